import { route } from "@/lib/http/route";
import { getMe, updateSettings } from "@/lib/services/settings";

export const GET = route(({ actor }) => getMe(actor));
export const PATCH = route(async ({ json, actor }) => updateSettings(actor, await json()));
