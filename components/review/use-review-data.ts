"use client";

import { useCallback } from "react";
import useSWR from "swr";
import type { CheckProgressDto, RemarkDto } from "./review-types";

/**
 * The package's check progress and remarks, kept fresh: other people remark
 * and check while this page is open, so both are re-read every few seconds
 * and at once after anything done here.
 */
export function useReviewData(packageId: string) {
  const progress = useSWR<CheckProgressDto>(`/api/v1/packages/${packageId}/check-progress`, { refreshInterval: 4000 });
  const remarks = useSWR<{ remarks: RemarkDto[] }>(`/api/v1/packages/${packageId}/remarks`, { refreshInterval: 4000 });
  const { mutate: mutateProgress } = progress;
  const { mutate: mutateRemarks } = remarks;
  const refresh = useCallback(() => {
    void mutateProgress();
    void mutateRemarks();
  }, [mutateProgress, mutateRemarks]);
  return { progress: progress.data, remarks: remarks.data?.remarks ?? [], refresh };
}
