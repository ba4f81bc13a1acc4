import { useState } from "react";
import { useBeam } from "../api/beams";
import { reportPdfWithChecksUrl, useSections } from "../api/sections";
import { SelectField } from "../components/SelectField";
import { TextField } from "../components/TextField";
import { formatQuantity } from "../editor/units/formatQuantity";
import { parseQuantity } from "../editor/units/parseQuantity";
import { displayUnitLabel, type UnitSystemId } from "../editor/units/unitSystems";

type Method = "LRFD" | "ASD";

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

/**
 * The PDF report of one revision with the member checks of a project section, method and Lb of the
 * user's choice; what the link leaves out (an empty Lb, Cb, cases, limits) the report takes from
 * the beam's saved design settings.
 */
export function ChecksReportLink({ projectId, beamId, version, units }: { projectId: string; beamId: string; version: number; units: UnitSystemId }) {
  const sections = useSections(projectId);
  const beam = useBeam(projectId, beamId);
  const [sectionId, setSectionId] = useState("");
  const [method, setMethod] = useState<Method>("LRFD");
  const [lbText, setLbText] = useState("");
  // Wait for the beam too: until its settings are known, an empty Lb's meaning is not.
  if (!sections.isSuccess || beam.isPending) return null;
  const list = sections.data;
  const chosen = list.find((s) => s.id === sectionId) ?? list[0];
  const lb = parseUnbracedLength(lbText, units);
  const empty = emptyLbMeaning(beam.isSuccess ? (beam.data.designSettings?.lb ?? null) : undefined, units);

  return (
    <details className="w-full max-w-sm text-sm">
      <summary className="cursor-pointer text-ink-700">Report with member checks</summary>
      {chosen === undefined ? (
        <p className="mt-2 text-paper-700">The project has no sections yet: add one in a beam's design tab to print member checks.</p>
      ) : (
        <div className="mt-2 space-y-2">
          <SelectField label="Project section" name="reportSection" value={chosen.id} options={list.map((s) => ({ value: s.id, label: s.name }))} onChange={(e) => setSectionId(e.target.value)} />
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
          {lb.ok && (
            <a className="text-ink-700 underline underline-offset-2" href={reportPdfWithChecksUrl(projectId, beamId, version, chosen.id, { method, lb: lb.lb })} download>
              PDF report with member checks
            </a>
          )}
        </div>
      )}
    </details>
  );
}
