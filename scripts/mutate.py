#!/usr/bin/python3
"""Mutation testing of the kernel (checker/*.c): `make mutate`.

Each mutant is one small change to one line of one kernel file:
  rel      flip a relational operator  (< <=, > >=, == !=, each way)
  const    +1 <-> -1, ++ <-> --
  logic    && <-> ||
  delete   replace a whole-line statement by the empty statement ';'
  verdict  replace a returned verdict: return 0 <-> return -1 (and 1 -> 0),
           or the reason code given to pw_fail (a rejection becomes another
           rejection, an input error another input error)
The mutated file is compiled from a copy (checker/ itself is never written)
and linked with the other kernel objects into the killers, run fastest first:
  manifest_check   every vector of vectors/MANIFEST, verdict and reason
  test_*           the kernel's cmocka programs that link with the kernel alone
  differential     (only with --differential) kernel vs. the independent oracle
A mutant is killed when a killer fails, crashes or times out; stillborn when it
does not compile.  Score = killed / (killed + survived).

With --asan the kernel and every killer are built with ASan + UBSan and the
allocation-failure hook (-DPW_FAULT_INJECTION, inert unless a test arms it), and
tests/fault/alloc_failure.c joins the killers: a deleted free() or a broken
out-of-memory path is then caught.  --replay FILE tests only the mutants listed
in FILE (a survivors.txt of an earlier run), e.g. a second, slower pass with
--asan over the survivors of a plain one.  --valgrind runs every killer under
valgrind's memcheck, failing on any error or definite leak: it sees a read of
uninitialised memory or one past the used part of a buffer, which ASan cannot
see inside an allocation (use it with --replay; it is about 30 times slower).

Usage: scripts/mutate.py [--sample N] [--seed S] [--files rotation.c,...]
                         [--differential] [--asan | --valgrind] [--replay FILE]
                         [--out build-mutate]
Run from the repository root.  Survivors are listed in OUT/survivors.txt; each
must be killed by a new vector or test, or explained as equivalent in the
results file (bench/results-hardening.md).
"""
import argparse
import glob
import os
import random
import re
import shutil
import subprocess
import sys
import time

CC = os.environ.get("CC", "cc")
CFLAGS = ["-std=c11", "-D_POSIX_C_SOURCE=200809L", "-O1", "-g0", "-w"]
CRYPTO = ["-lcrypto"]
LDFLAGS = []
ASAN = ["-fsanitize=address,undefined", "-fno-sanitize-recover=all"]
WRAP = []  # the killers' command prefix: valgrind with --valgrind
# Kept out of `make valgrind` too: its 8 GiB mapping does not fit valgrind's address space.
NOT_UNDER_VALGRIND = {"test_limits"}
VALGRIND = ["valgrind", "-q", "--error-exitcode=97", "--leak-check=full",
            "--errors-for-leak-kinds=definite", "--track-origins=no"]

REL = {"<": "<=", "<=": "<", ">": ">=", ">=": ">", "==": "!=", "!=": "=="}
OP_RE = re.compile(r"<<=?|>>=?|->|<=|>=|==|!=|&&|\|\||\+\+|--|<|>")
DECL_RE = re.compile(r"^(static\s+|const\s+|unsigned\s+)*[A-Za-z_]\w*(\s*\*)*\s+\**[A-Za-z_]\w*\s*(=|;|\[|,)")
CODE_RE = re.compile(r"\bPW_([RE])_[A-Z_0-9]+\b")


def mask(line):
    """The line with string and char literals blanked (same length)."""
    out, i, quote = [], 0, None
    while i < len(line):
        ch = line[i]
        if quote:
            if ch == "\\":
                out.append("  ")
                i += 2
                continue
            if ch == quote:
                quote = None
                out.append(ch)
            else:
                out.append(" ")
        else:
            if ch in "\"'":
                quote = ch
            out.append(ch)
        i += 1
    return "".join(out)[: len(line)]


