import { downloadResponse } from "@/lib/http/download";
import { route } from "@/lib/http/route";
import { readShopPack } from "@/lib/services/submittals";

// The shop pack zip of an approved revision, in the reader's units unless ?units= names the other.
export const GET = route<{ projectId: string; submittalId: string }>(({ req, actor, params }) => {
  const { doc, bytes } = readShopPack(actor, params.projectId, params.submittalId, new URL(req.url).searchParams.get("units"));
  return downloadResponse({ bytes, mime: doc.mime, name: doc.name, sha256: doc.sha256, attachment: true });
});
