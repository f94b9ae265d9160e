import { TextField } from '@/components/ui/text-field';
import { PASSWORD_MIN } from '@/shared/auth';

/** Message beside a "password again" field when the two entries differ (checked here, never sent). */
export const MISMATCH = 'Does not match the password above';

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
