import { useState, type FormEvent } from "react";
import { createProjectRequestSchema, type Project } from "@spanwright/contracts";
import { useCreateProject } from "../../api/projects";
import type { FieldErrors } from "../../api/client";
import { Alert } from "../../components/Alert";
import { Button } from "../../components/Button";
import { SelectField } from "../../components/SelectField";
import { TextField } from "../../components/TextField";
import { formValues } from "../../forms/formValues";
import { formLevelMessage, mergeFieldErrors, validateForm } from "../../forms/validateForm";
import { unitSystemOptions } from "../../roleLabels";

const fields = ["name", "unitSystem"] as const;

export function CreateProjectForm({ onCreated }: { onCreated: (project: Project) => void }) {
  const create = useCreateProject();
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const result = validateForm(createProjectRequestSchema, formValues(event.currentTarget));
    if (!result.ok) {
      setClientErrors(result.errors);
      create.reset();
      return;
    }
    setClientErrors({});
    create.mutate(result.data, { onSuccess: onCreated });
  }

  const errors = mergeFieldErrors(clientErrors, create.error);
  const message = formLevelMessage(create.error, fields);
  return (
    <form noValidate onSubmit={handleSubmit} className="space-y-4" aria-label="New project">
      {message !== null && (
        <Alert tone="error" title="Could not create the project">
          {message}
        </Alert>
      )}
      <TextField label="Project name" name="name" placeholder="e.g. Harbour Lane depot, stage 2" error={errors.name} />
      <SelectField label="Units" name="unitSystem" options={unitSystemOptions} defaultValue="si" error={errors.unitSystem} />
      <Button type="submit" variant="accent" busy={create.isPending} busyLabel="Creating…">
        Create project
      </Button>
    </form>
  );
}
