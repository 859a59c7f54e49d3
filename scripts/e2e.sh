#!/usr/bin/env bash
# The extension in a real editor, with one command: bash scripts/e2e.sh
#
# Installs what is missing (Debian's Chromium via apt-get when run as root; code-server@4.100.3,
# the browser build of the editor, from the npm registry into .e2e/code-server, outside the
# extension's own node_modules), builds and packages the extension, then:
#   1. installs the .vsix into a fresh editor and runs the UI script (test/e2e/ui.e2e.ts) in
#      Chromium: palette command, panel, highlights, click-to-reveal, live mode, payload document;
#   2. starts a second fresh editor and runs the in-editor mocha suite with the real vscode API
#      (test/e2e/run-in-editor.ts; E2E_RUNNER=electron uses @vscode/test-electron instead);
#   2b. installs the .vsix into a fresh editor and runs the digest UI script (test/e2e/digest-ui.e2e.ts):
#      three invented files (test/e2e/fixtures/digest/) digested, a line clicked, dismissed;
#   3. installs the .vsix into a third editor whose user settings put Tersely in the web worker
#      extension host (`remote.extensionKind`), so the `browser` bundle runs, and drives it
#      (test/e2e/web-host.e2e.ts).
# Editor timings (activation, first and later summaries) go to test-artifacts/editor-timings.json.
# Screenshots and logs go to test-artifacts/. The servers bind to 127.0.0.1 only and are stopped
# (whole process group) on exit.
set -euo pipefail

ROOT=$(cd "$(dirname "$0")/.." && pwd)
cd "$ROOT"
CS_VERSION=4.100.3
CS_DIR="$ROOT/.e2e/code-server"
CS="$CS_DIR/node_modules/.bin/code-server"
ARTIFACTS="$ROOT/test-artifacts"
T0=$(date +%s%3N)
elapsed() { echo $(( $(date +%s%3N) - T0 )); }
step() { echo "[$(printf '%6d' "$(elapsed)") ms] $*"; }

# ---------- install what is missing ----------
need_apt=()
command -v "${CHROMIUM_PATH:-/usr/bin/chromium}" >/dev/null 2>&1 || need_apt+=(chromium fonts-liberation fonts-dejavu-core)
command -v rg >/dev/null 2>&1 || need_apt+=(ripgrep)
command -v curl >/dev/null 2>&1 || need_apt+=(curl)
if [ ! -x "$CS" ]; then
  command -v make >/dev/null 2>&1 || need_apt+=(build-essential)
  command -v python3 >/dev/null 2>&1 || need_apt+=(python3)
  command -v pkg-config >/dev/null 2>&1 || need_apt+=(pkg-config)
  [ -e /usr/include/gssapi/gssapi.h ] || need_apt+=(libkrb5-dev)
