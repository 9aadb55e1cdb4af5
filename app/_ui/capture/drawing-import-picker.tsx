"use client";

import type { LengthUnits } from "@/model/units";
import { FormNotice } from "../field";
import type { DrawingRead, ShapeRole } from "./drawing-file";
import { ROLE_WORDS } from "./drawing-roles";
import type { DrawingImportState } from "./use-drawing-import";

/** The drawing's closed shapes, the one hovered or focused drawn thicker in the caution colour. */
function DrawingPreview({ view, box, roles, hover }: { view: DrawingRead; box: NonNullable<DrawingImportState["box"]>; roles: Record<string, ShapeRole>; hover: string | null }) {
  return (
    <svg viewBox={`${box.x} ${box.y} ${box.w} ${box.h}`} className="aspect-square w-full max-w-72 rounded-md border border-rule bg-paper" role="img" aria-label={`The drawing's ${view.shapes.length} closed shapes`}>
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
  );
}

/** The preview beside the table where each shape is given its role, and the button that puts them into the form. */
export function DrawingImportPicker({ s, view, allowed, units }: { s: DrawingImportState; view: DrawingRead; allowed: ShapeRole[]; units: LengthUnits }) {
  const { roles, hover, setHover } = s;
  const choices = [...allowed, ...(allowed.includes("unused") ? [] : ["unused" as const])];
  return (
    <div className="flex flex-col gap-4">
      {s.box ? <DrawingPreview view={view} box={s.box} roles={roles} hover={hover} /> : null}
      <div className="flex flex-col gap-2">
        <table className="w-full text-sm">
          <caption className="text-left font-medium">Which shape is which</caption>
          <thead>
            <tr className="text-left text-ink-2"><th className="font-normal">Shape in the file</th><th className="font-normal">Is</th></tr>
          </thead>
          <tbody>
            {view.shapes.map((shape, i) => (
              <tr key={shape.id} onMouseEnter={() => setHover(shape.id)} onMouseLeave={() => setHover(null)} className={hover === shape.id ? "bg-caution-soft" : undefined}>
                <td className="py-1 pr-2">{shape.source}</td>
                <td className="py-1">
                  <label className="sr-only" htmlFor={`drawing-role-${shape.id}`}>What shape {i + 1} ({shape.source}) is</label>
                  <select id={`drawing-role-${shape.id}`} className="field-input mt-0 min-w-32 py-1" value={roles[shape.id] ?? "unused"} onFocus={() => setHover(shape.id)} onBlur={() => setHover(null)} onChange={(e) => s.setRoles((r) => ({ ...r, [shape.id]: e.target.value as ShapeRole }))}>
                    {choices.map((r) => (
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
          <button type="button" className="btn" onClick={s.apply}>Put the shapes into the form</button>
        </div>
        {s.result ? <FormNotice tone={s.result.tone}>{s.result.text}</FormNotice> : null}
        <p className="text-xs text-ink-2">Units in the form: {units}. Check the imported figures against the part before cutting.</p>
      </div>
    </div>
  );
}
