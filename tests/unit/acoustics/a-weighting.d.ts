// Types for the a-weighting package (1.1.0), used only as an outside cross-check in tests.
declare module "a-weighting" {
  /** Linear gain of each weighting curve at a frequency in Hz, 1 at 1 kHz. */
  const weightings: Record<"a" | "b" | "c" | "d" | "m" | "z", (frequencyHz: number) => number>;
  export default weightings;
}
