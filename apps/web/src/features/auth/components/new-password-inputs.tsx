import { PasswordInput } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';

type NewPasswordValues = { password: string; confirm: string };

type Props<Values extends NewPasswordValues> = {
  form: UseFormReturnType<Values>;
  label: string;
  repeatLabel: string;
  /** Focus the password when the form opens (when it is the form's first field). */
  autoFocus?: boolean;
};

/** A new password and its repeat, for the invitation and reset forms (validated by `matchingPasswords`). */
export function NewPasswordInputs<Values extends NewPasswordValues>({ form, label, repeatLabel, autoFocus = false }: Props<Values>) {
  return (
    <>
      <PasswordInput
        label={label}
        description="At least 12 characters. A few unrelated words make a strong passphrase."
        autoComplete="new-password"
        required
        data-autofocus={autoFocus || undefined}
        key={form.key('password')}
        {...form.getInputProps('password')}
      />
      <PasswordInput label={repeatLabel} autoComplete="new-password" required key={form.key('confirm')} {...form.getInputProps('confirm')} />
    </>
  );
}
