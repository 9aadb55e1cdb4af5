// Helpers for the jobs tests: a study from the shipped example (invented data) written straight into the
// test database for a shop, and the after-cut readings that pass or fail against its plan.
import { randomUUID } from "node:crypto";
import { readFileSync } from "node:fs";
import { inflateSync } from "node:zlib";
import { testDb, type Http } from "../support/http";

const example = JSON.parse(readFileSync("public/examples/study.json", "utf8"));

/** Writes the example's case, kits, rig and study into a shop; returns the study id and kit ids. */
export async function insertExampleStudy(shopId: string, userId: string, name = "Example study") {
  const db = testDb();
  const now = Date.now();
  const caseId = randomUUID();
  const rigId = randomUUID();
  const studyId = randomUUID();
  const kitIds: string[] = [];
  try {
    const { name: caseName, ...caseData } = example.case;
    await db.execute({
      sql: "insert into case_profile (id, organization_id, name, data_json, created_at, updated_at, created_by) values (?, ?, ?, ?, ?, ?, ?)",
      args: [caseId, shopId, caseName, JSON.stringify(caseData), now, now, userId],
    });
    for (const kit of example.kits) {
      const { name: kitName, ...data } = kit;
      delete data.id;
      // The study file gives a bare price; the library keeps money (integer cents and the currency code), as the migration made of bare prices.
      if (typeof data.price === "number") data.price = { amountMinor: Math.round(data.price * 100), currency: "EUR" };
      const kitId = randomUUID();
      kitIds.push(kitId);
      await db.execute({
        sql: "insert into cylinder_kit (id, organization_id, name, data_json, created_at, updated_at, created_by) values (?, ?, ?, ?, ?, ?, ?)",
        args: [kitId, shopId, kitName, JSON.stringify(data), now, now, userId],
      });
    }
    const { name: rigName, ...rigData } = example.rig;
    await db.execute({
      sql: "insert into boring_rig (id, organization_id, name, data_json, created_at, updated_at, created_by) values (?, ?, ?, ?, ?, ?, ?)",
      args: [rigId, shopId, rigName, JSON.stringify(rigData), now, now, userId],
    });
    await db.execute({
      sql: "insert into study (id, organization_id, name, case_id, rig_id, readings_json, limits_json, chosen_kit_id, created_at, updated_at, created_by) values (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)",
      args: [studyId, shopId, name, caseId, rigId, JSON.stringify(example.readings), JSON.stringify(example.limits), kitIds[0], now, now, userId],
    });
    for (const [position, kitId] of kitIds.entries()) {
      await db.execute({ sql: "insert into study_kit (study_id, kit_id, position) values (?, ?, ?)", args: [studyId, kitId, position] });
    }
  } finally {
    db.close();
  }
  return { studyId, kitIds };
}

/** Opens a deposit checkout of 50.00 EUR on a job, as the payment service would answer one; its session id, named with `prefix`. */
export async function openCheckout(jobId: string, userId: string, prefix: string): Promise<string> {
  const sessionId = `cs_${prefix}_${randomUUID()}`;
  const db = testDb();
  try {
    await db.execute({
      sql: "insert into job_payment (id, job_id, checkout_session_id, amount, currency, status, created_by_id) values (?, ?, ?, 5000, 'eur', 'open', ?)",
      args: [randomUUID(), jobId, sessionId, userId],
    });
  } finally {
    db.close();
  }
  return sessionId;
}

export async function me(http: Http): Promise<{ userId: string; shopId: string; email: string; role: string }> {
  const res = await http.get("/api/v1/me");
  return (res.json as { me: { userId: string; shopId: string; email: string; role: string } }).me;
}

/** Readings within the plan of the example's first kit (cut 55.10 × 25.25 mm, skirt 53.96 mm, length 24.7 mm). */
export const PASSING_READINGS = {
  cutDiameterMm: [55.1, 55.12, 55.09],
  cutDepthMm: [25.26, 25.25, 25.27],
  sealingLandMm: [
    { stud: "front left", valueMm: 8.2 },
    { stud: "front right", valueMm: 8.25 },
    { stud: "rear right", valueMm: 8.3 },
    { stud: "rear left", valueMm: 8.22 },
  ],
  gasketStackMm: 0.2,
  chipsCleaned: true,
  trialFit: "goes-home",
};

/** The same with a cut 0.2 mm under size: the skirt clearance falls short. */
export const FAILING_READINGS = { ...PASSING_READINGS, cutDiameterMm: [54.9, 55.0, 54.95] };

