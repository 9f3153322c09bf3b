/**
 * The HTTP API's request schemas and response shapes, shared by the server (validation) and the
 * client (forms and typed fetchers). Paths are listed in ../shared/DESIGN.md (API section).
 * Errors always have the shape { error: { code, message, issues: [{ path, message }] } }.
 */
import { z } from 'zod';
import type { DesignDocument } from './design';
import { designWithParsedSchema, parsedDesignSchema } from './parsed-design';
import type { DesignResult } from '../engine/types';
import type { ShapeRecord } from '../engine/shapes/types';

export const ROLES = ['admin', 'architect', 'fabricator', 'engineer'] as const;
export type Role = (typeof ROLES)[number];
export const unitSystemSchema = z.enum(['US', 'SI'], { error: 'must be "US" or "SI"' });

/** Who may change which part of a design document (DESIGN.md, "Who uses it"). */
export const EDIT_RIGHTS: Record<Role, { member: boolean; connection: boolean; attachments: boolean }> = {
  admin: { member: false, connection: false, attachments: false },
  architect: { member: true, connection: false, attachments: true },
  fabricator: { member: false, connection: true, attachments: true },
  engineer: { member: true, connection: true, attachments: true },
};

// ---- auth and users --------------------------------------------------------------------------
export { loginSchema } from './auth';
export const updateMeSchema = z.object({
  units: unitSystemSchema.optional(),
  displayName: z.string().trim().min(1).max(80).optional(),
});
export type UpdateMeRequest = z.output<typeof updateMeSchema>;
export type UpdateMeBody = z.input<typeof updateMeSchema>;
export interface UserDto {
  id: number;
  email: string;
  displayName: string;
  role: Role;
  units: 'US' | 'SI';
  active: boolean;
  /**
   * Set when an admin created the account or reset its password: nothing but changing the password
   * works until it is changed (always sent).
   */
  mustChangePassword?: boolean;
}
export { changePasswordSchema, type ChangePasswordBody, type ChangePasswordRequest } from './auth';
export const createUserSchema = z.object({
  email: z.email('must be an e-mail address'),
  displayName: z.string().trim().min(1, 'is required').max(80),
  role: z.enum(ROLES, { error: 'must be admin, architect, fabricator or engineer' }),
  password: z.string().min(10, 'must be at least 10 characters').max(200),
});
export type CreateUserRequest = z.output<typeof createUserSchema>;
export const updateUserSchema = z.object({
  displayName: z.string().trim().min(1).max(80).optional(),
  role: z.enum(ROLES).optional(),
  active: z.boolean().optional(),
  /** An admin's reset: the person must change it at the next sign-in. */
  password: z.string().min(10, 'must be at least 10 characters').max(200).optional(),
});
export type UpdateUserRequest = z.output<typeof updateUserSchema>;

// ---- projects and members --------------------------------------------------------------------
export const DEFAULT_CODE_BASIS = 'IBC 2021 / ASCE 7-16 / AISC 360-16 / ACI 318-19';
export const createProjectSchema = z.object({
  name: z.string().trim().min(1, 'is required').max(120),
  site: z.string().trim().max(200).default(''),
  codeBasis: z.string().trim().max(200).default(DEFAULT_CODE_BASIS),
  units: unitSystemSchema.default('US'),
});
export type CreateProjectRequest = z.output<typeof createProjectSchema>;
export interface ProjectDto {
  id: number;
  name: string;
  site: string;
  codeBasis: string;
  units: 'US' | 'SI';
  createdAt: string;
  cantileverCount: number;
}
export interface MemberDto {
  userId: number;
  email: string;
  displayName: string;
  role: Role;
}
export interface ProjectDetailDto extends ProjectDto {
  members: MemberDto[];
  cantilevers: CantileverDto[];
}
export const addMemberSchema = z.object({ userId: z.number().int().positive() });
export type AddMemberRequest = z.output<typeof addMemberSchema>;

// ---- cantilevers and revisions ---------------------------------------------------------------
export type ReviewState = 'draft' | 'submitted' | 'approved' | 'changes-requested';
export interface CantileverDto {
  id: number;
  projectId: number;
  name: string;
  description: string;
  currentRevisionId: number | null;
  currentRevisionNumber: number | null;
  reviewState: ReviewState | null;
  ok: boolean | null;
  updatedAt: string;
  /** How many identical beams this cantilever stands for (the plate schedule's quantity). */
  quantity: number;
  /** The latest approved revision, which the shop builds from; null when none is approved. */
  latestApproved: {
    revisionId: number;
    number: number;
    approvedBy: string;
    approvedAt: string;
  } | null;
}
const quantitySchema = z
  .number({ error: 'must be a whole number of beams' })
  .int('must be a whole number of beams')
  .min(1, 'must be at least 1')
  .max(999, 'is too large (999 at most)');
