"""Oracle for shared/gap/gapCheck.ts: largest empty circle via shapely's polylabel on the faces.

Reads a JSON list on stdin, each {"width", "height", "lines": [...], "center": [x, y]}; the lines are
chords and closed rings, so every line bounds faces. For each design: polygonize the union of the
lines and the block outline, run shapely.ops.polylabel (Agafonkin's pole of inaccessibility, shapely
1.8.5) on every face with tolerance 1e-3, and report the largest distance found; also the distance from
our centre to the nearest line or border (an independent emptiness check of our disc).
Run with Debian's /usr/bin/python3.
"""
import json
import sys

from shapely.geometry import LineString, Point
from shapely.ops import polygonize, polylabel, unary_union

out = []
for d in json.load(sys.stdin):
    w, h = d["width"], d["height"]
    outline = LineString([(0, 0), (w, 0), (w, h), (0, h), (0, 0)])
    lines = [LineString(l) for l in d["lines"]] + [outline]
    union = unary_union(lines)
    best = 0.0
    for face in polygonize(union):
        p = polylabel(face, tolerance=1e-3)
        dist = min([face.exterior.distance(p)] + [ring.distance(p) for ring in face.interiors])
        best = max(best, dist)
    out.append({"radius": best, "centerClearance": Point(d["center"]).distance(union)})
print(json.dumps(out))
