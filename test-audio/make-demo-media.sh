#!/usr/bin/env bash
# Makes the demo history's media, committed under test-audio/demo/ and stored by the seed (never made at
# run time): short Opus voice notes and practice narrations spoken by espeak-ng, encoded by opusenc
# (Debian's opus-tools), and a small PNG photo drawn by make-demo-photo.mjs. The words are in demo-media.json.
#   test-audio/make-demo-media.sh
set -euo pipefail

here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
out="$here/demo"
mkdir -p "$out"

for tool in espeak-ng sox opusenc node; do
  command -v "$tool" >/dev/null || { echo "Needs $tool (apt-get install espeak-ng sox opus-tools)." >&2; exit 1; }
done

# Our own practice: 150 words a minute is near a driver's calm speech; 24 kbit/s mono Opus is a phone note.
words_per_minute=150
bitrate=24

speak() {
  local name="$1" voice="$2" text="$3" tmp
  tmp="$(mktemp --suffix=.wav)"
  espeak-ng -v "$voice" -s "$words_per_minute" -w "$tmp" "$text"
  # 48 kHz mono with a quarter second of silence each side, as a phone's recorder would keep it.
  sox "$tmp" -r 48000 -c 1 "$tmp.pad.wav" pad 0.25 0.25
  opusenc --quiet --bitrate "$bitrate" --comment "title=$name" "$tmp.pad.wav" "$out/$name.ogg"
  rm -f "$tmp" "$tmp.pad.wav"
}

# Every recording's words are in demo-media.json, which the seed reads too (the words "heard").
while IFS=$'\t' read -r file text; do
  speak "${file%.ogg}" en-us "$text"
done < <(node -e 'for (const m of require(process.argv[1])) console.log(`${m.file}\t${m.text}`)' "$here/demo-media.json")

node "$here/make-demo-photo.mjs" "$out/photo-marker-lens.png"

for file in "$out"/*.ogg; do
  printf '%s %s\n' "$(basename "$file")" "$(opusinfo "$file" | sed -n 's/.*Playback length: \(.*\)/\1/p')"
done
ls -l "$out"
