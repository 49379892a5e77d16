import { Router } from 'express';
import { Op, type WhereOptions } from 'sequelize';
import { updateUserSchema } from '@shared/schemas/auth';
import { inviteUserSchema, listUsersQuerySchema, userIdParamsSchema, type ListUsersQuery } from '@shared/schemas/users';
import { validate } from '../../http/validate';
import { allow, authorize } from '../../policies';
import { userPolicy } from '../../policies/user';
import { Session, User } from '../../models';
import { presentUser } from '../../presenters/user';
import { notFound } from '../../errors';
import { inviteUser } from '../../services/accounts';
import { getSequelize } from '../../db';

export function usersRouter(): Router {
  const router = Router();

  router.get('/', allow(userPolicy.list), validate({ query: listUsersQuerySchema }), async (req, res) => {
    const query = req.query as unknown as ListUsersQuery;
    const where: WhereOptions<User> = {};
    if (query.role) Object.assign(where, { role: query.role });
    if (query.q) {
      const like = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      Object.assign(where, { [Op.or]: [{ email: { [Op.like]: like } }, { displayName: { [Op.like]: like } }] });
    }
    const column = query.sort.replace(/^-/, '');
    const { rows, count } = await User.findAndCountAll({
      where,
      order: [[column, query.sort.startsWith('-') ? 'DESC' : 'ASC'], ['id', 'ASC']],
      limit: query.perPage,
      offset: (query.page - 1) * query.perPage,
    });
    res.json({ data: rows.map(presentUser), total: count, page: query.page, perPage: query.perPage });
  });

  router.post('/invitations', allow(userPolicy.invite), validate({ body: inviteUserSchema }), async (req, res) => {
    const user = await inviteUser(req.user!, req.body);
    res.status(201).json({ data: presentUser(user) });
  });

  router.patch('/:id', validate({ params: userIdParamsSchema, body: updateUserSchema }), async (req, res) => {
    const target = await User.findByPk(Number(req.params.id));
    authorize(req.user, userPolicy.list(req.user), 'Only admins manage accounts.');
    if (!target) throw notFound('The user');
    authorize(req.user, userPolicy.update(req.user, target), 'You cannot change your own role or deactivate yourself.');
    await getSequelize().transaction(async (transaction) => {
      await target.update(req.body, { transaction });
      // A deactivated account is signed out everywhere at once.
      if (req.body.active === false) await Session.destroy({ where: { userId: target.id }, transaction });
    });
    res.json({ data: presentUser(target) });
  });

  return router;
}
