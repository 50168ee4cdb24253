#!/usr/bin/env bash
# Training runs for the class-data-sharing archive: runs every command once through the app
# image's own launcher, each writing the classes it loaded, and the app up to its first frame
# under Xvfb when xvfb-run is installed. Writes OUT/classes.lst, the union of all the lists.
#
#   src/packaging/train-cds.sh IMAGE_DIR REPO_ROOT OUT_DIR
set -euo pipefail
IMG="$1"
ROOT="$2"
OUT="$3"
L="$IMG/bin/latent-ledger"
mkdir -p "$OUT"
DATA="$(mktemp -d)"
WORK="$(mktemp -d)"
trap 'rm -rf "$DATA" "$WORK"' EXIT
n=0

run() {
    n=$((n + 1))
    # the training runs must not touch the builder's own data folder or home
    env -u JAVA_HOME HOME="$WORK" JAVA_TOOL_OPTIONS="-XX:DumpLoadedClassList=$OUT/run-$n.lst" \
        "$L" --data-dir "$DATA" "$@" >"$OUT/run-$n.out" 2>&1 || {
        echo "train-cds.sh: training run failed: latent-ledger $*" >&2
        cat "$OUT/run-$n.out" >&2
        exit 1
    }
}

SAMPLE="$ROOT/field-data-samples/oversized-short-cycling.csv"
run --help
run state --dry-bulb 80 --wet-bulb 67
run state --dry-bulb 80 --wet-bulb 67 --json
run visits list                       # seeds the Saltreed demo ledger in the data folder
run visits list --json
run visits show dfa8
run coil --return-db 78 --return-rh 55 --supply-db 57 --supply-rh 92 --airflow 1100 --nominal-tons 3 --coil-temp 47
run coil --return-db 76 --return-rh 58 --supply-db 59 --supply-rh 90 --airflow 1200 --nominal-tons 3 --coil-temp 59 --json
run log "$SAMPLE" --airflow 1400
run log "$SAMPLE" --airflow 1400 --json
run report dfa8 --compare 894a --out "$WORK/report.pdf"
run data dfa8 --format json --out "$WORK/data.json"
run data dfa8 --format csv --out "$WORK/data.csv"
run settings show
run visits export dfa8 "$WORK/visit.zip"

if command -v xvfb-run >/dev/null 2>&1; then
    # the app up to its first frame (software rendering under Xvfb), then closed
    n=$((n + 1))
    env -u JAVA_HOME HOME="$WORK" JAVA_TOOL_OPTIONS="-XX:DumpLoadedClassList=$OUT/run-$n.lst -Dprism.order=sw -Dlatentledger.timing=true" \
        xvfb-run -a -s "-screen 0 1280x800x24" "$L" --data-dir "$DATA" >"$OUT/run-$n.out" 2>&1 &
    app=$!
    for _ in $(seq 1 120); do
        grep -q "first frame" "$OUT/run-$n.out" 2>/dev/null && break
        sleep 0.25
    done
    sleep 1   # the other screens are built in the pulses after the first frame
    if grep -q "first frame" "$OUT/run-$n.out"; then
        echo "train-cds.sh: app trained up to its first frame and beyond"
    else
        echo "train-cds.sh: the app did not reach its first frame under Xvfb; its classes are left out" >&2
        cat "$OUT/run-$n.out" >&2
    fi
    # stop the app (a normal JVM exit, so the class list is complete), then xvfb-run
    for c in $(pgrep -P "$app"); do
        if tr '\0' ' ' <"/proc/$c/cmdline" 2>/dev/null | grep -q "latent-ledger"; then kill -TERM "$c" 2>/dev/null || true; fi
    done
    wait "$app" 2>/dev/null || true
else
    echo "train-cds.sh: xvfb-run not installed: the app's first frame is not in the archive (commands are)" >&2
fi

# one list: the classes of every run, once each, in first-seen order
cat "$OUT"/run-*.lst | awk '!seen[$0]++' >"$OUT/classes.lst"
echo "train-cds.sh: $(wc -l <"$OUT/classes.lst") classes from $n runs"
