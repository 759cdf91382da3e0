import type { Metadata } from "next";
import { InvitationPanel } from "@/components/invitations/invitation-panel";
import { Notice } from "@/components/ui/notice";
import { currentActor } from "@/app/_lib/current-actor";
import { AppError } from "@/lib/errors";
import { describeInvitation, type InvitationView } from "@/lib/services/invitations";

export const metadata: Metadata = { title: "Invitation" };
export const dynamic = "force-dynamic";

const STATE_WORDS = {
  expired: { title: "This invitation has expired", body: "Invitations are valid for seven days. Ask whoever invited you to send a new one." },
  used: { title: "This invitation has already been used", body: "Sign in with the invited address to reach the project." },
  withdrawn: { title: "This invitation was withdrawn", body: "Ask whoever invited you to send a new one if you still need access." },
} as const;

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  let view: InvitationView;
  try {
    view = describeInvitation(token);
  } catch (e) {
    if (e instanceof AppError && e.code === "not_found") {
      return (
        <Notice tone="fault" title="This invitation link is not valid">
          Check that the whole link from the e-mail was opened, or ask for a new invitation.
        </Notice>
      );
    }
    throw e;
  }
  const actor = await currentActor();
  if (view.state !== "open") {
    const words = STATE_WORDS[view.state];
    return (
      <Notice tone="caution" title={words.title}>
        {words.body} <a className="underline" href="/sign-in">Sign in</a>
      </Notice>
    );
  }
  return <InvitationPanel token={token} view={view} signedInAs={actor?.email ?? null} />;
}
