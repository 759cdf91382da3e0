import { route } from "@/lib/http/route";
import { clientAddress } from "@/lib/auth/client-address";
import { requestPasswordReset } from "@/lib/services/password";

// Ask for a link to set a new password. The answer is the same whether or not the address
// has an account.
export const POST = route(async ({ req, json, actor }) => requestPasswordReset(actor, await json(), clientAddress(req.headers)), { public: true });
