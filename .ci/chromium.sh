#!/usr/bin/env bash
# Debian's headless Chromium and its WebDriver for the office page's browser test, sourced by .ci/run
# (and usable by hand: `source .ci/chromium.sh`). Idempotent: installs the packages `chromium` and
# `chromium-driver` from Debian only when /usr/bin/chromium or /usr/bin/chromedriver is missing;
# no test tool downloads a browser or a driver.
ll_chromium_install() {
  if [ -x /usr/bin/chromium ] && [ -x /usr/bin/chromedriver ]; then
    return 0
  fi
  if [ "$(id -u)" -ne 0 ]; then
    echo "chromium.sh: Chromium is not installed and not root; install Debian's chromium and chromium-driver" >&2
    return 1
  fi
  echo "chromium.sh: installing Debian's chromium and chromium-driver" >&2
  DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium chromium-driver >/dev/null
}
ll_chromium_install
