"""Draws the "scanned" depth-structure map of the demo from the depth grid, Python standard library only.

The map is drawn as ink on a straight page (contours by marching squares, fault traces with ticks on the downthrown
side, wells, grid ticks, scale bar, north arrow, title block), then "scanned": rotated by a small angle, laid on a
scanner bed, tinted like paper, mottled and specked. The control points are the 1 km grid crosses, carried through
the same rotation, so their pixel positions are exact. Pixel positions follow the world-file convention:
(0, 0) is the centre of the upper-left pixel, rows count downwards.
"""
import math
import random
import struct
import zlib

import demo_model as m

METRES_PER_PIXEL = 5.0
LEFT, TOP, RIGHT, BOTTOM = 140, 70, 60, 250          # page margins around the map frame, pixels
X_MIN, Y_MAX = 400000.0, 6206000.0                   # map frame: the extent of the grid
MAP_SIZE = int(6000 / METRES_PER_PIXEL)
PAGE_W, PAGE_H = LEFT + MAP_SIZE + RIGHT, TOP + MAP_SIZE + BOTTOM
ROTATION_DEGREES = 1.4
BED = 36                                             # scanner bed visible around the page, pixels
CONTOUR_STEP, INDEX_STEP = 10, 50
TICK_STEP = 1000.0
CONTROL_POINTS = [(x, y) for y in (6201000.0, 6203000.0, 6205000.0) for x in (401000.0, 403000.0, 405000.0)]
TITLE = "Example Field - Top Sand A depth (m TVDSS) - invented data"

# 5 x 7 bitmap font: per glyph seven rows of five bits, as hexadecimal bytes.
FONT = {
    " ": "00000000000000", "-": "0000001F000000", ".": "00000000000C0C", ",": "000000000C0408",
    "(": "02040808080402", ")": "08040202020408", ":": "000C0C000C0C00", "/": "00010204081000",
    "0": "0E11131519110E", "1": "040C040404040E", "2": "0E11010204081F", "3": "1F02040201110E",
    "4": "02060A121F0202", "5": "1F101E0101110E", "6": "0608101E11110E", "7": "1F010204080808",
    "8": "0E11110E11110E", "9": "0E11110F01020C",
    "A": "0E1111111F1111", "B": "1E11111E11111E", "C": "0E11101010110E", "D": "1C12111111121C",
    "E": "1F10101E10101F", "F": "1F10101E101010", "G": "0E11101711110F", "H": "1111111F111111",
    "I": "0E04040404040E", "J": "0702020202120C", "K": "11121418141211", "L": "1010101010101F",
    "M": "111B1515111111", "N": "11111915131111", "O": "0E11111111110E", "P": "1E11111E101010",
    "Q": "0E11111115120D", "R": "1E11111E141211", "S": "0F10100E01011E", "T": "1F040404040404",
    "U": "1111111111110E", "V": "11111111110A04", "W": "1111111515150A", "X": "11110A040A1111",
    "Y": "1111110A040404", "Z": "1F01020408101F",
    "a": "00000E010F110F", "b": "1010161911111E", "c": "00000E1010110E", "d": "01010D1311110F",
    "e": "00000E111F100E", "f": "0609081C080808", "g": "000F11110F010E", "h": "10101619111111",
    "i": "04000C0404040E", "j": "0200060202120C", "k": "10101214181412", "l": "0C04040404040E",
    "m": "00001A15151111", "n": "00001619111111", "o": "00000E1111110E", "p": "00001E111E1010",
    "q": "00000D130F0101", "r": "00001619101010", "s": "00000E100E011E", "t": "08081C08080906",
    "u": "0000111111130D", "v": "00001111110A04", "w": "0000111115150A", "x": "0000110A040A11",
    "y": "000011110F010E", "z": "00001F0204081F",
}


