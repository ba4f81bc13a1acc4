import { useState } from "react";
import type { BeamDesignSettings, ProjectSection } from "@spanwright/contracts";
import { useBeam } from "../api/beams";
import { useSections } from "../api/sections";
import { SelectField } from "../components/SelectField";
import { TextField } from "../components/TextField";
import { formatQuantity } from "../editor/units/formatQuantity";
import { parseQuantity } from "../editor/units/parseQuantity";
import { displayUnitLabel, type UnitSystemId } from "../editor/units/unitSystems";
import { checksReportUrl, reportDefaults, reportQuery, SAVED_TYPED_SECTION, type ReportCb, type ReportDefaults, type ReportMethod } from "./checksReportQuery";

/**
 * Unbraced length typed in the project's units ("3.5", "12 ft", "3500 mm") to metres; empty (null)
 * leaves Lb out of the link, so the report uses the beam's saved Lb, or braces at the supports
 * only when none is saved. The API refuses Lb ≤ 0, so the link is withheld for it.
 */
export function parseUnbracedLength(text: string, units: UnitSystemId): { ok: true; lb: number | null } | { ok: false; message: string } {
  if (text.trim() === "") return { ok: true, lb: null };
  const parsed = parseQuantity(text, "length", units);
  if (!parsed.ok) return { ok: false, message: parsed.error.message };
  if (!(parsed.value > 0)) return { ok: false, message: "Lb must be greater than zero." };
  return { ok: true, lb: parsed.value };
}

/**
 * What an empty Lb field stands for: the report reads Lb from the beam's saved design settings when
 * the link leaves it out, and braces at the supports only when none is saved.
 */
function emptyLbMeaning(savedLb: number | null | undefined, units: UnitSystemId): { placeholder: string; hint: string } {
  // The beam could not be read: say what the report does without claiming a value.
  if (savedLb === undefined) return { placeholder: "saved Lb, if any", hint: "Braces every Lb from the start of each span; empty: the beam's saved Lb, or at the supports only" };
  if (savedLb === null) return { placeholder: "braced at supports only", hint: "Braces every Lb from the start of each span; empty: at the supports only" };
  const saved = formatQuantity(savedLb, units, "length");
  return {
    placeholder: `saved: ${saved}`,
    hint: `Braces every Lb from the start of each span; empty: the beam's saved Lb of ${saved} (clear it in the design settings to brace at the supports only)`,
  };
}

/** As the design page words them; kept here so the revision page loads none of the checks' code. */
const CB_OPTIONS = [
  { value: "equation-f1-1", label: "From the moment diagram (eq. F1-1)" },
  { value: "unity", label: "1.0 (conservative, §F1)" },
];

function nameOf(material: unknown): string {
  const name = (material as { name?: unknown } | null)?.name;
  return typeof name === "string" ? name : "";
}

/**
 * The PDF report of one revision with member checks. It starts from the beam's saved design
 * settings (section with its saved material, method, Lb, Cb), and its link names only what the
 * user changed, so the report prints the saved settings for the rest (the cases, deflection limits
 * and allowables always). With nothing saved it starts from the first project section.
 */
export function ChecksReportLink({ projectId, beamId, version, units }: { projectId: string; beamId: string; version: number; units: UnitSystemId }) {
  const sections = useSections(projectId);
  const beam = useBeam(projectId, beamId);
  // Wait for the beam too: until its settings are known, what the link may leave out is not.
  if (!sections.isSuccess || beam.isPending) return null;
  // undefined: the beam could not be read, so its settings are unknown.
  const saved = beam.isSuccess ? (beam.data.designSettings ?? null) : undefined;
  return <ReportChoicesForm projectId={projectId} beamId={beamId} version={version} units={units} sections={sections.data} saved={saved} />;
}

interface ReportChoicesFormProps {
  readonly projectId: string;
  readonly beamId: string;
  readonly version: number;
  readonly units: UnitSystemId;
  readonly sections: readonly ProjectSection[];
  readonly saved: BeamDesignSettings | null | undefined;
}

