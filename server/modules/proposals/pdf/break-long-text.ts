/**
 * Lines for an e-mail address (or any long token) in a narrow PDF column. The PDF layout breaks
 * lines only at spaces, or at syllables with a hyphen added, so a long address would run into
 * the next column, and a hyphen in an address would change it. This breaks before "@" and after
 * dots, and only where the token is longer than `maxChars`; a piece longer than that on its own
 * is cut at `maxChars`. Joined with "\n", which the PDF renders as a line break.
 *
 * @example
 * breakLongToken("rowan.tessaly@homeowner.example", 16) // "rowan.tessaly\n@homeowner.\nexample"
 */
export function breakLongToken(token: string, maxChars: number): string {
  if (token.length <= maxChars) return token;
  const pieces = token.split(/(?=@)|(?<=\.)/).flatMap((piece) => chunks(piece, maxChars));
  const lines: string[] = [];
  for (const piece of pieces) {
    const last = lines.length - 1;
    if (last >= 0 && lines[last]!.length + piece.length <= maxChars) lines[last] += piece;
    else lines.push(piece);
  }
  return lines.join("\n");
}

function chunks(piece: string, maxChars: number): string[] {
  const out: string[] = [];
  for (let i = 0; i < piece.length; i += maxChars) out.push(piece.slice(i, i + maxChars));
  return out;
}
