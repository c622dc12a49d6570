"use client";
// Listen: what the chosen listening point hears, as a synthesized sketch, following the transition count by count.
import { useEffect, useMemo, useRef, useState } from "react";
import { Button } from "@/components/Button";
import { errorText } from "@/components/error-text";
import { VOICE_LABELS, VOICE_ORDER } from "@/app/shows/[showId]/music/voices";
import { NO_SOLO_MUTE, type SoloMute } from "@/lib/listen/audible";
import { setCountOnLine } from "@/lib/listen/count-line";
import { bpmAt } from "@/lib/listen/count-times";
import { scheduleListen } from "@/lib/listen/schedule";
import type { ScoreNotes } from "@/lib/listen/score-notes";
import type { ListenAnswer } from "@/lib/listen/types";
import type { AB } from "./listen-graph";
import { loadParts, loadScore, type SetRef } from "./load-listen";
import { exposeOfflineRender } from "./offline-render";
import { useListenSound } from "./use-listen";

/** The field animation Listen keeps in step with (the editor's transition player). */
export interface FollowedPlayback {
  count: number | null;
  playing: boolean;
  bpm: number;
  setBpm(bpm: number): void;
  play(): void;
  pause(): void;
}

interface Props {
  showId: string;
  listeningPointId: string | null;
  pointName: string;
  /** The show's sets in order, and the index of the set whose transition plays. */
  sets: readonly { id: string; counts: number }[];
  index: number;
  /** Versions of the from-set and the to-set when known (a saved change fetches new parts). */
  versions?: { from: number | null; to: number | null };
  playback?: FollowedPlayback;
  /** Counts a minute without a score, when there is no field animation to take it from. */
  bpm?: number;
}

type Loaded = { from: ListenAnswer | null; to: ListenAnswer; score: NonNullable<ScoreNotes["score"]> | null; scoreProblem: string | null };

const toggle = (list: readonly string[], item: string) => (list.includes(item) ? list.filter((x) => x !== item) : [...list, item]);
const pill = (on: boolean) => `min-h-9 rounded-md border px-2 text-sm font-semibold ${on ? "border-turf-dark bg-turf-light" : "border-ink/20 bg-paper-raised hover:bg-paper-sunk"}`;

