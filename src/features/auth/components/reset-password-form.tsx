import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { PASSWORD_MIN, resetPasswordSchema, type ResetPassword } from "../../../../shared/schemas";
import { Button } from "../../../components/ui/button";
import { FormMessage, TextField } from "../../../components/ui/field";
import { applyServerError } from "../../../lib/form-errors";
import { useResetPassword } from "../api/auth-mutations";

type ResetPasswordFormProps = { token: string; onReset: () => void };

/** Sets a new password with the single-use token from the e-mailed link. */
export function ResetPasswordForm({ token, onReset }: ResetPasswordFormProps) {
  const reset = useResetPassword();
  const form = useForm<ResetPassword>({ resolver: zodResolver(resetPasswordSchema), defaultValues: { token, password: "" } });
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) =>
    reset.mutateAsync(values).then(onReset, (error) => applyServerError(error, form.setError, ["password"])),
  );

  // The token is not a field the person can fix: its problems belong on the form itself.
  const tokenProblem = errors.token?.message;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <FormMessage message={tokenProblem ?? errors.root?.message} />
      <input type="hidden" {...form.register("token")} />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters.`}
        error={errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" busy={reset.isPending} className="w-full">
        Set new password
      </Button>
    </form>
  );
}
