import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { Link } from "react-router-dom";
import { loginSchema, type Login, type User } from "../../../../shared/schemas";
import { Button } from "../../../components/ui/button";
import { FormMessage, TextField } from "../../../components/ui/field";
import { applyServerError } from "../../../lib/form-errors";
import { useSignIn } from "../api/auth-mutations";

type SignInFormProps = { onSignedIn: (user: User) => void; defaultEmail?: string };

export function SignInForm({ onSignedIn, defaultEmail = "" }: SignInFormProps) {
  const signIn = useSignIn();
  const form = useForm<Login>({ resolver: zodResolver(loginSchema), defaultValues: { email: defaultEmail, password: "" } });
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) =>
    signIn.mutateAsync(values).then(
      onSignedIn,
      (error) => applyServerError(error, form.setError, ["email", "password"]),
    ),
  );

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <FormMessage message={errors.root?.message} />
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <div className="flex flex-col gap-1">
        <TextField
          label="Password"
          type="password"
          autoComplete="current-password"
          error={errors.password?.message}
          {...form.register("password")}
        />
        <Link to="/forgot-password" className="self-end text-sm text-well-600 hover:underline">
          Forgot your password?
        </Link>
      </div>
      <Button type="submit" busy={signIn.isPending} className="mt-1 w-full">
        Sign in
      </Button>
    </form>
  );
}
