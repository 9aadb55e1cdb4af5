import { NextResponse } from "next/server";
import { openApiDocument } from "../_lib/openapi";
import { handle } from "../../_lib/respond";

let cached: ReturnType<typeof openApiDocument> | null = null;

/** The OpenAPI 3.1 description of the library and studies API, for scripts. */
export const GET = handle(async () => {
  cached ??= openApiDocument();
  return NextResponse.json(cached);
});
