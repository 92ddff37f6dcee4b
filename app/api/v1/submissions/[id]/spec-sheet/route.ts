// GET /api/v1/submissions/:id/spec-sheet — the uploaded spec sheet (moderators and the submitter)
import { getSubmissionOrThrow } from "@/db/queries/submissions";
import { allowed, withSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { checkSpecSheet } from "@/lib/spec-sheet";
import { getObjectBytes } from "@/lib/storage";

export const dynamic = "force-dynamic";

export const GET = withSession<{ id: string }>(async (_request, { user, params }) => {
  const { part } = await getSubmissionOrThrow({ id: params.id });
  if (!allowed(user, { part: "review" }) && part.submittedBy !== user.id) throw new AppError("not_found:submission", "No such submission.");
  if (!part.specSheetKey) throw new AppError("not_found:spec_sheet", "No spec sheet was uploaded.");
  const bytes = await getObjectBytes({ key: part.specSheetKey });
  // The type comes from the bytes themselves (sniffed again, never the stored claim); anything
  // that is no longer a PDF/PNG/JPEG is offered as a download only.
  const sniffed = await checkSpecSheet(bytes);
  const filename = `${part.slug.replace(/[^A-Za-z0-9._-]/g, "-")}-spec-sheet${sniffed.ok ? `.${sniffed.ext}` : ""}`;
  return new Response(bytes as unknown as BodyInit, {
    headers: {
      "content-type": sniffed.ok ? sniffed.type : "application/octet-stream",
      "content-disposition": `${sniffed.ok ? "inline" : "attachment"}; filename="${filename}"`,
      "x-content-type-options": "nosniff",
      "cache-control": "private, no-store",
    },
  });
});
