#!/usr/bin/env python3
"""Regenerate solvent-db/solvents.csv from the published reference tables.

Usage (from the repository root):
    python3 solvent-db/curation/curate.py [REFERENCE_DATA_DIR]

REFERENCE_DATA_DIR defaults to ../shared/reference-data relative to the repository
root. The script reads the tables there (it never copies them), joins them by CAS
number, applies the curation rules written in solvent-db/SOURCES.md, adds the
hand-curated values of solvent-db/curation/manual.csv, and writes
solvent-db/solvents.csv. Python 3 standard library only; the output is
deterministic (same inputs -> byte-identical file).
"""
import csv
import math
import os
import re
import sys

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import structure_columns  # noqa: E402  (SMILES and families columns)
import vapour  # noqa: E402  (vapour-pressure correlation columns)

HERE = os.path.dirname(os.path.abspath(__file__))
DB_DIR = os.path.dirname(HERE)
REPO = os.path.dirname(DB_DIR)

COLUMNS = [
    "name", "synonyms", "cas", "formula", "smiles", "family", "families",
    "molar_mass", "density", "molar_volume",
    "dD", "dP", "dH",
    "boiling_point_c", "melting_point_c", "flash_point_c", "autoignition_c", "lfl_pct", "ufl_pct",
    *vapour.VP_COLUMNS,
    "hvap_kj_mol",
    "oel_twa_ppm", "oel_stel_ppm", "oel_ceiling_ppm", "oel_skin", "oel_jurisdiction",
    "hazard_statements", "peroxide_former", "ich_class",
    "unifac_groups",
    "src_identity", "src_smiles", "src_molar_mass", "src_density", "src_hsp", "src_boiling_point",
    "src_melting_point", "src_flash_point", "src_autoignition", "src_flammability_limits",
    "src_vapour_pressure", "src_hvap", "src_oel", "src_hazard_statements", "src_peroxide_former",
    "src_ich", "src_unifac",
    "note",
]

# IUPAC conventional/abridged standard atomic weights (CIAAW, IUPAC Technical
# Report 2021 "Standard atomic weights of the elements 2021", Pure Appl. Chem.).
ATOMIC_WEIGHTS = {
    "H": 1.008, "C": 12.011, "N": 14.007, "O": 15.999, "F": 18.998,
    "S": 32.06, "Cl": 35.45, "Br": 79.904, "P": 30.974,
}

# Curation decisions that pick a value against the default table priority.
# Each one is explained in the note column of the solvent (see manual.csv) and in SOURCES.md.
HSP_CHOICE = {
    "112-07-2": "alshehri",   # 2-butoxyethyl acetate
    "105-58-8": "schrier",    # diethyl carbonate
    "108-20-3": "alshehri",   # diisopropyl ether
    "141-43-5": "alshehri",   # monoethanolamine
}
# Flash point taken from the DIPPR (Serat) whole-degree value instead of IEC/NFPA.
FLASH_FROM_SERAT = {
    "103-09-3",  # 2-ethylhexyl acetate: IEC 44 °C vs NFPA 88 °C
    "108-82-7",  # diisobutyl carbinol: IEC 75 °C vs DIPPR 66 °C (round value), no third table: the lower one
    "78-59-1",   # isophorone: NFPA 84 °C vs DIPPR 77.5 °C (round value), no third table: the lower one
}
# A chosen flash point further than this from the DIPPR/Serat value is checked against the other fire-data tables
# and the outcome written in the note (issue 12).
SERAT_CHECK_K = 5.0
# Ontario mg/m3 limits converted to ppm (vapours only; aerosol/inhalable limits are not converted).
OEL_CONVERT_MG = {"872-50-4", "108-01-0"}
# ICH Q3C entries that cover an isomer group although listed under one CAS.
ICH_ALIASES = {
    "95-47-6": "1330-20-7", "108-38-3": "1330-20-7", "106-42-3": "1330-20-7",  # xylene
    "156-60-5": "540-59-0",  # 1,2-dichloroethene
}
ICH_CONFIRMED_R8 = {"96-47-9", "5614-37-9", "75-65-0"}
# The app's solvent model accepts ICH classes 1-3 only (Solvent.ichClass). Class 4 ("no adequate
# toxicological data", no PDE) is therefore written into the note, not the ich_class column.
# Set to True once the model accepts 4.
ICH_WRITE_CLASS_4 = False


# Hazard-statement basis (manual.csv column hazard_basis) -> source key. "harmonised": the solvent has an entry in
# CLP Regulation (EC) No 1272/2008 Annex VI Table 3 (the list recalled from memory); "self": no harmonised entry
# recalled, so the statements are the usual supplier self-classification.
HAZARD_BASIS_KEYS = {"harmonised": "memory-clp-annex-vi", "self": "memory-supplier-classification",
                     # checked against a stored copy (SOURCES.md names the copy for each solvent)
                     "harmonised-checked": "clp-annex-vi-checked", "sds-checked": "supplier-sds-checked",
                     # UN GHS classification of an International Chemical Safety Card, read from a stored copy
                     "icsc": "icsc",
                     # a REACH registrant's self-classification read from a stored copy of its ECHA registration
                     # dossier page (not harmonised: the note still tells the user to check the SDS)
                     "registrant-checked": "echa-registration-dossier",
                     # the classification of a GisChem data sheet (BG RCI / BGHM), which says whether the solvent is
                     # listed in Annex VI and which classes it adds from supplier data; read from a stored copy
                     "gischem-checked": "gischem",
                     # the GHS box of a German Wikipedia infobox (which cites GESTIS or a supplier), read from a copy
                     "dewiki-checked": "dewiki-infobox",
                     # the GHS box of an English Wikipedia infobox, read from a copy; its source is not named there, so
                     # the list is treated as a self-classification (the note keeps the SDS caution)
                     "wikipedia-checked": "wikipedia-infobox",
                     "frwiki-checked": "frwiki-infobox"}
