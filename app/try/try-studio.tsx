"use client";

import { useState } from "react";
import type { Study, StudyResult } from "@/geometry";
import { Studio } from "@/app/_ui/studio/studio";

/** The example study in the fit studio, read and evaluated on the server; the units switch is the visitor's. */
export function TryStudio({ study, result }: { study: Study; result: StudyResult }) {
  const [units, setUnits] = useState<"mm" | "in">("mm");
  return (
    <div className="flex flex-col gap-3">
      <fieldset className="flex items-center gap-3 text-sm">
        <legend className="sr-only">Units</legend>
        {(["mm", "in"] as const).map((u) => (
          <label key={u} className="flex items-center gap-1.5">
            <input type="radio" name="try-units" checked={units === u} onChange={() => setUnits(u)} className="accent-accent" data-testid={`units-${u}`} />
            {u === "mm" ? "millimetres" : "inches"}
          </label>
        ))}
      </fieldset>
      <Studio study={study} result={result} units={units} />
    </div>
  );
}
