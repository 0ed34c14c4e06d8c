// boost_driver.cpp - an outside peer for tests/check_certify_agree.py: reads a
// planewit graph file (format-spec/graph.md), asks the Boost Graph Library's
// planarity test for a verdict with its embedding or Kuratowski edge set, and
// writes that evidence in planewit's certificate format, for planewit's kernel
// to check.  Test code only; not part of planewit.
//
// Usage: boost_driver GRAPH CERT_OUT
// Prints "planar" or "nonplanar", then "trimmed K edges" when Boost's Kuratowski edge set
// (K edges) had to be shrunk beyond pruning pendant paths to become a bare subdivision.
// Exit: 0 done, 2 unreadable graph, 3 no subdivision found in Boost's edge set
#include <boost/graph/adjacency_list.hpp>
#include <boost/graph/boyer_myrvold_planar_test.hpp>
#include <boost/graph/properties.hpp>

#include <algorithm>
#include <cstdio>
#include <fstream>
#include <iostream>
#include <iterator>
#include <map>
#include <set>
#include <sstream>
#include <string>
#include <vector>

using Graph = boost::adjacency_list<boost::vecS, boost::vecS, boost::undirectedS,
                                    boost::property<boost::vertex_index_t, int>,
                                    boost::property<boost::edge_index_t, int>>;
using Edge = boost::graph_traits<Graph>::edge_descriptor;
using Adjacency = std::vector<std::vector<unsigned>>;

// The graph file's header and edge lines; '#' comments and blank lines skipped.
static bool read_graph(const char *path, unsigned &n, std::vector<std::pair<unsigned, unsigned>> &edges)
{
    std::ifstream in(path);
    std::string line, word;
    bool header = false;
    while (std::getline(in, line)) {
        line = line.substr(0, line.find('#'));
        std::istringstream fields(line);
        if (!header) {
            unsigned m;
            if (!(fields >> word))
                continue;
            if (word != "graph" || !(fields >> n >> m))
                return false;
            header = true;
            continue;
        }
        unsigned u, v;
        if (fields >> u >> v)
            edges.emplace_back(u, v);
    }
    return header;
}

static unsigned other_end(const Graph &g, Edge e, unsigned v)
{
    unsigned s = static_cast<unsigned>(boost::source(e, g));
    return s == v ? static_cast<unsigned>(boost::target(e, g)) : s;
}

static void write_rotation(std::ostream &out, const Graph &g, unsigned n,
                           const std::vector<std::vector<Edge>> &embedding)
{
    out << "certificate 1\nclaim planar\n";
    for (unsigned v = 0; v < n; v++) {
        out << "around " << v << " :";
        for (Edge e : embedding[v])
            out << ' ' << other_end(g, e, v);
        out << '\n';
    }
}

// Boost's Kuratowski edge sets may carry pendant paths: peel degree-1 vertices away.
static void prune_pendants(Adjacency &adj)
{
    std::vector<unsigned> queue;
    for (unsigned v = 0; v < adj.size(); v++)
        if (adj[v].size() == 1)
            queue.push_back(v);
    while (!queue.empty()) {
        unsigned v = queue.back();
        queue.pop_back();
        if (adj[v].size() != 1)
            continue;
        unsigned w = adj[v][0];
        adj[v].clear();
        auto &back = adj[w];
        back.erase(std::find(back.begin(), back.end(), v));
        if (back.size() == 1)
            queue.push_back(w);
    }
}

static bool boost_planar(unsigned n, const std::vector<std::pair<unsigned, unsigned>> &edges)
{
    Graph g(n);
    int index = 0;
    for (auto &e : edges)
        boost::put(boost::edge_index, g, boost::add_edge(e.first, e.second, g).first, index++);
    return boost::boyer_myrvold_planarity_test(g);
}

// Boost's Kuratowski edge set can hold more than a subdivision even after pruning pendant
// paths.  Shrink it to a minimal non-planar subgraph by dropping every edge whose removal
// keeps it non-planar (Boost answers each test); by Kuratowski's theorem (1930) what
// remains, less isolated vertices, is a subdivision of K5 or K3,3.  Quadratic: test code only.
static Adjacency minimal_nonplanar(unsigned n, std::vector<std::pair<unsigned, unsigned>> edges)
{
    for (size_t i = 0; i < edges.size();) {
        auto without = edges;
        without.erase(without.begin() + static_cast<long>(i));
        if (!boost_planar(n, without))
            edges = without;
        else
            i++;
    }
    Adjacency adj(n);
    for (auto &e : edges) {
        adj[e.first].push_back(e.second);
        adj[e.second].push_back(e.first);
    }
    return adj;
}

