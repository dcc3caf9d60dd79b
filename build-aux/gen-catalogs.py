#!/usr/bin/env python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Turn the engineering catalogs under data/ into one C file.

The JSON files are the only home of the numbers; this script converts units
(inch -> m exactly, 1 in = 25.4 mm; mm -> m), computes ID = OD - 2*wall
(less twice a lining where the file gives one), checks the tables for
consistency (and each wall against the rule of its series where the file
names one) and writes catalog-data.c / catalog-data.h with the tables as
const arrays; each series of a pipe file becomes a pipe catalog.  Python 3 standard library only.

With --names it writes instead the names the catalogs show to people
(materials, fittings, aging classes) as N_("...") marks, one C file that is
never compiled: xgettext cannot read JSON, so this file, committed and
listed in po/POTFILES.in, carries the names to translators.  The core keeps
the English names; the app and rugosa-cli translate them where they show
them.  tests/check-catalog-names.py fails when the committed file is stale.

Usage: gen-catalogs.py OUTDIR materials.json fittings.json aging.json pipes-*.json
       gen-catalogs.py --names po/catalog-names.c materials.json fittings.json aging.json
"""

import json
import math
import os
import sys

INCH_M = 0.0254  # exact (international inch, 1959)
MM_M = 0.001


class CatalogError(Exception):
    pass


def c_str(s):
    out = ['"']
    for ch in s:
        if ch == '\\':
            out.append('\\\\')
        elif ch == '"':
            out.append('\\"')
        elif ch == '\n':
            out.append('\\n')
        else:
            out.append(ch)
    out.append('"')
    return ''.join(out)


def c_num(x):
    x = float(x)
    if not math.isfinite(x):
        raise CatalogError('non-finite number %r' % x)
    r = repr(x)
    if 'e' not in r and '.' not in r:
        r += '.0'
    return r


def load(path):
    with open(path, encoding='utf-8') as f:
        return json.load(f, object_pairs_hook=no_duplicates)


def no_duplicates(pairs):
    d = {}
    for k, v in pairs:
        if k in d:
            raise CatalogError('duplicate key %r' % k)
        d[k] = v
    return d


def materials(doc):
    rows = []
    ids = set()
    for m in doc['materials']:
        lo, hi = m['range_mm']
        eps = m['roughness_mm']
        if not (0 < lo <= eps <= hi):
            raise CatalogError('material %s: roughness %g mm outside its range [%g, %g]'
                               % (m['id'], eps, lo, hi))
        if m['id'] in ids:
            raise CatalogError('material %s listed twice' % m['id'])
        ids.add(m['id'])
        rows.append(m)
    return rows, ids


def iso4065_wall(dn, renard_exponent, minimum):
    """ISO 4065 wall for nominal OD dn (mm) and series S = 10**exponent."""
    e = dn / (2.0 * 10.0 ** renard_exponent + 1.0)
    e = round(e, 2)
    e = math.ceil(round(e * 10.0, 6)) / 10.0
    return max(e, minimum)


def round_half_up(x, step):
    """x rounded to a multiple of step, halves up (decimal, not binary)."""
    n = round(x / step, 6)
    return math.floor(n + 0.5) * step


def ceil_to(x, step):
    return math.ceil(round(x / step, 6)) * step


def rule_wall(rule, nominal, od):
    """The wall a series' rule gives for nominal size `nominal` (a DN or an
    NPS text) and outside diameter `od` (the file's unit), or None."""
    kind = rule['kind']
    if kind == 'thickness-class':
        # ISO 2531:1998 K class: e = K(0.5 + 0.001 DN), at least the minimum,
        # to 0.1 mm (halves up, as 6.75 -> 6.8 for K9 DN 250)
        dn = float(nominal)
        return max(rule['minimum_mm'], round_half_up(rule['k'] * (0.5 + 0.001 * dn), 0.1))
    if kind == 'pressure-class':
        # ISO 2531:2009 pressure class C: e_min from the hoop stress at PFA with
        # the safety factor, at least the minimum, plus the casting tolerance
        # 1.3 + 0.001 DN, rounded up to 0.1 mm
        dn = float(nominal)
        pfa, sf, rm = rule['pfa_bar'], rule['safety_factor'], rule['rm_mpa']
        e_min = max(rule['minimum_mm'], pfa * sf * od / (20.0 * rm + pfa * sf))
        return ceil_to(e_min + 1.3 + 0.001 * dn, 0.1)
    if kind == 'dimension-ratio':
        # AWWA C900: minimum wall = OD / DR to 0.001 in
        return round_half_up(od / rule['dr'], 0.001)
    raise CatalogError('unknown wall rule %s' % kind)


def lining_for(doc, nominal):
    """Nominal lining thickness (file units) for a DN from the lining table."""
    lining = doc.get('lining')
    if lining is None:
        return 0.0
    if doc['units'] != 'mm':
        raise CatalogError('%s: a lining table needs mm units' % doc['standard'])
    dn = float(nominal)
    for dn_max, t in lining['thickness_mm_up_to_dn']:
        if dn <= dn_max:
            return t
    raise CatalogError('%s DN %s: no lining thickness' % (doc['standard'], nominal))


def pipes(doc, files_by_name, material_ids):
    std = doc['standard']
    unit = {'in': INCH_M, 'mm': MM_M}[doc['units']]
    if doc['material_id'] not in material_ids:
        raise CatalogError('%s: unknown material %s' % (std, doc['material_id']))
    mats = doc.get('materials', [doc['material_id']])
    if mats[0] != doc['material_id'] or len(set(mats)) != len(mats):
        raise CatalogError('%s: materials must start with material_id, each once' % std)
    for m in mats:
        if m not in material_ids:
            raise CatalogError('%s: unknown material %s' % (std, m))
    if 'outside_diameters' in doc:
        ods = doc['outside_diameters']
    else:
        ref = files_by_name[doc['outside_diameters_from']]
        if ref['units'] != doc['units']:
            raise CatalogError('%s: outside diameters in other units' % std)
        ods = ref['outside_diameters']
    rows = []
    for s in doc['series']:
        for nominal, wall in s['walls'].items():
            if nominal not in ods:
                raise CatalogError('%s %s: no outside diameter for %s' % (std, s['label'], nominal))
            od = ods[nominal]
            if not (0 < 2 * wall < od):
                raise CatalogError('%s %s %s: wall %g does not fit OD %g'
                                   % (std, nominal, s['label'], wall, od))
            if 'renard_exponent' in s:
                want = iso4065_wall(float(od), s['renard_exponent'], doc['minimum_wall_mm'])
                if abs(want - wall) > 1e-9:
                    raise CatalogError('%s dn %s %s: wall %g, ISO 4065 rule gives %g'
                                       % (std, nominal, s['label'], wall, want))
            if 'wall_rule' in s:
                want = rule_wall(s['wall_rule'], nominal, float(od))
                if abs(want - wall) > 1e-9:
                    raise CatalogError('%s %s %s: wall %g, the rule of the series gives %g'
                                       % (std, nominal, s['label'], wall, want))
            lining = lining_for(doc, nominal)
            if not (0 < 2 * (wall + lining) < od):
                raise CatalogError('%s %s %s: wall and lining do not fit OD %g'
                                   % (std, nominal, s['label'], od))
            od_m = od * unit
            wall_m = wall * unit
            lining_m = lining * unit
            rows.append({
                'designation': doc['designation'].format(nominal=nominal, label=s['label']),
                'standard': std,
                'nominal': ('DN ' + nominal) if doc['units'] == 'mm' else nominal,
                'series': s['series'],
                'material_id': doc['material_id'],
                'od': od_m,
                'wall': wall_m,
                'lining': lining_m,
                'id': od_m - 2.0 * wall_m - 2.0 * lining_m,
                'source': doc['source'],
                'series_label': s['label'],
                'usual': bool(s.get('usual', False)),
                'materials': mats,
                'lining_source': doc['lining']['source'] if 'lining' in doc else '',
                'title': doc['title'],
            })
    return rows


def pipe_catalogs(rows):
    """One catalog per series of a standard, in file order: rows of one
    series are consecutive in `rows`."""
    cats = []
    for i, p in enumerate(rows):
        key = (p['standard'], p['series'])
        if not cats or cats[-1]['key'] != key:
            if any(c['key'] == key for c in cats):
                raise CatalogError('%s %s: rows of a series must be consecutive' % key)
            cats.append({'key': key, 'name': p['standard'] + ' ' + p['series_label'],
                         'first': i, 'count': 0, 'p': p})
        cats[-1]['count'] += 1
        p['catalog'] = len(cats) - 1
    names = set()
    for c in cats:
        if c['name'].lower() in names:
            raise CatalogError('catalog %s listed twice' % c['name'])
        names.add(c['name'].lower())
    return cats


FITTING_METHODS = {'3k': 'RG_FITTING_METHOD_3K', 'crane-ft': 'RG_FITTING_METHOD_CRANE_FT'}
FITTING_BANDS_MAX = 4  # RG_FITTING_BANDS_MAX in src/core/fittings.h


def fitting(f, doc, ids):
    """Check one row of fittings.json; a Crane row gets k1 = ki = kd = 0."""
    if f['id'] in ids:
        raise CatalogError('fitting %s listed twice' % f['id'])
    ids.add(f['id'])
    if f['source'] not in doc['sources']:
        raise CatalogError('fitting %s: unknown source %s' % (f['id'], f['source']))
    method = f.get('method', '3k')
    if method not in FITTING_METHODS:
        raise CatalogError('fitting %s: unknown method %s' % (f['id'], method))
    if method == '3k':
        if 'bands' in f or 'min_bore_in' in f:
            raise CatalogError('fitting %s: size bands belong to method crane-ft' % f['id'])
        if min(f['k1'], f['ki'], f['kd']) < 0:
            raise CatalogError('fitting %s: negative constant' % f['id'])
        return
    if any(k in f for k in ('k1', 'ki', 'kd')):
        raise CatalogError('fitting %s: 3-K constants in a crane-ft row' % f['id'])
    f['k1'] = f['ki'] = f['kd'] = 0
    bands = f['bands']
    if not 1 <= len(bands) <= FITTING_BANDS_MAX:
        raise CatalogError('fitting %s: %d size bands, 1 to %d allowed'
                           % (f['id'], len(bands), FITTING_BANDS_MAX))
    lower = f['min_bore_in']
    for b in bands:
        if not (b['max_bore_in'] > lower > 0):
            raise CatalogError('fitting %s: band %s does not lie above %g in'
                               % (f['id'], b['nominal'], lower))
        if not (math.isfinite(b['n']) and b['n'] > 0):
            raise CatalogError('fitting %s: band %s: n must be positive' % (f['id'], b['nominal']))
        lower = b['max_bore_in']


def fitting_c(f, doc):
    src = doc['sources'][f['source']]
    method = f.get('method', '3k')
    row = ('  { .id = %s, .name = %s, .k1 = %s, .ki = %s, .kd = %s, .source = %s,'
           ' .method = %s'
           % (c_str(f['id']), c_str(f['name']), c_num(f['k1']), c_num(f['ki']),
              c_num(f['kd']), c_str('From memory of ' + src + '; not checked against the document'),
              FITTING_METHODS[method]))
    if method == 'crane-ft':
        bands = f['bands']
        row += (',\n    .n_bands = %d, .min_bore_m = %s,\n    .band_nominal = { %s },'
                '\n    .band_max_bore_m = { %s },\n    .band_n = { %s }'
                % (len(bands), c_num(f['min_bore_in'] * INCH_M),
                   ', '.join(c_str(b['nominal']) for b in bands),
                   ', '.join(c_num(b['max_bore_in'] * INCH_M) for b in bands),
                   ', '.join(c_num(b['n']) for b in bands)))
    return row + ' },'


NAMES_REGENERATE = ('/usr/bin/python3 build-aux/gen-catalogs.py --names po/catalog-names.c'
                    ' data/materials.json data/fittings.json data/aging.json')


def names_c(mats, fit_doc, aging_doc):
    """The text of po/catalog-names.c: the names in catalog order, each with
    a comment for translators naming its table and id."""
    c = []
    c.append('/* SPDX-License-Identifier: GPL-3.0-or-later */')
    c.append('/* Generated by build-aux/gen-catalogs.py from the JSON files under data/: do not edit.')
    c.append(' * Regenerate from the source root after a change of a name in data/:')
    c.append(' *   ' + NAMES_REGENERATE)
    c.append(' *')
    c.append(' * Never compiled.  xgettext reads it (po/POTFILES.in) so that the names')
    c.append(' * the catalogs show to people reach translators; the core keeps the')
    c.append(' * English names, and the app and rugosa-cli pass them through _() where')
    c.append(' * they show them (ids and JSON output stay as they are). */')
    c.append('')
    c.append('static const char *const catalog_names[] = {')
    tables = (('materials.json', 'pipe material', mats),
              ('fittings.json', 'fitting or valve', fit_doc['fittings']),
              ('aging.json', 'class of water aggressiveness (roughness growth per year)',
               aging_doc['classes']))
    for json_name, what, rows in tables:
        for r in rows:
            c.append('  /* Catalog name of a %s (data/%s, id %s). */' % (what, json_name, r['id']))
            c.append('  N_(%s),' % c_str(r['name']))
    c.append('};')
    return '\n'.join(c) + '\n'


def main(argv):
    names_out = outdir = None
    if len(argv) > 1 and argv[1] == '--names':
        names_out, inputs = argv[2], argv[3:]
    else:
        outdir, inputs = argv[1], argv[2:]
    docs = {}
    for path in inputs:
        docs[os.path.basename(path)] = load(path)

    mats, mat_ids = materials(docs['materials.json'])
    fit_doc = docs['fittings.json']
    aging_doc = docs['aging.json']

    pipe_rows = []
    for name in sorted(docs):
        if name.startswith('pipes-'):
            pipe_rows += pipes(docs[name], docs, mat_ids)
    pipe_cats = pipe_catalogs(pipe_rows)
    seen = set()
    for p in pipe_rows:
        key = p['designation'].lower()
        if key in seen:
            raise CatalogError('designation %s listed twice' % p['designation'])
        seen.add(key)

    fit_ids = set()
    for f in fit_doc['fittings']:
        fitting(f, fit_doc, fit_ids)

    for c in aging_doc['classes']:
        lo, hi = c['range_mm_per_year']
        if not (0 <= lo <= c['rate_mm_per_year'] <= hi):
            raise CatalogError('aging class %s: rate outside its range' % c['id'])

    if names_out is not None:
        with open(names_out, 'w', encoding='utf-8') as f:
            f.write(names_c(mats, fit_doc, aging_doc))
        return 0

    h = []
    h.append('/* Generated by build-aux/gen-catalogs.py from the JSON files under data/: do not edit. */')
    h.append('#pragma once')
    h.append('#include "core/aging.h"')
    h.append('#include "core/catalog.h"')
    h.append('#include "core/fittings.h"')
    h.append('')
    for typ, name in (('RgMaterial', 'materials'), ('RgPipe', 'pipes'),
                      ('RgPipeCatalog', 'pipe_catalogs'),
                      ('RgFitting', 'fittings'), ('RgAgingClass', 'aging_classes')):
        h.append('extern const %s rg_catalog_%s[];' % (typ, name))
        h.append('extern const int rg_catalog_%s_count;' % name)

    c = []
    c.append('/* SPDX-License-Identifier: GPL-3.0-or-later */')
    c.append('/* Generated by build-aux/gen-catalogs.py from the JSON files under data/: do not edit.')
    c.append(' * The sources of every table are in the JSON files and in the')
    c.append(' * `source` field of each row. */')
    c.append('#include "catalog-data.h"')
    c.append('')

    c.append('const RgMaterial rg_catalog_materials[] = {')
    for m in mats:
        lo, hi = m['range_mm']
        c.append('  { .id = %s, .name = %s, .roughness_m = %s, .roughness_min_m = %s,'
                 ' .roughness_max_m = %s, .source = %s },'
                 % (c_str(m['id']), c_str(m['name']), c_num(m['roughness_mm'] * MM_M),
                    c_num(lo * MM_M), c_num(hi * MM_M), c_str(m['source'])))
    c.append('};')
    c.append('const int rg_catalog_materials_count = %d;' % len(mats))
    c.append('')

    c.append('const RgPipe rg_catalog_pipes[] = {')
    for p in pipe_rows:
        c.append('  { .designation = %s, .standard = %s, .nominal = %s, .series = %s,'
                 ' .material_id = %s, .outside_diameter_m = %s, .wall_m = %s,'
                 ' .inner_diameter_m = %s, .source = %s, .lining_m = %s, .catalog = %d },'
                 % (c_str(p['designation']), c_str(p['standard']), c_str(p['nominal']),
                    c_str(p['series']), c_str(p['material_id']), c_num(p['od']),
                    c_num(p['wall']), c_num(p['id']), c_str(p['source']),
                    c_num(p['lining']), p['catalog']))
    c.append('};')
    c.append('const int rg_catalog_pipes_count = %d;' % len(pipe_rows))
    c.append('')

    for k, cat in enumerate(pipe_cats):
        c.append('static const char *const pipe_catalog_materials_%d[] = { %s, NULL };'
                 % (k, ', '.join(c_str(m) for m in cat['p']['materials'])))
    c.append('const RgPipeCatalog rg_catalog_pipe_catalogs[] = {')
    for k, cat in enumerate(pipe_cats):
        p = cat['p']
        c.append('  { .name = %s, .standard = %s, .series = %s, .title = %s,'
                 ' .material_ids = pipe_catalog_materials_%d, .usual = %d,'
                 ' .first_pipe = %d, .n_pipes = %d, .source = %s, .lining_source = %s },'
                 % (c_str(cat['name']), c_str(p['standard']), c_str(p['series']),
                    c_str(p['title']), k, 1 if p['usual'] else 0, cat['first'],
                    cat['count'], c_str(p['source']), c_str(p['lining_source'])))
    c.append('};')
    c.append('const int rg_catalog_pipe_catalogs_count = %d;' % len(pipe_cats))
    c.append('')

    c.append('const RgFitting rg_catalog_fittings[] = {')
    for f in fit_doc['fittings']:
        c.append(fitting_c(f, fit_doc))
    c.append('};')
    c.append('const int rg_catalog_fittings_count = %d;' % len(fit_doc['fittings']))
    c.append('')

    c.append('const RgAgingClass rg_catalog_aging_classes[] = {')
    year_rate = MM_M
    for a in aging_doc['classes']:
        lo, hi = a['range_mm_per_year']
        c.append('  { .id = %s, .name = %s, .rate_m_per_year = %s, .rate_min_m_per_year = %s,'
                 ' .rate_max_m_per_year = %s, .source = %s },'
                 % (c_str(a['id']), c_str(a['name']), c_num(a['rate_mm_per_year'] * year_rate),
                    c_num(lo * year_rate), c_num(hi * year_rate), c_str(a['source'])))
    c.append('};')
    c.append('const int rg_catalog_aging_classes_count = %d;' % len(aging_doc['classes']))

    os.makedirs(outdir, exist_ok=True)
    with open(os.path.join(outdir, 'catalog-data.h'), 'w', encoding='utf-8') as f:
        f.write('\n'.join(h) + '\n')
    with open(os.path.join(outdir, 'catalog-data.c'), 'w', encoding='utf-8') as f:
        f.write('\n'.join(c) + '\n')
    return 0


if __name__ == '__main__':
    try:
        sys.exit(main(sys.argv))
    except (CatalogError, KeyError, ValueError) as e:
        sys.stderr.write('gen-catalogs: %s\n' % e)
        sys.exit(1)
