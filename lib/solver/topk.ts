// A found chain before it is dressed as a Chain, and the bounded list of the best distinct
// part multisets. Order: fewest parts, smallest |error|, lowest price (unknown last), shortest
// D, then the multiset key so that ties come out the same every time.

export type Found = {
  /** Connector orientation index (>= 0) or a station mount encoded by `stationMove`. */
  moves: number[];
  k: number;
  /** |D − T|, 0 without a target. */
  err: number;
  /** Σ prices, Infinity when any is unknown. */
  price: number;
  /** D as set. */
  d: number;
  msKey: string;
};

export const stationMove = (station: number, rev: boolean): number => -1 - (station * 2 + (rev ? 1 : 0));
export const decodeStationMove = (move: number): { station: number; rev: boolean } => {
  const v = -1 - move;
  return { station: v >> 1, rev: (v & 1) === 1 };
};

/** Lengths that differ by less than this are equal for ranking (float noise of sums). */
export const RANK_EPS = 1e-9;

function cmpLen(a: number, b: number): number {
  return Math.abs(a - b) <= RANK_EPS ? 0 : a < b ? -1 : 1;
}

function cmpPrice(a: number, b: number): number {
  return a === b ? 0 : a < b ? -1 : 1;
}

/** Compare by the ranking key only (no multiset tie-break). */
export function cmpKey(a: Pick<Found, "k" | "err" | "price" | "d">, b: Pick<Found, "k" | "err" | "price" | "d">): number {
  return a.k - b.k || cmpLen(a.err, b.err) || cmpPrice(a.price, b.price) || cmpLen(a.d, b.d);
}

export function cmpFound(a: Found, b: Found): number {
  return cmpKey(a, b) || (a.msKey < b.msKey ? -1 : a.msKey > b.msKey ? 1 : 0);
}

export class TopK {
  readonly items: Found[] = [];
  private readonly keys = new Set<string>();

  constructor(readonly capacity: number) {}

  get full(): boolean {
    return this.items.length >= this.capacity;
  }

  get worst(): Found | undefined {
    return this.items[this.items.length - 1];
  }

  has(msKey: string): boolean {
    return this.keys.has(msKey);
  }

  /** Would a chain with this key (and some multiset) possibly enter? */
  admits(key: Pick<Found, "k" | "err" | "price" | "d">): boolean {
    return !this.full || cmpKey(key, this.worst!) <= 0;
  }

  offer(f: Found): void {
    if (this.keys.has(f.msKey)) return;
    if (this.full && cmpFound(f, this.worst!) >= 0) return;
    let i = this.items.length;
    while (i > 0 && cmpFound(f, this.items[i - 1]) < 0) i--;
    this.items.splice(i, 0, f);
    this.keys.add(f.msKey);
    if (this.items.length > this.capacity) this.keys.delete(this.items.pop()!.msKey);
  }
}
