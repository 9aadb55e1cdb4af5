import { lateralShiftMm, tiltDeg, tiltDirectionDeg } from "./alignment";
import { skirtClearance, worstSkirtDiameterMm } from "./clearance";
import { cutWarnings } from "./cut-warnings";
import { skirtProtrusionMm } from "./depth";
import { displacementCc, roundCc, thresholdsCrossedCc } from "./displacement";
import { crankCheck, portChecks } from "./kit-checks";
import { type PlannedCut, type SkirtNeeds, leastCutFor, planKitCut } from "./kit-cut";
import type { KitResult, Warning } from "./result-schema";
import { rigSetup } from "./rig-setup";
import type { CylinderKit } from "./schema";
import { type StudyContext, axisAt } from "./study-context";
import { matchStudPattern } from "./studs";
import { threadsMatch } from "./threads";
import { ORIGIN, distance } from "./vec";
import { decideVerdict } from "./verdict";
import { thinnestWall } from "./wall";
import { messages, warning } from "./warnings";

/** The stud pattern and thread match of a kit on the case, with their warnings. */
function studCheck(kit: CylinderKit, ctx: StudyContext, warnings: Warning[]): KitResult["studMatch"] {
  const cs = ctx.study.case;
  const studs = matchStudPattern(kit.studs, cs.studs, ctx.limits.studToleranceMm, ctx.tol);
  if (!studs.ok) warnings.push(warning("stud-pattern-mismatch", messages.studMismatch(studs.worstOffsetMm, studs.sharedCaseStuds)));
  let thread: KitResult["studMatch"]["thread"] = null;
  if (kit.studThread && cs.studThread) {
    const m = threadsMatch(cs.studThread, kit.studThread, ctx.tol);
    thread = { case: m.a, kit: m.b, ok: m.ok };
    if (!m.ok) warnings.push(warning("kit-thread-differs", messages.kitThreadDiffers(m.a, m.b)));
  }
  return { ok: studs.ok, worstOffsetMm: studs.worstOffsetMm, studs: studs.studs, sharedCaseStuds: studs.sharedCaseStuds, thread };
}

/** The skirt's needs: its radius and protrusion, and how far the (tilted, offset) tool axis strays from it over the protrusion. */
function skirtNeeds(radiusMm: number, protrusionMm: number, ctx: StudyContext): SkirtNeeds & { zSkirtMm: number } {
  const skirtCenterMm = ORIGIN;
  // The skirt meets the mouth wall only down to the mouth depth; below it is the crank chamber.
  const zSkirtMm = Math.max(0, Math.min(protrusionMm, ctx.study.case.mouth.depthMm));
  const offTop = distance(axisAt(ctx, 0), skirtCenterMm);
  const offBottom = distance(axisAt(ctx, zSkirtMm), skirtCenterMm);
  return {
    skirtCenterMm,
    skirtRadiusMm: radiusMm,
    protrusionMm,
    entersCase: protrusionMm > ctx.tol,
    worstAxisOffsetMm: Math.max(offTop, offBottom),
    zWorstMm: offBottom > offTop ? zSkirtMm : 0,
    slope: ctx.plane ? Math.hypot(ctx.plane.a, ctx.plane.b) : 0,
    zSkirtMm,
  };
}

/** What the holder's tilt does to this kit's cut: tilt, rock, lateral shift at the cut's bottom (or the skirt's), depth variation, worst axis offset; null when level. */
function kitAlignment(ctx: StudyContext, needs: SkirtNeeds & { zSkirtMm: number }, planned: PlannedCut | null): KitResult["alignment"] {
  const plane = ctx.plane;
  if (!plane) return null;
  return {
    tiltDeg: tiltDeg(plane),
    directionDeg: tiltDirectionDeg(plane),
    rockMm: plane.rockMm,
    lateralShiftMm: lateralShiftMm(plane, ctx.bearing, planned ? planned.cut.depthMm : needs.zSkirtMm),
    depthVariationMm: planned?.depthVariationMm ?? 0,
    worstAxisOffsetMm: needs.worstAxisOffsetMm,
  };
}

