// The preview image's font (Public Sans, latin subset) covers ASCII, Latin-1 and general
// punctuation. Anything else would make next/og fetch a fallback font from the network, so
// map the common trade symbols and drop the rest.
const MAP: Record<string, string> = { "″": "\"", "′": "'", "→": "->", "←": "<-", "×": "x", "≈": "~", "≤": "<=", "≥": ">=", "♂": "m", "♀": "f", "ø": "o", "Ø": "O" };

export function ogSafe(text: string): string {
  let out = "";
  for (const ch of text) {
    const c = ch.codePointAt(0)!;
    if (MAP[ch] !== undefined) out += MAP[ch];
    else if ((c >= 0x20 && c <= 0x7e) || (c >= 0xa0 && c <= 0xff) || (c >= 0x2000 && c <= 0x206f) || c === 0x2212) out += ch;
    else if (/\s/.test(ch)) out += " ";
  }
  return out.replace(/\s+/g, " ").trim();
}
