import "server-only";

/** Escape LIKE's wildcards (`%`, `_`) and its escape character, so a typed word matches literally. */
export const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);
