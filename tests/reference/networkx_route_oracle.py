"""Independent oracle for the route planner (networkx 2.8, Debian's /usr/bin/python3).

Reads a JSON list of instances from stdin: {"n", "edges": [[u, v, length, kind, allowed]], "start", "end"}.
For each travel-connected group that holds quilting lines it computes the minimum T-join exactly:
T = odd points of the quilting lines Δ {start} Δ {end}; missing ends become free ends (dummy terminals joined at
cost 0 to every terminal, not to each other); distances by networkx Dijkstra over allowed travel lines; pairing by
networkx's exact max_weight_matching (Van Rantwijk / Galil 1986) with maxcardinality=True on weights
(max + 1 - cost), i.e. the minimum-cost perfect matching. networkx's eulerize is not used (it is a heuristic).
Writes a JSON list of {"passes", "groups": [{"pieces", "exact", "lowerBound"}]}; "exact" marks groups where the
bound is the optimum (one piece, and no fixed end off the lines unless the other end is free).
"""
import json
import sys

import networkx as nx


def min_perfect_matching_cost(nodes, cost):
    g = nx.Graph()
    pairs = [(a, b, c) for (a, b), c in cost.items()]
    top = max((c for _, _, c in pairs), default=0) + 1
    for a, b, c in pairs:
        g.add_edge(a, b, weight=top - c)
    m = nx.max_weight_matching(g, maxcardinality=True)
    if 2 * len(m) != len(nodes):
        raise SystemExit("no perfect matching")
    return sum(cost[(a, b)] if (a, b) in cost else cost[(b, a)] for a, b in m)


def solve(inst):
    travel = nx.MultiGraph()
    quilting = nx.MultiGraph()
    travel.add_nodes_from(range(inst["n"]))
    for u, v, length, kind, allowed in inst["edges"]:
        if allowed:
            travel.add_edge(u, v, w=length)
        if kind == "quilting":
            quilting.add_edge(u, v)
    out = {"passes": 0, "groups": []}
    for comp in sorted(nx.connected_components(travel), key=min):
        qnodes = [v for v in comp if v in quilting]
        if not qnodes:
            continue
        out["passes"] += 1
        pieces = nx.number_connected_components(quilting.subgraph(qnodes))
        terminals = {v for v in qnodes if quilting.degree(v) % 2 == 1}
        free = 0
        off_lines = []
        for end in (inst["start"], inst["end"]):
            if end >= 0 and end in comp:
                terminals ^= {end}
                if end not in quilting:
                    off_lines.append(end)
            else:
                free += 1
        # One fixed end off the quilting lines with the other end free: the free end is not that point (going
        # back there is never shorter than stopping on the lines), and the bound is then exact for one piece.
        barred = set(off_lines) if free == 1 else set()
        exact = pieces == 1 and (not off_lines or (len(off_lines) == 1 and free == 1))
        terminals = sorted(terminals)
        if not terminals:
            out["groups"].append({"pieces": pieces, "exact": exact, "lowerBound": 0.0})
            continue
        cost = {}
        for i, t in enumerate(terminals):
            dist = nx.single_source_dijkstra_path_length(travel, t, weight="w")
            for t2 in terminals[i + 1:]:
                cost[(t, t2)] = dist[t2]
        nodes = list(terminals)
        for d in range(free):
            dummy = ("free", d)
            nodes.append(dummy)
            for t in terminals:
                if t not in barred:
                    cost[(t, dummy)] = 0.0
        out["groups"].append({"pieces": pieces, "exact": exact, "lowerBound": min_perfect_matching_cost(nodes, cost)})
    return out


print(json.dumps([solve(inst) for inst in json.load(sys.stdin)]))
