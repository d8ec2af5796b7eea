#!/usr/bin/env python3
"""Compares the hazard-statement lists of manual.csv with a copy of CLP Annex VI, Table 3.

Regulation (EC) No 1272/2008 (CLP), Annex VI, Part 3, Table 3 lists the harmonised classification of each
listed substance: its hazard class and category codes and hazard statement codes. The table covers only the
harmonised hazard classes; a supplier or REACH registrant classifies the other classes itself and may add
statements beyond the entry (Article 4(3) CLP), so a supplier's SDS can carry more than Annex VI.

Usage:
    python3 solvent-db/curation/check_annex_vi.py TABLE [--apply]

TABLE is a copy of Table 3 that this repository does not ship, either
  * JSON with an "entries" list whose items carry "index_no", "name", "cas" (a list; "[n]" suffixes and
    several numbers in one string are allowed) and "h_codes" (the layout of the table3.json built from the
    consolidated act, e.g. 02008R1272-20260701), or
  * TSV with the columns index_no, cas (";"-separated), name, h_codes (space-separated) and optionally
    minimum (the codes of classes the entry marks with "*"), for entries transcribed from such a copy.
    solvent-db/curation/annex-vi-table3-excerpt.tsv is that transcription for the entries compared so far
    (only those; the full table is not shipped).
An entry's class marked "*" is a minimum classification (Annex VI, 1.2.1): a recalled more severe category of
it (H330 beside the entry's H332) is kept and named in the note rather than replaced.
Only the entries the copy holds are compared: a solvent absent from a partial copy is reported as
"not in this copy", never as "not listed".

Without --apply the script prints one line per solvent with an entry: confirmed, or the changes. With --apply
it rewrites manual.csv for solvents whose basis is `harmonised`, `self` or `harmonised-checked`, and for any
solvent whose list contradicts the entry (another category of a class the entry sets):
  * the statements of the entry are written, a recalled statement of another category of the same hazard
    class is replaced by the entry's (e.g. H410 by H412, H332 by H331);
  * recalled statements of classes the entry does not set are kept (a supplier's or registrant's addition
    is plausible and the safer default) and named in the note, which tells the user to check the SDS;
  * hazard_basis becomes `harmonised-checked` (key clp-annex-vi-checked in SOURCES.md).
"""
import csv
import json
import re
import sys
from pathlib import Path

HERE = Path(__file__).resolve().parent
MANUAL = HERE / "manual.csv"
REWRITTEN_BASES = {"harmonised", "self", "harmonised-checked"}
CAS_RE = re.compile(r"\b\d{2,7}-\d{2}-\d\b")
H_RE = re.compile(r"^H\d{3}[A-Za-z]*$")
NOTE_MARK = "hazard statements checked against CLP Annex VI"


def hazard_class(code):
    """The hazard class (route for acute toxicity) an H-code belongs to; categories of one class share it."""
    n = int(code[1:4])
    if 224 <= n <= 226:
        return "flammable liquid"
    groups = {(300, 302): "acute oral", (310, 312): "acute dermal", (330, 332): "acute inhalation",
              (340, 341): "germ cell mutagenicity", (350, 351): "carcinogenicity",
              (360, 361): "reproductive toxicity", (370, 371): "STOT SE 1-2", (372, 373): "STOT RE",
              (410, 413): "aquatic chronic"}
    for (lo, hi), name in groups.items():
        if lo <= n <= hi:
            return name
    if n in (314, 315):
        return "skin"
    if n in (318, 319):
        return "eye"
    return code  # a class of its own (H304, H317, H335, H336, H400, H420 ...)


def minimum_codes(hazard_classes, codes):
    """The codes of classes the entry marks with '*' (a minimum classification, CLP Annex VI 1.2.1): a supplier
    with data for a more severe category must use it. Acute toxicity and STOT RE are the classes so marked."""
    starred = " ".join(c for c in hazard_classes if "*" in c)
    families = set()
    if "Acute Tox" in starred:
        families |= {"acute oral", "acute dermal", "acute inhalation"}
    if "STOT RE" in starred:
        families.add("STOT RE")
    return [c for c in codes if hazard_class(c) in families]


def load_table(path):
    """Maps CAS number -> (index_no, name, [h_codes], [minimum-classification codes]) from a copy of Table 3."""
    text = Path(path).read_text(encoding="utf-8")
    by_cas = {}
    if path.endswith(".json"):
        for e in json.loads(text)["entries"]:
            codes = [c for c in e.get("h_codes", []) if H_RE.match(c)]
            minimum = minimum_codes(e.get("hazard_classes", []), codes)
            for field in e.get("cas", []):
                for cas in CAS_RE.findall(field):
                    by_cas.setdefault(cas, (e["index_no"], e["name"], codes, minimum))
    else:
        rows = csv.DictReader(text.splitlines(), delimiter="\t")
        for r in rows:
            codes = [c for c in r["h_codes"].split() if H_RE.match(c)]
            minimum = (r.get("minimum") or "").split()
            for cas in r["cas"].split(";"):
                by_cas.setdefault(cas.strip(), (r["index_no"], r["name"], codes, minimum))
    return by_cas