def code_lines(text):
    """(number, line, masked) for lines of code: no comment, no preprocessor."""
    in_comment = False
    test_only = False  # inside #ifdef PW_FAULT_INJECTION: not in the killers' build
    result = []
    for number, line in enumerate(text.split("\n"), 1):
        masked = mask(line)
        if line.startswith("#ifdef PW_FAULT_INJECTION"):
            test_only = True
        elif test_only and line.startswith(("#else", "#endif")):
            test_only = False
        if test_only:
            continue
        if in_comment:
            if "*/" in masked:
                in_comment = False
            continue
        stripped = masked.strip()
        if stripped.startswith("/*"):
            in_comment = "*/" not in stripped
            continue
        if stripped.startswith("*") or stripped.startswith("#") or not stripped:
            continue
        if "fault_now" in line:  # the test-only allocation hook
            continue
        cut = masked.find("/*")
        result.append((number, line, masked[:cut] if cut >= 0 else masked))
    return result


def statement_deletable(prev, masked):
    s = masked.strip()
    if not s.endswith(";") or s.startswith(("return", "for", "}")) or DECL_RE.match(s):
        return False
    if s.count("(") != s.count(")") or s == ";":
        return False
    p = prev.strip()
    return p == "" or p.endswith((";", "{", "}", ")", ":")) or p == "else"


def mutants_of(path):
    text = open(path, encoding="ascii").read()
    lines = text.split("\n")
    found = []
    prev = ""
    for number, line, masked in code_lines(text):
        def add(kind, start, end, new):
            found.append((path, number, kind, line, line[:start] + new + line[end:]))
        for m in OP_RE.finditer(masked):
            op = m.group(0)
            if op in REL:
                add("rel", m.start(), m.end(), REL[op])
            elif op == "&&":
                add("logic", m.start(), m.end(), "||")
            elif op == "||":
                add("logic", m.start(), m.end(), "&&")
            elif op in ("++", "--"):
                add("const", m.start(), m.end(), "--" if op == "++" else "++")
        for m in re.finditer(r"([+-])(\s*)1\b", masked):
            add("const", m.start(), m.start() + 1, "-" if m.group(1) == "+" else "+")
        for m in re.finditer(r"\breturn (-1|0|1);", masked):
            new = {"-1": "0", "0": "-1", "1": "0"}[m.group(1)]
            add("verdict", m.start(), m.end(), "return %s;" % new)
        if "pw_fail(" in masked or "return pw_fail" in prev:
            for m in CODE_RE.finditer(masked):
                other = ("PW_R_EULER" if m.group(0) != "PW_R_EULER" else "PW_R_WITNESS_LINES") \
                    if m.group(1) == "R" else \
                    ("PW_E_SYNTAX" if m.group(0) != "PW_E_SYNTAX" else "PW_E_RANGE")
                add("verdict", m.start(), m.end(), other)
        if statement_deletable(prev, masked):
            indent = line[: len(line) - len(line.lstrip())]
            found.append((path, number, "delete", line, indent + ";"))
        prev = masked
    del lines
    return found


def run(cmd, timeout=None, **kw):
    return subprocess.run(cmd, stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL,
                          timeout=timeout, **kw).returncode


INCLUDE = ["-Ichecker"]  # set to the snapshot's checker/ in main()


def compile_obj(src, obj, extra=()):
    return run([CC] + CFLAGS + INCLUDE + list(extra) + ["-c", src, "-o", obj]) == 0


