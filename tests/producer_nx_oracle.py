"""Oracle for tests/test_producer.c: seeded random graphs with networkx's verdict.

Usage: producer_nx_oracle.py SEED COUNT
Prints one line per graph: "<graph6> <1 if networkx says planar else 0>".
The sizes and densities straddle the planarity threshold (M around 1.5 N to
3 N) so both verdicts are common; a few sparse and dense ones are mixed in.
Only networkx decides the verdicts printed here; the C test compares them
with the producer's certified answer.
"""
import random
import sys

import networkx as nx


def graph6(n, edges):
    """graph6 encoding (N < 63 here), upper triangle column by column."""
    bits = []
    adj = set(edges)
    for j in range(1, n):
        for i in range(j):
            bits.append(1 if (i, j) in adj else 0)
    while len(bits) % 6:
        bits.append(0)
    out = [chr(63 + n)]
    for k in range(0, len(bits), 6):
        value = 0
        for b in bits[k:k + 6]:
            value = value * 2 + b
        out.append(chr(63 + value))
    return "".join(out)


def main():
    seed, count = int(sys.argv[1]), int(sys.argv[2])
    rnd = random.Random(seed)
    for _ in range(count):
        n = rnd.randint(1, 40)
        density = rnd.choice([0.5, 1.0, 1.5, 2.0, 2.3, 2.6, 3.0, 4.0])
        m = min(int(density * n), n * (n - 1) // 2)
        edges = set()
        while len(edges) < m:
            a, b = rnd.randrange(n), rnd.randrange(n)
            if a != b:
                edges.add((min(a, b), max(a, b)))
        g = nx.Graph()
        g.add_nodes_from(range(n))
        g.add_edges_from(edges)
        planar, _ = nx.check_planarity(g)
        print(graph6(n, edges), 1 if planar else 0)


if __name__ == "__main__":
    main()
