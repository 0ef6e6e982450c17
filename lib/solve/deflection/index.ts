export { deflection, type DeflectionOptions, type DeflectionResult } from "./deflection";
export type { SpanCheck } from "./span-check";
export type { VirtualWorkTerm } from "./virtual-work-table";