export const jobBody = (over: Record<string, unknown> = {}) => ({
  title: "50 cc scooter, big-bore conversion",
  customerName: "Ivy Harrow",
  customerEmail: "customer@quillfern.test",
  engineNumber: "QF50-10231",
  caseNumber: "C-7781",
  caseVariant: "four-stud",
  depositAmount: 5000,
  currency: "eur",
  ...over,
});

/**
 * Pages, embedded TrueType fonts, the text and the drawing operators of a pdfkit PDF: inflates each stream
 * and maps glyph ids back through the fonts' ToUnicode maps; `content` is every inflated content stream
 * (pages, patterns) that is not a font, a character map or a cross-reference table.
 */
export function readPdf(pdf: Buffer): { pages: number; fontsEmbedded: number; text: string; content: string } {
  const raw = pdf.toString("latin1");
  const objects = new Map<string, string>();
  for (const m of raw.matchAll(/(\d+) 0 obj([\s\S]*?)endobj/g)) objects.set(m[1], m[2]);
  const streamOf = (body: string) => {
    const s = body.indexOf("stream") + 6;
    const start = body[s] === "\r" ? s + 2 : s + 1;
    const data = Buffer.from(body.slice(start, body.lastIndexOf("endstream")).replace(/\r?\n$/, ""), "latin1");
    return /FlateDecode/.test(body.slice(0, s)) ? inflateSync(data).toString("latin1") : data.toString("latin1");
  };
  const pages = [...objects.values()].filter((b) => /\/Type \/Page\b/.test(b)).length;
  const fontsEmbedded = [...objects.values()].filter((b) => /\/FontFile2 \d+ 0 R/.test(b)).length;
  // Each font resource name → its glyph-id → text map.
  const maps = new Map<string, Map<string, string>>();
  for (const [id, body] of objects) {
    const m = body.match(/\/Type \/Font[\s\S]*?\/ToUnicode (\d+) 0 R/);
    if (!m || !/\/Subtype \/Type0/.test(body)) continue;
    const cmap = streamOf(objects.get(m[1])!);
    const map = new Map<string, string>();
    for (const range of cmap.matchAll(/<([0-9a-f]+)>\s*<([0-9a-f]+)>\s*\[([^\]]*)\]/gi)) {
      const start = parseInt(range[1], 16);
      [...range[3].matchAll(/<([0-9a-f]*)>/gi)].forEach((u, i) => {
        const hex = u[1];
        let s = "";
        for (let k = 0; k < hex.length; k += 4) s += String.fromCharCode(parseInt(hex.slice(k, k + 4), 16));
        map.set((start + i).toString(16).padStart(4, "0"), s);
      });
    }
    for (const single of cmap.matchAll(/^<([0-9a-f]{4})>\s*<([0-9a-f]+)>$/gim)) {
      let s = "";
      for (let k = 0; k < single[2].length; k += 4) s += String.fromCharCode(parseInt(single[2].slice(k, k + 4), 16));
      map.set(single[1].toLowerCase(), s);
    }
    maps.set(id, map);
  }
  // Resource names (/F1 → object id) from the page's font dictionary.
  const resources = new Map<string, string>();
  for (const body of objects.values()) for (const r of body.matchAll(/\/(F\d+) (\d+) 0 R/g)) resources.set(r[1], r[2]);
  let text = "";
  let streams = "";
  for (const body of objects.values()) {
    if (!/stream/.test(body) || /\/Length1|\/Type \/XRef|CMapName|\/Subtype \/Type1C/.test(body)) continue;
    let content: string;
    try {
      content = streamOf(body);
    } catch {
      continue;
    }
    streams += content + "\n";
    if (!/BT[\s\S]*ET/.test(content)) continue;
    let font: Map<string, string> | undefined;
    for (const op of content.matchAll(/\/(F\d+) [\d.]+ Tf|\[([^\]]*)\] TJ|<([0-9a-f]+)> Tj|(ET)/gi)) {
      if (op[1]) font = maps.get(resources.get(op[1]) ?? "");
      else if (op[4]) text += "\n";
      else {
        const parts = op[2] !== undefined ? [...op[2].matchAll(/<([0-9a-f]+)>|(-?[\d.]+)/gi)] : [[op[0], op[3]] as unknown as RegExpMatchArray];
        for (const p of parts) {
          if (p[1]) for (let k = 0; k < p[1].length; k += 4) text += font?.get(p[1].slice(k, k + 4).toLowerCase()) ?? "?";
          else if (p[2] && Number(p[2]) < -200) text += " ";
        }
      }
    }
  }
  return { pages, fontsEmbedded, text, content: streams };
}
