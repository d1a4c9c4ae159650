#!/usr/bin/env bash
# Installs the Debian packages brume needs. Idempotent: checks what is missing first, runs
# `apt-get update` only when something must be installed, never asks questions.
set -euo pipefail

packages=(
  build-essential cmake git pkg-config
  libopenmpi-dev openmpi-bin
  libhdf5-openmpi-dev hdf5-tools
  libeigen3-dev
  libfftw3-dev libfftw3-mpi-dev
  libyaml-cpp-dev
  libgtest-dev libgmock-dev libbenchmark-dev
  python3-numpy python3-scipy python3-h5py python3-matplotlib
)

missing=()
for p in "${packages[@]}"; do
  if ! dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q 'install ok installed'; then
    missing+=("$p")
  fi
done

if [ ${#missing[@]} -eq 0 ]; then
  echo "brume: all ${#packages[@]} required Debian packages are installed."
  exit 0
fi

echo "brume: missing Debian packages: ${missing[*]}"
sudo_cmd=()
if [ "$(id -u)" -ne 0 ]; then
  if command -v sudo >/dev/null 2>&1 && sudo -n true 2>/dev/null; then
    sudo_cmd=(sudo -n)
  else
    echo "brume: cannot install them: this script is not running as root and sudo is not available" >&2
    echo "       without a password. Run as root:  apt-get install ${missing[*]}" >&2
    exit 2
  fi
fi

export DEBIAN_FRONTEND=noninteractive
if ! "${sudo_cmd[@]}" apt-get install -y --no-install-recommends "${missing[@]}" 2>/dev/null; then
  echo "brume: refreshing the package lists (apt-get update)"
  "${sudo_cmd[@]}" apt-get update -q
  "${sudo_cmd[@]}" apt-get install -y -q --no-install-recommends "${missing[@]}"
fi
echo "brume: installed ${#missing[@]} package(s)."
