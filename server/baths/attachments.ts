// Lab reports attached to a bath: PDF, PNG or JPEG (checked by their first bytes, not by what the
// browser claims; a name that says another of the three is refused), up to 10 MB, kept on disk
// under the uploads folder with their metadata in PostgreSQL. The file is written to a temporary
// name and renamed only after the metadata row is inserted in the same transaction; anything that
// fails half-way leaves neither behind.
import { createHash, randomUUID } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';

import { and, desc, eq } from 'drizzle-orm';
import { type Request, type Response, Router } from 'express';
import { z } from 'zod';

import { attachments, type AttachmentRow } from '@/db/schema';
import { allow, requireUser, signedIn } from '@/server/auth/access';
import type { AuthContext } from '@/server/auth/context';
import { writeAudit } from '@/server/audit';
import { findBath, namesOf } from '@/server/baths/store';
import { HttpError } from '@/server/http-error';
import { output } from '@/server/output';
import { receiveOneFile } from '@/server/upload';
import { type Attachment, attachmentListSchema, ATTACHMENT_MAX_BYTES, attachmentSchema, type ATTACHMENT_TYPES } from '@/shared/baths';

type AttachmentType = (typeof ATTACHMENT_TYPES)[number];


const titleSchema = z.string().trim().max(200, 'must be at most 200 characters');
const idParam = z.string().uuid();

const EXTENSION: Record<AttachmentType, string> = { 'application/pdf': 'pdf', 'image/png': 'png', 'image/jpeg': 'jpg' };
/** The name endings each accepted type goes by. */
const NAME_ENDINGS: Record<AttachmentType, readonly string[]> = { 'application/pdf': ['pdf'], 'image/png': ['png'], 'image/jpeg': ['jpg', 'jpeg', 'jpe'] };
const TYPE_WORDS: Record<AttachmentType, string> = { 'application/pdf': 'a PDF', 'image/png': 'a PNG image', 'image/jpeg': 'a JPEG image' };

