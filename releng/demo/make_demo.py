#!/usr/bin/env python3
"""Regenerates every file of demo-workspace/ from the invented geology in demo_model.py.

    python3 releng/demo/make_demo.py [workspace folder, default demo-workspace/]

Python 3 standard library only. The output is deterministic: running it twice gives the same files.
"""
import csv
import json
import math
import os
import sys

sys.dont_write_bytecode = True      # keep the repository free of __pycache__ folders
import demo_model as m              # noqa: E402 (imported after the setting above on purpose)
import scanned_map                  # noqa: E402

STUDY_NAME = "Example Field - narrow horst between EX-1 and EX-2 (invented demo data)"
GRID_FILE = "grids/top-sand-a.asc"
CONTOUR_INTERVAL = 10.0     # m, as on the scanned map
CUT_OFF_OFFSET = 40.0       # m off the trace, as the analysis files' "gridOffset"
CUT_OFF_STATIONS = 61


def node_depths():
    """Depth of Top Sand A at every grid node, rows from south to north, rounded as written."""
    g = m.GRID
    rows = []
    for j in range(g["nrows"]):
        y = g["y0"] + (j + 0.5) * g["cell"]
        rows.append([round(m.depth(g["x0"] + (i + 0.5) * g["cell"], y), 2) for i in range(g["ncols"])])
    return rows


def interpolate(rows, x, y):
    """Bilinear interpolation between node centres, as the grid reader does."""
    g = m.GRID
    tx = (x - g["x0"]) / g["cell"] - 0.5
    ty = (y - g["y0"]) / g["cell"] - 0.5
    i, j = int(tx), int(ty)
    fx, fy = tx - i, ty - j
    return ((1 - fy) * ((1 - fx) * rows[j][i] + fx * rows[j][i + 1])
            + fy * ((1 - fx) * rows[j + 1][i] + fx * rows[j + 1][i + 1]))


def write_grid(path, rows):
    g = m.GRID
    with open(path, "w", newline="\n") as out:
        out.write("ncols %d\nnrows %d\nxllcorner %.1f\nyllcorner %.1f\ncellsize %.1f\nNODATA_value -9999\n"
                  % (g["ncols"], g["nrows"], g["x0"], g["y0"], g["cell"]))
        for row in reversed(rows):          # the first data row is the northern one
            out.write(" ".join("%.2f" % v for v in row) + "\n")


def write_wells(folder, rows):
    with open(os.path.join(folder, "wells.csv"), "w", newline="") as out:
        w = csv.writer(out, lineterminator="\n")
        w.writerow(["well", "x", "y", "kb_elevation_m", "status"])
        for well in m.WELLS:
            w.writerow([well["well"], "%.1f" % well["x"], "%.1f" % well["y"], "%.1f" % well["kb"], well["status"]])
    with open(os.path.join(folder, "tops.csv"), "w", newline="") as out:
        w = csv.writer(out, lineterminator="\n")
        w.writerow(["Well", "Surface", "X", "Y", "TVDSS", "MD"])
        for well in m.WELLS:
            for surface, tvdss in well_tops(well, rows):
                w.writerow([well["well"], surface, "%.1f" % well["x"], "%.1f" % well["y"], "%.1f" % tvdss,
                            "%.1f" % (tvdss + well["kb"])])


def well_tops(well, rows):
    """Top of every unit in a vertical well: Top Sand A from the grid, the others hung from it with the mean
    thicknesses scaled by the well's own factor (the wells saw slightly different thicknesses)."""
    names = [u["name"] for u in m.UNITS]
    ref = names.index(m.REFERENCE_UNIT)
    depth = round(interpolate(rows, well["x"], well["y"]), 1)
    offsets = [0.0]
    for unit in m.UNITS[:-1]:
        offsets.append(offsets[-1] + m.mean_thickness(unit) * well["thickness_factor"])
    return [("Top " + name, depth + offsets[k] - offsets[ref]) for k, name in enumerate(names)]


def absolute(point):
    return [round(point[0], 1), round(point[1], 1)]


def write_faults(path):
    features = []
    for f in m.FAULTS:
        features.append({"type": "Feature",
                         "properties": {"id": f.id, "name": f.name, "dip": f.dip, "dipAzimuth": f.dip_azimuth,
                                        "crs_note": m.CRS_NOTE},
                         "geometry": {"type": "LineString", "coordinates": [absolute(p) for p in f.trace]}})
    with open(path, "w", newline="\n") as out:
        out.write(compact_json({"type": "FeatureCollection", "name": "Example Field faults (invented)",
                                "crs_note": m.CRS_NOTE, "features": features}) + "\n")


def node_xy(i, j):
    g = m.GRID
    return g["x0"] + (i + 0.5) * g["cell"], g["y0"] + (j + 0.5) * g["cell"]


