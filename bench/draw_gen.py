#!/usr/bin/python3
"""Seeded planar graph families for the drawing benchmark (invented test data).

usage: draw_gen.py FAMILY EDGES SEED GRAPH_OUT [ROTATION_OUT]
  trigrid   a square grid with one diagonal per cell (M about 3N)
  stacked   a random stacked triangulation: each new vertex goes into a random
            triangle of the previous one (maximal planar, M = 3N - 6)
  sparse    a random spanning tree of a grid plus a few more grid edges (M about 1.3N)
  forest    many small random trees and isolated vertices (disconnected)
Vertex ids are shuffled and edges listed in random order.  ROTATION_OUT, when
given, receives a planar certificate (around lines) with a rotation system of
the graph, so the drawing stage can be measured without the planarity test.
"""
import random
import sys


def by_angle(n, edges, pos):
    """Rotation of a straight-line drawing: neighbours sorted counterclockwise."""
    import math
    nbr = [[] for _ in range(n)]
    for a, b in edges:
        nbr[a].append(b)
        nbr[b].append(a)
    for v in range(n):
        x, y = pos(v)
        nbr[v].sort(key=lambda w: math.atan2(pos(w)[1] - y, pos(w)[0] - x))
    return nbr


def grid_edges(k, diagonals):
    """A k x k grid's edges, vertex r * k + c at (c, r); optionally one diagonal per cell."""
    edges = []
    for r in range(k):
        for c in range(k):
            v = r * k + c
            if c + 1 < k:
                edges.append((v, v + 1))
            if r + 1 < k:
                edges.append((v, v + k))
            if diagonals and r + 1 < k and c + 1 < k:
                edges.append((v, v + k + 1))
    return edges


def trigrid(m, rnd):
    k = 2
    while 3 * (k + 1) * (k + 1) < m:
        k += 1
    edges = grid_edges(k, True)
    return k * k, edges, lambda: by_angle(k * k, edges, lambda v: (v % k, v // k))


def stacked(m, rnd):
    n = max(3, (m + 6) // 3)
    edges = [(0, 1), (1, 2), (0, 2)]
    faces = [(0, 1, 2), (0, 2, 1)]  # both counterclockwise, seen from inside each
    succ = [dict() for _ in range(n)]  # succ[a][x]: the neighbour after x around a
    succ[0] = {1: 2, 2: 1}
    succ[1] = {2: 0, 0: 2}
    succ[2] = {0: 1, 1: 0}
    for v in range(3, n):
        i = rnd.randrange(len(faces))
        a, b, c = faces[i]
        edges += [(a, v), (b, v), (c, v)]
        for p, q, r in ((a, b, c), (b, c, a), (c, a, b)):
            succ[p][q] = v  # p's corner in this face runs from q to r
            succ[p][v] = r
        succ[v] = {a: b, b: c, c: a}
        faces[i] = (a, b, v)
        faces.append((b, c, v))
        faces.append((c, a, v))

    def rotation():
        out = []
        for v in range(n):
            start = next(iter(succ[v]))
            ring, w = [start], succ[v][start]
            while w != start:
                ring.append(w)
                w = succ[v][w]
            out.append(ring)
        return out
    return n, edges, rotation


def sparse(m, rnd):
    k = 2
    while 1.3 * k * k < m:
        k += 1
    cand = grid_edges(k, False)
    rnd.shuffle(cand)
    parent = list(range(k * k))

    def find(x):
        while parent[x] != x:
            parent[x] = parent[parent[x]]
            x = parent[x]
        return x
    edges, extra = [], []
    for a, b in cand:
        ra, rb = find(a), find(b)
        if ra != rb:
            parent[ra] = rb
            edges.append((a, b))
        else:
            extra.append((a, b))
    edges += extra[: max(0, m - len(edges))]
    return k * k, edges, lambda: by_angle(k * k, edges, lambda v: (v % k, v // k))


def forest(m, rnd):
    n = int(m * 1.25) + 1
    edges = []
    v = 0
    while v < n:
        size = rnd.choice([1, 1, 2, 3, 5, 12])
        for w in range(v + 1, min(n, v + size)):
            edges.append((rnd.randrange(v, w), w))
        v += size

    def rotation():
        nbr = [[] for _ in range(n)]
        for a, b in edges:  # a forest: every rotation is planar
            nbr[a].append(b)
            nbr[b].append(a)
        return nbr
    return n, edges, rotation


def main():
    family, m, seed = sys.argv[1], int(sys.argv[2]), int(sys.argv[3])
    rnd = random.Random(seed)
    make = {"trigrid": trigrid, "stacked": stacked, "sparse": sparse, "forest": forest}[family]
    n, edges, rotation = make(m, rnd)
    ids = list(range(n))
    rnd.shuffle(ids)
    rnd.shuffle(edges)
    with open(sys.argv[4], "w") as f:
        f.write(f"graph {n} {len(edges)}\n")
        f.write("".join(f"{ids[a]} {ids[b]}\n" for a, b in edges))
    if len(sys.argv) > 5:
        rot = rotation()
        lines = [None] * n
        for v in range(n):
            lines[ids[v]] = f"around {ids[v]} :" + "".join(f" {ids[w]}" for w in rot[v]) + "\n"
        with open(sys.argv[5], "w") as f:
            f.write("certificate 1\nclaim planar\n" + "".join(lines))


main()
