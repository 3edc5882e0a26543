/**
 * The claim-file grammar (grammar/claims.ebnf) as a Chevrotain CST parser. Rules are
 * class fields so that a misspelt rule does not compile. The driver parses one
 * statement at a time (`statementLine`), after `layout.ts` has cut the file at
 * statement boundaries; `claimFile` states the whole-file shape for the diagrams.
 */
import { CstParser } from './chevrotain-runtime.js';
import { structuredMessages } from './parse-problems.js';
import {
  Assume,
  Caret,
  Character,
  ClaimKeyword,
  Colon,
  Comma,
  Cusp,
  EqualEqual,
  Equal,
  Expect,
  Holomorphic,
  Index,
  Integer,
  Is,
  Jacobi,
  LatticeKeyword,
  LBrace,
  LBracket,
  Let,
  LParen,
  Minus,
  Name,
  Newline,
  PARSER_TOKENS,
  Plus,
  Proved,
  RBrace,
  RBracket,
  Refuted,
  RParen,
  Slash,
  Star,
  StringLiteral,
  Subscript,
  Tau,
  ThetaKeyword,
  Unproved,
  Variables,
  Weak,
  Weight,
} from './tokens.js';

export class ClaimParser extends CstParser {
  /**
   * `validate` checks the grammar (ambiguities, left recursion, …) as it is recorded.
   * The grammar is fixed, so the tests build it validated (test/lang/grammar-validation)
   * and every run skips the check: a quarter of the parser's start-up.
   */
  constructor(validate = false) {
    super([...PARSER_TOKENS], {
      recoveryEnabled: true,
      maxLookahead: 2,
      nodeLocationTracking: 'full',
      errorMessageProvider: structuredMessages,
      skipValidations: !validate,
    });
    this.performSelfAnalysis();
  }

  public claimFile = this.RULE('claimFile', () => {
    this.MANY(() => {
      this.OR([{ ALT: () => this.CONSUME(Newline) }, { ALT: () => this.SUBRULE(this.statementLine) }]);
    });
  });

  public statementLine = this.RULE('statementLine', () => {
    this.SUBRULE(this.statement);
    this.CONSUME(Newline);
  });

  /** The command line's `expand EXPR`: one expression and nothing else. */
  public expressionLine = this.RULE('expressionLine', () => {
    this.SUBRULE(this.expression);
    this.CONSUME(Newline);
  });

  public statement = this.RULE('statement', () => {
    this.OR([
      { ALT: () => this.SUBRULE(this.variablesStatement) },
      { ALT: () => this.SUBRULE(this.latticeStatement) },
      { ALT: () => this.SUBRULE(this.letStatement) },
      { ALT: () => this.SUBRULE(this.assumeStatement) },
      { ALT: () => this.SUBRULE(this.claimStatement) },
    ]);
  });

  public variablesStatement = this.RULE('variablesStatement', () => {
    this.CONSUME(Variables);
    this.AT_LEAST_ONE_SEP({ SEP: Comma, DEF: () => this.CONSUME(Name) });
  });

  public latticeStatement = this.RULE('latticeStatement', () => {
    this.CONSUME(LatticeKeyword);
    this.CONSUME(Name);
    this.CONSUME(Equal);
    this.SUBRULE(this.matrix);
  });

  public letStatement = this.RULE('letStatement', () => {
    this.CONSUME(Let);
    this.CONSUME(Name);
    this.OPTION(() => this.SUBRULE(this.parameterList));
    this.CONSUME(Equal);
    this.SUBRULE(this.expression);
  });

  public parameterList = this.RULE('parameterList', () => {
    this.CONSUME(LParen);
    this.AT_LEAST_ONE_SEP({ SEP: Comma, DEF: () => this.CONSUME(Name) });
    this.CONSUME(RParen);
  });

  public assumeStatement = this.RULE('assumeStatement', () => {
    this.CONSUME(Assume);
    this.CONSUME(Name);
    this.CONSUME(Is);
    this.SUBRULE(this.typeSpec);
  });

