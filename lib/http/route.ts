import type { z } from "zod";
import { can, isProjectPermission, type Permission } from "@/lib/access/permissions";
import { AppError, notFound } from "@/lib/app-error";
import { getActingUser } from "@/lib/auth/acting-user";
import { findPackageProjectId } from "@/lib/data/packages";
import { findProjectAccess, granteesOf, isUuid, type ProjectAccess } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";
import { toErrorResponse, zodErrorResponse } from "./error-response";
import { readBody } from "./read-body";

type Schema = z.ZodType;
type Out<S> = S extends z.ZodType ? z.output<S> : undefined;

export type RouteContext<P, B, Q> = {
  req: Request;
  user: ActingUser;
  params: P;
  body: B;
  query: Q;
  /** Resolved for project actions: the project and the acting user's role on it. */
  access: ProjectAccess | undefined;
};

export type RouteOptions<P extends Schema | undefined, B extends Schema | undefined, Q extends Schema | undefined> = {
  permission: Permission;
  params?: P;
  body?: B;
  query?: Q;
};

type NextContext = { params: Promise<Record<string, string | string[]>> };

/**
 * The one wrapper every route handler goes through, in this order:
 * sign-in (401) → scope to the actor's firm and project (404, never a 403 that
 * confirms another firm's row exists) → permission (403) → input (400, 422).
 */
export function route<P extends Schema | undefined = undefined, B extends Schema | undefined = undefined, Q extends Schema | undefined = undefined>(
  options: RouteOptions<P, B, Q>,
  handler: (ctx: RouteContext<Out<P>, Out<B>, Out<Q>>) => Promise<unknown>,
): (req: Request, ctx: NextContext) => Promise<Response> {
  return async (req, nextCtx) => {
    try {
      const user = await getActingUser();
      if (!user) throw new AppError("UNAUTHENTICATED", "Sign in first.");

      const rawParams = (await nextCtx?.params) ?? {};
      const access = await resolveAccess(user, options.permission, rawParams);
      const grantees = access ? access.grantees : granteesOf(user, null);
      if (!can(options.permission, grantees)) {
        throw new AppError("FORBIDDEN", `Your role does not allow this (${options.permission}).`);
      }

      const params = options.params ? options.params.safeParse(rawParams) : undefined;
      if (params && !params.success) throw notFound("Resource");
      const query = options.query ? options.query.safeParse(Object.fromEntries(new URL(req.url).searchParams)) : undefined;
      if (query && !query.success) return zodErrorResponse(query.error);
      const body = options.body ? await readBody(req, options.body) : undefined;
      if (body instanceof Response) return body;

      const result = await handler({
        req,
        user,
        access,
        params: params?.data as Out<P>,
        query: query?.data as Out<Q>,
        body: body as Out<B>,
      });
      return result instanceof Response ? result : Response.json(result);
    } catch (e) {
      return toErrorResponse(e);
    }
  };
}

async function resolveAccess(user: ActingUser, permission: Permission, params: Record<string, string | string[]>): Promise<ProjectAccess | undefined> {
  if (!isProjectPermission(permission)) return undefined;
  let projectId = typeof params.projectId === "string" ? params.projectId : undefined;
  if (!projectId && typeof params.packageId === "string") {
    projectId = isUuid(params.packageId) ? await findPackageProjectId(user, params.packageId) : undefined;
    if (!projectId) throw notFound("Package");
  }
  if (!projectId) throw new Error(`Route for ${permission} has neither projectId nor packageId`);
  const access = await findProjectAccess(user, projectId);
  if (!access) throw notFound(params.packageId ? "Package" : "Project");
  return access;
}

/** 201 with the created resource. */
export function created(body: unknown): Response {
  return Response.json(body, { status: 201 });
}
