import { z } from "zod";

// The field builders every input schema of the core uses. Every length is in millimetres and says so in its name.

/** Longest length the core accepts, mm. */
export const MAX_LENGTH_MM = 10_000;

/** A length, positive, mm. */
export const lengthMm = () => z.number().positive().max(MAX_LENGTH_MM);
/** A length that may be zero, mm. */
export const nonNegativeMm = () => z.number().nonnegative().max(MAX_LENGTH_MM);
/** A coordinate in the deck plane, mm. */
export const coordinateMm = () => z.number().min(-MAX_LENGTH_MM).max(MAX_LENGTH_MM);
/** A name a person gives (a stud, a pocket, a kit). */
export const label = () => z.string().trim().min(1).max(80);
