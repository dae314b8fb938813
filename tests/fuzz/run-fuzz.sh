#!/usr/bin/env bash
# Builds the loader's fuzz target with clang (lineward_core instrumented with
# -fsanitize=fuzzer-no-link plus ASan/UBSan; only the core and the target are built) and runs
# it for SECONDS (default 120) from the samples and the tests' malformed files, with the
# format's dictionary. A crash leaves its input in .build/fuzz/artifacts/ and fails; copy it
# into tests/fuzz/regressions/ so core_tests replays it for ever (FuzzRegressions.*).
set -euo pipefail
cd "$(dirname "$0")/../.."
seconds="${1:-120}"
CXX="${CXX:-clang++}"
cmake -B .build/fuzz -G Ninja -DCMAKE_CXX_COMPILER="$CXX" -DCMAKE_BUILD_TYPE=RelWithDebInfo \
  -DLINEWARD_FUZZ=ON -DLINEWARD_BUILD_UI=OFF >/dev/null
cmake --build .build/fuzz --target fuzz_load_drawing
corpus=.build/fuzz/corpus
mkdir -p "$corpus" .build/fuzz/artifacts
cp samples/*.lineward tests/data/hostile/* tests/fuzz/regressions/* "$corpus"/ 2>/dev/null || true
# An undefined-behaviour report must stop the run and fail CI like a crash does.
UBSAN_OPTIONS="halt_on_error=1:print_stacktrace=1${UBSAN_OPTIONS:+:$UBSAN_OPTIONS}" \
  .build/fuzz/tests/fuzz_load_drawing "$corpus" -dict=tests/fuzz/lineward.dict \
  -max_total_time="$seconds" -timeout=10 -rss_limit_mb=2048 -max_len=65536 \
  -artifact_prefix=.build/fuzz/artifacts/ -print_final_stats=1
