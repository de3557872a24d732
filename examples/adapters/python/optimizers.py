"""Pure-Python optimizers served to gradgate over the subprocess protocol.

Ports of three of gradgate's reference optimizers (src/optimizers/), written with the same
floating-point operations in the same order, so the harness can check that a run through the
protocol gives the metrics of the in-process reference run (tests/adapters/python-client.test.ts):

* ``sgd``       -- gradient descent, x <- x - lr*(g + weightDecay*x)                 (update form)
* ``momentum``  -- heavy-ball momentum, both ways of writing it (form "lr-inside" / "lr-outside")
* ``adam``      -- Adam (Kingma & Ba 2015, arXiv:1412.6980, Algorithm 1), with the §2 "efficient"
                   epsilon placement and coupled L2 weight decay; AMSGrad is not ported
* ``nesterov``  -- Nesterov's accelerated gradient in look-ahead form: evaluates at w - momentum*v,
                   not at the iterate, so it uses the general ``step`` generator form

Run by the harness as ``python3 optimizers.py`` (see gradgate.yml beside this file).
"""

import math
import os
import sys

sys.path.insert(0, os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "..", "..", "clients", "python"))

from gradgate_client import serve  # noqa: E402


class Sgd:
    """Gradient descent (Robbins & Monro 1951, Ann. Math. Statist. 22(3):400-407)."""

    name = "sgd"
    title = "Gradient descent, Python port of reference:sgd"
    defaults = {"lr": 0.01, "weightDecay": 0.0}

    def __init__(self, hyper, dim):
        self.lr = float(hyper["lr"])
        self.wd = float(hyper["weightDecay"])
        self.t = 0

    def update(self, x, f, g):
        lr = self.lr
        wd = self.wd
        self.t += 1
        return [xi - lr * (gi + wd * xi) for xi, gi in zip(x, g)]

    def export_state(self):
        return {"step": self.t, "lr": self.lr}

    def import_state(self, state):
        self.t = int(state["step"])
        self.lr = float(state["lr"])

    def set_learning_rate(self, lr):
        self.lr = float(lr)


class Momentum:
    """Heavy-ball momentum (Polyak 1964, USSR Comput. Math. Math. Phys. 4(5):1-17).

    "lr-inside":  v <- momentum*v + lr*g;  w <- w - v
    "lr-outside": b <- momentum*b + g;     w <- w - lr*b
    """

    name = "momentum"
    title = "Heavy-ball momentum, Python port of reference:momentum"
    defaults = {"lr": 0.01, "momentum": 0.9, "form": "lr-inside", "weightDecay": 0.0}

    def __init__(self, hyper, dim):
        self.lr = float(hyper["lr"])
        self.gamma = float(hyper["momentum"])
        self.wd = float(hyper["weightDecay"])
        if hyper["form"] not in ("lr-inside", "lr-outside"):
            raise ValueError('form must be "lr-inside" or "lr-outside", got %r' % (hyper["form"],))
        self.inside = hyper["form"] == "lr-inside"
        self.key = "velocity" if self.inside else "buffer"
        self.buf = [0.0] * dim
        self.t = 0

    def update(self, x, f, g):
        lr, gamma, wd, b = self.lr, self.gamma, self.wd, self.buf
        if self.inside:
            for i in range(len(x)):
                v = gamma * b[i] + lr * (g[i] + wd * x[i])
                b[i] = v
                x[i] -= v
        else:
            for i in range(len(x)):
                bi = gamma * b[i] + (g[i] + wd * x[i])
                b[i] = bi
                x[i] -= lr * bi
        self.t += 1
        return x

    def export_state(self):
        return {"step": self.t, "lr": self.lr, self.key: list(self.buf)}

    def import_state(self, state):
        self.t = int(state["step"])
        self.lr = float(state["lr"])
        self.buf = [float(v) for v in state[self.key]]

    def set_learning_rate(self, lr):
        self.lr = float(lr)


