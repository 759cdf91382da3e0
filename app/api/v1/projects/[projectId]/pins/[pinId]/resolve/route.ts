import { route } from "@/lib/http/route";
import { resolvePin } from "@/lib/services/boards";

export const POST = route<{ projectId: string; pinId: string }>(async ({ json, actor, params }) => resolvePin(actor, params.projectId, params.pinId, await json()));
