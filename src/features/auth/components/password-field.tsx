import { useId, useState } from 'react';
import { TextField, type TextFieldProps } from '@/components/text-field';

/** A password input with a "Show password" switch, so long phrases can be checked. */
export function PasswordField(props: Omit<TextFieldProps, 'type'>) {
  const [visible, setVisible] = useState(false);
  const toggleId = useId();
  return (
    <div>
      <TextField {...props} type={visible ? 'text' : 'password'} spellCheck={false} autoCapitalize="none" />
      <div className="mt-2 flex items-center gap-2 text-sm text-ink-muted">
        <input
          id={toggleId}
          type="checkbox"
          checked={visible}
          onChange={(event) => setVisible(event.target.checked)}
          className="size-4 accent-accent"
        />
        <label htmlFor={toggleId}>Show password</label>
      </div>
    </div>
  );
}