/** The type a file really is, from its first bytes; null when it is none of the accepted ones. */
export function sniffType(buffer: Buffer): AttachmentType | null {
  if (buffer.subarray(0, 5).toString('latin1') === '%PDF-') return 'application/pdf';
  if (buffer.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'image/png';
  if (buffer.length > 3 && buffer[0] === 0xff && buffer[1] === 0xd8 && buffer[2] === 0xff) return 'image/jpeg';
  return null;
}


function endingOf(name: string): string | null {
  return /\.([a-z0-9]{2,5})$/i.exec(name)?.[1]?.toLowerCase() ?? null;
}

/** Why a file's name contradicts what its bytes are (a PNG named .pdf), or null. */
function nameMismatch(name: string, type: AttachmentType): string | null {
  const ending = endingOf(name);
  const named = (Object.keys(NAME_ENDINGS) as AttachmentType[]).find((t) => ending !== null && NAME_ENDINGS[t].includes(ending));
  return named && named !== type ? `is named as ${TYPE_WORDS[named]} but is ${TYPE_WORDS[type]}` : null;
}

/**
 * A file name safe to show and to send back: no folders, no control characters, at most 120
 * characters, ending as its type does (a PDF named "Assay 2026.11.20" or "x.exe" gets ".pdf").
 */
function cleanName(name: string, type: AttachmentType): string {
  const base = path.basename(name.replace(/\\/g, '/')).replace(/[\u0000-\u001f\u007f"]/g, '').trim();
  const stem = base === '' ? 'report' : base.slice(0, 120);
  const ending = endingOf(stem);
  return ending !== null && NAME_ENDINGS[type].includes(ending) ? stem : `${stem}.${EXTENSION[type]}`;
}

function toAttachment(row: AttachmentRow, names: Map<string, string>): Attachment {
  return {
    id: row.id,
    bathId: row.bathId,
    title: row.title,
    fileName: row.fileName,
    contentType: row.contentType as AttachmentType,
    sizeBytes: row.sizeBytes,
    uploadedBy: { id: row.uploadedBy, name: names.get(row.uploadedBy) ?? 'Unknown' },
    uploadedAt: row.uploadedAt.toISOString(),
  };
}

/** Attachments of baths: list, upload, download. */
export function attachmentsRouter(ctx: AuthContext, uploadsDir: string): Router {
  const router = Router();
  const db = ctx.db;

  router.get('/baths/:id/attachments', signedIn, async (req: Request, res: Response) => {
    const bath = await findBath(db, req.params.id);
    const rows = await db.select().from(attachments).where(eq(attachments.bathId, bath.id)).orderBy(desc(attachments.uploadedAt));
    const names = await namesOf(db, rows.map((r) => r.uploadedBy));
    res.json(output(attachmentListSchema, rows.map((r) => toAttachment(r, names))));
  });

  router.post('/baths/:id/attachments', allow('chemist', 'technician'), receiveOneFile(ATTACHMENT_MAX_BYTES, 'attach a smaller scan or a PDF'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const file = req.file;
    if (!file) throw new HttpError(400, 'validation_failed', 'file: choose a PDF, PNG or JPEG file to attach (field "file")', [{ path: 'file', message: 'choose a file' }]);
    const type = sniffType(file.buffer);
    if (!type) {
      throw new HttpError(415, 'validation_failed', `file: "${file.originalname}" is not a PDF, PNG or JPEG file`, [{ path: 'file', message: 'must be a PDF, PNG or JPEG file' }]);
    }
    const mismatch = nameMismatch(file.originalname, type);
    if (mismatch) {
      throw new HttpError(415, 'validation_failed', `file: "${file.originalname}" ${mismatch}; attach the file it is named as, or rename it`, [{ path: 'file', message: mismatch }]);
    }
    const title = titleSchema.safeParse(typeof req.body?.title === 'string' ? req.body.title : '');
    if (!title.success) throw new HttpError(400, 'validation_failed', `title: ${title.error.issues[0]?.message}`, [{ path: 'title', message: title.error.issues[0]?.message ?? 'invalid' }]);
    const fileName = cleanName(file.originalname, type);
    const id = randomUUID();
    const storageKey = `${id}.${EXTENSION[type]}`;
    await fs.mkdir(uploadsDir, { recursive: true });
    const temp = path.join(uploadsDir, `.${storageKey}.part`);
    const final = path.join(uploadsDir, storageKey);
    await fs.writeFile(temp, file.buffer, { flag: 'wx' });
    try {
      const attachment = await db.transaction(async (tx) => {
        const bath = await findBath(tx, req.params.id);
        if (bath.status === 'archived') throw new HttpError(409, 'conflict', 'This bath is archived; nothing more is attached to it.');
        const [row] = await tx
          .insert(attachments)
          .values({
            id,
            bathId: bath.id,
            title: title.data === '' ? fileName : title.data,
            fileName,
            contentType: type,
            sizeBytes: file.size,
            sha256: createHash('sha256').update(file.buffer).digest('hex'),
            storageKey,
            uploadedBy: user.id,
          })
          .returning();
        if (!row) throw new Error('attachment not stored');
        await writeAudit(tx, { actor: user.id, action: 'attachment.uploaded', subject: `bath:${bath.id}`, payload: { attachment: id, fileName, contentType: type, sizeBytes: file.size } });
        // The rename is the last step inside the transaction: if it fails, the row is rolled back.
        await fs.rename(temp, final);
        return toAttachment(row, new Map([[user.id, user.name]]));
      });
      res.status(201).json(output(attachmentSchema, attachment));
    } catch (err) {
      await fs.rm(temp, { force: true });
      await fs.rm(final, { force: true }).catch(() => undefined);
      throw err;
    }
  });

  router.get('/baths/:id/attachments/:attachmentId', signedIn, async (req: Request, res: Response) => {
    const bath = await findBath(db, req.params.id);
    const parsed = idParam.safeParse(req.params.attachmentId);
    const [row] = parsed.success ? await db.select().from(attachments).where(and(eq(attachments.id, parsed.data), eq(attachments.bathId, bath.id))) : [];
    if (!row) throw new HttpError(404, 'not_found', `No attachment ${String(req.params.attachmentId)} on this bath.`);
    const data = await fs.readFile(path.join(uploadsDir, row.storageKey)).catch(() => null);
    if (!data) throw new HttpError(410, 'gone', 'The file of this attachment is missing from the server; ask an admin to restore it from a backup.');
    res.setHeader('Content-Type', row.contentType);
    res.setHeader('Content-Length', String(data.length));
    res.setHeader('Cache-Control', 'private, no-store');
    res.setHeader('Content-Disposition', `attachment; filename="${row.fileName.replace(/[^\x20-\x7e]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(row.fileName)}`);
    res.end(data);
  });

  return router;
}
