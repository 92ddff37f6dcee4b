import { AppError } from "@/lib/errors";
import { readBodyBytes } from "@/lib/http/body";
import { LIMITS } from "@/lib/validation/shops";

const tooLarge = () => new AppError("payload_too_large", `The file is larger than ${LIMITS.importBytes / 1024 / 1024} MB; split it and import the parts one after the other.`);

/**
 * The raw CSV body, refused past 5 MB before a byte is parsed: first by Content-Length,
 * then while streaming (a client may lie or send chunked).
 */
export async function readCsvUpload(request: Request, maxBytes: number = LIMITS.importBytes): Promise<string> {
  if (Number(request.headers.get("content-length") ?? 0) > maxBytes) throw tooLarge();
  if (!request.body) throw new AppError("bad_request:csv", "Send the CSV file as the request body.");
  const bytes = await readBodyBytes(request, maxBytes, tooLarge);
  if (bytes.byteLength === 0) throw new AppError("bad_request:csv", "The file is empty.");
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new AppError("bad_request:csv", "The file is not UTF-8 text; save it as CSV (UTF-8) and try again.");
  }
}
