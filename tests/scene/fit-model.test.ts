import { describe, expect, it } from "vitest";
import { evaluateStudy } from "@/geometry";
import { caseGeometry, cutGeometry, fitState, interferenceGeometry, skirtGeometry } from "@/scene/fit-model";
import { outlineRing } from "@/scene/outline";
import { regionsArea } from "@/scene/regions";
import { coreExtent, meshVolume } from "@/scene/solids";
import { polygonStudy, roundStudy } from "./fixtures";

// The meshes are checked against the core's own figures (StudyResult), which tests/geometry checks
// against published sources; here the only question is whether the drawing matches the numbers.
// A circle is drawn as an inscribed polygon of at least 48 sides, so areas carry up to about 0.3 % error.

for (const [name, make] of [["round", roundStudy], ["polygon", polygonStudy]] as const) {
  describe(`the fit solids of a ${name} case`, () => {
    it("draw the counterbore at the core's radius and depth, on the core's axis", () => {
      const study = make();
      const k = evaluateStudy(study).kits[0];
      expect(k.cut).not.toBeNull();
      const g = cutGeometry(k)!;
      const e = coreExtent(g, k.cut!.centerAtDeckMm);
      expect(e.zMin).toBeCloseTo(0, 5);
      expect(e.zMax).toBeCloseTo(k.cut!.depthMm, 4);
      // The bottom ring is shifted to the bottom centre; the top ring alone bounds the radius at the top centre.
      expect(e.radiusMax).toBeGreaterThanOrEqual(k.cut!.diameterMm / 2 - 1e-4);
      expect(e.radiusMax).toBeLessThan(k.cut!.diameterMm / 2 + Math.hypot(k.cut!.centerAtBottomMm[0] - k.cut!.centerAtDeckMm[0], k.cut!.centerAtBottomMm[1] - k.cut!.centerAtDeckMm[1]) + 1e-4);
      const area = (Math.PI * k.cut!.diameterMm ** 2) / 4;
      expect(meshVolume(g) / (area * k.cut!.depthMm)).toBeCloseTo(1, 2);
    });

    it("draw the skirt at the worst diameter reading and the core's protrusion", () => {
      const study = make();
      const k = evaluateStudy(study).kits[1];
      const g = skirtGeometry(k, study.kits[1])!;
      const e = coreExtent(g, k.skirt.centerMm);
      expect(e.radiusMax).toBeCloseTo(k.skirt.diameterMm / 2, 4);
      expect(e.zMin).toBeCloseTo(0, 5);
      expect(e.zMax).toBeCloseTo(k.skirt.protrusionMm, 4);
      expect(k.skirt.protrusionMm).toBeCloseTo(26.5 - 0.3, 9);
    });

    it("draw no interference when the core's cut clears the skirt", () => {
      const study = make();
      const r = evaluateStudy(study);
      const k = r.kits[0];
      expect(k.interference.vsCut).toBeNull();
      expect(interferenceGeometry(study, k)).toBeNull();
      expect(fitState(k, r)).toBe("clear");
    });

    it("draw interference whose volume is the core's interference area times the depth it runs over", () => {
      // A cut narrower than the skirt and shallower than its protrusion: the skirt meets the cut wall
      // down to the cut depth and the mouth wall below it.
      const study = make({ diameterMm: 52.5, depthMm: 20 });
      const r = evaluateStudy(study);
      const k = r.kits[0];
      const P = k.skirt.protrusionMm;
      const M = study.case.mouth.depthMm;
      expect(k.interference.vsCut).not.toBeNull();
      expect(k.interference.vsMouth).not.toBeNull();
      const expected = k.interference.vsCut!.areaMm2 * 20 + k.interference.vsMouth!.areaMm2 * (Math.min(P, M) - 20);
      const g = interferenceGeometry(study, k)!;
      expect(meshVolume(g) / expected).toBeCloseTo(1, 2);
      expect(coreExtent(g).zMax).toBeCloseTo(Math.min(P, M), 4);
      expect(fitState(k, r)).toBe("interfere");
    });

    it("draw the case as the deck outline less the mouth, stud holes and pockets, down to the mouth's depth", () => {
      const study = make();
      const cs = study.case;
      const g = caseGeometry(cs);
      const ringArea = (o: Parameters<typeof outlineRing>[0]) => regionsArea([{ outer: outlineRing(o), holes: [] }]);
      const holes = ringArea(cs.mouth.outline) + cs.pockets.reduce((s, p) => s + ringArea(p.outline), 0) + cs.studs.length * (Math.PI * cs.studHoleDiameterMm ** 2) / 4;
      const expected = (ringArea(cs.deck) - holes) * cs.mouth.depthMm;
      expect(meshVolume(g) / expected).toBeCloseTo(1, 2);
      expect(coreExtent(g).zMax).toBeCloseTo(cs.mouth.depthMm, 4);
    });
  });
}
