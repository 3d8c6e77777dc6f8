import { Injectable } from '@nestjs/common';
import { ValidationFailedError } from '../common/domain-error';
import { withTouchstoneStatus } from '../common/touchstone-http-error';
import { angleDeg, magnitude } from '../rf/complex';
import { evenlySpacedFrequencies, resample } from '../rf/curves';
import { linkBudget, rangeRatioFromDbDifference } from '../rf/link-budget';
import { designLSectionMatch, type LSectionNetwork, type SweepPoint } from '../rf/matching';
import {
  gammaFromImpedance,
  gammaMagnitudeFromReturnLossDb,
  gammaMagnitudeFromVswr,
  mismatchLossDbFromGammaMagnitude,
  reflectedFractionFromGammaMagnitude,
  returnLossDbFromGammaMagnitude,
  returnLossDbFromVswr,
  transmittedFractionFromGammaMagnitude,
  vswrFromGammaMagnitude,
  vswrFromReturnLossDb,
} from '../rf/mismatch';
import {
  bestMatch,
  DEFAULT_MATCH_CRITERION,
  gammaLimitOf,
  type MatchCriterion,
  matchedRanges,
  reflectionCurveFromNetwork,
  type ReflectionCurve,
  RETURN_LOSS_10_DB_CRITERION,
} from '../rf/reflection';
import { portsFromFileName, readTouchstone } from '../rf/touchstone';
import { dbmToMw, dbmToWatts, efficiencyDbToPercent, efficiencyPercentToDb, mwToDbm, wavelengthFractionMm } from '../rf/units';
import type { AnalyzeTouchstoneDto, CurvePointDto, TouchstoneAnalysisDto } from './dto/analyze-touchstone.dto';
import type { ConversionRequestDto, ConversionResponseDto, ReflectionDto } from './dto/conversions.dto';
import type { LinkBudgetRequestDto, LinkBudgetResponseDto } from './dto/link-budget.dto';
import type { MatchingElementDto, MatchingRequestDto, MatchingResponseDto, NetworkDto, SweepPointDto } from './dto/matching.dto';

/** Most points the analysis returns for plotting; a chart gains nothing from more. */
export const PLOT_POINTS = 2000;
/** Most matched ranges returned; a real antenna has a handful, a noisy file up to one per two points. */
export const MAX_MATCHED_RANGES = 100;

export interface UploadedTouchstone {
  readonly originalname: string;
  readonly buffer: Buffer;
}

/** JSON has no Infinity: an infinite return loss or VSWR goes out as null. */
const finiteOrNull = (value: number): number | null => (Number.isFinite(value) ? value : null);

@Injectable()
export class RfToolsService {
  analyzeTouchstone(file: UploadedTouchstone | undefined, options: AnalyzeTouchstoneDto): TouchstoneAnalysisDto {
    if (!file) throw new ValidationFailedError([{ field: 'file', message: 'a Touchstone file (.s1p, .s2p or .ts) is required' }]);
    const network = withTouchstoneStatus(() => readTouchstone(file.buffer, { expectedPorts: portsFromFileName(file.originalname) }));
    const port = options.port ?? 1;
    if (port > network.ports) throw new ValidationFailedError([{ field: 'port', message: `the file has ${network.ports} port; there is no port ${port}` }]);
    const criterionName = options.criterion ?? 'vswr';
    const criterion: MatchCriterion =
      criterionName === 'return-loss-10db'
        ? RETURN_LOSS_10_DB_CRITERION
        : options.vswrMax !== undefined
          ? { kind: 'vswr', maxVswr: options.vswrMax }
          : DEFAULT_MATCH_CRITERION;
    const curve = reflectionCurveFromNetwork(network, port);
    const gammaLimit = gammaLimitOf(criterion);
    const best = bestMatch(curve);
    const points = curve.frequenciesHz.length;
    const ranges = matchedRanges(curve, criterion);
    return {
      version: network.version,
      ports: network.ports,
      parameter: network.parameter,
      format: network.format,
      referenceOhms: [...network.referenceOhms],
      points,
      minFrequencyHz: curve.frequenciesHz[0],
      maxFrequencyHz: curve.frequenciesHz[points - 1],
      port,
      criterion: criterionName,
      thresholdVswr: vswrFromGammaMagnitude(gammaLimit),
      thresholdReturnLossDb: returnLossDbFromGammaMagnitude(gammaLimit),
      matchedRanges: ranges.slice(0, MAX_MATCHED_RANGES).map(({ fromHz, toHz }) => ({ fromHz, toHz })),
      matchedRangeCount: ranges.length,
      bestMatch: { frequencyHz: best.frequencyHz, gammaMagnitude: best.gammaMagnitude, vswr: best.vswr, returnLossDb: best.returnLossDb },
      resampled: points > PLOT_POINTS,
      curve: plotCurve(curve),
    };
  }

