// The bench setup card's content, built from a plan snapshot: it states the core's figures for the planned kit
// in the reader's units, its dates in the shop's time zone, and a cannot-fit plan on every page.
import { describe, expect, it } from "vitest";
import { evaluateStudy, mmToIn } from "@/geometry";
import { buildSetupCard, setupCardDrawings } from "@/db/setup-card";
import { SETUP_CARD_CAUTIONS } from "@/model/cautions";
import { roundStudy } from "../scene/fixtures";
import { benchJob, benchPlan } from "./setup-card-plan";

const job = benchJob;
const snapshot = benchPlan;

const line = (lines: { label: string; value: string }[] | null, label: string) => lines?.find((l) => l.label === label)?.value;

describe("the setup card", () => {
  it("states the core's cut for the planned kit, in mm or in inches", () => {
    const plan = snapshot(roundStudy());
    const cut = plan.result.kits[0].cut;
    expect(cut).not.toBeNull();
    const mm = buildSetupCard(job(), plan, "Quillfern Engine Works", "mm");
    expect(mm.plan.map((l) => l.value)).toContain(`${cut!.diameterMm.toFixed(2)} mm`);
    expect(mm.plan.map((l) => l.value)).toContain(`${cut!.depthMm.toFixed(2)} mm`);
    const inches = buildSetupCard(job(), plan, "Quillfern Engine Works", "in");
    // Inch users read decimal inches to 0.001 wherever a measurement is set.
    expect(inches.plan.map((l) => l.value)).toContain(`${mmToIn(cut!.diameterMm).toFixed(3)} in`);
    expect(inches.blanks[0].label).toContain("(in)");
  });

  it("is built for the kit the plan names, not the study's first", () => {
    const plan = snapshot(roundStudy(), 1);
    const card = buildSetupCard(job(), plan, "Quillfern Engine Works", "mm");
    expect(card.kitIndex).toBe(1);
    expect(line(card.header, "Kit")).toBe(plan.result.kits[1].name);
  });

  it("marks a cannot-fit plan on every page: with the owner's override when there is one, else a stop", () => {
    const study = roundStudy();
    const index = evaluateStudy(study).kits.findIndex((k) => k.verdict === "cannot-fit");
    expect(index).toBeGreaterThanOrEqual(0);
    const plan = snapshot(study, index);
    const stopped = buildSetupCard(job(), plan, "Quillfern Engine Works", "mm");
    expect(stopped.verdict.verdict).toBe("cannot-fit");
    expect(stopped.verdict.everyPage).toMatch(/no override recorded: do not cut/);
    expect(stopped.verdict.reasons.length).toBeGreaterThan(0);
    const overridden = buildSetupCard(job({ reason: "the customer supplies a thinner-skirted piston" }), plan, "Quillfern Engine Works", "mm");
    expect(overridden.verdict.everyPage).toContain("Ada Quillfern's override");
    expect(overridden.verdict.everyPage).toContain("the customer supplies a thinner-skirted piston");
    const fitting = buildSetupCard(job(), snapshot(study, study.kits.findIndex((_, i) => i !== index)), "Quillfern Engine Works", "mm");
    expect(fitting.verdict.everyPage).toBeNull();
  });

  it("writes its dates in the shop's time zone, with the zone named", () => {
    const plan = snapshot(roundStudy());
    // Europe/Berlin is UTC+1 in December (IANA time zone database: CET).
    const card = buildSetupCard(job(), plan, "Quillfern Engine Works", "mm", { printedAt: new Date("2026-12-02T23:30:00.000Z"), timeZone: "Europe/Berlin" });
    expect(line(card.header, "Printed")).toBe("3 Dec 2026, 00:30 Europe/Berlin");
    expect(line(card.header, "Study")).toBe("Bench study (plan taken 2 Dec 2026)");
    expect(line(buildSetupCard({ ...job(), engineNumber: "" }, plan, "Quillfern Engine Works", "mm").header, "Engine no.")).toBe("—");
  });

  it("asks for a rig when the study has none, and keeps every caution in the order of the work", () => {
    const study = roundStudy();
    const card = buildSetupCard(job(), snapshot({ ...study, rig: undefined }), "Quillfern Engine Works", "mm");
    expect(card.rig).toBeNull();
    expect(card.rigMissing).toMatch(/No boring rig/);
    expect(card.cautions).toEqual([...SETUP_CARD_CAUTIONS]);
    const withRig = buildSetupCard(job(), snapshot(study), "Quillfern Engine Works", "mm");
    expect(withRig.rig?.length).toBeGreaterThan(0);
    expect(withRig.rigMissing).toBeNull();
  });

  it("leaves one sealing-land blank per case stud, labelled by the stud", () => {
    const study = roundStudy();
    const card = buildSetupCard(job(), snapshot(study), "Quillfern Engine Works", "mm");
    const land = card.blanks.find((b) => b.cellLabels);
    expect(land?.cells).toBe(study.case.studs.length);
    expect(land?.cellLabels).toEqual(study.case.studs.map((s) => s.label));
  });

  it("draws the plan and the section with a scale bar of 50 mm, or 2 in (50.8 mm, the international inch) for inch users", () => {
    const plan = snapshot(roundStudy());
    const mm = setupCardDrawings(plan, 0, "mm");
    expect(mm.map((d) => d.barMm)).toEqual([50, 50]);
    const inches = setupCardDrawings(plan, 0, "in");
    expect(inches.map((d) => [d.barMm, d.barLabel])).toEqual([
      [50.8, "2 in"],
      [50.8, "2 in"],
    ]);
    for (const d of mm) expect(d.caption).toContain(`Scale ${d.scaleText}`);
  });
});
