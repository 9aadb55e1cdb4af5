import type { KitResult, LengthUnits, RigResult, StudyResult } from "@/geometry";
import { Figure } from "./figure";
import { lengthLabel, signedLengthLabel } from "@/model/units";

/** How to set the boring rig for the cut: cutter setting, bit reach, hardware, depth stop, speed. */
export function RigSetup({ rig, units, cutDiameterMm }: { rig: RigResult | null; units: LengthUnits; cutDiameterMm: number | null }) {
  if (!rig) return <p className="text-sm text-ink-2">Choose a boring rig to get its set-up for this cut.</p>;
  const ds = rig.depthStop;
  const shims = ds.shims.length ? ds.shims.map((s) => `${s.count} × ${lengthLabel(s.thicknessMm, units)}`).join(" + ") : "no shims";
  const rpm = rig.spindleRpm;
  return (
    <div className="grid gap-2 sm:grid-cols-2" data-testid="rig-setup">
      <Figure
        label="Cutter setting (caliper across the head and the bit)"
        value={lengthLabel(rig.cutterSettingToSetMm ?? rig.cutterSettingMm, units)}
        note={`exact ${lengthLabel(rig.cutterSettingMm, units)}, rounded up to the ${lengthLabel(rig.settingResolutionMm, units)} the calipers read · cuts ${lengthLabel(rig.cutAtSettingMm ?? cutDiameterMm, units)}`}
      />
      <Figure
        label="Bit"
        tone={rig.bitReaches ? "clear" : "interfere"}
        value={rig.bitReaches ? "reaches the cut" : rig.grindOffMm > 0 ? `grind off ${lengthLabel(rig.grindOffMm, units)}` : `too short by ${lengthLabel(rig.bitTooShortByMm, units)}`}
        note={`${lengthLabel(rig.bitLengthMm, units)} bit cuts ${lengthLabel(rig.bitReachMm.min, units)} – ${lengthLabel(rig.bitReachMm.max, units)}; lengths that reach: ${lengthLabel(rig.bitLengthWindowMm.min, units)} – ${lengthLabel(rig.bitLengthWindowMm.max, units)}`}
      />
      <Figure
        label="Screw heads on the head"
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
            ? "the screw heads would hit the case before the bit cuts: lower-profile screws or a smaller head"
            : "distance from the cut radius to the outermost rotating hardware"
        }
      />
      <Figure
        label="Depth stop"
        tone={ds.reached ? "clear" : "interfere"}
        value={ds.reached ? `${ds.groove} + ${shims}` : "cannot reach"}
        note={ds.reached ? `gives ${lengthLabel(ds.travelMm, units)} for ${lengthLabel(ds.wantedMm, units)} wanted (+${lengthLabel(ds.overshootMm, units)})` : `the most travel is ${lengthLabel(ds.travelMm, units)}`}
      />
      <Figure
        label="Spindle speed"
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
      <Figure label="Holder tilt" value={`${a.tiltDeg.toFixed(3)}°`} note={`towards ${Math.round(a.directionDeg)}°`} />
      <Figure label="Rocking" value={lengthLabel(a.rockMm, units)} note="how far the readings leave one plane" />
      <Figure label="Shift at the cut's bottom" value={lengthLabel(a.lateralShiftMm, units)} note={`depth varies ${lengthLabel(a.depthVariationMm, units)} across the bottom`} />
      {cost !== null ? (
        <Figure
          label="What the tilt costs"
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
