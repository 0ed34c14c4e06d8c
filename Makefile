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

.PHONY: all check test kernel-size clean help demo
all: $(BIN) kernel-size

$(BUILD)/%.o: %.c
	@mkdir -p $(dir $@)
	$(CC) $(CFLAGS) $(CRYPTO_CFLAGS) -Ichecker -Iproducer -Icli -c $< -o $@

# The trust boundary: the kernel library is built from checker/ alone.
$(LIBKERNEL): $(KERNEL_OBJ)
	$(AR) rcs $@ $^

$(BIN): $(CLI_OBJ) $(PRODUCER_OBJ) $(LIBKERNEL)
	$(CC) $(CFLAGS) -o $@ $(CLI_OBJ) $(PRODUCER_OBJ) $(LIBKERNEL) $(CRYPTO_LIBS)

$(BUILD)/tests/%: tests/%.c $(SUPPORT_OBJ) $(filter-out $(CLI_MAIN_OBJ),$(CLI_OBJ)) $(PRODUCER_OBJ) $(LIBKERNEL)
	@mkdir -p $(dir $@)
	$(CC) $(CFLAGS) $(CRYPTO_CFLAGS) -Ichecker -Iproducer -Icli -Itests -o $@ $^ $(CMOCKA_LIBS) $(CRYPTO_LIBS)

# Non-blank, non-comment lines of checker/, the figure the kernel budget is stated in.
kernel-size:
	@printf 'checker/ kernel: %s non-blank, non-comment lines\n' \
	  "$$(sh scripts/count-sloc.sh checker)"

check test: $(BIN) $(TEST_BINS)
	@sh tests/run-all.sh $(BUILD)

demo: $(BIN)
	@sh examples/run-demo.sh $(BIN)

clean:
	rm -rf $(BUILD)

help:
	@echo "make            build $(BIN) and print the kernel's size"
	@echo "make check      build and run every test (unit, vectors, end-to-end, cross-checks)"
	@echo "make demo       run the bundled demo"
	@echo "make clean      remove $(BUILD)/"

-include $(KERNEL_OBJ:.o=.d)
