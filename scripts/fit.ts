// Command-line runner: `npm run fit -- study.json [--units in]`, or the study on standard input.
// Prints the StudyResult as JSON. Invalid input exits with status 2 and one line per bad field.
// The file and process handling is here; the study is read, checked and evaluated by the core.

import { readFileSync } from "node:fs";
import { pathToFileURL } from "node:url";
import { GeometryError, convertLengthsToInches, evaluateStudy, safeParseStudy, type Study } from "../geometry";

const USAGE = "usage: npm run fit -- [study.json] [--units mm|in]   (reads the study from standard input when no file is given)";

function fail(status: number, lines: readonly string[]): never {
  for (const l of lines) process.stderr.write(`${l}\n`);
  process.exit(status);
}

function parseArgs(argv: readonly string[]): { file: string | null; units: "mm" | "in" } {
  let file: string | null = null;
  let units: "mm" | "in" = "mm";
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === "--units" || a.startsWith("--units=")) {
      const v = a === "--units" ? argv[++i] : a.slice("--units=".length);
      if (v !== "mm" && v !== "in") fail(2, [`--units must be mm or in, got ${v ?? "nothing"}`, USAGE]);
      units = v;
    } else if (a === "--help" || a === "-h") {
      process.stdout.write(`${USAGE}\n`);
      process.exit(0);
    } else if (a.startsWith("-") && a !== "-") {
      fail(2, [`unknown option ${a}`, USAGE]);
    } else if (file === null) {
      file = a === "-" ? null : a;
    } else {
      fail(2, [`only one study file at a time (got ${file} and ${a})`, USAGE]);
    }
  }
  return { file, units };
}

function readInput(file: string | null): string {
  try {
    return readFileSync(file ?? 0, "utf8");
  } catch (e) {
    const reason = e instanceof Error ? e.message : String(e);
    return fail(2, [`cannot read ${file ?? "standard input"}: ${reason}`]);
  }
}

/** A study file's text as the core's Study, or the lines that say what is wrong with it. */
export function readStudyText(text: string): { ok: true; study: Study } | { ok: false; lines: string[] } {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    return { ok: false, lines: [`(root): not valid JSON: ${e instanceof Error ? e.message : String(e)}`] };
  }
  const parsed = safeParseStudy(json);
  if (!parsed.ok) return { ok: false, lines: ["invalid study:", ...parsed.issues.map((i) => `  ${i.path || "(root)"}: ${i.message}`)] };
  return { ok: true, study: parsed.study };
}

function main(): void {
  const { file, units } = parseArgs(process.argv.slice(2));
  const read = readStudyText(readInput(file));
  if (!read.ok) fail(2, read.lines);
  try {
    const result = evaluateStudy(read.study);
    const out = units === "in" ? { units: "in", ...(convertLengthsToInches(result) as object) } : { units: "mm", ...result };
    process.stdout.write(`${JSON.stringify(out, null, 2)}\n`);
  } catch (e) {
    if (e instanceof GeometryError) fail(2, [`${e.code}: ${e.message}`]);
    throw e;
  }
}

// Run as a command (not when a test imports readStudyText).
if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) main();
