import { notFound } from "next/navigation";
import { AppError } from "@/lib/errors";

// For server pages whose subject may be closed by its state (a draft, a superseded revision):
// the service's own refusal as the page's message; not found, or not yours, as the 404 page.
export function orRefusal<T>(fn: () => T): { ok: true; value: T } | { ok: false; message: string } {
  try {
    return { ok: true, value: fn() };
  } catch (e) {
    if (e instanceof AppError && (e.code === "not_found" || e.code === "forbidden")) notFound();
    if (e instanceof AppError && e.code === "conflict") return { ok: false, message: e.message };
    throw e;
  }
}
