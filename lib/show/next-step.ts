// A new show's path, in the order a band builds it: the roster, then the drill, then the music.
// What a page needs decides how far along the path the show must be before the page has anything to say. Pure.

export type ShowProgress = { performers: number; placedPerformers: number; phrases: number };
export type StepNeed = "roster" | "drill" | "music";
export type NextStep = { need: StepNeed; title: string; body: string; action: string };

const STEPS: (NextStep & { done(p: ShowProgress): boolean })[] = [
  {
    need: "roster",
    title: "Add the band",
    body: "Farfield hears your band once it knows who plays what. Add performers by instrument on the show's overview.",
    action: "Add performers",
    done: (p) => p.performers > 0,
  },
  {
    need: "drill",
    title: "Place the band on the field",
    body: "What reaches the press box depends on where each player stands. Place the performers in set 1 in the field editor, then add the next sets.",
    action: "Open the field editor",
    done: (p) => p.placedPerformers > 0,
  },
  {
    need: "music",
    title: "Write the music",
    body: "The balance checks judge the melody, the bass and the rest: make a phrase and give each section its voice and written dynamic.",
    action: "Open the music page",
    done: (p) => p.phrases > 0,
  },
];

/** The first step not yet done among those `need` depends on (a page needing the music needs the roster and the drill too). */
export function nextStep(progress: ShowProgress, need: StepNeed): NextStep | null {
  const upTo = STEPS.findIndex((s) => s.need === need);
  const missing = STEPS.slice(0, upTo + 1).find((s) => !s.done(progress));
  return missing ? { need: missing.need, title: missing.title, body: missing.body, action: missing.action } : null;
}
