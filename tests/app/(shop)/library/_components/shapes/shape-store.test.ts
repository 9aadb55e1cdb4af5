import { describe, expect, it } from "vitest";
import { createShapeStore, gesture, switchUnits, type ShapeDoc } from "@/app/(shop)/library/_components/shapes/shape-store";
import { emptyOutline } from "@/app/_ui/form/text-values";

const square = (): ShapeDoc => ({
  deck: { ...emptyOutline("polygon"), pointsMm: [["50", "-50"], ["50", "50"], ["-50", "50"], ["-50", "-50"]] },
  mouth: emptyOutline("circle"),
  studs: [{ label: "a", positionMm: ["28", "28"] }],
  pockets: [{ label: "passage 1", startDepthMm: "0", outline: { ...emptyOutline("polygon"), pointsMm: [["30", "-5"], ["40", "-5"], ["40", "5"], ["30", "5"]] } }],
  capture: { deck: { kind: "chamfered-rect", widthMm: 100, heightMm: 100, chamferMm: 0 } },
});

describe("the shape store", () => {
  it("a dragged corner snaps to 0.1 mm, and undo and redo step through the change", () => {
    const s = createShapeStore(square(), "mm");
    s.getState().act.movePoint("deck:1", [51.234, 49.96]);
    expect(s.getState().doc.deck?.pointsMm[1]).toEqual(["51.2", "50"]);
    s.temporal.getState().undo();
    expect(s.getState().doc.deck?.pointsMm[1]).toEqual(["50", "50"]);
    s.temporal.getState().redo();
    expect(s.getState().doc.deck?.pointsMm[1]).toEqual(["51.2", "50"]);
  });

  it("without the snap a corner goes where it is put, to 0.001 mm", () => {
    const s = createShapeStore(square(), "mm");
    s.getState().act.movePoint("deck:0", [50.04321, -50], false);
    expect(s.getState().doc.deck?.pointsMm[0]).toEqual(["50.043", "-50"]);
  });

  it("in inches a dragged stud snaps to 0.005 in", () => {
    const s = createShapeStore(square(), "in");
    s.getState().act.movePoint("studs.0", [25.4 * 1.1234, 25.4 * 0.5]);
    expect(s.getState().doc.studs[0].positionMm).toEqual(["1.125", "0.5"]);
  });

  it("a whole drag is one undo step, back to where it began", () => {
    const s = createShapeStore(square(), "mm");
    const g = gesture(s);
    for (let i = 1; i <= 10; i++) s.getState().act.movePoint("deck:2", [-50 - i, 50]);
    g.end();
    expect(s.getState().doc.deck?.pointsMm[2]).toEqual(["-60", "50"]);
    expect(s.temporal.getState().pastStates).toHaveLength(1);
    s.temporal.getState().undo();
    expect(s.getState().doc.deck?.pointsMm[2]).toEqual(["-50", "50"]);
  });

  it("a hand edit of the deck drops the measurements it was drawn from; undo brings them back", () => {
    const s = createShapeStore(square(), "mm");
    s.getState().act.insertCorner("deck", 0, [55, 0]);
    expect(s.getState().doc.deck?.pointsMm).toHaveLength(5);
    expect(s.getState().doc.capture.deck).toBeUndefined();
    s.temporal.getState().undo();
    expect(s.getState().doc.capture.deck?.kind).toBe("chamfered-rect");
  });

  it("mirroring a passage across the y axis as a copy adds its image at −x", () => {
    const s = createShapeStore(square(), "mm");
    s.getState().act.mirror("pockets.0", "y", true);
    const p = s.getState().doc.pockets;
    expect(p).toHaveLength(2);
    expect(p[1].outline.pointsMm).toContainEqual(["-40", "-5"]);
    s.temporal.getState().undo();
    expect(s.getState().doc.pockets).toHaveLength(1);
  });

  it("switching units converts the texts and the history, so an undo after the switch is in the new units", () => {
    const s = createShapeStore(square(), "mm");
    s.getState().act.movePoint("deck:1", [63.5, 50.8]);
    switchUnits(s, "in");
    expect(s.getState().doc.deck?.pointsMm[1]).toEqual(["2.5", "2"]);
    s.temporal.getState().undo();
    // 50 mm = 1.9685 in, shown to 0.001 in.
    expect(s.getState().doc.deck?.pointsMm[1]).toEqual(["1.969", "1.969"]);
    expect(s.getState().units).toBe("in");
  });

  it("hovering a point is not an undo step", () => {
    const s = createShapeStore(square(), "mm");
    s.setState({ hover: "deck:1" });
    expect(s.temporal.getState().pastStates).toHaveLength(0);
  });
});
