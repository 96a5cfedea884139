#!/usr/bin/python3
"""Reads Mendwright's exported quote workbooks back with an independent reader and checks them.

Run by CTest (see CMakeLists.txt) with Debian's /usr/bin/python3, which has python3-openpyxl.

  check_quote_workbook.py --tool EXPORT_SAMPLE_QUOTE --work DIR [--recalculate]

1. The tool writes an invented sample quote, a 300-line quote with awkward quantities, a
   12-line quote with no findings, and for each a JSON file of the figures the pricing module
   worked out (name, sheet, cell, pence).
2. openpyxl reads them: sheet names, labels, formulas, cached values, formats, print setup.
   Every line and total is also re-worked here from the workbook's own inputs with Python's
   decimal module (half up, as planner/pricing/money.hpp states), independently of the engine.
3. With --recalculate, LibreOffice (headless, own profile with OOXMLRecalcMode 0 = always
   recalculate) recalculates the workbooks, and a copy whose quantity was edited with openpyxl;
   every money figure must equal the engine's own to the penny.
"""
import argparse
import json
import os
import re
import shutil
import subprocess
import sys
import tempfile
from decimal import Decimal, ROUND_HALF_UP

import openpyxl

SHEETS = ["Quote", "Plans compared", "Findings", "Materials"]
PENNY = Decimal("0.01")
LINE_TOTAL = re.compile(r"^(group\[\d+\]|extras)\[\d+\]\.total$")
failures = []


def check(condition, message):
    if not condition:
        failures.append(message)


def pence(value):
    """A cell's pound figure as whole pence; None when it is not a number."""
    if isinstance(value, bool) or not isinstance(value, (int, float)):
        return None
    return int((Decimal(repr(value)) * 100).quantize(Decimal(1), rounding=ROUND_HALF_UP))


def dec(value):
    return Decimal(repr(value))


def half_up(amount):
    return amount.quantize(PENNY, rounding=ROUND_HALF_UP)


def write_samples(tool, work):
    shutil.rmtree(work, ignore_errors=True)
    os.makedirs(work)
    subprocess.run([tool, "--out", work], check=True)
    subprocess.run([tool, "--out", work, "--name", "bulk-300", "--lines", "300"], check=True)
    subprocess.run([tool, "--out", work, "--name", "no-findings", "--lines", "12", "--no-findings"], check=True)
    return [os.path.join(work, n) for n in ("sample-quote", "bulk-300", "no-findings")]


