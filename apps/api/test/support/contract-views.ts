import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';

const API_ROOT = join(dirname(fileURLToPath(import.meta.url)), '../..');
const VIEWS = join(API_ROOT, 'src/common/openapi/views');

/** One field of a contract view type, as the TypeScript compiler reads it. */
export interface ContractField {
  name: string;
  optional: boolean;
}

/** A schema of the document and the contract type its view class implements, with that type's fields. */
export interface ContractView {
  /** The schema's name in the document (the class's @ApiSchema name, else the class name). */
  schema: string;
  /** The contract type as written after `implements` (`ShipProfile`, `Omit<X, 'y'>`). */
  contract: string;
  fields: ContractField[];
}

/** `@ApiSchema({ name: 'X' })` on the class: 'X'; undefined when the decorator is absent or its name is not a literal. */
function schemaNameOf(node: ts.ClassDeclaration): string | undefined {
  for (const decorator of ts.getDecorators(node) ?? []) {
    const call = decorator.expression;
    if (!ts.isCallExpression(call) || call.expression.getText() !== 'ApiSchema') continue;
    const options = call.arguments[0];
    if (!options || !ts.isObjectLiteralExpression(options)) return undefined;
    const name = options.properties.find(
      (property): property is ts.PropertyAssignment =>
        ts.isPropertyAssignment(property) && property.name.getText() === 'name',
    );
    return name && ts.isStringLiteral(name.initializer) ? name.initializer.text : undefined;
  }
  return node.name?.text;
}

/** Whether the name after `implements` is a type of @catline/contracts (through its import). */
function fromContracts(checker: ts.TypeChecker, contract: ts.ExpressionWithTypeArguments): boolean {
  const named = checker.getSymbolAtLocation(contract.expression);
  const symbol = named && named.flags & ts.SymbolFlags.Alias ? checker.getAliasedSymbol(named) : named;
  return (symbol?.declarations ?? []).some((declaration) =>
    /[/\\]contracts[/\\]/.test(declaration.getSourceFile().fileName),
  );
}

/**
 * Every view class of the document (src/common/openapi/views) that implements a type of
 * @catline/contracts, with that type's fields and whether each is optional, read by the TypeScript
 * compiler with the API's own settings. A generic class (the pages) names its schema by a template, so
 * it has no one schema to hold a contract against and is left out.
 */
export function contractViews(): ContractView[] {
  const configPath = join(API_ROOT, 'tsconfig.json');
  const config = ts.readConfigFile(configPath, (path) => ts.sys.readFile(path));
  const { options } = ts.parseJsonConfigFileContent(config.config, ts.sys, API_ROOT, undefined, configPath);
  const files = readdirSync(VIEWS)
    .filter((file) => file.endsWith('.view.ts'))
    .map((file) => join(VIEWS, file));
  const program = ts.createProgram(files, { ...options, noEmit: true });
  const checker = program.getTypeChecker();
  const views: ContractView[] = [];
  for (const file of files) {
    const source = program.getSourceFile(file)!;
    const visit = (node: ts.Node): void => {
      if (ts.isClassDeclaration(node) && !node.typeParameters) {
        const schema = schemaNameOf(node);
        const implemented = node.heritageClauses
          ?.filter((clause) => clause.token === ts.SyntaxKind.ImplementsKeyword)
          .flatMap((clause) => [...clause.types]);
        for (const contract of implemented ?? []) {
          if (!schema || !fromContracts(checker, contract)) continue;
          const type = checker.getTypeAtLocation(contract);
          views.push({
            schema,
            contract: contract.getText(),
            fields: checker.getPropertiesOfType(type).map((property) => ({
              name: property.getName(),
              optional: (property.flags & ts.SymbolFlags.Optional) !== 0,
            })),
          });
        }
      }
      ts.forEachChild(node, visit);
    };
    visit(source);
  }
  return views;
}
