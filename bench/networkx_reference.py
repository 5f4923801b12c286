"""Reference timings for `npm run bench`, on Debian's /usr/bin/python3 (networkx 2.8, shapely 1.8).

Reads a JSON list of cases from stdin. Per case:
  lines:  the design's polylines (quilting, seams, outline) -> shapely unary_union noding (the planar-graph step);
  groups: per pass {n, edges: [[u, v, cost]], terminals, freeEnds, walkEdges: [[u, v]], start}
          -> Dijkstra from every terminal (single_source_dijkstra_path_length), exact min-cost perfect matching
             (max_weight_matching, maxcardinality=True, weights max + 1 - cost; free ends as dummy terminals),
             and an Euler walk over the planner's own multigraph (eulerian_path from the same start).
Writes per case: seconds per step, the integer matching cost per group, shapely's noded segment count.
"""
import json
import sys
import time

import networkx as nx
from shapely.geometry import MultiLineString
from shapely.ops import unary_union


def match_cost(terminals, free, dist):
    g = nx.Graph()
    pairs = []
    for i, a in enumerate(terminals):
        for b in terminals[i + 1:]:
            pairs.append((a, b, dist[a][b]))
        for d in range(free):
            pairs.append((a, ("free", d), 0))
    top = max((c for _, _, c in pairs), default=0) + 1
    for a, b, c in pairs:
        g.add_edge(a, b, weight=top - c, cost=c)
    m = nx.max_weight_matching(g, maxcardinality=True)
    assert 2 * len(m) == len(terminals) + (free if terminals else 0), "no perfect matching"
    return sum(g[a][b]["cost"] for a, b in m)


def run(case):
    out = {"name": case["name"], "noding": 0.0, "dijkstra": 0.0, "matching": 0.0, "euler": 0.0, "costs": []}
    t = time.perf_counter()
    noded = unary_union(MultiLineString(case["lines"]))
    out["noding"] = time.perf_counter() - t
    out["nodedSegments"] = len(noded.geoms) if hasattr(noded, "geoms") else 1
    for grp in case["groups"]:
        g = nx.Graph() if False else nx.MultiGraph()
        g.add_nodes_from(range(grp["n"]))
        for u, v, c in grp["edges"]:
            g.add_edge(u, v, w=c)
        terms = grp["terminals"]
        t = time.perf_counter()
        dist = {a: nx.single_source_dijkstra_path_length(g, a, weight="w") for a in terms}
        out["dijkstra"] += time.perf_counter() - t
        t = time.perf_counter()
        out["costs"].append(match_cost(terms, grp["freeEnds"], dist) if terms else 0)
        out["matching"] += time.perf_counter() - t
        walk = nx.MultiGraph()
        walk.add_edges_from(grp["walkEdges"])
        t = time.perf_counter()
        steps = list(nx.eulerian_path(walk, source=grp["start"]))
        out["euler"] += time.perf_counter() - t
        assert len(steps) == len(grp["walkEdges"])
    return out


print(json.dumps([run(c) for c in json.load(sys.stdin)]))
