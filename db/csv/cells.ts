import type { Outline, Pocket, Stud } from "@/geometry";

// The library CSV's cell formats (our own, chosen to be typed by hand in a spreadsheet), read and written:
//   numbers       a point for decimals: 46.5
//   lists         values separated by semicolons: 53.92; 53.96
//   outline       "circle 46" or "circle 46 at 0.5 -0.2" (diameter, then centre), or a polygon as points
//                 "x y, x y, x y"
//   studs         "label: x y; label: x y"
//   pockets       "label: outline | label @depth: outline" (depth below the deck where it starts, mm)
//   yes/no        yes, no, true, false, 1, 0

/** A cell that does not read in its column's format; the message says how to write it. */
export class CellError extends Error {}

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;
export function num(text: string): number {
  const t = text.trim();
  if (/^[-+]?\d+,\d+$/.test(t)) throw new CellError(`"${t}": use a point for decimals, not a comma`);
  if (!NUMBER.test(t)) throw new CellError(`"${t}" is not a number`);
  return Number(t);
}
export const fmt = (n: number) => String(n);
export const list = (text: string) =>
  text
    .split(";")
    .map((x) => x.trim())
    .filter((x) => x !== "");
export const numList = (text: string) => list(text).map(num);
export const point = (text: string): [number, number] => {
  const parts = text.trim().split(/\s+/);
  if (parts.length !== 2) throw new CellError(`"${text.trim()}": a point is two numbers, x and y, separated by a space`);
  return [num(parts[0]), num(parts[1])];
};

export function outline(text: string): Outline {
  const t = text.trim();
  const circle = /^circle\s+(\S+)(?:\s+at\s+(\S+)\s+(\S+))?$/i.exec(t);
  if (circle) {
    const o: Outline = { kind: "circle", diameterMm: num(circle[1]) };
    if (circle[2] !== undefined) o.centerMm = [num(circle[2]), num(circle[3])];
    return o;
  }
  if (/^circle\b/i.test(t)) throw new CellError(`"${t}": write a circle as "circle 46" or "circle 46 at 0 0"`);
  return { kind: "polygon", pointsMm: t.split(",").map(point) };
}
export function outlineText(o: Outline): string {
  if (o.kind === "circle") return o.centerMm ? `circle ${fmt(o.diameterMm)} at ${fmt(o.centerMm[0])} ${fmt(o.centerMm[1])}` : `circle ${fmt(o.diameterMm)}`;
  return o.pointsMm.map(([x, y]) => `${fmt(x)} ${fmt(y)}`).join(", ");
}

export function studs(text: string): Stud[] {
  return list(text).map((entry) => {
    const at = entry.lastIndexOf(":");
    if (at <= 0) throw new CellError(`"${entry}": write each stud as "label: x y"`);
    return { label: entry.slice(0, at).trim(), positionMm: point(entry.slice(at + 1)) };
  });
}
export const studsText = (s: readonly Stud[]) => s.map((x) => `${x.label}: ${fmt(x.positionMm[0])} ${fmt(x.positionMm[1])}`).join("; ");

export function pockets(text: string): Pocket[] {
  return text
    .split("|")
    .map((x) => x.trim())
    .filter((x) => x !== "")
    .map((entry) => {
      const m = /^([^:@]+?)\s*(?:@\s*(\S+))?\s*:\s*(.+)$/.exec(entry);
      if (!m) throw new CellError(`"${entry}": write each pocket as "label: x y, x y, x y" or "label @3: circle 6 at 30 0"`);
      return { label: m[1].trim(), startDepthMm: m[2] === undefined ? 0 : num(m[2]), outline: outline(m[3]) };
    });
}
export const pocketsText = (p: readonly Pocket[]) =>
  p.map((x) => `${x.label}${x.startDepthMm ? ` @${fmt(x.startDepthMm)}` : ""}: ${outlineText(x.outline)}`).join(" | ");

export function yesNo(text: string): boolean {
  const t = text.trim().toLowerCase();
  if (["yes", "true", "1", "y"].includes(t)) return true;
  if (["no", "false", "0", "n"].includes(t)) return false;
  throw new CellError(`"${text.trim()}": write yes or no`);
}