  public claimStatement = this.RULE('claimStatement', () => {
    this.CONSUME(ClaimKeyword);
    this.OPTION(() => this.CONSUME(StringLiteral));
    this.OPTION2(() => {
      this.CONSUME(Expect);
      this.SUBRULE(this.expectation);
    });
    this.CONSUME(Colon);
    this.SUBRULE(this.relation);
  });

  public expectation = this.RULE('expectation', () => {
    this.OR([
      { ALT: () => this.CONSUME(Proved) },
      { ALT: () => this.CONSUME(Refuted) },
      { ALT: () => this.CONSUME(Unproved) },
    ]);
  });

  public relation = this.RULE('relation', () => {
    this.SUBRULE(this.expression);
    this.OR([
      {
        ALT: () => {
          this.CONSUME(EqualEqual);
          this.SUBRULE2(this.expression);
        },
      },
      {
        ALT: () => {
          this.CONSUME(Is);
          this.SUBRULE(this.typeSpec);
        },
      },
    ]);
  });

  public typeSpec = this.RULE('typeSpec', () => {
    this.CONSUME(Jacobi);
    this.CONSUME(LParen);
    this.CONSUME(Weight);
    this.SUBRULE(this.rational);
    this.CONSUME(Comma);
    this.SUBRULE(this.indexSpec);
    this.OPTION(() => {
      this.CONSUME2(Comma);
      this.SUBRULE(this.characterSpec);
    });
    this.CONSUME(RParen);
    this.OPTION2(() => this.SUBRULE(this.qualifier));
  });

  public indexSpec = this.RULE('indexSpec', () => {
    this.OR([
      {
        ALT: () => {
          this.CONSUME(Index);
          this.OR2([
            { ALT: () => this.SUBRULE(this.rational) },
            { ALT: () => this.SUBRULE(this.matrix) },
            { ALT: () => this.SUBRULE(this.latticeSpec) },
          ]);
        },
      },
      { ALT: () => this.SUBRULE2(this.latticeSpec) },
    ]);
  });

  public latticeSpec = this.RULE('latticeSpec', () => {
    this.CONSUME(LatticeKeyword);
    this.OR([{ ALT: () => this.SUBRULE(this.matrix) }, { ALT: () => this.CONSUME(Name) }]);
  });

  public characterSpec = this.RULE('characterSpec', () => {
    this.CONSUME(Character);
    this.CONSUME(Name);
    this.OPTION(() => {
      this.CONSUME(Caret);
      this.SUBRULE(this.exponent);
    });
  });

  public qualifier = this.RULE('qualifier', () => {
    this.OR([
      { ALT: () => this.CONSUME(Weak) },
      { ALT: () => this.CONSUME(Holomorphic) },
      { ALT: () => this.CONSUME(Cusp) },
    ]);
  });

  public matrix = this.RULE('matrix', () => {
    this.CONSUME(LBracket);
    this.AT_LEAST_ONE_SEP({ SEP: Comma, DEF: () => this.SUBRULE(this.matrixRow) });
    this.CONSUME(RBracket);
  });

  public matrixRow = this.RULE('matrixRow', () => {
    this.CONSUME(LBracket);
    this.AT_LEAST_ONE_SEP({ SEP: Comma, DEF: () => this.SUBRULE(this.rational) });
    this.CONSUME(RBracket);
  });

  /** A signed rational literal: `-2`, `3/2`, `-1/2`. */
  public rational = this.RULE('rational', () => {
    this.OPTION(() => this.CONSUME(Minus));
    this.CONSUME(Integer);
    this.OPTION2(() => {
      this.CONSUME(Slash);
      this.CONSUME2(Integer);
    });
  });

  /** Sums and differences, left-associative. */
  public expression = this.RULE('expression', () => {
    this.SUBRULE(this.product);
    this.MANY(() => {
      this.OR([{ ALT: () => this.CONSUME(Plus) }, { ALT: () => this.CONSUME(Minus) }]);
      this.SUBRULE2(this.product);
    });
  });

