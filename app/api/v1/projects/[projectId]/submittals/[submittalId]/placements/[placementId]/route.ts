import { route } from "@/lib/http/route";
import { setInstalled } from "@/lib/services/submittals";

// Mark a panel of the approved revision installed or not: { installed: true | false }.
export const PUT = route<{ projectId: string; submittalId: string; placementId: string }>(async ({ json, actor, params }) =>
  setInstalled(actor, params.projectId, params.submittalId, params.placementId, await json()),
);
