import { Button } from '@/components/ui/button';

/** The browser's print, where there is one (the web); null elsewhere. */
function browserPrint(): (() => void) | null {
  const host = globalThis as { print?: () => void };
  return typeof host.print === 'function' ? () => host.print?.() : null;
}

/** Opens the browser's print dialog; shows nothing where there is no browser print. The print rules hide it on paper. */
export function PrintButton() {
  const print = browserPrint();
  if (!print) return null;
  return <Button label="Print" variant="primary" accessibilityHint="Opens the print dialog; choose a printer or save as PDF" onPress={print} />;
}
