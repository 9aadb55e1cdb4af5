// The SVG writers every drawing is made of: numbers rounded to 0.001 mm, every text escaped, a sheet sized in
// millimetres so it prints to scale.
import { DOMParser } from "@xmldom/xmldom";
import { describe, expect, it } from "vitest";
import { el, esc, hdim, n, ringPath, sheet, text, vdim } from "@/scene/drawing/svg";

const parse = (svg: string) => new DOMParser().parseFromString(svg, "image/svg+xml");

describe("the SVG writers", () => {
  it("round every number to 0.001 mm and write no negative zero", () => {
    expect(n(1.23456)).toBe("1.235");
    expect(n(-2.0004)).toBe("-2");
    expect(n(-0.0004)).toBe("0");
    expect(n(12)).toBe("12");
  });

  it("escape the characters markup would read, and leave other text as it is", () => {
    expect(esc(`Tom & Jerry's <"stud">`)).toBe("Tom &amp; Jerry's &lt;&quot;stud&quot;&gt;");
    const plain = "front left";
    expect(esc(plain)).toBe(plain);
  });

  it("write an element with its attributes, leaving out those not given", () => {
    expect(el("circle", { cx: 1.00049, cy: -2, r: undefined, fill: "a&b" })).toBe('<circle cx="1" cy="-2" fill="a&amp;b"/>');
    expect(el("g", { id: "x" }, "<path/>")).toBe('<g id="x"><path/></g>');
  });

  it("close a ring's path, moving to its first point and drawing lines to the rest", () => {
    expect(ringPath([[0, 0], [10, 0], [10, 5.5]])).toBe("M0 0L10 0L10 5.5Z");
  });

  it("escape a label written as text", () => {
    const t = text(0, 0, "A < B", 3);
    expect(parse(`<svg xmlns="http://www.w3.org/2000/svg">${t}</svg>`).getElementsByTagName("text")[0].textContent).toBe("A < B");
  });

  it("centre a horizontal dimension's label between its ends and put a vertical one's beside the line", () => {
    const doc = parse(`<svg xmlns="http://www.w3.org/2000/svg">${hdim(-20, 40, -30, -10, -10, "60.00 mm", 3)}${vdim(50, -10, 10, 40, "20.00 mm", 3)}</svg>`);
    const [h, v] = Array.from(doc.getElementsByTagName("text"));
    expect(Number(h.getAttribute("x"))).toBeCloseTo(10, 3);
    expect(h.getAttribute("text-anchor")).toBe("middle");
    expect(h.textContent).toBe("60.00 mm");
    // Drawn right of the feature, the vertical label starts right of its line.
    expect(Number(v.getAttribute("x"))).toBeGreaterThan(50);
    expect(v.getAttribute("text-anchor")).toBe("start");
  });

  it("make a sheet sized in millimetres with its title, one unit a millimetre", () => {
    const d = sheet("Plan & section", -50, -40, 100, 80, el("rect", { x: 0, y: 0, width: 1, height: 1 }));
    expect(d.widthMm).toBe(100);
    expect(d.heightMm).toBe(80);
    const root = parse(d.svg).documentElement!;
    expect(root.getAttribute("width")).toBe("100mm");
    expect(root.getAttribute("height")).toBe("80mm");
    expect(root.getAttribute("viewBox")).toBe("-50 -40 100 80");
    expect(root.getAttribute("aria-label")).toBe("Plan & section");
    expect(root.getElementsByTagName("title")[0].textContent).toBe("Plan & section");
  });
});
