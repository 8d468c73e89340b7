#!/bin/sh
# Installs, upgrades or removes the Coilwright extension in this machine's LibreOffice.
#
#   tools/install_extension.sh [FILE.oxt]             install or upgrade, for you alone
#   sudo tools/install_extension.sh --shared [FILE]   install or upgrade, for every user
#   tools/install_extension.sh --remove [--shared]    remove your copy (or, as root, the shared one)
#
# FILE defaults to build/coilwright.oxt. LibreOffice must be closed while unopkg works.
#
# A copy for every user ("shared") and a copy of one's own can exist side by side; LibreOffice
# then uses one's own. LibreOffice 7.4 fails to switch between them after one's own copy was
# removed and added again: the new copy stays inactive ("Insert duplicate implementation name")
# and Calc keeps using the shared one, perhaps older, without a word. So this script installs
# no copy of one's own beside a shared copy, says which copies exist and what to do, and checks
# after every install that the copy it installed is the one LibreOffice activated.
#
# UNOPKG_ENV: extra -env: options for every unopkg call. The tests install into temporary
# profiles with it (-env:UserInstallation=..., -env:UNO_SHARED_PACKAGES_CACHE=...); the check
# for a running LibreOffice is then skipped, since no LibreOffice uses those profiles.
set -eu

ID=org.coilwright.calc
shared=0
action=install
oxt=build/coilwright.oxt
for arg in "$@"; do
  case "$arg" in
    --shared) shared=1 ;;
    --remove) action=remove ;;
    -h|--help) sed -n '2,9p' "$0" | sed 's/^# \{0,1\}//'; exit 0 ;;
    -*) echo "unknown option: $arg (see --help)" >&2; exit 2 ;;
    *) oxt="$arg" ;;
  esac
done
env_opts="${UNOPKG_ENV:-}"

say() { echo "$*" >&2; }

# "VERSION REGISTERED" of the copy in one scope ("--shared" or ""), or nothing when there is none.
copy_in() {
  # shellcheck disable=SC2086  # env_opts holds several options
  unopkg list $1 $env_opts "$ID" 2>/dev/null | awk '
    /^  Version:/ && !v { v = $2 }
    /^  is registered:/ && !r { r = $NF }
    END { if (v != "") print v, r }' || true
}

# The copy of the user who called sudo, read as that user (root cannot list other users' copies).
copy_of_sudo_user() {
  [ -n "${SUDO_USER:-}" ] && [ "$SUDO_USER" != root ] || return 0
  # shellcheck disable=SC2086
  runuser -u "$SUDO_USER" -- env HOME="$(getent passwd "$SUDO_USER" | cut -d: -f6)" \
    unopkg list $env_opts "$ID" 2>/dev/null | awk '/^  Version:/ && !v { v = $2 } END { if (v != "") print v }' || true
}

if [ -z "$env_opts" ]; then
  if [ "$shared" -eq 1 ]; then running=$(pgrep -x soffice.bin || true); else running=$(pgrep -u "$(id -u)" -x soffice.bin || true); fi
  if [ -n "$running" ]; then
    say "LibreOffice is running: close it (every window, and the quick starter), then run this again."
    exit 1
  fi
fi

if [ "$shared" -eq 0 ] && [ "$(id -u)" -eq 0 ]; then
  say "As root, unopkg installs only for every user. Run this as the user who uses LibreOffice,"
  say "or pass --shared to install for every user."
  exit 2
fi

scope_opt=""
[ "$shared" -eq 1 ] && scope_opt="--shared"
shared_copy=$(copy_in --shared)

if [ "$action" = remove ]; then
  mine=$(copy_in "$scope_opt")
  if [ -z "$mine" ]; then
    say "No Coilwright copy $( [ "$shared" -eq 1 ] && echo "for every user" || echo "of your own" ) is installed."
  else
    # shellcheck disable=SC2086
    unopkg remove $scope_opt $env_opts "$ID"
    echo "removed Coilwright ${mine%% *} $( [ "$shared" -eq 1 ] && echo "for every user" || echo "for $(id -un)" )"
  fi
  if [ "$shared" -eq 0 ] && [ -n "$shared_copy" ]; then
    say "Coilwright ${shared_copy%% *} stays installed for every user, and LibreOffice now uses it."
    say "An administrator removes it with: sudo tools/install_extension.sh --remove --shared"
  fi
  if [ "$shared" -eq 1 ]; then
    theirs=$(copy_of_sudo_user)
    [ -n "$theirs" ] && say "$SUDO_USER still has a copy of their own ($theirs): they remove it with tools/install_extension.sh --remove"
  fi
  exit 0
fi

if [ ! -f "$oxt" ]; then
  say "$oxt not found: build it first (tools/build.sh), or name the .oxt file."
  exit 2
fi

if [ "$shared" -eq 0 ]; then
  mine=$(copy_in "")
  if [ -n "$shared_copy" ] && [ -z "$mine" ]; then
    say "Coilwright ${shared_copy%% *} is installed for every user on this machine."
    say "A copy of your own beside it may stay inactive while Calc keeps using the shared one"
    say "(LibreOffice 7.4), so none is installed. Either ask an administrator to upgrade the shared copy:"
    say "  sudo tools/install_extension.sh --shared $oxt"
    say "or to remove it (sudo tools/install_extension.sh --remove --shared), then run this again."
    exit 3
  fi
  if [ -n "$shared_copy" ] && [ "${mine#* }" != yes ]; then
    say "Your own Coilwright ${mine%% *} is installed but inactive: Calc uses the copy for every user"
    say "(${shared_copy%% *}) instead, and LibreOffice 7.4 does not activate a copy of your own again."
    say "Remove yours (tools/install_extension.sh --remove) and ask an administrator to upgrade the shared one:"
    say "  sudo tools/install_extension.sh --shared $oxt"
    exit 3
  fi
  if [ -n "$shared_copy" ]; then
    say "Note: Coilwright ${shared_copy%% *} is also installed for every user; LibreOffice uses your own copy."
  fi
fi

before=$(copy_in "$scope_opt")
# shellcheck disable=SC2086
unopkg add $scope_opt -f --suppress-license $env_opts "$oxt" || say "unopkg could not install $oxt (see its message above)."

# The copy just installed must be the active one.
now=$(copy_in "$scope_opt")
if [ -z "$now" ]; then
  exit 1
fi
if [ "${now#* }" != yes ]; then
  say "LibreOffice installed Coilwright ${now%% *} but did not activate it$( [ -n "$shared_copy" ] && [ "$shared" -eq 0 ] && echo "; it uses the copy for every user (${shared_copy%% *}) instead" )."
  say "Remove it (tools/install_extension.sh --remove $scope_opt) and see tools/install_extension.sh --help."
  exit 1
fi
if [ "$shared" -eq 1 ]; then
  echo "installed Coilwright ${now%% *} for every user${before:+ (replacing ${before%% *})}"
  theirs=$(copy_of_sudo_user)
  if [ -n "$theirs" ]; then
    say "$SUDO_USER has a copy of their own ($theirs), which LibreOffice uses for them instead of this one:"
    say "they remove it with tools/install_extension.sh --remove"
  fi
  say "Users who installed a copy of their own keep using it until they remove it."
else
  echo "installed Coilwright ${now%% *} for $(id -un)${before:+ (replacing ${before%% *})}"
fi
