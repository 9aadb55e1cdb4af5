"use client";

import { memo, useMemo } from "react";
import type { Study, StudyResult } from "@/geometry";
import { planDrawing } from "@/scene/drawing/plan";
import { sectionDrawing } from "@/scene/drawing/section";
import type { Drawing } from "@/scene/drawing/svg";
import { download, slug } from "./download";

function printDrawings(drawings: readonly Drawing[]) {
  const w = window.open("", "_blank");
  if (!w) return;
  w.document.title = drawings.map((d) => d.title).join(" · ");
  w.document.body.innerHTML = drawings.map((d) => `<div style="page-break-after:always;margin:10mm">${d.svg}</div>`).join("");
  w.focus();
  w.print();
}

/** The plan and the section, to scale, with their downloads and print. */
export const Drawings = memo(function Drawings({ study, result, kitIndex, units }: { study: Study; result: StudyResult; kitIndex: number; units: "mm" | "in" }) {
  const plan = useMemo(() => planDrawing(study, result, kitIndex, units), [study, result, kitIndex, units]);
  const section = useMemo(() => sectionDrawing(study, result, kitIndex, units), [study, result, kitIndex, units]);
  const base = slug(`${study.name ?? "study"}-${result.kits[kitIndex].name}`);
  return (
    <section aria-label="Drawings" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 className="text-lg font-semibold">Drawings</h2>
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn-quiet" data-testid="download-plan" onClick={() => download(`${base}-plan.svg`, new Blob([plan.svg], { type: "image/svg+xml" }))}>
            Download plan (SVG)
          </button>
          <button type="button" className="btn-quiet" data-testid="download-section" onClick={() => download(`${base}-section.svg`, new Blob([section.svg], { type: "image/svg+xml" }))}>
            Download section (SVG)
          </button>
          <button type="button" className="btn-quiet" onClick={() => printDrawings([plan, section])}>
            Print to scale
          </button>
        </div>
      </div>
      <div className="grid gap-3 xl:grid-cols-2">
        {[plan, section].map((d) => (
          <figure key={d.title} className="card overflow-hidden p-2">
            <div className="[&>svg]:h-auto [&>svg]:w-full" dangerouslySetInnerHTML={{ __html: d.svg }} data-testid={d === plan ? "plan-drawing" : "section-drawing"} />
            <figcaption className="px-1 pt-1 text-xs text-ink-2">{d.title} — to scale; prints 1:1.</figcaption>
          </figure>
        ))}
      </div>
    </section>
  );
});
