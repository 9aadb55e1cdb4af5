import type { KitResult, LengthUnits, RigResult } from "@/geometry";
import { Figure } from "./figure";
import { len } from "./fmt";

/** How to set the boring rig for the cut: cutter setting, bit reach, hardware, depth stop, speed. */
export function RigSetup({ rig, units, cutDiameterMm }: { rig: RigResult | null; units: LengthUnits; cutDiameterMm: number | null }) {
  if (!rig) return <p className="text-sm text-ink-2">Choose a boring rig to get its set-up for this cut.</p>;
  const ds = rig.depthStop;
  const shims = ds.shims.length ? ds.shims.map((s) => `${s.count} × ${len(s.thicknessMm, units)}`).join(" + ") : "no shims";
  const rpm = rig.spindleRpm;
  return (
    <div className="grid gap-2 sm:grid-cols-2" data-testid="rig-setup">
      <Figure
        label="Cutter setting (caliper across the head and the bit)"
        value={len(rig.cutterSettingMm, units)}
        note={`read to ${len(rig.settingResolutionMm, units)} · gives a ${len(cutDiameterMm, units)} cut`}
      />
      <Figure
        label="Bit"
        tone={rig.bitReaches ? "clear" : "interfere"}
        value={rig.bitReaches ? "reaches the cut" : rig.grindOffMm > 0 ? `grind off ${len(rig.grindOffMm, units)}` : `too short by ${len(rig.bitTooShortByMm, units)}`}
        note={`${len(rig.bitLengthMm, units)} bit cuts ${len(rig.bitReachMm.min, units)} – ${len(rig.bitReachMm.max, units)}; lengths that reach: ${len(rig.bitLengthWindowMm.min, units)} – ${len(rig.bitLengthWindowMm.max, units)}`}
      />
      <Figure
        label="Screw heads on the head"
        tone={rig.hardwareClears === null ? undefined : rig.hardwareClears ? "clear" : "interfere"}
        value={rig.hardwareClearanceMm === null ? "not given" : rig.hardwareClears ? `clear by ${len(rig.hardwareClearanceMm, units)}` : `strike: ${len(rig.hardwareClearanceMm, units)}`}
        note="distance from the cut radius to the outermost rotating hardware"
      />
      <Figure
        label="Depth stop"
        tone={ds.reached ? "clear" : "interfere"}
        value={ds.reached ? `${ds.groove} + ${shims}` : "cannot reach"}
        note={ds.reached ? `gives ${len(ds.travelMm, units)} for ${len(ds.wantedMm, units)} wanted (+${len(ds.overshootMm, units)})` : `the most travel is ${len(ds.travelMm, units)}`}
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
export function AlignmentFigures({ a, units }: { a: KitResult["alignment"]; units: LengthUnits }) {
  if (!a) return <p className="text-sm text-ink-2">Enter holder heights at three or more studs to see the tilt.</p>;
  return (
    <div className="grid gap-2 sm:grid-cols-3">
      <Figure label="Holder tilt" value={`${a.tiltDeg.toFixed(3)}°`} note={`towards ${Math.round(a.directionDeg)}°`} />
      <Figure label="Rocking" value={len(a.rockMm, units)} note="how far the readings leave one plane" />
      <Figure label="Shift at the cut's bottom" value={len(a.lateralShiftMm, units)} note={`depth varies ${len(a.depthVariationMm, units)} across the bottom`} />
    </div>
  );
}
