#!/usr/bin/env bash
# Builds the C interface: libstartransport.so with its header and the Fortran module source,
# into the given directory (Maven calls this in the process-classes phase; see pom.xml).
#   usage: build-native.sh JAVA_HOME OUTPUT_DIR
# CC chooses the compiler (default cc). The jars go beside the library (Maven copies them).
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
java_home="$1"
out="$2"
cc="${CC:-cc}"
if [ ! -f "$java_home/include/jni.h" ]; then
  echo "transport-native: $java_home/include/jni.h not found: build with a JDK (not a JRE), e.g. apt-get install openjdk-17-jdk-headless" >&2
  exit 1
fi
mkdir -p "$out/include" "$out/fortran"
"$cc" -std=c11 -O2 -g -fPIC -shared -Wall -Wextra -Wl,-soname,libstartransport.so \
  -I"$java_home/include" -I"$java_home/include/linux" \
  "$here/src/main/c/startransport.c" -o "$out/libstartransport.so" -ldl -lpthread
cp "$here/src/main/c/startransport.h" "$out/include/"
cp "$here/src/main/fortran/startransport.f90" "$out/fortran/"
