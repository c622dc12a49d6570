// The SWR fetcher for our JSON route handlers: a non-OK answer becomes an ApiError with the API's message and status.

export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly issues: Record<string, string[]> = {},
  ) {
    super(message);
    this.name = "ApiError";
  }
}

type ErrorBody = { error?: unknown; issues?: unknown };

/** Reads an error answer of shared/API.md ({ error, issues? }); tolerates bodies that are not JSON. */
export async function apiErrorFrom(res: Response): Promise<ApiError> {
  let body: ErrorBody = {};
  try {
    body = (await res.json()) as ErrorBody;
  } catch {
    // A proxy or a crashed server may answer with HTML or nothing.
  }
  const message = typeof body.error === "string" ? body.error : `The server answered ${res.status}.`;
  const issues = body.issues && typeof body.issues === "object" ? (body.issues as Record<string, string[]>) : {};
  return new ApiError(res.status, message, issues);
}

export async function fetcher<T>(url: string): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, { headers: { accept: "application/json" }, credentials: "same-origin" });
  } catch {
    throw new ApiError(0, "The server cannot be reached. Check your connection and try again.");
  }
  if (!res.ok) throw await apiErrorFrom(res);
  return (await res.json()) as T;
}

/** Sends JSON with a write method; resolves to the parsed answer (or null for 204), throws ApiError otherwise. */
export async function sendJson<T>(url: string, method: "POST" | "PUT" | "PATCH" | "DELETE", body?: unknown): Promise<T | null> {
  let res: Response;
  try {
    res = await fetch(url, {
      method,
      headers: { "content-type": "application/json", accept: "application/json" },
      credentials: "same-origin",
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, "The server cannot be reached. Check your connection and try again.");
  }
  if (!res.ok) throw await apiErrorFrom(res);
  if (res.status === 204) return null;
  return (await res.json()) as T;
}
