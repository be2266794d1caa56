#!/usr/bin/env bash
# Installs what the browser and PDF tests need from Debian's archive, if missing (needs root).
set -euo pipefail
need=()
[ -x /usr/bin/chromium ] || need+=(chromium)
command -v pdftotext >/dev/null 2>&1 || need+=(poppler-utils)
[ -e /usr/share/fonts/truetype/dejavu/DejaVuSans.ttf ] || need+=(fonts-dejavu-core)
if [ ${#need[@]} -gt 0 ]; then
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq
  apt-get install -y -qq "${need[@]}" >/dev/null
fi
