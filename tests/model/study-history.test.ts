import { describe, expect, it } from "vitest";
import { describeChanges, formatMm, type StudySnapshot } from "@/model/study-history";

// The study's history in plain words: one line per change, names looked up, lengths in mm.

const names: Record<string, string> = { c1: "Case A", c2: "Case B", k1: "Kit 47", k2: "Kit 50", r1: "Rig 1" };
const nameOf = (id: string) => names[id] ?? "(deleted)";
const base: StudySnapshot = { name: "Study", notes: "", caseId: "c1", kitIds: ["k1"], rigId: null, cut: null, readings: null, limits: null, chosenKitId: null };

describe("the study's history", () => {
  it("says nothing when nothing changed", () => {
    expect(describeChanges(base, { ...base }, nameOf)).toEqual([]);
  });

  it("names each change, with the names of what the study refers to", () => {
    const after: StudySnapshot = {
      ...base,
      name: "Study 2",
      caseId: "c2",
      kitIds: ["k1", "k2"],
      rigId: "r1",
      cut: { diameterMm: 58, depthMm: 4.5 },
      limits: { minWallMm: 2 },
      chosenKitId: "k2",
      notes: "checked",
    };
    expect(describeChanges(base, after, nameOf)).toEqual([
      'renamed "Study" → "Study 2"',
      "case profile Case A → Case B",
      "added kit Kit 50",
      "rig set to Rig 1",
      "cut diameter proposed → 58.0 mm",
      "cut depth proposed → 4.5 mm",
      "minimum wall default → 2.0 mm",
      "chose kit Kit 50",
      "edited the notes",
    ]);
  });

  it("tells a reorder from an added or removed kit", () => {
    expect(describeChanges({ ...base, kitIds: ["k1", "k2"] }, { ...base, kitIds: ["k2", "k1"] }, nameOf)).toEqual(["reordered the kits"]);
    expect(describeChanges({ ...base, kitIds: ["k1", "k2"] }, { ...base, kitIds: ["k2"] }, nameOf)).toEqual(["removed kit Kit 47"]);
  });

  it("writes lengths with at least one decimal and at most three", () => {
    expect([formatMm(2), formatMm(2.5), formatMm(0.12345)]).toEqual(["2.0", "2.5", "0.123"]);
  });
});
