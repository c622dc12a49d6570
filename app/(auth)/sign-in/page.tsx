import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthFrame } from "@/components/AuthFrame";
import { safeNextPath } from "@/components/next-path";
import { currentUserOrNull } from "@/lib/auth/page-session";
import { SignInForm } from "./SignInForm";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: PageProps<"/sign-in">) {
  const { next } = await searchParams;
  const target = safeNextPath(typeof next === "string" ? next : null);
  if (await currentUserOrNull()) redirect(target);
  const signUpHref = target === "/programs" ? "/sign-up" : `/sign-up?next=${encodeURIComponent(target)}`;
  return (
    <AuthFrame
      title="Sign in"
      intro="Place your drill set by set, import your arrangement's MusicXML, then see and listen to what the press box is predicted to hear, before you get stadium time."
      footer={
        <>
          <Link href="/reset" className="inline-flex min-h-11 items-center font-semibold text-turf-dark underline underline-offset-4">
            Forgot your password?
          </Link>
          <br />
          New to Farfield?{" "}
          <Link href={signUpHref} className="inline-flex min-h-11 items-center font-semibold text-turf-dark underline underline-offset-4">
            Create an account
          </Link>
        </>
      }
    >
      <SignInForm next={target} />
    </AuthFrame>
  );
}
