import { route } from "@/lib/http/route";
import { setAccountDisabled } from "@/lib/services/firm";

// { "disabled": true | false }: a firm administrator disables or re-enables an account.
export const PATCH = route<{ userId: string }>(async ({ json, actor, params }) => setAccountDisabled(actor, params.userId, await json()));
