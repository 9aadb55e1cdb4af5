// The content of a job's bench setup card, built once from the plan snapshot so the printable page and
// the PDF say exactly the same. Pure (no I/O); it only reads the core's result, never recomputes it.
import type { LengthUnits, Verdict } from "@/geometry";
import { SETUP_CARD_CAUTIONS, TRIAL_CUT_READING, TRIAL_CUT_STEP } from "@/model/cautions";
import { dateText, dateTimeText } from "@/model/dates";
import { depthStopSentence, shimBreakdown } from "@/model/depth-stop-words";
import { TERM } from "@/model/glossary";
import { angleLabel, lengthLabel } from "@/model/units";
import { blockingReasons, TONE_HEX, VERDICT_TEXT, type VerdictTone } from "@/model/verdict";
import { planDrawing } from "@/scene/drawing/plan";
import { sectionDrawing } from "@/scene/drawing/section";
import type { Drawing } from "@/scene/drawing/svg";
import type { Override, PlanSnapshot } from "./jobs";

export type CardLine = { label: string; value: string; warn?: boolean };

/** The study's verdict for the planned kit, as the card states it at the top (and, for a cannot-fit plan, on every page). */
export type CardVerdict = {
  verdict: Verdict;
  words: string;
  tone: VerdictTone;
  /** The verdict's colour as printed. */
  color: string;
  /** What stops a kit that cannot fit, in plain words. */
  reasons: string[];
  /** For a cannot-fit plan: the line every page carries (the owner's override, or that there is none). */
  everyPage: string | null;
};

export type SetupCard = {
  title: string;
  verdict: CardVerdict;
  reference: string;
  shopName: string;
  header: CardLine[];
  plan: CardLine[];
  rig: CardLine[] | null;
  rigMissing: string | null;
  checks: string[];
  cautions: string[];
  blanks: { label: string; cells: number; cellLabels?: string[] }[];
  warnings: string[];
  kitIndex: number;
};

/** The cautions every card carries, in the order of the work. */
export const SETUP_CAUTIONS = SETUP_CARD_CAUTIONS;

type JobLike = {
  reference: string;
  title: string;
  plan?: { override: Override | null } | null;
  customer: { name: string };
  engineNumber: string;
  caseNumber: string;
  caseVariant: string;
};

