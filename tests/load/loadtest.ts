/**
 * Load test against a running production server (scripts/loadtest.sh starts one on loopback with a
 * fresh database and stops it afterwards). Two 10 s runs with autocannon: the stateless solve route
 * with a 20-span beam, and the save-revision route, each save on the latest version of one of many
 * beams (round-robin over idle beams, so no save conflicts). Prints requests/s, p50/p95/p99 latency
 * and errors against the targets of issue 7; exits 1 when a target is missed.
 */
import autocannon from "autocannon";
import fs from "node:fs";

const baseUrl = process.env.BASE_URL ?? "http://127.0.0.1:3000";
const duration = Number(process.env.LOAD_SECONDS ?? 10);
const connections = Number(process.env.LOAD_CONNECTIONS ?? 10);
const origin = baseUrl;

/** Invented: a 20-span floor beam, 6 m spans, steel E = 200 GPa, I = 2.5e-4 m⁴; dead and patterned live load, one factored combination. */
function beamModel(spans: number): Record<string, unknown> {
  const span = 6;
  return {
    format: "spanwright.beam/1",
    title: `load test ${spans}-span beam`,
    nodes: Array.from({ length: spans + 1 }, (_, i) => ({ x: i * span, support: { type: "pinned" } })),
    segments: Array.from({ length: spans }, () => ({ E: 2e11, I: 2.5e-4 })),
    loadCases: [
      { id: "G", category: "dead", loads: [{ type: "distributed", x1: 0, x2: spans * span, qy1: -12_000, qy2: -12_000 }] },
      { id: "Q", category: "live", pattern: true, loads: [{ type: "distributed", x1: 0, x2: spans * span, qy1: -8_000, qy2: -8_000 }] },
    ],
    combinations: [{ id: "ULS", factors: { G: 1.35, Q: 1.5 } }],
  };
}

