// The library forms' lists of readings: each length read several times on the part, and which reading counts (the
// trade's worst case: the smallest mouth, the largest skirt, the thinnest gasket). The forms add the units, the
// stamps of who took each reading, and any message of their own.

export const READING_LISTS = {
  mouth: {
    name: "mouthReadingsMm",
    label: "Mouth diameter readings",
    counts: "smallest",
    hint: "Read the mouth with calipers at several angles; the smallest reading counts.",
  },
  skirtDiameter: {
    name: "skirtDiameterReadingsMm",
    label: "Skirt diameter readings",
    counts: "largest",
    hint: "Read the skirt at several spots on the actual part; the largest counts.",
  },
  skirtLength: { name: "skirtLengthReadingsMm", label: "Skirt length readings (base face to skirt bottom)", counts: "largest" },
  baseGaskets: {
    name: "baseGasketsMm",
    label: "Base gasket thicknesses supplied",
    counts: "smallest",
    itemLabel: "Gasket",
    addLabel: "Add a gasket",
    hint: "Each gasket that comes with the kit; blank list when it comes with none.",
  },
} as const;
