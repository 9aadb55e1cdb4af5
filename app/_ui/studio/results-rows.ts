import type { KitResult, StudyResult } from "@/geometry";
import { TERM, type Term } from "@/model/glossary";
import { areaLabel, diameterLabel, fixedText, lengthLabel, signedLengthLabel, volumeLabel, type LengthUnits } from "@/model/units";
import { governingClearanceMm } from "@/scene/fit";

/** One figure of the results panel: the quantity, its value, a note. */
export type ResultRow = { term: Term; value: string; note?: string; testId?: string };

/** The figures of a kit's fit in the order the results panel lists them, the clearance that governs first; all from the core's result. */
export function resultRows(k: KitResult, L: StudyResult["limits"]["values"], units: LengthUnits, mouthDiameterMm: number | null): ResultRow[] {
  const c = governingClearanceMm(k);
  const f = (mm: number) => lengthLabel(mm, units);
  const minimum = `minimum ${f(L.minRadialClearanceMm)}`;
  const mouth = k.interference.vsMouth && k.interference.vsMouth.deepestMm > 0 ? `deepest at ${Math.round(k.interference.vsMouth.angleDeg)}°, ${areaLabel(k.interference.vsMouth.areaMm2, units)} overlap` : undefined;
  const rows: ResultRow[] = [];
  if (k.cut) rows.push({ term: TERM.clearanceToCut, value: signedLengthLabel(c, units), note: `${minimum}${k.alignment ? "; tilt and offset counted" : ""}`, testId: "clearance" });
  rows.push({ term: TERM.clearanceToMouth, value: signedLengthLabel(k.radialClearanceMm.vsMouth, units), note: k.cut ? mouth : [minimum, mouth].filter(Boolean).join("; "), testId: k.cut ? undefined : "clearance" });
  rows.push({ term: TERM.skirtDiameter, value: diameterLabel(k.skirt.diameterMm, units) });
  rows.push({ term: TERM.skirtProtrusion, value: f(k.skirt.protrusionMm), note: k.skirt.gasketMm > 0 ? `base gasket ${f(k.skirt.gasketMm)} counted` : "no gasket counted" });
  if (k.cut) {
    const how = k.cut.diameterProposed && k.cut.depthProposed ? "the least cut for this kit" : k.cut.proposed ? `the least ${k.cut.diameterProposed ? "diameter" : "depth"} for this kit` : "as set";
    rows.push({ term: TERM.plannedCut, value: `${diameterLabel(k.cut.diameterMm, units)} × ${f(k.cut.depthMm)} deep`, note: `${how}${k.cut.throughMouth ? "; runs through the mouth: no step is left" : ""}`, testId: "planned-cut" });
    rows.push({ term: TERM.depthClearance, value: k.depthClearanceMm === null ? "no step left" : signedLengthLabel(k.depthClearanceMm, units), note: `minimum ${f(L.minDepthClearanceMm)}` });
  }
  // The least cut once: as its own row only when the planned cut is not already it.
  if (k.leastCut && !(k.cut?.diameterProposed && k.cut.depthProposed)) rows.push({ term: TERM.leastCut, value: `${diameterLabel(k.leastCut.diameterMm, units)} × ${f(k.leastCut.depthMm)} deep` });
  if (k.thinnestWall) rows.push({ term: TERM.thinnestWall, value: `${f(k.thinnestWall.minWallMm)} at ${k.thinnestWall.label}`, note: `needs ${f(k.thinnestWall.requiredMm)}${k.thinnestWall.ok ? "" : " — too thin"}` });
  const belowMouth = mouthDiameterMm !== null && k.maxCutDiameterMm < mouthDiameterMm;
  rows.push({ term: TERM.largestCut, value: diameterLabel(k.maxCutDiameterMm, units), note: belowMouth ? "smaller than the existing mouth: a wall is already below the minimum before any cut" : undefined });
  const thread = k.studMatch.thread ? `; thread ${k.studMatch.thread.kit} on the kit, ${k.studMatch.thread.case} in the case` : "";
  rows.push({ term: TERM.studPattern, value: k.studMatch.ok ? "lines up" : `off by ${f(k.studMatch.worstOffsetMm)}`, note: thread ? thread.slice(2) : undefined });
  rows.push({
    term: TERM.crankClearance,
    value: k.crank.checked && k.crank.clearanceMm !== null ? signedLengthLabel(k.crank.clearanceMm, units) : "not checked",
    note: k.crank.checked ? `needs ${f(k.crank.requiredMm)}` : "the case profile gives no crank chamber",
  });
  const d = k.displacementCc;
  rows.push({ term: TERM.displacement, value: `${d.stockRounded} → ${d.kitRounded} cc`, note: d.crossesClasses.length ? `crosses ${d.crossesClasses.join(", ")} cc: the legal class may change` : `${d.change >= 0 ? "+" : ""}${fixedText(d.change, 1)} cc` });
  if (k.cut) rows.push({ term: TERM.removed, value: `${volumeLabel(k.removal.volumeMm3, units)}, ${k.removal.massG.toFixed(1)} g` });
  return rows;
}
