import { z } from "zod";
import { label, lengthMm, nonNegativeMm } from "./schema-fields";
import { MAX_CASE_CORNERS, OutlineSchema, outlineCorners, StudSchema, ThreadDesignationSchema } from "./schema-outline";
import { CaptureSchema } from "./shapes";

// A crankcase as the core reads it: deck, mouth, studs, pockets and the crank chamber below.

export const MouthSchema = z.strictObject({
  outline: OutlineSchema,
  /** How deep the mouth runs below the deck before it opens into the crank chamber. */
  depthMm: lengthMm(),
});

export const PocketSchema = z.strictObject({
  label: label(),
  outline: OutlineSchema,
  /** Depth below the deck where the pocket starts (0 = open at the deck). A cut shallower than this cannot reach it. */
  startDepthMm: nonNegativeMm().default(0),
});

/**
 * The crank chamber below the mouth. The crank axis runs along the case frame's x axis, square under the
 * cylinder axis; the webs (flywheels) are centred on the cylinder axis along it.
 */
export const CrankChamberSchema = z.strictObject({
  /** From the deck down to the crank axis. */
  deckToAxisMm: lengthMm(),
  /** Outer radius of the crank webs (flywheels) about the crank axis. */
  webRadiusMm: lengthMm(),
  /** Width of the webs across the cylinder axis, measured along the crank axis (outer face to outer face). */
  webSpanMm: lengthMm(),
});

export const CaseProfileSchema = z
  .strictObject({
    name: label(),
    deck: OutlineSchema,
    mouth: MouthSchema,
    studs: z.array(StudSchema).min(1).max(16),
    studHoleDiameterMm: lengthMm(),
    studThread: ThreadDesignationSchema.optional(),
    pockets: z.array(PocketSchema).max(32).default([]),
    stockBoreMm: lengthMm(),
    strokeMm: lengthMm(),
    cylinders: z.number().int().min(1).max(12).default(1),
    /** Density of the case alloy; the A356.0-T6 default (MatWeb) applies when absent. */
    densityGPerCm3: z.number().positive().max(25).optional(),
    /** The measurements its shapes were drawn from (geometry/shapes.ts), kept to edit them again; the computation never reads them. */
    capture: CaptureSchema.optional(),
    /** The crank chamber; when absent the skirt's clearance to the crank webs is not checked. */
    crank: CrankChamberSchema.optional(),
  })
  .superRefine((c, ctx) => {
    const corners = outlineCorners(c.deck) + outlineCorners(c.mouth.outline) + c.pockets.reduce((n, p) => n + outlineCorners(p.outline), 0);
    if (corners > MAX_CASE_CORNERS) {
      ctx.addIssue({ code: "custom", path: [], message: `the deck, mouth and pockets have ${corners} corners together; at most ${MAX_CASE_CORNERS}` });
    }
    const seen = new Set<string>();
    c.studs.forEach((s, i) => {
      if (seen.has(s.label)) ctx.addIssue({ code: "custom", path: ["studs", i, "label"], message: `duplicate stud label "${s.label}"` });
      seen.add(s.label);
    });
  });

export type Pocket = z.infer<typeof PocketSchema>;
export type CrankChamber = z.infer<typeof CrankChamberSchema>;
export type CaseProfile = z.infer<typeof CaseProfileSchema>;
