#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Translations: complete catalogs, and rugosa-cli in German.

Run:
  check-l10n.py catalogs SOURCE_ROOT
      Every language in po/LINGUAS: `msgfmt --check --statistics` passes and
      reports no fuzzy and no untranslated message; and every message that
      xgettext extracts from po/POTFILES.in today (with the keywords of
      po/meson.build) has a translation in it, so a new string in the
      sources fails here until it is translated.
  check-l10n.py cli RUGOSA_CLI SOURCE_ROOT
      rugosa-cli under LANGUAGE=de, LANG=de_DE.UTF-8 (LOCPATH and
      RUGOSA_LOCALEDIR come from the environment): refusals, core sentences
      and --help come out in German, and a refusal of the core names the
      option of the error's subjects (never one guessed from words); JSON, CSV and the numbers of the table
      are byte for byte those of the C locale; the catalog names in the
      tables are German, in JSON English.

Output is TAP.  The cli mode skips (TAP) when the de_DE.UTF-8 locale is not
available; the catalogs mode skips when msgfmt/xgettext are missing.
"""
import os
import re
import shutil
import subprocess
import sys
import tempfile

results = []


def check(name, ok, detail=""):
    results.append((name, ok, detail))


def finish():
    print(f"1..{len(results)}")
    for i, (name, ok, detail) in enumerate(results, 1):
        print(f"{'ok' if ok else 'not ok'} {i} - {name}")
        if not ok and detail:
            for line in str(detail).splitlines():
                print(f"# {line}")
    return 0 if all(ok for _, ok, _ in results) else 1


def skip_all(reason):
    print(f"1..0 # SKIP {reason}")
    return 0


# ---- a small PO reader ------------------------------------------------------

def _unquote(s):
    s = s.strip()
    assert s.startswith('"') and s.endswith('"'), s
    return bytes(s[1:-1], 'utf-8').decode('unicode_escape').encode('latin-1').decode('utf-8')


def read_po(path):
    """{(msgctxt, msgid): (msgstr list, flags)} of a PO/POT file (header
    and obsolete entries left out)."""
    entries = {}
    cur = None
    field = None

    def flush():
        if cur and cur.get('msgid') not in (None, ''):
            entries[(cur.get('msgctxt'), cur['msgid'])] = (cur['msgstr'], cur['flags'])

    with open(path, encoding='utf-8') as f:
        for raw in f:
            line = raw.rstrip('\n')
            if not line.strip():
                flush()
                cur = None
                continue
            if cur is None:
                cur = {'msgstr': [], 'flags': set()}
            if line.startswith('#~'):
                cur['obsolete'] = True
                continue
            if line.startswith('#,'):
                cur['flags'].update(x.strip() for x in line[2:].split(','))
                continue
            if line.startswith('#'):
                continue
            m = re.match(r'(msgctxt|msgid_plural|msgid|msgstr(?:\[\d+\])?)\s+(".*")$', line)
            if m:
                field = m.group(1)
                value = _unquote(m.group(2))
                if field.startswith('msgstr'):
                    cur['msgstr'].append(value)
                else:
                    cur[field] = value
            else:
                value = _unquote(line)
                if field.startswith('msgstr'):
                    cur['msgstr'][-1] += value
                else:
                    cur[field] += value
    flush()
    return entries


# ---- catalogs ---------------------------------------------------------------

def xgettext_args(root):
    """The preset 'glib' keywords plus the args: of po/meson.build."""
    args = ['--from-code=UTF-8', '--add-comments',
            '--keyword=_', '--keyword=N_', '--keyword=C_:1c,2', '--keyword=NC_:1c,2',
            '--keyword=g_dcgettext:2', '--keyword=g_dngettext:2,3',
            '--keyword=g_dpgettext2:2c,3']
    with open(os.path.join(root, 'po', 'meson.build'), encoding='utf-8') as f:
        text = f.read()
    args += re.findall(r"'(--(?:keyword|flag)=[^']+)'", text)
    return args


def catalogs(root):
    msgfmt = shutil.which('msgfmt')
    xgettext = shutil.which('xgettext')
    if msgfmt is None or xgettext is None:
        return skip_all("msgfmt or xgettext not found")
    with open(os.path.join(root, 'po', 'LINGUAS'), encoding='utf-8') as f:
        langs = [w for line in f for w in line.split('#')[0].split()]
    check("po/LINGUAS names at least one language", len(langs) > 0)

    with open(os.path.join(root, 'po', 'POTFILES.in'), encoding='utf-8') as f:
        sources = [l.strip() for l in f if l.strip() and not l.startswith('#')]
    with tempfile.TemporaryDirectory(prefix='rugosa-l10n-') as tmp:
        pot = os.path.join(tmp, 'rugosa.pot')
        p = subprocess.run([xgettext, '--package-name=rugosa', '--directory', root,
                            '--output', pot, *xgettext_args(root), *sources],
                           capture_output=True, text=True, timeout=120)
        check("xgettext extracts po/POTFILES.in", p.returncode == 0, p.stderr)
        wanted = read_po(pot) if p.returncode == 0 else {}
        pot_text = open(pot, encoding='utf-8').read() if p.returncode == 0 else ''
    for part in ('src/core/', 'src/model/', 'src/chart/', 'src/cli/', 'src/app/', 'ui/', 'data/'):
        check(f"the template holds messages of {part}", f"#: {part}" in pot_text
              or f" {part}" in pot_text)

    for lang in langs:
        po = os.path.join(root, 'po', lang + '.po')
        p = subprocess.run([msgfmt, '--check', '--statistics', '-o', os.devnull, po],
                           capture_output=True, text=True, timeout=60)
        stats = (p.stdout + p.stderr).strip()
        check(f"{lang}.po: msgfmt --check passes", p.returncode == 0, stats)
        check(f"{lang}.po: no fuzzy and no untranslated message",
              p.returncode == 0 and 'fuzzy' not in stats and 'untranslated' not in stats
              and 'translated message' in stats, stats)
        have = read_po(po)
        missing = [k for k in wanted
                   if k not in have or not all(have[k][0]) or 'fuzzy' in have[k][1]]
        check(f"{lang}.po translates every message of the sources ({len(wanted)})",
              not missing,
              "\n".join(f"missing: {k[1][:100]!r}" for k in missing[:20]))
    return finish()


# ---- rugosa-cli in German ---------------------------------------------------

def de_env():
    env = dict(os.environ)
    for k in list(env):
        if k.startswith('LC_'):
            del env[k]
    env.update(LANGUAGE='de', LANG='de_DE.UTF-8')
    return env


def c_env():
    env = dict(os.environ)
    for k in list(env):
        if k.startswith('LC_') or k in ('LANGUAGE', 'LANG'):
            del env[k]
    env.update(LC_ALL='C')
    return env


def run(cli, args, env):
    return subprocess.run([cli, *args], capture_output=True, env=env, timeout=60)


def cli(cli_path, root):
    localedir = os.environ.get('RUGOSA_LOCALEDIR')
    if not localedir or not os.path.isfile(os.path.join(localedir, 'de', 'LC_MESSAGES', 'rugosa.mo')):
        return skip_all("RUGOSA_LOCALEDIR has no de/LC_MESSAGES/rugosa.mo")
    # Is the locale there?  The C library falls back to C silently.
    probe = subprocess.run(['locale', 'decimal_point'], capture_output=True, text=True,
                           env=de_env())
    if probe.returncode != 0 or probe.stdout.strip() != ',' or probe.stderr.strip():
        return skip_all("the de_DE.UTF-8 locale is not available")

    de = read_po(os.path.join(root, 'po', 'de.po'))

    def tr(msgid):
        return de[(None, msgid)][0][0]

    # A refusal of the CLI itself.
    msgid = ('--diameter is required (inner diameter, e.g. --diameter "102.3 mm"), '
             'or name a catalog pipe with --pipe "NPS 4 Sch 40".')
    args = ['line', '--flow', '12 L/s', '--length', '100 m']
    p_de, p_c = run(cli_path, args, de_env()), run(cli_path, args, c_env())
    check("a CLI refusal is in German", p_de.returncode == 2
          and p_de.stderr.decode() == f"rugosa-cli: {tr(msgid)}\n", p_de.stderr.decode())
    check("the same refusal is in English in the C locale", p_c.returncode == 2
          and p_c.stderr.decode() == f"rugosa-cli: {msgid}\n", p_c.stderr.decode())
    check("the German refusal differs from the English one", tr(msgid) != msgid)

    # A sentence of the core (rg_error_set through dgettext), with the
    # translated list joiner.
    args = ['line', '--flow', '12 L/s', '--diameter', '100 mm', '--length', '100 m',
            '--material', 'nonsuch', '--fluid', 'water', '--temperature', '20 C']
    p_de = run(cli_path, args, de_env())
    prefix = tr('Unknown pipe material "%.40s"; the closest are %s.').split('%')[0]
    text = p_de.stderr.decode()
    check("a refusal of the core is in German", p_de.returncode == 2
          and text.startswith("rugosa-cli: --material: " + prefix) and ' oder ' in text, text)

    # The option a refusal of the core names comes from the error's subjects,
    # not from English words in the sentence: a pressure unit given for the
    # viscosity is about --viscosity (the sentence names it), never
    # --pressure; a custom density out of range names --density after the
    # German sentence.
    args = ['fluid', 'custom', '--density', '998 kg/m3', '--viscosity', '1 Pa']
    p_de = run(cli_path, args, de_env())
    text = p_de.stderr.decode()
    kind = tr("'%s' for %s has a unit of another quantity (%s): use %s.")
    check("German: a unit of another quantity for --viscosity names --viscosity only",
          p_de.returncode == 2 and p_de.stdout == b'' and text.count('\n') == 1
          and text.startswith('rugosa-cli: --viscosity: ' + kind.split('%s')[0] + '1 Pa')
          and '--viscosity' in text and '--pressure' not in text
          and '(' + tr('pressure') + ')' in text, text)
    args = ['fluid', 'custom', '--density', '1e5 kg/m3', '--viscosity', '1 cP']
    p_de = run(cli_path, args, de_env())
    text = p_de.stderr.decode()
    # the field's range sentence, with the field's German label
    check("German: a density out of range names --density before the German sentence",
          p_de.returncode == 2 and text.count('\n') == 1
          and text.startswith('rugosa-cli: --density: ' + tr('%s must lie between %s and %s.').split('%s')[0])
          and tr('Density') in text, text)

    # Warnings of the core in the table output: German; numbers with '.'.
    # A 100 mm bore at 0.25 L/s of 20 °C water: Re about 3200, transitional.
    args = ['line', '--flow', '0.25 L/s', '--diameter', '100 mm', '--length', '100 m',
            '--roughness', '0.045 mm', '--fluid', 'water', '--temperature', '20 C']
    t_de, t_c = run(cli_path, args, de_env()), run(cli_path, args, c_env())
    out_de, out_c = t_de.stdout.decode(), t_c.stdout.decode()
    check("the table runs in both locales", t_de.returncode == 0 and t_c.returncode == 0,
          t_de.stderr.decode() + t_c.stderr.decode())
    warn_prefix = tr('The flow is transitional (Re %.0f): the friction factor may lie anywhere '
                     'from the laminar %.4g to the turbulent %.4g; the turbulent value is used.'
                     ).split('%')[0]
    check("a warning of the core is in German in the table", warn_prefix in out_de, out_de)
    check("the table's labels are German", tr('Mean velocity') in out_de
          and tr('Head loss, total') in out_de, out_de)
    nums = re.compile(r'-?\d+(?:[.,]\d+)?(?:e[-+]?\d+)?')
    value_col = lambda out: [nums.findall(l[38:]) for l in out.splitlines() if len(l) > 38]
    check("the table's numbers are those of the C locale",
          value_col(out_de)[:18] == value_col(out_c)[:18] and ',' not in
          ''.join(l[38:] for l in out_de.splitlines() if not l.startswith(('Warnung', 'warning'))),
          out_de + "\n----\n" + out_c)

    # JSON and CSV: byte for byte the C locale's, warnings included.
    for name, extra in (('line --json', args + ['--json']),
                        ('friction --json', ['friction', '--re', '1e5', '--rr', '0.0002', '--json']),
                        ('fluid --json', ['fluid', 'water', '--temperature', '20 C', '--json'])):
        j_de, j_c = run(cli_path, extra, de_env()), run(cli_path, extra, c_env())
        check(f"{name}: the output is identical under de_DE and C",
              j_de.returncode == 0 and j_de.stdout == j_c.stdout and len(j_c.stdout) > 20,
              j_de.stdout.decode() + "\n----\n" + j_c.stdout.decode() + j_de.stderr.decode())
    # Catalog names (po/catalog-names.c): German in the tables, English
    # (the core's own) in JSON, ids unchanged.
    name = 'Commercial steel, new'
    for what, cmd in (('catalog materials', ['catalog', 'materials']),
                      ('line', ['line', '--flow', '12 L/s', '--diameter', '100 mm',
                                '--length', '100 m', '--material', 'commercial-steel',
                                '--fluid', 'water', '--temperature', '20 C'])):
        out = run(cli_path, cmd, de_env()).stdout.decode()
        check(f"{what}: the table shows the German catalog name", tr(name) != name
              and tr(name) in out and name not in out, out[:400])
    mats_c = run(cli_path, ['catalog', 'materials'], c_env()).stdout.decode()
    check("catalog materials: the C locale keeps the English name and the id",
          f'commercial-steel             {name}' in mats_c, mats_c[:400])
    for which in ('materials', 'fittings', 'aging'):
        j_de = run(cli_path, ['catalog', which, '--json'], de_env())
        j_c = run(cli_path, ['catalog', which, '--json'], c_env())
        check(f"catalog {which} --json: identical under de_DE and C",
              j_de.returncode == 0 and j_de.stdout == j_c.stdout and b'"name": "' in j_c.stdout,
              j_de.stdout.decode()[:400])
    check("line --json carries the warning (so the comparison is not empty)",
          b'"warnings": ["The flow is transitional' in run(cli_path, args + ['--json'], c_env()).stdout)
    demo = os.path.join(root, 'data', 'demo.rugosa')
    for fmt in ('json', 'csv'):
        e_de = run(cli_path, ['eval', demo, '--format', fmt], de_env())
        e_c = run(cli_path, ['eval', demo, '--format', fmt], c_env())
        check(f"eval --format {fmt}: identical under de_DE and C",
              e_de.returncode == 0 and e_de.stdout == e_c.stdout and len(e_c.stdout) > 50,
              e_de.stderr.decode())

    # --help and --version.
    h = run(cli_path, ['--help'], de_env())
    check("--help is German and keeps the command names",
          h.returncode == 0 and h.stdout.decode().startswith('Aufruf: rugosa-cli BEFEHL')
          and '--flow Q' in h.stdout.decode(), h.stdout.decode()[:200])
    v = run(cli_path, ['--version'], de_env())
    check("--version is the same in any language", v.returncode == 0
          and v.stdout == run(cli_path, ['--version'], c_env()).stdout)
    return finish()


def main():
    if len(sys.argv) == 3 and sys.argv[1] == 'catalogs':
        return catalogs(sys.argv[2])
    if len(sys.argv) == 4 and sys.argv[1] == 'cli':
        return cli(sys.argv[2], sys.argv[3])
    print(__doc__, file=sys.stderr)
    return 2


if __name__ == '__main__':
    sys.exit(main())
