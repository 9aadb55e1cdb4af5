import PerspT from "perspective-transform";
import { Matrix, SingularValueDecomposition } from "ml-matrix";
import { describe, expect, it } from "vitest";
import {
  applyHomography,
  checkReferencePoints,
  invertHomography,
  mmToPx,
  seenAspect,
  orderAsRectangle,
  pxToMm,
  rectangleFit,
  ReferencePointsError,
  solveHomography,
  twoPointScale,
  type Point,
} from "@/geometry/homography";

/** A pinhole camera looking down at the deck plane: tilted about x then y, the deck's +y shown up in the photo. */
function camera(opts: { f: number; principal: Point; tiltXDeg: number; tiltYDeg: number; distanceMm: number }) {
  const a = (opts.tiltXDeg * Math.PI) / 180;
  const b = (opts.tiltYDeg * Math.PI) / 180;
  return (p: Point): Point => {
    // Ry(b) then Rx(a), applied to (x, y, 0), then moved away along the optical axis.
    const x1 = p[0] * Math.cos(b);
    const z1 = -p[0] * Math.sin(b);
    const y2 = p[1] * Math.cos(a) - z1 * Math.sin(a);
    const z2 = p[1] * Math.sin(a) + z1 * Math.cos(a) + opts.distanceMm;
    return [opts.principal[0] + (opts.f * x1) / z2, opts.principal[1] - (opts.f * y2) / z2];
  };
}

const near = (got: readonly number[], want: readonly number[], tol: number) => {
  expect(got).toHaveLength(want.length);
  got.forEach((v, i) => expect(Math.abs(v - want[i])).toBeLessThanOrEqual(tol));
};

