import type { Metadata } from "next";
import Link from "next/link";
import { AuthFrame } from "@/components/AuthFrame";
import { NewPasswordForm } from "./NewPasswordForm";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function NewPasswordPage({ params }: PageProps<"/reset/[token]">) {
  const { token } = await params;
  return (
    <AuthFrame
      title="Choose a new password"
      intro="After this, every device signed in to your account is signed out."
      footer={<Link href="/reset" className="inline-flex min-h-11 items-center font-semibold text-turf-dark underline underline-offset-4">Ask for a new link</Link>}
    >
      <NewPasswordForm token={token} />
    </AuthFrame>
  );
}
