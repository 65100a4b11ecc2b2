/** Paths of this app that mail links lead to. */
const APP_PATHS = [/^\/invitations\/[^/]+$/, /^\/reset-password\/[^/]+$/, /^\/studies\/\d+$/];

/**
 * The in-app path of a link made by this server, or null for any other link. Mail links
 * carry the server's public address (APP_URL), which in development often names another
 * host or port than the one in the browser, so the path decides, not the origin.
 */
export function appPathOf(link: string): string | null {
  let url: URL;
  try {
    url = new URL(link);
  } catch {
    return null;
  }
  if (url.protocol !== 'http:' && url.protocol !== 'https:') return null;
  return APP_PATHS.some((pattern) => pattern.test(url.pathname)) ? url.pathname : null;
}

export type TextPart = { kind: 'text'; text: string } | { kind: 'link'; href: string; path: string | null };

const URL_PATTERN = /https?:\/\/[^\s<>"]+/g;

/** Splits a plain-text message into text runs and the links inside it. */
export function splitLinks(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const start = match.index ?? 0;
    if (start > last) parts.push({ kind: 'text', text: text.slice(last, start) });
    parts.push({ kind: 'link', href: match[0], path: appPathOf(match[0]) });
    last = start + match[0].length;
  }
  if (last < text.length) parts.push({ kind: 'text', text: text.slice(last) });
  return parts;
}
