"use client";

import { useEffect, useState } from "react";
import { evaluateStudy, safeParseStudy, type Study, type StudyResult } from "@/geometry";
import { Studio } from "@/app/_ui/studio/studio";

type Loaded = { study: Study; result: StudyResult } | { error: string } | null;

/** Loads the example study from /examples/study.json and evaluates it in the browser. */
export function TryStudio() {
  const [loaded, setLoaded] = useState<Loaded>(null);
  const [units, setUnits] = useState<"mm" | "in">("mm");
  useEffect(() => {
    let live = true;
    fetch("/examples/study.json")
      .then((r) => (r.ok ? r.json() : Promise.reject(new Error(`the example answered ${r.status}`))))
      .then((json: unknown) => {
        const parsed = safeParseStudy(json);
        if (!live) return;
        if (!parsed.ok) setLoaded({ error: `The example study could not be read: ${parsed.issues.map((i) => `${i.path}: ${i.message}`).join("; ")}` });
        else setLoaded({ study: parsed.study, result: evaluateStudy(parsed.study) });
      })
      .catch((e: unknown) => live && setLoaded({ error: `The example study could not be loaded: ${e instanceof Error ? e.message : String(e)}` }));
    return () => {
      live = false;
    };
  }, []);
  if (!loaded) return <p className="text-ink-2">Loading the example…</p>;
  if ("error" in loaded) return <p className="field-error" role="alert">{loaded.error}</p>;
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
      <Studio study={loaded.study} result={loaded.result} units={units} />
    </div>
  );
}
