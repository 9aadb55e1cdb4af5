"use client";

import { studsFromParams, type ShapeParams } from "@/geometry/shapes";
import { memo } from "react";
import { useFormContext } from "react-hook-form";
import { useStore } from "zustand";
import { errorAt } from "@/app/_ui/form/field-error";
import { ListError, StudListTools } from "@/app/_ui/form/stud-list-tools";
import { emptyOutline } from "@/app/_ui/form/text-values";
import { MEASURES, MeasurePanel } from "./measure-panel";
import { pointText, type ShapeStore } from "./shape-store";
import { StoreOutlineField } from "./store-outline-field";

/** The studs of the store: label and centre from the cylinder axis, or drawn from the pattern's centre distances. */
export function StoreStudsField({ store }: { store: ShapeStore }) {
  const studs = useStore(store, (s) => s.doc.studs);
  const units = useStore(store, (s) => s.units);
  const params = useStore(store, (s) => s.doc.capture.studs);
  const { formState } = useFormContext();
  const act = store.getState().act;
  const apply = (p: ShapeParams) => {
    const list = studsFromParams(p);
    if (list) act.setStuds(list.map((s) => ({ label: s.label, positionMm: pointText(s.positionMm, units, false) })), p);
  };
  const listError = errorAt(formState.errors, "studs");
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="field-label">Studs (centre from the cylinder axis at the deck)</legend>
      <MeasurePanel key={`${units}-${params?.kind ?? ""}`} specs={MEASURES.studs} params={params} units={units} what="stud pattern" onApply={apply} />
      <ul className="flex flex-col gap-2">
        {studs.map((s, i) => (
          <StudRow key={i} store={store} index={i} label={s.label} x={s.positionMm[0]} y={s.positionMm[1]} units={units} />
        ))}
      </ul>
      <ListError message={listError} />
      <StudListTools
        units={units}
        onAdd={() => act.setStuds([...studs, { label: `stud ${studs.length + 1}`, positionMm: ["", ""] }])}
        onFillSquare={(side) => apply({ kind: "rect-studs", spacingXMm: side, spacingYMm: side })}
      />
    </fieldset>
  );
}

const StudRow = memo(function StudRow({ store, index, label, x, y, units }: { store: ShapeStore; index: number; label: string; x: string; y: string; units: string }) {
  const key = `studs.${index}`;
  const lit = useStore(store, (s) => s.hover === key || s.selected === key);
  const { formState } = useFormContext();
  const e = (p: string) => errorAt(formState.errors, `studs.${index}.${p}`);
  const edit = (patch: { label?: string; x?: string; y?: string }) => {
    const studs = store.getState().doc.studs;
    store.getState().act.setStuds(studs.map((s, j) => (j === index ? { label: patch.label ?? s.label, positionMm: [patch.x ?? s.positionMm[0], patch.y ?? s.positionMm[1]] } : s)));
  };
  const errs = [e("label") && `label: ${e("label")}`, e("positionMm.0") && `x: ${e("positionMm.0")}`, e("positionMm.1") && `y: ${e("positionMm.1")}`].filter(Boolean);
  return (
    <li className={`flex flex-col rounded px-1 ${lit ? "bg-accent/10 ring-1 ring-accent" : ""}`} data-stud={key} onMouseEnter={() => store.setState({ hover: key })} onFocus={() => store.setState({ hover: key })}>
      <div className="flex flex-wrap items-center gap-2">
        <input aria-label={`Stud ${index + 1} label`} className="field-input mt-0 w-36" autoComplete="off" value={label} aria-invalid={e("label") ? true : undefined} onChange={(ev) => edit({ label: ev.target.value })} />
        {(["x", "y"] as const).map((axis) => (
          <label key={axis} className="flex items-center gap-1 text-sm text-ink-2">
            <span className="num">{axis}</span>
            <input aria-label={`Stud ${index + 1} ${axis} (${units})`} className="field-input mt-0 w-24 num" inputMode="decimal" autoComplete="off" value={axis === "x" ? x : y} onChange={(ev) => edit({ [axis]: ev.target.value })} />
          </label>
        ))}
        <span className="text-sm text-ink-3 num">{units}</span>
        <button type="button" className="btn-quiet" aria-label={`Remove stud ${index + 1}`} onClick={() => store.getState().act.setStuds(store.getState().doc.studs.filter((_, j) => j !== index))}>
          Remove
        </button>
      </div>
      {errs.length ? <p role="alert" className="field-error">{errs.join(" · ")}</p> : null}
    </li>
  );
});

/** Passages and pockets (or a gasket's port windows): label, where each starts below the deck, its outline. */
export function StorePocketsField({ store, word, withDepth = true, pathBase = "pockets" }: { store: ShapeStore; word: string; withDepth?: boolean; /** Where the form's messages for the list are ("pockets", "baseGasket.ports"). */ pathBase?: string }) {
  const pockets = useStore(store, (s) => s.doc.pockets);
  const units = useStore(store, (s) => s.units);
  const { formState } = useFormContext();
  const act = store.getState().act;
  const cap = word[0].toUpperCase() + word.slice(1);
  return (
    <div className="flex flex-col gap-3">
      {pockets.length === 0 ? <p className="text-sm text-ink-2">None yet.</p> : null}
      {pockets.map((p, i) => {
        const le = errorAt(formState.errors, `${pathBase}.${i}.label`), de = errorAt(formState.errors, `${pathBase}.${i}.startDepthMm`);
        return (
          <StoreOutlineField key={i} store={store} shapeKey={`pockets.${i}`} path={`${pathBase}.${i}.outline`} label={`${cap} ${i + 1}`} measures={MEASURES.pocket} mirror="copy">
            <div className="flex flex-wrap items-end gap-4">
              <label className="flex flex-col text-sm">
                <span className="field-label">Label</span>
                <input className="field-input mt-1 w-56" autoComplete="off" aria-label={`${cap} ${i + 1} label`} value={p.label} onChange={(e) => act.setPocket(i, { label: e.target.value })} />
                {le ? <span role="alert" className="field-error">{le}</span> : null}
              </label>
              {withDepth ? (
                <label className="flex flex-col text-sm">
                  <span className="field-label">Starts below the deck <span className="text-ink-3 num">({units})</span></span>
                  <input className="field-input mt-1 w-32 num" inputMode="decimal" autoComplete="off" aria-label={`${cap} ${i + 1} starts below the deck (${units})`} value={p.startDepthMm} onChange={(e) => act.setPocket(i, { startDepthMm: e.target.value })} />
                  {de ? <span role="alert" className="field-error">{de}</span> : null}
                </label>
              ) : null}
              <button type="button" className="btn-quiet" onClick={() => act.removePocket(i)}>
                Remove {word} {i + 1}
              </button>
            </div>
          </StoreOutlineField>
        );
      })}
      <div>
        <button type="button" className="btn-quiet" onClick={() => act.addPocket({ label: `${word} ${pockets.length + 1}`, startDepthMm: "0", outline: emptyOutline("polygon") })}>
          Add a {word}
        </button>
      </div>
    </div>
  );
}
