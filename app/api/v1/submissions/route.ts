// POST /api/v1/submissions — a member submits a missing part with its spec sheet (multipart)
// GET  /api/v1/submissions — moderators: the pending queue; members: their own submissions
import { createSubmission, listPendingSubmissions, listSubmissionsBy } from "@/db/queries/submissions";
import { allowed, parseWith, withSession } from "@/lib/auth/session";
import { rowToApiPart } from "@/lib/catalog/rows";
import { AppError } from "@/lib/errors";
import { checkSpecSheet, SPEC_SHEET_MAX_BYTES } from "@/lib/spec-sheet";
import { deleteObject, putObject } from "@/lib/storage";
import { partInputSchema } from "@/lib/validation/parts";

export const dynamic = "force-dynamic";

export const POST = withSession(async (request, { user }) => {
  if (Number(request.headers.get("content-length") ?? 0) > SPEC_SHEET_MAX_BYTES + 200_000) {
    throw new AppError("payload_too_large", "The spec sheet is larger than 10 MB.", { specSheet: ["At most 10 MB"] });
  }
  let form: FormData;
  try { form = await request.formData(); } catch { throw new AppError("bad_request", "Send the part as multipart form data with a `part` field and a `specSheet` file."); }
  let raw: unknown;
  try { raw = JSON.parse(String(form.get("part") ?? "")); } catch { throw new AppError("bad_request:validation", "The part's details are missing.", { part: ["Missing or not JSON"] }); }
  const input = parseWith(partInputSchema, raw);
  const file = form.get("specSheet");
  if (!(file instanceof File)) throw new AppError("bad_request:validation", "Attach the maker's spec sheet.", { specSheet: ["Attach a PDF, PNG or JPEG"] });
  const bytes = new Uint8Array(await file.arrayBuffer());
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
});

export const GET = withSession(async (_request, { user }) => {
  if (allowed(user, { part: "review" })) {
    const rows = await listPendingSubmissions();
    return Response.json({ items: rows.map((r) => ({ ...rowToApiPart(r.part), submitter: r.submitter, probableDuplicateOf: r.part.probableDuplicateOf, createdAt: r.part.createdAt })) });
  }
  const rows = await listSubmissionsBy({ userId: user.id });
  return Response.json({ items: rows.map((r) => ({ ...rowToApiPart(r), reviewReason: r.reviewReason, createdAt: r.createdAt })) });
});
