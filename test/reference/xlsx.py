"""Workbooks from a second, independent writer (openpyxl, Debian python3-openpyxl) for the XLSX reader.

    /usr/bin/python3 test/reference/xlsx.py

Writes test/fixtures/ingest/openpyxl.json (the writer's version), openpyxl-1900.xlsx and openpyxl-1904.xlsx (the same data in the 1900 and the 1904 date
system: two title rows, the header on row 3, real date cells, numbers with 16 significant digits, a long sheet with
timestamps) and test/fixtures/ingest/openpyxl.csv and openpyxl-long.csv (the same data as CSV, numbers written by
repr, which reads back to the same double). test/ingest/xlsx.test.ts reads both and compares.
"""
import csv
import datetime
import math
import os

import openpyxl
from openpyxl.utils.datetime import CALENDAR_MAC_1904

here = os.path.join(os.path.dirname(__file__), "..", "fixtures", "ingest")
months = [datetime.date(2024 + (m // 12), m % 12 + 1, 1) for m in range(30)]
# openpyxl writes numbers with "%.16g" (openpyxl/compat/strings.py), so the data are doubles that 16 significant
# digits give back exactly; the CSV holds the same doubles.
budget = [float("%.16g" % (1000 * (1 + 0.1 * math.sin(m / 1.9)) + m / 7)) for m in range(30)]
stock = [round(500 + 37.25 * math.cos(m / 3.1), 2) for m in range(30)]
long_rows = []
for d in range(75):
    at = datetime.datetime(2024, 1, 1, 8, 30) + datetime.timedelta(days=d, hours=(d * 5) % 13)
    for key in ("North", "South"):
        long_rows.append((at, key, float("%.16g" % ((d + 1) * (1.5 if key == "North" else 2.25) / 3))))


def workbook(epoch):
    wb = openpyxl.Workbook()
    if epoch is not None:
        wb.epoch = epoch
    ws = wb.active
    ws.title = "Budget"
    ws.append(["Tarnwick Outdoor Co. budget"])
    ws.append(["EUR k, by month"])
    ws.append(["Month", "Budget", "Stock"])
    for m, b, s in zip(months, budget, stock):
        ws.append([m, b, s])
    ws.cell(row=4, column=1).number_format = "yyyy-mm-dd"
    lw = wb.create_sheet("Long")
    lw.append(["at", "shop", "amount"])
    for row in long_rows:
        lw.append(list(row))
    return wb


workbook(None).save(os.path.join(here, "openpyxl-1900.xlsx"))
workbook(CALENDAR_MAC_1904).save(os.path.join(here, "openpyxl-1904.xlsx"))
with open(os.path.join(here, "openpyxl.csv"), "w", newline="") as f:
    w = csv.writer(f, lineterminator="\n")
    w.writerow(["Month", "Budget", "Stock"])
    for m, b, s in zip(months, budget, stock):
        w.writerow([m.isoformat(), repr(b), repr(s)])
with open(os.path.join(here, "openpyxl-long.csv"), "w", newline="") as f:
    w = csv.writer(f, lineterminator="\n")
    w.writerow(["at", "shop", "amount"])
    for at, key, v in long_rows:
        w.writerow([at.isoformat(sep=" "), key, repr(v)])
print("openpyxl", openpyxl.__version__)
with open(os.path.join(here, "openpyxl.json"), "w") as f:
    f.write('{"writer": "openpyxl %s (python3-openpyxl, Debian)", "script": "test/reference/xlsx.py"}\n' % openpyxl.__version__)
