import { route } from "@/lib/http/route";
import { createProject, listMyProjects } from "@/lib/services/projects";

export const GET = route(({ actor }) => ({ projects: listMyProjects(actor) }));
export const POST = route(async ({ json, actor }) => Response.json(createProject(actor, await json()), { status: 201 }));
