#!/usr/bin/env bash
# The report's browser tests drive Debian's chromium (tests/report/*.browser.test.ts).
# Installs it with apt-get when it is missing and we may; its long output goes to a
# log that is shown only on failure. Used by `npm test` (pretest) and by .ci/run.
set -euo pipefail
[ -x /usr/bin/chromium ] && exit 0
if [ "$(id -u)" != 0 ] || ! command -v apt-get >/dev/null 2>&1; then
  echo "The browser tests need Debian's chromium at /usr/bin/chromium: run 'apt-get install chromium' as root." >&2
  exit 1
fi
echo "Installing chromium for the browser tests (apt-get)..." >&2
apt_log=$(mktemp)
if ! { apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium; } >"$apt_log" 2>&1; then
  cat "$apt_log" >&2
  echo "could not install chromium for the browser tests" >&2
  exit 1
fi
rm -f "$apt_log"
