#!/bin/sh
# compare.sh measures tremie against the targets of issue 15 in one run
# and writes the result as a Markdown section:
#
#   - `tremie render WELLS --format svg,pdf --force` against the matplotlib
#     reference script (../shared/bench/matplotlib_well.py beside the
#     repository, or $REF) on the demo wells and on 100 synthetic wells,
#     the two alternated in pairs ($PAIRS, default 3), medians and ratio;
#   - the deep gallery well (testdata/gallery/DS-1200.toml, 1,200 ft,
#     150 layers) as SVG, PDF and PNG (target: under 1 s);
#   - the demo sheets' sizes (targets: SVG 100 KB, PDF 60 KB);
#   - `tremie check` on 1,000 wells beside BurntSushi/toml decoding them
#     (BenchmarkCheckVsDecode1000; target: at most 1.3 times);
#   - the machine, the Go and matplotlib versions, the commit, and the
#     load average before and after each measurement (the machine may be
#     shared: a number without its load means little).
#
#   sh render/out/testdata/bench/compare.sh            # print the section
#   sh render/out/testdata/bench/compare.sh --update   # and put it into BENCHMARKS.md
#   PAIRS=5 REF=/path/matplotlib_well.py sh .../compare.sh
#   PAIRS=1 SYNTH=5 sh .../compare.sh                  # a quick try of the script
#
# --update replaces what lies between the markers
# <!-- compare.sh:begin --> and <!-- compare.sh:end --> in BENCHMARKS.md.
# It needs Go, and Python 3 with matplotlib (Debian: apt-get install -y
# python3-matplotlib). About 6 minutes on a quiet 2-core machine.
set -eu

update=false
case "${1:-}" in
--update) update=true ;;
"") ;;
*) echo "usage: compare.sh [--update]" >&2; exit 3 ;;
esac

repo=$(cd "$(dirname "$0")/../../../.." && pwd)
ref=${REF:-}
if [ -z "$ref" ]; then # beside the repository, or beside the folder of worktrees
	for d in "$repo/../shared/bench" "$repo/../../shared/bench"; do
		[ -f "$d/matplotlib_well.py" ] && ref="$d/matplotlib_well.py" && break
	done
fi
pairs=${PAIRS:-3}
synth=${SYNTH:-100} # synthetic wells (fewer only to try the script out)
python=${PYTHON:-/usr/bin/python3}
[ -n "$ref" ] && [ -f "$ref" ] || { echo "compare.sh: no reference script matplotlib_well.py in ../shared/bench beside the repository (set REF)" >&2; exit 2; }
"$python" -c 'import matplotlib' 2>/dev/null || {
	echo "compare.sh: $python has no matplotlib (Debian: apt-get install -y python3-matplotlib; or set PYTHON)" >&2
	exit 2
}
command -v go >/dev/null || { echo "compare.sh: go is not on PATH" >&2; exit 2; }

work=$(mktemp -d "${TMPDIR:-/tmp}/tremie-bench.XXXXXX")
trap 'rm -rf "$work"' EXIT
trap 'exit 130' INT TERM

cd "$repo"
echo "compare.sh: building tremie and writing the wells in $work" >&2
go build -o "$work/tremie" ./cmd/tremie
"$work/tremie" demo -o "$work/demo" --quiet >/dev/null 2>&1 || true # findings are no failure
[ -d "$work/demo/wells" ] || { echo "compare.sh: tremie demo wrote no wells" >&2; exit 1; }
TREMIE_SYNTH_DIR="$work/synth" TREMIE_SYNTH_N=$synth go test -count=1 -run '^TestWriteSynthProject$' ./cmd/tremie >/dev/null

load() { cut -d' ' -f1-3 /proc/loadavg; }
now() { date +%s.%N; }
# seconds CMD...: run CMD (its output discarded; exit 1 from findings is
# no failure, anything else stops the run) and print the wall time.
seconds() {
	t0=$(now)
	rc=0
	"$@" >/dev/null 2>"$work/stderr" || rc=$?
	t1=$(now)
	if [ "$rc" -gt 1 ]; then
		echo "compare.sh: exit $rc from: $*" >&2
		tail -5 "$work/stderr" >&2
		exit 1
	fi
	echo "$t0 $t1" | awk '{printf "%.2f\n", $2 - $1}'
}
median() { sort -n | awk '{a[NR] = $1} END {if (NR % 2) print a[(NR + 1) / 2]; else printf "%.2f\n", (a[NR / 2] + a[NR / 2 + 1]) / 2}'; }
list() { tr '\n' ' ' <"$1" | sed 's/ $//; s/ /, /g'; }

