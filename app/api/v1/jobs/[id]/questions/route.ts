import { NextResponse } from "next/server";
import { handle, parseWith, readJson } from "@/app/api/_lib/respond";
import { requireCaller } from "@/db/access";
import { askQuestion } from "@/db/jobs";
import { QuestionSchema } from "@/model/schemas/jobs";

/** A question about the plan, kept on the job and mailed to the shop. */
export const POST = handle(async (req: Request, ctx: { params: Promise<{ id: string }> }) => {
  const caller = await requireCaller();
  const { id } = await ctx.params;
  const body = parseWith(QuestionSchema, await readJson(req));
  return NextResponse.json({ item: await askQuestion(caller, id, body.text) }, { status: 201 });
});
