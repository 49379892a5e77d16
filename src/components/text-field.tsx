import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from 'react';
import { cn } from '@/lib/cn';
import { FieldError, FieldHint, fieldIds } from './field';

export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'children'> {
  /** Always visible above the input. */
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  /** Shown after the label, e.g. "(optional)". */
  labelSuffix?: ReactNode;
  containerClassName?: string;
  ref?: Ref<HTMLInputElement>;
}

export function TextField({
  label,
  hint,
  error,
  labelSuffix,
  id,
  className,
  containerClassName,
  type = 'text',
  ...rest
}: TextFieldProps) {
  const generated = useId();
  const inputId = id ?? generated;
  const { hintId, errorId, describedBy } = fieldIds(inputId, hint, error);
  return (
    <div className={containerClassName}>
      <label htmlFor={inputId} className="block text-sm font-medium text-ink">
        {label}
        {labelSuffix && <span className="ml-1 font-normal text-ink-muted">{labelSuffix}</span>}
      </label>
      <FieldHint id={hintId}>{hint}</FieldHint>
      <input
        id={inputId}
        type={type}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={cn('field-control mt-1', error && 'border-danger', className)}
        {...rest}
      />
      <FieldError id={errorId} message={error} />
    </div>
  );
}