// From branch vertex b along neighbour first, through degree-2 vertices, to the next branch vertex.
static std::vector<unsigned> trace(const Adjacency &adj, const std::set<unsigned> &branch, unsigned b,
                                   unsigned first)
{
    std::vector<unsigned> path{b, first};
    while (!branch.count(path.back())) {
        const auto &next = adj[path.back()];
        path.push_back(next[0] == path[path.size() - 2] ? next[1] : next[0]);
    }
    return path;
}

// The pruned edge set as a planewit subdivision certificate; false if it is not one.
static bool write_subdivision(std::ostream &out, Adjacency adj)
{
    prune_pendants(adj);
    std::set<unsigned> branch;
    std::map<unsigned, unsigned> degrees;
    for (unsigned v = 0; v < adj.size(); v++) {
        if (adj[v].size() >= 3)
            branch.insert(v);
        if (!adj[v].empty())
            degrees[static_cast<unsigned>(adj[v].size())]++;
    }
    bool k5 = branch.size() == 5 && degrees[4] == 5, k33 = branch.size() == 6 && degrees[3] == 6;
    if (!(k5 || k33) || degrees.size() > 2 || (degrees.size() == 2 && !degrees.count(2)))
        return false;
    std::vector<std::vector<unsigned>> paths;
    std::map<unsigned, std::set<unsigned>> joined;
    for (unsigned b : branch)
        for (unsigned w : adj[b]) {
            auto p = trace(adj, branch, b, w);
            if (b < p.back())
                paths.push_back(p);
            joined[b].insert(p.back());
        }
    std::vector<unsigned> side_a, side_b, order(branch.begin(), branch.end());
    if (k33) { // the side of the first branch vertex is the set of those it is not joined to
        for (unsigned b : order)
            (b == order[0] || !joined[order[0]].count(b) ? side_a : side_b).push_back(b);
        if (side_a.size() != 3)
            return false;
    }
    out << "certificate 1\nclaim nonplanar\nsubdivision " << (k5 ? "k5" : "k33");
    if (k5)
        for (unsigned b : order)
            out << ' ' << b;
    else
        out << ' ' << side_a[0] << ' ' << side_a[1] << ' ' << side_a[2] << " / " << side_b[0] << ' '
            << side_b[1] << ' ' << side_b[2];
    out << '\n';
    for (const auto &p : paths) {
        out << "path";
        for (unsigned v : p)
            out << ' ' << v;
        out << '\n';
    }
    return true;
}

int main(int argc, char **argv)
{
    unsigned n = 0;
    std::vector<std::pair<unsigned, unsigned>> edges;
    if (argc != 3 || !read_graph(argv[1], n, edges)) {
        std::cerr << "boost_driver: usage: boost_driver GRAPH CERT_OUT (a readable graph file)\n";
        return 2;
    }
    Graph g(n);
    int index = 0;
    for (auto &e : edges)
        boost::put(boost::edge_index, g, boost::add_edge(e.first, e.second, g).first, index++);
    std::vector<std::vector<Edge>> embedding(n);
    std::vector<Edge> kuratowski;
    bool planar = boost::boyer_myrvold_planarity_test(
        boost::boyer_myrvold_params::graph = g,
        boost::boyer_myrvold_params::embedding = &embedding[0],
        boost::boyer_myrvold_params::kuratowski_subgraph = std::back_inserter(kuratowski));
    std::ofstream out(argv[2]);
    std::cout << (planar ? "planar" : "nonplanar") << '\n';
    if (planar) {
        write_rotation(out, g, n, embedding);
        return 0;
    }
    Adjacency adj(n);
    std::vector<std::pair<unsigned, unsigned>> set;
    for (Edge e : kuratowski) {
        unsigned s = static_cast<unsigned>(boost::source(e, g)), t = static_cast<unsigned>(boost::target(e, g));
        adj[s].push_back(t);
        adj[t].push_back(s);
        set.emplace_back(s, t);
    }
    std::ostringstream text;
    if (write_subdivision(text, adj)) {
        out << text.str();
        return 0;
    }
    // Reported on stdout so the test can count how often Boost's set needed more than pruning.
    std::cout << "trimmed " << set.size() << " edges\n";
    if (!write_subdivision(out, minimal_nonplanar(n, set))) {
        std::cerr << "boost_driver: no K5 or K3,3 subdivision found in Boost's Kuratowski edge set\n";
        return 3;
    }
    return 0;
}
