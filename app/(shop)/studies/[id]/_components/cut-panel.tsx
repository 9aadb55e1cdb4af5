"use client";

import type { KitResult } from "@/geometry";
import { PairInputs } from "@/app/_ui/form/pair-inputs";
import { TextField } from "@/app/_ui/form/text-field";
import { stepNote } from "@/app/_ui/studio/cut-card";
import { TERM } from "@/model/glossary";
import { lengthLabel, type LengthUnits } from "@/model/units";
import type { StudyFormValues } from "./study-values";

/** The cut plan: diameter and depth (blank: each kit's least cut, which follows the readings), and the centring offset. */
export function CutPanel({ units, kit }: { units: LengthUnits; kit: KitResult | null }) {
  const least = kit?.leastCut ?? null;
  return (
    <section className="card flex flex-col gap-4 p-4" aria-label="Cut plan">
      <h2 className="font-semibold">Cut plan</h2>
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField<StudyFormValues>
          name="cut.diameterMm"
          label={TERM.cutDiameter.label}
          unit={units}
          numeric
          placeholder={least ? `least cut ${lengthLabel(least.diameterMm, units)}` : "least cut"}
          hint={least ? `Blank: the least cut for ${kit?.name}, ${lengthLabel(least.diameterMm, units)} now; it follows the readings until you type a number, and ${kit ? stepNote(kit, units) : ""}.` : "Blank: the least cut that clears."}
        />
        <TextField<StudyFormValues>
          name="cut.depthMm"
          label={TERM.cutDepth.label}
          unit={units}
          numeric
          placeholder={least ? `least ${lengthLabel(least.depthMm, units)}` : "least depth"}
          hint={least ? `Blank: ${lengthLabel(least.depthMm, units)}, deep enough for the skirt.` : "Blank: deep enough for the skirt."}
        />
      </div>
      <div>
        <span className="field-label">Centring offset of the rig&apos;s axis from the stud-pattern centre</span>
        <div className="mt-1">
          <PairInputs<StudyFormValues> name="cut.centerOffsetMm" label="Centring offset" units={units} />
        </div>
        <p className="field-hint">Blank: on the stud-pattern centre, which is where the new cylinder sits. Enter an offset only when the rig&apos;s axis cannot sit there; every figure is then worked out about that axis.</p>
      </div>
    </section>
  );
}
