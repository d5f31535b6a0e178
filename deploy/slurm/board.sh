#!/usr/bin/env bash
# A board's nets as one job array: one task per scenario file (each a whole montecarlo run) and a dependent job that
# checks every net's output exists.
#   deploy/slurm/board.sh OUT FILE... -- wavesim-montecarlo-arguments...
# e.g.
#   deploy/slurm/board.sh runs/board nets/*.yaml -- --vary 'load.c=tol(20%)' --samples 500 --seed 1 --limit 'rx.overshoot<15%'
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
out=$1; shift
files=()
while [ $# -gt 0 ] && [ "$1" != "--" ]; do files+=("$1"); shift; done
[ "${1:-}" = "--" ] && shift
[ ${#files[@]} -gt 0 ] || { echo "usage: $0 OUT FILE... -- montecarlo-arguments..." >&2; exit 2; }
mkdir -p "$out"
printf '%s\n' "${files[@]}" > "$out/nets.txt"
array=$(sbatch --parsable --array=1-${#files[@]} --chdir="$PWD" --export=ALL "$here/net.sbatch" "$out" "$@")
array=${array%%;*}
check=$(sbatch --parsable --dependency=afterok:"$array" --chdir="$PWD" --export=ALL --wrap "ls -d $out/*/summary.json")
echo "$array ${check%%;*}"
