"use client";

import type { LengthUnits } from "@/model/units";
import { FormNotice } from "../field";
import type { CapturedShapes } from "./captured-shapes";
import type { ShapeRole } from "./drawing-file";
import { DrawingImportFields } from "./drawing-import-fields";
import { DrawingImportPicker } from "./drawing-import-picker";
import { useDrawingImport } from "./use-drawing-import";

// Import a deck drawing (DXF or SVG): the file is read in the browser, the person says which shape is the
// deck, the mouth, each passage and the stud holes, and the shapes go into the form in mm. Nothing is sent
// or kept until the form itself is saved.

type Props = {
  onApply: (shapes: CapturedShapes) => void;
  /** Which roles may be picked: a case takes deck, mouth, passages and studs; a kit's gasket takes ports and studs. */
  roles?: ShapeRole[];
  units?: LengthUnits;
};

export function DrawingImport({ onApply, roles: allowed = ["deck", "mouth", "passage", "stud", "unused"], units = "mm" }: Props) {
  const s = useDrawingImport(allowed, onApply);
  return (
    <section className="card flex flex-col gap-4 p-4" aria-label="Import a drawing">
      <div>
        <h2 className="text-lg font-semibold">Import a drawing</h2>
        <p className="text-sm text-ink-2">A DXF or SVG of the deck, drawn to scale. Curves are turned into corners no further than the chord tolerance from the drawn curve.</p>
      </div>
      <DrawingImportFields s={s} withOrigin={allowed.includes("mouth")} />
      {s.readError ? <FormNotice tone="error">{`${s.readError} Nothing was put into the form.`}</FormNotice> : null}
      {s.view && s.box ? <DrawingImportPicker s={s} view={s.view} allowed={allowed} units={units} /> : null}
    </section>
  );
}