fi
if [ ${#need_apt[@]} -gt 0 ]; then
  if [ "$(id -u)" != 0 ]; then
    echo "Missing system packages: ${need_apt[*]}. Install them (as root: apt-get install ${need_apt[*]}) and run again." >&2
    exit 1
  fi
  step "apt-get install ${need_apt[*]}"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${need_apt[@]}" >/dev/null
fi

# code-server's ripgrep dependency downloads a binary at install time; seed its cache from Debian's rg.
if [ ! -x "$CS" ] || [ ! -e "$CS_DIR/node_modules/code-server/lib/vscode/node_modules.asar" ]; then
  step "installing code-server@$CS_VERSION into .e2e/code-server (about two minutes)"
  cache="${TMPDIR:-/tmp}/vscode-ripgrep-cache-1.15.11"
  stage=$(mktemp -d)
  mkdir -p "$cache" && cp "$(command -v rg)" "$stage/rg"
  tar -C "$stage" -czf "$cache/ripgrep-v13.0.0-10-x86_64-unknown-linux-musl.tar.gz" rg && rm -rf "$stage"
  rm -rf "$CS_DIR" && mkdir -p "$CS_DIR"
  echo '{ "name": "tersely-e2e-editor", "private": true }' > "$CS_DIR/package.json"
  # npm_config_yes: a native module's install script calls `npx node-gyp`; nodedir: local Node
  # headers; allow scripts: newer npm skips dependency install scripts unless told, and
  # code-server's postinstall is what installs the editor itself.
  (cd "$CS_DIR" && npm_config_yes=true npm_config_nodedir=/usr npm_config_dangerously_allow_all_scripts=true \
    npm install "code-server@$CS_VERSION" --unsafe-perm --no-audit --no-fund --loglevel=error) > "$ROOT/.e2e/code-server-install.log" 2>&1 \
    || { tail -40 "$ROOT/.e2e/code-server-install.log"; exit 1; }
  [ -e "$CS_DIR/node_modules/code-server/lib/vscode/node_modules.asar" ] || { echo "code-server's postinstall did not run; see .e2e/code-server-install.log" >&2; exit 1; }
fi
step "tools ready"

# ---------- build, package ----------
node scripts/build.mjs --production
node test/e2e/build-suite.mjs
rm -f "$ROOT/.e2e/tersely.vsix"
npx --no-install vsce package --no-dependencies --allow-missing-repository --skip-license --no-rewrite-relative-links --out "$ROOT/.e2e/tersely.vsix" > "$ROOT/.e2e/vsce.log" 2>&1 \
  || { cat "$ROOT/.e2e/vsce.log"; exit 1; }
step "built and packaged: $(du -k "$ROOT/.e2e/tersely.vsix" | cut -f1) KB VSIX"

# ---------- one run folder; everything the editor writes stays in it ----------
rm -rf "$ARTIFACTS" && mkdir -p "$ARTIFACTS"
RUN=$(mktemp -d "$ROOT/.e2e/run.XXXXXX")
mkdir -p "$RUN/tmp" "$RUN/xdg-config" "$RUN/xdg-data" "$RUN/xdg-cache"
export XDG_CONFIG_HOME="$RUN/xdg-config" XDG_DATA_HOME="$RUN/xdg-data" XDG_CACHE_HOME="$RUN/xdg-cache"
export EXTENSIONS_GALLERY='{}' # no marketplace
for ws in workspace-ui workspace-suite workspace-web workspace-digest; do
  mkdir -p "$RUN/$ws" && cp "$ROOT"/media/demo/*.md "$RUN/$ws/"
done
# The reStructuredText demo, for the UI run's check of an opening-text abstract.
cp "$ROOT/media/demo/ferry-timetable-planner.rst" "$RUN/workspace-ui/"
# The digest's three invented files, in a folder of their own (the in-editor suite digests it too).
for ws in workspace-suite workspace-digest; do
  cp -r "$ROOT/test/e2e/fixtures/digest" "$RUN/$ws/digest"
done

SERVER_PID=""
stop_server() {
  if [ -n "$SERVER_PID" ]; then
    kill -TERM -- "-$SERVER_PID" 2>/dev/null || true
    for _ in 1 2 3 4 5 6 7 8 9 10; do kill -0 -- "-$SERVER_PID" 2>/dev/null || break; sleep 0.2; done
    kill -KILL -- "-$SERVER_PID" 2>/dev/null || true
    SERVER_PID=""
  fi
}
trap stop_server EXIT

free_port() { node -e "const s=require('net').createServer();s.listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})"; }

# start_server <name>: a fresh editor with its own user data and extensions folders.
start_server() {
  local name=$1 port
  port=$(free_port)
  mkdir -p "$RUN/$name/user-data/User" "$RUN/$name/extensions"
  cat > "$RUN/$name/user-data/User/settings.json" <<'JSON'
{
  "workbench.startupEditor": "none",
  "workbench.tips.enabled": false,
  "workbench.enableExperiments": false,
  "telemetry.telemetryLevel": "off",
  "update.mode": "none",
  "extensions.autoCheckUpdates": false,
  "extensions.autoUpdate": false,
  "extensions.ignoreRecommendations": true,
  "security.workspace.trust.enabled": false,
  "git.enabled": false,
  "npm.autoDetect": "off",
  "workbench.editor.enablePreview": false,
  "editor.minimap.enabled": false,
  "files.autoSave": "off",
  "tersely.length": "6s"
}
JSON
  if [ "$name" = web ]; then
    # Both `main` and `browser`: this user setting moves the extension to the web worker host.
    node -e 'const f=process.argv[1]; const s=JSON.parse(require("fs").readFileSync(f,"utf8")); s["remote.extensionKind"]={"tersely.tersely":["web"]}; require("fs").writeFileSync(f, JSON.stringify(s, null, 2));' "$RUN/$name/user-data/User/settings.json"
  fi
  printf 'bind-addr: 127.0.0.1:%s\nauth: none\ncert: false\n' "$port" > "$RUN/$name/config.yaml"
  COMMON=(--config "$RUN/$name/config.yaml" --user-data-dir "$RUN/$name/user-data" --extensions-dir "$RUN/$name/extensions")
  if [ "$name" = ui ] || [ "$name" = web ] || [ "$name" = digest ]; then
    "$CS" "${COMMON[@]}" --install-extension "$ROOT/.e2e/tersely.vsix" > "$RUN/$name/install.log" 2>&1 || { cat "$RUN/$name/install.log"; exit 1; }
  fi
  TMPDIR="$RUN/tmp" setsid "$CS" "${COMMON[@]}" --bind-addr "127.0.0.1:$port" --auth none --disable-telemetry --disable-update-check \
    --disable-workspace-trust --disable-getting-started-override --ignore-last-opened > "$RUN/$name/server.log" 2>&1 &
  SERVER_PID=$!
  until curl -fsS "http://127.0.0.1:$port/healthz" >/dev/null 2>&1; do
    kill -0 "$SERVER_PID" 2>/dev/null || { echo "code-server stopped:"; cat "$RUN/$name/server.log"; exit 1; }
    sleep 0.1
  done
  BASE="http://127.0.0.1:$port"
}

ONLY=${E2E_ONLY:-all} # ui | suite | digest | web | all (for working on one part)
# E2E_GREP=PATTERN runs only the in-editor tests whose titles match (the editor's extension host inherits it).
export E2E_GREP=${E2E_GREP:-}
UI_RC=0
DIGEST_RC=0
SUITE_RC=0
WEB_RC=0

# ---------- 1. UI script against the installed VSIX ----------
if [ "$ONLY" = all ] || [ "$ONLY" = ui ]; then
start_server ui
step "editor up for the UI script ($BASE)"
npx --no-install tsx test/e2e/ui.e2e.ts "$BASE" "$RUN/workspace-ui" "$ARTIFACTS" "$RUN/ui/user-data/User/settings.json" 2>&1 | tee "$ARTIFACTS/ui.log" || UI_RC=$?
stop_server
step "UI script: exit code $UI_RC"
fi

# ---------- 2. in-editor mocha suite (extension under development) ----------
if [ "$ONLY" = all ] || [ "$ONLY" = suite ]; then
start_server suite
step "editor up for the in-editor suite ($BASE)"
npx --no-install tsx test/e2e/run-in-editor.ts "$ROOT" "$RUN/workspace-suite" "$BASE" 2>&1 | tee "$ARTIFACTS/suite.log" || SUITE_RC=$?
stop_server
step "in-editor suite: exit code $SUITE_RC"
fi

# ---------- 2b. the digest UI script against the installed VSIX ----------
if [ "$ONLY" = all ] || [ "$ONLY" = digest ]; then
start_server digest
step "editor up for the digest UI script ($BASE)"
npx --no-install tsx test/e2e/digest-ui.e2e.ts "$BASE" "$RUN/workspace-digest" "$ARTIFACTS" 2>&1 | tee "$ARTIFACTS/digest-ui.log" || DIGEST_RC=$?
stop_server
step "digest UI script: exit code $DIGEST_RC"
fi

# ---------- 3. the browser bundle in the web worker extension host ----------
if [ "$ONLY" = all ] || [ "$ONLY" = web ]; then
start_server web
step "editor up for the web worker host ($BASE)"
npx --no-install tsx test/e2e/web-host.e2e.ts "$BASE" "$RUN/workspace-web" "$ARTIFACTS" "$RUN/web/user-data/User/settings.json" 2>&1 | tee "$ARTIFACTS/web.log" || WEB_RC=$?
stop_server
step "web worker host: exit code $WEB_RC"
fi

for name in ui suite digest web; do cp "$RUN/$name/server.log" "$ARTIFACTS/server-$name.log" 2>/dev/null || true; done
rm -rf "$RUN"
[ -f "$ARTIFACTS/editor-timings.json" ] && { step "editor timings (test-artifacts/editor-timings.json):"; cat "$ARTIFACTS/editor-timings.json"; }
step "done (screenshots and logs in test-artifacts/)"
[ "$UI_RC" = 0 ] && [ "$SUITE_RC" = 0 ] && [ "$DIGEST_RC" = 0 ] && [ "$WEB_RC" = 0 ]