# bases that are self-classifications (no harmonised CLP Annex VI entry): their note carries the SDS caution
SELF_BASES = {"self", "registrant-checked", "wikipedia-checked", "dewiki-checked", "frwiki-checked"}
SELF_CLASSIFICATION_NOTE = "hazard statements: supplier self-classification, check the SDS"
# The manual note that says a solvent carries no hazard statement because it is not classified (not because none is known).
NOT_CLASSIFIED_NOTE = "not classified as hazardous"
# A solvent without published Hansen parameters keeps all its other data and says so (never silently dropped).
HSP_MISSING_NOTE = ("no published Hansen parameters found: left for the structure-based estimate "
                    "(marked estimated when filled); until then left out of HSP searches")

# The note text that marks a solvent without a flash point because it does not burn in the standard tests.
NON_FLAMMABLE_NOTE = "no flash point (non-flammable under standard test conditions)"


def check_memory_flash_point(cas, fp_c, tb_c, hazard_statements, note):
    """Stops on a recalled flash point that contradicts the boiling point or the recalled GHS statements.

    A pure liquid's flash point lies below its normal boiling point (at the flash point the vapour pressure only
    reaches the lower flammability limit, a few kPa). GHS Rev. 10 (UN, 2023), chapter 2.6, flammable-liquid
    categories by closed-cup flash point: H224/H225 below 23 °C, H226 from 23 to 60 °C; a solvent with no
    flammability statement has a flash point above 60 °C.
    """
    codes = hazard_statements.split()
    problems = []
    if tb_c is not None and fp_c >= tb_c:
        problems.append(f"not below the boiling point {tb_c} °C")
    if NON_FLAMMABLE_NOTE in note:
        problems.append("note says non-flammable")
    if ("H224" in codes or "H225" in codes) and not fp_c < 23:
        problems.append("H224/H225 needs < 23 °C")
    if "H226" in codes and not 23 <= fp_c <= 60:
        problems.append("H226 needs 23-60 °C")
    classified = codes or "not classified as hazardous" in note
    if classified and not {"H224", "H225", "H226"} & set(codes) and fp_c <= 60:
        problems.append("no flammability statement needs > 60 °C")
    if problems:
        raise SystemExit(f"{cas}: manual flash point {fp_c} °C: " + "; ".join(problems))


def serat_check_note(cas, chosen_k, chosen_key, iec, nfpa, serat, notes):
    """Notes how a flash point that lies more than SERAT_CHECK_K from the DIPPR/Serat value was resolved.

    Resolved: another fire-data table (IEC 60079-20-1, NFPA 497) agrees with the chosen value within SERAT_CHECK_K.
    Otherwise the note says which values disagree; Serat values with many decimals look computed and run low (reference
    README caveat 2), so they alone do not overturn a measured table value.
    """
    if cas not in serat or not serat[cas][2].strip():
        return
    text = serat[cas][2].strip()
    sv = float(text)
    if abs(chosen_k - sv) <= SERAT_CHECK_K:
        return
    kind = "round value" if len(text.partition(".")[2]) <= 2 else "computed-looking value"
    others = []
    for table, key in ((iec, "IEC 60079-20-1"), (nfpa, "NFPA 497")):
        if cas in table and num(table[cas][2]) is not None:
            others.append((key, num(table[cas][2])))
    chosen_name = {"iec-60079-20-1": "IEC 60079-20-1", "nfpa-497-2008": "NFPA 497"}.get(chosen_key, chosen_key)
    agreeing = [k for k, v in others if k != chosen_name and abs(v - chosen_k) <= SERAT_CHECK_K]
    head = f"flash point: DIPPR/Serat {sv - 273.15:.1f} °C ({kind}) is {chosen_k - sv:+.0f} K from the value used"
    if chosen_key == "dippr-serat-2017":
        return
    if agreeing:
        notes.append(f"{head}; resolved: {' and '.join([chosen_name] + agreeing)} agree")
    elif others and any(k != chosen_name for k, _ in others):
        listed = ", ".join(f"{k} {v - 273.15:.1f} °C" for k, v in others)
        lowest = min(v for _, v in others) >= chosen_k - 1e-9
        notes.append(f"{head}; the tables disagree ({listed}): "
                     + ("the lowest (cautious) value is used" if lowest else "the value used is not the lowest, for the reason in this note")
                     + "; check the SDS")
    elif kind == "computed-looking value":
        notes.append(f"{head}; no second fire-data table has the solvent; the Serat value looks computed (such values run "
                     "low), so the value used stands" + (" (recalled from memory: check the SDS)" if chosen_key.startswith("memory-") else ""))
    else:
        notes.append(f"{head}; no second fire-data table has the solvent: unresolved, check the SDS")


# Isomer mixtures whose boiling point is taken from one isomer (vapour.PROXIES): the CRC rows whose boiling points give
# the range stated in the note.
ISOMER_RANGE = {
    "1330-20-7": ("95-47-6", "108-38-3", "106-42-3", "100-41-4"),  # o-, m-, p-xylene, ethylbenzene
    "91-17-8": ("493-01-6", "493-02-7"),                           # cis-, trans-decalin
}


# CRC boiling points rejected on published evidence: the manual.csv value (with its source key) is used instead and the
# note says why. N,N-diisopropylethylamine 7087-68-5: the CRC row (name "N-Ethyl-N-isopropyl-2-propanamine", the right
# CAS; its density 742.25 kg/m³ and n_D 1.41382 are DIPEA's) gives Tb 387.15 K = 114 °C, but GESTIS (via the German
# Wikipedia infobox) gives 127 °C, and the published Antoine equation quoted there reaches 101.325 kPa at 126.5 °C (at
# 114 °C it gives 67 kPa). Not a mix-up with triethylamine (121-44-8, Tb 89.8 °C) or diisopropylamine (108-18-9, 84 °C).
CRC_TB_REJECTED = {
    "7087-68-5": "boiling point: CRC physical-constants value 114 °C (387.15 K) not used: GESTIS (German Wikipedia infobox, "
                 "stored copy) gives 127 °C and the published Antoine equation quoted there (log10 P/Torr = 7.66956 − "
                 "1663.8374/(t/°C + 220.897)) gives 101.325 kPa at 126.5 °C but only 67 kPa at 114 °C; the CRC row is this "
                 "compound's (name, CAS, density 0.7422, n_D 1.4138 agree), its Tb looks like a transcription error",
}