def near_fault(x, y, distance):
    return any(f.locate(x, y)[1] < distance for f in m.FAULTS)


def contour_lines(rows, level):
    """Contour lines of the written grid at one level, by marching squares between node centres, joined into
    polylines. Cells that a fault crosses are left out (the grid steps there), so lines end at the faults as a
    digitizer would end them."""
    g = m.GRID
    segments = []
    for j in range(g["nrows"] - 1):
        for i in range(g["ncols"] - 1):
            v = [rows[j][i], rows[j][i + 1], rows[j + 1][i + 1], rows[j + 1][i]]
            if min(v) > level or max(v) <= level:
                continue
            cx, cy = node_xy(i + 0.5, j + 0.5)
            if near_fault(cx, cy, g["cell"]):
                continue
            corners = [node_xy(i, j), node_xy(i + 1, j), node_xy(i + 1, j + 1), node_xy(i, j + 1)]
            cross = []
            for e in range(4):
                a, b = v[e], v[(e + 1) % 4]
                if (a > level) != (b > level):
                    t = (level - a) / (b - a)
                    (ax, ay), (bx, by) = corners[e], corners[(e + 1) % 4]
                    cross.append((round(ax + t * (bx - ax), 1), round(ay + t * (by - ay), 1)))
            if len(cross) == 2:
                segments.append((cross[0], cross[1]))
            elif len(cross) == 4:
                segments.extend([(cross[0], cross[1]), (cross[2], cross[3])])
    return join_segments(segments)


def join_segments(segments):
    """Joins segments that share end points into polylines."""
    ends = {}
    for k, (a, b) in enumerate(segments):
        ends.setdefault(a, []).append(k)
        ends.setdefault(b, []).append(k)
    used = [False] * len(segments)
    lines = []
    for k in range(len(segments)):
        if used[k]:
            continue
        used[k] = True
        line = list(segments[k])
        for forward in (True, False):
            while True:
                tip = line[-1] if forward else line[0]
                nxt = [n for n in ends[tip] if not used[n]]
                if not nxt:
                    break
                used[nxt[0]] = True
                a, b = segments[nxt[0]]
                point = b if a == tip else a
                if forward:
                    line.append(point)
                else:
                    line.insert(0, point)
        if len(line) >= 3:
            lines.append([list(p) for p in line])
    return lines


