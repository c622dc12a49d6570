import { NextResponse } from "next/server";
import { listMemberships } from "@/db/queries/memberships";
import { requireUser } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";

export const GET = route(async () => {
  const user = await requireUser();
  const memberships = await listMemberships(user.id);
  return NextResponse.json({ user: { id: user.id, email: user.email, name: user.name }, memberships });
});
