/**
 * Turns a JSX attribute expression such as `preset={{ crMassPct: 9 }}` into its
 * value without running any code: only literals, arrays, objects and unary minus
 * are allowed. Anything else in a lesson is an error (lessons are data, not code).
 */

interface EsNode {
  type: string;
  [key: string]: unknown;
}

export class NotStaticError extends Error {
  override name = "NotStaticError";
}

export function staticValue(node: EsNode): unknown {
  switch (node.type) {
    case "Program": {
      const body = node.body as EsNode[];
      if (body.length !== 1 || body[0].type !== "ExpressionStatement") throw new NotStaticError("expected one expression");
      return staticValue(body[0].expression as EsNode);
    }
    case "ExpressionStatement":
      return staticValue(node.expression as EsNode);
    case "Literal":
      if (node.regex) throw new NotStaticError("regular expressions are not allowed");
      return node.value;
    case "TemplateLiteral": {
      if ((node.expressions as EsNode[]).length) throw new NotStaticError("template expressions are not allowed");
      return (node.quasis as EsNode[]).map((q) => (q.value as { cooked: string }).cooked).join("");
    }
    case "UnaryExpression": {
      const value = staticValue(node.argument as EsNode);
      if (typeof value !== "number") throw new NotStaticError("unary operators apply to numbers only");
      if (node.operator === "-") return -value;
      if (node.operator === "+") return value;
      throw new NotStaticError(`operator ${String(node.operator)} is not allowed`);
    }
    case "ArrayExpression":
      return (node.elements as (EsNode | null)[]).map((element) => {
        if (!element || element.type === "SpreadElement") throw new NotStaticError("holes and spreads are not allowed");
        return staticValue(element);
      });
    case "ObjectExpression": {
      const result: Record<string, unknown> = {};
      for (const property of node.properties as EsNode[]) {
        if (property.type !== "Property" || property.computed || property.kind !== "init") {
          throw new NotStaticError("only plain `key: value` properties are allowed");
        }
        const key = property.key as EsNode;
        const name = key.type === "Identifier" ? (key.name as string) : key.type === "Literal" ? String(key.value) : null;
        if (name === null) throw new NotStaticError("unsupported property key");
        result[name] = staticValue(property.value as EsNode);
      }
      return result;
    }
    case "Identifier":
      if (node.name === "undefined") return undefined;
      throw new NotStaticError(`the name ${String(node.name)} is not a value`);
    default:
      throw new NotStaticError(`${node.type} is not allowed`);
  }
}
