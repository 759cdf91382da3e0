import { readJson, route } from "@/lib/http/route";
import { calculate } from "@/lib/services/calculations";

export const POST = route(({ req, actor }) => calculate(actor, "rate", () => readJson(req)));
