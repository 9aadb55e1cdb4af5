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

/** Holder heights at the studs on the plane h = a·x + b·y + c, each off it by its rock. */
const readingsOn = (studs: { label: string; positionMm: P }[], r: { a: number; b: number; c: number; rock: number[] }) =>
  studs.map((s, i) => ({ stud: s.label, heightMm: r.a * s.positionMm[0] + r.b * s.positionMm[1] + r.c + r.rock[i] }));

/**
 * A valid study: round or polygon deck and mouth, 0–4 pockets (some starting below the cut), 1–3 kits, optional
 * cut, rig, readings and limits. The stud pattern (4–6 studs) is centred up to 3 mm off the cylinder axis in x
 * and y; the mouth sits up to 2 mm off the axis; the holder readings lie on a plane tilted in both x and y (plus
 * a little rock); the sealing-land and wall minimums are drawn apart; kit studs are jittered in x and y; cut
 * depths run past the mouth's depth; skirt lengths are drawn on a 0.001 mm grid, so the proposed depth often
 * rounds differently up than to nearest.
 */
export const studyArb = (opts: { withCut?: boolean; withRig?: boolean } = {}): fc.Arbitrary<StudyInput> =>
  fc
    .record({
      half: f(24, 36),
      studCount: fc.integer({ min: 4, max: 6 }),
      studPhase: f(0, Math.PI / 2),
      patternCenter: fc.tuple(f(-3, 3), f(-3, 3)),
      hole: f(5, 9),
      deckExtra: f(8, 30),
      deckPolygon: fc.boolean(),
      mouthD: f(30, 42),
      mouthPolygon: fc.boolean(),
      // Never exactly concentric: the direction of an interference is undefined for a concentric skirt.
      mouthOffset: fc.tuple(f(0.05, 2), f(0.05, 2), fc.boolean(), fc.boolean()),
      mouthDepth: f(10, 40),
      pockets: fc.array(fc.record({ angle: f(0, 2 * Math.PI), gap: f(1, 8), size: f(2, 6), startDepth: fc.option(f(0, 45), { nil: undefined }) }), { maxLength: 4 }),
      kits: fc.array(
        fc.record({
          bore: f(35, 60),
          skirts: fc.array(f(-8, 14), { minLength: 1, maxLength: 3 }),
          lengths: fc.array(fc.integer({ min: 2000, max: 45000 }).map((um) => um / 1000), { minLength: 1, maxLength: 3 }),
          jitter: fc.tuple(f(-0.5, 0.5), f(-0.5, 0.5)),
          gasket: fc.option(f(0, 1), { nil: undefined }),
        }),
        { minLength: 1, maxLength: 3 },
      ),
      cut: fc.record({ dExtra: f(-6, 20), depth: f(1, 45), offset: fc.tuple(f(-0.4, 0.4), f(-0.4, 0.4)) }),
      hasCut: opts.withCut === undefined ? fc.boolean() : fc.constant(opts.withCut),
      hasRig: opts.withRig === undefined ? fc.boolean() : fc.constant(opts.withRig),
      rig: fc.record({ head: f(25, 40), bit: f(25, 45), hw: f(10, 30), g1: f(10, 30), g2: f(30, 50), shim: f(0.05, 1), drill: f(300, 4000) }),
      readings: fc.option(
        fc.record({ a: f(-0.01, 0.01), b: f(-0.01, 0.01), c: f(18, 22), rock: fc.array(f(-0.03, 0.03), { minLength: 4, maxLength: 4 }), count: fc.integer({ min: 3, max: 4 }) }),
        { nil: undefined },
      ),
      minWall: fc.option(f(0.5, 4), { nil: undefined }),
      minLand: fc.option(f(0.5, 4), { nil: undefined }),
    })
    .map((g): StudyInput => {
      const studs = regular(g.studCount, g.half * Math.SQRT2, g.patternCenter, g.studPhase).map((p, i) => ({ label: `s${i}`, positionMm: p }));
      const deckR = Math.hypot(...g.patternCenter) + g.half * Math.SQRT2 + g.hole / 2 + g.deckExtra;
      const mouthC: P = [g.mouthOffset[2] ? g.mouthOffset[0] : -g.mouthOffset[0], g.mouthOffset[3] ? g.mouthOffset[1] : -g.mouthOffset[1]];
      const mouthR = g.mouthD / 2;
      const pockets = g.pockets.map((p, i) => {
        const rho = mouthR + p.gap + p.size;
        const c: P = [rho * Math.cos(p.angle), rho * Math.sin(p.angle)];
        return { label: `p${i}`, outline: { kind: "polygon" as const, pointsMm: regular(5, p.size, c, p.angle) }, ...(p.startDepth === undefined ? {} : { startDepthMm: p.startDepth }) };
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
          studs: studs.map((s) => ({ ...s, positionMm: [s.positionMm[0] + k.jitter[0], s.positionMm[1] + k.jitter[1]] as P })),
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
        ...(g.readings ? { readings: { holderHeights: readingsOn(studs.slice(0, g.readings.count), g.readings) } } : {}),
        ...(g.minWall === undefined && g.minLand === undefined
          ? {}
          : { limits: { ...(g.minWall === undefined ? {} : { minWallMm: g.minWall }), ...(g.minLand === undefined ? {} : { minSealingLandMm: g.minLand }) } }),
      };
    });
