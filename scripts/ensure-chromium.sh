#!/usr/bin/env bash
# Makes sure Debian's Chromium (for the end-to-end tests) and poppler-utils (pdftoppm, pdftotext, pdffonts:
# the PDF tests of vitest read and render certificates with them) are installed.
# Installs them when running as root with apt-get; otherwise says what to install and stops.
set -euo pipefail
chromium_path="${CHROMIUM_PATH:-/usr/bin/chromium}"
missing=()
[ -x "$chromium_path" ] || missing+=(chromium)
command -v pdftoppm >/dev/null 2>&1 || missing+=(poppler-utils)
[ ${#missing[@]} -eq 0 ] && exit 0
if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null 2>&1; then
  echo "Installing ${missing[*]} with apt-get…"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null
  exit 0
fi
echo "The end-to-end tests need: ${missing[*]}." >&2
echo "Install them with: sudo apt-get install -y ${missing[*]}  (or set CHROMIUM_PATH to a Chromium binary)" >&2
exit 1
