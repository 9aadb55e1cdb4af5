// First-load JavaScript of each page, read from the production build's manifests: the framework's root
// scripts plus the page's own entry chunks (the code a first visit must download and parse before the page
// can answer), uncompressed and gzip; and whether any of them holds three.js, the core's polygon code or the
// PDF writer. Part of `npm run bench:pages`.
import { existsSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { gzipSync } from "node:zlib";

/** Pages whose first-load JavaScript is printed, by their route in the build: first the light ones, which have an aim (no 3D, no PDF), then the rest. */
const LIGHT_PAGES = ["/bench-floor", "/(auth)/sign-in", "/(shop)/home", "/(shop)/library", "/(shop)/jobs", "/(shop)/settings", "/(shop)/studies"];
const OTHER_PAGES = ["/(shop)/library/[kind]/[id]", "/(shop)/jobs/[id]", "/(shop)/consult/[id]", "/try", "/(shop)/studies/[id]"];
const SIZED_PAGES: { route: string; light: boolean }[] = [...LIGHT_PAGES.map((route) => ({ route, light: true })), ...OTHER_PAGES.map((route) => ({ route, light: false }))];
const LIGHT_PAGE_AIM_BYTES = 300_000;

/** Text that marks a chunk as holding heavy code no light page should carry. */
const HEAVY_MARKS: { name: string; test: (code: string) => boolean }[] = [
  { name: "three.js", test: (c) => c.includes("WebGLRenderer") || c.includes("THREE.WebGLRenderer") },
  { name: "react-three-fiber", test: (c) => c.includes("R3F: Hooks can only be used within the Canvas component") },
  { name: "polygon booleans", test: (c) => c.includes("polygon-clipping") || c.includes("SweepEvent") || c.includes("Flatten.Polygon") },
  { name: "PDF writer", test: (c) => c.includes("PDFDocument") || c.includes("pdfkit") },
  // The core's fit evaluation (geometry/), known by one of its error texts (its own code is minified).
  { name: "fit evaluation", test: (c) => c.includes("the depth-stop search lost the stack") },
  // Not heavy, but worth knowing: the core's input schemas (zod) on a page.
  { name: "(core schemas)", test: (c) => c.includes("chamfered-rect") },
];

export const kB = (bytes: number) => `${(bytes / 1000).toFixed(0)} kB`;

export type PageSize = { route: string; light: boolean; files: number; bytes: number; gzipBytes: number; ownBytes: number; heavy: string[] };

/**
 * The entry scripts of one app route, from the client reference manifest the build writes beside the
 * route's server code: the JavaScript files every client component of the page (and its layouts) loads
 * first, with the build's root scripts (the framework and the router) in front.
 */
function routeEntryFiles(distDir: string, route: string): string[] | null {
  const file = join(distDir, "server", "app", route, "page_client-reference-manifest.js");
  if (!existsSync(file)) return null;
  const text = readFileSync(file, "utf8");
  // The file is `globalThis.__RSC_MANIFEST["/route/page"] = {…};` (Turbopack; webpack writes it without the
  // spaces): the JSON after the assignment.
  const assignment = /__RSC_MANIFEST\["[^"]*"\]\s*=\s*/.exec(text);
  if (!assignment) throw new Error(`${file}: no client reference manifest in it`);
  const start = assignment.index + assignment[0].length;
  const manifest = JSON.parse(text.slice(start, text.lastIndexOf("}") + 1)) as { entryJSFiles?: Record<string, string[]> };
  // A webpack build (`next build --webpack`) names no entry files here: only its root scripts are measured.
  if (!manifest.entryJSFiles) return null;
  const files = new Set<string>();
  for (const list of Object.values(manifest.entryJSFiles)) for (const f of list) files.add(f);
  return [...files];
}

function rootFiles(distDir: string): string[] {
  const manifest = JSON.parse(readFileSync(join(distDir, "build-manifest.json"), "utf8")) as { rootMainFiles?: string[]; polyfillFiles?: string[] };
  // The polyfills load only in browsers without modules (nomodule): not first-load code of today's browsers.
  return manifest.rootMainFiles ?? [];
}

/** Each sized page's first-load JavaScript, and the root scripts' share every page carries. */
export function measurePages(distDir: string): { sizes: PageSize[]; rootBytes: number } {
  const base = rootFiles(distDir);
  const sizes: PageSize[] = [];
  let rootBytes = 0;
  const cache = new Map<string, { bytes: number; gzipBytes: number; heavy: string[] }>();
  const chunk = (f: string) => {
    let c = cache.get(f);
    if (!c) {
      const path = join(distDir, f.replace(/^\/?_next\//, ""));
      const code = readFileSync(path);
      const text = code.toString("utf8");
      c = { bytes: statSync(path).size, gzipBytes: gzipSync(code).length, heavy: HEAVY_MARKS.filter((m) => m.test(text)).map((m) => m.name) };
      cache.set(f, c);
    }
    return c;
  };
  for (const f of base.filter((f) => f.endsWith(".js"))) rootBytes += chunk(f).bytes;
  for (const page of SIZED_PAGES) {
    const own = routeEntryFiles(distDir, page.route);
    if (own === null) continue;
    const files = [...new Set([...base, ...own])].filter((f) => f.endsWith(".js"));
    let bytes = 0;
    let gzipBytes = 0;
    const heavy = new Set<string>();
    for (const f of files) {
      const c = chunk(f);
      bytes += c.bytes;
      gzipBytes += c.gzipBytes;
      for (const h of c.heavy) heavy.add(h);
    }
    sizes.push({ route: page.route, light: page.light, files: files.length, bytes, gzipBytes, ownBytes: bytes - rootBytes, heavy: [...heavy] });
  }
  return { sizes, rootBytes };
}

export function printSizes(sizes: PageSize[], rootBytes: number, dist: string) {
  console.log(`\nFirst-load JavaScript per page (from ${dist}/ manifests: root scripts + the page's entry chunks)\n`);
  console.log("page".padEnd(30) + "files".padStart(7) + "bytes".padStart(10) + "gzip".padStart(10) + "beyond root".padStart(13) + "   heavy code in it");
  for (const s of sizes) {
    const over = s.light && s.bytes > LIGHT_PAGE_AIM_BYTES ? "  (over the 300 kB aim)" : "";
    console.log(s.route.padEnd(30) + String(s.files).padStart(7) + kB(s.bytes).padStart(10) + kB(s.gzipBytes).padStart(10) + kB(s.ownBytes).padStart(13) + `   ${s.heavy.join(", ") || "none"}${over}`);
  }
  console.log(`The build's root scripts (React DOM, the router, the bundler's runtime), on every page: ${kB(rootBytes)}.`);
  console.log("Code a page fetches after its first scripts (the 3D view, once the page is quiet) is not counted here: the Lighthouse table's JS parsed counts every script of the visit.");
  console.log("Aim: pages without 3D (sign-in, home, library, jobs, settings, studies list) at most 300 kB uncompressed, none of three.js, the polygon booleans, the fit evaluation or the PDF writer.");
}
