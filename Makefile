# planewit - build, test and audit targets.  `make help` lists them.
CC      ?= cc
CSTD    := -std=c11 -D_POSIX_C_SOURCE=200809L
WARN    := -Wall -Wextra -Werror -Wshadow -Wconversion -Wsign-conversion \
           -Wstrict-prototypes -Wmissing-prototypes -Wvla -Wformat=2 -Wundef
OPT     ?= -O2 -g
CFLAGS  += $(CSTD) $(WARN) $(OPT) -pthread
CRYPTO_CFLAGS := $(shell pkg-config --cflags libcrypto 2>/dev/null)
CRYPTO_LIBS   := $(shell pkg-config --libs libcrypto 2>/dev/null || echo -lcrypto)
CMOCKA_LIBS   := $(shell pkg-config --libs cmocka 2>/dev/null || echo -lcmocka)

BUILD   ?= build
KERNEL_SRC   := $(wildcard checker/*.c)
PRODUCER_SRC := $(wildcard producer/*.c)
CLI_SRC      := $(wildcard cli/*.c)
TEST_SRC     := $(wildcard tests/test_*.c)
TEST_SUPPORT := $(filter-out $(TEST_SRC),$(wildcard tests/*.c))

KERNEL_OBJ   := $(KERNEL_SRC:%.c=$(BUILD)/%.o)
PRODUCER_OBJ := $(PRODUCER_SRC:%.c=$(BUILD)/%.o)
CLI_OBJ      := $(CLI_SRC:%.c=$(BUILD)/%.o)
CLI_MAIN_OBJ := $(BUILD)/cli/main.o
TEST_BINS    := $(TEST_SRC:tests/%.c=$(BUILD)/tests/%)
SUPPORT_OBJ  := $(TEST_SUPPORT:%.c=$(BUILD)/%.o)

LIBKERNEL := $(BUILD)/libplanewit-check.a
BIN       := $(BUILD)/planewit

.PHONY: all check test kernel-size clean help demo qualify bench-batch bench-draw bench-geng10 bench-certify bench-certify-bound bench-certify-profile
all: $(BIN) kernel-size

$(BUILD)/%.o: %.c
	@mkdir -p $(dir $@)
	$(CC) $(CFLAGS) $(CRYPTO_CFLAGS) -MMD -MP -Ichecker -Iproducer -Icli -c $< -o $@

# What the binary says about itself in sign-off records (cli/buildinfo.c): the
# compiler, the flags, and the digest of the vector set (vectors/SHA256SUMS)
# present at build time, which `make qualify` then runs.  Rebuilt when the
# Makefile or the vector sums change.
VECTOR_SUMS := $(wildcard vectors/SHA256SUMS)
VECTOR_SET_SHA256 = $(if $(VECTOR_SUMS),$(firstword $(shell sha256sum $(VECTOR_SUMS))))
BUILD_CC_VERSION = $(shell $(CC) --version 2>/dev/null | head -n 1 | tr -d "\"'\\\\")
$(BUILD)/cli/buildinfo.o: cli/buildinfo.c Makefile $(VECTOR_SUMS)
	@mkdir -p $(dir $@)
	$(CC) $(CFLAGS) $(CRYPTO_CFLAGS) -Ichecker -Iproducer -Icli \
	  -DPW_BUILD_CC='"$(CC): $(BUILD_CC_VERSION)"' -DPW_BUILD_CFLAGS='"$(strip $(CFLAGS))"' \
	  -DPW_VECTOR_SET_SHA256='"$(VECTOR_SET_SHA256)"' -c $< -o $@

# The trust boundary: the kernel library is built from checker/ alone.
$(LIBKERNEL): $(KERNEL_OBJ)
	$(AR) rcs $@ $^

$(BIN): $(CLI_OBJ) $(PRODUCER_OBJ) $(LIBKERNEL)
	$(CC) $(CFLAGS) -o $@ $(CLI_OBJ) $(PRODUCER_OBJ) $(LIBKERNEL) $(CRYPTO_LIBS) -lm

$(BUILD)/tests/%: tests/%.c $(SUPPORT_OBJ) $(filter-out $(CLI_MAIN_OBJ),$(CLI_OBJ)) $(PRODUCER_OBJ) $(LIBKERNEL)
	@mkdir -p $(dir $@)
	$(CC) $(CFLAGS) $(CRYPTO_CFLAGS) -Ichecker -Iproducer -Icli -Itests -o $@ $^ $(CMOCKA_LIBS) $(CRYPTO_LIBS) -lm

# Non-blank, non-comment lines of checker/, the figure the kernel budget is stated in.
kernel-size:
	@printf 'checker/ kernel: %s non-blank, non-comment lines\n' \
	  "$$(sh scripts/count-sloc.sh checker)"

check test: $(BIN) $(TEST_BINS)
	@BUILD_CC="$(CC)" BUILD_OPT="$(OPT)" sh tests/run-all.sh $(BUILD)

demo: $(BIN)
	@sh examples/run-demo.sh $(BIN)

# The qualification run: every vector of vectors/MANIFEST through the built binary,
# every hash of vectors/SHA256SUMS verified; report in $(BUILD)/qualification.json.
qualify: $(BIN)
	$(BIN) selftest --vectors vectors -o $(BUILD)/qualification.json

# Batch throughput: 10^5 small jobs, and one 10^7-edge job among them (bench/results-batch.md).
bench-batch: $(BIN)
	sh bench/batch_bench.sh $(BIN) bench/results-batch.md

# Every graph on 10 vertices from nauty-geng through certify --graph6 -j 2, against geng
# alone; planar count vs OEIS A005470 (bench/results-geng10.md).  A few minutes.
bench-geng10: $(BIN)
	sh bench/geng10_bench.sh $(BIN) bench/results-geng10.md

# Drawing at 10^6 edges vs the Boost Graph Library's drawing pipeline (bench/results-draw.md).
bench-draw: $(BIN) $(LIBKERNEL)
	sh bench/draw_bench.sh $(BUILD)

# Drawing check vs the Boost Graph Library's is_straight_line_drawing (bench/results-check.md).
bench-check: $(BIN)
	sh bench/check_bench.sh $(BUILD)

# certify on six seeded families, 10^4 to 10^7 edges, phase by phase, vs Boost's
# boyer_myrvold_planarity_test and networkx (bench/results-certify.md).  REPEAT=N
# SIZES="..." override the defaults; about 25 minutes on 2 quiet cores.
bench-certify: $(BIN) $(LIBKERNEL)
	sh bench/certify_bench.sh $(BUILD)

# What bounds certify's time: floors (a bare depth-first search on the same files)
# and instructions per edge under callgrind (bench/results-certify-bound.md).
bench-certify-bound: $(BIN) $(LIBKERNEL)
	sh bench/certify_bound.sh $(BUILD)

# Where certify's time goes at 10^6 edges: perf samples by phase and function, page
# faults, callgrind's instructions per function; check's time by phase
# (bench/results-certify-profile.md).  About 4 minutes; perf needs root.
bench-certify-profile: $(BIN) $(LIBKERNEL)
	sh bench/certify_profile.sh $(BUILD)

clean:
	rm -rf $(BUILD)

help:
	@echo "make            build $(BIN) and print the kernel's size"
	@echo "make check      build and run every test (unit, vectors, end-to-end, cross-checks)"
	@echo "make demo       run the bundled demo"
	@echo "make qualify    run every vector with the built binary; report in $(BUILD)/qualification.json"
	@echo "make bench-batch  batch throughput benchmark, results in bench/results-batch.md"
	@echo "make bench-check  drawing check vs Boost, results in bench/results-check.md"
	@echo "make bench-certify  certify vs Boost and networkx, 10^4-10^7 edges, bench/results-certify.md"
	@echo "make bench-certify-bound  certify beside its floors, instructions per edge, bench/results-certify-bound.md"
	@echo "make bench-certify-profile  where certify's time goes (perf, callgrind), bench/results-certify-profile.md"
	@echo "make bench-geng10 all 12,005,168 graphs on 10 vertices through certify, bench/results-geng10.md"
	@echo "make bench-draw   drawing at 10^6 edges vs Boost, results in bench/results-draw.md"
	@echo "make clean      remove $(BUILD)/"

-include $(wildcard $(BUILD)/*/*.d)

