#!/usr/bin/env bash
# The whole benchmark suite with short iterations (about 4 minutes on 2 cores), with the GC
# profiler for B/op, writing JMH's JSON result to benchmarks/target/quick.json.
# Builds the benchmark jar first when it is missing or older than any source file.
set -euo pipefail
cd "$(dirname "$0")/.."
jar=benchmarks/target/benchmarks.jar
if [ ! -f "$jar" ] || [ -n "$(find transport-spi/src transport-core/src/main benchmarks/src -newer "$jar" -type f | head -1)" ]; then
  # BUILD_LOCK: optional lock file, so that builds on a shared machine run one at a time
  ${BUILD_LOCK:+flock "$BUILD_LOCK"} mvn -B -q -pl benchmarks -am package -DskipTests
fi
mkdir -p benchmarks/target
java -jar "$jar" -f 1 -wi 2 -w 1s -i 3 -r 1s -prof gc \
  -rf json -rff benchmarks/target/quick.json "$@"
