import { useId, type ReactNode, type Ref, type SelectHTMLAttributes } from 'react';
import { cx } from '../../lib/cx';

export interface SelectFieldProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  /** hide the label visually (inside a table cell) while keeping it for screen readers */
  labelHidden?: boolean;
  containerClassName?: string;
  ref?: Ref<HTMLSelectElement>;
}

/** A native select with the kit's label, hint and error; phones show their own picker. */
export function SelectField({ label, hint, error, labelHidden, containerClassName, id: givenId, className, ref, children, ...select }: SelectFieldProps) {
  const autoId = useId();
  const id = givenId ?? autoId;
  const described = [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div className={cx('flex flex-col gap-1.5', containerClassName)}>
      <label htmlFor={id} className={cx('font-bold text-ink', labelHidden && 'sr-only')}>
        {label}
      </label>
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      )}
      <select
        ref={ref}
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={described}
        className={cx(
          'block w-full min-w-0 rounded-field border bg-surface px-3 py-2.5 text-base text-ink transition-colors focus-visible:border-focus disabled:bg-oat-100 disabled:text-oat-700',
          error ? 'border-beet-600' : 'border-line-strong',
          className,
        )}
        {...select}
      >
        {children}
      </select>
      {error && (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm font-semibold text-beet-700">
          <span aria-hidden="true">●</span>
          <span>{error}</span>
        </p>
      )}
    </div>
  );
}
