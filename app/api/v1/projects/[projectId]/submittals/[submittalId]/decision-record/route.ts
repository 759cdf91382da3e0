import { fileResponse } from "@/lib/http/file-response";
import { route } from "@/lib/http/route";
import { readDecisionRecord } from "@/lib/services/submittals";

export const GET = route<{ projectId: string; submittalId: string }>(({ req, actor, params }) => {
  const { doc, bytes } = readDecisionRecord(actor, params.projectId, params.submittalId);
  return fileResponse({ bytes, mime: doc.mime, name: doc.name, sha256: doc.sha256, download: new URL(req.url).searchParams.has("download") });
});
