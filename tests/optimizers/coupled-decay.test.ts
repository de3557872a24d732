import { describe, it } from "vitest";
import type { Hyper } from "../../src/core/types.js";
import type { ReferenceOptimizerFactory } from "../../src/optimizers/hyper.js";
import { adagrad, adam, momentum, nesterov, rmsprop, sgd } from "../../src/optimizers/index.js";
import { DiagonalQuadratic, expectRelClose, run, vec } from "./helpers.js";

// Coupled L2 adds λ·x to the gradient of f, so on f = ½Σaᵢxᵢ² it must act exactly like the plain
// optimizer on ½Σ(aᵢ + λ)xᵢ² [recomputed: ∇ = a⊙x + λx = (a + λ)⊙x]. Not bit for bit: a·x + λ·x and
// (a + λ)·x round differently, hence a relative tolerance.
const rows: { label: string; factory: ReferenceOptimizerFactory; hyper: Hyper }[] = [
  { label: "sgd", factory: sgd, hyper: { lr: 0.05 } },
  { label: "momentum lr-inside", factory: momentum, hyper: { lr: 0.02, form: "lr-inside" } },
  { label: "momentum lr-outside", factory: momentum, hyper: { lr: 0.02, form: "lr-outside" } },
  { label: "nesterov lookahead", factory: nesterov, hyper: { lr: 0.02, form: "lookahead" } },
  { label: "nesterov stored-lookahead", factory: nesterov, hyper: { lr: 0.02, form: "stored-lookahead" } },
  { label: "adagrad", factory: adagrad, hyper: { lr: 0.1 } },
  { label: "rmsprop", factory: rmsprop, hyper: { lr: 0.01 } },
  { label: "adam", factory: adam, hyper: { lr: 0.01 } },
];

describe("coupled weightDecay λ equals the plain method on the shifted quadratic", () => {
  const a = vec(1, 4, 0.2);
  const lambda = 0.3;
  const shifted = Float64Array.from(a, (ai) => ai + lambda);
  it.each(rows.map((r) => [r.label, r] as const))("%s", (_label, r) => {
    const withDecay = run(
      r.factory.create({ ...r.hyper, weightDecay: lambda }, 3),
      vec(2, -1, 3),
      new DiagonalQuadratic(a),
      60,
    );
    const plain = run(r.factory.create(r.hyper, 3), vec(2, -1, 3), new DiagonalQuadratic(shifted), 60);
    // relative per coordinate: 60 steps of a few roundings each
    for (let i = 0; i < 3; i++) expectRelClose(withDecay[i], plain[i], 1e-11, `coordinate ${i}`);
  });
});
