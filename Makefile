# Quillcast: build, serve and test the forecasting notebook.
#
#   make serve   build the site and serve it on http://127.0.0.1:8080/
#   make test    every test: vet, host tests, the wasm build, wasm tests
#                under Node, and the browser tests in Chromium
#
# Nothing here names a folder of a particular machine: Go's own files are
# found with `go env GOROOT`.

GO        ?= go
GO_ROOT   := $(shell $(GO) env GOROOT)
WASM_LIB  := $(GO_ROOT)/lib/wasm
BUILD     := build
SITE      := $(BUILD)/site
ADDR      ?= 127.0.0.1
PORT      ?= 8080
FUZZTIME  ?= 30s
BENCHTIME ?= 1s
# DATA is the data for `make bakeoff` (a competition-layout file) or `make
# memo` (comma-separated data files); each target has its own default.
DATA      ?=
FORECASTS ?= $(BUILD)/bakeoff/forecasts.csv
SESSION   ?= testdata/sessions/demo.md
OUT       ?= $(BUILD)/memo

WASM_ENV  := GOOS=js GOARCH=wasm
WASM_OPTS := -trimpath -ldflags='-s -w'

.PHONY: all serve build test vet test-host test-wasm dist bundle sizes bakeoff memo fuzz bench bench-deps clean

all: build

## serve: build the site and serve it on $(ADDR):$(PORT)
serve: build
	ADDR=$(ADDR) PORT=$(PORT) $(GO) run ./core/cmd/serve -dir $(SITE)

## build: the static site in build/site (page, engine, demo files)
build:
	rm -rf $(SITE)
	mkdir -p $(SITE)/demo
	cp site/*.html site/*.css site/*.js $(SITE)/
	cp "$(WASM_LIB)/wasm_exec.js" $(SITE)/wasm_exec.js
	$(WASM_ENV) $(GO) build $(WASM_OPTS) -o $(SITE)/quillcast.wasm ./wasm
	for f in testdata/demo/*.csv testdata/sessions/demo.md; do \
		if [ -f "$$f" ]; then cp "$$f" $(SITE)/demo/; fi; \
	done
	(cd $(SITE)/demo && ls *.csv 2>/dev/null || true) > $(SITE)/demo/files.txt

## test: every test of the project
test: vet test-wasm test-host

vet:
	$(GO) vet ./...
	$(WASM_ENV) $(GO) vet ./wasm/...

# The host tests include the browser tests in site/browsertest, which open
# build/site, build/dist and build/quillcast.html in Chromium.
test-host: build dist bundle
	$(GO) test ./...

test-wasm:
	@command -v node >/dev/null || { echo "node is needed for the wasm tests (apt-get install nodejs)"; exit 1; }
	$(WASM_ENV) $(GO) test -exec="$(WASM_LIB)/go_js_wasm_exec" ./wasm/...

## dist: the folder to upload to any static host, in build/dist
dist: build
	$(GO) run ./site/pack -site $(SITE) -dist $(BUILD)/dist

## bundle: one self-contained HTML file that works opened from disk
bundle: build
	$(GO) run ./site/pack -site $(SITE) -bundle $(BUILD)/quillcast.html

## sizes: raw and gzip size of the built engine
sizes: build
	@raw=$$(wc -c < $(SITE)/quillcast.wasm); gz=$$(gzip -9c $(SITE)/quillcast.wasm | wc -c); \
	echo "quillcast.wasm: $$raw bytes raw, $$gz bytes gzip -9"

## bakeoff: run the bake-off over DATA and write FORECASTS
bakeoff:
	$(GO) run ./core/cmd/bakeoff -data $(or $(DATA),../shared/competition/m3-quarterly.csv) -forecasts $(FORECASTS)

## memo: run SESSION on DATA and write the memo to OUT
memo:
	$(GO) run ./core/cmd/memo -session $(SESSION) -data $(or $(DATA),testdata/demo/wickery-monthly-orders.csv) -out $(OUT)

## fuzz: run every fuzz target for FUZZTIME each
fuzz:
	@set -e; for pkg in $$($(GO) list ./core/...); do \
		for fz in $$($(GO) test -list '^Fuzz' $$pkg | grep '^Fuzz' || true); do \
			echo "== $$pkg $$fz"; \
			$(GO) test -run '^$$' -fuzz "^$$fz$$" -fuzztime $(FUZZTIME) $$pkg; \
		done; \
	done

## bench: measure speed and size side by side and print one table (see
## core/cmd/benchtable; the table is also written to build/bench/table.md)
bench: dist bundle bench-deps
	$(WASM_ENV) $(GO) build -tags bench $(WASM_OPTS) -o $(BUILD)/bench/quillcast-bench.wasm ./wasm
	$(WASM_ENV) $(GO) build -trimpath -o $(BUILD)/bench/quillcast-names.wasm ./wasm
	$(GO) run ./core/cmd/benchtable -prepare -out $(BUILD)/bench
	QUILLCAST_BENCH=1 QUILLCAST_BENCH_DIR=$(CURDIR)/$(BUILD)/bench $(GO) test -count=1 -timeout 30m -run '^TestBenchPage$$' ./site/browsertest
	$(GO) run ./core/cmd/benchtable -out $(BUILD)/bench

# bench-deps installs what the bench table compares with, from Debian, when missing.
bench-deps:
	@missing=""; \
	/usr/bin/python3 -c 'import numpy' 2>/dev/null || missing="$$missing python3-numpy"; \
	/usr/bin/python3 -c 'import statsmodels' 2>/dev/null || missing="$$missing python3-statsmodels"; \
	command -v brotli >/dev/null || missing="$$missing brotli"; \
	test -x /usr/bin/chromium || missing="$$missing chromium"; \
	if [ -n "$$missing" ]; then apt-get update && apt-get install -y $$missing; fi

clean:
	rm -rf $(BUILD)
