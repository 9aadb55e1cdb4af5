/**
 * Area of the lens where two circles of radii r and R with centres d apart overlap (Wolfram MathWorld,
 * "Circle-Circle Intersection"): A = r²·acos((d²+r²−R²)/(2dr)) + R²·acos((d²+R²−r²)/(2dR)) − ½·√((−d+r+R)(d+r−R)(d−r+R)(d+r+R)).
 */
export function lensArea(r: number, R: number, d: number): number {
  if (d >= r + R) return 0;
  if (d <= Math.abs(R - r)) return Math.PI * Math.min(r, R) ** 2;
  const clamp = (x: number) => Math.min(1, Math.max(-1, x));
  const a1 = r * r * Math.acos(clamp((d * d + r * r - R * R) / (2 * d * r)));
  const a2 = R * R * Math.acos(clamp((d * d + R * R - r * r) / (2 * d * R)));
  const k = (-d + r + R) * (d + r - R) * (d - r + R) * (d + r + R);
  return a1 + a2 - 0.5 * Math.sqrt(Math.max(0, k));
}
