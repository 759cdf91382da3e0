import { readJson, route } from "@/lib/http/route";
import { changePassword } from "@/lib/services/password";

export const POST = route(async ({ req, actor }) => changePassword(actor, await readJson(req)));
