#!/usr/bin/python3
"""Writes planewit's generated test vectors (our own code; deterministic).

Run from anywhere with Debian's python3 (standard library only):
    /usr/bin/python3 vectors/gen/make_vectors.py
then run vectors/regen-sums.sh and commit the output.  The files it writes
say in their first lines that they were generated, and by this script.

What it writes, and where each expected verdict comes from:
  * the five Platonic solids' graphs, with rotation systems read off their
    3-D vertex coordinates (neighbours sorted by angle around the outward
    normal, i.e. counterclockwise seen from outside) and the mirrored
    systems; face counts 4, 6, 8, 12, 20 come from Euler's polyhedron
    formula V - E + F = 2;
  * the cube with one vertex's rotation reversed, which is no longer a
    plane embedding (expected rejection "euler");
  * the Petersen graph (non-planar: textbook fact) with a K3,3 subdivision
    (the graph minus one vertex is a subdivided K3,3) and a K5 minor (its
    five spokes contracted), and an edge-bound claim that must fail
    (15 edges <= 3 * 10 - 6: the bound proves nothing here).
The script double-checks itself without planewit: it traces the faces of
each rotation system and checks the witnesses' rules in plain Python, and it
stops with an error if a fact does not hold.
"""
import hashlib
import math
import os

HERE = os.path.dirname(os.path.abspath(__file__))
VECTORS = os.path.dirname(HERE)
PHI = (1 + math.sqrt(5)) / 2
BY = "vectors/gen/make_vectors.py"


# ---- geometry: the solids' vertices, edges and rotation systems ----------

def signs(*values):
    """Every choice of sign for the nonzero values, in a fixed order."""
    out = [[]]
    for x in values:
        out = [p + [s] for p in out for s in ((x, -x) if x != 0 else (0,))]
    return [tuple(p) for p in out]


def cyclic(points):
    """Each point with its three cyclic coordinate permutations."""
    out = []
    for k in range(3):
        out += [tuple(p[(i + k) % 3] for i in range(3)) for p in points]
    return out


def solid_vertices(name):
    if name == "tetrahedron":
        return [(1, 1, 1), (1, -1, -1), (-1, 1, -1), (-1, -1, 1)]
    if name == "cube":
        return signs(1, 1, 1)
    if name == "octahedron":
        return cyclic(signs(1, 0, 0))
    if name == "icosahedron":
        return cyclic(signs(0, 1, PHI))
    if name == "dodecahedron":
        return signs(1, 1, 1) + cyclic(signs(0, 1 / PHI, PHI))
    raise ValueError(name)


def dist(p, q):
    return math.sqrt(sum((a - b) ** 2 for a, b in zip(p, q)))


def shortest_edges(points):
    """Edges of a convex polyhedron whose edges are exactly its shortest distances."""
    n = len(points)
    d = min(dist(points[i], points[j]) for i in range(n) for j in range(i + 1, n))
    return [(i, j) for i in range(n) for j in range(i + 1, n)
            if abs(dist(points[i], points[j]) - d) < 1e-9]


def sub(p, q):
    return tuple(a - b for a, b in zip(p, q))


def dot(p, q):
    return sum(a * b for a, b in zip(p, q))


def cross(p, q):
    return (p[1] * q[2] - p[2] * q[1], p[2] * q[0] - p[0] * q[2], p[0] * q[1] - p[1] * q[0])


def rotation_from_geometry(points, edges):
    """Neighbours counterclockwise around the outward normal (the solid is centred on 0)."""
    nbrs = neighbours(len(points), edges)
    rot = []
    for v, p in enumerate(points):
        first = sub(points[nbrs[v][0]], p)
        normal = p
        e1 = sub(first, tuple(x * dot(first, normal) / dot(normal, normal) for x in normal))
        e2 = cross(normal, e1)

        def angle(w):
            d = sub(points[w], p)
            return math.atan2(dot(d, e2), dot(d, e1)) % (2 * math.pi)
        rot.append(sorted(nbrs[v], key=angle))
    return rot


# ---- plain graph helpers and our own independent checks ------------------

def neighbours(n, edges):
    nbrs = [[] for _ in range(n)]
    for u, v in edges:
        nbrs[u].append(v)
        nbrs[v].append(u)
    return nbrs


def count_faces(rot):
    """Faces of a rotation system: orbits of (u -> v) |-> (v -> successor of u around v)."""
    seen = set()
    faces = 0
    for u in range(len(rot)):
        for v in rot[u]:
            if (u, v) in seen:
                continue
            faces += 1
            a, b = u, v
            while (a, b) not in seen:
                seen.add((a, b))
                around_b = rot[b]
                a, b = b, around_b[(around_b.index(a) + 1) % len(around_b)]
    return faces


