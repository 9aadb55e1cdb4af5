import { describe, expect, it } from "vitest";
import { evaluateStudy, parseStudy } from "@/geometry";
import { planDrawing } from "@/scene/drawing/plan";
import { portCaption, portsLayer } from "@/scene/drawing/ports";
import { FIT } from "@/model/palette";
import { exampleInput, thinPortWallStudy } from "./fixtures";

// The example study (invented): its short-skirt kit carries two port windows over the case's two passages.
const study = parseStudy(exampleInput());
const result = evaluateStudy(study);

describe("the port overlay on the plan", () => {
  it("draws one window per port of the kit's base gasket, labelled, in the plan's frame (y flipped)", () => {
    const svg = portsLayer(study, 0, result.kits[0], 3);
    const windows = svg.match(/data-port="[^"]+"/g) ?? [];
    expect(windows).toEqual(['data-port="left transfer"', 'data-port="right transfer"']);
    // The right window's corner (30.2, 10) in the core's frame is (30.2, −10) on the sheet.
    expect(svg).toContain("M30.2 10");
    expect(svg).toContain("right transfer</text>");
  });

  it("draws a window in the port colour, or in the wall-below-minimum colour when the matched passage would leave too little wall", () => {
    const s = thinPortWallStudy();
    const r = evaluateStudy(s);
    expect(r.kits[0].ports.every((p) => p.ok === false)).toBe(true);
    expect(portsLayer(s, 0, r.kits[0], 3)).toContain(`stroke="${FIT.wallLow.color.light}"`);
    expect(portsLayer(s, 0, r.kits[0], 3)).not.toContain(`stroke="${FIT.port.color.light}"`);
    expect(portsLayer(study, 0, result.kits[0], 3)).not.toContain(`stroke="${FIT.wallLow.color.light}"`);
    expect(portsLayer(study, 0, result.kits[0], 3)).toContain(`stroke="${FIT.port.color.light}"`);
  });

  it("is empty for a kit with no base gasket, and the plan drawing carries the windows of the kit shown", () => {
    expect(portsLayer(study, 1, result.kits[1], 3)).toBe("");
    expect(planDrawing(study, result, 0, "mm").svg).toContain('data-port="left transfer"');
    expect(planDrawing(study, result, 1, "mm").svg).not.toContain("data-port");
  });

  it("words a port's figures from the core's result", () => {
    // Right window x 30.2–34.5, y ±10 over the passage (30…35, ±8…9): in 30 − 30.2 = −0.20, out 34.5 − 35 = −0.50;
    // on x = 32.35 the passage's side runs 8 + 1.85/4.5 = 8.41 out, so the sides step 10 − 8.41 = +1.59 mm.
    const p = result.kits[0].ports.find((x) => x.portLabel === "right transfer")!;
    expect(portCaption(p, "mm")).toBe(`right transfer over right transfer passage; steps in −0.20 mm, out −0.50 mm, sides +1.59 mm / +1.59 mm; matched wall ${p.matchedWallMm!.toFixed(2)} mm`);
  });
});
