export { speciate } from "./speciate";
export { designBuffer } from "./design-buffer";
export type * from "./types";
