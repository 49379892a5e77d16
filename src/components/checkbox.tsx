import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from 'react';
import { cn } from '@/lib/cn';
import { FieldError, FieldHint, fieldIds } from './field';

export interface CheckboxProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'type' | 'children'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  hideLabel?: boolean;
  containerClassName?: string;
  ref?: Ref<HTMLInputElement>;
}

export function Checkbox({
  label,
  hint,
  error,
  hideLabel = false,
  id,
  className,
  containerClassName,
  ...rest
}: CheckboxProps) {
  const generated = useId();
  const inputId = id ?? generated;
  const { hintId, errorId, describedBy } = fieldIds(inputId, hint, error);
  return (
    <div className={cn('flex items-start gap-2', containerClassName)}>
      <input
        id={inputId}
        type="checkbox"
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={cn('mt-1 size-4 shrink-0 accent-accent', className)}
        {...rest}
      />
      <div>
        <label htmlFor={inputId} className={hideLabel ? 'sr-only' : 'text-sm text-ink'}>
          {label}
        </label>
        <FieldHint id={hintId}>{hint}</FieldHint>
        <FieldError id={errorId} message={error} />
      </div>
    </div>
  );
}
