export * from "./enums";
export * from "./labs";
export * from "./notebook";
export * from "./relations";
