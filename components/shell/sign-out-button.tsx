"use client";

import { useRouter } from "next/navigation";
import { useQueryClient } from "@tanstack/react-query";
import { authClient } from "@/lib/auth/client";

export function SignOutButton() {
  const router = useRouter();
  const qc = useQueryClient();
  return (
    <button
      type="button"
      className="text-sm text-ink-soft underline-offset-4 hover:text-ink hover:underline"
      onClick={async () => {
        await authClient.signOut();
        qc.clear();
        router.replace("/sign-in");
        router.refresh();
      }}
    >
      Sign out
    </button>
  );
}
