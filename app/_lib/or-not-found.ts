import { notFound } from "next/navigation";
import { AppError } from "@/lib/errors";

// For server pages: run a service call and turn "not found" (or "not yours") into the 404
// page; a refusal for the role shows the forbidden page through the error boundary.
export function orNotFound<T>(fn: () => T): T {
  try {
    return fn();
  } catch (e) {
    if (e instanceof AppError && (e.code === "not_found" || e.code === "forbidden")) notFound();
    throw e;
  }
}
