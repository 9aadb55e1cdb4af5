"use client";

/** A button whose action asks first (the browser's own confirm dialog): for what cannot be undone. */
export function ConfirmButton({ question, onConfirm, className, disabled, children }: { question: string; onConfirm: () => void; className: string; disabled?: boolean; children: React.ReactNode }) {
  return (
    <button
      type="button"
      className={className}
      disabled={disabled}
      onClick={() => {
        if (window.confirm(question)) onConfirm();
      }}
    >
      {children}
    </button>
  );
}
