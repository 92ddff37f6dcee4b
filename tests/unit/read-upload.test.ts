// The CSV upload reader: the size limit holds while streaming, and empty or non-UTF-8 files get a clear message.
import { describe, expect, it } from "vitest";
import { readCsvUpload } from "@/lib/shops/read-upload";

/** A chunked body (no Content-Length), as a client that does not declare its size sends it. */
function streamed(chunks: Uint8Array[]): Request {
  const body = new ReadableStream<Uint8Array>({ start(c) { for (const x of chunks) c.enqueue(x); c.close(); } });
  return new Request("http://local/import", { method: "POST", body, duplex: "half" } as RequestInit);
}

const codeOf = (p: Promise<unknown>) => p.then(() => "ok", (e: { code: string }) => e.code);

describe("readCsvUpload", () => {
  it("returns the text of a UTF-8 file", async () => {
    expect(await readCsvUpload(streamed([new TextEncoder().encode("slug,qty\n"), new TextEncoder().encode("a,1\n")]))).toBe("slug,qty\na,1\n");
  });
  it("refuses a body past the limit while it streams", async () => {
    expect(await codeOf(readCsvUpload(streamed([new Uint8Array(60), new Uint8Array(60)]), 100))).toBe("payload_too_large");
  });
  it("refuses a declared size past the limit before reading", async () => {
    const r = new Request("http://local/import", { method: "POST", body: "x".repeat(10), headers: { "content-length": "500" } });
    expect(await codeOf(readCsvUpload(r, 100))).toBe("payload_too_large");
  });
  it("says when the file is empty or not UTF-8", async () => {
    expect(await codeOf(readCsvUpload(streamed([])))).toBe("bad_request:csv");
    expect(await codeOf(readCsvUpload(streamed([new Uint8Array([0xff, 0xfe, 0x41])])))).toBe("bad_request:csv");
  });
});