# ---- Hardening: sanitizers, valgrind, coverage, fuzzing, lint, mutation -----
# Results and how to read them: bench/results-hardening.md.  `make help-hardening`.
.PHONY: sanitize sanitize-replay valgrind coverage coverage-enforce fuzz fuzz-long fuzz-afl fault-injection \
        differential lint mutate help-hardening
SAN_FLAGS    := -O1 -g -fno-omit-frame-pointer -fsanitize=address,undefined -fno-sanitize-recover=all
HARD_CFLAGS  := $(CSTD) $(WARN) $(CRYPTO_CFLAGS) -Ichecker -Icli -Itests/fuzz -Itests
HARD_DEPS    := $(wildcard tests/fuzz/*.c tests/fuzz/*.h tests/fault/*.c checker/*.h) $(KERNEL_SRC)
ORACLE_SRC   := tests/fuzz/differential.c tests/fuzz/oracle.c tests/fuzz/oracle_text.c \
                tests/fuzz/oracle_rules.c tests/fuzz/oracle_draw.c tests/draw_oracle.c \
                tests/fuzz/token_mutate.c
IMPORT_SRC   := $(wildcard cli/import_*.c) cli/edge_list.c cli/graph6.c cli/text_scan.c cli/name_table.c
# Sources of harness $(1): its own file, the shared part, the kernel, and what it tests.
fuzz_sources = tests/fuzz/fuzz_$(1).c tests/fuzz/fuzz_common.c $(KERNEL_SRC) \
               $(if $(filter differential certify,$(1)),$(ORACLE_SRC)) \
               $(if $(filter import,$(1)),$(IMPORT_SRC)) $(if $(filter certify,$(1)),$(PRODUCER_SRC) -Iproducer -lm)

# The whole suite (make check) with ASan + UBSan, any report fatal, in build-san/;
# then allocation-failure injection, the seeded differential run, and every seed
# of every fuzz harness replayed, all under the same sanitizers.
sanitize:
	@fail=0; \
	$(MAKE) BUILD=build-san OPT="$(SAN_FLAGS)" check || fail=1; \
	$(MAKE) fault-injection || fail=1; \
	$(MAKE) differential || fail=1; \
	$(MAKE) sanitize-replay || fail=1; \
	if [ $$fail -eq 0 ]; then echo "sanitize: suite, fault injection, differential, replays clean"; \
	else echo "sanitize: FAILED (see above)"; exit 1; fi
# Every seed and past finding of every harness, replayed once with the sanitizers.
SAN_REPLAYS := graph cert check import differential certify
sanitize-replay: $(foreach t,$(SAN_REPLAYS),build-san/fuzz/replay_$(t))
	/usr/bin/python3 tests/fuzz/seeds.py build-san/fuzz/seeds
	@fail=0; for t in $(SAN_REPLAYS); do \
	  build-san/fuzz/replay_$$t build-san/fuzz/seeds/$$t/* $$(ls -d tests/fuzz/regressions/$$t/* 2>/dev/null) \
	    >/dev/null 2>build-san/fuzz/replay_$$t.log && echo "replay $$t: clean" || \
	  { echo "replay $$t: FAILED"; grep -m 3 "runtime error\|ERROR:\|property violated" build-san/fuzz/replay_$$t.log; fail=1; }; \
	done; exit $$fail
build-san/fuzz/replay_%: $(HARD_DEPS)
	@mkdir -p $(dir $@)
	$(CC) $(HARD_CFLAGS) $(SAN_FLAGS) -o $@ tests/fuzz/standalone.c $(call fuzz_sources,$*) $(CRYPTO_LIBS)

# Every allocation of every vector's check made to fail in turn (tests/fault/):
# each must give status unusable, reason out-of-memory, and leak nothing (LSan).
fault-injection: build-fault/alloc_failure
	build-fault/alloc_failure
build-fault/alloc_failure: $(HARD_DEPS)
	@mkdir -p $(dir $@)
	$(CC) $(HARD_CFLAGS) $(SAN_FLAGS) $(FUZZ_RECOVER) -DPW_FAULT_INJECTION -o $@ tests/fault/alloc_failure.c \
	  tests/fuzz/vector_list.c $(KERNEL_SRC) $(CRYPTO_LIBS)

# Kernel against the independent oracle on every vector and DIFF_ROUNDS seeded
# token mutations of each (PW_SEED=N replays a run).
DIFF_ROUNDS ?= 200
differential: build-san/fuzz/differential_run
	build-san/fuzz/differential_run $(DIFF_ROUNDS)
build-san/fuzz/differential_run: $(HARD_DEPS)
	@mkdir -p $(dir $@)
	$(CC) $(HARD_CFLAGS) $(SAN_FLAGS) $(FUZZ_RECOVER) -o $@ tests/fuzz/differential_run.c tests/fuzz/vector_list.c \
	  tests/fuzz/fuzz_common.c $(ORACLE_SRC) $(KERNEL_SRC) $(CRYPTO_LIBS)

# The kernel's cmocka programs under valgrind (any error or leak fails), and the
# allocation-failure run without ASan under valgrind.
VALGRIND := valgrind -q --error-exitcode=99 --leak-check=full --show-leak-kinds=all \
            --errors-for-leak-kinds=all
KERNEL_TESTS := $(filter $(addprefix $(BUILD)/tests/,test_lex test_checks test_geometry test_vectors),$(TEST_BINS))
valgrind: $(KERNEL_TESTS) build-fault/alloc_failure_vg
	@for t in $(KERNEL_TESTS) build-fault/alloc_failure_vg; do echo "== valgrind $$t"; \
	  $(VALGRIND) $$t >/dev/null || { echo "valgrind: $$t FAILED"; exit 1; }; done
	@echo "valgrind: $(words $(KERNEL_TESTS)) kernel test programs and the fault run: no error, no leak"
build-fault/alloc_failure_vg: $(HARD_DEPS)
	@mkdir -p $(dir $@)
	$(CC) $(HARD_CFLAGS) -O1 -g -DPW_FAULT_INJECTION -o $@ tests/fault/alloc_failure.c \
	  tests/fuzz/vector_list.c $(KERNEL_SRC) $(CRYPTO_LIBS)

# Line and branch coverage of checker/ by the whole suite plus the allocation-failure
# run (the only way to reach the kernel's out-of-memory paths), gcovr, uncovered listed.
# Never give gcovr -o a device: it replaces the path with a regular file (it did so
# to /dev/null once), so its side outputs go to files in build-cov/.  The counters
# are updated atomically: batch and certify -j run the kernel in several threads,
# and racing increments once left a negative count that gcovr cannot read.
GCOVR := gcovr --root . --filter 'checker/' build-cov/checker build-cov/fault
COV_FAULT_OBJ := $(KERNEL_SRC:checker/%.c=build-cov/fault/%.o) build-cov/fault/t_alloc_failure.o \
                 build-cov/fault/t_vector_list.o
# A process that ends while another of its threads still runs the kernel dumps
# counters mid-job: derived branch counts came out negative (gcovr stops) or one
# short.  batch, interrupted, therefore ends with _exit (cli/cmd_batch.c).  The
# counters' own complaints (merge mismatches, unwritable or corrupt files) go to
# COV_ERRORS and are shown.
COV_ERRORS := $(CURDIR)/build-cov/gcov-errors.txt
coverage:
	rm -rf build-cov
	mkdir -p build-cov
	-GCOV_ERROR_FILE=$(COV_ERRORS) \
	  $(MAKE) BUILD=build-cov OPT="-O0 -g --coverage -fprofile-update=atomic" check
	$(MAKE) build-cov/fault/alloc_failure
	-GCOV_ERROR_FILE=$(COV_ERRORS) build-cov/fault/alloc_failure
	@if [ -s $(COV_ERRORS) ]; then echo "coverage counters reported:"; head -n 20 $(COV_ERRORS); fi
	$(GCOVR) --txt
	$(GCOVR) --txt --branches
	$(GCOVR) --print-summary -o build-cov/gcovr-summary.txt
build-cov/fault/%.o: checker/%.c
	@mkdir -p $(dir $@)
	$(CC) $(HARD_CFLAGS) -O0 -g --coverage -DPW_FAULT_INJECTION -c $< -o $@
build-cov/fault/t_%.o: $(HARD_DEPS)
	@mkdir -p $(dir $@)
	$(CC) $(HARD_CFLAGS) -O0 -g -c $(filter %/$*.c,$(wildcard tests/fault/*.c tests/fuzz/*.c)) -o $@
build-cov/fault/alloc_failure: $(COV_FAULT_OBJ)
	$(CC) --coverage -o $@ $^ $(CRYPTO_LIBS)
# The same figures as a gate for CI: 100% of lines, at least 95% of branches.
coverage-enforce: coverage
	$(GCOVR) --fail-under-line 100 --fail-under-branch 95 -o build-cov/gcovr-gate.txt

# libFuzzer harnesses (tests/fuzz/), FUZZ_SECONDS each; corpora in build-fuzz/corpus/.
FUZZ_CC      ?= clang
FUZZ_SECONDS ?= 60
# Every sanitizer report stops the run.  To keep fuzzing past a known, not yet fixed
# report, let its check recover, e.g. FUZZ_RECOVER=-fsanitize-recover=pointer-overflow
# (used for the NULL + 0 of finding 1 in bench/results-hardening.md until 9b995c4).
FUZZ_RECOVER ?=
fuzz:
	sh tests/fuzz/run.sh $(FUZZ_SECONDS)
# One long run per harness, bounded by CPU time at nice 19 (tests/fuzz/long.sh):
# make fuzz-long FUZZ_TARGETS="graph cert" FUZZ_CPU_SECONDS=3600
FUZZ_TARGETS ?= graph cert check import differential certify
FUZZ_CPU_SECONDS ?= 3600
fuzz-long:
	@for t in $(FUZZ_TARGETS); do sh tests/fuzz/long.sh $$t $(FUZZ_CPU_SECONDS) || exit 1; done
build-fuzz/fuzz_%: $(HARD_DEPS)
	@mkdir -p $(dir $@)
	$(FUZZ_CC) $(HARD_CFLAGS) $(SAN_FLAGS) $(FUZZ_RECOVER) -fsanitize=fuzzer -o $@ \
	  $(call fuzz_sources,$*) $(CRYPTO_LIBS)
# The same harnesses for AFL++ (Debian afl++), persistent mode (tests/fuzz/standalone.c).
AFL_CC ?= afl-clang-fast
fuzz-afl: $(foreach t,graph cert check import differential certify,build-afl/fuzz_$(t))
build-afl/fuzz_%: $(HARD_DEPS)
	@mkdir -p $(dir $@)
	AFL_USE_ASAN=1 AFL_USE_UBSAN=1 $(AFL_CC) $(HARD_CFLAGS) -O1 -g -o $@ tests/fuzz/standalone.c \
	  $(call fuzz_sources,$*) $(CRYPTO_LIBS)

# cppcheck and clang-tidy on checker/, the chosen checks documented in scripts/lint.sh.
lint:
	sh scripts/lint.sh

# Mutation testing of checker/ (scripts/mutate.py; MUTATE_ARGS="--sample 200" for a quick look).
MUTATE_ARGS ?= --differential
mutate:
	/usr/bin/python3 scripts/mutate.py $(MUTATE_ARGS)

help-hardening:
	@echo "make sanitize          whole suite + fault injection + differential + seed replays, ASan/UBSan"
	@echo "make valgrind          kernel test programs and the fault run under valgrind"
	@echo "make coverage          gcovr line/branch coverage of checker/ by the suite"
	@echo "make coverage-enforce  the same, failing below 100% lines / 95% branches"
	@echo "make fuzz FUZZ_SECONDS=N  each libFuzzer harness for N seconds"
	@echo "make fuzz-long         one run per harness until FUZZ_CPU_SECONDS of CPU (default 3600)"
	@echo "make fuzz-afl          build the harnesses for AFL++ into build-afl/"
	@echo "make fault-injection   fail every allocation in turn over the vectors"
	@echo "make differential      kernel vs the independent oracle on mutated vectors"
	@echo "make lint              cppcheck + clang-tidy on checker/"
	@echo "make mutate            mutation testing of checker/"
