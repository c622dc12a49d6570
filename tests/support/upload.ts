// Multipart uploads with a Client's session, and a private copy of the demo show to import into.
import { APP_URL, Client, demoIds, uniqueEmail, type ApiAnswer } from "./api";
import { signUp } from "./sign-up";

export async function uploadFile(
  client: Client,
  path: string,
  file: { name: string; content: string | Uint8Array; type?: string },
  fields: Record<string, string> = {},
): Promise<ApiAnswer> {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  form.append("file", new Blob([file.content as BlobPart], { type: file.type ?? "text/csv" }), file.name);
  const res = await fetch(APP_URL + path, { method: "POST", body: form, headers: client.cookie ? { cookie: client.cookie } : {} });
  const text = await res.text();
  let body: any = text;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {}
  return { status: res.status, body, headers: res.headers };
}

/** A new director with a program of their own holding an imported copy of the demo show. */
export async function privateShowCopy() {
  const ids = await demoIds();
  const exported = await ids.director.get(`/api/shows/${ids.showId}/export`);
  if (exported.status !== 200) throw new Error(`export answered ${exported.status}`);
  const director = new Client();
  const email = uniqueEmail("copy");
  const created = await signUp(director, { name: "Copy Director", email, password: "copy-director-pw", programName: "Copy Band" });
  const programId = created.body.programId as string;
  const imported = await uploadFile(director, `/api/programs/${programId}/shows/import`, { name: "show.json", content: JSON.stringify(exported.body), type: "application/json" });
  if (imported.status !== 201) throw new Error(`import answered ${imported.status}: ${JSON.stringify(imported.body)}`);
  return { director, email, password: "copy-director-pw", programId, showId: imported.body.show.id as string, original: exported.body, demo: ids };
}
