#!/usr/bin/env bash
# Cold-start times of the packaged launcher, each against a bare `java -version` timed in the same
# run (and the app's first frame against a bare JavaFX window), written as a table into
# docs/performance.md between the "startup-bench" markers.
#
#   bench/startup.sh [RUNS] [IMAGE_DIR]
#
# Needs the app image (mvn -B -Ppackage package, or src/packaging/package.sh --image-only).
# The first frame is measured only where xvfb-run is installed (apt-get install -y xvfb libgtk-3-0).
# Every run is a new process; the runs of all targets are interleaved so a change in the machine's
# load hits them all alike. Medians are reported.
set -euo pipefail
ROOT="$(cd "$(dirname "$0")/.." && pwd)"
RUNS="${1:-7}"
IMG="${2:-$ROOT/target/package/image/latent-ledger}"
L="$IMG/bin/latent-ledger"
[ -x "$L" ] || { echo "startup.sh: no launcher at $L; build the image first (mvn -B -Ppackage package)" >&2; exit 2; }
JAVA="${JAVA_HOME:+$JAVA_HOME/bin/}java"

WORK="$(mktemp -d)"
trap 'rm -rf "$WORK"' EXIT
DATA="$WORK/data"
export HOME="$WORK"
"$L" --data-dir "$DATA" visits list >/dev/null           # the Saltreed demo ledger, as on a used tablet

# a week at 1 Hz (604 800 rows): 20 minutes on, 25 off, invented readings
LOG="$WORK/week.csv"
awk 'BEGIN {
    print "time,return_db,return_rh,supply_db,supply_rh,compressor,fan";
    for (s = 0; s < 604800; s++) {
        d = int(s / 86400); r = s - d * 86400; h = int(r / 3600); m = int((r - h * 3600) / 60); sec = r % 60;
        on = (s % 2700) < 1200;
        k = on ? (s % 2700) / 1200.0 : 0;
        sdb = on ? 74 - 18 * (1 - exp(-k * 8)) : 74; srh = on ? 62 + 28 * (1 - exp(-k * 8)) : 60;
        printf "2026-07-%02dT%02d:%02d:%02d-04:00,%.2f,%.1f,%.2f,%.1f,%d,%d\n", d + 1, h, m, sec, 76 + 0.5 * sin(s / 9000.0), 55 + 2 * sin(s / 20000.0), sdb, srh, on, on;
    }
}' >"$LOG"

ms() { # wall-clock milliseconds of one command, its output thrown away; fails loudly.
    # Also keeps its CPU time (user + system, all threads) in $WORK/cpu: on a machine shared with
    # other builds the wall clock mostly measures the queue, the CPU time much less so.
    local s e
    s=$(date +%s%N)
    /usr/bin/time -f "%U %S" -o "$WORK/cpu" "$@" >/dev/null 2>"$WORK/err" || { echo "startup.sh: failed: $*" >&2; cat "$WORK/err" >&2; exit 1; }
    e=$(date +%s%N)
    echo $(((e - s) / 1000000))
}
cpu_ms() { awk '{printf "%d", ($1 + $2) * 1000}' "$WORK/cpu"; }

FIRST_FRAME=false
if command -v xvfb-run >/dev/null 2>&1; then
    FIRST_FRAME=true
    REF_SRC="$ROOT/src/jmh/java/app/latentledger/bench/FirstFrameReference.java"
    APPDIR="$IMG/lib/app"
    FXCP="$(ls "$APPDIR"/javafx-*.jar | paste -sd: -)"
    "${JAVA_HOME:+$JAVA_HOME/bin/}javac" -nowarn -d "$WORK/ref" -cp "$FXCP" "$REF_SRC"
fi

frame_ms() { # "first frame N ms after JVM start" from a window under Xvfb; then the window is closed
    local out="$WORK/frame.out" pid c
    : >"$out"
    JAVA_TOOL_OPTIONS="-Dprism.order=sw -Dlatentledger.timing=true" \
        xvfb-run -a -s "-screen 0 1280x800x24" "$@" >"$out" 2>&1 &
    pid=$!
    for _ in $(seq 1 240); do grep -q "first frame" "$out" && break; sleep 0.25; done
    for c in $(pgrep -P "$pid"); do
        if tr '\0' ' ' <"/proc/$c/cmdline" | grep -q -e latent-ledger -e FirstFrameReference; then kill -TERM "$c" 2>/dev/null || true; fi
    done
    wait "$pid" 2>/dev/null || true
    sed -n 's/^first frame \([0-9]*\) ms.*/\1/p' "$out" | head -1
}

