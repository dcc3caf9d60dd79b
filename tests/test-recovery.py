#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Unsaved work survives SIGKILL: the real `rugosa` program, real X input.

1. Start rugosa on a copy of the demo project, with its state, config and
   data folders in a temporary folder.
2. Add a line with the keyboard shortcut (Ctrl+=, win.line-add), as a user
   would; nothing is saved.
3. Wait for the autosave copy in $XDG_STATE_HOME/rugosa/recovery/ and check
   that it holds the added line.
4. Kill the program with SIGKILL: no handler runs, no clean-up happens.
5. Start rugosa again, once without a file and once with the project file
   (as a double-click does): it must offer the recovery.  Accept it with
   Enter (Recover is the default answer).  The window takes the copy over
   as its own autosave (the old copy goes, a new one appears).
6. Save with Ctrl+S: the recovered project must land in the original file
   (the added line is there), the file it replaced in the backup NAME~, and
   the recovery folder must be empty.

Run under xvfb-run and dbus-run-session (suite 'ui').  Without a display or
xdotool the test reports a skip (exit status 77).

Usage: test-recovery.py RUGOSA_BINARY
"""

import json
import os
import shutil
import signal
import subprocess
import sys
import tempfile
import time

SKIP = 77
# The app writes its autosave copy after 5 s of quiet (AUTOSAVE_DELAY_S in
# src/app/rugosa-window-files.c); allow for a slow, shared machine.
TIMEOUT_S = 30.0


def fail(message):
    print("FAIL: " + message, file=sys.stderr)
    sys.exit(1)


RUNNING = []  # the rugosa process expected to stay up while waiting


def wait_for(what, predicate, timeout=TIMEOUT_S):
    end = time.monotonic() + timeout
    while time.monotonic() < end:
        for p in RUNNING:
            if p.poll() is not None:
                fail("rugosa exited (status %d) while waiting for %s" % (p.returncode, what))
        value = predicate()
        if value:
            return value
        time.sleep(0.1)
    fail("timed out waiting for " + what)


def xdotool(*args):
    r = subprocess.run(["xdotool", *args], capture_output=True, text=True,
                       timeout=TIMEOUT_S)
    return r.stdout.split() if r.returncode == 0 else []


def windows_of(proc):
    return xdotool("search", "--onlyvisible", "--pid", str(proc.pid), "--name", ".")


def window_named(proc, prefix):
    """The visible window of proc whose title starts with prefix."""
    for wid in windows_of(proc):
        name = subprocess.run(["xdotool", "getwindowname", wid],
                              capture_output=True, text=True).stdout.strip()
        if name.startswith(prefix):
            return wid
    return None


def press(wid, keys):
    # Without a window manager, focus is set straight on the window.
    xdotool("windowfocus", "--sync", wid)
    time.sleep(0.3)
    xdotool("key", "--clearmodifiers", keys)


def n_lines(path):
    with open(path, encoding="utf-8") as f:
        return len(json.load(f)["lines"])


def recovery_copies(state):
    folder = os.path.join(state, "rugosa", "recovery")
    if not os.path.isdir(folder):
        return []
    return sorted(os.path.join(folder, n) for n in os.listdir(folder)
                  if n.endswith(".rugosa"))


def start(binary, env, *args):
    return subprocess.Popen([binary, *args], env=env,
                            stdout=subprocess.DEVNULL, stderr=None)


def scenario(binary, source, top, restart_with_file, procs):
    """One kill and recovery; restart without a file or with the project."""
    env = dict(os.environ)
    for var, sub in (("XDG_STATE_HOME", "state"), ("XDG_CONFIG_HOME", "config"),
                     ("XDG_DATA_HOME", "data"), ("XDG_CACHE_HOME", "cache")):
        env[var] = os.path.join(top, sub)
        os.makedirs(env[var])
    env.setdefault("GSK_RENDERER", "cairo")
    env.setdefault("GSETTINGS_BACKEND", "memory")
    state = env["XDG_STATE_HOME"]

    project = os.path.join(top, "plant.rugosa")
    shutil.copyfile(os.path.join(source, "data", "demo.rugosa"), project)
    with open(project, "rb") as f:
        original = f.read()
    before = n_lines(project)

    # 1-2. Open, add a line.
    first = start(binary, env, project)
    procs.append(first)
    RUNNING[:] = [first]
    wid = wait_for("the window of plant.rugosa",
                   lambda: window_named(first, "plant.rugosa"))
    press(wid, "ctrl+equal")
    wait_for("the title to show unsaved changes",
             lambda: window_named(first, "• plant.rugosa"), timeout=10)

    # 3. The autosave copy appears and holds the edit.
    copy = wait_for("the autosave copy", lambda: recovery_copies(state))
    if len(copy) != 1:
        fail("expected one recovery copy, found %r" % copy)
    copy = copy[0]
    wait_for("the autosave copy to hold the added line",
             lambda: os.path.exists(copy) and n_lines(copy) == before + 1)
    with open(copy + ".origin", encoding="utf-8") as f:
        if f.read() != project:
            fail("the recovery copy does not name plant.rugosa as its origin")

    # 4. Kill without warning.
    RUNNING[:] = []
    first.send_signal(signal.SIGKILL)
    first.wait(timeout=TIMEOUT_S)
    with open(project, "rb") as f:
        if f.read() != original:
            fail("plant.rugosa changed although nothing was saved")
    if recovery_copies(state) != [copy]:
        fail("the recovery copy did not outlive the killed program")

    # 5. Start again: the recovery is offered; accept it with Enter.
    second = start(binary, env, *([project] if restart_with_file else []))
    procs.append(second)
    RUNNING[:] = [second]
    if restart_with_file:
        # The file opens as it is on disk, unchanged, beside the offer.
        wait_for("the window of plant.rugosa",
                 lambda: window_named(second, "plant.rugosa"))
    dialog = wait_for("the offer to recover", lambda: window_named(second, "Recover unsaved work?"))
    press(dialog, "Return")
    wait_for("the old copy to be taken over", lambda: not os.path.exists(copy))
    wid = wait_for("the window to show the recovered, unsaved plant.rugosa",
                   lambda: window_named(second, "• plant.rugosa"))
    mine = wait_for("the recovered window's own autosave copy",
                    lambda: recovery_copies(state))
    if len(mine) != 1 or mine[0] == copy or n_lines(mine[0]) != before + 1:
        fail("after recovery, expected one new copy with the added line, found %r" % mine)

    # 6. Save: the recovered edit reaches the user's file.
    press(wid, "ctrl+s")
    wait_for("plant.rugosa to hold the recovered line",
             lambda: n_lines(project) == before + 1)
    with open(project + "~", "rb") as f:
        if f.read() != original:
            fail("the backup plant.rugosa~ is not the file before the save")
    wait_for("the recovery folder to empty", lambda: not recovery_copies(state))
    wait_for("the title to show the project saved",
             lambda: window_named(second, "plant.rugosa"))

    # A clean quit: nothing is left to recover.
    RUNNING[:] = []
    press(wid, "ctrl+q")
    second.wait(timeout=TIMEOUT_S)
    if recovery_copies(state):
        fail("a recovery copy is left after a clean quit")


def main():
    if len(sys.argv) != 2:
        print(__doc__, file=sys.stderr)
        return 2
    binary = os.path.abspath(sys.argv[1])
    if not os.environ.get("DISPLAY") or shutil.which("xdotool") is None:
        print("SKIP: no X display or no xdotool")
        return SKIP
    source = os.environ.get("RUGOSA_SOURCE_DIR",
                            os.path.join(os.path.dirname(__file__), ".."))

    for restart_with_file in (False, True):
        top = tempfile.mkdtemp(prefix="rugosa-recovery-")
        procs = []
        try:
            scenario(binary, source, top, restart_with_file, procs)
        finally:
            for p in procs:
                if p.poll() is None:
                    p.kill()
                    p.wait()
            shutil.rmtree(top, ignore_errors=True)
        print("PASS: an added line survived SIGKILL, was recovered (restart %s) and saved"
              % ("with the file" if restart_with_file else "without a file"))
    return 0


if __name__ == "__main__":
    sys.exit(main())
