/**
 * Generated from the grammar in parser.ts by generate-cst-types.ts; do not edit.
 * Regenerate with STURMCHECK_ACCEPT=1 npx vitest run test/lang/generated-files.test.ts
 */
import type { CstNode, ICstVisitor, IToken } from 'chevrotain';

export interface ClaimFileCstNode extends CstNode {
  name: 'claimFile';
  children: ClaimFileCstChildren;
}

export type ClaimFileCstChildren = {
  Newline?: IToken[];
  statementLine?: StatementLineCstNode[];
};

export interface StatementLineCstNode extends CstNode {
  name: 'statementLine';
  children: StatementLineCstChildren;
}

export type StatementLineCstChildren = {
  statement: StatementCstNode[];
  Newline: IToken[];
};

export interface ExpressionLineCstNode extends CstNode {
  name: 'expressionLine';
  children: ExpressionLineCstChildren;
}

export type ExpressionLineCstChildren = {
  expression: ExpressionCstNode[];
  Newline: IToken[];
};

export interface StatementCstNode extends CstNode {
  name: 'statement';
  children: StatementCstChildren;
}

export type StatementCstChildren = {
  variablesStatement?: VariablesStatementCstNode[];
  latticeStatement?: LatticeStatementCstNode[];
  letStatement?: LetStatementCstNode[];
  assumeStatement?: AssumeStatementCstNode[];
  claimStatement?: ClaimStatementCstNode[];
};

export interface VariablesStatementCstNode extends CstNode {
  name: 'variablesStatement';
  children: VariablesStatementCstChildren;
}

export type VariablesStatementCstChildren = {
  Variables: IToken[];
  Name: IToken[];
  Comma?: IToken[];
};

export interface LatticeStatementCstNode extends CstNode {
  name: 'latticeStatement';
  children: LatticeStatementCstChildren;
}

export type LatticeStatementCstChildren = {
  LatticeKeyword: IToken[];
  Name: IToken[];
  Equal: IToken[];
  matrix: MatrixCstNode[];
};

export interface LetStatementCstNode extends CstNode {
  name: 'letStatement';
  children: LetStatementCstChildren;
}

export type LetStatementCstChildren = {
  Let: IToken[];
  Name: IToken[];
  parameterList?: ParameterListCstNode[];
  Equal: IToken[];
  expression: ExpressionCstNode[];
};

export interface ParameterListCstNode extends CstNode {
  name: 'parameterList';
  children: ParameterListCstChildren;
}

export type ParameterListCstChildren = {
  LParen: IToken[];
  Name: IToken[];
  Comma?: IToken[];
  RParen: IToken[];
};

export interface AssumeStatementCstNode extends CstNode {
  name: 'assumeStatement';
  children: AssumeStatementCstChildren;
}

export type AssumeStatementCstChildren = {
  Assume: IToken[];
  Name: IToken[];
  Is: IToken[];
  typeSpec: TypeSpecCstNode[];
};

export interface ClaimStatementCstNode extends CstNode {
  name: 'claimStatement';
  children: ClaimStatementCstChildren;
}

export type ClaimStatementCstChildren = {
  ClaimKeyword: IToken[];
  StringLiteral?: IToken[];
  Expect?: IToken[];
  expectation?: ExpectationCstNode[];
  Colon: IToken[];
  relation: RelationCstNode[];
};

export interface ExpectationCstNode extends CstNode {
  name: 'expectation';
  children: ExpectationCstChildren;
}

export type ExpectationCstChildren = {
  Proved?: IToken[];
  Refuted?: IToken[];
  Unproved?: IToken[];
};

export interface RelationCstNode extends CstNode {
  name: 'relation';
  children: RelationCstChildren;
}

export type RelationCstChildren = {
  expression: (ExpressionCstNode)[];
  EqualEqual?: IToken[];
  Is?: IToken[];
  typeSpec?: TypeSpecCstNode[];
};

export interface TypeSpecCstNode extends CstNode {
  name: 'typeSpec';
  children: TypeSpecCstChildren;
}

