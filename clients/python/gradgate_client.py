"""gradgate_client: serve Python optimizers to gradgate over its subprocess protocol (version 1).

Standard library only; Python 3.8 or newer. Copy this one file next to your optimizers.

An optimizer is a class with a ``name`` (and optionally ``title`` and ``defaults``), a constructor
``__init__(self, hyper, dim)`` and one of two step methods:

* ``update(self, x, f, g)`` -- the gradient-at-the-iterate form. The harness gives the loss ``f`` and
  the gradient ``g`` (a list of floats) at the current iterate ``x`` (a list of floats); return the
  new iterate as a list of floats (updating ``x`` in place and returning it is fine).
* ``step(self, x)`` -- the general form, a generator. ``f, g = yield point`` asks for the loss and
  gradient at any point (a list of floats), as often as the method needs; ``return new_x`` ends the
  step. Yield ``x`` itself (the same list object) to evaluate at the iterate.

Optional capabilities, declared by defining the methods:

* ``export_state(self)`` -> dict of numbers and lists of numbers, and ``import_state(self, state)``:
  the resume scenario stops a run, exports the state and continues in a fresh instance;
* ``set_learning_rate(self, lr)``: the learning-rate-change scenario changes it between steps.

Then call ``serve([MyOptimizer, ...])`` from the script named in the suite config. Anything the
optimizers print goes to stderr (stdout carries the protocol). An exception raised by optimizer code
ends that run only, with the exception's text as its error. Loss or gradient values that are not
finite reach the optimizer as ``float("nan")``; an iterate or point that is not finite is reported
as such and the harness records the run as diverged.

The protocol (messages, fields, order) is described in docs/adapters.md and its JSON Schemas ship in
schema/protocol/.
"""

import json
import sys

PROTOCOL = 1
CLIENT = "gradgate_client.py 1"
NAN = float("nan")

__all__ = ["serve", "PROTOCOL"]


class _Run:
    """One run: an optimizer instance, its iterate and where it is in its step."""

    __slots__ = ("opt", "x", "update", "gen", "done", "pause", "held")

    def __init__(self, opt, x, pause):
        self.opt = opt
        self.x = x
        self.update = getattr(opt, "update", None)
        self.gen = None  # the running step generator (general form)
        self.done = 0  # steps completed by this instance
        self.pause = pause  # pause after this step of the instance, or None
        self.held = None  # iterate of an evaluation-free step, reported when resumed


def _describe(cls):
    caps = []
    if callable(getattr(cls, "export_state", None)) and callable(getattr(cls, "import_state", None)):
        caps.append("state")
    if callable(getattr(cls, "set_learning_rate", None)):
        caps.append("lr")
    entry = {"name": cls.name, "capabilities": caps}
    title = getattr(cls, "title", None)
    if title:
        entry["title"] = str(title)
    defaults = getattr(cls, "defaults", None)
    if defaults:
        entry["defaults"] = dict(defaults)
    if not callable(getattr(cls, "update", None)) and not callable(getattr(cls, "step", None)):
        raise TypeError("optimizer %r needs an update(x, f, g) or a step(x) generator method" % (cls.name,))
    return entry


def _text(err):
    text = "%s: %s" % (type(err).__name__, err)
    return text if len(text) <= 500 else text[:497] + "..."


