import type { TestProject } from "vitest/node";
import { startTestServer, type TestServer } from "./server";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    mailUrl: string;
    dataDir: string;
  }
}

let server: TestServer | null = null;

export async function setup(project: TestProject) {
  server = await startTestServer();
  project.provide("baseUrl", server.baseUrl);
  project.provide("mailUrl", server.mailUrl);
  project.provide("dataDir", server.dataDir);
}

export async function teardown() {
  await server?.stop();
}
