import { getLucia } from "@/lib/auth/lucia";
import { forgetSession } from "@/lib/auth/session-cache";
import { env } from "@/lib/env";
import { handler } from "@/lib/server/handler";
import { signInWithPassword } from "@/lib/server/sign-in";
import { signInSchema } from "@/lib/contracts/session";
import { clientAddress } from "@/lib/security/client-address";

/** Sign in: creates a Lucia session and sets its cookie. */
export const POST = handler({ public: true, body: signInSchema }, async ({ req, body, responseHeaders }) => {
  // Without a trusted proxy the client address is unknown; the per-account limit still applies.
  const { userId } = await signInWithPassword({
    email: body.email,
    password: body.password,
    clientAddress: clientAddress(req.headers.get("x-forwarded-for"), env().TRUSTED_PROXY),
  });
  const lucia = getLucia();
  const session = await lucia.createSession(userId, {});
  responseHeaders.append("Set-Cookie", lucia.createSessionCookie(session.id).serialize());
  return { ok: true };
});

/** Sign out: ends the session and clears the cookie. */
export const DELETE = handler({ public: true }, async ({ req, responseHeaders }) => {
  const lucia = getLucia();
  const sessionId = req.cookies.get(lucia.sessionCookieName)?.value;
  if (sessionId) {
    forgetSession(sessionId);
    await lucia.invalidateSession(sessionId);
  }
  responseHeaders.append("Set-Cookie", lucia.createBlankSessionCookie().serialize());
  return { ok: true };
});
