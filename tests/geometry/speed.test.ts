// Spindle speed n = 1000·Vc/(π·D) (Tungaloy technical data, turning formulas) against the drill's top speed.
import { describe, expect, it } from "vitest";
import { spindleSpeed } from "../../geometry/speed";

describe("the spindle-speed window against the drill", () => {
  // A Ø57 mm cut at 100–150 m/min: 1000·100/(π·57) = 558.44 and 1000·150/(π·57) = 837.66 min⁻¹.
  const lo = (1000 * 100) / (Math.PI * 57);
  const hi = (1000 * 150) / (Math.PI * 57);

  it("spans 558.44 to 837.66 min⁻¹ for a Ø57 mm cut at 100–150 m/min", () => {
    const s = spindleSpeed(57, 100, 150, 2800);
    expect(s.min).toBeCloseTo(558.44, 2);
    expect(s.max).toBeCloseTo(837.66, 2);
    expect(s.drillTopRpm).toBe(2800);
  });

  it("a drill faster than the window's top is neither limited nor too slow", () => {
    expect(spindleSpeed(57, 100, 150, 2800)).toMatchObject({ drillLimited: false, drillTooSlow: false });
    // Exactly at the top: not limited.
    expect(spindleSpeed(57, 100, 150, hi)).toMatchObject({ drillLimited: false, drillTooSlow: false });
  });

  it("a drill inside the window is limited; below its bottom it is also too slow; exactly at the bottom it is not", () => {
    expect(spindleSpeed(57, 100, 150, 700)).toMatchObject({ drillLimited: true, drillTooSlow: false });
    expect(spindleSpeed(57, 100, 150, 500)).toMatchObject({ drillLimited: true, drillTooSlow: true });
    expect(spindleSpeed(57, 100, 150, lo)).toMatchObject({ drillLimited: true, drillTooSlow: false });
  });
});
