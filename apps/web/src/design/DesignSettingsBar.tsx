import type { BeamDesignSettings } from "@spanwright/contracts";
import { isApiError } from "../api/client";
import { Alert } from "../components/Alert";
import { Button } from "../components/Button";
import { sameSettings, type SettingsDraft } from "./checkChoices";
import { reportPdfUrl, useSaveDesignSettings } from "./designSettingsApi";

export interface DesignSettingsBarProps {
  /** What the page shows now, as settings to save. */
  readonly draft: SettingsDraft;
  /** What the beam has saved; null when nothing is saved yet. */
  readonly saved: BeamDesignSettings | null;
  readonly canEdit: boolean;
  readonly saving: boolean;
  readonly error: unknown;
  readonly onSave: (settings: BeamDesignSettings) => void;
  /** The PDF report of the shown revision, which prints the saved settings. */
  readonly reportHref: string;
}

/** The field a refused save names: `details.field` (design rules) or the first issue's path (schema). */
function fieldOf(error: unknown): string | null {
  if (!isApiError(error)) return null;
  const details = error.details as { field?: unknown } | null;
  if (details && typeof details.field === "string") return details.field;
  return Object.keys(error.fieldErrors)[0] ?? null;
}

/**
 * Saving the section, material and check choices with the beam, and the PDF report that prints
 * them. The link is offered only for what is saved, so the report never differs from the page.
 */
export function DesignSettingsBar({ draft, saved, canEdit, saving, error, onSave, reportHref }: DesignSettingsBarProps) {
  const dirty = !draft.ok || !sameSettings(draft.settings, saved);
  const field = fieldOf(error);
  return (
    <div className="space-y-2 rounded-md border border-paper-300 p-3 text-sm">
      <div className="flex flex-wrap items-center gap-3">
        {canEdit && (
          <Button size="sm" disabled={!draft.ok || !dirty || saving} onClick={() => draft.ok && onSave(draft.settings)}>
            {saving ? "Saving…" : "Save design settings"}
          </Button>
        )}
        <span className="text-paper-700" aria-live="polite">
          {saved === null
            ? canEdit
              ? "Nothing saved for this beam yet: save to keep these choices and print them in the PDF report."
              : "No design settings have been saved for this beam yet; shown here are the defaults."
            : dirty
              ? "Unsaved changes: the saved settings differ from what is shown."
              : "Saved with the beam."}
        </span>
      </div>
      {!draft.ok && canEdit && <p className="text-danger-700">{draft.message}</p>}
      {error !== null && error !== undefined && (
        <Alert tone="error" title="The design settings were not saved">
          {error instanceof Error ? error.message : String(error)}
          {field ? ` (field: ${field})` : ""}
        </Alert>
      )}
      {saved !== null &&
        (dirty ? (
          <p className="text-paper-600">Save the settings to print these checks in the PDF report.</p>
        ) : (
          <a className="text-ink-700 underline underline-offset-2" href={reportHref} download>
            PDF report with these checks
          </a>
        ))}
    </div>
  );
}

/** The bar wired to the beam: saves through the API, links the report of revision `ids.version`. */
export function BeamDesignSettingsBar({ ids, draft, saved, canEdit }: {
  readonly ids: { readonly projectId: string; readonly beamId: string; readonly version: number };
  readonly draft: SettingsDraft;
  readonly saved: BeamDesignSettings | null;
  readonly canEdit: boolean;
}) {
  const save = useSaveDesignSettings(ids.projectId, ids.beamId);
  return (
    <DesignSettingsBar
      draft={draft}
      saved={saved}
      canEdit={canEdit}
      saving={save.isPending}
      error={save.error}
      onSave={(settings) => save.mutate(settings)}
      reportHref={reportPdfUrl(ids.projectId, ids.beamId, ids.version)}
    />
  );
}
