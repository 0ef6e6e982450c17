import type { ReportMeta } from "../report-model";

/** Printed on the cover and in every footer of a draft: a draft is never a construction document. */
export const PRELIMINARY = "PRELIMINARY \u2014 NOT FOR CONSTRUCTION";

export function revisionText(meta: ReportMeta): string {
  return meta.revision ? meta.revision.label : "Draft";
}
