import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { inviteSchema, type GroupRole, type Invite } from "../../../../shared/schemas";
import { Button } from "../../../components/ui/button";
import { FormMessage, SelectField, TextField } from "../../../components/ui/field";
import { applyServerError } from "../../../lib/form-errors";
import { toast } from "../../../lib/toast-store";
import { useInviteMember } from "../api/group-mutations";
import { roleDescription, roleLabel } from "./role-badge";

type InviteFormProps = { groupId: string; myRole: GroupRole };

/** Owners may invite any role; editors may invite editors and viewers. */
export function InviteForm({ groupId, myRole }: InviteFormProps) {
  const invite = useInviteMember(groupId);
  const roles: GroupRole[] = myRole === "owner" ? ["viewer", "editor", "owner"] : ["viewer", "editor"];
  const form = useForm<Invite>({ resolver: zodResolver(inviteSchema), defaultValues: { email: "", role: "viewer" } });
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) =>
    invite.mutateAsync(values).then(
      () => {
        toast.success(`Invitation sent to ${values.email}.`);
        form.reset({ email: "", role: values.role });
      },
      (error) => applyServerError(error, form.setError, ["email", "role"]),
    ),
  );

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3">
      <FormMessage message={errors.root?.message} />
      <TextField
        label="E-mail address"
        type="email"
        autoComplete="off"
        placeholder="colleague@lab.example"
        error={errors.email?.message}
        {...form.register("email")}
      />
      <SelectField
        label="Role"
        options={roles.map((r) => ({ value: r, label: `${roleLabel[r]} — ${roleDescription[r]}` }))}
        error={errors.role?.message}
        {...form.register("role")}
      />
      <Button type="submit" busy={invite.isPending} className="mt-1 self-start">
        Send invitation
      </Button>
    </form>
  );
}
