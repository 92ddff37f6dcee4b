// GET /api/v1/submissions/:id/spec-sheet — the uploaded spec sheet (moderators and the submitter)
import { getSubmissionOrThrow } from "@/db/queries/submissions";
import { allowed, withSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { getObjectBytes } from "@/lib/storage";

export const dynamic = "force-dynamic";

export const GET = withSession<{ id: string }>(async (_request, { user, params }) => {
  const { part } = await getSubmissionOrThrow({ id: params.id });
  if (!allowed(user, { part: "review" }) && part.submittedBy !== user.id) throw new AppError("not_found:submission", "No such submission.");
  if (!part.specSheetKey) throw new AppError("not_found:spec_sheet", "No spec sheet was uploaded.");
  const bytes = await getObjectBytes({ key: part.specSheetKey });
  return new Response(bytes as unknown as BodyInit, {
    headers: { "content-type": part.specSheetType ?? "application/octet-stream", "content-disposition": `inline; filename="${part.slug}-spec-sheet"`, "x-content-type-options": "nosniff" },
  });
});
