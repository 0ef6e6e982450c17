import type { Joint, TrussModel } from "../types";

/** Joints by id, so free-body code can look up coordinates without scanning the list. */
export function indexJoints(model: TrussModel): Map<string, Joint> {
  return new Map(model.joints.map((j) => [j.id, j]));
}
