"use client";

import { useFormContext, type FieldValues, type Path } from "react-hook-form";
import type { ReactNode } from "react";
import { Field } from "../field";
import { errorAt } from "./field-error";

/** A registered text input; `unit` is shown beside the label ("mm", "in", "rpm"). */
export function TextField<FV extends FieldValues>({
  name,
  label,
  unit,
  hint,
  numeric,
  placeholder,
  className,
}: {
  name: Path<FV>;
  label: ReactNode;
  unit?: string;
  hint?: ReactNode;
  numeric?: boolean;
  placeholder?: string;
  className?: string;
}) {
  const { register, formState, getValues } = useFormContext<FV>();
  // The value as the form holds it, so the server's HTML shows it too (the form alone sets it only in the browser).
  const initial: unknown = getValues(name);
  return (
    <div className={className}>
      <Field
        label={label}
        unit={unit}
        hint={hint}
        id={`f-${String(name).replaceAll(".", "-")}`}
        error={errorAt(formState.errors, name)}
        inputMode={numeric ? "decimal" : undefined}
        autoComplete="off"
        placeholder={placeholder}
        className={`field-input ${numeric ? "num" : ""}`}
        defaultValue={typeof initial === "string" || typeof initial === "number" ? initial : undefined}
        {...register(name)}
      />
    </div>
  );
}
