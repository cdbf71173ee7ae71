import { z } from 'zod'
import type { RouteSpec } from './route'

type AnySpec = RouteSpec<unknown, unknown, unknown>

function jsonSchema(schema: z.ZodType) {
  return z.toJSONSchema(schema, { io: 'input', unrepresentable: 'any' })
}

function parameters(spec: AnySpec) {
  const out: object[] = []
  for (const [where, schema] of [
    ['path', spec.params],
    ['query', spec.query],
  ] as const) {
    if (!schema) continue
    const js = jsonSchema(schema) as { properties?: Record<string, object>; required?: string[] }
    for (const [name, s] of Object.entries(js.properties ?? {})) {
      out.push({
        name,
        in: where,
        required: where === 'path' || !!js.required?.includes(name),
        schema: s,
      })
    }
  }
  return out
}

const errorSchema = {
  type: 'object',
  properties: {
    error: {
      type: 'object',
      properties: { code: { type: 'string' }, message: { type: 'string' }, details: {} },
      required: ['code', 'message'],
    },
  },
}

/** Collects every declared route so the API document can never fall behind the code. */
export class ApiRegistry {
  private readonly specs: AnySpec[] = []

  add<B, Q, P>(spec: RouteSpec<B, Q, P>) {
    this.specs.push(spec as AnySpec)
  }

  routes() {
    return this.specs.map((s) => ({ method: s.method, path: s.path, access: s.access }))
  }

  document(version: string) {
    const paths: Record<string, Record<string, object>> = {}
    for (const spec of this.specs) {
      const path = spec.path.replace(/:(\w+)/g, '{$1}')
      const access = Array.isArray(spec.access)
        ? `Roles: ${spec.access.join(', ')}.`
        : `Access: ${spec.access}.`
      const ok = spec.produces
        ? { description: 'OK', content: { [spec.produces]: {} } }
        : { description: 'OK' }
      paths[path] ??= {}
      paths[path][spec.method] = {
        tags: [spec.tag],
        summary: spec.summary,
        description: access,
        parameters: parameters(spec),
        ...(spec.upload && {
          requestBody: {
            required: true,
            content: {
              'multipart/form-data': {
                schema: {
                  type: 'object',
                  properties: { [spec.upload]: { type: 'string', format: 'binary' } },
                },
              },
            },
          },
        }),
        ...(spec.body && {
          requestBody: {
            required: true,
            content: { 'application/json': { schema: jsonSchema(spec.body) } },
          },
        }),
        responses: {
          [String(spec.status ?? 200)]: ok,
          '4XX': {
            description: 'Refused',
            content: { 'application/json': { schema: errorSchema } },
          },
        },
      }
    }
    return {
      openapi: '3.1.0',
      info: { title: 'Quellnode API', version },
      components: {
        securitySchemes: { session: { type: 'apiKey', in: 'cookie', name: 'qn_session' } },
      },
      security: [{ session: [] }],
      paths,
    }
  }
}
