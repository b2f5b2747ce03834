import type { ButtonHTMLAttributes, ReactNode } from 'react';
import { cx } from '../../lib/cx';
import { Spinner } from './spinner';

export type ButtonVariant = 'primary' | 'secondary' | 'quiet' | 'danger';
export type ButtonSize = 'sm' | 'md' | 'lg';

const VARIANTS: Record<ButtonVariant, string> = {
  primary: 'bg-accent text-white shadow-sm hover:bg-accent-strong active:bg-ember-800 disabled:bg-oat-300 disabled:text-oat-800',
  secondary: 'bg-surface text-ink border border-line-strong hover:bg-oat-100 active:bg-oat-200 disabled:text-oat-600',
  quiet: 'bg-transparent text-ink hover:bg-oat-100 active:bg-oat-200 disabled:text-oat-600',
  danger: 'bg-beet-700 text-white shadow-sm hover:bg-beet-800 disabled:bg-oat-300 disabled:text-oat-800',
};

const SIZES: Record<ButtonSize, string> = {
  sm: 'min-h-9 px-3 text-sm gap-1.5',
  md: 'min-h-11 px-5 text-base gap-2',
  lg: 'min-h-12 px-6 text-lg gap-2',
};

/** Button styling, also for links that look like buttons. */
export function buttonClasses(options: { variant?: ButtonVariant; size?: ButtonSize; fullWidth?: boolean; className?: string } = {}): string {
  const { variant = 'primary', size = 'md', fullWidth = false, className } = options;
  return cx(
    'inline-flex items-center justify-center rounded-pill font-bold transition-colors select-none',
    'disabled:cursor-not-allowed',
    VARIANTS[variant],
    SIZES[size],
    fullWidth && 'w-full',
    className,
  );
}

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  size?: ButtonSize;
  fullWidth?: boolean;
  /** shows a spinner, disables the button and announces it busy */
  loading?: boolean;
  /** text shown while loading, e.g. "Signing in…" */
  loadingLabel?: ReactNode;
}

export function Button({ variant, size, fullWidth, loading = false, loadingLabel, className, children, disabled, type = 'button', ...rest }: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClasses({ variant, size, fullWidth, className })}
      disabled={disabled || loading}
      aria-busy={loading || undefined}
      {...rest}
    >
      {loading && <Spinner className="size-4" />}
      {loading && loadingLabel ? loadingLabel : children}
    </button>
  );
}
