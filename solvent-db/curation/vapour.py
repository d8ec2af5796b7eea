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

    def range_text(self):
        lo, hi = self.tmin or "?", self.tmax or ("Tc" if self.tc else "?")
        return f"{lo}-{hi} K"

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


# The published tables, in the order of preference of the reference README ("a wide-range correlation inside its
# range" first, then the narrow-range Antoine sets): (source key, file, equation, reader of one row).
def _mcgarry(row):   # CAS Name A B C D Pc Tc Tmin; no upper limit given (the fit ends at the critical point)
    return row[2:6], row[8], "", row[7], row[6]


def _vdi(row):       # CAS Chemical Tm Tc Pc A B C D; valid from Tm to Tc
    return row[5:9], row[2], row[3], row[3], row[4]


def _perry(row):     # CAS Chemical C1..C5 Tmin Tmax
    return row[2:7], row[7], row[8], "", ""


def _poling_wagner(row):  # CAS Name A B C D Tc Pc Tmin Tmax
    return row[2:6], row[8], row[9], row[6], row[7]


def _antoine(row):   # CAS Chemical/Name A B C Tmin Tmax
    return row[2:5], row[5], row[6], "", ""


TABLES = [
    ("mcgarry-1983-wagner", "wagner-mcgarry-vapour-pressure.tsv", "wagner-3-6", _mcgarry, "McGarry Wagner"),
    ("vdi-2010-wagner", "vdi-ppds-wagner-vapour-pressure.tsv", "wagner-2.5-5", _vdi, "VDI Heat Atlas Wagner"),
    ("perry-2008-dippr101", "perry-dippr101-vapour-pressure.tsv", "dippr-101", _perry, "Perry DIPPR 101"),
    ("poling-2000-wagner", "wagner-poling-vapour-pressure.tsv", "wagner-2.5-5", _poling_wagner, "Poling Wagner"),
    ("poling-2000-antoine", "antoine-collection-poling.tsv", "antoine-log10", _antoine, "Poling Antoine"),
    ("landolt-iv20-antoine", "landolt-antoine-vapour-pressure.tsv", "antoine-ln", _antoine, "Landolt-Boernstein Antoine"),
]

# The temperature the workflows use most (drying at room temperature, vapour hazard at 25 °C), K.
ROOM_K = 298.15


def load_tables(ref):
    """cas -> list of Candidates, in the tables' order of preference (TABLES)."""
    out = {}
    for key, name, eq, read, label in TABLES:
        with open(os.path.join(ref, name), encoding="utf-8", newline="") as f:
            rows = [line.rstrip("\n").split("\t") for line in f][1:]
        seen = set()
        for row in rows:
            cas = row[0].strip()
            if not cas or cas in seen:
                continue
            seen.add(cas)
            coeffs, tmin, tmax, tc, pc = read(row)
            out.setdefault(cas, []).append(Candidate(key, eq, coeffs, tmin, tmax, tc, pc, label=label))
    return out


def tb_deviation(cand, tb_k):
    """P(Tb)/101.325 kPa - 1 of one candidate (evaluated even outside its range)."""
    try:
        return cand.p(tb_k) / ATM - 1
    except (OverflowError, ValueError, ZeroDivisionError):
        return math.inf


# Low end of the temperatures the workflows evaluate a curve at, K: 0 °C (cold drying, storage), or the flash point
# where that is lower (the blend flash-point search starts at the components' flash points).
COLD_K = 273.15


def coverage_rank(cand, tb_k, flash_k=None):
    """0: range holds the whole working span (min(0 °C, flash point) to Tb); 1: holds 25 °C and Tb; 2: holds 25 °C;
    3: holds Tb; 4: none of these. Sorted stably, so the table order decides within a rank."""
    low = min(COLD_K, flash_k) if flash_k is not None else COLD_K
    room, boil = cand.inside(ROOM_K), tb_k is None or cand.inside(tb_k)
    if room and boil and cand.inside(low):
        return 0
    return 1 if room and boil else 2 if room else 3 if boil else 4


