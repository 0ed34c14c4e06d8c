#!/usr/bin/python3
"""Seed corpora for the fuzz harnesses, made at run time from the committed
vectors (vectors/MANIFEST) and the invented demo (examples/demo/).

Usage: tests/fuzz/seeds.py OUTDIR   (run from the repository root)
Writes OUTDIR/<target>/seed-NNNN, one file per seed, in each harness's input
layout (tests/fuzz/fuzz.h and the harness headers)."""
import os
import re
import sys

# A few hand-written importer inputs (invented): graph6 for K4 and the
# 5-cycle, a DIMACS triangle, an edge list with names.
IMPORT_SEEDS = [
    (0, b"C~\n"),
    (0, b">>graph6<<Dhc\n"),
    (1, b"c a triangle\np edge 3 3\ne 1 2\ne 2 3\ne 1 3\n"),
    (2, b"# pumps\npump-a valve-b\nvalve-b,pump-c\npump-c , pump-a\nlonely\n"),
]


def manifest_pairs():
    pairs = []
    with open("vectors/MANIFEST", encoding="ascii") as f:
        for line in f:
            fields = line.split("#", 1)[0].split()
            if len(fields) >= 3:
                pairs.append(("vectors/" + fields[1], "vectors/" + fields[2]))
    demo = "examples/demo/"
    for graph, cert in (("coolant-chip", "coolant-chip"), ("sensor-board", "sensor-board"),
                        ("sensor-board", "sensor-board.solver")):
        pairs.append((demo + graph + ".graph", demo + cert + ".cert"))
    return [p for p in pairs if os.path.exists(p[0]) and os.path.exists(p[1])]


def read(path):
    with open(path, "rb") as f:
        return f.read()


def header_n(graph):
    m = re.search(rb"^[ \t]*graph[ \t]+([0-9]+)", graph, re.M)
    return int(m.group(1)) if m else 0


def write_all(outdir, target, seeds):
    folder = os.path.join(outdir, target)
    os.makedirs(folder, exist_ok=True)
    unique = sorted(set(seeds))
    for i, data in enumerate(unique):
        with open(os.path.join(folder, "seed-%04d" % i), "wb") as f:
            f.write(data)
    return len(unique)


def main():
    outdir = sys.argv[1]
    pairs = [(read(g), read(c)) for g, c in manifest_pairs()]
    seeds = {
        "graph": [g for g, _ in pairs],
        "cert": [bytes([header_n(g) % 256]) + c for g, c in pairs],
        "check": [g + b"\0" + c for g, c in pairs],
        "differential": [g + b"\0" + c for g, c in pairs],
        "import": [bytes([k]) + data for k, data in IMPORT_SEEDS]
        + [bytes([2]) + g for g, _ in pairs[:20]],
        # certify: N, then edge pairs (fuzz_certify.c): K4, K5, K3,3, a 6-cycle.
        "certify": [bytes([3, 0, 1, 0, 2, 0, 3, 1, 2, 1, 3, 2, 3]),
                    bytes([4] + [x for a in range(5) for b in range(a + 1, 5) for x in (a, b)]),
                    bytes([5] + [x for a in range(3) for b in range(3, 6) for x in (a, b)]),
                    bytes([5, 0, 1, 1, 2, 2, 3, 3, 4, 4, 5, 5, 0])],
    }
    for target, data in seeds.items():
        print("seeds: %-12s %d" % (target, write_all(outdir, target, data)))


main()
