"use client";

import { useMemo, useState } from "react";
import type { LengthUnits } from "@/model/units";
import { FormNotice } from "../field";
import type { CapturedShapes } from "./captured-shapes";
import {
  DEFAULT_CHORD_TOLERANCE_MM,
  DrawingFileError,
  MAX_DRAWING_BYTES,
  pickShapes,
  readDrawing,
  type DrawingRead,
  type DrawingShape,
  type DrawingUnit,
  type ShapeRole,
} from "./drawing-file";

// Import a deck drawing (DXF or SVG): the file is read in the browser, the person says which shape is the
// deck, the mouth, each passage and the stud holes, and the shapes go into the form in mm. Nothing is sent
// or kept until the form itself is saved.

const ROLE_WORDS: Record<ShapeRole, string> = { deck: "Deck", mouth: "Mouth", passage: "Passage", stud: "Stud hole", port: "Gasket port", unused: "Not used" };

type Props = {
  onApply: (shapes: CapturedShapes) => void;
  /** Which roles may be picked: a case takes deck, mouth, passages and studs; a kit's gasket takes ports and studs. */
  roles?: ShapeRole[];
  units?: LengthUnits;
};

function area(s: DrawingShape): number {
  if (s.shape.kind === "circle") return Math.PI * s.shape.radius ** 2;
  const p = s.shape.points;
  let a = 0;
  for (let i = 0; i < p.length; i++) a += p[i][0] * p[(i + 1) % p.length][1] - p[(i + 1) % p.length][0] * p[i][1];
  return Math.abs(a) / 2;
}

/** A first guess from layer names, then from size: the largest shape is the deck, repeated equal circles are studs, the largest other circle the mouth. */
function guessRoles(read: DrawingRead, allowed: ShapeRole[]): Record<string, ShapeRole> {
  const roles: Record<string, ShapeRole> = {};
  const byName = (s: DrawingShape): ShapeRole | null => {
    const n = (s.layer ?? "").toLowerCase();
    if (/deck/.test(n)) return "deck";
    if (/mouth|bore/.test(n)) return "mouth";
    if (/stud|bolt|hole/.test(n)) return "stud";
    if (/passage|transfer|pocket/.test(n)) return "passage";
    if (/port/.test(n)) return "port";
    return null;
  };
  for (const s of read.shapes) {
    const r = byName(s);
    if (r && allowed.includes(r)) roles[s.id] = r;
  }
  const rest = read.shapes.filter((s) => !roles[s.id]).sort((a, b) => area(b) - area(a));
  if (allowed.includes("deck") && !Object.values(roles).includes("deck") && rest[0]) roles[rest[0].id] = "deck";
  const radii = new Map<string, number>();
  for (const s of rest) if (s.shape.kind === "circle" && !roles[s.id]) radii.set(s.shape.radius.toFixed(6), (radii.get(s.shape.radius.toFixed(6)) ?? 0) + 1);
  for (const s of rest) {
    if (roles[s.id]) continue;
    if (s.shape.kind === "circle" && (radii.get(s.shape.radius.toFixed(6)) ?? 0) >= 2 && allowed.includes("stud")) roles[s.id] = "stud";
  }
  if (allowed.includes("mouth") && !Object.values(roles).includes("mouth")) {
    const m = rest.find((s) => !roles[s.id] && s.shape.kind === "circle");
    if (m) roles[m.id] = "mouth";
  }
  for (const s of read.shapes) roles[s.id] ??= allowed.includes("passage") ? "passage" : "unused";
  return roles;
}

