import { readFileSync } from "node:fs";
import { parseStudy, type Study, type StudyInput } from "@/geometry";

// Invented demo data only (the example study of the product, and variants of it).

export function exampleInput(): StudyInput {
  return JSON.parse(readFileSync(new URL("../../public/examples/study.json", import.meta.url), "utf8")) as StudyInput;
}

/** The example study with a round deck and a round mouth. */
export function roundStudy(cut?: { diameterMm?: number; depthMm?: number }): Study {
  const s = exampleInput();
  s.case.deck = { kind: "circle", diameterMm: 100 };
  s.cut = cut;
  return parseStudy(s);
}

/** The example study with a polygon deck and a polygon (twelve-sided, flattened) mouth. */
export function polygonStudy(cut?: { diameterMm?: number; depthMm?: number }): Study {
  const s = exampleInput();
  const pts: [number, number][] = [];
  for (let i = 0; i < 12; i++) {
    const a = (2 * Math.PI * i) / 12;
    pts.push([24 * Math.cos(a), 22 * Math.sin(a)]);
  }
  s.case.mouth = { outline: { kind: "polygon", pointsMm: pts }, depthMm: 26 };
  s.cut = cut;
  s.readings = undefined;
  return parseStudy(s);
}

/** The example study with a Ø 58.6 mm cut: wide enough to leave too little wall beside kit 0's matched passages. */
export function thinPortWallStudy(): Study {
  const s = exampleInput();
  s.cut = { diameterMm: 58.6 };
  return parseStudy(s);
}
