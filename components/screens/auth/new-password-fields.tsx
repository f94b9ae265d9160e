import { TextField } from '@/components/ui/text-field';
import { type FormErrors } from '@/lib/api/form-errors';
import { PASSWORD_MIN } from '@/shared/auth';

/** Message beside a "password again" field when the two entries differ (checked here, never sent). */
export const MISMATCH = 'Does not match the password above';

type Checked<T> = { ok: true; data: T } | { ok: false; errors: FormErrors };

/** A form's check (checkForm) with the "password again" comparison added. */
export function withConfirm<T>(check: Checked<T>, password: string, confirm: string): Checked<T> {
  if (password === confirm) return check;
  const errors = check.ok ? { fields: {} } : check.errors;
  return { ok: false, errors: { ...errors, fields: { confirm: MISMATCH, ...errors.fields } } };
}

type Props = {
  password: string;
  confirm: string;
  onPassword: (value: string) => void;
  onConfirm: (value: string) => void;
  onSubmit: () => void;
  errors: { password?: string; confirm?: string };
  /** The field names people see: "Password" on an invitation, "New password" elsewhere. */
  label?: string;
  autoFocus?: boolean;
};

/** A new password and the same again, with the length rule as a hint; the caller compares them. */
export function NewPasswordFields({ password, confirm, onPassword, onConfirm, onSubmit, errors, label = 'New password', autoFocus }: Props) {
  return (
    <>
      <TextField
        label={label}
        value={password}
        onChangeText={onPassword}
        onSubmit={onSubmit}
        error={errors.password}
        hint={`At least ${PASSWORD_MIN} characters.`}
        autoComplete="new-password"
        secureTextEntry
        autoFocus={autoFocus}
      />
      <TextField
        label={`${label} again`}
        value={confirm}
        onChangeText={onConfirm}
        onSubmit={onSubmit}
        error={errors.confirm}
        autoComplete="new-password"
        secureTextEntry
      />
    </>
  );
}
