"""Independent exact oracle for the rural postman planner: Debian's python3-pulp driving coinor-cbc.

Run with Debian's /usr/bin/python3 (the python3 on PATH may lack pulp). Reads a JSON list of instances from stdin:
  {"n", "edges": [[u, v, cost, kind, allowed]], "start", "end", "extraStops"}
with cost the weighted length, kind "quilting" | "seam" | "edge", allowed whether travel may use the edge, and
start/end a vertex or -1 (free), and an optional "timeLimit" in seconds (the benchmark's; tests give none). Writes a
JSON list of {"travel", "groups", "seconds"}: the least travel over every travel group (per group: "pieces" and
"travel"), and CBC's solve time for the instance; "travel" is null when CBC hit the time limit.

The model is written straight on the planar graph, with none of the engine's reduction (an independent check of
it): every allowed edge e gets an integer extra traversal count x_e in 0..2; a free thread end may sit at any vertex
of the group (an edge to a dummy vertex D, y_v in 0..1); parity at every vertex through an integer z_v; at most
(free route ends + 2 * extraStops) thread ends; a fixed start and end are joined by a closing edge (or tied to D
when only one is fixed). Connectivity is enforced lazily: solve, find the parts of the route, add
x(delta(S)) + y(delta(S)) >= 2 - c(S) for each part S holding quilting lines or a fixed end, solve again, until the
route is one piece. The engine's hidden-stop preference is not modelled: this is least travel only.
"""
import json
import sys
import time

import pulp

def cbc(time_limit=None):
    """CBC with no optimality gap; a time limit (seconds) only where the caller asks for one (the benchmark)."""
    return pulp.COIN_CMD(path="/usr/bin/cbc", msg=0, gapRel=0, gapAbs=1e-9, timeLimit=time_limit)


class TimeLimit(Exception):
    pass


class UnionFind:
    def __init__(self):
        self.parent = {}

    def find(self, a):
        self.parent.setdefault(a, a)
        while self.parent[a] != a:
            self.parent[a] = self.parent[self.parent[a]]
            a = self.parent[a]
        return a

    def union(self, a, b):
        self.parent[self.find(a)] = self.find(b)


def travel_groups(inst):
    """Vertex sets joined by allowed travel that hold quilting lines, as lists of edge indices."""
    uf = UnionFind()
    for i, (u, v, _, kind, allowed) in enumerate(inst["edges"]):
        if allowed:
            uf.union(u, v)
    groups = {}
    for i, (u, v, _, kind, allowed) in enumerate(inst["edges"]):
        if kind == "quilting":
            groups.setdefault(uf.find(u), []).append(i)
    return uf, groups


def solve_group(inst, uf, root, start, end, extra_stops, time_limit):
    edges = inst["edges"]
    group_edges = [i for i, (u, v, _, _, allowed) in enumerate(edges) if allowed and uf.find(u) == root]
    required = [i for i in group_edges if edges[i][3] == "quilting"]
    vertices = sorted({edges[i][0] for i in group_edges} | {edges[i][1] for i in group_edges})
    on_lines = {edges[i][0] for i in required} | {edges[i][1] for i in required}
    free_ends = (start < 0) + (end < 0)
    closing = None
    if start >= 0 and end >= 0 and start != end:
        closing = (start, end)
    elif start >= 0 and end < 0:
        closing = (start, "D")
    elif end >= 0 and start < 0:
        closing = (end, "D")
    b = {v: 0 for v in vertices}
    b["D"] = 0
    for i in required:
        b[edges[i][0]] ^= 1
        b[edges[i][1]] ^= 1
    if closing:
        b[closing[0]] ^= 1
        b[closing[1]] ^= 1
    prob = pulp.LpProblem("rpp", pulp.LpMinimize)
    x = {i: pulp.LpVariable(f"x{i}", 0, 2, cat="Integer") for i in group_edges if edges[i][0] != edges[i][1]}
    max_ends = free_ends + 2 * extra_stops
    barred = {v for v in (start, end) if v >= 0 and v not in on_lines}
    y = {}
    if max_ends > 0:
        y = {v: pulp.LpVariable(f"y{v}", 0, 1, cat="Integer") for v in vertices if v not in barred}
        prob += pulp.lpSum(y.values()) <= max_ends
    incident = {v: [] for v in vertices}
    for i in x:
        incident[edges[i][0]].append(x[i])
        incident[edges[i][1]].append(x[i])
    for v in vertices:
        z = pulp.LpVariable(f"z{v}", 0, None, cat="Integer")
        prob += pulp.lpSum(incident[v]) + (y[v] if v in y else 0) + b[v] == 2 * z
    prob += pulp.lpSum(edges[i][2] * x[i] for i in x)
    # Targets: one vertex per piece of quilting lines, and fixed ends off the lines.
    pieces = UnionFind()
    for i in required:
        pieces.union(edges[i][0], edges[i][1])
    targets = {pieces.find(edges[i][0]) for i in required}
    targets |= {v for v in (start, end) if v >= 0 and v not in on_lines}
    seconds = 0.0
    while True:
        t = time.perf_counter()
        left = None if time_limit is None else max(1, time_limit - seconds)
        status = prob.solve(cbc(left))
        seconds += time.perf_counter() - t
        if pulp.LpStatus[status] != "Optimal" or prob.sol_status != pulp.LpSolutionOptimal:
            if time_limit is not None and seconds >= time_limit - 1:
                raise TimeLimit()
            raise SystemExit(f"CBC status {pulp.LpStatus[status]}")
        parts = UnionFind()
        for i in required:
            parts.union(edges[i][0], edges[i][1])
        for i in x:
            if x[i].value() > 0.5:
                parts.union(edges[i][0], edges[i][1])
        for v in y:
            if y[v].value() > 0.5:
                parts.union(v, "D")
        if closing:
            parts.union(*closing)
        roots = {parts.find(tg) for tg in targets}
        if len(roots) <= 1:
            break
        for r in roots:
            inside = {v for v in vertices + ["D"] if parts.find(v) == r}
            crossing = [x[i] for i in x if (edges[i][0] in inside) != (edges[i][1] in inside)]
            crossing += [y[v] for v in y if (v in inside) != ("D" in inside)]
            const = 1 if closing and ((closing[0] in inside) != (closing[1] in inside)) else 0
            prob += pulp.lpSum(crossing) >= 2 - const
    travel = sum(edges[i][2] * round(x[i].value()) for i in x)
    return {"pieces": len({pieces.find(edges[i][0]) for i in required}), "travel": travel}, seconds


def solve(inst):
    uf, groups = travel_groups(inst)
    start, end = inst["start"], inst["end"]
    extra = inst.get("extraStops", 0)
    if extra and len(groups) > 1:
        raise SystemExit("extra stops are checked on one-group designs only")
    results, seconds = [], 0.0
    time_limit = inst.get("timeLimit")
    started = time.perf_counter()
    try:
        for root in sorted(groups, key=lambda r: min(min(inst["edges"][i][:2]) for i in groups[r])):
            s = start if start >= 0 and uf.find(start) == root else -1
            e = end if end >= 0 and uf.find(end) == root else -1
            result, secs = solve_group(inst, uf, root, s, e, extra, time_limit)
            results.append(result)
            seconds += secs
    except TimeLimit:
        return {"travel": None, "groups": [], "seconds": time.perf_counter() - started}
    return {"travel": sum(r["travel"] for r in results), "groups": results, "seconds": seconds}


if __name__ == "__main__":
    print(json.dumps([solve(inst) for inst in json.load(sys.stdin)]))
