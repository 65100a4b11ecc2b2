import { useEffect } from 'react';

/**
 * Print rules for the report page. The app lays itself out in the window's height and
 * scrolls inside its own views, so for paper every box around the report grows to its
 * content; the workspace chrome and every control are left off; black on white; each
 * section starts a page; rows, the charts and the approval stay whole.
 */
const PRINT_CSS = `
@media print {
  @page { size: A4; margin: 12mm; }
  html, body { background: #fff !important; height: auto !important; overflow: visible !important; }
  *:has(> main, > [role="main"]) > :not(main):not([role="main"]) { display: none !important; }
  [data-testid="report-toolbar"], [role="button"], button, nav, [role="navigation"] { display: none !important; }
  #root, *:has([data-testid="report"]) {
    display: block !important; width: auto !important; max-width: none !important;
    height: auto !important; min-height: 0 !important; max-height: none !important;
    overflow: visible !important; flex: none !important;
    padding: 0 !important; margin: 0 !important; background: #fff !important;
  }
  [data-testid="report"] {
    height: auto !important; overflow: visible !important;
    padding: 0 !important; border: 0 !important; border-radius: 0 !important;
  }
  [data-testid="report"], [data-testid="report"] * {
    color: #000 !important; background-color: transparent !important; border-color: #999 !important;
    box-shadow: none !important;
  }
  [data-testid^="report-section-"] { break-before: page; }
  [data-testid="report-section-approvals"] { break-before: avoid; }
  [role="row"], [role="listitem"], [data-testid="report-curves"], [data-testid^="report-soa-chart-"], [data-testid="report-approval"] { break-inside: avoid; }
  /* The SOA chart's pointer read-out means nothing on paper. */
  [data-testid^="report-soa-chart-"] *:has(> [data-testid="soa-chart-area"]) > :first-child:not([data-testid="soa-chart-area"]) { display: none !important; }
  [role="heading"], h1, h2, h3, h4, h5, h6 { break-after: avoid; }
}
`;

/** Adds the report's print rules to the document while the report is open. */
export function PrintStyles() {
  useEffect(() => {
    const style = document.createElement('style');
    style.setAttribute('data-report-print', '');
    style.textContent = PRINT_CSS;
    document.head.appendChild(style);
    return () => style.remove();
  }, []);
  return null;
}