describe("solveHomography", () => {
  const square: Point[] = [[-28, -28], [28, -28], [28, 28], [-28, 28]];
  const photo: Point[] = [[812.25, 1490.5], [2210.75, 1421.0], [2044.125, 362.375], [931.5, 402.0]];

  it("sends four known points onto their targets and back within 1e-9", () => {
    // Round trip: the solve is exact for four pairs, so only rounding remains (double precision).
    const h = solveHomography(square, photo);
    square.forEach((p, i) => near(applyHomography(h, p), photo[i], 1e-9));
    const back = invertHomography(h);
    photo.forEach((p, i) => near(applyHomography(back, p), square[i], 1e-9));
  });

  it("agrees with the perspective-transform package's matrix", () => {
    // Outside reference: perspective-transform (npm) solves the same 8 unknowns by its own normal equations
    // and rounds each coefficient to 1e-10, so the two agree to that order on points of unit size.
    const from: Point[] = [[0, 0], [1, 0], [1, 1], [0, 1]];
    const to: Point[] = [[0.1, 0.2], [1.3, 0.05], [1.1, 1.4], [-0.2, 0.9]];
    const theirs = PerspT(from.flat(), to.flat());
    const ours = solveHomography(from, to);
    near(ours, theirs.coeffs, 1e-8);
    for (const p of [[0.5, 0.5], [0.25, 0.8], [2, -1]] as Point[]) near(applyHomography(ours, p), theirs.transform(p[0], p[1]), 1e-8);
  });

  it("agrees with the null vector of the direct linear transform by ml-matrix's SVD", () => {
    // Outside reference: the DLT of Hartley and Zisserman, Multiple View Geometry, 2nd ed., algorithm 4.1 —
    // the homography is the right singular vector of the smallest singular value of the 8×9 system.
    const rows: number[][] = [];
    square.forEach(([x, y], i) => {
      const [u, v] = photo[i];
      rows.push([-x, -y, -1, 0, 0, 0, u * x, u * y, u]);
      rows.push([0, 0, 0, -x, -y, -1, v * x, v * y, v]);
    });
    rows.push(new Array(9).fill(0)); // square the system so the SVD gives all nine right singular vectors
    const svd = new SingularValueDecomposition(new Matrix(rows));
    const v = svd.rightSingularVectors.getColumn(svd.diagonal.indexOf(Math.min(...svd.diagonal)));
    const dlt = v.map((x) => x / v[8]);
    const ours = solveHomography(square, photo);
    ours.forEach((x, i) => expect(Math.abs(x - dlt[i])).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(dlt[i]))));
  });

  it("matches the closed-form square-to-quadrilateral map of a texture-mapping text", () => {
    // Heckbert, "Fundamentals of Texture Mapping and Image Warping" (1989), §2.2.3: the projective map of the
    // unit square onto the quadrilateral (x0,y0)…(x3,y3), formulas reproduced from memory.
    const q: Point[] = [[2, 1], [9, 2], [8, 7], [1, 6]];
    const [[x0, y0], [x1, y1], [x2, y2], [x3, y3]] = q;
    const sx = x0 - x1 + x2 - x3;
    const sy = y0 - y1 + y2 - y3;
    const dx1 = x1 - x2, dx2 = x3 - x2, dy1 = y1 - y2, dy2 = y3 - y2;
    const den = dx1 * dy2 - dx2 * dy1;
    const g = (sx * dy2 - dx2 * sy) / den;
    const hh = (dx1 * sy - sx * dy1) / den;
    const expected = [x1 - x0 + g * x1, x3 - x0 + hh * x3, x0, y1 - y0 + g * y1, y3 - y0 + hh * y3, y0, g, hh, 1];
    // Worked by hand for this quadrilateral: Σx = 2−9+8−1 = 0, Σy = 1−2+7−6 = 0, so it is affine (g = h = 0).
    expect(Math.abs(g)).toBe(0);
    const ours = solveHomography([[0, 0], [1, 0], [1, 1], [0, 1]], q);
    near(ours, expected, 1e-12);

    const skew: Point[] = [[0, 0], [4, 0], [3, 2], [1, 2]]; // a trapezoid: a true perspective (g ≠ 0 or h ≠ 0)
    const [[a0, b0], [a1, b1], [a2, b2], [a3, b3]] = skew;
    const Sx = a0 - a1 + a2 - a3, Sy = b0 - b1 + b2 - b3;
    const ex1 = a1 - a2, ex2 = a3 - a2, ey1 = b1 - b2, ey2 = b3 - b2;
    const d = ex1 * ey2 - ex2 * ey1;
    const G = (Sx * ey2 - ex2 * Sy) / d, H = (ex1 * Sy - Sx * ey1) / d;
    // By hand: Σx = 0−4+3−1 = −2, Σy = 0, Δx1 = 1, Δx2 = −2, Δy1 = −2, Δy2 = 0, det = 0−4 = −4, g = 0, h = (0−4)/−4 = 1.
    expect([Math.abs(G), H]).toEqual([0, 1]);
    near(solveHomography([[0, 0], [1, 0], [1, 1], [0, 1]], skew), [a1 - a0 + G * a1, a3 - a0 + H * a3, a0, b1 - b0 + G * b1, b3 - b0 + H * b3, b0, G, H, 1], 1e-12);
  });

  it("refuses points on one spot or on one line, saying which", () => {
    const err = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        return e as ReferencePointsError;
      }
      throw new Error("expected a refusal");
    };
    const same = err(() => solveHomography([[0, 0], [10, 0], [10, 0], [0, 10]], square));
    expect(same).toBeInstanceOf(ReferencePointsError);
    expect(same.problem).toBe("coincident");
    expect(same.code).toBe("degenerate-geometry");
    expect(same.message).toMatch(/same spot/);
    const line = err(() => solveHomography([[0, 0], [10, 0], [20, 0], [0, 10]], square));
    expect(line.problem).toBe("collinear");
    expect(line.message).toMatch(/one line/);
    expect(err(() => twoPointScale([5, 5], [5, 5], 40)).problem).toBe("coincident");
    expect(err(() => twoPointScale([5, 5], [50, 5], 0)).problem).toBe("bad-distance");
    // One point inside the triangle of the other three: no photo of a rectangle shows that.
    expect(err(() => orderAsRectangle([[0, 0], [100, 0], [50, 100], [50, 30]])).problem).toBe("not-convex");
  });
});

