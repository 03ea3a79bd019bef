import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { forgotPasswordSchema, type ForgotPassword } from "../../../../shared/schemas";
import { Button } from "../../../components/ui/button";
import { FormMessage, TextField } from "../../../components/ui/field";
import { applyServerError } from "../../../lib/form-errors";
import { useForgotPassword } from "../api/auth-mutations";

/** Asks for a reset link. The answer never says whether the address has an account. */
export function ForgotPasswordForm() {
  const forgot = useForgotPassword();
  const form = useForm<ForgotPassword>({ resolver: zodResolver(forgotPasswordSchema), defaultValues: { email: "" } });
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) =>
    forgot.mutateAsync(values).catch((error) => applyServerError(error, form.setError, ["email"])),
  );

  if (forgot.isSuccess) {
    return (
      <FormMessage
        tone="info"
        message={`If ${forgot.variables.email} belongs to an account, a reset link is on its way. It works once, for one hour.`}
      />
    );
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <FormMessage message={errors.root?.message} />
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <Button type="submit" busy={forgot.isPending} className="w-full">
        Send reset link
      </Button>
    </form>
  );
}
