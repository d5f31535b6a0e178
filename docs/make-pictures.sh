#!/usr/bin/env bash
# Regenerates the README's pictures from the example scenarios.
set -euo pipefail
cd "$(dirname "$0")/.."
dotnet run --project src/WaveSim.Cli -- run scenarios/clock-on-board.yaml --out out/demo --frames 40
dotnet run --project src/WaveSim.Cli -- run scenarios/lossy-fr4-link.yaml --out out/fr4
cp out/demo/waveforms.png docs/waveforms.png
cp out/demo/spacetime.png docs/spacetime.png
cp out/demo/frames/frame_00006.png docs/frame.png
cp out/fr4/eye_rx.png docs/eye.png
