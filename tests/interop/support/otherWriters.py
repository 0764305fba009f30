"""Writes small workbooks the way openpyxl (a general-purpose Python library) does:
a chart, a comment, a table, a sheet name over Excel's 31 characters, a macro-enabled
package. Each holds the same three DRIFT formulas with no cached values.
Usage: otherWriters.py <folder>"""
import sys, os, zipfile
import openpyxl
from openpyxl.chart import LineChart, Reference
from openpyxl.comments import Comment
from openpyxl.worksheet.table import Table

folder = sys.argv[1]

def base():
    wb = openpyxl.Workbook()
    ws = wb.active
    ws.title = 'Data'
    ws.append(['Doping', 'Rho'])
    for i, n in enumerate([1e15, 1e16, 1e17], start=2):
        ws.cell(row=i, column=1, value=n)
        ws.cell(row=i, column=2, value=f'=_xldudf_DRIFT_RESISTIVITY(A{i},"B")')
    return wb, ws

wb, ws = base()
chart = LineChart()
chart.add_data(Reference(ws, min_col=2, min_row=1, max_row=4), titles_from_data=True)
ws.add_chart(chart, 'D2')
wb.save(os.path.join(folder, 'chart.xlsx'))

wb, ws = base()
ws['A1'].comment = Comment('doping in cm-3', 'QA')
wb.save(os.path.join(folder, 'comment.xlsx'))

wb, ws = base()
ws.add_table(Table(displayName='Lots', ref='A1:B4'))
wb.save(os.path.join(folder, 'table.xlsx'))

import warnings
with warnings.catch_warnings():
    warnings.simplefilter('ignore')  # openpyxl itself warns that Excel will not accept the name
    wb, ws = base()
    ws.title = 'A sheet name that is longer than thirty-one'
    wb.save(os.path.join(folder, 'longname.xlsx'))

# A macro-enabled package: the same workbook with a vbaProject.bin part (its content is
# not executed by anyone here; a few bytes stand for it).
wb, ws = base()
plain = os.path.join(folder, 'plain.xlsx')
wb.save(plain)
with zipfile.ZipFile(plain) as src, zipfile.ZipFile(os.path.join(folder, 'macros.xlsm'), 'w', zipfile.ZIP_DEFLATED) as dst:
    for item in src.infolist():
        dst.writestr(item, src.read(item.filename))
    dst.writestr('xl/vbaProject.bin', b'\xd0\xcf\x11\xe0 stand-in')
os.remove(plain)
