// The client's one way to call the JSON API; errors keep the status and field issues.
export type FieldIssue = { field: string; message: string };

export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly issues: FieldIssue[] = [],
  ) {
    super(message);
  }

  fieldMessage(field: string): string | undefined {
    return this.issues.find((i) => i.field === field)?.message;
  }
}

export async function api<T>(path: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  const res = await fetch(path, {
    method: init.method ?? "GET",
    headers: init.body === undefined ? undefined : { "content-type": "application/json" },
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
    credentials: "same-origin",
  });
  return answer<T>(res);
}

/** A multipart upload (files), answered like any other call. */
export async function postForm<T>(path: string, form: FormData): Promise<T> {
  return answer<T>(await fetch(path, { method: "POST", body: form, credentials: "same-origin" }));
}

async function answer<T>(res: Response): Promise<T> {
  const text = await res.text();
  const data = text ? safeJson(text) : null;
  if (!res.ok) {
    const err = (data as { error?: { message?: string; issues?: FieldIssue[] } } | null)?.error;
    throw new ApiError(res.status, err?.message ?? `The server answered ${res.status}.`, err?.issues ?? []);
  }
  return data as T;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}
