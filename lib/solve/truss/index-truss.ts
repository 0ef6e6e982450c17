import type { TrussModel } from "../types";

/** Joint lookup for a model whose references are already known to be sound. */
export type TrussIndex = {
  /** Joint id → position in `model.joints`. */
  jointIndex: Map<string, number>;
  /** Member i runs from joint `start[i]` to joint `end[i]` (positions in `model.joints`, −1 for an unknown id). */
  start: Int32Array;
  end: Int32Array;
};

// Validation, the stability check and the solver all need the same index of one model object.
const cache = new WeakMap<TrussModel, TrussIndex>();

/**
 * Positions of every joint and member end, so that the solver never looks ids
 * up in its loops. Remembered per model object: treat models as immutable.
 */
export function indexTruss(model: TrussModel): TrussIndex {
  const known = cache.get(model);
  if (known) return known;
  const jointIndex = new Map<string, number>();
  for (let i = 0; i < model.joints.length; i++) jointIndex.set(model.joints[i].id, i);
  const m = model.members.length;
  const start = new Int32Array(m);
  const end = new Int32Array(m);
  for (let i = 0; i < m; i++) {
    start[i] = jointIndex.get(model.members[i].start) ?? -1;
    end[i] = jointIndex.get(model.members[i].end) ?? -1;
  }
  const index = { jointIndex, start, end };
  cache.set(model, index);
  return index;
}
