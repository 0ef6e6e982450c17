/** Largest package document accepted: 2 MB of JSON (UTF-8 bytes). Figures are stored as files, not inline. */
export const MAX_DOCUMENT_BYTES = 2 * 1024 * 1024;

/** Longest single text node: a long section of narrative, not a pasted data dump. */
export const MAX_TEXT_LENGTH = 100_000;

/** Deepest nesting of nodes (doc → list → item → paragraph → text is 5). */
export const MAX_NODE_DEPTH = 20;

/** Deepest nesting of JSON objects and arrays anywhere, calc inputs included. */
export const MAX_JSON_DEPTH = 64;
