// What a moderator pastes into a forum: the link with its preview image, as Markdown or HTML.

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
const escapeMarkdownText = (s: string) => s.replace(/[\\[\]()*_`<>!]/g, (c) => `\\${c}`).replace(/\s+/g, " ");

export function markdownSnippet({ title, url, imageUrl }: { title: string; url: string; imageUrl: string }): string {
  const t = escapeMarkdownText(title);
  return `[![${t}](${imageUrl})](${url})\n[${t}](${url}) — checked on Trainyard`;
}

export function htmlSnippet({ title, url, imageUrl }: { title: string; url: string; imageUrl: string }): string {
  const t = escapeHtml(title);
  return `<a href="${escapeHtml(url)}"><img src="${escapeHtml(imageUrl)}" alt="${t}" width="600" height="315"></a>\n<a href="${escapeHtml(url)}">${t}</a> — checked on Trainyard`;
}
