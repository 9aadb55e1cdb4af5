"use client";

import type { LengthUnits } from "@/geometry";
import type { CapturedShapes } from "@/app/_ui/capture/captured-shapes";
import { DrawingImport } from "@/app/_ui/capture/drawing-import";
import { PhotoTrace } from "@/app/_ui/capture/photo-trace";
import { useCasePhotoLink } from "../case-photo";

/**
 * The other ways in: trace over a photo of the deck, or import a drawing. What they find replaces the
 * matching shapes of the form in one step that Undo takes back.
 */
export function CaptureSources({ onApply, units, caseId, kit = false }: { onApply: (s: CapturedShapes) => void; units: LengthUnits; caseId?: string | null; kit?: boolean }) {
  // A case form keeps the photo and its reference points; a kit's gasket trace keeps neither.
  const link = useCasePhotoLink();
  const photo = !kit && link ? link : null;
  return (
    <div className="flex flex-col gap-3">
      <details className="card p-4">
        <summary className="cursor-pointer text-sm font-semibold">Trace over a photo</summary>
        <div className="mt-3">
          <PhotoTrace
            onApply={onApply}
            units={units}
            caseId={kit ? null : (caseId ?? null)}
            shapesFor={kit ? "gasket" : "case"}
            initialReference={photo?.initialReference}
            onReferenceChange={photo?.onReferenceChange}
            onPhotoChosen={photo?.onPhotoChosen}
          />
        </div>
      </details>
      <details className="card p-4">
        <summary className="cursor-pointer text-sm font-semibold">Import a drawing (DXF or SVG)</summary>
        <div className="mt-3">
          <DrawingImport onApply={onApply} units={units} roles={kit ? ["deck", "port", "stud", "unused"] : undefined} />
        </div>
      </details>
    </div>
  );
}
