"use client";

import { MAX_DRAWING_BYTES, type DrawingUnit } from "./drawing-file";
import type { DrawingImportState } from "./use-drawing-import";

/** The file, the drawing's unit, the chord tolerance and (for a case) where the cylinder axis is. */
export function DrawingImportFields({ s, withOrigin }: { s: DrawingImportState; withOrigin: boolean }) {
  const { fileError, view, toleranceError } = s;
  return (
    <div className="flex flex-wrap items-start gap-4">
      <div>
        <label htmlFor="drawing-file" className="field-label">Drawing (DXF or SVG, up to {MAX_DRAWING_BYTES / 1024 / 1024} MB)</label>
        <input id="drawing-file" type="file" accept=".dxf,.svg,image/svg+xml,application/dxf" className="mt-1 text-sm" onChange={(e) => void s.choose(e.target.files?.[0])} aria-describedby={fileError ? "drawing-file-error" : undefined} />
        {fileError ? <p id="drawing-file-error" className="field-error" role="alert">{fileError}</p> : null}
      </div>
      <div>
        <label htmlFor="drawing-unit" className="field-label">The drawing&apos;s unit</label>
        <select id="drawing-unit" className="field-input" value={s.unit ?? "mm"} onChange={(e) => s.setUnit(e.target.value as DrawingUnit)}>
          <option value="mm">millimetres</option>
          <option value="in">inches</option>
        </select>
        {view?.declaredUnit ? <p className="field-hint">The file says {view.declaredUnit === "mm" ? "millimetres" : "inches"}.</p> : view ? <p className="field-hint">The file does not say; check one known length.</p> : null}
      </div>
      <div className="w-44">
        <label htmlFor="drawing-tolerance" className="field-label">Chord tolerance <span className="text-ink-2 num">(mm)</span></label>
        <input id="drawing-tolerance" className="field-input num" inputMode="decimal" value={s.toleranceText} onChange={(e) => s.setToleranceText(e.target.value)} aria-invalid={toleranceError ? true : undefined} aria-describedby={toleranceError ? "drawing-tolerance-error" : undefined} />
        {toleranceError ? <p id="drawing-tolerance-error" className="field-error" role="alert">{toleranceError}</p> : null}
      </div>
      {withOrigin ? (
        <div>
          <label htmlFor="drawing-origin" className="field-label">Cylinder axis</label>
          <select id="drawing-origin" className="field-input" value={s.origin} onChange={(e) => s.setOrigin(e.target.value as "drawing" | "mouth")}>
            <option value="drawing">at the drawing&apos;s origin</option>
            <option value="mouth">at the mouth&apos;s centre</option>
          </select>
        </div>
      ) : null}
    </div>
  );
}
