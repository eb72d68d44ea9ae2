#!/usr/bin/env python3
"""Peer of the per-check evaluation figure of `npm run bench`: the contract example's
stress-life check (test/fixtures/contract-example.md) done with pint quantities.

Marin factors (Shigley's Mechanical Engineering Design, 10th ed., eqs. 6-8, 6-19, 6-20,
table 6-2 and 6-5), Kt of a shoulder fillet in bending and torsion (a power fit of
Peterson's charts for D/d = 1.2, from memory), Kf = 1 + q (Kt - 1) with Neuber's constant
(Shigley eqs. 6-33, 6-35a/b), von Mises amplitude and mean, Goodman n_f (Shigley eq. 6-41)
and first-cycle yield n_y. Prints the milliseconds per check (median of 5 runs of N checks).
Timing only: its numbers are not compared with the project's.

usage: python3 pint_peer.py [N]
"""
import math
import statistics
import sys
import time

import pint

u = pint.UnitRegistry()
Q = u.Quantity


def check(inp):
    sut = Q(inp["Sut"], "MPa")
    sy = Q(inp["Sy"], "MPa")
    d = Q(inp["d"], "mm")
    D = Q(inp["D"], "mm")
    r = Q(inp["r"], "mm")
    m_max = Q(inp["M_max"], "N*m")
    m_min = Q(inp["M_min"], "N*m")
    t_max = Q(inp["T_max"], "N*m")
    t_min = Q(inp["T_min"], "N*m")
    se_prime = 0.5 * sut
    ka = 4.51 * sut.to("MPa").magnitude ** -0.265
    kb = 1.24 * d.to("mm").magnitude ** -0.107
    kc, kd, ke = 1.0, 1.0, 0.814
    se = ka * kb * kc * kd * ke * se_prime
    rd = (r / d).to("dimensionless").magnitude
    _ = (D / d).to("dimensionless")
    kt = 0.97098 * rd**-0.21796
    kts = 0.83425 * rd**-0.21649
    sut_kpsi = sut.to("kpsi").magnitude
    sqrt_a = Q(0.246 - 3.08e-3 * sut_kpsi + 1.51e-5 * sut_kpsi**2 - 2.67e-8 * sut_kpsi**3, "in**0.5")
    sqrt_as = Q(0.190 - 2.51e-3 * sut_kpsi + 1.35e-5 * sut_kpsi**2 - 2.67e-8 * sut_kpsi**3, "in**0.5")
    sqrt_r = Q(math.sqrt(r.to("in").magnitude), "in**0.5")
    q = 1 / (1 + (sqrt_a / sqrt_r).to("dimensionless"))
    qs = 1 / (1 + (sqrt_as / sqrt_r).to("dimensionless"))
    kf = 1 + q * (kt - 1)
    kfs = 1 + qs * (kts - 1)
    ma, mm = (m_max - m_min) / 2, (m_max + m_min) / 2
    ta, tm = (t_max - t_min) / 2, (t_max + t_min) / 2
    zb = math.pi * d**3 / 32
    zt = math.pi * d**3 / 16
    sa = (kf * ma / zb).to("MPa")
    sm = (kf * mm / zb).to("MPa")
    tau_a = (kfs * ta / zt).to("MPa")
    tau_m = (kfs * tm / zt).to("MPa")
    sa_vm = (sa**2 + 3 * tau_a**2) ** 0.5
    sm_vm = (sm**2 + 3 * tau_m**2) ** 0.5
    n_f = 1 / (sa_vm / se + sm_vm / sut).to("dimensionless")
    s_max = ((sa + sm) ** 2 + 3 * (tau_a + tau_m) ** 2) ** 0.5
    n_y = (sy / s_max).to("dimensionless")
    return {"n_f": f"{n_f.magnitude:.4g}", "n_y": f"{n_y.magnitude:.4g}", "Se": f"{se:~.4g}"}


def main():
    n = int(sys.argv[1]) if len(sys.argv) > 1 else 200
    base = dict(Sut=630, Sy=530, d=35, D=42, r=1.5, M_max=180, M_min=-180, T_max=250, T_min=250)
    check(base)  # warm the registry's caches, as the project's figure is taken warm
    runs = []
    for _ in range(5):
        t0 = time.perf_counter()
        for i in range(n):
            check(dict(base, M_max=150 + i % 50))
        runs.append((time.perf_counter() - t0) * 1000 / n)
    print(statistics.median(runs))


if __name__ == "__main__":
    main()
