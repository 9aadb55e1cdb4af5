import type { JobStatus } from "./job-status";
import type { Verdict } from "@/geometry";
import { lengthLabel, type LengthUnits } from "./units";

// The product's one colour code. Each meaning has one colour per theme, one shape that carries it without
// colour (a fill pattern in the drawings, a glyph beside words), and its legend words. The CSS custom
// properties of app/globals.css, the legend, the 3D view, the 2D drawings, the window chart and the setup
// card's PDF all read this module; a unit test keeps the stylesheet equal to it and every other source file
// free of these colours.
//
// One red: interference (the skirt overlapping case material) and the verdict "cannot fit" are one
// meaning. The brand accent (buttons, tabs, links) is graphite, no colour of the fit code; the caution
// boxes and the job status badges are neutral, so amber means "tight" and nothing else.

export type Theme = "light" | "dark";
/** A colour in each theme, as #rrggbb. */
export type Pair = Readonly<Record<Theme, string>>;

/** How a meaning is drawn without colour: a fill pattern (2D drawings, legend swatches) or a line style. */
export type Shape =
  | "cross-hatch"
  | "hatch"
  | "open"
  | "dashed-outline"
  | "dots"
  | "thick-dash"
  | "dash-dot-outline"
  | "dotted-outline"
  | "solid";

export interface Meaning {
  /** The CSS custom property is `--color-${token}`, with `--color-${token}-soft` for its tinted background. */
  readonly token: string;
  readonly color: Pair;
  /** A tinted background for boxes that carry this meaning; text in `color` stays readable on it. */
  readonly soft: Pair;
  readonly shape: Shape;
  /** A glyph shown before the words, so the meaning survives colour blindness and black-and-white print. */
  readonly icon: string;
  /** The legend's name of the meaning. */
  readonly name: string;
  /** The legend's words: what the colour shows. */
  readonly words: string;
}

/** The clearance bands: the skirt's radial clearance to the case (the mouth or the planned cut). */
export type Band = "interfere" | "tight" | "clear";

/** The fit code of the 3D view, the plan and the section: one meaning a row, its colours in both themes beside its legend. */
export const FIT = {
  interfere: { token: "interfere", color: { light: "#b0281c", dark: "#ff8f84" }, soft: { light: "#f7dcd8", dark: "#44221f" }, shape: "cross-hatch", icon: "✕", name: "Interference", words: "the skirt overlaps case material; drawn solid where it would hit" },
  tight: { token: "tight", color: { light: "#8a5300", dark: "#f0b44c" }, soft: { light: "#f6ead2", dark: "#3d301c" }, shape: "hatch", icon: "◐", name: "Tight", words: "the skirt clears, but by less than the shop's minimum" },
  clear: { token: "clear", color: { light: "#0b6b62", dark: "#4fc4b6" }, soft: { light: "#d9eeea", dark: "#193a37" }, shape: "open", icon: "○", name: "Clear", words: "the skirt clears by the shop's minimum or more" },
  counterbore: { token: "counterbore", color: { light: "#1b5ea3", dark: "#7db6f2" }, soft: { light: "#dce8f5", dark: "#1d3048" }, shape: "dashed-outline", icon: "◌", name: "Planned counterbore", words: "the cut the plan makes, its outline dashed and see-through" },
  removed: { token: "removed", color: { light: "#5d6312", dark: "#c6cd6a" }, soft: { light: "#ecedd2", dark: "#33361a" }, shape: "dots", icon: "▦", name: "Removed material", words: "case material the counterbore takes away, dotted" },
  wallLow: { token: "wall-low", color: { light: "#a01c6c", dark: "#f28bc6" }, soft: { light: "#f6dcea", dark: "#42203a" }, shape: "thick-dash", icon: "‖", name: "Wall below the minimum", words: "a wall left thinner than the shop's minimum, a thick dashed mark" },
  port: { token: "port", color: { light: "#7a38a6", dark: "#e0a0f0" }, soft: { light: "#eee0f6", dark: "#392645" }, shape: "dash-dot-outline", icon: "◇", name: "Kit's port windows", words: "the transfer-port windows of the kit's base gasket, laid over the case" },
  passage: { token: "passage", color: { light: "#55606b", dark: "#a8b2bc" }, soft: { light: "#e6e8ea", dark: "#30363b" }, shape: "dotted-outline", icon: "▭", name: "Case passages", words: "the case's transfer passages and pockets at the deck" },
} as const satisfies Record<string, Meaning>;

