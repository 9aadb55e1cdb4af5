import { csvTemplate } from "@/db/csv";
import { LibraryKindQuerySchema } from "@/model/schemas";
import { api, queryOf, staff } from "../../_lib/http";
import { attachmentName } from "../../_lib/files";

/** A CSV template for case profiles or kits: the header row and one example row. */
export const GET = api(async (req: Request) => {
  await staff();
  const { kind } = queryOf(req, LibraryKindQuerySchema);
  return new Response(csvTemplate(kind), {
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": attachmentName(`${kind}-template.csv`) },
  });
});
