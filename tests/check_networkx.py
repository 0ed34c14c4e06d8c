#!/usr/bin/python3
"""Cross-check against an outside solver: networkx (Debian python3-networkx).

    /usr/bin/python3 tests/check_networkx.py BUILD_DIR      (PW_SEED=N to replay)

For a few hundred seeded random graphs (0 to 60 vertices, sparse to dense,
some disconnected, some with unused vertex ids) networkx decides planarity
itself (networkx.check_planarity).  Its answer is turned into our certificate
format - its PlanarEmbedding into around lines, its Kuratowski counterexample
into a "subdivision k5 / k33" witness and into a minor witness - and
`planewit check` must accept every one.  Then each certificate is perturbed in
ways that break it, and planewit must reject it with the expected reason.
Face counts of accepted planar certificates are compared with networkx's own
face traversal of its embedding.

Source of every expectation below: networkx 2.8's planarity result (its
embedding or counterexample), unless a line says "format rule" (issue 2's
certificate grammar) or "common practice" (the 3N - 6 edge bound).
Prints the seed and the counts; exits non-zero on any mismatch.
"""
import concurrent.futures
import hashlib
import json
import os
import random
import shutil
import subprocess
import sys
import tempfile
import time

import networkx as nx

MAX_N = 60
GRAPHS = 250
# Every perturbation kind applies to most graphs; a random few per graph keep the
# run short (each planewit start costs milliseconds) while every kind still runs
# dozens of times.
PERTURBATIONS_PER_GRAPH = 3


# ---- random graphs (our own generators, all driven by one seeded Random) ----

def triangulation(rng, n):
    """A random maximal planar graph: each new vertex goes into a random triangle."""
    g = nx.Graph([(0, 1), (1, 2), (2, 0)])
    faces = [(0, 1, 2), (0, 2, 1)]
    for v in range(3, n):
        a, b, c = faces.pop(rng.randrange(len(faces)))
        g.add_edges_from([(v, a), (v, b), (v, c)])
        faces += [(a, b, v), (b, c, v), (c, a, v)]
    return g


def thinned(rng, g, keep):
    return nx.Graph([e for e in g.edges if rng.random() < keep])


