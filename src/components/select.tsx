import { useId, type ReactNode, type Ref, type SelectHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';
import { FieldError, FieldHint, fieldIds } from './field';

export interface SelectOption {
  value: string;
  label: string;
  disabled?: boolean;
}

export interface SelectProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: ReactNode;
  /** Either options or <option> children. */
  options?: readonly SelectOption[];
  hint?: ReactNode;
  error?: string;
  /** Hide the label visually (it stays for screen readers), e.g. inside a table cell. */
  hideLabel?: boolean;
  containerClassName?: string;
  ref?: Ref<HTMLSelectElement>;
}

export function Select({
  label,
  options,
  hint,
  error,
  hideLabel = false,
  id,
  className,
  containerClassName,
  children,
  ...rest
}: SelectProps) {
  const generated = useId();
  const selectId = id ?? generated;
  const { hintId, errorId, describedBy } = fieldIds(selectId, hint, error);
  return (
    <div className={containerClassName}>
      <label htmlFor={selectId} className={hideLabel ? 'sr-only' : 'block text-sm font-medium text-ink'}>
        {label}
      </label>
      <FieldHint id={hintId}>{hint}</FieldHint>
      <select
        id={selectId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={cn('field-control', !hideLabel && 'mt-1', error && 'border-danger', className)}
        {...rest}
      >
        {options?.map((option) => (
          <option key={option.value} value={option.value} disabled={option.disabled}>
            {option.label}
          </option>
        ))}
        {children}
      </select>
      <FieldError id={errorId} message={error} />
    </div>
  );
}