function ReportChoicesForm({ projectId, beamId, version, units, sections, saved }: ReportChoicesFormProps) {
  const defaults: ReportDefaults | null = saved === undefined ? null : reportDefaults(saved, sections);
  const [section, setSection] = useState(() => defaults?.section ?? sections[0]?.id ?? "");
  const [method, setMethod] = useState<ReportMethod>(defaults?.method ?? "LRFD");
  const [cb, setCb] = useState<ReportCb>(defaults?.cb ?? "equation-f1-1");
  const [lbText, setLbText] = useState("");
  const lb = parseUnbracedLength(lbText, units);
  const empty = emptyLbMeaning(saved === undefined ? undefined : (saved?.lb ?? null), units);
  const savedChoice = saved?.section ?? null;
  const savedDeleted = savedChoice?.source === "project" && defaults?.section === null;
  const options = [
    ...(savedChoice?.source === "typed" ? [{ value: SAVED_TYPED_SECTION, label: `${savedChoice.name} (saved, typed for this beam)` }] : []),
    ...sections.map((s) => ({ value: s.id, label: s.id === defaults?.section ? `${s.name} (saved)` : s.name })),
  ];
  const deletedNote = savedDeleted ? "The project section saved with this beam has been deleted. " : "";

  return (
    <details className="w-full max-w-sm text-sm">
      <summary className="cursor-pointer text-ink-700">Report with member checks</summary>
      {options.length === 0 ? (
        <p className="mt-2 text-paper-700">{deletedNote}The project has no sections yet: add one in a beam's design tab to print member checks.</p>
      ) : (
        <div className="mt-2 space-y-2">
          <SelectField label="Section" name="reportSection" value={section} options={options} onChange={(e) => setSection(e.target.value)} />
          <p className="text-xs text-paper-600">
            {deletedNote}
            {materialNote(section, defaults, saved, sections)}
          </p>
          <SelectField
            label="Method"
            name="reportMethod"
            value={method}
            options={[{ value: "LRFD", label: "LRFD" }, { value: "ASD", label: "ASD" }]}
            onChange={(e) => setMethod(e.target.value === "ASD" ? "ASD" : "LRFD")}
          />
          <TextField
            label={`Unbraced length Lb (${displayUnitLabel(units, "length")})`}
            name="reportLb"
            inputMode="decimal"
            value={lbText}
            placeholder={empty.placeholder}
            hint={empty.hint}
            error={lb.ok ? undefined : lb.message}
            onChange={(e) => setLbText(e.target.value)}
          />
          <SelectField label="Cb" name="reportCb" value={cb} options={CB_OPTIONS} onChange={(e) => setCb(e.target.value === "unity" ? "unity" : "equation-f1-1")} />
          {lb.ok && (
            <a
              className="text-ink-700 underline underline-offset-2"
              href={checksReportUrl(projectId, beamId, version, reportQuery({ section, method, lb: lb.lb, cb }, defaults))}
              download
            >
              PDF report with member checks
            </a>
          )}
          {saved && <p className="text-xs text-paper-600">The report takes what is not changed here, and the cases, deflection limits and allowables, from the beam's saved design settings.</p>}
        </div>
      )}
    </details>
  );
}

/**
 * The material the report checks the chosen section in: the saved one while the saved section is
 * chosen; a section chosen here is checked in its own material (the report's query cannot name one).
 */
function materialNote(section: string, defaults: ReportDefaults | null, saved: BeamDesignSettings | null | undefined, sections: readonly ProjectSection[]): string {
  const savedMaterial = nameOf(saved?.material ?? null);
  const own = nameOf(sections.find((s) => s.id === section)?.material ?? null);
  if (defaults !== null && section === defaults.section) {
    return savedMaterial ? `Material: ${savedMaterial}, saved with the beam.` : `Material: the section's own, ${own}.`;
  }
  return `Material: the section's own, ${own}${savedMaterial ? ` (the saved ${savedMaterial} goes with the saved section only)` : ""}.`;
}
