#!/usr/bin/env bash
# Regenerates the spoken WAV fixtures from phrases.json with espeak-ng and sox, then checks them:
# 16-bit mono 44.1 kHz PCM (what Chromium's fake microphone captures at), about 0.5 s of silence
# before and after, and audible speech in between.
#   test-audio/make-fixtures.sh            make every fixture and check it
#   test-audio/make-fixtures.sh --check    only check the committed files
#   test-audio/make-fixtures.sh --meanings also run each phrase through the interpreter CLI
set -euo pipefail

here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
root="$(cd "$here/.." && pwd)"
out="$here/fixtures"
phrases="$here/phrases.json"

rate=44100
pad_seconds=0.5
# Our own practice: espeak-ng at 150 words a minute is near a driver's calm answer.
words_per_minute=150
# Our own practice: a file whose loudest sample stays under this (full scale 1.0) holds no speech.
min_peak=0.1

mode="make"
check_meanings=false
for arg in "$@"; do
  case "$arg" in
    --check) mode="check" ;;
    --meanings) check_meanings=true ;;
    *) echo "Unknown option: $arg" >&2; exit 2 ;;
  esac
done

need_tools() {
  local missing=()
  command -v sox >/dev/null || missing+=(sox)
  if [[ "$mode" == "make" ]]; then command -v espeak-ng >/dev/null || missing+=(espeak-ng); fi
  [[ ${#missing[@]} -eq 0 ]] && return 0
  if [[ "$(id -u)" -eq 0 ]] && command -v apt-get >/dev/null; then
    echo "Installing ${missing[*]} with apt-get..."
    apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null
  else
    echo "Missing: ${missing[*]}. Install them, e.g.: sudo apt-get install ${missing[*]}" >&2
    exit 1
  fi
}

# One line per fixture: id<TAB>voice<TAB>text (phrases, then notes).
list_fixtures() {
  node -e '
    const data = JSON.parse(require("node:fs").readFileSync(process.argv[1], "utf8"));
    for (const entry of [...data.phrases, ...data.notes]) {
      const voice = data.voices[entry.locale];
      if (!voice) throw new Error(`No voice for locale ${entry.locale}`);
      console.log([entry.id, voice, entry.text].join("\t"));
    }' "$phrases"
}

make_one() {
  local id="$1" voice="$2" text="$3" tmp
  tmp="$(mktemp --suffix=.wav)"
  espeak-ng -v "$voice" -s "$words_per_minute" -w "$tmp" -- "$text"
  # Trim espeak's own lead-in and tail, then pad to a known 0.5 s each side.
  sox "$tmp" -r "$rate" -c 1 -b 16 -e signed-integer "$out/$id.wav" \
    silence 1 0.01 0.5% reverse silence 1 0.01 0.5% reverse pad "$pad_seconds" "$pad_seconds"
  rm -f "$tmp"
}

check_one() {
  local id="$1" file="$out/$1.wav" info peak duration lead
  [[ -f "$file" ]] || { echo "FAIL $id: missing $file"; return 1; }
  info="$(soxi -t "$file") $(soxi -r "$file") $(soxi -c "$file") $(soxi -b "$file") $(soxi -e "$file")"
  if [[ "$info" != "wav $rate 1 16 Signed Integer PCM" ]]; then
    echo "FAIL $id: format is '$info'"
    return 1
  fi
  peak="$(sox "$file" -n stat 2>&1 | awk '/Maximum amplitude/ { print $3 }')"
  duration="$(soxi -D "$file")"
  # The first half second must be silent: the padding is there.
  lead="$(sox "$file" -n trim 0 0.45 stat 2>&1 | awk '/Maximum amplitude/ { print $3 }')"
  if ! awk -v p="$peak" -v m="$min_peak" -v l="$lead" 'BEGIN { exit !(p >= m && l < 0.01) }'; then
    echo "FAIL $id: peak $peak, lead-in peak $lead"
    return 1
  fi
  printf 'ok   %-32s %6.2f s %8d bytes  peak %s\n' "$id" "$duration" "$(stat -c %s "$file")" "$peak"
}

need_tools
mkdir -p "$out"
failed=0
total=0
while IFS=$'\t' read -r id voice text; do
  [[ "$mode" == "make" ]] && make_one "$id" "$voice" "$text"
  check_one "$id" || failed=$((failed + 1))
  total=$((total + 1))
done < <(list_fixtures)

if [[ "$check_meanings" == true ]]; then
  # The expected meaning of each phrase must be what the interpreter makes of its text.
  node -e '
    const data = JSON.parse(require("node:fs").readFileSync(process.argv[1], "utf8"));
    for (const p of data.phrases) console.log(JSON.stringify({ text: p.text, expect: p.expect, locale: p.locale }));
  ' "$phrases" | (cd "$root" && npm run --silent interpret --workspace shared) | node -e '
    const data = JSON.parse(require("node:fs").readFileSync(process.argv[1], "utf8"));
    const lines = require("node:fs").readFileSync(0, "utf8").trim().split("\n");
    let bad = 0;
    data.phrases.forEach((p, i) => {
      const got = lines[i] ?? "";
      if (got !== JSON.stringify(p.meaning)) { bad++; console.log(`FAIL meaning ${p.id}: got ${got}`); }
    });
    console.log(`meanings: ${data.phrases.length - bad} of ${data.phrases.length} as expected`);
    process.exit(bad ? 1 : 0);
  ' "$phrases" || failed=$((failed + 1))
fi

echo "$((total - failed)) of $total fixtures ok, $(du -cb "$out"/*.wav | tail -1 | cut -f1) bytes in all"
[[ "$failed" -eq 0 ]]
