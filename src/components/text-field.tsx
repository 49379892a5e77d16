import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from 'react';
import { cn } from '@/lib/cn';
import { LabelledField, fieldIds } from './field';

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
    <LabelledField inputId={inputId} label={label} labelSuffix={labelSuffix} hint={hint} hintId={hintId} error={error} errorId={errorId} className={containerClassName}>
      <input
        id={inputId}
        type={type}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={cn('field-control mt-1', error && 'border-danger', className)}
        {...rest}
      />
    </LabelledField>
  );
}
