// What each controller handler answers, as OpenAPI schemas read from the handler's return type
// with the TypeScript type checker: the interfaces and mapper return types the responses are
// built from, their doc comments as descriptions. Named types become components; the rest is inline.
import path from 'node:path';

const HTTP_DECORATORS = new Set(['Get', 'Post', 'Put', 'Patch', 'Delete']);

/**
 * @param ts the TypeScript module
 * @param program the backend's program
 * @param sourceRoot absolute path of backend/src
 * @returns {{ operations: Record<string, object>, components: Record<string, object>, unknown: string[] }}
 */
export function describeResponses(ts, program, sourceRoot) {
  const checker = program.getTypeChecker();
  const components = {};
  /** type id → component name, for named types already described (or being described). */
  const named = new Map();
  const usedNames = new Map();
  const unknown = [];
  let where = '';

  function description(symbol) {
    const text = ts.displayPartsToString(symbol.getDocumentationComment(checker)).trim();
    return text || undefined;
  }

  function componentName(type, symbol) {
    const base = symbol.getName().replace(/[^A-Za-z0-9_]/g, '');
    const decl = symbol.declarations?.[0];
    const file = decl ? path.relative(sourceRoot, decl.getSourceFile().fileName) : '';
    const key = `${base}@${file}`;
    if (!usedNames.has(base)) usedNames.set(base, key);
    if (usedNames.get(base) === key) return base;
    // Same name, another declaration: prefix the folder it lives in.
    const folder = path
      .dirname(file)
      .split(path.sep)[0]
      .replace(/(^|-)(\w)/g, (_, __, c) => c.toUpperCase());
    return folder + base;
  }

  function isNamedObject(type) {
    const symbol = type.aliasSymbol ?? type.getSymbol();
    if (!symbol || type.aliasTypeArguments?.length || type.typeArguments?.length) return null;
    const name = symbol.getName();
    if (!name || name.startsWith('__') || name === 'Object') return null;
    if (!(type.flags & ts.TypeFlags.Object) && !type.aliasSymbol) return null;
    const decl = symbol.declarations?.[0];
    if (!decl || !path.resolve(decl.getSourceFile().fileName).startsWith(sourceRoot)) return null;
    return symbol;
  }

  function withNull(schema, nullable) {
    if (!nullable) return schema;
    if (schema.$ref) return { allOf: [schema], nullable: true };
    return { ...schema, nullable: true };
  }

  function schemaOf(type, depth = 0) {
    if (depth > 40) throw new Error(`${where}: type too deep`);
    const f = type.flags;
    // unknown: any JSON value (stored documents, changed values); any: a type that was never written.
    if (f & ts.TypeFlags.Unknown) return {};
    if (f & ts.TypeFlags.Any) {
      unknown.push(where);
      return {};
    }
    if (f & ts.TypeFlags.Never) return {};
    if (f & ts.TypeFlags.StringLiteral) return { type: 'string', enum: [type.value] };
    if (f & ts.TypeFlags.NumberLiteral) return { type: 'number', enum: [type.value] };
    if (f & ts.TypeFlags.BooleanLiteral) return { type: 'boolean', enum: [type.intrinsicName === 'true'] };
    if (f & (ts.TypeFlags.String | ts.TypeFlags.TemplateLiteral)) return { type: 'string' };
    if (f & ts.TypeFlags.Number) return { type: 'number' };
    if (f & ts.TypeFlags.Boolean) return { type: 'boolean' };
    if (f & ts.TypeFlags.BigInt) return { type: 'integer' };
    if (f & ts.TypeFlags.Null) return { nullable: true };
    if (f & (ts.TypeFlags.Undefined | ts.TypeFlags.Void)) return {};
    if (f & ts.TypeFlags.EnumLiteral && type.isUnion?.()) return unionSchema(type, depth);
    if (type.isUnion()) return unionSchema(type, depth);
    if (type.isIntersection()) return objectSchema(type, depth);
    if (checker.isArrayType(type) || checker.isTupleType(type)) {
      const args = checker.getTypeArguments(type);
      if (checker.isTupleType(type)) {
        const items = dedupe(args.map((a) => schemaOf(a, depth + 1)));
        return {
          type: 'array',
          items: items.length === 1 ? items[0] : { oneOf: items },
          minItems: args.length,
          maxItems: args.length,
        };
      }
      return { type: 'array', items: schemaOf(args[0], depth + 1) };
    }
    const symbolName = type.getSymbol()?.getName();
    if (symbolName === 'Date') return { type: 'string', format: 'date-time' };
    if (
      symbolName === 'Buffer' ||
      symbolName === 'Uint8Array' ||
      symbolName === 'Readable' ||
      symbolName === 'ReadStream'
    )
      return { type: 'string', format: 'binary' };
    if (f & ts.TypeFlags.Object) {
      const symbol = isNamedObject(type);
      if (symbol) {
        const id = type.id;
        if (!named.has(id)) {
          const name = componentName(type, symbol);
          named.set(id, name);
          components[name] = {};
          const schema = objectSchema(type, depth);
          const text = description(symbol);
          components[name] = text ? { ...schema, description: text } : schema;
        }
        return { $ref: `#/components/schemas/${named.get(id)}` };
      }
      return objectSchema(type, depth);
    }
    unknown.push(`${where} (${checker.typeToString(type)})`);
    return {};
  }

  function dedupe(schemas) {
    const seen = new Map();
    for (const s of schemas) seen.set(JSON.stringify(s), s);
    return [...seen.values()];
  }

  function unionSchema(type, depth) {
    let nullable = false;
    const parts = [];
    for (const t of type.types) {
      if (t.flags & ts.TypeFlags.Null) nullable = true;
      else if (t.flags & (ts.TypeFlags.Undefined | ts.TypeFlags.Void)) continue;
      else parts.push(t);
    }
    // true | false is boolean.
    const bools = parts.filter((t) => t.flags & ts.TypeFlags.BooleanLiteral);
    const rest = parts.filter((t) => !(t.flags & ts.TypeFlags.BooleanLiteral));
    const schemas = rest.map((t) => schemaOf(t, depth + 1));
    if (bools.length === 2) schemas.push({ type: 'boolean' });
    else if (bools.length === 1) schemas.push(schemaOf(bools[0], depth + 1));
    // A union of literals of one type is one enum.
    const enums = schemas.filter((s) => s.enum && !s.nullable);
    if (enums.length === schemas.length && schemas.length > 0 && new Set(enums.map((s) => s.type)).size === 1) {
      return withNull({ type: enums[0].type, enum: enums.flatMap((s) => s.enum) }, nullable);
    }
    const unique = dedupe(schemas);
    if (unique.length === 0) return nullable ? { nullable: true } : {};
    if (unique.length === 1) return withNull(unique[0], nullable);
    return withNull({ oneOf: unique }, nullable);
  }

  function objectSchema(type, depth) {
    const properties = {};
    const required = [];
    for (const prop of checker.getPropertiesOfType(type)) {
      const decl = prop.valueDeclaration ?? prop.declarations?.[0];
      if (decl && (ts.isMethodDeclaration(decl) || ts.isMethodSignature(decl))) continue;
      const propType = decl ? checker.getTypeOfSymbolAtLocation(prop, decl) : checker.getTypeOfSymbol(prop);
      if (propType.getCallSignatures().length) continue;
      const outer = where;
      where = `${outer}.${prop.getName()}`;
      let schema = schemaOf(propType, depth + 1);
      where = outer;
      const text = description(prop);
      if (text) schema = schema.$ref ? { allOf: [schema], description: text } : { ...schema, description: text };
      properties[prop.getName()] = schema;
      const optional =
        prop.flags & ts.SymbolFlags.Optional ||
        (propType.isUnion() && propType.types.some((t) => t.flags & ts.TypeFlags.Undefined));
      if (!optional) required.push(prop.getName());
    }
    const schema = { type: 'object', properties };
    if (required.length) schema.required = required;
    const index = checker.getIndexInfosOfType(type);
    if (index.length) schema.additionalProperties = schemaOf(index[0].type, depth + 1);
    if (!index.length && !Object.keys(properties).length) schema.additionalProperties = true;
    return schema;
  }

  const operations = {};
  for (const file of program.getSourceFiles()) {
    if (
      file.isDeclarationFile ||
      !path.resolve(file.fileName).startsWith(sourceRoot) ||
      !file.fileName.endsWith('.controller.ts')
    )
      continue;
    ts.forEachChild(file, (node) => {
      if (!ts.isClassDeclaration(node) || !node.name) return;
      for (const member of node.members) {
        if (!ts.isMethodDeclaration(member)) continue;
        const decorators = ts.getDecorators(member) ?? [];
        const named = (d) => (ts.isCallExpression(d.expression) ? d.expression.expression.getText() : '');
        if (!decorators.some((d) => HTTP_DECORATORS.has(named(d)))) continue;
        const key = `${node.name.text}.${member.name.getText()}`;
        // A file or text answer (@ApiProduces): its bytes are described by the media type alone.
        if (decorators.some((d) => named(d) === 'ApiProduces')) {
          operations[key] = { type: 'string', format: 'binary' };
          continue;
        }
        const signature = checker.getSignatureFromDeclaration(member);
        let returned = checker.getReturnTypeOfSignature(signature);
        const awaited = checker.getAwaitedType(returned);
        if (awaited) returned = awaited;
        where = key;
        const isEmpty = returned.flags & (ts.TypeFlags.Void | ts.TypeFlags.Undefined);
        operations[key] = isEmpty ? null : schemaOf(returned);
      }
    });
  }
  return { operations, components, unknown };
}