describe("twoPointScale", () => {
  it("scales by the measured distance with the origin midway and photo-up as +y", () => {
    // 200 px between the points and 50 mm measured: 0.25 mm a pixel; (200, 0) is 100 px above the midpoint.
    const map = twoPointScale([100, 100], [300, 100], 50);
    near(pxToMm(map, [200, 0]), [0, 25], 1e-12);
    near(pxToMm(map, [300, 100]), [25, 0], 1e-12);
    near(mmToPx(map, [0, 25]), [200, 0], 1e-12);
  });
});

describe("rectangleFit", () => {
  const photoSize = { width: 2000, height: 1500 };
  const cam = camera({ f: 1600, principal: [1000, 750], tiltXDeg: 25, tiltYDeg: -12, distanceMm: 300 });
  const studs: Point[] = [[-28, -28], [28, -28], [28, 28], [-28, 28]];

  it("squares up a tilted photo: other points of the deck come back in mm", () => {
    // Synthetic check: the camera above projects known deck points; the fit must invert it.
    const clicked = [studs[2], studs[0], studs[3], studs[1]].map(cam); // clicked in no particular order
    const fit = rectangleFit(clicked, 56, 56, photoSize);
    expect(fit.fits).toBe(true);
    expect(fit.judgedFlat).toBe(false);
    expect(fit.misfitMm).toBeLessThan(1e-6);
    expect(fit.summary).toBe("The four points fit a 56 mm × 56 mm rectangle within 0 mm.");
    for (const p of [[45, -38], [-50, 12.5], [0, 0], [33.3, 47.1]] as Point[]) near(pxToMm(fit.map, cam(p)), p, 1e-6);
  });

  it("warns when the typed spacing is not what the photo shows", () => {
    // The studs are 56 × 56 but 56 × 60 is typed. Same size √(56·60) = 57.966 mm a side for the square the photo
    // shows; a corner is off by √(((57.966−56)/2)² + ((57.966−60)/2)²) = √(0.983² + 1.017²) = 1.414 mm, above the
    // threshold of max(0.5, 1% of the 82.07 mm diagonal) = 0.82 mm.
    const fit = rectangleFit(studs.map(cam), 56, 60, photoSize);
    expect(fit.fits).toBe(false);
    expect(fit.misfitMm).toBeCloseTo(1.414, 3);
    expect(fit.warnAboveMm).toBeCloseTo(0.8207, 4);
    expect(fit.summary).toMatch(/do not fit a 56 mm × 60 mm rectangle: they show one about 58 mm × 58 mm/);
  });

  it("points whose misfit is exactly the threshold fit, the threshold itself included", () => {
    // A 1000 px square from straight above (judged flat, aspect 1) and 68 × h mm typed: the photo shows a square of
    // √(68·h) a side, the misfit √(((s − 68)/2)² + ((s − h)/2)²) grows with h, and the threshold is
    // max(0.5, 1% of the diagonal). h = 70.7759350531163 is the largest double at which the two are equal in
    // double arithmetic, found by bisection (common practice, no published source); one digit more does not fit.
    const square: Point[] = [[500, 1250], [1500, 1250], [1500, 250], [500, 250]];
    const tie = rectangleFit(square, 68, 70.7759350531163, photoSize);
    expect(tie.judgedFlat).toBe(true);
    expect(tie.misfitMm).toBe(tie.warnAboveMm);
    expect(tie.warnAboveMm).toBeCloseTo(0.01 * Math.hypot(68, 70.7759350531163), 15);
    expect(tie.fits).toBe(true);
    expect(tie.summary).toBe("The four points fit a 68 mm × 70.8 mm rectangle within 1 mm.");
    const over = rectangleFit(square, 68, 70.7759350531164, photoSize);
    expect(over.misfitMm).toBeGreaterThan(over.warnAboveMm);
    expect(over.fits).toBe(false);
  });

  it("judges a photo from straight above as a parallelogram", () => {
    const above = camera({ f: 1600, principal: [1000, 750], tiltXDeg: 0, tiltYDeg: 0, distanceMm: 300 });
    // Straight above a 70 × 50 rectangle the photo shows it as drawn, so 70 × 50 fits and 50 × 70 does not.
    const corners: Point[] = [[-35, -25], [35, -25], [35, 25], [-35, 25]];
    expect(rectangleFit(corners.map(above), 70, 50, photoSize).fits).toBe(true);
    const wrong = rectangleFit(corners.map(above), 50, 70, photoSize);
    expect(wrong.judgedFlat).toBe(true);
    expect(wrong.fits).toBe(false);
  });
});

