#!/usr/bin/env python3
"""Independent evaluation of the published Helmholtz equations, for domeprint's tests.

Reads the coefficient dataset in its original layout (../shared/eos-data, not domeprint's fluid
files), evaluates alpha with mpmath at 40 digits, takes every derivative numerically (mp.diff), and
solves saturation by mp.findroot. Nothing here shares code or derivative formulas with src/eos.
Writes tests/fixtures/eos-reference.json.  Usage: python3 tests/reference/helmholtz_mp.py [eos-data dir]
"""
import json, os, sys
import mpmath as mp

mp.mp.dps = 40
HERE = os.path.dirname(os.path.abspath(__file__))
SRC = sys.argv[1] if len(sys.argv) > 1 else os.path.join(HERE, "..", "..", "..", "shared", "eos-data")
OUT = os.path.join(HERE, "..", "fixtures", "eos-reference.json")


def alpha0(d, tau, delta):
    Tr = mp.mpf(d["reducing"]["T_K"])
    a = mp.log(delta)
    for t in d["ideal"]:
        f = t["form"]
        if f in ("lead", "offset"):
            a += t["a1"] + t["a2"] * tau
        elif f == "log_tau":
            a += t["a"] * mp.log(tau)
        elif f == "tau_power":
            a += sum(n * tau ** e for n, e in zip(t["n"], t["t"]))
        elif f == "planck_einstein":
            a += sum(n * mp.log(1 - mp.exp(-th * tau)) for n, th in zip(t["n"], t["theta"]))
        elif f == "planck_einstein_kelvin":
            T = Tr / tau
            a += sum(n * mp.log(1 - mp.exp(-th / T)) for n, th in zip(t["n"], t["theta_K"]))
        elif f == "planck_einstein_general":
            a += sum(n * mp.log(c + dd * mp.exp(th * tau)) for n, c, dd, th in zip(t["n"], t["c"], t["d"], t["theta"]))
        elif f == "cp0_power":
            T, T0 = Tr / tau, mp.mpf(t["T0_K"])
            for c, e in zip(t["c"], t["t"]):
                if e == 0:
                    a += c * ((T - T0) / T - mp.log(T / T0))
                else:
                    a += c * (T ** e * (mp.mpf(1) / (e + 1) - mp.mpf(1) / e) - T0 ** (e + 1) / (T * (e + 1)) + T0 ** e / e)
        else:
            raise ValueError(f)
    return a


def alphar(d, tau, delta):
    a = mp.mpf(0)
    for t in d["residual"]:
        f = t["form"]
        if f == "power":
            for n, e, dd, l in zip(t["n"], t["t"], t["d"], t["l"]):
                a += n * tau ** e * delta ** dd * (mp.exp(-delta ** l) if l > 0 else 1)
        elif f == "gaussian":
            for n, e, dd, eta, eps, be, ga in zip(t["n"], t["t"], t["d"], t["eta"], t["epsilon"], t["beta"], t["gamma"]):
                a += n * tau ** e * delta ** dd * mp.exp(-eta * (delta - eps) ** 2 - be * (tau - ga) ** 2)
        elif f == "gaussian_rational":
            for n, e, dd, eta, eps, be, ga, b in zip(t["n"], t["t"], t["d"], t["eta"], t["epsilon"], t["beta"], t["gamma"], t["b"]):
                a += n * tau ** e * delta ** dd * mp.exp(-eta * (delta - eps) ** 2 + 1 / (be * (tau - ga) ** 2 + b))
        elif f == "power_double_exp":
            for n, e, dd, l, m in zip(t["n"], t["t"], t["d"], t["l"], t["m"]):
                a += n * tau ** e * delta ** dd * mp.exp(-delta ** l - tau ** m)
        elif f == "nonanalytic":
            for n, aa, b, be, A, B, C, D in zip(t["n"], t["a"], t["b"], t["beta"], t["A"], t["B"], t["C"], t["D"]):
                d2 = (delta - 1) ** 2
                theta = (1 - tau) + A * d2 ** (1 / (2 * mp.mpf(be)))
                Delta = theta ** 2 + B * d2 ** aa
                psi = mp.exp(-C * d2 - D * (tau - 1) ** 2)
                a += n * Delta ** b * delta * psi
        else:
            raise ValueError(f)
    return a


