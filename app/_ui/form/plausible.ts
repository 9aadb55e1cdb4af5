// Plausibility bounds of the forms. Borewright plans small engines (scooter, moped, light motorcycle);
// the core accepts any length up to 10 m, but a form stops a typing slip (a 500 mm skirt) before it is
// saved. These bounds are common practice, no published source: generous for the engines in scope.

/** Largest plausible value, in mm, by the field's last name segment. */
export const PLAUSIBLE_MAX_MM: Record<string, number> = {
  boreMm: 150,
  stockBoreMm: 150,
  strokeMm: 150,
  skirtDiameterReadingsMm: 200,
  skirtLengthReadingsMm: 150,
  mouthReadingsMm: 250,
  diameterMm: 400,
  depthMm: 150,
  studHoleDiameterMm: 30,
  baseGasketsMm: 5,
  headDiameterMm: 200,
  bitLengthMm: 150,
  minCutDiameterMm: 250,
  maxCutDiameterMm: 250,
  hardwareRadiusMm: 150,
  travelMm: 200,
  thicknessMm: 20,
  settingResolutionMm: 1,
  startDepthMm: 150,
  heightMm: 300,
  straightedgeMm: 50,
  positionMm: 250,
  pointsMm: 250,
  centerMm: 250,
  centerOffsetMm: 20,
};

/** What a field is, in words, for the message ("a skirt diameter"). */
export const FIELD_WORDS: Record<string, string> = {
  skirtDiameterReadingsMm: "a skirt diameter",
  skirtLengthReadingsMm: "a skirt length",
  boreMm: "a bore",
  stockBoreMm: "a stock bore",
  strokeMm: "a stroke",
  mouthReadingsMm: "a mouth diameter",
  studHoleDiameterMm: "a stud hole",
  baseGasketsMm: "a base gasket",
  headDiameterMm: "a cutter head",
};
