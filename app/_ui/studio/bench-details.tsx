"use client";

import { memo } from "react";
import type { KitResult, StudyResult } from "@/geometry";
import type { LengthUnits } from "@/model/units";
import { AlignmentFigures, RigSetup } from "./rig-setup";
import { WallsTable } from "./walls-table";

/**
 * What the bench needs beyond the fit figures beside the view: the wall left at every stud and pocket, how to
 * set the rig, and what the holder's tilt costs. Shown once, under the cut it belongs to.
 */
export const BenchDetails = memo(function BenchDetails({ kit, result, units }: { kit: KitResult; result: StudyResult; units: LengthUnits }) {
  const cut = kit.cut;
  return (
    <div className="grid gap-4" data-testid="bench-details">
      <section aria-label="Walls left by the cut" className="card flex flex-col gap-2 p-4">
        <h2 className="font-semibold">Walls left by the cut</h2>
        {cut ? <WallsTable walls={kit.walls} units={units} /> : <p className="text-sm text-ink-2">No cut, so no wall is touched.</p>}
      </section>
      <section aria-label="Rig set-up" className="card flex flex-col gap-2 p-4">
        <h2 className="font-semibold">Rig set-up</h2>
        {cut ? <RigSetup rig={kit.rig} units={units} cutDiameterMm={cut.diameterMm} /> : <p className="text-sm text-ink-2">No cut, nothing to set.</p>}
      </section>
      <section aria-label="Alignment" className="card flex flex-col gap-2 p-4">
        <h2 className="font-semibold">Alignment</h2>
        <AlignmentFigures a={kit.alignment} units={units} kit={kit} limits={result.limits.values} />
      </section>
    </div>
  );
});
