import { readFileSync } from "node:fs";

// The framework's own floor for `npm run bench:api`: a route handler of this same production server that
// answers a JSON text it already holds, with no session check and no database. It exists only when the
// server was started with BOREWRIGHT_BENCH_FLOOR naming a JSON file of those texts ({ "results": "…",
// "list": "…" }, which the benchmark writes from the real answers); otherwise every path under it is a 404.

export const dynamic = "force-dynamic";

type Context = { params: Promise<{ what: string }> };

let bodies: Record<string, string> | null = null;

function notFound(): Response {
  return Response.json({ error: { code: "not_found", message: "No such page." } }, { status: 404, headers: { "cache-control": "no-store" } });
}

/** The texts, read once from the file the benchmark wrote; null until it exists. */
function loaded(file: string): Record<string, string> | null {
  if (bodies) return bodies;
  try {
    const parsed = JSON.parse(readFileSync(file, "utf8")) as unknown;
    if (parsed && typeof parsed === "object") bodies = parsed as Record<string, string>;
  } catch {
    return null;
  }
  return bodies;
}

export async function GET(_req: Request, ctx: Context): Promise<Response> {
  const file = process.env.BOREWRIGHT_BENCH_FLOOR;
  if (!file) return notFound();
  const body = loaded(file)?.[(await ctx.params).what];
  if (typeof body !== "string") return notFound();
  return new Response(body, { headers: { "content-type": "application/json", "cache-control": "no-store" } });
}
