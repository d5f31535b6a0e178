#!/usr/bin/env bash
# Times `wavesim bench` and the same update as plain C loops (plain_loop.c, built with full optimisation and
# auto-vectorisation for this CPU) on the same line, alternating, so both see the same machine.
# Usage: tests/WaveSim.Benchmarks/CReference/side-by-side.sh [CELLS] [ROUNDS]     (defaults: 10000 cells, 3 rounds)
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
root=$(cd "$here/../../.." && pwd)
cells=${1:-10000}
rounds=${2:-3}
steps=$(( 2500000000 / cells ))
cc=${CC:-cc}
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT

"$cc" -O3 -march=native -o "$tmp/plain_loop" "$here/plain_loop.c" -lm
dotnet build -c Release -v quiet -nologo "$root/src/WaveSim.Cli" >/dev/null
wavesim="$root/src/WaveSim.Cli/bin/Release/net10.0/wavesim.dll"

echo "cpu: $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | xargs), compiler: $("$cc" --version | head -1)"
echo "line: $cells cells, $steps steps per repetition, fastest of 3 repetitions per row"
printf '%-8s %-9s %-22s %s\n' round line program cell_updates_per_s
rate() { printf '%.3e' "$(sed -E 's/.*"cell_updates_per_s": ([0-9.eE+-]+).*/\1/')"; }
for r in $(seq 1 "$rounds"); do
  for lossless in 0 1; do
    line=$([ "$lossless" = 1 ] && echo lossless || echo lossy)
    flag=$([ "$lossless" = 1 ] && echo --lossless || true)
    printf '%-8s %-9s %-22s %s\n' "$r" "$line" "C -O3 -march=native" "$("$tmp/plain_loop" "$cells" "$steps" 3 "$lossless" | rate)"
    printf '%-8s %-9s %-22s %s\n' "$r" "$line" "wavesim bench" "$(dotnet "$wavesim" bench --cells "$cells" --steps "$steps" --repeat 3 $flag --json | rate)"
  done
done
