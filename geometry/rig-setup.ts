import { chooseDepthStop } from "./depth-stop";
import { DEFAULT_SETTING_RESOLUTION_MM } from "./limits";
import type { ResolvedLimits } from "./resolve-limits";
import type { RigResult, Warning } from "./result-schema";
import { checkBit, cutDiameterFromSettingMm, cutterSettingMm, hardwareClearanceMm } from "./rig";
import type { BoringRig } from "./schema";
import { spindleSpeed } from "./speed";
import { cleanDecimal, roundUpTo } from "./tolerance";
import { messages, warning } from "./warnings";

/** The rig's set-up for a cut (setting, bit, hardware, depth stop, speed), adding a warning for each thing the rig cannot do. */
export function rigSetup(rig: BoringRig, diameterMm: number, depthMm: number, L: ResolvedLimits["values"], tol: number, warnings: Warning[]): RigResult {
  const bit = checkBit(diameterMm, rig, tol);
  if (!bit.reaches) {
    warnings.push(
      warning("bit-cannot-reach", bit.grindOffMm > 0 ? messages.bitTooLong(bit.grindOffMm, diameterMm) : messages.bitTooShort(bit.tooShortByMm, diameterMm)),
    );
  }
  let hardwareClearance: number | null = null;
  let hardwareClears: boolean | null = null;
  if (rig.hardwareRadiusMm !== undefined) {
    hardwareClearance = hardwareClearanceMm(diameterMm, rig.hardwareRadiusMm);
    hardwareClears = hardwareClearance >= L.hardwareMarginMm - tol;
    if (!hardwareClears) warnings.push(warning("hardware-strikes", messages.hardwareStrikes(hardwareClearance, L.hardwareMarginMm)));
  }
  const depthStop = chooseDepthStop(depthMm, rig, tol);
  if (!depthStop.reached) warnings.push(warning("depth-stop-unreachable", messages.depthStopUnreachable(depthMm, depthStop.travelMm)));
  const speed = spindleSpeed(diameterMm, L.cuttingSpeedMinMPerMin, L.cuttingSpeedMaxMPerMin, rig.drillTopRpm);
  if (speed.drillTooSlow) warnings.push(warning("drill-too-slow", messages.drillTooSlow(speed.drillTopRpm, speed.min)));
  const resolutionMm = rig.settingResolutionMm ?? DEFAULT_SETTING_RESOLUTION_MM;
  const toSetMm = cleanDecimal(roundUpTo(cutterSettingMm(diameterMm, rig.headDiameterMm), resolutionMm, tol));
  return {
    cutterSettingMm: cutterSettingMm(diameterMm, rig.headDiameterMm),
    cutterSettingToSetMm: toSetMm,
    cutAtSettingMm: cleanDecimal(cutDiameterFromSettingMm(toSetMm, rig.headDiameterMm)),
    settingResolutionMm: resolutionMm,
    bitLengthMm: rig.bitLengthMm,
    bitReachMm: bit.reachMm,
    bitReaches: bit.reaches,
    bitLengthWindowMm: bit.windowMm,
    grindOffMm: bit.grindOffMm,
    bitTooShortByMm: bit.tooShortByMm,
    hardwareClearanceMm: hardwareClearance,
    hardwareClears,
    depthStop,
    spindleRpm: speed,
  };
}