def random_graph(rng, max_n=MAX_N, union=True):
    kind = rng.choice(["triangulation", "thinned", "gnp", "plus-edges"] + (["union"] if union else []))
    n = rng.randint(0, max_n)
    if kind == "triangulation" and n >= 3:
        g = triangulation(rng, n)
    elif kind == "thinned" and n >= 3:
        g = thinned(rng, triangulation(rng, n), rng.choice([0.4, 0.7, 0.9]))
    elif kind == "plus-edges" and n >= 5:
        n = min(n, 36)  # networkx's counterexample search grows fast with the edge count
        g = triangulation(rng, n)
        for _ in range(rng.randint(1, 4)):
            u, w = rng.sample(range(n), 2)
            g.add_edge(u, w)
    elif kind == "union":
        parts = [random_graph(rng, max_n // 2, False)[0] for _ in range(2)]
        g = nx.disjoint_union(parts[0], parts[1])
    else:
        degree = rng.choice([0.5, 1, 2, 3, 4, 5])  # mean degree: sparse to well past planar
        g = nx.gnp_random_graph(n, min(1.0, degree / max(n, 1)), seed=rng.randrange(2**31))
    return relabelled(rng, g, n), kind


def relabelled(rng, g, n):
    """Shuffles ids and sometimes leaves ids above the largest used one unused."""
    size = max(n, g.number_of_nodes() and max(g.nodes) + 1)
    size += rng.choice([0, 0, 0, 1, 3])
    perm = list(range(size))
    rng.shuffle(perm)
    h = nx.Graph()
    h.add_nodes_from(range(size))
    h.add_edges_from((perm[u], perm[w]) for u, w in g.edges)
    return h


# ---- our file formats ---------------------------------------------------------

def graph_text(g, rng):
    edges = [(u, w) if rng.random() < 0.5 else (w, u) for u, w in g.edges]
    rng.shuffle(edges)
    return "graph %d %d\n" % (g.number_of_nodes(), len(edges)) + "".join("%d %d\n" % e for e in edges)


def cert_text(claim, lines, digest=None):
    head = ["certificate 1"] + (["graph-sha256 " + digest] if digest else []) + ["claim " + claim]
    return "\n".join(head + lines) + "\n"


def around_lines(g, embedding):
    """networkx gives neighbours clockwise; ours are counterclockwise, so each list
    is reversed (without point lines a mirror would be accepted too: format rule)."""
    out = []
    for v in g.nodes:
        cw = list(embedding.neighbors_cw_order(v)) if v in embedding else []
        out.append(("around %d : %s" % (v, " ".join(map(str, reversed(cw))))).rstrip())
    return out


def networkx_faces(g, embedding):
    """Faces by networkx's own traversal, plus one per isolated vertex."""
    seen, faces = set(), 0
    for u, w in embedding.edges:
        if (u, w) not in seen:
            embedding.traverse_face(u, w, mark_half_edges=seen)
            faces += 1
    return faces + sum(1 for v in g.nodes if g.degree(v) == 0)


def kuratowski_paths(k):
    """Branch vertices (degree >= 3) of networkx's counterexample and the paths between them."""
    branch = sorted(v for v in k.nodes if k.degree(v) >= 3)
    paths, used = [], set()
    for b in branch:
        for w in sorted(k.neighbors(b)):
            if (b, w) in used:
                continue
            path = [b, w]
            while k.degree(path[-1]) == 2:
                path.append(next(x for x in k.neighbors(path[-1]) if x != path[-2]))
            used.add((path[-1], path[-2]))
            paths.append(path)
    return branch, paths


def two_sides(branch, paths):
    side = {branch[0]: 0}
    while len(side) < len(branch):
        for p in paths:
            for a, b in ((p[0], p[-1]), (p[-1], p[0])):
                if a in side and b not in side:
                    side[b] = 1 - side[a]
    return [v for v in branch if side[v] == 0], [v for v in branch if side[v] == 1]


def subdivision_lines(branch, paths):
    if len(branch) == 5:
        head = "subdivision k5 " + " ".join(map(str, branch))
        return [head] + ["path " + " ".join(map(str, p)) for p in paths], branch
    left, right = two_sides(branch, paths)
    paths = [p if p[0] in left else list(reversed(p)) for p in paths]
    head = "subdivision k33 %s / %s" % (" ".join(map(str, left)), " ".join(map(str, right)))
    return [head] + ["path " + " ".join(map(str, p)) for p in paths], left + right


def minor_lines(order, paths):
    """Set i: branch vertex order[i] and the interiors of the paths starting there."""
    sets = {b: [b] for b in order}
    for p in paths:
        sets[p[0]] += p[1:-1]
    kind = "k5" if len(order) == 5 else "k33"
    return ["minor " + kind] + ["set %d : %s" % (i, " ".join(map(str, sets[b]))) for i, b in enumerate(order)]


# ---- running planewit -------------------------------------------------------------

class Checker:
    """Collects (graph, certificate, expectation) jobs, then runs planewit on them."""

    def __init__(self, binary, workdir):
        self.binary, self.workdir = binary, workdir
        self.jobs = []
        self.candidates = []
        self.failures = 0
        self.tally = {}

    def run(self, graph_path, cert, label, want, faces=None):
        """want: 'accepted' or the reason name that must reject."""
        cert_path = os.path.join(self.workdir, "c%d.cert" % len(self.jobs))
        with open(cert_path, "w", encoding="ascii") as f:
            f.write(cert)
        self.jobs.append((graph_path, cert_path, label, want, faces))
        self.tally[label] = self.tally.get(label, 0) + 1

    def maybe(self, graph_path, cert, label, want, faces=None):
        """A perturbation: kept as a candidate; take() runs a random few per graph."""
        self.candidates.append((graph_path, cert, label, want, faces))

    def take(self, rng, count):
        for job in rng.sample(self.candidates, min(count, len(self.candidates))):
            self.run(*job)
        self.candidates = []

    def one(self, job):
        graph_path, cert_path, label, want, faces = job
        proc = subprocess.run([self.binary, "check", graph_path, cert_path, "--json"],
                              capture_output=True, text=True, check=False)
        try:
            rec = json.loads(proc.stdout)
            got = "accepted" if rec["verdict"] == "accepted" else rec["reason"]["name"]
            got_faces = rec["counts"]["faces"]
        except (ValueError, KeyError):
            got, got_faces = "no JSON record (exit %d): %s" % (proc.returncode, proc.stderr.strip()), None
        status = 0 if want == "accepted" else 1
        if got == want and proc.returncode == status and (faces is None or got_faces == faces):
            return None
        with open(cert_path, encoding="ascii") as f:
            cert = f.read()
        return "MISMATCH %s: expected %s%s, got %s%s (graph %s)\n%s" % (
            label, want, "" if faces is None else " with %d faces" % faces, got,
            "" if faces is None else " with %s faces" % got_faces, graph_path, cert)

    def finish(self):
        with concurrent.futures.ThreadPoolExecutor(max_workers=os.cpu_count() or 2) as pool:
            for problem in pool.map(self.one, self.jobs):
                if problem:
                    self.failures += 1
                    print(problem, file=sys.stderr)


# ---- the checks per graph ---------------------------------------------------------

def check_planar(chk, rng, g, gpath, digest, embedding):
    lines = around_lines(g, embedding)
    faces = networkx_faces(g, embedding)
    chk.run(gpath, cert_text("planar", lines), "planar: networkx embedding", "accepted", faces)
    chk.maybe(gpath, cert_text("planar", lines, digest), "planar: with graph-sha256", "accepted", faces)
    chk.maybe(gpath, cert_text("planar", lines, hashlib.sha256(b"other bytes").hexdigest()),
            "planar: graph-sha256 of other bytes", "graph-hash-mismatch")
    if g.number_of_nodes() >= 3:
        chk.maybe(gpath, cert_text("nonplanar", ["edge-bound"]),
                "planar: edge-bound claim (common practice: M <= 3N - 6)", "edge-bound")
    if g.number_of_nodes() > 0:
        dropped = lines[:]
        del dropped[rng.randrange(len(dropped))]
        chk.maybe(gpath, cert_text("planar", dropped), "planar: an around line removed", "around-count")
    perturb_rotation(chk, rng, g, gpath, embedding)


def list_of(embedding, v):
    return list(reversed(list(embedding.neighbors_cw_order(v))))


def perturb_rotation(chk, rng, g, gpath, embedding):
    def with_list(v, new):
        return [("around %d : %s" % (v, " ".join(map(str, new)))).rstrip() if line.split()[1] == str(v)
                else line for line in around_lines(g, embedding)]
    touched = [v for v in g.nodes if g.degree(v) >= 1]
    if not touched:
        return
    v = rng.choice(touched)
    order = list_of(embedding, v)
    chk.maybe(gpath, cert_text("planar", with_list(v, order[1:])), "planar: a neighbour dropped",
            "neighbour-missing")
    chk.maybe(gpath, cert_text("planar", with_list(v, order + [order[0]])), "planar: a neighbour twice",
            "listed-twice")
    strangers = [w for w in g.nodes if w != v and not g.has_edge(v, w)]
    if strangers:
        chk.maybe(gpath, cert_text("planar", with_list(v, order + [rng.choice(strangers)])),
                "planar: a non-neighbour listed", "not-neighbour")
    # At a vertex of degree >= 3 that is no cut vertex every corner lies on its own
    # face, so any other cyclic order merges faces and V - E + F drops below 2.
    cut = set(nx.articulation_points(g))
    inner = [x for x in g.nodes if g.degree(x) >= 3 and x not in cut]
    if inner:
        x = rng.choice(inner)
        order = list_of(embedding, x)
        i, j = rng.sample(range(len(order)), 2)
        order[i], order[j] = order[j], order[i]
        chk.maybe(gpath, cert_text("planar", with_list(x, order)),
                "planar: two neighbours swapped at a non-cut vertex", "euler")


def check_nonplanar(chk, rng, g, gpath, digest, counterexample):
    branch, paths = kuratowski_paths(counterexample)
    if len(branch) not in (5, 6) or len(paths) != (10 if len(branch) == 5 else 9):
        chk.failures += 1
        print("MISMATCH networkx counterexample is not a K5/K3,3 subdivision: %s" % branch, file=sys.stderr)
        return
    lines, order = subdivision_lines(branch, paths)
    oriented = [[int(x) for x in line.split()[1:]] for line in lines[1:]]
    chk.run(gpath, cert_text("nonplanar", lines), "nonplanar: networkx counterexample", "accepted")
    chk.maybe(gpath, cert_text("nonplanar", lines, digest), "nonplanar: with graph-sha256", "accepted")
    chk.run(gpath, cert_text("nonplanar", minor_lines(order, oriented)), "nonplanar: as a minor", "accepted")
    chk.maybe(gpath, cert_text("nonplanar", lines, "0" * 64), "nonplanar: graph-sha256 zeros",
            "graph-hash-mismatch")
    if g.number_of_edges() > 3 * g.number_of_nodes() - 6:
        chk.maybe(gpath, cert_text("nonplanar", ["edge-bound"]), "nonplanar: edge-bound (common practice)",
                "accepted")
    perturb_paths(chk, rng, g, gpath, lines, order, counterexample)


def perturb_paths(chk, rng, g, gpath, lines, order, counterexample):
    k = rng.randrange(1, len(lines))
    path = lines[k].split()[1:]
    reversed_ = lines[:k] + ["path " + " ".join(reversed(path))] + lines[k + 1:]
    chk.maybe(gpath, cert_text("nonplanar", reversed_), "nonplanar: a path reversed (format rule: either direction)",
            "accepted")
    cut = lines[:k] + ["path " + " ".join(path[:-1])] + lines[k + 1:]
    chk.maybe(gpath, cert_text("nonplanar", cut), "nonplanar: a path cut short", "path-ends")
    chk.maybe(gpath, cert_text("nonplanar", lines[:k] + lines[k + 1:]), "nonplanar: a path line removed",
            "witness-lines")
    head = lines[0].split()
    slot = rng.choice([i for i, t in enumerate(head) if i >= 2 and t != "/"])
    outside = [v for v in g.nodes if v not in counterexample]
    if outside:
        head2 = head[:slot] + [str(rng.choice(outside))] + head[slot + 1:]
        chk.maybe(gpath, cert_text("nonplanar", [" ".join(head2)] + lines[1:]),
                "nonplanar: a branch vertex moved off the subgraph", "path-ends")
    other = rng.choice([t for i, t in enumerate(head) if i >= 2 and t != "/" and i != slot])
    head3 = head[:slot] + [other] + head[slot + 1:]
    chk.maybe(gpath, cert_text("nonplanar", [" ".join(head3)] + lines[1:]),
            "nonplanar: a branch vertex named twice", "branch-repeated")


def check_graphs(chk, rng, work):
    """Generates the graphs, asks networkx, queues the planewit jobs; returns the kinds seen."""
    kinds = {"planar": 0, "nonplanar": 0, "disconnected": 0}
    for i in range(GRAPHS):
        g, _ = random_graph(rng)
        text = graph_text(g, rng)
        gpath = os.path.join(work, "g%d.graph" % i)
        with open(gpath, "w", encoding="ascii") as f:
            f.write(text)
        digest = hashlib.sha256(text.encode("ascii")).hexdigest()
        planar, witness = nx.check_planarity(g, counterexample=True)
        kinds["planar" if planar else "nonplanar"] += 1
        kinds["disconnected"] += g.number_of_nodes() > 0 and not nx.is_connected(g)
        if planar:
            check_planar(chk, rng, g, gpath, digest, witness)
        else:
            check_nonplanar(chk, rng, g, gpath, digest, witness)
        chk.take(rng, PERTURBATIONS_PER_GRAPH)
    return kinds


def main():
    build = sys.argv[1] if len(sys.argv) > 1 else "build"
    seed = int(os.environ.get("PW_SEED", "20261201"))
    print("networkx %s cross-check, seed %d (set PW_SEED to replay another)" % (nx.__version__, seed))
    binary = os.path.join(build, "planewit")
    if not os.access(binary, os.X_OK):
        print("check_networkx.py: %s is missing: build it first (make)" % binary, file=sys.stderr)
        return 2
    started = time.monotonic()
    work = tempfile.mkdtemp(prefix="pw-networkx-")
    chk = Checker(binary, work)
    kinds = check_graphs(chk, random.Random(seed), work)
    networkx_seconds = time.monotonic() - started
    chk.finish()
    print("graphs: %d planar, %d non-planar (networkx), %d disconnected" % (
        kinds["planar"], kinds["nonplanar"], kinds["disconnected"]))
    for label in sorted(chk.tally):
        print("  %5d  %s" % (chk.tally[label], label))
    print("planewit runs: %d, mismatches: %d (%.1f s generating and in networkx, %.1f s in all)" % (
        len(chk.jobs), chk.failures, networkx_seconds, time.monotonic() - started))
    if chk.failures:
        print("the graphs and certificates are kept in %s" % work, file=sys.stderr)
        return 1
    shutil.rmtree(work)
    return 0


if __name__ == "__main__":
    sys.exit(main())
