import { sectionProfile, shapeDepth, type ProfilePoint, type SectionShape } from "@spanwright/solver/design";
import type { Theory } from "../editor/model/BeamDocument";
import type { UnitSystemId } from "../editor/units/unitSystems";
import { formatDesign, type DesignQuantity } from "./designUnits";
import { sectionOutlinePath, shapeWidth } from "./sectionOutline";

export interface SectionViewProps {
  readonly shape: SectionShape;
  /** Pa. */ readonly E: number;
  /** Pa; used for the Timoshenko shear strain. */ readonly G?: number;
  /** Bending moment at x, N·m, sagging positive (exchange format). */ readonly M: number;
  /** Shear force at x, N. */ readonly V: number;
  /** Rotation of the section at x, rad, counter-clockwise positive; draws the displaced section. */
  readonly rz?: number;
  readonly theory: Theory;
  readonly units: UnitSystemId;
  /** Where along the beam, m, for the caption. */ readonly x?: number;
}

const DEPTH_PX = 200;
const TOP = 28;
const PANEL = 130;
const DIAGRAM = 50; // px for the largest value of a distribution
const EXAGGERATED_ANGLE = (20 * Math.PI) / 180;

function Distribution({ points, value, left, scale, label, fill }: { points: readonly ProfilePoint[]; value: (p: ProfilePoint) => number; left: number; scale: number; label: string; fill: string }) {
  const peak = Math.max(...points.map((p) => Math.abs(value(p))), 0);
  const k = peak > 0 ? DIAGRAM / peak : 0;
  const axis = left + PANEL / 2;
  const y = (p: ProfilePoint) => TOP + p.s * scale;
  const first = points[0];
  const last = points[points.length - 1];
  const path = first && last ? `M${axis},${y(first)} ${points.map((p) => `L${axis + value(p) * k},${y(p)}`).join(" ")} L${axis},${y(last)}Z` : "";
  return (
    <g>
      <text x={axis} y={TOP - 10} textAnchor="middle" className="fill-ink-800 text-[11px] font-medium">
        {label}
      </text>
      <path d={path} className={fill} fillOpacity={0.35} stroke="currentColor" strokeWidth={1} />
      <line x1={axis} y1={TOP} x2={axis} y2={TOP + DEPTH_PX} className="stroke-paper-500" />
    </g>
  );
}

function DisplacedSection({ rz, slope, left }: { rz: number; slope: number; left: number }) {
  const peak = Math.max(Math.abs(rz), Math.abs(slope));
  const amp = peak > 0 ? EXAGGERATED_ANGLE / peak : 1;
  const cx = left + PANEL / 2;
  const cy = TOP + DEPTH_PX / 2;
  const h = DEPTH_PX * 0.8;
  // SVG y points down, so a counter-clockwise rotation θ moves the top of the section left.
  const theta = rz * amp;
  const phi = Math.atan(slope * amp);
  const half = PANEL / 2 - 8;
  return (
    <g aria-label="Displaced section, exaggerated">
      <text x={cx} y={TOP - 10} textAnchor="middle" className="fill-ink-800 text-[11px] font-medium">
        Rotated section
      </text>
      <line x1={cx - half} y1={cy} x2={cx + half} y2={cy} className="stroke-paper-400" strokeDasharray="3 3" />
      <line x1={cx} y1={cy - h / 2} x2={cx} y2={cy + h / 2} className="stroke-paper-400" strokeDasharray="3 3" />
      <line x1={cx - half * Math.cos(phi)} y1={cy + half * Math.sin(phi)} x2={cx + half * Math.cos(phi)} y2={cy - half * Math.sin(phi)} className="stroke-ink-500" strokeWidth={1.5} />
      <line x1={cx + (h / 2) * Math.sin(theta)} y1={cy + (h / 2) * Math.cos(theta)} x2={cx - (h / 2) * Math.sin(theta)} y2={cy - (h / 2) * Math.cos(theta)} className="stroke-ochre-500" strokeWidth={3} />
      <text x={cx} y={TOP + DEPTH_PX + 16} textAnchor="middle" className="fill-paper-600 text-[10px]">
        {peak > 0 ? `angles ×${amp.toPrecision(3)}` : "no rotation"}
      </text>
    </g>
  );
}

/**
 * The cross-section at one x, to scale, with its strain ε = −y·κ (κ = M/EI, plane sections remain
 * plane), bending stress σ = E·ε, shear stress τ = V·Q/(I·b) through the depth, and the section
 * rotated by rz (exaggerated); for Timoshenko beams the section leaves the normal to the axis by γ.
 */
