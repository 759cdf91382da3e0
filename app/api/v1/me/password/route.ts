import { route } from "@/lib/http/route";
import { changePassword } from "@/lib/services/password";

export const POST = route(async ({ json, actor }) => changePassword(actor, await json()));
