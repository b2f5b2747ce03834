import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from 'react';
import { cx } from '../../lib/cx';

export interface CheckboxFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'type' | 'children'> {
  label: ReactNode;
  /** a line under the label */
  description?: ReactNode;
  containerClassName?: string;
  ref?: Ref<HTMLInputElement>;
}

/** One checkbox with its label (and a line of explanation); the whole row is the click target. */
export function CheckboxField({ label, description, containerClassName, id: givenId, className, ref, disabled, ...input }: CheckboxFieldProps) {
  const autoId = useId();
  const id = givenId ?? autoId;
  return (
    <label
      htmlFor={id}
      className={cx(
        'flex min-h-11 gap-3 rounded-field px-2 py-2',
        disabled ? 'cursor-not-allowed text-oat-600' : 'cursor-pointer hover:bg-oat-100',
        containerClassName,
      )}
    >
      <input
        ref={ref}
        id={id}
        type="checkbox"
        disabled={disabled}
        aria-describedby={description ? `${id}-desc` : undefined}
        className={cx('mt-1 size-5 shrink-0 accent-ember-600', className)}
        {...input}
      />
      <span className="flex min-w-0 flex-col">
        <span className="font-semibold">{label}</span>
        {description && (
          <span id={`${id}-desc`} className="text-sm text-ink-soft">
            {description}
          </span>
        )}
      </span>
    </label>
  );
}
