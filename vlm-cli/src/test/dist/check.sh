#!/usr/bin/env bash
# Archive check of Spanlift's release archive (run by mvn verify, integration-test phase, after packaging):
# the zip and the tar.gz hold exactly the expected entries with the expected modes and line endings, the jar
# inside is the one built, and the unpacked Unix launcher runs the program with the Java on PATH (directly,
# from another folder and through a link), as does the bash completion script.
#
# Usage: check.sh ARCHIVE_BASE   (the archive's path without .zip or .tar.gz: vlm-cli/target/spanlift-VERSION)
# Needs bash, tar, a Java 17 runtime on PATH; unzip for the zip's modes (the check says when it is skipped).
set -euo pipefail

base="$1"
name="$(basename "$base")"
module="$(cd "$(dirname "$0")/../../.." && pwd)"
root="$(cd "$module/.." && pwd)"
out="$module/target/archive-check"
rm -rf "$out"
mkdir -p "$out"

failures=0
fail() { echo "FAIL $*"; failures=$((failures + 1)); }

for f in "$base.zip" "$base.tar.gz"; do
    [ -f "$f" ] || { echo "FAIL $f is missing"; exit 1; }
done

# What must be inside, under the folder NAME/: every command has its man page (the commands as --help lists them).
commands="$(java -jar "$module/target/spanlift.jar" --help | sed -n '/^Commands:/,/^$/p' | sed -n 's/^  \([a-z][a-z-]*\) .*/\1/p')"
[ -n "$commands" ] || fail "no commands found in spanlift --help"
{
    printf '%s\n' bin/spanlift bin/spanlift.bat bin/spanlift_completion lib/spanlift.jar \
        README.md LICENSE NOTICE THIRD-PARTY.md CHANGELOG.md man/spanlift.adoc
    for c in $commands; do echo "man/spanlift-$c.adoc"; done
    (cd "$root" && ls geometries/*.yaml)
} | sed "s|^|$name/|" | sort > "$out/expected.txt"

tar tzf "$base.tar.gz" | grep -v '/$' | sort > "$out/tar.txt"
jar tf "$base.zip" | grep -v '/$' | sort > "$out/zip.txt"
diff -u "$out/expected.txt" "$out/tar.txt" > "$out/tar.diff" || { fail "tar.gz entries (diff in $out/tar.diff)"; cat "$out/tar.diff"; }
diff -u "$out/expected.txt" "$out/zip.txt" > "$out/zip.diff" || { fail "zip entries (diff in $out/zip.diff)"; cat "$out/zip.diff"; }

# Modes: the Unix launcher executable, everything else not.
tar tzvf "$base.tar.gz" | grep -v '/$' | awk '{print $1, $NF}' > "$out/tar-modes.txt"
while read -r mode path; do
    case "$path" in
        */bin/spanlift) [ "$mode" = "-rwxr-xr-x" ] || fail "tar.gz: $path has mode $mode" ;;
        *) [ "$mode" = "-rw-r--r--" ] || fail "tar.gz: $path has mode $mode" ;;
    esac
done < "$out/tar-modes.txt"
if command -v zipinfo >/dev/null 2>&1; then
    zipinfo "$base.zip" | awk '/^-/ {print $1, $NF}' > "$out/zip-modes.txt"
    while read -r mode path; do
        case "$path" in
            */bin/spanlift) [ "$mode" = "-rwxr-xr-x" ] || fail "zip: $path has mode $mode" ;;
            *) [ "$mode" = "-rw-r--r--" ] || fail "zip: $path has mode $mode" ;;
        esac
    done < "$out/zip-modes.txt"
else
    echo "archive check: zipinfo not found, the zip's modes were not checked"
fi

# Unpack the tar.gz: the jar is the one built; line endings; notices present.
mkdir -p "$out/tar"
tar xzf "$base.tar.gz" -C "$out/tar"
home="$out/tar/$name"
cmp -s "$home/lib/spanlift.jar" "$module/target/spanlift.jar" || fail "lib/spanlift.jar is not target/spanlift.jar"
if grep -q $'\r' "$home/bin/spanlift"; then fail "bin/spanlift has carriage returns"; fi
lines="$(wc -l < "$home/bin/spanlift.bat")"
crlf="$(grep -c $'\r$' "$home/bin/spanlift.bat" || true)"
[ "$lines" -gt 0 ] && [ "$lines" = "$crlf" ] || fail "bin/spanlift.bat: $crlf of $lines lines end in CRLF"
for f in NOTICE THIRD-PARTY.md LICENSE README.md; do
    [ -s "$home/$f" ] || fail "$f is empty"
done
cmp -s "$home/README.md" "$root/README.md" || fail "README.md is not the repository's"
for page in "$home"/man/*.adoc; do
    head -n 5 "$page" | grep -q '^:doctype: manpage' || fail "$page is not an AsciiDoc man page"
done

# The launcher with the Java on PATH: --version, a solve, from another folder and through a link.
version="$(cd "$out" && "$home/bin/spanlift" --version)" || fail "bin/spanlift --version exited $?"
echo "$version" | head -n 1 | grep -q "^spanlift " || fail "--version printed: $version"
echo "$version" | sed -n 2p | grep -Eq '^commit ([0-9a-f]{12}(-dirty)?|unknown)$' || fail "--version printed: $version"
(cd "$home" && bin/spanlift solve geometries/trainer.wing.yaml --alpha 4 --format json > "$out/solve.json") \
    || fail "bin/spanlift solve exited $?"
grep -q '"CL"' "$out/solve.json" || fail "the solve printed no CL"
ln -s "$home/bin/spanlift" "$out/spanlift-link"
(cd / && "$out/spanlift-link" solve "$home/geometries/rectangular.wing.yaml" --alpha 2 > "$out/solve-link.txt") \
    || fail "a link to bin/spanlift exited $?"
set +e
"$home/bin/spanlift" solve "$out/no-such.wing.yaml" > /dev/null 2> "$out/missing.txt"
code=$?
set -e
[ "$code" = 2 ] || fail "a missing wing file gave exit code $code, not 2"

# The zip, unpacked by unzip, keeps the launcher executable.
if command -v unzip >/dev/null 2>&1; then
    mkdir -p "$out/zip"
    unzip -q "$base.zip" -d "$out/zip"
    [ -x "$out/zip/$name/bin/spanlift" ] || fail "the zip's bin/spanlift is not executable once unzipped"
    "$out/zip/$name/bin/spanlift" --version > /dev/null || fail "the zip's bin/spanlift --version exited $?"
else
    echo "archive check: unzip not found, the zip was not unpacked"
fi

# The completion script loads and completes the commands.
completed="$(bash -c 'source "$1"; COMP_WORDS=(spanlift so); COMP_CWORD=1; COMP_LINE="spanlift so"; COMP_POINT=11
    _complete_spanlift; printf "%s\n" "${COMPREPLY[@]}"' _ "$home/bin/spanlift_completion" 2> "$out/completion.err")" \
    || fail "the completion script failed: $(cat "$out/completion.err")"
[ "$completed" = "solve" ] || fail "completing 'spanlift so' gave: $completed"

if [ "$failures" -gt 0 ]; then
    echo "archive check: $failures failure(s)"
    exit 1
fi
echo "archive check: $(wc -l < "$out/expected.txt") entries in the zip and the tar.gz, launcher and completion ran"