# Solvents whose CAS no vapour-pressure table holds, mapped to a liquid that one does hold (a curation decision,
# written into the solvent's note; SOURCES.md, "Vapour pressure"): cas -> (proxy CAS, reason).
PROXIES = {
    "138-86-3": ("5989-27-5", "dipentene (racemic limonene): curve of (R)-(+)-limonene 5989-27-5; the two enantiomers "
                 "and their racemic liquid have the same vapour pressure"),
    "97-64-3": ("687-47-8", "ethyl DL-lactate: curve of ethyl (S)-lactate 687-47-8 (enantiomers, same vapour pressure)"),
    "547-64-8": ("2155-30-8", "methyl lactate: curve of methyl (±)-lactate 2155-30-8 (same liquid, other CAS entry)"),
    "1330-20-7": ("108-38-3", "mixed xylene: curve of m-xylene 108-38-3, its main isomer"),
    "91-17-8": ("493-02-7", "decalin (cis/trans mixture): curve of trans-decalin 493-02-7, the more volatile isomer"),
    "25498-49-1": ("20324-33-8", "tripropylene glycol methyl ether (isomer mixture): curve of the isomer 20324-33-8"),
    "98-55-5": ("10482-56-1", "alpha-terpineol: curve of the Landolt–Börnstein entry p-menth-1-en-8-ol, CAS 10482-56-1 ((−)-alpha-terpineol; "
                "enantiomers and their racemic liquid have the same vapour pressure)"),
}

# PROXIES that are the same liquid under another CAS entry (an enantiomer or the racemate, not an isomer of a mixture):
# where no CRC table has a boiling point, the proxy's own published fit may give it (curate.py, tb-from-vapour-fit).
SAME_LIQUID_PROXIES = {"138-86-3", "97-64-3", "547-64-8", "98-55-5"}

# Solvents without a boiling point of their own whose liquid the CRC table lists under another CAS: that boiling point
# is the check of the vapour-pressure fit (written into the note): cas -> (CAS of the CRC row, reason).
TB_PROXIES = {
    "123-96-6": ("4128-31-8", "2-octanol: the CRC table lists (±)-2-octanol under CAS 4128-31-8"),
    "98-55-5": ("2438-12-2", "alpha-terpineol: the CRC table lists 'α-Terpineol' under CAS 2438-12-2 (melting point "
                "35 °C, the racemate's)"),
}

# A boiling point read off a published correlation may lie this far above the fit's upper limit (K): Landolt sets often
# end a few tenths of a kelvin below the normal boiling point, at 99-100 kPa.
TB_FIT_SLACK_K = 1.0


def boiling_point_from_fit(cands):
    """(Tb in K, candidate) for the first published correlation (table order) that reaches 101.325 kPa inside its own
    range (or within TB_FIT_SLACK_K above its upper limit), found by bisection; None when none does. Used only where
    neither CRC table has a boiling point: the value is then read off measured vapour-pressure data rather than
    recalled, but the boiling-point check of that same fit is no independent test (the note says so)."""
    for cand in cands:
        if not cand.tmax:
            continue
        lo, hi = (float(cand.tmin) if cand.tmin else float(cand.tmax) - 150), float(cand.tmax) + TB_FIT_SLACK_K
        try:
            if not cand.p(lo) < ATM < cand.p(hi):
                continue
        except (OverflowError, ValueError, ZeroDivisionError):
            continue
        for _ in range(60):
            mid = (lo + hi) / 2
            lo, hi = (mid, hi) if cand.p(mid) < ATM else (lo, mid)
        return round((lo + hi) / 2, 2), cand
    return None


# Source key of the stored estimate made from the CRC enthalpies of vaporisation (SOURCES.md, docs/methods.md).
ESTIMATE_KEY = "estimate-clapeyron-crc-hvap"
# Source key of the curve through the normal boiling point and one published vapour-pressure point (vapour-points.csv).
POINT_KEY = "estimate-clapeyron-tb-point"
MMHG_PA = 133.322


def load_points(path):
    """cas -> (T in K, P in Pa, source key, note) from curation/vapour-points.csv (one published point per solvent)."""
    out = {}
    if not os.path.exists(path):
        return out
    import csv
    with open(path, encoding="utf-8", newline="") as f:
        for row in csv.DictReader(f):
            if row["cas"] in out:
                raise SystemExit(f"vapour-points.csv: two points for {row['cas']}")
            out[row["cas"]] = (float(row["t_c"]) + 273.15, float(row["p_pa"]), row["src"].strip(), row["note"].strip())
    return out


