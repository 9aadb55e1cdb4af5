import type { KitResult, LengthUnits, StudyResult } from "@/geometry";
import { CutFigures, tone } from "./cut-figures";
import { Figure } from "./figure";
import { areaLabel, lengthLabel } from "@/model/units";
import { TONE_CLASS, VERDICT } from "./verdict-words";
import { REASON_WORDS } from "./reasons";
import { AlignmentFigures, RigSetup } from "./rig-setup";
import { WallsTable } from "./walls-table";
import { WarningsList } from "./warnings-list";

/** Everything the core says about one kit in this study, as planned. */
export function KitResults({ kit, result, units, mouthDiameterMm }: { kit: KitResult; result: StudyResult; units: LengthUnits; mouthDiameterMm: number | null }) {
  const v = VERDICT[kit.verdict];
  const L = result.limits.values;
  const cut = kit.cut;
  const interferes = kit.radialClearanceMm.vsMouth < 0;
  return (
    <div className="flex flex-col gap-4" data-testid="kit-results">
      <div className={`rounded-md border-l-4 px-4 py-3 ${TONE_CLASS[v.tone]}`} data-testid="verdict">
        <p className="text-lg font-semibold">
          {kit.name}: {v.words}
        </p>
        <p className="text-sm">{kit.reasons.map((r) => REASON_WORDS[r]).join("; ")}.</p>
      </div>

      <div className="grid gap-2 sm:grid-cols-2 lg:grid-cols-3">
        <Figure label="Skirt diameter (largest reading)" value={lengthLabel(kit.skirt.diameterMm, units)} note={`protrudes ${lengthLabel(kit.skirt.protrusionMm, units)} below the base`} />
        <Figure
          label="Against the existing mouth"
          testId="vs-mouth"
          tone={tone(kit.radialClearanceMm.vsMouth, L.minRadialClearanceMm)}
          value={interferes ? `interferes ${lengthLabel(-kit.radialClearanceMm.vsMouth, units)}` : `clears ${lengthLabel(kit.radialClearanceMm.vsMouth, units)}`}
          note={
            kit.interference.vsMouth && kit.interference.vsMouth.deepestMm > 0
              ? `deepest at ${Math.round(kit.interference.vsMouth.angleDeg)}°, ${areaLabel(kit.interference.vsMouth.areaMm2, units)} overlap`
              : "radial clearance at the deck"
          }
        />
        <Figure
          label="Largest cut the case takes"
          value={lengthLabel(kit.maxCutDiameterMm, units)}
          tone={mouthDiameterMm !== null && kit.maxCutDiameterMm < mouthDiameterMm ? "interfere" : undefined}
          note={
            mouthDiameterMm !== null && kit.maxCutDiameterMm < mouthDiameterMm
              ? `smaller than the existing mouth (${lengthLabel(mouthDiameterMm, units)}): a wall is already below the minimum before any cut`
              : "keeping every minimum wall, at this centre and depth"
          }
        />
      </div>

      <section aria-label="The cut" className="flex flex-col gap-2">
        <h3 className="font-semibold">The cut</h3>
        {cut ? (
          <CutFigures kit={kit} limits={L} units={units} />
        ) : (
          <p className="text-sm text-ink-2">
            No cut is needed for this kit: the skirt clears the mouth by at least the minimum. Displacement {kit.displacementCc.stockRounded} →{" "}
            <span className="num">{kit.displacementCc.kitRounded} cc</span>.
          </p>
        )}
        {cut ? <WallsTable walls={kit.walls} units={units} /> : null}
      </section>

      <section aria-label="Rig set-up" className="flex flex-col gap-2">
        <h3 className="font-semibold">Rig set-up</h3>
        {cut ? <RigSetup rig={kit.rig} units={units} cutDiameterMm={cut.diameterMm} /> : <p className="text-sm text-ink-2">No cut, nothing to set.</p>}
      </section>

      <section aria-label="Alignment" className="flex flex-col gap-2">
        <h3 className="font-semibold">Alignment</h3>
        <AlignmentFigures a={kit.alignment} units={units} kit={kit} limits={L} />
      </section>

      <section aria-label="Stud pattern" className="text-sm">
        <h3 className="font-semibold">Stud pattern</h3>
        <p className={kit.studMatch.ok ? "text-clear" : "text-interfere"}>
          {kit.studMatch.ok ? "✓ The kit's studs line up with the case's" : "✕ The kit's studs do not line up with this case"} (worst offset{" "}
          <span className="num">{lengthLabel(kit.studMatch.worstOffsetMm, units)}</span>)
          {kit.studMatch.thread ? `; thread ${kit.studMatch.thread.kit} on the kit, ${kit.studMatch.thread.case} in the case` : ""}.
        </p>
      </section>

      <section aria-label="Warnings" className="flex flex-col gap-2">
        <h3 className="font-semibold">Warnings</h3>
        <WarningsList warnings={[...result.warnings, ...kit.warnings]} units={units} />
      </section>
    </div>
  );
}
