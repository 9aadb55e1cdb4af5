// The case form's crank chamber texts as the core reads them: all three lengths in mm, or none.
import { describe, expect, it } from "vitest";
import { caseDefaults, caseToCore } from "@/app/(shop)/library/_components/case-values";
import { FormReader } from "@/app/_ui/form/form-reader";

const values = (crank: { deckToAxisMm: string; webRadiusMm: string; webSpanMm: string }) => ({ ...caseDefaults(null, "mm"), crank });

describe("the case form's crank chamber", () => {
  it("is left out when all three lengths are empty", () => {
    const read = new FormReader("mm");
    const core = caseToCore(values({ deckToAxisMm: "", webRadiusMm: " ", webSpanMm: "" }), read) as { crank?: unknown };
    expect(core.crank).toBeUndefined();
    expect(read.issues.filter((i) => i.path[0] === "crank")).toEqual([]);
  });

  it("reads inches into millimetres (1 in = 25.4 mm exactly, by the international yard of 1959)", () => {
    const read = new FormReader("in");
    const core = caseToCore(values({ deckToAxisMm: "2.5", webRadiusMm: "1.25", webSpanMm: "3" }), read) as { crank?: Record<string, number> };
    expect(core.crank?.deckToAxisMm).toBeCloseTo(63.5, 9);
    expect(core.crank?.webRadiusMm).toBeCloseTo(31.75, 9);
    expect(core.crank?.webSpanMm).toBeCloseTo(76.2, 9);
    expect(read.issues.filter((i) => i.path[0] === "crank")).toEqual([]);
  });

  it("with one length missing says so at that length only", () => {
    const read = new FormReader("mm");
    caseToCore(values({ deckToAxisMm: "60", webRadiusMm: "", webSpanMm: "80" }), read);
    expect(read.issues.filter((i) => i.path[0] === "crank")).toEqual([{ path: ["crank", "webRadiusMm"], message: "fill in all three crank chamber lengths, or leave all three empty" }]);
  });

  it("with a length that is no number says so at that length", () => {
    const read = new FormReader("mm");
    caseToCore(values({ deckToAxisMm: "60", webRadiusMm: "3O", webSpanMm: "80" }), read);
    const crankIssues = read.issues.filter((i) => i.path[0] === "crank");
    expect(crankIssues.map((i) => i.path.join("."))).toEqual(["crank.webRadiusMm"]);
  });
});
