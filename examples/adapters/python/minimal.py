# serve.py: one optimizer under test, served to gradgate over the subprocess protocol.
import os
import sys

# Copy clients/python/gradgate_client.py next to this file; this line finds it in gradgate's repository.
sys.path.insert(0, os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "..", "..", "clients", "python"))

from gradgate_client import serve  # noqa: E402


class MySgd:
    name = "my-sgd"
    defaults = {"lr": 0.01}

    def __init__(self, hyper, dim):
        self.lr = hyper["lr"]

    def update(self, x, f, g):
        """Loss f and gradient g at the iterate x (lists of floats) -> the new iterate."""
        return [xi - self.lr * gi for xi, gi in zip(x, g)]


if __name__ == "__main__":
    sys.exit(serve([MySgd]))
