/**
 * The families of fonts/README.md. A DOCX names fonts rather than carrying
 * them; Word substitutes a close face where they are not installed, which is
 * why each has a common fallback in the same class (serif, sans, mono).
 */
export const BODY_FONT = "Source Serif 4";
export const HEADING_FONT = "Inter";
export const CODE_FONT = "JetBrains Mono";

/** Half-points, as Word measures type. */
export const BODY_SIZE = 21;
export const SMALL_SIZE = 16;
export const TITLE_BLOCK_SIZE = 14;

export const INK = "1F2328";
export const INK_SOFT = "57606A";
export const RULE = "B8BEC6";
export const HEADER_FILL = "EEF1F4";
export const CAUTION = "8A2B06";
