import type { KitResult, StudyResult } from "@/geometry";
import type { Money } from "@/model/money";

export type LineupRow = {
  kitId: string;
  name: string;
  kit: KitResult;
  /** The library kit's price, for display and sorting only. */
  price: Money | null;
  /** The least cut this kit needs, from the core's proposal (null: no cut needed). */
  needDiameterMm: number | null;
  needDepthMm: number | null;
  thinnestWallMm: number | null;
  thinnestWhere: string;
  rigOk: boolean | null;
  rigText: string;
};

const WHERE = { stud: "at stud", pocket: "to", outline: "to the outside" } as const;

/** One lineup row per kit, from the evaluation in which the core proposed each kit's own cut. */
export function lineupRows(needed: StudyResult, prices: Readonly<Record<string, Money | undefined>>): LineupRow[] {
  return needed.kits.map((k) => {
    const w = k.thinnestWall;
    const rig = k.rig;
    const problems = rig
      ? [
          !rig.bitReaches ? (rig.grindOffMm > 0 ? "bit too long" : "bit too short") : null,
          rig.hardwareClears === false ? "screw heads strike" : null,
          !rig.depthStop.reached ? "depth stop short" : null,
          rig.spindleRpm.drillTooSlow ? "drill too slow" : null,
        ].filter((x): x is string => Boolean(x))
      : [];
    return {
      kitId: k.kitId,
      name: k.name,
      kit: k,
      price: prices[k.kitId] ?? null,
      needDiameterMm: k.cut?.diameterMm ?? null,
      needDepthMm: k.cut?.depthMm ?? null,
      thinnestWallMm: w ? w.minWallMm : null,
      thinnestWhere: w ? `${WHERE[w.kind]}${w.kind === "outline" ? "" : ` ${w.label}`}` : "",
      // A kit that cannot fit is not going to be cut: the rig is not judged for it.
      rigOk: k.cut === null || k.verdict === "cannot-fit" ? null : rig ? problems.length === 0 : null,
      rigText: k.cut === null ? "no cut needed" : k.verdict === "cannot-fit" ? "—" : !rig ? "no rig chosen" : problems.length ? problems.join(", ") : "can make this cut",
    };
  });
}
