"""Multi-port Touchstone data as scikit-rf (Debian python3-scikit-rf 0.15) reads them, for the N-port cross-check.

Usage: /usr/bin/python3 skrf_nport.py work_dir output.json

- shipped: every file of 3 or more ports that Debian's scikit-rf package ships (its own test files, of many
  shapes and origins), read with skrf.Network; a file skrf itself cannot read is listed with its error;
- generated: random reciprocal networks of 3 to 16 ports written by skrf's own write_touchstone (version 1,
  rows wrapped after 4 pairs) in RI, MA and DB, and read back by skrf.
S is written point-major, then row, then column.
"""
import glob
import json
import os
import re
import sys

import numpy as np

# skrf 0.15 still calls numpy's removed alias np.complex (the builtin complex); restore it before importing.
if not hasattr(np, 'complex'):
    np.complex = complex

import skrf  # noqa: E402

PORTS_IN_NAME = re.compile(r'\.s(\d+)p$', re.IGNORECASE)


def entry(kind, path, network):
    s = network.s
    return {
        'kind': kind,
        'path': path,
        'ports': int(s.shape[1]),
        'frequenciesHz': network.f.tolist(),
        'sRe': s.real.reshape(-1).tolist(),
        'sIm': s.imag.reshape(-1).tolist(),
    }


def shipped():
    root = os.path.dirname(skrf.__file__)
    results = []
    for path in sorted(glob.glob(os.path.join(root, '**', '*.*'), recursive=True)):
        match = PORTS_IN_NAME.search(path)
        if not match or int(match.group(1)) < 3:
            continue
        try:
            results.append(entry('shipped', path, skrf.Network(path)))
        except Exception as error:  # a file skrf cannot read is reported, not compared
            results.append({'kind': 'shipped', 'path': path, 'skrfError': str(error)})
    return results


def generated(work_dir):
    rng = np.random.default_rng(20261202)
    results = []
    for ports in (3, 4, 5, 6, 8, 12, 16):
        for form in ('ri', 'ma', 'db'):
            frequency = skrf.Frequency(0.7, 2.7, 41, 'ghz')
            a = rng.normal(size=(41, ports, ports)) + 1j * rng.normal(size=(41, ports, ports))
            s = (a + np.transpose(a, (0, 2, 1))) * (0.4 / ports)
            name = 'generated_%dport_%s' % (ports, form)
            skrf.Network(frequency=frequency, s=s, z0=50).write_touchstone(name, dir=work_dir, form=form)
            path = os.path.join(work_dir, '%s.s%dp' % (name, ports))
            results.append(entry('generated', path, skrf.Network(path)))
    return results


def main():
    work_dir, output_path = sys.argv[1], sys.argv[2]
    with open(output_path, 'w') as handle:
        json.dump({'skrfVersion': skrf.__version__, 'results': shipped() + generated(work_dir)}, handle)


if __name__ == '__main__':
    main()
