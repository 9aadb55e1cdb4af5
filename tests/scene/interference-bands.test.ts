import { describe, expect, it } from "vitest";
import { evaluateStudy } from "@/geometry";
import { interferenceRegions } from "@/scene/fit";
import { interferenceBandGeometry } from "@/scene/fit-model";
import { circleRing, circleSegments, outlineRing } from "@/scene/outline";
import { regionsArea, ringMinus } from "@/scene/regions";
import { meshVolume } from "@/scene/solids";
import { polygonStudy, roundStudy } from "./fixtures";

// While a cut's diameter is dragged, the interference below the cut (the skirt outside the mouth) stays as
// it is: the 3D view keeps its solid and rebuilds only the band beside the cut. A mouth that lies inside the
// cut takes nothing more from the skirt than the cut does, so that band is clipped by the cut alone; and for
// the 3D view, which only fills it, a cut inside the skirt leaves the skirt's ring with the cut as its hole.
// The areas are compared with the polygon boolean of every cutter (polygon-clipping, a Martinez-Rueda sweep).

const base = { round: roundStudy(), polygon: polygonStudy() };

/** The case's study with a cut, as the studio makes it while a cut is dragged: the same case, a new cut. */
const at = (name: keyof typeof base, diameterMm: number, depthMm = 20, centerOffsetMm?: [number, number]) => {
  const study = { ...base[name], cut: { diameterMm, depthMm, centerOffsetMm } };
  return { study, k: evaluateStudy(study).kits[0] };
};

for (const name of ["round", "polygon"] as const) {
  describe(`the interference bands of a ${name} case`, () => {
    it("give the 3D view the skirt's ring around a cut inside it, without the boolean", () => {
      const { study, k } = at(name, 52.5);
      const [band] = interferenceRegions(study, k, { ringsInAnyOrder: true });
      expect(band.part).toBe("beside-cut");
      expect(band.regions).toHaveLength(1);
      expect(band.regions[0].outer).toEqual(circleRing(k.skirt.centerMm, k.skirt.diameterMm / 2));
      expect(band.regions[0].holes).toEqual([circleRing(k.cut!.centerAtDeckMm, k.cut!.diameterMm / 2)]);
    });

    it("write the band beside the cut into the last step's geometry when it has as many vertices, equal to a fresh build", () => {
      const a = at(name, 52.5), b = at(name, 52.55);
      expect(circleSegments(52.5 / 2)).toBe(circleSegments(52.55 / 2));
      const beside = (x: typeof a) => interferenceRegions(x.study, x.k, { ringsInAnyOrder: true }).find((band) => band.part === "beside-cut")!;
      const g = interferenceBandGeometry(beside(a));
      const buffer = g.getAttribute("position").array;
      const reused = interferenceBandGeometry(beside(b), g);
      expect(reused).toBe(g);
      expect(reused.getAttribute("position").array).toBe(buffer);
      const fresh = interferenceBandGeometry(beside(b));
      expect(Array.from(reused.getAttribute("position").array)).toEqual(Array.from(fresh.getAttribute("position").array));
      expect(Array.from(reused.getAttribute("normal").array)).toEqual(Array.from(fresh.getAttribute("normal").array));
      // A ring prism: the band's area times its depth, to single precision.
      expect(meshVolume(reused) / (regionsArea(beside(b).regions) * 20)).toBeCloseTo(1, 5);
    });

    it("keep the very regions below the cut while only its diameter changes, and new ones for a new depth", () => {
      const a = at(name, 52.5), b = at(name, 52.8);
      const below = (x: typeof a) => interferenceRegions(x.study, x.k).find((band) => band.part === "below-cut");
      const ba = below(a)!, bb = below(b)!;
      expect(ba.regions.length).toBeGreaterThan(0);
      expect(bb.regions).toBe(ba.regions);
      expect([bb.z0, bb.z1]).toEqual([ba.z0, ba.z1]);
      const deeper = below(at(name, 52.8, 21))!;
      expect(deeper.z0).toBeCloseTo(21, 9);
      expect(deeper.z0).not.toBe(ba.z0);
    });

    it("clip the band beside the cut to the same area as the boolean with the mouth among the cutters", () => {
      // Cuts inside the skirt (a ring of skirt is left) and cuts off its centre that cross it (a crescent).
      const cases: [number, [number, number] | undefined][] = [[52.2, undefined], [52.5, undefined], [53, undefined], [53.6, undefined], [53, [1.2, 0]], [54.5, [0.8, -0.9]]];
      for (const [d, offset] of cases) {
        const { study, k } = at(name, d, 20, offset);
        const beside = interferenceRegions(study, k).find((band) => band.part === "beside-cut");
        const filled = interferenceRegions(study, k, { ringsInAnyOrder: true }).find((band) => band.part === "beside-cut");
        const c = k.cut!.centerAtDeckMm;
        const full = ringMinus(circleRing(k.skirt.centerMm, k.skirt.diameterMm / 2), [circleRing(c, k.cut!.diameterMm / 2), outlineRing(study.case.mouth.outline)]);
        expect(regionsArea(full)).toBeGreaterThan(0);
        expect(regionsArea(beside!.regions)).toBeCloseTo(regionsArea(full), 9);
        expect(regionsArea(filled!.regions)).toBeCloseTo(regionsArea(full), 9);
      }
    });
  });
}
