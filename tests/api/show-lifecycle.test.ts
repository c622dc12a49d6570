// A show's life: duplicate, archive, delete (the name typed; undone within SHOW_UNDO_DAYS), and a backup
// restored as a new show after a preview that writes nothing.
import { describe, expect, it } from "vitest";
import { APP_URL, Client, DEMO, demoIds, signedIn, uniqueEmail } from "../support/api";
import { copyDemoShow } from "../support/show-copy";
import { signUp } from "../support/sign-up";

async function upload(c: Client, path: string, text: string, fields: Record<string, string> = {}) {
  const form = new FormData();
  form.set("file", new Blob([text], { type: "application/json" }), "backup.farfield.json");
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  const res = await fetch(APP_URL + path, { method: "POST", body: form, headers: { cookie: c.cookie! } });
  return { status: res.status, body: await res.json() };
}

const showNames = async (c: Client, programId: string) => (await c.get(`/api/programs/${programId}/shows`)).body;

describe("duplicating a show", () => {
  it("copies roster, sets, music and settings as a new show named 'Copy of …'", async () => {
    const { client: c, programId, showId } = await copyDemoShow("dup");
    await c.call("PATCH", `/api/shows/${showId}`, { conditions: { betweenGroundFactor: 0.3 } });
    const res = await c.post(`/api/shows/${showId}/duplicate`, {});
    expect(res.status).toBe(201);
    const original = (await c.get(`/api/shows/${showId}`)).body;
    expect(res.body.show.name).toBe(`Copy of ${original.show.name}`);
    const copy = (await c.get(`/api/shows/${res.body.show.id}`)).body;
    expect(copy.show.conditions).toEqual(original.show.conditions);
    expect(copy.performers.map((p: any) => p.label)).toEqual(original.performers.map((p: any) => p.label));
    expect(copy.sets.map((s: any) => [s.number, s.counts])).toEqual(original.sets.map((s: any) => [s.number, s.counts]));
    const strip = (file: any) => ({ ...file, show: { ...file.show, name: "" } });
    expect(strip((await c.get(`/api/shows/${res.body.show.id}/export`)).body)).toEqual(strip((await c.get(`/api/shows/${showId}/export`)).body));
    const named = await c.post(`/api/shows/${showId}/duplicate`, { name: "Finals version" });
    expect(named.body.show.name).toBe("Finals version");
    expect((await showNames(c, programId)).shows.map((s: any) => s.name)).toContain("Finals version");
  });

  it("is for directors: designers and staff get 403, outsiders 404", async () => {
    const ids = await demoIds();
    const designer = await signedIn(DEMO.designer);
    const res = await designer.post(`/api/shows/${ids.showId}/duplicate`, {});
    expect(res.status).toBe(403);
    expect((await ids.other.post(`/api/shows/${ids.showId}/duplicate`, {})).status).toBe(404);
    expect((await ids.director.post(`/api/shows/${ids.showId}/duplicate`, { name: "" })).status).toBe(400);
  });
});

