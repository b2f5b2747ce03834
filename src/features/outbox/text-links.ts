export type TextPart = { kind: 'text'; text: string } | { kind: 'link'; href: string; text: string };

const URL_PATTERN = /\bhttps?:\/\/[^\s<>"'`]+/gi;
const TRAILING = /[.,;:!?'"»”’]+$/;

/** A link ends before sentence punctuation and before a ')' it did not open. */
function trimLink(candidate: string): string {
  let url = candidate.replace(TRAILING, '');
  while (url.endsWith(')') && (url.match(/\(/g)?.length ?? 0) < (url.match(/\)/g)?.length ?? 0)) {
    url = url.slice(0, -1).replace(TRAILING, '');
  }
  return url;
}

/**
 * Splits mail text into plain runs and http(s) links, so links can be made clickable without
 * ever putting the mail's own markup on the page. Joined back, the parts are the text unchanged.
 */
export function splitLinks(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const start = match.index ?? 0;
    const url = trimLink(match[0]);
    if (!url || !/^https?:\/\/[^/]/i.test(url)) continue;
    if (start > last) parts.push({ kind: 'text', text: text.slice(last, start) });
    parts.push({ kind: 'link', href: url, text: url });
    last = start + url.length;
  }
  if (last < text.length) parts.push({ kind: 'text', text: text.slice(last) });
  return parts;
}
