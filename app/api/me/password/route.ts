import { getLucia } from "@/lib/auth/lucia";
import { handler } from "@/lib/server/handler";
import { changeOwnPassword } from "@/lib/server/passwords";
import { changePasswordSchema } from "@/lib/contracts/passwords";

/** Change one's own password; every role has cases:read, so this is every signed-in person. */
export const PUT = handler(
  { permission: "cases:read", body: changePasswordSchema },
  async ({ req, user, body, responseHeaders }) => {
    const sessionId = req.cookies.get(getLucia().sessionCookieName)?.value ?? "";
    responseHeaders.set("Cache-Control", "no-store");
    return changeOwnPassword({ user, sessionId, input: body });
  },
);
