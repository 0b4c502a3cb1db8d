"""Shared by the spreadsheet test runners (tests/calc, tests/calc_robust,
tests/workbooks): a tally of checks with their failures, the validation log
line format of tests/unit/th_test.hpp, and reading LibreOffice's CSV export.
"""
from __future__ import annotations

import csv
import math
import os
import pathlib


class Report:
    """Counts checks and keeps the failures; record() appends one line for
    docs/validation.md when TH_VALIDATION_LOG is set (same format as
    th_test::record in tests/unit/th_test.hpp)."""

    def __init__(self):
        self.failures: list[str] = []
        self.checks = 0
        self.log = os.environ.get("TH_VALIDATION_LOG") or None

    def check(self, ok: bool, what: str):
        self.checks += 1
        if not ok:
            self.failures.append(what)

    def finish(self, stage: str, timings: dict, details=()) -> int:
        """Prints the failures, the tally (with `details` lines under it) and
        the stage's timings; returns the exit status of a test runner."""
        for f in self.failures:
            print("FAIL:", f)
        print(f"{self.checks - len(self.failures)} of {self.checks} checks passed")
        for line in details:
            print(line)
        print(f"{stage} timings:")
        width = max((len(k) for k in timings), default=0)
        for k, v in timings.items():
            print(f"  {k:{width}s} {v:6.2f} s")
        return 1 if self.failures else 0

    def record(self, check: str, source: str, deviation: float, tolerance: float):
        if self.log:
            with open(self.log, "a", encoding="utf-8") as fh:
                fh.write(f"{check}\t{source}\t{deviation:.3g}\t{tolerance:.3g}\trelative\n")


def read_csv(path: pathlib.Path) -> list:
    with open(path, newline="", encoding="utf-8") as fh:
        return list(csv.reader(fh))


def as_number(text: str):
    """The finite number a CSV cell holds, or None (text, error, empty)."""
    try:
        v = float(text)
    except ValueError:
        return None
    return v if math.isfinite(v) else None
