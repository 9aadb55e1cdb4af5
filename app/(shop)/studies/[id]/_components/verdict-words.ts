import { formatLength, type LengthUnits, type Verdict } from "@/geometry";

/** A length for the results: 2 decimals in mm, 3 in inches. */
export const len = (mm: number | null | undefined, units: LengthUnits) =>
  mm === null || mm === undefined || !Number.isFinite(mm) ? "—" : formatLength(mm, units, { digits: units === "mm" ? 2 : 3 });

/** A clearance with its sign spelled out: "+0.52 mm" clears, "−0.31 mm" interferes. */
export const signedLen = (mm: number | null | undefined, units: LengthUnits) =>
  mm === null || mm === undefined || !Number.isFinite(mm) ? "—" : `${mm >= 0 ? "+" : "−"}${len(Math.abs(mm), units)}`;

export const VERDICT: Record<Verdict, { words: string; tone: "clear" | "tight" | "interfere"; short: string }> = {
  "fits-as-is": { words: "Fits as it is", tone: "clear", short: "clear" },
  "fits-after-cut": { words: "Fits after the cut", tone: "tight", short: "needs a cut" },
  "cannot-fit": { words: "Cannot fit safely", tone: "interfere", short: "cannot fit" },
};

export const TONE_CLASS = {
  clear: "border-clear bg-clear-soft text-ink",
  tight: "border-tight bg-tight-soft text-ink",
  interfere: "border-interfere bg-interfere-soft text-ink",
} as const;

export const TONE_TEXT = { clear: "text-clear", tight: "text-tight", interfere: "text-interfere" } as const;
