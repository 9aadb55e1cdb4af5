import { describe, expect, it } from "vitest";
import { Color, Float32BufferAttribute, LineDashedMaterial, LineLoop, Mesh, MeshBasicMaterial, type Object3D } from "three";
import { evaluateStudy, parseStudy } from "@/geometry";
import { FIT } from "@/model/palette";
import { OVERLAY_LIFT_MM, PortOverlayMaterials, portOverlay } from "@/scene/three/port-overlay";
import { exampleInput, thinPortWallStudy } from "./fixtures";

// The example study (invented): kit 0 carries two rectangular port windows, x 30.2–34.5 and −34.5…−30.2,
// y ±10, over the case's two transfer passages, which are open at the deck.
const study = parseStudy(exampleInput());
const result = evaluateStudy(study);

/** The world points of an object's geometry (world = (x, −z, −y) of the core's frame, z down into the case). */
function points(o: Object3D): [number, number, number][] {
  const a = (o as Mesh).geometry.getAttribute("position") as Float32BufferAttribute;
  return Array.from({ length: a.count }, (_, i) => [a.getX(i), a.getY(i), a.getZ(i)]);
}

const hex = (m: unknown) => `#${((m as LineDashedMaterial | MeshBasicMaterial).color as Color).getHexString()}`;

describe("the 3D view's port overlay", () => {
  const group = portOverlay(study, 0, result.kits[0], new PortOverlayMaterials());

  it("holds a fill and a dash-dotted outline per window, in the port colour, and an outline per passage open at the deck", () => {
    const ports = group.children.filter((o) => o.userData.port);
    expect(ports.map((o) => `${o.userData.port}/${o.userData.part}`)).toEqual(["left transfer/fill", "left transfer/outline", "right transfer/fill", "right transfer/outline"]);
    const outline = ports.find((o) => o.userData.port === "right transfer" && o.userData.part === "outline") as LineLoop;
    expect(outline).toBeInstanceOf(LineLoop);
    expect(outline.material).toBeInstanceOf(LineDashedMaterial);
    expect(hex(outline.material)).toBe(FIT.port.color.light);
    expect(outline.geometry.getAttribute("lineDistance")).toBeDefined();
    const passages = group.children.filter((o) => o.userData.passage).map((o) => o.userData.passage);
    expect(passages).toEqual(["left transfer passage", "right transfer passage"]);
    expect(hex((group.children.find((o) => o.userData.passage) as LineLoop).material)).toBe(FIT.passage.color.light);
  });

  it("lies at the deck, just above it, at the window's corners: core (30.2, 10) is world (30.2, +lift, −10)", () => {
    const outline = group.children.find((o) => o.userData.port === "right transfer" && o.userData.part === "outline")!;
    const p = points(outline);
    expect(p).toHaveLength(4);
    const expected: [number, number, number][] = [
      [30.2, OVERLAY_LIFT_MM, 10],
      [34.5, OVERLAY_LIFT_MM, 10],
      [34.5, OVERLAY_LIFT_MM, -10],
      [30.2, OVERLAY_LIFT_MM, -10],
    ];
    p.forEach((q, i) => q.forEach((v, j) => expect(v).toBeCloseTo(expected[i][j], 5)));
    // The fill covers the same rectangle: two triangles, every vertex on a corner, area 4.3 × 20 = 86 mm².
    const fill = points(group.children.find((o) => o.userData.port === "right transfer" && o.userData.part === "fill")!);
    expect(fill).toHaveLength(6);
    let area = 0;
    for (let i = 0; i < fill.length; i += 3) {
      const [a, b, c] = [fill[i], fill[i + 1], fill[i + 2]];
      area += Math.abs((b[0] - a[0]) * (c[2] - a[2]) - (c[0] - a[0]) * (b[2] - a[2])) / 2;
    }
    // The buffer holds float32: about 7 significant digits.
    expect(area).toBeCloseTo(86, 3);
    for (const q of fill) expect(q[1]).toBeCloseTo(OVERLAY_LIFT_MM, 6);
  });

  it("draws a window in the wall-below-minimum colour when the core says the matched passage leaves too little wall", () => {
    const s = thinPortWallStudy();
    const r = evaluateStudy(s);
    expect(r.kits[0].ports.every((p) => p.ok === false)).toBe(true);
    const g = portOverlay(s, 0, r.kits[0], new PortOverlayMaterials());
    const outlines = g.children.filter((o) => o.userData.part === "outline");
    expect(outlines).toHaveLength(2);
    for (const o of outlines) expect(hex((o as LineLoop).material)).toBe(FIT.wallLow.color.light);
  });

  it("is empty for a kit with no base gasket", () => {
    expect(study.kits[1].baseGasket).toBeUndefined();
    expect(portOverlay(study, 1, result.kits[1], new PortOverlayMaterials()).children).toHaveLength(0);
  });
});
