import { z } from "zod";
import { label, lengthMm, nonNegativeMm } from "./schema-fields";
import { OutlineSchema, StudSchema, ThreadDesignationSchema } from "./schema-outline";
import { CaptureSchema } from "./shapes";

// A cylinder kit as the core reads it: bore, skirt readings, studs, gaskets and the base gasket's port windows.

/** A port window of a kit's base gasket, in the case's frame at the deck. */
export const PortWindowSchema = z.strictObject({ label: label(), outline: OutlineSchema });

/** A kit's base gasket at the deck, in the case's frame: its outline (optional) and its transfer-port windows. */
export const BaseGasketSchema = z
  .strictObject({
    outline: OutlineSchema.optional(),
    ports: z.array(PortWindowSchema).max(16).default([]),
  })
  .superRefine((g, ctx) => {
    const seen = new Set<string>();
    g.ports.forEach((p, i) => {
      if (seen.has(p.label)) ctx.addIssue({ code: "custom", path: ["ports", i, "label"], message: `duplicate port label "${p.label}"` });
      seen.add(p.label);
    });
  });

export const CylinderKitSchema = z.strictObject({
  id: label(),
  name: label(),
  boreMm: lengthMm(),
  /** Stroke when the kit changes it (a stroker crank); the case's stroke otherwise. */
  strokeMm: lengthMm().optional(),
  skirtDiameterReadingsMm: z.array(lengthMm()).min(1, "at least one skirt diameter reading"),
  skirtLengthReadingsMm: z.array(lengthMm()).min(1, "at least one skirt length reading"),
  studs: z.array(StudSchema).min(1).max(16),
  studThread: ThreadDesignationSchema.optional(),
  baseGasketsMm: z.array(nonNegativeMm()).default([]),
  /** True when the kit is always run with a base gasket, so the thinnest one may be subtracted from the skirt length. */
  alwaysWithGasket: z.boolean().default(false),
  price: z.number().nonnegative().optional(),
  /** The kit's base gasket with its port windows, for the port overlay. */
  baseGasket: BaseGasketSchema.optional(),
  /** The measurements its base-gasket shapes were drawn from (geometry/shapes.ts); the computation never reads them. */
  capture: CaptureSchema.optional(),
});

export type PortWindow = z.infer<typeof PortWindowSchema>;
export type BaseGasket = z.infer<typeof BaseGasketSchema>;
export type CylinderKit = z.infer<typeof CylinderKitSchema>;