class Page:
    """Ink coverage (0 = paper, 255 = full ink) of the straight, unrotated page."""

    def __init__(self, width, height):
        self.w, self.h = width, height
        self.ink = bytearray(width * height)

    def dot(self, x, y, radius):
        r = int(math.ceil(radius))
        for j in range(int(round(y)) - r, int(round(y)) + r + 1):
            for i in range(int(round(x)) - r, int(round(x)) + r + 1):
                if 0 <= i < self.w and 0 <= j < self.h and (i - x) ** 2 + (j - y) ** 2 <= radius * radius + 0.25:
                    self.ink[j * self.w + i] = 255

    def line(self, x1, y1, x2, y2, width=1.0):
        steps = max(1, int(math.hypot(x2 - x1, y2 - y1) * 2))
        for k in range(steps + 1):
            t = k / steps
            self.dot(x1 + t * (x2 - x1), y1 + t * (y2 - y1), width / 2)

    def fill(self, x1, y1, x2, y2, value=255):
        for j in range(max(0, int(y1)), min(self.h, int(y2) + 1)):
            for i in range(max(0, int(x1)), min(self.w, int(x2) + 1)):
                self.ink[j * self.w + i] = value

    def box(self, x1, y1, x2, y2, width=2):
        for a, b, c, d in ((x1, y1, x2, y1), (x2, y1, x2, y2), (x2, y2, x1, y2), (x1, y2, x1, y1)):
            self.line(a, b, c, d, width)

    def text(self, x, y, string, scale=2, anchor="left", erase=False):
        """Text with its top-left corner at (x, y), or centred on x (anchor "centre"), or ending at x ("right")."""
        width = len(string) * 6 * scale - scale
        x0 = x - (width / 2 if anchor == "centre" else width if anchor == "right" else 0)
        if erase:
            self.fill(x0 - 3, y - 3, x0 + width + 3, y + 7 * scale + 2, 0)
        for n, ch in enumerate(string):
            rows = bytes.fromhex(FONT[ch])
            for r, bits in enumerate(rows):
                for c in range(5):
                    if bits & (16 >> c):
                        left = x0 + n * 6 * scale + c * scale
                        self.fill(left, y + r * scale, left + scale - 1, y + r * scale + scale - 1)


def to_page(x, y):
    return LEFT + (x - X_MIN) / METRES_PER_PIXEL, TOP + (Y_MAX - y) / METRES_PER_PIXEL


def fault_cells():
    """Grid cells (between four nodes) that a fault trace crosses: contours are not drawn across the step there."""
    g, cells = m.GRID, set()
    for f in m.FAULTS:
        for k in range(int(f.length) + 1):
            x, y = f.position(float(k))
            cells.add((int((x - g["x0"]) / g["cell"] - 0.5), int((y - g["y0"]) / g["cell"] - 0.5)))
    return cells


def contour_segments(rows, skip):
    """Marching squares over the node grid: (level, (x1, y1), (x2, y2)) in map coordinates."""
    g = m.GRID
    node = lambda i, j: (g["x0"] + (i + 0.5) * g["cell"], g["y0"] + (j + 0.5) * g["cell"])
    segments = []
    for j in range(g["nrows"] - 1):
        for i in range(g["ncols"] - 1):
            if (i, j) in skip:
                continue
            corners = [(i, j), (i + 1, j), (i + 1, j + 1), (i, j + 1)]
            z = [rows[b][a] for a, b in corners]
            for level in range(int(math.ceil(min(z) / CONTOUR_STEP)) * CONTOUR_STEP, int(max(z)) + 1, CONTOUR_STEP):
                points = []
                for e in range(4):                   # edges: bottom, right, top, left
                    za, zb = z[e], z[(e + 1) % 4]
                    if (za >= level) != (zb >= level):
                        t = (level - za) / (zb - za)
                        (xa, ya), (xb, yb) = node(*corners[e]), node(*corners[(e + 1) % 4])
                        points.append((e, (xa + t * (xb - xa), ya + t * (yb - ya))))
                if len(points) == 2:
                    segments.append((level, points[0][1], points[1][1]))
                elif len(points) == 4:               # saddle: the centre decides which corners are cut off
                    p = [pt for _, pt in points]
                    if (sum(z) / 4 >= level) == (z[0] >= level):
                        segments += [(level, p[0], p[1]), (level, p[2], p[3])]
                    else:
                        segments += [(level, p[3], p[0]), (level, p[1], p[2])]
    return segments


def draw_contours(page, rows):
    skip = fault_cells()
    labels = []
    for level, a, b in contour_segments(rows, skip):
        (x1, y1), (x2, y2) = to_page(*a), to_page(*b)
        page.line(x1, y1, x2, y2, 2.2 if level % INDEX_STEP == 0 else 1.0)
        if level % INDEX_STEP == 0:
            labels.append((level, (x1 + x2) / 2, (y1 + y2) / 2, (a[0] + b[0]) / 2, (a[1] + b[1]) / 2))
    placed = []
    g = m.GRID
    for level, x, y, mx, my in labels:
        ci, cj = int((mx - g["x0"]) / g["cell"]), int((my - g["y0"]) / g["cell"])
        near_fault = any((ci + di, cj + dj) in skip for di in range(-6, 7) for dj in range(-3, 4))
        inside = LEFT + 40 < x < LEFT + MAP_SIZE - 40 and TOP + 20 < y < TOP + MAP_SIZE - 20
        if near_fault or not inside:
            continue
        if all(math.hypot(x - px, y - py) > (300 if level == pl else 70) for pl, px, py in placed):
            page.text(x, y - 7, str(level), 2, "centre", erase=True)
            placed.append((level, x, y))


