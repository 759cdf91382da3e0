import { env } from "@/lib/env";

// Absolute links for e-mails, built on the configured app URL.
export const appLink = (path: string) => `${env().appUrl}${path}`;

export const LINKS = {
  signIn: () => appLink("/sign-in"),
  forgotPassword: () => appLink("/forgot-password"),
  resetPassword: (token: string) => appLink(`/reset-password/${encodeURIComponent(token)}`),
  projects: () => appLink("/projects"),
  invitation: (token: string) => appLink(`/invite/${token}`),
  submittal: (projectId: string, submittalId: string) => appLink(`/projects/${projectId}/submittals/${submittalId}`),
  shopPack: (projectId: string, submittalId: string) => appLink(`/projects/${projectId}/shop-pack/${submittalId}`),
};
