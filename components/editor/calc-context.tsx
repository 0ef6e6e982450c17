"use client";

import { createContext, useContext, type ReactNode } from "react";
import type { CalcResult, PackageEvaluation } from "@/lib/calcs/calc-types";

type CalcContextValue = { evaluation: PackageEvaluation; editable: boolean; unitSystem: "SI" | "US"; labels: string[] };

const CalcContext = createContext<CalcContextValue | null>(null);

export function CalcProvider({ value, children }: { value: CalcContextValue; children: ReactNode }) {
  return <CalcContext.Provider value={value}>{children}</CalcContext.Provider>;
}

export function useCalcContext(): CalcContextValue {
  const v = useContext(CalcContext);
  if (!v) throw new Error("Calc node views must sit inside a CalcProvider");
  return v;
}

export function useCalcResult(id: string | null): CalcResult | undefined {
  const { evaluation } = useCalcContext();
  return id ? evaluation.results[id] : undefined;
}
