"use client";

import type { LengthUnits } from "@/geometry";
import { ShapeParamsSchema, type ShapeParams } from "@/geometry/shapes";
import { useState } from "react";
import { lengthFieldText as lengthText, parseLengthText, parseNumberText } from "@/model/units";
import { RowOptions } from "@/app/_ui/form/row-options";

type Field = { name: string; label: string; length?: boolean };
export type MeasureSpec = { kind: ShapeParams["kind"]; label: string; fields: Field[] };

/** The helpers a shape can be drawn from, by what it is. */
export const MEASURES: Record<"deck" | "pocket" | "studs", MeasureSpec[]> = {
  deck: [
    { kind: "chamfered-rect", label: "Rectangle, chamfered corners", fields: [{ name: "widthMm", label: "Width (x)", length: true }, { name: "heightMm", label: "Length (y)", length: true }, { name: "chamferMm", label: "Chamfer along each side", length: true }] },
    { kind: "rounded-rect", label: "Rectangle, rounded corners", fields: [{ name: "widthMm", label: "Width (x)", length: true }, { name: "heightMm", label: "Length (y)", length: true }, { name: "radiusMm", label: "Corner radius", length: true }] },
    { kind: "circle", label: "Circle", fields: [{ name: "diameterMm", label: "Diameter", length: true }] },
  ],
  pocket: [
    { kind: "arc-slot", label: "Arc slot around the bore", fields: [{ name: "innerRadiusMm", label: "Inner radius", length: true }, { name: "outerRadiusMm", label: "Outer radius", length: true }, { name: "spanDeg", label: "Angular span (°)" }, { name: "centerDeg", label: "Centre angle from +x (°)" }] },
    { kind: "radial-rect", label: "Rectangle beside the bore", fields: [{ name: "widthMm", label: "Width across", length: true }, { name: "lengthMm", label: "Length outwards", length: true }, { name: "nearEdgeMm", label: "Near edge from the axis", length: true }, { name: "angleDeg", label: "Direction from +x (°)" }] },
  ],
  studs: [
    { kind: "rect-studs", label: "Rectangular pattern", fields: [{ name: "spacingXMm", label: "Centre distance across (x)", length: true }, { name: "spacingYMm", label: "Centre distance along (y)", length: true }] },
    { kind: "bolt-circle", label: "Bolt circle", fields: [{ name: "diameterMm", label: "Bolt-circle diameter", length: true }, { name: "count", label: "Number of studs" }, { name: "startDeg", label: "First stud at (° from +x)" }] },
  ],
};

const textsOf = (spec: MeasureSpec, p: ShapeParams | undefined, units: LengthUnits) =>
  Object.fromEntries(spec.fields.map((f) => {
    const v = p && p.kind === spec.kind ? (p as Record<string, unknown>)[f.name] : undefined;
    return [f.name, typeof v === "number" ? (f.length ? lengthText(v, units) : String(v)) : ""];
  }));

/**
 * Draws a shape from the measurements taken at the bench. What was typed is kept with the profile, so
 * the shape opens here again with the same numbers.
 */
export function MeasurePanel({ specs, params, units, what, onApply }: { specs: MeasureSpec[]; params?: ShapeParams; units: LengthUnits; what: string; onApply: (p: ShapeParams) => void }) {
  const [kind, setKind] = useState<ShapeParams["kind"]>(params && specs.some((s) => s.kind === params.kind) ? params.kind : specs[0].kind);
  const spec = specs.find((s) => s.kind === kind) ?? specs[0];
  const [texts, setTexts] = useState<Record<string, string>>(() => textsOf(spec, params, units));
  const [message, setMessage] = useState<string | null>(null);
  const apply = () => {
    const values: Record<string, unknown> = { kind: spec.kind };
    for (const f of spec.fields) {
      const r = f.length ? parseLengthText(texts[f.name], units) : parseNumberText(texts[f.name]);
      if (!r.ok) return setMessage(`${f.label}: ${r.message}`);
      if (r.value === undefined) return setMessage(`${f.label}: enter a value`);
      values[f.name] = r.value;
    }
    const p = ShapeParamsSchema.safeParse(values);
    if (!p.success) return setMessage(`${spec.fields.find((f) => f.name === p.error.issues[0]?.path[0])?.label ?? "A value"}: ${p.error.issues[0]?.message ?? "not usable"}`);
    setMessage(null);
    onApply(p.data);
  };
  return (
    <details className="rounded-md border border-rule p-3" open={!!params}>
      <summary className="cursor-pointer text-sm font-medium">Draw the {what} from measurements</summary>
      <div className="mt-3 flex flex-col gap-3">
        <label className="flex items-center gap-2 text-sm">
          <span className="text-ink-2">Shape</span>
          <select
            className="rounded-md border border-rule bg-card px-2 py-1.5"
            value={kind}
            aria-label={`${what} drawn as`}
            onChange={(e) => {
              const next = specs.find((s) => s.kind === e.target.value) ?? specs[0];
              setKind(next.kind);
              setTexts(textsOf(next, params, units));
            }}
          >
            <RowOptions rows={specs.map((s) => ({ id: s.kind, name: s.label }))} />
          </select>
        </label>
        <div className="flex flex-wrap items-end gap-3">
          {spec.fields.map((f) => (
            <label key={f.name} className="flex flex-col text-sm">
              <span className="field-label">
                {f.label} {f.length ? <span className="text-ink-3 num">({units})</span> : null}
              </span>
              <input
                className="field-input mt-1 w-32 num"
                inputMode="decimal"
                autoComplete="off"
                aria-label={`${what}: ${f.label}${f.length ? ` (${units})` : ""}`}
                value={texts[f.name] ?? ""}
                onChange={(e) => setTexts({ ...texts, [f.name]: e.target.value })}
              />
            </label>
          ))}
          <button type="button" className="btn-quiet" onClick={apply}>
            Draw the {what}
          </button>
        </div>
        {message ? (
          <p role="alert" className="field-error">
            {message}
          </p>
        ) : null}
      </div>
    </details>
  );
}
