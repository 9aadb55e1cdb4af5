"use client";

import type { LengthUnits } from "@/geometry";
import type { Money } from "@/model/money";
import type { CaseRow } from "../../../../_ui/query/types";
import type { Evaluation } from "./assemble";
import { caseFromRow } from "./assemble";
import { lineupRows } from "./lineup-rows";
import { LineupTable } from "./lineup-table";
import { WindowChart } from "./window-chart";

/** The lineup: the window chart above, the sortable table of all kits below. */
export function LineupView({
  shown,
  units,
  prices,
  chosen,
  onChoose,
  mouthRow,
}: {
  shown: Extract<Evaluation, { ok: true }> | null;
  units: LengthUnits;
  prices: Readonly<Record<string, Money | undefined>>;
  chosen: string;
  onChoose: (kitId: string) => void;
  mouthRow: CaseRow | null;
}) {
  if (!shown) return <p className="text-ink-2">The lineup appears once the study can be evaluated.</p>;
  const rows = lineupRows(shown.needed, prices);
  const mouth = mouthRow ? caseFromRow(mouthRow).mouth.outline : null;
  const mouthDiameterMm = mouth?.kind === "circle" ? mouth.diameterMm : null;
  return (
    <div className="flex min-w-0 flex-col gap-4">
      <WindowChart rows={rows} result={shown.needed} mouthDiameterMm={mouthDiameterMm} units={units} />
      <p className="text-sm text-ink-2">
        Each kit at the smallest cut that clears it by the shop&apos;s minimum{shown.study.cut?.centerOffsetMm ? ", with the study's centring offset" : ""}. Click a
        column to sort; mark the kit the shop recommends as the choice.
      </p>
      <LineupTable rows={rows} units={units} chosen={chosen} onChoose={onChoose} />
    </div>
  );
}
