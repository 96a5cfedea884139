#!/usr/bin/python3
"""Lists every cell of a workbook (value or formula, number format, bold), its column widths,
frozen panes and merged ranges as JSON, so openpyxl_write_cells.py can write the very same cells.
Not timed: run once before the benchmark.  Usage: dump_workbook_cells.py IN.xlsx OUT.json"""
import json
import sys

import openpyxl

book = openpyxl.load_workbook(sys.argv[1])
sheets = []
for ws in book.worksheets:
    cells = []
    for row in ws.iter_rows():
        for c in row:
            if c.value is None:
                continue
            value = c.value.isoformat() if hasattr(c.value, "isoformat") else c.value
            cells.append([c.row, c.column, value, c.number_format, bool(c.font.b), bool(c.alignment.wrap_text)])
    sheets.append({
        "name": ws.title,
        "cells": cells,
        "widths": {k: v.width for k, v in ws.column_dimensions.items()},
        "freeze": ws.freeze_panes,
        "merged": [str(r) for r in ws.merged_cells.ranges],
    })
json.dump(sheets, open(sys.argv[2], "w"))
