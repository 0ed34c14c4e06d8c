#!/usr/bin/python3
"""Verdict agreement of `planewit certify` with two outside peers.

On a few thousand seeded random graphs of mixed size and density, planar and
not, planewit's verdict must equal the planarity verdict of networkx
(Debian python3-networkx, nx.check_planarity) and of the Boost Graph Library
(libboost-graph-dev, boyer_myrvold_planarity_test, through the small driver
tests/boost_driver.cpp).  The other way round, Boost's own evidence - its
embedding, or its Kuratowski edge set pruned to a bare subdivision - written in
planewit's certificate format must be accepted by planewit's kernel.

Usage: tests/check_certify_agree.py BUILD_DIR [SEED]   (or PW_SEED=...)
Run with Debian's /usr/bin/python3.
"""
import os
import random
import re
import subprocess
import sys
import tempfile

import networkx as nx

STREAM_GRAPHS = 3000   # through `certify --graph6`, against networkx
FILE_GRAPHS = 200      # through `certify GRAPH -o CERT`, against networkx and Boost


def relabel(rng, g):
    """The same graph with vertex ids shuffled, as integers 0..n-1."""
    order = list(g.nodes())
    rng.shuffle(order)
    return nx.relabel_nodes(g, {v: i for i, v in enumerate(order)})


