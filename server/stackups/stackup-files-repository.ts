/** The tables around a stackup: the read-only links it was shared by and the files uploaded against it. */
import type { Knex } from 'knex';

export interface StackupShare {
  id: number;
  stackupId: number;
  stackupVersion: number;
  email: string;
  sharedBy: number | null;
  expiresAt: string;
  revokedAt: string | null;
  createdAt: string;
}

export type UploadKind = 'fabricator-reply' | 'coupon';

export interface StackupUpload<R = unknown> {
  id: number;
  stackupId: number;
  stackupVersion: number;
  kind: UploadKind;
  fileName: string | null;
  report: R;
  uploadedBy: number | null;
  createdAt: string;
}

type Row = Record<string, unknown>;
const iso = (value: unknown) => (value === null || value === undefined ? null : new Date(value as string).toISOString());

function share(row: Row): StackupShare {
  return {
    id: row['id'] as number,
    stackupId: row['stackup_id'] as number,
    stackupVersion: row['stackup_version'] as number,
    email: row['email'] as string,
    sharedBy: row['shared_by'] as number | null,
    expiresAt: iso(row['expires_at'])!,
    revokedAt: iso(row['revoked_at']),
    createdAt: iso(row['created_at'])!,
  };
}

function upload(row: Row): StackupUpload {
  return {
    id: row['id'] as number,
    stackupId: row['stackup_id'] as number,
    stackupVersion: row['stackup_version'] as number,
    kind: row['kind'] as UploadKind,
    fileName: row['file_name'] as string | null,
    report: typeof row['report'] === 'string' ? JSON.parse(row['report']) : row['report'],
    uploadedBy: row['uploaded_by'] as number | null,
    createdAt: iso(row['created_at'])!,
  };
}

export class StackupFilesRepository {
  constructor(private readonly db: Knex) {}

  async insertShare(values: { stackupId: number; stackupVersion: number; email: string; sharedBy: number; expiresAt: Date }): Promise<StackupShare> {
    const [id] = await this.db('stackup_shares').insert({
      stackup_id: values.stackupId,
      stackup_version: values.stackupVersion,
      email: values.email,
      shared_by: values.sharedBy,
      expires_at: values.expiresAt,
    });
    return (await this.findShare(id))!;
  }

  async findShare(id: number): Promise<StackupShare | undefined> {
    const row = await this.db('stackup_shares').where({ id }).first();
    return row ? share(row) : undefined;
  }

  async listShares(stackupId: number): Promise<StackupShare[]> {
    return (await this.db('stackup_shares').where({ stackup_id: stackupId }).orderBy('id', 'desc')).map(share);
  }

  async revokeShare(stackupId: number, id: number): Promise<boolean> {
    return (await this.db('stackup_shares').where({ id, stackup_id: stackupId }).whereNull('revoked_at').update({ revoked_at: this.db.fn.now() })) === 1;
  }

  async insertUpload(values: { stackupId: number; stackupVersion: number; kind: UploadKind; fileName: string | null; report: unknown; uploadedBy: number }): Promise<StackupUpload> {
    const [id] = await this.db('stackup_uploads').insert({
      stackup_id: values.stackupId,
      stackup_version: values.stackupVersion,
      kind: values.kind,
      file_name: values.fileName,
      report: JSON.stringify(values.report),
      uploaded_by: values.uploadedBy,
    });
    return upload(await this.db('stackup_uploads').where({ id }).first());
  }

  async listUploads(stackupId: number, kind: UploadKind): Promise<StackupUpload[]> {
    return (await this.db('stackup_uploads').where({ stackup_id: stackupId, kind }).orderBy('id', 'desc').limit(50)).map(upload);
  }

  async countUploads(stackupId: number): Promise<number> {
    const [{ total }] = await this.db('stackup_uploads').where({ stackup_id: stackupId }).count({ total: '*' });
    return Number(total);
  }
}