export type TypeSpecCstChildren = {
  Jacobi: IToken[];
  LParen: IToken[];
  Weight: IToken[];
  rational: RationalCstNode[];
  Comma: (IToken)[];
  indexSpec: IndexSpecCstNode[];
  characterSpec?: CharacterSpecCstNode[];
  RParen: IToken[];
  qualifier?: QualifierCstNode[];
};

export interface IndexSpecCstNode extends CstNode {
  name: 'indexSpec';
  children: IndexSpecCstChildren;
}

export type IndexSpecCstChildren = {
  Index?: IToken[];
  rational?: RationalCstNode[];
  matrix?: MatrixCstNode[];
  latticeSpec?: (LatticeSpecCstNode)[];
};

export interface LatticeSpecCstNode extends CstNode {
  name: 'latticeSpec';
  children: LatticeSpecCstChildren;
}

export type LatticeSpecCstChildren = {
  LatticeKeyword: IToken[];
  matrix?: MatrixCstNode[];
  Name?: IToken[];
};

export interface CharacterSpecCstNode extends CstNode {
  name: 'characterSpec';
  children: CharacterSpecCstChildren;
}

export type CharacterSpecCstChildren = {
  Character: IToken[];
  Name: IToken[];
  Caret?: IToken[];
  exponent?: ExponentCstNode[];
};

export interface QualifierCstNode extends CstNode {
  name: 'qualifier';
  children: QualifierCstChildren;
}

export type QualifierCstChildren = {
  Weak?: IToken[];
  Holomorphic?: IToken[];
  Cusp?: IToken[];
};

export interface MatrixCstNode extends CstNode {
  name: 'matrix';
  children: MatrixCstChildren;
}

export type MatrixCstChildren = {
  LBracket: IToken[];
  matrixRow: MatrixRowCstNode[];
  Comma?: IToken[];
  RBracket: IToken[];
};

export interface MatrixRowCstNode extends CstNode {
  name: 'matrixRow';
  children: MatrixRowCstChildren;
}

export type MatrixRowCstChildren = {
  LBracket: IToken[];
  rational: RationalCstNode[];
  Comma?: IToken[];
  RBracket: IToken[];
};

export interface RationalCstNode extends CstNode {
  name: 'rational';
  children: RationalCstChildren;
}

export type RationalCstChildren = {
  Minus?: IToken[];
  Integer: (IToken)[];
  Slash?: IToken[];
};

export interface ExpressionCstNode extends CstNode {
  name: 'expression';
  children: ExpressionCstChildren;
}

export type ExpressionCstChildren = {
  product: (ProductCstNode)[];
  Plus?: IToken[];
  Minus?: IToken[];
};

export interface ProductCstNode extends CstNode {
  name: 'product';
  children: ProductCstChildren;
}

export type ProductCstChildren = {
  unary: (UnaryCstNode)[];
  Star?: IToken[];
  Slash?: IToken[];
};

export interface UnaryCstNode extends CstNode {
  name: 'unary';
  children: UnaryCstChildren;
}

export type UnaryCstChildren = {
  Minus?: IToken[];
  unary?: UnaryCstNode[];
  power?: PowerCstNode[];
};

export interface PowerCstNode extends CstNode {
  name: 'power';
  children: PowerCstChildren;
}

export type PowerCstChildren = {
  postfix: PostfixCstNode[];
  Caret?: IToken[];
  exponent?: ExponentCstNode[];
};

export interface ExponentCstNode extends CstNode {
  name: 'exponent';
  children: ExponentCstChildren;
}

export type ExponentCstChildren = {
  Minus?: IToken[];
  exponent?: ExponentCstNode[];
  LBrace?: IToken[];
  expression?: ExpressionCstNode[];
  RBrace?: IToken[];
  power?: PowerCstNode[];
};

export interface PostfixCstNode extends CstNode {
  name: 'postfix';
  children: PostfixCstChildren;
}

export type PostfixCstChildren = {
  primary: PrimaryCstNode[];
  callArguments?: CallArgumentsCstNode[];
};

export interface CallArgumentsCstNode extends CstNode {
  name: 'callArguments';
  children: CallArgumentsCstChildren;
}

export type CallArgumentsCstChildren = {
  LParen: IToken[];
  expression?: ExpressionCstNode[];
  Comma?: IToken[];
  RParen: IToken[];
};

