#!/usr/bin/env python3
"""Writes rg-65-slice/: every line of the raw Brown, MASC and State of the Union text that holds a word of RG-65.

Usage, from this folder: python3 make-rg-65-slice.py ../../../../shared/datasets/raw
Files that are not valid UTF-8 are left out whole. See README.md for what the slice is for.
"""
import csv
import glob
import os
import re
import sys

raw = sys.argv[1]
words = set()
with open("rg-65.csv", encoding="utf-8") as f:
    for row in csv.DictReader(f):
        words.add(row["word1"].lower())
        words.add(row["word2"].lower())
pattern = re.compile(r"\b(" + "|".join(sorted(words)) + r")(s|es)?\b", re.I)
os.makedirs("rg-65-slice", exist_ok=True)
for corpus in ["brown", "masc", "addresses"]:
    kept = []
    for name in sorted(glob.glob(os.path.join(raw, corpus, "*.txt"))):
        try:
            with open(name, encoding="utf-8") as f:
                lines = f.read().split("\n")
        except UnicodeDecodeError:
            continue
        kept += [line.strip() for line in lines if pattern.search(line)]
    with open(os.path.join("rg-65-slice", corpus + ".txt"), "w", encoding="utf-8") as out:
        out.write("\n".join(kept) + "\n")
    print(corpus, len(kept))
