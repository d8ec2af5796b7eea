"""Vapour-pressure columns of solvents.csv: the choice of one correlation per solvent.

Columns written (see solvent-db/README.md): vp_equation, vp_c1..vp_c5, vp_tmin_k, vp_tmax_k, vp_tc_k, vp_pc_pa,
src_vapour_pressure. Equation keys and the meaning of c1..c5:

  antoine-log10  log10(P/Pa) = c1 - c2/(T/K + c3)                     (Poling et al. 2000)
  antoine-ln     ln(P/Pa)    = c1 - c2/(T/K + c3)                     (Landolt-Boernstein IV/20, converted)
  dippr-101      ln(P/Pa)    = c1 + c2/T + c3 ln T + c4 T^c5         (Perry's Handbook 8th ed., Table 2-8)
  wagner-2.5-5   ln(P/Pc)    = (c1 t + c2 t^1.5 + c3 t^2.5 + c4 t^5)/Tr, t = 1 - T/Tc   (VDI Heat Atlas; Poling)
  wagner-3-6     ln(P/Pc)    = (c1 t + c2 t^1.5 + c3 t^3 + c4 t^6)/Tr                   (McGarry 1983)
  clapeyron      ln(P/c2)    = -((c3 - c4 c1)/R)(1/T - 1/c1) + (c4/R) ln(T/c1)           (an estimate)

Python 3 standard library only.
"""
import math
import os

# A correlation is accepted only when it gives the solvent's own normal boiling point within this fraction.
MAX_DEV_AT_TB = 0.05
ATM = 101325.0
R = 8.314462618

VP_COLUMNS = ["vp_equation", "vp_c1", "vp_c2", "vp_c3", "vp_c4", "vp_c5", "vp_tmin_k", "vp_tmax_k", "vp_tc_k", "vp_pc_pa"]


def pressure(eq, c, tc=None, pc=None, t=None):
    """P in Pa at T in K for one stored correlation (c: list of floats c1..)."""
    if eq == "antoine-log10":
        return 10 ** (c[0] - c[1] / (t + c[2]))
    if eq == "antoine-ln":
        return math.exp(c[0] - c[1] / (t + c[2]))
    if eq == "dippr-101":
        return math.exp(c[0] + c[1] / t + c[2] * math.log(t) + c[3] * t ** c[4])
    if eq in ("wagner-2.5-5", "wagner-3-6"):
        tr = t / tc
        tau = max(0.0, 1 - tr)
        e1, e2 = (2.5, 5) if eq == "wagner-2.5-5" else (3, 6)
        return pc * math.exp((c[0] * tau + c[1] * tau ** 1.5 + c[2] * tau ** e1 + c[3] * tau ** e2) / tr)
    if eq == "clapeyron":
        t0, p0, h0, dcp = c[:4]
        return p0 * math.exp(-((h0 - dcp * t0) / R) * (1 / t - 1 / t0) + (dcp / R) * math.log(t / t0))
    raise ValueError(eq)


class Candidate:
    """One published correlation for one CAS, with the text of its coefficients exactly as in its table."""

    def __init__(self, key, eq, coeffs, tmin, tmax, tc="", pc="", label=""):
        self.key, self.eq = key, eq
        self.coeffs = [x.strip() for x in coeffs]
        self.tmin, self.tmax = (tmin or "").strip(), (tmax or "").strip()
        self.tc, self.pc = (tc or "").strip(), (pc or "").strip()
        self.label = label or key

    def p(self, t):
        c = [float(x) for x in self.coeffs]
        return pressure(self.eq, c, float(self.tc) if self.tc else None, float(self.pc) if self.pc else None, t)

    def inside(self, t):
        return (not self.tmin or t >= float(self.tmin)) and (not self.tmax or t <= float(self.tmax))

    def columns(self):
        cols = {k: "" for k in VP_COLUMNS}
        cols["vp_equation"] = self.eq
        for i, x in enumerate(self.coeffs):
            cols[f"vp_c{i + 1}"] = x
        cols["vp_tmin_k"], cols["vp_tmax_k"] = self.tmin, self.tmax
        cols["vp_tc_k"], cols["vp_pc_pa"] = self.tc, self.pc
        cols["src_vapour_pressure"] = self.key
        return cols


def load_tables(ref):
    """cas -> list of Candidates, in order of preference (step 1: Poling's Antoine table only)."""
    out = {}
    path = os.path.join(ref, "antoine-collection-poling.tsv")
    with open(path, encoding="utf-8", newline="") as f:
        rows = [line.rstrip("\n").split("\t") for line in f][1:]
    for row in rows:
        cas = row[0].strip()
        if cas and cas not in out:
            out[cas] = [Candidate("poling-2000-antoine", "antoine-log10", row[2:5], row[5], row[6], label="Poling Antoine")]
    return out


def choose(cas, tb_k, tables, notes):
    """The columns of the chosen correlation for one solvent ({} when none passes), adding reasons to notes.

    Rule: the first candidate (in preference order) that reproduces the normal boiling point within
    MAX_DEV_AT_TB where Tb lies inside its range; a candidate whose range does not reach Tb is accepted
    unchecked (it cannot be judged there)."""
    for cand in tables.get(cas, []):
        if tb_k is not None and cand.inside(tb_k):
            p_tb = cand.p(tb_k)
            if abs(p_tb / ATM - 1) > MAX_DEV_AT_TB:
                notes.append(f"{cand.label} fit dropped: gives {p_tb:.0f} Pa at the boiling point")
                continue
        return cand.columns()
    return {}