def triangulated_grid(rng, n):
    """A grid with one diagonal per cell (planar), thinned, plus 0-2 random edges."""
    w = rng.randint(2, 8)
    h = max(2, n // w)
    g = nx.grid_2d_graph(w, h)
    g.add_edges_from(((x, y), (x + 1, y + 1)) for x in range(w - 1) for y in range(h - 1))
    for e in list(g.edges()):
        if rng.random() < 0.15:
            g.remove_edge(*e)
    nodes = list(g.nodes())
    for _ in range(rng.randint(0, 2)):
        a, b = rng.sample(nodes, 2)
        g.add_edge(a, b)
    return g


def hidden_kuratowski(rng, n):
    """K5 or K3,3 with subdivided edges, inside a random tree with a few extra edges."""
    core = nx.complete_graph(5) if rng.random() < 0.5 else nx.complete_bipartite_graph(3, 3)
    g = nx.Graph()
    label = len(core)
    for a, b in core.edges():
        chain = [a] + list(range(label, label + rng.randint(0, 3))) + [b]
        label += len(chain) - 2
        nx.add_path(g, chain)
    while g.number_of_nodes() < n:
        g.add_edge(rng.choice(list(g.nodes())), label)
        label += 1
    nodes = list(g.nodes())
    for _ in range(rng.randint(0, 2)):
        g.add_edge(*rng.sample(nodes, 2))
    return g


def random_graph(rng):
    kind = rng.random()
    n = rng.choice([rng.randint(1, 12), rng.randint(5, 40), rng.randint(40, 120)])
    if kind < 0.45:
        m = rng.randint(0, min(n * (n - 1) // 2, 3 * n))
        g = nx.gnm_random_graph(n, m, seed=rng.randrange(2**31))
    elif kind < 0.65:
        g = nx.random_tree(n, seed=rng.randrange(2**31)) if n > 1 else nx.empty_graph(n)
        nodes = list(g.nodes())
        for _ in range(rng.randint(0, 4) if n > 1 else 0):
            g.add_edge(*rng.sample(nodes, 2))
    elif kind < 0.85:
        g = triangulated_grid(rng, n)
    else:
        g = hidden_kuratowski(rng, n)
    g.remove_edges_from(nx.selfloop_edges(g))
    return relabel(rng, g)


def graph_text(rng, g):
    edges = [(a, b) if rng.random() < 0.5 else (b, a) for a, b in g.edges()]
    rng.shuffle(edges)
    return "graph %d %d\n" % (g.number_of_nodes(), len(edges)) + "".join(
        "%d %d\n" % e for e in edges)


class Tally:
    def __init__(self):
        self.failures = 0
        self.checks = 0
        self.trimmed = 0  # Boost Kuratowski sets that needed more than pruning pendant paths

    def expect(self, ok, message):
        self.checks += 1
        if not ok:
            self.failures += 1
            if self.failures <= 20:
                print("FAIL", message)


def run(args, **kw):
    return subprocess.run(args, capture_output=True, text=True, **kw)


def stream_agreement(bin_path, graphs, tmp, tally, witness):
    """Every graph through one `certify --graph6` run; each verdict against networkx."""
    path = os.path.join(tmp, "stream.g6")
    with open(path, "wb") as f:
        for g in graphs:
            f.write(nx.to_graph6_bytes(g, nodes=range(g.number_of_nodes()), header=False))
    args = [bin_path, "certify", "--graph6", path] + (["--witness", witness] if witness else [])
    got = run(args)
    tally.expect(got.returncode == 0, "certify --graph6 %s exit %d: %s" % (witness, got.returncode, got.stderr[-2000:]))
    verdicts = re.findall(r"^line (\d+): certified (planar|nonplanar) \(([a-z0-9-]+)\)", got.stdout, re.M)
    tally.expect(len(verdicts) == len(graphs), "%d verdict lines for %d graphs" % (len(verdicts), len(graphs)))
    for line, claim, kind in verdicts:
        g = graphs[int(line) - 1]
        expected = "planar" if nx.check_planarity(g)[0] else "nonplanar"  # networkx's verdict
        tally.expect(claim == expected, "graph6 line %s (%s): planewit %s by %s, networkx %s" % (
            line, nx.to_graph6_bytes(g, header=False).decode().strip(), claim, kind, expected))
    return sum(1 for v in verdicts if v[1] == "planar")


def file_agreement(bin_path, driver, rng, graphs, tmp, tally):
    """certify GRAPH -o CERT, then check; Boost's verdict and certificate for the same file."""
    graph, cert, peer = (os.path.join(tmp, name) for name in ("g.graph", "g.cert", "boost.cert"))
    for i, g in enumerate(graphs):
        with open(graph, "w") as f:
            f.write(graph_text(rng, g))
        expected = "planar" if nx.check_planarity(g)[0] else "nonplanar"  # networkx's verdict
        witness = ["--witness", "cheapest"] if i % 3 == 2 else []
        made = run([bin_path, "certify", graph, "-o", cert] + witness)
        claim = re.search(r"^accepted: (planar|nonplanar) ", made.stdout, re.M)
        tally.expect(made.returncode == 0 and claim and claim.group(1) == expected,
                     "graph %d: certify exit %d, %s, networkx %s\n%s" % (
                         i, made.returncode, claim and claim.group(1), expected, made.stderr[-1500:]))
        if made.returncode == 0:
            checked = run([bin_path, "check", graph, cert])
            tally.expect(checked.returncode == 0, "graph %d: check of certify's output: %s" % (i, checked.stdout))
        boost = run([driver, graph, peer])
        said = boost.stdout.split("\n")[0]
        tally.trimmed += "trimmed" in boost.stdout
        tally.expect(boost.returncode == 0 and said == expected,
                     "graph %d: Boost says %r (exit %d), networkx %s: %s" % (
                         i, said, boost.returncode, expected, boost.stderr))
        if boost.returncode == 0:
            peer_checked = run([bin_path, "check", graph, peer])
            tally.expect(peer_checked.returncode == 0,
                         "graph %d: kernel refuses Boost's certificate: %s" % (i, peer_checked.stdout))


def build_driver(build):
    driver = os.path.join(build, "tests", "boost_driver")
    os.makedirs(os.path.dirname(driver), exist_ok=True)
    source = os.path.join(os.path.dirname(os.path.abspath(__file__)), "boost_driver.cpp")
    if not os.path.exists(driver) or os.path.getmtime(driver) < os.path.getmtime(source):
        subprocess.run(["g++", "-O2", "-std=c++17", "-w", "-o", driver, source], check=True)
    return driver


def main():
    build = sys.argv[1] if len(sys.argv) > 1 else "build"
    seed = int(sys.argv[2] if len(sys.argv) > 2 else os.environ.get("PW_SEED", 20261201))
    print("check_certify_agree: seed %d (rerun: PW_SEED=%d)" % (seed, seed))
    rng = random.Random(seed)
    bin_path = os.path.join(build, "planewit")
    driver = build_driver(build)
    graphs = [random_graph(rng) for _ in range(STREAM_GRAPHS)]
    tally = Tally()
    with tempfile.TemporaryDirectory() as tmp:
        planar = stream_agreement(bin_path, graphs, tmp, tally, None)
        stream_agreement(bin_path, graphs, tmp, tally, "cheapest")
        file_agreement(bin_path, driver, rng, graphs[:FILE_GRAPHS], tmp, tally)
    print("check_certify_agree: %d graphs (%d planar, %d not), %d of them also through files "
          "and Boost (%d Boost edge sets trimmed to a subdivision); %d checks, %d failed" % (
              len(graphs), planar, len(graphs) - planar, FILE_GRAPHS, tally.trimmed,
              tally.checks, tally.failures))
    return 1 if tally.failures else 0


if __name__ == "__main__":
    sys.exit(main())
