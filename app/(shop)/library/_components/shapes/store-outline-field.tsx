"use client";

import { outlineFromParams, type ShapeParams } from "@/geometry/shapes";
import { memo, type ReactNode } from "react";
import { useFormContext } from "react-hook-form";
import { useStore } from "zustand";
import { AxisErrors, CornerInputs } from "@/app/_ui/form/corner-inputs";
import { ListError } from "@/app/_ui/form/stud-list-tools";
import { errorAt } from "@/app/_ui/form/field-error";
import { emptyOutline, type OutlineText, type PairText } from "@/app/_ui/form/text-values";
import { MeasurePanel, type MeasureSpec } from "./measure-panel";
import { outlineAt, outlineTexts, type ShapeStore } from "./shape-store";

/**
 * An outline of the store (deck, mouth, a passage): circle or polygon, its corners as rows that light
 * up with their point in the drawing, drawn from measurements or mirrored. `path` is where the form's
 * validation puts its messages ("deck", "mouth.outline", "pockets.0.outline").
 */
export function StoreOutlineField({
  store,
  shapeKey,
  path,
  label,
  measures,
  circleSlot,
  mirror,
  what,
  children,
}: {
  store: ShapeStore;
  shapeKey: string;
  path: string;
  label: string;
  measures?: MeasureSpec[];
  circleSlot?: ReactNode;
  /** "flip": mirror in place; "copy": add a mirrored copy (a passage traced on one side). */
  mirror?: "flip" | "copy";
  /** What the measurements draw ("gasket outline"); the label in lower case when absent. */
  what?: string;
  children?: ReactNode;
}) {
  const o = useStore(store, (s) => outlineAt(s.doc, shapeKey)) ?? emptyOutline();
  const units = useStore(store, (s) => s.units);
  const params = useStore(store, (s) => s.doc.capture[shapeKey]);
  const active = useStore(store, (s) => (s.hover === shapeKey || s.hover?.startsWith(`${shapeKey}~`) ? true : false));
  const act = store.getState().act;
  const { formState } = useFormContext();
  const set = (next: OutlineText) => act.setOutline(shapeKey, next);
  const err = errorAt(formState.errors, `${path}.pointsMm`) ?? errorAt(formState.errors, path);
  const apply = (p: ShapeParams) => {
    const out = outlineFromParams(p);
    if (out) act.setOutline(shapeKey, outlineTexts(out, units), p);
  };
  return (
    <fieldset className={`flex flex-col gap-3 rounded-md border p-4 ${active ? "border-accent" : "border-rule"}`} onMouseEnter={() => store.setState({ hover: shapeKey })}>
      <legend className="px-1 text-sm font-semibold">{label}</legend>
      <div className="flex flex-wrap items-center gap-4 text-sm" role="radiogroup" aria-label={`${label} shape`}>
        {(["circle", "polygon"] as const).map((k) => (
          <label key={k} className="flex items-center gap-2">
            <input type="radio" name={`${shapeKey}-kind`} checked={o.kind === k} onChange={() => set({ ...o, kind: k })} /> {k === "circle" ? "Circle" : "Polygon (corners)"}
          </label>
        ))}
        {mirror ? <MirrorButtons store={store} shapeKey={shapeKey} label={label} copy={mirror === "copy"} /> : null}
      </div>
      {children}
      {measures ? <MeasurePanel key={`${units}-${params?.kind ?? ""}`} specs={measures} params={params} units={units} what={what ?? label.toLowerCase()} onApply={apply} /> : null}
      {o.kind === "polygon" ? (
        <Corners store={store} shapeKey={shapeKey} path={path} label={label} points={o.pointsMm} units={units} onChange={(pointsMm) => set({ ...o, pointsMm })} />
      ) : (
        <div className="flex flex-wrap items-start gap-4">
          {circleSlot ?? <Pair label={`${label} diameter`} path={`${path}.diameterMm`} one value={o.diameterMm} units={units} onChange={(t) => set({ ...o, diameterMm: t })} />}
          <div>
            <span className="field-label">Centre (blank = on the axis)</span>
            <Pair label={`${label} centre`} path={`${path}.centerMm`} value={o.centerMm} units={units} onChange={(p) => set({ ...o, centerMm: p })} />
          </div>
        </div>
      )}
      <ListError message={err} />
    </fieldset>
  );
}