def compare(recalled, entry, minimum=()):
    """Returns (new list, added, replaced [(old, new)], kept extras, kept more severe [(recalled, entry)])."""
    entry_classes = {hazard_class(c): c for c in entry}
    if "H314" in entry:  # skin corrosion 1 implies serious eye damage; H318 is not labelled beside H314
        entry_classes.setdefault("eye", "H314")
    added = [c for c in entry if c not in recalled]
    replaced, extras, severer = [], [], []
    for c in recalled:
        if c in entry:
            continue
        cls = hazard_class(c)
        if cls in entry_classes:
            e = entry_classes[cls]
            if e in minimum and int(c[1:4]) < int(e[1:4]):
                severer.append((c, e))  # a minimum classification: the recalled more severe category may be right
            else:
                replaced.append((c, e))
        else:
            extras.append(c)
    dropped = {e for _, e in severer}
    new = sorted((set(entry) - dropped) | set(extras) | {c for c, _ in severer}, key=lambda c: (int(c[1:4]), c))
    return new, [c for c in added if c not in {n for _, n in replaced} | dropped], replaced, extras, severer


def note_text(index_no, added, replaced, extras, severer=()):
    parts = [f"{NOTE_MARK} (index {index_no}, key clp-annex-vi-checked, read from a stored copy)"]
    if added or replaced:
        fix = [f"added {' '.join(added)}"] if added else []
        fix += [f"{old} replaced by {new}" for old, new in replaced]
        parts.append("corrected: " + ", ".join(fix))
    else:
        parts.append("confirmed")
    for c, e in severer:
        parts.append(f"{c} kept instead of the entry's {e}: the entry is a minimum classification (marked *), "
                     f"suppliers classify more severely where their data say so, check the SDS")
    if extras:
        parts.append(f"{' '.join(extras)} not in the harmonised entry: kept as recalled from memory of suppliers' "
                     f"classifications (Annex VI lists only the harmonised classes; suppliers and registrants "
                     f"classify the others), check the SDS")
    return "; ".join(parts)


def main(argv):
    if len(argv) < 2 or argv[1].startswith("-"):
        print(__doc__.strip().splitlines()[0])
        print("usage: check_annex_vi.py TABLE [--apply]", file=sys.stderr)
        return 2
    table = load_table(argv[1])
    apply = "--apply" in argv[2:]
    with MANUAL.open(newline="", encoding="utf-8") as f:
        reader = csv.DictReader(f)
        fields = reader.fieldnames
        rows = list(reader)
    counts = {"confirmed": 0, "corrected": 0, "reported only": 0}
    for r in rows:
        hit = table.get(r["cas"])
        if hit is None:
            continue
        index_no, _, entry, minimum = hit
        recalled = r["hazard_statements"].split()
        basis = r["hazard_basis"].strip()
        new, added, replaced, extras, severer = compare(recalled, entry, minimum)
        verdict = "corrected" if (added or replaced) else "confirmed"
        print(f"{r['cas']:>11} {r['name'][:34]:34} {basis:18} {index_no}  {verdict}"
              + (f"  +{' '.join(added)}" if added else "")
              + "".join(f"  {o}->{n}" for o, n in replaced)
              + "".join(f"  {c} kept (minimum {e})" for c, e in severer)
              + (f"  extra {' '.join(extras)}" if extras else ""))
        if basis not in REWRITTEN_BASES and not replaced:
            counts["reported only"] += 1
            continue
        counts[verdict] += 1
        if apply and not (added or replaced) and NOTE_MARK in r["note"]:
            continue  # checked before: keep its note, which may say what was corrected then
        if apply:
            r["hazard_statements"] = " ".join(new)
            r["hazard_basis"] = "harmonised-checked"
            kept = [p for p in r["note"].split("; ") if p and not p.startswith(NOTE_MARK)] if r["note"] else []
            r["note"] = "; ".join(kept + [note_text(index_no, added, replaced, extras, severer)])
    print(f"{sum(1 for r in rows if r['cas'] in table)} solvents with an entry in this copy: "
          + ", ".join(f"{v} {k}" for k, v in counts.items()))
    if apply:
        with MANUAL.open("w", newline="", encoding="utf-8") as f:
            w = csv.DictWriter(f, fieldnames=fields, lineterminator="\n")
            w.writeheader()
            w.writerows(rows)
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
