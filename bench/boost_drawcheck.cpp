// boost_drawcheck.cpp - benchmark peer: reads a planewit graph file and the
// point lines of a certificate, and times the Boost Graph Library's
// is_straight_line_drawing on them.  Prints "<seconds> <0|1>".
#include <boost/graph/adjacency_list.hpp>
#include <boost/graph/is_straight_line_drawing.hpp>
#include <chrono>
#include <fstream>
#include <iostream>
#include <sstream>
#include <string>
#include <vector>

struct coord_t {
    std::size_t x;
    std::size_t y;
};

using graph = boost::adjacency_list<boost::vecS, boost::vecS, boost::undirectedS,
                                    boost::property<boost::vertex_index_t, int>,
                                    boost::property<boost::edge_index_t, int>>;

int main(int argc, char **argv)
{
    if (argc != 3) {
        std::cerr << "usage: boost_drawcheck GRAPH CERT\n";
        return 2;
    }
    std::ifstream gin(argv[1]), cin_(argv[2]);
    std::string line, word;
    long n = -1, m = 0;
    std::vector<std::pair<long, long>> edges;
    while (std::getline(gin, line)) {
        if (line.empty() || line[0] == '#')
            continue;
        std::istringstream s(line);
        if (n < 0) {
            s >> word >> n >> m;
            edges.reserve((std::size_t)m);
        } else {
            long a, b;
            s >> a >> b;
            edges.emplace_back(a, b);
        }
    }
    graph g((std::size_t)n);
    for (auto &e : edges)
        boost::add_edge((std::size_t)e.first, (std::size_t)e.second, g);
    std::vector<coord_t> at((std::size_t)n);
    while (std::getline(cin_, line)) {
        if (line.rfind("point ", 0) != 0)
            continue;
        std::istringstream s(line);
        long v, x, y;
        std::string colon;
        s >> word >> v >> colon >> x >> y;
        at[(std::size_t)v] = coord_t{(std::size_t)x, (std::size_t)y};
    }
    auto map = boost::make_iterator_property_map(at.begin(), get(boost::vertex_index, g));
    auto start = std::chrono::steady_clock::now();
    bool ok = boost::is_straight_line_drawing(g, map);
    std::chrono::duration<double> took = std::chrono::steady_clock::now() - start;
    std::cout << took.count() << " " << (ok ? 1 : 0) << "\n";
    return 0;
}
