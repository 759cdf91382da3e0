// Stable query keys, so a mutation can invalidate exactly what it changed.
export const keys = {
  me: ["me"] as const,
  sessions: ["me", "sessions"] as const,
  projects: ["projects"] as const,
  project: (id: string) => ["projects", id] as const,
  firm: ["firm"] as const,
  buildUps: (projectId: string) => ["projects", projectId, "build-ups"] as const,
  rooms: (projectId: string) => ["projects", projectId, "rooms"] as const,
  room: (projectId: string, roomId: string) => ["projects", projectId, "rooms", roomId] as const,
  submittals: (projectId: string) => ["projects", projectId, "submittals"] as const,
  submittal: (projectId: string, id: string) => ["projects", projectId, "submittals", id] as const,
};