def require(condition, what):
    if not condition:
        raise SystemExit("make_vectors.py: fact does not hold: " + what)


def check_subdivision(edges, left, right, paths):
    """Plain re-statement of the K3,3 subdivision rules, independent of the kernel."""
    es = {frozenset(e) for e in edges}
    pairs = set()
    inner = set()
    for p in paths:
        require(all(frozenset((a, b)) in es for a, b in zip(p, p[1:])), "path uses edges")
        require(len(set(p)) == len(p), "path is simple")
        ends = (p[0], p[-1])
        require((ends[0] in left) != (ends[1] in left), "path joins the two sides")
        require(set(ends) <= set(left) | set(right), "path ends at branch vertices")
        pairs.add(frozenset(ends))
        for x in p[1:-1]:
            require(x not in inner and x not in left and x not in right, "interiors disjoint")
            inner.add(x)
    require(len(pairs) == 9 == len(paths), "every cross pair joined once")


# ---- file writing ---------------------------------------------------------

def write(rel, header_lines, body_lines):
    text = "".join("# %s\n" % h for h in header_lines) + "".join(b + "\n" for b in body_lines)
    path = os.path.join(VECTORS, rel)
    with open(path, "w", encoding="ascii", newline="\n") as f:
        f.write(text)
    require(len(text) < 20000, rel + " stays small")
    return text.encode("ascii")


def graph_lines(n, edges):
    return ["graph %d %d" % (n, len(edges))] + ["%d %d" % e for e in edges]


def rotation_lines(rot, digest=None):
    head = ["certificate 1"]
    if digest:
        head.append("graph-sha256 " + digest)
    head.append("claim planar")
    return head + ["around %d : %s" % (v, " ".join(map(str, ws))) for v, ws in enumerate(rot)]


SOLIDS = [  # name, expected faces by Euler's polyhedron formula, bind the graph by hash?
    ("tetrahedron", 4, False),
    ("cube", 6, False),
    ("octahedron", 8, False),
    ("dodecahedron", 12, True),
    ("icosahedron", 20, True),
]


def make_solid(name, faces, bind):
    points = solid_vertices(name)
    edges = shortest_edges(points)
    n = len(points)
    rot = rotation_from_geometry(points, edges)
    require(n - len(edges) + faces == 2, name + ": Euler's polyhedron formula")
    require(count_faces(rot) == faces, name + ": traced faces")
    mirror = [list(reversed(ws)) for ws in rot]
    require(count_faces(mirror) == faces, name + ": mirrored faces")
    graph = write("graphs/%s.graph" % name, [
        "The %s's graph: %d vertices, %d edges (a convex polyhedron's skeleton)." % (name, n, len(edges)),
        "Generated by %s from the solid's vertex coordinates; edges join" % BY,
        "vertices at the shortest distance.  Planar, with %d faces by Euler's" % faces,
        "polyhedron formula V - E + F = 2."], graph_lines(n, edges))
    digest = hashlib.sha256(graph).hexdigest() if bind else None
    note = ["Lists follow the coordinates: counterclockwise around the outward normal."]
    if bind:
        note.append("graph-sha256 is the SHA-256 of graphs/%s.graph, computed by the generator." % name)
    write("certs/%s.cert" % name, [
        "A rotation system for graphs/%s.graph, generated by %s." % (name, BY)] + note + [
        "Expected: accepted, %d faces (Euler's polyhedron formula), 1 component." % faces],
        rotation_lines(rot, digest))
    write("certs/%s-mirror.cert" % name, [
        "The mirror image of certs/%s.cert (every list reversed), generated by %s." % (name, BY),
        "Without point lines a mirrored system is equally valid (format rule).",
        "Expected: accepted, %d faces (Euler's polyhedron formula), 1 component." % faces],
        rotation_lines(mirror, digest))
    if name == "cube":
        make_wrong_cube(n, edges, rot)


def make_wrong_cube(n, edges, rot):
    """Reversing one vertex's rotation puts the cube on a torus: V - E + F = 0."""
    wrong = [list(ws) for ws in rot]
    wrong[0] = list(reversed(wrong[0]))
    faces = count_faces(wrong)
    require(n - len(edges) + faces != 2, "cube with one rotation reversed is not a plane embedding")
    write("certs/cube-vertex0-reversed.cert", [
        "certs/cube.cert with vertex 0's list reversed, generated by %s." % BY,
        "Tracing the faces gives %d, so V - E + F = %d - %d + %d = %d, not 2." % (
            faces, n, len(edges), faces, n - len(edges) + faces),
        "Expected: rejected, euler."], rotation_lines(wrong))


