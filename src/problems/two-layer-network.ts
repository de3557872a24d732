/**
 * Two-layer tanh network regression on data from a teacher network of the same shape.
 *
 * What it is for: a small nonconvex training problem with the structure of real ones (layers,
 * saturating units, permutation symmetry, mini-batch noise) whose global minimum is known: the
 * targets come from a teacher network of the same shape, so f* = 0 is attained (at the teacher's
 * weights and at their images under hidden-unit permutations and sign flips (w₁ₖ, b₁ₖ, w₂ₖ) →
 * −(w₁ₖ, b₁ₖ, w₂ₖ)). A student may still stall at a local minimum or plateau with f > 0.
 *
 * Network with d inputs, h hidden units, one output: ŷ(x) = Σₖ w₂ₖ tanh(W₁ₖ·x + b₁ₖ) + b₂.
 * Parameters θ (dimension h(d + 2) + 1), in this order: W₁ (h×d, row-major), b₁ (h), w₂ (h), b₂.
 * f(θ) = (1/m) Σᵢ ½(ŷ(xᵢ) − yᵢ)², yᵢ = ŷ_teacher(xᵢ). With rᵢ = ŷ(xᵢ) − yᵢ and zₖ = tanh(aₖ):
 * ∂/∂b₂ = r, ∂/∂w₂ₖ = r·zₖ, ∂/∂b₁ₖ = δₖ = r·w₂ₖ(1 − zₖ²), ∂/∂W₁ₖⱼ = δₖ·xⱼ (averaged over the batch).
 * Fixed structure, drawn from `structureRng("two-layer-network[d=…,h=…,m=…]", seed)` in this order:
 * teacher W₁ ~ N(0, 1/d), b₁ ~ N(0, 1/4), w₂ ~ N(0, 1/h), b₂ ~ N(0, 1/4); inputs X (m×d) ~ N(0, 1);
 * then the standard start (the student's initialisation): W₁ ~ N(0, 1/d), w₂ ~ N(0, 1/h), biases 0
 * (variance 1/fan-in: LeCun, Bottou, Orr & Müller (1998), "Efficient BackProp", in Neural Networks:
 * Tricks of the Trade, LNCS 1524, volume from memory). Targets are computed by the same routine that evaluates the
 * student, so f(θ_teacher) = 0 exactly. x* reported is the teacher's θ (one of the global minimisers).
 * Mini-batches (param `batch` > 0, default 16): `batch` examples drawn uniformly with replacement from
 * the run's noise stream (one `nextBelow(m)` each); unbiased estimates of f and ∇f. `batch = 0` is the
 * full batch.
 *
 * Source: constructed here (common practice), after the teacher–student setting of Saad & Solla
 * (1995), "On-line learning in soft committee machines", Phys. Rev. E 52(4) (volume and issue from
 * memory).
 * Start perturbation: ±(1% of |θ0ᵢ| + 0.001) uniform per coordinate (so zero biases move too).
 * Cost: O(m·h·d) flops and m·h tanh per full-batch evaluation; O(batch·h·d) per mini-batch;
 * `measureEvery` is 5 because the exact objective costs a full pass.
 */
import type { Pcg32 } from "../core/rng.js";
import { structureRng } from "../core/rng.js";
import type { ProblemDefinition, ProblemInstance, ProblemParams, ProblemRunContext } from "../core/types.js";
import { prepare, structureKey } from "./params.js";
import { cached, halfWidths, writeStart } from "./util.js";

/** Teacher, inputs, targets and the student's standard start of one parameter set. */
export interface NetworkData {
  readonly d: number;
  readonly h: number;
  readonly m: number;
  readonly teacher: Float64Array;
  /** Inputs, row-major m×d. */
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly start: Float64Array;
}

const DATA = new Map<string, NetworkData>();

/**
 * Network output at input row `xi` (offset into `x`); writes the hidden activations into `z`. Used to
 * build the targets; `evaluate` and `objective` repeat the same arithmetic in the same order (so
 * f(θ_teacher) is exactly 0).
 */
function forward(
  theta: Float64Array,
  d: number,
  h: number,
  x: Float64Array,
  xi: number,
  z: Float64Array,
): number {
  const b1 = h * d;
  const w2 = b1 + h;
  let out = theta[w2 + h];
  for (let k = 0; k < h; k++) {
    let a = theta[b1 + k];
    const row = k * d;
    for (let j = 0; j < d; j++) a += theta[row + j] * x[xi + j];
    const zk = Math.tanh(a);
    z[k] = zk;
    out += theta[w2 + k] * zk;
  }
  return out;
}

