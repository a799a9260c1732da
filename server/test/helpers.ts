import type { INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { LoginResponse, Role } from '@yardcall/shared';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { AppModule } from '../src/app.module';
import { configureApp } from '../src/app.setup';
import { DEMO_PASSWORD } from '../src/database/seed-data';

export { bodyOf, errorBody } from './http';

export const ROLE_EMAILS: Record<Role, string> = {
  driver: 'driver@yardcall.test',
  mechanic: 'mechanic@yardcall.test',
  supervisor: 'supervisor@yardcall.test',
  trainer: 'trainer@yardcall.test',
  admin: 'admin@yardcall.test',
};
export const OTHER_ORG_ADMIN = 'admin@tamarack-bay.test';

export interface TestApp {
  app: INestApplication;
  url: string;
  dataSource: DataSource;
  close(): Promise<void>;
}

// The real app over real HTTP on a free loopback port.
export async function startApp(): Promise<TestApp> {
  const app = await NestFactory.create(AppModule, { logger: ['error', 'warn'], abortOnError: false });
  configureApp(app);
  await app.listen(0, '127.0.0.1');
  const { port } = (app.getHttpServer() as Server).address() as AddressInfo;
  return {
    app,
    url: `http://127.0.0.1:${port}`,
    dataSource: app.get(DataSource),
    close: () => app.close(),
  };
}

export async function login(url: string, email: string, password = DEMO_PASSWORD): Promise<LoginResponse> {
  const response = await request(url).post('/api/auth/login').send({ email, password });
  if (response.status !== 200) throw new Error(`login ${email} answered ${response.status}: ${response.text}`);
  return response.body as LoginResponse;
}

export async function tokensByRole(url: string): Promise<Record<Role, string>> {
  const entries = await Promise.all(
    (Object.entries(ROLE_EMAILS) as [Role, string][]).map(
      async ([role, email]) => [role, (await login(url, email)).accessToken] as const,
    ),
  );
  return Object.fromEntries(entries) as Record<Role, string>;
}

export function bearer(token: string): { Authorization: string } {
  return { Authorization: `Bearer ${token}` };
}
