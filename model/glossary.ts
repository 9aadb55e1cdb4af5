import type { LimitName } from "@/geometry";

// The product's one name for each quantity it shows. `label` is the full name (a figure, a table row, a
// field), `short` the name where room is tight (a lineup column, a list of limits), `plain` the words a
// customer reads (no rig or trade jargon). Screens, the setup card and the PDF import them; nobody writes a
// quantity's name as a literal elsewhere.

export type Term = { readonly label: string; readonly short: string; readonly plain: string };

const term = (label: string, short: string, plain: string): Term => ({ label, short, plain });

export const TERM = {
  // ——— The fit ———
  /** Radial clearance between the skirt and the planned cut (tilt and centring counted where read). */
  clearanceToCut: term("Radial clearance to the cut", "Clearance to the cut", "Room around the cylinder in the enlarged opening"),
  /** Radial clearance between the skirt and the case's mouth as it is now, before any cut. */
  clearanceToMouth: term("Radial clearance to the stock mouth", "Clearance to the stock mouth", "Room around the cylinder in the opening as it is now"),
  /** Clearance between the skirt's end and the bottom of the cut. */
  depthClearance: term("Depth clearance under the skirt", "Depth clearance", "Room below the end of the cylinder"),
  skirtDiameter: term("Skirt diameter (largest reading)", "Skirt diameter", "Width of the cylinder's lower part"),
  /** How far the skirt reaches below the deck (the case's top face), base gasket counted. */
  skirtProtrusion: term("Skirt protrusion below the deck", "Skirt protrusion", "How far the cylinder reaches into the case"),
  cutDiameter: term("Cut diameter", "Cut diameter", "Width of the enlarged opening"),
  cutDepth: term("Cut depth below the deck", "Cut depth", "Depth of the enlarged opening"),
  plannedCut: term("Planned cut", "Cut", "The enlarged opening"),
  leastCut: term("Least cut that clears", "Least cut", "The smallest opening the cylinder fits"),
  largestCut: term("Largest cut the case takes", "Largest cut", "The largest opening this case allows"),
  thinnestWall: term("Thinnest wall", "Thinnest wall", "Thinnest metal left"),
  sealingLand: term("Sealing land at a stud", "Sealing land", "Metal left for the gasket around a bolt"),
  wallToPocket: term("Wall to a pocket", "Wall to pocket", "Metal left beside a passage"),
  wallToOutside: term("Wall to the outside", "Wall to outside", "Metal left to the outside of the case"),
  studPattern: term("Stud pattern", "Studs", "Bolt pattern"),
  displacement: term("Displacement", "Displacement", "Engine size"),
  removed: term("Aluminium removed", "Removed", "Metal cut away"),
  crankClearance: term("Skirt to the crank webs", "Crank clearance", "Room between the cylinder and the crankshaft"),
  // ——— The rig ———
  cutterSetting: term("Cutter setting (caliper across head and bit)", "Cutter setting", "Machine setting"),
  bit: term("Bit", "Bit", "Cutting tool"),
  screwHeads: term("Screw-head clearance in the cut", "Screw heads", "Room for the cutter's screws"),
  depthStop: term("Depth stop", "Depth stop", "Depth setting"),
  spindleSpeed: term("Spindle speed", "Speed", "Cutting speed"),
  // ——— Alignment ———
  holderHeight: term("Holder height", "Height", "Holder height"),
  /** A straightedge laid across the deck where the gauge cannot reach it: the reading is taken on its top. */
  straightedge: term("Straightedge thickness", "Straightedge", "Straightedge"),
  holderTilt: term("Holder tilt", "Tilt", "Tilt of the machine"),
  holderRock: term("Holder rocking", "Rocking", "Wobble of the machine"),
  axisShift: term("Axis shift at the cut's bottom", "Axis shift", "Drift at the bottom of the opening"),
  tiltCost: term("What the tilt costs", "Tilt cost", "Room lost to tilt"),
  // ——— The quote ———
  quoteKit: term("Cylinder kit", "Kit", "The cylinder kit"),
  quoteParts: term("Gaskets and parts", "Parts", "Gaskets and parts"),
  quoteMachining: term("Machining", "Machining", "The shop's work"),
  quoteOther: term("Other", "Other", "Other costs"),
  quoteSubtotal: term("Sum before tax", "Before tax", "Price before tax"),
  quoteTax: term("Tax", "Tax", "Tax"),
  quoteTotal: term("Total, tax included", "Total", "Total price, tax included"),
  quoteDeposit: term("Deposit on approval", "Deposit", "Deposit you pay when you approve"),
} as const satisfies Record<string, Term>;

export type TermKey = keyof typeof TERM;

/** What the straightedge field means, said where it is asked for. */
export const STRAIGHTEDGE_HINT =
  "Where the gauge cannot reach the deck, lay a straightedge across it and read on its top; enter the straightedge's thickness here (blank: read on the deck itself).";

/** Each limit's one name: the shop's settings and the study's own limits use the same words. */
export const LIMIT_TERM: Readonly<Record<LimitName, { label: string; short: string; hint: string }>> = {
  minRadialClearanceMm: { label: "Radial clearance around the skirt, at least", short: "radial clearance", hint: "Room all round the skirt in the cut or the mouth." },
  minDepthClearanceMm: { label: "Depth clearance under the skirt, at least", short: "depth clearance", hint: "Room under the skirt before the cylinder base seats." },
  minSealingLandMm: { label: "Sealing land at each stud, at least", short: "sealing land", hint: "The land the base gasket seals on." },
  minWallMm: { label: "Wall to pockets and the outside, at least", short: "wall", hint: "Thinner walls are not to be trusted." },
  studToleranceMm: { label: "Stud position tolerance", short: "stud position tolerance", hint: "How far a kit stud may sit from the case stud." },
  hardwareMarginMm: { label: "Screw-head margin inside the cut", short: "screw-head margin", hint: "The cutter's screw heads must stay this far inside the cut." },
  maxRockMm: { label: "Holder rocking, at most", short: "holder rocking", hint: "Above this, shim the holder before cutting." },
  minCrankClearanceMm: { label: "Skirt to the crank webs, at least", short: "crank clearance", hint: "Room between the skirt's lower edge and the swept crank webs." },
  cuttingSpeedMinMPerMin: { label: "Cutting speed, from", short: "lowest cutting speed", hint: "Aluminium with a carbide bit." },
  cuttingSpeedMaxMPerMin: { label: "Cutting speed, to", short: "highest cutting speed", hint: "Aluminium with a carbide bit." },
  displacementClassesCc: { label: "Legal-class limits", short: "legal-class limits", hint: "A result that crosses one is flagged; local rules decide." },
};

/** What a study's save state is called where the studio shows it: saved, unsaved, saving, or refused and why. */
export const SAVE_STATE = {
  saved: "All changes saved",
  unsaved: "Unsaved changes",
  saving: "Saving…",
  invalid: "Not saved: fix the marked fields",
  conflict: "Not saved: someone else changed this study",
  error: "Not saved",
} as const;

/** The limits a study takes at their defaults, named in words: "radial clearance, holder rocking". */
export function defaultedLimitsText(keys: readonly string[]): string {
  return keys.map((k) => (k in LIMIT_TERM ? LIMIT_TERM[k as LimitName].short : k)).join(", ");
}
