/** Id of the print page's column, which the web's print rules size (a nativeID is the element's id on the web). */
export const PRINT_PAGE_ID = 'run-print-page';

/** Id of the controls (back link, Print button) that the paper leaves out. */
export const PRINT_CONTROLS_ID = 'print-controls';
