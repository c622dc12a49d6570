import type { Metadata } from "next";
import { ButtonLink } from "@/components/Button";
import { BrandMark } from "@/components/BrandMark";

export const metadata: Metadata = { title: "Page not found" };

export default function NotFound() {
  return (
    <main id="main" className="flex min-h-dvh items-center justify-center px-4">
      <div className="max-w-md text-center">
        <BrandMark className="mx-auto h-12 w-12" />
        <h1 className="mt-4 text-2xl font-bold text-ink">This page is not on the field</h1>
        <p className="mt-2 text-ink-soft">The address may be mistyped, or the page belongs to a program you are not a member of.</p>
        <ButtonLink variant="primary" href="/programs" className="mt-6">
          Go to your programs
        </ButtonLink>
      </div>
    </main>
  );
}