describe("archiving, deleting and restoring a show", () => {
  it("archives and brings back; an archived show is still listed, marked, and readable", async () => {
    const { client: c, programId, showId } = await copyDemoShow("archive");
    const res = await c.post(`/api/shows/${showId}/archive`, { archived: true });
    expect(res.status).toBe(200);
    expect(res.body.show.archivedAt).toEqual(expect.any(String));
    expect((await showNames(c, programId)).shows.find((s: any) => s.id === showId).archivedAt).toEqual(expect.any(String));
    expect((await c.get(`/api/shows/${showId}`)).status).toBe(200);
    expect((await c.post(`/api/shows/${showId}/archive`, { archived: false })).body.show.archivedAt).toBeNull();
    expect((await c.post(`/api/shows/${showId}/archive`, { archived: "yes" })).status).toBe(400);
  });

  it("deletes only when the show's name is typed, hides it everywhere, and restores it with everything in it", async () => {
    const { client: c, programId, showId, show } = await copyDemoShow("delete");
    const wrong = await c.call("DELETE", `/api/shows/${showId}`, { name: "lanterns" });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error).toBe(`Type the show's name, "${show.show.name}", exactly to delete it.`);
    expect((await c.get(`/api/shows/${showId}`)).status).toBe(200);
    const before = (await c.get(`/api/shows/${showId}/export`)).body;

    const res = await c.call("DELETE", `/api/shows/${showId}`, { name: show.show.name });
    expect(res.status).toBe(200);
    // Restorable for 14 days.
    expect(new Date(res.body.show.purgeAt).getTime() - new Date(res.body.show.deletedAt).getTime()).toBe(14 * 86_400_000);
    expect((await c.get(`/api/shows/${showId}`)).status).toBe(404);
    expect((await c.get(`/api/shows/${showId}/sets/${show.sets[0].id}`)).status).toBe(404);
    const listed = await showNames(c, programId);
    expect(listed.shows.map((s: any) => s.id)).not.toContain(showId);
    expect(listed.deletedShows).toEqual([{ id: showId, name: show.show.name, deletedAt: expect.any(String), purgeAt: expect.any(String) }]);

    const restored = await c.post(`/api/shows/${showId}/restore`);
    expect(restored.status).toBe(200);
    expect((await c.get(`/api/shows/${showId}/export`)).body).toEqual(before);
    expect((await showNames(c, programId)).deletedShows).toEqual([]);
    const again = await c.post(`/api/shows/${showId}/restore`);
    expect(again.status).toBe(409);
    expect(again.body.error).toBe(`"${show.show.name}" is not deleted.`);
  });

  it("keeps deleting, archiving and restoring for directors", async () => {
    const ids = await demoIds();
    const designer = await signedIn(DEMO.designer);
    const staff = await signedIn(DEMO.staff);
    for (const who of [designer, staff]) {
      expect((await who.call("DELETE", `/api/shows/${ids.showId}`, { name: ids.show.show.name })).status).toBe(403);
      expect((await who.post(`/api/shows/${ids.showId}/archive`, { archived: true })).status).toBe(403);
      expect((await who.post(`/api/shows/${ids.showId}/restore`)).status).toBe(403);
    }
    expect((await ids.other.call("DELETE", `/api/shows/${ids.showId}`, { name: ids.show.show.name })).status).toBe(404);
    expect((await ids.director.get(`/api/shows/${ids.showId}`)).status).toBe(200);
  });
});

describe("restoring a backup", () => {
  it("previews the file without writing, then restores it as a new show", async () => {
    const { client: c, showId } = await copyDemoShow("backup");
    const backup = await fetch(`${APP_URL}/api/shows/${showId}/export`, { headers: { cookie: c.cookie! } });
    expect(backup.headers.get("content-disposition")).toMatch(/attachment; filename=".+\.farfield\.json"/);
    const text = await backup.text();
    const file = JSON.parse(text);

    const other = new Client();
    const up = await signUp(other, { name: "Backup Director", email: uniqueEmail("restore"), password: "backup-director-pass", programName: "Backup Band" });
    const programId = up.body.programId as string;
    const preview = await upload(other, `/api/programs/${programId}/shows/import/preview`, text);
    expect(preview.status).toBe(200);
    expect(preview.body.preview).toMatchObject({
      name: file.show.name,
      fieldRules: file.show.fieldRules,
      performers: file.performers.length,
      movements: file.movements.map((m: any) => m.name),
      phrases: file.phrases.map((p: any) => p.name),
      listeningPoints: file.listeningPoints.map((l: any) => l.name),
    });
    expect(preview.body.preview.sets).toHaveLength(file.sets.length);
    expect((await showNames(other, programId)).shows).toEqual([]);

    const damaged = await upload(other, `/api/programs/${programId}/shows/import/preview`, text.slice(0, 200));
    expect(damaged.status).toBe(400);
    expect(damaged.body.error).toMatch(/damaged: it is not valid JSON/);

    const restored = await upload(other, `/api/programs/${programId}/shows/import`, text, { name: "Restored" });
    expect(restored.status).toBe(201);
    expect((await showNames(other, programId)).shows.map((s: any) => s.name)).toEqual(["Restored"]);
  });

  it("lets staff not preview (403) and outsiders not see the program (404)", async () => {
    const ids = await demoIds();
    const staff = await signedIn(DEMO.staff);
    expect((await upload(staff, `/api/programs/${ids.programId}/shows/import/preview`, "{}")).status).toBe(403);
    expect((await upload(ids.other, `/api/programs/${ids.programId}/shows/import/preview`, "{}")).status).toBe(404);
  });
});
