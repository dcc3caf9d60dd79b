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

With --instances, the copy's owner instead (test recovery-instances):
instances that share the state folder but not a D-Bus session (two logins,
a remote session and a local one), each started under a dbus-run-session of
its own so that each is a primary instance:

1. A edits plant.rugosa; its autosave copy appears.
2. B starts without a file, and D with plant.rugosa: neither offers A's
   live copy (no "Recover unsaved work?" window within OFFER_WAIT_S), and
   the copy keeps its bytes.  B edits too and writes a copy of its own.
3. A is killed with SIGKILL.  C starts and offers A's copy; while C's offer
   is open, E starts and offers nothing (C holds the copy).
4. C recovers with Enter: A's copy goes, C writes its own, and B's live
   copy is there with the same bytes throughout.

Usage: test-recovery.py [--instances] RUGOSA_BINARY
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
    # --all: every condition must hold (xdotool's default is any of them)
    return xdotool("search", "--all", "--onlyvisible", "--pid", str(proc.pid), "--name", ".")


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


# How long an instance is given to show an offer it should not show: the
# offer comes with the first window (rugosa_application_activate), so a
# few seconds after that window is ample.
OFFER_WAIT_S = 4.0


def start_own_session(binary, env, *args):
    """rugosa under a D-Bus session of its own; returns (wrapper, pid of
    rugosa)."""
    dbus = shutil.which("dbus-run-session")
    wrapper = subprocess.Popen([dbus, "--", binary, *args], env=env,
                               stdout=subprocess.DEVNULL, stderr=None)
    exe = os.path.realpath(binary)

    def child():
        try:
            with open(f"/proc/{wrapper.pid}/task/{wrapper.pid}/children") as f:
                kids = f.read().split()
        except OSError:
            return None
        for k in kids:
            try:
                if os.path.realpath(f"/proc/{k}/exe") == exe:
                    return int(k)
            except OSError:
                pass
        return None

    pid = wait_for("rugosa to start in its own session", child)
    return wrapper, pid


class Pid:
    """What the xdotool helpers need of a process: its pid."""
    def __init__(self, pid):
        self.pid = pid


def no_offer_from(pid, what):
    """Fail if the instance shows the recovery offer within OFFER_WAIT_S."""
    end = time.monotonic() + OFFER_WAIT_S
    while time.monotonic() < end:
        if window_named(Pid(pid), "Recover unsaved work?"):
            fail(what + " offered a copy that another running instance owns")
        time.sleep(0.2)


def read_bytes(path):
    with open(path, "rb") as f:
        return f.read()


