// Sections in score order: woodwinds, brass, battery, front ensemble (common practice, no source).
import { describe, expect, it } from "vitest";
import { sectionsInScoreOrder } from "@/lib/show/score-order";

describe("sectionsInScoreOrder", () => {
  it("reads woodwinds, brass, battery, front ensemble, whatever order the roster lists them in", () => {
    const roster = [
      { section: "Snares", instrument: "snare" },
      { section: "Tubas", instrument: "tuba" },
      { section: "Front Ensemble", instrument: "marimba" },
      { section: "Trumpets", instrument: "trumpet" },
      { section: "Trumpets", instrument: "trumpet" },
      { section: "Clarinets", instrument: "clarinet" },
      { section: "Flutes", instrument: "flute" },
    ];
    const order = sectionsInScoreOrder(roster).map((s) => s.name);
    const at = (name: string) => order.indexOf(name);
    expect(at("Flutes")).toBeLessThan(at("Trumpets"));
    expect(at("Clarinets")).toBeLessThan(at("Trumpets"));
    expect(at("Trumpets")).toBeLessThan(at("Tubas"));
    expect(at("Tubas")).toBeLessThan(at("Snares"));
    expect(at("Snares")).toBeLessThan(at("Front Ensemble"));
    expect(sectionsInScoreOrder(roster).find((s) => s.name === "Trumpets")!.players).toBe(2);
  });

  it("places a section by its highest-scored instrument, and instruments of the program's own last, by name", () => {
    const order = sectionsInScoreOrder([
      { section: "Zithers", instrument: "zither" },
      { section: "Bagpipes", instrument: "bagpipe" },
      { section: "Low brass", instrument: "tuba" },
      { section: "Low brass", instrument: "trombone" },
      { section: "Horns", instrument: "mellophone" },
      { section: "Basses", instrument: "tuba" },
    ]).map((s) => s.name);
    expect(order.slice(-2)).toEqual(["Bagpipes", "Zithers"]);
    // Trombones and tubas: placed by the trombone, still after the mellophones (the catalog's brass run trumpet, mellophone, trombone, baritone, tuba).
    expect(order.slice(0, 3)).toEqual(["Horns", "Low brass", "Basses"]);
  });
});
