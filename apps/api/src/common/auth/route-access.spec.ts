import { randomUUID } from 'node:crypto';
import { Controller, Get, Module } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { type Role, roles } from '@limitbook/contracts';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { users } from '../../database/schema/index.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { routesOf } from '../openapi/route-catalog.js';

/** A route someone forgot to give an access rule: the matrix must spot it and the guards must refuse it. */
@Controller('access-probe')
class UndeclaredProbeController {
  @Get('undeclared')
  undeclared() {
    return { leaked: true };
  }
}

@Module({ controllers: [UndeclaredProbeController] })
class UndeclaredProbeModule {}

const probeRoute = 'GET /api/access-probe/undeclared';

interface ExpressLayer {
  route?: { path: string | string[]; methods: Record<string, boolean> };
}

/** The routes Express will actually dispatch, read from its router rather than from a list kept by hand. */
function expressRoutes(t: TestApp): { method: string; path: string }[] {
  const express = t.app.getHttpAdapter().getInstance() as { router: { stack: ExpressLayer[] } };
  return express.router.stack.flatMap((layer) =>
    layer.route
      ? [layer.route.path].flat().flatMap((path) => Object.keys(layer.route!.methods).filter((m) => m !== '_all').map((method) => ({ method: method.toUpperCase(), path })))
      : [],
  );
}

const concretePath = (path: string) => path.replace(/:[A-Za-z0-9_]+/g, () => randomUUID());

type Identity = 'none' | 'forged' | 'expired' | Role;
const identities: Identity[] = ['none', 'forged', 'expired', ...roles];

describe('access rules of every route', () => {
  let t: TestApp;
  const tokens = new Map<Identity, string | undefined>();

  beforeAll(async () => {
    t = await createTestApp({ imports: [UndeclaredProbeModule] });
    for (const role of roles) tokens.set(role, await t.signIn(role));
    const [admin] = await t.db.select().from(users).where(eq(users.email, t.demoPerson('admin').email));
    tokens.set('none', undefined);
    tokens.set('forged', new JwtService({ secret: 'not-the-server-secret-but-long-enough-0123456789' }).sign({ sub: admin!.id }, { expiresIn: 600 }));
    tokens.set('expired', t.tokenFor(admin!.id, -30));
  });
  afterAll(async () => {
    await t?.close();
  });

  it('finds the API routes in the router and knows every one of them', () => {
    const dispatched = expressRoutes(t).filter((route) => route.path.startsWith('/api/'));
    const known = new Set(routesOf(t.app).map((route) => `${route.method} ${route.path}`));
    expect(dispatched.length).toBeGreaterThan(10);
    expect(dispatched.map((route) => `${route.method} ${route.path}`).filter((key) => !known.has(key))).toEqual([]);
  });

  it('every route declares @Public or @Roles (only the deliberate probe does not)', () => {
    const undeclared = routesOf(t.app)
      .filter((route) => route.access.kind === 'none')
      .map((route) => `${route.method} ${route.path} (${route.controller}.${route.handlerName})`);
    expect(undeclared).toEqual([`${probeRoute} (UndeclaredProbeController.undeclared)`]);
  });

  it('answers every route × identity as its rule says', async () => {
    const catalog = new Map(routesOf(t.app).map((route) => [`${route.method} ${route.path}`, route]));
    const failures: string[] = [];
    for (const { method, path } of expressRoutes(t).filter((route) => route.path.startsWith('/api/'))) {
      const route = catalog.get(`${method} ${path}`)!;
      for (const identity of identities) {
        const token = tokens.get(identity);
        let request = t.http[method.toLowerCase() as 'get'](concretePath(path));
        if (token) request = request.set('Authorization', `Bearer ${token}`);
        if (method !== 'GET' && method !== 'DELETE') request = request.send({});
        const response = await request;
        const { status } = response;
        // The guards mark their refusals; a public route's own 401 (refresh without a cookie) is not one.
        const guardRefused = status === 403 || (status === 401 && String(response.headers['www-authenticate']).startsWith('Bearer'));
        const signedInAs = roles.includes(identity as Role) ? (identity as Role) : undefined;
        let expected: string;
        let ok: boolean;
        if (route.access.kind === 'public') {
          expected = 'no refusal by the guards';
          ok = !guardRefused;
        } else if (!signedInAs) {
          expected = '401 with a Bearer challenge';
          ok = status === 401 && guardRefused;
        } else if (route.access.kind === 'none' || !route.access.roles.includes(signedInAs)) {
          expected = '403';
          ok = status === 403;
        } else {
          expected = 'not 401/403';
          ok = status !== 401 && status !== 403;
        }
        if (status >= 500) ok = false;
        if (!ok) failures.push(`${method} ${path} as ${identity}: got ${status}, expected ${expected}`);
      }
    }
    expect(failures).toEqual([]);
  });
});
