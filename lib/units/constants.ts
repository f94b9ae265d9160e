// Exact unit definitions (international yard and pound agreement, 1959; US liquid gallon = 231 in³).

/** One troy ounce in grams (exact): precious-metal content is traded in troy ounces. */
export const TROY_OUNCE_G = '31.1034768';

/** One avoirdupois ounce in grams (exact): salts and free cyanide in plating shops are weighed in these. */
export const AVOIRDUPOIS_OUNCE_G = '28.349523125';

/** One avoirdupois pound in grams (exact). */
export const POUND_G = '453.59237';

/** One US liquid gallon in litres (exact); tank volumes in US shops are stated in these. */
export const US_GALLON_L = '3.785411784';