class Killers:
    """The test programs, each as (name, objects besides the kernel, run command)."""

    def __init__(self, out, differential, snapshot, asan=False):
        self.out = out
        self.kernel_src = sorted(glob.glob(os.path.join(snapshot, "checker", "*.c")))
        os.makedirs(os.path.join(out, "base"), exist_ok=True)
        self.base = {}
        for src in self.kernel_src:
            obj = os.path.join(out, "base", os.path.basename(src)[:-2] + ".o")
            if not compile_obj(src, obj):
                sys.exit("mutate: %s does not compile unmutated" % src)
            self.base[src] = obj
        self.programs = []
        support = os.path.join(out, "vector_list.o")
        compile_obj("tests/fuzz/vector_list.c", support, ["-Itests/fuzz"])
        self.add("manifest_check", ["tests/fuzz/manifest_check.c", "tests/fuzz/fuzz_common.c"],
                 [support], [])
        for test in sorted(glob.glob("tests/test_*.c")):
            name = os.path.basename(test)[:-2]
            if WRAP and name in NOT_UNDER_VALGRIND:
                continue
            self.add(name, [test], [], ["-lcmocka"])
        if asan:
            self.add("alloc_failure", ["tests/fault/alloc_failure.c"], [support], [])
        if differential:
            srcs = ["tests/fuzz/differential_run.c", "tests/fuzz/differential.c",
                    "tests/fuzz/oracle.c", "tests/fuzz/oracle_text.c",
                    "tests/fuzz/oracle_rules.c", "tests/fuzz/oracle_draw.c", "tests/draw_oracle.c",
                    "tests/fuzz/token_mutate.c", "tests/fuzz/fuzz_common.c"]
            self.add("differential", srcs, [support], [], args=["20"], env={"PW_SEED": "1"})
        # Fastest first, so that most mutants cost one short run; the slow ones last.
        self.programs.sort(key=lambda p: (p["name"] in ("differential", "alloc_failure"), p["seconds"]))

    def add(self, name, srcs, extra_objs, libs, args=(), env=None):
        objs = []
        for src in srcs:
            obj = os.path.join(self.out, "t_" + os.path.basename(src)[:-2] + ".o")
            if not compile_obj(src, obj, ["-Itests/fuzz", "-Itests"]):
                print("mutate: %s does not compile; %s is not used as a killer" % (src, name))
                return
            objs.append(obj)
        prog = dict(name=name, objs=objs + list(extra_objs), libs=libs, args=list(args),
                    env=dict(os.environ, **(env or {})))
        exe = os.path.join(self.out, name)
        if not self.link(prog, self.base, exe):
            print("mutate: %s needs more than the kernel to link; not used as a killer" % name)
            return
        start = time.time()
        if run(WRAP + [exe] + prog["args"], env=prog["env"], timeout=3600) != 0:
            sys.exit("mutate: %s fails on the unmutated kernel; fix that first" % name)
        prog["seconds"] = time.time() - start
        prog["timeout"] = 3 + 4 * prog["seconds"]
        self.programs.append(prog)
        print("mutate: killer %-16s %.2fs unmutated" % (name, time.time() - start))

    def link(self, prog, kernel, exe):
        cmd = [CC] + LDFLAGS + ["-o", exe] + prog["objs"] + sorted(kernel.values()) + prog["libs"] + CRYPTO
        return run(cmd) == 0

    def judge(self, mutated_src, target):
        """'stillborn', ('killed', by) or 'survived'."""
        obj = os.path.join(self.out, "mut.o")
        if not compile_obj(mutated_src, obj):
            return "stillborn", None
        kernel = dict(self.base)
        kernel[target] = obj
        for prog in self.programs:
            exe = os.path.join(self.out, "mut_" + prog["name"])
            if not self.link(prog, kernel, exe):
                return "stillborn", None
            try:
                rc = run(WRAP + [exe] + prog["args"], env=prog["env"], timeout=prog["timeout"])
            except subprocess.TimeoutExpired:
                return "killed", prog["name"] + " (timeout)"
            if rc != 0:
                return "killed", prog["name"]
        return "survived", None


