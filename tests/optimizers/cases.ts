/**
 * Every reference optimizer in every form and option that changes its update or its state layout:
 * the table the cross-cutting tests (resume, allocation, oracle use) run over.
 */
import type { Hyper } from "../../src/core/types.js";
import type { ReferenceOptimizerFactory } from "../../src/optimizers/hyper.js";
import { adagrad, adam, adamw, momentum, nesterov, rmsprop, sgd } from "../../src/optimizers/index.js";

export interface OptimizerCase {
  readonly label: string;
  readonly factory: ReferenceOptimizerFactory;
  readonly hyper: Hyper;
}

export const CASES: readonly OptimizerCase[] = [
  { label: "sgd", factory: sgd, hyper: { lr: 0.05 } },
  { label: "sgd weightDecay", factory: sgd, hyper: { lr: 0.05, weightDecay: 0.1 } },
  {
    label: "momentum lr-inside",
    factory: momentum,
    hyper: { lr: 0.02, form: "lr-inside", weightDecay: 0.01 },
  },
  { label: "momentum lr-outside", factory: momentum, hyper: { lr: 0.02, form: "lr-outside" } },
  {
    label: "nesterov lookahead",
    factory: nesterov,
    hyper: { lr: 0.02, form: "lookahead", weightDecay: 0.01 },
  },
  { label: "nesterov stored-lookahead", factory: nesterov, hyper: { lr: 0.02, form: "stored-lookahead" } },
  {
    label: "nesterov lookahead lr-outside",
    factory: nesterov,
    hyper: { lr: 0.02, form: "lookahead", lrPlacement: "lr-outside", weightDecay: 0.01 },
  },
  {
    label: "nesterov stored-lookahead lr-outside",
    factory: nesterov,
    hyper: { lr: 0.02, form: "stored-lookahead", lrPlacement: "lr-outside" },
  },
  { label: "adagrad", factory: adagrad, hyper: { lr: 0.1, initialAccumulator: 0.1, weightDecay: 0.01 } },
  { label: "rmsprop outside", factory: rmsprop, hyper: { lr: 0.01 } },
  {
    label: "rmsprop inside",
    factory: rmsprop,
    hyper: { lr: 0.01, epsPlacement: "inside", weightDecay: 0.01 },
  },
  { label: "adam", factory: adam, hyper: { lr: 0.01 } },
  { label: "adam L2", factory: adam, hyper: { lr: 0.01, weightDecay: 0.05 } },
  { label: "adam efficient", factory: adam, hyper: { lr: 0.01, epsPlacement: "efficient", eps: 1e-3 } },
  { label: "adam amsgrad raw", factory: adam, hyper: { lr: 0.01, amsgrad: true } },
  {
    label: "adam amsgrad corrected",
    factory: adam,
    hyper: { lr: 0.01, amsgrad: true, amsgradMax: "corrected" },
  },
  {
    label: "adam amsgrad corrected efficient",
    factory: adam,
    hyper: { lr: 0.01, amsgrad: true, amsgradMax: "corrected", epsPlacement: "efficient" },
  },
  { label: "adamw", factory: adamw, hyper: { lr: 0.01 } },
  {
    label: "adamw unscaled",
    factory: adamw,
    hyper: { lr: 0.01, weightDecay: 0.001, decayScaledByLr: false },
  },
  { label: "adamw amsgrad", factory: adamw, hyper: { lr: 0.01, amsgrad: true } },
];
