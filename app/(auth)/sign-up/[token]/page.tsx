import type { Metadata } from "next";
import Link from "next/link";
import { AuthFrame } from "@/components/AuthFrame";
import { ConfirmSignUp } from "./ConfirmSignUp";

export const metadata: Metadata = { title: "Create your account" };

/** The page behind the sign-up message's link: one button creates the account (a link alone never does, so mail scanners that open links create nothing). */
export default async function ConfirmSignUpPage({ params }: PageProps<"/sign-up/[token]">) {
  const { token } = await params;
  return (
    <AuthFrame
      title="Create your account"
      intro="You become the director of a new band program, with a workspace of its own."
      footer={<Link href="/sign-in" className="inline-flex min-h-11 items-center font-semibold text-turf-dark underline underline-offset-4">Sign in instead</Link>}
    >
      <ConfirmSignUp token={token} />
    </AuthFrame>
  );
}
