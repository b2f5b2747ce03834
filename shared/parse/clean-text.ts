/**
 * Clean one pasted ingredient line before it is parsed: control and format characters go,
 * look-alike slashes and dashes become ASCII, whitespace collapses.
 */

/**
 * The parser's cost grows quickly with line length (a line of 800 repeated fractions takes
 * a tenth of a second), and real ingredient lines stay well under 250 characters.
 */
export const MAX_PARSED_CHARS = 400;
const MAX_SCANNED_CHARS = 4 * MAX_PARSED_CHARS;

export interface CleanedText {
  text: string;
  truncated: boolean;
}

export function cleanLine(raw: string): CleanedText {
  let text = raw.length > MAX_SCANNED_CHARS ? raw.slice(0, MAX_SCANNED_CHARS) : raw;
  text = text
    .normalize('NFC')
    .replace(/[\t\n\v\f\r\u0085\u2028\u2029]/g, ' ')
    .replace(/[\p{Cc}\p{Cf}\p{Co}\p{Cs}]/gu, '')
    .replace(/[\u2044\u2215]/g, '/')
    .replace(/[\u2010\u2011\u2012\u2212\uFE63\uFF0D]/g, '-')
    .replace(/\p{Zs}/gu, ' ')
    .replace(/\s+/g, ' ')
    .trim();
  // List bullets and leading numbering ("1." before a quantity is rare; bullets are common).
  text = text.replace(/^(?:[-*+•·▪◦‣⁃●○■□✓✔]\s*)+(?=\S)/u, '');
  let truncated = raw.length > MAX_SCANNED_CHARS;
  if (text.length > MAX_PARSED_CHARS) {
    const cut = text.lastIndexOf(' ', MAX_PARSED_CHARS);
    text = text.slice(0, cut > MAX_PARSED_CHARS / 2 ? cut : MAX_PARSED_CHARS).trim();
    truncated = true;
  }
  return { text, truncated };
}
