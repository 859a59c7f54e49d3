#!/usr/bin/env bash
# Retrains both shipped sentence models from the commands recorded in them (naive Bayes first,
# then maximum entropy, which reads the naive Bayes score) and compares the results byte for byte
# with media/models/. Exit 1 and a diff when a model does not reproduce.
# The recorded commands name ../shared/corpus/... relative to the repository, so they run in a
# scratch folder laid out that way (the corpus is linked, never copied).
# Needs a build (dist/cli.cjs) and the corpus: TERSELY_SHARED (default: ../shared beside the repo).
set -euo pipefail
repo="$(cd "$(dirname "$0")/.." && pwd)"
shared="${TERSELY_SHARED:-$repo/../shared}"
[ -d "$shared/corpus" ] || { echo "check-models: no corpus under $shared (set TERSELY_SHARED)" >&2; exit 2; }
scratch="$(mktemp -d)"; trap 'rm -rf "$scratch"' EXIT
mkdir -p "$scratch/repo/media/models" "$scratch/repo/bench"
ln -s "$(cd "$shared" && pwd)" "$scratch/shared"
ln -s "$repo/dist" "$scratch/repo/dist"; ln -s "$repo/node_modules" "$scratch/repo/node_modules"
cp "$repo/bench/training-files.txt" "$scratch/repo/bench/"
status=0
for model in default-model.json maxent-model.json; do
  command="$(node -e 'console.log(require(process.argv[1]).trainedOn.command)' "$repo/media/models/$model")"
  echo "$model: $command"
  (cd "$scratch/repo" && eval "node dist/cli.cjs ${command#tersely }")
  if cmp -s "$repo/media/models/$model" "$scratch/repo/media/models/$model"; then echo "$model: reproduces byte for byte"
  else echo "$model: DOES NOT reproduce"; diff <(node -e 'console.log(JSON.stringify(require(process.argv[1]),null,1))' "$repo/media/models/$model") <(node -e 'console.log(JSON.stringify(require(process.argv[1]),null,1))' "$scratch/repo/media/models/$model") | head -20 || true; status=1; fi
done
exit $status
