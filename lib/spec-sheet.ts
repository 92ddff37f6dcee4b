// Spec sheets: PDF, PNG or JPEG, at most 10 MB, recognised by their content (file-type reads
// the magic bytes), never by the name or the type the browser claims.
import { fileTypeFromBuffer } from "file-type";

export const SPEC_SHEET_MAX_BYTES = 10 * 1024 * 1024;
const ALLOWED = new Set(["application/pdf", "image/png", "image/jpeg"]);

export async function checkSpecSheet(bytes: Uint8Array): Promise<{ ok: true; type: string; ext: string } | { ok: false; message: string }> {
  if (bytes.length === 0) return { ok: false, message: "The spec sheet is empty." };
  if (bytes.length > SPEC_SHEET_MAX_BYTES) return { ok: false, message: "The spec sheet is larger than 10 MB." };
  const found = await fileTypeFromBuffer(bytes);
  if (!found || !ALLOWED.has(found.mime)) {
    return { ok: false, message: "The spec sheet must be a PDF, PNG or JPEG file (its content is checked, not its name)." };
  }
  return { ok: true, type: found.mime, ext: found.ext };
}
