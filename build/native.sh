#!/usr/bin/env bash
# Builds the windscript command as one Native AOT binary (no .NET runtime needed to run it), with
# SkiaSharp's native library beside it so that `plot --format png` and `report` work.
#   build/native.sh [OUT_DIR] [RID]        default: artifacts/native/linux-x64, linux-x64
# Needs the .NET 10 SDK and a C toolchain for the platform linker (Debian: clang or gcc, zlib1g-dev).
# Other platforms: run it there with their RID (osx-arm64, win-x64 from Git Bash, linux-arm64);
# Native AOT does not cross-compile between operating systems.
set -euo pipefail
cd "$(dirname "$0")/.."
rid=${2:-linux-x64}
out=${1:-artifacts/native/$rid}
commit=$(git rev-parse --short=12 HEAD 2>/dev/null || echo unknown)
dotnet publish src/WindScript.Cli -c Release -r "$rid" -p:PublishAot=true -p:SourceRevisionId="$commit" \
  -p:StripSymbols=true -p:DebugType=none -o "$out" -v quiet -nologo
rm -f "$out"/*.dbg "$out"/*.pdb
exe="$out/windscript"; [ -f "$exe.exe" ] && exe="$exe.exe"
case "$rid" in
  linux-*) skia="$out/libSkiaSharp.so" ;;
  osx-*) skia="$out/libSkiaSharp.dylib" ;;
  win-*) skia="$out/libSkiaSharp.dll" ;;
  *) skia="" ;;
esac
if [ -n "$skia" ] && [ ! -f "$skia" ]; then echo "native.sh: SkiaSharp's native library is missing from $out" >&2; exit 1; fi
"$exe" --version >/dev/null
echo "$exe"
