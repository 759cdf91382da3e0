import { downloadResponse } from "@/lib/http/download";
import { route } from "@/lib/http/route";
import { readDecisionRecord } from "@/lib/services/submittals";

export const GET = route<{ projectId: string; submittalId: string }>(({ req, actor, params }) => {
  const { doc, bytes } = readDecisionRecord(actor, params.projectId, params.submittalId);
  return downloadResponse({ bytes, mime: doc.mime, name: doc.name, sha256: doc.sha256, attachment: new URL(req.url).searchParams.has("download") });
});
