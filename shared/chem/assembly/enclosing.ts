/**
 * Enclosing marks nest as ( ), [ ( ) ], { [ ( ) ] }, ( { [ ( ) ] } ) … (IUPAC 2013 P-16.5.4).
 */
export function enclose(text: string): string {
  let depth = 0;
  let max = 0;
  for (const ch of text) {
    if ('([{'.includes(ch)) max = Math.max(max, ++depth);
    else if (')]}'.includes(ch)) depth -= 1;
  }
  const [open, close] = [['(', ')'], ['[', ']'], ['{', '}']][max % 3];
  return open + text + close;
}
