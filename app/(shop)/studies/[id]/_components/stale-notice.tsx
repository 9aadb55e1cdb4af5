"use client";

import { get, type FieldErrors } from "react-hook-form";
import { lengthLabel, type LengthUnits } from "@/model/units";
import { TERM } from "@/model/glossary";
import { LIMIT_LABEL } from "./limits-panel";
import type { LimitKey, StudyFormValues, StudyInputs } from "./study-values";

type Path = string;

/** Every path of a form's errors that carries a message ("cut.diameterMm", "readings.holderHeights.0.heightMm"). */
export function errorPaths(errors: FieldErrors, prefix = ""): Path[] {
  const out: Path[] = [];
  for (const [key, value] of Object.entries(errors)) {
    if (!value || typeof value !== "object" || key === "ref") continue;
    const path = prefix ? `${prefix}.${key}` : key;
    if (typeof (value as { message?: unknown }).message === "string") out.push(key === "root" ? prefix : path);
    else out.push(...errorPaths(value as FieldErrors, path));
  }
  return [...new Set(out)].filter(Boolean);
}

/** The field at a path in the study's words. */
function fieldName(path: Path, values: StudyFormValues): string {
  const p = path.split(".");
  if (path === "cut.diameterMm") return TERM.cutDiameter.label;
  if (path === "cut.depthMm") return TERM.cutDepth.label;
  if (p[0] === "cut" && p[1] === "centerOffsetMm") return `Centring offset ${p[2] === "1" ? "y" : "x"}`;
  if (p[0] === "readings") {
    const stud = values.readings.holderHeights[Number(p[2])]?.stud;
    return `${p[3] === "straightedgeMm" ? TERM.straightedge.label : TERM.holderHeight.label}${stud ? ` at stud ${stud}` : ""}`;
  }
  if (p[0] === "limits") return LIMIT_LABEL[p[1] as LimitKey] ?? p[1];
  return path === "name" ? "Study name" : path;
}

/** What a value the results were made from reads as, in the user's units. */
function valueText(path: Path, value: unknown, units: LengthUnits): string {
  if (value === undefined) return path.startsWith("cut.") ? "blank (the least cut)" : "blank";
  if (typeof value === "number") return /Mm(\.\d+)?$/.test(path) ? lengthLabel(value, units) : String(value);
  if (Array.isArray(value)) return value.join(", ");
  return String(value);
}

/** While a field is wrong: which field, what it reads, and the last valid value the results on screen are based on. */
export function StaleNotice({ errors, values, basis, units }: { errors: FieldErrors; values: StudyFormValues; basis: StudyInputs | null; units: LengthUnits }) {
  const paths = errorPaths(errors).filter((p) => p !== "name" && p !== "notes");
  if (!basis) return null;
  return (
    <div className="rounded-md border border-caution bg-caution-soft px-4 py-3 text-sm" role="status" data-testid="stale-results">
      <p className="font-medium">The results below are based on the last valid values, not on what the marked fields read now:</p>
      <ul className="mt-1 list-disc pl-5">
        {paths.map((p) => (
          <li key={p}>
            {fieldName(p, values)} reads “{String(get(values, p) ?? "")}”; the results use {valueText(p, get(basis, p), units)}.
          </li>
        ))}
      </ul>
      {paths.length === 0 ? <p>Fix the marked fields to update them.</p> : null}
    </div>
  );
}
