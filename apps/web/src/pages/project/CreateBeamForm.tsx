import { useState, type FormEvent } from "react";
import { z } from "zod";
import { beamSchema } from "@spanwright/contracts";
import { beamTemplates, findBeamTemplate } from "../../api/beamTemplates";
import { useCreateBeam } from "../../api/beams";
import type { FieldErrors } from "../../api/client";
import { Alert } from "../../components/Alert";
import { Button } from "../../components/Button";
import { SelectField } from "../../components/SelectField";
import { TextField } from "../../components/TextField";
import { formValues } from "../../forms/formValues";
import { formLevelMessage, mergeFieldErrors, validateForm } from "../../forms/validateForm";

// The form asks for a name and a starting shape; the model itself comes from the template.
const createBeamFormSchema = z.object({
  name: beamSchema.shape.name,
  template: z.enum(beamTemplates.map((t) => t.id) as [string, ...string[]]),
});

const fields = ["name", "template"] as const;

export function CreateBeamForm({ projectId, onCreated }: { projectId: string; onCreated: (beamId: string) => void }) {
  const create = useCreateBeam(projectId);
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const result = validateForm(createBeamFormSchema, formValues(event.currentTarget));
    if (!result.ok) {
      setClientErrors(result.errors);
      create.reset();
      return;
    }
    setClientErrors({});
    const template = findBeamTemplate(result.data.template);
    create.mutate(
      { name: result.data.name, model: { ...template.model, title: result.data.name } },
      { onSuccess: (created) => onCreated(created.beam.id) },
    );
  }

  const errors = mergeFieldErrors(clientErrors, create.error);
  const message = formLevelMessage(create.error, fields);
  return (
    <form noValidate onSubmit={handleSubmit} aria-label="New beam" className="space-y-3">
      {message !== null && (
        <Alert tone="error" title="Could not create the beam">
          {message}
        </Alert>
      )}
      <div className="grid gap-3 sm:grid-cols-[minmax(0,3fr)_minmax(0,2fr)_auto] sm:items-start">
        <TextField label="Beam name" name="name" placeholder="e.g. Level 3, grid D, B12" error={errors.name} />
        <SelectField
          label="Start from"
          name="template"
          options={beamTemplates.map((t) => ({ value: t.id, label: t.label }))}
          error={errors.template}
        />
        <Button type="submit" variant="accent" className="sm:mt-6" busy={create.isPending} busyLabel="Creating…">
          Add beam
        </Button>
      </div>
    </form>
  );
}
