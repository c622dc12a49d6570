// The stadium rehearsal plan as a message to the staff. Pure.
import { setListWords } from "@/lib/show/set-words";
import type { RehearsalItem } from "@/lib/rehearsal/plan";
import { escapeHtml, layout, linkButton, paragraphs } from "./html";
import { absoluteLink, type MailMessage } from "./message";

export interface RehearsalMessageInput {
  baseUrl: string;
  path: string;
  programName: string;
  showName: string;
  senderName: string;
  listenFrom: { name: string; words: string };
  items: (RehearsalItem & { minutes?: number })[];
}

/** What the box should hear and does not yet, in the checks' own sentences: "At Set 7: The melody is 6 dB below the accompaniment." */
function listenFor(it: RehearsalItem): string[] {
  return it.failing.map((f) => `At ${setListWords(f.sets)}: ${f.detail}`);
}

const heading = (it: RehearsalItem & { minutes?: number }, n: number) => `${n}. ${it.name}${it.minutes !== undefined ? ` — ${it.minutes} ${it.minutes === 1 ? "minute" : "minutes"}` : ""} (${setListWords(it.sets)})`;

const SOURCE_WORDS = { adopted: "adopted plan", proposed: "proposed", written: "as written" } as const;

function itemText(it: RehearsalItem & { minutes?: number }, n: number): string {
  const lines = [heading(it, n)];
  const listen = listenFor(it);
  lines.push(...(listen.length ? ["   Listen for:", ...listen.map((l) => `   - ${l}`)] : ["   The balance already works here: run it once as a check."]));
  for (const s of it.buildUp) lines.push(`   Step ${s.step}, ${s.title.toLowerCase()}: ${s.sections.join(", ")}`);
  for (const d of it.dynamics) lines.push(`   ${d.who}: play ${d.play}${d.play === d.written ? " as written" : ` where ${d.written} is written`} (${SOURCE_WORDS[d.source]})`);
  const why = it.dynamics.filter((d) => d.why);
  if (why.length) lines.push("   Why:", ...why.map((d) => `   - ${d.why}`));
  for (const u of it.unmet) lines.push(`   Not reachable within the limits: ${u}`);
  return lines.join("\n");
}

function itemHtml(it: RehearsalItem & { minutes?: number }, n: number): string {
  const steps = it.buildUp.map((s) => `<li>${escapeHtml(s.title)}: ${escapeHtml(s.sections.join(", "))}</li>`).join("");
  const dyn = it.dynamics
    .map((d) => `<tr><td style="padding:2px 8px 2px 0">${escapeHtml(d.who)}</td><td style="padding:2px 8px">${d.written}</td><td style="padding:2px 8px"><strong>${d.play}</strong></td><td style="padding:2px 0;color:#6b7280">${SOURCE_WORDS[d.source]}</td></tr>`)
    .join("");
  const listen = listenFor(it);
  const why = it.dynamics.filter((d) => d.why).map((d) => `<li>${escapeHtml(d.why)}</li>`).join("");
  const unmet = it.unmet.map((u) => `<li>${escapeHtml(u)}</li>`).join("");
  return `<h3 style="margin:18px 0 6px;font-size:16px">${escapeHtml(heading(it, n))}</h3>
${listen.length ? `<p style="margin:0 0 2px">Listen for:</p><ul style="margin:0 0 6px 18px;padding:0">${listen.map((l) => `<li>${escapeHtml(l)}</li>`).join("")}</ul>` : `<p style="margin:0 0 6px;color:#6b7280">The balance already works here: run it once as a check.</p>`}
<ol style="margin:0 0 8px 18px;padding:0">${steps}</ol>
<table style="border-collapse:collapse;font-size:14px"><tr><th align="left">Section</th><th align="left" style="padding:0 8px">Written</th><th align="left" style="padding:0 8px">Play</th><th></th></tr>${dyn}</table>${why ? `<ul style="margin:6px 0 0 18px;padding:0;font-size:14px">${why}</ul>` : ""}${unmet ? `<p style="margin:6px 0 0;font-size:14px">Not reachable within the limits:</p><ul style="margin:0 0 0 18px;padding:0;font-size:14px">${unmet}</ul>` : ""}`;
}

export function rehearsalMessage(input: RehearsalMessageInput): MailMessage {
  const link = absoluteLink(input.baseUrl, input.path);
  const subject = `Stadium rehearsal plan: ${input.showName}`;
  const intro = `${input.senderName} sent the stadium rehearsal plan for ${input.showName} (${input.programName}). Listen from the ${input.listenFrom.name}: ${input.listenFrom.words}. Work through the phrases in this order, in the minutes given; in each, build up from the soloist or the melody alone.`;
  const caution = "Levels are predictions, not measurements. Wear musicians' hearing protection near loud sections and follow your school's and venue's rules.";
  const text = [intro, "", ...input.items.map((it, i) => itemText(it, i + 1) + "\n"), `The plan, printable: ${link}`, "", caution].join("\n");
  const html = layout(
    subject,
    paragraphs([escapeHtml(intro)]) + input.items.map((it, i) => itemHtml(it, i + 1)).join("\n") + linkButton(link, "Open the printable plan") + paragraphs([escapeHtml(caution)]),
  );
  return { subject, text, html };
}
