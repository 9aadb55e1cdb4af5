import { get, type FieldErrors } from "react-hook-form";

/** The message at a form path, whether it sits on the field itself or on the root of a list. */
export function errorAt(errors: FieldErrors, path: string): string | undefined {
  const e = get(errors, path) as { message?: unknown; root?: { message?: unknown } } | undefined;
  const m = e?.message ?? e?.root?.message;
  return typeof m === "string" && m ? m : undefined;
}
