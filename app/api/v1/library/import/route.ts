import { importLibraryCsv } from "@/db/csv";
import { CsvImportSchema, LibraryKindQuerySchema } from "@/model/schemas";
import { api, bodyOf, json, queryOf, staff } from "../../_lib/http";

const MAX_IMPORT_BYTES = 2 * 1024 * 1024;

/** Checks each row of a CSV of case profiles or kits; with confirm, writes the good rows. */
export const POST = api(async (req: Request) => {
  const caller = await staff();
  const { kind } = queryOf(req, LibraryKindQuerySchema);
  const { csv, confirm } = await bodyOf(req, CsvImportSchema, MAX_IMPORT_BYTES);
  return json(await importLibraryCsv(caller, kind, csv, confirm));
});
