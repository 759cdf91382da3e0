"use client";

import { QueryClientProvider } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";
import { z } from "zod";
import { makeQueryClient } from "@/lib/queries/query-client";

// zod would otherwise probe for eval (new Function) to compile its parsers, which the pages'
// Content-Security-Policy refuses and reports; its interpreted mode is fast enough for forms.
z.config({ jitless: true });

export function Providers({ children }: { children: ReactNode }) {
  const [client] = useState(makeQueryClient);
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
