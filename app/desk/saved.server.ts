import { env } from "~/config/env.server";
import { sendMailOrLog } from "~/mail/mailer.server";
import { revisionAlertMail } from "~/mail/templates";
import { Detail, type DetailRevision, SavedDetail, User } from "~/models/index.server";

// Members save details to find them again and to hear when one is revised.

export async function isSaved(userId: number, detailId: number): Promise<boolean> {
  return (await SavedDetail.count({ where: { userId, detailId } })) > 0;
}

/** Saves or forgets a published detail for this member; answers whether it is saved afterwards. */
export async function setSaved(userId: number, slug: string, saved: boolean): Promise<boolean | null> {
  const detail = await Detail.findOne({ where: { slug }, attributes: ["id", "publishedRevisionId", "withdrawnAt"] });
  if (!detail) return null;
  if (saved) {
    if (!detail.isLive()) return null;
    await SavedDetail.findOrCreate({
      where: { userId, detailId: detail.id },
      defaults: { userId, detailId: detail.id },
    });
  } else {
    await SavedDetail.destroy({ where: { userId, detailId: detail.id } });
  }
  return saved;
}

export interface SavedRow {
  slug: string;
  title: string;
  tier: string;
  savedAt: string;
  live: boolean;
}

export async function listSaved(userId: number): Promise<SavedRow[]> {
  const saved = await SavedDetail.findAll({
    where: { userId },
    include: [
      {
        model: Detail,
        as: "detail",
        attributes: ["id", "slug", "title", "tier", "publishedRevisionId", "withdrawnAt"],
        required: true,
      },
    ],
    order: [["createdAt", "DESC"]],
  });
  return saved.flatMap(({ detail, createdAt }) =>
    detail
      ? [
          {
            slug: detail.slug,
            title: detail.title,
            tier: detail.tier,
            savedAt: createdAt.toISOString(),
            live: detail.isLive(),
          },
        ]
      : [],
  );
}

/** E-mails every member who saved the detail about its new revision, with the change note. Returns how many were sent. */
export async function alertSavers(detail: Detail, revision: DetailRevision): Promise<number> {
  const saved = await SavedDetail.findAll({
    where: { detailId: detail.id },
    attributes: ["userId"],
    include: [
      { model: User, as: "user", attributes: ["id", "email", "displayName", "emailVerifiedAt"], required: true },
    ],
  });
  if (saved.length === 0) return 0;
  const users = saved.flatMap((row) => (row.user ? [row.user] : []));
  const link = new URL(`/details/${detail.slug}`, env().APP_URL).toString();
  const sent = await Promise.all(
    users
      .filter((user) => user.emailVerifiedAt)
      .map((user) =>
        sendMailOrLog(
          user.email,
          revisionAlertMail({
            displayName: user.displayName,
            detailTitle: revision.title,
            revision: revision.number,
            changeNote: revision.changeNote ?? "See the revision history on the detail page.",
            link,
          }),
        ),
      ),
  );
  return sent.filter(Boolean).length;
}
