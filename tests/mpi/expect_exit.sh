#!/bin/sh
# expect_exit.sh CODE PATTERN FOLDER COMMAND...: removes FOLDER (the run folder the command will
# create), runs COMMAND, and succeeds when it exits with CODE and its output contains PATTERN.
code=$1 pattern=$2 folder=$3
shift 3
rm -rf "$folder"
output=$("$@" 2>&1)
status=$?
printf '%s\n' "$output"
if [ "$status" -ne "$code" ]; then
  echo "expect_exit.sh: exit code $status, expected $code"
  exit 1
fi
if ! printf '%s\n' "$output" | grep -qF -- "$pattern"; then
  echo "expect_exit.sh: output lacks: $pattern"
  exit 1
fi
