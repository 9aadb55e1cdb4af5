import type { LengthUnits } from "@/geometry";
import { lengthText, parseLengthText } from "./number-text";

/** Whether a form path holds a length: it or one of its parents ends in "Mm" (as the core names lengths). */
export function isLengthPath(path: readonly (string | number)[]): boolean {
  return path.some((p) => typeof p === "string" && /Mm$/.test(p));
}

/**
 * Rewrites every length text in a form's values from one unit to the other. Text that does not parse
 * is left exactly as typed, so switching units never loses anything.
 */
export function convertLengthTexts<T>(values: T, from: LengthUnits, to: LengthUnits): T {
  if (from === to) return values;
  const walk = (v: unknown, path: (string | number)[]): unknown => {
    if (typeof v === "string") {
      if (!isLengthPath(path)) return v;
      const r = parseLengthText(v, from);
      return r.ok && r.value !== undefined ? lengthText(r.value, to) : v;
    }
    if (Array.isArray(v)) return v.map((x, i) => walk(x, [...path, i]));
    if (v && typeof v === "object") return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, walk(x, [...path, k])]));
    return v;
  };
  return walk(values, []) as T;
}
