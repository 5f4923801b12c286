"""Oracle for shared/graph/planarGraph.ts: nodes lines with shapely (GEOS) and reports comparable figures.

Reads a JSON list of designs on stdin, each {"quilting": [...], "seams": [...], "outline": [...] or null},
every line a list of [x, y]. For each design prints the figures of unary_union over all lines:
total length, straight-segment count, odd-degree nodes, nodes of degree >= 3, connected components
(networkx), and the dissolved lengths of the quilting lines alone and of quilting + seams.
Run with Debian's /usr/bin/python3 (python3-shapely 1.8.5 / GEOS 3.11, python3-networkx 2.8.8).
"""
import json
import sys
from collections import Counter

import networkx as nx
from shapely.geometry import LineString
from shapely.ops import unary_union


def parts(geom):
    if geom.is_empty:
        return []
    return list(geom.geoms) if hasattr(geom, "geoms") else [geom]


def union_length(lines):
    return sum(g.length for g in parts(unary_union([LineString(l) for l in lines]))) if lines else 0.0


def figures(design):
    lines = design["quilting"] + design["seams"] + ([design["outline"]] if design["outline"] else [])
    pieces = parts(unary_union([LineString(l) for l in lines]))
    degree = Counter()
    graph = nx.MultiGraph()
    segments = 0
    for g in pieces:
        coords = list(g.coords)
        segments += len(coords) - 1
        for a, b in zip(coords, coords[1:]):
            degree[a] += 1
            degree[b] += 1
            graph.add_edge(a, b)
    return {
        "length": sum(g.length for g in pieces),
        "segments": segments,
        "odd": sum(1 for d in degree.values() if d % 2 == 1),
        "junctions": sum(1 for d in degree.values() if d >= 3),
        "components": nx.number_connected_components(graph),
        "quiltingLength": union_length(design["quilting"]),
        "quiltingSeamLength": union_length(design["quilting"] + design["seams"]),
    }


print(json.dumps([figures(d) for d in json.load(sys.stdin)]))
