/**
 * A TypeScript transformer for the add-in's bundle: the help and source texts of the cell
 * functions' declarations become empty strings. Excel reads those texts from functions.json, which
 * the build writes from the untouched declarations; the bundle only runs the functions, and the
 * texts would be a third of it.
 *
 * In src/cells only, it empties
 *  - text passed to a parameter named `help` or `source` (num, choice, the local helpers that pass
 *    a help text on), found through the type checker: a string, a template, a sum of them, or a
 *    constant naming one;
 *  - the value of a `help` or `source` property written in an object literal (a function's
 *    declaration), whatever it is: those fields are documentation only.
 */
const path = require('node:path');
const ts = require('typescript');

const DOC_NAMES = new Set(['help', 'source']);
const CELLS = `${path.sep}src${path.sep}cells${path.sep}`;

/** Text written in place (a literal, a template, strings joined with +) or a constant's name. */
function isText(node) {
  if (ts.isStringLiteral(node) || ts.isNoSubstitutionTemplateLiteral(node) || ts.isTemplateExpression(node) || ts.isIdentifier(node)) return true;
  if (ts.isParenthesizedExpression(node)) return isText(node.expression);
  return ts.isBinaryExpression(node) && node.operatorToken.kind === ts.SyntaxKind.PlusToken && (isText(node.left) || isText(node.right));
}

/** The name of the parameter that receives argument `i` of a call, if the checker resolves it. */
function parameterName(checker, call, i) {
  const signature = checker.getResolvedSignature(call);
  const declaration = signature?.getDeclaration?.() ?? signature?.declaration;
  const params = declaration?.parameters;
  if (!params || params.length === 0) return undefined;
  const p = i < params.length ? params[i] : params[params.length - 1].dotDotDotToken ? params[params.length - 1] : undefined;
  return p && ts.isIdentifier(p.name) ? p.name.text : undefined;
}

/** @param {ts.Program} program */
module.exports = function withoutHelpText(program) {
  const checker = program.getTypeChecker();
  return (context) => (sourceFile) => {
    if (!path.normalize(sourceFile.fileName).includes(CELLS)) return sourceFile;
    const empty = () => context.factory.createStringLiteral('');
    const visit = (node) => {
      if (ts.isCallExpression(node)) {
        const args = node.arguments.map((arg, i) => (isText(arg) && DOC_NAMES.has(parameterName(checker, node, i)) ? empty() : ts.visitNode(arg, visit)));
        return context.factory.updateCallExpression(node, ts.visitNode(node.expression, visit), node.typeArguments, args);
      }
      if (ts.isPropertyAssignment(node) && ts.isIdentifier(node.name) && DOC_NAMES.has(node.name.text)) {
        return context.factory.updatePropertyAssignment(node, node.name, empty());
      }
      return ts.visitEachChild(node, visit, context);
    };
    return ts.visitNode(sourceFile, visit);
  };
};
