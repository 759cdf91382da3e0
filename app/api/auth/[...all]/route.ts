import { auth } from "@/lib/auth/server";
import { authRoute } from "@/lib/http/route";

// better-auth's own endpoints: /api/auth/sign-in/email, /sign-up/email, /sign-out, /get-session ...
export const GET = authRoute((req) => auth().handler(req));
export const POST = authRoute((req) => auth().handler(req));