def point_curve(tb_k, point):
    """Clausius–Clapeyron with constant ΔHvap through (Tb, 101.325 kPa) and one published point (T1, P1):
    ΔHvap = R ln(101325/P1) / (1/T1 - 1/Tb). Range: T1..Tb (interpolation between the two data points)."""
    t1, p1, src, _ = point
    if tb_k is None or not t1 < tb_k - 10 or not 0 < p1 < ATM:
        return None
    h = R * math.log(ATM / p1) / (1 / t1 - 1 / tb_k)
    coeffs = [f"{tb_k:.2f}", "101325", f"{h:.0f}", "0"]
    return Candidate(POINT_KEY, "clapeyron", coeffs, f"{t1:.2f}", f"{tb_k:.2f}", label="curve through Tb and a published point")


def crc_estimate(tb_k, hvap_tb, hvap_298):
    """Clausius–Clapeyron estimate anchored at the normal boiling point (Tb, 101.325 kPa), with ΔHvap linear in T
    between the CRC values at Tb and at 298.15 K (constant ΔCp); with only one of them, ΔHvap constant. None when
    neither is known. Its measured error at 25 °C is in docs/methods.md."""
    if tb_k is None or (hvap_tb is None and hvap_298 is None):
        return None
    if hvap_tb is not None and hvap_298 is not None and abs(tb_k - ROOM_K) > 1:
        h0, dcp = hvap_tb, (hvap_298 - hvap_tb) / (ROOM_K - tb_k)
        lo, hi = min(ROOM_K, tb_k), max(ROOM_K, tb_k)
        label = "ΔHvap at Tb and at 25 °C"
    else:
        h0, dcp = (hvap_tb if hvap_tb is not None else hvap_298), 0.0
        lo, hi = (min(ROOM_K, tb_k), max(ROOM_K, tb_k)) if hvap_tb is None else (tb_k - 20, tb_k + 20)
        label = "ΔHvap at 25 °C only" if hvap_tb is None else "ΔHvap at Tb only"
    coeffs = [f"{tb_k:.2f}", "101325", f"{h0:.0f}", f"{dcp:.2f}"]
    cand = Candidate(ESTIMATE_KEY, "clapeyron", coeffs, f"{lo:.2f}", f"{hi:.2f}", label="estimate from Tb and CRC " + label)
    return cand


# Source key of the last-resort estimate: ΔHvap at 25 °C from the cohesive energy of the Hansen parameters.
HANSEN_KEY = "estimate-clapeyron-hansen-hvap"
# The same estimate where the Hansen parameters are themselves estimated from the structure (the default group route,
# curation/estimated-hsp.csv): two estimates in a chain, measured as a chain (docs/methods.md).
STRUCTURE_HANSEN_KEY = "estimate-clapeyron-structure-hvap"
# Families the Hansen-based estimate is applied to. Left out, by its error measured on the bundled solvents that
# have published correlations (docs/methods.md): glycols (median error 48 %, always too low), carboxylic acids
# (dimerise in the vapour), nitriles (benzonitrile +244 %), "other" (phosphates, sulfur compounds: median 30 %, and
# low, the unsafe direction for a flash point) and water.
HANSEN_FAMILIES = {"alcohol", "aliphatic", "amine", "aromatic", "chlorinated", "ester", "ether", "ketone", "glycol_ether",
                   "glycol_ether_acetate", "dipolar_aprotic", "lactone", "carbonate", "terpene"}


def hansen_estimate(tb_k, hansen, vm_cm3, ratio, key=HANSEN_KEY):
    """Clausius–Clapeyron anchored at (Tb, 101.325 kPa) with ΔHvap(298.15 K) = δt²·Vm + R·298.15 (Hildebrand &
    Scott: δt² is the cohesive energy density, J/cm³ = MPa) and ΔHvap(Tb) = ΔHvap(298.15 K) / ratio, ratio = the median
    ΔHvap(298)/ΔHvap(Tb) of the CRC table over the bundled solvents (constant ΔCp between the two). None without Tb,
    Hansen parameters or molar volume. Its measured error is in docs/methods.md."""
    if tb_k is None or hansen is None or vm_cm3 is None or not tb_k > ROOM_K + 10:
        return None
    d2 = sum(x * x for x in hansen)
    h298 = d2 * vm_cm3 + R * ROOM_K
    htb = h298 / ratio
    dcp = (h298 - htb) / (ROOM_K - tb_k)
    coeffs = [f"{tb_k:.2f}", "101325", f"{htb:.0f}", f"{dcp:.2f}"]
    return Candidate(key, "clapeyron", coeffs, f"{ROOM_K:.2f}", f"{tb_k:.2f}",
                     label="estimate from Tb and ΔHvap from the Hansen cohesive energy")


