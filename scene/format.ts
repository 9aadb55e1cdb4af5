import { formatLength, type LengthUnits } from "@/geometry";

// How the scene and the drawings write a length: mm with two decimals, or inches — fractional to 1/64"
// for sizes, decimal thousandths for small figures (a clearance of 0.5 mm is under 1/64").

const SMALL_IN_MM = 6.35;

/** A length for a label or a dimension line. */
export function lengthText(mm: number, units: LengthUnits): string {
  if (units === "mm") return formatLength(mm, "mm", { digits: 2 });
  if (Math.abs(mm) < SMALL_IN_MM) return formatLength(mm, "in", { digits: 3 });
  return formatLength(mm, "in", { fractionDenominator: 64 });
}

/** A length as a plain decimal number in the chosen units, for inputs. */
export function lengthValue(mm: number, units: LengthUnits, digits = units === "mm" ? 2 : 4): string {
  return (units === "mm" ? mm : mm / 25.4).toFixed(digits);
}

/** A diameter label: "Ø 55.10 mm". */
export function diameterText(mm: number, units: LengthUnits): string {
  return `Ø ${lengthText(mm, units)}`;
}

/** A signed clearance: "+0.54 mm" or "−0.30 mm". */
export function signedLengthText(mm: number, units: LengthUnits): string {
  const t = lengthText(Math.abs(mm), units);
  return mm < 0 ? `−${t}` : `+${t}`;
}
