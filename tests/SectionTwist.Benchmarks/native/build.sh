#!/bin/sh
# Builds the CHOLMOD baseline driver (needs Debian's libsuitesparse-dev and libopenblas-dev:
#   apt-get install -y libsuitesparse-dev libopenblas-dev). Output: ./cholmod_bench beside this script.
set -e
cd "$(dirname "$0")"
cc -O2 -o cholmod_bench cholmod_bench.c -lcholmod -lm
