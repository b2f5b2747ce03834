import { useEffect, useRef, useState } from 'react';
import { Button, type ButtonSize, type ButtonVariant } from './button';

export interface CopyButtonProps {
  /** the text put on the clipboard */
  text: string;
  /** what the button copies, e.g. "Copy the model" */
  label?: string;
  variant?: ButtonVariant;
  size?: ButtonSize;
  className?: string;
}

type CopyState = 'idle' | 'copied' | 'failed';

/** Puts a text on the clipboard and says so beside the button, for screen readers too. */
export function CopyButton({ text, label = 'Copy', variant = 'secondary', size = 'sm', className }: CopyButtonProps) {
  const [state, setState] = useState<CopyState>('idle');
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  useEffect(() => () => void (timer.current && clearTimeout(timer.current)), []);

  async function copy() {
    let next: CopyState = 'copied';
    try {
      await navigator.clipboard.writeText(text);
    } catch {
      next = 'failed';
    }
    setState(next);
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => setState('idle'), 2500);
  }

  return (
    <span className="inline-flex items-center gap-2">
      <Button variant={variant} size={size} onClick={copy} className={className}>
        {label}
      </Button>
      <span role="status" className="text-sm font-semibold text-ink-soft">
        {state === 'copied' ? 'Copied.' : state === 'failed' ? 'Could not reach the clipboard; select the text instead.' : ''}
      </span>
    </span>
  );
}
