// A signed-in client of a running server, over real HTTP: for the crash, race and load runs,
// which drive the API as a second browser tab or a script would.
export const DEMO_PASSWORD = "cavity-demo-2026";

export type Answer = { status: number; json: any };

export class ApiClient {
  private constructor(
    readonly baseUrl: string,
    readonly cookie: string,
  ) {}

  static async signIn(baseUrl: string, email: string, password = DEMO_PASSWORD): Promise<ApiClient> {
    const res = await fetch(`${baseUrl}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: baseUrl },
      body: JSON.stringify({ email, password }),
    });
    if (res.status !== 200) throw new Error(`sign-in failed for ${email}: ${res.status} ${await res.text()}`);
    return new ApiClient(baseUrl, res.headers.getSetCookie().map((c) => c.split(";")[0]).join("; "));
  }

  /** The headers a page of the app would send with a JSON request. */
  headers(): Record<string, string> {
    return { cookie: this.cookie, origin: this.baseUrl, "content-type": "application/json" };
  }

  async call(method: string, path: string, body?: unknown): Promise<Answer> {
    const res = await fetch(`${this.baseUrl}${path}`, { method, headers: this.headers(), body: body === undefined ? undefined : JSON.stringify(body) });
    const text = await res.text();
    return { status: res.status, json: text ? JSON.parse(text) : null };
  }

  async ok(method: string, path: string, body?: unknown): Promise<any> {
    const answer = await this.call(method, path, body);
    if (answer.status >= 300) throw new Error(`${method} ${path}: ${answer.status} ${JSON.stringify(answer.json)}`);
    return answer.json;
  }
}

// A panel build-up and a room the runs can make in a project of their own.
export const RUN_SPEC = {
  facing: { kind: "round-holes", thickness: 0.016, holeDiameter: 0.008, pitch: 0.04, grid: "square" },
  cavity: { depth: 0.2, partitioned: true },
  infill: null,
  air: { temperature: 20, pressure: 101325 },
};
export const runBuildUp = (name: string) => ({ name, spec: RUN_SPEC, moduleWidth: 0.6, moduleHeight: 1.2, borderX: 0.03, borderY: 0.03 });
export const runRoom = (name: string) => ({ name, use: "speech", shape: "shoebox", length: 12, width: 8, height: 4 });

// n panels in a row on a 12 m wall, each coded and placed apart.
export const panels = (n: number, buildUpId: string, tag: string) =>
  Array.from({ length: n }, (_v, i) => ({ id: `${tag}-${i}`, buildUpId, code: `P-${String(i + 1).padStart(3, "0")}`, x: 0.1 + (i % 15) * 0.75, y: 0.1 + Math.floor(i / 15) * 1.3, width: 0.6, height: 1.2 }));

export async function newProject(client: ApiClient, name: string): Promise<{ projectId: string; buildUpId: string }> {
  const project = await client.ok("POST", "/api/v1/projects", { name });
  const buildUp = await client.ok("POST", `/api/v1/projects/${project.id}/build-ups`, runBuildUp("Run panel"));
  return { projectId: project.id, buildUpId: buildUp.id };
}
