#!/usr/bin/env bash
# Submits a wavesim sweep or montecarlo run as a Slurm job array of N shards and a merge job that waits for all of them.
#   deploy/slurm/submit.sh N OUT wavesim-arguments...
# e.g.
#   deploy/slurm/submit.sh 4 runs/clock montecarlo scenarios/clock-on-board.yaml --vary 'load.c=tol(20%)' --samples 400 --seed 3
# The arguments must not hold --out or --shard: the script adds --out OUT and the tasks add --shard auto.
# Prints the two job ids (array, merge). WAVESIM names the executable (default: wavesim on PATH).
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
[ $# -ge 3 ] || { echo "usage: $0 N OUT wavesim-arguments..." >&2; exit 2; }
n=$1 out=$2; shift 2
[[ $n =~ ^[1-9][0-9]*$ ]] || { echo "error: N must be a whole number of 1 or more, got '$n'" >&2; exit 2; }
mkdir -p "$out"
array=$(sbatch --parsable --array=1-"$n" --chdir="$PWD" --export=ALL "$here/shards.sbatch" "$@" --out "$out")
array=${array%%;*}
merge=$(sbatch --parsable --dependency=afterok:"$array" --chdir="$PWD" --export=ALL "$here/merge.sbatch" "$out")
echo "$array ${merge%%;*}"
