// Illinois false position (Dowell & Jarratt, BIT 11, 1971): the root of a function of one
// unknown on a bracket whose ends have opposite signs. The solver's bracketing fallbacks use it.

/** The last point tried, its value, and the bracket left. */
export interface IllinoisResult {
  x: number;
  fx: number;
  a: number;
  fa: number;
  b: number;
  fb: number;
}

/**
 * Narrows [a, b] (fa and fb of opposite signs) by false position, halving the value kept at an
 * end that survives twice running. Stops after maxSteps, when done(x, fx, a, b) says so (checked
 * before each step, first with x = b), or when f gives 0 or NaN (returned as fx).
 */
export function illinois(
  f: (x: number) => number,
  bracket: { a: number; fa: number; b: number; fb: number },
  done: (x: number, fx: number, a: number, b: number) => boolean,
  maxSteps = 100,
): IllinoisResult {
  let { a, fa, b, fb } = bracket;
  let x = b;
  let fx = fb;
  let side = 0;
  for (let i = 0; i < maxSteps && !done(x, fx, a, b); i++) {
    x = (a * fb - b * fa) / (fb - fa);
    if (!Number.isFinite(x) || x <= Math.min(a, b) || x >= Math.max(a, b)) x = 0.5 * (a + b);
    fx = f(x);
    if (Number.isNaN(fx) || fx === 0) break;
    if (Math.sign(fx) === Math.sign(fb)) {
      b = x;
      fb = fx;
      if (side === -1) fa /= 2;
      side = -1;
    } else {
      a = x;
      fa = fx;
      if (side === 1) fb /= 2;
      side = 1;
    }
  }
  return { x, fx, a, fa, b, fb };
}
