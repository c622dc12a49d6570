// A private copy of the demo show: a new director signs up and imports the demo's export into their own
// program, so a test can change it while other suites read and edit the demo itself.
import { APP_URL, Client, DEMO, signedIn, uniqueEmail } from "./api";
import { signUp } from "./sign-up";

export async function copyDemoShow(tag: string) {
  const client = new Client();
  const email = uniqueEmail(tag);
  const password = `${tag}-director-pass`;
  const up = await signUp(client, { name: `${tag} Director`, email, password, programName: `${tag} Band` });
  if (up.status !== 201) throw new Error(`sign-up answered ${up.status}`);
  const programId = up.body.programId as string;
  const demo = await signedIn(DEMO.director);
  const demoMe = await demo.get("/api/me");
  const demoProgram = demoMe.body.memberships.find((m: any) => m.programName.startsWith("Harbor Ridge")).programId;
  const demoShow = (await demo.get(`/api/programs/${demoProgram}/shows`)).body.shows[0].id;
  const exported = await fetch(`${APP_URL}/api/shows/${demoShow}/export`, { headers: { cookie: demo.cookie! } });
  const form = new FormData();
  form.set("file", new Blob([await exported.text()], { type: "application/json" }), "show.json");
  const imported = await fetch(`${APP_URL}/api/programs/${programId}/shows/import`, { method: "POST", body: form, headers: { cookie: client.cookie! } });
  if (imported.status !== 201) throw new Error(`import answered ${imported.status}: ${await imported.text()}`);
  const showId = (await imported.json()).show.id as string;
  // Start from what is written: plans adopted on the demo by other suites are set aside.
  const music = (await client.get(`/api/shows/${showId}/music`)).body;
  for (const phrase of music.phrases) await client.call("DELETE", `/api/shows/${showId}/phrases/${phrase.id}/plan`);
  const show = (await client.get(`/api/shows/${showId}`)).body;
  const pressBoxId = show.listeningPoints.find((l: any) => l.name === "Press box").id as string;
  return { client, programId, showId, show, pressBoxId, email, password };
}
