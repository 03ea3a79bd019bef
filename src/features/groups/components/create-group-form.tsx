import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { createGroupSchema, type CreateGroup } from "../../../../shared/schemas";
import { Button } from "../../../components/ui/button";
import { FormMessage, TextField } from "../../../components/ui/field";
import { applyServerError } from "../../../lib/form-errors";
import { useCreateGroup } from "../api/group-mutations";

export function CreateGroupForm() {
  const create = useCreateGroup();
  const form = useForm<CreateGroup>({ resolver: zodResolver(createGroupSchema), defaultValues: { name: "" } });
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) =>
    create.mutateAsync(values).then(
      () => form.reset(),
      (error) => applyServerError(error, form.setError, ["name"]),
    ),
  );

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3">
      <FormMessage message={errors.root?.message} />
      <TextField
        label="Group name"
        placeholder="e.g. Cortical dynamics journal club"
        hint="You become its owner and can invite people next."
        error={errors.name?.message}
        {...form.register("name")}
      />
      <Button type="submit" busy={create.isPending} className="self-start">
        Create group
      </Button>
    </form>
  );
}
