// The HTTP contract between client and server: request and response shapes under /api.
import type { Locale, ReadingRule } from '../checklist/index.js';
import type { FieldProblem, VehicleConfig, VehicleKind, VehicleStatus } from '../vehicle/index.js';

export const ROLES = ['driver', 'mechanic', 'supervisor', 'trainer', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const THEMES = ['day', 'night', 'night_red'] as const;
export type Theme = (typeof THEMES)[number];

// Text size in percent of the base size (WCAG 2.2 1.4.4 asks for text to 200 %).
export const TEXT_SCALE_MIN = 100;
export const TEXT_SCALE_MAX = 200;

export interface DisplaySettings {
  textScale: number;
  theme: Theme;
  // Main controls at least 20 mm and spaced, for gloved hands.
  gloveMode: boolean;
  locale: Locale;
}

export const DEFAULT_DISPLAY_SETTINGS: DisplaySettings = {
  textScale: 100,
  theme: 'day',
  gloveMode: false,
  locale: 'en',
};

export interface OrganizationSummary {
  id: string;
  name: string;
  // Readings every walk-around must take (by default none); a driver may still answer "no gauge".
  requiredReadings: ReadingRule[];
}

export interface UpdateRequiredReadingsRequest {
  requiredReadings: ReadingRule[];
}

export interface UserSummary {
  id: string;
  email: string;
  name: string;
  role: Role;
  // A driver in training: practice walk-arounds, reviewed by a trainer.
  isStudent: boolean;
  status: 'active' | 'invited';
  organizationId: string;
  organizationName: string;
  settings: DisplaySettings;
}

export interface LoginRequest {
  email: string;
  password: string;
}

export interface LoginResponse {
  accessToken: string;
  user: UserSummary;
}

export interface InviteUserRequest {
  email: string;
  name: string;
  role: Role;
  isStudent?: boolean;
}

export interface UpdateUserRequest {
  role?: Role;
  name?: string;
  isStudent?: boolean;
}

export interface InvitationSummary {
  email: string;
  name: string;
  organizationName: string;
  expiresAt: string;
}

export interface AcceptInvitationRequest {
  password: string;
}

export interface VehicleRequest {
  unitNumber: string;
  kind: VehicleKind;
  vin: string;
  plate: string;
  config: VehicleConfig;
  status?: VehicleStatus;
  // Why the vehicle is out of service; cleared when it returns to service.
  statusReason?: string | null;
}

export interface VehicleResponse {
  id: string;
  unitNumber: string;
  kind: VehicleKind;
  vin: string;
  plate: string;
  status: VehicleStatus;
  statusReason: string | null;
  statusSince: string;
  config: VehicleConfig;
  createdAt: string;
  updatedAt: string;
}

export interface CaughtMail {
  id: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
}

export interface HealthResponse {
  status: 'ok' | 'error';
  database: 'up' | 'down';
}

// The one error shape every /api route answers with.
export interface ApiErrorBody {
  statusCode: number;
  error: string;
  // A sentence a person can act on.
  message: string;
  // Present for validation errors: each field and what is wrong with it.
  fields?: FieldProblem[];
}

// Minimum password length for accounts (NIST SP 800-63B 5.1.1.2 asks for at least 8).
export const PASSWORD_MIN_LENGTH = 8;