async function call(method: string, path: string, body: unknown, cookie?: string): Promise<{ status: number; json: any; cookie?: string }> {
  const res = await fetch(`${baseUrl}${path}`, {
    method,
    headers: { "Content-Type": "application/json", Origin: origin, ...(cookie ? { Cookie: cookie } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const setCookie = res.headers.getSetCookie().find((c) => c.startsWith("spanwright_session="));
  return { status: res.status, json: await res.json().catch(() => null), cookie: setCookie?.split(";")[0] };
}

async function setUp() {
  const email = `load.${Date.now()}@example.test`;
  const up = await call("POST", "/api/auth/sign-up", { email, name: "Load Test", password: "load test passphrase" });
  if (up.status !== 201 || !up.cookie) throw new Error(`sign-up failed: ${up.status} ${JSON.stringify(up.json)}`);
  const cookie = up.cookie;
  const project = await call("POST", "/api/projects", { name: "Load test" }, cookie);
  if (project.status !== 201) throw new Error(`project: ${project.status} ${JSON.stringify(project.json)}`);
  const projectId: string = project.json.project.id;
  const beams: string[] = [];
  for (let i = 0; i < connections * 2; i++) {
    const beam = await call("POST", `/api/projects/${projectId}/beams`, { name: `Beam ${i}`, model: beamModel(5) }, cookie);
    if (beam.status !== 201) throw new Error(`beam: ${beam.status} ${JSON.stringify(beam.json)}`);
    beams.push(beam.json.beam.id);
  }
  return { cookie, projectId, beams };
}

/**
 * The server's CPU time (user + system, Linux /proc, clock ticks of 10 ms), when scripts/loadtest.sh
 * passes its pid: CPU per request does not depend on what else the shared machine is running, so
 * it tells the capacity of one core even when the wall-clock figures are squeezed.
 */
const serverPid = process.env.SERVER_PID;
function serverCpuMs(): number | null {
  if (!serverPid) return null;
  try {
    const fields = fs.readFileSync(`/proc/${serverPid}/stat`, "utf8").split(") ")[1]!.split(" ");
    return (Number(fields[11]) + Number(fields[12])) * 10;
  } catch {
    return null;
  }
}

interface Figures {
  name: string;
  /** Server CPU ms per request, or null when unknown. */
  cpuPerRequest: number | null;
  requestsPerSecond: number;
  p50: number;
  p95: number;
  p99: number;
  errors: number;
  total: number;
}

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
}

async function run(name: string, options: autocannon.Options, expectedStatus: number): Promise<Figures> {
  const latencies: number[] = [];
  let wrongStatus = 0;
  const cpuBefore = serverCpuMs();
  // without a callback autocannon returns its instance, which is also a promise of the result
  const instance = autocannon({ ...options, duration, connections, pipelining: 1 }) as unknown as autocannon.Instance & PromiseLike<autocannon.Result>;
  instance.on("response", (_client: unknown, statusCode: number, _bytes: number, responseTime: number) => {
    latencies.push(responseTime);
    if (statusCode !== expectedStatus) wrongStatus++;
  });
  const result = await instance;
  const cpuAfter = serverCpuMs();
  latencies.sort((a, b) => a - b);
  return {
    name,
    cpuPerRequest: cpuBefore !== null && cpuAfter !== null && latencies.length > 0 ? (cpuAfter - cpuBefore) / latencies.length : null,
    requestsPerSecond: latencies.length / duration,
    p50: percentile(latencies, 50),
    p95: percentile(latencies, 95),
    p99: percentile(latencies, 99),
    errors: wrongStatus + result.errors + result.timeouts,
    total: latencies.length,
  };
}

function report(f: Figures, target: { rps: number; p99: number }): boolean {
  const met = f.requestsPerSecond >= target.rps && f.p99 < target.p99 && f.errors === 0;
  console.log(
    `${f.name.padEnd(14)} ${f.requestsPerSecond.toFixed(0).padStart(6)} req/s  p50 ${f.p50.toFixed(1)} ms  p95 ${f.p95.toFixed(1)} ms  p99 ${f.p99.toFixed(1)} ms  errors ${f.errors}/${f.total}  ` +
      `(target >= ${target.rps} req/s, p99 < ${target.p99} ms, 0 errors: ${met ? "met" : "MISSED"})`,
  );
  if (f.cpuPerRequest !== null) {
    console.log(`${"".padEnd(14)} server CPU ${f.cpuPerRequest.toFixed(2)} ms/request: at most ${(1000 / f.cpuPerRequest).toFixed(0)} req/s on one core`);
  }
  return met;
}

const { cookie, projectId, beams } = await setUp();
const headers = { "Content-Type": "application/json", Origin: origin, Cookie: cookie };

const solveBody = JSON.stringify(beamModel(20));
const solve = await run("solve 20 spans", { url: `${baseUrl}/api/solve`, method: "POST", headers, body: solveBody }, 200);

// each connection takes an idle beam, saves on its latest version and hands it back
const versions = new Map(beams.map((id) => [id, 1]));
const idle = [...beams];
const saveModel = beamModel(5);
let sequence = 0;
const save = await run(
  "save revision",
  {
    url: baseUrl,
    headers,
    requests: [
      {
        method: "POST",
        setupRequest: (req: any, context: any) => {
          const beamId = idle.shift()!;
          context.beamId = beamId;
          const body = { baseVersion: versions.get(beamId), model: { ...saveModel, title: `save ${++sequence}` }, changeSummary: "load test" };
          return { ...req, path: `/api/projects/${projectId}/beams/${beamId}/revisions`, body: JSON.stringify(body) };
        },
        onResponse: (status: number, body: string, context: any) => {
          const beamId: string = context.beamId;
          if (status === 201) versions.set(beamId, JSON.parse(body).revision.version);
          else if (status === 409) versions.set(beamId, JSON.parse(body).error.details.current.version);
          idle.push(beamId);
        },
      },
    ],
  } as autocannon.Options,
  201,
);

const [load1] = fs.existsSync("/proc/loadavg") ? fs.readFileSync("/proc/loadavg", "utf8").split(" ") : ["?"];
console.log(`\nSpanwright load test at ${baseUrl}, ${connections} connections, ${duration} s each (machine load average ${load1})`);
const solveMet = report(solve, { rps: 500, p99: 50 });
const saveMet = report(save, { rps: 150, p99: 100 });
process.exit(solveMet && saveMet ? 0 : 1);
