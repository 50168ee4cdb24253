#!/usr/bin/env bash
# Builds the self-contained Latent Ledger app image (its own Java runtime, made with jlink) and, on
# Linux with dpkg-deb and fakeroot, a .deb — with the JDK's own jlink and jpackage.
#
#   src/packaging/package.sh [--image-only] [--no-cds] [TARGET_DIR]
#
# Run by `mvn -B -Ppackage package` after the jar and target/lib/ exist; can be run by hand on a
# built tree. Output in TARGET_DIR/package/: image/latent-ledger/ (the app image) and, unless
# --image-only, the .deb beside it. --no-cds skips the class-data-sharing training (faster build,
# slower start).
#
# Why a class path and not modules: PDFBox and other libraries are automatic modules, which jlink
# refuses, and JavaFX's jmods are not published on Maven Central. So jlink makes a runtime of the
# JDK modules alone; the app's jars and JavaFX's platform jars sit on the class path in the image,
# with JavaFX's and SQLite's native libraries unpacked beside them (nothing is extracted to the
# home folder or /tmp at run time).
set -euo pipefail

IMAGE_ONLY=false
CDS=true
TARGET=""
for a in "$@"; do
    case "$a" in
        --image-only) IMAGE_ONLY=true ;;
        --no-cds) CDS=false ;;
        -*) echo "package.sh: unknown option $a" >&2; exit 2 ;;
        *) TARGET="$a" ;;
    esac
done
HERE="$(cd "$(dirname "$0")" && pwd)"
ROOT="$(cd "$HERE/../.." && pwd)"
TARGET="$(cd "${TARGET:-$ROOT/target}" && pwd)"

JAVA_BIN="${JAVA_HOME:+$JAVA_HOME/bin/}"
JLINK="${JAVA_BIN}jlink"
JAR="${JAVA_BIN}jar"   # the JDK's own jar tool unpacks entries, so the build needs no unzip
JPACKAGE="${JAVA_BIN}jpackage"
if ! command -v "$JPACKAGE" >/dev/null 2>&1; then
    echo "package.sh: jpackage not found (needs a full JDK 17+, not a JRE); no app image built" >&2
    exit 3
fi
[ -f "$TARGET/latent-ledger.jar" ] || { echo "package.sh: $TARGET/latent-ledger.jar missing: run mvn package first" >&2; exit 2; }

NAME=latent-ledger
MAIN_CLASS=app.latentledger.Main
# jpackage wants a plain numeric version
MF_DIR="$(mktemp -d)"
(cd "$MF_DIR" && "$JAR" xf "$TARGET/latent-ledger.jar" META-INF/MANIFEST.MF)
VERSION="$(sed -n 's/^Implementation-Version: *\([0-9.]*\).*/\1/p' "$MF_DIR/META-INF/MANIFEST.MF" | tr -d '\r')"
rm -rf "$MF_DIR"
VERSION="${VERSION:-0.1.0}"
# What the jars need, from `jdeps --print-module-deps` over the app and its libraries:
# java.desktop (JavaFX, PDFBox images and fonts), java.sql (SQLite, Gson), java.management (start
# timing), jdk.unsupported (JavaFX, SQLite), jdk.unsupported.desktop (javafx-swing), jdk.jfr
# (JavaFX's optional flight-recorder events), jdk.zipfs (zip file systems for bundles), java.net.http
# (the tablet's office sync client), jdk.crypto.ec (TLS to an https office server: ECDHE and EC
# certificates live outside java.base on Java 17), java.naming (the PostgreSQL driver and the
# connection pool of `serve`).
MODULES=java.base,java.desktop,java.logging,java.management,java.naming,java.net.http,java.sql,java.xml,jdk.crypto.ec,jdk.unsupported,jdk.unsupported.desktop,jdk.jfr,jdk.zipfs

OUT="$TARGET/package"
rm -rf "$OUT"
mkdir -p "$OUT/input/native" "$OUT/image"

