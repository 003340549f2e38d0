export * from "./types";
export * from "./match";
export * from "./seed";
