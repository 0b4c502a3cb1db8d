# scripts/deps.sh - sourced by scripts/test and scripts/demo: installs the
# Debian 12 packages tubeheat needs, only when one is missing (idempotent).
# shellcheck shell=bash

TH_PACKAGES=(
  cmake g++ make pkg-config zip unzip
  libboost-math-dev catch2 libbenchmark-dev
  clang libclang-rt-14-dev
  libreoffice-dev libreoffice-dev-common libreoffice-calc libreoffice-core
  python3 python3-fluids python3-iapws python3-scipy python3-numpy python3-mpmath python3-matplotlib
  poppler-utils util-linux
)

th_install_deps() {
  local missing=()
  for p in "${TH_PACKAGES[@]}"; do
    dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed" || missing+=("$p")
  done
  if [ ${#missing[@]} -eq 0 ]; then
    return 0
  fi
  echo "installing: ${missing[*]}"
  local sudo=""
  [ "$(id -u)" -ne 0 ] && sudo="sudo"
  $sudo apt-get update -qq
  DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y --no-install-recommends "${missing[@]}"
}