function buildData(rng: Pcg32, d: number, h: number, m: number): NetworkData {
  const dim = h * (d + 2) + 1;
  const b1 = h * d;
  const w2 = b1 + h;
  const teacher = new Float64Array(dim);
  for (let i = 0; i < b1; i++) teacher[i] = rng.nextNormal() / Math.sqrt(d);
  for (let k = 0; k < h; k++) teacher[b1 + k] = 0.5 * rng.nextNormal();
  for (let k = 0; k < h; k++) teacher[w2 + k] = rng.nextNormal() / Math.sqrt(h);
  teacher[w2 + h] = 0.5 * rng.nextNormal();
  const x = new Float64Array(m * d);
  for (let i = 0; i < m * d; i++) x[i] = rng.nextNormal();
  const z = new Float64Array(h);
  const y = new Float64Array(m);
  for (let i = 0; i < m; i++) y[i] = forward(teacher, d, h, x, i * d, z);
  const start = new Float64Array(dim);
  for (let i = 0; i < b1; i++) start[i] = rng.nextNormal() / Math.sqrt(d);
  for (let k = 0; k < h; k++) start[w2 + k] = rng.nextNormal() / Math.sqrt(h);
  return { d, h, m, teacher, x, y, start };
}

export const twoLayerNetwork: ProblemDefinition = {
  name: "two-layer-network",
  title: "Two-layer tanh network, regression on a same-shape teacher (f* = 0 attained)",
  tags: ["nonconvex", "stochastic", "mini-batch", "machine-learning", "neural-network"],
  source:
    'Constructed here (common practice), after the teacher–student setting of Saad & Solla (1995), "On-line learning in soft committee machines", Phys. Rev. E 52(4)',
  fStarNote:
    "f* = 0 by construction: the targets are the outputs of a teacher network of the same shape, reached exactly at the teacher's weights (and their symmetric images).",
  params: {
    d: { default: 3, min: 1, max: 1000, integer: true, description: "number of inputs" },
    h: { default: 5, min: 1, max: 1000, integer: true, description: "number of hidden tanh units" },
    m: { default: 64, min: 1, max: 1000000, integer: true, description: "number of training examples" },
    batch: {
      default: 16,
      min: 0,
      max: 1000000,
      integer: true,
      description: "mini-batch size; 0 = full batch",
    },
    seed: {
      default: 0,
      min: 0,
      max: 4294967295,
      integer: true,
      description: "structure seed (teacher, data, init)",
    },
  },
  // The exact objective is a full pass over m examples (≈ m/batch = 4 mini-batch evaluations).
  measureEvery: 5,
  create: (params, ctx) => createTwoLayerNetwork(params, ctx),
};

/** The fixed structure of a parameter set (shared, read-only). */
export function networkData(params: ProblemParams): NetworkData {
  const { p } = prepare(twoLayerNetwork, params);
  const sKey = structureKey(twoLayerNetwork.name, p, ["d", "h", "m"]);
  return cached(DATA, `${sKey}#${p.seed}`, () => buildData(structureRng(sKey, p.seed), p.d, p.h, p.m));
}

function createTwoLayerNetwork(params: ProblemParams, ctx: ProblemRunContext): ProblemInstance {
  const { p, key } = prepare(twoLayerNetwork, params);
  const data = networkData(p);
  const { d, h, m, x, y } = data;
  const dim = h * (d + 2) + 1;
  const b1 = h * d;
  const w2 = b1 + h;
  const batch = p.batch;
  const noise = ctx.noise;
  const z = new Float64Array(h);
  const widths = halfWidths(data.start);

  // The per-example work is written out inside each loop (no helper returning a double), so that no
  // call in the hot loop depends on V8 inlining it to avoid boxing its result.
  const evaluate = (theta: Float64Array, g: Float64Array): number => {
    g.fill(0);
    const count = batch > 0 ? batch : m;
    const w = 1 / count;
    let s = 0;
    for (let t = 0; t < count; t++) {
      const i = batch > 0 ? noise.nextBelow(m) : t;
      const xi = i * d;
      let out = theta[w2 + h];
      for (let k = 0; k < h; k++) {
        let a = theta[b1 + k];
        const row = k * d;
        for (let j = 0; j < d; j++) a += theta[row + j] * x[xi + j];
        const zk = Math.tanh(a);
        z[k] = zk;
        out += theta[w2 + k] * zk;
      }
      const r = out - y[i];
      s += r * r;
      const wr = w * r;
      g[w2 + h] += wr;
      for (let k = 0; k < h; k++) {
        const zk = z[k];
        g[w2 + k] += wr * zk;
        const delta = wr * theta[w2 + k] * (1 - zk * zk);
        g[b1 + k] += delta;
        const row = k * d;
        for (let j = 0; j < d; j++) g[row + j] += delta * x[xi + j];
      }
    }
    return (0.5 * s) / count;
  };
  const objective = (theta: Float64Array): number => {
    let s = 0;
    for (let i = 0; i < m; i++) {
      const xi = i * d;
      let out = theta[w2 + h];
      for (let k = 0; k < h; k++) {
        let a = theta[b1 + k];
        const row = k * d;
        for (let j = 0; j < d; j++) a += theta[row + j] * x[xi + j];
        out += theta[w2 + k] * Math.tanh(a);
      }
      const r = out - y[i];
      s += r * r;
    }
    return (0.5 * s) / m;
  };
  return {
    key,
    dim,
    fStar: 0,
    fStarKind: "computed",
    xStar: Float64Array.from(data.teacher),
    stochastic: batch > 0,
    evaluate,
    objective,
    start: (out, rng) => writeStart(out, data.start, widths, rng, twoLayerNetwork.name),
  };
}
