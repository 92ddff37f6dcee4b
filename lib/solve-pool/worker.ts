// Runs in a piscina worker thread: one inline solve, off the thread that answers requests.
// Bundled on its own by lib/solve-pool/build.ts (the Next build does not emit worker files).
import { solveTrain, type SolveRequest, type SolveResult } from "@/lib/solver";

export default function solve(request: SolveRequest): SolveResult {
  return solveTrain(request);
}
