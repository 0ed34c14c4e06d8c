/* main.c - `planewit COMMAND ...`: dispatch to one single-purpose command. */
#include "cli.h"

#include <string.h>

static const char usage[] =
    "usage: planewit COMMAND [ARGS]\n"
    "\n"
    "Commands:\n"
    "  check GRAPH CERT   verify a planarity certificate (exit 0 accepted, 1 rejected, 2 unusable)\n"
    "  batch LIST         check every job of a jobs list on worker threads, in job order\n"
    "  merge SHARD...     put the outputs of 'batch --shard' back into one run's order\n"
    "  seal DIR           write DIR/SHA256SUMS and a seal record over every file in DIR\n"
    "  audit DIR          re-verify a sealed DIR's hashes and re-check its certificates\n"
    "  selftest           run every test vector and write a qualification report\n"
    "  certify GRAPH      find a certificate, have the kernel check it, then write it\n"
    "  import FILE        bring a graph in from graph6, DIMACS or an edge list\n"
    "  draw GRAPH         straight-line grid drawing and picture; a non-planar graph's witness\n"
    "\n"
    "Options:\n"
    "  -h, --help         show this help; 'planewit COMMAND --help' shows a command's\n"
    "  --version          show the version\n"
    "\n"
    "planewit verifies a mathematical claim only: design rules, standards and\n"
    "qualified reviewers still decide whether a design is right.\n";

typedef struct {
    const char *name;
    int (*run)(int argc, char **argv);
} command;

static const command commands[] = {
    {"check", cmd_check},
    {"batch", cmd_batch},
    {"merge", cmd_merge},
    {"seal", cmd_seal},
    {"audit", cmd_audit},
    {"selftest", cmd_selftest},
    {"certify", cmd_certify},
    {"import", cmd_import},
    {"draw", cmd_draw},
};

int main(int argc, char **argv)
{
    if (argc < 2) {
        fputs(usage, stderr);
        return CLI_EXIT_USAGE;
    }
    if (strcmp(argv[1], "-h") == 0 || strcmp(argv[1], "--help") == 0) {
        fputs(usage, stdout);
        return 0;
    }
    if (strcmp(argv[1], "--version") == 0) {
        printf("planewit %s\n", PW_VERSION);
        return 0;
    }
    for (size_t i = 0; i < sizeof commands / sizeof commands[0]; i++)
        if (strcmp(argv[1], commands[i].name) == 0)
            return commands[i].run(argc - 1, argv + 1);
    fprintf(stderr, "planewit: unknown command '%s'\nTry 'planewit --help'.\n", argv[1]);
    return CLI_EXIT_USAGE;
}
