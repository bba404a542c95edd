# Reference curvature values from SymPy (Debian python3-sympy), for the
# component-by-component comparison in curvature-sheet.test.ts.
# Reads {"coordinates", "components" (plain syntax), "functions", "points": [{name: value}]}
# on stdin; prints, per point, Γ^a_bc, R^a_bcd, R_ab, R, G_ab and K evaluated there.
# Jets of undetermined functions are named like the TypeScript side: "A[1](r)" = A'(r).
import json, sys
import sympy as sp

req = json.load(sys.stdin)
coords = [sp.Symbol(c) for c in req["coordinates"]]
n = len(coords)
funcs = {f: sp.Function(f) for f in req.get("functions", [])}
ns = {c.name: c for c in coords}
ns.update(funcs)
import re
BUILTINS = {"sin", "cos", "tan", "exp", "log", "sqrt", "pi"}
def read(s):
    # every other identifier is a plain symbol (so "Lambda", "E", "S" are not SymPy objects)
    for name in re.findall(r"[A-Za-z][A-Za-z0-9_]*", s):
        if name not in BUILTINS and name not in ns:
            ns[name] = sp.Symbol(name)
    return sp.sympify(s.replace("^", "**"), locals=ns)
g = sp.Matrix(n, n, lambda i, j: read(req["components"][i][j]))
ginv = g.inv()
gamma = [[[sum(ginv[a, d] * (sp.diff(g[d, c], coords[b]) + sp.diff(g[d, b], coords[c]) - sp.diff(g[b, c], coords[d])) for d in range(n)) / 2
           for c in range(n)] for b in range(n)] for a in range(n)]
riem = [[[[sp.diff(gamma[a][d][b], coords[c]) - sp.diff(gamma[a][c][b], coords[d])
           + sum(gamma[a][c][e] * gamma[e][d][b] - gamma[a][d][e] * gamma[e][c][b] for e in range(n))
           for d in range(n)] for c in range(n)] for b in range(n)] for a in range(n)]
ric = [[sum(riem[a][b][a][d] for a in range(n)) for d in range(n)] for b in range(n)]
scal = sum(ginv[b, d] * ric[b][d] for b in range(n) for d in range(n))
ein = [[ric[a][b] - scal * g[a, b] / 2 for b in range(n)] for a in range(n)]
down = [[[[sum(g[a, e] * riem[e][b][c][d] for e in range(n)) for d in range(n)] for c in range(n)] for b in range(n)] for a in range(n)]

def jets(point):
    subs = []
    for f, fn in funcs.items():
        for key, val in point.items():
            if key.startswith(f + "["):
                orders = [int(x) for x in key[len(f) + 1:key.index("]")].split(",")]
                args = [sp.Symbol(a) for a in key[key.index("(") + 1:-1].split(",")]
                base = fn(*args)
                spec = [(a, o) for a, o in zip(args, orders) if o > 0]
                subs.append((sum(orders), sp.Derivative(base, *spec) if spec else base, sp.Float(val, 40)))
    subs.sort(key=lambda t: -t[0])
    return subs

out = []
for point in req["points"]:
    subs = jets(point)
    plain = {sp.Symbol(k): sp.Float(v, 40) for k, v in point.items() if "[" not in k}
    def ev(e):
        e = sp.sympify(e)
        for _, what, val in subs:
            e = e.subs(what, val)
        return str(sp.N(e.subs(plain), 30))
    # Kretschmann: evaluate R_abcd and g^ab at the point, then contract numerically
    D = [[[[sp.Float(ev(down[a][b][c][d]), 30) for d in range(n)] for c in range(n)] for b in range(n)] for a in range(n)]
    GI = [[sp.Float(ev(ginv[a, b]), 30) for b in range(n)] for a in range(n)]
    U = D
    for slot in range(4):
        prev = U
        def raised(idx, slot=slot, prev=prev):
            total = 0
            for y in range(n):
                if GI[idx[slot]][y] == 0: continue
                j = list(idx); j[slot] = y
                total += GI[idx[slot]][y] * prev[j[0]][j[1]][j[2]][j[3]]
            return total
        U = [[[[raised((a, b, c, d)) for d in range(n)] for c in range(n)] for b in range(n)] for a in range(n)]
    K = sum(D[a][b][c][d] * U[a][b][c][d] for a in range(n) for b in range(n) for c in range(n) for d in range(n))
    out.append({
        "christoffel": [[[ev(gamma[a][b][c]) for c in range(n)] for b in range(n)] for a in range(n)],
        "riemann": [[[[ev(riem[a][b][c][d]) for d in range(n)] for c in range(n)] for b in range(n)] for a in range(n)],
        "ricci": [[ev(ric[a][b]) for b in range(n)] for a in range(n)],
        "ricciScalar": ev(scal),
        "einstein": [[ev(ein[a][b]) for b in range(n)] for a in range(n)],
        "kretschmann": ev(K),
    })
json.dump(out, sys.stdout)
