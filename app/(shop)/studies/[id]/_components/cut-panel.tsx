"use client";

import type { CutResult, LengthUnits } from "@/geometry";
import { PairInputs } from "@/app/_ui/form/pair-inputs";
import { TextField } from "@/app/_ui/form/text-field";
import { len } from "./fmt";
import type { StudyFormValues } from "./study-values";

/** The cut plan: diameter and depth (blank: the core proposes them per kit), and the centring offset. */
export function CutPanel({ units, cut }: { units: LengthUnits; cut: CutResult | null }) {
  return (
    <section className="card flex flex-col gap-4 p-4" aria-label="Cut plan">
      <h2 className="font-semibold">Cut plan</h2>
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField<StudyFormValues>
          name="cut.diameterMm"
          label="Cut diameter"
          unit={units}
          numeric
          placeholder={cut?.diameterProposed ? len(cut.diameterMm, units) : "proposed"}
          hint={cut?.diameterProposed ? `Blank: proposed ${len(cut.diameterMm, units)} for the kit shown.` : "Blank: the least cut that clears."}
        />
        <TextField<StudyFormValues>
          name="cut.depthMm"
          label="Cut depth"
          unit={units}
          numeric
          placeholder={cut?.depthProposed ? len(cut.depthMm, units) : "proposed"}
          hint={cut?.depthProposed ? `Blank: proposed ${len(cut.depthMm, units)}.` : "Blank: deep enough for the skirt."}
        />
      </div>
      <div>
        <span className="field-label">Centring offset of the rig&apos;s axis from the stud-pattern centre</span>
        <div className="mt-1">
          <PairInputs<StudyFormValues> name="cut.centerOffsetMm" label="Centring offset" units={units} />
        </div>
        <p className="field-hint">Blank: centred on the studs. Cut the least that clears, centred on the actual cylinder.</p>
      </div>
    </section>
  );
}
