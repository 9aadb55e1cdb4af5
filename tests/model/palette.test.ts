import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { hex as contrast } from "wcag-contrast";
import { describe, expect, it } from "vitest";
import {
  bandOf,
  bandRanges,
  cssVariables,
  CAUTION_ICON,
  FIT,
  FIT_MEANINGS,
  STATUS_ICON,
  SURFACE,
  VERDICT_COLOURS,
  wallLowRange,
  type Theme,
} from "@/model/palette";

const ROOT = join(__dirname, "..", "..");
const THEMES: Theme[] = ["light", "dark"];
// Text against its background: WCAG 2.1 success criterion 1.4.3 (Contrast, minimum), level AA, 4.5:1 for
// normal text; a focus ring or a swatch against the page: 1.4.11 (Non-text contrast), 3:1. The ratio is
// WCAG 2.1's (L1 + 0.05) / (L2 + 0.05) of relative luminances, computed by the wcag-contrast package.
const AA_TEXT = 4.5;
const AA_GRAPHIC = 3;
const GROUNDS = ["paper", "paper-2", "card"] as const;

/** The colour custom properties the stylesheet declares, each as its light and dark value (`--x: light-dark(#l, #d);`). */
function declared(css: string): Record<Theme, Record<string, string>> {
  const found = [...css.matchAll(/(--color-[a-z0-9-]+):\s*light-dark\(\s*(#[0-9a-f]{6})\s*,\s*(#[0-9a-f]{6})\s*\)\s*;/gi)];
  return {
    light: Object.fromEntries(found.map((m) => [m[1], m[2].toLowerCase()])),
    dark: Object.fromEntries(found.map((m) => [m[1], m[3].toLowerCase()])),
  };
}

describe("the stylesheet's colours are the palette's", () => {
  const css = readFileSync(join(ROOT, "app/globals.css"), "utf8");

  it.each(THEMES)("the %s theme's colours are exactly the palette's", (t) => {
    expect(declared(css)[t]).toEqual(cssVariables(t));
  });

  it("each colour property is declared once, in the theme, as its light and dark pair", () => {
    const theme = css.slice(css.indexOf("@theme"), css.indexOf("}", css.indexOf("@theme")));
    const everywhere = [...css.matchAll(/(--color-[a-z0-9-]+)\s*:/g)].map((m) => m[1]);
    expect(everywhere.sort()).toEqual(Object.keys(cssVariables("light")).sort());
    expect(declared(theme).light).toEqual(cssVariables("light"));
  });

  it("the page follows the system's scheme and the printed setup card's page stays light on a dark screen", () => {
    expect(css).toMatch(/:root\s*\{\s*color-scheme:\s*light dark;/);
    expect(css).toMatch(/:root:has\(\.setup-card\)\s*\{\s*color-scheme:\s*light;/);
  });
});

describe("contrast of every pair that carries text (WCAG 2.1 AA)", () => {
  for (const t of THEMES) {
    it(`${t}: each fit and verdict colour reads at 4.5:1 or more on the paper, the cards and its own tinted box`, () => {
      const low: string[] = [];
      for (const m of FIT_MEANINGS) {
        for (const g of GROUNDS) if (contrast(m.color[t], SURFACE[g][t]) < AA_TEXT) low.push(`${m.token} on ${g}: ${contrast(m.color[t], SURFACE[g][t]).toFixed(2)}`);
        if (contrast(m.color[t], m.soft[t]) < AA_TEXT) low.push(`${m.token} on its soft: ${contrast(m.color[t], m.soft[t]).toFixed(2)}`);
        // Ink on the tinted box (a verdict box's sentence).
        if (contrast(SURFACE.ink[t], m.soft[t]) < AA_TEXT) low.push(`ink on ${m.token}-soft`);
      }
      expect(low).toEqual([]);
    });

    it(`${t}: the ink, the accent's links, a button's label and a caution read at 4.5:1 or more`, () => {
      for (const g of GROUNDS) {
        for (const ink of ["ink", "ink-2", "ink-3", "accent", "caution", "success", "error"] as const) {
          expect(contrast(SURFACE[ink][t], SURFACE[g][t]), `${ink} on ${g}`).toBeGreaterThanOrEqual(AA_TEXT);
        }
      }
      // .btn: the paper's colour on the accent, and on the accent's hover shade.
      expect(contrast(SURFACE.paper[t], SURFACE.accent[t])).toBeGreaterThanOrEqual(AA_TEXT);
      expect(contrast(SURFACE.paper[t], SURFACE["accent-2"][t])).toBeGreaterThanOrEqual(AA_TEXT);
      expect(contrast(SURFACE.ink[t], SURFACE["caution-soft"][t])).toBeGreaterThanOrEqual(AA_TEXT);
      expect(contrast(SURFACE.accent[t], SURFACE["accent-soft"][t])).toBeGreaterThanOrEqual(AA_TEXT);
    });

    it(`${t}: the focus ring and the caution edge stand out at 3:1 or more`, () => {
      for (const g of GROUNDS) {
        expect(contrast(SURFACE.focus[t], SURFACE[g][t]), `focus on ${g}`).toBeGreaterThanOrEqual(AA_GRAPHIC);
        expect(contrast(SURFACE.caution[t], SURFACE["caution-soft"][t]), "caution edge").toBeGreaterThanOrEqual(AA_GRAPHIC);
      }
    });
  }
});

/** Distance of two #rrggbb colours in sRGB (0–441); our own threshold for "told apart at a glance", no published source. */
function distance(a: string, b: string): number {
  const ch = (h: string) => [1, 3, 5].map((i) => parseInt(h.slice(i, i + 2), 16));
  const [x, y] = [ch(a), ch(b)];
  return Math.hypot(x[0] - y[0], x[1] - y[1], x[2] - y[2]);
}

describe("one colour and one shape per meaning", () => {
  const meanings = FIT_MEANINGS.filter((m) => m !== VERDICT_COLOURS["cannot-fit"]);

  it("'cannot fit' is the interference red: one red, not two", () => {
    expect(VERDICT_COLOURS["cannot-fit"].color).toEqual(FIT.interfere.color);
    for (const m of meanings.filter((x) => x !== FIT.interfere)) {
      for (const t of THEMES) expect(distance(m.color[t], FIT.interfere.color[t]), `${m.token} apart from the red`).toBeGreaterThan(60);
    }
  });

  it("no two meanings share a colour, in either theme", () => {
    for (const t of THEMES) {
      for (let i = 0; i < meanings.length; i++) {
        for (let j = i + 1; j < meanings.length; j++) {
          expect(distance(meanings[i].color[t], meanings[j].color[t]), `${meanings[i].token} vs ${meanings[j].token} (${t})`).toBeGreaterThan(40);
        }
      }
    }
  });

  it("the accent, the focus ring and the caution boxes are no colour of the fit code", () => {
    for (const t of THEMES) {
      for (const m of FIT_MEANINGS) {
        for (const s of ["accent", "accent-2", "accent-soft", "focus", "caution", "caution-soft"] as const) {
          expect(distance(SURFACE[s][t], m.color[t]), `${s} vs ${m.token}`).toBeGreaterThan(40);
          expect(SURFACE[s][t]).not.toBe(m.soft[t]);
        }
      }
    }
  });

  it("every meaning has its own glyph, and the caution and status glyphs are none of them", () => {
    const icons = FIT_MEANINGS.map((m) => m.icon);
    expect(new Set(icons).size).toBe(icons.length);
    expect(icons).not.toContain(CAUTION_ICON);
    expect(new Set(Object.values(STATUS_ICON)).size).toBe(Object.keys(STATUS_ICON).length);
  });

  it("the three verdicts' colours are apart from the clearance bands'", () => {
    for (const v of [VERDICT_COLOURS["fits-as-is"], VERDICT_COLOURS["fits-after-cut"]]) {
      for (const b of [FIT.clear, FIT.tight, FIT.interfere]) for (const t of THEMES) expect(distance(v.color[t], b.color[t])).toBeGreaterThan(60);
    }
  });
});

describe("the clearance bands' ranges meet without overlapping", () => {
  it("a clearance falls in one band: below 0 interference, 0 up to the minimum tight, the minimum or more clear", () => {
    expect(bandOf(-0.001, 0.5)).toBe("interfere");
    expect(bandOf(0, 0.5)).toBe("tight");
    expect(bandOf(0.499, 0.5)).toBe("tight");
    expect(bandOf(0.5, 0.5)).toBe("clear");
    expect(bandOf(2, 0.5)).toBe("clear");
  });

  it("the legend's words say the same, from the shop's minimum, in mm and in inches", () => {
    expect(bandRanges(0.5, "mm")).toEqual({ interfere: "under 0.00 mm", tight: "0.00 mm to under 0.50 mm", clear: "0.50 mm or more" });
    expect(bandRanges(0.381, "in")).toEqual({ interfere: "under 0.000 in", tight: "0.000 in to under 0.015 in", clear: "0.015 in or more" });
    expect(wallLowRange(1.5, "mm")).toBe("under 1.50 mm");
  });
});

/** Every source file of the product (not the tests, not the build output). */
function sources(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    if (name === "node_modules" || name.startsWith(".")) continue;
    const p = join(dir, name);
    if (statSync(p).isDirectory()) out.push(...sources(p));
    else if (/\.(ts|tsx|css|js|mjs|svg)$/.test(name)) out.push(p);
  }
  return out;
}

describe("the fit colours are written in one place", () => {
  it("no source file outside model/palette.ts (and the stylesheet it is checked against) writes a fit or verdict colour", () => {
    const hexes = [...new Set(FIT_MEANINGS.flatMap((m) => [m.color.light, m.color.dark, m.soft.light, m.soft.dark]))];
    const allowed = new Set(["model/palette.ts", "app/globals.css"]);
    const found: string[] = [];
    for (const top of ["app", "scene", "db", "model", "geometry", "scripts", "public"]) {
      for (const file of sources(join(ROOT, top))) {
        const rel = relative(ROOT, file);
        if (allowed.has(rel)) continue;
        const text = readFileSync(file, "utf8").toLowerCase();
        for (const h of hexes) if (text.includes(h)) found.push(`${rel}: ${h}`);
      }
    }
    expect(found).toEqual([]);
  });

  it("no component paints with a colour literal in a class name (bg-[#…], text-[#…])", () => {
    const found: string[] = [];
    for (const top of ["app", "scene"]) {
      for (const file of sources(join(ROOT, top))) {
        const m = readFileSync(file, "utf8").match(/\b(bg|text|border|fill|stroke)-\[#[0-9a-f]{3,8}\]/gi);
        if (m) found.push(`${relative(ROOT, file)}: ${m.join(", ")}`);
      }
    }
    // The printed setup card sets its own ink on white paper; nothing else may.
    expect(found.filter((f) => !f.startsWith("app/(print)/"))).toEqual([]);
  });
});
