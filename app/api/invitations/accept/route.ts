import { getLucia } from "@/lib/auth/lucia";
import { acceptInvitationSchema } from "@/lib/contracts/invitations";
import { handler } from "@/lib/server/handler";
import { acceptInvitation } from "@/lib/server/invitations";

/** The invited person sets a password; the account is made and signed in. */
export const POST = handler(
  { public: true, body: acceptInvitationSchema },
  async ({ body, responseHeaders }) => {
    const { userId } = await acceptInvitation(body);
    const lucia = getLucia();
    const session = await lucia.createSession(userId, {});
    responseHeaders.append("Set-Cookie", lucia.createSessionCookie(session.id).serialize());
    return Response.json({ ok: true }, { status: 201 });
  },
);
