import { z } from 'zod'
import type { RouteSpec } from './route-spec'

type AnySpec = RouteSpec<unknown, unknown, unknown>

function jsonSchema(schema: z.ZodType, io: 'input' | 'output' = 'input') {
  return z.toJSONSchema(schema, { io, unrepresentable: 'any' })
}

/** The success answer: a file of its type, the JSON of the response schema, or no body. */
function success(spec: AnySpec) {
  if (spec.produces)
    return {
      description: 'OK',
      content: { [spec.produces]: { schema: { type: 'string', format: 'binary' } } },
    }
  if (spec.response)
    return {
      description: 'OK',
      content: { 'application/json': { schema: jsonSchema(spec.response, 'output') } },
    }
  return { description: 'No body' }
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

  /** @param checkResponses check every JSON answer against its route's schema (the API tests) */
  constructor(readonly checkResponses = false) {}

  add<B, Q, P, R>(spec: RouteSpec<B, Q, P, R>) {
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
          [String(spec.status ?? (spec.response || spec.produces ? 200 : 204))]: success(spec),
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
