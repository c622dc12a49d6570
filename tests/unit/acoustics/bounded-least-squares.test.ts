import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { boundedLeastSquares, type ResidualModel } from "@/lib/acoustics/bounded-least-squares";

// Rosenbrock's function as residuals r1 = 10(x2 − x1²), r2 = 1 − x1, started at (−1.2, 1): problem 1 of
// Moré, Garbow and Hillstrom, "Testing Unconstrained Optimization Software", ACM TOMS 7(1), 1981,
// minimum 0 at (1, 1) (from memory).
const rosenbrock: ResidualModel = {
  evaluate: ([x1, x2]) => ({
    r: [10 * (x2! - x1! * x1!), 1 - x1!],
    J: [
      { cols: [0, 1], vals: [-20 * x1!, 10] },
      { cols: [0], vals: [-1] },
    ],
  }),
};

describe("boundedLeastSquares", () => {
  it("finds the minimum of Rosenbrock's function from the standard start", () => {
    const { x, cost } = boundedLeastSquares(rosenbrock, [-1.2, 1], [-5, -5], [5, 5]);
    expect(cost).toBeLessThan(1e-8);
    expect(x[0]).toBeCloseTo(1, 3);
    expect(x[1]).toBeCloseTo(1, 3);
  });

  it("stops on an active bound: with x1 ≤ 0.5 the minimum is x = (0.5, 0.25), cost 0.25", () => {
    // On the bound, 100(x2 − 0.25)² + 0.25 is least at x2 = 0.25; inside, the cost falls towards x1 = 1,
    // so the bound holds (worked by hand).
    const { x, cost } = boundedLeastSquares(rosenbrock, [-1.2, 1], [-5, -5], [0.5, 5]);
    expect(x[0]).toBeCloseTo(0.5, 6);
    expect(x[1]).toBeCloseTo(0.25, 3);
    expect(cost).toBeCloseTo(0.25, 5);
  });

  it("solves a linear least-squares problem exactly, within the bounds it is given (property)", () => {
    // r = A x − b with A invertible (diagonally dominant): the unbounded minimum is A⁻¹b with cost 0;
    // with the box around it, the solve must find it.
    fc.assert(
      fc.property(fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 3, maxLength: 3 }), fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 9, maxLength: 9 }), (target, offDiagonal) => {
        const A = [0, 1, 2].map((i) => [0, 1, 2].map((j) => (i === j ? 4 : offDiagonal[3 * i + j]!)));
        const b = A.map((row) => row.reduce((s, a, j) => s + a * target[j]!, 0));
        const model: ResidualModel = {
          evaluate: (x) => ({
            r: A.map((row, i) => row.reduce((s, a, j) => s + a * x[j]!, -b[i]!)),
            J: A.map((row) => ({ cols: [0, 1, 2], vals: row })),
          }),
        };
        const { x, cost } = boundedLeastSquares(model, [0, 0, 0], [-10, -10, -10], [10, 10, 10]);
        expect(cost).toBeLessThan(1e-8);
        x.forEach((v, j) => expect(Math.abs(v - target[j]!)).toBeLessThan(1e-4));
      }),
      { numRuns: 60 },
    );
  });
});
