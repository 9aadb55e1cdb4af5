"use client";

/** Opens the browser's print dialog for the card. */
export function PrintButton() {
  return (
    <button type="button" className="btn" onClick={() => window.print()}>
      Print the card
    </button>
  );
}
