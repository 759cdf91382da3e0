import { route } from "@/lib/http/route";
import { decideSubmittal } from "@/lib/services/submittals";

// The client's decision: { outcome, signature (their full name), notes, pdfSha256 }.
export const POST = route<{ projectId: string; submittalId: string }>(async ({ json, actor, params }) => decideSubmittal(actor, params.projectId, params.submittalId, await json()));
