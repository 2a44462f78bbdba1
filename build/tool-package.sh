#!/usr/bin/env bash
# Packs the windscript .NET tool into artifacts/ (three packages, as .NET 10 lays out RID-specific tools):
#   windscript.VERSION.nupkg            the package users name; points at the two below
#   windscript.linux-x64.VERSION.nupkg  the Native AOT binary with libSkiaSharp.so (built here, on Linux x64)
#   windscript.any.VERSION.nupkg        framework-dependent fallback for every other platform (needs the .NET 10 runtime)
# Install:  dotnet tool install --global windscript --add-source artifacts
# A native package for another platform is packed on that platform: dotnet pack src/WindScript.Cli -c Release -r osx-arm64
# (Native AOT does not cross-compile between operating systems); add its RID to ToolPackageRuntimeIdentifiers.
set -euo pipefail
cd "$(dirname "$0")/.."
commit=$(git rev-parse --short=12 HEAD 2>/dev/null || echo unknown)
common=(-c Release -v quiet -nologo -p:SourceRevisionId="$commit")
rm -f artifacts/windscript.*.nupkg
dotnet pack src/WindScript.Cli "${common[@]}"
dotnet pack src/WindScript.Cli "${common[@]}" -r linux-x64 -p:DebugType=none -p:StripSymbols=true
dotnet pack src/WindScript.Cli "${common[@]}" -r any -p:PublishAot=false
ls artifacts/windscript.*.nupkg
