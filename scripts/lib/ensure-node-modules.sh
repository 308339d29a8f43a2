# Installs the npm dependencies when they are missing or older than package-lock.json.
# Sourced by the npm scripts, so a fresh clone needs nothing but Node 20 and npm.
if [ ! -x node_modules/.bin/tsx ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "[setup] installing npm dependencies (npm ci)…"
  npm ci --no-audit --no-fund
fi