def related_boiling_point(cas, phys):
    """(Tb in K, note) for a solvent that the CRC table lists under another CAS only: the same liquid under another
    entry (vapour.TB_PROXIES, vapour.PROXIES: enantiomers, racemates) or, for an isomer mixture, the isomer whose
    vapour-pressure curve is used, with the isomers' range in the note. None when there is no such row."""
    proxy = vapour.TB_PROXIES.get(cas) or vapour.PROXIES.get(cas)
    if proxy is None or proxy[0] not in phys or num(phys[proxy[0]][3]) is None:
        return None
    other, reason = proxy
    tb = num(phys[other][3])
    what = reason if cas in vapour.TB_PROXIES else reason.split(":")[0]
    text = f"boiling point of {other} in the CRC table ({what})"
    if cas in ISOMER_RANGE:
        tbs = [num(phys[c][3]) for c in ISOMER_RANGE[cas] if c in phys and num(phys[c][3]) is not None]
        text += (f"; the components boil from {min(tbs) - 273.15:.1f} to {max(tbs) - 273.15:.1f} °C (CRC, CAS "
                 f"{', '.join(ISOMER_RANGE[cas])}): a grade distils over part of that range")
    return tb, text


# Source key of the molar mass of a technical mixture taken from its representative main component (an estimate).
REPRESENTATIVE_MM_KEY = "estimate-representative-molar-mass"


# Solvents without a density of their own in the CRC table whose liquid it lists under another CAS: the same liquid
# (an enantiomer or the racemate) or, for an isomer mixture, its main isomer (the one its vapour-pressure curve uses):
# cas -> (CAS of the CRC row, reason). Decalin is left out on purpose: its cis and trans isomers differ by 3.5 % in
# density (0.8965 and 0.8659 g/cm³), so neither stands for the mixture (its recalled value lies between them).
DENSITY_PROXIES = {
    "138-86-3": ("5989-27-5", "dipentene (racemic limonene): the CRC table lists (R)-(+)-limonene 5989-27-5, the same "
                 "liquid as an enantiomer (enantiomers have the same density)"),
    "123-96-6": ("4128-31-8", "2-octanol: the CRC table lists (±)-2-octanol under CAS 4128-31-8"),
    "138-22-7": ("34451-18-8", "n-butyl lactate: the CRC table lists 'Butyl lactate' under CAS 34451-18-8"),
    "98-55-5": ("2438-12-2", "alpha-terpineol: the CRC table lists 'α-Terpineol' under CAS 2438-12-2 (melting point "
                "35 °C, the racemate's)"),
    "1330-20-7": ("108-38-3", "mixed xylene: density of m-xylene 108-38-3, its main isomer"),
}


def related_density(cas, phys, recalled):
    """(density in g/cm³, note) from the CRC row of DENSITY_PROXIES, with the isomers' range for an isomer mixture."""
    proxy = DENSITY_PROXIES.get(cas)
    if proxy is None or proxy[0] not in phys or num(phys[proxy[0]][4]) is None:
        return None
    other, reason = proxy
    rho = sig(num(phys[other][4]) / 1000.0, 4)
    text = f"density of {other} in the CRC table ({reason})" + (
        f" (replaces {recalled} g/cm³ recalled from memory)" if recalled else "")
    if cas in ISOMER_RANGE:
        rhos = [num(phys[c][4]) / 1000.0 for c in ISOMER_RANGE[cas] if c in phys and num(phys[c][4]) is not None]
        text += (f"; the components range from {min(rhos):.4f} to {max(rhos):.4f} g/cm³ (CRC, CAS "
                 f"{', '.join(ISOMER_RANGE[cas])}): a grade's density depends on its composition")
    return rho, text


def recalled_bp_replaced(m):
    return f" (replaces {m['boiling_point_c']} °C recalled from memory)" if m.get("boiling_point_c") else ""


def read_tsv(path, header=True):
    with open(path, encoding="utf-8", newline="") as f:
        rows = [line.rstrip("\n").split("\t") for line in f]
    return rows[1:] if header else rows


def by_cas(path):
    out = {}
    for row in read_tsv(path):
        if row and row[0].strip():
            out.setdefault(row[0].strip(), row)
    return out


def num(text):
    text = (text or "").strip()
    if not text:
        return None
    return float(text)


def fmt(x, decimals):
    """Fixed number of decimals (HSP 18.0, temperatures 28.0)."""
    if x is None:
        return ""
    s = f"{x:.{decimals}f}"
    return s[1:] if s.startswith("-") and float(s) == 0 else s


def fmt_short(x, decimals):
    """At most `decimals` decimals, trailing zeros stripped (1.40 -> 1.4, 11.0 -> 11)."""
    if x is None:
        return ""
    s = fmt(x, decimals)
    if "." in s:
        s = s.rstrip("0").rstrip(".")
    return s


def fmt_sig(x, digits):
    """`digits` significant figures, trailing zeros kept (0.997 -> 0.9970)."""
    decimals = max(0, digits - 1 - int(math.floor(math.log10(abs(x)))))
    return fmt(round(x, decimals), decimals)


def sig(x, digits):
    if x == 0:
        return 0.0
    return round(x, digits - 1 - int(math.floor(math.log10(abs(x)))))


def kelvin_to_c(k):
    return None if k is None else round(k - 273.15, 1)


def parse_formula(formula):
    counts = {}
    for el, n in re.findall(r"([A-Z][a-z]?)(\d*)", formula):
        counts[el] = counts.get(el, 0) + (int(n) if n else 1)
    return counts


