// An optimizer under test in the in-process contract: an object shaped like gradgate's OptimizerFactory.
// Gradient descent, x ← x − lr·∇f(x), with the optional capabilities the scenarios use.
export const mySgd = {
  name: "my-sgd",
  title: "Gradient descent (example module)",
  defaults: { lr: 0.01 },
  create(hyper, dim) {
    const g = new Float64Array(dim); // buffers are made once, in create
    let lr = hyper.lr;
    return {
      step(x, oracle) {
        oracle.evaluate(x, g); // at the iterate itself: the harness reuses this loss for its metrics
        for (let i = 0; i < dim; i++) x[i] -= lr * g[i];
      },
      exportState: () => ({ lr }),
      importState: (state) => {
        lr = state.lr;
      },
      setLearningRate: (value) => {
        lr = value;
      },
    };
  },
};
