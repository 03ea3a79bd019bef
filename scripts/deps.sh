#!/usr/bin/env bash
# Installs what is missing on a fresh machine: npm packages (npm ci when the lock changed),
# Debian's postgresql server, and (for tests) Debian's chromium and poppler-utils. Safe to run every time.
set -euo pipefail
ROOT=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)

deps_npm() {
  local want have=""
  want=$(sha256sum "$ROOT/package-lock.json" | cut -c1-16)
  [ -f "$ROOT/node_modules/.lock-hash" ] && have=$(cat "$ROOT/node_modules/.lock-hash")
  if [ "$want" != "$have" ]; then
    echo "[equilibrist] npm ci…"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
    echo "$want" > "$ROOT/node_modules/.lock-hash"
  fi
}

# pdftotext (Debian's poppler-utils): the review browser test reads the printed report's PDF.
deps_pdftotext() {
  if ! command -v pdftotext >/dev/null; then
    echo "[equilibrist] installing Debian's poppler-utils (pdftotext)…"
    apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq poppler-utils >/dev/null
  fi
}

deps_chromium() {
  if [ ! -x /usr/bin/chromium ]; then
    echo "[equilibrist] installing Debian's chromium…"
    apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
  fi
}