def draw_faults(page):
    for f in m.FAULTS:
        points = [to_page(*p) for p in f.trace]
        for (x1, y1), (x2, y2) in zip(points, points[1:]):
            page.line(x1, y1, x2, y2, 3.5)
        az = math.radians(f.dip_azimuth)
        for u in range(60, int(f.length) - 40, 110):  # ticks on the downthrown side, as the grid has it
            throw = f.throw(u)
            if abs(throw) < 3:
                continue
            (x, y), (xa, ya) = f.position(u), f.position(u + 5)
            nx, ny = (ya - y) / 5, (x - xa) / 5      # unit normal of the trace in map axes (y up)
            if nx * math.sin(az) + ny * math.cos(az) < 0:
                nx, ny = -nx, -ny                    # ... turned to the dip side
            length = 11 if throw > 0 else -11
            px, py = to_page(x, y)
            page.line(px, py, px + length * nx, py - length * ny, 2.5)
        x, y = to_page(*f.trace[-1])                  # name beside the northern end, on the hanging-wall side
        west = math.sin(math.radians(f.dip_azimuth)) < 0
        page.text(x - 8 if west else x + 8, y - 24, f.name, 2, "right" if west else "left", erase=True)


def draw_wells(page):
    for w in m.WELLS:
        x, y = to_page(w["x"], w["y"])
        page.dot(x, y, 7)
        page.text(x + 12, y - 20, w["well"], 2, erase=True)


def draw_frame(page):
    right, bottom = LEFT + MAP_SIZE, TOP + MAP_SIZE
    page.box(LEFT, TOP, right, bottom, 3)
    for k in range(7):
        v = k * TICK_STEP
        x, _ = to_page(X_MIN + v, Y_MAX)
        _, y = to_page(X_MIN, Y_MAX - v)
        page.line(x, bottom, x, bottom + 12, 2)
        page.line(x, TOP, x, TOP - 12, 2)
        page.text(x, bottom + 18, "%d" % (X_MIN + v), 2, "centre")
        page.line(LEFT, y, LEFT - 12, y, 2)
        page.line(right, y, right + 12, y, 2)
        page.text(LEFT - 16, y - 7, "%d" % (Y_MAX - v), 2, "right")
    for x, y in [(x, y) for x in range(401000, 406000, 1000) for y in range(6201000, 6206000, 1000)]:
        px, py = to_page(x, y)
        page.line(px - 9, py, px + 9, py, 1.6)
        page.line(px, py - 9, px, py + 9, 1.6)


def draw_title_block(page):
    x1, y1, x2, y2 = LEFT, TOP + MAP_SIZE + 60, LEFT + MAP_SIZE, PAGE_H - 25
    page.box(x1, y1, x2, y2, 3)
    page.text(x1 + 20, y1 + 18, TITLE, 3)
    page.text(x1 + 20, y1 + 62, "Contour interval 10 m, labelled every 50 m. Ticks on the downthrown side.", 2)
    page.text(x1 + 20, y1 + 86, "Local engineering grid, metres (invented, not a real projection).", 2)
    page.text(x1 + 20, y1 + 110, "Example Operator - demonstration map, not real data.", 2)
    page.dot(x1 + 28, y1 + 141, 7)
    page.text(x1 + 44, y1 + 134, "Oil producer", 2)
    ax, ay = x2 - 60, y1 + 40                        # north arrow (grid north)
    for k in range(34):
        page.line(ax - k * 0.3, ay + k, ax + k * 0.3, ay + k, 1)
    page.line(ax, ay + 34, ax, ay + 64, 3)
    page.text(ax, ay - 26, "N", 3, "centre")
    sx, sy = x2 - 300, y1 + 140                      # scale bar: 0-1000 m in 250 m blocks
    for k in range(4):
        a = sx + k * 250 / METRES_PER_PIXEL
        page.box(a, sy, a + 250 / METRES_PER_PIXEL, sy + 10, 2)
        if k % 2 == 0:
            page.fill(a, sy, a + 250 / METRES_PER_PIXEL, sy + 10)
    for v in (0, 500, 1000):
        page.text(sx + v / METRES_PER_PIXEL, sy - 24, "%d" % v, 2, "centre")
    page.text(sx + 1000 / METRES_PER_PIXEL + 14, sy - 2, "m", 2)


