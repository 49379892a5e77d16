import { useId, type ReactNode, type Ref, type TextareaHTMLAttributes } from 'react';
import { LabelledField, fieldIds } from '@/components/field';
import { cn } from '@/lib/cn';

export interface TextareaFieldProps extends TextareaHTMLAttributes<HTMLTextAreaElement> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  labelSuffix?: ReactNode;
  /** Source text: the book face with generous line height. */
  serif?: boolean;
  containerClassName?: string;
  ref?: Ref<HTMLTextAreaElement>;
}

export function TextareaField({
  label,
  hint,
  error,
  labelSuffix,
  serif = false,
  id,
  className,
  containerClassName,
  rows = 4,
  ...rest
}: TextareaFieldProps) {
  const generated = useId();
  const inputId = id ?? generated;
  const { hintId, errorId, describedBy } = fieldIds(inputId, hint, error);
  return (
    <LabelledField inputId={inputId} label={label} labelSuffix={labelSuffix} hint={hint} hintId={hintId} error={error} errorId={errorId} className={containerClassName}>
      <textarea
        id={inputId}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={cn('field-control mt-1', serif && 'font-serif text-[1.1875rem] leading-[1.8]', error && 'border-danger', className)}
        {...rest}
      />
    </LabelledField>
  );
}
