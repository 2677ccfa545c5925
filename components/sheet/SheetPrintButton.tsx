'use client';

/** Opens the browser's print dialog for the field sheet. */
export default function SheetPrintButton() {
  return (
    <button type="button" className="btn-primary" onClick={() => window.print()}>
      Print sheet
    </button>
  );
}
