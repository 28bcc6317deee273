#!/usr/bin/env bash
# Estate scale: generates 500 sites / 10,000 boards / 500,000 circuits into an EMPTY PostgreSQL database
# (EstateGenerator, test scope, fixed seed), recomputes every site's analysis on one core (EstateAnalysis),
# then starts the app on that database and times the site list, a search and board pages one request at a
# time. Loopback only; bounded. Usage:
#   src/benchmark/estate.sh jdbc:postgresql://127.0.0.1:5432/wayledger_estate [port]
set -euo pipefail
cd "$(dirname "$0")/../.."
URL=${1:?JDBC URL of an empty PostgreSQL database}
PORT=${2:-8112}
USER_=${ESTATE_DB_USER:-postgres}
PASS=${ESTATE_DB_PASSWORD:-}
OUT=target/benchmark; mkdir -p "$OUT"
./mvnw -o -B -q test-compile -Djacoco.skip=true -Dspotless.check.skip=true
./mvnw -o -B -q dependency:build-classpath -Dmdep.outputFile="$OUT/cp.txt" -Dmdep.includeScope=test
CP="target/test-classes:target/classes:$(cat "$OUT/cp.txt")"
echo "load $(cut -d' ' -f1 /proc/loadavg): generating"
java -Xmx1g -cp "$CP" com.wayledger.estate.EstateGenerator "$URL" "$USER_" "$PASS"
echo "load $(cut -d' ' -f1 /proc/loadavg): analysing every site on one core"
java -XX:ActiveProcessorCount=1 -Xmx256m -cp "$CP" com.wayledger.estate.EstateAnalysis "$URL" "$USER_" "$PASS" | tee "$OUT/estate-analysis.txt"

./mvnw -o -B -q package -DskipTests -Djacoco.skip=true -Dspotless.check.skip=true
JAR=$(ls target/wayledger-*.jar | head -1)
WAYLEDGER_ADMIN_USERNAME=estate WAYLEDGER_ADMIN_PASSWORD=estate-password-1 \
  java -Xmx512m -jar "$JAR" --server.port="$PORT" --server.address=127.0.0.1 \
  --spring.datasource.url="$URL" --spring.datasource.username="$USER_" --spring.datasource.password="$PASS" \
  > "$OUT/estate-app.log" 2>&1 &
APP=$!
trap 'kill $APP 2>/dev/null || true' EXIT
for _ in $(seq 1 300); do curl -fs "http://127.0.0.1:$PORT/login" >/dev/null && break; sleep 1; done
AUTH="estate:estate-password-1"
TOKEN_PAGE=$(mktemp); JAR_C=$(mktemp)
CSRF=$(curl -s -c "$JAR_C" "http://127.0.0.1:$PORT/login" | grep -o 'name="_csrf"[^>]*value="[^"]*"' | sed 's/.*value="//;s/"$//')
curl -s -b "$JAR_C" -c "$JAR_C" -o /dev/null -d "username=estate&password=estate-password-1&_csrf=$CSRF" "http://127.0.0.1:$PORT/login"
time_it() { # label url: five single requests, one at a time, after one warm-up
  curl -s -o /dev/null -b "$JAR_C" "$2"
  local t=(); for _ in 1 2 3 4 5; do t+=("$(curl -s -o /dev/null -w '%{time_total}' -b "$JAR_C" "$2")"); done
  printf '| %s | %s | %s |\n' "$1" "$(printf '%s\n' "${t[@]}" | sort -n | sed -n 3p)" "$(cut -d' ' -f1 /proc/loadavg)"
}
SITE=$(curl -s -u "$AUTH" "http://127.0.0.1:$PORT/api/sites" | jq '.[250].id')
BOARD=$(curl -s -u "$AUTH" "http://127.0.0.1:$PORT/api/sites/$SITE/boards" | jq '.[5].id')
COLD=$(curl -s -o /dev/null -w '%{time_total}' -b "$JAR_C" "http://127.0.0.1:$PORT/boards/$BOARD")
{
  echo "| what (estate: 500 sites, 10,000 boards, 500,000 circuits) | median of 5 single requests, s | load |"
  echo "|---|---|---|"
  time_it "site list, first page" "http://127.0.0.1:$PORT/sites"
  time_it "site list, page 6" "http://127.0.0.1:$PORT/sites?page=5"
  time_it "search by board reference (DB-07)" "http://127.0.0.1:$PORT/sites?q=db-07"
  time_it "search by street" "http://127.0.0.1:$PORT/sites?q=kiln"
  time_it "board page (50 circuits, site of 1,019), analysis kept" "http://127.0.0.1:$PORT/boards/$BOARD"
  time_it "site overview (20 boards), analysis kept" "http://127.0.0.1:$PORT/sites/$SITE"
  echo
  echo "First board page of that site after start-up (computes the site's analysis): ${COLD} s"
} | tee "$OUT/estate-pages.md"
rm -f "$TOKEN_PAGE" "$JAR_C"