def listed_mutants(path):
    """(file, line, mutated text) of every mutant in a survivors.txt."""
    wanted, head = set(), None
    for line in open(path, encoding="ascii"):
        if line.startswith("    + ") and head:
            wanted.add((head[0], head[1], line[6:].rstrip("\n").strip()))
        elif not line.startswith(" "):
            where = line.split(" ")[0].rsplit(":", 1)
            head = (where[0], int(where[1]))
    return wanted


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--sample", type=int, default=0, help="test N mutants drawn at random")
    ap.add_argument("--seed", type=int, default=None)
    ap.add_argument("--files", default="", help="comma-separated names in checker/")
    ap.add_argument("--differential", action="store_true")
    ap.add_argument("--asan", action="store_true", help="sanitizers, fault hook, alloc_failure")
    ap.add_argument("--valgrind", action="store_true", help="run every killer under valgrind")
    ap.add_argument("--replay", default="", help="test only the mutants in this survivors.txt")
    ap.add_argument("--out", default="build-mutate")
    a = ap.parse_args()
    if a.asan:
        CFLAGS.extend(ASAN + ["-DPW_FAULT_INJECTION"])
        LDFLAGS.extend(ASAN)
    if a.asan and a.valgrind:
        sys.exit("mutate: --asan and --valgrind do not mix (valgrind cannot run ASan binaries)")
    if a.valgrind:
        WRAP.extend(VALGRIND)
        CFLAGS[CFLAGS.index("-g0")] = "-g"
    seed = a.seed if a.seed is not None else int(time.time())
    files = ["checker/" + f for f in a.files.split(",")] if a.files else sorted(glob.glob("checker/*.c"))
    shutil.rmtree(a.out, ignore_errors=True)
    os.makedirs(a.out)
    # Mutate a snapshot: others may edit checker/ while a long run goes on.
    snapshot = os.path.join(a.out, "snapshot")
    shutil.copytree("checker", os.path.join(snapshot, "checker"))
    INCLUDE[0] = "-I" + os.path.join(snapshot, "checker")
    files = [os.path.join(snapshot, f) for f in files]
    killers = Killers(a.out, a.differential, snapshot, a.asan)
    mutants = [m for f in files for m in mutants_of(f)]
    if a.replay:
        wanted = listed_mutants(a.replay)
        mutants = [m for m in mutants
                   if (os.path.relpath(m[0], snapshot), m[1], m[4].strip()) in wanted]
        print("mutate: replaying %d of the %d mutants listed in %s" % (len(mutants), len(wanted), a.replay))
    print("mutate: %d mutants in %d files; seed %d" % (len(mutants), len(files), seed))
    if a.sample and a.sample < len(mutants):
        mutants = sorted(random.Random(seed).sample(mutants, a.sample), key=lambda m: (m[0], m[1]))
        print("mutate: testing a sample of %d (replay with --seed %d)" % (len(mutants), seed))
    counts = {"killed": 0, "survived": 0, "stillborn": 0}
    by_file = {}
    survivors = []
    log = open(os.path.join(a.out, "mutants.txt"), "w", buffering=1)
    src_copy = os.path.join(a.out, "mutant.c")
    for path, number, kind, old, new in mutants:
        lines = open(path, encoding="ascii").read().split("\n")
        lines[number - 1] = new
        with open(src_copy, "w") as f:
            f.write("\n".join(lines))
        result, by = killers.judge(src_copy, path)
        counts[result] += 1
        stats = by_file.setdefault(os.path.relpath(path, snapshot),
                                   {"killed": 0, "survived": 0, "stillborn": 0})
        stats[result] += 1
        shown = os.path.relpath(path, snapshot)
        log.write("%s:%d %s %s%s\n    - %s\n    + %s\n" % (shown, number, kind, result,
                  " by " + by if by else "", old.strip(), new.strip()))
        if result == "survived":
            survivors.append((shown, number, kind, old.strip(), new.strip()))
    log.close()
    with open(os.path.join(a.out, "survivors.txt"), "w") as f:
        for path, number, kind, old, new in survivors:
            f.write("%s:%d [%s]\n    - %s\n    + %s\n" % (path, number, kind, old, new))
    for path in sorted(by_file):
        s = by_file[path]
        print("mutate: %-22s killed %4d  survived %3d  stillborn %3d" %
              (path, s["killed"], s["survived"], s["stillborn"]))
    live = counts["killed"] + counts["survived"]
    score = 100.0 * counts["killed"] / live if live else 0.0
    print("mutate: %d mutants: %d killed, %d survived, %d stillborn; score %.1f%%" %
          (len(mutants), counts["killed"], counts["survived"], counts["stillborn"], score))
    print("mutate: survivors listed in %s/survivors.txt" % a.out)
    return 0 if counts["survived"] == 0 else 1


sys.exit(main())