echo "== app jars"
cp "$TARGET/latent-ledger.jar" "$OUT/input/"
for j in "$TARGET"/lib/*.jar; do
    base="$(basename "$j")"
    # JavaFX's jars without a platform classifier hold only a manifest; the -linux/-win/-mac ones carry the code
    case "$base" in javafx-*-[0-9]*.[0-9]*.[0-9]*.jar) [[ "$base" =~ -(linux|win|mac)(-aarch64)?\.jar$ ]] || continue ;; esac
    cp "$j" "$OUT/input/"
done
echo "== native libraries unpacked beside the jars"
# JavaFX loads its libraries from the folder of its jar before it tries to extract them
for j in "$OUT"/input/javafx-*.jar; do
    libs="$("$JAR" tf "$j" | grep -E '\.(so|dll|dylib)$' || true)"
    if [ -n "$libs" ]; then
        # shellcheck disable=SC2086 # one word per entry
        (cd "$OUT/input" && "$JAR" xf "$j" $libs)
    fi
done
# SQLite's JDBC driver takes its library from org.sqlite.lib.path instead of extracting it to /tmp each run
case "$(uname -s)-$(uname -m)" in
    Linux-x86_64) SQLITE_NATIVE=org/sqlite/native/Linux/x86_64/libsqlitejdbc.so ;;
    Linux-aarch64) SQLITE_NATIVE=org/sqlite/native/Linux/aarch64/libsqlitejdbc.so ;;
    Darwin-arm64) SQLITE_NATIVE=org/sqlite/native/Mac/aarch64/libsqlitejdbc.dylib ;;
    Darwin-x86_64) SQLITE_NATIVE=org/sqlite/native/Mac/x86_64/libsqlitejdbc.dylib ;;
    *) SQLITE_NATIVE="" ;;
esac
if [ -n "$SQLITE_NATIVE" ]; then
    (cd "$OUT/input/native" && "$JAR" xf "$(ls "$OUT"/input/sqlite-jdbc-*.jar)" "$SQLITE_NATIVE" \
        && mv "$SQLITE_NATIVE" . && rm -rf org)
fi

echo "== runtime (jlink: $MODULES)"
"$JLINK" --add-modules "$MODULES" --strip-debug --no-header-files --no-man-pages \
    --output "$OUT/runtime"
# JDK 17's jlink does not write the default class-data archive; without it even `java -version`
# from the image starts slower than from the JDK
"$OUT/runtime/bin/java" -Xshare:dump -XX:-UsePerfData >/dev/null

echo "== app image (jpackage)"
"$JPACKAGE" --type app-image --name "$NAME" --app-version "$VERSION" \
    --vendor "Latent Ledger" --description "Air-conditioning moisture and dehumidification diagnostics" \
    --input "$OUT/input" --main-jar latent-ledger.jar --main-class "$MAIN_CLASS" \
    --runtime-image "$OUT/runtime" --icon "$HERE/icons/latent-ledger.png" \
    --dest "$OUT/image"
IMG="$OUT/image/$NAME"
LAUNCHER="$IMG/bin/$NAME"
CFG="$IMG/lib/app/$NAME.cfg"

# The launcher: a shell script in place of jpackage's native one. On Linux the native launcher
# asks rpm and dpkg which package owns it on every start (two package-database searches, a few
# hundred ms, longer than a whole command); the script starts the image's own java at once.
# Class path in the order jpackage wrote it: the archive below is only used with this exact one.
CP="$(sed -n 's|^app.classpath=\$APPDIR/||p' "$CFG" | sed 's|^|$APPDIR/|' | paste -sd: -)"
# -XX:-UsePerfData: no hsperfdata file per run (saves a file per start; jstat cannot attach).
# SerialGC: one collector starts faster on a 2-core tablet and is enough for a week-long log.
# ArchiveRelocationMode=0: map the class-data archive where it was dumped instead of at a random
# address (this JDK's default), which would patch every pointer of the archive at each start.
JOPTS='-XX:-UsePerfData -XX:+UseSerialGC'
if [ -n "$SQLITE_NATIVE" ]; then
    JOPTS="$JOPTS -Dorg.sqlite.lib.path=\$APPDIR/native -Dorg.sqlite.lib.name=$(basename "$SQLITE_NATIVE")"
fi
if $CDS; then
    # no -Xshare:auto: it is the default, and a -Xshare:dump given in JAVA_TOOL_OPTIONS (below, and
    # in the .deb's postinst) must not be overridden by the launcher's own options
    JOPTS="$JOPTS -XX:SharedArchiveFile=\$APPDIR/$NAME.jsa -Xlog:cds=off,cds+dynamic=off -XX:+UnlockDiagnosticVMOptions -XX:ArchiveRelocationMode=0"
fi
write_launcher() {
    # $1: java options. Shell built-ins only (readlink by its full path), so it runs with an empty PATH
    local quoted=""
    for o in $1; do quoted="$quoted \"$o\""; done
    cat >"$LAUNCHER" <<SCRIPT
#!/bin/sh
# Latent Ledger: with a command word it runs the command line, with none it opens the app.
# Runs the Java runtime inside this image; needs neither PATH nor JAVA_HOME.
SELF="\$0"
# follow links such as /usr/bin/latent-ledger -> /opt/latent-ledger/bin/latent-ledger
while [ -L "\$SELF" ]; do
    LINK="\$(/usr/bin/readlink "\$SELF" 2>/dev/null || /bin/readlink "\$SELF")" || break
    case "\$LINK" in
        /*) SELF="\$LINK" ;;
        *) SELF="\${SELF%/*}/\$LINK" ;;
    esac
done
case "\$SELF" in
    */*) BINDIR="\${SELF%/*}" ;;
    *) BINDIR=. ;;
