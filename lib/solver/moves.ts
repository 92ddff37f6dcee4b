// A chain's moves: a connector orientation index (>= 0), or a station mount encoded below
// (< 0), so that one number array holds a whole chain.

export const stationMove = (station: number, rev: boolean): number => -1 - (station * 2 + (rev ? 1 : 0));
export const decodeStationMove = (move: number): { station: number; rev: boolean } => {
  const v = -1 - move;
  return { station: v >> 1, rev: (v & 1) === 1 };
};
