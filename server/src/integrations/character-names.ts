/**
 * Characters named for people, from the Unicode character database (through the unicode-name package), so a
 * message can say which letter a font lacks even when the reader's screen cannot show it.
 */
import { unicodeName } from 'unicode-name';

/** Listed one by one up to this many; the rest are counted. */
const MAX_NAMED = 6;

/** “ễ” (Latin small letter e with circumflex and tilde), and the others joined with commas and “and”. */
export function describeCharacters(characters: readonly string[]): string {
  const named = characters.slice(0, MAX_NAMED).map((character) => {
    const name = unicodeName(character)?.toLowerCase() ?? `U+${character.codePointAt(0)!.toString(16).toUpperCase()}`;
    return `“${character}” (${name.charAt(0).toUpperCase()}${name.slice(1)})`;
  });
  const rest = characters.length - named.length;
  if (rest > 0) named.push(`${rest} more`);
  return named.length === 1 ? named[0] : `${named.slice(0, -1).join(', ')} and ${named.at(-1)}`;
}
