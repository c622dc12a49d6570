# Where npm start keeps its data and which ports it uses (override by environment).
PG_DIR="${FARFIELD_PG_DIR:-$ROOT/.data/pg}"
PG_PORT="${FARFIELD_PG_PORT:-5544}"
export PORT="${PORT:-3000}"
export DATABASE_URL="${DATABASE_URL:-postgres://postgres@127.0.0.1:$PG_PORT/farfield}"
export APP_BASE_URL="${APP_BASE_URL:-http://127.0.0.1:$PORT}"
export DEMO_PASSWORD="${DEMO_PASSWORD:-farfield-demo}"
