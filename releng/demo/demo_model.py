"""The invented geology of the Faultbench demo study (all of it fictional).

A gently dipping, faulted dome at about 1400-1800 m TVDSS, mapped at the top of Sand A. Two sub-parallel normal
faults, F-West (down to the west) and F-East (down to the east), raise a narrow horst between the producing wells
EX-1 (west block) and EX-2 (east block). F-North, further north, is deliberately over-correlated: its throw is down
to the north along the western half of its trace and down to the south along the eastern half.

Coordinates are an invented local engineering grid in metres (x east, y north); depth z is positive down.
"""
import math

CRS_NOTE = "local engineering grid, metres (invented; not a real projection, not WGS84)"
ORIGIN = (403000.0, 6203000.0)
"""Map centre; the model below is written in metres relative to it."""
GRID = {"x0": 400000.0, "y0": 6200000.0, "cell": 20.0, "ncols": 300, "nrows": 300}
"""The depth grid: lower-left corner, cell size and size. Nodes sit at cell centres."""

# --- the dome: a Gaussian high on a gently tilted plane, with a saddle towards a second high to the south-east ---
DOME_CREST = (-150.0, -50.0)
DOME_AXIS_AZIMUTH = 15.0
DOME_RELIEF = 230.0
DOME_LENGTH = 1600.0     # standard deviation along the axis, m
DOME_WIDTH = 1300.0      # standard deviation across the axis, m
BASE_DEPTH = 1700.0
TILT = 0.012             # regional rise towards TILT_AZIMUTH, m/m (about 0.7 degrees)
TILT_AZIMUTH = 120.0
NEIGHBOUR_CREST = (2800.0, -2300.0)   # a second high, mostly off the map to the south-east
NEIGHBOUR_RELIEF = 230.0
NEIGHBOUR_SIZE = 1000.0

DISPLACEMENT_REACH = 1500.0
"""Distance from a fault at which its footwall uplift and hanging-wall drop have died out, m."""
FOOTWALL_SHARE = 0.35
"""Part of the throw taken up by footwall uplift; the hanging wall drops by the rest (common for normal faults)."""


def local(x, y):
    return x - ORIGIN[0], y - ORIGIN[1]


def regional_depth(x, y):
    """Top Sand A before faulting: the dome and its neighbour on the tilted plane."""
    lx, ly = local(x, y)
    a = math.radians(DOME_AXIS_AZIMUTH)
    dx, dy = lx - DOME_CREST[0], ly - DOME_CREST[1]
    along = dx * math.sin(a) + dy * math.cos(a)
    across = dx * math.cos(a) - dy * math.sin(a)
    dome = DOME_RELIEF * math.exp(-0.5 * ((along / DOME_LENGTH) ** 2 + (across / DOME_WIDTH) ** 2))
    nx, ny = lx - NEIGHBOUR_CREST[0], ly - NEIGHBOUR_CREST[1]
    neighbour = NEIGHBOUR_RELIEF * math.exp(-0.5 * (nx * nx + ny * ny) / NEIGHBOUR_SIZE ** 2)
    t = math.radians(TILT_AZIMUTH)
    return BASE_DEPTH - dome - neighbour - TILT * (lx * math.sin(t) + ly * math.cos(t))


def bell_throw(maximum, peak_at):
    """Throw profile that is zero at both tips and largest at fraction peak_at of the trace."""
    k = math.log(0.5) / math.log(peak_at)
    return lambda f: maximum * math.sin(math.pi * f ** k) ** 0.8


def flipping_throw(north_down, south_down, flip_at):
    """Over-correlated profile: down to the dip side (+) before flip_at, down to the other side (-) after it."""
    def profile(f):
        if f < flip_at:
            return north_down * math.sin(math.pi * f / flip_at)
        return -south_down * math.sin(math.pi * (f - flip_at) / (1 - flip_at))
    return profile


