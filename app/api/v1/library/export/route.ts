import { exportLibraryCsv } from "@/db/csv";
import { LibraryKindQuerySchema } from "@/model/schemas";
import { api, queryOf, staff } from "../../_lib/http";
import { attachmentName } from "../../_lib/files";

/** The shop's case profiles or kits as CSV, in the template's columns. */
export const GET = api(async (req: Request) => {
  const caller = await staff();
  const { kind } = queryOf(req, LibraryKindQuerySchema);
  return new Response(await exportLibraryCsv(caller, kind), {
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": attachmentName(`${kind}.csv`) },
  });
});
