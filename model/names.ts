// The rules for a name a person types: their own, their shop's, a row's. Pure zod, shared by the sign-in
// routes, the data layer and the forms.
import { z } from "zod";

/**
 * Characters that reorder how text is shown (Unicode bidirectional controls: embeddings, overrides,
 * isolates and marks). In a name they can make "Quillfern" display as something else, so names refuse them.
 */
export const BIDI_CONTROL = /[\u061C\u200E\u200F\u202A-\u202E\u2066-\u2069]/;
/** C0 and C1 control characters (tabs and line breaks included): never part of a name. */
export const CONTROL_CHARACTER = /[\u0000-\u001F\u007F-\u009F]/;

export const BIDI_MESSAGE = "Remove the invisible text-direction characters from the name.";

/** A string schema that refuses text-direction controls. */
export function withoutBidi<T extends z.ZodType<string>>(schema: T, message = BIDI_MESSAGE) {
  return schema.refine((s) => !BIDI_CONTROL.test(s), { message });
}

export const PERSON_NAME_MAX = 100;

/** A person's name: text, 1 to 100 characters after trimming, no control or text-direction characters. */
export const PersonNameSchema = z
  .string({ error: "Give your name as text." })
  .trim()
  .min(1, "Give your name.")
  .max(PERSON_NAME_MAX, `Keep the name to ${PERSON_NAME_MAX} characters or fewer.`)
  .refine((s) => !CONTROL_CHARACTER.test(s), { message: "A name is one line of text, without control characters." })
  .refine((s) => !BIDI_CONTROL.test(s), { message: BIDI_MESSAGE });

/** A shop's name: as a person's name, at most 80 characters. */
export const ShopNameSchema = z
  .string({ error: "Give the shop's name as text." })
  .trim()
  .min(1, "Give the shop a name.")
  .max(80, "Keep the shop's name to 80 characters or fewer.")
  .refine((s) => !CONTROL_CHARACTER.test(s), { message: "A name is one line of text, without control characters." })
  .refine((s) => !BIDI_CONTROL.test(s), { message: BIDI_MESSAGE });
