import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { PASSWORD_MIN, registerSchema, type Register, type User } from "../../../../shared/schemas";
import { Button } from "../../../components/ui/button";
import { FormMessage, TextField } from "../../../components/ui/field";
import { applyServerError } from "../../../lib/form-errors";
import { useRegister } from "../api/auth-mutations";

type RegisterFormProps = { onRegistered: (user: User) => void; defaultEmail?: string };

export function RegisterForm({ onRegistered, defaultEmail = "" }: RegisterFormProps) {
  const register = useRegister();
  const form = useForm<Register>({
    resolver: zodResolver(registerSchema),
    defaultValues: { name: "", email: defaultEmail, password: "" },
  });
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) =>
    register.mutateAsync(values).then(
      onRegistered,
      (error) => applyServerError(error, form.setError, ["name", "email", "password"]),
    ),
  );

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <FormMessage message={errors.root?.message} />
      <TextField label="Name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters. A short sentence works well.`}
        error={errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" busy={register.isPending} className="mt-1 w-full">
        Create account
      </Button>
    </form>
  );
}
