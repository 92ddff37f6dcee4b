// Page cursors, one codec for every list: the last row's key fields, comma-joined, in
// base64url. Opaque to clients; each list checks the fields it gets back.

export const packCursor = (...fields: string[]): string => Buffer.from(fields.join(","), "utf8").toString("base64url");

export const unpackCursor = (cursor: string): string[] => Buffer.from(cursor, "base64url").toString("utf8").split(",");
