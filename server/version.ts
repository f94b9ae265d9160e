import pkg from '../package.json';

/** The running build's version, reported by /api/health and stamped on saved runs later. */
export const APP_VERSION: string = pkg.version;
