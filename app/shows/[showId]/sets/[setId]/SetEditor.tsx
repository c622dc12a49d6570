"use client";
// The field editor of one set: the field with its performers, the box mix, the selection, the roster,
// the sets strip and the editing commands. Designers and directors edit; staff read.
import { useRouter } from "next/navigation";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { flushSync } from "react-dom";
import { mutate } from "swr";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { ShowNav } from "@/components/ShowNav";
import { ErrorState } from "@/components/ErrorState";
import { SkeletonCard } from "@/components/Skeleton";
import { sendJson } from "@/components/fetcher";
import { useApi } from "@/components/use-api";
import { FieldCanvas } from "@/components/field/FieldCanvas";
import { Legend } from "@/components/field/Legend";
import { MixPanel, type MixFigures } from "@/components/field/MixPanel";
import { VOICE_STYLES } from "@/components/field/palette";
import { instrumentSpreadDeg } from "@/lib/field/marks";
import type { StageDot } from "@/components/field/FieldStage";
import { DEFAULT_INSTRUMENTS, positionsAtCount } from "@/lib/acoustics";
import { snapToStep } from "@/lib/field/geometry";
import type { InstrumentCatalog, VoiceOrTacet } from "@/lib/acoustics/types";
import { can } from "@/lib/auth/permissions";
import { copyFrom, face, fillBlock, mirrorSides, moveBy, nudge, snapToGrid, spreadAlongArc, spreadAlongLine, type Changes } from "@/lib/editor/forms";
import { canRedo, canUndo, commit, historyOf, redo, undo, type History } from "@/lib/editor/history";
import { layoutOf, rowsOf, withSpots, type Layout } from "@/lib/editor/layout";
import { clickSelect, bandSelect } from "@/lib/editor/selection";
import { CHECK_LABELS } from "../../music/voices";
import { ChecksPanel } from "./ChecksPanel";
import { EditTools, type FormCommand } from "./EditTools";
import { editorKeys, useSet, useShow, type AnalysisResponse, type MixInputResponse } from "./editor-api";
import { RosterPanel } from "./RosterPanel";
import { SelectionPanel } from "./SelectionPanel";
import { SetsBar } from "./SetsBar";
import { usePreview, type PreviewMix } from "./use-preview";
import { useSetSaver } from "./use-set-saver";
import { TransitionPlayer } from "./TransitionPlayer";
import { usePlayback } from "./use-playback";
import { createLiveMix, useLiveMix, type LiveMix } from "./live-mix";
import { firstListeningPointId } from "@/lib/show/first-choices";
import { ListenControl } from "@/components/listen/ListenControl";
import { ListeningPointSelect } from "@/components/ListeningPointSelect";

/** The mix panel, showing a drag's live mix while there is one. */
function LiveMixPanel({ live, mix, source, ...rest }: { live: LiveMix } & Parameters<typeof MixPanel>[0]) {
  const dragging = useLiveMix(live);
  return <MixPanel mix={dragging ?? mix} source={dragging ? "preview" : source} {...rest} />;
}

declare global {
  interface Window {
    /** Test and bench hook: read-only views of the editor's state. */
    __farfieldEditor?: {
      version(): number | null;
      layout(): Layout;
      previewMix(): PreviewMix | null;
      storedMix(): AnalysisResponse | null;
      selected(): string[];
      /** Players marked on the field by the chosen balance check. */
      flagged(): string[];
      /** The count of the transition shown, or null when the field shows the set itself. */
      shownCount(): number | null;
      /** Positions on the field now: the set's, or those of the count shown. */
      shown(): Layout;
      frameTimes: number[];
    };
  }
}

const EMPTY: Layout = {};

