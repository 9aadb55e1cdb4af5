import type { LengthUnits } from "@/geometry";
import { lengthFieldText, parseLengthText } from "@/model/units";

/** Whether a form path holds a length: it or one of its parents ends in "Mm" (as the core names lengths). */
export function isLengthPath(path: readonly (string | number)[]): boolean {
  return path.some((p) => typeof p === "string" && /Mm$/.test(p));
}

/**
 * What the last unit switch wrote at each path, and the text it replaced. Switching back gives the
 * text as it was typed (12.10 mm → 0.4764 in → 12.10 mm, not 12.101), unless it was edited meanwhile.
 */
export type UnitSwitchMemory = Map<string, { wrote: string; was: string }>;

/**
 * Rewrites every length text in a form's values from one unit to the other. Text that does not parse
 * is left exactly as typed, so switching units never loses anything; with a memory, switching there
 * and back again restores the very characters typed.
 */
export function convertLengthTexts<T>(values: T, from: LengthUnits, to: LengthUnits, memory?: UnitSwitchMemory): T {
  if (from === to) return values;
  const walk = (v: unknown, path: (string | number)[]): unknown => {
    if (typeof v === "string") {
      if (!isLengthPath(path)) return v;
      const key = path.join(".");
      const last = memory?.get(key);
      const r = parseLengthText(v, from);
      const next = last && last.wrote === v ? last.was : r.ok && r.value !== undefined ? lengthFieldText(r.value, to) : v;
      if (memory) {
        if (next === v) memory.delete(key);
        else memory.set(key, { wrote: next, was: v });
      }
      return next;
    }
    if (Array.isArray(v)) return v.map((x, i) => walk(x, [...path, i]));
    if (v && typeof v === "object") return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, walk(x, [...path, k])]));
    return v;
  };
  return walk(values, []) as T;
}
