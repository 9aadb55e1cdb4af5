import { describe, expect, it } from "vitest";
import { describeChanges, type StudySnapshot } from "@/model/study-history";
import { recordMmText } from "@/model/units";

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
    expect([recordMmText(2), recordMmText(2.5), recordMmText(0.12345)]).toEqual(["2.0", "2.5", "0.123"]);
  });

  it("tells a rig changed from one set or removed, and a cut value from one proposed", () => {
    const rigged = { ...base, rigId: "r1" };
    expect(describeChanges(rigged, { ...base, rigId: "r2" }, nameOf)).toEqual(["rig Rig 1 → (deleted)"]);
    expect(describeChanges(rigged, base, nameOf)).toEqual(["removed the rig Rig 1"]);
    const cut = { ...base, cut: { diameterMm: 54, depthMm: 25.25 } };
    expect(describeChanges(cut, { ...base, cut: { diameterMm: 54.5, depthMm: 25.25 } }, nameOf)).toEqual(["cut diameter 54.0 → 54.5 mm"]);
    expect(describeChanges(cut, base, nameOf)).toEqual(["cut diameter 54.0 → proposed", "cut depth 25.25 → proposed"]);
  });

  it("states the centring offset set or removed, and the holder heights by their count", () => {
    const offset = { ...base, cut: { centerOffsetMm: [0.1, -0.25] as const } };
    expect(describeChanges(base, offset, nameOf)).toEqual(["cut centring offset set to (0.1, -0.25) mm"]);
    expect(describeChanges(offset, base, nameOf)).toEqual(["cut centring offset removed"]);
    const one = { ...base, readings: { holderHeights: [{ stud: "front left", heightMm: 30, straightedgeMm: 0 }] } };
    expect(describeChanges(base, one, nameOf)).toEqual(["holder heights changed (1 reading)"]);
    expect(describeChanges(one, { ...base, readings: { holderHeights: [] } }, nameOf)).toEqual(["holder heights cleared"]);
  });

  it("writes a limit in its own unit, a list of classes, and a limit back to its default", () => {
    const before = { ...base, limits: { cuttingSpeedMaxMPerMin: 120, displacementClassesCc: [50, 125] } };
    const after = { ...base, limits: { displacementClassesCc: [] } };
    expect(describeChanges(before, after, nameOf)).toEqual(["highest cutting speed 120.0 m/min → default", "displacement classes 50, 125 cc → none"]);
  });

  it("says when the chosen kit is cleared", () => {
    expect(describeChanges({ ...base, chosenKitId: "k1" }, base, nameOf)).toEqual(["cleared the chosen kit"]);
  });
});
