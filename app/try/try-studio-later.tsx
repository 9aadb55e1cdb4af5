"use client";

import type { Study, StudyResult } from "@/geometry";
import { later } from "../_ui/later";

const TryStudio = later(() => import("./try-studio").then((m) => m.TryStudio));

/** The example in the fit studio: in the first HTML as the server rendered it, its code a script of its own, fetched with the page's first ones. */
export function TryStudioLater({ study, result }: { study: Study; result: StudyResult }) {
  return <TryStudio study={study} result={result} />;
}
