"use client";

import { Suspense } from "react";
import type { LengthUnits } from "@/geometry";
import { later } from "@/app/_ui/later";

const StudyEditor = later(() => import("./study-editor").then((m) => m.StudyEditor));

/**
 * The study's editor, in the first HTML as the server rendered it (the studio with its plan drawing and every
 * figure, the inputs); its code loads and it comes alive once the page has settled, without moving anything.
 */
export function StudyEditorLater({ id, units }: { id: string; units: LengthUnits }) {
  return (
    <Suspense fallback={<p className="text-ink-2">Loading the study…</p>}>
      <StudyEditor id={id} units={units} />
    </Suspense>
  );
}