/** Builds the card for one job from its plan; dates in the shop's time zone (UTC unless given). */
export function buildSetupCard(job: JobLike, plan: PlanSnapshot, shopName: string, units: LengthUnits, opts: { printedAt?: Date; timeZone?: string } = {}): SetupCard {
  const zone = opts.timeZone ?? "UTC";
  const L = (mm: number) => lengthLabel(mm, units);
  const kitIndex = Math.max(0, plan.result.kits.findIndex((k) => k.kitId === plan.kitId));
  const k = plan.result.kits[kitIndex];
  const cut = k.cut;
  const tone = VERDICT_TEXT[k.verdict];
  const override = job.plan?.override ?? null;
  const verdict: CardVerdict = {
    verdict: k.verdict,
    words: tone.words,
    tone: tone.tone,
    color: TONE_HEX[tone.tone],
    reasons: blockingReasons(k),
    everyPage:
      k.verdict !== "cannot-fit"
        ? null
        : override
          ? `${tone.words.toUpperCase()} — planned on ${override.by.name}'s override (${dateText(override.at, zone)}): ${override.reason}`
          : `${tone.words.toUpperCase()} — no override recorded: do not cut before the shop's owner decides.`,
  };
  const header: CardLine[] = [
    { label: "Job", value: `${job.reference} — ${job.title}` },
    { label: "Customer", value: job.customer.name },
    { label: "Engine no.", value: job.engineNumber || "—" },
    { label: "Case no.", value: job.caseNumber || "—" },
    { label: "Case variant", value: job.caseVariant || plan.study.case.name },
    { label: "Kit", value: k.name },
    { label: "Study", value: `${plan.studyName} (plan taken ${dateText(plan.takenAt, zone)})` },
    { label: "Printed", value: dateTimeText(opts.printedAt ?? new Date(), zone) },
  ];
  const planLines: CardLine[] = cut
    ? [
        { label: TERM.cutDiameter.label, value: L(cut.diameterMm) },
        { label: TERM.cutDepth.label, value: L(cut.depthMm) },
        { label: TERM.skirtDiameter.label, value: L(k.skirt.diameterMm) },
        { label: TERM.skirtProtrusion.label, value: L(k.skirt.protrusionMm) },
        { label: TERM.clearanceToCut.label, value: k.radialClearanceMm.vsCut === null ? "—" : L(k.radialClearanceMm.vsCut) },
        { label: TERM.depthClearance.label, value: k.depthClearanceMm === null ? (cut.throughMouth ? "no step (cut opens into the crankcase)" : "—") : L(k.depthClearanceMm) },
        {
          label: TERM.thinnestWall.label,
          value: k.thinnestWall ? `${L(k.thinnestWall.minWallMm)} at ${k.thinnestWall.label}` : "—",
          warn: k.thinnestWall ? !k.thinnestWall.ok : false,
        },
        { label: TERM.displacement.label, value: `${k.displacementCc.stockRounded} cc to ${k.displacementCc.kitRounded} cc` },
      ]
    : [{ label: "Cut", value: "This kit needs no cut.", warn: false }];
  let rig: CardLine[] | null = null;
  let rigMissing: string | null = null;
  if (k.rig) {
    const r = k.rig;
    rig = [
      { label: TERM.cutterSetting.label, value: L(r.cutterSettingToSetMm ?? r.cutterSettingMm) },
      {
        label: "Bit length",
        value: r.bitReaches
          ? `${L(r.bitLengthMm)} — reaches (${L(r.bitReachMm.min)} to ${L(r.bitReachMm.max)})`
          : r.grindOffMm > 0
            ? `${L(r.bitLengthMm)} — too long: grind off ${L(r.grindOffMm)}`
            : `${L(r.bitLengthMm)} — too short by ${L(r.bitTooShortByMm)}`,
        warn: !r.bitReaches,
      },
      {
        label: TERM.depthStop.label,
        value: [depthStopSentence(r.depthStop, units), shimBreakdown(r.depthStop, units)].filter(Boolean).join("; "),
        warn: !r.depthStop.reached,
      },
      {
        label: TERM.spindleSpeed.label,
        value: `${Math.round(r.spindleRpm.min)}–${Math.round(Math.min(r.spindleRpm.max, r.spindleRpm.drillTopRpm))} rpm (drill top ${Math.round(r.spindleRpm.drillTopRpm)} rpm)`,
        warn: r.spindleRpm.drillTooSlow,
      },
      {
        label: TERM.screwHeads.label,
        value: r.hardwareClears === null ? "not given" : r.hardwareClears ? `clears by ${L(r.hardwareClearanceMm ?? 0)}` : `strikes: ${L(-(r.hardwareClearanceMm ?? 0))} too far out`,
        warn: r.hardwareClears === false,
      },
    ];
  } else {
    rigMissing = "No boring rig in the study: add one to get the cutter setting, the depth stop and the speed.";
  }
  const studs = plan.study.case.studs.map((s) => s.label);
  const heights = plan.study.readings?.holderHeights ?? [];
  const align = k.alignment;
  const maxRock = plan.result.limits.values.maxRockMm;
  const checks = [
    `Studs and spacers even: the same spacer stack on every stud (${studs.join(", ")}).`,
    heights.length
      ? `Holder heights read at each stud and within tolerance (planned: ${heights.map((h) => `${h.stud} ${L(h.heightMm + h.straightedgeMm)}`).join(", ")}${align ? `; tilt ${angleLabel(align.tiltDeg)}, rocking ${L(align.rockMm)} of ${L(maxRock)} allowed` : ""}).`
      : `Holder heights read at each stud and within tolerance (rocking at most ${L(maxRock)}).`,
    "Bit orientation: cutting edge leading in the direction of rotation; bit tight in the head.",
    k.rig ? `Cutter setting read across the head and bit: ${L(k.rig.cutterSettingToSetMm ?? k.rig.cutterSettingMm)}.` : "Cutter setting read across the head and bit.",
    k.rig?.depthStop.reached
      ? "Depth stop set as above and confirmed with the bit resting on the deck."
      : "Depth stop confirmed with the bit resting on the deck.",
    TRIAL_CUT_STEP,
    "Light feed, drill at the speed above; stop at the ring and let the cutter dwell before withdrawing.",
  ];
  const blanks = [
    { label: `${TRIAL_CUT_READING} (${units})`, cells: 1 },
    { label: `${TERM.cutDiameter.label} readings (${units})`, cells: 3 },
    { label: `${TERM.cutDepth.short} readings (${units})`, cells: 3 },
    { label: `${TERM.sealingLand.short} at each stud (${units})`, cells: studs.length, cellLabels: studs },
    { label: `Gasket stack used (${units})`, cells: 1 },
    { label: "Crankcase cleaned of chips ☐   Trial fit: goes fully home ☐ / binds ☐", cells: 0 },
  ];
  return {
    title: `Setup card — ${job.reference}`,
    verdict,
    reference: job.reference,
    shopName,
    header,
    plan: planLines,
    rig,
    rigMissing,
    checks,
    cautions: [...SETUP_CAUTIONS],
    blanks,
    warnings: k.warnings.map((w) => w.message),
    kitIndex,
  };
}

