// The signed-in person as services see them; built from the session by lib/auth/session.ts.
export type Actor = {
  userId: string;
  email: string;
  name: string;
  firmId: string | null;
  isFirmAdmin: boolean;
  unitPreference: "metric" | "imperial";
  /** the session this request came with, so "this device" can be told from the others */
  sessionId?: string;
};
