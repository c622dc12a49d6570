import type { Metadata } from "next";
import Link from "next/link";
import { AuthFrame } from "@/components/AuthFrame";
import { ResetRequestForm } from "./ResetRequestForm";

export const metadata: Metadata = { title: "Reset your password" };

export default function ResetPage() {
  return (
    <AuthFrame
      title="Reset your password"
      intro="We will e-mail you a link to choose a new one. It works once, for an hour."
      footer={<Link href="/sign-in" className="inline-flex min-h-11 items-center font-semibold text-turf-dark underline underline-offset-4">Back to sign-in</Link>}
    >
      <ResetRequestForm />
    </AuthFrame>
  );
}
