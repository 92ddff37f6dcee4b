import { describe, expect, it } from "vitest";
import { htmlSnippet, markdownSnippet } from "@/lib/builds/snippets";

const base = { title: "Refractor to cooled camera", url: "http://x.test/b/abc", imageUrl: "http://x.test/b/abc/opengraph-image" };

describe("forum snippets", () => {
  it("say “checked on Trainyard” only for an endorsed build", () => {
    expect(markdownSnippet({ ...base, endorsed: true })).toContain("checked on Trainyard");
    expect(htmlSnippet({ ...base, endorsed: true })).toContain("checked on Trainyard");
    expect(markdownSnippet({ ...base, endorsed: false })).not.toContain("checked");
    expect(htmlSnippet({ ...base, endorsed: false })).not.toContain("checked");
    expect(markdownSnippet({ ...base, endorsed: false })).toContain("planned on Trainyard");
  });
});
