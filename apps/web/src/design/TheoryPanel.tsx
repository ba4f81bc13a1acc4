import { shearShare, spanDepthHint, type ShearShareCase } from "@spanwright/solver/design";
import type { Theory } from "../editor/model/BeamDocument";
import type { UnitSystemId } from "../editor/units/unitSystems";
import { designSpans, type DesignModel } from "./designModel";
import { formatDesign } from "./designUnits";

export interface TheoryPanelProps {
  readonly model: DesignModel;
  readonly theory: Theory;
  /** Without it the choice is shown read-only (e.g. for a saved revision). */
  readonly onTheoryChange?: (theory: Theory) => void;
  /** Section depth, m, for the span-to-depth hint (the exchange format does not carry it). */
  readonly depth?: number;
  /** Used where a segment has no G / shear area of its own (Euler-Bernoulli models), SI. */
  readonly fallback?: { readonly G?: number; readonly shearArea?: number | null };
  readonly units: UnitSystemId;
}

const THEORY_LABELS: Record<Theory, string> = {
  "euler-bernoulli": "Euler-Bernoulli (bending only)",
  timoshenko: "Timoshenko (bending + shear deformation)",
};

/**
 * Theory choice and, per span, the share of the deflection due to shear by the closed forms of
 * `shearShare`: a uniform load on a simple span, or on a cantilever for an overhang. Continuity
 * changes the share somewhat; it is an indication, not a result.
 */
export function TheoryPanel({ model, theory, onTheoryChange, depth, fallback, units }: TheoryPanelProps) {
  const spans = designSpans(model);
  return (
    <div className="space-y-3">
      <fieldset>
        <legend className="mb-1 text-sm font-medium text-ink-800">Beam theory</legend>
        <div className="flex flex-wrap gap-4">
          {(Object.keys(THEORY_LABELS) as Theory[]).map((t) => (
            <label key={t} className="flex items-center gap-1.5 text-sm">
              <input type="radio" name="beam-theory" value={t} checked={theory === t} disabled={!onTheoryChange} onChange={() => onTheoryChange?.(t)} />
              {THEORY_LABELS[t]}
            </label>
          ))}
        </div>
      </fieldset>
      <table className="w-full text-sm" aria-label="Shear deformation per span">
        <thead>
          <tr className="border-b border-paper-300 text-left text-xs uppercase tracking-wide text-paper-600">
            <th className="py-1 pr-3">Span</th>
            <th className="py-1 pr-3">Length</th>
            <th className="py-1 pr-3 text-right">Shear share of deflection</th>
            <th className="py-1">Span-to-depth</th>
          </tr>
        </thead>
        <tbody>
          {spans.map((span) => {
            const seg = model.segments[span.segment];
            const L = span.x2 - span.x1;
            const G = seg?.G ?? fallback?.G;
            const shearArea = seg?.A !== undefined && seg.shearFactor !== undefined ? seg.A * seg.shearFactor : fallback?.shearArea ?? undefined;
            const shareCase: ShearShareCase = span.kind === "cantilever" ? "cantilever-udl" : "simple-udl";
            const share = seg && G !== undefined && shearArea !== undefined && depth !== undefined
              ? shearShare({ case: shareCase, L, depth, E: seg.E, I: seg.I, G, shearArea })
              : null;
            const hint = depth !== undefined ? spanDepthHint(L, depth) : null;
            return (
              <tr key={span.label} className="border-b border-paper-200 align-top">
                <td className="py-1 pr-3">{span.label}</td>
                <td className="py-1 pr-3 font-mono">{formatDesign(L, units, "length")}</td>
                <td className="py-1 pr-3 text-right font-mono" data-share={share?.share}>
                  {share ? `${(share.share * 100).toFixed(1)} %` : <span className="text-xs text-paper-600">needs G, shear area and depth</span>}
                </td>
                <td className={`py-1 text-xs ${hint?.shearMatters ? "font-medium text-caution-700" : "text-paper-600"}`}>{hint ? hint.message : "depth not known"}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <p className="text-xs text-paper-600">
        Share from closed forms for a uniform load on a simple span (cantilever for overhangs), Timoshenko &amp; Gere and Roark 8th ed. §8.10; continuity changes it somewhat.
        {theory === "euler-bernoulli" ? " This beam is analysed without shear deformation." : ""}
      </p>
    </div>
  );
}
