import sharp from 'sharp';
import type { Badge, BadgeSheetQuery } from '@chuckkey/core';
import { badgeCodeSchema, fullName, PHOTO_MAX_BYTES, pinSchema, roleLabels } from '@chuckkey/core';
import { badgeCodeBox, badgeCodeHash, generateBadgeCode, hashPassword, SecretBoxError, verifyPassword } from '@chuckkey/db';
import type { Db } from '../../lib/db';
import type { Deps } from '../../lib/deps';
import { conflict, notFound } from '../../lib/errors';
import { sniffType, unsupportedType, type UploadRule } from '../../lib/uploads';
import { auditLog } from '../audit/audit.repository';
import { shopRepository } from '../shop/shop.repository';
import { cardPdf, qrSvg, sheetPdf, type CardContent } from './badge-card';
import { badgesRepository, type BadgeHolder, type BadgeRecord, type PhotoRecord } from './badges.repository';

export const PHOTO_UPLOAD: UploadRule = { field: 'photo', maxBytes: PHOTO_MAX_BYTES, label: 'photo' };
export const PHOTO_TYPES = ['image/jpeg', 'image/png'] as const;
export const PHOTO_KINDS = 'a JPEG or PNG image';
/** Large enough for a sharp card photo at 300 dpi (20 × 25 mm is about 240 × 300 px), small in the database. */
export const PHOTO_MAX_SIDE = 600;
// A small compressed file can still expand to a huge bitmap; refuse anything above 50 megapixels.
const PHOTO_MAX_INPUT_PIXELS = 50_000_000;

/**
 * The photo as stored: the camera's EXIF orientation applied, at most 600 × 600, transparency
 * flattened on white, re-encoded as JPEG. Re-encoding drops all metadata (EXIF, GPS position).
 */
export async function normalizePhoto(data: Buffer): Promise<Buffer> {
  try {
    return await sharp(data, { limitInputPixels: PHOTO_MAX_INPUT_PIXELS, failOn: 'error' })
      .autoOrient()
      .resize(PHOTO_MAX_SIDE, PHOTO_MAX_SIDE, { fit: 'inside', withoutEnlargement: true })
      .flatten({ background: '#ffffff' })
      .jpeg({ quality: 85 })
      .toBuffer();
  } catch {
    throw unsupportedType(PHOTO_UPLOAD, `${PHOTO_KINDS} that can be read`);
  }
}

const memberNotFound = () => notFound('member_not_found', 'There is no member with that id.');

