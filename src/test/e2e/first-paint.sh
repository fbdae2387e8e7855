#!/bin/sh
# Measurement harness, run by hand (not a test): how long `yoke open` takes from its start to the
# first full-screen paint, and to the ranking's start, in a real terminal (tmux); also to the
# first output of any kind (a plain line of text counts). Polls the pane
# as fast as tmux answers (a few ms a poll) and prints one line per run.
#
# usage: first-paint.sh PROJECT_DIR CATALOG_DIR [RUNS] [SCENARIO]
#   PROJECT_DIR  a built checkout (runs PROJECT_DIR/yoke, the user's launcher)
#   CATALOG_DIR  e.g. a folder written by CatalogScaleBench (write /tmp/big 5000 10000)
set -eu
project=$1
catalog=$2
runs=${3:-3}
scenario=${4:-$project/demo-data/rover-wheel.yaml}
sock="yoke-paint-$$"
tm() { tmux -L "$sock" -f /dev/null "$@"; }
cleanup() { tm kill-server >/dev/null 2>&1 || true; }
trap cleanup EXIT INT TERM
now_ms() { echo $(( $(date +%s%N) / 1000000 )); }

for run in $(seq 1 "$runs"); do
    stamp=$(mktemp)
    # The start time is taken by the shell that then execs the launcher: what a user's Enter starts.
    tm new-session -d -s p -x 100 -y 30 \
        "date +%s%N > '$stamp'; TERM=xterm-256color LANG=C.UTF-8 exec '$project/yoke' open '$scenario' --catalog '$catalog'"
    output=""
    paint=""
    ranking=""
    tries=0
    while [ -z "$ranking" ] && [ "$tries" -lt 20000 ]; do
        screen=$(tm capture-pane -p -t p 2>/dev/null || true)
        t=$(now_ms)
        # The first output of any kind (before the screen existed: a line saying the catalog is read).
        if [ -z "$output" ] && [ -n "$(printf '%s' "$screen" | tr -d ' \n')" ]; then
            output=$t
        fi
        # The first paint: any full-screen view has a footer with the way out ("q quit", "Esc quit").
        if [ -z "$paint" ] && printf '%s' "$screen" | grep -q -e 'q quit' -e 'Esc quit'; then
            paint=$t
        fi
        if printf '%s' "$screen" | grep -q -e '(Esc stops)' -e 'ranked '; then
            ranking=$t
            # A poll can catch the shortlist drawn before its footer: it was painted all the same.
            paint=${paint:-$t}
        fi
        tries=$((tries + 1))
    done
    start=$(( $(cat "$stamp") / 1000000 ))
    tm send-keys -t p q
    sleep 1
    tm kill-session -t p >/dev/null 2>&1 || true
    rm -f "$stamp"
    echo "run $run: first output $(( output - start )) ms, first paint $(( paint - start )) ms, ranking shown $(( ranking - start )) ms (load average $(cut -d' ' -f1 /proc/loadavg))"
done
