#!/usr/bin/env python3
"""Compares two outputs of the tool (text, JSON, CSV, HTML or SVG) that should hold the same results.

Text between the numbers must be identical. Numbers must agree to a relative 1e-6 of the scale of their quantity: in
JSON the scale is the largest magnitude any value of the same key reaches in the document, elsewhere the number itself
(so the check is relative, and values that are zero up to round-off, such as the eigenvalue of a rigid-body mode, may
differ in their noise). With --loose (pictures as SVG, the HTML report) numbers printed with few digits may differ in
their last printed digit: a relative 1e-3. Exit 0 when the outputs agree, 1 with the first differences otherwise.
"""
import json, re, sys

NUM = re.compile(r'[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?')
# the time a report was made ("2026-12-03 02:00 UTC+00:00"): the two builds run a moment apart, so it is not compared
STAMP = re.compile(r'\d{4}-\d{2}-\d{2} \d{2}:\d{2}(?::\d{2})? UTC[-+]\d{2}:\d{2}')


def scales(node, out, key=None):
    if isinstance(node, dict):
        for k, v in node.items():
            scales(v, out, k)
    elif isinstance(node, list):
        for v in node:
            scales(v, out, key)
    elif isinstance(node, (int, float)) and not isinstance(node, bool):
        out[key] = max(out.get(key, 0.0), abs(float(node)))


def compare_json(a, b, sa, path, diffs, key=None):
    if isinstance(a, dict) and isinstance(b, dict):
        if list(a.keys()) != list(b.keys()):
            diffs.append(f"{path}: keys differ")
            return
        for k in a:
            compare_json(a[k], b[k], sa, f"{path}.{k}", diffs, k)
    elif isinstance(a, list) and isinstance(b, list):
        if len(a) != len(b):
            diffs.append(f"{path}: {len(a)} against {len(b)} items")
            return
        for i, (x, y) in enumerate(zip(a, b)):
            compare_json(x, y, sa, f"{path}[{i}]", diffs, key)
    elif isinstance(a, (int, float)) and isinstance(b, (int, float)) and not isinstance(a, bool) and not isinstance(b, bool):
        scale = max(sa.get(key, 0.0), abs(a), abs(b))
        if abs(a - b) > 1e-6 * scale:
            diffs.append(f"{path}: {a!r} against {b!r}")
    elif a != b:
        diffs.append(f"{path}: {a!r} against {b!r}")


def compare_text(a, b, rel, diffs):
    ta, tb = NUM.split(a), NUM.split(b)
    na, nb = NUM.findall(a), NUM.findall(b)
    if ta != tb or len(na) != len(nb):
        for i, (x, y) in enumerate(zip(a.splitlines(), b.splitlines())):
            if NUM.split(x) != NUM.split(y):
                diffs.append(f"line {i + 1}: {x.strip()[:120]!r} against {y.strip()[:120]!r}")
                return
        diffs.append("the texts differ in length")
        return
    for x, y in zip(na, nb):
        fx, fy = float(x), float(y)
        if abs(fx - fy) > rel * max(abs(fx), abs(fy)):
            diffs.append(f"number {x} against {y}")
            if len(diffs) > 5:
                return


def main():
    loose = "--loose" in sys.argv
    fa, fb = [p for p in sys.argv[1:] if p != "--loose"]
    a = open(fa, encoding="utf-8").read()
    b = open(fb, encoding="utf-8").read()
    a, b = STAMP.sub("(time made)", a), STAMP.sub("(time made)", b)
    diffs = []
    try:
        ja, jb = json.loads(a), json.loads(b)
    except ValueError:
        ja = jb = None
    if ja is not None and jb is not None:
        sa = {}
        scales(ja, sa)
        scales(jb, sa)
        compare_json(ja, jb, sa, "$", diffs)
    else:
        lines_a, lines_b = a.splitlines(), b.splitlines()
        if all(l.startswith("{") for l in lines_a + lines_b) and len(lines_a) == len(lines_b) and lines_a:
            for la, lb in zip(lines_a, lines_b):  # JSON lines
                sa = {}
                xa, xb = json.loads(la), json.loads(lb)
                scales(xa, sa)
                scales(xb, sa)
                compare_json(xa, xb, sa, "$", diffs)
        else:
            compare_text(a, b, 1e-3 if loose else 1e-6, diffs)
    for d in diffs[:6]:
        print("  " + d)
    sys.exit(1 if diffs else 0)


if __name__ == "__main__":
    main()