def hill(counts):
    keys = sorted(counts)
    if "C" in counts:
        keys = ["C"] + (["H"] if "H" in counts else []) + sorted(k for k in counts if k not in ("C", "H"))
    return "".join(k + (str(counts[k]) if counts[k] != 1 else "") for k in keys)


def molar_mass(formula):
    return sum(ATOMIC_WEIGHTS[el] * n for el, n in parse_formula(formula).items())


# Atoms in each original-UNIFAC subgroup used by the hand-made assignments, to check
# that a manual assignment adds up to the molecular formula.
SUBGROUP_ATOMS = {
    1: "CH3", 2: "CH2", 3: "CH", 4: "C", 6: "C2H2", 7: "C2H2", 8: "C2H", 9: "CH", 10: "C",
    11: "C2H3", 12: "C2H2", 13: "C2H", 14: "OH", 15: "CH4O", 16: "H2O", 21: "C2H3O2", 22: "C2H2O2",
    24: "CH3O", 25: "CH2O", 26: "CHO", 27: "CH2O", 35: "CH2N", 54: "CH3NO2", 55: "CH2NO2", 56: "CHNO2", 69: "Cl", 74: "CF3",
    77: "CO2", 100: "C2H5O2", 101: "C2H4O2",
}


def unifac_formula(groups):
    total = {}
    for gid, cnt in groups:
        for el, n in parse_formula(SUBGROUP_ATOMS[gid]).items():
            total[el] = total.get(el, 0) + n * cnt
    return hill(total)


def parse_groups(text):
    groups = []
    for pair in text.split():
        gid, cnt = pair.split(":")
        groups.append((int(gid), int(cnt)))
    return groups


def ddbst_groups(field):
    nums = [int(x) for x in field.split()]
    return sorted(zip(nums[0::2], nums[1::2]))


def groups_text(groups):
    return " ".join(f"{g}:{c}" for g, c in sorted(groups))


def parse_oel(cell):
    """Ontario cells hold text such as '500 ppm' or '0.05 mg/m3'. Returns (value, unit)."""
    cell = (cell or "").strip()
    if not cell:
        return None, None
    m = re.fullmatch(r"([0-9.]+)\s*(ppm|mg/m3)", cell)
    if not m:
        raise ValueError(f"unparsed Ontario limit: {cell!r}")
    return float(m.group(1)), m.group(2)


