export * from "./types";
export { buildTrail, buildAllTrails, DEFAULT_MAX_DEPTH } from "./build";