def check_structure(base, expected):
    """Sheet names, formulas, cached values, formats, panes and print setup as written."""
    name = os.path.basename(base)
    formulas = openpyxl.load_workbook(base + ".xlsx")
    cached = openpyxl.load_workbook(base + ".xlsx", data_only=True)
    check(formulas.sheetnames == SHEETS, f"{name}: sheets {formulas.sheetnames}, expected {SHEETS}")

    for figure in expected["figures"]:
        where = f"{name}: {figure['sheet']}!{figure['cell']} ({figure['name']})"
        formula = formulas[figure["sheet"]][figure["cell"]].value
        check(isinstance(formula, str) and formula.startswith("="), f"{where}: expected a formula, got {formula!r}")
        value = cached[figure["sheet"]][figure["cell"]].value
        check(pence(value) == figure["pence"], f"{where}: cached {value!r}, expected {figure['pence']} p")
        number_format = formulas[figure["sheet"]][figure["cell"]].number_format
        check("£" in number_format and "0.00" in number_format, f"{where}: number format {number_format!r}")

    quote = formulas["Quote"]
    check(quote["A1"].value.startswith("Quotation "), f"{name}: Quote!A1 is {quote['A1'].value!r}")
    check(quote.freeze_panes == "A10", f"{name}: Quote panes frozen at {quote.freeze_panes}, expected A10")
    check(int(quote.page_setup.paperSize) == 9, f"{name}: paper size {quote.page_setup.paperSize}, expected 9 (A4)")
    check(quote.sheet_properties.pageSetUpPr.fitToPage, f"{name}: Quote is not set to fit to the page")
    # pageSetup fitToWidth defaults to 1 when absent (ECMA-376 Part 1, 18.3.1.64; from memory);
    # fitToHeight 0 = as many pages tall as needed.
    check(int(quote.page_setup.fitToWidth or 1) == 1, f"{name}: fit to {quote.page_setup.fitToWidth} pages wide")
    check(int(quote.page_setup.fitToHeight) == 0, f"{name}: fit to {quote.page_setup.fitToHeight} pages tall")
    check(quote.oddHeader.left.text and "Quotation" in quote.oddHeader.left.text, f"{name}: no page header")
    check(quote.oddFooter.right.text and "&P" in quote.oddFooter.right.text, f"{name}: no page numbers in footer")
    check(quote.column_dimensions["B"].width >= 40, f"{name}: description column is narrow")
    texts = [c.value for row in quote.iter_rows() for c in row if isinstance(c.value, str)]
    for phrase in ("planning aid", "competent person", "Local regulations", "re-measured"):
        check(any(phrase in t for t in texts), f"{name}: the caution mentioning {phrase!r} is missing")
    # Each priced option says, in the client's words, what it puts right: code, title and place
    # of each finding, never our internal finding ids (common practice: a quote a client can read).
    puts_right = [t for t in texts if t.startswith("Puts right: ")]
    if name == "sample-quote":
        first = next((t for t in puts_right if "RA 310 ohm" in t), "")
        # One finding at one place: code, title and place.
        check("C2 Meter tails 4 m long, concealed, with no protection at the origin (Meter position to consumer unit)"
              in first, f"{name}: the first option's line does not name the tails finding: {first!r}")
        # The same finding at two places: said once, with the count.
        check("C2 No device gives fault protection: RA 310 ohm, no RCD (at 2 places: see Findings)" in first,
              f"{name}: the first option's line does not group the two C2 findings: {first!r}")
    check(not any("@" in t for t in puts_right), f"{name}: a 'Puts right' line shows finding ids: {puts_right!r}")
    # The block above the table, label and figure side by side on each row.
    for cell, label in (("A2", "Client"), ("E2", "Date"), ("A3", "Site"), ("E3", "Valid until"),
                        ("A4", "Plan"), ("E4", "Labour rate per hour"), ("A5", "Alternative"),
                        ("E5", "Markup on materials"), ("E7", "VAT")):
        check(quote[cell].value == label, f"{name}: Quote!{cell} is {quote[cell].value!r}, expected {label!r}")
    check(quote["H2"].is_date and quote["H3"].is_date, f"{name}: the quote and validity dates are not dates")
    # Option headings, "Puts right" lines and notes are merged across the table, one row each, and
    # tall enough for their wrapped text (13.5 points a line, the writer's own rule).
    merged = {str(r) for r in quote.merged_cells.ranges}
    check(all(re.fullmatch(r"A(\d+):I\1", r) for r in merged), f"{name}: a merged range is not one table row: {merged}")
    notes = texts_of_notes(quote)
    check(len(notes) >= 4, f"{name}: only {len(notes)} exclusions and cautions found under their headings")
    for row in quote.iter_rows(min_col=1, max_col=1):
        cell = row[0]
        if isinstance(cell.value, str) and (cell.value.startswith("Puts right: ") or cell.value in notes):
            check(f"A{cell.row}:I{cell.row}" in merged, f"{name}: Quote!A{cell.row} is not merged across the table")
            height = quote.row_dimensions[cell.row].height
            check(height is not None and height >= 13.5, f"{name}: Quote row {cell.row} height {height}")
    options_height = formulas["Plans compared"].row_dimensions[5].height
    check(options_height is not None and options_height >= 13.5, f"{name}: Plans compared options row height {options_height}")
    # The findings filter spans the header and exactly the findings' rows (none: the header only).
    findings = formulas["Findings"]
    rows = [r[0].value for r in findings.iter_rows(min_row=4, min_col=1, max_col=1) if r[0].value is not None]
    listed = [v for v in rows if v != "No findings listed."]
    check(findings.auto_filter.ref == f"A3:F{3 + len(listed)}",
          f"{name}: Findings filter {findings.auto_filter.ref!r} for {len(listed)} findings")
    if name == "no-findings":
        check(rows == ["No findings listed."], f"{name}: Findings rows {rows!r}")
    else:
        check(len(listed) == 6 and "No findings listed." not in rows, f"{name}: Findings rows {rows!r}")
    for sheet in SHEETS[1:]:
        check(formulas[sheet].freeze_panes is not None, f"{name}: {sheet} has no frozen header")
        check(int(formulas[sheet].page_setup.paperSize) == 9, f"{name}: {sheet} is not set to A4")

    by_name = {f["name"]: f for f in expected["figures"]}
    first = by_name["group[0][0].materials"]["cell"][1:]
    check(quote["F" + first].value == f"=ROUND(C{first}*E{first},2)", f"{name}: materials formula {quote['F' + first].value!r}")
    check(quote["H" + first].value == f"=ROUND(C{first}*G{first}*$H$4,2)", f"{name}: labour formula {quote['H' + first].value!r}")
    check(quote["I" + first].value == f"=F{first}+H{first}", f"{name}: line total formula {quote['I' + first].value!r}")
    check(formulas["Plans compared"][by_name["plans.chosen.total"]["cell"]].value
          == "='Quote'!" + by_name["total"]["cell"], f"{name}: chosen-plan price does not refer to the quote total")
    return cached


