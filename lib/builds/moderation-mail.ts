import "server-only";
// Members hear from us when a moderator endorses or hides one of their builds.
import { getUserContact } from "@/db/queries/users";
import { linkMail, sendMail } from "@/lib/mail";

type Build = { slug: string; title: string; ownerId: string };
export type ModerationEvent = { kind: "endorsed" } | { kind: "hidden"; reason: string };

export function moderationMessage(build: Build, event: ModerationEvent, origin: string) {
  const url = `${origin}/b/${build.slug}`;
  if (event.kind === "endorsed") {
    return {
      subject: `Your build is now a reference build: ${build.title}`,
      ...linkMail(`A moderator checked “${build.title}” and endorsed it as a reference build. Its link and preview now say it was checked on Trainyard, and it is listed among the reference builds.`,
        url, "Open the build"),
    };
  }
  return {
    subject: `A moderator hid your build: ${build.title}`,
    ...linkMail(`A moderator hid “${build.title}”. Only you and moderators can open its link now, and it has no preview image.\n\nReason: ${event.reason}`,
      url, "Open the build", "You can edit the build and reply to the moderator through the forum thread where it was linked; a moderator can show it again."),
  };
}

/** Mail the owner; the moderation itself is done and stays done if the mail cannot go. */
export async function notifyBuildOwner({ build, actorId, event }: { build: Build; actorId: string; event: ModerationEvent }) {
  if (build.ownerId === actorId) return;
  const owner = await getUserContact({ id: build.ownerId });
  if (!owner) return;
  const origin = process.env.BETTER_AUTH_URL ?? "";
  try {
    await sendMail({ to: owner.email, ...moderationMessage(build, event, origin) });
  } catch (err) {
    console.error(`[mail] could not tell ${build.ownerId} about build ${build.slug}: ${(err as Error).message}`);
  }
}
