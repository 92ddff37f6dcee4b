// POST /api/v1/submissions — a member submits a missing part with its spec sheet (multipart)
// GET  /api/v1/submissions — moderators: the pending queue; members: their own submissions
import { countSubmissionsSince, createSubmission, listPendingSubmissions, listSubmissionsBy } from "@/db/queries/submissions";
import { allowed, withSession } from "@/lib/auth/session";
import { parseWith } from "@/lib/http/body";
import { rowToApiPart } from "@/lib/catalog/part-json";
import { AppError } from "@/lib/errors";
import { readBodyBytes } from "@/lib/http/body";
import { checkSpecSheet, SPEC_SHEET_MAX_BYTES } from "@/lib/spec-sheet";
import { deleteObject, putObject } from "@/lib/storage";
import { partInputSchema } from "@/lib/validation/parts";
import { listSubmissionsQuerySchema } from "@/lib/validation/submissions";

export const dynamic = "force-dynamic";

/** Spec sheets one member may upload in a day: plenty for honest work, not a free file store. */
const UPLOADS_PER_DAY = Number(process.env.TRAINYARD_UPLOADS_PER_DAY ?? 20);

const tooLarge = () => new AppError("payload_too_large", "The spec sheet is larger than 10 MB.", { specSheet: ["At most 10 MB"] });

export const POST = withSession(async (request, { user }) => {
  const since = new Date(Date.now() - 24 * 3600_000);
  if (await countSubmissionsSince({ userId: user.id, since }) >= UPLOADS_PER_DAY) {
    const e = new AppError("too_many_requests:uploads", `You can submit ${UPLOADS_PER_DAY} parts a day; try again tomorrow.`);
    e.headers = { "retry-after": "3600" };
    throw e;
  }
  // Read at most the limit (plus room for the form fields), then stop, Content-Length or not.
  const bytesIn = await readBodyBytes(request, SPEC_SHEET_MAX_BYTES + 64_000, tooLarge);
  let form: FormData;
  try {
    form = await new Response(bytesIn as unknown as BodyInit, { headers: { "content-type": request.headers.get("content-type") ?? "" } }).formData();
  } catch { throw new AppError("bad_request", "Send the part as multipart form data with a `part` field and a `specSheet` file."); }
  let raw: unknown;
  try { raw = JSON.parse(String(form.get("part") ?? "")); } catch { throw new AppError("bad_request:validation", "The part's details are missing.", { part: ["Missing or not JSON"] }); }
  const input = parseWith(partInputSchema, raw);
  const file = form.get("specSheet");
  if (!(file instanceof File)) throw new AppError("bad_request:validation", "Attach the maker's spec sheet.", { specSheet: ["Attach a PDF, PNG or JPEG"] });
  const bytes = new Uint8Array(await file.arrayBuffer());
  if (bytes.length > SPEC_SHEET_MAX_BYTES) throw tooLarge();
  const checked = await checkSpecSheet(bytes);
  if (!checked.ok) throw new AppError("bad_request:validation", checked.message, { specSheet: [checked.message] });
  const key = `spec-sheets/${crypto.randomUUID()}.${checked.ext}`;
  await putObject({ key, body: bytes, contentType: checked.type });
  let row: Awaited<ReturnType<typeof createSubmission>>;
  try {
    row = await createSubmission({ input, userId: user.id, specSheet: { key, type: checked.type } });
  } catch (err) {
    // No orphan uploads: a submission that was not stored keeps no spec sheet either.
    await deleteObject({ key }).catch((e) => console.error(`could not delete ${key}`, e));
    throw err;
  }
  return Response.json({ ...rowToApiPart(row), probableDuplicateOf: row.probableDuplicateOf }, { status: 201 });
}, { limit: "upload" });

export const GET = withSession(async (request, { user }) => {
  const query = parseWith(listSubmissionsQuerySchema, Object.fromEntries(new URL(request.url).searchParams));
  if (allowed(user, { part: "review" })) {
    const { items, nextCursor } = await listPendingSubmissions(query);
    return Response.json({ items: items.map((r) => ({ ...rowToApiPart(r.part), submitter: r.submitter, probableDuplicateOf: r.part.probableDuplicateOf, createdAt: r.part.createdAt })), nextCursor });
  }
  const { items, nextCursor } = await listSubmissionsBy({ userId: user.id, ...query });
  return Response.json({ items: items.map((r) => ({ ...rowToApiPart(r), reviewReason: r.reviewReason, createdAt: r.createdAt })), nextCursor });
});
