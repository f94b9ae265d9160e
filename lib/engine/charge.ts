// Charges come from the trailing sign of a name, the way Ligandry writes ions: "Ag+", "S2O3-2",
// "Cu+2", "Ag(CN)2-". A name without a trailing sign is neutral ("HCN", "AgCl").

const TRAILING_CHARGE = /([+-])(\d*)$/;
// Names repeat across solves (a curve, a bench, a bath's runs): remember what was read.
const known = new Map<string, number>();

/** Charge number read from a name's trailing sign and optional digits; 0 when there is none. */
export function chargeFromName(name: string): number {
  let charge = known.get(name);
  if (charge === undefined) {
    const match = TRAILING_CHARGE.exec(name);
    const size = match?.[2] ? Number(match[2]) : 1;
    charge = !match ? 0 : match[1] === '-' ? -size : size;
    if (known.size > 5000) known.clear();
    known.set(name, charge);
  }
  return charge;
}
