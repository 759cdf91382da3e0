import Link from "next/link";
import { Notice } from "@/components/ui/notice";

// A reset link that has expired or been used: say so, and offer a new one.
export function SpentResetLink({ message }: { message: string }) {
  return (
    <Notice tone="caution" title="This link no longer works">
      {message}{" "}
      <Link className="underline underline-offset-2" href="/forgot-password">
        Ask for a new link
      </Link>
    </Notice>
  );
}
