// The client's address, as far as it can be trusted. Next.js route handlers do not see the socket's
// peer address, so the only source is X-Forwarded-For, and that header is written by whoever sends
// the request: only the entries our own reverse proxies appended can be believed.

const ADDRESS = /^(?:[0-9]{1,3}(?:\.[0-9]{1,3}){3}|[0-9a-f:]*:[0-9a-f:.]*)$/i;

/**
 * With `trustedProxies` reverse proxies in front of the app, each appending the address it saw,
 * the client is the entry that many places from the right; entries further left were sent by the
 * client and prove nothing. Null when no proxy is trusted or the header is missing or malformed.
 */
export function clientAddress(
  forwardedFor: string | null | undefined,
  trustedProxies: number,
): string | null {
  if (trustedProxies <= 0 || !forwardedFor) return null;
  const entries = forwardedFor.split(",").map((entry) => entry.trim());
  const entry = entries[entries.length - trustedProxies];
  if (!entry) return null;
  // "[2001:db8::1]:443" and "203.0.113.7:51000" carry a port some proxies add.
  const address = entry
    .replace(/^\[([^\]]+)\](?::\d+)?$/, "$1")
    .replace(/^(\d{1,3}(?:\.\d{1,3}){3}):\d+$/, "$1");
  return ADDRESS.test(address) && address.length <= 45 ? address.toLowerCase() : null;
}
