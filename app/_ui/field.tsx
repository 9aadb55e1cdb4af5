import type { InputHTMLAttributes, ReactNode } from "react";

type FieldProps = InputHTMLAttributes<HTMLInputElement> & {
  label: ReactNode;
  name: string;
  error?: string;
  hint?: ReactNode;
  unit?: string;
};

/** A labelled input with its hint and, next to it, what is wrong in words. */
export function Field({ label, name, error, hint, unit, id, ...input }: FieldProps) {
  const inputId = id ?? `field-${name}`;
  const describedBy = [error ? `${inputId}-error` : null, hint ? `${inputId}-hint` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div>
      <label htmlFor={inputId} className="field-label">
        {label}
        {unit ? <span className="ml-1 text-ink-3 num">({unit})</span> : null}
      </label>
      <input id={inputId} name={name} aria-invalid={error ? true : undefined} aria-describedby={describedBy} className="field-input" {...input} />
      {hint && !error ? (
        <p id={`${inputId}-hint`} className="field-hint">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${inputId}-error`} role="alert" className="field-error">
          {error}
        </p>
      ) : null}
    </div>
  );
}

/** A message above a form: what went wrong as a whole, or that it worked. */
export function FormNotice({ tone, children }: { tone: "error" | "ok"; children: ReactNode }) {
  const cls = tone === "error" ? "border-error bg-paper-2" : "border-success bg-paper-2";
  return (
    <div role={tone === "error" ? "alert" : "status"} className={`rounded-md border-l-4 px-4 py-3 text-sm ${cls}`}>
      {children}
    </div>
  );
}
