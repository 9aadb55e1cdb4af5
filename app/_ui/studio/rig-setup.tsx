import type { KitResult, LengthUnits, RigResult, StudyResult } from "@/geometry";
import { depthStopSentence, shimBreakdown } from "@/model/depth-stop-words";
import { TERM } from "@/model/glossary";
import { lengthLabel, signedLengthLabel } from "@/model/units";
import { Figure } from "./figure";

/** How to set the boring rig for the cut: cutter setting, bit reach, the cutter head's screws, depth stop, speed. */
export function RigSetup({ rig, units, cutDiameterMm }: { rig: RigResult | null; units: LengthUnits; cutDiameterMm: number | null }) {
  if (!rig) return <p className="text-sm text-ink-2">Choose a boring rig to get its set-up for this cut.</p>;
  const ds = rig.depthStop;
  const rpm = rig.spindleRpm;
  return (
    <div className="grid gap-2 sm:grid-cols-2" data-testid="rig-setup">
      <Figure
        label={TERM.cutterSetting.label}
        value={lengthLabel(rig.cutterSettingToSetMm ?? rig.cutterSettingMm, units)}
        note={`exact ${lengthLabel(rig.cutterSettingMm, units)}, rounded up to the ${lengthLabel(rig.settingResolutionMm, units)} the caliper reads · cuts ${lengthLabel(rig.cutAtSettingMm ?? cutDiameterMm, units)}`}
      />
      <Figure
        label={TERM.bit.label}
        tone={rig.bitReaches ? "clear" : "interfere"}
        value={rig.bitReaches ? "reaches the cut" : rig.grindOffMm > 0 ? `grind off ${lengthLabel(rig.grindOffMm, units)}` : `too short by ${lengthLabel(rig.bitTooShortByMm, units)}`}
        note={`${lengthLabel(rig.bitLengthMm, units)} bit cuts ${lengthLabel(rig.bitReachMm.min, units)} – ${lengthLabel(rig.bitReachMm.max, units)}; lengths that reach: ${lengthLabel(rig.bitLengthWindowMm.min, units)} – ${lengthLabel(rig.bitLengthWindowMm.max, units)}`}
      />
      <Figure
        label={TERM.screwHeads.label}
        tone={rig.hardwareClears === null ? undefined : rig.hardwareClears ? "clear" : "interfere"}
        value={
          rig.hardwareClearanceMm === null
            ? "not given"
            : rig.hardwareClears
              ? `clear by ${lengthLabel(rig.hardwareClearanceMm, units)}`
              : rig.hardwareClearanceMm < 0
                ? `strike: ${lengthLabel(-rig.hardwareClearanceMm, units)} past the cut`
                : `strike: only ${lengthLabel(rig.hardwareClearanceMm, units)} inside the cut`
        }
        note={
          rig.hardwareClears === false
            ? "the cutter head's screw heads would hit the case before the bit cuts: lower-profile screws or a smaller head"
            : "from the outermost screw heads on the cutter head to the cut's edge"
        }
      />
      <Figure
        label={TERM.depthStop.label}
        testId="depth-stop"
        tone={ds.reached ? "clear" : "interfere"}
        value={depthStopSentence(ds, units)}
        note={ds.reached ? [shimBreakdown(ds, units), `${lengthLabel(ds.wantedMm, units)} wanted, ${lengthLabel(ds.overshootMm, units)} over`].filter(Boolean).join(" · ") : undefined}
      />
      <Figure
        label={TERM.spindleSpeed.label}
        tone={rpm.drillTooSlow ? "tight" : undefined}
        value={`${Math.round(rpm.min)} – ${Math.round(rpm.max)} rpm`}
        note={`drill tops out at ${Math.round(rpm.drillTopRpm)} rpm${rpm.drillLimited ? " (limits the speed)" : ""}`}
      />
    </div>
  );
}

/** The holder's tilt and what it costs. */
export function AlignmentFigures({ a, units, kit, limits }: { a: KitResult["alignment"]; units: LengthUnits; kit?: KitResult; limits?: StudyResult["limits"]["values"] }) {
  if (!a) return <p className="text-sm text-ink-2">Enter holder heights at three or more studs to see the tilt.</p>;
  // What the tilt (and any centring offset) takes off the radial clearance to the cut.
  const asCut = kit?.radialClearanceMm.vsCut ?? null;
  const withTilt = kit?.effectiveRadialClearanceMm ?? null;
  const cost = asCut !== null && withTilt !== null ? Math.max(0, asCut - withTilt) : null;
  const rocks = limits ? a.rockMm > limits.maxRockMm : false;
  const short = limits && withTilt !== null ? withTilt < limits.minRadialClearanceMm : false;
  return (
    <div className="grid gap-2 sm:grid-cols-2 lg:grid-cols-4">
      <Figure label={TERM.holderTilt.label} value={`${a.tiltDeg.toFixed(3)}°`} note={`toward ${Math.round(a.directionDeg)}°`} />
      <Figure label={TERM.holderRock.label} value={lengthLabel(a.rockMm, units)} note="how far the readings leave one plane" />
      <Figure label={TERM.axisShift.label} value={lengthLabel(a.lateralShiftMm, units)} note={`depth varies ${lengthLabel(a.depthVariationMm, units)} across the bottom`} />
      {cost !== null ? (
        <Figure
          label={TERM.tiltCost.label}
          testId="tilt-cost"
          tone={rocks || short ? "tight" : "clear"}
          value={`${lengthLabel(cost, units)} of clearance`}
          note={
            rocks
              ? "the holder rocks: re-seat it and read again before cutting"
              : short
                ? `leaves ${signedLengthLabel(withTilt, units)}: shim the holder level before cutting`
                : `leaves ${signedLengthLabel(withTilt, units)}: no shim needed`
          }
        />
      ) : null}
    </div>
  );
}