export function ListenControl({ showId, listeningPointId, pointName, sets, index, versions, playback, bpm = 120 }: Props) {
  const [ab, setAb] = useState<AB>("written");
  const [soloMute, setSoloMute] = useState<SoloMute>(NO_SOLO_MUTE);
  const [background, setBackground] = useState(false);
  const [loaded, setLoaded] = useState<Loaded | null>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const controls = useMemo(() => ({ ab, soloMute, background }), [ab, soloMute, background]);
  const sound = useListenSound(controls);

  const to = sets[index];
  const from = index > 0 ? sets[index - 1]! : null;
  const counts = to?.counts ?? 0;
  const spanStart = setCountOnLine(sets, index) - (from ? counts : 0);
  const tempo = playback?.bpm ?? bpm;
  const key = `${showId}/${from?.id}/${to?.id}/${listeningPointId}/${versions?.from}/${versions?.to}`;
  const loadedKey = useRef<string | null>(null);

  useEffect(() => {
    exposeOfflineRender();
  }, []);

  const schedule = (l: Loaded, atBpm: number) => scheduleListen({ from: l.from, to: l.to, counts, spanStartOnLine: spanStart, score: l.score, fallbackBpm: atBpm });
  const startCount = () => (playback && from && playback.count !== null && playback.count < counts ? playback.count : 0);

  async function listen() {
    if (!to || !listeningPointId) return;
    if (!sound.prepare()) {
      setError("This browser cannot play sound (no Web Audio).");
      return;
    }
    setError(null);
    setBusy(true);
    try {
      let l = loadedKey.current === key ? loaded : null;
      if (!l) {
        const ref = (id: string, v: number | null | undefined): SetRef => ({ id, version: v ?? null });
        const [parts, score] = await Promise.all([
          loadParts(showId, from ? ref(from.id, versions?.from) : null, ref(to.id, versions?.to), listeningPointId),
          loadScore(showId).then(
            (s) => ({ s, problem: null }),
            (e: unknown) => ({ s: null, problem: `The score's notes could not be read (${errorText(e)}); held chords play instead.` }),
          ),
        ]);
        l = { ...parts, score: score.s, scoreProblem: score.problem };
        loadedKey.current = key;
        setLoaded(l);
      }
      const first = startCount();
      const atBpm = l.score?.tempo.length ? bpmAt(spanStart + first, l.score.tempo, tempo) : tempo;
      if (l.score?.tempo.length && playback) playback.setBpm(atBpm);
      sound.start(schedule(l, tempo), first);
      if (playback && from) playback.play();
    } catch (e) {
      setError(errorText(e, "Try again."));
    } finally {
      setBusy(false);
    }
  }

  function stop() {
    sound.stop();
    if (playback?.playing) playback.pause();
  }

  // Kept in step with the field: a pause, a step or a seek there stops the sound; the score's tempo drives the animation.
  const followed = useRef(false);
  useEffect(() => {
    if (!playback || !from) return;
    if (sound.playing && playback.playing) followed.current = true;
    if (sound.playing && followed.current && !playback.playing) {
      followed.current = false;
      sound.stop();
    }
    if (!sound.playing) followed.current = false;
  }, [playback, from, sound]);
  useEffect(() => {
    if (!playback || !sound.playing || playback.count === null || !loaded?.score?.tempo.length) return;
    const want = bpmAt(spanStart + playback.count, loaded.score.tempo, playback.bpm);
    if (want !== playback.bpm) playback.setBpm(want);
  }, [playback, sound.playing, loaded, spanStart]);
  // Without a score the tempo is the player's: a new tempo restarts the sound from the count shown.
  const lastTempo = useRef(tempo);
  useEffect(() => {
    if (lastTempo.current === tempo) return;
    lastTempo.current = tempo;
    if (sound.playing && loaded && !loaded.score?.tempo.length) sound.start(schedule(loaded, tempo), startCount());
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [tempo]);

  const parts = useMemo(() => (loaded ? [...loaded.to.parts, ...(loaded.from?.parts ?? []).filter((p) => !loaded.to.parts.some((q) => q.key === p.key))] : []), [loaded]);
  const sections = [...new Set(parts.map((p) => p.section))];
  const voices = VOICE_ORDER.filter((v) => parts.some((p) => p.voice === v));
  const hasBackground = Boolean(loaded?.to.backgroundOctaveDb);

  return (
    <section className="flex flex-col gap-2 rounded-xl border border-ink/10 bg-paper-raised px-4 py-3 text-sm shadow-sm" aria-labelledby="listen-title" data-testid="listen">
      <div className="flex flex-wrap items-center gap-2">
        <h2 id="listen-title" className="mr-2 text-base font-semibold">
          Listen at {pointName}
        </h2>
        {sound.playing ? (
          <Button variant="secondary" onClick={stop} data-testid="listen-toggle">
            Stop
          </Button>
        ) : (
          <Button variant="secondary" onClick={() => void listen()} disabled={busy || !listeningPointId || !to} data-testid="listen-toggle">
            {busy ? "Getting ready…" : "Listen"}
          </Button>
        )}
        <fieldset className="flex items-center gap-1">
          <legend className="sr-only">Dynamics heard</legend>
          {(["written", "plan"] as const).map((v) => (
            <button key={v} type="button" aria-pressed={ab === v} className={pill(ab === v)} onClick={() => setAb(v)} data-testid={`listen-ab-${v}`}>
              {v === "written" ? "As written" : "With the plan"}
            </button>
          ))}
        </fieldset>
        <label className="flex items-center gap-1">
          <input type="checkbox" checked={background} onChange={(e) => setBackground(e.target.checked)} disabled={Boolean(loaded) && !hasBackground} data-testid="listen-background" />
          Mix in the background noise {loaded && !hasBackground ? `(${pointName} has none)` : `at ${pointName}`}
        </label>
      </div>
      <p>
        <strong>An audible sketch of the prediction, not a recording.</strong> Each section is a simple synthesized voice shaped to its predicted level in each octave band at {pointName}, arriving with its predicted delay
        {from ? "; between the two sets the levels move count by count in step with the field" : ""}.
        {loaded ? (loaded.score ? " Notes from the imported score." : " No score imported: each section holds a chord in its register.") : null}
        {ab === "plan" ? ` “With the plan” changes each section by the balance plan of ${from ? "each of the two sets" : "the set"} at ${pointName}.` : null}
      </p>
      <p className="text-ink-soft" data-testid="listen-caution">
        Keep your volume low, above all on headphones: playback is held to one quiet level and limited, but your device&apos;s volume decides how loud it is. Follow your school&apos;s or venue&apos;s rules; any decision about a
        person&apos;s hearing belongs to a licensed audiologist.
      </p>
      {error ? (
        <p role="alert" className="text-signal-bad">
          Listen could not start: {error}
        </p>
      ) : null}
      {loaded?.scoreProblem ? <p role="status">{loaded.scoreProblem}</p> : null}
      {loaded ? (
        <div className="flex flex-col gap-1" role="group" aria-label="Solo and mute">
          <div className="flex flex-wrap items-center gap-1">
            <span className="w-32 font-semibold">Voices</span>
            {voices.map((v) => (
              <span key={v} className="flex items-center gap-1 pr-2">
                {VOICE_LABELS[v]}
                <button type="button" aria-pressed={soloMute.soloVoices.includes(v)} className={pill(soloMute.soloVoices.includes(v))} onClick={() => setSoloMute((s) => ({ ...s, soloVoices: toggle(s.soloVoices, v) }))} data-testid={`listen-solo-voice-${v}`} aria-label={`Solo the ${VOICE_LABELS[v]!.toLowerCase()}`}>
                  Solo
                </button>
                <button type="button" aria-pressed={soloMute.mutedVoices.includes(v)} className={pill(soloMute.mutedVoices.includes(v))} onClick={() => setSoloMute((s) => ({ ...s, mutedVoices: toggle(s.mutedVoices, v) }))} data-testid={`listen-mute-voice-${v}`} aria-label={`Mute the ${VOICE_LABELS[v]!.toLowerCase()}`}>
                  Mute
                </button>
              </span>
            ))}
          </div>
          <div className="flex flex-wrap items-center gap-1">
            <span className="w-32 font-semibold">Sections</span>
            {sections.map((s) => (
              <span key={s} className="flex items-center gap-1 pr-2">
                {s}
                <button type="button" aria-pressed={soloMute.soloSections.includes(s)} className={pill(soloMute.soloSections.includes(s))} onClick={() => setSoloMute((x) => ({ ...x, soloSections: toggle(x.soloSections, s) }))} data-testid={`listen-solo-section-${s}`} aria-label={`Solo ${s}`}>
                  Solo
                </button>
                <button type="button" aria-pressed={soloMute.mutedSections.includes(s)} className={pill(soloMute.mutedSections.includes(s))} onClick={() => setSoloMute((x) => ({ ...x, mutedSections: toggle(x.mutedSections, s) }))} data-testid={`listen-mute-section-${s}`} aria-label={`Mute ${s}`}>
                  Mute
                </button>
              </span>
            ))}
          </div>
        </div>
      ) : null}
    </section>
  );
}
