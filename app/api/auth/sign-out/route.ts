import { endSession } from "@/lib/auth/session";
import { route } from "@/lib/http/handler";

export const POST = route(async () => {
  await endSession();
  return new Response(null, { status: 204 });
});
