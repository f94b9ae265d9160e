// The engine's version, stamped on every saved run. Raise it when a change can move a result.
export const ENGINE_VERSION = '1.1.0';
