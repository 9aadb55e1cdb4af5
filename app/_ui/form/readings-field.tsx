"use client";

import type { LengthUnits } from "@/geometry";
import { useController, useFormContext, type FieldValues, type Path } from "react-hook-form";
import { dateText } from "@/model/dates";
import { useShopTimeZone } from "../query/settings/use-shop-settings";
import { errorAt } from "./field-error";
import { lengthLabel, parseLengthText } from "@/model/units";

export type ReadingStamp = { takenBy: string; takenAt: string } | undefined;

/**
 * A list of readings of one length (a skirt read at three spots). Says which reading counts — the
 * largest or the smallest, as the trade's worst case — and the spread between them.
 */
export function ReadingsField<FV extends FieldValues>({
  name,
  label,
  units,
  counts,
  hint,
  stamps,
  extraError,
  itemLabel = "Reading",
  addLabel = "Add a reading",
}: {
  name: Path<FV>;
  label: string;
  units: LengthUnits;
  counts: "largest" | "smallest";
  hint?: string;
  stamps?: (valueMm: number | undefined, index: number) => ReadingStamp;
  extraError?: string;
  /** What one entry is called ("Reading 2", "Gasket 2"). */
  itemLabel?: string;
  addLabel?: string;
}) {
  const { control, formState } = useFormContext<FV>();
  const { field } = useController({ control, name });
  const zone = useShopTimeZone();
  const texts = (field.value as string[] | undefined) ?? [];
  const values = texts.map((t) => parseLengthText(t, units)).map((r) => (r.ok ? r.value : undefined));
  // Only readings without a message count toward the worst one and the spread.
  const good = values
    .map((v, i) => [v, i] as const)
    .filter((p): p is readonly [number, number] => p[0] !== undefined && p[0] > 0 && !errorAt(formState.errors, `${name}.${p[1]}`));
  const worst = good.length ? good.reduce((a, b) => (counts === "largest" ? (b[0] > a[0] ? b : a) : b[0] < a[0] ? b : a)) : null;
  const spread = good.length > 1 ? Math.max(...good.map((g) => g[0])) - Math.min(...good.map((g) => g[0])) : null;
  const set = (next: string[]) => field.onChange(next);
  const listError = errorAt(formState.errors, name) ?? extraError;
  const baseId = `f-${String(name).replaceAll(".", "-")}`;

  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={`${baseId}-summary`}>
      <legend className="field-label">
        {label} <span className="text-ink-3 num">({units})</span>
      </legend>
      <ul className="flex flex-col gap-2">
        {texts.map((t, i) => (
          <ReadingRow
            key={i}
            id={`${baseId}-${i}`}
            label={`${itemLabel} ${i + 1}`}
            text={t}
            error={errorAt(formState.errors, `${name}.${i}`)}
            stamp={stamps?.(values[i], i)}
            counts={worst?.[1] === i && good.length > 1}
            zone={zone}
            onChange={(text) => set(texts.map((x, j) => (j === i ? text : x)))}
            onBlur={field.onBlur}
            onRemove={() => set(texts.filter((_, j) => j !== i))}
          />
        ))}
      </ul>
      <div className="flex flex-wrap items-center gap-3">
        <button type="button" className="btn-quiet" onClick={() => set([...texts, ""])}>
          {addLabel}
        </button>
        <ReadingsSummary id={`${baseId}-summary`} units={units} counts={counts} itemLabel={itemLabel} hint={hint} worst={worst} spreadMm={spread} several={good.length > 1} />
      </div>
      {listError ? (
        <p role="alert" className="field-error">
          {listError}
        </p>
      ) : null}
    </fieldset>
  );
}

/** Which reading counts and the spread between them, or the hint while there is none. */
function ReadingsSummary({ id, units, counts, itemLabel, hint, worst, spreadMm, several }: {
  id: string;
  units: LengthUnits;
  counts: "largest" | "smallest";
  itemLabel: string;
  hint: string | undefined;
  worst: readonly [valueMm: number, index: number] | null;
  spreadMm: number | null;
  several: boolean;
}) {
  return (
    <p id={id} className="text-sm text-ink-2" data-testid={id}>
      {worst ? (
        <>
          The {counts} counts: <span className="num text-ink">{lengthLabel(worst[0], units)}</span>
          {several ? <> ({itemLabel.toLowerCase()} {worst[1] + 1})</> : null}
          {spreadMm !== null ? (
            <>
              {" "}
              · spread <span className="num">{lengthLabel(spreadMm, units)}</span>
            </>
          ) : null}
        </>
      ) : (
        (hint ?? "Read it at several spots; the worst reading counts.")
      )}
    </p>
  );
}

/** One reading: its field, marked when it is the one that counts, its message, and who took it when. */
function ReadingRow({ id, label, text, error, stamp, counts, zone, onChange, onBlur, onRemove }: {
  id: string;
  label: string;
  text: string;
  error: string | undefined;
  stamp: ReadingStamp;
  counts: boolean;
  zone: string;
  onChange: (text: string) => void;
  onBlur: () => void;
  onRemove: () => void;
}) {
  return (
    <li className="flex flex-col">
      <div className="flex items-center gap-2">
        <label htmlFor={id} className="w-20 shrink-0 text-sm text-ink-2">
          {label}
        </label>
        <input
          id={id}
          className={`field-input mt-0 num ${counts ? "border-accent" : ""}`}
          inputMode="decimal"
          autoComplete="off"
          value={text}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          onChange={(e) => onChange(e.target.value)}
          onBlur={onBlur}
        />
        {counts ? <span className="shrink-0 rounded bg-accent-soft px-1.5 py-0.5 text-xs text-accent">counts</span> : null}
        <button type="button" className="btn-quiet shrink-0" aria-label={`Remove ${label.toLowerCase()}`} onClick={onRemove}>
          Remove
        </button>
      </div>
      {error ? (
        <p id={`${id}-error`} role="alert" className="field-error ml-22">
          {error}
        </p>
      ) : null}
      {stamp ? (
        <p className="field-hint ml-22">
          taken by {stamp.takenBy}, {dateText(stamp.takenAt, zone)}
        </p>
      ) : null}
    </li>
  );
}
