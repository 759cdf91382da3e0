import { route } from "@/lib/http/route";
import { completePasswordReset } from "@/lib/services/password";

// Set the new password with the e-mailed token (single use, one hour).
export const POST = route<{ token: string }>(async ({ json, actor, params }) => completePasswordReset(actor, params.token, await json()), { public: true });
