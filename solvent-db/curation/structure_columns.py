"""SMILES and family columns of solvents.csv (kept apart from curate.py so that edits there merge cleanly).

SMILES: from curation/structures.csv (columns cas, smiles, src_smiles; filled by the structure curation) where it
has the CAS, else from the PubChem identifiers table (field 5 of chemical-identifiers-pubchem-small.tsv).
Families: the `families` column of manual.csv (`;`-separated, primary family first) when it exists, else the
single `family`.
"""
import csv
import os

HERE = os.path.dirname(os.path.abspath(__file__))
STRUCTURES = os.path.join(HERE, "structures.csv")


def read_structures(path=STRUCTURES):
    """cas -> (smiles, source key) from structures.csv; an absent file is an empty table."""
    if not os.path.exists(path):
        return {}
    out = {}
    with open(path, encoding="utf-8", newline="") as f:
        for row in csv.DictReader(f):
            cas = (row.get("cas") or "").strip()
            smiles = (row.get("smiles") or "").strip()
            if not cas or not smiles:
                continue
            src = (row.get("src_smiles") or "").strip()
            if not src:
                raise SystemExit(f"structures.csv: {cas}: a SMILES needs its src_smiles key")
            if cas in out:
                raise SystemExit(f"structures.csv: duplicate CAS {cas}")
            out[cas] = (smiles, src)
    return out


def fill_smiles(r, cas, pubchem_row, structures, notes):
    """Sets r['smiles'] and r['src_smiles']: structures.csv first (a curated choice), else PubChem."""
    pub = pubchem_row[4].strip() if pubchem_row is not None and len(pubchem_row) > 4 else ""
    if cas in structures:
        smiles, src = structures[cas]
        r["smiles"], r["src_smiles"] = smiles, src
        if pub and pub != smiles:
            notes.append(f"SMILES from curation/structures.csv ({src}) instead of PubChem's {pub}")
    elif pub:
        r["smiles"], r["src_smiles"] = pub, "pubchem"


def fill_families(r, manual_row):
    """Sets r['families']: manual.csv's `families` when given (primary family put first), else the family alone."""
    primary = manual_row["family"].strip()
    given = [f.strip() for f in (manual_row.get("families") or "").split(";") if f.strip()]
    families = [primary] + [f for f in given if f != primary] if primary else given
    seen = []
    for f in families:
        if f not in seen:
            seen.append(f)
    r["families"] = ";".join(seen)
