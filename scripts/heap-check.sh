#!/usr/bin/env bash
# Heap check: does indexing a folder of large photographs stay inside a given Java heap?
#
# Generates N invented 3000x2000 JPEGs (scripts/LargeJpegs.java: 200 distinct pictures, each file made unique by bytes
# after its end-of-image marker; cached in the work folder, so a second run skips this), then indexes them into a
# fresh catalog once per heap size with `./morphscout index`, the heap given through MORPHSCOUT_JAVA_OPTS (the
# launcher passes it to the JVM). A heap size passes when the run exits 0 and every image is indexed (no "not enough
# memory" failure, no OutOfMemoryError). Reports the peak resident set size (RSS) of the
# JVM: from /usr/bin/time -v when installed, else from VmHWM in /proc/<pid>/status sampled once a second.
#
# Usage: scripts/heap-check.sh [N=2000] [heap sizes=512m 768m 1g]
#   MORPHSCOUT_HEAP_WORK  work folder (default /tmp/morphscout-heap-check); images in pool-WxH/, catalogs beside
#   MORPHSCOUT_HEAP_SIZE  image size, WxH (default 3000x2000)
# Exit code: 0 when at least one heap size passed, 1 when none did.
#
# Measured 2026-12-01 on 2 shared cores, JDK 25, 3000x2000 JPEGs, default 2 threads (peak RSS counts the heap plus
# ONNX Runtime's native memory, metaspace and code):
#   N=2000 (1.3 GB): -Xmx256m PASS, peak RSS 512 MB, 540 s
#   2026-12-02, with the pixel fingerprint, quiet machine: N=2000: -Xmx256m PASS, peak RSS 530 MB, 231 s
#   N=300  (189 MB): -Xmx256m PASS, peak RSS 503 MB;  -Xmx384m PASS, 625 MB;  -Xmx512m PASS, 749 MB
# What grows with N is the indexer's analysis cache during the neighbour-graph update, about 15-20 KB per image
# (a 128 px byte-per-pixel mask plus vectors): some 40 MB at N=2000, but up to ~1 GB at its 50,000-entry cap.
set -euo pipefail

here="$(cd "$(dirname "$(readlink -f "${BASH_SOURCE[0]}")")/.." && pwd)"
n="${1:-2000}"
shift || true
sizes=("$@")
[ "${#sizes[@]}" -eq 0 ] && sizes=(512m 768m 1g)
work="${MORPHSCOUT_HEAP_WORK:-/tmp/morphscout-heap-check}"
dims="${MORPHSCOUT_HEAP_SIZE:-3000x2000}"
w="${dims%x*}"
h="${dims#*x}"
pool="$work/pool-$dims"      # every generated image; each N gets a folder of hard links to the first N
images="$work/images-$dims-$n"

java_bin="${JAVA_HOME:-/usr/lib/jvm/temurin-25-jdk-amd64}/bin/java"
[ -x "$java_bin" ] || java_bin="$(command -v java)"

mkdir -p "$pool" "$images"
have="$(find "$pool" -maxdepth 1 -name '*.jpg' | wc -l)"
if [ "$have" -lt "$n" ]; then
  echo "heap-check: generating $n JPEGs of ${w}x${h} in $pool (have $have)..." >&2
  start=$(date +%s)
  "$java_bin" -Djava.awt.headless=true "$here/scripts/LargeJpegs.java" "$pool" "$n" "$w" "$h"
  echo "heap-check: generated in $(( $(date +%s) - start )) s" >&2
fi
mapfile -t all < <(find "$pool" -maxdepth 1 -name 'large-*.jpg' | sort)
for f in "${all[@]:0:$n}"; do
  [ -e "$images/$(basename "$f")" ] || ln "$f" "$images/" 2>/dev/null || cp "$f" "$images/"
done
echo "heap-check: $n images, $(du -sh "$images" | cut -f1) on disk" >&2

# Build once before timing anything.
"$here/morphscout" --version >/dev/null

peak_rss_kb() { # runs "$@", prints the peak RSS in kB on fd 3; returns the command's exit code
  if [ -x /usr/bin/time ]; then
    local tf; tf="$(mktemp)"
    local rc=0
    /usr/bin/time -v -o "$tf" "$@" || rc=$?
    sed -n 's/^[[:space:]]*Maximum resident set size (kbytes): //p' "$tf" >&3
    rm -f "$tf"
    return $rc
  fi
  "$@" &
  local pid=$! peak=0 v
  while kill -0 "$pid" 2>/dev/null; do
    for p in "$pid" $(pgrep -P "$pid" 2>/dev/null); do
      v="$(sed -n 's/^VmHWM:[[:space:]]*\([0-9]*\).*/\1/p' "/proc/$p/status" 2>/dev/null || true)"
      [ -n "$v" ] && [ "$v" -gt "$peak" ] && peak="$v"
    done
    sleep 1
  done
  local rc=0
  wait "$pid" || rc=$?
  echo "$peak" >&3
  return $rc
}

any_pass=1
printf '%-8s %-6s %-9s %-8s %-9s %s\n' heap result indexed failed seconds "peak RSS (MB)"
for xmx in "${sizes[@]}"; do
  catalog="$work/catalog-$n-$xmx"
  rm -rf "$catalog"
  out="$work/index-$n-$xmx.json"
  err="$work/index-$n-$xmx.err"
  start=$(date +%s)
  rc=0
  rss="$( { MORPHSCOUT_JAVA_OPTS="-Xmx$xmx" peak_rss_kb "$here/morphscout" --catalog "$catalog" index --json "$images" \
      >"$out" 2>"$err"; } 3>&1 )" || rc=$?
  secs=$(( $(date +%s) - start ))
  indexed="$(sed -n 's/.*"indexed" *: *\([0-9]*\).*/\1/p' "$out" | head -n1)"
  failed="$(sed -n 's/.*"failed" *: *\([0-9]*\).*/\1/p' "$out" | head -n1)"
  result=FAIL
  if [ "$rc" -eq 0 ] && [ "${indexed:-0}" -eq "$n" ] && ! grep -q OutOfMemoryError "$err"; then
    result=PASS
    any_pass=0
  fi
  printf '%-8s %-6s %-9s %-8s %-9s %s\n' "$xmx" "$result" "${indexed:-?}" "${failed:-?}" "$secs" \
      "$(( ${rss:-0} / 1024 ))"
  [ "$result" = FAIL ] && echo "  exit code $rc; see $out and $err" >&2
done
exit $any_pass
