#!/bin/sh
# Build the project-loader fuzzer with clang and libFuzzer.
# Usage: tests/fuzz/build-fuzzer.sh [OUTPUT_DIR]   (default: build-fuzz)
# Run from the top of the source tree.
set -eu
out=${1:-build-fuzz}
mkdir -p "$out"
# config.h holds only strings the model does not use in this harness.
printf '#define PACKAGE_VERSION "fuzz"\n#define PACKAGE_NAME "rugosa"\n' > "$out/config.h"

# The catalogs are generated from data/*.json as in the Meson build.
/usr/bin/python3 build-aux/gen-catalogs.py "$out" data/materials.json data/fittings.json \
  data/aging.json data/pipes-*.json

# shellcheck disable=SC2086
clang -g -O1 -fsanitize=fuzzer,address,undefined -fno-sanitize-recover=undefined \
  -DGLIB_VERSION_MIN_REQUIRED=GLIB_VERSION_2_74 \
  -DGLIB_VERSION_MAX_ALLOWED=GLIB_VERSION_2_74 -D_XOPEN_SOURCE=700 \
  -I"$out" -Isrc \
  $(pkg-config --cflags gobject-2.0 gio-2.0 libcjson) \
  tests/fuzz/fuzz-project-load.c src/model/*.c src/core/*.c "$out/catalog-data.c" \
  $(pkg-config --libs gobject-2.0 gio-2.0 libcjson) -lm \
  -o "$out/fuzz-project-load"
echo "built $out/fuzz-project-load"
