"use client";
/** Opens the browser's print dialog; the sheet itself is plain HTML that prints without it. */
export function PrintButton({ label = "Print" }: { label?: string }) {
  return (
    <button type="button" className="btn-primary print:hidden" onClick={() => window.print()}>
      {label}
    </button>
  );
}
