# grid_pair.awk - an R x C square grid (our own invented test input) and a
# rotation system of it, for the batch tests and the batch benchmark.
# Alone: awk -v R=ROWS -v C=COLS -v G=GRAPH -v K=CERT [-v note=TEXT] -f tests/grid_pair.awk
# In a larger program: awk -f tests/grid_pair.awk -f PROGRAM, calling grid_pair().

# Writes the graph to file G (a first comment line "# NOTE" unless note is
# empty) and the certificate to file K: around each vertex its neighbours in
# the order right, previous row, left, next row, the same turn at every vertex.
function grid_pair(R, C, G, K, note,    r, c, v, s) {
    if (note != "")
        print "# " note > G
    print "graph", R * C, R * (C - 1) + (R - 1) * C > G
    print "certificate 1\nclaim planar" > K
    for (r = 0; r < R; r++) for (c = 0; c < C; c++) {
        v = r * C + c; s = "around " v " :"
        if (c + 1 < C) { print v, v + 1 > G; s = s " " (v + 1) }
        if (r + 1 < R) print v, v + C > G
        if (r > 0) s = s " " (v - C)
        if (c > 0) s = s " " (v - 1)
        if (r + 1 < R) s = s " " (v + C)
        print s > K
    }
    close(G); close(K)
}

BEGIN { if (G != "") grid_pair(R, C, G, K, note) }