# pair NAME LABEL WELLS: alternate tremie and matplotlib $pairs times on
# WELLS and print one table row.
pair() {
	name=$1 label=$2 wells=$3
	: >"$work/$name.tremie"
	: >"$work/$name.mpl"
	before=$(load)
	i=1
	while [ "$i" -le "$pairs" ]; do
		echo "compare.sh: $label, pair $i of $pairs" >&2
		seconds "$work/tremie" render "$wells" -o "$work/out-t-$name" --format svg,pdf --force --quiet >>"$work/$name.tremie"
		rm -rf "$work/out-m-$name"
		seconds "$python" "$ref" "$wells"/*.toml -o "$work/out-m-$name" --format svg,pdf -q >>"$work/$name.mpl"
		i=$((i + 1))
	done
	after=$(load)
	ls "$work/out-t-$name"/*.svg "$work/out-t-$name"/*.pdf >/dev/null # both drew
	ls "$work/out-m-$name"/*.svg "$work/out-m-$name"/*.pdf >/dev/null
	t=$(median <"$work/$name.tremie")
	m=$(median <"$work/$name.mpl")
	ratio=$(echo "$m $t" | awk '{printf "%.1f", $1 / $2}')
	met=$(echo "$ratio" | awk '{print ($1 >= 20) ? "yes" : "**no**"}')
	echo "| $label | $(list "$work/$name.tremie") → **$t s** | $(list "$work/$name.mpl") → **$m s** | **${ratio}×** | ≥ 20× | $met | $before → $after |"
}

out="$work/section.md"
{
	echo "**Run of $(date -u '+%Y-%m-%d %H:%M UTC')**, commit $(git rev-parse --short HEAD 2>/dev/null || echo unknown)$(git diff --quiet HEAD 2>/dev/null || echo ' (with uncommitted changes)'), by \`compare.sh\`:"
	echo "\`nproc\` = $(nproc), $(grep -m1 'model name' /proc/cpuinfo | sed 's/.*: //'), $(awk '/MemTotal/ {printf "%.1f GB", $2 / 1048576}' /proc/meminfo) RAM;"
	echo "$(go version | cut -d' ' -f3-); matplotlib $("$python" -c 'import matplotlib; print(matplotlib.__version__)') ($python)."
	echo "Load average (1, 5, 15 min) at the start: $(load)."
	echo
	echo "| wells, SVG + PDF | tremie ($pairs runs → median) | matplotlib reference ($pairs runs → median) | ratio | target | met? | load before → after |"
	echo "|---|---|---|---|---|---|---|"
	pair demo "$(ls "$work/demo/wells"/*.toml | wc -l | tr -d ' ') demo wells" "$work/demo/wells"
	pair synth "$synth synthetic wells" "$work/synth/wells"
	echo

	echo "compare.sh: the deep gallery well" >&2
	: >"$work/deep"
	before=$(load)
	for i in 1 2 3; do
		seconds "$work/tremie" render testdata/gallery/DS-1200.toml -o "$work/out-deep" --format svg,pdf,png --force --quiet >>"$work/deep"
	done
	d=$(median <"$work/deep")
	echo "| other target | measured | met? | load before → after |"
	echo "|---|---|---|---|"
	echo "| 1,200-ft, 150-layer well (DS-1200) SVG + PDF + PNG < 1 s | $(list "$work/deep") → **$d s** | $(echo "$d" | awk '{print ($1 < 1) ? "yes" : "**no**"}') | $before → $(load) |"

	svgmax=0 pdfmax=0
	for f in "$work/out-t-demo"/*.svg; do
		case $f in *-features.svg) continue ;; esac
		n=$(wc -c <"$f"); [ "$n" -gt "$svgmax" ] && svgmax=$n && svgname=$(basename "$f")
	done
	for f in "$work/out-t-demo"/*.pdf; do
		case $f in *-features.pdf) continue ;; esac
		n=$(wc -c <"$f"); [ "$n" -gt "$pdfmax" ] && pdfmax=$n && pdfname=$(basename "$f")
	done
	pdfpages=$(grep -a -c '/Type */Page[^s]' "$work/out-t-demo/$pdfname" || echo 1)
	echo "| a demo sheet's SVG ≤ 100 KB | largest $svgname $((svgmax / 1000)) KB | $([ "$svgmax" -le 100000 ] && echo yes || echo '**no**') | |"
	echo "| a demo sheet's PDF ≤ 60 KB | largest $pdfname $((pdfmax / 1000)) KB ($pdfpages page(s)) | $([ "$pdfmax" -le $((60000 * pdfpages)) ] && echo yes || echo '**no**') | |"

	echo "compare.sh: check against the TOML decoder (BenchmarkCheckVsDecode1000)" >&2
	before=$(load)
	go test -count=1 -run '^$' -bench '^BenchmarkCheckVsDecode1000$' -benchtime 10x ./cmd/tremie >"$work/check" 2>&1 || { cat "$work/check" >&2; exit 1; }
	line=$(grep '^BenchmarkCheckVsDecode1000' "$work/check")
	cm=$(echo "$line" | awk '{for (i = 1; i < NF; i++) if ($(i+1) == "check-ms") print $i}')
	dm=$(echo "$line" | awk '{for (i = 1; i < NF; i++) if ($(i+1) == "decode-ms") print $i}')
	cr=$(echo "$line" | awk '{for (i = 1; i < NF; i++) if ($(i+1) == "check/decode") printf "%.2f", $i}')
	echo "| \`check\` on 1,000 wells ≤ 1.3 × BurntSushi/toml decoding them (both on every core, same iterations, 10 of them) | check $cm ms, decode $dm ms: **${cr}×** | $(echo "$cr" | awk '{print ($1 <= 1.3) ? "yes" : "**no**"}') | $before → $(load) |"
	echo
	echo "Demo sheet sizes (bytes): $(cd "$work/out-t-demo" && for f in *.svg *.pdf; do printf '%s %s; ' "$f" "$(wc -c <"$f" | tr -d ' ')"; done | sed 's/; $//')."
} >"$out"

cat "$out"
if $update; then
	md="$repo/BENCHMARKS.md"
	grep -q '<!-- compare.sh:begin -->' "$md" && grep -q '<!-- compare.sh:end -->' "$md" || {
		echo "compare.sh: BENCHMARKS.md has no <!-- compare.sh:begin --> / <!-- compare.sh:end --> markers" >&2
		exit 1
	}
	awk -v section="$out" '
		/<!-- compare.sh:begin -->/ { print; while ((getline l < section) > 0) print l; skip = 1; next }
		/<!-- compare.sh:end -->/ { skip = 0 }
		!skip { print }
	' "$md" >"$work/BENCHMARKS.md"
	cp "$work/BENCHMARKS.md" "$md"
	echo "compare.sh: BENCHMARKS.md updated" >&2
fi
