#!/usr/bin/env python3
"""Evaluates water (IAPWS-95) and ammonia (Tillner-Roth & Baehr) states with Debian's python3-iapws.

Reads a JSON list of requests on stdin, each {"fluid": "water"|"ammonia", "kind": "TD"|"sat", "T": K, "rho": kg/m3};
writes a JSON list of results in SI (Pa, J/kg, J/(kg K), m/s, kg/m3). Used to make tests/fixtures/water-iapws.json
(python3 tests/reference/iapws_eval.py --fixture) and by the live cross-check in the test suite.
"""
import json, random, sys

from iapws import IAPWS95
from iapws.ammonia import NH3


def evaluate(req):
    cls = IAPWS95 if req["fluid"] == "water" else NH3
    if req["kind"] == "TD":
        st = cls(T=req["T"], rho=req["rho"])
        if st.cp is None or st.w is None:  # inside the two-phase region: no single-phase reference
            return None
        return {"p": st.P * 1e6, "h": st.h * 1e3, "s": st.s * 1e3, "cv": st.cv * 1e3, "cp": st.cp * 1e3, "w": st.w}
    liq = cls(T=req["T"], x=0)
    vap = cls(T=req["T"], x=1)
    return {"p": liq.P * 1e6, "rhoL": liq.rho, "rhoV": vap.rho, "hL": liq.h * 1e3, "hV": vap.h * 1e3, "sL": liq.s * 1e3, "sV": vap.s * 1e3}


def fixture():
    rnd = random.Random(95)
    reqs = []
    for T in [275, 300, 350, 400, 450, 500, 550, 600, 640, 646]:
        reqs.append({"fluid": "water", "kind": "sat", "T": T})
    for _ in range(60):
        T = rnd.uniform(273.16, 1273.0)
        rho = 10 ** rnd.uniform(-2, 3.03)
        reqs.append({"fluid": "water", "kind": "TD", "T": T, "rho": rho})
    for T in [200, 220, 240, 260, 280, 300, 320, 340, 360, 380, 400]:
        reqs.append({"fluid": "ammonia", "kind": "sat", "T": T})
    for T, rho in [(250, 670), (300, 620), (300, 5), (350, 10), (400, 40), (450, 100), (500, 300), (600, 50)]:
        reqs.append({"fluid": "ammonia", "kind": "TD", "T": T, "rho": rho})
    out = []
    for r in reqs:
        res = evaluate(r)
        if res is None or res["p"] <= 0 or res["p"] > 1e9:
            continue
        out.append({**r, **res})
    return {"source": "Debian python3-iapws " + __import__("iapws").__version__ + " (IAPWS95 class; NH3 class: Tillner-Roth, Harms-Watzenberg & Baehr 1993)", "states": out}


if __name__ == "__main__":
    if "--fixture" in sys.argv:
        json.dump(fixture(), sys.stdout, indent=1)
        sys.stdout.write("\n")
    else:
        json.dump([evaluate(r) for r in json.load(sys.stdin)], sys.stdout)
