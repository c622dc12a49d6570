// The answer of GET …/work-progress, shared by the server's tracker and the page that shows it.
export interface WorkProgress {
  done: number;
  total: number;
  startedAt: string;
}