esac
ROOTDIR="\$(cd -P -- "\$BINDIR/.." && pwd -P)"
APPDIR="\$ROOTDIR/lib/app"
# Short commands end before the optimising compiler pays off (on two cores its compile threads
# only compete with the command): they run on the quick compiler alone. The app, screens and log
# (a week of samples) keep both.
JIT=
SKIP=
for W in "\$@"; do
    if [ -n "\$SKIP" ]; then SKIP=; continue; fi
    case "\$W" in
        --data-dir) SKIP=1 ;;
        --data-dir=*) ;;
        log|screens) break ;;
        *) JIT=-XX:TieredStopAtLevel=1; break ;;
    esac
done
exec "\$ROOTDIR/lib/runtime/bin/java"$quoted \$JIT -cp "$CP" $MAIN_CLASS "\$@"
SCRIPT
    chmod 755 "$LAUNCHER"
}
rm -f "$IMG/lib/libapplauncher.so"
write_launcher "$JOPTS"

if $CDS; then
    echo "== class-data sharing: training runs"
    # (the archive named in the launcher does not exist yet: the training runs start without one)
    "$HERE/train-cds.sh" "$IMG" "$ROOT" "$OUT/cds"
    # The list ships in the image: JDK 17 accepts an archive only at the class path it was dumped
    # with, so the .deb dumps its own at install time (postinst) from the same list.
    cp "$OUT/cds/classes.lst" "$IMG/lib/app/$NAME.classlist"
    # dumped through the launcher itself, so the archive's class path is exactly the launcher's
    JAVA_TOOL_OPTIONS="-Xshare:dump -XX:SharedClassListFile=$IMG/lib/app/$NAME.classlist" \
        "$LAUNCHER" >"$OUT/cds/dump.log" 2>&1 || { tail -20 "$OUT/cds/dump.log" >&2; exit 1; }
    [ -f "$IMG/lib/app/$NAME.jsa" ] || { echo "package.sh: no class-data archive written" >&2; tail -20 "$OUT/cds/dump.log" >&2; exit 1; }
fi

# desktop entry for the .deb (copied to /usr/share/applications by its postinst); the icon is
# the one jpackage put in lib/
cat >"$IMG/lib/$NAME.desktop" <<DESKTOP
[Desktop Entry]
Type=Application
Name=Latent Ledger
GenericName=Moisture diagnostics
Comment=Is this air conditioner taking moisture out of the air? Readings, coil checks, logs, reports
Exec=/opt/$NAME/bin/$NAME
Icon=/opt/$NAME/lib/$NAME.png
Terminal=false
Categories=Utility;Science;
Keywords=HVAC;psychrometrics;dehumidification;coil;humidity;
DESKTOP
echo "app image: $IMG"

if ! $IMAGE_ONLY && [ "$(uname -s)" = Linux ]; then
    if command -v dpkg-deb >/dev/null && command -v fakeroot >/dev/null; then
        echo "== .deb (jpackage)"
        # without this machine's archive: it only fits the image's build path; postinst makes one
        DEBIMG="$OUT/deb-image/$NAME"
        mkdir -p "$OUT/deb-image"
        cp -a "$IMG" "$DEBIMG"
        rm -f "$DEBIMG/lib/app/$NAME.jsa"
        "$JPACKAGE" --type deb --app-image "$DEBIMG" --name "$NAME" --app-version "$VERSION" \
            --vendor "Latent Ledger" --description "Air-conditioning moisture and dehumidification diagnostics" \
            --icon "$HERE/icons/latent-ledger.png" --resource-dir "$HERE/linux" \
            --linux-package-name "$NAME" --linux-app-category utils --linux-deb-maintainer "packaging@latentledger.invalid" \
            --dest "$OUT"
        ls "$OUT"/*.deb
    else
        echo "package.sh: no .deb: jpackage needs dpkg-deb and fakeroot (apt-get install -y fakeroot dpkg-dev)" >&2
    fi
fi
