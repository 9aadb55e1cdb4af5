import { ThreadDesignationError } from "./errors";

/**
 * ISO 262 selected sizes and their coarse pitch, mm: the pitch a designation without one ("M8") means. M7 (1.0)
 * and M8 (1.25) are checked in tests against ISO 262; the other rows are from memory.
 */
export const ISO_262_PITCHES_MM: Readonly<Record<number, { coarse: number }>> = {
  3: { coarse: 0.5 },
  4: { coarse: 0.7 },
  5: { coarse: 0.8 },
  6: { coarse: 1 },
  7: { coarse: 1 },
  8: { coarse: 1.25 },
  10: { coarse: 1.5 },
  12: { coarse: 1.75 },
  14: { coarse: 2 },
  16: { coarse: 2 },
};

/** A parsed ISO metric thread. */
export interface MetricThread {
  readonly nominalDiameterMm: number;
  readonly pitchMm: number;
  /** True when the pitch came from the ISO 262 coarse column because the designation gave none. */
  readonly pitchImplied: boolean;
  /** Canonical designation, e.g. "M8x1.25". */
  readonly designation: string;
}

/** Parses "M8" or "M8x1.25"; a missing pitch is the ISO 262 coarse pitch for that diameter. */
export function parseMetricThread(designation: string): MetricThread {
  const m = /^M(\d+(?:\.\d+)?)(?:\s*[x×]\s*(\d+(?:\.\d+)?))?$/i.exec(designation.trim());
  if (!m) throw new ThreadDesignationError(designation);
  const d = Number(m[1]);
  let pitch: number;
  let pitchImplied = false;
  if (m[2] !== undefined) {
    pitch = Number(m[2]);
  } else {
    const row = ISO_262_PITCHES_MM[d];
    if (!row) throw new ThreadDesignationError(`${designation} (no ISO 262 coarse pitch known for M${d}; give the pitch, e.g. M${d}x1)`);
    pitch = row.coarse;
    pitchImplied = true;
  }
  if (!(pitch > 0)) throw new ThreadDesignationError(designation);
  return { nominalDiameterMm: d, pitchMm: pitch, pitchImplied, designation: `M${d}x${pitch}` };
}

/** Basic minor diameter of an ISO metric internal thread: D1 = D − 1.082532·P (ISO 724 basic profile). */
export function minorDiameterMm(thread: Pick<MetricThread, "nominalDiameterMm" | "pitchMm">): number {
  return thread.nominalDiameterMm - 1.082532 * thread.pitchMm;
}

/** Result of comparing two threads. */
export interface ThreadMatch {
  readonly a: string;
  readonly b: string;
  readonly ok: boolean;
}

/** Two threads mate when nominal diameter and pitch are equal (within tolerance). */
export function threadsMatch(a: string, b: string, toleranceMm: number): ThreadMatch {
  const ta = parseMetricThread(a);
  const tb = parseMetricThread(b);
  const ok = Math.abs(ta.nominalDiameterMm - tb.nominalDiameterMm) <= toleranceMm && Math.abs(ta.pitchMm - tb.pitchMm) <= toleranceMm;
  return { a: ta.designation, b: tb.designation, ok };
}
