import { useState } from 'react';
import { Button, type ButtonSize, type ButtonVariant } from './button';
import { useToast } from './toast';

/** Puts text on the clipboard; older or insecure pages fall back to a hidden text area. */
export async function copyText(text: string): Promise<void> {
  if (navigator.clipboard?.writeText && window.isSecureContext) {
    await navigator.clipboard.writeText(text);
    return;
  }
  const area = document.createElement('textarea');
  area.value = text;
  area.setAttribute('readonly', '');
  area.style.position = 'fixed';
  area.style.opacity = '0';
  document.body.appendChild(area);
  area.select();
  const ok = document.execCommand('copy');
  area.remove();
  if (!ok) throw new Error('The browser refused to copy.');
}

export interface CopyTextButtonProps {
  text: string;
  children: string;
  /** toast after a copy, e.g. "Shopping list copied." */
  copiedMessage: string;
  variant?: ButtonVariant;
  size?: ButtonSize;
  disabled?: boolean;
  className?: string;
}

export function CopyTextButton({ text, children, copiedMessage, variant = 'secondary', size = 'sm', disabled, className }: CopyTextButtonProps) {
  const toast = useToast();
  const [copying, setCopying] = useState(false);
  return (
    <Button
      variant={variant}
      size={size}
      className={className}
      disabled={disabled || !text}
      loading={copying}
      onClick={async () => {
        setCopying(true);
        try {
          await copyText(text);
          toast.show(copiedMessage, 'success');
        } catch {
          toast.show("Couldn't copy here. Select the list and copy it by hand.", 'danger');
        } finally {
          setCopying(false);
        }
      }}
    >
      {children}
    </Button>
  );
}
