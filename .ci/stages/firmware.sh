#!/usr/bin/env bash
# Cortex-M4F float cross build (gcc-arm-none-eabi, newlib-nano) of the library and the sample
# firmware bindings-examples/firmware. Fails if malloc, free, printf or strtod is linked into
# the image, if the library calls soft-double helpers (__aeabi_d*), or if a stack frame is
# dynamic / the library recurses. Reports the library's code+data size (goal <= 16 KiB). Stack:
# worst case per public function including library callees, -Os (the budget, 512 B: above it
# fails) and -O0 (a second build of the library alone, reported); the table in
# docs/embedding.md between the stack-table markers must match (GASKIT_FIRMWARE_UPDATE_DOCS=1
# rewrites it). Takes about 2 minutes on 2 cores (two cross builds).
set -euo pipefail
cd "$(dirname "$0")/../.."
cmake -S bindings-examples/firmware -B build-m4 ${GASKIT_FIRMWARE_CMAKE_ARGS:-} \
      -DCMAKE_TOOLCHAIN_FILE="$PWD/cmake/arm-none-eabi-cortex-m4f.cmake" -DCMAKE_BUILD_TYPE=MinSizeRel
cmake --build build-m4 -j2
lib=build-m4/gaskit/libgaskit.a
elf=build-m4/firmware.elf

# 1. No heap, no stdio, no text-to-number from the C library in the linked image.
forbidden='^(malloc|free|calloc|realloc|_malloc_r|_free_r|_calloc_r|_realloc_r|printf|_printf_r|vfprintf|_vfprintf_r|_svfprintf_r|iprintf|puts|strtod|_strtod_r|strtof|_strtof_r|atof|sscanf)$'
found=$(arm-none-eabi-nm "$elf" | awk '{print $NF}' | grep -E "$forbidden" || true)
if [ -n "$found" ]; then
  echo "forbidden C-library functions linked into the firmware: $found"; exit 1
fi
# 2. The float library does no double arithmetic (no soft-double calls on an M4F).
undef=$(arm-none-eabi-nm -u "$lib" | awk 'NF {print $NF}' | { grep -v ':$' || true; } | sort -u)
echo "library's undefined symbols: $(echo $undef)"
if echo "$undef" | grep -q '^__aeabi_d'; then
  echo "soft-double helpers called by the float library: $(echo "$undef" | grep '^__aeabi_d' | tr '\n' ' ')"; exit 1
fi
if echo "$undef" | grep -Eq "$forbidden"; then
  echo "the library itself references a forbidden function"; exit 1
fi
# 3. Sizes.
arm-none-eabi-size -t "$lib"
read -r text data bss < <(arm-none-eabi-size -t "$lib" | awk '/(TOTALS)/ {print $1, $2, $3}')
total=$((text + data))
goal=$((16 * 1024))
verdict=$([ "$total" -le "$goal" ] && echo "within" || echo "ABOVE")
arm-none-eabi-size "$elf"
read -r etext edata ebss < <(arm-none-eabi-size "$elf" | awk 'NR == 2 {print $1, $2, $3}')
echo "summary: M4F library (every function, -Os): code+rodata $text B, data $data B, bss $bss B: $total B = $(awk "BEGIN {printf \"%.1f\", $total / 1024}") KiB, $verdict the 16 KiB goal"
echo "summary: sample firmware image (--gc-sections, newlib-nano): text $etext B, data $edata B, bss $ebss B; no malloc/free/printf/strtod, no __aeabi_d*"
# 4. Stack: -Os (above) and -O0 (the library alone).
cmake -S bindings-examples/firmware -B build-m4-O0 ${GASKIT_FIRMWARE_CMAKE_ARGS:-} \
      -DCMAKE_TOOLCHAIN_FILE="$PWD/cmake/arm-none-eabi-cortex-m4f.cmake" -DCMAKE_BUILD_TYPE=Debug >/dev/null
cmake --build build-m4-O0 -j2 --target gaskit_static >/dev/null
update=()
[ "${GASKIT_FIRMWARE_UPDATE_DOCS:-0}" = 1 ] && update=(--update)
python3 bindings-examples/firmware/stack_report.py build-m4/gaskit --o0 build-m4-O0/gaskit \
  --goal 512 --doc docs/embedding.md "${update[@]}"
