import { useState, type FormEvent } from "react";
import { useNavigate } from "react-router";
import { can, updateProjectRequestSchema, type Project } from "@spanwright/contracts";
import { describeError, type FieldErrors } from "../../api/client";
import { useDeleteProject, useUpdateProject } from "../../api/projects";
import { Alert } from "../../components/Alert";
import { Button } from "../../components/Button";
import { ConfirmButton } from "../../components/ConfirmButton";
import { Card } from "../../components/PageHeader";
import { SelectField } from "../../components/SelectField";
import { TextField } from "../../components/TextField";
import { formValues, numberOrUndefined } from "../../forms/formValues";
import { formLevelMessage, mergeFieldErrors, validateForm } from "../../forms/validateForm";
import { unitSystemLabels, unitSystemOptions } from "../../roleLabels";

const fields = ["name", "unitSystem", "compareThresholdPercent"] as const;

function ReadOnlySettings({ project }: { project: Project }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 text-sm">
      <dt className="text-paper-600">Units</dt>
      <dd>{unitSystemLabels[project.unitSystem]}</dd>
      <dt className="text-paper-600">Compare threshold</dt>
      <dd className="tabular">{project.compareThresholdPercent} %</dd>
    </dl>
  );
}

export function ProjectSettings({ project }: { project: Project }) {
  const update = useUpdateProject(project.id);
  const remove = useDeleteProject(project.id);
  const navigate = useNavigate();
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});

  if (!can(project.role, "manage")) {
    return (
      <Card title="Settings">
        <ReadOnlySettings project={project} />
        <p className="mt-3 text-xs text-paper-600">Only a project lead can change these.</p>
      </Card>
    );
  }

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const raw = formValues(event.currentTarget);
    const result = validateForm(updateProjectRequestSchema, {
      name: raw.name,
      unitSystem: raw.unitSystem,
      compareThresholdPercent: numberOrUndefined(raw.compareThresholdPercent),
    });
    if (!result.ok) {
      setClientErrors(result.errors);
      update.reset();
      return;
    }
    setClientErrors({});
    update.mutate(result.data);
  }

  const errors = mergeFieldErrors(clientErrors, update.error);
  const message = formLevelMessage(update.error, fields) ?? errors[""] ?? null;
  return (
    <Card title="Settings">
      {/* key: refill the form from the server's answer after a save or a refetch. */}
      <form key={project.updatedAt} noValidate onSubmit={handleSubmit} aria-label="Project settings" className="space-y-4">
        {message !== null && (
          <Alert tone="error" title="Could not save the settings">
            {message}
          </Alert>
        )}
        {update.isSuccess && <Alert tone="success">Settings saved.</Alert>}
        <TextField label="Project name" name="name" defaultValue={project.name} error={errors.name} />
        <SelectField
          label="Units"
          name="unitSystem"
          options={unitSystemOptions}
          defaultValue={project.unitSystem}
          error={errors.unitSystem}
        />
        <TextField
          label="Compare threshold (%)"
          name="compareThresholdPercent"
          inputMode="decimal"
          defaultValue={String(project.compareThresholdPercent)}
          hint="A reaction that changes by more than this between revisions is flagged."
          error={errors.compareThresholdPercent}
        />
        <Button type="submit" busy={update.isPending} busyLabel="Saving…">
          Save settings
        </Button>
      </form>
      <div className="mt-6 border-t border-paper-200 pt-4">
        <p className="mb-2 text-sm font-medium text-ink-900">Delete project</p>
        <p className="mb-2 text-xs text-paper-600">Removes every beam and revision for all members.</p>
        {remove.isError && (
          <div className="mb-2">
            <Alert tone="error">{describeError(remove.error)}</Alert>
          </div>
        )}
        <ConfirmButton
          label="Delete project…"
          confirmLabel="Delete"
          question="Delete for everyone?"
          busy={remove.isPending}
          onConfirm={() => remove.mutate(undefined, { onSuccess: () => void navigate("/projects", { replace: true }) })}
        />
      </div>
    </Card>
  );
}
