import { useEffect } from 'react';

/**
 * Print layout for the board: A4 landscape, only the header, counts and table, small type. react-native-web lays
 * the app out in fixed-height scrolling boxes, so those are let out to their full height for paper.
 */
const CSS = `
@media print {
  @page { size: A4 landscape; margin: 10mm; }
  html, body, #root { height: auto !important; overflow: visible !important; background: #fff !important; }
  #root div { overflow: visible !important; }
  [role="navigation"], #board-actions, #board-filters, [data-testid="page-previous"], [data-testid="page-next"], [aria-label="Sort by"] { display: none !important; }
  #board-print-area { max-width: none !important; width: 100% !important; }
  [role="table"], #board-print-area [data-testid="board-table"] > div:first-child > div { width: 100% !important; min-width: 0 !important; }
  #board-print-area * { font-size: 9pt !important; line-height: 1.25 !important; }
  #board-print-area [role="row"] { min-height: 0 !important; break-inside: avoid; }
}
`;

/** Adds the board's print stylesheet while the board is open. */
export function BoardPrintStyles() {
  useEffect(() => {
    const el = document.createElement('style');
    el.setAttribute('data-board-print', '');
    el.textContent = CSS;
    document.head.appendChild(el);
    return () => el.remove();
  }, []);
  return null;
}

export const printBoard = () => window.print();
export const canPrint = true;
