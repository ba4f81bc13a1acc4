/**
 * Lateral-torsional buckling modification factor, AISC 360-22 §F1, eq. F1-1:
 *   Cb = 12.5·Mmax / (2.5·Mmax + 3·MA + 4·MB + 3·MC)
 * with absolute moments over the unbraced segment: Mmax the largest, MA, MB, MC at its quarter,
 * centre and three-quarter points.
 */
export interface CbResult {
  readonly Cb: number;
  readonly Mmax: number;
  readonly MA: number;
  readonly MB: number;
  readonly MC: number;
}

function cbOf(Mmax: number, MA: number, MB: number, MC: number): CbResult {
  const denominator = 2.5 * Mmax + 3 * MA + 4 * MB + 3 * MC;
  // A segment with no moment at all does not buckle; 1.0 is the conservative, permitted value (§F1).
  const Cb = denominator > 0 ? (12.5 * Mmax) / denominator : 1;
  return { Cb, Mmax, MA, MB, MC };
}

/**
 * Cb from a moment function M(x) over the unbraced segment [xa, xb]. Mmax is searched on a grid of
 * `divisions` intervals (default 400) plus the quarter points; pass the exact peak of the moment
 * diagram as `exactMmax` when known (e.g. from the engine's extremes), it then wins if larger.
 */
export function cbFromFunction(M: (x: number) => number, xa: number, xb: number, options: { divisions?: number; exactMmax?: number } = {}): CbResult {
  const n = options.divisions ?? 400;
  const at = (f: number) => Math.abs(M(xa + f * (xb - xa)));
  let Mmax = Math.abs(options.exactMmax ?? 0);
  for (let i = 0; i <= n; i++) Mmax = Math.max(Mmax, at(i / n));
  const MA = at(0.25), MB = at(0.5), MC = at(0.75);
  return cbOf(Math.max(Mmax, MA, MB, MC), MA, MB, MC);
}

export interface MomentSample {
  readonly x: number;
  readonly M: number;
}

/** Linear interpolation between samples; samples must bracket x. */
function interpolate(samples: readonly MomentSample[], x: number): number {
  for (let i = 1; i < samples.length; i++) {
    const a = samples[i - 1]!, b = samples[i]!;
    if (x >= a.x && x <= b.x) return b.x === a.x ? b.M : a.M + ((b.M - a.M) * (x - a.x)) / (b.x - a.x);
  }
  return samples[samples.length - 1]?.M ?? 0;
}

/**
 * Cb from sampled moments (e.g. the exchange format's `stations`, which report M at each x).
 * Quarter-point moments are interpolated linearly; Mmax is the largest sample inside the segment,
 * so include stations at the quarter points and at the peak for an exact value.
 */
export function cbFromSamples(samples: readonly MomentSample[], xa: number, xb: number): CbResult {
  const sorted = [...samples].sort((a, b) => a.x - b.x);
  const at = (f: number) => Math.abs(interpolate(sorted, xa + f * (xb - xa)));
  let Mmax = Math.max(at(0), at(1));
  for (const s of sorted) if (s.x >= xa && s.x <= xb) Mmax = Math.max(Mmax, Math.abs(s.M));
  const MA = at(0.25), MB = at(0.5), MC = at(0.75);
  return cbOf(Math.max(Mmax, MA, MB, MC), MA, MB, MC);
}
