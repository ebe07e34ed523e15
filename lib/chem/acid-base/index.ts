export { speciate } from "./speciate";
export { designBuffer } from "./design-buffer";
export { ACID_SYSTEMS, WATER_IONIZATION, acidSystem } from "./data/pka-goldberg-2002";
export { BUFFER_REAGENTS, STRONG_ELECTROLYTES } from "./data/buffer-reagents";
export { pKaAt } from "./thermo";
export type * from "./types";
