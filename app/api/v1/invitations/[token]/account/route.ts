import { route } from "@/lib/http/route";
import { createAccountFromInvitation } from "@/lib/services/invitations";

// Create the account for the invited address and join; the client then signs in.
export const POST = route<{ token: string }>(async ({ json, params }) =>
  Response.json(await createAccountFromInvitation(params.token, await json()), { status: 201 }),
  { public: true },
);
