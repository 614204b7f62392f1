import type { UseFormRegisterReturn } from "react-hook-form";
import { PasswordField } from "@/components/ui/field";
import { PASSWORD_MIN_LENGTH } from "../api/schemas";

export interface NewPasswordFieldsProps {
  password: UseFormRegisterReturn;
  repeatPassword: UseFormRegisterReturn;
  passwordError?: string;
  repeatPasswordError?: string;
  label?: string;
}

/** "New password" + "Repeat new password", with the minimum length stated up front. */
export function NewPasswordFields({
  password,
  repeatPassword,
  passwordError,
  repeatPasswordError,
  label = "New password",
}: NewPasswordFieldsProps) {
  return (
    <>
      <PasswordField
        label={label}
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. A few unrelated words make a strong one.`}
        autoComplete="new-password"
        error={passwordError}
        {...password}
      />
      <PasswordField
        label="Repeat the password"
        autoComplete="new-password"
        error={repeatPasswordError}
        {...repeatPassword}
      />
    </>
  );
}
