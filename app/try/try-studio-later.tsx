"use client";

import { Suspense } from "react";
import type { Study, StudyResult } from "@/geometry";
import { later } from "../_ui/later";

const TryStudio = later(() => import("./try-studio").then((m) => m.TryStudio));

/** The example in the fit studio: in the first HTML as the server rendered it, alive once the page has settled. */
export function TryStudioLater({ study, result }: { study: Study; result: StudyResult }) {
  return (
    <Suspense fallback={<p className="text-ink-2">Loading the fit studio…</p>}>
      <TryStudio study={study} result={result} />
    </Suspense>
  );
}
