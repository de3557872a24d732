/**
 * The suite gradgate runs when a repository has no gradgate.yml: the seven reference optimizers on the
 * standard problems, with step sizes tuned per problem (a coarse grid 1e-4 … 1, three seeds, best median
 * final gap after 2000 steps — chosen here, not published). It is also what `npm run demo` and the
 * benchmark run. Behaviours covered: ill-conditioned quadratics (κ = 10, 100, 10⁴), curved valleys
 * (Rosenbrock, helical valley, Wood), bad scaling (Powell, Brown: per-parameter step sizes), a local
 * basin (Freudenstein–Roth), a saddle, a plateau, stochastic gradients (noisy quadratic, mini-batch
 * logistic regression and a two-layer network) and rare features (sparse least squares). Extra sets
 * expose what only shows under specific conditions: AMSGrad (its running maximum) and a large ε (where
 * ε sits relative to the square root and the bias correction).
 */
export const DEFAULT_SUITE_YAML = `# gradgate default suite
version: 1
seed: 1
seeds: 5
budget:
  steps: 2000
optimizers:
  - name: sgd
  - name: momentum
    hyper: { momentum: 0.9 }
  - name: nesterov
    hyper: { momentum: 0.9 }
  - name: adagrad
  - name: rmsprop
    sets:
      large-eps: { eps: 0.0001 }
  - name: adam
    sets:
      amsgrad: { amsgrad: true }
      large-eps: { eps: 0.01 }
  - name: adamw
problems:
  - use: quadratic
    params: { kappa: 10 }
    hyper:
      sgd: { lr: 0.01 }
      momentum: { lr: 0.001 }
      nesterov: { lr: 0.1 }
      adagrad: { lr: 0.1 }
      rmsprop: { lr: 0.001 }
      adam: { lr: 0.01 }
      adamw: { lr: 0.1 }
  - use: quadratic
    params: { kappa: 100 }
    hyper:
      sgd: { lr: 0.01 }
      momentum: { lr: 0.001 }
      nesterov: { lr: 0.001 }
      adagrad: { lr: 0.3 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.03 }
      adamw: { lr: 0.03 }
  - use: quadratic
    params: { kappa: 10000 }
    hyper:
      sgd: { lr: 0.0001 }
      momentum: { lr: 0.0003 }
      nesterov: { lr: 0.0001 }
      adagrad: { lr: 1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 1 }
      adamw: { lr: 0.1 }
  - use: rosenbrock
    hyper:
      sgd: { lr: 0.001 }
      momentum: { lr: 0.003 }
      nesterov: { lr: 0.001 }
      adagrad: { lr: 1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.1 }
      adamw: { lr: 0.03 }
  - use: freudenstein-roth
    hyper:
      sgd: { lr: 0.0001 }
      momentum: { lr: 0.0001 }
      nesterov: { lr: 0.0001 }
      adagrad: { lr: 0.03 }
      rmsprop: { lr: 0.01 }
      adam: { lr: 0.001 }
      adamw: { lr: 0.001 }
  - use: powell-badly-scaled
    optimizers: [adagrad, rmsprop, adam, adamw]
    hyper:
      adagrad: { lr: 0.0001 }
      rmsprop: { lr: 0.0001 }
      adam: { lr: 0.0001 }
      adamw: { lr: 0.0001 }
  - use: brown-badly-scaled
    optimizers: [adagrad, rmsprop, adam, adamw]
    hyper:
      adagrad: { lr: 0.1 }
      rmsprop: { lr: 0.1 }
      adam: { lr: 0.1 }
      adamw: { lr: 0.1, weightDecay: 0 }
  - use: beale
    hyper:
      sgd: { lr: 0.03 }
      momentum: { lr: 0.003 }
      nesterov: { lr: 0.003 }
      adagrad: { lr: 0.3 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.03 }
      adamw: { lr: 0.1 }
  - use: helical-valley
    hyper:
      sgd: { lr: 0.001 }
      momentum: { lr: 0.001 }
      nesterov: { lr: 0.001 }
      adagrad: { lr: 1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.3 }
      adamw: { lr: 1 }
  - use: gaussian
    hyper:
      sgd: { lr: 0.1 }
      momentum: { lr: 0.01 }
      nesterov: { lr: 0.1 }
      adagrad: { lr: 0.001 }
      rmsprop: { lr: 0.0001 }
      adam: { lr: 0.0001 }
      adamw: { lr: 0.0003 }
  - use: powell-singular
    hyper:
      sgd: { lr: 0.003 }
      momentum: { lr: 0.003 }
      nesterov: { lr: 0.003 }
      adagrad: { lr: 1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 1 }
      adamw: { lr: 0.3 }
  - use: wood
    hyper:
      sgd: { lr: 0.0003 }
      momentum: { lr: 0.0001 }
      nesterov: { lr: 0.0001 }
      adagrad: { lr: 0.1 }
      rmsprop: { lr: 0.001 }
      adam: { lr: 1 }
      adamw: { lr: 0.3 }
  - use: extended-rosenbrock
    hyper:
      sgd: { lr: 0.001 }
      momentum: { lr: 0.001 }
      nesterov: { lr: 0.001 }
      adagrad: { lr: 1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.1 }
      adamw: { lr: 0.03 }
  - use: penalty-1
    hyper:
      sgd: { lr: 0.003 }
      momentum: { lr: 0.001 }
      nesterov: { lr: 0.001 }
      adagrad: { lr: 1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.1 }
      adamw: { lr: 0.3 }
  - use: penalty-2
    hyper:
      sgd: { lr: 0.003 }
      momentum: { lr: 0.003 }
      nesterov: { lr: 0.003 }
      adagrad: { lr: 0.1 }
      rmsprop: { lr: 0.0003 }
      adam: { lr: 0.003 }
      adamw: { lr: 0.003 }
  - use: saddle
    hyper:
      sgd: { lr: 0.03 }
      momentum: { lr: 0.03 }
      nesterov: { lr: 0.3 }
      adagrad: { lr: 0.1 }
      rmsprop: { lr: 0.3 }
      adam: { lr: 0.003 }
      adamw: { lr: 0.03 }
  - use: plateau
    hyper:
      sgd: { lr: 1 }
      momentum: { lr: 0.01 }
      nesterov: { lr: 0.3 }
      adagrad: { lr: 0.1 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.003 }
      adamw: { lr: 0.003 }
  - use: noisy-quadratic
    hyper:
      sgd: { lr: 0.003 }
      momentum: { lr: 0.0003 }
      nesterov: { lr: 0.0003 }
      adagrad: { lr: 0.03 }
      rmsprop: { lr: 0.001 }
      adam: { lr: 0.003 }
      adamw: { lr: 0.003 }
  - use: sparse-least-squares
    hyper:
      sgd: { lr: 1 }
      momentum: { lr: 1 }
      nesterov: { lr: 1 }
      adagrad: { lr: 0.3 }
      rmsprop: { lr: 0.003 }
      adam: { lr: 0.01 }
      adamw: { lr: 0.3 }
  - use: logistic-regression
    hyper:
      sgd: { lr: 0.01 }
      momentum: { lr: 0.001 }
      nesterov: { lr: 0.001 }
      adagrad: { lr: 0.03 }
      rmsprop: { lr: 0.001 }
      adam: { lr: 0.003 }
      adamw: { lr: 0.003 }
  - use: two-layer-network
    hyper:
      sgd: { lr: 1 }
      momentum: { lr: 0.1 }
      nesterov: { lr: 0.1 }
      adagrad: { lr: 0.3 }
      rmsprop: { lr: 0.001 }
      adam: { lr: 0.03 }
      adamw: { lr: 0.03 }
`;
