/**
 * Registry of the reference optimizers: the published methods, implemented plainly in this folder,
 * that the suite runs beside (and checks) the optimizer under test.
 *
 * `OPTIMIZERS` is in a stable order (simplest first), used wherever they are listed. Each factory
 * declares its hyperparameters in `hyperSpecs`; `resolveHyper` validates a user's mapping against
 * them and `hyperJsonSchema` turns them into a JSON Schema fragment.
 */
import { InputError, quote } from "../core/errors.js";
import { adagrad } from "./adagrad.js";
import { adam } from "./adam.js";
import { adamw } from "./adamw.js";
import type { ReferenceOptimizerFactory } from "./hyper.js";
import { momentum } from "./momentum.js";
import { nesterov } from "./nesterov.js";
import { rmsprop } from "./rmsprop.js";
import { sgd } from "./sgd.js";

export {
  defaultsOf,
  describeNumberSpec,
  hyperJsonSchema,
  resolveHyper,
  type BooleanHyperSpec,
  type ChoiceHyperSpec,
  type HyperSpec,
  type HyperSpecs,
  type NumberHyperSpec,
  type ReferenceOptimizer,
  type ReferenceOptimizerFactory,
} from "./hyper.js";
export { adagrad, adam, adamw, momentum, nesterov, rmsprop, sgd };

/** All reference optimizers, in a stable order. */
export const OPTIMIZERS: readonly ReferenceOptimizerFactory[] = Object.freeze([
  sgd,
  momentum,
  nesterov,
  adagrad,
  rmsprop,
  adam,
  adamw,
]);

/** Names of the reference optimizers, in registry order. */
export const OPTIMIZER_NAMES: readonly string[] = Object.freeze(OPTIMIZERS.map((f) => f.name));

/**
 * The reference optimizer called `name`. Throws an `InputError` listing the known names otherwise;
 * `where` locates the name for the message (e.g. `config gradgate.yml: optimizers[1].name`).
 */
export function getOptimizer(name: unknown, where = "optimizer name"): ReferenceOptimizerFactory {
  const found = OPTIMIZERS.find((f) => f.name === name);
  if (found === undefined) {
    throw new InputError(
      `${where} must name a reference optimizer (known: ${OPTIMIZER_NAMES.join(", ")}), got ${quote(name)}`,
    );
  }
  return found;
}
