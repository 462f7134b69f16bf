// Where to go after signing in. A `next` value comes from the address bar, so anyone can write it;
// only a path on our own origin is followed, anything else goes home.

export const HOME_PATH = "/cases";
const MAX_NEXT_LENGTH = 2000;
// C0 controls, DEL and C1 controls: browsers strip some of them (tab, CR, LF) while parsing a URL,
// which is how `/\t/evil.example` becomes `//evil.example`.
const CONTROL_CHARACTERS = /[\u0000-\u001f\u007f-\u009f]/;

function decodedOrNull(text: string): string | null {
  try {
    return decodeURIComponent(text);
  } catch {
    return null;
  }
}

/** True when the text, as written or once decoded, could make a browser leave our origin. */
function looksLikeEscape(text: string): boolean {
  return (
    !text.startsWith("/") || text.startsWith("//") || text.includes("\\") || CONTROL_CHARACTERS.test(text)
  );
}

/**
 * The path (with query and fragment) to send a signed-in person to, or HOME_PATH.
 * Accepted only when it starts with a single `/`, holds no backslash or control character (as
 * written and after percent-decoding), and `new URL(next, appOrigin)` keeps our origin and does
 * not normalise into a scheme-relative `//host` path (`/..//evil`, `/.%2e//evil`).
 */
export function safeNextPath(next: unknown, appOrigin: string): string {
  if (typeof next !== "string" || next.length === 0 || next.length > MAX_NEXT_LENGTH) return HOME_PATH;
  const decoded = decodedOrNull(next);
  if (decoded === null || looksLikeEscape(next) || looksLikeEscape(decoded)) return HOME_PATH;

  let url: URL;
  let origin: string;
  try {
    origin = new URL(appOrigin).origin;
    url = new URL(next, origin);
  } catch {
    return HOME_PATH;
  }
  if (url.origin !== origin || url.username || url.password) return HOME_PATH;
  if (url.pathname.startsWith("//") || url.pathname.includes("\\")) return HOME_PATH;
  // Back to the sign-in page would only loop.
  if (url.pathname === "/sign-in" || url.pathname.startsWith("/sign-in/")) return HOME_PATH;
  return `${url.pathname}${url.search}${url.hash}`;
}
