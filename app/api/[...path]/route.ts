// Any /api path no route handles: a JSON 404 with the API's headers, not the HTML not-found page.
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";

const unknown = route<{ path: string[] }>(async () => {
  throw notFound("There is no such API route.");
});

export const GET = unknown;
export const POST = unknown;
export const PUT = unknown;
export const PATCH = unknown;
export const DELETE = unknown;
