import { z } from "zod";
import { CaseProfileSchema } from "./schema-case";
import { label } from "./schema-fields";
import { CylinderKitSchema } from "./schema-kit";
import { StudyLimitsSchema } from "./schema-limits";
import { MAX_STUDY_CORNERS, outlineCorners } from "./schema-outline";
import { BoringRigSchema, CutPlanSchema, ReadingsSchema } from "./schema-rig";

// Input schemas of the core, by concern: outlines and studs (schema-outline.ts), the case (schema-case.ts), the
// kit (schema-kit.ts), the rig and its cut (schema-rig.ts), the limits (schema-limits.ts); here, the study that
// holds them. Every length is in millimetres and says so in its name.

export * from "./schema-case";
export * from "./schema-kit";
export * from "./schema-limits";
export * from "./schema-outline";
export * from "./schema-rig";

/** Corners of a kit's own outlines (its base gasket and port windows). */
function kitCorners(kit: { baseGasket?: { outline?: { kind: string; pointsMm?: readonly unknown[] }; ports: readonly { outline: { kind: string; pointsMm?: readonly unknown[] } }[] } }): number {
  const g = kit.baseGasket;
  return g ? outlineCorners(g.outline) + g.ports.reduce((n, p) => n + outlineCorners(p.outline), 0) : 0;
}

/** A study: one case, one or more candidate kits, and optionally a cut plan, a rig, holder readings and limits. */
export const StudySchema = z
  .strictObject({
    name: label().optional(),
    case: CaseProfileSchema,
    kits: z.array(CylinderKitSchema).min(1, "at least one kit").max(100),
    cut: CutPlanSchema.optional(),
    rig: BoringRigSchema.optional(),
    readings: ReadingsSchema.optional(),
    limits: StudyLimitsSchema.optional(),
  })
  .superRefine((study, ctx) => {
    const corners = outlineCorners(study.case.deck) + outlineCorners(study.case.mouth.outline) + study.case.pockets.reduce((n, p) => n + outlineCorners(p.outline), 0) + study.kits.reduce((n, k) => n + kitCorners(k), 0);
    if (corners > MAX_STUDY_CORNERS) ctx.addIssue({ code: "custom", path: [], message: `the study's outlines have ${corners} corners together; at most ${MAX_STUDY_CORNERS}` });
    const ids = new Set<string>();
    study.kits.forEach((k, i) => {
      if (ids.has(k.id)) ctx.addIssue({ code: "custom", path: ["kits", i, "id"], message: `duplicate kit id "${k.id}"` });
      ids.add(k.id);
    });
    const studs = new Set(study.case.studs.map((s) => s.label));
    const used = new Set<string>();
    study.readings?.holderHeights.forEach((r, i) => {
      if (!studs.has(r.stud)) {
        ctx.addIssue({ code: "custom", path: ["readings", "holderHeights", i, "stud"], message: `no case stud labelled "${r.stud}"` });
      } else if (used.has(r.stud)) {
        ctx.addIssue({ code: "custom", path: ["readings", "holderHeights", i, "stud"], message: `a second reading at stud "${r.stud}"` });
      }
      used.add(r.stud);
    });
  });

/** A parsed study (defaults such as empty pocket lists filled in). */
export type Study = z.infer<typeof StudySchema>;
/** A study as written in JSON, before defaults are filled in. */
export type StudyInput = z.input<typeof StudySchema>;
