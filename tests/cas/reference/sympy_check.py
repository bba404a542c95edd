"""SymPy reference for the step corpus (Debian python3-sympy).

Reads one JSON job per line on stdin, prints one JSON line per job:
{"id", "verdict": "verified" | "refuted" | "undecided", "ms"}. Decisions are
SymPy's own: simplify(lhs - rhs) == 0 for identities, solve() on the previous
step then simplify for consequences, its own Euler-Lagrange expression, limit().
Only the expression trees come from Vierbein's reader, printed as SymPy source.
"""
import json
import sys
import time

import sympy
from sympy import Function, Rational, Symbol, diff, limit, oo, simplify, solve


def decide(job):
    positive = set(job["positive"])
    symbols = {}
    defined = dict(job["definitions"])
    expanding = set()

    def V(name):
        # A defined name reads as its definition, so diff(V_eff, r) differentiates the right-hand side.
        if name in defined and name not in expanding:
            expanding.add(name)
            try:
                return read(defined[name])
            finally:
                expanding.discard(name)
        if name not in symbols:
            symbols[name] = Symbol(name, positive=True) if name in positive else Symbol(name, real=True)
        return symbols[name]

    functions = {}

    def F(name):
        return functions.setdefault(name, Function(name))

    chains = job["chains"]
    parameter = job["parameter"]

    def TD(e):
        """Total derivative along the curve: every coordinate and its dots move."""
        out = diff(e, V(parameter))
        for chain in chains:
            for k in range(len(chain) - 1):
                out += diff(e, V(chain[k])) * V(chain[k + 1])
        return out

    namespace = dict(vars(sympy))
    namespace.update({"V": V, "F": F, "TD": TD, "R": Rational})

    def read(src):
        return None if src is None else eval(src, namespace)

    definitions = [(V(n), read(s)) for n, s in job["definitions"]]
    fixed = {}
    for n, s in job["fixed"]:
        fixed[V(n)] = read(s)
        for chain in chains:
            if chain[0] == n and not read(s).free_symbols:
                for derived in chain[1:] + ["d_" + n]:
                    fixed[V(derived)] = 0

    def prepare(e):
        if e is None:
            return None
        for _ in range(len(definitions) + 1):
            e = e.subs(dict(definitions))
        e = e.doit()
        if job["link"]:
            e = e.subs({V("d_" + chain[0]): V(chain[1]) * V("d_" + parameter) for chain in chains})
        e = e.subs(fixed)
        # r > r_s: write r = r_s + excess with a positive excess, the usual way to hand SymPy an inequality.
        for name, lower in job.get("bounds", []):
            e = e.subs(V(name), read(lower) + Symbol(name + "_excess", positive=True))
        return e

    kind = job["kind"]
    if kind == "definition":
        lhs = job["name"]
        defined.pop(lhs, None)
        rhs = read(job["to"][1])
        return "refuted" if V(lhs) in rhs.free_symbols else "verified"

    to_l, to_r = (prepare(read(s)) for s in job["to"])
    claim = to_l - to_r
    if kind == "identity":
        return "verified" if simplify(claim) == 0 else "refuted"
    if kind == "expr-equal":
        return "verified" if simplify(prepare(read(job["from"][0])) - to_l) == 0 else "refuted"
    if kind == "limit":
        # For relations, lim(lhs - rhs) of the previous step against lhs - rhs of the new one.
        lim = limit(read(job["from"][0]) - read(job["from"][1]), V(job["symbol"]), oo)
        return "verified" if simplify(prepare(lim) - claim) == 0 else "refuted"
    if kind == "euler-lagrange":
        lagrangian = read(job["from"][0])
        x = job["coordinate"]
        chain = next(c for c in chains if c[0] == x)
        el = prepare(TD(diff(lagrangian, V(chain[1]))) - diff(lagrangian, V(x)))
        acc = V(chain[2])
        roots = solve(el, acc)
        if not roots:
            return "undecided"
        if any(simplify(claim.subs(acc, r)) != 0 for r in roots):
            return "refuted"
        back = solve(claim, acc)
        if not back or any(simplify(el.subs(acc, r)) != 0 for r in back):
            return "refuted"
        return "verified"
    if kind == "implies":
        premise = prepare(read(job["from"][0])) - prepare(read(job["from"][1]))
        names = sorted(premise.free_symbols, key=lambda s: (str(s) not in job["signed"], str(s)))
        for v in names:
            if str(v) == "d_" + parameter or v in fixed:
                continue
            roots = solve(premise, v)
            if not roots:
                continue
            return "verified" if all(simplify(claim.subs(v, r)) == 0 for r in roots) else "refuted"
        return "undecided"
    return "undecided"


for line in sys.stdin:
    job = json.loads(line)
    start = time.perf_counter()
    try:
        verdict = decide(job)
    except Exception as err:  # a reference failure is reported, not fatal
        verdict = "undecided: " + type(err).__name__
    print(json.dumps({"id": job["id"], "verdict": verdict, "ms": (time.perf_counter() - start) * 1000}), flush=True)
