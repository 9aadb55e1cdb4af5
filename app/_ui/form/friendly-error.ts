import type { LengthUnits } from "@/geometry";
import type { z } from "zod";
import { limitText } from "./form-reader";
import { isLengthPath } from "./units-text";

type Issue = z.core.$ZodRawIssue;

/** The core's validation issues in plain words, with limits in the form's units. */
export function friendlyError(units: LengthUnits) {
  return (issue: Issue): string | undefined => {
    const path = (issue.path ?? []) as (string | number)[];
    const length = isLengthPath(path);
    const show = (n: number) => (length ? limitText(n, units) : String(n));
    switch (issue.code) {
      case "invalid_type":
        if (issue.input === undefined || (typeof issue.input === "number" && Number.isNaN(issue.input))) return "required: enter a value";
        return issue.expected === "number" ? "enter a number" : undefined;
      case "too_small": {
        if (issue.origin === "array") return `add at least ${issue.minimum}`;
        if (issue.origin === "string") return "required: enter a value";
        const min = Number(issue.minimum);
        if (min === 0) return issue.inclusive ? "must be 0 or more (not negative)" : `must be more than ${show(0)} (not zero or negative)`;
        return `must be ${issue.inclusive ? "at least" : "more than"} ${show(min)}`;
      }
      case "too_big": {
        if (issue.origin === "array") return `at most ${issue.maximum} entries`;
        if (issue.origin === "string") return `at most ${issue.maximum} characters`;
        return `must be ${issue.inclusive ? "at most" : "less than"} ${show(Number(issue.maximum))}`;
      }
      case "not_multiple_of":
        return "must be a whole number";
      case "unrecognized_keys":
        return undefined;
      default:
        return undefined;
    }
  };
}
