import { readRoute, writeRoute } from "@/app/api/v1/_lib/http";
import { quoteFor, saveQuote } from "@/db/jobs";
import { QuotePutSchema } from "@/model/quote";

/** The job's quote with its figures; for staff also the shop's rates now and the library's kit price. The job's customer sees it once shared. */
export const GET = readRoute("signed-in", quoteFor);

/** Writes the quote (owner or builder; a deposit other than the shop's share is the owner's, with a reason). Fixed once approved. */
export const PUT = writeRoute(QuotePutSchema, saveQuote);