class Fault:
    """A mapped normal fault: trace, dip, dip azimuth (the hanging-wall side) and a throw profile along its trace."""

    def __init__(self, fid, name, trace, dip, dip_azimuth, throw_profile):
        self.id, self.name, self.dip, self.dip_azimuth = fid, name, dip, dip_azimuth
        self.trace = [(ORIGIN[0] + x, ORIGIN[1] + y) for x, y in trace]
        self.profile = throw_profile
        self.starts = [0.0]
        for (ax, ay), (bx, by) in zip(self.trace, self.trace[1:]):
            self.starts.append(self.starts[-1] + math.hypot(bx - ax, by - ay))
        self.length = self.starts[-1]
        (sx, sy), (ex, ey) = self.trace[0], self.trace[-1]
        az = math.radians(dip_azimuth)
        self.dip_on_left = (ex - sx) * math.cos(az) - (ey - sy) * math.sin(az) > 0

    def throw(self, u):
        """Signed throw at along-strike distance u (hanging wall on the dip side when positive), m."""
        return self.profile(min(max(u / self.length, 0.0), 1.0))

    def locate(self, x, y):
        """(u, distance, side) of the nearest trace point; side is +1 on the dip side, -1 on the other."""
        best = None
        for k, ((ax, ay), (bx, by)) in enumerate(zip(self.trace, self.trace[1:])):
            tx, ty = bx - ax, by - ay
            seg = math.hypot(tx, ty)
            t = min(max(((x - ax) * tx + (y - ay) * ty) / (seg * seg), 0.0), 1.0)
            d = math.hypot(x - ax - t * tx, y - ay - t * ty)
            if best is None or d < best[1]:
                left = tx * (y - ay) - ty * (x - ax) > 0
                best = (self.starts[k] + t * seg, d, 1 if left == self.dip_on_left else -1)
        return best

    def position(self, u):
        """Map point at along-strike distance u."""
        for k in range(len(self.trace) - 1):
            if u <= self.starts[k + 1] or k == len(self.trace) - 2:
                f = (u - self.starts[k]) / (self.starts[k + 1] - self.starts[k])
                (ax, ay), (bx, by) = self.trace[k], self.trace[k + 1]
                return ax + f * (bx - ax), ay + f * (by - ay)

    def displacement(self, x, y):
        """Depth change at (x, y): the hanging wall drops and the footwall rises, fading smoothly away from the
        fault, so that the step across the trace is the full local throw."""
        u, d, side = self.locate(x, y)
        if d >= DISPLACEMENT_REACH:
            return 0.0
        fade = (1 - (d / DISPLACEMENT_REACH) ** 2) ** 2
        share = 1 - FOOTWALL_SHARE if side > 0 else -FOOTWALL_SHARE
        return share * self.throw(u) * fade


F_WEST = Fault("F-West", "F-West", [(-700, -1550), (-520, -800), (-400, -60), (-300, 640), (-160, 1400)],
               60, 282, bell_throw(62, 0.45))
F_EAST = Fault("F-East", "F-East", [(-330, -1500), (-150, -770), (-10, -40), (120, 680), (300, 1420)],
               60, 102, bell_throw(78, 0.55))
F_NORTH = Fault("F-North", "F-North", [(-2550, 1950), (-1300, 2200), (-100, 2130), (1200, 2380), (2500, 2280)],
                65, 0, flipping_throw(32, 26, 0.46))
FAULTS = [F_WEST, F_EAST, F_NORTH]


def depth(x, y):
    """Top Sand A, m TVDSS, with every fault's step."""
    return regional_depth(x, y) + sum(f.displacement(x, y) for f in FAULTS)


# --- stratigraphy: thin-bedded sands and shales below a top seal; thicknesses in m ---
def normal(mean, sd):
    return {"normal": {"mean": mean, "sd": sd}}


def triangular(lo, mode, hi):
    return {"triangular": {"min": lo, "mode": mode, "max": hi}}


def sand(name, thickness, vcl, ntg, porosity, sw, bo=1.25):
    return {"name": name, "lithology": "reservoir", "thickness": thickness, "vcl": vcl, "ntg": ntg,
            "porosity": porosity, "sw": sw, "bo": bo}


def shale(name, thickness, vcl):
    return {"name": name, "lithology": "seal", "thickness": thickness, "vcl": vcl}


UNITS = [
    shale("Cap Shale", normal(90, 6), 0.72),
    sand("Sand A", normal(14, 2), 0.08, 0.85, triangular(0.20, 0.25, 0.28), 0.22),
    shale("Shale A", triangular(4, 6, 9), 0.62),
    sand("Sand B", normal(9, 1.5), 0.14, 0.65, triangular(0.17, 0.22, 0.25), 0.32),
    shale("Siltstone B", triangular(3, 5, 7), 0.45),
    sand("Sand C", normal(16, 2.5), 0.10, triangular(0.70, 0.80, 0.88), triangular(0.19, 0.24, 0.27), 0.25),
    shale("Shale C", triangular(5, 8, 12), 0.66),
    sand("Sand D", normal(10, 2), 0.18, 0.60, triangular(0.15, 0.20, 0.24), 0.35),
    shale("Siltstone D", triangular(2, 4, 6), 0.48),
    sand("Sand E", normal(18, 3), 0.12, triangular(0.62, 0.75, 0.85), triangular(0.17, 0.22, 0.26), 0.28),
    shale("Base Shale", normal(80, 6), 0.68),
]
REFERENCE_UNIT = "Sand A"


def mean_thickness(unit):
    t = unit["thickness"]
    if isinstance(t, dict):
        kind, p = next(iter(t.items()))
        return p["mean"] if kind == "normal" else (p["min"] + p["mode"] + p["max"]) / 3
    return t


# --- wells: vertical producers, one in each block beside the horst ---
WELLS = [
    {"well": "EX-1", "x": 402380.0, "y": 6203180.0, "kb": 28.5, "status": "oil producer",
     "thickness_factor": 1.04},
    {"well": "EX-2", "x": 403420.0, "y": 6203020.0, "kb": 31.0, "status": "oil producer",
     "thickness_factor": 0.96},
]
EX2_DRAINAGE = {"triangular": {"min": 1516, "mode": 1522, "max": 1532}}
"""Drainage depth of EX-2, m TVDSS: its top perforation, 4 m below its top of Sand A, with a margin for how far up
the produced contact may have risen. Oil that cannot flow down to it stays behind as attic oil."""