/** `initialCount`: open on that count of the transition into the set (links from the timeline), paused. */
export function SetEditor({ showId, setId, initialCount = null }: { showId: string; setId: string; initialCount?: number | null }) {
  const router = useRouter();
  const show = useShow(showId);
  const setData = useSet(showId, setId);
  const sets = show.data?.sets ?? [];
  const index = sets.findIndex((s) => s.id === setId);
  const previousId = index > 0 ? sets[index - 1].id : null;
  const previous = useSet(showId, previousId);
  const mixInput = useApi<MixInputResponse>(editorKeys.mixInput(showId, setId));
  const editable = show.data ? can(show.data.role, "edit-drill") : false;

  const [history, setHistory] = useState<History<Layout>>(() => historyOf(EMPTY));
  const layout = history.present;
  const [selected, setSelected] = useState<string[]>([]);
  const [pointId, setPointId] = useState<string | null>(null);
  const [placingId, setPlacingId] = useState<string | null>(null);
  // On by default: positions land on the step grid, as the drill is written (issue: "1.75 steps inside the 35").
  const [snap, setSnap] = useState(true);
  const [showGrid, setShowGrid] = useState(false);
  const [liveMix] = useState(createLiveMix);
  const [chosenCheck, setChosenCheck] = useState<string | null>(null);
  const frameTimes = useRef<number[]>([]);
  const fieldBox = useRef<HTMLDivElement>(null);

  const listeningPoints = show.data?.listeningPoints ?? [];
  const lpId = pointId ?? firstListeningPointId(listeningPoints);
  const point = listeningPoints.find((l) => l.id === lpId);

  const saver = useSetSaver({
    showId,
    setId,
    present: layout,
    enabled: editable,
    onSaved: () => {
      void mutate(editorKeys.mixInput(showId, setId));
    },
    onTheirs: (theirs) => setHistory((h) => commit(h, theirs)),
  });

  // First load, and a newer version read while we have nothing unsaved.
  useEffect(() => {
    const d = setData.data;
    if (!d) return;
    if (!saver.server) {
      const l = layoutOf(d.positions);
      saver.adopt(l, d.set.version);
      // The server's set arrives through SWR: taking it into the editable history is this effect's job.
      // eslint-disable-next-line react-hooks/set-state-in-effect
      setHistory(historyOf(l));
    } else if (d.set.version > saver.server.version && !saver.dirty && !saver.busy() && !saver.conflict) {
      const l = layoutOf(d.positions);
      saver.adopt(l, d.set.version);
      setHistory((h) => commit(h, l));
    }
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [setData.data]);

  // Before the first effect adopts the loaded set, its version is the server's: the stored box mix can show at once.
  const version = saver.server?.version ?? setData.data?.set.version ?? null;
  const analysis = useApi<AnalysisResponse>(lpId && version !== null ? editorKeys.analysis(showId, setId, lpId, version) : null);
  const input = mixInput.data?.input;
  const preview = usePreview(input, lpId, layout);

  // Transition playback: positions of the count being shown (between the previous set and this one).
  const counts = sets[index]?.counts ?? 0;
  const playback = usePlayback(counts, initialCount);
  const { count: playCount, playing } = playback;
  const playLayout = useMemo(() => {
    if (playCount === null || !previous.data) return null;
    return layoutOf(positionsAtCount(previous.data.positions, rowsOf(layout), Math.min(playCount, counts), Math.max(1, counts)));
  }, [playCount, previous.data, layout, counts]);
  // A count asked for in the address means nothing for the first set (no transition into it).
  const shownCount = playLayout ? Math.min(playCount!, counts) : null;
  const shown = playLayout ?? layout;

  const previewMix = useMemo(() => (preview ? preview.mixFor(shown) : null), [preview, shown]);
  // Not waiting on a refetch of the live mix's input: the stored mix does not read it, and the page's first
  // render (from the server's preloaded answers) would otherwise flip from stored to preview and back.
  const stored = analysis.data && !saver.dirty && shownCount === null && mixInput.data ? analysis.data : null;
  const mix: MixFigures | null = useMemo(() => (stored ? { ...stored.mix, loudness: stored.loudness } : previewMix), [stored, previewMix]);
  const perPerformer: Record<string, number> = useMemo(() => {
    if (stored) return Object.fromEntries(stored.mix.performers.flatMap((p) => (p.dbA === null ? [] : [[p.performerId, p.dbA]])));
    return previewMix?.performers ?? {};
  }, [stored, previewMix]);
  const loudest = useMemo(() => Math.max(-Infinity, ...Object.values(perPerformer).filter(Number.isFinite)), [perPerformer]);
  const relDb = useMemo(() => Object.fromEntries(Object.entries(perPerformer).map(([id, db]) => [id, db - loudest])), [perPerformer, loudest]);


  const performers = useMemo(() => show.data?.performers ?? [], [show.data]);
  const byId = useMemo(() => new Map(performers.map((p) => [p.id, p])), [performers]);
  const voiceOf = useMemo(() => new Map((input?.performers ?? []).map((p) => [p.id, p.voice as VoiceOrTacet])), [input]);
  const catalog: InstrumentCatalog = useMemo(() => ({ ...DEFAULT_INSTRUMENTS, ...(input?.instruments ?? {}) }), [input]);

  const dots: StageDot[] = useMemo(
    () =>
      Object.entries(shown).flatMap(([id, s]) => {
        const p = byId.get(id);
        if (!p) return [];
        return [{ id, label: p.label, spreadDeg: instrumentSpreadDeg(p.instrument, catalog), style: VOICE_STYLES[voiceOf.get(id) ?? "tacet"], x: s.x, y: s.y, facingDeg: s.facingDeg }];
      }),
    [shown, byId, catalog, voiceOf],
  );
  const ghosts = useMemo(() => (previous.data && shownCount === null ? previous.data.positions.map((p) => ({ id: p.performerId, x: p.x, y: p.y })) : []), [previous.data, shownCount]);

  /** One edit: changes computed from the latest layout (key repeats never work on a stale one). */
  const apply = useCallback(
    (changes: Changes | Record<string, undefined> | ((l: Layout) => Changes | Record<string, undefined>)) => {
      if (!editable) return;
      setHistory((h) => {
        const c = typeof changes === "function" ? changes(h.present) : changes;
        return Object.keys(c).length === 0 ? h : commit(h, withSpots(h.present, c));
      });
    },
    [editable],
  );

  const selectedSet = useMemo(() => new Set(selected), [selected]);
  // The chosen check's players, from the latest stored analysis (it follows saves: a fixed check marks no one).
  const chosen = analysis.data?.checks.find((c) => c.id === chosenCheck && !c.passed) ?? null;
  const flagged = useMemo(() => new Set(chosen?.performerIds ?? []), [chosen]);
  useEffect(() => {
    window.__farfieldEditor = {
      version: () => version,
      layout: () => layout,
      previewMix: () => (preview ? preview.mixFor(layout) : null),
      storedMix: () => analysis.data ?? null,
      selected: () => selected,
      flagged: () => [...flagged],
      shownCount: () => shownCount,
      shown: () => shown,
      frameTimes: frameTimes.current,
    };
  });
  const chooseCheck = (id: string | null) => {
    setChosenCheck(id);
    const ids = analysis.data?.checks.find((c) => c.id === id)?.performerIds ?? [];
    if (!id) return;
    setSelected(ids.filter((p) => layout[p]));
    // On a tablet the panel sits below the field: bring the marked players into view.
    const box = fieldBox.current?.getBoundingClientRect();
    if (box && (box.bottom < 0 || box.top > window.innerHeight)) fieldBox.current!.scrollIntoView({ behavior: "smooth", block: "start" });
  };
  const onForm = (cmd: FormCommand) => {
    const prev = previous.data ? layoutOf(previous.data.positions) : EMPTY;
    const fn = { line: spreadAlongLine, arc: spreadAlongArc, mirror: mirrorSides, snap: snapToGrid, "copy-previous": (_: Layout, ids: readonly string[]) => copyFrom(prev, ids) }[cmd];
    apply((l) => fn(l, selected));
  };
  const removeSelected = () => apply(Object.fromEntries(selected.map((id) => [id, undefined])));

  // Keyboard: arrows nudge one step (shift: four), Delete takes off the set, Ctrl+Z / Ctrl+Shift+Z, Ctrl+A, Esc.
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const t = e.target as HTMLElement | null;
      if (t && (t.tagName === "INPUT" || t.tagName === "TEXTAREA" || t.tagName === "SELECT" || t.isContentEditable)) return;
      const mod = e.ctrlKey || e.metaKey;
      const step = e.shiftKey ? 4 : 1;
      const arrows: Record<string, [number, number]> = { ArrowLeft: [-step, 0], ArrowRight: [step, 0], ArrowUp: [0, step], ArrowDown: [0, -step] };
      if (arrows[e.key] && selected.length && editable) {
        e.preventDefault();
        apply((l) => nudge(l, selected, ...arrows[e.key]));
      } else if ((e.key === "Delete" || e.key === "Backspace") && selected.length && editable) {
        e.preventDefault();
        removeSelected();
      } else if (mod && e.key.toLowerCase() === "z") {
        e.preventDefault();
        if (editable) setHistory((h) => (e.shiftKey ? redo(h) : undo(h)));
      } else if (mod && e.key.toLowerCase() === "y") {
        e.preventDefault();
        if (editable) setHistory(redo);
      } else if (mod && e.key.toLowerCase() === "a") {
        e.preventDefault();
        setSelected(Object.keys(layout));
      } else if (e.key === "Escape") {
        setPlacingId(null);
        setSelected([]);
        setChosenCheck(null);
      }
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  });

  if (show.error) return <ErrorState error={show.error} what="show" onRetry={() => show.mutate()} />;
  if (setData.error) return <ErrorState error={setData.error} what="set" onRetry={() => setData.mutate()} />;
  if (!show.data || !setData.data) return <SkeletonCard rows={6} label="Loading the set…" />;

  const current = sets[index];
  const unplaced = performers.filter((p) => !layout[p.id]);
  const selPerformers = selected.map((id) => byId.get(id)).filter((p): p is NonNullable<typeof p> => Boolean(p));
  const one = selected.length === 1 ? selected[0] : null;
  const setPath = editorKeys.set(showId, setId);
  const afterSetChange = async () => {
    await mutate(editorKeys.show(showId));
  };

  return (
    <div className="flex flex-col gap-3">
      <Breadcrumbs items={[{ label: "Programs", href: "/programs" }, { label: show.data.show.name, href: `/shows/${showId}` }, { label: `Set ${current?.number ?? setData.data.set.number}` }]} />
      <ShowNav showId={showId} />
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h1 className="text-2xl font-bold">
          Set {current?.number ?? setData.data.set.number} <span className="text-base font-normal text-ink-soft">{counts} counts from the previous set</span>
          {shownCount !== null && !playing ? (
            <span className="ml-2 rounded-full bg-[#fff3d6] px-2 py-0.5 align-middle text-sm font-semibold text-signal-warn">Shown at count {shownCount} of {counts} from set {sets[index - 1]?.number}</span>
          ) : null}
        </h1>
        <div className="flex items-center gap-3 text-sm">
          <ListeningPointSelect points={listeningPoints} value={lpId} onChange={setPointId} />
          <span aria-live="polite" data-testid="save-status" data-status={saver.dirty ? "unsaved" : saver.status}>
            {saver.status === "error" ? "Not saved" : saver.dirty || saver.status === "saving" ? "Saving…" : editable ? "All changes saved" : null}
          </span>
        </div>
      </div>

      {saver.error ? (
        <div role="alert" className="rounded-lg border border-signal-bad/40 bg-[#fbe9ea] p-3 text-sm">
          Your last change was not saved: {saver.error}{" "}
          <button type="button" className="font-semibold underline" onClick={saver.retry}>
            Try again
          </button>
        </div>
      ) : null}
      {saver.conflict ? (
        <div role="alert" className="rounded-lg border border-signal-warn/50 bg-[#fff3d6] p-3 text-sm" data-testid="conflict">
          <p className="font-semibold">Someone else changed this set while you were editing.</p>
          <p>
            The field now shows their version. Your unsaved change ({saver.conflict.mine.upserts.length} moved or placed, {saver.conflict.mine.removals.length} taken off) is kept: re-apply it on top of theirs, or discard it.
          </p>
          <div className="mt-2 flex gap-2">
            <button
              type="button"
              className="min-h-9 rounded-md border border-turf-dark bg-turf px-3 font-semibold text-white"
              onClick={() => {
                const c = saver.conflict!;
                const changes: Record<string, { x: number; y: number; facingDeg: number } | undefined> = Object.fromEntries(c.mine.upserts.map((r) => [r.performerId, { x: r.x, y: r.y, facingDeg: r.facingDeg }]));
                for (const id of c.mine.removals) changes[id] = undefined;
                saver.closeConflict();
                setHistory((h) => commit(h, withSpots(c.theirs, changes)));
              }}
            >
              Re-apply my change
            </button>
            <button type="button" className="min-h-9 rounded-md border border-ink/20 bg-paper-raised px-3 font-semibold" onClick={saver.closeConflict}>
              Discard mine, keep theirs
            </button>
          </div>
        </div>
      ) : null}

      <SetsBar
        showId={showId}
        sets={sets}
        currentId={setId}
        editable={editable}
        onAdd={async (fromHere) => {
          // A new set starts from this one's positions unless asked to start empty; 8 counts either way.
          const r = await sendJson<{ set: { id: string } }>(editorKeys.sets(showId), "POST", fromHere ? { after: setId, duplicateOf: setId, counts: 8 } : { after: setId });
          await afterSetChange();
          router.push(`/shows/${showId}/sets/${r!.set.id}`);
        }}
        onRenumber={async (number) => {
          const r = await sendJson<{ set: { version: number } }>(setPath, "PATCH", { version, number });
          saver.setVersion(r!.set.version);
          await afterSetChange();
        }}
        onCounts={async (c) => {
          const r = await sendJson<{ set: { version: number } }>(setPath, "PATCH", { version, counts: c });
          saver.setVersion(r!.set.version);
          await afterSetChange();
        }}
        onDelete={async () => {
          await sendJson(`${setPath}?version=${version}`, "DELETE");
          await afterSetChange();
          const next = sets[index + 1] ?? sets[index - 1];
          router.push(next ? `/shows/${showId}/sets/${next.id}` : `/shows/${showId}`);
        }}
      />

      <EditTools
        editable={editable}
        selectionSize={selected.length}
        canUndo={canUndo(history)}
        canRedo={canRedo(history)}
        hasPrevious={Boolean(previous.data)}
        snap={snap}
        showGrid={showGrid}
        onUndo={() => setHistory(undo)}
        onRedo={() => setHistory(redo)}
        onFace={(deg) => apply((l) => face(l, selected, deg))}
        onRemove={removeSelected}
        onForm={onForm}
        onBlock={(columns, intervalSteps) => apply((l) => fillBlock(l, selected, { columns, intervalSteps }))}
        onSnap={setSnap}
        onGrid={setShowGrid}
      />

      <div className="grid gap-3 lg:grid-cols-[minmax(0,1fr)_20rem]">
        {/* On wide screens the field stays in view while the side panel scrolls (choosing a check marks players on it). */}
        <div className="flex min-w-0 flex-col gap-2 lg:sticky lg:top-2 lg:self-start">
          {/* On a phone the field runs edge to edge: every pixel of width is scale. */}
          <div ref={fieldBox} className="-mx-4 h-[360px] sm:mx-0 sm:h-[min(62vh,560px)] sm:min-h-[320px]">
            <FieldCanvas
              rules={show.data.show.fieldRules}
              dots={dots}
              ghosts={ghosts}
              selected={selectedSet}
              flagged={flagged}
              relDb={relDb}
              listeningPoints={listeningPoints}
              selectedPointId={lpId}
              editable={editable && shownCount === null}
              showGrid={showGrid}
              snap={snap}
              placing={Boolean(placingId)}
              onSelect={(ids, mode, additive) => setSelected((cur) => (mode === "click" ? clickSelect(cur, ids[0], additive) : bandSelect(cur, ids, additive)))}
              onDragFrame={(moved) => {
                if (!preview) return;
                const m = preview.mixFor(layout, moved);
                flushSync(() => liveMix.set(m));
                const top = Math.max(...Object.values(m.performers).filter(Number.isFinite));
                return Object.fromEntries(moved.map((p) => [p.performerId, (m.performers[p.performerId] ?? -Infinity) - top]));
              }}
              onDragEnd={(ids, dx, dy) => {
                apply((l) => moveBy(l, ids, dx, dy));
                liveMix.set(null);
              }}
              onPlace={(x, y) => {
                if (!placingId) return;
                apply({ [placingId]: snap ? { x: snapToStep(x), y: snapToStep(y), facingDeg: 0 } : { x, y, facingDeg: 0 } });
                setSelected([placingId]);
                // Keep placing: the next unplaced performer follows (Esc stops).
                setPlacingId(unplaced.find((p) => p.id !== placingId)?.id ?? null);
              }}
              onFrameTime={(ms) => {
                frameTimes.current.push(ms);
                if (frameTimes.current.length > 5000) frameTimes.current.splice(0, 1000);
              }}
            />
          </div>
          <Legend flaggedBy={chosen ? (CHECK_LABELS[chosen.id] ?? chosen.id) : null} />
          {previous.data ? <TransitionPlayer playback={playback} counts={counts} from={sets[index - 1]?.number ?? ""} to={current?.number ?? ""} /> : null}
          <ListenControl
            showId={showId}
            listeningPointId={lpId}
            pointName={point?.name ?? "the listening point"}
            sets={sets}
            index={index}
            versions={{ from: previous.data?.set.version ?? null, to: version }}
            playback={previous.data ? playback : undefined}
          />
        </div>
        <aside className="flex flex-col gap-3">
          <div className="rounded-xl border border-ink/10 bg-paper-raised px-4 py-3 shadow-sm">
            <SelectionPanel
              live={liveMix}
              performers={selPerformers}
              count={selected.length}
              spot={one ? (shown[one] ?? null) : null}
              voice={one ? (voiceOf.get(one) ?? null) : null}
              contributionDbA={one ? perPerformer[one] : undefined}
              pointName={point?.name ?? "the box"}
              rules={show.data.show.fieldRules}
            />
          </div>
          <LiveMixPanel live={liveMix} mix={mix} source={!mix ? "loading" : stored ? "stored" : "preview"} pointName={point?.name ?? "the listening point"} computedAt={stored?.computedAt} />
          <ChecksPanel showId={showId} analysis={analysis.data ?? null} pointName={point?.name ?? "the listening point"} chosen={chosen?.id ?? null} stale={!stored} onChoose={chooseCheck} />
          <div className="rounded-xl border border-ink/10 bg-paper-raised p-4 shadow-sm">
            <RosterPanel
              unplaced={unplaced}
              placingId={placingId}
              editable={editable}
              onPlace={setPlacingId}
              onAdd={async (instrument, count) => {
                await sendJson(editorKeys.performers(showId), "POST", { instrument, count });
                await mutate(editorKeys.show(showId));
              }}
            />
          </div>
        </aside>
      </div>
    </div>
  );
}
