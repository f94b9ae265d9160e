/** Print rules for the page; only the web has a browser print (see print-styles.web.tsx). */
export function PrintStyles() {
  return null;
}