export function DrawingImport({ onApply, roles: allowed = ["deck", "mouth", "passage", "stud", "unused"], units = "mm" }: Props) {
  const [file, setFile] = useState<{ name: string; text: string } | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [unit, setUnit] = useState<DrawingUnit | null>(null);
  const [toleranceText, setToleranceText] = useState(String(DEFAULT_CHORD_TOLERANCE_MM));
  const [roles, setRoles] = useState<Record<string, ShapeRole>>({});
  const [origin, setOrigin] = useState<"drawing" | "mouth">("drawing");
  const [hover, setHover] = useState<string | null>(null);
  const [result, setResult] = useState<{ tone: "ok" | "error"; text: string } | null>(null);

  const tolerance = Number(toleranceText);
  const toleranceError = !(tolerance > 0) || tolerance > 1 ? "Enter a chord tolerance above 0 and at most 1 mm." : null;

  const read = useMemo((): { read: DrawingRead } | { error: string } | null => {
    if (!file || toleranceError) return null;
    try {
      return { read: readDrawing(file.name, file.text, { unit: unit ?? "mm", chordToleranceMm: tolerance }) };
    } catch (error) {
      if (error instanceof DrawingFileError) return { error: error.message };
      return { error: `The drawing cannot be read: ${(error as Error).message}` };
    }
  }, [file, unit, tolerance, toleranceError]);

  async function choose(f: File | undefined) {
    setFileError(null);
    setResult(null);
    setFile(null);
    if (!f) return;
    if (f.size > MAX_DRAWING_BYTES) {
      setFileError(`The file is ${(f.size / 1024 / 1024).toFixed(1)} MB; drawings are limited to ${MAX_DRAWING_BYTES / 1024 / 1024} MB. Export only the deck. Nothing was read.`);
      return;
    }
    const text = await f.text();
    try {
      const first = readDrawing(f.name, text, { unit: "mm", chordToleranceMm: DEFAULT_CHORD_TOLERANCE_MM });
      setUnit(first.declaredUnit ?? "mm");
      setRoles(guessRoles(first, allowed));
    } catch {
      setUnit("mm");
      setRoles({});
    }
    setFile({ name: f.name, text });
  }

  function apply() {
    if (!read || !("read" in read)) return;
    const { shapes, problems } = pickShapes(read.read, roles, { unit: unit ?? "mm", origin });
    if (problems.length) {
      setResult({ tone: "error", text: `${problems.join(" ")} Nothing was put into the form.` });
      return;
    }
    onApply(shapes);
    const parts = [shapes.deck ? "the deck" : null, shapes.mouth ? "the mouth" : null, shapes.studs ? `${shapes.studs.length} studs` : null, shapes.pockets ? `${shapes.pockets.length} passages` : null, shapes.ports ? `${shapes.ports.length} ports` : null].filter(Boolean);
    setResult({ tone: "ok", text: `Put into the form: ${parts.join(", ")}.` });
  }

  const view = read && "read" in read ? read.read : null;
  const box = useMemo(() => {
    if (!view) return null;
    let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
    for (const s of view.shapes) {
      const pts = s.shape.kind === "circle" ? [[s.shape.center[0] - s.shape.radius, s.shape.center[1] - s.shape.radius], [s.shape.center[0] + s.shape.radius, s.shape.center[1] + s.shape.radius]] : s.shape.points;
      for (const [x, y] of pts) {
        minX = Math.min(minX, x); minY = Math.min(minY, y); maxX = Math.max(maxX, x); maxY = Math.max(maxY, y);
      }
    }
    const pad = 0.05 * Math.max(maxX - minX, maxY - minY, 1e-6);
    return { x: minX - pad, y: -(maxY + pad), w: maxX - minX + 2 * pad, h: maxY - minY + 2 * pad };
  }, [view]);

  return (
    <section className="card flex flex-col gap-4 p-4" aria-label="Import a drawing">
      <div>
        <h2 className="text-lg font-semibold">Import a drawing</h2>
        <p className="text-sm text-ink-2">A DXF or SVG of the deck, drawn to scale. Curves are turned into corners no further than the chord tolerance from the drawn curve.</p>
      </div>
      <div className="flex flex-wrap items-start gap-4">
        <div>
          <label htmlFor="drawing-file" className="field-label">Drawing (DXF or SVG, up to {MAX_DRAWING_BYTES / 1024 / 1024} MB)</label>
          <input id="drawing-file" type="file" accept=".dxf,.svg,image/svg+xml,application/dxf" className="mt-1 text-sm" onChange={(e) => void choose(e.target.files?.[0])} aria-describedby={fileError ? "drawing-file-error" : undefined} />
          {fileError ? <p id="drawing-file-error" className="field-error" role="alert">{fileError}</p> : null}
        </div>
        <div>
          <label htmlFor="drawing-unit" className="field-label">The drawing&apos;s unit</label>
          <select id="drawing-unit" className="field-input" value={unit ?? "mm"} onChange={(e) => setUnit(e.target.value as DrawingUnit)}>
            <option value="mm">millimetres</option>
            <option value="in">inches</option>
          </select>
          {view?.declaredUnit ? <p className="field-hint">The file says {view.declaredUnit === "mm" ? "millimetres" : "inches"}.</p> : view ? <p className="field-hint">The file does not say; check one known length.</p> : null}
        </div>
        <div className="w-44">
          <label htmlFor="drawing-tolerance" className="field-label">Chord tolerance <span className="text-ink-2 num">(mm)</span></label>
          <input id="drawing-tolerance" className="field-input num" inputMode="decimal" value={toleranceText} onChange={(e) => setToleranceText(e.target.value)} aria-invalid={toleranceError ? true : undefined} aria-describedby={toleranceError ? "drawing-tolerance-error" : undefined} />
          {toleranceError ? <p id="drawing-tolerance-error" className="field-error" role="alert">{toleranceError}</p> : null}
        </div>
        {allowed.includes("mouth") ? (
          <div>
            <label htmlFor="drawing-origin" className="field-label">Cylinder axis</label>
            <select id="drawing-origin" className="field-input" value={origin} onChange={(e) => setOrigin(e.target.value as "drawing" | "mouth")}>
              <option value="drawing">at the drawing&apos;s origin</option>
              <option value="mouth">at the mouth&apos;s centre</option>
            </select>
          </div>
        ) : null}
      </div>

      {read && "error" in read ? <FormNotice tone="error">{`${read.error} Nothing was put into the form.`}</FormNotice> : null}

      {view && box ? (
        <div className="grid gap-4 md:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
          <svg viewBox={`${box.x} ${box.y} ${box.w} ${box.h}`} className="aspect-square w-full rounded-md border border-rule bg-paper" role="img" aria-label={`The drawing's ${view.shapes.length} closed shapes`}>
            {view.shapes.map((s) => {
              const role = roles[s.id] ?? "unused";
              const color = hover === s.id ? "var(--color-caution)" : role === "unused" ? "var(--color-ink-3)" : "var(--color-accent)";
              const w = box.w / 300;
              return s.shape.kind === "circle" ? (
                <circle key={s.id} cx={s.shape.center[0]} cy={-s.shape.center[1]} r={s.shape.radius} fill="none" stroke={color} strokeWidth={hover === s.id ? 3 * w : w} />
              ) : (
                <polygon key={s.id} points={s.shape.points.map(([x, y]) => `${x},${-y}`).join(" ")} fill="none" stroke={color} strokeWidth={hover === s.id ? 3 * w : w} />
              );
            })}
          </svg>
          <div className="flex flex-col gap-2">
            <table className="w-full text-sm">
              <caption className="text-left font-medium">Which shape is which</caption>
              <thead>
                <tr className="text-left text-ink-2"><th className="font-normal">Shape in the file</th><th className="font-normal">Is</th></tr>
              </thead>
              <tbody>
                {view.shapes.map((s, i) => (
                  <tr key={s.id} onMouseEnter={() => setHover(s.id)} onMouseLeave={() => setHover(null)} className={hover === s.id ? "bg-caution-soft" : undefined}>
                    <td className="py-1 pr-2">{s.source}</td>
                    <td className="py-1">
                      <label className="sr-only" htmlFor={`drawing-role-${s.id}`}>What shape {i + 1} ({s.source}) is</label>
                      <select id={`drawing-role-${s.id}`} className="field-input mt-0 py-1" value={roles[s.id] ?? "unused"} onFocus={() => setHover(s.id)} onBlur={() => setHover(null)} onChange={(e) => setRoles((r) => ({ ...r, [s.id]: e.target.value as ShapeRole }))}>
                        {[...allowed, ...(allowed.includes("unused") ? [] : ["unused" as const])].map((r) => (
                          <option key={r} value={r}>{ROLE_WORDS[r]}</option>
                        ))}
                      </select>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
            {view.notUsed.length ? <p className="text-xs text-ink-2">Also in the file, not used: {view.notUsed.join(", ")}.</p> : null}
            <div className="flex flex-wrap items-center gap-3">
              <button type="button" className="btn" onClick={apply}>Put the shapes into the form</button>
            </div>
            {result ? <FormNotice tone={result.tone}>{result.text}</FormNotice> : null}
            <p className="text-xs text-ink-2">Units in the form: {units}. Check the imported figures against the part before cutting.</p>
          </div>
        </div>
      ) : null}
    </section>
  );
}
