import { route } from "@/lib/http/route";
import { issueSubmittal, listSubmittals } from "@/lib/services/submittals";

type P = { projectId: string };
export const GET = route<P>(({ actor, params }) => listSubmittals(actor, params.projectId));
// Issue the next revision of a room: { roomId, confirm: [keys of the items confirmed] }.
export const POST = route<P>(async ({ json, actor, params }) => Response.json(await issueSubmittal(actor, params.projectId, await json()), { status: 201 }));
