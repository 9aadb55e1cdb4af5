import { diskInsideArea } from "./outline";
import type { Outline } from "./schema";
import type { Vec2 } from "./vec";

/** Material a counterbore removes. */
export interface Removal {
  /** Area of the cut circle outside the existing mouth. */
  readonly areaMm2: number;
  readonly volumeMm3: number;
  readonly massG: number;
}

/**
 * Counterbore volume outside the existing opening: V = (πR² − area(cut ∩ mouth)) · min(depth, mouth depth)
 * (below the mouth depth is the crank chamber); mass = V · ρ, with ρ in g/cm³ and 1 cm³ = 1000 mm³.
 */
export function removal(center: Vec2, radiusMm: number, depthMm: number, mouth: Outline, mouthDepthMm: number, densityGPerCm3: number, toleranceMm: number): Removal {
  const areaMm2 = Math.max(0, Math.PI * radiusMm * radiusMm - diskInsideArea(center, radiusMm, mouth, toleranceMm));
  const volumeMm3 = areaMm2 * Math.min(depthMm, mouthDepthMm);
  return { areaMm2, volumeMm3, massG: (volumeMm3 / 1000) * densityGPerCm3 };
}