function MirrorButtons({ store, shapeKey, label, copy }: { store: ShapeStore; shapeKey: string; label: string; copy: boolean }) {
  const act = store.getState().act;
  return (
    <span className="flex items-center gap-2">
      <span className="text-ink-2">{copy ? "Add a mirrored copy" : "Mirror"}</span>
      <button type="button" className="btn-quiet" aria-label={`${copy ? "Add a copy of" : "Mirror"} ${label} mirrored across the y axis, left ↔ right`} onClick={() => act.mirror(shapeKey, "y", copy)}>
        left ↔ right
      </button>
      <button type="button" className="btn-quiet" aria-label={`${copy ? "Add a copy of" : "Mirror"} ${label} mirrored across the x axis, front ↕ rear`} onClick={() => act.mirror(shapeKey, "x", copy)}>
        front ↕ rear
      </button>
    </span>
  );
}

type PairProps = { label: string; path: string; units: string } & (
  | { one: true; value: string; onChange: (t: string) => void }
  | { one?: false; value: PairText; onChange: (p: PairText) => void }
);

/** One or two length inputs with the form's messages at their paths. */
function Pair(p: PairProps) {
  const { formState } = useFormContext();
  if (p.one) {
    const e = errorAt(formState.errors, p.path);
    return (
      <label className="flex flex-col text-sm">
        <span className="field-label">Diameter <span className="text-ink-3 num">({p.units})</span></span>
        <input id={`f-${p.path.replaceAll(".", "-")}`} className="field-input mt-1 w-32 num" inputMode="decimal" autoComplete="off" aria-label={`${p.label} (${p.units})`} aria-invalid={e ? true : undefined} value={p.value} onChange={(ev) => p.onChange(ev.target.value)} />
        {e ? <span role="alert" className="field-error">{e}</span> : null}
      </label>
    );
  }
  const ex = errorAt(formState.errors, `${p.path}.0`), ey = errorAt(formState.errors, `${p.path}.1`);
  return (
    <div className="flex flex-col">
      <div className="mt-1 flex items-center gap-2">
        {([0, 1] as const).map((i) => (
          <label key={i} className="flex items-center gap-1 text-sm text-ink-2">
            <span className="num">{i ? "y" : "x"}</span>
            <input className="field-input mt-0 w-24 num" inputMode="decimal" autoComplete="off" aria-label={`${p.label} ${i ? "y" : "x"} (${p.units})`} aria-invalid={(i ? ey : ex) ? true : undefined} value={p.value[i]} onChange={(ev) => p.onChange(i ? [p.value[0], ev.target.value] : [ev.target.value, p.value[1]])} />
          </label>
        ))}
        <span className="text-sm text-ink-3 num">{p.units}</span>
      </div>
      <AxisErrors x={ex} y={ey} />
    </div>
  );
}

function Corners({ store, shapeKey, path, label, points, units, onChange }: { store: ShapeStore; shapeKey: string; path: string; label: string; points: PairText[]; units: string; onChange: (p: PairText[]) => void }) {
  return (
    <div className="flex flex-col gap-2">
      <ol className="flex max-h-96 flex-col gap-1 overflow-y-auto" aria-label={`${label} corners`}>
        {points.map((p, i) => (
          <CornerRow key={i} store={store} shapeKey={shapeKey} path={path} label={label} index={i} point={p} units={units} />
        ))}
      </ol>
      <div>
        <button type="button" className="btn-quiet" onClick={() => onChange([...points, ["", ""]])}>
          Add a corner
        </button>
      </div>
    </div>
  );
}

type RowProps = { store: ShapeStore; shapeKey: string; path: string; label: string; index: number; point: PairText; units: string };

/** One corner's row; only the row whose point changed renders again while a 200-corner outline is dragged. */
const CornerRow = memo(function CornerRow({ store, shapeKey, path, label, index, point, units }: RowProps) {
  const cornerKey = `${shapeKey}:${index}`;
  const lit = useStore(store, (s) => s.hover === cornerKey || s.selected === cornerKey);
  const { formState } = useFormContext();
  const at = `${path}.pointsMm.${index}`;
  const ex = errorAt(formState.errors, `${at}.0`), ey = errorAt(formState.errors, `${at}.1`);
  const edit = (axis: 0 | 1, text: string) => {
    const o = outlineAt(store.getState().doc, shapeKey);
    if (o) store.getState().act.setOutline(shapeKey, { ...o, pointsMm: o.pointsMm.map((q, j) => (j === index ? (axis ? [q[0], text] : [text, q[1]]) : q)) });
  };
  return (
    <li className={`flex flex-col rounded px-1 ${lit ? "bg-accent/10 ring-1 ring-accent" : ""}`} data-corner={cornerKey} onMouseEnter={() => store.setState({ hover: cornerKey })} onFocus={() => store.setState({ hover: cornerKey })}>
      <CornerInputs label={label} index={index} point={point} units={units} errors={[ex, ey]} onEdit={edit} onRemove={() => store.getState().act.removeCorner(shapeKey, index)} />
    </li>
  );
});
