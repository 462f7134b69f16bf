import { handler } from "@/lib/server/handler";
import { getProfile, updateProfile } from "@/lib/server/profile";
import { profileInputSchema } from "@/lib/contracts/profile";

// Everyone signed in reads and sets their own units; nobody else's.
export const GET = handler({ permission: "cases:read" }, async ({ user }) => getProfile({ user }));

export const PUT = handler({ permission: "cases:read", body: profileInputSchema }, async ({ user, body }) =>
  updateProfile({ user, input: body }),
);