  matching(request: MatchingRequestDto): MatchingResponseDto {
    const solutions = designLSectionMatch({
      frequencyHz: request.frequencyHz,
      loadOhms: { re: request.loadOhms.re, im: request.loadOhms.im },
      z0Ohms: request.z0Ohms,
      series: request.series,
      ...(request.sweep ? { sweep: { fromHz: request.sweep.fromHz, toHz: request.sweep.toHz, points: request.sweep.points } } : {}),
    });
    return {
      frequencyHz: request.frequencyHz,
      z0Ohms: request.z0Ohms,
      series: request.series,
      solutions: solutions.map((solution) => ({
        topology: solution.exact.topology,
        exact: toNetworkDto(solution.exact, solution.exactSweep),
        snapped: toNetworkDto(solution.snapped, solution.snappedSweep),
        snappedReturnLossDb: finiteOrNull(solution.snappedReturnLossDb),
      })),
    };
  }

  linkBudget(request: LinkBudgetRequestDto): LinkBudgetResponseDto {
    return { ...linkBudget(request), rangeRatioFor6DbLess: rangeRatioFromDbDifference(-6) };
  }

  convert(request: ConversionRequestDto): ConversionResponseDto {
    const given = (['vswr', 'returnLossDb', 'gammaMagnitude', 'impedanceOhms', 'frequencyHz', 'dbm', 'mw', 'efficiencyPct', 'efficiencyDb'] as const).filter(
      (key) => request[key] !== undefined,
    );
    if (given.length !== 1) {
      throw new ValidationFailedError([
        {
          field: given.length ? given.join(', ') : 'body',
          message: `give exactly one known quantity (vswr, returnLossDb, gammaMagnitude, impedanceOhms, frequencyHz, dbm, mw, efficiencyPct or efficiencyDb); got ${given.length}`,
        },
      ]);
    }
    if (request.z0Ohms !== undefined && given[0] !== 'impedanceOhms')
      throw new ValidationFailedError([{ field: 'z0Ohms', message: 'only goes with impedanceOhms' }]);
    const input = given[0];
    switch (input) {
      case 'vswr':
        return {
          input,
          reflection: reflectionOf(gammaMagnitudeFromVswr(request.vswr!), { vswr: request.vswr!, returnLossDb: returnLossDbFromVswr(request.vswr!) }),
        };
      case 'returnLossDb':
        return {
          input,
          reflection: reflectionOf(gammaMagnitudeFromReturnLossDb(request.returnLossDb!), {
            vswr: vswrFromReturnLossDb(request.returnLossDb!),
            returnLossDb: request.returnLossDb!,
          }),
        };
      case 'gammaMagnitude':
        return { input, reflection: reflectionOf(request.gammaMagnitude!) };
      case 'impedanceOhms': {
        const gamma = gammaFromImpedance({ re: request.impedanceOhms!.re, im: request.impedanceOhms!.im }, request.z0Ohms ?? 50);
        const gammaMagnitude = magnitude(gamma);
        return { input, gamma: { re: gamma.re, im: gamma.im, magnitude: gammaMagnitude, angleDeg: angleDeg(gamma) }, reflection: reflectionOf(gammaMagnitude) };
      }
      case 'frequencyHz': {
        const f = request.frequencyHz!;
        return {
          input,
          wavelength: {
            frequencyHz: f,
            wavelengthMm: wavelengthFractionMm(f),
            halfWaveMm: wavelengthFractionMm(f, 0.5),
            quarterWaveMm: wavelengthFractionMm(f, 0.25),
          },
        };
      }
      case 'dbm':
        return { input, power: { dbm: request.dbm!, mw: dbmToMw(request.dbm!), watts: dbmToWatts(request.dbm!) } };
      case 'mw': {
        const dbm = mwToDbm(request.mw!);
        return { input, power: { dbm, mw: request.mw!, watts: dbmToWatts(dbm) } };
      }
      case 'efficiencyPct':
        return { input, efficiency: { percent: request.efficiencyPct!, db: efficiencyPercentToDb(request.efficiencyPct!) } };
      case 'efficiencyDb':
        return { input, efficiency: { percent: efficiencyDbToPercent(request.efficiencyDb!), db: request.efficiencyDb! } };
    }
  }
}

