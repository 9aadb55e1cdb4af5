import type { Stud } from "./schema";
import { distance } from "./vec";

/** One kit stud against the case stud nearest to it. */
export interface StudPairing {
  readonly kitStud: string;
  readonly caseStud: string;
  readonly offsetMm: number;
  readonly ok: boolean;
}

/** The stud pattern match of a kit on a case. */
export interface StudMatch {
  readonly ok: boolean;
  readonly worstOffsetMm: number;
  readonly studs: StudPairing[];
  /** Case studs claimed by more than one kit stud (a different pattern, not a small offset). */
  readonly sharedCaseStuds: string[];
}

/** Each kit stud against its nearest case stud (the first listed on a tie): offset = |p_kit − p_case|, ok when ≤ tolerance and no case stud serves two kit studs. */
export function matchStudPattern(kitStuds: readonly Stud[], caseStuds: readonly Stud[], studToleranceMm: number, toleranceMm: number): StudMatch {
  const claims = new Map<string, number>();
  const studs = kitStuds.map((k) => {
    let best = caseStuds[0];
    let bestD = Infinity;
    for (const c of caseStuds) {
      const d = distance(k.positionMm, c.positionMm);
      if (d < bestD) {
        bestD = d;
        best = c;
      }
    }
    claims.set(best.label, (claims.get(best.label) ?? 0) + 1);
    return { kitStud: k.label, caseStud: best.label, offsetMm: bestD, ok: bestD <= studToleranceMm + toleranceMm };
  });
  const sharedCaseStuds = [...claims].filter(([, n]) => n > 1).map(([l]) => l).sort();
  const worstOffsetMm = Math.max(...studs.map((s) => s.offsetMm));
  return { ok: sharedCaseStuds.length === 0 && studs.every((s) => s.ok), worstOffsetMm, studs, sharedCaseStuds };
}
