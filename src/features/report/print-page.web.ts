/** The browser's own print dialog (and "Save as PDF"). */
export const canPrint = true;

export function printPage(): void {
  window.print();
}
