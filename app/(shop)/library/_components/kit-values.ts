import { CylinderKitSchema, type LengthUnits } from "@/geometry";
import { amountText, CURRENCY_CODES, parseAmount, type CurrencyCode, type Money } from "@/model/money";
import type { Capture } from "@/geometry/shapes";
import type { KitRow } from "../../../_ui/query/types";
import type { FormReader } from "@/app/_ui/form/form-reader";
import { lengthFieldText as lengthText } from "@/model/units";
import { outlineText, readOutline, readStuds, studsText } from "@/app/_ui/form/read-shapes";
import { emptyOutline, type OutlineText } from "@/app/_ui/form/text-values";
import type { PocketText, ShapeDoc } from "./shapes/shape-store";
import type { StudText } from "@/app/_ui/form/text-values";

export type KitFormValues = {
  name: string;
  notes: string;
  boreMm: string;
  strokeMm: string;
  skirtDiameterReadingsMm: string[];
  skirtLengthReadingsMm: string[];
  studs: StudText[];
  studThread: string;
  baseGasketsMm: string[];
  alwaysWithGasket: boolean;
  /** The price in major units as typed ("289.00") and its ISO 4217 code ("EUR"): kept as integer minor units. */
  price: string;
  priceCurrency: string;
  /** The base gasket at the deck (kept in the shape store): its outline, optional, and its port windows. */
  gasket?: { outline: OutlineText; ports: PocketText[] };
  /** The measurements the gasket's shapes were drawn from. */
  capture?: Capture;
};

/** The kit's base gasket as the shape store's first doc (lengths in mm); the bore stands in for the mouth. */
export function kitDoc(row: KitRow | null): ShapeDoc {
  const g = row?.data.baseGasket;
  return {
    deck: g?.outline ? outlineText(g.outline, "mm") : emptyOutline("polygon"),
    mouth: emptyOutline("circle"),
    studs: [],
    pockets: (g?.ports ?? []).map((p) => ({ label: p.label, startDepthMm: "0", outline: outlineText(p.outline, "mm") })),
    capture: renameKeys(row?.data.capture ?? {}, "gasket", "ports", "deck", "pockets"),
  };
}

/** The store calls the gasket's outline and ports "deck" and "pockets"; the kit's data names them as they are. */
function renameKeys(c: Capture, outline: string, ports: string, toOutline: string, toPorts: string): Capture {
  return Object.fromEntries(Object.entries(c).map(([k, v]) => [k === outline ? toOutline : k.replace(new RegExp(`^${ports}\\.`), `${toPorts}.`), v]));
}

/** The form's values with the gasket from the store. */
export function mergeKit(v: KitFormValues, doc: ShapeDoc): KitFormValues {
  return { ...v, gasket: { outline: doc.deck ?? emptyOutline("polygon"), ports: doc.pockets }, capture: renameKeys(doc.capture, "deck", "pockets", "gasket", "ports") };
}

/** Whether an outline's texts hold anything (a gasket without an outline leaves it empty). */
const filled = (o: OutlineText) => (o.kind === "polygon" ? o.pointsMm.length > 0 : o.diameterMm.trim() !== "");

/** The kit schema knows the base gasket (the port overlay's input). */
const TAKES_GASKET = "baseGasket" in CylinderKitSchema.shape;

export function kitDefaults(row: KitRow | null, units: LengthUnits): KitFormValues {
  const d = row?.data;
  const list = (v: readonly number[] | undefined) => (v && v.length ? v.map((x) => lengthText(x, units)) : [""]);
  return {
    name: row?.name ?? "",
    notes: row?.notes ?? "",
    boreMm: lengthText(d?.boreMm, units),
    strokeMm: lengthText(d?.strokeMm, units),
    skirtDiameterReadingsMm: list(d?.skirtDiameterReadingsMm),
    skirtLengthReadingsMm: list(d?.skirtLengthReadingsMm),
    studs: d ? studsText(d.studs, units) : [],
    studThread: d?.studThread ?? "",
    baseGasketsMm: d?.baseGasketsMm?.map((x) => lengthText(x, units)) ?? [],
    alwaysWithGasket: d?.alwaysWithGasket ?? false,
    price: d?.price ? amountText(d.price.amountMinor, d.price.currency) : "",
    priceCurrency: d?.price?.currency ?? "EUR",
  };
}

/** The form's texts as the core's CylinderKit input (with a stand-in id; the row's id is the kit's id). */
export function kitToCore(v: KitFormValues, read: FormReader): unknown {
  const readings = (key: "skirtDiameterReadingsMm" | "skirtLengthReadingsMm") => {
    const texts = (v[key] ?? []).filter((t, i, all) => t.trim() !== "" || all.length === 1);
    return read.lengths(texts, [key]);
  };
  return {
    id: "draft",
    name: v.name,
    boreMm: read.length(v.boreMm, ["boreMm"]),
    strokeMm: read.length(v.strokeMm, ["strokeMm"]),
    skirtDiameterReadingsMm: readings("skirtDiameterReadingsMm"),
    skirtLengthReadingsMm: readings("skirtLengthReadingsMm"),
    studs: readStuds(v.studs, read),
    studThread: read.optionalText(v.studThread),
    baseGasketsMm: read.lengths(v.baseGasketsMm, ["baseGasketsMm"]),
    alwaysWithGasket: v.alwaysWithGasket,
    price: readPrice(v, read),
    ...gasketToCore(v, read),
  };
}

/** The typed price as money (minor units and code); undefined when blank or unreadable (the reader keeps why). */
function readPrice(v: KitFormValues, read: FormReader): Money | undefined {
  if (v.price.trim() === "") return undefined;
  const currency = v.priceCurrency.trim().toUpperCase();
  if (!(CURRENCY_CODES as readonly string[]).includes(currency)) {
    read.issues.push({ path: ["priceCurrency"], message: `Give the price's currency code: ${CURRENCY_CODES.join(", ")}` });
    return undefined;
  }
  const amountMinor = parseAmount(v.price, currency);
  if (amountMinor === null) {
    read.issues.push({ path: ["price"], message: `Write the price as an amount in ${currency}, e.g. 289 or 289.00` });
    return undefined;
  }
  return { amountMinor, currency: currency as CurrencyCode };
}

function gasketToCore(v: KitFormValues, read: FormReader): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  if (v.capture && Object.keys(v.capture).length) out.capture = v.capture;
  const g = v.gasket;
  if (!TAKES_GASKET || !g || (!filled(g.outline) && g.ports.length === 0)) return out;
  out.baseGasket = {
    ...(filled(g.outline) ? { outline: readOutline(g.outline, ["baseGasket", "outline"], read) } : {}),
    ports: g.ports.map((p, i) => ({ label: p.label.trim(), outline: readOutline(p.outline, ["baseGasket", "ports", i, "outline"], read) })),
  };
  return out;
}
