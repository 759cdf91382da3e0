import { route } from "@/lib/http/route";
import { deleteBuildUp, getBuildUp, updateBuildUp } from "@/lib/services/build-ups";

type P = { projectId: string; buildUpId: string };
export const GET = route<P>(({ actor, params }) => getBuildUp(actor, params.projectId, params.buildUpId));
export const PUT = route<P>(async ({ json, actor, params }) => updateBuildUp(actor, params.projectId, params.buildUpId, await json()));
export const DELETE = route<P>(({ actor, params }) => deleteBuildUp(actor, params.projectId, params.buildUpId));
