// What a moderator pastes into a forum: the link with its preview image, as Markdown or HTML.
// "Checked on Trainyard" is a moderator's word: only an endorsed (reference) build says it.

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
const escapeMarkdownText = (s: string) => s.replace(/[\\[\]()*_`<>!]/g, (c) => `\\${c}`).replace(/\s+/g, " ");

export type SnippetInput = { title: string; url: string; imageUrl: string; endorsed: boolean };

const tail = (endorsed: boolean) => (endorsed ? " — checked on Trainyard" : " — planned on Trainyard");

export function markdownSnippet({ title, url, imageUrl, endorsed }: SnippetInput): string {
  const t = escapeMarkdownText(title);
  return `[![${t}](${imageUrl})](${url})\n[${t}](${url})${tail(endorsed)}`;
}

export function htmlSnippet({ title, url, imageUrl, endorsed }: SnippetInput): string {
  const t = escapeHtml(title);
  return `<a href="${escapeHtml(url)}"><img src="${escapeHtml(imageUrl)}" alt="${t}" width="600" height="315"></a>\n<a href="${escapeHtml(url)}">${t}</a>${tail(endorsed)}`;
}
