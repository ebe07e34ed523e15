/**
 * The engine's version, stored with every computed solution. Raise it whenever a change can
 * move a number a block shows (a model, a parameter table, a default): revisions saved
 * before keep the numbers they were computed with, and a signed revision can say which
 * engine computed its numbers and whether today's engine would give others.
 */
export const ENGINE_VERSION = "2026.12.6";
