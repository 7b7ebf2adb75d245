#!/usr/bin/env bash
# Builds and runs the two example hosts of the C interface, a C program and a Fortran program.
# Each reads the demo star's zones (profile.csv, written here by the Java program
# ExampleReference together with reference.csv, the same batch calls made through the Java API),
# calls thermodynamics, opacity, stability and convection with its Jacobian through
# libstartransport, compares every value with the Java API's bit for bit, and shows one refused
# zone. Prints "c-host: refused: ...", "c-host: ... ok", "fortran-host: refused: ..." and
# "fortran-host: ... ok"; exits 1 unless both hosts agreed.
#
# Builds transport-native first when target/native is missing or older than a source file
# (set BUILD_LOCK to a lock file to serialise that build on a shared machine). Needs cc and
# gfortran (apt-get install gcc gfortran) and Java 17.
set -euo pipefail
root="$(cd "$(dirname "$0")/.." && pwd)"
native="$root/transport-native/target/native"
work="$root/transport-native/target/examples"
lib="$native/libstartransport.so"
if [ ! -f "$lib" ] || [ -n "$(find "$root/transport-spi/src/main" "$root/transport-core/src/main" \
    "$root/transport-native/src/main" -newer "$lib" -type f | head -1)" ]; then
  (cd "$root" && ${BUILD_LOCK:+flock "$BUILD_LOCK"} mvn -B -q -pl transport-native -am package -DskipTests) >&2
fi
mkdir -p "$work"
java -cp "$native/*" io.github.startransport.bridge.ExampleReference "$work" 800 > /dev/null

status=0
# C host: the compile and link flags a host needs
cc -std=c11 -O2 -I"$native/include" -I"$root/transport-native/src/examples/c" \
  "$root/transport-native/src/examples/c/host.c" -o "$work/c-host" \
  -L"$native" -lstartransport -Wl,-rpath,"$native"
"$work/c-host" "$work" || status=1

# Fortran host: the module is compiled with the host (Fortran 2003), then linked the same way
if command -v gfortran > /dev/null; then
  gfortran -std=f2003 -O2 -c "$native/fortran/startransport.f90" -J "$work" -o "$work/startransport.o"
  gfortran -O2 -I"$work" "$root/transport-native/src/examples/fortran/host.f90" "$work/startransport.o" \
    -o "$work/fortran-host" -L"$native" -lstartransport -Wl,-rpath,"$native"
  "$work/fortran-host" "$work" || status=1
else
  echo "fortran-host: not run: gfortran is not installed (apt-get install gfortran): FAILED"
  status=1
fi
exit $status
