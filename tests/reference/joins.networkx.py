"""Oracle for shared/joins/findJoins.ts: shortest connections between passes.

Reads {"groups": [part indices], "parts": [{"segments": [[[x, y], [x, y]], ...]}, ...]} on stdin. Every pair
of travel parts is joined by an edge weighted with Shapely's exact distance between their geometries (1.8.5,
GEOS); networkx 2.8's Dijkstra then gives, for each pair of groups a < b, the shortest connection that passes
only through parts without quilting lines. Prints {"a,b": length}. Run with Debian's /usr/bin/python3.
"""
import json
import sys

import networkx as nx
from shapely.geometry import MultiLineString

d = json.load(sys.stdin)
geoms = [MultiLineString(p["segments"]) for p in d["parts"]]
groups = d["groups"]
dist = {}
for i in range(len(geoms)):
    for j in range(i + 1, len(geoms)):
        dist[(i, j)] = geoms[i].distance(geoms[j])
out = {}
for a in range(len(groups)):
    for b in range(a + 1, len(groups)):
        allowed = {groups[a], groups[b]} | {i for i in range(len(geoms)) if i not in groups}
        g = nx.Graph()
        for (i, j), w in dist.items():
            if i in allowed and j in allowed:
                g.add_edge(i, j, weight=w)
        out[f"{a},{b}"] = nx.dijkstra_path_length(g, groups[a], groups[b])
print(json.dumps(out))
