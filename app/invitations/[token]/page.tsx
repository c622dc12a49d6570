import type { Metadata } from "next";
import { AuthFrame } from "@/components/AuthFrame";
import { AcceptInvitation } from "./AcceptInvitation";

export const metadata: Metadata = { title: "Invitation" };

export default async function InvitationPage({ params }: PageProps<"/invitations/[token]">) {
  const { token } = await params;
  return (
    <AuthFrame title="Join a band program" intro="A director invited you to work on their show in Farfield." footer={<a className="font-semibold text-turf-dark underline underline-offset-4" href="/sign-in">Sign in instead</a>}>
      <AcceptInvitation token={token} />
    </AuthFrame>
  );
}
