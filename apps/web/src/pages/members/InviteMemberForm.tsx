import { useState, type FormEvent } from "react";
import { inviteMemberRequestSchema, type Member } from "@spanwright/contracts";
import { isApiError, type FieldErrors } from "../../api/client";
import { useInviteMember } from "../../api/members";
import { Alert } from "../../components/Alert";
import { Button } from "../../components/Button";
import { SelectField } from "../../components/SelectField";
import { TextField } from "../../components/TextField";
import { formValues } from "../../forms/formValues";
import { formLevelMessage, mergeFieldErrors, validateForm } from "../../forms/validateForm";
import { roleOptions } from "../../roleLabels";
import { describeMemberError } from "./memberErrors";

const fields = ["email", "role"] as const;

export function InviteMemberForm({ projectId }: { projectId: string }) {
  const invite = useInviteMember(projectId);
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const [invited, setInvited] = useState<Member | null>(null);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    const result = validateForm(inviteMemberRequestSchema, formValues(form));
    setInvited(null);
    if (!result.ok) {
      setClientErrors(result.errors);
      invite.reset();
      return;
    }
    setClientErrors({});
    invite.mutate(result.data, {
      onSuccess: (member) => {
        setInvited(member);
        form.reset();
      },
    });
  }

  const already = isApiError(invite.error) && invite.error.code === "already-member";
  const errors: FieldErrors = {
    ...mergeFieldErrors(clientErrors, invite.error),
    ...(already && clientErrors.email === undefined ? { email: describeMemberError(invite.error) } : {}),
  };
  const message = already || formLevelMessage(invite.error, fields) === null ? null : describeMemberError(invite.error);

  return (
    <form noValidate onSubmit={handleSubmit} aria-label="Invite a member" className="space-y-3">
      {message !== null && (
        <Alert tone="error" title="Could not invite">
          {message}
        </Alert>
      )}
      {invited !== null && (
        <Alert tone="success">
          {invited.pending
            ? `${invited.email} was added. They will see the project once they create an account with that e-mail and confirm it from the link we send.`
            : `${invited.name} was added and can open the project now.`}
        </Alert>
      )}
      <div className="grid gap-3 sm:grid-cols-[minmax(0,3fr)_minmax(0,2fr)_auto] sm:items-start">
        <TextField label="E-mail" name="email" type="email" autoComplete="off" error={errors.email} />
        <SelectField label="Role" name="role" options={roleOptions} defaultValue="engineer" error={errors.role} />
        <Button type="submit" variant="accent" className="sm:mt-6" busy={invite.isPending} busyLabel="Inviting…">
          Invite
        </Button>
      </div>
    </form>
  );
}
