#!/usr/bin/env bash
# Starts or stops a one-node Slurm cluster (munged, slurmctld, slurmd) for the CI test of deploy/slurm; needs root and
# Debian's slurm-wlm and munge packages.
#   cluster.sh start STATE_DIR   writes STATE_DIR/slurm.conf, starts the daemons, waits for the node to be idle,
#                                records their process ids in STATE_DIR/pids
#   cluster.sh stop STATE_DIR    stops the daemons it started, by those process ids
set -euo pipefail
cmd=$1 state=$2
here=$(cd "$(dirname "$0")" && pwd)
if [ "$cmd" = stop ]; then
  [ -f "$state/pids" ] || exit 0
  while read -r pid; do kill "$pid" 2>/dev/null || true; done < "$state/pids"
  rm -f "$state/pids"
  exit 0
fi
mkdir -p "$state/ctld" "$state/d"
host=$(hostname -s)
mem=$(free -m | awk '/^Mem:/ { print int($2 * 0.9) }')
sed -e "s|@HOST@|$host|g" -e "s|@CPUS@|$(nproc)|g" -e "s|@MEM@|$mem|g" -e "s|@STATE@|$state|g" "$here/slurm.conf.in" > "$state/slurm.conf"
export SLURM_CONF=$state/slurm.conf
# munge: a random key, owned by munge, mode 400; the daemon runs as user munge.
mkdir -p /etc/munge /run/munge /var/lib/munge /var/log/munge
[ -s /etc/munge/munge.key ] || dd if=/dev/urandom of=/etc/munge/munge.key bs=1024 count=1 status=none
chown munge:munge /etc/munge/munge.key /run/munge /var/lib/munge /var/log/munge /etc/munge
chmod 400 /etc/munge/munge.key
: > "$state/pids"
su -s /bin/sh munge -c "munged --pid-file=$state/munged.pid" 2>/dev/null || su -s /bin/sh munge -c munged
for _ in $(seq 50); do [ -s "$state/munged.pid" ] && break; sleep 0.1; done
pgrep -u munge -x munged >> "$state/pids" || true
slurmctld -f "$SLURM_CONF"
for _ in $(seq 50); do [ -s "$state/slurmctld.pid" ] && break; sleep 0.1; done
cat "$state/slurmctld.pid" >> "$state/pids"
slurmd -f "$SLURM_CONF"
for _ in $(seq 50); do [ -s "$state/slurmd.pid" ] && break; sleep 0.1; done
cat "$state/slurmd.pid" >> "$state/pids"
for _ in $(seq 120); do
  sinfo -h -o %t 2>/dev/null | grep -qx idle && { echo "slurm: node $host idle"; exit 0; }
  sleep 0.5
done
echo "error: the Slurm node did not come up idle; see $state/slurmctld.log and $state/slurmd.log" >&2
exit 1
