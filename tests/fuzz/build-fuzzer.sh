#!/bin/sh
# Build the project-loader fuzzer with clang and libFuzzer.
# Usage: tests/fuzz/build-fuzzer.sh [OUTPUT_DIR]   (default: build-fuzz)
# Run from the top of the source tree.
set -eu
out=${1:-build-fuzz}
mkdir -p "$out"
# config.h holds only strings the model does not use in this harness.
printf '#define PACKAGE_VERSION "fuzz"\n#define PACKAGE_NAME "rugosa"\n' > "$out/config.h"

# Test doubles stand in for core files not yet merged (see
# tests/model-core-fakes.c); with every real file present none is used.
fakes=""
defs=""
for pair in fluid.c:RUGOSA_FAKE_FLUID catalog.c:RUGOSA_FAKE_CATALOG \
            fittings.c:RUGOSA_FAKE_FITTINGS aging.c:RUGOSA_FAKE_AGING; do
  file=${pair%%:*}
  if [ ! -e "src/core/$file" ]; then
    defs="$defs -D${pair##*:}"
    fakes="tests/model-core-fakes.c"
  fi
done

# shellcheck disable=SC2086
clang -g -O1 -fsanitize=fuzzer,address,undefined -fno-sanitize-recover=undefined \
  -DGLIB_VERSION_MIN_REQUIRED=GLIB_VERSION_2_74 \
  -DGLIB_VERSION_MAX_ALLOWED=GLIB_VERSION_2_74 $defs \
  -I"$out" -Isrc \
  $(pkg-config --cflags gobject-2.0 gio-2.0 libcjson) \
  tests/fuzz/fuzz-project-load.c src/model/*.c src/core/*.c $fakes \
  $(pkg-config --libs gobject-2.0 gio-2.0 libcjson) -lm \
  -o "$out/fuzz-project-load"
echo "built $out/fuzz-project-load"
