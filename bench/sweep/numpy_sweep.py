"""Reference for the sweep benchmark: the same work as `windscript sweep --slots A..B
--poles C..D [--pitch all]` (every feasible 3-phase double-layer combination, star-of-slots
layout with the pole-pitch rule or every pitch up to it, winding factors at electrical orders
1..49, exact differential leakage), written as a vectorised NumPy script, so that both can be
timed as whole processes on the same machine (bench/sweep/run.sh; see docs/sweep.md). Prints one
JSON object per layout. Usage: numpy_sweep.py [A..B C..D [pole|all]]; default 6..120 2..60 pole."""
import math
import sys

import numpy as np

M, ORDERS = 3, 49
args = sys.argv[1:] or ["6..120", "2..60", "pole"]
(q_from, q_to), (p_from, p_to) = (tuple(int(v) for v in a.split("..")) for a in args[:2])
every_pitch = len(args) > 2 and args[2] == "all"


def layout(Q, poles, p, t, y, s, theta):
    # star of slots: slot s at p*s/Q turns; 2m sectors of 60 degrees, each starting at its belt
    sector = (p * s % Q) * (2 * M) // Q
    phase = np.where(sector % 2 == 0, sector // 2, ((sector - M) % (2 * M)) // 2)
    sign = np.where(sector % 2 == 0, 1, -1)
    c = np.zeros((M, Q))
    np.add.at(c, (phase, s), sign)                    # top layer: go sides
    np.add.at(c, (phase, (s + y) % Q), -sign)         # bottom layer: returns, one pitch on
    sides = 2 * Q // M
    nu = p * np.arange(1, ORDERS + 1)
    kw = np.abs(np.exp(-1j * np.outer(nu, theta)) @ c[0]) / sides
    # exact differential leakage: mean square of the MMF space vector over the working wave
    levels = np.cumsum(c, axis=1)
    levels -= levels.mean(axis=1, keepdims=True)
    rot = np.exp(1j * 2 * np.pi / M * np.arange(M))
    space = rot @ levels
    s_p = c @ np.exp(-1j * p * theta)
    working = max(abs(s_p @ rot), abs(s_p @ rot.conj())) / (2 * np.pi * p)
    leakage = np.mean(np.abs(space) ** 2) / working ** 2 - 1
    factors = ",".join(f"{x:.6f}" for x in kw)
    out.append(f'{{"slots":{Q},"poles":{poles},"phases":3,"layers":2,"pitch":{y},'
               f'"periodicity":{t},"coggingOrder":{Q * poles // math.gcd(Q, poles)},'
               f'"differentialLeakage":{leakage:.6g},"windingFactors":[{factors}]}}')


out = []
for Q in range(q_from, q_to + 1):
    s = np.arange(Q)
    theta = 2 * np.pi * (s + 0.5) / Q
    for poles in range(p_from + p_from % 2, p_to + 1, 2):
        p = poles // 2
        t = math.gcd(Q, p)
        if p % Q == 0 or Q % (M * t) != 0:
            continue
        pole_pitch = max(1, Q // poles)
        for y in (range(1, pole_pitch + 1) if every_pitch else [pole_pitch]):
            layout(Q, poles, p, t, y, s, theta)
sys.stdout.write("\n".join(out) + "\n")