  /** Products and quotients, left-associative: `2*3/4` is `(2*3)/4`. */
  public product = this.RULE('product', () => {
    this.SUBRULE(this.unary);
    this.MANY(() => {
      this.OR([{ ALT: () => this.CONSUME(Star) }, { ALT: () => this.CONSUME(Slash) }]);
      this.SUBRULE2(this.unary);
    });
  });

  /** Unary minus binds looser than `^`: `-eta^2` is `-(eta^2)`. */
  public unary = this.RULE('unary', () => {
    this.OR([
      {
        ALT: () => {
          this.CONSUME(Minus);
          this.SUBRULE(this.unary);
        },
      },
      { ALT: () => this.SUBRULE(this.power) },
    ]);
  });

  /** `^` is right-associative: `a^b^c` is `a^(b^c)`. */
  public power = this.RULE('power', () => {
    this.SUBRULE(this.postfix);
    this.OPTION(() => {
      this.CONSUME(Caret);
      this.SUBRULE(this.exponent);
    });
  });

  /** What may follow `^`: `-6`, `(-6)`, `{18}`, or a further power. */
  public exponent = this.RULE('exponent', () => {
    this.OR([
      {
        ALT: () => {
          this.CONSUME(Minus);
          this.SUBRULE(this.exponent);
        },
      },
      {
        ALT: () => {
          this.CONSUME(LBrace);
          this.SUBRULE(this.expression);
          this.CONSUME(RBrace);
        },
      },
      { ALT: () => this.SUBRULE(this.power) },
    ]);
  });

  /** Calls parse alike everywhere; `resolve-expr.ts` classifies them afterwards. */
  public postfix = this.RULE('postfix', () => {
    this.SUBRULE(this.primary);
    this.MANY(() => this.SUBRULE(this.callArguments));
  });

  public callArguments = this.RULE('callArguments', () => {
    this.CONSUME(LParen);
    this.MANY_SEP({ SEP: Comma, DEF: () => this.SUBRULE(this.expression) });
    this.CONSUME(RParen);
  });

  public primary = this.RULE('primary', () => {
    this.OR([
      { ALT: () => this.SUBRULE(this.numberTerm) },
      { ALT: () => this.CONSUME(Name) },
      { ALT: () => this.CONSUME(Tau) },
      { ALT: () => this.SUBRULE(this.parenthesized) },
      { ALT: () => this.SUBRULE(this.latticeTheta) },
      { ALT: () => this.SUBRULE(this.rankinCohen) },
    ]);
  });

  /** An integer, optionally followed directly by a name: `2z`, the only juxtaposition. */
  public numberTerm = this.RULE('numberTerm', () => {
    this.CONSUME(Integer);
    this.OPTION(() => {
      this.OR([{ ALT: () => this.CONSUME(Name) }, { ALT: () => this.CONSUME(Tau) }]);
    });
  });

  public parenthesized = this.RULE('parenthesized', () => {
    this.CONSUME(LParen);
    this.SUBRULE(this.expression);
    this.CONSUME(RParen);
  });

  /** `Theta[NAME]`; after the keyword `Theta`, `[` names a lattice. */
  public latticeTheta = this.RULE('latticeTheta', () => {
    this.CONSUME(ThetaKeyword);
    this.CONSUME(LBracket);
    this.CONSUME(Name);
    this.CONSUME(RBracket);
  });

  /** The Rankin–Cohen bracket `[f, g]_n`. */
  public rankinCohen = this.RULE('rankinCohen', () => {
    this.CONSUME(LBracket);
    this.SUBRULE(this.expression);
    this.CONSUME(Comma);
    this.SUBRULE2(this.expression);
    this.CONSUME(RBracket);
    this.CONSUME(Subscript);
  });
}

/** Building the parser analyses the grammar, so one instance serves every parse. */
export const claimParser = new ClaimParser();
