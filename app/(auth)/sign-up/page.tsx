import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthFrame } from "@/components/AuthFrame";
import { safeNextPath } from "@/components/next-path";
import { currentUserOrNull } from "@/lib/auth/page-session";
import { SignUpForm } from "./SignUpForm";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: PageProps<"/sign-up">) {
  const { next } = await searchParams;
  const target = safeNextPath(typeof next === "string" ? next : null);
  if (await currentUserOrNull()) redirect(target);
  const signInHref = target === "/programs" ? "/sign-in" : `/sign-in?next=${encodeURIComponent(target)}`;
  return (
    <AuthFrame
      title="Create an account"
      intro="You become the director of a new band program, with a workspace of its own."
      footer={
        <>
          Already have an account?{" "}
          <Link href={signInHref} className="inline-flex min-h-11 items-center font-semibold text-turf-dark underline underline-offset-4">
            Sign in
          </Link>
        </>
      }
    >
      <SignUpForm />
    </AuthFrame>
  );
}