class Adam:
    """Adam (Kingma & Ba 2015, ICLR, arXiv:1412.6980, Algorithm 1; "efficient" form from its section 2).

    m <- b1*m + (1-b1)*g;  v <- b2*v + (1-b2)*g^2
    "corrected": x <- x - lr*(m/(1-b1^t)) / (sqrt(v/(1-b2^t)) + eps)
    "efficient": x <- x - (lr*sqrt(1-b2^t)/(1-b1^t))*m / (sqrt(v) + eps)
    """

    name = "adam"
    title = "Adam, Python port of reference:adam (no AMSGrad)"
    defaults = {
        "lr": 0.001,
        "beta1": 0.9,
        "beta2": 0.999,
        "eps": 1e-8,
        "weightDecay": 0.0,
        "amsgrad": False,
        "amsgradMax": "raw",
        "epsPlacement": "corrected",
    }

    def __init__(self, hyper, dim):
        if hyper["amsgrad"]:
            raise ValueError("amsgrad is not ported to Python; use the reference optimizer")
        self.lr = float(hyper["lr"])
        self.b1 = float(hyper["beta1"])
        self.b2 = float(hyper["beta2"])
        self.eps = float(hyper["eps"])
        self.l2 = float(hyper["weightDecay"])
        self.efficient = hyper["epsPlacement"] == "efficient"
        self.m = [0.0] * dim
        self.v = [0.0] * dim
        self.t = 0

    def update(self, x, f, g):
        t = self.t + 1
        lr, b1, b2, eps, l2 = self.lr, self.b1, self.b2, self.eps, self.l2
        m, v = self.m, self.v
        bc1 = 1 - math.pow(b1, t)
        bc2 = 1 - math.pow(b2, t)
        step_efficient = (lr * math.sqrt(bc2)) / bc1
        for i in range(len(x)):
            xi = x[i]
            gi = g[i] + l2 * xi
            mi = b1 * m[i] + (1 - b1) * gi
            vi = b2 * v[i] + (1 - b2) * gi * gi
            m[i] = mi
            v[i] = vi
            if self.efficient:
                update = (step_efficient * mi) / (math.sqrt(vi) + eps)
            else:
                update = (lr * (mi / bc1)) / (math.sqrt(vi / bc2) + eps)
            x[i] = xi - update - 0.0 * xi
        self.t = t
        return x

    def export_state(self):
        return {"step": self.t, "lr": self.lr, "m": list(self.m), "v": list(self.v)}

    def import_state(self, state):
        self.t = int(state["step"])
        self.lr = float(state["lr"])
        self.m = [float(a) for a in state["m"]]
        self.v = [float(a) for a in state["v"]]

    def set_learning_rate(self, lr):
        self.lr = float(lr)


class Nesterov:
    """Nesterov's accelerated gradient, look-ahead form (Sutskever et al. 2013, ICML, eq. 3-4).

    a = w - momentum*v;  v <- momentum*v + lr*(grad(a) + weightDecay*a);  w <- w - v
    """

    name = "nesterov"
    title = "Nesterov's accelerated gradient (look-ahead form), Python port of reference:nesterov"
    defaults = {"lr": 0.01, "momentum": 0.9, "form": "lookahead", "lrPlacement": "lr-inside", "weightDecay": 0.0}

    def __init__(self, hyper, dim):
        if hyper["form"] != "lookahead":
            raise ValueError('only form "lookahead" is ported, got %r' % (hyper["form"],))
        if hyper.get("lrPlacement", "lr-inside") != "lr-inside":
            raise ValueError('only lrPlacement "lr-inside" is ported, got %r' % (hyper["lrPlacement"],))
        self.lr = float(hyper["lr"])
        self.gamma = float(hyper["momentum"])
        self.wd = float(hyper["weightDecay"])
        self.vel = [0.0] * dim
        self.t = 0

    def step(self, x):
        gamma, lr, wd, vel = self.gamma, self.lr, self.wd, self.vel
        ahead = [x[i] - gamma * vel[i] for i in range(len(x))]
        f, g = yield ahead
        for i in range(len(x)):
            vi = gamma * vel[i] + lr * (g[i] + wd * ahead[i])
            vel[i] = vi
            x[i] -= vi
        self.t += 1
        return x

    def export_state(self):
        return {"step": self.t, "lr": self.lr, "velocity": list(self.vel)}

    def import_state(self, state):
        self.t = int(state["step"])
        self.lr = float(state["lr"])
        self.vel = [float(a) for a in state["velocity"]]

    def set_learning_rate(self, lr):
        self.lr = float(lr)


if __name__ == "__main__":
    sys.exit(serve([Sgd, Momentum, Adam, Nesterov]))