/** Evaluates one kit on the study's case: verdict, clearances, least and planned cut, walls, rig, crank chamber, ports, displacement, removal, warnings. */
export function evaluateKit(kit: CylinderKit, ctx: StudyContext): KitResult {
  const { study, tol, limits: L, plane } = ctx;
  const cs = study.case;
  const warnings: Warning[] = [];
  const skirtDiameterMm = worstSkirtDiameterMm(kit.skirtDiameterReadingsMm);
  const depth = skirtProtrusionMm(kit);
  const needs = skirtNeeds(skirtDiameterMm / 2, depth.protrusionMm, ctx);
  const { entersCase, skirtCenterMm } = needs;

  const vsMouth = skirtClearance(skirtCenterMm, needs.skirtRadiusMm, cs.mouth.outline, tol);
  const clearsMouth = !entersCase || vsMouth.clearanceMm >= L.minRadialClearanceMm - tol;
  const studMatch = studCheck(kit, ctx, warnings);

  // The least cut that clears this kit, whatever cut is planned: the cut the core proposes when none is given.
  const leastCut = clearsMouth ? null : leastCutFor(needs, ctx);
  const planCut = !clearsMouth || study.cut?.diameterMm !== undefined || study.cut?.depthMm !== undefined;
  const planned: PlannedCut | null = planCut ? planKitCut(needs, ctx) : null;
  let rig: KitResult["rig"] = null;
  if (planned) {
    if (study.rig) rig = rigSetup(study.rig, planned.cut.diameterMm, planned.cut.depthMm, L, tol, warnings);
    warnings.push(...cutWarnings(planned, { entersCase, clearsMouth, plane }, L, tol));
  }
  const crank = crankCheck(needs.skirtRadiusMm, depth.protrusionMm, entersCase, ctx, warnings);
  const ports = portChecks(kit, planned, ctx, warnings);

  const { verdict, reasons } = decideVerdict(
    {
      studsOk: studMatch.ok,
      entersCase,
      clearsMouth,
      crankOk: crank.ok,
      cut: planned
        ? {
            effectiveRadialClearanceMm: planned.effectiveMm,
            depthClearanceMm: planned.depthClearanceMm,
            walls: planned.walls,
            diameterMm: planned.cut.diameterMm,
            maxCutDiameterMm: planned.maxCutDiameterMm,
          }
        : null,
      minRadialClearanceMm: L.minRadialClearanceMm,
      minDepthClearanceMm: L.minDepthClearanceMm,
    },
    tol,
  );

  const kitCc = displacementCc(kit.boreMm, kit.strokeMm ?? cs.strokeMm, cs.cylinders);
  const crossesClasses = thresholdsCrossedCc(ctx.stockCc, kitCc, L.displacementClassesCc);
  for (const t of crossesClasses) warnings.push(warning("displacement-crosses-class", messages.crossesClass(ctx.stockCc, kitCc, t)));
  const walls = planned?.walls ?? [];

  return {
    kitId: kit.id,
    name: kit.name,
    verdict,
    reasons,
    skirt: { centerMm: skirtCenterMm, diameterMm: skirtDiameterMm, lengthMm: depth.lengthMm, gasketMm: depth.gasketMm, protrusionMm: depth.protrusionMm },
    cut: planned?.cut ?? null,
    leastCut,
    radialClearanceMm: { vsMouth: vsMouth.clearanceMm, vsCut: planned?.vsCutMm ?? null },
    effectiveRadialClearanceMm: planned?.effectiveMm ?? null,
    depthClearanceMm: planned?.depthClearanceMm ?? null,
    interference: { vsMouth: entersCase ? vsMouth.interference : null, vsCut: planned?.interferenceVsCut ?? null },
    walls,
    thinnestWall: thinnestWall(walls),
    maxCutDiameterMm: planned?.maxCutDiameterMm ?? ctx.caseMaxCutDiameterMm,
    studMatch,
    rig,
    alignment: kitAlignment(ctx, needs, planned),
    crank,
    ports,
    displacementCc: { stock: ctx.stockCc, kit: kitCc, change: kitCc - ctx.stockCc, stockRounded: roundCc(ctx.stockCc), kitRounded: roundCc(kitCc), crossesClasses },
    removal: { ...(planned?.removed ?? { areaMm2: 0, volumeMm3: 0, massG: 0 }), densityGPerCm3: ctx.densityGPerCm3, densityDefaulted: ctx.densityDefaulted },
    warnings,
  };
}
