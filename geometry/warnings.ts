import type { Warning, WarningCode } from "./result-schema";

const mm = (v: number) => `${v.toFixed(2)} mm`;

/** A warning with its plain-words message. */
export function warning(code: WarningCode, message: string): Warning {
  return { code, message };
}

/** Plain-words messages, one builder per warning code that carries numbers. */
export const messages = {
  studMismatch: (offsetMm: number, shared: readonly string[]) =>
    shared.length > 0
      ? `The kit's stud pattern differs from the case's: more than one kit stud lands on case stud ${shared.join(", ")}. Cylinder, head and gasket will not interchange, whatever the cut.`
      : `The kit's studs are up to ${mm(offsetMm)} away from the case's studs. This kit is made for another stud pattern; no cut fixes that.`,
  bitTooLong: (grindMm: number, cutMm: number) =>
    `The installed bit is too long to cut ${mm(cutMm)}: grind at least ${mm(grindMm)} off it, or fit a shorter bit.`,
  bitTooShort: (byMm: number, cutMm: number) => `The installed bit is too short to reach ${mm(cutMm)}: fit a bit at least ${mm(byMm)} longer.`,
  hardwareStrikes: (clearMm: number, marginMm: number) =>
    clearMm < 0
      ? `The screw heads on the cutter head reach ${mm(-clearMm)} past the cut radius (they should stay ${mm(marginMm)} inside it): they will strike the case before the bit cuts. Use lower-profile screws or a smaller head.`
      : `The screw heads on the cutter head come within ${mm(clearMm)} of the cut radius (margin wanted ${mm(marginMm)}): they will strike the case before the bit cuts. Use lower-profile screws or a smaller head.`,
  threadMismatch: (caseThread: string, rigThread: string) =>
    `The case studs are ${caseThread} but the rig's studs or nuts are ${rigThread}: they will not thread on. Do not force them.`,
  kitThreadDiffers: (caseThread: string, kitThread: string) =>
    `The kit wants ${kitThread} studs but the case is threaded ${caseThread}: the case must be re-threaded or the kit's studs changed.`,
  tiltEats: (nominalMm: number, effectiveMm: number, tiltDeg: number) =>
    `The holder is tilted ${tiltDeg.toFixed(3)}°: the clearance of ${mm(nominalMm)} on paper becomes ${mm(effectiveMm)} on the worst side. Level the holder (even up the spacers) before cutting.`,
  depthStopUnreachable: (wantedMm: number, bestMm: number) =>
    `No groove and shim stack gives the wanted depth of ${mm(wantedMm)}; the deepest travel available is ${mm(bestMm)}. Cut a deeper groove or change the spacers.`,
  radialBelowMin: (clearMm: number, minMm: number) =>
    clearMm < 0
      ? `The skirt would hit the cut by ${mm(-clearMm)} on its worst side.`
      : `Radial clearance of ${mm(clearMm)} is below the minimum of ${mm(minMm)}.`,
  depthBelowMin: (clearMm: number, minMm: number) =>
    clearMm < 0
      ? `The cut is ${mm(-clearMm)} too shallow: the skirt will bottom on the step before the cylinder seats on its gasket.`
      : `Depth clearance of ${mm(clearMm)} is below the minimum of ${mm(minMm)}.`,
  wallBelowMin: (label: string, wallMm: number, minMm: number) => `Only ${mm(wallMm)} of wall would remain to ${label} (minimum ${mm(minMm)}).`,
  landBelowMin: (label: string, wallMm: number, minMm: number) =>
    `Only ${mm(wallMm)} of sealing land would remain at stud ${label} (minimum ${mm(minMm)}); once it is gone the base gasket leaks and only a new case fixes it.`,
  breaksPocket: (label: string, byMm: number) => `The cut breaks ${mm(byMm)} into ${label}.`,
  breaksStud: (label: string, byMm: number) => `The cut breaks ${mm(byMm)} into the hole of stud ${label}.`,
  breaksDeck: (byMm: number) => `The cut breaks ${mm(byMm)} through the outside of the case.`,
  throughMouth: () =>
    "The cut reaches the full depth of the mouth and opens into the crank chamber: check the bit and crank clear, and remove every chip from the crankcase before assembly.",
  cutNotNeeded: () => "The skirt already clears the existing mouth: no cut is needed. Cut the least that clears.",
  crossesClass: (fromCc: number, toCc: number, classCc: number) =>
    `Displacement goes from ${fromCc.toFixed(1)} cc to ${toCc.toFixed(1)} cc, across the ${classCc} cc class. This may change the vehicle's legal class; local rules decide.`,
  drillTooSlow: (topRpm: number, minRpm: number) =>
    `The drill's top speed of ${Math.round(topRpm)} min⁻¹ is below the ${Math.round(minRpm)} min⁻¹ the cutting speed wants: the cut will be slow and rough.`,
  holderRocks: (rockMm: number, maxMm: number) =>
    `The holder readings disagree by up to ${mm(rockMm)} from a flat plane (more than ${mm(maxMm)}): the holder rocks or a reading is wrong. Re-seat the holder and measure again.`,
  crankNotChecked: () =>
    "The case profile gives no crank chamber (deck to crank axis, web radius, web span): the skirt's clearance to the crank webs was not checked. Measure them, or check by hand before assembly.",
  crankBelowMin: (clearMm: number, minMm: number) =>
    clearMm < 0
      ? `The skirt's lower edge reaches ${mm(-clearMm)} into the path of the crank webs: the crank would strike it. No counterbore fixes that; a shorter skirt or a different crank does.`
      : `The skirt's lower edge clears the crank webs by only ${mm(clearMm)} (minimum ${mm(minMm)}).`,
  matchedWallBelowMin: (port: string, passage: string | null, wallMm: number, minMm: number) =>
    wallMm < 0
      ? `If ${passage ?? "a passage"} were opened to match port ${port}, the cut would break ${mm(-wallMm)} into it: match the port less, or cut smaller.`
      : `If ${passage ?? "a passage"} were opened to match port ${port}, only ${mm(wallMm)} of wall would remain to the cut (minimum ${mm(minMm)}).`,
  readingsInsufficient: () => "At least three holder readings at studs not on one line are needed to check the holder's tilt; the tilt is not accounted for.",
};
