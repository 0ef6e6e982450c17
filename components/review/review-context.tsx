"use client";

import { createContext, useContext, type ReactNode } from "react";
import type { CalcCheckDto, RemarkDto, RemarkTarget, ReviewAbilities } from "./review-types";

export type ReviewContextValue = {
  abilities: ReviewAbilities;
  status: string;
  checkOf: (calcId: string) => CalcCheckDto | undefined;
  remarksOn: (calcId: string) => RemarkDto[];
  markCalc: (calcId: string, state: "checked" | "returned") => Promise<void>;
  startRemark: (target: RemarkTarget) => void;
  showRemark: (remarkId: string) => void;
};

const ReviewContext = createContext<ReviewContextValue | null>(null);

export function ReviewProvider({ value, children }: { value: ReviewContextValue | null; children: ReactNode }) {
  return <ReviewContext.Provider value={value}>{children}</ReviewContext.Provider>;
}

/** The review around one calc; null outside a package page (e.g. a calc rendered alone). */
export function useCalcReview(calcId: string): (Omit<ReviewContextValue, "checkOf" | "remarksOn"> & { check: CalcCheckDto | undefined; remarks: RemarkDto[] }) | null {
  const v = useContext(ReviewContext);
  if (!v) return null;
  return { ...v, check: v.checkOf(calcId), remarks: v.remarksOn(calcId) };
}