export type FitMeaning = keyof typeof FIT;

/** The three verdicts: their own colours and glyphs, apart from the clearance bands (cannot fit is the one red). */
export const VERDICT_COLOURS: Readonly<Record<Verdict, Meaning>> = {
  "fits-as-is": { token: "verdict-fits", color: { light: "#2f6a1c", dark: "#92d677" }, soft: { light: "#e0efd8", dark: "#22361b" }, shape: "solid", icon: "✓", name: "Fits as it is", words: "the kit fits the case's mouth without a cut" },
  "fits-after-cut": { token: "verdict-after-cut", color: { light: "#4b45a8", dark: "#b0adf7" }, soft: { light: "#e5e3f7", dark: "#2d2b4a" }, shape: "solid", icon: "◎", name: "Fits after the cut", words: "the kit fits once the planned counterbore is cut" },
  "cannot-fit": { token: "verdict-cannot", color: FIT.interfere.color, soft: FIT.interfere.soft, shape: "cross-hatch", icon: "⊘", name: "Cannot fit safely", words: "no cut this case can take makes the kit fit safely" },
};

/** The page's neutral surfaces and ink, the brand accent (graphite, no fit colour), the caution boxes and plain success and error. */
export const SURFACE = {
  paper: { light: "#f6f3ec", dark: "#1f2224" },
  "paper-2": { light: "#eeeae0", dark: "#272b2e" },
  card: { light: "#fbfaf6", dark: "#2a2e31" },
  ink: { light: "#2b2f33", dark: "#e7e3da" },
  "ink-2": { light: "#5b6167", dark: "#b5b1a8" },
  "ink-3": { light: "#63686d", dark: "#a6a39d" },
  rule: { light: "#d9d3c6", dark: "#3d4246" },
  accent: { light: "#2f3a44", dark: "#dfe6ec" },
  "accent-2": { light: "#1c242b", dark: "#f4f7f9" },
  "accent-soft": { light: "#e3e6e9", dark: "#323a41" },
  focus: { light: "#2f3a44", dark: "#dfe6ec" },
  caution: { light: "#4a4036", dark: "#e3d9c6" },
  "caution-soft": { light: "#ece6d9", dark: "#33302b" },
  // Plain good and bad news that is no fit (a save, an import, a traced photo): a deep green-grey and a wine
  // red, each apart from every colour of the fit code, always with words beside them.
  success: { light: "#30594a", dark: "#b4dcc0" },
  error: { light: "#902040", dark: "#ffb3a8" },
} as const satisfies Record<string, Pair>;

/** The glyph of a caution box (the box itself is neutral: graphite edge, warm grey ground). */
export const CAUTION_ICON = "⚠";

/** Job status badges: neutral, told apart by a glyph that fills as the job moves on (the word is always shown). */
export const STATUS_ICON: Readonly<Record<JobStatus, string>> = {
  intake: "○",
  planned: "◔",
  approved: "◑",
  machined: "◕",
  verified: "●",
  closed: "—",
};

/** Colours of the 3D view's solids and the drawings' paper (a light workshop scene in both themes, as printed). */
export const SCENE = {
  background: "#f1eee6",
  skyLight: "#fffdf7",
  groundLight: "#8a8577",
  caseMetal: "#bdb7aa",
  flange: "#8f969b",
  gasket: "#a79f8f",
  interferenceGlow: "#4a0903",
  labelGround: "#fbfaf6",
  sheet: "#ffffff",
} as const;

/** Every meaning that carries a colour of the fit code, for the checks that keep it in this module. */
export const FIT_MEANINGS: readonly Meaning[] = [...Object.values(FIT), ...Object.values(VERDICT_COLOURS)];

