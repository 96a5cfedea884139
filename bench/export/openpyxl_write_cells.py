#!/usr/bin/python3
"""The comparison side of the export benchmark: python3-openpyxl writing the same cells as
Mendwright's export (values, formulas, number formats, bold, wrap, widths, frozen panes,
merged ranges, A4 fit-to-width print setup). Usage: openpyxl_write_cells.py CELLS.json OUT.xlsx"""
import datetime
import json
import sys

import openpyxl
from openpyxl.styles import Alignment, Font

sheets = json.load(open(sys.argv[1]))
book = openpyxl.Workbook()
book.remove(book.active)
bold = Font(bold=True)
wrap = Alignment(wrap_text=True, vertical="top")
for sheet in sheets:
    ws = book.create_sheet(sheet["name"])
    for row, col, value, number_format, is_bold, is_wrapped in sheet["cells"]:
        if isinstance(value, str) and len(value) == 19 and value[4] == "-" and value[10] == "T":
            value = datetime.datetime.fromisoformat(value)
        c = ws.cell(row=row, column=col, value=value)
        if number_format != "General":
            c.number_format = number_format
        if is_bold:
            c.font = bold
        if is_wrapped:
            c.alignment = wrap
    for letter, width in sheet["widths"].items():
        ws.column_dimensions[letter].width = width
    ws.freeze_panes = sheet["freeze"]
    for merged in sheet["merged"]:
        ws.merge_cells(merged)
    ws.page_setup.paperSize = 9
    ws.page_setup.fitToWidth = 1
    ws.page_setup.fitToHeight = 0
    ws.sheet_properties.pageSetUpPr.fitToPage = True
book.save(sys.argv[2])
