import { route } from "@/lib/http/route";
import { calculate } from "@/lib/services/calculations";

export const POST = route(({ json, actor }) => calculate(actor, "reverb", json));