def scan(page):
    """Rotates the page onto a scanner bed and turns ink into palette indices on tinted, mottled, specked paper."""
    rng = random.Random(7)
    out_w, out_h = page.w + 2 * BED, page.h + 2 * BED
    cos, sin = math.cos(math.radians(ROTATION_DEGREES)), math.sin(math.radians(ROTATION_DEGREES))
    phases = [rng.random() * 6.283 for _ in range(4)]
    ink, w, h = page.ink, page.w, page.h
    rows = []
    for r in range(out_h):
        row = bytearray(out_w)
        for c in range(out_w):
            px, py = page_position(c, r, cos, sin)
            if not (0 <= px < w - 1 and 0 <= py < h - 1):
                continue                             # palette index 0: the scanner bed
            i, j = int(px), int(py)
            fx, fy = px - i, py - j
            k = j * w + i
            v = ((1 - fy) * ((1 - fx) * ink[k] + fx * ink[k + 1])
                 + fy * ((1 - fx) * ink[k + w] + fx * ink[k + w + 1]))
            if rng.random() < 0.0004:
                v = 160 + rng.random() * 80          # dust
            mottle = math.sin(px / 170 + phases[0]) + math.sin(py / 230 + phases[1]) \
                + 0.6 * math.sin((px + py) / 90 + phases[2]) + 0.5 * math.sin((px - py) / 310 + phases[3])
            shade = min(3, max(0, int(1.5 + mottle * 0.7)))
            row[c] = 1 + shade * 8 + min(7, int(v / 32))
        rows.append(row)
    return out_w, out_h, rows


def page_position(c, r, cos, sin):
    """Page position sampled by output pixel (c, r): the inverse of output_position."""
    dx, dy = c - (BED + (PAGE_W - 1) / 2), r - (BED + (PAGE_H - 1) / 2)
    return (PAGE_W - 1) / 2 + cos * dx + sin * dy, (PAGE_H - 1) / 2 - sin * dx + cos * dy


def output_position(px, py):
    """Pixel (column, row) of the scanned image that shows page position (px, py)."""
    cos, sin = math.cos(math.radians(ROTATION_DEGREES)), math.sin(math.radians(ROTATION_DEGREES))
    dx, dy = px - (PAGE_W - 1) / 2, py - (PAGE_H - 1) / 2
    return BED + (PAGE_W - 1) / 2 + cos * dx - sin * dy, BED + (PAGE_H - 1) / 2 + sin * dx + cos * dy


def palette():
    """Index 0: scanner bed; then 4 paper shades x 8 ink levels."""
    colours = [(70, 72, 74)]
    for shade in range(4):
        paper = (246 - 5 * shade, 240 - 6 * shade, 222 - 8 * shade)
        for level in range(8):
            t = level / 7 * 0.92
            colours.append(tuple(int(p + t * (q - p)) for p, q in zip(paper, (38, 36, 40))))
    return colours


def write_png(path, width, height, rows, colours):
    def chunk(kind, data):
        return struct.pack(">I", len(data)) + kind + data + struct.pack(">I", zlib.crc32(kind + data) & 0xFFFFFFFF)
    raw = b"".join(b"\x00" + bytes(row) for row in rows)
    with open(path, "wb") as out:
        out.write(b"\x89PNG\r\n\x1a\n")
        out.write(chunk(b"IHDR", struct.pack(">IIBBBBB", width, height, 8, 3, 0, 0, 0)))
        out.write(chunk(b"PLTE", b"".join(bytes(c) for c in colours)))
        out.write(chunk(b"IDAT", zlib.compress(raw, 9)))
        out.write(chunk(b"IEND", b""))


def write(rows, png_path, control_points_path):
    page = Page(PAGE_W, PAGE_H)
    draw_contours(page, rows)
    draw_faults(page)
    draw_wells(page)
    draw_frame(page)
    draw_title_block(page)
    width, height, pixels = scan(page)
    write_png(png_path, width, height, pixels, palette())
    with open(control_points_path, "w", newline="\n") as out:
        out.write("id,pixel_col,pixel_row,map_x,map_y\n")
        for n, (x, y) in enumerate(CONTROL_POINTS, 1):
            col, row = output_position(*to_page(x, y))
            out.write("CP%d,%.2f,%.2f,%.1f,%.1f\n" % (n, col, row, x, y))
