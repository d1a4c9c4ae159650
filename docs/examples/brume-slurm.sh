#!/bin/bash
# A long brume run as a chain of Slurm jobs, each within the queue's time limit (docs/cluster.md):
#
#   sbatch brume-slurm.sh INPUT RUN
#
# The first job runs `brume run INPUT --out RUN`; a job that finds the folder RUN continues it
# with `brume run --restart RUN` (its newest checkpoint). brume exits with code 4 when it stopped
# early with a checkpoint written (clock.wall_budget used up, or SIGTERM, SIGINT or SIGUSR1
# received); the job then submits itself again, at most BRUME_MAX_JOBS jobs in all.
#
# Slurm facts used here are from memory (check them against your site's documentation):
# #SBATCH lines are read up to the first command; --signal=B:USR1@600 sends SIGUSR1 to this batch
# shell (B:) about 600 s before the time limit; the job starts in the folder it was submitted from.
#
#SBATCH --job-name=brume
#SBATCH --nodes=2
#SBATCH --ntasks-per-node=64
#SBATCH --cpus-per-task=1
#SBATCH --time=24:00:00
#SBATCH --signal=B:USR1@600
#SBATCH --output=brume-%j.out

set -u

# Stop a few minutes before --time above (keep the two together): brume checks the budget
# before each step, so the margin must hold a step and the writing of a checkpoint.
wall_budget=23.75h
brume=${BRUME:-brume}           # the brume binary (a path, or found on PATH)
script=${BRUME_JOB_SCRIPT:-brume-slurm.sh}  # this file, from the submit folder
max_jobs=${BRUME_MAX_JOBS:-30}  # a chain that never finishes stops here
job=${BRUME_JOB_NUMBER:-1}

usage="usage: sbatch $script INPUT RUN"
input=${1:?$usage}
run=${2:?$usage}

if [ -d "$run" ]; then
  command=("$brume" run --restart "$run" --set "clock.wall_budget=$wall_budget")
else
  command=("$brume" run "$input" --out "$run" --set "clock.wall_budget=$wall_budget")
fi
echo "brume-slurm.sh: job $job of at most $max_jobs: ${command[*]}"

# mpirun takes its rank count and hosts from the Slurm allocation. It passes SIGUSR1 on to every
# rank, but answers SIGTERM by killing the ranks within seconds (Open MPI's mpirun man page,
# "Signal Propagation"): the early SIGUSR1 is what lets brume write its checkpoint.
mpirun --bind-to core --map-by core "${command[@]}" &
launcher=$!
trap 'kill -USR1 "$launcher" 2>/dev/null' USR1
wait "$launcher"
status=$?
# A trapped signal ends `wait` early with a code above 128: wait again for mpirun's own code.
while [ "$status" -gt 128 ] && kill -0 "$launcher" 2>/dev/null; do
  wait "$launcher"
  status=$?
done

case $status in
  0) echo "brume-slurm.sh: the run is complete" ;;
  4)
    if [ "$job" -ge "$max_jobs" ]; then
      echo "brume-slurm.sh: stopped with a checkpoint after $job jobs (BRUME_MAX_JOBS);" \
        "resubmit to continue: sbatch $script $input $run"
    else
      echo "brume-slurm.sh: stopped with a checkpoint; submitting job $((job + 1))"
      # This job's part is done: it succeeds when the next one is queued.
      sbatch --export=ALL,BRUME_JOB_NUMBER=$((job + 1)) "$script" "$input" "$run" && exit 0
    fi
    ;;
  *) echo "brume-slurm.sh: brume exited with code $status (docs/command-line.md); not resubmitted" ;;
esac
exit "$status"
