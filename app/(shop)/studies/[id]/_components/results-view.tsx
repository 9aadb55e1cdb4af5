"use client";

import type { LengthUnits } from "@/geometry";
import { useState } from "react";
import type { Evaluation } from "./assemble";
import { TONE_TEXT, VERDICT } from "./verdict-words";
import { KitResults } from "./kit-results";

/** The live results: a kit picker and everything the core says about that kit. */
export function ResultsView({
  shown,
  units,
  chosen,
  loading,
}: {
  shown: Extract<Evaluation, { ok: true }> | null;
  units: LengthUnits;
  chosen: string;
  loading: boolean;
}) {
  const [picked, setPicked] = useState<string | null>(null);
  if (!shown) return <p className="text-ink-2">{loading ? "Loading the case and kits…" : "Results appear once the inputs are complete."}</p>;
  const kits = shown.result.kits;
  const mouth = shown.study.case.mouth.outline;
  const mouthDiameterMm = mouth.kind === "circle" ? mouth.diameterMm : null;
  const current = kits.find((k) => k.kitId === picked) ?? kits.find((k) => k.kitId === chosen) ?? kits[0];
  return (
    <div className="flex flex-col gap-4" aria-label="Results">
      <div className="flex flex-wrap gap-2" role="group" aria-label="Kit shown">
        {kits.map((k) => {
          const v = VERDICT[k.verdict];
          const on = k.kitId === current?.kitId;
          return (
            <button
              key={k.kitId}
              type="button"
              aria-pressed={on}
              onClick={() => setPicked(k.kitId)}
              className={`rounded-md border px-3 py-1.5 text-left text-sm ${on ? "border-accent bg-accent-soft" : "border-rule bg-card hover:border-ink-3"}`}
            >
              <span className="block font-medium">{k.name}</span>
              <span className={`text-xs ${TONE_TEXT[v.tone]}`}>{v.words}</span>
            </button>
          );
        })}
      </div>
      {current ? <KitResults kit={current} result={shown.result} units={units} mouthDiameterMm={mouthDiameterMm} /> : null}
    </div>
  );
}
