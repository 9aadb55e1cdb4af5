// fast-check generators of valid studies (invented geometry within sensible ranges).
import fc from "fast-check";
import type { StudyInput } from "../../geometry/index";

type P = [number, number];
const f = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

const regular = (n: number, r: number, c: P, phase = 0): P[] =>
  Array.from({ length: n }, (_, i) => {
    const t = phase + (2 * Math.PI * i) / n;
    return [c[0] + r * Math.cos(t), c[1] + r * Math.sin(t)] as P;
  });

/** A valid study: round or polygon deck and mouth, 0–4 pockets, 1–3 kits, optional cut, rig, readings and limits. */
export const studyArb = (opts: { withCut?: boolean; withRig?: boolean } = {}): fc.Arbitrary<StudyInput> =>
  fc
    .record({
      half: f(24, 36),
      hole: f(5, 9),
      deckExtra: f(8, 30),
      deckPolygon: fc.boolean(),
      mouthD: f(30, 42),
      mouthPolygon: fc.boolean(),
      // Never exactly concentric: the direction of an interference is undefined for a concentric skirt.
      mouthOffset: fc.tuple(f(0.05, 0.5), f(0.05, 0.5), fc.boolean(), fc.boolean()),
      mouthDepth: f(10, 40),
      pockets: fc.array(fc.record({ angle: f(0, 2 * Math.PI), gap: f(1, 8), size: f(2, 6) }), { maxLength: 4 }),
      kits: fc.array(
        fc.record({
          bore: f(35, 60),
          skirts: fc.array(f(-8, 14), { minLength: 1, maxLength: 3 }),
          lengths: fc.array(f(2, 45), { minLength: 1, maxLength: 3 }),
          jitter: f(0, 0.5),
          gasket: fc.option(f(0, 1), { nil: undefined }),
        }),
        { minLength: 1, maxLength: 3 },
      ),
      cut: fc.record({ dExtra: f(-6, 20), depth: f(1, 45), offset: fc.tuple(f(-0.4, 0.4), f(-0.4, 0.4)) }),
      hasCut: opts.withCut === undefined ? fc.boolean() : fc.constant(opts.withCut),
      hasRig: opts.withRig === undefined ? fc.boolean() : fc.constant(opts.withRig),
      rig: fc.record({ head: f(25, 40), bit: f(25, 45), hw: f(10, 30), g1: f(10, 30), g2: f(30, 50), shim: f(0.05, 1), drill: f(300, 4000) }),
      readings: fc.option(fc.array(f(20, 20.4), { minLength: 4, maxLength: 4 }), { nil: undefined }),
      minWall: fc.option(f(0.5, 4), { nil: undefined }),
    })
    .map((g): StudyInput => {
      const studs = regular(4, g.half * Math.SQRT2, [0, 0], Math.PI / 4).map((p, i) => ({ label: `s${i}`, positionMm: p }));
      const deckR = g.half * Math.SQRT2 + g.hole / 2 + g.deckExtra;
      const mouthC: P = [g.mouthOffset[2] ? g.mouthOffset[0] : -g.mouthOffset[0], g.mouthOffset[3] ? g.mouthOffset[1] : -g.mouthOffset[1]];
      const mouthR = g.mouthD / 2;
      const pockets = g.pockets.map((p, i) => {
        const rho = mouthR + p.gap + p.size;
        const c: P = [rho * Math.cos(p.angle), rho * Math.sin(p.angle)];
        return { label: `p${i}`, outline: { kind: "polygon" as const, pointsMm: regular(5, p.size, c, p.angle) } };
      });
      return {
        case: {
          name: "generated case",
          deck: g.deckPolygon ? { kind: "polygon", pointsMm: regular(8, deckR, [0, 0], 0.1) } : { kind: "circle", diameterMm: 2 * deckR },
          mouth: {
            outline: g.mouthPolygon ? { kind: "polygon", pointsMm: regular(6, mouthR, mouthC, 0.2) } : { kind: "circle", diameterMm: g.mouthD, centerMm: mouthC },
            depthMm: g.mouthDepth,
          },
          studs,
          studHoleDiameterMm: g.hole,
          pockets,
          stockBoreMm: 40,
          strokeMm: 39.2,
        },
        kits: g.kits.map((k, i) => ({
          id: `k${i}`,
          name: `kit ${i}`,
          boreMm: k.bore,
          skirtDiameterReadingsMm: k.skirts.map((s) => g.mouthD + s),
          skirtLengthReadingsMm: k.lengths,
          studs: studs.map((s) => ({ ...s, positionMm: [s.positionMm[0] + k.jitter, s.positionMm[1]] as P })),
          ...(k.gasket === undefined ? {} : { baseGasketsMm: [k.gasket], alwaysWithGasket: true }),
        })),
        ...(g.hasCut ? { cut: { diameterMm: g.mouthD + 6 + g.cut.dExtra, depthMm: g.cut.depth, centerOffsetMm: g.cut.offset } } : {}),
        ...(g.hasRig
          ? {
              rig: {
                name: "generated rig",
                headDiameterMm: g.rig.head,
                bitLengthMm: g.rig.bit,
                calibration: { bitLengthMm: 35, minCutDiameterMm: 52.5, maxCutDiameterMm: 62 },
                hardwareRadiusMm: g.rig.hw,
                grooves: [
                  { label: "g1", travelMm: g.rig.g1 },
                  { label: "g2", travelMm: g.rig.g2 },
                ],
                shims: [{ thicknessMm: g.rig.shim, count: 4 }],
                drillTopRpm: g.rig.drill,
                settingResolutionMm: 0.05,
              },
            }
          : {}),
        ...(g.readings ? { readings: { holderHeights: g.readings.map((h, i) => ({ stud: `s${i}`, heightMm: h })) } } : {}),
        ...(g.minWall === undefined ? {} : { limits: { minWallMm: g.minWall } }),
      };
    });