/** A meaning's colour in the light theme, for things that print (the drawings, the PDF, the 3D view). */
export const printed = (m: Meaning): string => m.color.light;

/** The band a radial clearance falls in: interference below 0, tight from 0 to under the minimum, clear at the minimum or more. */
export function bandOf(clearanceMm: number, minRadialClearanceMm: number): Band {
  if (clearanceMm < 0) return "interfere";
  return clearanceMm < minRadialClearanceMm ? "tight" : "clear";
}

/** The legend's ranges of the clearance bands from the shop's minimum: they meet without overlapping ("under 0.50 mm", "0.50 mm or more"). */
export function bandRanges(minRadialClearanceMm: number, units: LengthUnits): Readonly<Record<Band, string>> {
  const zero = lengthLabel(0, units);
  const min = lengthLabel(minRadialClearanceMm, units);
  return { interfere: `under ${zero}`, tight: `${zero} to under ${min}`, clear: `${min} or more` };
}

/** The legend's range of a wall below the shop's minimum. */
export function wallLowRange(minWallMm: number, units: LengthUnits): string {
  return `under ${lengthLabel(minWallMm, units)}`;
}

/** The custom properties of a theme, as the stylesheet declares them (`--color-…` → #rrggbb). */
export function cssVariables(theme: Theme): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [name, pair] of Object.entries(SURFACE)) out[`--color-${name}`] = pair[theme];
  for (const m of FIT_MEANINGS) {
    out[`--color-${m.token}`] = m.color[theme];
    out[`--color-${m.token}-soft`] = m.soft[theme];
  }
  return out;
}

/**
 * The stylesheet's declarations, one a line, for pasting into app/globals.css: each property once, its two
 * colours in CSS's `light-dark()`, which follows the `color-scheme` of the element that paints with it.
 */
export function cssDeclarations(indent = "  "): string {
  const dark = cssVariables("dark");
  return Object.entries(cssVariables("light"))
    .map(([k, v]) => `${indent}${k}: light-dark(${v}, ${dark[k]});`)
    .join("\n");
}

/** The SVG pattern id of a fill shape; patterns are defined by `patternDefs`. */
export const patternId = (m: Meaning) => `fill-${m.token}`;

/**
 * SVG `<pattern>` definitions for the meanings filled with a pattern, in a theme's colours (or `var(--color-…)`
 * for markup inside the page, so it follows the theme). Cross-hatch for interference, one hatch for tight,
 * dots for removed material.
 */
export function patternDefs(colour: (m: Meaning) => string = printed, sizeMm = 1.6): string {
  const s = sizeMm;
  const out: string[] = [];
  for (const m of FIT_MEANINGS) {
    if (m.token === "verdict-cannot") continue;
    const c = colour(m);
    const line = (x1: number, y1: number, x2: number, y2: number) => `<line x1="${x1}" y1="${y1}" x2="${x2}" y2="${y2}" stroke="${c}" stroke-width="${s / 5}"/>`;
    let inner: string;
    if (m.shape === "cross-hatch") inner = line(0, 0, 0, s) + line(0, 0, s, 0);
    else if (m.shape === "hatch") inner = line(0, 0, 0, s);
    else if (m.shape === "dots") inner = `<circle cx="${s / 2}" cy="${s / 2}" r="${s / 5}" fill="${c}"/>`;
    else continue;
    out.push(`<pattern id="${patternId(m)}" width="${s}" height="${s}" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">${inner}</pattern>`);
  }
  return out.join("");
}

/** The stroke dash of an outline shape, in drawing units (mm), or undefined for a solid line. */
export function dashOf(shape: Shape): string | undefined {
  switch (shape) {
    case "dashed-outline":
      return "2 1";
    case "dash-dot-outline":
      return "1.6 0.6 0.3 0.6";
    case "dotted-outline":
      return "0.3 0.6";
    case "thick-dash":
      return "1.2 0.6";
    default:
      return undefined;
  }
}