/** Every reflection quantity from |Γ|; `direct` keeps the given value exact instead of a round trip. */
function reflectionOf(gammaMagnitude: number, direct: { vswr?: number; returnLossDb?: number } = {}): ReflectionDto {
  return {
    gammaMagnitude,
    vswr: finiteOrNull(direct.vswr ?? vswrFromGammaMagnitude(gammaMagnitude)),
    returnLossDb: finiteOrNull(direct.returnLossDb ?? returnLossDbFromGammaMagnitude(gammaMagnitude)),
    mismatchLossDb: finiteOrNull(mismatchLossDbFromGammaMagnitude(gammaMagnitude)),
    transmittedPercent: transmittedFractionFromGammaMagnitude(gammaMagnitude) * 100,
    reflectedPercent: reflectedFractionFromGammaMagnitude(gammaMagnitude) * 100,
  };
}

function curvePoint(frequencyHz: number, gammaMagnitude: number): CurvePointDto {
  return {
    frequencyHz,
    gammaMagnitude,
    vswr: finiteOrNull(vswrFromGammaMagnitude(gammaMagnitude)),
    returnLossDb: finiteOrNull(returnLossDbFromGammaMagnitude(gammaMagnitude)),
  };
}

/** The file's points, or |Γ| resampled onto PLOT_POINTS even steps when the file has more. */
function plotCurve(curve: ReflectionCurve): CurvePointDto[] {
  const f = curve.frequenciesHz;
  if (f.length <= PLOT_POINTS) return Array.from(f, (frequencyHz, i) => curvePoint(frequencyHz, curve.gammaMagnitude[i]));
  const grid = evenlySpacedFrequencies(f[0], f[f.length - 1], PLOT_POINTS);
  const gamma = resample({ frequenciesHz: f, values: curve.gammaMagnitude }, grid);
  return Array.from(grid, (frequencyHz, k) => curvePoint(frequencyHz, gamma[k]));
}

function toNetworkDto(network: LSectionNetwork, sweep: { status: string; points?: readonly SweepPoint[] } | undefined): NetworkDto {
  const elements: MatchingElementDto[] = network.elements.map((element) => ({
    connection: element.connection,
    position: element.position,
    kind: element.component.kind,
    inductanceNh: element.component.kind === 'inductor' ? element.component.inductanceNh : null,
    capacitancePf: element.component.kind === 'capacitor' ? element.component.capacitancePf : null,
  }));
  const points: SweepPointDto[] = (sweep?.points ?? []).map((p) => ({
    frequencyHz: p.frequencyHz,
    returnLossDb: finiteOrNull(p.returnLossDb),
    vswr: finiteOrNull(p.vswr),
  }));
  return { elements, sweep: points };
}
