import { makeStaticStyles } from '@fluentui/react-components';

/**
 * Print layout of the shop sheet, for letter and A4 alike (`size: auto` lets the printer's paper
 * decide). While a sheet is on the page, printing drops the app's top bar and navigation and lets
 * the content run over as many pages as it needs.
 */
const usePrintStyles = makeStaticStyles(`
@page { size: auto; margin: 12mm 12mm 14mm; }
@media print {
  body:has([data-shop-sheet]) header,
  body:has([data-shop-sheet]) nav,
  [data-print-hide] { display: none !important; }
  body:has([data-shop-sheet]),
  body:has([data-shop-sheet]) div:has([data-shop-sheet]),
  body:has([data-shop-sheet]) main:has([data-shop-sheet]) {
    display: block !important; overflow: visible !important; height: auto !important; min-height: 0 !important;
    padding: 0 !important; margin: 0 !important; background: #ffffff !important;
  }
  [data-shop-sheet] { color: #000000; font-size: 10pt; }
  [data-sheet-section] { break-inside: avoid; }
  [data-sheet-break] { break-before: page; }
  [data-shop-sheet] tr { break-inside: avoid; }
  [data-shop-sheet] thead { display: table-header-group; }
}
`);

export function PrintStyles() {
  usePrintStyles();
  return null;
}