/** The refusal a call throws, or a failed check when it throws none. */
function refusal(f: () => unknown): ReferencePointsError {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(ReferencePointsError);
    return e as ReferencePointsError;
  }
  throw new Error("expected a refusal");
}

describe("reference points that fix nothing, each said in words", () => {
  it("a point that is not a finite number, in either coordinate", () => {
    const e = refusal(() => checkReferencePoints([[0, 0], [Number.NaN, 1], [2, 2]]));
    expect([e.name, e.problem, e.message]).toEqual(["ReferencePointsError", "bad-distance", "The reference points must be finite numbers."]);
    expect(refusal(() => checkReferencePoints([[0, 0], [1, Number.POSITIVE_INFINITY]])).problem).toBe("bad-distance");
  });

  it("two points on one spot, numbered from 1, and what they are", () => {
    expect(refusal(() => checkReferencePoints([[0, 0], [10, 0], [10, 0]])).message).toBe(
      "Two of the reference points (2 and 3) are on the same spot; place each one on its own mark.",
    );
    expect(refusal(() => solveHomography([[0, 0], [10, 0], [10, 0], [0, 10]], [[0, 0], [1, 0], [1, 1], [0, 1]])).message).toMatch(/^Two of the points clicked \(2 and 3\)/);
    expect(refusal(() => solveHomography([[0, 0], [10, 0], [10, 10], [0, 10]], [[0, 0], [1, 0], [1, 0], [0, 1]])).message).toMatch(/^Two of the target points \(2 and 3\)/);
    expect(refusal(() => twoPointScale([5, 5], [5, 5], 40)).message).toMatch(/^Two of the two points \(1 and 2\)/);
    expect(refusal(() => orderAsRectangle([[0, 0], [100, 0], [100, 0], [0, 60]])).message).toMatch(/^Two of the four points \(2 and 3\)/);
  });

  it("on one spot is judged against the points' spread: half a thousandth of a pixel apart on a 1000 px spread is one spot", () => {
    expect(refusal(() => checkReferencePoints([[0, 0], [1000, 0], [1000.0005, 0.0002], [0, 1000]])).problem).toBe("coincident");
    expect(() => checkReferencePoints([[0, 0], [1000, 0], [1000.5, 0.5], [0, 1000]])).not.toThrow();
  });

  it("two points exactly 1e-6 of the spread apart are one spot, the threshold itself included", () => {
    // Corners of a 3000 × 4000 px rectangle: the spread is its diagonal, 5000 px exactly (3-4-5). The fifth point
    // is 1e-6 · 5000 px from the first, the threshold as the check works it out, to the last bit.
    const points: Point[] = [[0, 0], [3000, 0], [3000, 4000], [0, 4000], [1e-6 * 5000, 0]];
    const e = refusal(() => checkReferencePoints(points));
    expect([e.problem, e.message]).toEqual(["coincident", "Two of the reference points (1 and 5) are on the same spot; place each one on its own mark."]);
  });

  it("a third point exactly 1e-6 of the spread off the line through the other two is on the line, the threshold itself included", () => {
    // (0, 0) and (1024, 0) are the spread, 1024 px; (512, h) with h = 1e-6 · 1024 is h off their line: twice the
    // triangle's area, 1024·h, over its longest side, 1024, is h to the last bit (1024 is a power of two).
    const e = refusal(() => checkReferencePoints([[0, 0], [1024, 0], [512, 1e-6 * 1024]]));
    expect(e.problem).toBe("collinear");
  });

  it("three points on one line, numbered from 1; two of them close together are still on the line", () => {
    expect(refusal(() => checkReferencePoints([[0, 10], [0, 0], [10, 0], [20, 0]])).message).toBe(
      "Three of the reference points (2, 3 and 4) lie on one line; they cannot fix a perspective. Use four points at the corners of a rectangle.",
    );
    // Exactly three points are checked too.
    expect(refusal(() => checkReferencePoints([[0, 0], [10, 0], [20, 0]])).problem).toBe("collinear");
    // (1000.5, 0.0004) is 0.0004 px off the line through the other two, under 1e-6 of the 1000 px spread,
    // though it is only 0.5 px from (1000, 0).
    expect(refusal(() => checkReferencePoints([[0, 0], [1000, 0], [1000.5, 0.0004]])).problem).toBe("collinear");
    expect(() => checkReferencePoints([[0, 0], [1000, 0], [1000.5, 5]])).not.toThrow();
    // Two points can only be on one spot, never on one line.
    expect(() => checkReferencePoints([[0, 0], [10, 0]])).not.toThrow();
  });

  it("a perspective needs at least four pairs, as many targets as points; five are fitted", () => {
    const four: Point[] = [[0, 0], [10, 0], [10, 10], [0, 10]];
    const e = refusal(() => solveHomography(four.slice(0, 3), four.slice(0, 3)));
    expect([e.problem, e.message]).toEqual(["too-few", "A perspective needs four point pairs (or more), one for each clicked point."]);
    expect(refusal(() => solveHomography(four, [...four, [2, 7]])).problem).toBe("too-few");
    const five: Point[] = [...four, [2, 7]];
    near(solveHomography(five, five.map((p) => [2 * p[0], 2 * p[1]] as Point)), [2, 0, 0, 0, 2, 0, 0, 0, 1], 1e-9);
  });

  it("a rectangle needs exactly four clicks, a figure with four corners, and a spacing above zero each way", () => {
    const e = refusal(() => orderAsRectangle([[0, 0], [100, 0], [100, 60]]));
    expect([e.problem, e.message]).toEqual(["too-few", "Click exactly four points, one on each corner of the rectangle."]);
    expect(refusal(() => orderAsRectangle([[0, 0], [100, 0], [50, 100], [50, 30]])).message).toBe(
      "The four points do not make a four-sided figure with corners; place one on each corner of the rectangle.",
    );
    const corners: Point[] = [[0, 60], [100, 60], [100, 0], [0, 0]];
    const photo = { width: 200, height: 120 };
    for (const [w, h] of [[0, 50], [70, 0], [Number.POSITIVE_INFINITY, 50], [70, Number.POSITIVE_INFINITY], [Number.NaN, 50], [-70, 50]]) {
      const r = refusal(() => rectangleFit(corners, w, h, photo));
      expect([r.problem, r.message]).toEqual(["bad-distance", "Type the measured spacing across and along the pattern, each greater than zero."]);
    }
  });

  it("a two-point scale needs a distance above zero, said so", () => {
    const e = refusal(() => twoPointScale([5, 5], [50, 5], -3));
    expect([e.problem, e.message]).toEqual(["bad-distance", "Type the measured distance between the two points, greater than zero."]);
    expect(twoPointScale([5, 5], [50, 5], 45).kind).toBe("scale");
  });
});