export function SectionView({ shape, E, G, M, V, rz, theory, units, x }: SectionViewProps) {
  const timoshenko = theory === "timoshenko";
  const profile = sectionProfile(shape, M, V, E, timoshenko ? G : undefined);
  if (!profile.ok) return <p className="text-sm text-danger-700">Section: {profile.error.message}</p>;
  const p = profile.value;
  const depth = shapeDepth(shape);
  const scale = Math.min(DEPTH_PX / depth, (PANEL - 10) / shapeWidth(shape));
  const drawnDepth = depth * scale;
  const profileScale = DEPTH_PX / depth;
  const gamma = p.shearStrain ?? 0;
  // Exchange-format sign: γ = d(uy)/dx − rz, so the axis slope is rz + γ.
  const slope = (rz ?? 0) + gamma;
  const fmt = (v: number, q: DesignQuantity) => formatDesign(v, units, q);
  const hasShear = p.points.some((q) => q.shearStress !== null);
  const panels = 3 + (hasShear ? 1 : 0) + (rz !== undefined ? 1 : 0);

  return (
    <figure className="space-y-3">
      <svg viewBox={`0 0 ${panels * PANEL} ${TOP + DEPTH_PX + 24}`} className="w-full max-w-4xl text-ink-700" role="img" aria-label={`Section at x ${x !== undefined ? fmt(x, "length") : ""}`}>
        <g transform={`translate(${PANEL / 2},${TOP + (DEPTH_PX - drawnDepth) / 2})`}>
          {shape.kind === "custom" ? (
            <rect x={(-depth / 4) * scale} y={0} width={(depth / 2) * scale} height={drawnDepth} className="fill-none stroke-ink-500" strokeDasharray="4 3" />
          ) : (
            <path d={sectionOutlinePath(shape, scale)} fillRule="evenodd" className="fill-ink-200 stroke-ink-600" strokeWidth={1} />
          )}
          <line x1={-PANEL / 2 + 4} x2={PANEL / 2 - 4} y1={p.properties.yTop * scale} y2={p.properties.yTop * scale} className="stroke-ochre-500" strokeDasharray="5 3" />
        </g>
        <text x={PANEL / 2} y={TOP - 10} textAnchor="middle" className="fill-ink-800 text-[11px] font-medium">
          Section (to scale)
        </text>
        <Distribution points={p.points} value={(q) => q.strain} left={PANEL} scale={profileScale} label="Strain ε" fill="fill-ink-400" />
        <Distribution points={p.points} value={(q) => q.stress} left={2 * PANEL} scale={profileScale} label="Stress σ" fill="fill-ochre-300" />
        {hasShear && <Distribution points={p.points} value={(q) => q.shearStress ?? 0} left={3 * PANEL} scale={profileScale} label="Shear τ" fill="fill-ink-300" />}
        {rz !== undefined && <DisplacedSection rz={rz} slope={slope} left={(panels - 1) * PANEL} />}
      </svg>
      <dl className="grid grid-cols-2 gap-x-6 gap-y-1 text-sm md:grid-cols-4">
        <dt className="text-paper-600">M</dt>
        <dd className="font-mono">{fmt(M, "moment")}</dd>
        <dt className="text-paper-600">V</dt>
        <dd className="font-mono">{fmt(V, "force")}</dd>
        <dt className="text-paper-600">κ = M/EI</dt>
        <dd className="font-mono">{p.curvature.toExponential(3)} 1/m</dd>
        <dt className="text-paper-600">σ top (tension +)</dt>
        <dd className="font-mono" data-testid="stress-top" data-value={p.top.stress}>{fmt(p.top.stress, "stress")}</dd>
        <dt className="text-paper-600">σ bottom</dt>
        <dd className="font-mono" data-testid="stress-bottom" data-value={p.bottom.stress}>{fmt(p.bottom.stress, "stress")}</dd>
        <dt className="text-paper-600">ε top / bottom</dt>
        <dd className="font-mono">{fmt(p.top.strain, "strain")} / {fmt(p.bottom.strain, "strain")}</dd>
        <dt className="text-paper-600">τ at neutral axis</dt>
        <dd className="font-mono" data-testid="shear-na">{p.shearStressAtNeutralAxis === null ? "not known" : fmt(p.shearStressAtNeutralAxis, "stress")}</dd>
        {timoshenko && (
          <>
            <dt className="text-paper-600">Shear strain γ = −V/(κGA)</dt>
            <dd className="font-mono" data-testid="shear-strain">{p.shearStrain === null ? "needs G and shear area" : fmt(p.shearStrain, "strain")}</dd>
          </>
        )}
      </dl>
      <figcaption className="text-xs text-paper-600">
        Plane sections remain plane: ε = −y·κ with y up from the neutral axis (dashed) and κ = M/(E·I); σ = E·ε, tension positive. The rotated section is drawn with exaggerated angles
        {timoshenko ? "; for Timoshenko beams it departs from the normal to the deflected axis by the shear strain γ." : "; for Euler-Bernoulli beams it stays normal to the deflected axis."}
      </figcaption>
    </figure>
  );
}