/** A drawing as the card prints it: at a stated scale that fits its page, with a bar to check the print by. */
export type CardDrawing = Drawing & {
  /** Printed size ÷ true size: 1 is full size. */
  scale: number;
  /** "1:1", "1:2", … */
  scaleText: string;
  /** The length the scale bar stands for, mm (50 mm, or 2 in for inch users), and its label. */
  barMm: number;
  barLabel: string;
  caption: string;
};

/**
 * The room a drawing has on its own landscape page, mm: A4 (297 × 210) and Letter (279.4 × 215.9) alike, less
 * 10 mm margins, the heading above and the caption and scale bar below.
 */
export const DRAWING_ROOM_MM = { width: 259, height: 150 } as const;

/** The scales a drawing is printed at, largest first: full size when it fits the page, else half, else a quarter. */
export const DRAWING_SCALES = [1, 1 / 2, 1 / 4] as const;

/** The largest of DRAWING_SCALES at which a drawing fits DRAWING_ROOM_MM. */
export function drawingScale(d: { widthMm: number; heightMm: number }): number {
  const fits = DRAWING_SCALES.find((s) => d.widthMm * s <= DRAWING_ROOM_MM.width && d.heightMm * s <= DRAWING_ROOM_MM.height);
  return fits ?? Math.min(DRAWING_ROOM_MM.width / d.widthMm, DRAWING_ROOM_MM.height / d.heightMm);
}

/** A scale as the trade writes it ("1:1", "1:2"), or "1:3.7" for an odd one. */
export function scaleText(scale: number): string {
  const d = 1 / scale;
  return `1:${Number.isInteger(Math.round(d * 10) / 10) ? Math.round(d) : (Math.round(d * 10) / 10).toString()}`;
}

/**
 * The card's two drawings of the planned kit (plan at the deck, section through the axis), each for a page of
 * its own at a stated scale, the same for the printable page and the PDF. A plan the drawing code cannot draw
 * leaves the card without drawings rather than without its figures.
 */
export function setupCardDrawings(plan: PlanSnapshot, kitIndex: number, units: LengthUnits): CardDrawing[] {
  let drawings: Drawing[];
  try {
    // The card states each drawing's scale itself, so the plan's own corner note is left out.
    drawings = [planDrawing(plan.study, plan.result, kitIndex, units, { scaleNote: null }), sectionDrawing(plan.study, plan.result, kitIndex, units)];
  } catch (error) {
    // The figures are the card; the drawings only illustrate them, so the card is still printed without them.
    console.warn("setup card: the plan could not be drawn; the card is printed without its drawings.", error);
    return [];
  }
  const barMm = units === "in" ? 50.8 : 50;
  const barLabel = units === "in" ? "2 in" : "50 mm";
  return drawings.map((d) => {
    const scale = drawingScale(d);
    const text = scaleText(scale);
    const caption =
      scale === 1
        ? `Scale 1:1 — full size when printed at 100 % (turn off “fit to page”). Check the print: the bar is ${barLabel} long.`
        : `Scale ${text} — too large for the page at full size. The bar stands for ${barLabel}; measure the part, not the print.`;
    return { ...d, scale, scaleText: text, barMm, barLabel, caption };
  });
}
