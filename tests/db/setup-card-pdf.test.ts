// The setup card's PDF as printed: the figures on page 1, each drawing on a landscape page of its own at its
// stated scale — measured in the PDF itself — and a cannot-fit plan marked on every page.
import { describe, expect, it } from "vitest";
import type { Study } from "@/geometry";
import type { PlanSnapshot } from "@/db/jobs";
import { buildSetupCard, drawingScale, scaleText, setupCardDrawings, DRAWING_ROOM_MM } from "@/db/setup-card";
import { setupCardPdf } from "@/db/setup-card-pdf";
import { VERDICT_COLOURS } from "@/model/palette";
import { measurePdf, widestBox } from "../integration/jobs-pdf-measure";
import { benchJob, benchPlan } from "./setup-card-plan";
import { roundStudy } from "../scene/fixtures";

// The job and its plan, as the content test builds its card from (tests/db/setup-card-plan.ts).
const job = (_plan: PlanSnapshot, override: { reason: string } | null = null) => benchJob(override);
const snapshot = (study: Study) => benchPlan(study);

describe("the drawings' scale on the card", () => {
  it("is the largest of 1:1, 1:2, 1:4 that fits the landscape page's room", () => {
    expect(drawingScale({ widthMm: 212, heightMm: 150 })).toBe(1);
    expect(drawingScale({ widthMm: DRAWING_ROOM_MM.width + 1, heightMm: 100 })).toBe(0.5);
    expect(drawingScale({ widthMm: 300, heightMm: DRAWING_ROOM_MM.height * 2 + 1 })).toBe(0.25);
    expect(scaleText(1)).toBe("1:1");
    expect(scaleText(0.5)).toBe("1:2");
    expect(scaleText(0.25)).toBe("1:4");
  });
});

// Making a PDF and reading it back takes a few seconds on a busy two-core machine.
describe("the setup card PDF", { timeout: 60_000 }, () => {
  it("prints each drawing on its own page at the scale its caption states, measured in the PDF", async () => {
    const plan = snapshot(roundStudy());
    const card = buildSetupCard(job(plan), plan, "Quillfern Engine Works", "mm");
    const drawings = setupCardDrawings(plan, card.kitIndex, "mm");
    expect(drawings.length).toBe(2);
    const pages = await measurePdf(new Uint8Array(await setupCardPdf(card, drawings)));
    expect(pages.length).toBe(1 + drawings.length);
    // Page 1 is A4 portrait (210 × 297 mm, ISO 216), the drawing pages A4 landscape.
    expect(pages[0].widthMm).toBeCloseTo(210, 0);
    expect(pages[0].heightMm).toBeCloseTo(297, 0);
    drawings.forEach((d, i) => {
      const p = pages[i + 1];
      expect(p.widthMm).toBeCloseTo(297, 0);
      expect(p.heightMm).toBeCloseTo(210, 0);
      // The drawing's sheet (its white ground) is the widest painted box on the page.
      const sheet = widestBox(p);
      expect(sheet, `page ${i + 2}`).toBeDefined();
      expect(Math.abs(sheet!.widthMm - d.widthMm * d.scale), `${d.title} printed width`).toBeLessThan(0.5);
      expect(Math.abs(sheet!.heightMm - d.heightMm * d.scale), `${d.title} printed height`).toBeLessThan(0.5);
      expect(p.text).toContain(`Scale ${d.scaleText}`);
      // The scale bar is drawn at the same scale: 50 mm long at 1:1.
      const bar = p.boxes.find((b) => b.heightMm < 2 && b.heightMm > 1 && Math.abs(b.widthMm - 50 * d.scale) < 0.3);
      expect(bar, `${d.title} scale bar`).toBeDefined();
    });
    expect(pages[0].text).not.toContain("1:1 when printed at 100 %");
    expect(pages.every((p) => !/CANNOT FIT SAFELY/.test(p.text))).toBe(true);
  });

  it("states the verdict at the top of page 1 and marks every page of a cannot-fit plan with the owner's override", async () => {
    // A 75 mm cut on the example's 100 mm deck breaks into the transfer passages and the stud holes.
    const plan = snapshot(roundStudy({ diameterMm: 75 }));
    expect(plan.result.kits[0].verdict).toBe("cannot-fit");
    const card = buildSetupCard(job(plan, { reason: "passages to be welded and re-cut" }), plan, "Quillfern Engine Works", "mm");
    expect(card.verdict.words).toBe("Cannot fit safely");
    expect(card.verdict.color).toBe(VERDICT_COLOURS["cannot-fit"].color.light);
    const pages = await measurePdf(new Uint8Array(await setupCardPdf(card, setupCardDrawings(plan, card.kitIndex, "mm"))));
    expect(pages.length).toBe(3);
    for (const p of pages) expect(p.text.replace(/\s+/g, " ")).toMatch(/CANNOT FIT SAFELY — planned on Ada Quillfern's override \(2 Dec 2026\): passages to be welded/);
    expect(pages[0].text).toMatch(/Cannot fit safely — /);
  });

  it("embeds the two faces from their TrueType files and keeps the text searchable", async () => {
    const plan = snapshot(roundStudy());
    const card = buildSetupCard(job(plan), plan, "Quillfern Engine Works", "mm");
    const pdf = await setupCardPdf(card, []);
    const raw = pdf.toString("latin1");
    expect((raw.match(/\/FontFile2 \d+ 0 R/g) ?? []).length).toBe(2);
    expect(raw).toMatch(/\/BaseFont \/[A-Z]{6}\+Inter-Regular/);
    expect(raw).toMatch(/\/BaseFont \/[A-Z]{6}\+SourceCodePro-Regular/);
    const [page] = await measurePdf(new Uint8Array(pdf));
    expect(page.text).toMatch(/Wear eye protection while cutting; aluminium chips fly\./);
    expect(page.text).toMatch(/Fits after the cut|Fits as it is/);
  });
});
