#!/usr/bin/env python3
"""Peer of `fatigue-notes cycles FILE.csv --column 2 --format json --bins N` for the bench.

A straightforward pure-Python rainflow count (standard library only), written for the bench
from the rules of ASTM E1049-85 (Reapproved 2017), section 5.4.4: turning points, then the
three-point rules with S the first point of the residue, the residue counted as half cycles.
It reads the same CSV (header row, comma-separated, load in column 2), prints every cycle
as JSON and a range-mean histogram of N x N equal bins between the history's extremes.

usage: python3 rainflow_peer.py FILE.csv BINS
"""
import csv
import json
import sys


def turning_points(values):
    """Peaks and valleys; repeated values and points between two of one direction are dropped."""
    out = []
    for x in values:
        if out and x == out[-1]:
            continue
        if len(out) >= 2 and (out[-1] - out[-2]) * (x - out[-1]) > 0:
            out[-1] = x
        else:
            out.append(x)
    return out


def rainflow(points, emit):
    stack = []
    for p in points:
        stack.append(p)
        while len(stack) >= 3:
            x = abs(stack[-1] - stack[-2])
            y = abs(stack[-2] - stack[-3])
            if x < y:
                break
            if len(stack) == 3:
                emit(y, (stack[0] + stack[1]) / 2, 0.5)
                stack.pop(0)
            else:
                emit(y, (stack[-2] + stack[-3]) / 2, 1.0)
                last = stack.pop()
                stack.pop()
                stack.pop()
                stack.append(last)
    for i in range(len(stack) - 1):
        emit(abs(stack[i + 1] - stack[i]), (stack[i] + stack[i + 1]) / 2, 0.5)


def main():
    path, bins = sys.argv[1], int(sys.argv[2])
    values = []
    with open(path, newline="") as f:
        rows = csv.reader(f)
        next(rows)
        for row in rows:
            values.append(float(row[1]))
    lo, hi = min(values), max(values)
    cycles = []
    rainflow(turning_points(values), lambda r, m, c: cycles.append((r, m, c)))
    counts = [[0.0] * bins for _ in range(bins)]
    r_scale = bins / (hi - lo)
    m_scale = bins / (hi - lo)
    out = sys.stdout
    out.write('{"cycles":[')
    first = True
    for r, m, c in cycles:
        i = min(int(r * r_scale), bins - 1)
        j = min(int((m - lo) * m_scale), bins - 1)
        counts[i][j] += c
        out.write(("\n" if first else ",\n") + json.dumps({"range": r, "mean": m, "count": c}))
        first = False
    out.write("\n],\n")
    summary = {"samples": len(values), "totalCycles": sum(c for _, _, c in cycles)}
    out.write('"summary":' + json.dumps(summary) + ",\n")
    edges = lambda a, b: [a + (b - a) * k / bins for k in range(bins)] + [b]
    hist = {"rangeEdges": edges(0, hi - lo), "meanEdges": edges(lo, hi), "counts": counts}
    out.write('"histogram":' + json.dumps(hist) + "}\n")


if __name__ == "__main__":
    main()
