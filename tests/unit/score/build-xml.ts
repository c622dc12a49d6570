// Hand-made MusicXML for the parser's tests: each helper writes one element as the W3C MusicXML 4.0
// reference spells it (element pages named beside each helper).

export interface PartSpec {
  id: string;
  name: string;
  /** Each measure's inner XML; attrs on the <measure> element by index. */
  measures: string[];
  measureAttrs?: Record<number, string>;
}

/** <score-partwise> with <part-list>/<score-part>/<part-name> and one <part> per spec. */
export function partwise(parts: PartSpec[], title = "Test piece"): string {
  const list = parts.map((p) => `<score-part id="${p.id}"><part-name>${p.name}</part-name></score-part>`).join("");
  const body = parts
    .map(
      (p) =>
        `<part id="${p.id}">${p.measures
          .map((m, i) => `<measure number="${i + 1}"${p.measureAttrs?.[i] ?? ""}>${m}</measure>`)
          .join("")}</part>`,
    )
    .join("");
  return `<?xml version="1.0" encoding="UTF-8"?>
<!DOCTYPE score-partwise PUBLIC "-//Recordare//DTD MusicXML 4.0 Partwise//EN" "http://www.musicxml.org/dtds/partwise.dtd">
<score-partwise version="4.0"><work><work-title>${title}</work-title></work><part-list>${list}</part-list>${body}</score-partwise>`;
}

/** <attributes> with <divisions> and <time>/<beats>/<beat-type>. */
export const attrs = (divisions: number, beats?: number, beatType?: number) =>
  `<attributes><divisions>${divisions}</divisions>${beats ? `<time><beats>${beats}</beats><beat-type>${beatType}</beat-type></time>` : ""}</attributes>`;
/** <time> alone, for a meter change. */
export const time = (beats: number, beatType: number) => `<attributes><time><beats>${beats}</beats><beat-type>${beatType}</beat-type></time></attributes>`;
/** <note> with <pitch> (<step>, <alter>, <octave>) and <duration>; extra goes inside the note. */
export const note = (pitch: string, duration: number, extra = "") => {
  const m = /^([A-G])(#|b)?(-?\d)$/.exec(pitch)!;
  const alter = m[2] === "#" ? "<alter>1</alter>" : m[2] === "b" ? "<alter>-1</alter>" : "";
  return `<note>${extra.includes("<chord/>") ? "<chord/>" : ""}<pitch><step>${m[1]}</step>${alter}<octave>${m[3]}</octave></pitch><duration>${duration}</duration>${extra.replace("<chord/>", "")}</note>`;
};
/** <note> with <rest>. */
export const rest = (duration: number, extra = "") => `<note><rest/><duration>${duration}</duration>${extra}</note>`;
/** <direction>/<direction-type>/<dynamics>. */
export const dyn = (marking: string) => `<direction placement="below"><direction-type><dynamics><${marking}/></dynamics></direction-type></direction>`;
/** <direction>/<direction-type>/<wedge type>. */
export const wedge = (type: "crescendo" | "diminuendo" | "stop") => `<direction><direction-type><wedge type="${type}"/></direction-type></direction>`;
/** <direction>/<direction-type>/<words>. */
export const words = (text: string) => `<direction><direction-type><words>${text}</words></direction-type></direction>`;
/** <direction>/<direction-type>/<rehearsal>. */
export const rehearsal = (text: string) => `<direction placement="above"><direction-type><rehearsal>${text}</rehearsal></direction-type></direction>`;
/** <direction> with <metronome> (<beat-unit>, <beat-unit-dot>, <per-minute>) and optionally <sound tempo>. */
export const metronome = (unit: string, perMinute: number, dotted = false, soundTempo?: number) =>
  `<direction><direction-type><metronome><beat-unit>${unit}</beat-unit>${dotted ? "<beat-unit-dot/>" : ""}<per-minute>${perMinute}</per-minute></metronome></direction-type>${soundTempo ? `<sound tempo="${soundTempo}"/>` : ""}</direction>`;
/** <barline> with <bar-style>, <repeat direction> and <ending number type>. */
export const barline = (location: "left" | "right", inner: string) => `<barline location="${location}">${inner}</barline>`;
export const backup = (duration: number) => `<backup><duration>${duration}</duration></backup>`;
