// certify_boost.cpp - the benchmark peer for `planewit certify` (issue 3): the
// Boost Graph Library's boyer_myrvold_planarity_test asked, in one call, for an
// embedding and for a Kuratowski edge set, on a planewit graph file.  Only
// that call is timed; reading the file and building the adjacency list are not.
// Memory: the resident set before the call and the process's peak after it
// (VmRSS, VmHWM from /proc/self/status), so the call's own growth shows.
// usage: certify_boost GRAPH -> one line of key=value pairs (seconds, KiB)
#include <boost/graph/adjacency_list.hpp>
#include <boost/graph/boyer_myrvold_planar_test.hpp>

#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <iterator>
#include <vector>

using namespace boost;
typedef adjacency_list<vecS, vecS, undirectedS, property<vertex_index_t, int>,
                       property<edge_index_t, int>> ugraph;
typedef graph_traits<ugraph>::edge_descriptor edge_t;

static double now() {
    return std::chrono::duration<double>(std::chrono::steady_clock::now().time_since_epoch()).count();
}

static long status_kib(const char *key) {
    FILE *f = std::fopen("/proc/self/status", "r");
    char line[256];
    long kib = -1;
    std::size_t len = std::strlen(key);
    while (f && std::fgets(line, sizeof line, f))
        if (std::strncmp(line, key, len) == 0) kib = std::atol(line + len);
    if (f) std::fclose(f);
    return kib;
}

// Bench input written by certify_gen: a header line, then "U V" lines, no comments.
static bool read_graph(const char *path, ugraph &g, unsigned &n, unsigned &m) {
    FILE *f = std::fopen(path, "r");
    if (!f || std::fscanf(f, "graph %u %u", &n, &m) != 2) return false;
    g = ugraph(n);
    for (unsigned i = 0; i < m; i++) {
        unsigned a, b;
        if (std::fscanf(f, "%u %u", &a, &b) != 2) return false;
        put(edge_index, g, add_edge(a, b, g).first, static_cast<int>(i));
    }
    std::fclose(f);
    return true;
}

int main(int argc, char **argv) {
    ugraph g;
    unsigned n, m;
    if (argc != 2 || !read_graph(argv[1], g, n, m)) {
        std::fprintf(stderr, "usage: certify_boost GRAPH (a graph file certify_gen wrote)\n");
        return 2;
    }
    std::vector<std::vector<edge_t>> embedding(n);
    std::vector<edge_t> kuratowski;
    long rss_before = status_kib("VmRSS:");
    double t0 = now();
    bool planar = boyer_myrvold_planarity_test(
        boyer_myrvold_params::graph = g,
        boyer_myrvold_params::embedding = make_iterator_property_map(embedding.begin(), get(vertex_index, g)),
        boyer_myrvold_params::kuratowski_subgraph = std::back_inserter(kuratowski));
    double t1 = now();
    std::printf("n=%u m=%u planar=%s seconds=%.4f kuratowski_edges=%zu rss_before_kib=%ld "
                "peak_kib=%ld\n", n, m, planar ? "yes" : "no", t1 - t0, kuratowski.size(),
                rss_before, status_kib("VmHWM:"));
    return 0;
}
