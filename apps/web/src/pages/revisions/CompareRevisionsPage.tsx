import { useSearchParams } from "react-router";
import type { CompareResponse, RevisionSummary } from "@spanwright/contracts";
import { isApiError } from "../../api/client";
import { useBeam } from "../../api/beams";
import { useProject } from "../../api/projects";
import { useCompareRevisions, useRevisions } from "../../api/revisions";
import { Caution } from "../../components/Caution";
import { Card } from "../../components/PageHeader";
import { Loading, QueryError } from "../../components/QueryState";
import { CompareTable } from "../../revisions/CompareTable";
import { ReactionTable } from "../../revisions/ReactionTable";
import { NotFoundPage } from "../NotFoundPage";
import { BeamPageHeader } from "./BeamPageHeader";
import { useBeamParams } from "./useBeamParams";

function parseVersion(text: string | null): number | null {
  const n = Number(text);
  return text !== null && Number.isInteger(n) && n > 0 ? n : null;
}

/** Two revisions of a beam: reactions side by side with the change, and what changed in the model. */
export function CompareRevisionsPage() {
  const { projectId, beamId } = useBeamParams();
  const [params, setParams] = useSearchParams();
  const project = useProject(projectId);
  const beam = useBeam(projectId, beamId);
  const revisions = useRevisions(projectId, beamId);
  const latest = beam.data?.beam.latestVersion ?? 1;
  const to = parseVersion(params.get("to")) ?? latest;
  const from = parseVersion(params.get("from")) ?? Math.max(1, to - 1);
  const compare = useCompareRevisions(projectId, beamId, from, to);

  if (project.isPending || beam.isPending) return <Loading label="Loading beam…" />;
  const failed = project.error ?? beam.error;
  if (failed !== null) {
    if (isApiError(failed) && failed.status === 404) return <NotFoundPage />;
    return <QueryError error={failed} title="Could not load the beam" />;
  }
  const p = project.data!;
  const b = beam.data!.beam;
  const choose = (key: "from" | "to", value: string) => {
    const next = new URLSearchParams(params);
    next.set("from", String(from));
    next.set("to", String(to));
    next.set(key, value);
    setParams(next, { replace: true });
  };

  return (
    <>
      <BeamPageHeader project={p} beamId={beamId} beamName={b.name} title={`${b.name}: compare r${from} with r${to}`} />
      <div className="space-y-6">
        <div className="flex flex-wrap items-end gap-4 text-sm">
          <VersionSelect label="Older" value={from} revisions={revisions.data ?? []} onChange={(v) => choose("from", v)} />
          <VersionSelect label="Newer" value={to} revisions={revisions.data ?? []} onChange={(v) => choose("to", v)} />
          <span className="text-paper-600">{`Threshold: ${p.compareThresholdPercent} % (project setting)`}</span>
        </div>
        {compare.isPending && <Loading label="Comparing…" />}
        {compare.isError && <QueryError error={compare.error} title="Could not compare the revisions" onRetry={() => void compare.refetch()} />}
        {compare.isSuccess && <CompareResult data={compare.data} />}
        <Caution />
      </div>
    </>
  );
}

function VersionSelect({ label, value, revisions, onChange }: {
  label: string;
  value: number;
  revisions: readonly RevisionSummary[];
  onChange: (value: string) => void;
}) {
  const versions = revisions.length > 0 ? revisions.map((r) => r.version) : [value];
  return (
    <label className="flex flex-col gap-1">
      <span className="font-medium text-ink-800">{label}</span>
      <select value={value} onChange={(e) => onChange(e.target.value)} className="h-8 rounded-md border border-paper-300 bg-white px-2">
        {[...new Set([...versions, value])].sort((a, b) => b - a).map((v) => {
          const r = revisions.find((x) => x.version === v);
          return <option key={v} value={v}>{`r${v}${r !== undefined ? ` (${r.status})` : ""}`}</option>;
        })}
      </select>
    </label>
  );
}

const supportStatusText = {
  added: "added",
  removed: "removed",
  "type-changed": "changed type",
  kept: "kept",
} as const;

function CompareResult({ data }: { data: CompareResponse }) {
  const supportChanges = data.supports.filter((s) => s.status !== "kept");
  return (
    <>
      <Card title="What changed in the model">
        {data.modelDiff.summary.length === 0 ? (
          <p className="text-sm text-paper-600">The models are the same.</p>
        ) : (
          <ul className="list-disc space-y-0.5 pl-5 text-sm text-paper-800">
            {data.modelDiff.summary.map((line, i) => <li key={i}>{line}</li>)}
          </ul>
        )}
        {supportChanges.length > 0 && (
          <p className="mt-3 text-sm font-medium text-caution-700">
            {`Supports: ${supportChanges
              .map((s) => `${(s.after ?? s.before)?.label ?? "?"} at ${Number((s.x / data.units.length.toSI).toPrecision(6))} ${data.units.length.label} ${supportStatusText[s.status]}`)
              .join("; ")}.`}
          </p>
        )}
      </Card>
      <Card title="Reactions">
        <CompareTable values={data.values} units={data.units} thresholdPct={data.thresholdPercent} from={data.from} to={data.to} />
      </Card>
      <details className="rounded-lg border border-paper-300 bg-white px-5 py-3 shadow-card">
        <summary className="cursor-pointer text-base font-semibold text-ink-900">Both reaction tables side by side</summary>
        <div className="mt-4 grid gap-6 xl:grid-cols-2">
          <section aria-label={`Reactions of r${data.from}`} className="min-w-0">
            <h3 className="mb-2 text-sm font-semibold text-ink-900">{`r${data.from}`}</h3>
            <ReactionTable table={data.before} units={data.units} caption={`Support reactions of r${data.from}`} />
          </section>
          <section aria-label={`Reactions of r${data.to}`} className="min-w-0">
            <h3 className="mb-2 text-sm font-semibold text-ink-900">{`r${data.to}`}</h3>
            <ReactionTable table={data.after} units={data.units} caption={`Support reactions of r${data.to}`} />
          </section>
        </div>
      </details>
    </>
  );
}
