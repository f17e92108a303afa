import { useId, type InputHTMLAttributes, type ReactNode, type Ref, type SelectHTMLAttributes, type TextareaHTMLAttributes } from 'react';
import { cx } from './cx.ts';

const control =
  'block w-full rounded-md border bg-white/80 px-3 text-ink placeholder:text-hide-400 transition-colors ' +
  'focus:border-brass-500 focus:outline-none focus-visible:outline-2 focus-visible:outline-brass-500 ' +
  'disabled:bg-hide-50 disabled:text-hide-600';

function controlClass(invalid: boolean, extra?: string) {
  return cx(control, invalid ? 'border-thread-500' : 'border-hide-300', extra);
}

interface FieldFrameProps {
  id: string;
  label: ReactNode;
  /** Unit shown after the label and inside the control's end ("mm", "in", "oz"). */
  unit?: string | undefined;
  hint?: ReactNode;
  error?: string | undefined;
  children: ReactNode;
  className?: string | undefined;
}

/** Label, control, hint and error wired together with ids so screen readers read all three. */
function FieldFrame({ id, label, unit, hint, error, children, className }: FieldFrameProps) {
  return (
    <div className={cx('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-medium text-hide-900">
        {label}
        {unit && <> <span className="font-normal text-hide-600">({unit})</span></>}
      </label>
      {children}
      {hint && !error && (
        <p id={`${id}-hint`} className="text-xs text-hide-600">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} role="alert" className="text-sm font-medium text-thread-700">
          {error}
        </p>
      )}
    </div>
  );
}

function describedBy(id: string, hint: unknown, error: unknown) {
  return error ? `${id}-error` : hint ? `${id}-hint` : undefined;
}

export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> {
  label: ReactNode;
  unit?: string | undefined;
  hint?: ReactNode;
  error?: string | undefined;
  ref?: Ref<HTMLInputElement>;
  wrapperClassName?: string;
}

export function TextField({ label, unit, hint, error, className, wrapperClassName, ...rest }: TextFieldProps) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} unit={unit} hint={hint} error={error} className={wrapperClassName}>
      <input
        id={id}
        className={controlClass(Boolean(error), cx('h-10', className))}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        {...rest}
      />
    </FieldFrame>
  );
}

export interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> {
  label: ReactNode;
  unit?: string | undefined;
  hint?: ReactNode;
  error?: string | undefined;
  ref?: Ref<HTMLSelectElement>;
  wrapperClassName?: string;
}

export function SelectField({ label, unit, hint, error, className, wrapperClassName, children, ...rest }: SelectFieldProps) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} unit={unit} hint={hint} error={error} className={wrapperClassName}>
      <select
        id={id}
        className={controlClass(Boolean(error), cx('h-10 pr-8', className))}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        {...rest}
      >
        {children}
      </select>
    </FieldFrame>
  );
}

export interface TextAreaFieldProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'id'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string | undefined;
  ref?: Ref<HTMLTextAreaElement>;
  wrapperClassName?: string;
}

export function TextAreaField({ label, hint, error, className, wrapperClassName, ...rest }: TextAreaFieldProps) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error} className={wrapperClassName}>
      <textarea
        id={id}
        className={controlClass(Boolean(error), cx('min-h-20 py-2', className))}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        {...rest}
      />
    </FieldFrame>
  );
}
