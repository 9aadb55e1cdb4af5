import type { LengthUnits } from "@/geometry";
import { boundLabel as limitText, parseLengthText, parseNumberText } from "@/model/units";
import { FIELD_WORDS, PLAUSIBLE_MAX_MM } from "./plausible";

export type Path = (string | number)[];
export type TextIssue = { path: Path; message: string };

/** Shows a limit given in mm in the form's units ("200 mm", "7.874 in"). */
export { boundLabel as limitText } from "@/model/units";

const lastName = (path: Path) => [...path].reverse().find((p): p is string => typeof p === "string") ?? "";

/**
 * Turns a form's texts into the core's numbers (lengths in mm), collecting what cannot be read —
 * a comma decimal, a word, an implausible size — as messages at the field's path.
 */
export class FormReader {
  readonly issues: TextIssue[] = [];
  constructor(readonly units: LengthUnits) {}

  /** A length typed in the form's units, in mm; undefined when empty or unreadable. */
  length(text: string | undefined, path: Path): number | undefined {
    const r = parseLengthText(text, this.units);
    if (!r.ok) {
      this.issues.push({ path, message: r.message });
      return undefined;
    }
    if (r.value === undefined) return undefined;
    const key = lastName(path);
    const max = PLAUSIBLE_MAX_MM[key];
    if (max !== undefined && Math.abs(r.value) > max + 1e-9) {
      const what = FIELD_WORDS[key] ?? "this length";
      this.issues.push({
        path,
        message: `${limitText(r.value, this.units)} is too large: ${what} can be at most ${limitText(max, this.units)} for the engines Borewright plans — check the reading`,
      });
    }
    return r.value;
  }

  /** A plain number (a count, a speed, a price); undefined when empty or unreadable. */
  number(text: string | undefined, path: Path): number | undefined {
    const r = parseNumberText(text);
    if (!r.ok) {
      this.issues.push({ path, message: r.message });
      return undefined;
    }
    return r.value;
  }

  /** A list of lengths, each read at its index. */
  lengths(texts: readonly string[] | undefined, path: Path): number[] {
    return (texts ?? []).map((t, i) => this.length(t, [...path, i])).map((v) => v ?? Number.NaN);
  }

  /** Trimmed text, or undefined when empty (for optional text such as a thread). */
  optionalText(text: string | undefined): string | undefined {
    const t = (text ?? "").trim();
    return t === "" ? undefined : t;
  }
}
