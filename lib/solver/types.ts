// The solver contract (SOLVER.md, v2). Field names here are the public API: add, never rename.

export type Gender = "male" | "female";

/** One face of a part. Barrels: male = barrel/nosepiece, female = holder/clamp. */
export type Port = { interface: string; gender: Gender };

export type Part = {
  id: string;
  name?: string;
  /** Sky side. */
  front: Port | null;
  /** Sensor side. */
  rear: Port | null;
  /** Optical path length between its two joint planes (camera: joint plane to sensor). */
  lengthMm: number;
  /** Adjustable parts: real length anywhere in [lengthMm, lengthMm + adjustMm]. */
  adjustMm?: number;
  /** May be mounted back to front (default false). */
  reversible?: boolean;
  /** Most uses in one chain (stock); absent = unlimited. */
  quantity?: number;
  /** Absent = price unknown; owned parts are sent with 0. */
  priceCents?: number;
  clearApertureMm?: number;
  weightG?: number;
};

export type Optics = Part & {
  backFocusMm?: number;
  backFocusToleranceMm?: number;
  focalRatio?: number;
  imageCircleMm?: number;
  maxLoadG?: number;
};

export type Camera = Part & { sensorDiagonalMm?: number };

export type Filter = { thicknessMm: number; refractiveIndex?: number };

export type SolveRequest = {
  optics: Optics;
  camera: Camera;
  /** Devices that must be in the train, in this order, sky to sensor. */
  stations?: Part[];
  /** Glass in the beam at once. */
  filters?: Filter[];
  /** Connecting parts available: adapters, spacers, extensions. */
  parts: Part[];
  /** Most connecting parts in one chain (default 10). */
  maxParts?: number;
  /** Default 5. */
  maxSolutions?: number;
};

export type StepRole = "connector" | "station" | "camera";

export type Step = {
  partId: string;
  role: StepRole;
  reversed: boolean;
  /** As set (adjustable parts: the chosen setting). */
  lengthMm: number;
  /** Distance from the optics' rear joint plane to this step's front. */
  startMm: number;
  /** The joint on this step's front face. */
  joint: { interface: string };
};

export type WarningCode = "vignetting" | "image-circle" | "load";

export type ChainWarning = { code: WarningCode | (string & {}); partId?: string; message: string };

export type Chain = {
  /** Everything after the optics, sky to sensor; the camera is last. */
  steps: Step[];
  /** D: optics' rear joint plane to sensor = Σ steps' lengthMm. */
  sensorDistanceMm: number;
  /** D − target; null without a back focus. */
  errorMm: number | null;
  /** Connecting parts only (not stations, not the camera). */
  partCount: number;
  /** Σ connecting parts' prices; null when any is unknown. */
  priceCents: number | null;
  /**
   * Joints per leg that return to an interface already used in that leg after leaving it
   * (M48 → M63 → M48 is one), contract v2 §1.3.
   */
  detours: number;
  warnings: ChainWarning[];
  /**
   * Solutions only: the next up to 3 multisets of the same geometry (equivalent parts from
   * other makers), best first, each in its best ordering. Variants themselves carry none.
   */
  variants?: Chain[];
};

export type SolveStatus = "ok" | "no-connection" | "too-long" | "out-of-reach";

/** The reachable distances closest to the window when nothing lands inside it. */
export type Nearest = { belowMm: number | null; aboveMm: number | null };

export type SolveResult = {
  status: SolveStatus;
  /** backFocusMm + filterShiftMm, or null when no back focus is set. */
  targetMm: number | null;
  toleranceMm: number | null;
  /** Σ t·(n−1)/n, n defaulting to 1.5. */
  filterShiftMm: number;
  /** The minimal-length connection, ignoring the target (honouring quantity, maxParts, stations). */
  shortest: Chain | null;
  /**
   * Chains inside the window (every connection without a back focus), one per geometry, the
   * best multiset of each of the first maxSolutions geometries in rank order (contract v2).
   */
  solutions: Chain[];
  /** One plain sentence whenever status is not "ok". */
  reason?: string;
  /**
   * Present when a back focus is set and nothing lands in the window ("too-long",
   * "out-of-reach"): the largest reachable D below it and the smallest above it.
   */
  nearest?: Nearest;
  /**
   * Present (true) only when the search hit its safety limit (thousands of arbitrary-length
   * spacers on one face): the chains returned are real, but better ones may exist.
   */
  truncated?: true;
};

export const DEFAULT_MAX_PARTS = 10;
export const DEFAULT_MAX_SOLUTIONS = 5;
export const DEFAULT_TOLERANCE_MM = 0.5;
/** Slack on every length comparison (mm), as the contract says. */
export const LENGTH_SLACK_MM = 1e-6;
