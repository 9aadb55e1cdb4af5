import type { KitResult, StudyResult } from "@/geometry";
import { fixedText, lengthLabel, signedLengthLabel, volumeLabel, type LengthUnits } from "@/model/units";
import { Figure } from "./figure";

/** A figure's colour from a clearance and its minimum. */
export const tone = (mm: number | null, min: number): "clear" | "tight" | "interfere" | undefined =>
  mm === null ? undefined : mm < 0 ? "interfere" : mm < min ? "tight" : "clear";

/** The planned cut of one kit: its size, the clearances it leaves, what it removes and the displacement. */
export function CutFigures({ kit, limits, units }: { kit: KitResult; limits: StudyResult["limits"]["values"]; units: LengthUnits }) {
  const cut = kit.cut;
  const L = limits;
  if (!cut) return null;
  return (
    <div className="grid gap-2 sm:grid-cols-2 lg:grid-cols-3">
      <Figure label={`Cut diameter${cut.diameterProposed ? " (least cut)" : ""}`} value={lengthLabel(cut.diameterMm, units)} testId="cut-diameter" />
      <Figure label={`Cut depth${cut.depthProposed ? " (least cut)" : ""}`} value={lengthLabel(cut.depthMm, units)} note={cut.throughMouth ? "runs through the mouth: no step is left" : undefined} />
      <Figure
        label="Radial clearance to the cut"
        tone={tone(kit.effectiveRadialClearanceMm, L.minRadialClearanceMm)}
        value={signedLengthLabel(kit.radialClearanceMm.vsCut, units)}
        note={`with the tilt: ${signedLengthLabel(kit.effectiveRadialClearanceMm, units)} (minimum ${lengthLabel(L.minRadialClearanceMm, units)})`}
      />
      <Figure
        label="Depth clearance under the skirt"
        tone={tone(kit.depthClearanceMm, L.minDepthClearanceMm)}
        value={signedLengthLabel(kit.depthClearanceMm, units)}
        note={`minimum ${lengthLabel(L.minDepthClearanceMm, units)}`}
      />
      <Figure label="Material removed" value={volumeLabel(kit.removal.volumeMm3, units)} note={`about ${kit.removal.massG.toFixed(1)} g of aluminium`} />
      <Figure
        label="Displacement"
        tone={kit.displacementCc.crossesClasses.length ? "tight" : undefined}
        value={`${kit.displacementCc.stockRounded} → ${kit.displacementCc.kitRounded} cc`}
        note={kit.displacementCc.crossesClasses.length ? `crosses ${kit.displacementCc.crossesClasses.join(", ")} cc: the legal class may change` : `${kit.displacementCc.change >= 0 ? "+" : ""}${fixedText(kit.displacementCc.change, 1)} cc`}
      />
    </div>
  );
}
