// Open faces of a chain: the rear port that the next part must mate with, interned to ints.
// A connector's front (iface, g) mates an open face (iface, opposite of g), so an
// orientation runs from the face (front.iface, ¬front.gender) to (rear.iface, rear.gender).

import type { Gender, Port } from "./types";

export const opposite = (g: Gender): Gender => (g === "male" ? "female" : "male");

export class FaceTable {
  readonly ids = new Map<string, number>();
  readonly iface: string[] = [];
  readonly gender: Gender[] = [];

  get size(): number {
    return this.iface.length;
  }

  intern(iface: string, gender: Gender): number {
    const key = `${iface}\u0000${gender}`;
    let id = this.ids.get(key);
    if (id === undefined) {
      id = this.iface.length;
      this.ids.set(key, id);
      this.iface.push(iface);
      this.gender.push(gender);
    }
    return id;
  }

  lookup(iface: string, gender: Gender): number {
    return this.ids.get(`${iface}\u0000${gender}`) ?? -1;
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
    for (const [k, v] of this.ids) copy.ids.set(k, v);
    copy.iface.push(...this.iface);
    copy.gender.push(...this.gender);
    return copy;
  }

  nodeKey(face: number): string {
    return `${this.iface[face]}|${this.gender[face]}`;
  }
}
