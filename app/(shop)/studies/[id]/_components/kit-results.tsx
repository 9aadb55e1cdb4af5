import type { KitResult, LengthUnits, StudyResult } from "@/geometry";
import { Cautions } from "./cautions";
import { Figure } from "./figure";
import { len, signedLen, TONE_CLASS, VERDICT } from "./fmt";
import { REASON_WORDS } from "./reasons";
import { AlignmentFigures, RigSetup } from "./rig-setup";
import { WallsTable } from "./walls-table";
import { WarningsList } from "./warnings-list";

const tone = (mm: number | null, min: number): "clear" | "tight" | "interfere" | undefined =>
  mm === null ? undefined : mm < 0 ? "interfere" : mm < min ? "tight" : "clear";

/** Everything the core says about one kit in this study, as planned. */
export function KitResults({ kit, result, units }: { kit: KitResult; result: StudyResult; units: LengthUnits }) {
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
        <Figure label="Skirt diameter (largest reading)" value={len(kit.skirt.diameterMm, units)} note={`protrudes ${len(kit.skirt.protrusionMm, units)} below the base`} />
        <Figure
          label="Against the existing mouth"
          testId="vs-mouth"
          tone={tone(kit.radialClearanceMm.vsMouth, L.minRadialClearanceMm)}
          value={interferes ? `interferes ${len(-kit.radialClearanceMm.vsMouth, units)}` : `clears ${len(kit.radialClearanceMm.vsMouth, units)}`}
          note={
            kit.interference.vsMouth && kit.interference.vsMouth.deepestMm > 0
              ? `deepest at ${Math.round(kit.interference.vsMouth.angleDeg)}°, ${kit.interference.vsMouth.areaMm2.toFixed(1)} mm² overlap`
              : "radial clearance at the deck"
          }
        />
        <Figure label="Largest cut the case takes" value={len(kit.maxCutDiameterMm, units)} note="keeping every minimum wall, at this centre and depth" />
      </div>

      <section aria-label="The cut" className="flex flex-col gap-2">
        <h3 className="font-semibold">The cut</h3>
        {cut ? (
          <div className="grid gap-2 sm:grid-cols-2 lg:grid-cols-3">
            <Figure label={`Cut diameter${cut.diameterProposed ? " (proposed)" : ""}`} value={len(cut.diameterMm, units)} testId="cut-diameter" />
            <Figure label={`Cut depth${cut.depthProposed ? " (proposed)" : ""}`} value={len(cut.depthMm, units)} note={cut.throughMouth ? "runs through the mouth: no step is left" : undefined} />
            <Figure
              label="Radial clearance to the cut"
              tone={tone(kit.effectiveRadialClearanceMm, L.minRadialClearanceMm)}
              value={signedLen(kit.radialClearanceMm.vsCut, units)}
              note={`with the tilt: ${signedLen(kit.effectiveRadialClearanceMm, units)} (minimum ${len(L.minRadialClearanceMm, units)})`}
            />
            <Figure
              label="Depth clearance under the skirt"
              tone={tone(kit.depthClearanceMm, L.minDepthClearanceMm)}
              value={signedLen(kit.depthClearanceMm, units)}
              note={`minimum ${len(L.minDepthClearanceMm, units)}`}
            />
            <Figure label="Material removed" value={`${(kit.removal.volumeMm3 / 1000).toFixed(2)} cm³`} note={`about ${kit.removal.massG.toFixed(1)} g of aluminium`} />
            <Figure
              label="Displacement"
              tone={kit.displacementCc.crossesClasses.length ? "tight" : undefined}
              value={`${kit.displacementCc.stockRounded} → ${kit.displacementCc.kitRounded} cc`}
              note={kit.displacementCc.crossesClasses.length ? `crosses ${kit.displacementCc.crossesClasses.join(", ")} cc: the legal class may change` : `+${kit.displacementCc.change.toFixed(1)} cc`}
            />
          </div>
        ) : (
          <p className="text-sm text-ink-2">
            No cut is needed for this kit: the skirt clears the mouth by at least the minimum. Displacement {kit.displacementCc.stockRounded} →{" "}
            <span className="num">{kit.displacementCc.kitRounded} cc</span>.
          </p>
        )}
        {cut ? <WallsTable walls={kit.walls} units={units} /> : null}
        {cut ? <Cautions compact /> : null}
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
          <span className="num">{len(kit.studMatch.worstOffsetMm, units)}</span>)
          {kit.studMatch.thread ? `; thread ${kit.studMatch.thread.kit} on the kit, ${kit.studMatch.thread.case} in the case` : ""}.
        </p>
      </section>

      <section aria-label="Warnings" className="flex flex-col gap-2">
        <h3 className="font-semibold">Warnings</h3>
        <WarningsList warnings={[...result.warnings, ...kit.warnings]} />
      </section>
    </div>
  );
}
