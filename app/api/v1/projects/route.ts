import { readJson, route } from "@/lib/http/route";
import { createProject, listMyProjects } from "@/lib/services/projects";

export const GET = route(({ actor }) => ({ projects: listMyProjects(actor) }));
export const POST = route(async ({ req, actor }) => Response.json(createProject(actor, await readJson(req)), { status: 201 }));