describe("the corners of a clicked rectangle", () => {
  it("come out bottom-left, bottom-right, top-right, top-left (photo y down), in whatever order they were clicked", () => {
    // A rectangle far from the photo's origin, as clicks in a large photo are.
    const bl: Point = [1000, 1200], br: Point = [1400, 1190], tr: Point = [1390, 900], tl: Point = [1010, 910];
    const clicks = [bl, br, tr, tl];
    const orders = [[0, 1, 2, 3], [3, 2, 1, 0], [2, 0, 3, 1], [1, 3, 0, 2], [2, 3, 0, 1], [1, 0, 3, 2]];
    for (const o of orders) expect(orderAsRectangle(o.map((i) => clicks[i]))).toEqual([bl, br, tr, tl]);
  });
});

describe("the corners of a rectangle turned in the photo", () => {
  it("a square turned 30° keeps the corner nearest the lower left as bottom-left, in any click order", () => {
    // Corners 300 px from (1200, 1000) at −105°, −15°, 75° and 165° (counter-clockwise, y up): x = 1200 + 300·cos θ,
    // y = 1000 − 300·sin θ (photo y down).
    const at = (deg: number): Point => [1200 + 300 * Math.cos((deg * Math.PI) / 180), 1000 - 300 * Math.sin((deg * Math.PI) / 180)];
    const [bl, br, tr, tl] = [at(-105), at(-15), at(75), at(165)];
    for (const o of [[0, 1, 2, 3], [3, 1, 0, 2], [2, 3, 1, 0]]) expect(orderAsRectangle(o.map((i) => [bl, br, tr, tl][i]))).toEqual([bl, br, tr, tl]);
  });

  it("a 2 : 1 rectangle turned 33° or 38° takes the corner nearest −135° as bottom-left, not the first one below the centre", () => {
    // Corners of a 2 : 1 rectangle are at ±26.565° and 180° ± 26.565° (atan ½) from its centre; turned 33° they are
    // at −120.435°, 6.435°, 59.565° and −173.565° (y up). Two lie in the lower left quarter turn: −120.435° is 14.6°
    // from −135°, −173.565° is 38.6° from it. Turned 38°: −115.435° (19.6°) against −168.565° (33.6°).
    const at = (deg: number): Point => [1200 + 300 * Math.cos((deg * Math.PI) / 180), 1000 - 300 * Math.sin((deg * Math.PI) / 180)];
    const a = (Math.atan(0.5) * 180) / Math.PI;
    for (const turn of [33, 38]) {
      const [bl, br, tr, tl] = [at(-180 + a + turn), at(-a + turn), at(a + turn), at(180 - a + turn)];
      for (const o of [[0, 1, 2, 3], [3, 2, 1, 0], [1, 3, 0, 2]]) expect(orderAsRectangle(o.map((i) => [bl, br, tr, tl][i])), `turned ${turn}°`).toEqual([bl, br, tr, tl]);
    }
  });
});