export function badgesService({ db, config }: Deps) {
  const badges = badgesRepository(db);
  const box = badgeCodeBox(config.BADGE_SECRET);

  function toBadge(record: BadgeRecord): Badge {
    try {
      return { id: record.id, issuedAt: record.issuedAt.toISOString(), code: box.open(record.codeEncrypted) };
    } catch (error) {
      // The badge still scans (scans are matched by hash), but its code was sealed under an
      // earlier BADGE_SECRET and cannot be printed again.
      if (error instanceof SecretBoxError) {
        throw conflict('badge_unreadable', 'This badge cannot be printed again (the server secret has changed). Reissue it to print a new card.');
      }
      throw error;
    }
  }

  async function insertBadge(trx: Db, actorId: string, memberId: string, revokedBadgeId: string | undefined): Promise<BadgeRecord> {
    const code = generateBadgeCode();
    const record = await badgesRepository(trx).insert({
      memberId,
      codeHash: badgeCodeHash(code),
      codeEncrypted: box.seal(code),
      issuedBy: actorId,
    });
    await auditLog(trx).record({
      actorId,
      action: 'badge.issued',
      entity: 'badge',
      entityId: record.id,
      memberId,
      details: revokedBadgeId ? { reissue: true, revokedBadgeId } : { reissue: false },
    });
    return record;
  }

  /** The member's active badge, issued now if they have none. */
  async function activeBadge(actorId: string, memberId: string): Promise<BadgeRecord> {
    const existing = await badges.findActive(memberId);
    if (existing) return existing;
    // Locking the member row makes two first views at once issue one badge, not two.
    return db.transaction(async (trx) => {
      const repo = badgesRepository(trx);
      if (!(await repo.lockMember(memberId))) throw memberNotFound();
      return (await repo.findActive(memberId)) ?? insertBadge(trx, actorId, memberId, undefined);
    });
  }

  async function requireMember(memberId: string): Promise<BadgeHolder> {
    const member = await badges.findMember(memberId);
    if (!member) throw memberNotFound();
    return member;
  }

  async function cardContent(actorId: string, member: BadgeHolder, shopName: string, photo: Buffer | undefined): Promise<CardContent> {
    const badge = toBadge(await activeBadge(actorId, member.id));
    return { shopName, fullName: fullName(member.firstName, member.lastName), roleLabel: roleLabels[member.role], code: badge.code, photo };
  }

  return {
    async current(actor: Express.User, memberId: string): Promise<Badge> {
      await requireMember(memberId);
      return toBadge(await activeBadge(actor.id, memberId));
    },

    /** A new code for a lost card: the old one stops scanning the moment this commits. */
    async reissue(actor: Express.User, memberId: string): Promise<Badge> {
      const record = await db.transaction(async (trx) => {
        const repo = badgesRepository(trx);
        if (!(await repo.lockMember(memberId))) throw memberNotFound();
        const revokedId = await repo.revokeActive(memberId);
        return insertBadge(trx, actor.id, memberId, revokedId);
      });
      return toBadge(record);
    },

    async qrSvg(actor: Express.User, memberId: string): Promise<string> {
      await requireMember(memberId);
      return qrSvg(toBadge(await activeBadge(actor.id, memberId)).code);
    },

    async cardPdf(actor: Express.User, memberId: string): Promise<{ pdf: Buffer; member: BadgeHolder }> {
      const member = await requireMember(memberId);
      const [shop, photo] = await Promise.all([shopRepository(db).get(), badges.findPhoto(memberId)]);
      const pdf = await cardPdf(await cardContent(actor.id, member, shop.name, photo?.image));
      return { pdf, member };
    },

    async sheetPdf(actor: Express.User, query: BadgeSheetQuery): Promise<Buffer> {
      const ids = [...new Set(query.memberIds)];
      const members = new Map((await badges.findMembers(ids)).map((m) => [m.id, m]));
      const missing = ids.filter((id) => !members.has(id));
      if (missing.length > 0) {
        throw notFound('member_not_found', `${missing.length === 1 ? 'One member id is' : `${missing.length} member ids are`} not known: ${missing.join(', ')}.`);
      }
      const [shop, photos] = await Promise.all([shopRepository(db).get(), badges.findPhotos(ids)]);
      const cards: CardContent[] = [];
      for (const id of ids) cards.push(await cardContent(actor.id, members.get(id)!, shop.name, photos.get(id)));
      return sheetPdf(cards, query.paper);
    },

    /** Checks the upload by its content, then stores it resized as JPEG; on any refusal nothing is stored. */
    async setPhoto(memberId: string, data: Buffer): Promise<void> {
      await requireMember(memberId);
      await sniffType(data, PHOTO_TYPES, PHOTO_UPLOAD, PHOTO_KINDS);
      await badges.savePhoto(memberId, await normalizePhoto(data), 'image/jpeg');
    },

    async photo(memberId: string): Promise<PhotoRecord> {
      const photo = await badges.findPhoto(memberId);
      if (!photo) throw notFound('no_photo', 'This member has no photo yet.');
      return photo;
    },

    /** Stores the PIN as an argon2id hash, like a password (OWASP Password Storage Cheat Sheet). */
    async setPin(memberId: string, pin: string): Promise<void> {
      if (!(await badges.setPinHash(memberId, await hashPassword(pin)))) throw memberNotFound();
    },

    /** The holder of the active badge with this code, or null for an unknown, revoked or malformed code. */
    async findMemberByCode(code: string): Promise<BadgeHolder | null> {
      const parsed = badgeCodeSchema.safeParse(code);
      if (!parsed.success) return null;
      return (await badges.findHolderByCodeHash(badgeCodeHash(parsed.data))) ?? null;
    },

    /** False when the member has set no PIN, or the PIN is not theirs. */
    async verifyPin(memberId: string, pin: string): Promise<boolean> {
      if (!pinSchema.safeParse({ pin }).success) return false;
      const pinHash = await badges.findPinHash(memberId);
      return pinHash ? verifyPassword(pinHash, pin) : false;
    },
  };
}
export type BadgesService = ReturnType<typeof badgesService>;
