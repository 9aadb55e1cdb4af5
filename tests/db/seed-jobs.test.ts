// The demo's after-cut readings must be readings one real cut could give: the land left at a stud is the
// planned land less what the cut's radius grew by (half the diameter's change; plain geometry, worked by hand
// beside each check). A cut that came out small cannot leave lands thinner than planned.
import { describe, expect, it } from "vitest";
import { evaluateStudy } from "@/geometry";
import { demoAfterCutReadings, demoStudy } from "@/db/seed-jobs";

const { study, chosenKitId } = demoStudy();
const demo = demoAfterCutReadings(study, evaluateStudy(study), chosenKitId);
const plannedLand = new Map(demo.vplan.studs.map((s) => [s.label, s.plannedMm]));

describe("the demo's after-cut readings", () => {
  it("verify as meant: the set on size passes, the set cut small fails", () => {
    expect(demo.pass.verdict).toBe("pass");
    expect(demo.fail.verdict).toBe("fail");
  });

  it("a cut 0.25 mm small in diameter leaves every land about 0.125 mm thicker than planned, never thinner", () => {
    expect(Math.max(...demo.failing.cutDiameterMm)).toBeLessThan(demo.vplan.cutDiameterMm);
    for (const l of demo.failing.sealingLandMm) {
      const planned = plannedLand.get(l.stud)!;
      expect(l.valueMm).toBeGreaterThan(planned);
      // widest reading planned + 0.02 − 0.25 = 0.23 mm small: radius 0.115 mm smaller; the land is rounded to 0.01 mm (± 0.005)
      expect(Math.abs(l.valueMm - planned - 0.115)).toBeLessThanOrEqual(0.0051);
    }
  });

  it("a cut on size (widest reading 0.02 mm over) leaves lands 0.01 mm thinner than planned (± 0.005 for the rounding)", () => {
    for (const l of demo.passing.sealingLandMm) expect(Math.abs(plannedLand.get(l.stud)! - l.valueMm - 0.01)).toBeLessThanOrEqual(0.0051);
  });
});