describe("the proportions a photo shows", () => {
  it("a figure that asks for a focal length of exactly 0 is judged as a parallelogram", () => {
    // About the principal point (1000, 750): m1 (0, 0), m2 (200, 0), m3 (0, 200), m4 (300, 100). Then k2 = 3/2 and
    // k3 = 1/2 (as in Zhang and He 2007, cited in geometry/homography.ts), n2 = k2·m2 − m1 = (300, 0, 1/2) and
    // n3 = k3·m3 − m1 = (0, 100, −1/2), whose x, y parts are square to each other, so
    // f² = −(n2x·n3x + n2y·n3y)/(n2z·n3z) = 0 exactly (all in halves, no rounding): no camera. As a
    // parallelogram: √(300² / 100²) = 3.
    const r = seenAspect([[1000, 750], [1200, 750], [1000, 950], [1300, 850]], [1000, 750]);
    expect(r.flat).toBe(true);
    expect(r.aspect).toBe(3);
  });

  it("a four-sided figure no centred camera could give is judged as a parallelogram", () => {
    // For these corners the focal length that the pinhole model asks for comes out with f² < 0 (no real camera).
    const r = seenAspect([[-100, 120], [110, 100], [-90, -100], [95, -95]], [0, 0]);
    expect(r.flat).toBe(true);
    expect(Number.isFinite(r.aspect) && r.aspect > 0).toBe(true);
  });
});

describe("photo pixels and millimetres both ways", () => {
  it("a scale map sends mm back to the pixels they came from, across and up", () => {
    // 200 px for 50 mm: 4 px a millimetre; (25, 10) mm is 100 px right of and 40 px above the midpoint (200, 100).
    const map = twoPointScale([100, 100], [300, 100], 50);
    near(mmToPx(map, [25, 10]), [300, 60], 1e-12);
    near(pxToMm(map, [300, 60]), [25, 10], 1e-12);
  });

  it("a perspective map sends mm back through its inverse", () => {
    const h = solveHomography([[0, 0], [100, 0], [100, 100], [0, 100]], [[10, 20], [210, 20], [230, 240], [5, 200]]);
    const map = { kind: "perspective" as const, h };
    near(pxToMm(map, [50, 50]), applyHomography(h, [50, 50]), 1e-12);
    near(mmToPx(map, applyHomography(h, [30, 70])), [30, 70], 1e-9);
  });
});
