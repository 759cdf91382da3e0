"use client";

import { createAuthClient } from "better-auth/react";

// Same-origin client for better-auth's endpoints under /api/auth.
export const authClient = createAuthClient();
