// POST /api/v1/submissions/:id/review — a moderator approves or rejects a submitted part
import { getSubmissionOrThrow, reviewSubmission } from "@/db/queries/submissions";
import { withSession } from "@/lib/auth/session";
import { parseJsonBody } from "@/lib/http/body";
import { rowToApiPart } from "@/lib/catalog/part-json";
import { AppError } from "@/lib/errors";
import { sendMail } from "@/lib/mail";
import { reviewDecisionSchema } from "@/lib/validation/submissions";

export const dynamic = "force-dynamic";

export const POST = withSession<{ id: string }>(async (request, { user, params }) => {
  const { decision, reason } = await parseJsonBody(request, reviewDecisionSchema);
  // Four eyes: a moderator's own part is checked by someone else.
  if ((await getSubmissionOrThrow({ id: params.id })).part.submittedBy === user.id) {
    throw new AppError("forbidden:own_submission", "Another moderator must review a part you submitted yourself.");
  }
  const updated = await reviewSubmission({ id: params.id, reviewerId: user.id, decision, reason });
  const { submitterEmail } = await getSubmissionOrThrow({ id: params.id });
  if (submitterEmail) {
    const name = `${updated.maker} ${updated.model}`;
    const base = process.env.BETTER_AUTH_URL ?? "";
    await sendMail(decision === "approve"
      ? { to: submitterEmail, subject: `Your part is in the catalog: ${name}`,
          text: `Thank you. ${name} was checked by a moderator and is now in the Trainyard catalog, where the planner can use it.\n\n${base}/parts/${updated.slug}${reason ? `\n\nModerator's note: ${reason}` : ""}` }
      : { to: submitterEmail, subject: `Your part was not added: ${name}`,
          text: `A moderator looked at ${name} and did not add it to the catalog.\n\nReason: ${reason}\n\nYou can submit it again with corrected numbers or a clearer spec sheet.` });
  }
  return Response.json(rowToApiPart(updated));
}, { permission: { part: "review" } });
