import { PRINT_CONTROLS_ID, PRINT_PAGE_ID } from '@/components/screens/runs/print-ids';
import { palettes } from '@/components/theme/tokens';

// The page scrolls as a document (not inside a scroll view) so the browser can split it into pages;
// 180 mm of content fits A4 (210 mm) and Letter (216 mm) inside 15 mm margins.
const CSS = `
@page { size: auto; margin: 15mm; }
html, body { height: auto !important; min-height: 100%; overflow: visible !important; }
#root { height: auto !important; min-height: 100vh; }
#${PRINT_PAGE_ID} { max-width: 180mm; }
#${PRINT_PAGE_ID} svg, #${PRINT_PAGE_ID} img, #${PRINT_PAGE_ID} canvas { max-width: 100%; }
@media print {
  html, body, #root { background: ${palettes.light.surface} !important; }
  #${PRINT_CONTROLS_ID} { display: none !important; }
  #${PRINT_PAGE_ID} { width: auto !important; margin: 0 auto !important; padding: 0 !important; }
  [role="row"], [role="listitem"] { break-inside: avoid; page-break-inside: avoid; }
  [role="heading"], h1, h2, h3 { break-after: avoid; page-break-after: avoid; }
}
`;

/** The print rules (page size and margins, no controls, rows kept whole), mounted only with the print page. */
export function PrintStyles() {
  return <style>{CSS}</style>;
}
