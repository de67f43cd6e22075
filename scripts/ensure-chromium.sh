#!/usr/bin/env bash
# Makes sure the system Chromium used by the end-to-end tests is installed.
# Idempotent and silent when it is already there; installs it with apt-get otherwise.
set -euo pipefail

CHROMIUM=/usr/bin/chromium

if [ -x "$CHROMIUM" ]; then
  exit 0
fi

if [ "$(id -u)" -ne 0 ]; then
  echo "ensure-chromium: $CHROMIUM is missing and installing it needs root." >&2
  echo "ensure-chromium: run as root, or: sudo apt-get update && sudo apt-get install -y chromium" >&2
  exit 1
fi

echo "ensure-chromium: installing chromium with apt-get (first run only)..."
export DEBIAN_FRONTEND=noninteractive
apt-get update -qq
apt-get install -y -qq chromium >/dev/null

if [ ! -x "$CHROMIUM" ]; then
  echo "ensure-chromium: apt-get finished but $CHROMIUM is still missing." >&2
  exit 1
fi
echo "ensure-chromium: installed $("$CHROMIUM" --version 2>/dev/null || echo chromium)."
