"""certify_networkx.py - networkx (Debian python3-networkx) as a second peer
for the certify benchmark (issue 3): check_planarity with counterexample=True
on a planewit graph file, so it returns an embedding or a Kuratowski subgraph.
Only that call is timed; reading the file and building the graph are not.

usage: /usr/bin/python3 bench/certify_networkx.py GRAPH
prints one line of key=value pairs: seconds, planar, the counterexample's edge
count, and the process's peak resident set (KiB, whole interpreter included).
"""
import resource
import sys
import time

import networkx as nx


def read_graph(path):
    with open(path, encoding="ascii") as f:
        _, n, m = f.readline().split()
        g = nx.Graph()
        g.add_nodes_from(range(int(n)))
        g.add_edges_from(tuple(map(int, line.split())) for line in f)
    return g


def main():
    g = read_graph(sys.argv[1])
    start = time.perf_counter()
    planar, evidence = nx.check_planarity(g, counterexample=True)
    seconds = time.perf_counter() - start
    witness_edges = 0 if planar else evidence.number_of_edges()
    peak = resource.getrusage(resource.RUSAGE_SELF).ru_maxrss
    print(f"n={g.number_of_nodes()} m={g.number_of_edges()} planar={'yes' if planar else 'no'} "
          f"seconds={seconds:.3f} kuratowski_edges={witness_edges} peak_kib={peak}")


if __name__ == "__main__":
    main()
