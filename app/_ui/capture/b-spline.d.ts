declare module "b-spline" {
  /** The point at t in [0, 1] of the B-spline of the given degree over the control points (and knot vector, weights). */
  export default function interpolate(t: number, degree: number, points: number[][], knots?: number[], weights?: number[], result?: number[]): number[];
}
