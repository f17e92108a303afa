import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from 'react';
import { cx } from './cx.ts';

export interface CheckboxFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id' | 'type'> {
  label: ReactNode;
  hint?: ReactNode;
  ref?: Ref<HTMLInputElement>;
  wrapperClassName?: string;
}

/** A checkbox with its label to the right and an optional hint below. */
export function CheckboxField({ label, hint, wrapperClassName, className, ...rest }: CheckboxFieldProps) {
  const id = useId();
  return (
    <div className={cx('flex items-start gap-2.5', wrapperClassName)}>
      <input
        id={id}
        type="checkbox"
        className={cx('mt-0.5 size-4 rounded border-hide-400 accent-hide-700', className)}
        aria-describedby={hint ? `${id}-hint` : undefined}
        {...rest}
      />
      <div className="leading-tight">
        <label htmlFor={id} className="text-sm font-medium text-hide-900">
          {label}
        </label>
        {hint && (
          <p id={`${id}-hint`} className="mt-0.5 text-xs text-hide-600">
            {hint}
          </p>
        )}
      </div>
    </div>
  );
}
