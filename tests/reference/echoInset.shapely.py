"""Oracle for shared/motifs/inset.ts and echo.ts: echoes as Shapely negative buffers.

Reads a JSON list on stdin, each {"polygon": [[x, y], ...], "spacing": s, "levels": [[ring, ...], ...]} where
levels[k-1] holds our rings k·s inside the polygon. For k = 1, 2, ... until the buffer is empty, Shapely
(1.8.5, GEOS) computes polygon.buffer(-k·s, join_style=mitre, mitre_limit=5.0); we report how many levels it
has and the largest area of the symmetric difference between its buffer and the union of our rings.
Run with Debian's /usr/bin/python3.
"""
import json
import sys

from shapely.geometry import Polygon
from shapely.ops import unary_union

out = []
for case in json.load(sys.stdin):
    p = Polygon(case["polygon"])
    s = case["spacing"]
    levels = case["levels"]
    worst = 0.0
    k = 1
    while True:
        ref = p.buffer(-k * s, join_style=2, mitre_limit=5.0)
        if ref.is_empty or ref.area < 1e-12:
            break
        ours = unary_union([Polygon(r) for r in levels[k - 1]]) if k - 1 < len(levels) else Polygon()
        worst = max(worst, ref.symmetric_difference(ours).area)
        k += 1
    out.append({"levels": k - 1, "worst": worst})
print(json.dumps(out))
