#!/usr/bin/python3
"""Reads a quote workbook the desktop application exported, with openpyxl (independent of the
program): the four sheets are there, the Quote sheet names the client, and the grand total the
application showed (e.g. "£1,234.56") is among the Quote sheet's cached values.

  read_quote.py FILE CLIENT TOTAL_TEXT        exit 0 when all hold, 1 with the reason otherwise
"""
import sys
from decimal import Decimal

import openpyxl

path, client, total_text = sys.argv[1], sys.argv[2], sys.argv[3]
book = openpyxl.load_workbook(path, data_only=True)
expected_sheets = ["Quote", "Plans compared", "Findings", "Materials"]
if book.sheetnames != expected_sheets:
    sys.exit(f"sheets {book.sheetnames}, expected {expected_sheets}")
quote = book["Quote"]
texts = [str(c.value) for row in quote.iter_rows() for c in row if c.value is not None]
if not any(client in t for t in texts):
    sys.exit(f"client {client!r} not on the Quote sheet")
total = Decimal(total_text.replace("£", "").replace(",", ""))
numbers = [Decimal(str(c.value)).quantize(Decimal("0.01")) for row in quote.iter_rows() for c in row
           if isinstance(c.value, (int, float))]
if total not in numbers:
    sys.exit(f"total {total} not among the Quote sheet's values")
print(f"read back: {len(texts)} text cells, total {total} found")
