"use client";

import type { LengthUnits } from "@/geometry";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type DefaultValues, type FieldValues, type Path } from "react-hook-form";
import type { z } from "zod";
import { ApiFailure } from "../query/fetch";
import { useSaveLibraryRow } from "../query/library/use-library-mutations";
import type { LibraryKind } from "../query/types";
import { coreResolver, type FormContext } from "./core-resolver";
import { FormReader } from "./form-reader";
import { convertLengthTexts, type UnitSwitchMemory } from "./units-text";

type Notice = { tone: "error" | "ok"; text: string } | null;

/** Values a form keeps outside react-hook-form, and what they must do when the form switches units or saves. */
export type OutsideValues<FV> = { merge: (values: FV) => FV; switchUnits: (to: LengthUnits) => void; saved: () => void };

/** What a library form is: its row, its schema, its first texts and how they become the core's input and the request. */
export type LibraryFormOptions<FV extends FieldValues, S extends z.ZodType> = {
  kind: LibraryKind;
  /** The row being edited (its id and the version it was read at), or null for a new one. */
  row: { id: string; version: number } | null;
  schema: S;
  initialUnits: LengthUnits;
  /** The form's first texts, lengths in mm (shown in the initial units). */
  defaults: DefaultValues<FV>;
  toCore: (values: FV, read: FormReader) => unknown;
  toBody: (core: z.output<S>, values: FV, units: LengthUnits) => Record<string, unknown>;
  /** Server field paths to form paths; by default "data.boreMm" is the form's "boreMm". */
  fieldPath?: (serverPath: string) => string;
  /** Fields kept outside react-hook-form (the shapes in their own store): merged into the values that are validated and saved. */
  outside?: OutsideValues<FV>;
  /**
   * Runs after each successful save, before the form moves on (e.g. keeps a photo chosen before the first
   * save). It never throws: it answers where a new row's form goes instead of the list, or the notice to show.
   */
  afterSave?: (row: { id: string; name: string }, created: boolean) => Promise<{ goTo?: string; notice?: Notice } | void>;
};

/**
 * The common machinery of a library form: texts kept as typed, validated on every change by the core's
 * schema, units switchable without losing anything, and a save whose refusal leaves every field as it was.
 */
export function useLibraryForm<FV extends FieldValues, S extends z.ZodType>(opts: LibraryFormOptions<FV, S>) {
  const router = useRouter();
  const [units, setUnitsState] = useState<LengthUnits>(opts.initialUnits);
  const [notice, setNotice] = useState<Notice>(null);
  const id = opts.row?.id ?? null;
  const [version, setVersion] = useState(opts.row?.version ?? null);
  const [finishing, setFinishing] = useState(false);
  const save = useSaveLibraryRow(opts.kind, id);
  const [resolver] = useState(() => coreResolver<FV, S>(opts.schema, (v, read) => opts.toCore(opts.outside ? opts.outside.merge(v) : v, read)));
  const all = () => (opts.outside ? opts.outside.merge(form.getValues()) : form.getValues());
  // Remembers the texts each unit switch replaced, so that switching back restores them as typed.
  const [unitMemory] = useState<UnitSwitchMemory>(() => new Map());
  const [defaults] = useState(() => convertLengthTexts(opts.defaults, "mm", opts.initialUnits, unitMemory));
  const form = useForm<FV, FormContext, z.output<S>>({ mode: "onChange", defaultValues: defaults, resolver, context: { units } });

  /**
   * What is saved is read from the texts as millimetres: a value shown in inches and left alone goes
   * back exactly as it was stored (a kept reading keeps who took it and when).
   */
  const inMm = (core: z.output<S>): { core: z.output<S>; values: FV; units: LengthUnits } => {
    const asTyped = { core, values: all(), units };
    if (units === "mm") return asTyped;
    const values = convertLengthTexts(all(), units, "mm", new Map(unitMemory));
    const read = new FormReader("mm");
    const parsed = opts.schema.safeParse(opts.toCore(values, read));
    return read.issues.length === 0 && parsed.success ? { core: parsed.data as z.output<S>, values, units: "mm" } : asTyped;
  };

  const setUnits = (next: LengthUnits) => {
    const values = form.getValues();
    setUnitsState(next);
    opts.outside?.switchUnits(next);
    form.reset(convertLengthTexts(values, units, next, unitMemory), { keepDefaultValues: true, keepDirty: true, keepTouched: true });
    // The context (units) reaches the resolver on the next render; validate after it.
    setTimeout(() => void form.trigger(), 0);
  };

  const onSubmit = form.handleSubmit(
    async (core) => {
      setNotice(null);
      const mm = inMm(core);
      const body = opts.toBody(mm.core, mm.values, mm.units);
      try {
        const row = await save.mutateAsync(id ? { ...body, version } : body);
        setVersion(row.version);
        form.reset(form.getValues());
        opts.outside?.saved();
        setFinishing(Boolean(opts.afterSave));
        const after = opts.afterSave ? await opts.afterSave(row, !id).finally(() => setFinishing(false)) : undefined;
        if (!id) router.push(after?.goTo ?? `/library?kind=${opts.kind}&saved=${encodeURIComponent(row.name)}`);
        else setNotice(after?.notice ?? { tone: "ok", text: `Saved “${row.name}”.` });
      } catch (error) {
        if (error instanceof ApiFailure) {
          for (const [path, message] of Object.entries(error.fields ?? {})) {
            form.setError((opts.fieldPath?.(path) ?? path.replace(/^data\./, "")) as Path<FV>, { type: "server", message });
          }
          setNotice({ tone: "error", text: `${error.message} Everything you typed is still here.` });
        } else {
          // Not an answer of the API (the network, or a defect): the form keeps everything and says so; the cause is logged.
          console.error("library form: the save did not go through", error);
          setNotice({ tone: "error", text: "The save did not go through; everything you typed is still here. Try again." });
        }
      }
    },
    () => setNotice({ tone: "error", text: "Some fields need attention (marked in red); nothing was saved and nothing was lost." }),
  );

  return { form, units, setUnits, notice, onSubmit, busy: save.isPending || finishing };
}
