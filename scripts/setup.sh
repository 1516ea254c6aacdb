#!/usr/bin/env bash
# One-time setup on a Debian/Ubuntu machine with Node 20: the Debian packages the tests
# and the report need (Jupyter for the notebooks, Chromium for browser tests and the PNG
# chart), the npm dependencies, the compiled package and the TypeScript Jupyter kernel.
# Safe to run again: it installs only what is missing.
set -euo pipefail
cd "$(dirname "$0")/.."

export DEBIAN_FRONTEND=noninteractive
packages=(jupyter-nbconvert python3-nbclient python3-ipykernel chromium)
missing=()
for p in "${packages[@]}"; do
  dpkg -s "$p" >/dev/null 2>&1 || missing+=("$p")
done
if [ "${#missing[@]}" -gt 0 ]; then
  sudo_cmd=""
  [ "$(id -u)" -ne 0 ] && sudo_cmd="sudo"
  echo "setup: installing Debian packages: ${missing[*]}"
  $sudo_cmd apt-get update -qq
  $sudo_cmd apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
fi

echo "setup: npm ci"
npm ci --no-audit --no-fund --loglevel=error
echo "setup: build"
npm run -s build
if [ -f scripts/install-kernel.mjs ]; then
  echo "setup: register the TypeScript kernel (project-local)"
  node scripts/install-kernel.mjs
fi
echo "setup: done"
