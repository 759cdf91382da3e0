"use client";

import { useRouter } from "next/navigation";
import type { FormEvent } from "react";
import { useCreateProject } from "@/lib/queries/projects";
import { ApiError } from "@/lib/queries/api";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { Sheet } from "@/components/ui/sheet";

export function CreateProjectForm({ onDone }: { onDone: () => void }) {
  const router = useRouter();
  const create = useCreateProject();
  const err = create.error instanceof ApiError ? create.error : null;

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = Object.fromEntries(new FormData(e.currentTarget)) as Record<string, string>;
    const created = await create.mutateAsync(form).catch(() => null);
    if (created) {
      onDone();
      router.push(`/projects/${created.id}`);
    }
  }

  return (
    <Sheet title="New project" className="mb-8">
      <form onSubmit={onSubmit} className="grid gap-4 sm:grid-cols-[2fr_1fr]" noValidate>
        {err && !err.issues.length && (
          <div className="sm:col-span-2">
            <Notice tone="fault">{err.message}</Notice>
          </div>
        )}
        <TextField label="Project name" name="name" error={err?.fieldMessage("name")} autoFocus />
        <TextField label="Reference" name="reference" error={err?.fieldMessage("reference")} hint="Your job number, if any." />
        <TextField label="Site" name="site" className="sm:col-span-2" error={err?.fieldMessage("site")} />
        <div className="flex gap-3 sm:col-span-2">
          <Button type="submit" disabled={create.isPending}>
            {create.isPending ? "Creating…" : "Create project"}
          </Button>
          <Button type="button" tone="quiet" onClick={onDone}>
            Cancel
          </Button>
        </div>
      </form>
    </Sheet>
  );
}
