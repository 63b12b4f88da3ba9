#!/bin/sh
# compare.sh times `tremie render` against the matplotlib reference script
# (../shared/bench/matplotlib_well.py beside the repository, or $REF) on
# the demo wells and on 100 synthetic wells, in one run, alternating the
# two in pairs, and prints the medians, their ratio and the machine. It
# also prints the sizes of the demo sheets and the time to draw the deep
# gallery well (testdata/gallery/DS-1200.toml) as SVG, PDF and PNG.
# Results go into BENCHMARKS.md by hand.
#
#   sh render/out/testdata/bench/compare.sh            # from the repository
#   PAIRS=5 REF=/path/matplotlib_well.py sh .../compare.sh
set -eu

repo=$(cd "$(dirname "$0")/../../../.." && pwd)
ref=${REF:-$repo/../shared/bench/matplotlib_well.py}
pairs=${PAIRS:-3}
python=${PYTHON:-/usr/bin/python3}
[ -f "$ref" ] || { echo "compare.sh: no reference script at $ref (set REF)" >&2; exit 2; }

work=$(mktemp -d "${TMPDIR:-/tmp}/tremie-bench.XXXXXX")
trap 'rm -rf "$work"' EXIT INT TERM

cd "$repo"
go build -o "$work/tremie" ./cmd/tremie
"$work/tremie" demo -o "$work/demo" --quiet >/dev/null || true
TREMIE_SYNTH_DIR="$work/synth" TREMIE_SYNTH_N=100 go test -count=1 -run '^TestWriteSynthProject$' ./cmd/tremie >/dev/null

now() { date +%s.%N; }
# seconds CMD...: run CMD (its output discarded; a non-zero exit from
# findings is no failure here) and print the wall time in seconds.
seconds() {
	t0=$(now)
	"$@" >/dev/null 2>&1 || true
	t1=$(now)
	echo "$t0 $t1" | awk '{printf "%.3f\n", $2 - $1}'
}
median() { sort -n | awk '{a[NR] = $1} END {if (NR % 2) print a[(NR + 1) / 2]; else printf "%.3f\n", (a[NR / 2] + a[NR / 2 + 1]) / 2}'; }

# pair NAME WELLS: alternate tremie and matplotlib $pairs times on WELLS.
pair() {
	name=$1 wells=$2
	n=$(ls "$wells"/*.toml | wc -l)
	: >"$work/$name.tremie"
	: >"$work/$name.mpl"
	i=1
	while [ "$i" -le "$pairs" ]; do
		seconds "$work/tremie" render "$wells" -o "$work/out-t-$name" --format svg,pdf --force --quiet >>"$work/$name.tremie"
		rm -rf "$work/out-m-$name"
		seconds "$python" "$ref" "$wells"/*.toml -o "$work/out-m-$name" --format svg,pdf -q >>"$work/$name.mpl"
		i=$((i + 1))
	done
	ls "$work/out-t-$name"/*.svg >/dev/null && ls "$work/out-m-$name"/*.svg >/dev/null # both drew
	t=$(median <"$work/$name.tremie")
	m=$(median <"$work/$name.mpl")
	echo "$name ($n wells, $pairs pairs): tremie $(tr '\n' ' ' <"$work/$name.tremie")-> median ${t} s; matplotlib $(tr '\n' ' ' <"$work/$name.mpl")-> median ${m} s; ratio $(echo "$m $t" | awk '{printf "%.1f", $1 / $2}')x"
}

echo "date: $(date -u '+%Y-%m-%d %H:%M UTC')"
echo "machine: nproc $(nproc); $(grep -m1 'model name' /proc/cpuinfo | sed 's/.*: //'); $(awk '/MemTotal/ {printf "%.1f GB", $2 / 1048576}' /proc/meminfo); load average $(cut -d' ' -f1-3 /proc/loadavg)"
echo "go: $(go version | cut -d' ' -f3-); matplotlib: $("$python" -c 'import matplotlib; print(matplotlib.__version__)'); commit $(git rev-parse --short HEAD 2>/dev/null || echo unknown)"
pair demo "$work/demo/wells"
pair synth100 "$work/synth/wells"

echo "demo sheet sizes (tremie, bytes):"
for f in "$work/out-t-demo"/*.svg "$work/out-t-demo"/*.pdf; do
	echo "  $(basename "$f") $(wc -c <"$f")"
done

: >"$work/deep"
for i in 1 2 3; do
	seconds "$work/tremie" render testdata/gallery/DS-1200.toml -o "$work/out-deep" --format svg,pdf,png --force --quiet >>"$work/deep"
done
echo "DS-1200 (1,200 ft, 150 layers) svg,pdf,png: $(tr '\n' ' ' <"$work/deep")-> median $(median <"$work/deep") s"
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)"
