// draw_boost.cpp - the Boost Graph Library's straight-line drawing pipeline on a
// planewit graph file, timed step by step, for the drawing benchmark:
// embed (boyer_myrvold_planarity_test), make_connected, make_biconnected_planar,
// make_maximal_planar (each followed by re-embedding, as the library requires),
// planar_canonical_ordering, chrobak_payne_straight_line_drawing.
// usage: draw_boost GRAPH -> one line of key=value pairs (seconds, grid)
#include <boost/graph/adjacency_list.hpp>
#include <boost/graph/boyer_myrvold_planar_test.hpp>
#include <boost/graph/chrobak_payne_drawing.hpp>
#include <boost/graph/make_biconnected_planar.hpp>
#include <boost/graph/make_connected.hpp>
#include <boost/graph/make_maximal_planar.hpp>
#include <boost/graph/planar_canonical_ordering.hpp>
#include <chrono>
#include <cstdio>
#include <vector>

using namespace boost;
typedef adjacency_list<vecS, vecS, undirectedS, property<vertex_index_t, int>,
                       property<edge_index_t, int>> ugraph;
typedef graph_traits<ugraph>::edge_descriptor edge_t;
typedef std::vector<std::vector<edge_t>> embedding_t;
struct coord { std::size_t x, y; };

static double now() {
    return std::chrono::duration<double>(std::chrono::steady_clock::now().time_since_epoch()).count();
}

static void reindex(ugraph &g) {
    int k = 0;
    graph_traits<ugraph>::edge_iterator ei, ee;
    for (tie(ei, ee) = edges(g); ei != ee; ++ei) put(edge_index, g, *ei, k++);
}

static bool embed(ugraph &g, embedding_t &emb) {
    reindex(g);
    emb.assign(num_vertices(g), std::vector<edge_t>());
    return boyer_myrvold_planarity_test(boyer_myrvold_params::graph = g,
                                        boyer_myrvold_params::embedding = &emb[0]);
}

int main(int argc, char **argv) {
    if (argc != 2) { std::fprintf(stderr, "usage: draw_boost GRAPH\n"); return 2; }
    FILE *f = std::fopen(argv[1], "r");
    unsigned n, m, a, b;
    if (!f || std::fscanf(f, "graph %u %u", &n, &m) != 2) return 2;
    double t0 = now();
    ugraph g(n);
    for (unsigned i = 0; i < m; i++) {
        if (std::fscanf(f, "%u %u", &a, &b) != 2) return 2;
        add_edge(a, b, g);
    }
    double t1 = now();
    embedding_t emb;
    if (!embed(g, emb)) { std::printf("boost: not planar\n"); return 1; }
    double t2 = now();
    make_connected(g);
    embed(g, emb);
    double t3 = now();
    make_biconnected_planar(g, &emb[0]);
    embed(g, emb);
    double t4 = now();
    make_maximal_planar(g, &emb[0]);
    embed(g, emb);
    double t5 = now();
    std::vector<graph_traits<ugraph>::vertex_descriptor> order;
    planar_canonical_ordering(g, &emb[0], std::back_inserter(order));
    double t6 = now();
    std::vector<coord> at(num_vertices(g));
    chrobak_payne_straight_line_drawing(g, emb, order.begin(), order.end(),
        make_iterator_property_map(at.begin(), get(vertex_index, g)));
    double t7 = now();
    std::size_t w = 0, h = 0;
    for (auto &c : at) { w = c.x > w ? c.x : w; h = c.y > h ? c.y : h; }
    std::printf("n=%u m=%u read=%.3f embed=%.3f connect=%.3f biconnect=%.3f maximal=%.3f "
                "order=%.3f chrobak_payne=%.3f pipeline=%.3f grid=%zux%zu\n",
                n, m, t1 - t0, t2 - t1, t3 - t2, t4 - t3, t5 - t4, t6 - t5, t7 - t6, t7 - t1, w, h);
    return 0;
}
