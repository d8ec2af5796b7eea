#!/usr/bin/env python3
"""Builds Cohesa's UNIFAC parameter tables (our CSV format) from the published tables.

Input: the tab-separated UNIFAC tables in ../shared/reference-data (see its README; the numbers are
those of the publications cited below). Output: four CSV files under
src/main/resources/org/cohesa/core/activity/, each with '#' citation lines, a header row and
our own column names. Run from the repository root:

    python3 docs/tools/build_unifac_tables.py [REFERENCE_DIR]

Curation decisions (also written into the output headers):
- LLE subgroup 30 (FCH2O): the source table gives R = 9183, an obvious lost decimal point; we use
  R = 0.9183, the value of the same ring CH2O group (THF) in the original table.
"""
import csv
import os
import sys

REPO = os.path.dirname(os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
OUT = os.path.join(REPO, "src", "main", "resources", "org", "cohesa", "core", "activity")

VLE_CITE = [
    "Original UNIFAC (vapour-liquid parameter set).",
    "Method: Fredenslund A., Jones R. L., Prausnitz J. M., AIChE J. 21 (1975) 1086-1099.",
    "Group volumes R and areas Q as tabulated with: Hansen H. K., Rasmussen P., Fredenslund A., Schiller M.,",
    "Gmehling J., Ind. Eng. Chem. Res. 30 (1991) 2352-2355; Wittig R., Lohmann J., Gmehling J., Ind. Eng. Chem. Res. 42 (2003) 183-188.",
]
LLE_CITE = [
    "UNIFAC liquid-liquid parameter set.",
    "Magnussen T., Rasmussen P., Fredenslund A., Ind. Eng. Chem. Process Des. Dev. 20 (1981) 331-339.",
]
GENERATED = "Built by docs/tools/build_unifac_tables.py from the published tables; do not edit by hand."


def read_tsv(path, header):
    with open(path, newline="", encoding="utf-8") as f:
        rows = list(csv.reader(f, delimiter="\t"))
    return rows[1:] if header else rows


def write(name, cite, extra, header, rows):
    with open(os.path.join(OUT, name), "w", newline="", encoding="utf-8") as f:
        for line in cite + extra + [GENERATED]:
            f.write("# " + line + "\n")
        w = csv.writer(f, lineterminator="\n")
        w.writerow(header)
        w.writerows(rows)


def subgroups(path, fixes):
    out = []
    for sid, name, main, main_name, r, q in read_tsv(path, True):
        r = fixes.get(int(sid), r)
        out.append([int(sid), name, int(main), main_name, float(r), float(q)])
    return sorted(out)


def interactions(path):
    out = []
    for m, n, a in read_tsv(path, False):
        out.append([int(m), int(n), float(a)])
    return sorted(out)


def main():
    ref = sys.argv[1] if len(sys.argv) > 1 else os.path.join(REPO, "..", "shared", "reference-data")
    sg_header = ["subgroup", "name", "main_group", "main_group_name", "r", "q"]
    ia_header = ["m", "n", "a_mn_k"]
    write("unifac-vle-subgroups.csv", VLE_CITE, ["R: van der Waals group volume, Q: group surface area (both dimensionless)."],
          sg_header, subgroups(os.path.join(ref, "unifac-subgroups.tsv"), {}))
    write("unifac-vle-interactions.csv", VLE_CITE,
          ["a_mn in K between main groups m and n; Psi_mn = exp(-a_mn/T); a pair not listed has no published value."],
          ia_header, interactions(os.path.join(ref, "unifac-interaction-parameters.tsv")))
    write("unifac-lle-subgroups.csv", LLE_CITE,
          ["R, Q dimensionless. Methanol is CH3 + OH in this set; P1 = 1-propanol, P2 = 2-propanol as whole molecules.",
           "Curation: subgroup 30 (FCH2O) R = 0.9183 (source table prints 9183, a lost decimal point; 0.9183 is the ring CH2O value)."],
          sg_header, subgroups(os.path.join(ref, "unifac-lle-subgroups.tsv"), {30: "0.9183"}))
    write("unifac-lle-interactions.csv", LLE_CITE,
          ["a_mn in K between main groups m and n (numbering of this set); a pair not listed has no published value."],
          ia_header, interactions(os.path.join(ref, "unifac-lle-interaction-parameters.tsv")))


if __name__ == "__main__":
    main()
