// Callout labels for the build drawing, in rows stacked away from the train. Each label hangs
// on a vertical leader at `cx`; rows count outward from the train (row 0 nearest), so a
// leader from row r crosses rows 0…r−1. The rule kept: no two labels in a row overlap, and
// no leader passes through another label. A label may slide sideways along its leader
// (centred, or starting or ending near it) to find room. Pure, for the drawing and its tests.

export type Callout = { cx: number; width: number };
export type Placed = { row: number; left: number; right: number };

const GAP = 10;
/** Leaders closer than this share one callout (the drawing merges them). */
export const MIN_LEADER_GAP = 16;
const LEADER_MARGIN = 4;

const overlaps = (a: { left: number; right: number }, b: { left: number; right: number }) => a.left < b.right + GAP && b.left < a.right + GAP;
const covers = (l: { left: number; right: number }, x: number) => x > l.left - LEADER_MARGIN && x < l.right + LEADER_MARGIN;

function candidatesFor(l: Callout, minX: number, maxX: number): number[] {
  const clampLeft = (left: number) => Math.min(Math.max(left, minX), Math.max(minX, maxX - l.width));
  // Centred first (reads best), then starting or ending just past the leader.
  const all = [l.cx - l.width / 2, l.cx - l.width + LEADER_MARGIN * 2, l.cx - LEADER_MARGIN * 2].map(clampLeft)
    .filter((left) => left <= l.cx && left + l.width >= l.cx);
  return all.length ? all : [clampLeft(l.cx - l.width / 2)];
}

function fits(span: Placed, cx: number, others: (Placed & { cx: number })[]): boolean {
  return others.every((p) =>
    (p.row === span.row ? !overlaps(p, span) : true)
    && (p.row < span.row ? !covers(p, cx) : true)     // my leader crosses nearer rows
    && (p.row > span.row ? !covers(span, p.cx) : true)); // their leaders cross my row
}

/**
 * Rows and horizontal spans for each label (sorted by `cx`, leaders at least MIN_LEADER_GAP
 * apart), in as few rows as a bounded search finds; `minX`/`maxX` bound the drawing.
 */
export function layoutCallouts(labels: Callout[], minX = 0, maxX = Infinity): Placed[] {
  const options = labels.map((l) => candidatesFor(l, minX, maxX));
  let budget = 50_000;
  const chosen: (Placed & { cx: number })[] = [];
  const search = (i: number, rows: number): boolean => {
    if (i === labels.length) return true;
    for (let row = 0; row < rows; row++) {
      for (const left of options[i]) {
        if (--budget < 0) return false;
        const span = { row, left, right: left + labels[i].width };
        if (!fits(span, labels[i].cx, chosen)) continue;
        chosen.push({ ...span, cx: labels[i].cx });
        if (search(i + 1, rows)) return true;
        chosen.pop();
      }
    }
    return false;
  };
  for (let rows = 1; rows <= labels.length && budget > 0; rows++) {
    chosen.length = 0;
    if (search(0, rows)) return chosen.map(({ row, left, right }) => ({ row, left, right }));
  }
  return staircase(labels, minX, maxX);
}

/**
 * The fallback when the search runs out of budget: one label per row. Either each label ends
 * just past its leader with the leftmost nearest the train (later leaders pass to the right of
 * every nearer label), or — when the drawing's left edge pushes a label over the next leader —
 * each starts just before its leader with the rightmost nearest the train.
 */
function staircase(labels: Callout[], minX: number, maxX: number): Placed[] {
  const n = labels.length;
  const endingAt = labels.map((l, row) => {
    const left = Math.max(minX, l.cx - l.width + LEADER_MARGIN * 2);
    return { row, left, right: left + l.width };
  });
  const valid = endingAt.every((p, i) => labels.every((later, j) => !(j > i && later.cx > p.left - LEADER_MARGIN && later.cx < p.right + LEADER_MARGIN)));
  if (valid) return endingAt;
  return labels.map((l, i) => {
    const left = Math.max(minX, Math.min(l.cx - LEADER_MARGIN * 2, maxX - l.width));
    return { row: n - 1 - i, left, right: left + l.width };
  });
}
