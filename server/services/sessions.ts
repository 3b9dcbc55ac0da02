import { Op } from 'sequelize';
import { RevokedSession } from '../models';

/**
 * Signing out withdraws the token itself, not only the cookie: a copied cookie or a Bearer token
 * stops working at once instead of at its expiry. Rows past their expiry are no longer needed
 * (the signature check refuses the token anyway) and are removed on the way.
 */
export async function revokeSession(token: { jti: string; userId: string; expiresAt: Date }) {
  await RevokedSession.destroy({ where: { expiresAt: { [Op.lt]: new Date() } } });
  await RevokedSession.findOrCreate({
    where: { jti: token.jti },
    defaults: { jti: token.jti, userId: token.userId, expiresAt: token.expiresAt },
  });
}

export async function isSessionRevoked(jti: string): Promise<boolean> {
  return (await RevokedSession.count({ where: { jti } })) > 0;
}
