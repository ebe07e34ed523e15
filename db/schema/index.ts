export * from "./enums";
export * from "./labs";
export * from "./notebook";
export * from "./mail";
export * from "./relations";
