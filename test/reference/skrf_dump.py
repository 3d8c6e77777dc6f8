"""Reads Touchstone files with scikit-rf (Debian python3-scikit-rf 0.15) and writes per-point facts as JSON.

Usage: /usr/bin/python3 skrf_dump.py manifest.json output.json
manifest: {"files": ["/tmp/x/a.s1p", ...], "vswrMax": 2}

skrf 0.15 gaps, bridged here and nowhere else:
- it does not know the v2 keywords [Two-Port Data Order], [Number of Noise Frequencies], [Noise Data],
  [Matrix Format]: those lines are dropped from a temporary copy before skrf reads it;
- it always reads 2-port data in the version-1 order (S21 before S12), so a 12_21 file's matrix is
  transposed back (Touchstone 2.0 [Two-Port Data Order]);
- it uses the option line's R as z0 and ignores [Reference], so port impedances use Touchstone.reference;
- skrf.Network refuses Z and Y files, so those are read with skrf's Touchstone class and converted with
  skrf.network.z2s / y2s (v1 data de-normalised by R, v2 data already in ohms / siemens).
"""
import json
import os
import sys
import tempfile

import numpy as np

# skrf 0.15 still calls numpy's removed alias np.complex (the builtin complex); restore it before importing.
if not hasattr(np, 'complex'):
    np.complex = complex

import skrf  # noqa: E402
from skrf.io.touchstone import Touchstone  # noqa: E402
from skrf.network import Network, y2s, z2s  # noqa: E402

UNKNOWN_TO_SKRF = ('[two-port data order]', '[number of noise frequencies]', '[noise data]', '[matrix format]')


def skrf_copy(path, work_dir):
    with open(path) as handle:
        lines = handle.read().splitlines()
    order = None
    ports = None
    kept = []
    for line in lines:
        lowered = line.strip().lower()
        if lowered.startswith('[two-port data order]'):
            order = lowered.split()[-1]
        if lowered.startswith('[number of ports]'):
            ports = int(lowered.split()[-1])
        if lowered.startswith(UNKNOWN_TO_SKRF):
            continue
        kept.append(line)
    if ports is None:
        ports = int(os.path.splitext(path)[1][2:-1])
    copy = os.path.join(work_dir, os.path.basename(os.path.splitext(path)[0]) + '.s%dp' % ports)
    with open(copy, 'w') as handle:
        handle.write('\n'.join(kept) + '\n')
    return copy, order, ports


def read(path, work_dir):
    copy, order, ports = skrf_copy(path, work_dir)
    touchstone = Touchstone(copy)
    references = np.array([float(r) for r in touchstone.reference], dtype=float)
    parameter = touchstone.get_format().split()[1]
    if parameter == 's':
        network = Network(copy)
        f = network.f
        s = network.s
    else:
        f, raw = touchstone.get_sparameter_arrays()
        resistance = float(touchstone.resistance)
        version1 = touchstone.version == '1.0'
        if parameter == 'z':
            s = z2s(raw * resistance if version1 else raw, references)
        elif parameter == 'y':
            s = y2s(raw / resistance if version1 else raw, references)
        else:
            raise SystemExit('unsupported parameter ' + parameter)
    if ports == 2 and order == '12_21':
        s = np.transpose(s, axes=(0, 2, 1))
    return f, s, references, ports


def matched_ranges(f, vswr, vswr_max):
    # Sample-based: a range runs from its first to its last matched sample.
    ranges = []
    start = None
    for i, ok in enumerate(vswr <= vswr_max):
        if ok and start is None:
            start = i
        if not ok and start is not None:
            ranges.append([float(f[start]), float(f[i - 1])])
            start = None
    if start is not None:
        ranges.append([float(f[start]), float(f[-1])])
    return ranges


def main():
    manifest_path, output_path = sys.argv[1], sys.argv[2]
    with open(manifest_path) as handle:
        manifest = json.load(handle)
    results = []
    with tempfile.TemporaryDirectory() as work_dir:
        for path in manifest['files']:
            f, s, references, ports = read(path, work_dir)
            entry = {'path': path, 'skrfVersion': skrf.__version__, 'frequenciesHz': f.tolist(), 'ports': []}
            for p in range(ports):
                one_port = Network(f=f, s=s[:, p, p], z0=references[p], f_unit='hz')
                vswr = one_port.s_vswr[:, 0, 0]
                entry['ports'].append({
                    'port': p + 1,
                    'sRe': s[:, p, p].real.tolist(),
                    'sIm': s[:, p, p].imag.tolist(),
                    'sMagnitude': one_port.s_mag[:, 0, 0].tolist(),
                    'vswr': vswr.tolist(),
                    'returnLossDb': (-one_port.s_db[:, 0, 0]).tolist(),
                    'zRe': one_port.z[:, 0, 0].real.tolist(),
                    'zIm': one_port.z[:, 0, 0].imag.tolist(),
                    'matchedRanges': matched_ranges(f, vswr, manifest['vswrMax']),
                })
            results.append(entry)
    with open(output_path, 'w') as handle:
        json.dump({'results': results}, handle)


if __name__ == '__main__':
    main()