# ---- the Petersen graph -----------------------------------------------------

def petersen():
    """Outer 5-cycle 0..4, spokes i -- i+5, inner pentagram i+5 -- (i+2)%5+5."""
    edges = [(i, (i + 1) % 5) for i in range(5)]
    edges += [(i, i + 5) for i in range(5)]
    edges += [(5 + i, 5 + (i + 2) % 5) for i in range(5)]
    return 10, [tuple(sorted(e)) for e in edges]


def trace_branch_paths(n, edges, removed):
    """Branch vertices and paths of the graph minus `removed` (degrees 2 and 3 only)."""
    kept = [e for e in edges if removed not in e]
    nbrs = neighbours(n, kept)
    branch = [v for v in range(n) if len(nbrs[v]) == 3]
    paths, used = [], set()
    for b in branch:
        for w in nbrs[b]:
            path = [b, w]
            while len(nbrs[path[-1]]) == 2:
                nxt = [x for x in nbrs[path[-1]] if x != path[-2]]
                path.append(nxt[0])
            if (path[-1], path[-2]) not in used:
                used.add((path[0], path[1]))
                paths.append(path)
    return branch, paths


def two_sides(branch, paths):
    """The branch vertices split by path ends: one side and the other (K3,3 is bipartite)."""
    side = {branch[0]: 0}
    for _ in range(len(branch)):
        for p in paths:
            a, b = p[0], p[-1]
            if a in side and b not in side:
                side[b] = 1 - side[a]
            if b in side and a not in side:
                side[a] = 1 - side[b]
    return [v for v in branch if side[v] == 0], [v for v in branch if side[v] == 1]


def make_petersen():
    n, edges = petersen()
    nbrs = neighbours(n, edges)
    require(all(len(x) == 3 for x in nbrs) and len(edges) == 15, "Petersen graph is 3-regular")
    write("graphs/petersen.graph", [
        "The Petersen graph: 10 vertices, 15 edges; outer 5-cycle 0-4, spokes",
        "i -- i+5, inner pentagram i+5 -- (i+2 mod 5)+5.  Generated by %s." % BY,
        "Non-planar (textbook fact)."], graph_lines(n, edges))
    branch, paths = trace_branch_paths(n, edges, removed=0)
    left, right = two_sides(branch, paths)
    check_subdivision(edges, left, right, paths)
    paths = [p if p[0] in left else list(reversed(p)) for p in paths]
    write("certs/petersen-k33.cert", [
        "A K3,3 subdivision in the Petersen graph, generated by %s:" % BY,
        "deleting vertex 0 leaves six vertices of degree 3 joined by nine paths.",
        "Expected: accepted (non-planar, textbook fact; Kuratowski 1930)."],
        ["certificate 1", "claim nonplanar",
         "subdivision k33 %s / %s" % (" ".join(map(str, left)), " ".join(map(str, right)))]
        + ["path " + " ".join(map(str, p)) for p in paths])
    sets = [[i, i + 5] for i in range(5)]
    for i in range(5):
        for j in range(i + 1, 5):
            require(any(u in sets[i] and v in sets[j] or v in sets[i] and u in sets[j]
                        for u, v in edges), "Petersen spokes contract to K5")
    write("certs/petersen-k5-minor.cert", [
        "A K5 minor of the Petersen graph, generated by %s: set i is" % BY,
        "the spoke {i, i+5}; outer cycle and pentagram join every pair of spokes.",
        "Expected: accepted (non-planar, textbook fact; Wagner 1937)."],
        ["certificate 1", "claim nonplanar", "minor k5"]
        + ["set %d : %d %d" % (i, s[0], s[1]) for i, s in enumerate(sets)])
    write("certs/petersen-edge-bound.cert", [
        "An edge-bound witness for the Petersen graph, generated by %s." % BY,
        "15 edges do not exceed 3 * 10 - 6 = 24 (common practice: the bound),",
        "so this witness proves nothing although the graph is non-planar.",
        "Expected: rejected, edge-bound."],
        ["certificate 1", "claim nonplanar", "edge-bound"])


def main():
    for name, faces, bind in SOLIDS:
        make_solid(name, faces, bind)
    make_petersen()


if __name__ == "__main__":
    main()
