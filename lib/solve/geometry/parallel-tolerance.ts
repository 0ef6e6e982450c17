/**
 * Two unit directions whose cross product is below this are treated as
 * parallel. Hand-entered coordinates are exact to far better than this, and
 * a real near-parallel pair at this level would put the meeting point about
 * a billion member lengths away, which no engineer would take moments about.
 */
export const PARALLEL_TOLERANCE = 1e-9;