def texts_of_notes(quote):
    """The paragraphs under "Not included" and "Please note": the rows after those headings."""
    notes, inside = set(), False
    for row in quote.iter_rows(min_col=1, max_col=1):
        value = row[0].value
        if value in ("Not included", "Please note"):
            inside = True
        elif value is None:
            inside = False
        elif inside:
            notes.add(value)
    return notes


def rework_independently(base, expected, book):
    """The whole quote re-worked from the workbook's own inputs with decimal arithmetic."""
    name = os.path.basename(base)
    quote = book["Quote"]
    rate, markup, contingency, vat = (dec(quote[c].value) for c in ("H4", "H5", "H6", "H7"))
    contingency_is_percent = "%" in quote["E6"].value
    ours = {}
    materials = labour = Decimal(0)
    groups = {}
    for figure in expected["figures"]:
        line = LINE_TOTAL.match(figure["name"])   # "group[0][3].total", "extras[1].total"
        if not line:
            continue
        row = figure["cell"][1:]
        quantity, unit_cost, hours = dec(quote["C" + row].value), dec(quote["E" + row].value), dec(quote["G" + row].value)
        line_materials = half_up(quantity * unit_cost)            # R6
        line_labour = half_up(quantity * hours * rate)            # R6
        prefix = figure["name"][: -len(".total")]
        ours[prefix + ".materials"] = line_materials
        ours[prefix + ".labour"] = line_labour
        ours[figure["name"]] = line_materials + line_labour
        materials += line_materials
        labour += line_labour
        groups[line.group(1)] = groups.get(line.group(1), Decimal(0)) + line_materials + line_labour
    for group, amount in groups.items():
        ours[group + ".total"] = amount                          # R7
    subtotal = materials + labour
    ours.update(materials=materials, labour=labour, subtotal=subtotal)
    ours["contingency"] = half_up(subtotal * contingency) if contingency_is_percent else contingency  # R8
    ours["markup"] = half_up(materials * markup)                 # R8
    ours["net"] = subtotal + ours["contingency"] + ours["markup"]
    ours["vat"] = half_up(ours["net"] * vat)                     # R8
    ours["total"] = ours["net"] + ours["vat"]
    ours["plans.chosen.total"] = ours["total"]
    checked = 0
    for figure in expected["figures"]:
        if figure["name"] in ours:
            mine = int(ours[figure["name"]] * 100)
            check(mine == figure["pence"], f"{name}: {figure['name']} re-worked here as {mine} p, engine says {figure['pence']} p")
            checked += 1
    check(checked >= 8, f"{name}: only {checked} figures re-worked")


