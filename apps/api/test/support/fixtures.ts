import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { ShopEntity } from '../../src/shops/shop.entity.js';
import type { Role } from '../../src/users/role.js';
import type { UserEntity } from '../../src/users/user.entity.js';
import { UsersService } from '../../src/users/users.service.js';
import type { TestApp } from './test-app.js';

export const TEST_PASSWORD = 'correct-horse-battery';

export interface TestShop {
  shop: ShopEntity;
  /** Creates a user in this shop with TEST_PASSWORD; e-mails are unique per run. */
  addUser: (roles: Role[], label?: string) => Promise<UserEntity>;
}

/** A shop with a unique name, so e2e files never collide; removed (with its users) by `removeShops`. */
export async function createTestShop(testApp: TestApp, label: string): Promise<TestShop> {
  const unique = randomUUID().slice(0, 8);
  const shop = await testApp.dataSource.getRepository(ShopEntity).save({
    name: `E2E ${label} ${unique}`,
    slug: `e2e-${label.toLowerCase().replace(/\W+/g, '-')}-${unique}`,
    timezone: 'UTC',
    taxRatePercent: 0,
  });
  const users = testApp.app.get(UsersService);
  return {
    shop,
    addUser: (roles, userLabel = roles.join('-')) =>
      users.createUser(shop.id, {
        email: `${userLabel}.${randomUUID().slice(0, 8)}@${shop.slug}.example`,
        displayName: `${userLabel} of ${shop.name}`,
        roles,
        password: TEST_PASSWORD,
      }),
  };
}

export async function removeShops(dataSource: DataSource, shops: TestShop[]): Promise<void> {
  const ids = shops.map((entry) => entry.shop.id);
  if (ids.length) await dataSource.getRepository(ShopEntity).delete(ids);
}

/** Signs in through the API and returns the access token and the refresh cookie. */
export async function signIn(testApp: TestApp, email: string, password = TEST_PASSWORD) {
  const response = await testApp.http().post('/api/auth/login').send({ email, password }).expect(200);
  return { accessToken: response.body.accessToken as string, cookie: refreshCookieOf(response.headers) };
}

export function refreshCookieOf(headers: Record<string, unknown>): string {
  const setCookie = (headers['set-cookie'] as string[] | undefined) ?? [];
  const cookie = setCookie.find((line) => line.startsWith('ls_refresh='));
  if (!cookie) throw new Error('no ls_refresh cookie in the response');
  return cookie.split(';')[0];
}

/** Adds a user with `roles` to `target` and signs them in; answers the access token. */
export async function tokenFor(testApp: TestApp, target: TestShop, roles: Role[], label?: string): Promise<string> {
  return (await signIn(testApp, (await target.addUser(roles, label)).email)).accessToken;
}

/** The Authorization header of a bearer token. */
export const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });
