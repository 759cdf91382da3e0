import { downloadResponse } from "@/lib/http/download";
import { route } from "@/lib/http/route";
import { readSubmittalPdf } from "@/lib/services/submittals";

// The issued PDF, byte for byte; ?download=1 saves it instead of showing it.
export const GET = route<{ projectId: string; submittalId: string }>(({ req, actor, params }) => {
  const { doc, bytes } = readSubmittalPdf(actor, params.projectId, params.submittalId);
  return downloadResponse({ bytes, mime: doc.mime, name: doc.name, sha256: doc.sha256, attachment: new URL(req.url).searchParams.has("download") });
});