def recalculate(paths, work):
    """LibreOffice headless, own profile, recalculating on load (TOOLCHAIN.md pitfall 9)."""
    profile = tempfile.mkdtemp(prefix="mendwright-lo-profile-", dir=work)
    user = os.path.join(profile, "user")
    os.makedirs(user)
    with open(os.path.join(user, "registrymodifications.xcu"), "w", encoding="utf-8") as out:
        out.write('<?xml version="1.0" encoding="UTF-8"?>\n'
                  '<oor:items xmlns:oor="http://openoffice.org/2001/registry" '
                  'xmlns:xs="http://www.w3.org/2001/XMLSchema" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">\n'
                  '<item oor:path="/org.openoffice.Office.Calc/Formula/Load">'
                  '<prop oor:name="OOXMLRecalcMode" oor:op="fuse"><value>0</value></prop></item>\n'
                  '</oor:items>\n')
    out_dir = os.path.join(work, "recalculated")
    os.makedirs(out_dir, exist_ok=True)
    env = dict(os.environ, HOME=profile)
    subprocess.run(["soffice", "-env:UserInstallation=file://" + profile, "--headless", "--norestore",
                    "--convert-to", "xlsx", "--outdir", out_dir] + paths,
                   check=True, env=env, stdout=subprocess.DEVNULL, timeout=150)
    return {os.path.basename(p): os.path.join(out_dir, os.path.basename(p)) for p in paths}


def compare_recalculated(path, figures, label):
    book = openpyxl.load_workbook(path, data_only=True)
    check(book.sheetnames == SHEETS, f"{label}: sheets after recalculation {book.sheetnames}")
    for figure in figures:
        value = book[figure["sheet"]][figure["cell"]].value
        check(pence(value) == figure["pence"],
              f"{label}: {figure['sheet']}!{figure['cell']} ({figure['name']}) recalculated to {value!r}, "
              f"engine says {figure['pence']} p")
    return len(figures)


def main():
    parser = argparse.ArgumentParser()
    parser.add_argument("--tool", required=True)
    parser.add_argument("--work", required=True)
    parser.add_argument("--recalculate", action="store_true")
    args = parser.parse_args()

    bases = write_samples(args.tool, args.work)
    expected = {}
    for base in bases:
        with open(base + ".expected.json", encoding="utf-8") as f:
            expected[base] = json.load(f)
        cached = check_structure(base, expected[base])
        rework_independently(base, expected[base], cached)

    if args.recalculate:
        # A copy with one quantity changed by another program: it carries no cached values for
        # the formulas, so only a real recalculation can give the engine's edited figures.
        sample = bases[0]
        edit = expected[sample]["edit"]
        edited_path = sample + ".edited.xlsx"
        book = openpyxl.load_workbook(sample + ".xlsx")
        book[edit["sheet"]][edit["cell"]].value = edit["quantity"]
        book.save(edited_path)
        paths = [b + ".xlsx" for b in bases] + [edited_path]
        out = recalculate(paths, args.work)
        count = 0
        for base in bases:
            count += compare_recalculated(out[os.path.basename(base) + ".xlsx"], expected[base]["figures"],
                                          os.path.basename(base) + " recalculated")
        count += compare_recalculated(out[os.path.basename(edited_path)], edit["figures"], "edited copy recalculated")
        print(f"LibreOffice recalculation: {count} figures compared")

    if failures:
        for failure in failures[:40]:
            print("FAIL:", failure)
        print(f"{len(failures)} failure(s)")
        return 1
    print("all checks passed")
    return 0


if __name__ == "__main__":
    sys.exit(main())
