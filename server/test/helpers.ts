import type { INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import {
  type InspectionResponse,
  type LoginResponse,
  type ResultUpsert,
  type Role,
  type VehicleRequest,
  type VehicleResponse,
} from '@yardcall/shared';
import { sampleTractor, sampleTrailer } from '@yardcall/shared/testing';
import { randomInt, randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { AppModule } from '../src/app.module';
import { configureApp } from '../src/app.setup';
import { DEMO_PASSWORD } from '../src/database/seed-data';
import { bodyOf, errorBody } from './http';

export { binary, bodyOf, errorBody } from './http';

export const ROLE_EMAILS: Record<Role, string> = {
  driver: 'driver@yardcall.test',
  mechanic: 'mechanic@yardcall.test',
  supervisor: 'supervisor@yardcall.test',
  trainer: 'trainer@yardcall.test',
  admin: 'admin@yardcall.test',
};
export const OTHER_ORG_ADMIN = 'admin@tamarack-bay.test';
// A second driver of the demo organisation.
export const SECOND_DRIVER = 'tomas.reyes@yardcall.test';

export interface TestApp {
  app: INestApplication;
  url: string;
  dataSource: DataSource;
  close(): Promise<void>;
}

// The real app over real HTTP on a free loopback port.
export async function startApp(): Promise<TestApp> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule, {
    logger: ['error', 'warn'],
    abortOnError: false,
  });
  configureApp(app);
  await app.listen(0, '127.0.0.1');
  const { port } = app.getHttpServer().address() as AddressInfo;
  return {
    app,
    url: `http://127.0.0.1:${port}`,
    dataSource: app.get(DataSource),
    close: () => app.close(),
  };
}

export interface SuiteApp {
  t: TestApp;
  tokens: Record<Role, string>;
}

// A suite's app: started before its tests with a token for each demo role, and closed after them (after
// `putBack`, for a suite that changes demo data the suites after it read). Both objects are filled in by
// beforeAll, so tests read t.url and tokens.driver; a suite's own beforeAll runs after this one.
export function suiteApp(putBack?: () => PromiseLike<unknown>): SuiteApp {
  const t = {} as TestApp;
  const tokens = {} as Record<Role, string>;
  beforeAll(async () => {
    Object.assign(t, await startApp());
    Object.assign(tokens, await tokensByRole(t.url));
  });
  afterAll(async () => {
    await putBack?.();
    await t.close();
  });
  return { t, tokens };
}

// A unit number of the test's own, so suites sharing the database never collide.
export function unitNumber(prefix: string): string {
  return `${prefix}-${randomInt(10_000, 99_999)}`;
}

// A 400 that names at least these fields, each with its message.
export function expectFieldProblems(response: request.Response, problems: { field: string; message: string }[]): void {
  expect(response.status).toBe(400);
  expect(errorBody(response).fields).toEqual(expect.arrayContaining(problems));
}

// A 201 and the record it answers.
export function createdBody<T>(response: request.Response): T {
  expect(response.status).toBe(201);
  return bodyOf<T>(response);
}

export async function login(url: string, email: string, password = DEMO_PASSWORD): Promise<LoginResponse> {
  const response = await request(url).post('/api/auth/login').send({ email, password });
  if (response.status !== 200) throw new Error(`login ${email} answered ${response.status}: ${response.text}`);
  return response.body as LoginResponse;
}

// The access token of a seeded user.
export async function signIn(url: string, email: string): Promise<string> {
  return (await login(url, email)).accessToken;
}

export async function tokensByRole(url: string): Promise<Record<Role, string>> {
  const entries = await Promise.all(
    (Object.entries(ROLE_EMAILS) as [Role, string][]).map(
      async ([role, email]) => [role, await signIn(url, email)] as const,
    ),
  );
  return Object.fromEntries(entries) as Record<Role, string>;
}

export function bearer(token: string): { Authorization: string } {
  return { Authorization: `Bearer ${token}` };
}

// The shared demo tractor and trailer under a unit number of the test's own: for tests that need
// any valid vehicle, not a particular configuration.
export function tractorRequest(unitNumber: string, overrides: Partial<VehicleRequest> = {}): VehicleRequest {
  return { ...sampleTractor(), unitNumber, ...overrides };
}

export function trailerRequest(unitNumber: string): VehicleRequest {
  return { ...sampleTrailer(), unitNumber };
}

export async function createVehicle(url: string, token: string, body: VehicleRequest): Promise<VehicleResponse> {
  const response = await request(url).post('/api/vehicles').set(bearer(token)).send(body);
  return createdBody<VehicleResponse>(response);
}

// A tractor of the test's own (the demo tractor under a fresh unit number starting with `prefix`).
export function newTractor(url: string, token: string, prefix: string): Promise<VehicleResponse> {
  return createVehicle(url, token, tractorRequest(unitNumber(prefix)));
}

export interface InspectionStart {
  vehicleIds: string[];
  kind?: string;
  startedAt?: string;
  clientId?: string;
  location?: string;
}

// POST /api/inspections; unless the test says otherwise a pre-trip starting now under a fresh clientId.
export function postInspection(url: string, token: string, start: InspectionStart): request.Test {
  const {
    vehicleIds,
    kind = 'pre_trip',
    startedAt = new Date().toISOString(),
    clientId = randomUUID(),
    location,
  } = start;
  // JSON leaves out a location the test did not give.
  return request(url)
    .post('/api/inspections')
    .set(bearer(token))
    .send({ vehicleIds, kind, startedAt, clientId, location });
}

export async function startInspection(url: string, token: string, start: InspectionStart): Promise<InspectionResponse> {
  const response = await postInspection(url, token, start);
  return createdBody<InspectionResponse>(response);
}

// PUT a batch of answers of a walk-around, which the server must take.
export async function putAnswers(url: string, token: string, inspectionId: string, results: ResultUpsert[]) {
  const put = await request(url).put(`/api/inspections/${inspectionId}/results`).set(bearer(token)).send({ results });
  expect(put.status).toBe(200);
}

// Signs and submits a walk-around as the demo driver: the report as the server keeps it.
export async function signAndSubmit(url: string, token: string, inspectionId: string): Promise<InspectionResponse> {
  const submitted = await request(url)
    .post(`/api/inspections/${inspectionId}/submit`)
    .set(bearer(token))
    .send({ signature: { name: 'Dana Okafor' } });
  expect(submitted.status).toBe(200);
  return bodyOf<InspectionResponse>(submitted);
}

// Sends a walk-around's answers, then signs and submits it: the report as the server keeps it.
export async function answerAndSubmit(
  url: string,
  token: string,
  inspectionId: string,
  results: ResultUpsert[],
): Promise<InspectionResponse> {
  await putAnswers(url, token, inspectionId, results);
  return signAndSubmit(url, token, inspectionId);
}
