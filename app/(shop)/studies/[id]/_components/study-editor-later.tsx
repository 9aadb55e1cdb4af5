"use client";

import type { LengthUnits } from "@/geometry";
import { later } from "@/app/_ui/later";

const StudyEditor = later(() => import("./study-editor").then((m) => m.StudyEditor));

/**
 * The study's editor, in the first HTML as the server rendered it (the studio with its plan drawing and every
 * figure, the inputs with their values); its code is a script of its own, fetched with the page's first ones.
 */
export function StudyEditorLater({ id, units }: { id: string; units: LengthUnits }) {
  return <StudyEditor id={id} units={units} />;
}
