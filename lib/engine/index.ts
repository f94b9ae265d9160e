// The engine's public surface.
export { chargeFromName } from './charge';
export { DEFAULTS, type SolveOptions } from './defaults';
export { EngineInputError } from './errors';
export type { WarmStart } from './phases';
export { solve, solveTableau, type TableauSolution } from './solve';
export { compileProblem, retarget, type Tableau } from './tableau';
export { daviesA, vantHoff } from './temperature';
export { ENGINE_VERSION } from './version';
export type * from './types';
