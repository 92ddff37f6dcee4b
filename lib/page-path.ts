// The path of the page being rendered, as proxy.ts saw it, so a layout can send a visitor to
// sign in and back to the very page they asked for. Pure: the header comes from the request.

/** Request header proxy.ts sets on every page request (a client's own value is overwritten). */
export const PAGE_PATH_HEADER = "x-trainyard-page-path";

/**
 * Where to come back to after signing in: the page's own path when it lies inside `section`
 * (the section itself or below it), made only of letters, digits, `-`, `_` and single
 * slashes; anything else (absent, another section, a protocol-relative `//host`, a backslash,
 * a control character) falls back to the section.
 */
export function returnPath(section: string, pagePath: string | null | undefined): string {
  if (!pagePath || !/^(\/[\w-]+)+$/.test(pagePath)) return section;
  return pagePath === section || pagePath.startsWith(`${section}/`) ? pagePath : section;
}
