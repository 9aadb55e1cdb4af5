import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";

const root = new URL("../../", import.meta.url).pathname;
const tsx = `${root}node_modules/.bin/tsx`;
const run = (args: string[], input?: string) => spawnSync(tsx, ["scripts/fit.ts", ...args], { cwd: root, input, encoding: "utf8", timeout: 60_000 });

// Each check runs the script in a process of its own (tsx compiles it first): seconds on a busy machine.
describe("fit command line", { timeout: 60_000 }, () => {
  it("prints the example study's result as JSON", () => {
    const r = run(["public/examples/study.json"]);
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.units).toBe("mm");
    expect(out.kits.length).toBeGreaterThan(0);
  });

  it("reads the study from standard input and prints inches with --units in", () => {
    const r = run(["--units", "in"], readFileSync(`${root}public/examples/study.json`, "utf8"));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.units).toBe("in");
    expect(out.kits[0].cut).not.toHaveProperty("diameterMm");
    const mm = JSON.parse(run(["public/examples/study.json"]).stdout);
    expect(out.kits[0].cut.diameterIn * 25.4).toBeCloseTo(mm.kits[0].cut.diameterMm, 9);
  });

  it("exits 2 on an invalid study, listing each bad field by path and reason, without a stack trace", () => {
    const study = JSON.parse(readFileSync(`${root}public/examples/study.json`, "utf8"));
    study.kits[0].boreMm = -1;
    delete study.case.strokeMm;
    const r = run([], JSON.stringify(study));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/kits\.0\.boreMm: /);
    expect(r.stderr).toMatch(/case\.strokeMm: /);
    expect(r.stderr).not.toMatch(/\bat .*\.ts:\d+/);
  });

  it("exits 2 on input that is not JSON", () => {
    const r = run([], "{ not json");
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/not valid JSON/);
  });
});
