"""Run LibreOffice headless on a throw-away profile with the extension
installed, as an unprivileged user (unopkg refuses root installs into a user
profile). Used by tests/calc and the demo stage of scripts/demo. Standard
library only.

    with CalcSession(oxt) as calc:            # installs the .oxt
        calc.convert([book.fods], "csv", out)  # recalculates and exports
"""
from __future__ import annotations

import os
import pathlib
import shutil
import signal
import subprocess
import tempfile
import time

SOFFICE = shutil.which("soffice", path="/usr/bin:/usr/lib/libreoffice/program") or "soffice"
UNOPKG = shutil.which("unopkg", path="/usr/bin:/usr/lib/libreoffice/program") or "unopkg"
NOBODY = 65534
# Every sheet to its own CSV (<name>-<sheet>.csv), UTF-8, ',' separated,
# '"' quoted, formulas' results as shown.
CSV_ALL_SHEETS = "csv:Text - txt - csv (StarCalc):44,34,76,1,,0,false,true,false,false,false,-1"


class LibreOfficeError(RuntimeError):
    pass


class CalcSession:
    def __init__(self, oxt: os.PathLike | None, keep: bool = False,
                 timeout: float = 300.0):
        self.oxt = pathlib.Path(oxt) if oxt else None
        self.keep = keep
        self.timeout = timeout
        self.root: pathlib.Path | None = None
        self.timings: dict = {}

    # -- lifecycle ------------------------------------------------------------
    def __enter__(self):
        self.root = pathlib.Path(tempfile.mkdtemp(prefix="tubeheat-calc-"))
        for d in ("home", "tmp", "profile", "in", "out"):
            (self.root / d).mkdir()
        self._chown_tree()
        if self.oxt is not None:
            t0 = time.monotonic()
            dest = self.root / "in" / self.oxt.name
            shutil.copyfile(self.oxt, dest)
            self._chown_tree()
            # -s: accept the licence without asking (non-interactive).
            self._run([UNOPKG, "add", "-f", "-s", self._env_arg(), str(dest)])
            self.timings["install"] = time.monotonic() - t0
        return self

    def __exit__(self, *exc):
        if self.root is not None and not self.keep:
            shutil.rmtree(self.root, ignore_errors=True)
        return False

    # -- helpers --------------------------------------------------------------
    @property
    def profile_url(self) -> str:
        return (self.root / "profile").as_uri()

    def _env_arg(self) -> str:
        return f"-env:UserInstallation={self.profile_url}"

    def _chown_tree(self):
        if os.geteuid() != 0:
            return
        for dirpath, dirnames, filenames in os.walk(self.root):
            os.chown(dirpath, NOBODY, NOBODY)
            for f in filenames:
                os.chown(os.path.join(dirpath, f), NOBODY, NOBODY)

    def _run(self, cmd: list) -> subprocess.CompletedProcess:
        env = {"HOME": str(self.root / "home"), "TMPDIR": str(self.root / "tmp"),
               "PATH": "/usr/bin:/bin", "LANG": "C.UTF-8", "LC_ALL": "C.UTF-8",
               "SAL_USE_VCLPLUGIN": "svp"}
        if os.geteuid() == 0:
            cmd = ["setpriv", f"--reuid={NOBODY}", f"--regid={NOBODY}",
                   "--clear-groups", "--"] + cmd
        # Own process group: on a timeout the whole LibreOffice process tree
        # (wrapper script, oosplash, soffice.bin) is ended, nothing else.
        proc = subprocess.Popen(cmd, env=env, stdout=subprocess.PIPE,
                                stderr=subprocess.PIPE, text=True,
                                cwd=self.root / "tmp", start_new_session=True)
        try:
            out, err = proc.communicate(timeout=self.timeout)
        except subprocess.TimeoutExpired:
            os.killpg(proc.pid, signal.SIGKILL)
            proc.communicate()
            raise LibreOfficeError(f"{' '.join(cmd)} timed out after {self.timeout} s")
        p = subprocess.CompletedProcess(cmd, proc.returncode, out, err)
        if p.returncode != 0:
            raise LibreOfficeError(f"{' '.join(cmd)} failed ({p.returncode}):\n"
                                   f"{p.stdout}\n{p.stderr}")
        return p

    def stage(self, files) -> list:
        """Copy input files into the session (readable by the unprivileged user)."""
        staged = []
        for f in files:
            dest = self.root / "in" / pathlib.Path(f).name
            shutil.copyfile(f, dest)
            staged.append(dest)
        self._chown_tree()
        return staged

    def set_recalc_on_load_always(self):
        """Make Calc recompute every formula when it loads an .ods that carries
        cached values (default: never for files written by LibreOffice)."""
        reg = self.root / "profile" / "user" / "registrymodifications.xcu"
        item = ('<item oor:path="/org.openoffice.Office.Calc/Formula/Load">'
                '<prop oor:name="ODFRecalcMode" oor:op="fuse"><value>0</value></prop></item>\n')
        if reg.exists():
            text = reg.read_text(encoding="utf-8")
            text = text.replace("</oor:items>", item + "</oor:items>")
        else:
            reg.parent.mkdir(parents=True, exist_ok=True)
            text = ('<?xml version="1.0" encoding="UTF-8"?>\n<oor:items '
                    'xmlns:oor="http://openoffice.org/2001/registry" '
                    'xmlns:xs="http://www.w3.org/2001/XMLSchema" '
                    'xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">\n'
                    + item + "</oor:items>\n")
        reg.write_text(text, encoding="utf-8")
        self._chown_tree()

    def convert(self, files, target: str, outdir: os.PathLike | None = None) -> pathlib.Path:
        """Load, recalculate and export `files` (already staged or not) with
        one soffice run; returns the output folder."""
        files = [pathlib.Path(f) for f in files]
        staged = [f if self.root in f.parents else self.stage([f])[0] for f in files]
        out = self.root / "out"
        t0 = time.monotonic()
        self._run([SOFFICE, "--headless", "--norestore", "--nolockcheck",
                   self._env_arg(), "--convert-to", target, "--outdir", str(out)]
                  + [str(f) for f in staged])
        self.timings.setdefault("convert", 0.0)
        self.timings["convert"] += time.monotonic() - t0
        if outdir is not None:
            outdir = pathlib.Path(outdir)
            outdir.mkdir(parents=True, exist_ok=True)
            for f in out.iterdir():
                shutil.copyfile(f, outdir / f.name)
            return outdir
        return out
