# shellcheck shell=bash
# Sourced by scripts/start.sh and scripts/test.sh (never run on its own).
# Installs what a fresh Debian machine of our kind lacks, and nothing else:
#   - Debian packages: postgresql (server binaries), chromium (e2e tests), poppler-utils (PDF checks)
#   - node_modules via `npm ci` when it is missing or older than package-lock.json
# `apt-get update` runs once, and only when a package is missing.

eigenroom_ensure_system() {
  local root
  root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"

  local missing=()
  if ! compgen -G "/usr/lib/postgresql/*/bin/initdb" >/dev/null; then missing+=(postgresql); fi
  if [ ! -x /usr/bin/chromium ]; then missing+=(chromium); fi
  if ! command -v pdftoppm >/dev/null 2>&1; then missing+=(poppler-utils); fi

  if [ "${#missing[@]}" -gt 0 ]; then
    local sudo_cmd=()
    if [ "$(id -u)" -ne 0 ]; then
      if command -v sudo >/dev/null 2>&1; then
        sudo_cmd=(sudo)
      else
        echo "eigenroom: missing Debian packages: ${missing[*]}" >&2
        echo "eigenroom: installing them needs root. Run as root, install sudo, or run:" >&2
        echo "           apt-get update && apt-get install -y ${missing[*]}" >&2
        return 1
      fi
    fi
    echo "eigenroom: installing Debian packages: ${missing[*]}"
    echo "eigenroom: apt-get update"
    "${sudo_cmd[@]}" env DEBIAN_FRONTEND=noninteractive apt-get update -qq || {
      echo "eigenroom: apt-get update failed" >&2
      return 1
    }
    echo "eigenroom: apt-get install -y ${missing[*]}"
    "${sudo_cmd[@]}" env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${missing[@]}" || {
      echo "eigenroom: apt-get install ${missing[*]} failed" >&2
      return 1
    }
  else
    echo "eigenroom: Debian packages present (postgresql, chromium, poppler-utils)"
  fi

  if [ ! -d "$root/node_modules" ] || [ ! -f "$root/node_modules/.package-lock.json" ] \
    || [ "$root/package-lock.json" -nt "$root/node_modules/.package-lock.json" ]; then
    echo "eigenroom: npm ci (node_modules missing or older than package-lock.json)"
    (cd "$root" && npm ci --no-audit --no-fund) || {
      echo "eigenroom: npm ci failed" >&2
      return 1
    }
  else
    echo "eigenroom: node_modules up to date"
  fi
}

eigenroom_ensure_system
