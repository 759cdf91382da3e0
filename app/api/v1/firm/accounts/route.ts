import { route } from "@/lib/http/route";
import { getFirmAccounts } from "@/lib/services/firm";

export const GET = route(({ actor }) => getFirmAccounts(actor));
