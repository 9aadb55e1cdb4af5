// The drawings as they are drawn today, pinned to the character for the example study and its variants, so a
// rearrangement of the drawing code shows up as a change of the markup. The example study's drawings in mm are
// kept whole (a change shows as a readable difference); the variants by a digest of their markup. When a
// drawing is meant to change, look at the difference and update (`npx vitest run --project unit -u tests/scene/drawing`).
import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import type { Drawing } from "@/scene/drawing/svg";
import { evaluateStudy, parseStudy, type LengthUnits, type Study } from "@/geometry";
import { editDrawing, type EditShapes } from "@/scene/drawing/plan-edit";
import { planDrawing } from "@/scene/drawing/plan";
import { sectionDrawing } from "@/scene/drawing/section";
import { exampleInput, polygonStudy, roundStudy } from "../fixtures";
import { squareDeckShapes } from "./shapes";

/** The example study with its first pocket starting below the deck (a level of its own in the section). */
function deepPocketStudy(): Study {
  const s = exampleInput();
  s.case.pockets = (s.case.pockets ?? []).map((p, i) => (i === 0 ? { ...p, startDepthMm: 8 } : p));
  return parseStudy(s);
}

/** The drawing as it is, or by a digest of its markup. */
const pinned = (d: Drawing | string, whole: boolean) => {
  const svg = typeof d === "string" ? d : d.svg;
  const markup = whole ? svg : `sha256 ${createHash("sha256").update(svg).digest("hex")} (${svg.length} characters)`;
  return typeof d === "string" ? markup : { ...d, svg: markup };
};

const studies: [string, () => Study][] = [
  ["the example study", () => parseStudy(exampleInput())],
  ["a pocket below the deck", deepPocketStudy],
  ["a round deck with a cut", () => roundStudy({ diameterMm: 55.1, depthMm: 25.25 })],
  ["a round deck with no cut", () => roundStudy()],
  ["a polygon mouth", () => polygonStudy({ diameterMm: 54, depthMm: 20 })],
];

describe.each(studies)("the drawings of %s", (name, make) => {
  const study = make();
  const result = evaluateStudy(study);
  const kits = study.kits.map((_, i) => i);
  const units: LengthUnits[] = ["mm", "in"];

  it.each(units)("draw the plan of every kit the same (%s)", (u) => {
    const whole = name === "the example study" && u === "mm";
    for (const i of kits) expect(pinned(planDrawing(study, result, i, u), whole)).toMatchSnapshot();
    expect(pinned(planDrawing(study, result, 0, u, { scaleNote: null }).svg, whole)).toMatchSnapshot();
  });

  it.each(units)("draw the section of every kit the same, full and compact (%s)", (u) => {
    const whole = name === "the example study" && u === "mm";
    for (const i of kits) {
      expect(pinned(sectionDrawing(study, result, i, u), whole)).toMatchSnapshot();
      expect(pinned(sectionDrawing(study, result, i, u, { compact: true }).svg, whole)).toMatchSnapshot();
    }
  });
});

/** The square-deck shapes with a stud not named yet, a round passage starting below the deck, and a passage not readable yet. */
const shapes = (): EditShapes => {
  const s = squareDeckShapes();
  return {
    ...s,
    studs: s.studs.map((st, i) => (i === 1 && st ? { ...st, label: "" } : st)),
    pockets: [
      ...s.pockets,
      { label: "", outline: { kind: "circle", diameterMm: 6, centerMm: [-20, 10] }, startDepthMm: 4 },
      { label: "unread", outline: null, startDepthMm: 0 },
    ],
  };
};

describe("the editable plan", () => {
  it("draws the shapes as entered the same", () => {
    expect(pinned(editDrawing(shapes(), { units: "mm" }), true)).toMatchSnapshot();
    expect(pinned(editDrawing(shapes(), { units: "in", title: "Gasket as entered", words: { deck: "gasket", mouth: "bore", pocket: "port" } }).svg, false)).toMatchSnapshot();
  });

  it("draws the highlight, the picked point, the issues and a drag the same", () => {
    const issues = [
      { at: "deck", message: "the deck crosses itself" },
      { at: "deck", message: "a second message for the deck" },
      { at: "studs.2", message: "the stud stands outside the deck" },
      { at: "pockets.0", message: "the passage leaves the deck" },
      { at: "mouth", message: "the mouth is wider than the deck" },
    ];
    const frame = { minX: -80, minY: -70, maxX: 90, maxY: 70 };
    expect(pinned(editDrawing(shapes(), { units: "mm", highlight: "deck:2", selected: "studs.0", issues }).svg, true)).toMatchSnapshot();
    expect(pinned(editDrawing(shapes(), { units: "mm", highlight: "mouth", selected: "mouth:edge", frame, dragging: true, fixedCircles: ["mouth"], fixedStuds: true }).svg, false)).toMatchSnapshot();
  });

  it("draws an empty profile the same", () => {
    expect(pinned(editDrawing({ deck: null, mouth: null, studs: [], studHoleDiameterMm: null, pockets: [] }, { units: "mm" }), false)).toMatchSnapshot();
    expect(pinned(editDrawing({ deck: null, mouth: { kind: "polygon", pointsMm: [[-10, -10], [10, -10], [0, 12]] }, studs: [{ label: "only", positionMm: [20, 0] }], studHoleDiameterMm: 0, pockets: [] }, { units: "mm" }).svg, false)).toMatchSnapshot();
  });
});
