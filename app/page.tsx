import { redirect } from "next/navigation";
import { currentUserOrNull } from "@/lib/auth/page-session";

/** The front door: your programs when signed in, else the sign-in page. */
export default async function Home() {
  const user = await currentUserOrNull();
  redirect(user ? "/programs" : "/sign-in");
}