def props(d, T, rho):
    """p [Pa], h [J/mol], s [J/(mol K)] at T [K], rho [mol/m3]."""
    R = mp.mpf(d["gas_constant_J_molK"])
    T, rho = mp.mpf(T), mp.mpf(rho)
    tau = mp.mpf(d["reducing"]["T_K"]) / T
    delta = rho / mp.mpf(d["reducing"]["rho_mol_m3"])
    ar = lambda x, y: alphar(d, x, y)
    a0 = lambda x, y: alpha0(d, x, y)
    ar_d = mp.diff(ar, (tau, delta), (0, 1))
    ar_t = mp.diff(ar, (tau, delta), (1, 0))
    a0_t = mp.diff(a0, (tau, delta), (1, 0))
    p = rho * R * T * (1 + delta * ar_d)
    h = R * T * (1 + tau * (a0_t + ar_t) + delta * ar_d)
    s = R * (tau * (a0_t + ar_t) - a0(tau, delta) - ar(tau, delta))
    return p, h, s


def saturation(d, T, guessL, guessV):
    R = mp.mpf(d["gas_constant_J_molK"])
    T = mp.mpf(T)
    tau = mp.mpf(d["reducing"]["T_K"]) / T
    rr = mp.mpf(d["reducing"]["rho_mol_m3"])

    def pg(delta):
        ar_d = mp.diff(lambda y: alphar(d, tau, y), delta)
        z = 1 + delta * ar_d
        return z, alphar(d, tau, delta) + z - 1 + mp.log(delta)  # Z and (g - g_ideal(T))/RT

    def eqs(dl, dv):
        zl, gl = pg(dl)
        zv, gv = pg(dv)
        return [dl * zl - dv * zv, gl - gv]

    dl, dv = mp.findroot(eqs, (mp.mpf(guessL) / rr, mp.mpf(guessV) / rr), tol=mp.mpf(10) ** -30, maxsteps=200)
    zv, _ = pg(dv)
    return dv * rr * R * T * zv, dl * rr, dv * rr


def anc(a, T):
    theta = 1 - T / a["T_reducing_K"]
    S = sum(n * theta ** t for n, t in zip(a["n"], a["t"]))
    if a["form"] == "linear":
        return a["value_reducing"] * (1 + S)
    if a["form"] == "exp":
        return a["value_reducing"] * mp.e ** S
    return a["value_reducing"] * mp.e ** (a["T_reducing_K"] / T * S)


def main():
    out = {"source": "tests/reference/helmholtz_mp.py (mpmath, 40 digits, numerical derivatives)", "fluids": {}}
    for name in sorted(os.listdir(os.path.join(SRC, "fluids"))):
        d = json.load(open(os.path.join(SRC, "fluids", name)))
        Tt, Tc, rc = d["triple"]["T_K"], d["critical"]["T_K"], d["critical"]["rho_mol_m3"]
        Tmax = d["limits"]["T_max_K"]
        rows = []
        Tlo = Tt + 0.3 * (Tc - Tt)
        Tmid = Tt + 0.85 * (Tc - Tt)
        for T, rho in [(Tlo, float(anc(d["ancillaries"]["rho_liquid"], Tlo)) * 1.01),
                       (Tmid, float(anc(d["ancillaries"]["rho_vapor"], Tmid)) * 0.5),
                       (Tmid, float(anc(d["ancillaries"]["rho_liquid"], Tmid)) * 1.005),
                       (min(1.3 * Tc, Tmax), rc),
                       (min(1.3 * Tc, Tmax), 0.1 * rc),
                       (min(2.0 * Tc, Tmax), 1.5 * rc)]:
            p, h, s = props(d, T, rho)
            rows.append({"T": T, "rho": rho, "p": float(p), "h": float(h), "s": float(s)})
        sats = []
        if not d["pseudo_pure"]:
            for T in [Tt + 0.05 * (Tc - Tt), Tt + 0.5 * (Tc - Tt), Tc - 0.5]:
                p, rl, rv = saturation(d, T, anc(d["ancillaries"]["rho_liquid"], T), anc(d["ancillaries"]["rho_vapor"], T))
                sats.append({"T": T, "p": float(p), "rhoL": float(rl), "rhoV": float(rv)})
        out["fluids"][d["id"]] = {"states": rows, "saturation": sats}
        print(d["id"], "done", file=sys.stderr, flush=True)
    tmp = OUT + ".tmp"
    with open(tmp, "w") as fh:
        json.dump(out, fh, indent=1)
        fh.write("\n")
    os.replace(tmp, OUT)


if __name__ == "__main__":
    main()