def choose(cas, tb_k, tables, notes, proxy_tb=None, hvap=None, flash_k=None, point=None, hansen=None):
    """The columns of the chosen correlation for one solvent ({} when none passes), adding reasons to notes.

    Rule (SOURCES.md, "Vapour pressure"): among the published candidates (of the solvent's CAS, else of its PROXIES
    entry), those whose range holds the whole working span (0 °C or the flash point if lower, up to Tb) come first,
    then those holding 25 °C and Tb, then 25 °C, then Tb, then the rest (coverage_rank); within a rank the table
    order of TABLES. The first candidate that reproduces the
    solvent's own normal boiling point within MAX_DEV_AT_TB (101.325 kPa ± 5 %, evaluated even where Tb lies outside
    its range) is taken. For a proxy without a boiling point of the solvent's own, the proxy's CRC boiling point
    (proxy_tb: cas -> K) is the check. When none passes, the estimate of crc_estimate (hvap: (ΔHvap at Tb, ΔHvap at
    298.15 K) in J/mol, each or both None) is stored — after a curve through Tb and a published point (point: see
    load_points), which comes first because it rests on a measured value near room temperature."""
    cands = tables.get(cas, [])
    if not cands and cas in PROXIES:
        proxy, reason = PROXIES[cas]
        cands = tables.get(proxy, [])
        if cands:
            notes.append("vapour pressure: " + reason)
            if tb_k is None and proxy_tb and proxy_tb.get(proxy):
                tb_k = proxy_tb[proxy]
                notes.append(f"vapour-pressure fit checked at the boiling point of {proxy}: {tb_k - 273.15:.2f} °C")
    if cands and tb_k is None and cas in TB_PROXIES and proxy_tb and proxy_tb.get(TB_PROXIES[cas][0]):
        other, reason = TB_PROXIES[cas]
        tb_k = proxy_tb[other]
        notes.append(f"{reason}; vapour-pressure fit checked at the boiling point of {other}: {tb_k - 273.15:.2f} °C")
    if cands and tb_k is None:
        notes.append("vapour-pressure correlation not used: no boiling point to check it against")
        cands = []
    for cand in sorted(cands, key=lambda c: coverage_rank(c, tb_k, flash_k)):
        dev = tb_deviation(cand, tb_k)
        if abs(dev) > MAX_DEV_AT_TB:
            notes.append(f"{cand.label} vapour-pressure fit not used: {100 * dev:+.0f} % from 101.325 kPa "
                         f"at the boiling point")
            continue
        if not cand.inside(ROOM_K):
            notes.append(f"vapour pressure at 25 °C extrapolated: {cand.label} fit covers {cand.range_text()}")
        return cand.columns()
    if point is not None:
        cur = point_curve(tb_k, point)
        if cur is not None:
            notes.append(f"vapour pressure: Clausius–Clapeyron curve through the boiling point and the published point "
                         f"{point[1]:g} Pa at {point[0] - 273.15:g} °C (source {point[2]}: {point[3]}); an interpolation "
                         f"between two data points, stored as an estimate")
            return cur.columns()
    est = crc_estimate(tb_k, *(hvap or (None, None)))
    if est is not None:
        notes.append(f"vapour pressure estimated (Clausius–Clapeyron from the boiling point and CRC "
                     f"{est.label.split('CRC ')[1]}; no published correlation passes the boiling-point check)")
        return est.columns()
    if hansen is not None:
        from_structure = len(hansen) > 3 and hansen[3]
        est = hansen_estimate(tb_k, *hansen[:3], key=STRUCTURE_HANSEN_KEY if from_structure else HANSEN_KEY)
        if est is not None:
            notes.append("vapour pressure roughly estimated: Clausius–Clapeyron from the boiling point and ΔHvap(25 °C) = "
                         "δt²·Vm + RT from the Hansen parameters"
                         + (", themselves estimated from the structure (two estimates in a chain)" if from_structure else "")
                         + " (no published correlation or data point found; error in docs/methods.md)")
            return est.columns()
    return {}