export interface PrimaryCstNode extends CstNode {
  name: 'primary';
  children: PrimaryCstChildren;
}

export type PrimaryCstChildren = {
  numberTerm?: NumberTermCstNode[];
  Name?: IToken[];
  Tau?: IToken[];
  parenthesized?: ParenthesizedCstNode[];
  latticeTheta?: LatticeThetaCstNode[];
  rankinCohen?: RankinCohenCstNode[];
};

export interface NumberTermCstNode extends CstNode {
  name: 'numberTerm';
  children: NumberTermCstChildren;
}

export type NumberTermCstChildren = {
  Integer: IToken[];
  Name?: IToken[];
  Tau?: IToken[];
};

export interface ParenthesizedCstNode extends CstNode {
  name: 'parenthesized';
  children: ParenthesizedCstChildren;
}

export type ParenthesizedCstChildren = {
  LParen: IToken[];
  expression: ExpressionCstNode[];
  RParen: IToken[];
};

export interface LatticeThetaCstNode extends CstNode {
  name: 'latticeTheta';
  children: LatticeThetaCstChildren;
}

export type LatticeThetaCstChildren = {
  ThetaKeyword: IToken[];
  LBracket: IToken[];
  Name: IToken[];
  RBracket: IToken[];
};

export interface RankinCohenCstNode extends CstNode {
  name: 'rankinCohen';
  children: RankinCohenCstChildren;
}

export type RankinCohenCstChildren = {
  LBracket: IToken[];
  expression: (ExpressionCstNode)[];
  Comma: IToken[];
  RBracket: IToken[];
  Subscript: IToken[];
};

export interface ICstNodeVisitor<IN, OUT> extends ICstVisitor<IN, OUT> {
  claimFile(children: ClaimFileCstChildren, param?: IN): OUT;
  statementLine(children: StatementLineCstChildren, param?: IN): OUT;
  expressionLine(children: ExpressionLineCstChildren, param?: IN): OUT;
  statement(children: StatementCstChildren, param?: IN): OUT;
  variablesStatement(children: VariablesStatementCstChildren, param?: IN): OUT;
  latticeStatement(children: LatticeStatementCstChildren, param?: IN): OUT;
  letStatement(children: LetStatementCstChildren, param?: IN): OUT;
  parameterList(children: ParameterListCstChildren, param?: IN): OUT;
  assumeStatement(children: AssumeStatementCstChildren, param?: IN): OUT;
  claimStatement(children: ClaimStatementCstChildren, param?: IN): OUT;
  expectation(children: ExpectationCstChildren, param?: IN): OUT;
  relation(children: RelationCstChildren, param?: IN): OUT;
  typeSpec(children: TypeSpecCstChildren, param?: IN): OUT;
  indexSpec(children: IndexSpecCstChildren, param?: IN): OUT;
  latticeSpec(children: LatticeSpecCstChildren, param?: IN): OUT;
  characterSpec(children: CharacterSpecCstChildren, param?: IN): OUT;
  qualifier(children: QualifierCstChildren, param?: IN): OUT;
  matrix(children: MatrixCstChildren, param?: IN): OUT;
  matrixRow(children: MatrixRowCstChildren, param?: IN): OUT;
  rational(children: RationalCstChildren, param?: IN): OUT;
  expression(children: ExpressionCstChildren, param?: IN): OUT;
  product(children: ProductCstChildren, param?: IN): OUT;
  unary(children: UnaryCstChildren, param?: IN): OUT;
  power(children: PowerCstChildren, param?: IN): OUT;
  exponent(children: ExponentCstChildren, param?: IN): OUT;
  postfix(children: PostfixCstChildren, param?: IN): OUT;
  callArguments(children: CallArgumentsCstChildren, param?: IN): OUT;
  primary(children: PrimaryCstChildren, param?: IN): OUT;
  numberTerm(children: NumberTermCstChildren, param?: IN): OUT;
  parenthesized(children: ParenthesizedCstChildren, param?: IN): OUT;
  latticeTheta(children: LatticeThetaCstChildren, param?: IN): OUT;
  rankinCohen(children: RankinCohenCstChildren, param?: IN): OUT;
}
