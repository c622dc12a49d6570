// The stadium rehearsal e-mail in the director's words: what to listen for in the checks' own
// sentences, the plan's reasons and the minutes, never check ids or check names.
import { describe, expect, it } from "vitest";
import { CHECK_IDS } from "@/lib/acoustics/types";
import { rehearsalMessage } from "@/lib/mail/rehearsal-message";
import { CHECK_LABELS } from "@/lib/music/check-labels";
import { buildRehearsalPlan } from "@/lib/rehearsal/plan";

const why = "Clarinets: play mf where p is written — clarinets carry poorly outdoors, and the melody is 6 dB under the accompaniment at the Press box.";
const items = buildRehearsalPlan([
  {
    kind: "phrase",
    name: "Clarinet song",
    sets: [{ setNumber: "7", checks: [{ id: "melody-forward", passed: false, detail: "The melody is 6 dB below the accompaniment." }, { id: "bass-up-pyramid", passed: false, detail: "…" }], plan: [], planUnmet: [] }],
    sections: [
      { section: "Clarinets", voice: "melody", writtenDynamic: "p", playedDynamic: null },
      { section: "Trumpets", voice: "accompaniment", writtenDynamic: "p", playedDynamic: null },
    ],
    plan: {
      entries: [
        { section: "Clarinets", who: "Clarinets", why, writtenDynamic: "p", playedDynamic: "mf", changeDb: 11 },
        { section: "Trumpets", who: "Trumpets", why: "", writtenDynamic: "p", playedDynamic: "p", changeDb: 0 },
      ],
      unmet: ["The melody is 3 dB under the accompaniment at the Press box in set 8; the melody should lead every other voice by 3 dB."],
    },
  },
]);
const message = rehearsalMessage({ baseUrl: "http://127.0.0.1:3000", path: "/shows/x/rehearsal", programName: "Band", showName: "Show", senderName: "Director", listenFrom: { name: "Press box", words: "on the 50" }, items });

describe("rehearsalMessage", () => {
  it("says what to listen for in sentences, never by check id or check name", () => {
    for (const body of [message.text, message.html]) {
      expect(body).toContain("At Set 7: The melody is 6 dB below the accompaniment.");
      for (const id of CHECK_IDS) expect(body).not.toContain(id);
      for (const name of Object.values(CHECK_LABELS)) expect(body).not.toContain(name);
      expect(body).not.toMatch(/\bsets 7\b/);
    }
  });

  it("gives each item its minutes of stadium time", () => {
    const timed = rehearsalMessage({ baseUrl: "http://127.0.0.1:3000", path: "/p", programName: "Band", showName: "Show", senderName: "Director", listenFrom: { name: "Press box", words: "on the 50" }, items: items.map((it) => ({ ...it, minutes: 12 })) });
    expect(timed.text).toContain("1. Clarinet song — 12 minutes (Set 7)");
    expect(timed.html).toContain("1. Clarinet song — 12 minutes (Set 7)");
  });

  it("carries the plan's own reasons and what stays out of reach", () => {
    expect(message.text).toContain(why);
    expect(message.html).toContain("Clarinets: play mf where p is written — clarinets carry poorly outdoors");
    expect(message.text).toContain("The melody is 3 dB under the accompaniment at the Press box in set 8");
  });
});
