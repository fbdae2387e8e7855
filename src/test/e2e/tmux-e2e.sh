#!/bin/sh
# End-to-end run of the workbench in a real terminal (tmux): start it on the demo scenario, sort by
# cost, open a pairing's detail, export the view to CSV, open help, quit; then open a scenario with a
# mistake and expect its problems printed with exit status 2. Screen captures go to
# OUT/NN-name.txt for the calling test to check; the script itself fails fast when a screen it
# waits for never appears.
#
# usage: tmux-e2e.sh JAR PROJECT_DIR OUT_DIR
set -eu
jar=$1
project=$2
out=$3
mkdir -p "$out"
work="$out/work"
mkdir -p "$work"
sock="yoke-e2e-$$"
tm() { tmux -L "$sock" -f /dev/null "$@"; }
cleanup() { tm kill-server >/dev/null 2>&1 || true; }
trap cleanup EXIT INT TERM

# capture NAME: waits until the screen stops changing (two polls 0.3 s apart agree, at most ~10 s),
# so a capture never catches the terminal half-way through a redraw on a busy machine.
capture() {
    prev=""
    for _ in $(seq 1 33); do
        now=$(tm capture-pane -p -t e2e)
        if [ -n "$prev" ] && [ "$now" = "$prev" ]; then
            break
        fi
        prev=$now
        sleep 0.3
    done
    printf '%s\n' "$now" > "$out/$1.txt"
}

# wait_for TEXT SECONDS [SESSION]: polls the screen (session e2e unless named) until TEXT shows.
wait_for() {
    session=${3:-e2e}
    tries=$(( $2 * 10 ))
    while [ "$tries" -gt 0 ]; do
        if tm capture-pane -p -t "$session" 2>/dev/null | grep -F -q -- "$1"; then
            return 0
        fi
        sleep 0.1
        tries=$(( tries - 1 ))
    done
    tm capture-pane -p -t "$session" > "$out/timeout.txt" 2>/dev/null || true
    echo "tmux-e2e: '$1' did not appear within $2 s in session $session (screen in $out/timeout.txt)" >&2
    exit 1
}

keys() { tm send-keys -t e2e "$@"; }

# The export lands in the working folder, so the tool runs there with absolute input paths.
tm new-session -d -s e2e -x 120 -y 40 \
    "cd '$work' && TERM=xterm-256color LANG=C.UTF-8 LC_ALL= java -Djava.awt.headless=true -jar '$jar' open '$project/demo-data/rover-wheel.yaml' --catalog '$project/catalog'; echo YOKE-EXIT=\$?; sleep 120"

wait_for "ranked" 90
capture 01-shortlist

# The cursor column starts on the binding margin; cost is two columns to the right (after total loss).
for i in 1 2; do keys Right; done
keys s
wait_for "sort cost asc" 10
keys Home
sleep 0.5
capture 02-sorted-by-cost

keys Enter
wait_for "Pairing detail" 10
sleep 0.5
capture 03-detail
keys Escape
wait_for "shown /" 10

keys x
wait_for "export to CSV file: shortlist.csv" 10
keys Enter
wait_for "wrote " 30
capture 04-exported

keys '?'
wait_for "Help: keys" 10
capture 05-help
keys q
wait_for "shown /" 10

keys c
wait_for "Safety cautions" 10
capture 06-cautions
keys Escape
wait_for "shown /" 10

keys q
wait_for "YOKE-EXIT=" 10
capture 07-after-quit

# A scenario with a mistake: the screen opens while the files are read, closes when the reading
# fails, and the problems are printed in the terminal with exit status 2.
cat > "$work/broken.yaml" <<'YAML'
name: x
bench:
  bus_voltage: 24 mH
profile: 3
YAML
tm new-session -d -s bad -x 120 -y 40 \
    "cd '$work' && TERM=xterm-256color LANG=C.UTF-8 LC_ALL= java -Djava.awt.headless=true -jar '$jar' open '$work/broken.yaml' --catalog '$project/catalog'; echo YOKE-EXIT=\$?; sleep 120"
wait_for "YOKE-EXIT=" 30 bad
tm capture-pane -p -t bad > "$out/08-load-error.txt"
