import { useId, type InputHTMLAttributes, type ReactNode, type Ref, type TextareaHTMLAttributes } from 'react';
import { cx } from '../../lib/cx';

const CONTROL =
  'block w-full rounded-field border bg-surface px-3.5 py-2.5 text-base text-ink placeholder:text-oat-600 ' +
  'transition-colors focus-visible:border-focus disabled:bg-oat-100 disabled:text-oat-700 [&[readonly]]:bg-oat-100 [&[readonly]]:text-ink-soft';

function controlClasses(invalid: boolean, className?: string): string {
  return cx(CONTROL, invalid ? 'border-beet-600' : 'border-line-strong', className);
}

interface FieldFrameProps {
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  optional?: boolean;
  children: ReactNode;
  className?: string;
}

function FieldFrame({ id, label, hint, error, optional, children, className }: FieldFrameProps) {
  return (
    <div className={cx('flex flex-col gap-1.5', className)}>
      <label htmlFor={id} className="font-bold text-ink">
        {label}
        {optional && <span className="ml-1.5 text-sm font-normal text-ink-soft">(optional)</span>}
      </label>
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      )}
      {children}
      {error && (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm font-semibold text-beet-700">
          <span aria-hidden="true">●</span>
          <span>{error}</span>
        </p>
      )}
    </div>
  );
}

function describedBy(id: string, hint: unknown, error: unknown): string | undefined {
  const ids = [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean);
  return ids.length ? ids.join(' ') : undefined;
}

export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'children'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  optional?: boolean;
  containerClassName?: string;
  /** something beside the input, inside the field, e.g. a show-password toggle */
  trailing?: ReactNode;
  ref?: Ref<HTMLInputElement>;
}

export function TextField({ label, hint, error, optional, containerClassName, trailing, id: givenId, className, ref, ...input }: TextFieldProps) {
  const autoId = useId();
  const id = givenId ?? autoId;
  const control = (
    <input
      ref={ref}
      id={id}
      aria-invalid={error ? true : undefined}
      aria-describedby={describedBy(id, hint, error)}
      className={controlClasses(Boolean(error), cx(trailing ? 'pr-24' : undefined, className))}
      {...input}
    />
  );
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error} optional={optional} className={containerClassName}>
      {trailing ? (
        <div className="relative">
          {control}
          <div className="absolute inset-y-0 right-1.5 flex items-center">{trailing}</div>
        </div>
      ) : (
        control
      )}
    </FieldFrame>
  );
}

export interface TextAreaFieldProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'children'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  optional?: boolean;
  containerClassName?: string;
  ref?: Ref<HTMLTextAreaElement>;
}

export function TextAreaField({ label, hint, error, optional, containerClassName, id: givenId, className, ref, ...textarea }: TextAreaFieldProps) {
  const autoId = useId();
  const id = givenId ?? autoId;
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error} optional={optional} className={containerClassName}>
      <textarea
        ref={ref}
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        className={controlClasses(Boolean(error), cx('min-h-40 leading-relaxed', className))}
        {...textarea}
      />
    </FieldFrame>
  );
}

export interface ChoiceOption<V extends string> {
  value: V;
  label: ReactNode;
  description?: ReactNode;
}

export interface ChoiceCardsProps<V extends string> {
  legend: ReactNode;
  options: ChoiceOption<V>[];
  /** props for every radio, e.g. react-hook-form's register('field') */
  inputProps: Omit<InputHTMLAttributes<HTMLInputElement>, 'value' | 'type'> & { ref?: Ref<HTMLInputElement> };
  hint?: ReactNode;
  error?: string;
  columns?: 1 | 2;
  className?: string;
}

/** Radio buttons laid out as cards, each with a label and a line of explanation. */
export function ChoiceCards<V extends string>({ legend, options, inputProps, hint, error, columns = 2, className }: ChoiceCardsProps<V>) {
  const id = useId();
  return (
    <fieldset className={cx('flex flex-col gap-2', className)} aria-describedby={describedBy(id, hint, error)} aria-invalid={error ? true : undefined}>
      <legend className="mb-1.5 font-bold text-ink">{legend}</legend>
      {hint && (
        <p id={`${id}-hint`} className="-mt-1 mb-1 text-sm text-ink-soft">
          {hint}
        </p>
      )}
      <div className={cx('grid gap-3', columns === 2 && 'sm:grid-cols-2')}>
        {options.map((option) => {
          const optionId = `${id}-${option.value}`;
          return (
            <label
              key={option.value}
              htmlFor={optionId}
              className={cx(
                'group relative flex cursor-pointer gap-3 rounded-card border-2 bg-surface p-4 transition-colors',
                'border-oat-300 hover:border-oat-500',
                'has-[:checked]:border-accent has-[:checked]:bg-ember-50',
                'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-focus',
                error && 'border-beet-600',
              )}
            >
              <input
                type="radio"
                id={optionId}
                value={option.value}
                className="mt-1 size-4 shrink-0 accent-ember-600 focus-visible:outline-none"
                aria-describedby={option.description ? `${optionId}-desc` : undefined}
                {...inputProps}
              />
              <span className="flex flex-col gap-1">
                <span className="font-bold text-ink">{option.label}</span>
                {option.description && (
                  <span id={`${optionId}-desc`} className="text-sm text-ink-soft">
                    {option.description}
                  </span>
                )}
              </span>
            </label>
          );
        })}
      </div>
      {error && (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm font-semibold text-beet-700">
          <span aria-hidden="true">●</span>
          <span>{error}</span>
        </p>
      )}
    </fieldset>
  );
}