def write_contours(path, rows):
    levels = sorted({v for row in rows for v in row})
    first = int(levels[0] // CONTOUR_INTERVAL + 1)
    last = int(levels[-1] // CONTOUR_INTERVAL)
    features = []
    for n in range(first, last + 1):
        level = n * CONTOUR_INTERVAL
        for line in contour_lines(rows, level):
            features.append({"type": "Feature", "properties": {"depth": level, "horizon": "Top " + m.REFERENCE_UNIT},
                             "geometry": {"type": "LineString", "coordinates": line}})
    with open(path, "w", newline="\n") as out:
        json.dump({"type": "FeatureCollection", "name": "Top Sand A digitized contours (invented)",
                   "crs_note": m.CRS_NOTE, "unit": "m TVDSS", "features": features}, out, separators=(",", ":"))
        out.write("\n")


def cut_off(rows, fault, hanging_wall):
    """Cut-off line of Top Sand A on one wall: the written grid read CUT_OFF_OFFSET m off the trace, perpendicular to
    it, at evenly spaced stations, as the analysis reads it with "gridOffset"."""
    points = []
    for k in range(CUT_OFF_STATIONS):
        u = fault.length * k / (CUT_OFF_STATIONS - 1)
        x, y = fault.position(u)
        seg = max(i for i in range(len(fault.trace) - 1) if fault.starts[i] <= u or i == 0)
        seg = min(seg, len(fault.trace) - 2)
        (ax, ay), (bx, by) = fault.trace[seg], fault.trace[seg + 1]
        length = math.hypot(bx - ax, by - ay)
        left = (-(by - ay) / length, (bx - ax) / length)
        toward_dip = 1 if fault.dip_on_left else -1
        side = toward_dip if hanging_wall else -toward_dip
        px, py = x + side * CUT_OFF_OFFSET * left[0], y + side * CUT_OFF_OFFSET * left[1]
        points.append([round(px, 1), round(py, 1), round(interpolate(rows, px, py), 2)])
    return points


def write_cut_offs(path, rows):
    features = []
    for f in m.FAULTS:
        for wall, hanging in (("footwall", False), ("hangingWall", True)):
            features.append({"type": "Feature",
                             "properties": {"fault": f.id, "wall": wall, "horizon": "Top " + m.REFERENCE_UNIT,
                                            "offset_m": CUT_OFF_OFFSET},
                             "geometry": {"type": "LineString", "coordinates": cut_off(rows, f, hanging)}})
    with open(path, "w", newline="\n") as out:
        out.write(compact_json({"type": "FeatureCollection", "name": "Top Sand A fault cut-offs (invented)",
                                "crs_note": m.CRS_NOTE, "features": features}) + "\n")


def study(criterion):
    """The analysis file of the narrow horst, with the given seal criterion."""
    compartment = [absolute(p) for p in m.F_WEST.trace] + [absolute(p) for p in reversed(m.F_EAST.trace)]
    faults = [{"id": f.id, "name": f.name, "trace": [absolute(p) for p in f.trace], "dip": f.dip,
               "dipAzimuth": f.dip_azimuth, "normal": True, "columns": 300,
               "throwScale": {"normal": {"mean": 1, "sd": 0.12}}, "cutOffs": {"gridOffset": 40}}
              for f in (m.F_WEST, m.F_EAST)]
    seal = {"criterion": criterion, "burialDepth": 1900}    # maximum burial, m: Bretan's shallow band
    if criterion == "sgr":
        seal.update({"pressureModel": "bretan", "calibrationShift": {"normal": {"mean": 0, "sd": 0.12}}})
    name = STUDY_NAME if criterion == "sgr" else STUDY_NAME.replace("(", "- juxtaposition only (")
    return {
        "format": "faultbench-analysis",
        "formatVersion": 1,
        "name": name,
        "referenceTop": {"grid": "../" + GRID_FILE, "format": "esri-ascii", "unit": "m"},
        "compartment": compartment,
        "stratigraphy": {"referenceUnit": m.REFERENCE_UNIT, "units": m.UNITS},
        "faults": faults,
        "fluids": {"trapped": "oil", "density": {"normal": {"mean": 760, "sd": 15}},
                   "brineDensity": {"normal": {"mean": 1045, "sd": 8}}},
        "seal": seal,
        "depthUncertainty": {"shift": {"normal": {"mean": 0, "sd": 5}}, "residualSd": 4, "correlationLength": 800},
        "attic": {"drainedFault": m.F_EAST.id, "drainageDepth": m.EX2_DRAINAGE},
        "wells": [{"name": w["well"], "x": w["x"], "y": w["y"], "status": w["status"]} for w in m.WELLS],
        "simulation": {"realisations": 2000, "seed": 20240917, "cellHeight": 5},
    }


def compact_json(value, indent=0):
    """JSON with short objects and lists of numbers kept on one line, so traces and units stay readable."""
    flat = json.dumps(value)
    if len(flat) + indent <= 116 or not isinstance(value, (dict, list)):
        return flat
    pad = " " * (indent + 2)
    if isinstance(value, dict):
        items = ['%s"%s": %s' % (pad, k, compact_json(v, indent + 2).lstrip()) for k, v in value.items()]
        return "{\n" + ",\n".join(items) + "\n" + " " * indent + "}"
    if all(isinstance(v, list) and all(isinstance(c, (int, float)) for c in v) for v in value):
        lines, line = [], []
        for v in value:
            if line and len(", ".join(line)) + len(json.dumps(v)) + indent > 110:
                lines.append(", ".join(line))
                line = []
            line.append(json.dumps(v))
        lines.append(", ".join(line))
        return "[\n" + ",\n".join(pad + text for text in lines) + "\n" + " " * indent + "]"
    return "[\n" + ",\n".join(pad + compact_json(v, indent + 2) for v in value) + "\n" + " " * indent + "]"


def main():
    here = os.path.dirname(os.path.abspath(__file__))
    root = sys.argv[1] if len(sys.argv) > 1 else os.path.join(here, "..", "..", "demo-workspace")
    for sub in ("grids", "studies", "wells", "faults", "maps"):
        os.makedirs(os.path.join(root, sub), exist_ok=True)
    rows = node_depths()
    write_grid(os.path.join(root, GRID_FILE), rows)
    write_wells(os.path.join(root, "wells"), rows)
    write_faults(os.path.join(root, "faults", "faults.geojson"))
    write_contours(os.path.join(root, "maps", "digitized-contours.geojson"), rows)
    write_cut_offs(os.path.join(root, "maps", "cut-offs.geojson"), rows)
    for criterion, name in (("sgr", "demo-study.json"), ("juxtaposition", "demo-study-juxtaposition.json")):
        with open(os.path.join(root, "studies", name), "w", newline="\n") as out:
            out.write(compact_json(study(criterion)) + "\n")
    scanned_map.write(rows, os.path.join(root, "maps", "depth-structure-scan.png"),
                      os.path.join(root, "maps", "depth-structure-scan.control-points.csv"))
    print("demo files written to", os.path.normpath(root))


if __name__ == "__main__":
    main()