export const updateCantileverSchema = z.object({ quantity: quantitySchema });
export type UpdateCantileverRequest = z.output<typeof updateCantileverSchema>;
export const createCantileverSchema = z.object({
  /** Number of identical beams; default 1. */
  quantity: quantitySchema.default(1),
  name: z.string().trim().min(1, 'is required').max(120, 'is too long (120 characters at most)'),
  description: z.string().trim().max(500, 'is too long (500 characters at most)').default(''),
  /**
   * Optional first design; saved as revision 1 with the message "First design". Validated and
   * parsed in one pass: the handler gets the document as written and the engine's parsed form.
   */
  input: designWithParsedSchema.optional(),
});
export type CreateCantileverRequest = z.output<typeof createCantileverSchema>;
export const createRevisionSchema = z.object({
  /** The revision number this save was based on; null for the first revision. */
  baseRevision: z.number().int().positive().nullable(),
  message: z.string().trim().min(1, 'describe what changed').max(500),
  /** The document as written (stored, compared) and parsed (the engine's input), from one pass. */
  input: designWithParsedSchema,
});
/** What the server's handlers receive (parsed). */
export type CreateRevisionRequest = z.output<typeof createRevisionSchema>;
/** What a client sends (before parsing). */
export type CreateRevisionBody = z.input<typeof createRevisionSchema>;
export interface RevisionSummaryDto {
  id: number;
  cantileverId: number;
  number: number;
  authorId: number;
  authorName: string;
  message: string;
  engineVersion: string;
  baseRevisionNumber: number | null;
  createdAt: string;
  ok: boolean;
  reviewState: ReviewState;
}
export interface RevisionDto extends RevisionSummaryDto {
  input: DesignDocument;
  result: DesignResult;
  reviews: ReviewDto[];
}
/** Body of a 409 answer to a stale save: the error, and the latest revision to compare with. */
export interface StaleSaveBody {
  error: { code: 'stale_base'; message: string; issues: [] };
  latest: RevisionDto;
}

// ---- review and comments ---------------------------------------------------------------------
/** Body of a submission: an optional note to the reviewer, sent in the e-mail and kept with the request. */
export const submitSchema = z
  .object({ note: z.string().trim().max(2000, 'is too long (2000 characters at most)').default('') })
  .default({ note: '' });
export type SubmitRequest = z.output<typeof submitSchema>;
/** What a submission answers: the revision, and in words who was told (or why nobody could be). */
export type SubmitResponse = RevisionDto & { notice: string; notified: string[] };
/** A submitted revision waiting for the signed-in engineer (never their own). */
export interface AwaitingReviewDto {
  revisionId: number;
  number: number;
  message: string;
  cantileverId: number;
  cantileverName: string;
  projectId: number;
  projectName: string;
  authorName: string;
  submittedAt: string;
}
export const reviewSchema = z.object({
  decision: z.enum(['approve', 'request-changes'], { error: 'must be "approve" or "request-changes"' }),
  comment: z.string().trim().max(4000).default(''),
});
export type ReviewRequest = z.output<typeof reviewSchema>;
export type ReviewBody = z.input<typeof reviewSchema>;
export interface ReviewDto {
  id: number;
  revisionId: number;
  state: 'submitted' | 'approved' | 'changes-requested';
  reviewerId: number;
  reviewerName: string;
  comment: string;
  createdAt: string;
}
export const commentSchema = z.object({ body: z.string().trim().min(1, 'is required').max(4000) });
export interface CommentDto {
  id: number;
  revisionId: number;
  authorId: number;
  authorName: string;
  body: string;
  createdAt: string;
}

// ---- attachments, shapes, outbox -------------------------------------------------------------
export interface AttachmentDto {
  id: number;
  cantileverId: number;
  originalName: string;
  mimeType: string;
  size: number;
  sha256: string;
  uploaderId: number;
  uploaderName: string;
  createdAt: string;
  /** What the file shows, in the uploader's words ('' when none). */
  description: string;
  /** The revision of the same cantilever the file belongs to, or null. */
  revisionId: number | null;
  revisionNumber: number | null;
}
export const ATTACHMENT_DESCRIPTION_MAX = 500;
const attachmentDescription = z
  .string()
  .trim()
  .max(ATTACHMENT_DESCRIPTION_MAX, `must be at most ${ATTACHMENT_DESCRIPTION_MAX} characters`);
const attachmentRevision = z.coerce
  .number({ error: 'must be a revision id' })
  .int('must be a revision id')
  .positive('must be a revision id');
/** The text parts of an upload (multipart fields beside `file`); empty strings mean "none". */
export const attachmentFieldsSchema = z.object({
  description: attachmentDescription.optional(),
  revisionId: z.union([z.literal(''), attachmentRevision]).optional(),
});
/** The uploader's later changes: the description, and the revision it belongs to (null: none). */
export const updateAttachmentSchema = z
  .object({
    description: attachmentDescription.optional(),
    revisionId: attachmentRevision.nullable().optional(),
  })
  .refine((v) => v.description !== undefined || v.revisionId !== undefined, {
    message: 'give a description or a revisionId',
  });
export type UpdateAttachmentRequest = z.output<typeof updateAttachmentSchema>;
export type UpdateAttachmentBody = z.input<typeof updateAttachmentSchema>;
export const shapesQuerySchema = z.object({
  family: z.enum(['W', 'HSS', 'PIPE', 'C']).optional(),
  q: z.string().trim().max(40).optional(),
  minDepth: z.coerce.number().nonnegative().optional(),
  maxDepth: z.coerce.number().positive().optional(),
  /** Adds this project's imported shapes (members only). */
  projectId: z.coerce.number().int().positive().optional(),
});
export type ShapesQuery = z.output<typeof shapesQuerySchema>;
export interface ShapesDto {
  source: string;
  shapes: ShapeRecord[];
}
export interface ShapeImportDto {
  imported: number;
  rejected: { row: number; label: string | null; reason: string }[];
}
export interface OutboxDto {
  id: number;
  to: string[];
  subject: string;
  text: string;
  status: 'pending' | 'sent' | 'failed';
  attempts: number;
  lastError: string | null;
  createdAt: string;
  sentAt: string | null;
}

export const checkRequestSchema = z.object({
  /** Validated and parsed in the route: the engine takes the parsed document. */
  input: parsedDesignSchema,
  /** Adds this project's imported shapes (members only). */
  projectId: z.number().int().positive().optional(),
  /** Adds the station arrays (V, M, deflection along x), as the CLI's --stations does. */
  stations: z.boolean().optional(),
});
