// The cautions of the work: worded once, and the setup card (page and PDF) carries each in the order of the
// work. The cautions are common workshop practice, no published source.
import { describe, expect, it } from "vitest";
import { evaluateStudy } from "@/geometry";
import type { PlanSnapshot } from "@/db/jobs";
import { buildSetupCard, setupCardDrawings } from "@/db/setup-card";
import { setupCardPdf } from "@/db/setup-card-pdf";
import { CAUTION, CONSULT_CAUTIONS, SETUP_CARD_CAUTIONS, STUDY_CAUTIONS, TRIAL_CUT_READING, TRIAL_CUT_STEP } from "@/model/cautions";
import { measurePdf } from "../integration/jobs-pdf-measure";
import { roundStudy } from "../scene/fixtures";

/** The cautions a builder meets, in the order of the work (common practice, no published source). */
const IN_ORDER = [
  /Wear eye protection while cutting.* when blowing chips out/,
  /Clamp the case securely without crushing it/,
  /Unplug the drill before fitting, setting or checking the bit/,
  /sleeves, gloves and hair away from the turning shaft/,
  /against its torque kick/,
  /shallow trial cut and measure it before going to full depth/,
  /Keep chips out of the bearings/,
  /never spin a bearing with compressed air/,
  /Remove every chip from the crankcase before assembly/,
  /legal class; local rules decide/,
  /kit maker's instructions; when in doubt, defer to a qualified machinist/,
];

/** Where each pattern first matches in the text, or -1. */
const positions = (text: string) => IN_ORDER.map((re) => text.replace(/\s+/g, " ").search(re));

function card() {
  const study = roundStudy();
  const result = evaluateStudy(study);
  const k = result.kits[0];
  const plan: PlanSnapshot = { studyId: "s1", studyName: "Bench study", kitId: k.kitId, kitName: k.name, study, result, takenAt: "2026-12-02T08:00:00.000Z" };
  const job = { reference: "J-0042", title: "Bench test engine", customer: { name: "Quillfern Engine Works" }, engineNumber: "E-1", caseNumber: "C-1", caseVariant: "", plan: { override: null } };
  return { plan, card: buildSetupCard(job, plan, "Quillfern Engine Works", "mm") };
}

const ascending = (xs: number[]) => xs.every((x, i) => x >= 0 && (i === 0 || x > xs[i - 1]));

describe("the cautions", () => {
  it("the setup card carries every caution, in the order of the work", () => {
    const { card: c } = card();
    expect(c.cautions).toEqual([...SETUP_CARD_CAUTIONS]);
    const at = positions(c.cautions.join(" "));
    expect(at.filter((p) => p < 0), "a caution is missing").toEqual([]);
    expect(ascending(at), `out of order: ${at.join(", ")}`).toBe(true);
  });

  it("the trial cut is a step of the set-up, after the depth stop and before the full cut, with a box for its reading before the cut's readings", () => {
    const { card: c } = card();
    const trial = c.checks.indexOf(TRIAL_CUT_STEP);
    expect(trial).toBeGreaterThan(c.checks.findIndex((s) => s.startsWith("Depth stop confirmed")));
    expect(trial).toBeLessThan(c.checks.findIndex((s) => s.startsWith("Light feed")));
    const box = c.blanks.findIndex((b) => b.label.startsWith(TRIAL_CUT_READING));
    expect(box).toBeGreaterThanOrEqual(0);
    expect(c.blanks[box].cells).toBe(1);
    expect(box).toBeLessThan(c.blanks.findIndex((b) => b.label.startsWith("Cut diameter readings")));
  });

  it("the PDF's first page says the same cautions in the same order", { timeout: 60_000 }, async () => {
    const { plan, card: c } = card();
    const pages = await measurePdf(new Uint8Array(await setupCardPdf(c, setupCardDrawings(plan, c.kitIndex, "mm"))));
    expect(pages.length).toBe(3);
    const at = positions(pages[0].text);
    expect(at.filter((p) => p < 0), "a caution is missing from page 1").toEqual([]);
    expect(ascending(at), `out of order: ${at.join(", ")}`).toBe(true);
    expect(pages[0].text.replace(/\s+/g, " ")).toContain(TRIAL_CUT_READING);
  });

  it("the study page shows them all once; the customer sees only the legal class and the kit maker's instructions", () => {
    expect(new Set(STUDY_CAUTIONS).size).toBe(STUDY_CAUTIONS.length);
    expect([...STUDY_CAUTIONS].sort()).toEqual(Object.values(CAUTION).sort());
    expect(Object.keys(CONSULT_CAUTIONS)).toEqual(["legalClass", "kitMaker"]);
    expect(Object.values(CONSULT_CAUTIONS).join(" ")).not.toMatch(/drill|bearing|sleeves|compressed air/);
  });
});
