/** Spindle speed for a cutting speed Vc (m/min) at diameter D (mm): n = 1000·Vc / (π·D), in min⁻¹ (Tungaloy technical data). */
export function spindleRpm(cuttingSpeedMPerMin: number, diameterMm: number): number {
  return (1000 * cuttingSpeedMPerMin) / (Math.PI * diameterMm);
}

/** Cutting speed at diameter D (mm) and n (min⁻¹): Vc = π·D·n / 1000, in m/min (Tungaloy technical data). */
export function cuttingSpeedMPerMin(diameterMm: number, rpm: number): number {
  return (Math.PI * diameterMm * rpm) / 1000;
}

/** The spindle-speed window of a cut against the drill. */
export interface SpindleSpeed {
  readonly min: number;
  readonly max: number;
  readonly drillTopRpm: number;
  /** True when the drill's top speed is below the top of the window. */
  readonly drillLimited: boolean;
  /** True when the drill cannot reach even the bottom of the window. */
  readonly drillTooSlow: boolean;
}

/** Spindle-speed window n = 1000·Vc/(π·D) over [Vc_min, Vc_max], against the drill's top speed. */
export function spindleSpeed(diameterMm: number, vcMinMPerMin: number, vcMaxMPerMin: number, drillTopRpm: number): SpindleSpeed {
  const min = spindleRpm(vcMinMPerMin, diameterMm);
  const max = spindleRpm(vcMaxMPerMin, diameterMm);
  return { min, max, drillTopRpm, drillLimited: drillTopRpm < max, drillTooSlow: drillTopRpm < min };
}
