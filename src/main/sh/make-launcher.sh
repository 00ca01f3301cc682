#!/bin/sh
# Run by the build after the jar is packaged: puts the launcher beside target/riffle.jar and
# writes the class-data archive (target/riffle.jsa) from a small import and an info, the classes
# a command needs most. Without the archive the launcher still works.
set -eu
target=$1
cp src/main/sh/riffle "$target/riffle"
chmod +x "$target/riffle"
work="$target/cds-run"
rm -rf "$work" "$target/riffle.jsa"
mkdir -p "$work"
printf 'id,What made you choose us?\n1,the grinder was quiet and the delivery quick\n' > "$work/w.csv"
java -XX:ArchiveClassesAtExit="$target/riffle.jsa" -Xlog:cds=off -Xlog:cds+dynamic=off \
  -jar "$target/riffle.jar" import --project "$work/p.riffle" --file "$work/w.csv" > /dev/null 2>&1 \
  || { rm -f "$target/riffle.jsa"; echo "make-launcher: no class-data archive (the launcher works without)"; }
rm -rf "$work"
