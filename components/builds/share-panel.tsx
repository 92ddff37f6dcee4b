"use client";
import { CopyButton } from "./copy-button";

/** The link and ready-made snippets (link + preview image) for forums and pages. */
export function SharePanel({ url, markdown, html, previewable, noPreviewReason = "private" }: {
  url: string; markdown: string; html: string; previewable: boolean; noPreviewReason?: "private" | "hidden";
}) {
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-2">
        <input readOnly value={url} aria-label="Link to this build" onFocus={(e) => e.currentTarget.select()}
          className="code min-w-0 flex-1 rounded-md border border-line bg-sunken px-3 py-1.5 text-sm text-text" />
        <CopyButton text={url} label="Copy link" />
      </div>
      {previewable ? (
        <div className="flex flex-wrap gap-2">
          <CopyButton text={markdown} label="Copy Markdown" />
          <CopyButton text={html} label="Copy HTML" />
        </div>
      ) : (
        <p className="text-xs text-muted">{noPreviewReason === "hidden"
          ? "A moderator hid this build, so it has no preview image and only you and moderators can open the link. It gets its picture back if a moderator shows it again."
          : "Private builds have no preview image: make the build unlisted or public to paste it with a picture."}</p>
      )}
    </div>
  );
}
