import { useId, useState, type FormEvent } from "react";
import { uploadLimits } from "@spanwright/contracts";
import { describeError, isApiError } from "../../api/client";
import { useImportBeam } from "../../api/imports";
import { Alert } from "../../components/Alert";
import { Button } from "../../components/Button";
import { TextField } from "../../components/TextField";

/** Messages for the upload errors a person can act on; anything else shows the server's words. */
function importErrorText(error: unknown): string {
  if (!isApiError(error)) return describeError(error);
  switch (error.code) {
    case "file-too-large":
      return `The file is larger than ${uploadLimits.fileBytes / 1_000_000} MB.`;
    case "invalid-file":
      return "That file is not a beam model in the Spanwright exchange format (JSON).";
    case "invalid-model":
      return `The model is not valid: ${error.message}`;
    default:
      return describeError(error);
  }
}

/** Creates a beam from an exchange-format JSON file (e.g. one exported from the editor). */
export function ImportBeamForm({ projectId, onImported }: { projectId: string; onImported: (beamId: string) => void }) {
  const fileId = useId();
  const importBeam = useImportBeam(projectId);
  const [file, setFile] = useState<File | null>(null);
  const [missing, setMissing] = useState(false);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (file === null) {
      setMissing(true);
      return;
    }
    const name = String(new FormData(event.currentTarget).get("name") ?? "").trim();
    importBeam.mutate({ file, ...(name !== "" ? { name } : {}) }, { onSuccess: (created) => onImported(created.beam.id) });
  }

  return (
    <form noValidate onSubmit={handleSubmit} aria-label="Import a beam" className="space-y-3">
      {importBeam.isError && (
        <Alert tone="error" title="Could not import the beam">
          {importErrorText(importBeam.error)}
        </Alert>
      )}
      <div>
        <label htmlFor={fileId} className="mb-1 block text-sm font-medium text-ink-800">Model file (JSON)</label>
        <input
          id={fileId}
          type="file"
          accept=".json,application/json"
          aria-invalid={missing || undefined}
          onChange={(e) => {
            setFile(e.target.files?.[0] ?? null);
            setMissing(false);
          }}
          className="block text-sm"
        />
        {missing && <p className="mt-1 text-sm font-medium text-danger-700">Choose a file to import.</p>}
      </div>
      <TextField label="Name (optional)" name="name" hint="Defaults to the model's title." maxLength={120} />
      <Button type="submit" variant="secondary" busy={importBeam.isPending} busyLabel="Importing…">
        Import beam
      </Button>
    </form>
  );
}
