/**
 * Version of the scenario analysis stored with each result. Bump it whenever lib/analysis or an
 * engine it calls (lib/modes, lib/porous, lib/reverb) changes what a stored result would contain:
 * stored results of another version are recomputed when they are next read.
 */
export const ENGINE_VERSION = "analysis-2026.12-1";