def scenario_instances(binary, source, top, procs):
    env = dict(os.environ)
    for var, sub in (("XDG_STATE_HOME", "state"), ("XDG_CONFIG_HOME", "config"),
                     ("XDG_DATA_HOME", "data"), ("XDG_CACHE_HOME", "cache")):
        env[var] = os.path.join(top, sub)
        os.makedirs(env[var])
    env.setdefault("GSK_RENDERER", "cairo")
    env.setdefault("GSETTINGS_BACKEND", "memory")
    env.pop("DBUS_SESSION_BUS_ADDRESS", None)
    state = env["XDG_STATE_HOME"]
    project = os.path.join(top, "plant.rugosa")
    shutil.copyfile(os.path.join(source, "data", "demo.rugosa"), project)
    before = n_lines(project)

    alive = {}  # pid of rugosa -> its dbus-run-session, expected to stay up

    def start(*args):
        wrapper, pid = start_own_session(binary, env, *args)
        procs.append(wrapper)
        alive[pid] = wrapper
        RUNNING[:] = list(alive.values())
        return pid

    def kill(pid):
        wrapper = alive.pop(pid)
        RUNNING[:] = list(alive.values())
        os.kill(pid, signal.SIGKILL)
        wrapper.wait(timeout=TIMEOUT_S)

    # 1. A edits; its copy appears.
    a = start(project)
    wid = wait_for("A's window", lambda: window_named(Pid(a), "plant.rugosa"))
    press(wid, "ctrl+equal")
    copies = wait_for("A's autosave copy", lambda: recovery_copies(state))
    if len(copies) != 1:
        fail("expected A's copy alone, found %r" % copies)
    a_copy = copies[0]
    wait_for("A's copy to hold the added line",
             lambda: os.path.exists(a_copy) and n_lines(a_copy) == before + 1)
    a_bytes = read_bytes(a_copy)

    # 2. B (no file) and D (the project file) start in sessions of their own:
    # A's copy is live, so neither offers it.
    b = start()
    b_wid = wait_for("B's window", lambda: window_named(Pid(b), "Unsaved project"))
    no_offer_from(b, "B, started without a file,")
    d = start(project)
    wait_for("D's window", lambda: window_named(Pid(d), "plant.rugosa"))
    no_offer_from(d, "D, started with the project file,")
    if recovery_copies(state) != [a_copy] or read_bytes(a_copy) != a_bytes:
        fail("A's live copy changed or went while B and D started")
    kill(d)

    # B's own unsaved work: a second live copy.
    press(b_wid, "ctrl+equal")
    both = wait_for("B's autosave copy", lambda: len(recovery_copies(state)) == 2
                    and recovery_copies(state))
    b_copy = [c for c in both if c != a_copy][0]
    wait_for("B's copy to be whole", lambda: n_lines(b_copy) >= 1)
    b_bytes = read_bytes(b_copy)

    # 3. A ends without warning; C offers its copy, E (while C's offer is
    # open) does not.
    kill(a)
    c = start()
    dialog = wait_for("C's offer of A's copy",
                      lambda: window_named(Pid(c), "Recover unsaved work?"))
    e = start()
    wait_for("E's window", lambda: window_named(Pid(e), "Unsaved project"))
    no_offer_from(e, "E, while C's offer was open,")
    kill(e)

    # 4. C recovers A's work; B's copy is untouched.
    press(dialog, "Return")
    wait_for("A's copy to be taken over by C", lambda: not os.path.exists(a_copy))
    wait_for("C's own copy of the recovered work",
             lambda: [x for x in recovery_copies(state) if x not in (a_copy, b_copy)
                      and n_lines(x) == before + 1])
    if not os.path.exists(b_copy) or read_bytes(b_copy) != b_bytes:
        fail("B's live copy changed or went")
    wait_for("C's window to show the recovered, unsaved plant.rugosa",
             lambda: window_named(Pid(c), "• plant.rugosa"))
    RUNNING[:] = []


def main():
    instances = "--instances" in sys.argv[1:]
    args = [a for a in sys.argv[1:] if a != "--instances"]
    if len(args) != 1:
        print(__doc__, file=sys.stderr)
        return 2
    binary = os.path.abspath(args[0])
    if not os.environ.get("DISPLAY") or shutil.which("xdotool") is None:
        print("SKIP: no X display or no xdotool")
        return SKIP
    source = os.environ.get("RUGOSA_SOURCE_DIR",
                            os.path.join(os.path.dirname(__file__), ".."))

    if instances:
        if shutil.which("dbus-run-session") is None:
            print("SKIP: no dbus-run-session")
            return SKIP
        top = tempfile.mkdtemp(prefix="rugosa-recovery-")
        procs = []
        try:
            scenario_instances(binary, source, top, procs)
        finally:
            for p in procs:
                if p.poll() is None:
                    # the wrapper's rugosa first, then the wrapper and its bus
                    try:
                        with open(f"/proc/{p.pid}/task/{p.pid}/children") as f:
                            for k in f.read().split():
                                os.kill(int(k), signal.SIGKILL)
                    except OSError:
                        pass
                    p.wait(timeout=TIMEOUT_S)
            shutil.rmtree(top, ignore_errors=True)
        print("PASS: no instance offered or deleted another's live copy; "
              "the copy of a killed instance was offered once and recovered")
        return 0

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