declare -A T C
add() { T[$1]="${T[$1]:-} $2"; C[$1]="${C[$1]:-} $(cpu_ms)"; }
addf() { T[$1]="${T[$1]:-} $2"; }
LOAD_BEFORE="$(cut -d' ' -f1-3 /proc/loadavg)"
for i in $(seq 1 "$RUNS"); do
    add jv "$(ms "$JAVA" -version)"
    add state "$(ms "$L" --data-dir "$DATA" state --dry-bulb 80 --wet-bulb 67)"
    add coil "$(ms "$L" --data-dir "$DATA" coil --return-db 76 --return-rh 58 --supply-db 59 --supply-rh 90 --airflow 1200 --nominal-tons 3 --coil-temp 59 --json)"
    add log "$(ms "$L" --data-dir "$DATA" log "$LOG" --airflow 1200)"
    add report "$(ms "$L" --data-dir "$DATA" report dfa8 --out "$WORK/report.pdf")"
    if $FIRST_FRAME; then
        addf frame "$(frame_ms "$L" --data-dir "$DATA")"
        addf bare "$(frame_ms "$IMG/lib/runtime/bin/java" -XX:-UsePerfData -XX:+UseSerialGC -cp "$WORK/ref:$FXCP" 'app.latentledger.bench.FirstFrameReference$Launcher')"
    fi
    echo "run $i/$RUNS done" >&2
done
LOAD_AFTER="$(cut -d' ' -f1-3 /proc/loadavg)"

median() { tr ' ' '\n' | grep -v '^$' | sort -n | awk '{a[NR]=$1} END {print (NR % 2) ? a[(NR + 1) / 2] : int((a[NR / 2] + a[NR / 2 + 1]) / 2)}'; }
all() { echo "${T[$1]}" | tr -s ' ' | sed 's/^ //; s/ /, /g'; }
M_JV=$(echo "${T[jv]}" | median)
C_JV=$(echo "${C[jv]}" | median)
row() { # name key target_ms
    local m ok c
    m=$(echo "${T[$2]}" | median)
    c=$(echo "${C[$2]}" | median)
    ok=$([ "$m" -le "$3" ] && echo "✔" || echo "✘")
    printf '| %s | %d ms | %.1f× | %d ms | %.1f× | ≤ %d ms %s | %s |\n' "$1" "$m" "$(echo "$m $M_JV" | awk '{print $1 / $2}')" \
        "$c" "$(echo "$c $C_JV" | awk '{print $1 / ($2 > 0 ? $2 : 1)}')" "$3" "$ok" "$(all "$2")"
}
TABLE="$WORK/table.md"
{
    echo "Measured $(date -u '+%Y-%m-%d %H:%M UTC') by \`bench/startup.sh $RUNS\`: $RUNS interleaved cold runs each, medians;"
    echo "$(nproc) cores, load average $LOAD_BEFORE before and $LOAD_AFTER after; reference \`$("$JAVA" -version 2>&1 | head -1)\`."
    echo
    echo "| Packaged launcher, cold process | Wall, median | × bare \`java -version\` | CPU (user+sys), median | × bare | Target (wall) | All runs, wall (ms) |"
    echo "|---|---|---|---|---|---|---|"
    printf '| reference: bare `java -version` (the JDK'"'"'s) | %d ms | 1 | %d ms | 1 | — | %s |\n' "$M_JV" "$C_JV" "$(all jv)"
    row '`state --dry-bulb 80 --wet-bulb 67`' state 120
    row '`coil … --json` (stored settings read from the ledger)' coil 150
    row '`log` of a 7-day 1 Hz file (604 800 rows, 32 MB)' log 1000
    row '`report` of a visit, 5 pages' report 500
    if $FIRST_FRAME; then
        M_BARE=$(echo "${T[bare]}" | median)
        M_FRAME=$(echo "${T[frame]}" | median)
        printf '| reference: bare JavaFX window, first frame (same runtime, Xvfb, software rendering) | %d ms | %.1f× | | | — | %s |\n' "$M_BARE" "$(echo "$M_BARE $M_JV" | awk '{print $1 / $2}')" "$(all bare)"
        ok=$( { [ "$M_FRAME" -le 1000 ] || [ "$(echo "$M_FRAME $M_BARE" | awk '{print ($1 <= 1.2 * $2)}')" = 1 ]; } && echo "✔" || echo "✘")
        printf '| app first frame (Xvfb, software rendering), %.2f× the bare window | %d ms | %.1f× | | | ≤ 1000 ms or ≤ 1.2× bare %s | %s |\n' "$(echo "$M_FRAME $M_BARE" | awk '{print $1 / $2}')" "$M_FRAME" "$(echo "$M_FRAME $M_JV" | awk '{print $1 / $2}')" "$ok" "$(all frame)"
    else
        echo "| app first frame | not measured: xvfb-run is not installed | | | | ≤ 1000 ms or ≤ 1.2× bare | |"
    fi
    echo
    echo "First-frame times are the app's own \"ms after JVM start\" (\`-Dlatentledger.timing=true\`), the others wall-clock from exec to exit."
} >"$TABLE"
cat "$TABLE"

DOC="$ROOT/docs/performance.md"
if grep -q '<!-- startup-bench:begin -->' "$DOC"; then
    awk -v table="$TABLE" '
        /<!-- startup-bench:begin -->/ { print; while ((getline line < table) > 0) print line; skip = 1; next }
        /<!-- startup-bench:end -->/ { skip = 0 }
        !skip { print }' "$DOC" >"$WORK/doc.md"
    cp "$WORK/doc.md" "$DOC"
    echo "startup.sh: table written to docs/performance.md" >&2
else
    echo "startup.sh: docs/performance.md has no startup-bench markers; table printed only" >&2
fi
