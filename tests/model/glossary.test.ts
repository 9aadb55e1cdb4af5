// The glossary is the one place a quantity's name is written: every screen, the setup card and its PDF import
// it. The check reads the source as text and looks for any glossary name written out as a literal elsewhere.
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { LIMIT_TERM, TERM } from "@/model/glossary";

const ROOTS = ["app", "db", "model", "scene"];
const GLOSSARY = join("model", "glossary.ts");

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) return sourceFiles(p);
    return /\.(ts|tsx)$/.test(name) && p !== GLOSSARY ? [p] : [];
  });
}

/** Every name the glossary defines that is a name and not a plain word ("Bit", "Studs"): two words or more. */
function names(): string[] {
  const all = [...Object.values(TERM).flatMap((t) => [t.label, t.short, t.plain]), ...Object.values(LIMIT_TERM).map((t) => t.label)];
  return [...new Set(all.filter((n) => n.trim().split(/\s+/).length >= 2))];
}

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");

/**
 * A name written out as a literal: a whole string ("…", '…', `…`), the start of a template (`Name ${…}`), or
 * the whole text of a JSX element (>Name<).
 */
function literal(name: string): RegExp {
  const n = escape(name);
  return new RegExp(`(["'\`]${n}["'\`]|\`${n}\\s*\\$\\{|>\\s*${n}\\s*<)`);
}

describe("the glossary", () => {
  const files = ROOTS.flatMap(sourceFiles).map((p) => ({ p, text: readFileSync(p, "utf8") }));

  it("finds the source it checks (the studio, the study page, the setup card)", () => {
    const paths = files.map((f) => f.p);
    expect(paths).toContain(join("app", "_ui", "studio", "results-panel.tsx"));
    expect(paths).toContain(join("db", "setup-card.ts"));
    expect(paths.some((p) => p.startsWith(join("app", "(shop)", "studies")))).toBe(true);
    expect(paths).not.toContain(GLOSSARY);
  });

  it("recognises a name written as a literal, and not one imported", () => {
    const re = literal(TERM.clearanceToCut.label);
    expect(re.test(`label: "${TERM.clearanceToCut.label}"`)).toBe(true);
    expect(re.test(`<dt>${TERM.clearanceToCut.label}</dt>`)).toBe(true);
    expect(re.test("`" + TERM.clearanceToCut.label + " ${x}`")).toBe(true);
    expect(re.test("label: TERM.clearanceToCut.label")).toBe(false);
  });

  it("gives each quantity one name: no two quantities share a label", () => {
    const labels = Object.values(TERM).map((t) => t.label);
    expect(new Set(labels).size).toBe(labels.length);
    const limits = Object.values(LIMIT_TERM).map((t) => t.label);
    expect(new Set(limits).size).toBe(limits.length);
  });

  it("is the only place a quantity's name is written out", () => {
    const found = files.flatMap(({ p, text }) => names().filter((n) => literal(n).test(text)).map((n) => `${p}: "${n}"`));
    expect(found).toEqual([]);
  });
});
