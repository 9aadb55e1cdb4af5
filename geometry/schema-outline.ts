import { z } from "zod";
import { coordinateMm, label, lengthMm } from "./schema-fields";
import { describePolygonProblem, polygonProblem } from "./simplicity";

// Points, outlines and studs in the deck plane: the pieces every case and kit schema is drawn from.

/** A point in the deck plane, [x, y] in mm, origin on the cylinder axis at the deck. */
export const Vec2Schema = z.tuple([coordinateMm(), coordinateMm()]).readonly();

/** ISO metric thread designation: "M8" (coarse pitch implied) or "M8x1.25". */
export const ThreadDesignationSchema = z
  .string()
  .trim()
  .regex(/^M\d+(\.\d+)?(\s*[x×]\s*\d+(\.\d+)?)?$/i, "expected an ISO metric thread such as M8 or M8x1.25");

export const CircleOutlineSchema = z.strictObject({
  kind: z.literal("circle"),
  diameterMm: lengthMm(),
  centerMm: Vec2Schema.optional(),
});

// Corners an outline may have: a traced or imported outline needs a few hundred. The totals bound the cost of a
// study: validation is O(n log n) per outline (polygonProblem) and evaluation O(n) per outline and kit.
/** Most corners of one polygon outline. */
export const MAX_OUTLINE_CORNERS = 2000;
/** Most corners of a case's outlines together (deck, mouth and pockets). */
export const MAX_CASE_CORNERS = 6000;
/** Most corners of a study's outlines together (the case's and every kit's). */
export const MAX_STUDY_CORNERS = 20_000;

/** Number of corners of an outline (a circle has none). */
export function outlineCorners(outline: { kind: string; pointsMm?: readonly unknown[] } | undefined): number {
  return outline?.kind === "polygon" ? (outline.pointsMm?.length ?? 0) : 0;
}

export const PolygonOutlineSchema = z
  .strictObject({
    kind: z.literal("polygon"),
    pointsMm: z
      .array(Vec2Schema)
      .min(3, "a polygon needs at least 3 points")
      .max(MAX_OUTLINE_CORNERS, `a polygon has at most ${MAX_OUTLINE_CORNERS} corners`),
  })
  .superRefine((poly, ctx) => {
    const problem = polygonProblem(poly.pointsMm);
    if (problem) ctx.addIssue({ code: "custom", path: ["pointsMm"], message: describePolygonProblem(problem, poly.pointsMm.length) });
  });

/** A closed outline in the deck plane: a circle (analytic) or a simple polygon. */
export const OutlineSchema = z.discriminatedUnion("kind", [CircleOutlineSchema, PolygonOutlineSchema]);

export const StudSchema = z.strictObject({ label: label(), positionMm: Vec2Schema });

export type Outline = z.infer<typeof OutlineSchema>;
export type CircleOutline = z.infer<typeof CircleOutlineSchema>;
export type PolygonOutline = z.infer<typeof PolygonOutlineSchema>;
export type Stud = z.infer<typeof StudSchema>;
