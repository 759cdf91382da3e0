import { auth } from "@/lib/auth/server";

// better-auth's own endpoints: /api/auth/sign-in/email, /sign-up/email, /sign-out, /get-session ...
export const GET = (req: Request) => auth().handler(req);
export const POST = (req: Request) => auth().handler(req);