def serve(optimizers, stdin=None, stdout=None):
    """Serves the optimizer classes until the harness says bye (or closes stdin). Returns 0."""
    out = stdout if stdout is not None else sys.stdout.buffer
    inp = stdin if stdin is not None else sys.stdin.buffer
    if stdout is None:
        # Stray print() calls must not corrupt the protocol stream.
        sys.stdout = sys.stderr
    classes = {}
    described = []
    for cls in optimizers:
        described.append(_describe(cls))
        classes[cls.name] = cls
    loads = json.loads
    encoder = json.JSONEncoder(allow_nan=False, separators=(",", ":"), check_circular=False)
    dumps = encoder.encode
    write = out.write
    flush = out.flush

    hello = loads(inp.readline() or b"null")
    if not isinstance(hello, dict) or hello.get("type") != "hello":
        sys.stderr.write("gradgate_client: expected a hello message first, got %r\n" % (hello,))
        return 2
    if PROTOCOL not in hello.get("protocols", ()):
        sys.stderr.write("gradgate_client: the harness speaks protocols %r, this client %d\n" % (hello.get("protocols"), PROTOCOL))
        return 2
    write(json.dumps({"type": "ready", "protocol": PROTOCOL, "client": CLIENT, "optimizers": described}).encode() + b"\n")
    flush()

    runs = {}
    readline = inp.readline
    while True:
        line = readline()
        if not line:
            return 0
        msg = loads(line)
        kind = msg.get("type")
        if kind == "bye":
            return 0
        if kind != "orders":
            sys.stderr.write("gradgate_client: unexpected message %r\n" % (line[:200],))
            return 2
        steps = []
        evals = []
        states = []
        failed = []
        add_step = steps.append
        add_eval = evals.append

        def fail(rid, phase, err):
            failed.append({"run": rid, "phase": phase, "message": _text(err)})
            runs.pop(rid, None)

        def after_step(rid, run, x):
            """Step completed with iterate x: report it, then begin the next step unless pausing."""
            run.x = x
            run.done += 1
            if run.pause is not None and run.done == run.pause:
                add_step({"run": rid, "x": x})
                return
            if run.update is not None:
                add_step({"run": rid, "x": x, "eval": True})
                return
            begin_general(rid, run, x)

        def begin_general(rid, run, x):
            gen = run.opt.step(x)
            try:
                point = next(gen)
            except StopIteration as stop:
                # A step without evaluations: report x now; the next iterate when the harness resumes us.
                add_step({"run": rid, "x": x})
                run.held = stop.value
                return
            run.gen = gen
            if point is x:
                add_step({"run": rid, "x": x, "eval": True})
            else:
                add_step({"run": rid, "x": x})
                add_eval({"run": rid, "x": point})

        def begin(rid, run):
            """The run stands at a step boundary whose iterate is already reported: start a step."""
            if run.update is not None:
                add_eval({"run": rid, "x": run.x})
                return
            gen = run.opt.step(run.x)
            try:
                point = next(gen)
            except StopIteration as stop:
                after_step(rid, run, stop.value)
                return
            run.gen = gen
            add_eval({"run": rid, "x": point})

        for rid in msg.get("end", ()):
            runs.pop(rid, None)

        for e in msg.get("start", ()):
            rid = e["run"]
            phase = "create"
            try:
                cls = classes.get(e["optimizer"])
                if cls is None:
                    raise KeyError("no optimizer named %r here" % (e["optimizer"],))
                opt = cls(dict(e["hyper"]), e["dim"])
                run = _Run(opt, list(e["x"]), e.get("pause"))
                if "state" in e:
                    phase = "importState"
                    opt.import_state(e["state"])
                runs[rid] = run
                phase = "step"
                begin(rid, run)
            except Exception as err:  # noqa: BLE001 - optimizer code
                fail(rid, phase, err)

        get_run = runs.get
        for v in msg.get("values", ()):
            rid = v["run"]
            run = get_run(rid)
            if run is None:
                continue
            f = v["f"]
            g = v["g"]
            if f is None:
                f = NAN
            if None in g:
                g = [NAN if a is None else a for a in g]
            update = run.update
            if update is not None:
                # The gradient-at-the-iterate form, inlined: this loop is the client's hot path.
                try:
                    x = update(run.x, f, g)
                except Exception as err:  # noqa: BLE001 - optimizer code
                    fail(rid, "step", err)
                    continue
                run.x = x
                run.done += 1
                if run.done == run.pause:
                    add_step({"run": rid, "x": x})
                else:
                    add_step({"run": rid, "x": x, "eval": True})
                continue
            try:
                try:
                    point = run.gen.send((f, g))
                except StopIteration as stop:
                    run.gen = None
                    after_step(rid, run, stop.value)
                    continue
                add_eval({"run": rid, "x": point})
            except Exception as err:  # noqa: BLE001 - optimizer code
                fail(rid, "step", err)

        for e in msg.get("resume", ()):
            rid = e["run"]
            run = runs.get(rid)
            if run is None:
                continue
            phase = "setLearningRate"
            try:
                if "lr" in e:
                    run.opt.set_learning_rate(e["lr"])
                if "pause" in e:
                    run.pause = e["pause"]
                phase = "step"
                if run.held is not None:
                    # The evaluation-free step computed last turn: report it now.
                    x = run.held
                    run.held = None
                    after_step(rid, run, x)
                else:
                    begin(rid, run)
            except Exception as err:  # noqa: BLE001 - optimizer code
                fail(rid, phase, err)

        for rid in msg.get("exportState", ()):
            run = runs.get(rid)
            if run is None:
                continue
            try:
                states.append({"run": rid, "state": run.opt.export_state()})
            except Exception as err:  # noqa: BLE001 - optimizer code
                fail(rid, "exportState", err)

        report = {"type": "report"}
        if steps:
            report["steps"] = steps
        if evals:
            report["evals"] = evals
        if states:
            report["states"] = states
        if failed:
            report["failed"] = failed
        try:
            text = dumps(report)
        except (ValueError, RecursionError):
            # A non-finite number (or, from export_state, a structure that is not a tree).
            text = dumps(_without_non_finite(report))
        write(text.encode() + b"\n")
        flush()


def _finite(values):
    for v in values:
        if v != v or v in (float("inf"), float("-inf")):
            return False
    return True


def _without_non_finite(report):
    """A non-finite iterate or point is sent as null; a state with one becomes a failure."""
    for section in ("steps", "evals"):
        for entry in report.get(section, ()):
            if entry["x"] is not None and not _finite(entry["x"]):
                entry["x"] = None
    kept = []
    for entry in report.get("states", ()):
        try:
            json.dumps(entry["state"], allow_nan=False)
            kept.append(entry)
        except ValueError:
            report.setdefault("failed", []).append(
                {"run": entry["run"], "phase": "exportState", "message": "the state holds a number that is not finite"}
            )
    if "states" in report:
        report["states"] = kept
    return report
