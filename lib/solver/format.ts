// Wording helpers shared by reasons and warnings (kept here so the solver imports nothing
// outside lib/solver and lib/optics).

import type { Part, Port } from "./types";

export const mm = (x: number): string => {
  const t = x.toFixed(1);
  return `${Number(t) === 0 ? "0.0" : t} mm`;
};

export const grams = (x: number): string => `${Math.round(x)} g`;

export const nameOf = (p: Pick<Part, "id" | "name">): string => p.name ?? p.id;

export const describePort = (port: Port): string => `${port.interface} ${port.gender}`;

/** "A, B and C" */
export function listAnd(items: string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}
