"use client";
// The plan's display unit (mm or inches), for the parts of the form that show lengths: the
// chosen parts' cards, the filter's focus shift and the tolerance. Inputs stay in millimetres.
import { createContext, useContext, type ReactNode } from "react";
import type { LengthUnit } from "@/lib/units";

const LengthUnitContext = createContext<LengthUnit>("mm");

export function LengthUnitProvider({ unit, children }: { unit: LengthUnit; children: ReactNode }) {
  return <LengthUnitContext.Provider value={unit}>{children}</LengthUnitContext.Provider>;
}

export const useLengthUnit = () => useContext(LengthUnitContext);
