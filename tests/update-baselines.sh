#!/usr/bin/env bash
# Regenerates tests/baselines/ from the current code. Review the diff before committing.
set -euo pipefail
cd "$(dirname "$0")/.."
WINDSCRIPT_UPDATE_BASELINES=1 dotnet test tests/WindScript.Tests --filter "FullyQualifiedName~BaselineTests" "$@"
git status --short tests/baselines
