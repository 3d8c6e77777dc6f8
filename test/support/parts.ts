import type { INestApplication } from '@nestjs/common';
import { ListObjectsV2Command, type S3Client } from '@aws-sdk/client-s3';
import { getDataSourceToken } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import request from 'supertest';
import { writeTouchstone } from '../../src-server/rf/touchstone-writer';
import { unique } from './api-app';

/** A minimal valid draft body with a unique MPN under a test-only manufacturer. */
export function draftBody(overrides: Record<string, unknown> = {}) {
  return {
    manufacturer: 'Testbench Antennas',
    mpn: unique('TB'),
    title: 'Test chip antenna',
    formFactor: 'chip',
    connector: 'solder-pad',
    polarization: 'linear',
    ...overrides,
  };
}

export async function createDraft(app: INestApplication, token: string, overrides: Record<string, unknown> = {}) {
  const res = await request(app.getHttpServer()).post('/api/parts').set('Authorization', `Bearer ${token}`).send(draftBody(overrides));
  if (res.status !== 201) throw new Error(`creating a draft failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; version: number; mpn: string; manufacturer: string };
}

/** A 1-port Touchstone file (RI) with |Γ| given per frequency; Γ is real so |Γ| is exact. */
export function s1pWithGamma(points: [mhz: number, gammaMagnitude: number][]): string {
  return writeTouchstone({
    version: 1,
    ports: 1,
    frequencyUnit: 'MHz',
    format: 'RI',
    comments: ['test data, invented'],
    frequenciesHz: points.map(([mhz]) => mhz * 1e6),
    data: [{ re: points.map(([, g]) => g), im: points.map(() => 0) }],
  });
}

export function csvCurve(header: string, points: [number, number][]): string {
  return [header, ...points.map(([f, v]) => `${f},${v}`)].join('\n') + '\n';
}

/** How many file rows (measurements and documents) and stored objects a part has: after a refusal both stay 0. */
export async function storedFilesOf(app: INestApplication, s3: S3Client, bucket: string, partId: number): Promise<{ rows: number; objects: number }> {
  const db = app.get<DataSource>(getDataSourceToken());
  const [m] = await db.query('SELECT COUNT(*) AS n FROM part_measurements WHERE part_id = ?', [partId]);
  const [d] = await db.query('SELECT COUNT(*) AS n FROM part_documents WHERE part_id = ?', [partId]);
  const objects = (await s3.send(new ListObjectsV2Command({ Bucket: bucket, Prefix: `parts/${partId}/` }))).KeyCount ?? 0;
  return { rows: Number(m.n) + Number(d.n), objects };
}

/** The basis an upload of each kind states in the tests unless a test says otherwise: total efficiency, peak gain; none for s11. */
const TEST_BASIS: Record<string, string | undefined> = { efficiency: 'total', 'peak-gain': 'peak', 'average-gain': 'peak' };

/** The multipart field `basis` for a kind, as the upload form sends it (nothing for s11 or an unknown kind). */
export function basisFields(kind: string): Record<string, string> {
  const basis = TEST_BASIS[kind];
  return basis ? { basis } : {};
}
