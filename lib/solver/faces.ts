// Open faces of a chain: the rear port that the next part must mate with, interned to ints.
// A connector's front (iface, g) mates an open face (iface, opposite of g), so an
// orientation runs from the face (front.iface, ¬front.gender) to (rear.iface, rear.gender).

import type { Gender, Port } from "./types";

export const opposite = (g: Gender): Gender => (g === "male" ? "female" : "male");

/**
 * True when a part may be mounted back to front *and* that is another orientation: a
 * reversible part with the same port on both faces mounts the same way round either way.
 */
export function turnsAround(p: { front: Port | null; rear: Port | null; reversible?: boolean }): boolean {
  if (!p.reversible || !p.front || !p.rear) return false;
  return p.front.interface !== p.rear.interface || p.front.gender !== p.rear.gender;
}

export class FaceTable {
  /** interface → [male id, female id] (-1 when not interned yet). */
  private readonly ids = new Map<string, [number, number]>();
  readonly iface: string[] = [];
  readonly gender: Gender[] = [];

  get size(): number {
    return this.iface.length;
  }

  intern(iface: string, gender: Gender): number {
    let pair = this.ids.get(iface);
    if (!pair) this.ids.set(iface, (pair = [-1, -1]));
    const slot = gender === "male" ? 0 : 1;
    if (pair[slot] < 0) {
      pair[slot] = this.iface.length;
      this.iface.push(iface);
      this.gender.push(gender);
    }
    return pair[slot];
  }

  lookup(iface: string, gender: Gender): number {
    return this.ids.get(iface)?.[gender === "male" ? 0 : 1] ?? -1;
  }

  /** The face a chain must present for this front port to mate. */
  entryOf(front: Port): number {
    return this.intern(front.interface, opposite(front.gender));
  }

  exitOf(rear: Port): number {
    return this.intern(rear.interface, rear.gender);
  }

  /** A copy that can grow with a request's own faces without touching the cached model. */
  extend(): FaceTable {
    const copy = new FaceTable();
    for (const [k, v] of this.ids) copy.ids.set(k, [v[0], v[1]]);
    copy.iface.push(...this.iface);
    copy.gender.push(...this.gender);
    return copy;
  }

  nodeKey(face: number): string {
    return `${this.iface[face]}|${this.gender[face]}`;
  }
}
