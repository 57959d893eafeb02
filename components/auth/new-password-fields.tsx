import type { UseFormRegisterReturn } from "react-hook-form";
import { TextField } from "@/components/ui/field";
import { minPasswordLength } from "@/lib/auth/password-rules";

interface Props {
  /** The first field's label: "Choose a password", "New password". */
  label: string;
  password: UseFormRegisterReturn;
  confirm: UseFormRegisterReturn;
  passwordError?: string;
  confirmError?: string;
}

/** A new password and its confirmation, with the rule said once (invitation and account forms). */
export function NewPasswordFields({ label, password, confirm, passwordError, confirmError }: Props) {
  return (
    <>
      <TextField
        label={label}
        type="password"
        autoComplete="new-password"
        hint={`At least ${minPasswordLength} characters. A few unrelated words work well; very common passwords are refused.`}
        error={passwordError}
        {...password}
      />
      <TextField label="Type it again" type="password" autoComplete="new-password" error={confirmError} {...confirm} />
    </>
  );
}
