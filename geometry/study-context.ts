import { type PlaneFit, axisAtDepthMm } from "./alignment";
import type { ResolvedLimits } from "./resolve-limits";
import type { Study } from "./schema";
import type { Vec2 } from "./vec";

/** Everything case-wide that each kit's evaluation shares. */
export interface StudyContext {
  readonly study: Study;
  readonly tol: number;
  readonly limits: ResolvedLimits["values"];
  /** Where the rig's bearing sits at the deck: stud-pattern centre + centring offset. */
  readonly bearing: Vec2;
  /** The holder's plane from the readings, or null when the holder is taken as level. */
  readonly plane: PlaneFit | null;
  readonly densityGPerCm3: number;
  readonly densityDefaulted: boolean;
  readonly stockCc: number;
  readonly caseMaxCutDiameterMm: number;
}

/** The tool axis's centre at depth z below the deck (the bearing itself when the holder is level). */
export function axisAt(ctx: Pick<StudyContext, "plane" | "bearing">, zMm: number): Vec2 {
  return ctx.plane ? axisAtDepthMm(ctx.plane, ctx.bearing, zMm) : ctx.bearing;
}
