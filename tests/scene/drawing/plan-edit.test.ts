// The editable plan of a profile being entered: a handle for every corner, stud and circle edge, named so the
// form can find what was touched, and a drag that redraws only the handle and its shape.
import { DOMParser } from "@xmldom/xmldom";
import { describe, expect, it } from "vitest";
import { dragPatch, editDrawing, frameOf } from "@/scene/drawing/plan-edit";
import { squareDeckShapes } from "./shapes";

const shapes = squareDeckShapes;

const handles = (svg: string) =>
  Array.from(new DOMParser().parseFromString(svg, "image/svg+xml").getElementsByTagName("circle"))
    .filter((c) => c.getAttribute("role") === "button")
    .map((c) => c.getAttribute("data-key"));

describe("the editable plan", () => {
  it("offers a handle for every corner, every stud that can be read and the mouth's edge", () => {
    const d = editDrawing(shapes(), { units: "mm" });
    expect(handles(d.svg).sort()).toEqual(["deck:0", "deck:1", "deck:2", "deck:3", "mouth:edge", "pockets.0:0", "pockets.0:1", "pockets.0:2", "studs.0", "studs.1", "studs.2"].sort());
  });

  it("leaves out the handles of a mouth whose diameter comes from its readings, and of studs entered in their own list", () => {
    const d = editDrawing(shapes(), { units: "mm", fixedCircles: ["mouth"], fixedStuds: true });
    const keys = handles(d.svg);
    expect(keys).not.toContain("mouth:edge");
    expect(keys.some((k) => k?.startsWith("studs."))).toBe(false);
    expect(keys).toContain("deck:0");
  });

  it("names each handle by its point in the reader's units", () => {
    const d = editDrawing(shapes(), { units: "in" });
    // 35 mm is 1.378 in to 0.001 (1 in = 25.4 mm exactly, the international inch of 1959).
    expect(d.svg).toContain('aria-label="stud front left: x −1.378 in, y −1.378 in"');
  });

  it("frames every shape and the origin with room to spare, and a default frame when nothing can be read yet", () => {
    const f = frameOf(shapes());
    expect(f.minX).toBeLessThan(-50);
    expect(f.maxX).toBeGreaterThan(50);
    expect(f.minY).toBeLessThan(-50);
    expect(f.maxY).toBeGreaterThan(50);
    const empty = frameOf({ deck: null, mouth: null, studs: [], studHoleDiameterMm: null, pockets: [] });
    expect(empty.minX).toBeLessThan(-50);
    expect(empty.maxX).toBeGreaterThan(50);
  });

  it("redraws a dragged corner and its outline only, with the other corners where they were", () => {
    const patch = dragPatch(shapes(), "deck:2", [60, 55], "mm");
    expect(patch.map((p) => p.part)).toEqual(["handle", "shape"]);
    // Drawing coordinates have y down: the point (60, 55) is drawn at (60, −55).
    expect(patch[0].attrs).toMatchObject({ cx: "60", cy: "-55" });
    expect(patch[1].attrs.d).toBe("M-50 50L50 50L60 -55L-50 -50Z");
  });

  it("sets a circle's diameter from its edge dragged to a point: twice the distance to the centre", () => {
    const [handle, shape] = dragPatch(shapes(), "mouth:edge", [30, 0], "mm");
    expect(handle.attrs.cx).toBe("30");
    expect(handle.attrs["aria-label"]).toContain("diameter Ø 60.00 mm");
    expect(shape.key).toBe("mouth");
  });

  it("moves a stud with its hole's centre cross, and ignores a key that names nothing", () => {
    const patch = dragPatch(shapes(), "studs.1", [36, -34], "mm");
    expect(patch.map((p) => p.part)).toEqual(["handle", "shape", "cross"]);
    expect(patch[1].attrs).toEqual({ cx: "36", cy: "34" });
    expect(dragPatch(shapes(), "studs.3", [0, 0], "mm")).toEqual([]);
    expect(dragPatch(shapes(), "deck:9", [0, 0], "mm")).toEqual([]);
    expect(dragPatch(shapes(), "nothing", [0, 0], "mm")).toEqual([]);
  });
});