def main(argv):
    ref = argv[1] if len(argv) > 1 else os.path.join(REPO, "..", "shared", "reference-data")
    ref = os.path.abspath(ref)
    if not os.path.isdir(ref):
        sys.exit(f"error: reference-data folder not found: {ref}")
    p = lambda name: os.path.join(ref, name)

    # The solvent list: the reference folder's index of working solvents, then any solvent
    # that exists only in manual.csv (added by hand), in the order of that file.
    with open(os.path.join(HERE, "manual.csv"), encoding="utf-8", newline="") as f:
        manual_rows = list(csv.DictReader(f))
    manual = {r["cas"]: r for r in manual_rows}
    if len(manual) != len(manual_rows):
        raise SystemExit("manual.csv: duplicate CAS")
    solvents = [row[:2] for row in read_tsv(p("common-solvents.tsv"))]
    listed = {row[1] for row in solvents}
    solvents += [[r["name"], r["cas"]] for r in manual_rows if r["cas"] not in listed]
    missing = [row[1] for row in solvents if row[1] not in manual]
    if missing:
        raise SystemExit(f"manual.csv has no row for: {', '.join(missing)}")

    alshehri = by_cas(p("alshehri-hansen-solubility-parameters.tsv"))
    schrier = by_cas(p("schrier-hansen-solubility-parameters.tsv"))
    vapour_tables = vapour.load_tables(ref)
    vapour_points = vapour.load_points(os.path.join(HERE, "vapour-points.csv"))
    structures = structure_columns.read_structures()
    hvap = by_cas(p("crc-handbook-heat-of-vaporization.tsv"))
    phys = by_cas(p("physical-constants-of-organic-compounds.csv"))
    iec = by_cas(p("iec-60079-20-1-2010.tsv"))
    nfpa = by_cas(p("nfpa-497-2008.tsv"))
    serat = by_cas(p("dippr-t-flash-serat.csv"))
    ich = {r[1]: r for r in read_tsv(p("ich-q3c-r8.tsv"))}
    proxy_tb = {c: num(phys[c][3]) for c in phys if num(phys[c][3]) is not None}
    # median ΔHvap(298 K)/ΔHvap(Tb) of the CRC table over the listed solvents (acids excluded: they dimerise), for
    # the Hansen-based vapour-pressure estimate (curation/vapour.py, hansen_estimate)
    hvap_ratios = sorted(num(hvap[c][5]) / num(hvap[c][4]) for c in manual if c in hvap and manual[c]["family"] != "acid"
                         and num(hvap[c][4]) and num(hvap[c][5]))
    hvap_ratio = hvap_ratios[len(hvap_ratios) // 2]
    subgroups = {int(r[0]) for r in read_tsv(p("unifac-subgroups.tsv"))}
    with open(os.path.join(HERE, "estimated-hsp.csv"), encoding="utf-8", newline="") as f:
        structure_hsp = {e["cas"]: tuple(float(e[c]) for c in ("dD", "dP", "dH")) for e in csv.DictReader(f) if e["dD"]}

    ids = {}
    for row in read_tsv(p("chemical-identifiers-pubchem-small.tsv"), header=False):
        if len(row) > 6:
            ids.setdefault(row[1], row)
    ddbst = {}
    for row in read_tsv(p("ddbst-unifac-assignments.tsv"), header=False):
        ddbst.setdefault(row[0], row)

    ontario = {}
    for row in read_tsv(p("ontario-exposure-limits.tsv")):
        for cas in row[0].split(";"):
            cas = cas.strip()
            if cas:
                ontario.setdefault(cas, (row, len([c for c in row[0].split(";") if c.strip()]) > 1))

    out_rows = []
    for sol in solvents:
        cas = sol[1]
        m = manual[cas]
        r = {c: "" for c in COLUMNS}
        notes = [m["note"]] if m["note"] else []
        r["name"] = m["name"]
        r["synonyms"] = m["synonyms"]
        r["cas"] = cas
        r["family"] = m["family"]
        structure_columns.fill_families(r, m)

        # identity and formula
        pub = ids.get(cas)
        if pub is not None:
            formula = hill(parse_formula(pub[2]))
            r["src_identity"] = "pubchem"
            if m["formula"] and hill(parse_formula(m["formula"])) != formula:
                raise SystemExit(f"{cas}: manual formula {m['formula']} != PubChem {formula}")
        else:
            formula = hill(parse_formula(m["formula"])) if m["formula"] else ""
            r["src_identity"] = "memory-identity"
        r["formula"] = formula
        structure_columns.fill_smiles(r, cas, pub, structures, notes)
        crc_formula = hvap.get(cas, [None, None, ""])[2]
        if formula and crc_formula and hill(parse_formula(crc_formula)) != formula:
            raise SystemExit(f"{cas}: formula {formula} disagrees with CRC {crc_formula}")

        mm = molar_mass(formula) if formula else None
        if mm is not None:
            r["molar_mass"] = fmt(round(mm, 3), 3)
            r["src_molar_mass"] = "computed"
        elif (rep := (m.get("hsp_component") or "").strip()) and rep in ids:
            # a technical mixture without a formula: the molar mass of its named main component stands for the grade's
            # mean molar mass (an estimate; SOURCES.md, estimate-representative-molar-mass), so that mole fractions,
            # molar volume and evaporation can be computed
            mm = molar_mass(hill(parse_formula(ids[rep][2])))
            r["molar_mass"] = fmt(round(mm, 3), 3)
            r["src_molar_mass"] = REPRESENTATIVE_MM_KEY
            notes.append(f"molar mass: that of the representative main component {manual[rep]['name'] if rep in manual else rep} "
                         f"({rep}), an estimate of the grade's mean molar mass (its components' molar masses differ by "
                         "up to about 15 %)")

        # density (g/cm3)
        rho = None
        if cas in phys and num(phys[cas][4]) is not None:
            rho = sig(num(phys[cas][4]) / 1000.0, 4)
            r["density"] = fmt_sig(rho, 4)
            r["src_density"] = "crc-physical-constants"
        elif (related := related_density(cas, phys, m["density"])) is not None:
            rho, text = related
            r["density"] = fmt_sig(rho, 4)
            r["src_density"] = "crc-physical-constants-related"
            notes.append(text)
        elif m["density"]:
            # kept as written in manual.csv: the number of digits states its precision
            rho = float(m["density"])
            r["density"] = m["density"]
            r["src_density"] = m["src_density"]
        if rho is not None:
            if mm is not None:
                r["molar_volume"] = fmt(round(mm / rho, 2), 2)

        # Hansen parameters (MPa^0.5)
        choice = HSP_CHOICE.get(cas)
        hsp, src = None, ""
        if choice == "schrier" or (choice is None and cas not in alshehri and cas in schrier):
            hsp, src = schrier[cas][1:4], "schrier-2020"
        elif cas in alshehri:
            hsp, src = alshehri[cas][1:4], "alshehri-2022"
        component = (m.get("hsp_component") or "").strip()
        if hsp is None and component:
            # a technical mixture takes the published value of its named main component (SOURCES.md, representative)
            if component not in alshehri:
                raise SystemExit(f"{cas}: representative component {component} has no alshehri row")
            hsp, src = alshehri[component][1:4], "alshehri-2022-representative"
            if component not in manual:
                raise SystemExit(f"{cas}: representative component {component} is not bundled")
            notes.append(f"HSP of the representative main component {manual[component]['name']} ({component}), "
                         "Alshehri et al. 2022: a screening value for the whole grade")
        if hsp is not None:
            vals = [round(float(x) / 1000.0, 1) for x in hsp]
            if m["dD"]:
                notes.append("manual HSP ignored: table value exists")
        elif m["dD"]:
            vals, src = [float(m["dD"]), float(m["dP"]), float(m["dH"])], m["src_hsp"]
        else:
            vals = None
        if vals is not None:
            r["dD"], r["dP"], r["dH"] = (fmt(v, 1) for v in vals)
            r["src_hsp"] = src
        else:
            notes.append(HSP_MISSING_NOTE)

        # boiling and melting point (°C)
        tb = num(phys[cas][3]) if cas in phys else None
        if cas in CRC_TB_REJECTED:
            tb = float(m["boiling_point_c"]) + 273.15
            r["src_boiling_point"] = m["src_boiling_point"]
            notes.append(CRC_TB_REJECTED[cas])
        elif tb is not None:
            r["src_boiling_point"] = "crc-physical-constants"
        elif cas in hvap and num(hvap[cas][3]) is not None:
            tb = num(hvap[cas][3])
            r["src_boiling_point"] = "crc-hvap"
        elif (related := related_boiling_point(cas, phys)) is not None:
            tb, text = related
            r["src_boiling_point"] = "crc-physical-constants-related"
            notes.append(text + recalled_bp_replaced(m))
        elif (from_fit := vapour.boiling_point_from_fit(vapour_tables.get(cas, []))) is not None:
            tb, fit = from_fit
            r["src_boiling_point"] = "tb-from-vapour-fit"
            notes.append(f"boiling point: the temperature at which the {fit.label} fit ({fit.range_text()}) gives "
                         f"101.325 kPa, so the boiling-point check of that fit is no independent test"
                         + recalled_bp_replaced(m))
        elif cas in vapour.SAME_LIQUID_PROXIES and (from_fit := vapour.boiling_point_from_fit(
                vapour_tables.get(vapour.PROXIES[cas][0], []))) is not None:
            # the same liquid under another CAS entry (enantiomer, racemate): its fit gives the boiling point
            tb, fit = from_fit
            other, reason = vapour.PROXIES[cas]
            r["src_boiling_point"] = "tb-from-vapour-fit"
            notes.append(f"boiling point: the temperature at which the {fit.label} fit of {other} ({fit.range_text()}; "
                         f"{reason.split(':')[0]}, the same liquid) gives 101.325 kPa, so the boiling-point check of "
                         f"that fit is no independent test" + recalled_bp_replaced(m))
        elif m.get("boiling_point_c"):
            tb = float(m["boiling_point_c"]) + 273.15
            r["src_boiling_point"] = m["src_boiling_point"]
        r["boiling_point_c"] = fmt(kelvin_to_c(tb), 1)
        tm = num(phys[cas][2]) if cas in phys else None
        if tm is not None:
            r["melting_point_c"] = fmt(kelvin_to_c(tm), 1)
            r["src_melting_point"] = "crc-physical-constants"
        elif cas == "7732-18-5":
            r["melting_point_c"] = "0.0"
            r["src_melting_point"] = "memory-water-properties"

        # flash point (closed cup, °C): IEC, then NFPA, then Serat values with at most two decimals
        def serat_round():
            # README caveat 2: the many-decimal Serat values look computed (median 6 K below IEC);
            # the values with at most two decimals ("round" values) match IEC within about 2 K.
            if cas in serat and serat[cas][2].strip():
                text = serat[cas][2].strip()
                if len(text.partition(".")[2]) <= 2:
                    return float(text)
                notes.append(f"Serat flash point {float(text):.2f} K not used (many decimals, looks computed)")
            return None
        fp, fsrc = None, ""
        if cas in FLASH_FROM_SERAT:
            fp, fsrc = serat_round(), "dippr-serat-2017"
        elif cas in iec and num(iec[cas][2]) is not None:
            fp, fsrc = num(iec[cas][2]), "iec-60079-20-1"
        elif cas in nfpa and num(nfpa[cas][2]) is not None:
            fp, fsrc = num(nfpa[cas][2]), "nfpa-497-2008"
        else:
            fp = serat_round()
            fsrc = "dippr-serat-2017" if fp is not None else ""
        if fp is not None or m.get("flash_point_c"):
            chosen = fp if fp is not None else float(m["flash_point_c"]) + 273.15
            serat_check_note(cas, chosen, fsrc if fp is not None else m["src_flash_point"], iec, nfpa, serat, notes)
        if fp is not None:
            if m.get("flash_point_c"):
                raise SystemExit(f"{cas}: manual flash point given although {fsrc} has one")
            r["flash_point_c"] = fmt(kelvin_to_c(fp), 1)
            r["src_flash_point"] = fsrc
        elif m.get("flash_point_c"):
            # recalled from memory of supplier SDS (closed cup, whole degrees), only where no table has a value
            fp_c = float(m["flash_point_c"])
            check_memory_flash_point(cas, fp_c, kelvin_to_c(tb), m["hazard_statements"], m["note"])
            r["flash_point_c"] = fmt(fp_c, 1)
            r["src_flash_point"] = m["src_flash_point"]
        elif NON_FLAMMABLE_NOTE not in m["note"] and "flash point" not in m["note"]:
            notes.append("flash point unknown (no table value, none recalled with confidence): "
                         "treat as unknown, not as non-flammable; check the SDS")

        # autoignition (°C): IEC, then NFPA
        for table, key in ((iec, "iec-60079-20-1"), (nfpa, "nfpa-497-2008")):
            if cas in table and num(table[cas][3]) is not None:
                r["autoignition_c"] = fmt(kelvin_to_c(num(table[cas][3])), 1)
                r["src_autoignition"] = key
                break

        # flammability limits (vol %): both from the first table with a valid (positive) LFL
        for table, key in ((iec, "iec-60079-20-1"), (nfpa, "nfpa-497-2008")):
            if cas in table:
                lfl, ufl = num(table[cas][4]), num(table[cas][5])
                if lfl is not None and lfl <= 0:
                    notes.append(f"{key} LFL {lfl:g} is not a valid fraction: flammability limits from that table not used")
                    continue
                if lfl is not None:
                    r["lfl_pct"] = fmt_short(lfl * 100, 3)
                    r["ufl_pct"] = fmt_short(ufl * 100, 3) if ufl is not None else ""
                    r["src_flammability_limits"] = key
                    break

        # vapour pressure: one correlation per solvent, checked against the normal boiling point (curation/vapour.py)
        hv_pair = (num(hvap[cas][4]), num(hvap[cas][5])) if cas in hvap else None
        fp_k = float(r["flash_point_c"]) + 273.15 if r["flash_point_c"] else None
        hansen = None
        if r["dD"] and r["molar_volume"] and m["family"] in vapour.HANSEN_FAMILIES:
            hansen = ((float(r["dD"]), float(r["dP"]), float(r["dH"])), float(r["molar_volume"]), hvap_ratio)
        elif not r["dD"] and r["molar_volume"] and m["family"] in vapour.HANSEN_FAMILIES and structure_hsp.get(cas):
            # Hansen parameters that apply_structure_estimates fills later (curation/estimated-hsp.csv)
            hansen = (structure_hsp[cas], float(r["molar_volume"]), hvap_ratio, True)
        r.update(vapour.choose(cas, tb, vapour_tables, notes, proxy_tb, hv_pair, fp_k, vapour_points.get(cas), hansen))

        # enthalpy of vaporisation at 25 °C (kJ/mol)
        if cas in hvap and num(hvap[cas][5]) is not None:
            r["hvap_kj_mol"] = fmt(num(hvap[cas][5]) / 1000.0, 2)
            r["src_hvap"] = "crc-hvap"

        # occupational exposure limits (Ontario)
        if cas in ontario:
            row, group = ontario[cas]
            vals = {}
            for col, idx in (("oel_twa_ppm", 2), ("oel_stel_ppm", 3), ("oel_ceiling_ppm", 4)):
                v, unit = parse_oel(row[idx])
                if v is None:
                    continue
                if unit == "ppm":
                    vals[col] = fmt_short(v, 3)
                elif cas in OEL_CONVERT_MG and mm is not None:
                    vals[col] = fmt_short(sig(v * 24.45 / mm, 3), 3)
                    notes.append(f"OEL {col.split('_')[1].upper()} converted from Ontario {v:g} mg/m3 (ppm = mg/m3 x 24.45 / M)")
            skin = row[5].strip().lower() == "skin"
            if vals or skin:
                r.update(vals)
                r["oel_skin"] = "yes" if skin else ""
                r["oel_jurisdiction"] = "Ontario"
                r["src_oel"] = "ontario-oel"

        # hazard statements and peroxide formers (hand-curated, from memory); the basis says whether the list is the
        # harmonised CLP Annex VI classification or a supplier self-classification (SOURCES.md, hazard statements)
        if m["hazard_statements"]:
            r["hazard_statements"] = m["hazard_statements"]
            basis = m.get("hazard_basis", "").strip()
            if basis not in HAZARD_BASIS_KEYS:
                raise SystemExit(f"{cas}: hazard_basis must be one of {sorted(HAZARD_BASIS_KEYS)}, not {basis!r}")
            r["src_hazard_statements"] = HAZARD_BASIS_KEYS[basis]
            if basis in SELF_BASES:
                notes.append(SELF_CLASSIFICATION_NOTE)
        elif NOT_CLASSIFIED_NOTE in m["note"] and m.get("hazard_basis", "").strip() in HAZARD_BASIS_KEYS:
            # "no statements" is itself the classification here (the note says so and names its basis), not a gap:
            # the source key records it, so the ranking does not treat the liquid as unknown
            r["src_hazard_statements"] = HAZARD_BASIS_KEYS[m["hazard_basis"].strip()]
        if m["peroxide_former"]:
            r["peroxide_former"] = "yes"
            r["src_peroxide_former"] = "memory-peroxide-formers"

        # ICH Q3C(R8) class
        ich_row = ich.get(cas) or ich.get(ICH_ALIASES.get(cas, ""))
        if ich_row is not None and (ich_row[2] != "4" or ICH_WRITE_CLASS_4):
            r["ich_class"] = ich_row[2]
            r["src_ich"] = "ich-q3c-r8" if ich_row[1] in ICH_CONFIRMED_R8 else "ich-q3c-r8-memory"
        elif ich_row is not None:
            notes.append("ICH Q3C(R8) class 4 (no adequate toxicological data; no PDE), from memory of the "
                         "guideline (key ich-q3c-r8-memory): not written in ich_class, which holds classes 1-3")

        # UNIFAC (original) subgroups: DDBST where it lists the solvent, else hand-made
        dd = ddbst.get(pub[6]) if pub is not None else None
        if dd is not None:
            if dd[1].split()[0] == "1":
                r["unifac_groups"] = groups_text(ddbst_groups(dd[2]))
                r["src_unifac"] = "ddbst-unifac"
            if m["unifac"]:
                raise SystemExit(f"{cas}: manual UNIFAC given although DDBST lists the solvent")
        elif m["unifac"]:
            groups = parse_groups(m["unifac"])
            for g, _ in groups:
                if g not in subgroups:
                    raise SystemExit(f"{cas}: unknown UNIFAC subgroup {g}")
            if formula and unifac_formula(groups) != formula:
                raise SystemExit(f"{cas}: UNIFAC groups give {unifac_formula(groups)}, formula is {formula}")
            r["unifac_groups"] = groups_text(groups)
            r["src_unifac"] = "unifac-manual"

        r["note"] = "; ".join(n for n in notes if n)
        out_rows.append(r)

    apply_structure_estimates(out_rows)
    names = [r["name"] for r in out_rows]
    if len(set(names)) != len(names):
        raise SystemExit("duplicate names")
    out = os.path.join(DB_DIR, "solvents.csv")
    with open(out, "w", encoding="utf-8", newline="") as f:
        w = csv.DictWriter(f, fieldnames=COLUMNS, lineterminator="\r\n")
        w.writeheader()
        w.writerows(out_rows)
    print(f"wrote {len(out_rows)} solvents to {os.path.relpath(out, REPO)}")
    update_readme_coverage(out_rows)


ESTIMATE_KEY = "estimate-structure-groups"
COMPONENTS = (("dD", "δD"), ("dP", "δP"), ("dH", "δH"))


DIPOLE_ROUTE = "dipole moment (Hansen–Beerbower)"


def route_name(route, e=None):
    """'group contribution (mean of Mathieu 2018 and …)' -> 'the mean of Mathieu 2018 and …'; one method alone is
    named with 'alone' (StructureEstimator's route strings); δP from a measured dipole moment (the property route,
    Hansen–Beerbower) names the dipole moment and the density with their source keys (row e of estimated-hsp.csv)."""
    if route == DIPOLE_ROUTE:
        if not (e and e["dipole_debye"] and e["src_dipole"] and e["density"] and e["src_density"]):
            raise SystemExit(f"estimated-hsp.csv: {e and e['cas']}: δP from a dipole moment without the dipole and density with their keys")
        return (f"from the dipole moment {e['dipole_debye']} D ({e['src_dipole']}) and the molar volume M/ρ "
                f"(density {e['density']} g/cm³, {e['src_density']}) by Hansen–Beerbower, δP = 37.4·μ/√V")
    prefix = "group contribution ("
    if not (route.startswith(prefix) and route.endswith(")")):
        raise SystemExit(f"estimated-hsp.csv: route {route!r} is not a group route")
    name = route[len(prefix):-1]
    return "the " + name if name.startswith("mean of") else name + " alone"


def estimate_note(e, isomer):
    """The note of a bundled estimated set: the route of each component and that case's expected error (mean absolute
    error and 90th percentile on the published table, docs/methods.md), and the cautions that bear on the set."""
    routes = [route_name(e["route_" + c], e) for c, _ in COMPONENTS]
    if len(set(routes)) == 1:
        how = f"δD, δP and δH each {routes[0]}"
    else:
        how = "; ".join(f"{sym} {r}" for (_, sym), r in zip(COMPONENTS, routes))
    errors = ", ".join(f"{sym} {e['mae_' + c]} (P90 {e['p90_' + c]})" for c, sym in COMPONENTS)
    caution = f"; {e['caution']}" if e["caution"] else ""
    if DIPOLE_ROUTE in (e["route_" + c] for c, _ in COMPONENTS):
        what = f"{isomer} and its measured dipole moment (group contribution, default route, with δP by the property route: "
    else:
        what = f"{isomer} (group contribution, default route: "
    return (f"Hansen parameters estimated from the structure{what}{how}; expected "
            f"error of each component's route, mean absolute and 90th percentile on the published table: {errors} "
            f"MPa½{caution}); no published value found; confirm by a solubility test")


def apply_structure_estimates(rows):
    """Fills the Hansen columns of solvents without a published set from curation/estimated-hsp.csv (generated from
    each SMILES by LibraryEstimatesTest with the default group route of StructureEstimator: per component the mean of
    Mathieu 2018 and Stefanis–Panayiotou where both cover it, else the one that does; δP from the Poling dipole moment
    by Hansen–Beerbower where Poling lists the solvent, as a user's solvent added with --dipole) under the source key
    estimate-structure-groups, the key a user's solvent added by SMILES gets. A published or recalled set always wins;
    a solvent the methods cannot cover, or a mixture without a single structure, keeps empty Hansen columns and its
    note says why."""
    with open(os.path.join(HERE, "estimated-hsp.csv"), encoding="utf-8", newline="") as f:
        estimates = {e["cas"]: e for e in csv.DictReader(f)}
    for r in rows:
        if r["src_hsp"] or HSP_MISSING_NOTE not in r["note"]:
            continue
        e = estimates.get(r["cas"])
        if e is None and r["smiles"]:
            raise SystemExit(f"{r['cas']} {r['name']}: no row in estimated-hsp.csv; regenerate it (DEVELOPERS.md)")
        if e is None:
            why = ("no published Hansen parameters found and no structure-based estimate: a mixture of variable "
                   "composition has no single structure; left out of HSP searches until a value for the grade is entered")
        elif not e["dD"]:
            why = (f"no published Hansen parameters found and no structure-based estimate ({e['caution']}); "
                   "left out of HSP searches")
        else:
            if e["route"] != ESTIMATE_KEY:
                raise SystemExit(f"estimated-hsp.csv: {r['cas']}: route {e['route']!r}, expected {ESTIMATE_KEY}")
            r["dD"], r["dP"], r["dH"] = (fmt(float(e[c]), 1) for c in ("dD", "dP", "dH"))
            r["src_hsp"] = ESTIMATE_KEY
            isomer = ", for the main isomer's structure" if r["src_smiles"] == "memory-structure-main-isomer" else ""
            why = estimate_note(e, isomer)
        r["note"] = r["note"].replace(HSP_MISSING_NOTE, why)

COVERAGE_START = "<!-- coverage:start (generated by curation/curate.py) -->"
COVERAGE_END = "<!-- coverage:end -->"


def coverage_table(rows):
    n = len(rows)
    lines = [f"{n} solvents. Non-empty values per column (source columns omitted):", "",
             "| column | filled | of | % |", "|---|---:|---:|---:|"]
    for col in COLUMNS:
        if col.startswith("src_") or col == "note":
            continue
        filled = sum(1 for r in rows if r[col])
        lines.append(f"| `{col}` | {filled} | {n} | {100.0 * filled / n:.0f} |")
    keys = {}
    for r in rows:
        for col in COLUMNS:
            if col.startswith("src_") and r[col]:
                keys[r[col]] = keys.get(r[col], 0) + 1
    lines += ["", "Values per source key:", "", "| source key | values |", "|---|---:|"]
    lines += [f"| `{k}` | {keys[k]} |" for k in sorted(keys)]
    # Solvents without a stored vapour-pressure correlation, so that the drying and blend flash-point code knows
    # the gaps: with a boiling point and ΔHvap the app can only estimate the vapour pressure at run time
    # (Clausius–Clapeyron), without them it has none.
    for title, want_estimate in (("without a vapour-pressure correlation, vapour pressure only estimated at run time "
                                  "from the boiling point and ΔHvap (Clausius–Clapeyron)", True),
                                 ("without any vapour-pressure data (no correlation, no boiling point "
                                  "and ΔHvap pair)", False)):
        by_family = {}
        for r in rows:
            estimate = bool(r["boiling_point_c"] and r["hvap_kj_mol"])
            if not r["vp_equation"] and estimate == want_estimate:
                by_family.setdefault(r["family"], []).append(r["name"])
        lines += ["", f"Solvents {title}: {sum(map(len, by_family.values()))}", "",
                  "| family | solvents |", "|---|---|"]
        lines += [f"| {fam} | {', '.join(by_family[fam])} |" for fam in sorted(by_family)]
    return "\n".join(lines)


def update_readme_coverage(rows):
    path = os.path.join(DB_DIR, "README.md")
    if not os.path.exists(path):
        return
    with open(path, encoding="utf-8") as f:
        text = f.read()
    start, end = text.find(COVERAGE_START), text.find(COVERAGE_END)
    if start < 0 or end < start:
        return
    text = text[:start + len(COVERAGE_START)] + "\n" + coverage_table(rows) + "\n" + text[end:]
    with open(path, "w", encoding="utf-8") as f:
        f.write(text)


if __name__ == "__main__":
    main(sys.argv)
