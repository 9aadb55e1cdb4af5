import { zodResolver } from "@hookform/resolvers/zod";
import type { LengthUnits } from "@/geometry";
import { get, set, type FieldErrors, type FieldValues, type Resolver } from "react-hook-form";
import type { z } from "zod";
import { FormReader } from "./form-reader";
import { friendlyError } from "./friendly-error";

export type FormContext = { units: LengthUnits };

/**
 * A react-hook-form resolver that validates with one of the core's zod schemas (through zodResolver).
 * The form keeps the text as typed; `toCore` reads it into the core's input (lengths in mm) with a
 * FormReader, whose messages (a comma decimal, an implausible size) stand before the core's at the same
 * field. The form's paths mirror the core's, so every message lands next to its field. The units of
 * the texts come in the form's context (useForm({ context: { units } })).
 */
export function coreResolver<FV extends FieldValues, S extends z.ZodType>(
  schema: S,
  toCore: (values: FV, read: FormReader) => unknown,
): Resolver<FV, FormContext, z.output<S>> {
  return async (values, context, options) => {
    const read = new FormReader(context?.units ?? "mm");
    const input = toCore(values, read);
    const core = zodResolver(schema as never, { error: friendlyError(read.units) } as never);
    // The core sees its own input; errors are nested by the same paths the form uses.
    const result = (await core(input as never, context, { ...options, shouldUseNativeValidation: false } as never)) as {
      values: unknown;
      errors: FieldErrors;
    };
    if (read.issues.length === 0 && Object.keys(result.errors).length === 0) {
      return { values: result.values as z.output<S>, errors: {} };
    }
    const errors: FieldErrors = { ...result.errors };
    for (const issue of read.issues) {
      const at = issue.path.join(".");
      const existing = get(errors, at) as { message?: string } | undefined;
      set(errors, at, { ...(existing ?? {}), type: "text", message: issue.message });
    }
    return { values: {}, errors: errors as FieldErrors<FV> };
  };
}
