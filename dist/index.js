import { createRequire as __WEBPACK_EXTERNAL_createRequire } from "module";
/******/ var __webpack_modules__ = ({

/***/ 2210:
/***/ ((module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.MissingRefError = exports.ValidationError = exports.CodeGen = exports.Name = exports.nil = exports.stringify = exports.str = exports._ = exports.KeywordCxt = exports.Ajv2020 = void 0;
const core_1 = __nccwpck_require__(3893);
const draft2020_1 = __nccwpck_require__(4298);
const discriminator_1 = __nccwpck_require__(8886);
const json_schema_2020_12_1 = __nccwpck_require__(3995);
const META_SCHEMA_ID = "https://json-schema.org/draft/2020-12/schema";
class Ajv2020 extends core_1.default {
    constructor(opts = {}) {
        super({
            ...opts,
            dynamicRef: true,
            next: true,
            unevaluated: true,
        });
    }
    _addVocabularies() {
        super._addVocabularies();
        draft2020_1.default.forEach((v) => this.addVocabulary(v));
        if (this.opts.discriminator)
            this.addKeyword(discriminator_1.default);
    }
    _addDefaultMetaSchema() {
        super._addDefaultMetaSchema();
        const { $data, meta } = this.opts;
        if (!meta)
            return;
        json_schema_2020_12_1.default.call(this, $data);
        this.refs["http://json-schema.org/schema"] = META_SCHEMA_ID;
    }
    defaultMeta() {
        return (this.opts.defaultMeta =
            super.defaultMeta() || (this.getSchema(META_SCHEMA_ID) ? META_SCHEMA_ID : undefined));
    }
}
exports.Ajv2020 = Ajv2020;
module.exports = exports = Ajv2020;
module.exports.Ajv2020 = Ajv2020;
Object.defineProperty(exports, "__esModule", ({ value: true }));
exports["default"] = Ajv2020;
var validate_1 = __nccwpck_require__(7881);
Object.defineProperty(exports, "KeywordCxt", ({ enumerable: true, get: function () { return validate_1.KeywordCxt; } }));
var codegen_1 = __nccwpck_require__(1436);
Object.defineProperty(exports, "_", ({ enumerable: true, get: function () { return codegen_1._; } }));
Object.defineProperty(exports, "str", ({ enumerable: true, get: function () { return codegen_1.str; } }));
Object.defineProperty(exports, "stringify", ({ enumerable: true, get: function () { return codegen_1.stringify; } }));
Object.defineProperty(exports, "nil", ({ enumerable: true, get: function () { return codegen_1.nil; } }));
Object.defineProperty(exports, "Name", ({ enumerable: true, get: function () { return codegen_1.Name; } }));
Object.defineProperty(exports, "CodeGen", ({ enumerable: true, get: function () { return codegen_1.CodeGen; } }));
var validation_error_1 = __nccwpck_require__(3021);
Object.defineProperty(exports, "ValidationError", ({ enumerable: true, get: function () { return validation_error_1.default; } }));
var ref_error_1 = __nccwpck_require__(3162);
Object.defineProperty(exports, "MissingRefError", ({ enumerable: true, get: function () { return ref_error_1.default; } }));
//# sourceMappingURL=2020.js.map

/***/ }),

/***/ 567:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.regexpCode = exports.getEsmExportName = exports.getProperty = exports.safeStringify = exports.stringify = exports.strConcat = exports.addCodeArg = exports.str = exports._ = exports.nil = exports._Code = exports.Name = exports.IDENTIFIER = exports._CodeOrName = void 0;
// eslint-disable-next-line @typescript-eslint/no-extraneous-class
class _CodeOrName {
}
exports._CodeOrName = _CodeOrName;
exports.IDENTIFIER = /^[a-z$_][a-z$_0-9]*$/i;
class Name extends _CodeOrName {
    constructor(s) {
        super();
        if (!exports.IDENTIFIER.test(s))
            throw new Error("CodeGen: name must be a valid identifier");
        this.str = s;
    }
    toString() {
        return this.str;
    }
    emptyStr() {
        return false;
    }
    get names() {
        return { [this.str]: 1 };
    }
}
exports.Name = Name;
class _Code extends _CodeOrName {
    constructor(code) {
        super();
        this._items = typeof code === "string" ? [code] : code;
    }
    toString() {
        return this.str;
    }
    emptyStr() {
        if (this._items.length > 1)
            return false;
        const item = this._items[0];
        return item === "" || item === '""';
    }
    get str() {
        var _a;
        return ((_a = this._str) !== null && _a !== void 0 ? _a : (this._str = this._items.reduce((s, c) => `${s}${c}`, "")));
    }
    get names() {
        var _a;
        return ((_a = this._names) !== null && _a !== void 0 ? _a : (this._names = this._items.reduce((names, c) => {
            if (c instanceof Name)
                names[c.str] = (names[c.str] || 0) + 1;
            return names;
        }, {})));
    }
}
exports._Code = _Code;
exports.nil = new _Code("");
function _(strs, ...args) {
    const code = [strs[0]];
    let i = 0;
    while (i < args.length) {
        addCodeArg(code, args[i]);
        code.push(strs[++i]);
    }
    return new _Code(code);
}
exports._ = _;
const plus = new _Code("+");
function str(strs, ...args) {
    const expr = [safeStringify(strs[0])];
    let i = 0;
    while (i < args.length) {
        expr.push(plus);
        addCodeArg(expr, args[i]);
        expr.push(plus, safeStringify(strs[++i]));
    }
    optimize(expr);
    return new _Code(expr);
}
exports.str = str;
function addCodeArg(code, arg) {
    if (arg instanceof _Code)
        code.push(...arg._items);
    else if (arg instanceof Name)
        code.push(arg);
    else
        code.push(interpolate(arg));
}
exports.addCodeArg = addCodeArg;
function optimize(expr) {
    let i = 1;
    while (i < expr.length - 1) {
        if (expr[i] === plus) {
            const res = mergeExprItems(expr[i - 1], expr[i + 1]);
            if (res !== undefined) {
                expr.splice(i - 1, 3, res);
                continue;
            }
            expr[i++] = "+";
        }
        i++;
    }
}
function mergeExprItems(a, b) {
    if (b === '""')
        return a;
    if (a === '""')
        return b;
    if (typeof a == "string") {
        if (b instanceof Name || a[a.length - 1] !== '"')
            return;
        if (typeof b != "string")
            return `${a.slice(0, -1)}${b}"`;
        if (b[0] === '"')
            return a.slice(0, -1) + b.slice(1);
        return;
    }
    if (typeof b == "string" && b[0] === '"' && !(a instanceof Name))
        return `"${a}${b.slice(1)}`;
    return;
}
function strConcat(c1, c2) {
    return c2.emptyStr() ? c1 : c1.emptyStr() ? c2 : str `${c1}${c2}`;
}
exports.strConcat = strConcat;
// TODO do not allow arrays here
function interpolate(x) {
    return typeof x == "number" || typeof x == "boolean" || x === null
        ? x
        : safeStringify(Array.isArray(x) ? x.join(",") : x);
}
function stringify(x) {
    return new _Code(safeStringify(x));
}
exports.stringify = stringify;
function safeStringify(x) {
    return JSON.stringify(x)
        .replace(/\u2028/g, "\\u2028")
        .replace(/\u2029/g, "\\u2029");
}
exports.safeStringify = safeStringify;
function getProperty(key) {
    return typeof key == "string" && exports.IDENTIFIER.test(key) ? new _Code(`.${key}`) : _ `[${key}]`;
}
exports.getProperty = getProperty;
//Does best effort to format the name properly
function getEsmExportName(key) {
    if (typeof key == "string" && exports.IDENTIFIER.test(key)) {
        return new _Code(`${key}`);
    }
    throw new Error(`CodeGen: invalid export name: ${key}, use explicit $id name mapping`);
}
exports.getEsmExportName = getEsmExportName;
function regexpCode(rx) {
    return new _Code(rx.toString());
}
exports.regexpCode = regexpCode;
//# sourceMappingURL=code.js.map

/***/ }),

/***/ 1436:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.or = exports.and = exports.not = exports.CodeGen = exports.operators = exports.varKinds = exports.ValueScopeName = exports.ValueScope = exports.Scope = exports.Name = exports.regexpCode = exports.stringify = exports.getProperty = exports.nil = exports.strConcat = exports.str = exports._ = void 0;
const code_1 = __nccwpck_require__(567);
const scope_1 = __nccwpck_require__(7788);
var code_2 = __nccwpck_require__(567);
Object.defineProperty(exports, "_", ({ enumerable: true, get: function () { return code_2._; } }));
Object.defineProperty(exports, "str", ({ enumerable: true, get: function () { return code_2.str; } }));
Object.defineProperty(exports, "strConcat", ({ enumerable: true, get: function () { return code_2.strConcat; } }));
Object.defineProperty(exports, "nil", ({ enumerable: true, get: function () { return code_2.nil; } }));
Object.defineProperty(exports, "getProperty", ({ enumerable: true, get: function () { return code_2.getProperty; } }));
Object.defineProperty(exports, "stringify", ({ enumerable: true, get: function () { return code_2.stringify; } }));
Object.defineProperty(exports, "regexpCode", ({ enumerable: true, get: function () { return code_2.regexpCode; } }));
Object.defineProperty(exports, "Name", ({ enumerable: true, get: function () { return code_2.Name; } }));
var scope_2 = __nccwpck_require__(7788);
Object.defineProperty(exports, "Scope", ({ enumerable: true, get: function () { return scope_2.Scope; } }));
Object.defineProperty(exports, "ValueScope", ({ enumerable: true, get: function () { return scope_2.ValueScope; } }));
Object.defineProperty(exports, "ValueScopeName", ({ enumerable: true, get: function () { return scope_2.ValueScopeName; } }));
Object.defineProperty(exports, "varKinds", ({ enumerable: true, get: function () { return scope_2.varKinds; } }));
exports.operators = {
    GT: new code_1._Code(">"),
    GTE: new code_1._Code(">="),
    LT: new code_1._Code("<"),
    LTE: new code_1._Code("<="),
    EQ: new code_1._Code("==="),
    NEQ: new code_1._Code("!=="),
    NOT: new code_1._Code("!"),
    OR: new code_1._Code("||"),
    AND: new code_1._Code("&&"),
    ADD: new code_1._Code("+"),
};
class Node {
    optimizeNodes() {
        return this;
    }
    optimizeNames(_names, _constants) {
        return this;
    }
}
class Def extends Node {
    constructor(varKind, name, rhs) {
        super();
        this.varKind = varKind;
        this.name = name;
        this.rhs = rhs;
    }
    render({ es5, _n }) {
        const varKind = es5 ? scope_1.varKinds.var : this.varKind;
        const rhs = this.rhs === undefined ? "" : ` = ${this.rhs}`;
        return `${varKind} ${this.name}${rhs};` + _n;
    }
    optimizeNames(names, constants) {
        if (!names[this.name.str])
            return;
        if (this.rhs)
            this.rhs = optimizeExpr(this.rhs, names, constants);
        return this;
    }
    get names() {
        return this.rhs instanceof code_1._CodeOrName ? this.rhs.names : {};
    }
}
class Assign extends Node {
    constructor(lhs, rhs, sideEffects) {
        super();
        this.lhs = lhs;
        this.rhs = rhs;
        this.sideEffects = sideEffects;
    }
    render({ _n }) {
        return `${this.lhs} = ${this.rhs};` + _n;
    }
    optimizeNames(names, constants) {
        if (this.lhs instanceof code_1.Name && !names[this.lhs.str] && !this.sideEffects)
            return;
        this.rhs = optimizeExpr(this.rhs, names, constants);
        return this;
    }
    get names() {
        const names = this.lhs instanceof code_1.Name ? {} : { ...this.lhs.names };
        return addExprNames(names, this.rhs);
    }
}
class AssignOp extends Assign {
    constructor(lhs, op, rhs, sideEffects) {
        super(lhs, rhs, sideEffects);
        this.op = op;
    }
    render({ _n }) {
        return `${this.lhs} ${this.op}= ${this.rhs};` + _n;
    }
}
class Label extends Node {
    constructor(label) {
        super();
        this.label = label;
        this.names = {};
    }
    render({ _n }) {
        return `${this.label}:` + _n;
    }
}
class Break extends Node {
    constructor(label) {
        super();
        this.label = label;
        this.names = {};
    }
    render({ _n }) {
        const label = this.label ? ` ${this.label}` : "";
        return `break${label};` + _n;
    }
}
class Throw extends Node {
    constructor(error) {
        super();
        this.error = error;
    }
    render({ _n }) {
        return `throw ${this.error};` + _n;
    }
    get names() {
        return this.error.names;
    }
}
class AnyCode extends Node {
    constructor(code) {
        super();
        this.code = code;
    }
    render({ _n }) {
        return `${this.code};` + _n;
    }
    optimizeNodes() {
        return `${this.code}` ? this : undefined;
    }
    optimizeNames(names, constants) {
        this.code = optimizeExpr(this.code, names, constants);
        return this;
    }
    get names() {
        return this.code instanceof code_1._CodeOrName ? this.code.names : {};
    }
}
class ParentNode extends Node {
    constructor(nodes = []) {
        super();
        this.nodes = nodes;
    }
    render(opts) {
        return this.nodes.reduce((code, n) => code + n.render(opts), "");
    }
    optimizeNodes() {
        const { nodes } = this;
        let i = nodes.length;
        while (i--) {
            const n = nodes[i].optimizeNodes();
            if (Array.isArray(n))
                nodes.splice(i, 1, ...n);
            else if (n)
                nodes[i] = n;
            else
                nodes.splice(i, 1);
        }
        return nodes.length > 0 ? this : undefined;
    }
    optimizeNames(names, constants) {
        const { nodes } = this;
        let i = nodes.length;
        while (i--) {
            // iterating backwards improves 1-pass optimization
            const n = nodes[i];
            if (n.optimizeNames(names, constants))
                continue;
            subtractNames(names, n.names);
            nodes.splice(i, 1);
        }
        return nodes.length > 0 ? this : undefined;
    }
    get names() {
        return this.nodes.reduce((names, n) => addNames(names, n.names), {});
    }
}
class BlockNode extends ParentNode {
    render(opts) {
        return "{" + opts._n + super.render(opts) + "}" + opts._n;
    }
}
class Root extends ParentNode {
}
class Else extends BlockNode {
}
Else.kind = "else";
class If extends BlockNode {
    constructor(condition, nodes) {
        super(nodes);
        this.condition = condition;
    }
    render(opts) {
        let code = `if(${this.condition})` + super.render(opts);
        if (this.else)
            code += "else " + this.else.render(opts);
        return code;
    }
    optimizeNodes() {
        super.optimizeNodes();
        const cond = this.condition;
        if (cond === true)
            return this.nodes; // else is ignored here
        let e = this.else;
        if (e) {
            const ns = e.optimizeNodes();
            e = this.else = Array.isArray(ns) ? new Else(ns) : ns;
        }
        if (e) {
            if (cond === false)
                return e instanceof If ? e : e.nodes;
            if (this.nodes.length)
                return this;
            return new If(not(cond), e instanceof If ? [e] : e.nodes);
        }
        if (cond === false || !this.nodes.length)
            return undefined;
        return this;
    }
    optimizeNames(names, constants) {
        var _a;
        this.else = (_a = this.else) === null || _a === void 0 ? void 0 : _a.optimizeNames(names, constants);
        if (!(super.optimizeNames(names, constants) || this.else))
            return;
        this.condition = optimizeExpr(this.condition, names, constants);
        return this;
    }
    get names() {
        const names = super.names;
        addExprNames(names, this.condition);
        if (this.else)
            addNames(names, this.else.names);
        return names;
    }
}
If.kind = "if";
class For extends BlockNode {
}
For.kind = "for";
class ForLoop extends For {
    constructor(iteration) {
        super();
        this.iteration = iteration;
    }
    render(opts) {
        return `for(${this.iteration})` + super.render(opts);
    }
    optimizeNames(names, constants) {
        if (!super.optimizeNames(names, constants))
            return;
        this.iteration = optimizeExpr(this.iteration, names, constants);
        return this;
    }
    get names() {
        return addNames(super.names, this.iteration.names);
    }
}
class ForRange extends For {
    constructor(varKind, name, from, to) {
        super();
        this.varKind = varKind;
        this.name = name;
        this.from = from;
        this.to = to;
    }
    render(opts) {
        const varKind = opts.es5 ? scope_1.varKinds.var : this.varKind;
        const { name, from, to } = this;
        return `for(${varKind} ${name}=${from}; ${name}<${to}; ${name}++)` + super.render(opts);
    }
    get names() {
        const names = addExprNames(super.names, this.from);
        return addExprNames(names, this.to);
    }
}
class ForIter extends For {
    constructor(loop, varKind, name, iterable) {
        super();
        this.loop = loop;
        this.varKind = varKind;
        this.name = name;
        this.iterable = iterable;
    }
    render(opts) {
        return `for(${this.varKind} ${this.name} ${this.loop} ${this.iterable})` + super.render(opts);
    }
    optimizeNames(names, constants) {
        if (!super.optimizeNames(names, constants))
            return;
        this.iterable = optimizeExpr(this.iterable, names, constants);
        return this;
    }
    get names() {
        return addNames(super.names, this.iterable.names);
    }
}
class Func extends BlockNode {
    constructor(name, args, async) {
        super();
        this.name = name;
        this.args = args;
        this.async = async;
    }
    render(opts) {
        const _async = this.async ? "async " : "";
        return `${_async}function ${this.name}(${this.args})` + super.render(opts);
    }
}
Func.kind = "func";
class Return extends ParentNode {
    render(opts) {
        return "return " + super.render(opts);
    }
}
Return.kind = "return";
class Try extends BlockNode {
    render(opts) {
        let code = "try" + super.render(opts);
        if (this.catch)
            code += this.catch.render(opts);
        if (this.finally)
            code += this.finally.render(opts);
        return code;
    }
    optimizeNodes() {
        var _a, _b;
        super.optimizeNodes();
        (_a = this.catch) === null || _a === void 0 ? void 0 : _a.optimizeNodes();
        (_b = this.finally) === null || _b === void 0 ? void 0 : _b.optimizeNodes();
        return this;
    }
    optimizeNames(names, constants) {
        var _a, _b;
        super.optimizeNames(names, constants);
        (_a = this.catch) === null || _a === void 0 ? void 0 : _a.optimizeNames(names, constants);
        (_b = this.finally) === null || _b === void 0 ? void 0 : _b.optimizeNames(names, constants);
        return this;
    }
    get names() {
        const names = super.names;
        if (this.catch)
            addNames(names, this.catch.names);
        if (this.finally)
            addNames(names, this.finally.names);
        return names;
    }
}
class Catch extends BlockNode {
    constructor(error) {
        super();
        this.error = error;
    }
    render(opts) {
        return `catch(${this.error})` + super.render(opts);
    }
}
Catch.kind = "catch";
class Finally extends BlockNode {
    render(opts) {
        return "finally" + super.render(opts);
    }
}
Finally.kind = "finally";
class CodeGen {
    constructor(extScope, opts = {}) {
        this._values = {};
        this._blockStarts = [];
        this._constants = {};
        this.opts = { ...opts, _n: opts.lines ? "\n" : "" };
        this._extScope = extScope;
        this._scope = new scope_1.Scope({ parent: extScope });
        this._nodes = [new Root()];
    }
    toString() {
        return this._root.render(this.opts);
    }
    // returns unique name in the internal scope
    name(prefix) {
        return this._scope.name(prefix);
    }
    // reserves unique name in the external scope
    scopeName(prefix) {
        return this._extScope.name(prefix);
    }
    // reserves unique name in the external scope and assigns value to it
    scopeValue(prefixOrName, value) {
        const name = this._extScope.value(prefixOrName, value);
        const vs = this._values[name.prefix] || (this._values[name.prefix] = new Set());
        vs.add(name);
        return name;
    }
    getScopeValue(prefix, keyOrRef) {
        return this._extScope.getValue(prefix, keyOrRef);
    }
    // return code that assigns values in the external scope to the names that are used internally
    // (same names that were returned by gen.scopeName or gen.scopeValue)
    scopeRefs(scopeName) {
        return this._extScope.scopeRefs(scopeName, this._values);
    }
    scopeCode() {
        return this._extScope.scopeCode(this._values);
    }
    _def(varKind, nameOrPrefix, rhs, constant) {
        const name = this._scope.toName(nameOrPrefix);
        if (rhs !== undefined && constant)
            this._constants[name.str] = rhs;
        this._leafNode(new Def(varKind, name, rhs));
        return name;
    }
    // `const` declaration (`var` in es5 mode)
    const(nameOrPrefix, rhs, _constant) {
        return this._def(scope_1.varKinds.const, nameOrPrefix, rhs, _constant);
    }
    // `let` declaration with optional assignment (`var` in es5 mode)
    let(nameOrPrefix, rhs, _constant) {
        return this._def(scope_1.varKinds.let, nameOrPrefix, rhs, _constant);
    }
    // `var` declaration with optional assignment
    var(nameOrPrefix, rhs, _constant) {
        return this._def(scope_1.varKinds.var, nameOrPrefix, rhs, _constant);
    }
    // assignment code
    assign(lhs, rhs, sideEffects) {
        return this._leafNode(new Assign(lhs, rhs, sideEffects));
    }
    // `+=` code
    add(lhs, rhs) {
        return this._leafNode(new AssignOp(lhs, exports.operators.ADD, rhs));
    }
    // appends passed SafeExpr to code or executes Block
    code(c) {
        if (typeof c == "function")
            c();
        else if (c !== code_1.nil)
            this._leafNode(new AnyCode(c));
        return this;
    }
    // returns code for object literal for the passed argument list of key-value pairs
    object(...keyValues) {
        const code = ["{"];
        for (const [key, value] of keyValues) {
            if (code.length > 1)
                code.push(",");
            code.push(key);
            if (key !== value || this.opts.es5) {
                code.push(":");
                (0, code_1.addCodeArg)(code, value);
            }
        }
        code.push("}");
        return new code_1._Code(code);
    }
    // `if` clause (or statement if `thenBody` and, optionally, `elseBody` are passed)
    if(condition, thenBody, elseBody) {
        this._blockNode(new If(condition));
        if (thenBody && elseBody) {
            this.code(thenBody).else().code(elseBody).endIf();
        }
        else if (thenBody) {
            this.code(thenBody).endIf();
        }
        else if (elseBody) {
            throw new Error('CodeGen: "else" body without "then" body');
        }
        return this;
    }
    // `else if` clause - invalid without `if` or after `else` clauses
    elseIf(condition) {
        return this._elseNode(new If(condition));
    }
    // `else` clause - only valid after `if` or `else if` clauses
    else() {
        return this._elseNode(new Else());
    }
    // end `if` statement (needed if gen.if was used only with condition)
    endIf() {
        return this._endBlockNode(If, Else);
    }
    _for(node, forBody) {
        this._blockNode(node);
        if (forBody)
            this.code(forBody).endFor();
        return this;
    }
    // a generic `for` clause (or statement if `forBody` is passed)
    for(iteration, forBody) {
        return this._for(new ForLoop(iteration), forBody);
    }
    // `for` statement for a range of values
    forRange(nameOrPrefix, from, to, forBody, varKind = this.opts.es5 ? scope_1.varKinds.var : scope_1.varKinds.let) {
        const name = this._scope.toName(nameOrPrefix);
        return this._for(new ForRange(varKind, name, from, to), () => forBody(name));
    }
    // `for-of` statement (in es5 mode replace with a normal for loop)
    forOf(nameOrPrefix, iterable, forBody, varKind = scope_1.varKinds.const) {
        const name = this._scope.toName(nameOrPrefix);
        if (this.opts.es5) {
            const arr = iterable instanceof code_1.Name ? iterable : this.var("_arr", iterable);
            return this.forRange("_i", 0, (0, code_1._) `${arr}.length`, (i) => {
                this.var(name, (0, code_1._) `${arr}[${i}]`);
                forBody(name);
            });
        }
        return this._for(new ForIter("of", varKind, name, iterable), () => forBody(name));
    }
    // `for-in` statement.
    // With option `ownProperties` replaced with a `for-of` loop for object keys
    forIn(nameOrPrefix, obj, forBody, varKind = this.opts.es5 ? scope_1.varKinds.var : scope_1.varKinds.const) {
        if (this.opts.ownProperties) {
            return this.forOf(nameOrPrefix, (0, code_1._) `Object.keys(${obj})`, forBody);
        }
        const name = this._scope.toName(nameOrPrefix);
        return this._for(new ForIter("in", varKind, name, obj), () => forBody(name));
    }
    // end `for` loop
    endFor() {
        return this._endBlockNode(For);
    }
    // `label` statement
    label(label) {
        return this._leafNode(new Label(label));
    }
    // `break` statement
    break(label) {
        return this._leafNode(new Break(label));
    }
    // `return` statement
    return(value) {
        const node = new Return();
        this._blockNode(node);
        this.code(value);
        if (node.nodes.length !== 1)
            throw new Error('CodeGen: "return" should have one node');
        return this._endBlockNode(Return);
    }
    // `try` statement
    try(tryBody, catchCode, finallyCode) {
        if (!catchCode && !finallyCode)
            throw new Error('CodeGen: "try" without "catch" and "finally"');
        const node = new Try();
        this._blockNode(node);
        this.code(tryBody);
        if (catchCode) {
            const error = this.name("e");
            this._currNode = node.catch = new Catch(error);
            catchCode(error);
        }
        if (finallyCode) {
            this._currNode = node.finally = new Finally();
            this.code(finallyCode);
        }
        return this._endBlockNode(Catch, Finally);
    }
    // `throw` statement
    throw(error) {
        return this._leafNode(new Throw(error));
    }
    // start self-balancing block
    block(body, nodeCount) {
        this._blockStarts.push(this._nodes.length);
        if (body)
            this.code(body).endBlock(nodeCount);
        return this;
    }
    // end the current self-balancing block
    endBlock(nodeCount) {
        const len = this._blockStarts.pop();
        if (len === undefined)
            throw new Error("CodeGen: not in self-balancing block");
        const toClose = this._nodes.length - len;
        if (toClose < 0 || (nodeCount !== undefined && toClose !== nodeCount)) {
            throw new Error(`CodeGen: wrong number of nodes: ${toClose} vs ${nodeCount} expected`);
        }
        this._nodes.length = len;
        return this;
    }
    // `function` heading (or definition if funcBody is passed)
    func(name, args = code_1.nil, async, funcBody) {
        this._blockNode(new Func(name, args, async));
        if (funcBody)
            this.code(funcBody).endFunc();
        return this;
    }
    // end function definition
    endFunc() {
        return this._endBlockNode(Func);
    }
    optimize(n = 1) {
        while (n-- > 0) {
            this._root.optimizeNodes();
            this._root.optimizeNames(this._root.names, this._constants);
        }
    }
    _leafNode(node) {
        this._currNode.nodes.push(node);
        return this;
    }
    _blockNode(node) {
        this._currNode.nodes.push(node);
        this._nodes.push(node);
    }
    _endBlockNode(N1, N2) {
        const n = this._currNode;
        if (n instanceof N1 || (N2 && n instanceof N2)) {
            this._nodes.pop();
            return this;
        }
        throw new Error(`CodeGen: not in block "${N2 ? `${N1.kind}/${N2.kind}` : N1.kind}"`);
    }
    _elseNode(node) {
        const n = this._currNode;
        if (!(n instanceof If)) {
            throw new Error('CodeGen: "else" without "if"');
        }
        this._currNode = n.else = node;
        return this;
    }
    get _root() {
        return this._nodes[0];
    }
    get _currNode() {
        const ns = this._nodes;
        return ns[ns.length - 1];
    }
    set _currNode(node) {
        const ns = this._nodes;
        ns[ns.length - 1] = node;
    }
}
exports.CodeGen = CodeGen;
function addNames(names, from) {
    for (const n in from)
        names[n] = (names[n] || 0) + (from[n] || 0);
    return names;
}
function addExprNames(names, from) {
    return from instanceof code_1._CodeOrName ? addNames(names, from.names) : names;
}
function optimizeExpr(expr, names, constants) {
    if (expr instanceof code_1.Name)
        return replaceName(expr);
    if (!canOptimize(expr))
        return expr;
    return new code_1._Code(expr._items.reduce((items, c) => {
        if (c instanceof code_1.Name)
            c = replaceName(c);
        if (c instanceof code_1._Code)
            items.push(...c._items);
        else
            items.push(c);
        return items;
    }, []));
    function replaceName(n) {
        const c = constants[n.str];
        if (c === undefined || names[n.str] !== 1)
            return n;
        delete names[n.str];
        return c;
    }
    function canOptimize(e) {
        return (e instanceof code_1._Code &&
            e._items.some((c) => c instanceof code_1.Name && names[c.str] === 1 && constants[c.str] !== undefined));
    }
}
function subtractNames(names, from) {
    for (const n in from)
        names[n] = (names[n] || 0) - (from[n] || 0);
}
function not(x) {
    return typeof x == "boolean" || typeof x == "number" || x === null ? !x : (0, code_1._) `!${par(x)}`;
}
exports.not = not;
const andCode = mappend(exports.operators.AND);
// boolean AND (&&) expression with the passed arguments
function and(...args) {
    return args.reduce(andCode);
}
exports.and = and;
const orCode = mappend(exports.operators.OR);
// boolean OR (||) expression with the passed arguments
function or(...args) {
    return args.reduce(orCode);
}
exports.or = or;
function mappend(op) {
    return (x, y) => (x === code_1.nil ? y : y === code_1.nil ? x : (0, code_1._) `${par(x)} ${op} ${par(y)}`);
}
function par(x) {
    return x instanceof code_1.Name ? x : (0, code_1._) `(${x})`;
}
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 7788:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.ValueScope = exports.ValueScopeName = exports.Scope = exports.varKinds = exports.UsedValueState = void 0;
const code_1 = __nccwpck_require__(567);
class ValueError extends Error {
    constructor(name) {
        super(`CodeGen: "code" for ${name} not defined`);
        this.value = name.value;
    }
}
var UsedValueState;
(function (UsedValueState) {
    UsedValueState[UsedValueState["Started"] = 0] = "Started";
    UsedValueState[UsedValueState["Completed"] = 1] = "Completed";
})(UsedValueState || (exports.UsedValueState = UsedValueState = {}));
exports.varKinds = {
    const: new code_1.Name("const"),
    let: new code_1.Name("let"),
    var: new code_1.Name("var"),
};
class Scope {
    constructor({ prefixes, parent } = {}) {
        this._names = {};
        this._prefixes = prefixes;
        this._parent = parent;
    }
    toName(nameOrPrefix) {
        return nameOrPrefix instanceof code_1.Name ? nameOrPrefix : this.name(nameOrPrefix);
    }
    name(prefix) {
        return new code_1.Name(this._newName(prefix));
    }
    _newName(prefix) {
        const ng = this._names[prefix] || this._nameGroup(prefix);
        return `${prefix}${ng.index++}`;
    }
    _nameGroup(prefix) {
        var _a, _b;
        if (((_b = (_a = this._parent) === null || _a === void 0 ? void 0 : _a._prefixes) === null || _b === void 0 ? void 0 : _b.has(prefix)) || (this._prefixes && !this._prefixes.has(prefix))) {
            throw new Error(`CodeGen: prefix "${prefix}" is not allowed in this scope`);
        }
        return (this._names[prefix] = { prefix, index: 0 });
    }
}
exports.Scope = Scope;
class ValueScopeName extends code_1.Name {
    constructor(prefix, nameStr) {
        super(nameStr);
        this.prefix = prefix;
    }
    setValue(value, { property, itemIndex }) {
        this.value = value;
        this.scopePath = (0, code_1._) `.${new code_1.Name(property)}[${itemIndex}]`;
    }
}
exports.ValueScopeName = ValueScopeName;
const line = (0, code_1._) `\n`;
class ValueScope extends Scope {
    constructor(opts) {
        super(opts);
        this._values = {};
        this._scope = opts.scope;
        this.opts = { ...opts, _n: opts.lines ? line : code_1.nil };
    }
    get() {
        return this._scope;
    }
    name(prefix) {
        return new ValueScopeName(prefix, this._newName(prefix));
    }
    value(nameOrPrefix, value) {
        var _a;
        if (value.ref === undefined)
            throw new Error("CodeGen: ref must be passed in value");
        const name = this.toName(nameOrPrefix);
        const { prefix } = name;
        const valueKey = (_a = value.key) !== null && _a !== void 0 ? _a : value.ref;
        let vs = this._values[prefix];
        if (vs) {
            const _name = vs.get(valueKey);
            if (_name)
                return _name;
        }
        else {
            vs = this._values[prefix] = new Map();
        }
        vs.set(valueKey, name);
        const s = this._scope[prefix] || (this._scope[prefix] = []);
        const itemIndex = s.length;
        s[itemIndex] = value.ref;
        name.setValue(value, { property: prefix, itemIndex });
        return name;
    }
    getValue(prefix, keyOrRef) {
        const vs = this._values[prefix];
        if (!vs)
            return;
        return vs.get(keyOrRef);
    }
    scopeRefs(scopeName, values = this._values) {
        return this._reduceValues(values, (name) => {
            if (name.scopePath === undefined)
                throw new Error(`CodeGen: name "${name}" has no value`);
            return (0, code_1._) `${scopeName}${name.scopePath}`;
        });
    }
    scopeCode(values = this._values, usedValues, getCode) {
        return this._reduceValues(values, (name) => {
            if (name.value === undefined)
                throw new Error(`CodeGen: name "${name}" has no value`);
            return name.value.code;
        }, usedValues, getCode);
    }
    _reduceValues(values, valueCode, usedValues = {}, getCode) {
        let code = code_1.nil;
        for (const prefix in values) {
            const vs = values[prefix];
            if (!vs)
                continue;
            const nameSet = (usedValues[prefix] = usedValues[prefix] || new Map());
            vs.forEach((name) => {
                if (nameSet.has(name))
                    return;
                nameSet.set(name, UsedValueState.Started);
                let c = valueCode(name);
                if (c) {
                    const def = this.opts.es5 ? exports.varKinds.var : exports.varKinds.const;
                    code = (0, code_1._) `${code}${def} ${name} = ${c};${this.opts._n}`;
                }
                else if ((c = getCode === null || getCode === void 0 ? void 0 : getCode(name))) {
                    code = (0, code_1._) `${code}${c}${this.opts._n}`;
                }
                else {
                    throw new ValueError(name);
                }
                nameSet.set(name, UsedValueState.Completed);
            });
        }
        return code;
    }
}
exports.ValueScope = ValueScope;
//# sourceMappingURL=scope.js.map

/***/ }),

/***/ 1283:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.extendErrors = exports.resetErrorsCount = exports.reportExtraError = exports.reportError = exports.keyword$DataError = exports.keywordError = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const names_1 = __nccwpck_require__(630);
exports.keywordError = {
    message: ({ keyword }) => (0, codegen_1.str) `must pass "${keyword}" keyword validation`,
};
exports.keyword$DataError = {
    message: ({ keyword, schemaType }) => schemaType
        ? (0, codegen_1.str) `"${keyword}" keyword must be ${schemaType} ($data)`
        : (0, codegen_1.str) `"${keyword}" keyword is invalid ($data)`,
};
function reportError(cxt, error = exports.keywordError, errorPaths, overrideAllErrors) {
    const { it } = cxt;
    const { gen, compositeRule, allErrors } = it;
    const errObj = errorObjectCode(cxt, error, errorPaths);
    if (overrideAllErrors !== null && overrideAllErrors !== void 0 ? overrideAllErrors : (compositeRule || allErrors)) {
        addError(gen, errObj);
    }
    else {
        returnErrors(it, (0, codegen_1._) `[${errObj}]`);
    }
}
exports.reportError = reportError;
function reportExtraError(cxt, error = exports.keywordError, errorPaths) {
    const { it } = cxt;
    const { gen, compositeRule, allErrors } = it;
    const errObj = errorObjectCode(cxt, error, errorPaths);
    addError(gen, errObj);
    if (!(compositeRule || allErrors)) {
        returnErrors(it, names_1.default.vErrors);
    }
}
exports.reportExtraError = reportExtraError;
function resetErrorsCount(gen, errsCount) {
    gen.assign(names_1.default.errors, errsCount);
    gen.if((0, codegen_1._) `${names_1.default.vErrors} !== null`, () => gen.if(errsCount, () => gen.assign((0, codegen_1._) `${names_1.default.vErrors}.length`, errsCount), () => gen.assign(names_1.default.vErrors, null)));
}
exports.resetErrorsCount = resetErrorsCount;
function extendErrors({ gen, keyword, schemaValue, data, errsCount, it, }) {
    /* istanbul ignore if */
    if (errsCount === undefined)
        throw new Error("ajv implementation error");
    const err = gen.name("err");
    gen.forRange("i", errsCount, names_1.default.errors, (i) => {
        gen.const(err, (0, codegen_1._) `${names_1.default.vErrors}[${i}]`);
        gen.if((0, codegen_1._) `${err}.instancePath === undefined`, () => gen.assign((0, codegen_1._) `${err}.instancePath`, (0, codegen_1.strConcat)(names_1.default.instancePath, it.errorPath)));
        gen.assign((0, codegen_1._) `${err}.schemaPath`, (0, codegen_1.str) `${it.errSchemaPath}/${keyword}`);
        if (it.opts.verbose) {
            gen.assign((0, codegen_1._) `${err}.schema`, schemaValue);
            gen.assign((0, codegen_1._) `${err}.data`, data);
        }
    });
}
exports.extendErrors = extendErrors;
function addError(gen, errObj) {
    const err = gen.const("err", errObj);
    gen.if((0, codegen_1._) `${names_1.default.vErrors} === null`, () => gen.assign(names_1.default.vErrors, (0, codegen_1._) `[${err}]`), (0, codegen_1._) `${names_1.default.vErrors}.push(${err})`);
    gen.code((0, codegen_1._) `${names_1.default.errors}++`);
}
function returnErrors(it, errs) {
    const { gen, validateName, schemaEnv } = it;
    if (schemaEnv.$async) {
        gen.throw((0, codegen_1._) `new ${it.ValidationError}(${errs})`);
    }
    else {
        gen.assign((0, codegen_1._) `${validateName}.errors`, errs);
        gen.return(false);
    }
}
const E = {
    keyword: new codegen_1.Name("keyword"),
    schemaPath: new codegen_1.Name("schemaPath"), // also used in JTD errors
    params: new codegen_1.Name("params"),
    propertyName: new codegen_1.Name("propertyName"),
    message: new codegen_1.Name("message"),
    schema: new codegen_1.Name("schema"),
    parentSchema: new codegen_1.Name("parentSchema"),
};
function errorObjectCode(cxt, error, errorPaths) {
    const { createErrors } = cxt.it;
    if (createErrors === false)
        return (0, codegen_1._) `{}`;
    return errorObject(cxt, error, errorPaths);
}
function errorObject(cxt, error, errorPaths = {}) {
    const { gen, it } = cxt;
    const keyValues = [
        errorInstancePath(it, errorPaths),
        errorSchemaPath(cxt, errorPaths),
    ];
    extraErrorProps(cxt, error, keyValues);
    return gen.object(...keyValues);
}
function errorInstancePath({ errorPath }, { instancePath }) {
    const instPath = instancePath
        ? (0, codegen_1.str) `${errorPath}${(0, util_1.getErrorPath)(instancePath, util_1.Type.Str)}`
        : errorPath;
    return [names_1.default.instancePath, (0, codegen_1.strConcat)(names_1.default.instancePath, instPath)];
}
function errorSchemaPath({ keyword, it: { errSchemaPath } }, { schemaPath, parentSchema }) {
    let schPath = parentSchema ? errSchemaPath : (0, codegen_1.str) `${errSchemaPath}/${keyword}`;
    if (schemaPath) {
        schPath = (0, codegen_1.str) `${schPath}${(0, util_1.getErrorPath)(schemaPath, util_1.Type.Str)}`;
    }
    return [E.schemaPath, schPath];
}
function extraErrorProps(cxt, { params, message }, keyValues) {
    const { keyword, data, schemaValue, it } = cxt;
    const { opts, propertyName, topSchemaRef, schemaPath } = it;
    keyValues.push([E.keyword, keyword], [E.params, typeof params == "function" ? params(cxt) : params || (0, codegen_1._) `{}`]);
    if (opts.messages) {
        keyValues.push([E.message, typeof message == "function" ? message(cxt) : message]);
    }
    if (opts.verbose) {
        keyValues.push([E.schema, schemaValue], [E.parentSchema, (0, codegen_1._) `${topSchemaRef}${schemaPath}`], [names_1.default.data, data]);
    }
    if (propertyName)
        keyValues.push([E.propertyName, propertyName]);
}
//# sourceMappingURL=errors.js.map

/***/ }),

/***/ 2718:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.resolveSchema = exports.getCompilingSchema = exports.resolveRef = exports.compileSchema = exports.SchemaEnv = void 0;
const codegen_1 = __nccwpck_require__(1436);
const validation_error_1 = __nccwpck_require__(3021);
const names_1 = __nccwpck_require__(630);
const resolve_1 = __nccwpck_require__(4090);
const util_1 = __nccwpck_require__(4464);
const validate_1 = __nccwpck_require__(7881);
class SchemaEnv {
    constructor(env) {
        var _a;
        this.refs = {};
        this.dynamicAnchors = {};
        let schema;
        if (typeof env.schema == "object")
            schema = env.schema;
        this.schema = env.schema;
        this.schemaId = env.schemaId;
        this.root = env.root || this;
        this.baseId = (_a = env.baseId) !== null && _a !== void 0 ? _a : (0, resolve_1.normalizeId)(schema === null || schema === void 0 ? void 0 : schema[env.schemaId || "$id"]);
        this.schemaPath = env.schemaPath;
        this.localRefs = env.localRefs;
        this.meta = env.meta;
        this.$async = schema === null || schema === void 0 ? void 0 : schema.$async;
        this.refs = {};
    }
}
exports.SchemaEnv = SchemaEnv;
// let codeSize = 0
// let nodeCount = 0
// Compiles schema in SchemaEnv
function compileSchema(sch) {
    // TODO refactor - remove compilations
    const _sch = getCompilingSchema.call(this, sch);
    if (_sch)
        return _sch;
    const rootId = (0, resolve_1.getFullPath)(this.opts.uriResolver, sch.root.baseId); // TODO if getFullPath removed 1 tests fails
    const { es5, lines } = this.opts.code;
    const { ownProperties } = this.opts;
    const gen = new codegen_1.CodeGen(this.scope, { es5, lines, ownProperties });
    let _ValidationError;
    if (sch.$async) {
        _ValidationError = gen.scopeValue("Error", {
            ref: validation_error_1.default,
            code: (0, codegen_1._) `require("ajv/dist/runtime/validation_error").default`,
        });
    }
    const validateName = gen.scopeName("validate");
    sch.validateName = validateName;
    const schemaCxt = {
        gen,
        allErrors: this.opts.allErrors,
        data: names_1.default.data,
        parentData: names_1.default.parentData,
        parentDataProperty: names_1.default.parentDataProperty,
        dataNames: [names_1.default.data],
        dataPathArr: [codegen_1.nil], // TODO can its length be used as dataLevel if nil is removed?
        dataLevel: 0,
        dataTypes: [],
        definedProperties: new Set(),
        topSchemaRef: gen.scopeValue("schema", this.opts.code.source === true
            ? { ref: sch.schema, code: (0, codegen_1.stringify)(sch.schema) }
            : { ref: sch.schema }),
        validateName,
        ValidationError: _ValidationError,
        schema: sch.schema,
        schemaEnv: sch,
        rootId,
        baseId: sch.baseId || rootId,
        schemaPath: codegen_1.nil,
        errSchemaPath: sch.schemaPath || (this.opts.jtd ? "" : "#"),
        errorPath: (0, codegen_1._) `""`,
        opts: this.opts,
        self: this,
    };
    let sourceCode;
    try {
        this._compilations.add(sch);
        (0, validate_1.validateFunctionCode)(schemaCxt);
        gen.optimize(this.opts.code.optimize);
        // gen.optimize(1)
        const validateCode = gen.toString();
        sourceCode = `${gen.scopeRefs(names_1.default.scope)}return ${validateCode}`;
        // console.log((codeSize += sourceCode.length), (nodeCount += gen.nodeCount))
        if (this.opts.code.process)
            sourceCode = this.opts.code.process(sourceCode, sch);
        // console.log("\n\n\n *** \n", sourceCode)
        const makeValidate = new Function(`${names_1.default.self}`, `${names_1.default.scope}`, sourceCode);
        const validate = makeValidate(this, this.scope.get());
        this.scope.value(validateName, { ref: validate });
        validate.errors = null;
        validate.schema = sch.schema;
        validate.schemaEnv = sch;
        if (sch.$async)
            validate.$async = true;
        if (this.opts.code.source === true) {
            validate.source = { validateName, validateCode, scopeValues: gen._values };
        }
        if (this.opts.unevaluated) {
            const { props, items } = schemaCxt;
            validate.evaluated = {
                props: props instanceof codegen_1.Name ? undefined : props,
                items: items instanceof codegen_1.Name ? undefined : items,
                dynamicProps: props instanceof codegen_1.Name,
                dynamicItems: items instanceof codegen_1.Name,
            };
            if (validate.source)
                validate.source.evaluated = (0, codegen_1.stringify)(validate.evaluated);
        }
        sch.validate = validate;
        return sch;
    }
    catch (e) {
        delete sch.validate;
        delete sch.validateName;
        if (sourceCode)
            this.logger.error("Error compiling schema, function code:", sourceCode);
        // console.log("\n\n\n *** \n", sourceCode, this.opts)
        throw e;
    }
    finally {
        this._compilations.delete(sch);
    }
}
exports.compileSchema = compileSchema;
function resolveRef(root, baseId, ref) {
    var _a;
    ref = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, ref);
    const schOrFunc = root.refs[ref];
    if (schOrFunc)
        return schOrFunc;
    let _sch = resolve.call(this, root, ref);
    if (_sch === undefined) {
        const schema = (_a = root.localRefs) === null || _a === void 0 ? void 0 : _a[ref]; // TODO maybe localRefs should hold SchemaEnv
        const { schemaId } = this.opts;
        if (schema)
            _sch = new SchemaEnv({ schema, schemaId, root, baseId });
    }
    if (_sch === undefined)
        return;
    return (root.refs[ref] = inlineOrCompile.call(this, _sch));
}
exports.resolveRef = resolveRef;
function inlineOrCompile(sch) {
    if ((0, resolve_1.inlineRef)(sch.schema, this.opts.inlineRefs))
        return sch.schema;
    return sch.validate ? sch : compileSchema.call(this, sch);
}
// Index of schema compilation in the currently compiled list
function getCompilingSchema(schEnv) {
    for (const sch of this._compilations) {
        if (sameSchemaEnv(sch, schEnv))
            return sch;
    }
}
exports.getCompilingSchema = getCompilingSchema;
function sameSchemaEnv(s1, s2) {
    return s1.schema === s2.schema && s1.root === s2.root && s1.baseId === s2.baseId;
}
// resolve and compile the references ($ref)
// TODO returns AnySchemaObject (if the schema can be inlined) or validation function
function resolve(root, // information about the root schema for the current schema
ref // reference to resolve
) {
    let sch;
    while (typeof (sch = this.refs[ref]) == "string")
        ref = sch;
    return sch || this.schemas[ref] || resolveSchema.call(this, root, ref);
}
// Resolve schema, its root and baseId
function resolveSchema(root, // root object with properties schema, refs TODO below SchemaEnv is assigned to it
ref // reference to resolve
) {
    const p = this.opts.uriResolver.parse(ref);
    const refPath = (0, resolve_1._getFullPath)(this.opts.uriResolver, p);
    let baseId = (0, resolve_1.getFullPath)(this.opts.uriResolver, root.baseId, undefined);
    // TODO `Object.keys(root.schema).length > 0` should not be needed - but removing breaks 2 tests
    if (Object.keys(root.schema).length > 0 && refPath === baseId) {
        return getJsonPointer.call(this, p, root);
    }
    const id = (0, resolve_1.normalizeId)(refPath);
    const schOrRef = this.refs[id] || this.schemas[id];
    if (typeof schOrRef == "string") {
        const sch = resolveSchema.call(this, root, schOrRef);
        if (typeof (sch === null || sch === void 0 ? void 0 : sch.schema) !== "object")
            return;
        return getJsonPointer.call(this, p, sch);
    }
    if (typeof (schOrRef === null || schOrRef === void 0 ? void 0 : schOrRef.schema) !== "object")
        return;
    if (!schOrRef.validate)
        compileSchema.call(this, schOrRef);
    if (id === (0, resolve_1.normalizeId)(ref)) {
        const { schema } = schOrRef;
        const { schemaId } = this.opts;
        const schId = schema[schemaId];
        if (schId)
            baseId = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, schId);
        return new SchemaEnv({ schema, schemaId, root, baseId });
    }
    return getJsonPointer.call(this, p, schOrRef);
}
exports.resolveSchema = resolveSchema;
const PREVENT_SCOPE_CHANGE = new Set([
    "properties",
    "patternProperties",
    "enum",
    "dependencies",
    "definitions",
]);
function getJsonPointer(parsedRef, { baseId, schema, root }) {
    var _a;
    if (((_a = parsedRef.fragment) === null || _a === void 0 ? void 0 : _a[0]) !== "/")
        return;
    for (const part of parsedRef.fragment.slice(1).split("/")) {
        if (typeof schema === "boolean")
            return;
        const partSchema = schema[(0, util_1.unescapeFragment)(part)];
        if (partSchema === undefined)
            return;
        schema = partSchema;
        // TODO PREVENT_SCOPE_CHANGE could be defined in keyword def?
        const schId = typeof schema === "object" && schema[this.opts.schemaId];
        if (!PREVENT_SCOPE_CHANGE.has(part) && schId) {
            baseId = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, schId);
        }
    }
    let env;
    if (typeof schema != "boolean" && schema.$ref && !(0, util_1.schemaHasRulesButRef)(schema, this.RULES)) {
        const $ref = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, schema.$ref);
        env = resolveSchema.call(this, root, $ref);
    }
    // even though resolution failed we need to return SchemaEnv to throw exception
    // so that compileAsync loads missing schema.
    const { schemaId } = this.opts;
    env = env || new SchemaEnv({ schema, schemaId, root, baseId });
    if (env.schema !== env.root.schema)
        return env;
    return undefined;
}
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 630:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const names = {
    // validation function arguments
    data: new codegen_1.Name("data"), // data passed to validation function
    // args passed from referencing schema
    valCxt: new codegen_1.Name("valCxt"), // validation/data context - should not be used directly, it is destructured to the names below
    instancePath: new codegen_1.Name("instancePath"),
    parentData: new codegen_1.Name("parentData"),
    parentDataProperty: new codegen_1.Name("parentDataProperty"),
    rootData: new codegen_1.Name("rootData"), // root data - same as the data passed to the first/top validation function
    dynamicAnchors: new codegen_1.Name("dynamicAnchors"), // used to support recursiveRef and dynamicRef
    // function scoped variables
    vErrors: new codegen_1.Name("vErrors"), // null or array of validation errors
    errors: new codegen_1.Name("errors"), // counter of validation errors
    this: new codegen_1.Name("this"),
    // "globals"
    self: new codegen_1.Name("self"),
    scope: new codegen_1.Name("scope"),
    // JTD serialize/parse name for JSON string and position
    json: new codegen_1.Name("json"),
    jsonPos: new codegen_1.Name("jsonPos"),
    jsonLen: new codegen_1.Name("jsonLen"),
    jsonPart: new codegen_1.Name("jsonPart"),
};
exports["default"] = names;
//# sourceMappingURL=names.js.map

/***/ }),

/***/ 3162:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const resolve_1 = __nccwpck_require__(4090);
class MissingRefError extends Error {
    constructor(resolver, baseId, ref, msg) {
        super(msg || `can't resolve reference ${ref} from id ${baseId}`);
        this.missingRef = (0, resolve_1.resolveUrl)(resolver, baseId, ref);
        this.missingSchema = (0, resolve_1.normalizeId)((0, resolve_1.getFullPath)(resolver, this.missingRef));
    }
}
exports["default"] = MissingRefError;
//# sourceMappingURL=ref_error.js.map

/***/ }),

/***/ 4090:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.getSchemaRefs = exports.resolveUrl = exports.normalizeId = exports._getFullPath = exports.getFullPath = exports.inlineRef = void 0;
const util_1 = __nccwpck_require__(4464);
const equal = __nccwpck_require__(3430);
const traverse = __nccwpck_require__(1167);
// TODO refactor to use keyword definitions
const SIMPLE_INLINED = new Set([
    "type",
    "format",
    "pattern",
    "maxLength",
    "minLength",
    "maxProperties",
    "minProperties",
    "maxItems",
    "minItems",
    "maximum",
    "minimum",
    "uniqueItems",
    "multipleOf",
    "required",
    "enum",
    "const",
]);
function inlineRef(schema, limit = true) {
    if (typeof schema == "boolean")
        return true;
    if (limit === true)
        return !hasRef(schema);
    if (!limit)
        return false;
    return countKeys(schema) <= limit;
}
exports.inlineRef = inlineRef;
const REF_KEYWORDS = new Set([
    "$ref",
    "$recursiveRef",
    "$recursiveAnchor",
    "$dynamicRef",
    "$dynamicAnchor",
]);
function hasRef(schema) {
    for (const key in schema) {
        if (REF_KEYWORDS.has(key))
            return true;
        const sch = schema[key];
        if (Array.isArray(sch) && sch.some(hasRef))
            return true;
        if (typeof sch == "object" && hasRef(sch))
            return true;
    }
    return false;
}
function countKeys(schema) {
    let count = 0;
    for (const key in schema) {
        if (key === "$ref")
            return Infinity;
        count++;
        if (SIMPLE_INLINED.has(key))
            continue;
        if (typeof schema[key] == "object") {
            (0, util_1.eachItem)(schema[key], (sch) => (count += countKeys(sch)));
        }
        if (count === Infinity)
            return Infinity;
    }
    return count;
}
function getFullPath(resolver, id = "", normalize) {
    if (normalize !== false)
        id = normalizeId(id);
    const p = resolver.parse(id);
    return _getFullPath(resolver, p);
}
exports.getFullPath = getFullPath;
function _getFullPath(resolver, p) {
    const serialized = resolver.serialize(p);
    return serialized.split("#")[0] + "#";
}
exports._getFullPath = _getFullPath;
const TRAILING_SLASH_HASH = /#\/?$/;
function normalizeId(id) {
    return id ? id.replace(TRAILING_SLASH_HASH, "") : "";
}
exports.normalizeId = normalizeId;
function resolveUrl(resolver, baseId, id) {
    id = normalizeId(id);
    return resolver.resolve(baseId, id);
}
exports.resolveUrl = resolveUrl;
const ANCHOR = /^[a-z_][-a-z0-9._]*$/i;
function getSchemaRefs(schema, baseId) {
    if (typeof schema == "boolean")
        return {};
    const { schemaId, uriResolver } = this.opts;
    const schId = normalizeId(schema[schemaId] || baseId);
    const baseIds = { "": schId };
    const pathPrefix = getFullPath(uriResolver, schId, false);
    const localRefs = {};
    const schemaRefs = new Set();
    traverse(schema, { allKeys: true }, (sch, jsonPtr, _, parentJsonPtr) => {
        if (parentJsonPtr === undefined)
            return;
        const fullPath = pathPrefix + jsonPtr;
        let innerBaseId = baseIds[parentJsonPtr];
        if (typeof sch[schemaId] == "string")
            innerBaseId = addRef.call(this, sch[schemaId]);
        addAnchor.call(this, sch.$anchor);
        addAnchor.call(this, sch.$dynamicAnchor);
        baseIds[jsonPtr] = innerBaseId;
        function addRef(ref) {
            // eslint-disable-next-line @typescript-eslint/unbound-method
            const _resolve = this.opts.uriResolver.resolve;
            ref = normalizeId(innerBaseId ? _resolve(innerBaseId, ref) : ref);
            if (schemaRefs.has(ref))
                throw ambiguos(ref);
            schemaRefs.add(ref);
            let schOrRef = this.refs[ref];
            if (typeof schOrRef == "string")
                schOrRef = this.refs[schOrRef];
            if (typeof schOrRef == "object") {
                checkAmbiguosRef(sch, schOrRef.schema, ref);
            }
            else if (ref !== normalizeId(fullPath)) {
                if (ref[0] === "#") {
                    checkAmbiguosRef(sch, localRefs[ref], ref);
                    localRefs[ref] = sch;
                }
                else {
                    this.refs[ref] = fullPath;
                }
            }
            return ref;
        }
        function addAnchor(anchor) {
            if (typeof anchor == "string") {
                if (!ANCHOR.test(anchor))
                    throw new Error(`invalid anchor "${anchor}"`);
                addRef.call(this, `#${anchor}`);
            }
        }
    });
    return localRefs;
    function checkAmbiguosRef(sch1, sch2, ref) {
        if (sch2 !== undefined && !equal(sch1, sch2))
            throw ambiguos(ref);
    }
    function ambiguos(ref) {
        return new Error(`reference "${ref}" resolves to more than one schema`);
    }
}
exports.getSchemaRefs = getSchemaRefs;
//# sourceMappingURL=resolve.js.map

/***/ }),

/***/ 7353:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.getRules = exports.isJSONType = void 0;
const _jsonTypes = ["string", "number", "integer", "boolean", "null", "object", "array"];
const jsonTypes = new Set(_jsonTypes);
function isJSONType(x) {
    return typeof x == "string" && jsonTypes.has(x);
}
exports.isJSONType = isJSONType;
function getRules() {
    const groups = {
        number: { type: "number", rules: [] },
        string: { type: "string", rules: [] },
        array: { type: "array", rules: [] },
        object: { type: "object", rules: [] },
    };
    return {
        types: { ...groups, integer: true, boolean: true, null: true },
        rules: [{ rules: [] }, groups.number, groups.string, groups.array, groups.object],
        post: { rules: [] },
        all: {},
        keywords: {},
    };
}
exports.getRules = getRules;
//# sourceMappingURL=rules.js.map

/***/ }),

/***/ 4464:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.checkStrictMode = exports.getErrorPath = exports.Type = exports.useFunc = exports.setEvaluated = exports.evaluatedPropsToName = exports.mergeEvaluated = exports.eachItem = exports.unescapeJsonPointer = exports.escapeJsonPointer = exports.escapeFragment = exports.unescapeFragment = exports.schemaRefOrVal = exports.schemaHasRulesButRef = exports.schemaHasRules = exports.checkUnknownRules = exports.alwaysValidSchema = exports.toHash = void 0;
const codegen_1 = __nccwpck_require__(1436);
const code_1 = __nccwpck_require__(567);
// TODO refactor to use Set
function toHash(arr) {
    const hash = {};
    for (const item of arr)
        hash[item] = true;
    return hash;
}
exports.toHash = toHash;
function alwaysValidSchema(it, schema) {
    if (typeof schema == "boolean")
        return schema;
    if (Object.keys(schema).length === 0)
        return true;
    checkUnknownRules(it, schema);
    return !schemaHasRules(schema, it.self.RULES.all);
}
exports.alwaysValidSchema = alwaysValidSchema;
function checkUnknownRules(it, schema = it.schema) {
    const { opts, self } = it;
    if (!opts.strictSchema)
        return;
    if (typeof schema === "boolean")
        return;
    const rules = self.RULES.keywords;
    for (const key in schema) {
        if (!rules[key])
            checkStrictMode(it, `unknown keyword: "${key}"`);
    }
}
exports.checkUnknownRules = checkUnknownRules;
function schemaHasRules(schema, rules) {
    if (typeof schema == "boolean")
        return !schema;
    for (const key in schema)
        if (rules[key])
            return true;
    return false;
}
exports.schemaHasRules = schemaHasRules;
function schemaHasRulesButRef(schema, RULES) {
    if (typeof schema == "boolean")
        return !schema;
    for (const key in schema)
        if (key !== "$ref" && RULES.all[key])
            return true;
    return false;
}
exports.schemaHasRulesButRef = schemaHasRulesButRef;
function schemaRefOrVal({ topSchemaRef, schemaPath }, schema, keyword, $data) {
    if (!$data) {
        if (typeof schema == "number" || typeof schema == "boolean")
            return schema;
        if (typeof schema == "string")
            return (0, codegen_1._) `${schema}`;
    }
    return (0, codegen_1._) `${topSchemaRef}${schemaPath}${(0, codegen_1.getProperty)(keyword)}`;
}
exports.schemaRefOrVal = schemaRefOrVal;
function unescapeFragment(str) {
    return unescapeJsonPointer(decodeURIComponent(str));
}
exports.unescapeFragment = unescapeFragment;
function escapeFragment(str) {
    return encodeURIComponent(escapeJsonPointer(str));
}
exports.escapeFragment = escapeFragment;
function escapeJsonPointer(str) {
    if (typeof str == "number")
        return `${str}`;
    return str.replace(/~/g, "~0").replace(/\//g, "~1");
}
exports.escapeJsonPointer = escapeJsonPointer;
function unescapeJsonPointer(str) {
    return str.replace(/~1/g, "/").replace(/~0/g, "~");
}
exports.unescapeJsonPointer = unescapeJsonPointer;
function eachItem(xs, f) {
    if (Array.isArray(xs)) {
        for (const x of xs)
            f(x);
    }
    else {
        f(xs);
    }
}
exports.eachItem = eachItem;
function makeMergeEvaluated({ mergeNames, mergeToName, mergeValues, resultToName, }) {
    return (gen, from, to, toName) => {
        const res = to === undefined
            ? from
            : to instanceof codegen_1.Name
                ? (from instanceof codegen_1.Name ? mergeNames(gen, from, to) : mergeToName(gen, from, to), to)
                : from instanceof codegen_1.Name
                    ? (mergeToName(gen, to, from), from)
                    : mergeValues(from, to);
        return toName === codegen_1.Name && !(res instanceof codegen_1.Name) ? resultToName(gen, res) : res;
    };
}
exports.mergeEvaluated = {
    props: makeMergeEvaluated({
        mergeNames: (gen, from, to) => gen.if((0, codegen_1._) `${to} !== true && ${from} !== undefined`, () => {
            gen.if((0, codegen_1._) `${from} === true`, () => gen.assign(to, true), () => gen.assign(to, (0, codegen_1._) `${to} || {}`).code((0, codegen_1._) `Object.assign(${to}, ${from})`));
        }),
        mergeToName: (gen, from, to) => gen.if((0, codegen_1._) `${to} !== true`, () => {
            if (from === true) {
                gen.assign(to, true);
            }
            else {
                gen.assign(to, (0, codegen_1._) `${to} || {}`);
                setEvaluated(gen, to, from);
            }
        }),
        mergeValues: (from, to) => (from === true ? true : { ...from, ...to }),
        resultToName: evaluatedPropsToName,
    }),
    items: makeMergeEvaluated({
        mergeNames: (gen, from, to) => gen.if((0, codegen_1._) `${to} !== true && ${from} !== undefined`, () => gen.assign(to, (0, codegen_1._) `${from} === true ? true : ${to} > ${from} ? ${to} : ${from}`)),
        mergeToName: (gen, from, to) => gen.if((0, codegen_1._) `${to} !== true`, () => gen.assign(to, from === true ? true : (0, codegen_1._) `${to} > ${from} ? ${to} : ${from}`)),
        mergeValues: (from, to) => (from === true ? true : Math.max(from, to)),
        resultToName: (gen, items) => gen.var("items", items),
    }),
};
function evaluatedPropsToName(gen, ps) {
    if (ps === true)
        return gen.var("props", true);
    const props = gen.var("props", (0, codegen_1._) `{}`);
    if (ps !== undefined)
        setEvaluated(gen, props, ps);
    return props;
}
exports.evaluatedPropsToName = evaluatedPropsToName;
function setEvaluated(gen, props, ps) {
    Object.keys(ps).forEach((p) => gen.assign((0, codegen_1._) `${props}${(0, codegen_1.getProperty)(p)}`, true));
}
exports.setEvaluated = setEvaluated;
const snippets = {};
function useFunc(gen, f) {
    return gen.scopeValue("func", {
        ref: f,
        code: snippets[f.code] || (snippets[f.code] = new code_1._Code(f.code)),
    });
}
exports.useFunc = useFunc;
var Type;
(function (Type) {
    Type[Type["Num"] = 0] = "Num";
    Type[Type["Str"] = 1] = "Str";
})(Type || (exports.Type = Type = {}));
function getErrorPath(dataProp, dataPropType, jsPropertySyntax) {
    // let path
    if (dataProp instanceof codegen_1.Name) {
        const isNumber = dataPropType === Type.Num;
        return jsPropertySyntax
            ? isNumber
                ? (0, codegen_1._) `"[" + ${dataProp} + "]"`
                : (0, codegen_1._) `"['" + ${dataProp} + "']"`
            : isNumber
                ? (0, codegen_1._) `"/" + ${dataProp}`
                : (0, codegen_1._) `"/" + ${dataProp}.replace(/~/g, "~0").replace(/\\//g, "~1")`; // TODO maybe use global escapePointer
    }
    return jsPropertySyntax ? (0, codegen_1.getProperty)(dataProp).toString() : "/" + escapeJsonPointer(dataProp);
}
exports.getErrorPath = getErrorPath;
function checkStrictMode(it, msg, mode = it.opts.strictSchema) {
    if (!mode)
        return;
    msg = `strict mode: ${msg}`;
    if (mode === true)
        throw new Error(msg);
    it.self.logger.warn(msg);
}
exports.checkStrictMode = checkStrictMode;
//# sourceMappingURL=util.js.map

/***/ }),

/***/ 7692:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.shouldUseRule = exports.shouldUseGroup = exports.schemaHasRulesForType = void 0;
function schemaHasRulesForType({ schema, self }, type) {
    const group = self.RULES.types[type];
    return group && group !== true && shouldUseGroup(schema, group);
}
exports.schemaHasRulesForType = schemaHasRulesForType;
function shouldUseGroup(schema, group) {
    return group.rules.some((rule) => shouldUseRule(schema, rule));
}
exports.shouldUseGroup = shouldUseGroup;
function shouldUseRule(schema, rule) {
    var _a;
    return (schema[rule.keyword] !== undefined ||
        ((_a = rule.definition.implements) === null || _a === void 0 ? void 0 : _a.some((kwd) => schema[kwd] !== undefined)));
}
exports.shouldUseRule = shouldUseRule;
//# sourceMappingURL=applicability.js.map

/***/ }),

/***/ 5346:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.boolOrEmptySchema = exports.topBoolOrEmptySchema = void 0;
const errors_1 = __nccwpck_require__(1283);
const codegen_1 = __nccwpck_require__(1436);
const names_1 = __nccwpck_require__(630);
const boolError = {
    message: "boolean schema is false",
};
function topBoolOrEmptySchema(it) {
    const { gen, schema, validateName } = it;
    if (schema === false) {
        falseSchemaError(it, false);
    }
    else if (typeof schema == "object" && schema.$async === true) {
        gen.return(names_1.default.data);
    }
    else {
        gen.assign((0, codegen_1._) `${validateName}.errors`, null);
        gen.return(true);
    }
}
exports.topBoolOrEmptySchema = topBoolOrEmptySchema;
function boolOrEmptySchema(it, valid) {
    const { gen, schema } = it;
    if (schema === false) {
        gen.var(valid, false); // TODO var
        falseSchemaError(it);
    }
    else {
        gen.var(valid, true); // TODO var
    }
}
exports.boolOrEmptySchema = boolOrEmptySchema;
function falseSchemaError(it, overrideAllErrors) {
    const { gen, data } = it;
    // TODO maybe some other interface should be used for non-keyword validation errors...
    const cxt = {
        gen,
        keyword: "false schema",
        data,
        schema: false,
        schemaCode: false,
        schemaValue: false,
        params: {},
        it,
    };
    (0, errors_1.reportError)(cxt, boolError, undefined, overrideAllErrors);
}
//# sourceMappingURL=boolSchema.js.map

/***/ }),

/***/ 6685:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.reportTypeError = exports.checkDataTypes = exports.checkDataType = exports.coerceAndCheckDataType = exports.getJSONTypes = exports.getSchemaTypes = exports.DataType = void 0;
const rules_1 = __nccwpck_require__(7353);
const applicability_1 = __nccwpck_require__(7692);
const errors_1 = __nccwpck_require__(1283);
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
var DataType;
(function (DataType) {
    DataType[DataType["Correct"] = 0] = "Correct";
    DataType[DataType["Wrong"] = 1] = "Wrong";
})(DataType || (exports.DataType = DataType = {}));
function getSchemaTypes(schema) {
    const types = getJSONTypes(schema.type);
    const hasNull = types.includes("null");
    if (hasNull) {
        if (schema.nullable === false)
            throw new Error("type: null contradicts nullable: false");
    }
    else {
        if (!types.length && schema.nullable !== undefined) {
            throw new Error('"nullable" cannot be used without "type"');
        }
        if (schema.nullable === true)
            types.push("null");
    }
    return types;
}
exports.getSchemaTypes = getSchemaTypes;
// eslint-disable-next-line @typescript-eslint/no-redundant-type-constituents
function getJSONTypes(ts) {
    const types = Array.isArray(ts) ? ts : ts ? [ts] : [];
    if (types.every(rules_1.isJSONType))
        return types;
    throw new Error("type must be JSONType or JSONType[]: " + types.join(","));
}
exports.getJSONTypes = getJSONTypes;
function coerceAndCheckDataType(it, types) {
    const { gen, data, opts } = it;
    const coerceTo = coerceToTypes(types, opts.coerceTypes);
    const checkTypes = types.length > 0 &&
        !(coerceTo.length === 0 && types.length === 1 && (0, applicability_1.schemaHasRulesForType)(it, types[0]));
    if (checkTypes) {
        const wrongType = checkDataTypes(types, data, opts.strictNumbers, DataType.Wrong);
        gen.if(wrongType, () => {
            if (coerceTo.length)
                coerceData(it, types, coerceTo);
            else
                reportTypeError(it);
        });
    }
    return checkTypes;
}
exports.coerceAndCheckDataType = coerceAndCheckDataType;
const COERCIBLE = new Set(["string", "number", "integer", "boolean", "null"]);
function coerceToTypes(types, coerceTypes) {
    return coerceTypes
        ? types.filter((t) => COERCIBLE.has(t) || (coerceTypes === "array" && t === "array"))
        : [];
}
function coerceData(it, types, coerceTo) {
    const { gen, data, opts } = it;
    const dataType = gen.let("dataType", (0, codegen_1._) `typeof ${data}`);
    const coerced = gen.let("coerced", (0, codegen_1._) `undefined`);
    if (opts.coerceTypes === "array") {
        gen.if((0, codegen_1._) `${dataType} == 'object' && Array.isArray(${data}) && ${data}.length == 1`, () => gen
            .assign(data, (0, codegen_1._) `${data}[0]`)
            .assign(dataType, (0, codegen_1._) `typeof ${data}`)
            .if(checkDataTypes(types, data, opts.strictNumbers), () => gen.assign(coerced, data)));
    }
    gen.if((0, codegen_1._) `${coerced} !== undefined`);
    for (const t of coerceTo) {
        if (COERCIBLE.has(t) || (t === "array" && opts.coerceTypes === "array")) {
            coerceSpecificType(t);
        }
    }
    gen.else();
    reportTypeError(it);
    gen.endIf();
    gen.if((0, codegen_1._) `${coerced} !== undefined`, () => {
        gen.assign(data, coerced);
        assignParentData(it, coerced);
    });
    function coerceSpecificType(t) {
        switch (t) {
            case "string":
                gen
                    .elseIf((0, codegen_1._) `${dataType} == "number" || ${dataType} == "boolean"`)
                    .assign(coerced, (0, codegen_1._) `"" + ${data}`)
                    .elseIf((0, codegen_1._) `${data} === null`)
                    .assign(coerced, (0, codegen_1._) `""`);
                return;
            case "number":
                gen
                    .elseIf((0, codegen_1._) `${dataType} == "boolean" || ${data} === null
              || (${dataType} == "string" && ${data} && ${data} == +${data})`)
                    .assign(coerced, (0, codegen_1._) `+${data}`);
                return;
            case "integer":
                gen
                    .elseIf((0, codegen_1._) `${dataType} === "boolean" || ${data} === null
              || (${dataType} === "string" && ${data} && ${data} == +${data} && !(${data} % 1))`)
                    .assign(coerced, (0, codegen_1._) `+${data}`);
                return;
            case "boolean":
                gen
                    .elseIf((0, codegen_1._) `${data} === "false" || ${data} === 0 || ${data} === null`)
                    .assign(coerced, false)
                    .elseIf((0, codegen_1._) `${data} === "true" || ${data} === 1`)
                    .assign(coerced, true);
                return;
            case "null":
                gen.elseIf((0, codegen_1._) `${data} === "" || ${data} === 0 || ${data} === false`);
                gen.assign(coerced, null);
                return;
            case "array":
                gen
                    .elseIf((0, codegen_1._) `${dataType} === "string" || ${dataType} === "number"
              || ${dataType} === "boolean" || ${data} === null`)
                    .assign(coerced, (0, codegen_1._) `[${data}]`);
        }
    }
}
function assignParentData({ gen, parentData, parentDataProperty }, expr) {
    // TODO use gen.property
    gen.if((0, codegen_1._) `${parentData} !== undefined`, () => gen.assign((0, codegen_1._) `${parentData}[${parentDataProperty}]`, expr));
}
function checkDataType(dataType, data, strictNums, correct = DataType.Correct) {
    const EQ = correct === DataType.Correct ? codegen_1.operators.EQ : codegen_1.operators.NEQ;
    let cond;
    switch (dataType) {
        case "null":
            return (0, codegen_1._) `${data} ${EQ} null`;
        case "array":
            cond = (0, codegen_1._) `Array.isArray(${data})`;
            break;
        case "object":
            cond = (0, codegen_1._) `${data} && typeof ${data} == "object" && !Array.isArray(${data})`;
            break;
        case "integer":
            cond = numCond((0, codegen_1._) `!(${data} % 1) && !isNaN(${data})`);
            break;
        case "number":
            cond = numCond();
            break;
        default:
            return (0, codegen_1._) `typeof ${data} ${EQ} ${dataType}`;
    }
    return correct === DataType.Correct ? cond : (0, codegen_1.not)(cond);
    function numCond(_cond = codegen_1.nil) {
        return (0, codegen_1.and)((0, codegen_1._) `typeof ${data} == "number"`, _cond, strictNums ? (0, codegen_1._) `isFinite(${data})` : codegen_1.nil);
    }
}
exports.checkDataType = checkDataType;
function checkDataTypes(dataTypes, data, strictNums, correct) {
    if (dataTypes.length === 1) {
        return checkDataType(dataTypes[0], data, strictNums, correct);
    }
    let cond;
    const types = (0, util_1.toHash)(dataTypes);
    if (types.array && types.object) {
        const notObj = (0, codegen_1._) `typeof ${data} != "object"`;
        cond = types.null ? notObj : (0, codegen_1._) `!${data} || ${notObj}`;
        delete types.null;
        delete types.array;
        delete types.object;
    }
    else {
        cond = codegen_1.nil;
    }
    if (types.number)
        delete types.integer;
    for (const t in types)
        cond = (0, codegen_1.and)(cond, checkDataType(t, data, strictNums, correct));
    return cond;
}
exports.checkDataTypes = checkDataTypes;
const typeError = {
    message: ({ schema }) => `must be ${schema}`,
    params: ({ schema, schemaValue }) => typeof schema == "string" ? (0, codegen_1._) `{type: ${schema}}` : (0, codegen_1._) `{type: ${schemaValue}}`,
};
function reportTypeError(it) {
    const cxt = getTypeErrorContext(it);
    (0, errors_1.reportError)(cxt, typeError);
}
exports.reportTypeError = reportTypeError;
function getTypeErrorContext(it) {
    const { gen, data, schema } = it;
    const schemaCode = (0, util_1.schemaRefOrVal)(it, schema, "type");
    return {
        gen,
        keyword: "type",
        data,
        schema: schema.type,
        schemaCode,
        schemaValue: schemaCode,
        parentSchema: schema,
        params: {},
        it,
    };
}
//# sourceMappingURL=dataType.js.map

/***/ }),

/***/ 1699:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.assignDefaults = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
function assignDefaults(it, ty) {
    const { properties, items } = it.schema;
    if (ty === "object" && properties) {
        for (const key in properties) {
            assignDefault(it, key, properties[key].default);
        }
    }
    else if (ty === "array" && Array.isArray(items)) {
        items.forEach((sch, i) => assignDefault(it, i, sch.default));
    }
}
exports.assignDefaults = assignDefaults;
function assignDefault(it, prop, defaultValue) {
    const { gen, compositeRule, data, opts } = it;
    if (defaultValue === undefined)
        return;
    const childData = (0, codegen_1._) `${data}${(0, codegen_1.getProperty)(prop)}`;
    if (compositeRule) {
        (0, util_1.checkStrictMode)(it, `default is ignored for: ${childData}`);
        return;
    }
    let condition = (0, codegen_1._) `${childData} === undefined`;
    if (opts.useDefaults === "empty") {
        condition = (0, codegen_1._) `${condition} || ${childData} === null || ${childData} === ""`;
    }
    // `${childData} === undefined` +
    // (opts.useDefaults === "empty" ? ` || ${childData} === null || ${childData} === ""` : "")
    gen.if(condition, (0, codegen_1._) `${childData} = ${(0, codegen_1.stringify)(defaultValue)}`);
}
//# sourceMappingURL=defaults.js.map

/***/ }),

/***/ 7881:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.getData = exports.KeywordCxt = exports.validateFunctionCode = void 0;
const boolSchema_1 = __nccwpck_require__(5346);
const dataType_1 = __nccwpck_require__(6685);
const applicability_1 = __nccwpck_require__(7692);
const dataType_2 = __nccwpck_require__(6685);
const defaults_1 = __nccwpck_require__(1699);
const keyword_1 = __nccwpck_require__(5202);
const subschema_1 = __nccwpck_require__(6200);
const codegen_1 = __nccwpck_require__(1436);
const names_1 = __nccwpck_require__(630);
const resolve_1 = __nccwpck_require__(4090);
const util_1 = __nccwpck_require__(4464);
const errors_1 = __nccwpck_require__(1283);
// schema compilation - generates validation function, subschemaCode (below) is used for subschemas
function validateFunctionCode(it) {
    if (isSchemaObj(it)) {
        checkKeywords(it);
        if (schemaCxtHasRules(it)) {
            topSchemaObjCode(it);
            return;
        }
    }
    validateFunction(it, () => (0, boolSchema_1.topBoolOrEmptySchema)(it));
}
exports.validateFunctionCode = validateFunctionCode;
function validateFunction({ gen, validateName, schema, schemaEnv, opts }, body) {
    if (opts.code.es5) {
        gen.func(validateName, (0, codegen_1._) `${names_1.default.data}, ${names_1.default.valCxt}`, schemaEnv.$async, () => {
            gen.code((0, codegen_1._) `"use strict"; ${funcSourceUrl(schema, opts)}`);
            destructureValCxtES5(gen, opts);
            gen.code(body);
        });
    }
    else {
        gen.func(validateName, (0, codegen_1._) `${names_1.default.data}, ${destructureValCxt(opts)}`, schemaEnv.$async, () => gen.code(funcSourceUrl(schema, opts)).code(body));
    }
}
function destructureValCxt(opts) {
    return (0, codegen_1._) `{${names_1.default.instancePath}="", ${names_1.default.parentData}, ${names_1.default.parentDataProperty}, ${names_1.default.rootData}=${names_1.default.data}${opts.dynamicRef ? (0, codegen_1._) `, ${names_1.default.dynamicAnchors}={}` : codegen_1.nil}}={}`;
}
function destructureValCxtES5(gen, opts) {
    gen.if(names_1.default.valCxt, () => {
        gen.var(names_1.default.instancePath, (0, codegen_1._) `${names_1.default.valCxt}.${names_1.default.instancePath}`);
        gen.var(names_1.default.parentData, (0, codegen_1._) `${names_1.default.valCxt}.${names_1.default.parentData}`);
        gen.var(names_1.default.parentDataProperty, (0, codegen_1._) `${names_1.default.valCxt}.${names_1.default.parentDataProperty}`);
        gen.var(names_1.default.rootData, (0, codegen_1._) `${names_1.default.valCxt}.${names_1.default.rootData}`);
        if (opts.dynamicRef)
            gen.var(names_1.default.dynamicAnchors, (0, codegen_1._) `${names_1.default.valCxt}.${names_1.default.dynamicAnchors}`);
    }, () => {
        gen.var(names_1.default.instancePath, (0, codegen_1._) `""`);
        gen.var(names_1.default.parentData, (0, codegen_1._) `undefined`);
        gen.var(names_1.default.parentDataProperty, (0, codegen_1._) `undefined`);
        gen.var(names_1.default.rootData, names_1.default.data);
        if (opts.dynamicRef)
            gen.var(names_1.default.dynamicAnchors, (0, codegen_1._) `{}`);
    });
}
function topSchemaObjCode(it) {
    const { schema, opts, gen } = it;
    validateFunction(it, () => {
        if (opts.$comment && schema.$comment)
            commentKeyword(it);
        checkNoDefault(it);
        gen.let(names_1.default.vErrors, null);
        gen.let(names_1.default.errors, 0);
        if (opts.unevaluated)
            resetEvaluated(it);
        typeAndKeywords(it);
        returnResults(it);
    });
    return;
}
function resetEvaluated(it) {
    // TODO maybe some hook to execute it in the end to check whether props/items are Name, as in assignEvaluated
    const { gen, validateName } = it;
    it.evaluated = gen.const("evaluated", (0, codegen_1._) `${validateName}.evaluated`);
    gen.if((0, codegen_1._) `${it.evaluated}.dynamicProps`, () => gen.assign((0, codegen_1._) `${it.evaluated}.props`, (0, codegen_1._) `undefined`));
    gen.if((0, codegen_1._) `${it.evaluated}.dynamicItems`, () => gen.assign((0, codegen_1._) `${it.evaluated}.items`, (0, codegen_1._) `undefined`));
}
function funcSourceUrl(schema, opts) {
    const schId = typeof schema == "object" && schema[opts.schemaId];
    return schId && (opts.code.source || opts.code.process) ? (0, codegen_1._) `/*# sourceURL=${schId} */` : codegen_1.nil;
}
// schema compilation - this function is used recursively to generate code for sub-schemas
function subschemaCode(it, valid) {
    if (isSchemaObj(it)) {
        checkKeywords(it);
        if (schemaCxtHasRules(it)) {
            subSchemaObjCode(it, valid);
            return;
        }
    }
    (0, boolSchema_1.boolOrEmptySchema)(it, valid);
}
function schemaCxtHasRules({ schema, self }) {
    if (typeof schema == "boolean")
        return !schema;
    for (const key in schema)
        if (self.RULES.all[key])
            return true;
    return false;
}
function isSchemaObj(it) {
    return typeof it.schema != "boolean";
}
function subSchemaObjCode(it, valid) {
    const { schema, gen, opts } = it;
    if (opts.$comment && schema.$comment)
        commentKeyword(it);
    updateContext(it);
    checkAsyncSchema(it);
    const errsCount = gen.const("_errs", names_1.default.errors);
    typeAndKeywords(it, errsCount);
    // TODO var
    gen.var(valid, (0, codegen_1._) `${errsCount} === ${names_1.default.errors}`);
}
function checkKeywords(it) {
    (0, util_1.checkUnknownRules)(it);
    checkRefsAndKeywords(it);
}
function typeAndKeywords(it, errsCount) {
    if (it.opts.jtd)
        return schemaKeywords(it, [], false, errsCount);
    const types = (0, dataType_1.getSchemaTypes)(it.schema);
    const checkedTypes = (0, dataType_1.coerceAndCheckDataType)(it, types);
    schemaKeywords(it, types, !checkedTypes, errsCount);
}
function checkRefsAndKeywords(it) {
    const { schema, errSchemaPath, opts, self } = it;
    if (schema.$ref && opts.ignoreKeywordsWithRef && (0, util_1.schemaHasRulesButRef)(schema, self.RULES)) {
        self.logger.warn(`$ref: keywords ignored in schema at path "${errSchemaPath}"`);
    }
}
function checkNoDefault(it) {
    const { schema, opts } = it;
    if (schema.default !== undefined && opts.useDefaults && opts.strictSchema) {
        (0, util_1.checkStrictMode)(it, "default is ignored in the schema root");
    }
}
function updateContext(it) {
    const schId = it.schema[it.opts.schemaId];
    if (schId)
        it.baseId = (0, resolve_1.resolveUrl)(it.opts.uriResolver, it.baseId, schId);
}
function checkAsyncSchema(it) {
    if (it.schema.$async && !it.schemaEnv.$async)
        throw new Error("async schema in sync schema");
}
function commentKeyword({ gen, schemaEnv, schema, errSchemaPath, opts }) {
    const msg = schema.$comment;
    if (opts.$comment === true) {
        gen.code((0, codegen_1._) `${names_1.default.self}.logger.log(${msg})`);
    }
    else if (typeof opts.$comment == "function") {
        const schemaPath = (0, codegen_1.str) `${errSchemaPath}/$comment`;
        const rootName = gen.scopeValue("root", { ref: schemaEnv.root });
        gen.code((0, codegen_1._) `${names_1.default.self}.opts.$comment(${msg}, ${schemaPath}, ${rootName}.schema)`);
    }
}
function returnResults(it) {
    const { gen, schemaEnv, validateName, ValidationError, opts } = it;
    if (schemaEnv.$async) {
        // TODO assign unevaluated
        gen.if((0, codegen_1._) `${names_1.default.errors} === 0`, () => gen.return(names_1.default.data), () => gen.throw((0, codegen_1._) `new ${ValidationError}(${names_1.default.vErrors})`));
    }
    else {
        gen.assign((0, codegen_1._) `${validateName}.errors`, names_1.default.vErrors);
        if (opts.unevaluated)
            assignEvaluated(it);
        gen.return((0, codegen_1._) `${names_1.default.errors} === 0`);
    }
}
function assignEvaluated({ gen, evaluated, props, items }) {
    if (props instanceof codegen_1.Name)
        gen.assign((0, codegen_1._) `${evaluated}.props`, props);
    if (items instanceof codegen_1.Name)
        gen.assign((0, codegen_1._) `${evaluated}.items`, items);
}
function schemaKeywords(it, types, typeErrors, errsCount) {
    const { gen, schema, data, allErrors, opts, self } = it;
    const { RULES } = self;
    if (schema.$ref && (opts.ignoreKeywordsWithRef || !(0, util_1.schemaHasRulesButRef)(schema, RULES))) {
        gen.block(() => keywordCode(it, "$ref", RULES.all.$ref.definition)); // TODO typecast
        return;
    }
    if (!opts.jtd)
        checkStrictTypes(it, types);
    gen.block(() => {
        for (const group of RULES.rules)
            groupKeywords(group);
        groupKeywords(RULES.post);
    });
    function groupKeywords(group) {
        if (!(0, applicability_1.shouldUseGroup)(schema, group))
            return;
        if (group.type) {
            gen.if((0, dataType_2.checkDataType)(group.type, data, opts.strictNumbers));
            iterateKeywords(it, group);
            if (types.length === 1 && types[0] === group.type && typeErrors) {
                gen.else();
                (0, dataType_2.reportTypeError)(it);
            }
            gen.endIf();
        }
        else {
            iterateKeywords(it, group);
        }
        // TODO make it "ok" call?
        if (!allErrors)
            gen.if((0, codegen_1._) `${names_1.default.errors} === ${errsCount || 0}`);
    }
}
function iterateKeywords(it, group) {
    const { gen, schema, opts: { useDefaults }, } = it;
    if (useDefaults)
        (0, defaults_1.assignDefaults)(it, group.type);
    gen.block(() => {
        for (const rule of group.rules) {
            if ((0, applicability_1.shouldUseRule)(schema, rule)) {
                keywordCode(it, rule.keyword, rule.definition, group.type);
            }
        }
    });
}
function checkStrictTypes(it, types) {
    if (it.schemaEnv.meta || !it.opts.strictTypes)
        return;
    checkContextTypes(it, types);
    if (!it.opts.allowUnionTypes)
        checkMultipleTypes(it, types);
    checkKeywordTypes(it, it.dataTypes);
}
function checkContextTypes(it, types) {
    if (!types.length)
        return;
    if (!it.dataTypes.length) {
        it.dataTypes = types;
        return;
    }
    types.forEach((t) => {
        if (!includesType(it.dataTypes, t)) {
            strictTypesError(it, `type "${t}" not allowed by context "${it.dataTypes.join(",")}"`);
        }
    });
    narrowSchemaTypes(it, types);
}
function checkMultipleTypes(it, ts) {
    if (ts.length > 1 && !(ts.length === 2 && ts.includes("null"))) {
        strictTypesError(it, "use allowUnionTypes to allow union type keyword");
    }
}
function checkKeywordTypes(it, ts) {
    const rules = it.self.RULES.all;
    for (const keyword in rules) {
        const rule = rules[keyword];
        if (typeof rule == "object" && (0, applicability_1.shouldUseRule)(it.schema, rule)) {
            const { type } = rule.definition;
            if (type.length && !type.some((t) => hasApplicableType(ts, t))) {
                strictTypesError(it, `missing type "${type.join(",")}" for keyword "${keyword}"`);
            }
        }
    }
}
function hasApplicableType(schTs, kwdT) {
    return schTs.includes(kwdT) || (kwdT === "number" && schTs.includes("integer"));
}
function includesType(ts, t) {
    return ts.includes(t) || (t === "integer" && ts.includes("number"));
}
function narrowSchemaTypes(it, withTypes) {
    const ts = [];
    for (const t of it.dataTypes) {
        if (includesType(withTypes, t))
            ts.push(t);
        else if (withTypes.includes("integer") && t === "number")
            ts.push("integer");
    }
    it.dataTypes = ts;
}
function strictTypesError(it, msg) {
    const schemaPath = it.schemaEnv.baseId + it.errSchemaPath;
    msg += ` at "${schemaPath}" (strictTypes)`;
    (0, util_1.checkStrictMode)(it, msg, it.opts.strictTypes);
}
class KeywordCxt {
    constructor(it, def, keyword) {
        (0, keyword_1.validateKeywordUsage)(it, def, keyword);
        this.gen = it.gen;
        this.allErrors = it.allErrors;
        this.keyword = keyword;
        this.data = it.data;
        this.schema = it.schema[keyword];
        this.$data = def.$data && it.opts.$data && this.schema && this.schema.$data;
        this.schemaValue = (0, util_1.schemaRefOrVal)(it, this.schema, keyword, this.$data);
        this.schemaType = def.schemaType;
        this.parentSchema = it.schema;
        this.params = {};
        this.it = it;
        this.def = def;
        if (this.$data) {
            this.schemaCode = it.gen.const("vSchema", getData(this.$data, it));
        }
        else {
            this.schemaCode = this.schemaValue;
            if (!(0, keyword_1.validSchemaType)(this.schema, def.schemaType, def.allowUndefined)) {
                throw new Error(`${keyword} value must be ${JSON.stringify(def.schemaType)}`);
            }
        }
        if ("code" in def ? def.trackErrors : def.errors !== false) {
            this.errsCount = it.gen.const("_errs", names_1.default.errors);
        }
    }
    result(condition, successAction, failAction) {
        this.failResult((0, codegen_1.not)(condition), successAction, failAction);
    }
    failResult(condition, successAction, failAction) {
        this.gen.if(condition);
        if (failAction)
            failAction();
        else
            this.error();
        if (successAction) {
            this.gen.else();
            successAction();
            if (this.allErrors)
                this.gen.endIf();
        }
        else {
            if (this.allErrors)
                this.gen.endIf();
            else
                this.gen.else();
        }
    }
    pass(condition, failAction) {
        this.failResult((0, codegen_1.not)(condition), undefined, failAction);
    }
    fail(condition) {
        if (condition === undefined) {
            this.error();
            if (!this.allErrors)
                this.gen.if(false); // this branch will be removed by gen.optimize
            return;
        }
        this.gen.if(condition);
        this.error();
        if (this.allErrors)
            this.gen.endIf();
        else
            this.gen.else();
    }
    fail$data(condition) {
        if (!this.$data)
            return this.fail(condition);
        const { schemaCode } = this;
        this.fail((0, codegen_1._) `${schemaCode} !== undefined && (${(0, codegen_1.or)(this.invalid$data(), condition)})`);
    }
    error(append, errorParams, errorPaths) {
        if (errorParams) {
            this.setParams(errorParams);
            this._error(append, errorPaths);
            this.setParams({});
            return;
        }
        this._error(append, errorPaths);
    }
    _error(append, errorPaths) {
        ;
        (append ? errors_1.reportExtraError : errors_1.reportError)(this, this.def.error, errorPaths);
    }
    $dataError() {
        (0, errors_1.reportError)(this, this.def.$dataError || errors_1.keyword$DataError);
    }
    reset() {
        if (this.errsCount === undefined)
            throw new Error('add "trackErrors" to keyword definition');
        (0, errors_1.resetErrorsCount)(this.gen, this.errsCount);
    }
    ok(cond) {
        if (!this.allErrors)
            this.gen.if(cond);
    }
    setParams(obj, assign) {
        if (assign)
            Object.assign(this.params, obj);
        else
            this.params = obj;
    }
    block$data(valid, codeBlock, $dataValid = codegen_1.nil) {
        this.gen.block(() => {
            this.check$data(valid, $dataValid);
            codeBlock();
        });
    }
    check$data(valid = codegen_1.nil, $dataValid = codegen_1.nil) {
        if (!this.$data)
            return;
        const { gen, schemaCode, schemaType, def } = this;
        gen.if((0, codegen_1.or)((0, codegen_1._) `${schemaCode} === undefined`, $dataValid));
        if (valid !== codegen_1.nil)
            gen.assign(valid, true);
        if (schemaType.length || def.validateSchema) {
            gen.elseIf(this.invalid$data());
            this.$dataError();
            if (valid !== codegen_1.nil)
                gen.assign(valid, false);
        }
        gen.else();
    }
    invalid$data() {
        const { gen, schemaCode, schemaType, def, it } = this;
        return (0, codegen_1.or)(wrong$DataType(), invalid$DataSchema());
        function wrong$DataType() {
            if (schemaType.length) {
                /* istanbul ignore if */
                if (!(schemaCode instanceof codegen_1.Name))
                    throw new Error("ajv implementation error");
                const st = Array.isArray(schemaType) ? schemaType : [schemaType];
                return (0, codegen_1._) `${(0, dataType_2.checkDataTypes)(st, schemaCode, it.opts.strictNumbers, dataType_2.DataType.Wrong)}`;
            }
            return codegen_1.nil;
        }
        function invalid$DataSchema() {
            if (def.validateSchema) {
                const validateSchemaRef = gen.scopeValue("validate$data", { ref: def.validateSchema }); // TODO value.code for standalone
                return (0, codegen_1._) `!${validateSchemaRef}(${schemaCode})`;
            }
            return codegen_1.nil;
        }
    }
    subschema(appl, valid) {
        const subschema = (0, subschema_1.getSubschema)(this.it, appl);
        (0, subschema_1.extendSubschemaData)(subschema, this.it, appl);
        (0, subschema_1.extendSubschemaMode)(subschema, appl);
        const nextContext = { ...this.it, ...subschema, items: undefined, props: undefined };
        subschemaCode(nextContext, valid);
        return nextContext;
    }
    mergeEvaluated(schemaCxt, toName) {
        const { it, gen } = this;
        if (!it.opts.unevaluated)
            return;
        if (it.props !== true && schemaCxt.props !== undefined) {
            it.props = util_1.mergeEvaluated.props(gen, schemaCxt.props, it.props, toName);
        }
        if (it.items !== true && schemaCxt.items !== undefined) {
            it.items = util_1.mergeEvaluated.items(gen, schemaCxt.items, it.items, toName);
        }
    }
    mergeValidEvaluated(schemaCxt, valid) {
        const { it, gen } = this;
        if (it.opts.unevaluated && (it.props !== true || it.items !== true)) {
            gen.if(valid, () => this.mergeEvaluated(schemaCxt, codegen_1.Name));
            return true;
        }
    }
}
exports.KeywordCxt = KeywordCxt;
function keywordCode(it, keyword, def, ruleType) {
    const cxt = new KeywordCxt(it, def, keyword);
    if ("code" in def) {
        def.code(cxt, ruleType);
    }
    else if (cxt.$data && def.validate) {
        (0, keyword_1.funcKeywordCode)(cxt, def);
    }
    else if ("macro" in def) {
        (0, keyword_1.macroKeywordCode)(cxt, def);
    }
    else if (def.compile || def.validate) {
        (0, keyword_1.funcKeywordCode)(cxt, def);
    }
}
const JSON_POINTER = /^\/(?:[^~]|~0|~1)*$/;
const RELATIVE_JSON_POINTER = /^([0-9]+)(#|\/(?:[^~]|~0|~1)*)?$/;
function getData($data, { dataLevel, dataNames, dataPathArr }) {
    let jsonPointer;
    let data;
    if ($data === "")
        return names_1.default.rootData;
    if ($data[0] === "/") {
        if (!JSON_POINTER.test($data))
            throw new Error(`Invalid JSON-pointer: ${$data}`);
        jsonPointer = $data;
        data = names_1.default.rootData;
    }
    else {
        const matches = RELATIVE_JSON_POINTER.exec($data);
        if (!matches)
            throw new Error(`Invalid JSON-pointer: ${$data}`);
        const up = +matches[1];
        jsonPointer = matches[2];
        if (jsonPointer === "#") {
            if (up >= dataLevel)
                throw new Error(errorMsg("property/index", up));
            return dataPathArr[dataLevel - up];
        }
        if (up > dataLevel)
            throw new Error(errorMsg("data", up));
        data = dataNames[dataLevel - up];
        if (!jsonPointer)
            return data;
    }
    let expr = data;
    const segments = jsonPointer.split("/");
    for (const segment of segments) {
        if (segment) {
            data = (0, codegen_1._) `${data}${(0, codegen_1.getProperty)((0, util_1.unescapeJsonPointer)(segment))}`;
            expr = (0, codegen_1._) `${expr} && ${data}`;
        }
    }
    return expr;
    function errorMsg(pointerType, up) {
        return `Cannot access ${pointerType} ${up} levels up, current level is ${dataLevel}`;
    }
}
exports.getData = getData;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 5202:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.validateKeywordUsage = exports.validSchemaType = exports.funcKeywordCode = exports.macroKeywordCode = void 0;
const codegen_1 = __nccwpck_require__(1436);
const names_1 = __nccwpck_require__(630);
const code_1 = __nccwpck_require__(8484);
const errors_1 = __nccwpck_require__(1283);
function macroKeywordCode(cxt, def) {
    const { gen, keyword, schema, parentSchema, it } = cxt;
    const macroSchema = def.macro.call(it.self, schema, parentSchema, it);
    const schemaRef = useKeyword(gen, keyword, macroSchema);
    if (it.opts.validateSchema !== false)
        it.self.validateSchema(macroSchema, true);
    const valid = gen.name("valid");
    cxt.subschema({
        schema: macroSchema,
        schemaPath: codegen_1.nil,
        errSchemaPath: `${it.errSchemaPath}/${keyword}`,
        topSchemaRef: schemaRef,
        compositeRule: true,
    }, valid);
    cxt.pass(valid, () => cxt.error(true));
}
exports.macroKeywordCode = macroKeywordCode;
function funcKeywordCode(cxt, def) {
    var _a;
    const { gen, keyword, schema, parentSchema, $data, it } = cxt;
    checkAsyncKeyword(it, def);
    const validate = !$data && def.compile ? def.compile.call(it.self, schema, parentSchema, it) : def.validate;
    const validateRef = useKeyword(gen, keyword, validate);
    const valid = gen.let("valid");
    cxt.block$data(valid, validateKeyword);
    cxt.ok((_a = def.valid) !== null && _a !== void 0 ? _a : valid);
    function validateKeyword() {
        if (def.errors === false) {
            assignValid();
            if (def.modifying)
                modifyData(cxt);
            reportErrs(() => cxt.error());
        }
        else {
            const ruleErrs = def.async ? validateAsync() : validateSync();
            if (def.modifying)
                modifyData(cxt);
            reportErrs(() => addErrs(cxt, ruleErrs));
        }
    }
    function validateAsync() {
        const ruleErrs = gen.let("ruleErrs", null);
        gen.try(() => assignValid((0, codegen_1._) `await `), (e) => gen.assign(valid, false).if((0, codegen_1._) `${e} instanceof ${it.ValidationError}`, () => gen.assign(ruleErrs, (0, codegen_1._) `${e}.errors`), () => gen.throw(e)));
        return ruleErrs;
    }
    function validateSync() {
        const validateErrs = (0, codegen_1._) `${validateRef}.errors`;
        gen.assign(validateErrs, null);
        assignValid(codegen_1.nil);
        return validateErrs;
    }
    function assignValid(_await = def.async ? (0, codegen_1._) `await ` : codegen_1.nil) {
        const passCxt = it.opts.passContext ? names_1.default.this : names_1.default.self;
        const passSchema = !(("compile" in def && !$data) || def.schema === false);
        gen.assign(valid, (0, codegen_1._) `${_await}${(0, code_1.callValidateCode)(cxt, validateRef, passCxt, passSchema)}`, def.modifying);
    }
    function reportErrs(errors) {
        var _a;
        gen.if((0, codegen_1.not)((_a = def.valid) !== null && _a !== void 0 ? _a : valid), errors);
    }
}
exports.funcKeywordCode = funcKeywordCode;
function modifyData(cxt) {
    const { gen, data, it } = cxt;
    gen.if(it.parentData, () => gen.assign(data, (0, codegen_1._) `${it.parentData}[${it.parentDataProperty}]`));
}
function addErrs(cxt, errs) {
    const { gen } = cxt;
    gen.if((0, codegen_1._) `Array.isArray(${errs})`, () => {
        gen
            .assign(names_1.default.vErrors, (0, codegen_1._) `${names_1.default.vErrors} === null ? ${errs} : ${names_1.default.vErrors}.concat(${errs})`)
            .assign(names_1.default.errors, (0, codegen_1._) `${names_1.default.vErrors}.length`);
        (0, errors_1.extendErrors)(cxt);
    }, () => cxt.error());
}
function checkAsyncKeyword({ schemaEnv }, def) {
    if (def.async && !schemaEnv.$async)
        throw new Error("async keyword in sync schema");
}
function useKeyword(gen, keyword, result) {
    if (result === undefined)
        throw new Error(`keyword "${keyword}" failed to compile`);
    return gen.scopeValue("keyword", typeof result == "function" ? { ref: result } : { ref: result, code: (0, codegen_1.stringify)(result) });
}
function validSchemaType(schema, schemaType, allowUndefined = false) {
    // TODO add tests
    return (!schemaType.length ||
        schemaType.some((st) => st === "array"
            ? Array.isArray(schema)
            : st === "object"
                ? schema && typeof schema == "object" && !Array.isArray(schema)
                : typeof schema == st || (allowUndefined && typeof schema == "undefined")));
}
exports.validSchemaType = validSchemaType;
function validateKeywordUsage({ schema, opts, self, errSchemaPath }, def, keyword) {
    /* istanbul ignore if */
    if (Array.isArray(def.keyword) ? !def.keyword.includes(keyword) : def.keyword !== keyword) {
        throw new Error("ajv implementation error");
    }
    const deps = def.dependencies;
    if (deps === null || deps === void 0 ? void 0 : deps.some((kwd) => !Object.prototype.hasOwnProperty.call(schema, kwd))) {
        throw new Error(`parent schema must have dependencies of ${keyword}: ${deps.join(",")}`);
    }
    if (def.validateSchema) {
        const valid = def.validateSchema(schema[keyword]);
        if (!valid) {
            const msg = `keyword "${keyword}" value is invalid at path "${errSchemaPath}": ` +
                self.errorsText(def.validateSchema.errors);
            if (opts.validateSchema === "log")
                self.logger.error(msg);
            else
                throw new Error(msg);
        }
    }
}
exports.validateKeywordUsage = validateKeywordUsage;
//# sourceMappingURL=keyword.js.map

/***/ }),

/***/ 6200:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.extendSubschemaMode = exports.extendSubschemaData = exports.getSubschema = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
function getSubschema(it, { keyword, schemaProp, schema, schemaPath, errSchemaPath, topSchemaRef }) {
    if (keyword !== undefined && schema !== undefined) {
        throw new Error('both "keyword" and "schema" passed, only one allowed');
    }
    if (keyword !== undefined) {
        const sch = it.schema[keyword];
        return schemaProp === undefined
            ? {
                schema: sch,
                schemaPath: (0, codegen_1._) `${it.schemaPath}${(0, codegen_1.getProperty)(keyword)}`,
                errSchemaPath: `${it.errSchemaPath}/${keyword}`,
            }
            : {
                schema: sch[schemaProp],
                schemaPath: (0, codegen_1._) `${it.schemaPath}${(0, codegen_1.getProperty)(keyword)}${(0, codegen_1.getProperty)(schemaProp)}`,
                errSchemaPath: `${it.errSchemaPath}/${keyword}/${(0, util_1.escapeFragment)(schemaProp)}`,
            };
    }
    if (schema !== undefined) {
        if (schemaPath === undefined || errSchemaPath === undefined || topSchemaRef === undefined) {
            throw new Error('"schemaPath", "errSchemaPath" and "topSchemaRef" are required with "schema"');
        }
        return {
            schema,
            schemaPath,
            topSchemaRef,
            errSchemaPath,
        };
    }
    throw new Error('either "keyword" or "schema" must be passed');
}
exports.getSubschema = getSubschema;
function extendSubschemaData(subschema, it, { dataProp, dataPropType: dpType, data, dataTypes, propertyName }) {
    if (data !== undefined && dataProp !== undefined) {
        throw new Error('both "data" and "dataProp" passed, only one allowed');
    }
    const { gen } = it;
    if (dataProp !== undefined) {
        const { errorPath, dataPathArr, opts } = it;
        const nextData = gen.let("data", (0, codegen_1._) `${it.data}${(0, codegen_1.getProperty)(dataProp)}`, true);
        dataContextProps(nextData);
        subschema.errorPath = (0, codegen_1.str) `${errorPath}${(0, util_1.getErrorPath)(dataProp, dpType, opts.jsPropertySyntax)}`;
        subschema.parentDataProperty = (0, codegen_1._) `${dataProp}`;
        subschema.dataPathArr = [...dataPathArr, subschema.parentDataProperty];
    }
    if (data !== undefined) {
        const nextData = data instanceof codegen_1.Name ? data : gen.let("data", data, true); // replaceable if used once?
        dataContextProps(nextData);
        if (propertyName !== undefined)
            subschema.propertyName = propertyName;
        // TODO something is possibly wrong here with not changing parentDataProperty and not appending dataPathArr
    }
    if (dataTypes)
        subschema.dataTypes = dataTypes;
    function dataContextProps(_nextData) {
        subschema.data = _nextData;
        subschema.dataLevel = it.dataLevel + 1;
        subschema.dataTypes = [];
        it.definedProperties = new Set();
        subschema.parentData = it.data;
        subschema.dataNames = [...it.dataNames, _nextData];
    }
}
exports.extendSubschemaData = extendSubschemaData;
function extendSubschemaMode(subschema, { jtdDiscriminator, jtdMetadata, compositeRule, createErrors, allErrors }) {
    if (compositeRule !== undefined)
        subschema.compositeRule = compositeRule;
    if (createErrors !== undefined)
        subschema.createErrors = createErrors;
    if (allErrors !== undefined)
        subschema.allErrors = allErrors;
    subschema.jtdDiscriminator = jtdDiscriminator; // not inherited
    subschema.jtdMetadata = jtdMetadata; // not inherited
}
exports.extendSubschemaMode = extendSubschemaMode;
//# sourceMappingURL=subschema.js.map

/***/ }),

/***/ 3893:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.CodeGen = exports.Name = exports.nil = exports.stringify = exports.str = exports._ = exports.KeywordCxt = void 0;
var validate_1 = __nccwpck_require__(7881);
Object.defineProperty(exports, "KeywordCxt", ({ enumerable: true, get: function () { return validate_1.KeywordCxt; } }));
var codegen_1 = __nccwpck_require__(1436);
Object.defineProperty(exports, "_", ({ enumerable: true, get: function () { return codegen_1._; } }));
Object.defineProperty(exports, "str", ({ enumerable: true, get: function () { return codegen_1.str; } }));
Object.defineProperty(exports, "stringify", ({ enumerable: true, get: function () { return codegen_1.stringify; } }));
Object.defineProperty(exports, "nil", ({ enumerable: true, get: function () { return codegen_1.nil; } }));
Object.defineProperty(exports, "Name", ({ enumerable: true, get: function () { return codegen_1.Name; } }));
Object.defineProperty(exports, "CodeGen", ({ enumerable: true, get: function () { return codegen_1.CodeGen; } }));
const validation_error_1 = __nccwpck_require__(3021);
const ref_error_1 = __nccwpck_require__(3162);
const rules_1 = __nccwpck_require__(7353);
const compile_1 = __nccwpck_require__(2718);
const codegen_2 = __nccwpck_require__(1436);
const resolve_1 = __nccwpck_require__(4090);
const dataType_1 = __nccwpck_require__(6685);
const util_1 = __nccwpck_require__(4464);
const $dataRefSchema = __nccwpck_require__(3837);
const uri_1 = __nccwpck_require__(6285);
const defaultRegExp = (str, flags) => new RegExp(str, flags);
defaultRegExp.code = "new RegExp";
const META_IGNORE_OPTIONS = ["removeAdditional", "useDefaults", "coerceTypes"];
const EXT_SCOPE_NAMES = new Set([
    "validate",
    "serialize",
    "parse",
    "wrapper",
    "root",
    "schema",
    "keyword",
    "pattern",
    "formats",
    "validate$data",
    "func",
    "obj",
    "Error",
]);
const removedOptions = {
    errorDataPath: "",
    format: "`validateFormats: false` can be used instead.",
    nullable: '"nullable" keyword is supported by default.',
    jsonPointers: "Deprecated jsPropertySyntax can be used instead.",
    extendRefs: "Deprecated ignoreKeywordsWithRef can be used instead.",
    missingRefs: "Pass empty schema with $id that should be ignored to ajv.addSchema.",
    processCode: "Use option `code: {process: (code, schemaEnv: object) => string}`",
    sourceCode: "Use option `code: {source: true}`",
    strictDefaults: "It is default now, see option `strict`.",
    strictKeywords: "It is default now, see option `strict`.",
    uniqueItems: '"uniqueItems" keyword is always validated.',
    unknownFormats: "Disable strict mode or pass `true` to `ajv.addFormat` (or `formats` option).",
    cache: "Map is used as cache, schema object as key.",
    serialize: "Map is used as cache, schema object as key.",
    ajvErrors: "It is default now.",
};
const deprecatedOptions = {
    ignoreKeywordsWithRef: "",
    jsPropertySyntax: "",
    unicode: '"minLength"/"maxLength" account for unicode characters by default.',
};
const MAX_EXPRESSION = 200;
// eslint-disable-next-line complexity
function requiredOptions(o) {
    var _a, _b, _c, _d, _e, _f, _g, _h, _j, _k, _l, _m, _o, _p, _q, _r, _s, _t, _u, _v, _w, _x, _y, _z, _0;
    const s = o.strict;
    const _optz = (_a = o.code) === null || _a === void 0 ? void 0 : _a.optimize;
    const optimize = _optz === true || _optz === undefined ? 1 : _optz || 0;
    const regExp = (_c = (_b = o.code) === null || _b === void 0 ? void 0 : _b.regExp) !== null && _c !== void 0 ? _c : defaultRegExp;
    const uriResolver = (_d = o.uriResolver) !== null && _d !== void 0 ? _d : uri_1.default;
    return {
        strictSchema: (_f = (_e = o.strictSchema) !== null && _e !== void 0 ? _e : s) !== null && _f !== void 0 ? _f : true,
        strictNumbers: (_h = (_g = o.strictNumbers) !== null && _g !== void 0 ? _g : s) !== null && _h !== void 0 ? _h : true,
        strictTypes: (_k = (_j = o.strictTypes) !== null && _j !== void 0 ? _j : s) !== null && _k !== void 0 ? _k : "log",
        strictTuples: (_m = (_l = o.strictTuples) !== null && _l !== void 0 ? _l : s) !== null && _m !== void 0 ? _m : "log",
        strictRequired: (_p = (_o = o.strictRequired) !== null && _o !== void 0 ? _o : s) !== null && _p !== void 0 ? _p : false,
        code: o.code ? { ...o.code, optimize, regExp } : { optimize, regExp },
        loopRequired: (_q = o.loopRequired) !== null && _q !== void 0 ? _q : MAX_EXPRESSION,
        loopEnum: (_r = o.loopEnum) !== null && _r !== void 0 ? _r : MAX_EXPRESSION,
        meta: (_s = o.meta) !== null && _s !== void 0 ? _s : true,
        messages: (_t = o.messages) !== null && _t !== void 0 ? _t : true,
        inlineRefs: (_u = o.inlineRefs) !== null && _u !== void 0 ? _u : true,
        schemaId: (_v = o.schemaId) !== null && _v !== void 0 ? _v : "$id",
        addUsedSchema: (_w = o.addUsedSchema) !== null && _w !== void 0 ? _w : true,
        validateSchema: (_x = o.validateSchema) !== null && _x !== void 0 ? _x : true,
        validateFormats: (_y = o.validateFormats) !== null && _y !== void 0 ? _y : true,
        unicodeRegExp: (_z = o.unicodeRegExp) !== null && _z !== void 0 ? _z : true,
        int32range: (_0 = o.int32range) !== null && _0 !== void 0 ? _0 : true,
        uriResolver: uriResolver,
    };
}
class Ajv {
    constructor(opts = {}) {
        this.schemas = {};
        this.refs = {};
        this.formats = Object.create(null);
        this._compilations = new Set();
        this._loading = {};
        this._cache = new Map();
        opts = this.opts = { ...opts, ...requiredOptions(opts) };
        const { es5, lines } = this.opts.code;
        this.scope = new codegen_2.ValueScope({ scope: {}, prefixes: EXT_SCOPE_NAMES, es5, lines });
        this.logger = getLogger(opts.logger);
        const formatOpt = opts.validateFormats;
        opts.validateFormats = false;
        this.RULES = (0, rules_1.getRules)();
        checkOptions.call(this, removedOptions, opts, "NOT SUPPORTED");
        checkOptions.call(this, deprecatedOptions, opts, "DEPRECATED", "warn");
        this._metaOpts = getMetaSchemaOptions.call(this);
        if (opts.formats)
            addInitialFormats.call(this);
        this._addVocabularies();
        this._addDefaultMetaSchema();
        if (opts.keywords)
            addInitialKeywords.call(this, opts.keywords);
        if (typeof opts.meta == "object")
            this.addMetaSchema(opts.meta);
        addInitialSchemas.call(this);
        opts.validateFormats = formatOpt;
    }
    _addVocabularies() {
        this.addKeyword("$async");
    }
    _addDefaultMetaSchema() {
        const { $data, meta, schemaId } = this.opts;
        let _dataRefSchema = $dataRefSchema;
        if (schemaId === "id") {
            _dataRefSchema = { ...$dataRefSchema };
            _dataRefSchema.id = _dataRefSchema.$id;
            delete _dataRefSchema.$id;
        }
        if (meta && $data)
            this.addMetaSchema(_dataRefSchema, _dataRefSchema[schemaId], false);
    }
    defaultMeta() {
        const { meta, schemaId } = this.opts;
        return (this.opts.defaultMeta = typeof meta == "object" ? meta[schemaId] || meta : undefined);
    }
    validate(schemaKeyRef, // key, ref or schema object
    // eslint-disable-next-line @typescript-eslint/no-redundant-type-constituents
    data // to be validated
    ) {
        let v;
        if (typeof schemaKeyRef == "string") {
            v = this.getSchema(schemaKeyRef);
            if (!v)
                throw new Error(`no schema with key or ref "${schemaKeyRef}"`);
        }
        else {
            v = this.compile(schemaKeyRef);
        }
        const valid = v(data);
        if (!("$async" in v))
            this.errors = v.errors;
        return valid;
    }
    compile(schema, _meta) {
        const sch = this._addSchema(schema, _meta);
        return (sch.validate || this._compileSchemaEnv(sch));
    }
    compileAsync(schema, meta) {
        if (typeof this.opts.loadSchema != "function") {
            throw new Error("options.loadSchema should be a function");
        }
        const { loadSchema } = this.opts;
        return runCompileAsync.call(this, schema, meta);
        async function runCompileAsync(_schema, _meta) {
            await loadMetaSchema.call(this, _schema.$schema);
            const sch = this._addSchema(_schema, _meta);
            return sch.validate || _compileAsync.call(this, sch);
        }
        async function loadMetaSchema($ref) {
            if ($ref && !this.getSchema($ref)) {
                await runCompileAsync.call(this, { $ref }, true);
            }
        }
        async function _compileAsync(sch) {
            try {
                return this._compileSchemaEnv(sch);
            }
            catch (e) {
                if (!(e instanceof ref_error_1.default))
                    throw e;
                checkLoaded.call(this, e);
                await loadMissingSchema.call(this, e.missingSchema);
                return _compileAsync.call(this, sch);
            }
        }
        function checkLoaded({ missingSchema: ref, missingRef }) {
            if (this.refs[ref]) {
                throw new Error(`AnySchema ${ref} is loaded but ${missingRef} cannot be resolved`);
            }
        }
        async function loadMissingSchema(ref) {
            const _schema = await _loadSchema.call(this, ref);
            if (!this.refs[ref])
                await loadMetaSchema.call(this, _schema.$schema);
            if (!this.refs[ref])
                this.addSchema(_schema, ref, meta);
        }
        async function _loadSchema(ref) {
            const p = this._loading[ref];
            if (p)
                return p;
            try {
                return await (this._loading[ref] = loadSchema(ref));
            }
            finally {
                delete this._loading[ref];
            }
        }
    }
    // Adds schema to the instance
    addSchema(schema, // If array is passed, `key` will be ignored
    key, // Optional schema key. Can be passed to `validate` method instead of schema object or id/ref. One schema per instance can have empty `id` and `key`.
    _meta, // true if schema is a meta-schema. Used internally, addMetaSchema should be used instead.
    _validateSchema = this.opts.validateSchema // false to skip schema validation. Used internally, option validateSchema should be used instead.
    ) {
        if (Array.isArray(schema)) {
            for (const sch of schema)
                this.addSchema(sch, undefined, _meta, _validateSchema);
            return this;
        }
        let id;
        if (typeof schema === "object") {
            const { schemaId } = this.opts;
            id = schema[schemaId];
            if (id !== undefined && typeof id != "string") {
                throw new Error(`schema ${schemaId} must be string`);
            }
        }
        key = (0, resolve_1.normalizeId)(key || id);
        this._checkUnique(key);
        this.schemas[key] = this._addSchema(schema, _meta, key, _validateSchema, true);
        return this;
    }
    // Add schema that will be used to validate other schemas
    // options in META_IGNORE_OPTIONS are alway set to false
    addMetaSchema(schema, key, // schema key
    _validateSchema = this.opts.validateSchema // false to skip schema validation, can be used to override validateSchema option for meta-schema
    ) {
        this.addSchema(schema, key, true, _validateSchema);
        return this;
    }
    //  Validate schema against its meta-schema
    validateSchema(schema, throwOrLogError) {
        if (typeof schema == "boolean")
            return true;
        let $schema;
        $schema = schema.$schema;
        if ($schema !== undefined && typeof $schema != "string") {
            throw new Error("$schema must be a string");
        }
        $schema = $schema || this.opts.defaultMeta || this.defaultMeta();
        if (!$schema) {
            this.logger.warn("meta-schema not available");
            this.errors = null;
            return true;
        }
        const valid = this.validate($schema, schema);
        if (!valid && throwOrLogError) {
            const message = "schema is invalid: " + this.errorsText();
            if (this.opts.validateSchema === "log")
                this.logger.error(message);
            else
                throw new Error(message);
        }
        return valid;
    }
    // Get compiled schema by `key` or `ref`.
    // (`key` that was passed to `addSchema` or full schema reference - `schema.$id` or resolved id)
    getSchema(keyRef) {
        let sch;
        while (typeof (sch = getSchEnv.call(this, keyRef)) == "string")
            keyRef = sch;
        if (sch === undefined) {
            const { schemaId } = this.opts;
            const root = new compile_1.SchemaEnv({ schema: {}, schemaId });
            sch = compile_1.resolveSchema.call(this, root, keyRef);
            if (!sch)
                return;
            this.refs[keyRef] = sch;
        }
        return (sch.validate || this._compileSchemaEnv(sch));
    }
    // Remove cached schema(s).
    // If no parameter is passed all schemas but meta-schemas are removed.
    // If RegExp is passed all schemas with key/id matching pattern but meta-schemas are removed.
    // Even if schema is referenced by other schemas it still can be removed as other schemas have local references.
    removeSchema(schemaKeyRef) {
        if (schemaKeyRef instanceof RegExp) {
            this._removeAllSchemas(this.schemas, schemaKeyRef);
            this._removeAllSchemas(this.refs, schemaKeyRef);
            return this;
        }
        switch (typeof schemaKeyRef) {
            case "undefined":
                this._removeAllSchemas(this.schemas);
                this._removeAllSchemas(this.refs);
                this._cache.clear();
                return this;
            case "string": {
                const sch = getSchEnv.call(this, schemaKeyRef);
                if (typeof sch == "object")
                    this._cache.delete(sch.schema);
                delete this.schemas[schemaKeyRef];
                delete this.refs[schemaKeyRef];
                return this;
            }
            case "object": {
                const cacheKey = schemaKeyRef;
                this._cache.delete(cacheKey);
                let id = schemaKeyRef[this.opts.schemaId];
                if (id) {
                    id = (0, resolve_1.normalizeId)(id);
                    delete this.schemas[id];
                    delete this.refs[id];
                }
                return this;
            }
            default:
                throw new Error("ajv.removeSchema: invalid parameter");
        }
    }
    // add "vocabulary" - a collection of keywords
    addVocabulary(definitions) {
        for (const def of definitions)
            this.addKeyword(def);
        return this;
    }
    addKeyword(kwdOrDef, def // deprecated
    ) {
        let keyword;
        if (typeof kwdOrDef == "string") {
            keyword = kwdOrDef;
            if (typeof def == "object") {
                this.logger.warn("these parameters are deprecated, see docs for addKeyword");
                def.keyword = keyword;
            }
        }
        else if (typeof kwdOrDef == "object" && def === undefined) {
            def = kwdOrDef;
            keyword = def.keyword;
            if (Array.isArray(keyword) && !keyword.length) {
                throw new Error("addKeywords: keyword must be string or non-empty array");
            }
        }
        else {
            throw new Error("invalid addKeywords parameters");
        }
        checkKeyword.call(this, keyword, def);
        if (!def) {
            (0, util_1.eachItem)(keyword, (kwd) => addRule.call(this, kwd));
            return this;
        }
        keywordMetaschema.call(this, def);
        const definition = {
            ...def,
            type: (0, dataType_1.getJSONTypes)(def.type),
            schemaType: (0, dataType_1.getJSONTypes)(def.schemaType),
        };
        (0, util_1.eachItem)(keyword, definition.type.length === 0
            ? (k) => addRule.call(this, k, definition)
            : (k) => definition.type.forEach((t) => addRule.call(this, k, definition, t)));
        return this;
    }
    getKeyword(keyword) {
        const rule = this.RULES.all[keyword];
        return typeof rule == "object" ? rule.definition : !!rule;
    }
    // Remove keyword
    removeKeyword(keyword) {
        // TODO return type should be Ajv
        const { RULES } = this;
        delete RULES.keywords[keyword];
        delete RULES.all[keyword];
        for (const group of RULES.rules) {
            const i = group.rules.findIndex((rule) => rule.keyword === keyword);
            if (i >= 0)
                group.rules.splice(i, 1);
        }
        return this;
    }
    // Add format
    addFormat(name, format) {
        if (typeof format == "string")
            format = new RegExp(format);
        this.formats[name] = format;
        return this;
    }
    errorsText(errors = this.errors, // optional array of validation errors
    { separator = ", ", dataVar = "data" } = {} // optional options with properties `separator` and `dataVar`
    ) {
        if (!errors || errors.length === 0)
            return "No errors";
        return errors
            .map((e) => `${dataVar}${e.instancePath} ${e.message}`)
            .reduce((text, msg) => text + separator + msg);
    }
    $dataMetaSchema(metaSchema, keywordsJsonPointers) {
        const rules = this.RULES.all;
        metaSchema = JSON.parse(JSON.stringify(metaSchema));
        for (const jsonPointer of keywordsJsonPointers) {
            const segments = jsonPointer.split("/").slice(1); // first segment is an empty string
            let keywords = metaSchema;
            for (const seg of segments)
                keywords = keywords[seg];
            for (const key in rules) {
                const rule = rules[key];
                if (typeof rule != "object")
                    continue;
                const { $data } = rule.definition;
                const schema = keywords[key];
                if ($data && schema)
                    keywords[key] = schemaOrData(schema);
            }
        }
        return metaSchema;
    }
    _removeAllSchemas(schemas, regex) {
        for (const keyRef in schemas) {
            const sch = schemas[keyRef];
            if (!regex || regex.test(keyRef)) {
                if (typeof sch == "string") {
                    delete schemas[keyRef];
                }
                else if (sch && !sch.meta) {
                    this._cache.delete(sch.schema);
                    delete schemas[keyRef];
                }
            }
        }
    }
    _addSchema(schema, meta, baseId, validateSchema = this.opts.validateSchema, addSchema = this.opts.addUsedSchema) {
        let id;
        const { schemaId } = this.opts;
        if (typeof schema == "object") {
            id = schema[schemaId];
        }
        else {
            if (this.opts.jtd)
                throw new Error("schema must be object");
            else if (typeof schema != "boolean")
                throw new Error("schema must be object or boolean");
        }
        let sch = this._cache.get(schema);
        if (sch !== undefined)
            return sch;
        baseId = (0, resolve_1.normalizeId)(id || baseId);
        const localRefs = resolve_1.getSchemaRefs.call(this, schema, baseId);
        sch = new compile_1.SchemaEnv({ schema, schemaId, meta, baseId, localRefs });
        this._cache.set(sch.schema, sch);
        if (addSchema && !baseId.startsWith("#")) {
            // TODO atm it is allowed to overwrite schemas without id (instead of not adding them)
            if (baseId)
                this._checkUnique(baseId);
            this.refs[baseId] = sch;
        }
        if (validateSchema)
            this.validateSchema(schema, true);
        return sch;
    }
    _checkUnique(id) {
        if (this.schemas[id] || this.refs[id]) {
            throw new Error(`schema with key or id "${id}" already exists`);
        }
    }
    _compileSchemaEnv(sch) {
        if (sch.meta)
            this._compileMetaSchema(sch);
        else
            compile_1.compileSchema.call(this, sch);
        /* istanbul ignore if */
        if (!sch.validate)
            throw new Error("ajv implementation error");
        return sch.validate;
    }
    _compileMetaSchema(sch) {
        const currentOpts = this.opts;
        this.opts = this._metaOpts;
        try {
            compile_1.compileSchema.call(this, sch);
        }
        finally {
            this.opts = currentOpts;
        }
    }
}
Ajv.ValidationError = validation_error_1.default;
Ajv.MissingRefError = ref_error_1.default;
exports["default"] = Ajv;
function checkOptions(checkOpts, options, msg, log = "error") {
    for (const key in checkOpts) {
        const opt = key;
        if (opt in options)
            this.logger[log](`${msg}: option ${key}. ${checkOpts[opt]}`);
    }
}
function getSchEnv(keyRef) {
    keyRef = (0, resolve_1.normalizeId)(keyRef); // TODO tests fail without this line
    return this.schemas[keyRef] || this.refs[keyRef];
}
function addInitialSchemas() {
    const optsSchemas = this.opts.schemas;
    if (!optsSchemas)
        return;
    if (Array.isArray(optsSchemas))
        this.addSchema(optsSchemas);
    else
        for (const key in optsSchemas)
            this.addSchema(optsSchemas[key], key);
}
function addInitialFormats() {
    for (const name in this.opts.formats) {
        const format = this.opts.formats[name];
        if (format)
            this.addFormat(name, format);
    }
}
function addInitialKeywords(defs) {
    if (Array.isArray(defs)) {
        this.addVocabulary(defs);
        return;
    }
    this.logger.warn("keywords option as map is deprecated, pass array");
    for (const keyword in defs) {
        const def = defs[keyword];
        if (!def.keyword)
            def.keyword = keyword;
        this.addKeyword(def);
    }
}
function getMetaSchemaOptions() {
    const metaOpts = { ...this.opts };
    for (const opt of META_IGNORE_OPTIONS)
        delete metaOpts[opt];
    return metaOpts;
}
const noLogs = { log() { }, warn() { }, error() { } };
function getLogger(logger) {
    if (logger === false)
        return noLogs;
    if (logger === undefined)
        return console;
    if (logger.log && logger.warn && logger.error)
        return logger;
    throw new Error("logger must implement log, warn and error methods");
}
const KEYWORD_NAME = /^[a-z_$][a-z0-9_$:-]*$/i;
function checkKeyword(keyword, def) {
    const { RULES } = this;
    (0, util_1.eachItem)(keyword, (kwd) => {
        if (RULES.keywords[kwd])
            throw new Error(`Keyword ${kwd} is already defined`);
        if (!KEYWORD_NAME.test(kwd))
            throw new Error(`Keyword ${kwd} has invalid name`);
    });
    if (!def)
        return;
    if (def.$data && !("code" in def || "validate" in def)) {
        throw new Error('$data keyword must have "code" or "validate" function');
    }
}
function addRule(keyword, definition, dataType) {
    var _a;
    const post = definition === null || definition === void 0 ? void 0 : definition.post;
    if (dataType && post)
        throw new Error('keyword with "post" flag cannot have "type"');
    const { RULES } = this;
    let ruleGroup = post ? RULES.post : RULES.rules.find(({ type: t }) => t === dataType);
    if (!ruleGroup) {
        ruleGroup = { type: dataType, rules: [] };
        RULES.rules.push(ruleGroup);
    }
    RULES.keywords[keyword] = true;
    if (!definition)
        return;
    const rule = {
        keyword,
        definition: {
            ...definition,
            type: (0, dataType_1.getJSONTypes)(definition.type),
            schemaType: (0, dataType_1.getJSONTypes)(definition.schemaType),
        },
    };
    if (definition.before)
        addBeforeRule.call(this, ruleGroup, rule, definition.before);
    else
        ruleGroup.rules.push(rule);
    RULES.all[keyword] = rule;
    (_a = definition.implements) === null || _a === void 0 ? void 0 : _a.forEach((kwd) => this.addKeyword(kwd));
}
function addBeforeRule(ruleGroup, rule, before) {
    const i = ruleGroup.rules.findIndex((_rule) => _rule.keyword === before);
    if (i >= 0) {
        ruleGroup.rules.splice(i, 0, rule);
    }
    else {
        ruleGroup.rules.push(rule);
        this.logger.warn(`rule ${before} is not defined`);
    }
}
function keywordMetaschema(def) {
    let { metaSchema } = def;
    if (metaSchema === undefined)
        return;
    if (def.$data && this.opts.$data)
        metaSchema = schemaOrData(metaSchema);
    def.validateSchema = this.compile(metaSchema, true);
}
const $dataRef = {
    $ref: "https://raw.githubusercontent.com/ajv-validator/ajv/master/lib/refs/data.json#",
};
function schemaOrData(schema) {
    return { anyOf: [schema, $dataRef] };
}
//# sourceMappingURL=core.js.map

/***/ }),

/***/ 3995:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const metaSchema = __nccwpck_require__(1678);
const applicator = __nccwpck_require__(7216);
const unevaluated = __nccwpck_require__(9547);
const content = __nccwpck_require__(8226);
const core = __nccwpck_require__(518);
const format = __nccwpck_require__(4588);
const metadata = __nccwpck_require__(5707);
const validation = __nccwpck_require__(7082);
const META_SUPPORT_DATA = ["/properties"];
function addMetaSchema2020($data) {
    ;
    [
        metaSchema,
        applicator,
        unevaluated,
        content,
        core,
        with$data(this, format),
        metadata,
        with$data(this, validation),
    ].forEach((sch) => this.addMetaSchema(sch, undefined, false));
    return this;
    function with$data(ajv, sch) {
        return $data ? ajv.$dataMetaSchema(sch, META_SUPPORT_DATA) : sch;
    }
}
exports["default"] = addMetaSchema2020;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 4951:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
// https://github.com/ajv-validator/ajv/issues/889
const equal = __nccwpck_require__(3430);
equal.code = 'require("ajv/dist/runtime/equal").default';
exports["default"] = equal;
//# sourceMappingURL=equal.js.map

/***/ }),

/***/ 6214:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
// https://mathiasbynens.be/notes/javascript-encoding
// https://github.com/bestiejs/punycode.js - punycode.ucs2.decode
function ucs2length(str) {
    const len = str.length;
    let length = 0;
    let pos = 0;
    let value;
    while (pos < len) {
        length++;
        value = str.charCodeAt(pos++);
        if (value >= 0xd800 && value <= 0xdbff && pos < len) {
            // high surrogate, and there is a next character
            value = str.charCodeAt(pos);
            if ((value & 0xfc00) === 0xdc00)
                pos++; // low surrogate
        }
    }
    return length;
}
exports["default"] = ucs2length;
ucs2length.code = 'require("ajv/dist/runtime/ucs2length").default';
//# sourceMappingURL=ucs2length.js.map

/***/ }),

/***/ 6285:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const uri = __nccwpck_require__(4352);
uri.code = 'require("ajv/dist/runtime/uri").default';
exports["default"] = uri;
//# sourceMappingURL=uri.js.map

/***/ }),

/***/ 3021:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
class ValidationError extends Error {
    constructor(errors) {
        super("validation failed");
        this.errors = errors;
        this.ajv = this.validation = true;
    }
}
exports["default"] = ValidationError;
//# sourceMappingURL=validation_error.js.map

/***/ }),

/***/ 3448:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.validateAdditionalItems = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: ({ params: { len } }) => (0, codegen_1.str) `must NOT have more than ${len} items`,
    params: ({ params: { len } }) => (0, codegen_1._) `{limit: ${len}}`,
};
const def = {
    keyword: "additionalItems",
    type: "array",
    schemaType: ["boolean", "object"],
    before: "uniqueItems",
    error,
    code(cxt) {
        const { parentSchema, it } = cxt;
        const { items } = parentSchema;
        if (!Array.isArray(items)) {
            (0, util_1.checkStrictMode)(it, '"additionalItems" is ignored when "items" is not an array of schemas');
            return;
        }
        validateAdditionalItems(cxt, items);
    },
};
function validateAdditionalItems(cxt, items) {
    const { gen, schema, data, keyword, it } = cxt;
    it.items = true;
    const len = gen.const("len", (0, codegen_1._) `${data}.length`);
    if (schema === false) {
        cxt.setParams({ len: items.length });
        cxt.pass((0, codegen_1._) `${len} <= ${items.length}`);
    }
    else if (typeof schema == "object" && !(0, util_1.alwaysValidSchema)(it, schema)) {
        const valid = gen.var("valid", (0, codegen_1._) `${len} <= ${items.length}`); // TODO var
        gen.if((0, codegen_1.not)(valid), () => validateItems(valid));
        cxt.ok(valid);
    }
    function validateItems(valid) {
        gen.forRange("i", items.length, len, (i) => {
            cxt.subschema({ keyword, dataProp: i, dataPropType: util_1.Type.Num }, valid);
            if (!it.allErrors)
                gen.if((0, codegen_1.not)(valid), () => gen.break());
        });
    }
}
exports.validateAdditionalItems = validateAdditionalItems;
exports["default"] = def;
//# sourceMappingURL=additionalItems.js.map

/***/ }),

/***/ 2431:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const code_1 = __nccwpck_require__(8484);
const codegen_1 = __nccwpck_require__(1436);
const names_1 = __nccwpck_require__(630);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: "must NOT have additional properties",
    params: ({ params }) => (0, codegen_1._) `{additionalProperty: ${params.additionalProperty}}`,
};
const def = {
    keyword: "additionalProperties",
    type: ["object"],
    schemaType: ["boolean", "object"],
    allowUndefined: true,
    trackErrors: true,
    error,
    code(cxt) {
        const { gen, schema, parentSchema, data, errsCount, it } = cxt;
        /* istanbul ignore if */
        if (!errsCount)
            throw new Error("ajv implementation error");
        const { allErrors, opts } = it;
        it.props = true;
        if (opts.removeAdditional !== "all" && (0, util_1.alwaysValidSchema)(it, schema))
            return;
        const props = (0, code_1.allSchemaProperties)(parentSchema.properties);
        const patProps = (0, code_1.allSchemaProperties)(parentSchema.patternProperties);
        checkAdditionalProperties();
        cxt.ok((0, codegen_1._) `${errsCount} === ${names_1.default.errors}`);
        function checkAdditionalProperties() {
            gen.forIn("key", data, (key) => {
                if (!props.length && !patProps.length)
                    additionalPropertyCode(key);
                else
                    gen.if(isAdditional(key), () => additionalPropertyCode(key));
            });
        }
        function isAdditional(key) {
            let definedProp;
            if (props.length > 8) {
                // TODO maybe an option instead of hard-coded 8?
                const propsSchema = (0, util_1.schemaRefOrVal)(it, parentSchema.properties, "properties");
                definedProp = (0, code_1.isOwnProperty)(gen, propsSchema, key);
            }
            else if (props.length) {
                definedProp = (0, codegen_1.or)(...props.map((p) => (0, codegen_1._) `${key} === ${p}`));
            }
            else {
                definedProp = codegen_1.nil;
            }
            if (patProps.length) {
                definedProp = (0, codegen_1.or)(definedProp, ...patProps.map((p) => (0, codegen_1._) `${(0, code_1.usePattern)(cxt, p)}.test(${key})`));
            }
            return (0, codegen_1.not)(definedProp);
        }
        function deleteAdditional(key) {
            gen.code((0, codegen_1._) `delete ${data}[${key}]`);
        }
        function additionalPropertyCode(key) {
            if (opts.removeAdditional === "all" || (opts.removeAdditional && schema === false)) {
                deleteAdditional(key);
                return;
            }
            if (schema === false) {
                cxt.setParams({ additionalProperty: key });
                cxt.error();
                if (!allErrors)
                    gen.break();
                return;
            }
            if (typeof schema == "object" && !(0, util_1.alwaysValidSchema)(it, schema)) {
                const valid = gen.name("valid");
                if (opts.removeAdditional === "failing") {
                    applyAdditionalSchema(key, valid, false);
                    gen.if((0, codegen_1.not)(valid), () => {
                        cxt.reset();
                        deleteAdditional(key);
                    });
                }
                else {
                    applyAdditionalSchema(key, valid);
                    if (!allErrors)
                        gen.if((0, codegen_1.not)(valid), () => gen.break());
                }
            }
        }
        function applyAdditionalSchema(key, valid, errors) {
            const subschema = {
                keyword: "additionalProperties",
                dataProp: key,
                dataPropType: util_1.Type.Str,
            };
            if (errors === false) {
                Object.assign(subschema, {
                    compositeRule: true,
                    createErrors: false,
                    allErrors: false,
                });
            }
            cxt.subschema(subschema, valid);
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=additionalProperties.js.map

/***/ }),

/***/ 9205:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const util_1 = __nccwpck_require__(4464);
const def = {
    keyword: "allOf",
    schemaType: "array",
    code(cxt) {
        const { gen, schema, it } = cxt;
        /* istanbul ignore if */
        if (!Array.isArray(schema))
            throw new Error("ajv implementation error");
        const valid = gen.name("valid");
        schema.forEach((sch, i) => {
            if ((0, util_1.alwaysValidSchema)(it, sch))
                return;
            const schCxt = cxt.subschema({ keyword: "allOf", schemaProp: i }, valid);
            cxt.ok(valid);
            cxt.mergeEvaluated(schCxt);
        });
    },
};
exports["default"] = def;
//# sourceMappingURL=allOf.js.map

/***/ }),

/***/ 9380:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const code_1 = __nccwpck_require__(8484);
const def = {
    keyword: "anyOf",
    schemaType: "array",
    trackErrors: true,
    code: code_1.validateUnion,
    error: { message: "must match a schema in anyOf" },
};
exports["default"] = def;
//# sourceMappingURL=anyOf.js.map

/***/ }),

/***/ 6182:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: ({ params: { min, max } }) => max === undefined
        ? (0, codegen_1.str) `must contain at least ${min} valid item(s)`
        : (0, codegen_1.str) `must contain at least ${min} and no more than ${max} valid item(s)`,
    params: ({ params: { min, max } }) => max === undefined ? (0, codegen_1._) `{minContains: ${min}}` : (0, codegen_1._) `{minContains: ${min}, maxContains: ${max}}`,
};
const def = {
    keyword: "contains",
    type: "array",
    schemaType: ["object", "boolean"],
    before: "uniqueItems",
    trackErrors: true,
    error,
    code(cxt) {
        const { gen, schema, parentSchema, data, it } = cxt;
        let min;
        let max;
        const { minContains, maxContains } = parentSchema;
        if (it.opts.next) {
            min = minContains === undefined ? 1 : minContains;
            max = maxContains;
        }
        else {
            min = 1;
        }
        const len = gen.const("len", (0, codegen_1._) `${data}.length`);
        cxt.setParams({ min, max });
        if (max === undefined && min === 0) {
            (0, util_1.checkStrictMode)(it, `"minContains" == 0 without "maxContains": "contains" keyword ignored`);
            return;
        }
        if (max !== undefined && min > max) {
            (0, util_1.checkStrictMode)(it, `"minContains" > "maxContains" is always invalid`);
            cxt.fail();
            return;
        }
        if ((0, util_1.alwaysValidSchema)(it, schema)) {
            let cond = (0, codegen_1._) `${len} >= ${min}`;
            if (max !== undefined)
                cond = (0, codegen_1._) `${cond} && ${len} <= ${max}`;
            cxt.pass(cond);
            return;
        }
        it.items = true;
        const valid = gen.name("valid");
        if (max === undefined && min === 1) {
            validateItems(valid, () => gen.if(valid, () => gen.break()));
        }
        else if (min === 0) {
            gen.let(valid, true);
            if (max !== undefined)
                gen.if((0, codegen_1._) `${data}.length > 0`, validateItemsWithCount);
        }
        else {
            gen.let(valid, false);
            validateItemsWithCount();
        }
        cxt.result(valid, () => cxt.reset());
        function validateItemsWithCount() {
            const schValid = gen.name("_valid");
            const count = gen.let("count", 0);
            validateItems(schValid, () => gen.if(schValid, () => checkLimits(count)));
        }
        function validateItems(_valid, block) {
            gen.forRange("i", 0, len, (i) => {
                cxt.subschema({
                    keyword: "contains",
                    dataProp: i,
                    dataPropType: util_1.Type.Num,
                    compositeRule: true,
                }, _valid);
                block();
            });
        }
        function checkLimits(count) {
            gen.code((0, codegen_1._) `${count}++`);
            if (max === undefined) {
                gen.if((0, codegen_1._) `${count} >= ${min}`, () => gen.assign(valid, true).break());
            }
            else {
                gen.if((0, codegen_1._) `${count} > ${max}`, () => gen.assign(valid, false).break());
                if (min === 1)
                    gen.assign(valid, true);
                else
                    gen.if((0, codegen_1._) `${count} >= ${min}`, () => gen.assign(valid, true));
            }
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=contains.js.map

/***/ }),

/***/ 5826:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.validateSchemaDeps = exports.validatePropertyDeps = exports.error = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const code_1 = __nccwpck_require__(8484);
exports.error = {
    message: ({ params: { property, depsCount, deps } }) => {
        const property_ies = depsCount === 1 ? "property" : "properties";
        return (0, codegen_1.str) `must have ${property_ies} ${deps} when property ${property} is present`;
    },
    params: ({ params: { property, depsCount, deps, missingProperty } }) => (0, codegen_1._) `{property: ${property},
    missingProperty: ${missingProperty},
    depsCount: ${depsCount},
    deps: ${deps}}`, // TODO change to reference
};
const def = {
    keyword: "dependencies",
    type: "object",
    schemaType: "object",
    error: exports.error,
    code(cxt) {
        const [propDeps, schDeps] = splitDependencies(cxt);
        validatePropertyDeps(cxt, propDeps);
        validateSchemaDeps(cxt, schDeps);
    },
};
function splitDependencies({ schema }) {
    const propertyDeps = {};
    const schemaDeps = {};
    for (const key in schema) {
        if (key === "__proto__")
            continue;
        const deps = Array.isArray(schema[key]) ? propertyDeps : schemaDeps;
        deps[key] = schema[key];
    }
    return [propertyDeps, schemaDeps];
}
function validatePropertyDeps(cxt, propertyDeps = cxt.schema) {
    const { gen, data, it } = cxt;
    if (Object.keys(propertyDeps).length === 0)
        return;
    const missing = gen.let("missing");
    for (const prop in propertyDeps) {
        const deps = propertyDeps[prop];
        if (deps.length === 0)
            continue;
        const hasProperty = (0, code_1.propertyInData)(gen, data, prop, it.opts.ownProperties);
        cxt.setParams({
            property: prop,
            depsCount: deps.length,
            deps: deps.join(", "),
        });
        if (it.allErrors) {
            gen.if(hasProperty, () => {
                for (const depProp of deps) {
                    (0, code_1.checkReportMissingProp)(cxt, depProp);
                }
            });
        }
        else {
            gen.if((0, codegen_1._) `${hasProperty} && (${(0, code_1.checkMissingProp)(cxt, deps, missing)})`);
            (0, code_1.reportMissingProp)(cxt, missing);
            gen.else();
        }
    }
}
exports.validatePropertyDeps = validatePropertyDeps;
function validateSchemaDeps(cxt, schemaDeps = cxt.schema) {
    const { gen, data, keyword, it } = cxt;
    const valid = gen.name("valid");
    for (const prop in schemaDeps) {
        if ((0, util_1.alwaysValidSchema)(it, schemaDeps[prop]))
            continue;
        gen.if((0, code_1.propertyInData)(gen, data, prop, it.opts.ownProperties), () => {
            const schCxt = cxt.subschema({ keyword, schemaProp: prop }, valid);
            cxt.mergeValidEvaluated(schCxt, valid);
        }, () => gen.var(valid, true) // TODO var
        );
        cxt.ok(valid);
    }
}
exports.validateSchemaDeps = validateSchemaDeps;
exports["default"] = def;
//# sourceMappingURL=dependencies.js.map

/***/ }),

/***/ 3818:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const dependencies_1 = __nccwpck_require__(5826);
const def = {
    keyword: "dependentSchemas",
    type: "object",
    schemaType: "object",
    code: (cxt) => (0, dependencies_1.validateSchemaDeps)(cxt),
};
exports["default"] = def;
//# sourceMappingURL=dependentSchemas.js.map

/***/ }),

/***/ 8584:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: ({ params }) => (0, codegen_1.str) `must match "${params.ifClause}" schema`,
    params: ({ params }) => (0, codegen_1._) `{failingKeyword: ${params.ifClause}}`,
};
const def = {
    keyword: "if",
    schemaType: ["object", "boolean"],
    trackErrors: true,
    error,
    code(cxt) {
        const { gen, parentSchema, it } = cxt;
        if (parentSchema.then === undefined && parentSchema.else === undefined) {
            (0, util_1.checkStrictMode)(it, '"if" without "then" and "else" is ignored');
        }
        const hasThen = hasSchema(it, "then");
        const hasElse = hasSchema(it, "else");
        if (!hasThen && !hasElse)
            return;
        const valid = gen.let("valid", true);
        const schValid = gen.name("_valid");
        validateIf();
        cxt.reset();
        if (hasThen && hasElse) {
            const ifClause = gen.let("ifClause");
            cxt.setParams({ ifClause });
            gen.if(schValid, validateClause("then", ifClause), validateClause("else", ifClause));
        }
        else if (hasThen) {
            gen.if(schValid, validateClause("then"));
        }
        else {
            gen.if((0, codegen_1.not)(schValid), validateClause("else"));
        }
        cxt.pass(valid, () => cxt.error(true));
        function validateIf() {
            const schCxt = cxt.subschema({
                keyword: "if",
                compositeRule: true,
                createErrors: false,
                allErrors: false,
            }, schValid);
            cxt.mergeEvaluated(schCxt);
        }
        function validateClause(keyword, ifClause) {
            return () => {
                const schCxt = cxt.subschema({ keyword }, schValid);
                gen.assign(valid, schValid);
                cxt.mergeValidEvaluated(schCxt, valid);
                if (ifClause)
                    gen.assign(ifClause, (0, codegen_1._) `${keyword}`);
                else
                    cxt.setParams({ ifClause: keyword });
            };
        }
    },
};
function hasSchema(it, keyword) {
    const schema = it.schema[keyword];
    return schema !== undefined && !(0, util_1.alwaysValidSchema)(it, schema);
}
exports["default"] = def;
//# sourceMappingURL=if.js.map

/***/ }),

/***/ 8775:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const additionalItems_1 = __nccwpck_require__(3448);
const prefixItems_1 = __nccwpck_require__(6467);
const items_1 = __nccwpck_require__(5791);
const items2020_1 = __nccwpck_require__(2959);
const contains_1 = __nccwpck_require__(6182);
const dependencies_1 = __nccwpck_require__(5826);
const propertyNames_1 = __nccwpck_require__(1372);
const additionalProperties_1 = __nccwpck_require__(2431);
const properties_1 = __nccwpck_require__(8778);
const patternProperties_1 = __nccwpck_require__(664);
const not_1 = __nccwpck_require__(8350);
const anyOf_1 = __nccwpck_require__(9380);
const oneOf_1 = __nccwpck_require__(2490);
const allOf_1 = __nccwpck_require__(9205);
const if_1 = __nccwpck_require__(8584);
const thenElse_1 = __nccwpck_require__(6829);
function getApplicator(draft2020 = false) {
    const applicator = [
        // any
        not_1.default,
        anyOf_1.default,
        oneOf_1.default,
        allOf_1.default,
        if_1.default,
        thenElse_1.default,
        // object
        propertyNames_1.default,
        additionalProperties_1.default,
        dependencies_1.default,
        properties_1.default,
        patternProperties_1.default,
    ];
    // array
    if (draft2020)
        applicator.push(prefixItems_1.default, items2020_1.default);
    else
        applicator.push(additionalItems_1.default, items_1.default);
    applicator.push(contains_1.default);
    return applicator;
}
exports["default"] = getApplicator;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 5791:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.validateTuple = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const code_1 = __nccwpck_require__(8484);
const def = {
    keyword: "items",
    type: "array",
    schemaType: ["object", "array", "boolean"],
    before: "uniqueItems",
    code(cxt) {
        const { schema, it } = cxt;
        if (Array.isArray(schema))
            return validateTuple(cxt, "additionalItems", schema);
        it.items = true;
        if ((0, util_1.alwaysValidSchema)(it, schema))
            return;
        cxt.ok((0, code_1.validateArray)(cxt));
    },
};
function validateTuple(cxt, extraItems, schArr = cxt.schema) {
    const { gen, parentSchema, data, keyword, it } = cxt;
    checkStrictTuple(parentSchema);
    if (it.opts.unevaluated && schArr.length && it.items !== true) {
        it.items = util_1.mergeEvaluated.items(gen, schArr.length, it.items);
    }
    const valid = gen.name("valid");
    const len = gen.const("len", (0, codegen_1._) `${data}.length`);
    schArr.forEach((sch, i) => {
        if ((0, util_1.alwaysValidSchema)(it, sch))
            return;
        gen.if((0, codegen_1._) `${len} > ${i}`, () => cxt.subschema({
            keyword,
            schemaProp: i,
            dataProp: i,
        }, valid));
        cxt.ok(valid);
    });
    function checkStrictTuple(sch) {
        const { opts, errSchemaPath } = it;
        const l = schArr.length;
        const fullTuple = l === sch.minItems && (l === sch.maxItems || sch[extraItems] === false);
        if (opts.strictTuples && !fullTuple) {
            const msg = `"${keyword}" is ${l}-tuple, but minItems or maxItems/${extraItems} are not specified or different at path "${errSchemaPath}"`;
            (0, util_1.checkStrictMode)(it, msg, opts.strictTuples);
        }
    }
}
exports.validateTuple = validateTuple;
exports["default"] = def;
//# sourceMappingURL=items.js.map

/***/ }),

/***/ 2959:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const code_1 = __nccwpck_require__(8484);
const additionalItems_1 = __nccwpck_require__(3448);
const error = {
    message: ({ params: { len } }) => (0, codegen_1.str) `must NOT have more than ${len} items`,
    params: ({ params: { len } }) => (0, codegen_1._) `{limit: ${len}}`,
};
const def = {
    keyword: "items",
    type: "array",
    schemaType: ["object", "boolean"],
    before: "uniqueItems",
    error,
    code(cxt) {
        const { schema, parentSchema, it } = cxt;
        const { prefixItems } = parentSchema;
        it.items = true;
        if ((0, util_1.alwaysValidSchema)(it, schema))
            return;
        if (prefixItems)
            (0, additionalItems_1.validateAdditionalItems)(cxt, prefixItems);
        else
            cxt.ok((0, code_1.validateArray)(cxt));
    },
};
exports["default"] = def;
//# sourceMappingURL=items2020.js.map

/***/ }),

/***/ 8350:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const util_1 = __nccwpck_require__(4464);
const def = {
    keyword: "not",
    schemaType: ["object", "boolean"],
    trackErrors: true,
    code(cxt) {
        const { gen, schema, it } = cxt;
        if ((0, util_1.alwaysValidSchema)(it, schema)) {
            cxt.fail();
            return;
        }
        const valid = gen.name("valid");
        cxt.subschema({
            keyword: "not",
            compositeRule: true,
            createErrors: false,
            allErrors: false,
        }, valid);
        cxt.failResult(valid, () => cxt.reset(), () => cxt.error());
    },
    error: { message: "must NOT be valid" },
};
exports["default"] = def;
//# sourceMappingURL=not.js.map

/***/ }),

/***/ 2490:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: "must match exactly one schema in oneOf",
    params: ({ params }) => (0, codegen_1._) `{passingSchemas: ${params.passing}}`,
};
const def = {
    keyword: "oneOf",
    schemaType: "array",
    trackErrors: true,
    error,
    code(cxt) {
        const { gen, schema, parentSchema, it } = cxt;
        /* istanbul ignore if */
        if (!Array.isArray(schema))
            throw new Error("ajv implementation error");
        if (it.opts.discriminator && parentSchema.discriminator)
            return;
        const schArr = schema;
        const valid = gen.let("valid", false);
        const passing = gen.let("passing", null);
        const schValid = gen.name("_valid");
        cxt.setParams({ passing });
        // TODO possibly fail straight away (with warning or exception) if there are two empty always valid schemas
        gen.block(validateOneOf);
        cxt.result(valid, () => cxt.reset(), () => cxt.error(true));
        function validateOneOf() {
            schArr.forEach((sch, i) => {
                let schCxt;
                if ((0, util_1.alwaysValidSchema)(it, sch)) {
                    gen.var(schValid, true);
                }
                else {
                    schCxt = cxt.subschema({
                        keyword: "oneOf",
                        schemaProp: i,
                        compositeRule: true,
                    }, schValid);
                }
                if (i > 0) {
                    gen
                        .if((0, codegen_1._) `${schValid} && ${valid}`)
                        .assign(valid, false)
                        .assign(passing, (0, codegen_1._) `[${passing}, ${i}]`)
                        .else();
                }
                gen.if(schValid, () => {
                    gen.assign(valid, true);
                    gen.assign(passing, i);
                    if (schCxt)
                        cxt.mergeEvaluated(schCxt, codegen_1.Name);
                });
            });
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=oneOf.js.map

/***/ }),

/***/ 664:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const code_1 = __nccwpck_require__(8484);
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const util_2 = __nccwpck_require__(4464);
const def = {
    keyword: "patternProperties",
    type: "object",
    schemaType: "object",
    code(cxt) {
        const { gen, schema, data, parentSchema, it } = cxt;
        const { opts } = it;
        const patterns = (0, code_1.allSchemaProperties)(schema);
        const alwaysValidPatterns = patterns.filter((p) => (0, util_1.alwaysValidSchema)(it, schema[p]));
        if (patterns.length === 0 ||
            (alwaysValidPatterns.length === patterns.length &&
                (!it.opts.unevaluated || it.props === true))) {
            return;
        }
        const checkProperties = opts.strictSchema && !opts.allowMatchingProperties && parentSchema.properties;
        const valid = gen.name("valid");
        if (it.props !== true && !(it.props instanceof codegen_1.Name)) {
            it.props = (0, util_2.evaluatedPropsToName)(gen, it.props);
        }
        const { props } = it;
        validatePatternProperties();
        function validatePatternProperties() {
            for (const pat of patterns) {
                if (checkProperties)
                    checkMatchingProperties(pat);
                if (it.allErrors) {
                    validateProperties(pat);
                }
                else {
                    gen.var(valid, true); // TODO var
                    validateProperties(pat);
                    gen.if(valid);
                }
            }
        }
        function checkMatchingProperties(pat) {
            for (const prop in checkProperties) {
                if (new RegExp(pat).test(prop)) {
                    (0, util_1.checkStrictMode)(it, `property ${prop} matches pattern ${pat} (use allowMatchingProperties)`);
                }
            }
        }
        function validateProperties(pat) {
            gen.forIn("key", data, (key) => {
                gen.if((0, codegen_1._) `${(0, code_1.usePattern)(cxt, pat)}.test(${key})`, () => {
                    const alwaysValid = alwaysValidPatterns.includes(pat);
                    if (!alwaysValid) {
                        cxt.subschema({
                            keyword: "patternProperties",
                            schemaProp: pat,
                            dataProp: key,
                            dataPropType: util_2.Type.Str,
                        }, valid);
                    }
                    if (it.opts.unevaluated && props !== true) {
                        gen.assign((0, codegen_1._) `${props}[${key}]`, true);
                    }
                    else if (!alwaysValid && !it.allErrors) {
                        // can short-circuit if `unevaluatedProperties` is not supported (opts.next === false)
                        // or if all properties were evaluated (props === true)
                        gen.if((0, codegen_1.not)(valid), () => gen.break());
                    }
                });
            });
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=patternProperties.js.map

/***/ }),

/***/ 6467:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const items_1 = __nccwpck_require__(5791);
const def = {
    keyword: "prefixItems",
    type: "array",
    schemaType: ["array"],
    before: "uniqueItems",
    code: (cxt) => (0, items_1.validateTuple)(cxt, "items"),
};
exports["default"] = def;
//# sourceMappingURL=prefixItems.js.map

/***/ }),

/***/ 8778:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const validate_1 = __nccwpck_require__(7881);
const code_1 = __nccwpck_require__(8484);
const util_1 = __nccwpck_require__(4464);
const additionalProperties_1 = __nccwpck_require__(2431);
const def = {
    keyword: "properties",
    type: "object",
    schemaType: "object",
    code(cxt) {
        const { gen, schema, parentSchema, data, it } = cxt;
        if (it.opts.removeAdditional === "all" && parentSchema.additionalProperties === undefined) {
            additionalProperties_1.default.code(new validate_1.KeywordCxt(it, additionalProperties_1.default, "additionalProperties"));
        }
        const allProps = (0, code_1.allSchemaProperties)(schema);
        for (const prop of allProps) {
            it.definedProperties.add(prop);
        }
        if (it.opts.unevaluated && allProps.length && it.props !== true) {
            it.props = util_1.mergeEvaluated.props(gen, (0, util_1.toHash)(allProps), it.props);
        }
        const properties = allProps.filter((p) => !(0, util_1.alwaysValidSchema)(it, schema[p]));
        if (properties.length === 0)
            return;
        const valid = gen.name("valid");
        for (const prop of properties) {
            if (hasDefault(prop)) {
                applyPropertySchema(prop);
            }
            else {
                gen.if((0, code_1.propertyInData)(gen, data, prop, it.opts.ownProperties));
                applyPropertySchema(prop);
                if (!it.allErrors)
                    gen.else().var(valid, true);
                gen.endIf();
            }
            cxt.it.definedProperties.add(prop);
            cxt.ok(valid);
        }
        function hasDefault(prop) {
            return it.opts.useDefaults && !it.compositeRule && schema[prop].default !== undefined;
        }
        function applyPropertySchema(prop) {
            cxt.subschema({
                keyword: "properties",
                schemaProp: prop,
                dataProp: prop,
            }, valid);
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=properties.js.map

/***/ }),

/***/ 1372:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: "property name must be valid",
    params: ({ params }) => (0, codegen_1._) `{propertyName: ${params.propertyName}}`,
};
const def = {
    keyword: "propertyNames",
    type: "object",
    schemaType: ["object", "boolean"],
    error,
    code(cxt) {
        const { gen, schema, data, it } = cxt;
        if ((0, util_1.alwaysValidSchema)(it, schema))
            return;
        const valid = gen.name("valid");
        gen.forIn("key", data, (key) => {
            cxt.setParams({ propertyName: key });
            cxt.subschema({
                keyword: "propertyNames",
                data: key,
                dataTypes: ["string"],
                propertyName: key,
                compositeRule: true,
            }, valid);
            gen.if((0, codegen_1.not)(valid), () => {
                cxt.error(true);
                if (!it.allErrors)
                    gen.break();
            });
        });
        cxt.ok(valid);
    },
};
exports["default"] = def;
//# sourceMappingURL=propertyNames.js.map

/***/ }),

/***/ 6829:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const util_1 = __nccwpck_require__(4464);
const def = {
    keyword: ["then", "else"],
    schemaType: ["object", "boolean"],
    code({ keyword, parentSchema, it }) {
        if (parentSchema.if === undefined)
            (0, util_1.checkStrictMode)(it, `"${keyword}" without "if" is ignored`);
    },
};
exports["default"] = def;
//# sourceMappingURL=thenElse.js.map

/***/ }),

/***/ 8484:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.validateUnion = exports.validateArray = exports.usePattern = exports.callValidateCode = exports.schemaProperties = exports.allSchemaProperties = exports.noPropertyInData = exports.propertyInData = exports.isOwnProperty = exports.hasPropFunc = exports.reportMissingProp = exports.checkMissingProp = exports.checkReportMissingProp = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const names_1 = __nccwpck_require__(630);
const util_2 = __nccwpck_require__(4464);
function checkReportMissingProp(cxt, prop) {
    const { gen, data, it } = cxt;
    gen.if(noPropertyInData(gen, data, prop, it.opts.ownProperties), () => {
        cxt.setParams({ missingProperty: (0, codegen_1._) `${prop}` }, true);
        cxt.error();
    });
}
exports.checkReportMissingProp = checkReportMissingProp;
function checkMissingProp({ gen, data, it: { opts } }, properties, missing) {
    return (0, codegen_1.or)(...properties.map((prop) => (0, codegen_1.and)(noPropertyInData(gen, data, prop, opts.ownProperties), (0, codegen_1._) `${missing} = ${prop}`)));
}
exports.checkMissingProp = checkMissingProp;
function reportMissingProp(cxt, missing) {
    cxt.setParams({ missingProperty: missing }, true);
    cxt.error();
}
exports.reportMissingProp = reportMissingProp;
function hasPropFunc(gen) {
    return gen.scopeValue("func", {
        // eslint-disable-next-line @typescript-eslint/unbound-method
        ref: Object.prototype.hasOwnProperty,
        code: (0, codegen_1._) `Object.prototype.hasOwnProperty`,
    });
}
exports.hasPropFunc = hasPropFunc;
function isOwnProperty(gen, data, property) {
    return (0, codegen_1._) `${hasPropFunc(gen)}.call(${data}, ${property})`;
}
exports.isOwnProperty = isOwnProperty;
function propertyInData(gen, data, property, ownProperties) {
    const cond = (0, codegen_1._) `${data}${(0, codegen_1.getProperty)(property)} !== undefined`;
    return ownProperties ? (0, codegen_1._) `${cond} && ${isOwnProperty(gen, data, property)}` : cond;
}
exports.propertyInData = propertyInData;
function noPropertyInData(gen, data, property, ownProperties) {
    const cond = (0, codegen_1._) `${data}${(0, codegen_1.getProperty)(property)} === undefined`;
    return ownProperties ? (0, codegen_1.or)(cond, (0, codegen_1.not)(isOwnProperty(gen, data, property))) : cond;
}
exports.noPropertyInData = noPropertyInData;
function allSchemaProperties(schemaMap) {
    return schemaMap ? Object.keys(schemaMap).filter((p) => p !== "__proto__") : [];
}
exports.allSchemaProperties = allSchemaProperties;
function schemaProperties(it, schemaMap) {
    return allSchemaProperties(schemaMap).filter((p) => !(0, util_1.alwaysValidSchema)(it, schemaMap[p]));
}
exports.schemaProperties = schemaProperties;
function callValidateCode({ schemaCode, data, it: { gen, topSchemaRef, schemaPath, errorPath }, it }, func, context, passSchema) {
    const dataAndSchema = passSchema ? (0, codegen_1._) `${schemaCode}, ${data}, ${topSchemaRef}${schemaPath}` : data;
    const valCxt = [
        [names_1.default.instancePath, (0, codegen_1.strConcat)(names_1.default.instancePath, errorPath)],
        [names_1.default.parentData, it.parentData],
        [names_1.default.parentDataProperty, it.parentDataProperty],
        [names_1.default.rootData, names_1.default.rootData],
    ];
    if (it.opts.dynamicRef)
        valCxt.push([names_1.default.dynamicAnchors, names_1.default.dynamicAnchors]);
    const args = (0, codegen_1._) `${dataAndSchema}, ${gen.object(...valCxt)}`;
    return context !== codegen_1.nil ? (0, codegen_1._) `${func}.call(${context}, ${args})` : (0, codegen_1._) `${func}(${args})`;
}
exports.callValidateCode = callValidateCode;
const newRegExp = (0, codegen_1._) `new RegExp`;
function usePattern({ gen, it: { opts } }, pattern) {
    const u = opts.unicodeRegExp ? "u" : "";
    const { regExp } = opts.code;
    const rx = regExp(pattern, u);
    return gen.scopeValue("pattern", {
        key: rx.toString(),
        ref: rx,
        code: (0, codegen_1._) `${regExp.code === "new RegExp" ? newRegExp : (0, util_2.useFunc)(gen, regExp)}(${pattern}, ${u})`,
    });
}
exports.usePattern = usePattern;
function validateArray(cxt) {
    const { gen, data, keyword, it } = cxt;
    const valid = gen.name("valid");
    if (it.allErrors) {
        const validArr = gen.let("valid", true);
        validateItems(() => gen.assign(validArr, false));
        return validArr;
    }
    gen.var(valid, true);
    validateItems(() => gen.break());
    return valid;
    function validateItems(notValid) {
        const len = gen.const("len", (0, codegen_1._) `${data}.length`);
        gen.forRange("i", 0, len, (i) => {
            cxt.subschema({
                keyword,
                dataProp: i,
                dataPropType: util_1.Type.Num,
            }, valid);
            gen.if((0, codegen_1.not)(valid), notValid);
        });
    }
}
exports.validateArray = validateArray;
function validateUnion(cxt) {
    const { gen, schema, keyword, it } = cxt;
    /* istanbul ignore if */
    if (!Array.isArray(schema))
        throw new Error("ajv implementation error");
    const alwaysValid = schema.some((sch) => (0, util_1.alwaysValidSchema)(it, sch));
    if (alwaysValid && !it.opts.unevaluated)
        return;
    const valid = gen.let("valid", false);
    const schValid = gen.name("_valid");
    gen.block(() => schema.forEach((_sch, i) => {
        const schCxt = cxt.subschema({
            keyword,
            schemaProp: i,
            compositeRule: true,
        }, schValid);
        gen.assign(valid, (0, codegen_1._) `${valid} || ${schValid}`);
        const merged = cxt.mergeValidEvaluated(schCxt, schValid);
        // can short-circuit if `unevaluatedProperties/Items` not supported (opts.unevaluated !== true)
        // or if all properties and items were evaluated (it.props === true && it.items === true)
        if (!merged)
            gen.if((0, codegen_1.not)(valid));
    }));
    cxt.result(valid, () => cxt.reset(), () => cxt.error(true));
}
exports.validateUnion = validateUnion;
//# sourceMappingURL=code.js.map

/***/ }),

/***/ 9872:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const def = {
    keyword: "id",
    code() {
        throw new Error('NOT SUPPORTED: keyword "id", use "$id" for schema ID');
    },
};
exports["default"] = def;
//# sourceMappingURL=id.js.map

/***/ }),

/***/ 7397:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const id_1 = __nccwpck_require__(9872);
const ref_1 = __nccwpck_require__(2996);
const core = [
    "$schema",
    "$id",
    "$defs",
    "$vocabulary",
    { keyword: "$comment" },
    "definitions",
    id_1.default,
    ref_1.default,
];
exports["default"] = core;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 2996:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.callRef = exports.getValidate = void 0;
const ref_error_1 = __nccwpck_require__(3162);
const code_1 = __nccwpck_require__(8484);
const codegen_1 = __nccwpck_require__(1436);
const names_1 = __nccwpck_require__(630);
const compile_1 = __nccwpck_require__(2718);
const util_1 = __nccwpck_require__(4464);
const def = {
    keyword: "$ref",
    schemaType: "string",
    code(cxt) {
        const { gen, schema: $ref, it } = cxt;
        const { baseId, schemaEnv: env, validateName, opts, self } = it;
        const { root } = env;
        if (($ref === "#" || $ref === "#/") && baseId === root.baseId)
            return callRootRef();
        const schOrEnv = compile_1.resolveRef.call(self, root, baseId, $ref);
        if (schOrEnv === undefined)
            throw new ref_error_1.default(it.opts.uriResolver, baseId, $ref);
        if (schOrEnv instanceof compile_1.SchemaEnv)
            return callValidate(schOrEnv);
        return inlineRefSchema(schOrEnv);
        function callRootRef() {
            if (env === root)
                return callRef(cxt, validateName, env, env.$async);
            const rootName = gen.scopeValue("root", { ref: root });
            return callRef(cxt, (0, codegen_1._) `${rootName}.validate`, root, root.$async);
        }
        function callValidate(sch) {
            const v = getValidate(cxt, sch);
            callRef(cxt, v, sch, sch.$async);
        }
        function inlineRefSchema(sch) {
            const schName = gen.scopeValue("schema", opts.code.source === true ? { ref: sch, code: (0, codegen_1.stringify)(sch) } : { ref: sch });
            const valid = gen.name("valid");
            const schCxt = cxt.subschema({
                schema: sch,
                dataTypes: [],
                schemaPath: codegen_1.nil,
                topSchemaRef: schName,
                errSchemaPath: $ref,
            }, valid);
            cxt.mergeEvaluated(schCxt);
            cxt.ok(valid);
        }
    },
};
function getValidate(cxt, sch) {
    const { gen } = cxt;
    return sch.validate
        ? gen.scopeValue("validate", { ref: sch.validate })
        : (0, codegen_1._) `${gen.scopeValue("wrapper", { ref: sch })}.validate`;
}
exports.getValidate = getValidate;
function callRef(cxt, v, sch, $async) {
    const { gen, it } = cxt;
    const { allErrors, schemaEnv: env, opts } = it;
    const passCxt = opts.passContext ? names_1.default.this : codegen_1.nil;
    if ($async)
        callAsyncRef();
    else
        callSyncRef();
    function callAsyncRef() {
        if (!env.$async)
            throw new Error("async schema referenced by sync schema");
        const valid = gen.let("valid");
        gen.try(() => {
            gen.code((0, codegen_1._) `await ${(0, code_1.callValidateCode)(cxt, v, passCxt)}`);
            addEvaluatedFrom(v); // TODO will not work with async, it has to be returned with the result
            if (!allErrors)
                gen.assign(valid, true);
        }, (e) => {
            gen.if((0, codegen_1._) `!(${e} instanceof ${it.ValidationError})`, () => gen.throw(e));
            addErrorsFrom(e);
            if (!allErrors)
                gen.assign(valid, false);
        });
        cxt.ok(valid);
    }
    function callSyncRef() {
        cxt.result((0, code_1.callValidateCode)(cxt, v, passCxt), () => addEvaluatedFrom(v), () => addErrorsFrom(v));
    }
    function addErrorsFrom(source) {
        const errs = (0, codegen_1._) `${source}.errors`;
        gen.assign(names_1.default.vErrors, (0, codegen_1._) `${names_1.default.vErrors} === null ? ${errs} : ${names_1.default.vErrors}.concat(${errs})`); // TODO tagged
        gen.assign(names_1.default.errors, (0, codegen_1._) `${names_1.default.vErrors}.length`);
    }
    function addEvaluatedFrom(source) {
        var _a;
        if (!it.opts.unevaluated)
            return;
        const schEvaluated = (_a = sch === null || sch === void 0 ? void 0 : sch.validate) === null || _a === void 0 ? void 0 : _a.evaluated;
        // TODO refactor
        if (it.props !== true) {
            if (schEvaluated && !schEvaluated.dynamicProps) {
                if (schEvaluated.props !== undefined) {
                    it.props = util_1.mergeEvaluated.props(gen, schEvaluated.props, it.props);
                }
            }
            else {
                const props = gen.var("props", (0, codegen_1._) `${source}.evaluated.props`);
                it.props = util_1.mergeEvaluated.props(gen, props, it.props, codegen_1.Name);
            }
        }
        if (it.items !== true) {
            if (schEvaluated && !schEvaluated.dynamicItems) {
                if (schEvaluated.items !== undefined) {
                    it.items = util_1.mergeEvaluated.items(gen, schEvaluated.items, it.items);
                }
            }
            else {
                const items = gen.var("items", (0, codegen_1._) `${source}.evaluated.items`);
                it.items = util_1.mergeEvaluated.items(gen, items, it.items, codegen_1.Name);
            }
        }
    }
}
exports.callRef = callRef;
exports["default"] = def;
//# sourceMappingURL=ref.js.map

/***/ }),

/***/ 8886:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const types_1 = __nccwpck_require__(7115);
const compile_1 = __nccwpck_require__(2718);
const ref_error_1 = __nccwpck_require__(3162);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: ({ params: { discrError, tagName } }) => discrError === types_1.DiscrError.Tag
        ? `tag "${tagName}" must be string`
        : `value of tag "${tagName}" must be in oneOf`,
    params: ({ params: { discrError, tag, tagName } }) => (0, codegen_1._) `{error: ${discrError}, tag: ${tagName}, tagValue: ${tag}}`,
};
const def = {
    keyword: "discriminator",
    type: "object",
    schemaType: "object",
    error,
    code(cxt) {
        const { gen, data, schema, parentSchema, it } = cxt;
        const { oneOf } = parentSchema;
        if (!it.opts.discriminator) {
            throw new Error("discriminator: requires discriminator option");
        }
        const tagName = schema.propertyName;
        if (typeof tagName != "string")
            throw new Error("discriminator: requires propertyName");
        if (schema.mapping)
            throw new Error("discriminator: mapping is not supported");
        if (!oneOf)
            throw new Error("discriminator: requires oneOf keyword");
        const valid = gen.let("valid", false);
        const tag = gen.const("tag", (0, codegen_1._) `${data}${(0, codegen_1.getProperty)(tagName)}`);
        gen.if((0, codegen_1._) `typeof ${tag} == "string"`, () => validateMapping(), () => cxt.error(false, { discrError: types_1.DiscrError.Tag, tag, tagName }));
        cxt.ok(valid);
        function validateMapping() {
            const mapping = getMapping();
            gen.if(false);
            for (const tagValue in mapping) {
                gen.elseIf((0, codegen_1._) `${tag} === ${tagValue}`);
                gen.assign(valid, applyTagSchema(mapping[tagValue]));
            }
            gen.else();
            cxt.error(false, { discrError: types_1.DiscrError.Mapping, tag, tagName });
            gen.endIf();
        }
        function applyTagSchema(schemaProp) {
            const _valid = gen.name("valid");
            const schCxt = cxt.subschema({ keyword: "oneOf", schemaProp }, _valid);
            cxt.mergeEvaluated(schCxt, codegen_1.Name);
            return _valid;
        }
        function getMapping() {
            var _a;
            const oneOfMapping = {};
            const topRequired = hasRequired(parentSchema);
            let tagRequired = true;
            for (let i = 0; i < oneOf.length; i++) {
                let sch = oneOf[i];
                if ((sch === null || sch === void 0 ? void 0 : sch.$ref) && !(0, util_1.schemaHasRulesButRef)(sch, it.self.RULES)) {
                    const ref = sch.$ref;
                    sch = compile_1.resolveRef.call(it.self, it.schemaEnv.root, it.baseId, ref);
                    if (sch instanceof compile_1.SchemaEnv)
                        sch = sch.schema;
                    if (sch === undefined)
                        throw new ref_error_1.default(it.opts.uriResolver, it.baseId, ref);
                }
                const propSch = (_a = sch === null || sch === void 0 ? void 0 : sch.properties) === null || _a === void 0 ? void 0 : _a[tagName];
                if (typeof propSch != "object") {
                    throw new Error(`discriminator: oneOf subschemas (or referenced schemas) must have "properties/${tagName}"`);
                }
                tagRequired = tagRequired && (topRequired || hasRequired(sch));
                addMappings(propSch, i);
            }
            if (!tagRequired)
                throw new Error(`discriminator: "${tagName}" must be required`);
            return oneOfMapping;
            function hasRequired({ required }) {
                return Array.isArray(required) && required.includes(tagName);
            }
            function addMappings(sch, i) {
                if (sch.const) {
                    addMapping(sch.const, i);
                }
                else if (sch.enum) {
                    for (const tagValue of sch.enum) {
                        addMapping(tagValue, i);
                    }
                }
                else {
                    throw new Error(`discriminator: "properties/${tagName}" must have "const" or "enum"`);
                }
            }
            function addMapping(tagValue, i) {
                if (typeof tagValue != "string" || tagValue in oneOfMapping) {
                    throw new Error(`discriminator: "${tagName}" values must be unique strings`);
                }
                oneOfMapping[tagValue] = i;
            }
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 7115:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.DiscrError = void 0;
var DiscrError;
(function (DiscrError) {
    DiscrError["Tag"] = "tag";
    DiscrError["Mapping"] = "mapping";
})(DiscrError || (exports.DiscrError = DiscrError = {}));
//# sourceMappingURL=types.js.map

/***/ }),

/***/ 4298:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const core_1 = __nccwpck_require__(7397);
const validation_1 = __nccwpck_require__(5481);
const applicator_1 = __nccwpck_require__(8775);
const dynamic_1 = __nccwpck_require__(9923);
const next_1 = __nccwpck_require__(7844);
const unevaluated_1 = __nccwpck_require__(2010);
const format_1 = __nccwpck_require__(2601);
const metadata_1 = __nccwpck_require__(6620);
const draft2020Vocabularies = [
    dynamic_1.default,
    core_1.default,
    validation_1.default,
    (0, applicator_1.default)(true),
    format_1.default,
    metadata_1.metadataVocabulary,
    metadata_1.contentVocabulary,
    next_1.default,
    unevaluated_1.default,
];
exports["default"] = draft2020Vocabularies;
//# sourceMappingURL=draft2020.js.map

/***/ }),

/***/ 8639:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.dynamicAnchor = void 0;
const codegen_1 = __nccwpck_require__(1436);
const names_1 = __nccwpck_require__(630);
const compile_1 = __nccwpck_require__(2718);
const ref_1 = __nccwpck_require__(2996);
const def = {
    keyword: "$dynamicAnchor",
    schemaType: "string",
    code: (cxt) => dynamicAnchor(cxt, cxt.schema),
};
function dynamicAnchor(cxt, anchor) {
    const { gen, it } = cxt;
    it.schemaEnv.root.dynamicAnchors[anchor] = true;
    const v = (0, codegen_1._) `${names_1.default.dynamicAnchors}${(0, codegen_1.getProperty)(anchor)}`;
    const validate = it.errSchemaPath === "#" ? it.validateName : _getValidate(cxt);
    gen.if((0, codegen_1._) `!${v}`, () => gen.assign(v, validate));
}
exports.dynamicAnchor = dynamicAnchor;
function _getValidate(cxt) {
    const { schemaEnv, schema, self } = cxt.it;
    const { root, baseId, localRefs, meta } = schemaEnv.root;
    const { schemaId } = self.opts;
    const sch = new compile_1.SchemaEnv({ schema, schemaId, root, baseId, localRefs, meta });
    compile_1.compileSchema.call(self, sch);
    return (0, ref_1.getValidate)(cxt, sch);
}
exports["default"] = def;
//# sourceMappingURL=dynamicAnchor.js.map

/***/ }),

/***/ 5065:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.dynamicRef = void 0;
const codegen_1 = __nccwpck_require__(1436);
const names_1 = __nccwpck_require__(630);
const ref_1 = __nccwpck_require__(2996);
const def = {
    keyword: "$dynamicRef",
    schemaType: "string",
    code: (cxt) => dynamicRef(cxt, cxt.schema),
};
function dynamicRef(cxt, ref) {
    const { gen, keyword, it } = cxt;
    if (ref[0] !== "#")
        throw new Error(`"${keyword}" only supports hash fragment reference`);
    const anchor = ref.slice(1);
    if (it.allErrors) {
        _dynamicRef();
    }
    else {
        const valid = gen.let("valid", false);
        _dynamicRef(valid);
        cxt.ok(valid);
    }
    function _dynamicRef(valid) {
        // TODO the assumption here is that `recursiveRef: #` always points to the root
        // of the schema object, which is not correct, because there may be $id that
        // makes # point to it, and the target schema may not contain dynamic/recursiveAnchor.
        // Because of that 2 tests in recursiveRef.json fail.
        // This is a similar problem to #815 (`$id` doesn't alter resolution scope for `{ "$ref": "#" }`).
        // (This problem is not tested in JSON-Schema-Test-Suite)
        if (it.schemaEnv.root.dynamicAnchors[anchor]) {
            const v = gen.let("_v", (0, codegen_1._) `${names_1.default.dynamicAnchors}${(0, codegen_1.getProperty)(anchor)}`);
            gen.if(v, _callRef(v, valid), _callRef(it.validateName, valid));
        }
        else {
            _callRef(it.validateName, valid)();
        }
    }
    function _callRef(validate, valid) {
        return valid
            ? () => gen.block(() => {
                (0, ref_1.callRef)(cxt, validate);
                gen.let(valid, true);
            })
            : () => (0, ref_1.callRef)(cxt, validate);
    }
}
exports.dynamicRef = dynamicRef;
exports["default"] = def;
//# sourceMappingURL=dynamicRef.js.map

/***/ }),

/***/ 9923:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const dynamicAnchor_1 = __nccwpck_require__(8639);
const dynamicRef_1 = __nccwpck_require__(5065);
const recursiveAnchor_1 = __nccwpck_require__(9982);
const recursiveRef_1 = __nccwpck_require__(1794);
const dynamic = [dynamicAnchor_1.default, dynamicRef_1.default, recursiveAnchor_1.default, recursiveRef_1.default];
exports["default"] = dynamic;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 9982:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const dynamicAnchor_1 = __nccwpck_require__(8639);
const util_1 = __nccwpck_require__(4464);
const def = {
    keyword: "$recursiveAnchor",
    schemaType: "boolean",
    code(cxt) {
        if (cxt.schema)
            (0, dynamicAnchor_1.dynamicAnchor)(cxt, "");
        else
            (0, util_1.checkStrictMode)(cxt.it, "$recursiveAnchor: false is ignored");
    },
};
exports["default"] = def;
//# sourceMappingURL=recursiveAnchor.js.map

/***/ }),

/***/ 1794:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const dynamicRef_1 = __nccwpck_require__(5065);
const def = {
    keyword: "$recursiveRef",
    schemaType: "string",
    code: (cxt) => (0, dynamicRef_1.dynamicRef)(cxt, cxt.schema),
};
exports["default"] = def;
//# sourceMappingURL=recursiveRef.js.map

/***/ }),

/***/ 6402:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const error = {
    message: ({ schemaCode }) => (0, codegen_1.str) `must match format "${schemaCode}"`,
    params: ({ schemaCode }) => (0, codegen_1._) `{format: ${schemaCode}}`,
};
const def = {
    keyword: "format",
    type: ["number", "string"],
    schemaType: "string",
    $data: true,
    error,
    code(cxt, ruleType) {
        const { gen, data, $data, schema, schemaCode, it } = cxt;
        const { opts, errSchemaPath, schemaEnv, self } = it;
        if (!opts.validateFormats)
            return;
        if ($data)
            validate$DataFormat();
        else
            validateFormat();
        function validate$DataFormat() {
            const fmts = gen.scopeValue("formats", {
                ref: self.formats,
                code: opts.code.formats,
            });
            const fDef = gen.const("fDef", (0, codegen_1._) `${fmts}[${schemaCode}]`);
            const fType = gen.let("fType");
            const format = gen.let("format");
            // TODO simplify
            gen.if((0, codegen_1._) `typeof ${fDef} == "object" && !(${fDef} instanceof RegExp)`, () => gen.assign(fType, (0, codegen_1._) `${fDef}.type || "string"`).assign(format, (0, codegen_1._) `${fDef}.validate`), () => gen.assign(fType, (0, codegen_1._) `"string"`).assign(format, fDef));
            cxt.fail$data((0, codegen_1.or)(unknownFmt(), invalidFmt()));
            function unknownFmt() {
                if (opts.strictSchema === false)
                    return codegen_1.nil;
                return (0, codegen_1._) `${schemaCode} && !${format}`;
            }
            function invalidFmt() {
                const callFormat = schemaEnv.$async
                    ? (0, codegen_1._) `(${fDef}.async ? await ${format}(${data}) : ${format}(${data}))`
                    : (0, codegen_1._) `${format}(${data})`;
                const validData = (0, codegen_1._) `(typeof ${format} == "function" ? ${callFormat} : ${format}.test(${data}))`;
                return (0, codegen_1._) `${format} && ${format} !== true && ${fType} === ${ruleType} && !${validData}`;
            }
        }
        function validateFormat() {
            const formatDef = self.formats[schema];
            if (!formatDef) {
                unknownFormat();
                return;
            }
            if (formatDef === true)
                return;
            const [fmtType, format, fmtRef] = getFormat(formatDef);
            if (fmtType === ruleType)
                cxt.pass(validCondition());
            function unknownFormat() {
                if (opts.strictSchema === false) {
                    self.logger.warn(unknownMsg());
                    return;
                }
                throw new Error(unknownMsg());
                function unknownMsg() {
                    return `unknown format "${schema}" ignored in schema at path "${errSchemaPath}"`;
                }
            }
            function getFormat(fmtDef) {
                const code = fmtDef instanceof RegExp
                    ? (0, codegen_1.regexpCode)(fmtDef)
                    : opts.code.formats
                        ? (0, codegen_1._) `${opts.code.formats}${(0, codegen_1.getProperty)(schema)}`
                        : undefined;
                const fmt = gen.scopeValue("formats", { key: schema, ref: fmtDef, code });
                if (typeof fmtDef == "object" && !(fmtDef instanceof RegExp)) {
                    return [fmtDef.type || "string", fmtDef.validate, (0, codegen_1._) `${fmt}.validate`];
                }
                return ["string", fmtDef, fmt];
            }
            function validCondition() {
                if (typeof formatDef == "object" && !(formatDef instanceof RegExp) && formatDef.async) {
                    if (!schemaEnv.$async)
                        throw new Error("async format in sync schema");
                    return (0, codegen_1._) `await ${fmtRef}(${data})`;
                }
                return typeof format == "function" ? (0, codegen_1._) `${fmtRef}(${data})` : (0, codegen_1._) `${fmtRef}.test(${data})`;
            }
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=format.js.map

/***/ }),

/***/ 2601:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const format_1 = __nccwpck_require__(6402);
const format = [format_1.default];
exports["default"] = format;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 6620:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.contentVocabulary = exports.metadataVocabulary = void 0;
exports.metadataVocabulary = [
    "title",
    "description",
    "default",
    "deprecated",
    "readOnly",
    "writeOnly",
    "examples",
];
exports.contentVocabulary = [
    "contentMediaType",
    "contentEncoding",
    "contentSchema",
];
//# sourceMappingURL=metadata.js.map

/***/ }),

/***/ 7844:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const dependentRequired_1 = __nccwpck_require__(643);
const dependentSchemas_1 = __nccwpck_require__(3818);
const limitContains_1 = __nccwpck_require__(3907);
const next = [dependentRequired_1.default, dependentSchemas_1.default, limitContains_1.default];
exports["default"] = next;
//# sourceMappingURL=next.js.map

/***/ }),

/***/ 2010:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const unevaluatedProperties_1 = __nccwpck_require__(6855);
const unevaluatedItems_1 = __nccwpck_require__(4144);
const unevaluated = [unevaluatedProperties_1.default, unevaluatedItems_1.default];
exports["default"] = unevaluated;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 4144:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: ({ params: { len } }) => (0, codegen_1.str) `must NOT have more than ${len} items`,
    params: ({ params: { len } }) => (0, codegen_1._) `{limit: ${len}}`,
};
const def = {
    keyword: "unevaluatedItems",
    type: "array",
    schemaType: ["boolean", "object"],
    error,
    code(cxt) {
        const { gen, schema, data, it } = cxt;
        const items = it.items || 0;
        if (items === true)
            return;
        const len = gen.const("len", (0, codegen_1._) `${data}.length`);
        if (schema === false) {
            cxt.setParams({ len: items });
            cxt.fail((0, codegen_1._) `${len} > ${items}`);
        }
        else if (typeof schema == "object" && !(0, util_1.alwaysValidSchema)(it, schema)) {
            const valid = gen.var("valid", (0, codegen_1._) `${len} <= ${items}`);
            gen.if((0, codegen_1.not)(valid), () => validateItems(valid, items));
            cxt.ok(valid);
        }
        it.items = true;
        function validateItems(valid, from) {
            gen.forRange("i", from, len, (i) => {
                cxt.subschema({ keyword: "unevaluatedItems", dataProp: i, dataPropType: util_1.Type.Num }, valid);
                if (!it.allErrors)
                    gen.if((0, codegen_1.not)(valid), () => gen.break());
            });
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=unevaluatedItems.js.map

/***/ }),

/***/ 6855:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const names_1 = __nccwpck_require__(630);
const error = {
    message: "must NOT have unevaluated properties",
    params: ({ params }) => (0, codegen_1._) `{unevaluatedProperty: ${params.unevaluatedProperty}}`,
};
const def = {
    keyword: "unevaluatedProperties",
    type: "object",
    schemaType: ["boolean", "object"],
    trackErrors: true,
    error,
    code(cxt) {
        const { gen, schema, data, errsCount, it } = cxt;
        /* istanbul ignore if */
        if (!errsCount)
            throw new Error("ajv implementation error");
        const { allErrors, props } = it;
        if (props instanceof codegen_1.Name) {
            gen.if((0, codegen_1._) `${props} !== true`, () => gen.forIn("key", data, (key) => gen.if(unevaluatedDynamic(props, key), () => unevaluatedPropCode(key))));
        }
        else if (props !== true) {
            gen.forIn("key", data, (key) => props === undefined
                ? unevaluatedPropCode(key)
                : gen.if(unevaluatedStatic(props, key), () => unevaluatedPropCode(key)));
        }
        it.props = true;
        cxt.ok((0, codegen_1._) `${errsCount} === ${names_1.default.errors}`);
        function unevaluatedPropCode(key) {
            if (schema === false) {
                cxt.setParams({ unevaluatedProperty: key });
                cxt.error();
                if (!allErrors)
                    gen.break();
                return;
            }
            if (!(0, util_1.alwaysValidSchema)(it, schema)) {
                const valid = gen.name("valid");
                cxt.subschema({
                    keyword: "unevaluatedProperties",
                    dataProp: key,
                    dataPropType: util_1.Type.Str,
                }, valid);
                if (!allErrors)
                    gen.if((0, codegen_1.not)(valid), () => gen.break());
            }
        }
        function unevaluatedDynamic(evaluatedProps, key) {
            return (0, codegen_1._) `!${evaluatedProps} || !${evaluatedProps}[${key}]`;
        }
        function unevaluatedStatic(evaluatedProps, key) {
            const ps = [];
            for (const p in evaluatedProps) {
                if (evaluatedProps[p] === true)
                    ps.push((0, codegen_1._) `${key} !== ${p}`);
            }
            return (0, codegen_1.and)(...ps);
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=unevaluatedProperties.js.map

/***/ }),

/***/ 8026:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const equal_1 = __nccwpck_require__(4951);
const error = {
    message: "must be equal to constant",
    params: ({ schemaCode }) => (0, codegen_1._) `{allowedValue: ${schemaCode}}`,
};
const def = {
    keyword: "const",
    $data: true,
    error,
    code(cxt) {
        const { gen, data, $data, schemaCode, schema } = cxt;
        if ($data || (schema && typeof schema == "object")) {
            cxt.fail$data((0, codegen_1._) `!${(0, util_1.useFunc)(gen, equal_1.default)}(${data}, ${schemaCode})`);
        }
        else {
            cxt.fail((0, codegen_1._) `${schema} !== ${data}`);
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=const.js.map

/***/ }),

/***/ 643:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const dependencies_1 = __nccwpck_require__(5826);
const def = {
    keyword: "dependentRequired",
    type: "object",
    schemaType: "object",
    error: dependencies_1.error,
    code: (cxt) => (0, dependencies_1.validatePropertyDeps)(cxt),
};
exports["default"] = def;
//# sourceMappingURL=dependentRequired.js.map

/***/ }),

/***/ 3200:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const equal_1 = __nccwpck_require__(4951);
const error = {
    message: "must be equal to one of the allowed values",
    params: ({ schemaCode }) => (0, codegen_1._) `{allowedValues: ${schemaCode}}`,
};
const def = {
    keyword: "enum",
    schemaType: "array",
    $data: true,
    error,
    code(cxt) {
        const { gen, data, $data, schema, schemaCode, it } = cxt;
        if (!$data && schema.length === 0)
            throw new Error("enum must have non-empty array");
        const useLoop = schema.length >= it.opts.loopEnum;
        let eql;
        const getEql = () => (eql !== null && eql !== void 0 ? eql : (eql = (0, util_1.useFunc)(gen, equal_1.default)));
        let valid;
        if (useLoop || $data) {
            valid = gen.let("valid");
            cxt.block$data(valid, loopEnum);
        }
        else {
            /* istanbul ignore if */
            if (!Array.isArray(schema))
                throw new Error("ajv implementation error");
            const vSchema = gen.const("vSchema", schemaCode);
            valid = (0, codegen_1.or)(...schema.map((_x, i) => equalCode(vSchema, i)));
        }
        cxt.pass(valid);
        function loopEnum() {
            gen.assign(valid, false);
            gen.forOf("v", schemaCode, (v) => gen.if((0, codegen_1._) `${getEql()}(${data}, ${v})`, () => gen.assign(valid, true).break()));
        }
        function equalCode(vSchema, i) {
            const sch = schema[i];
            return typeof sch === "object" && sch !== null
                ? (0, codegen_1._) `${getEql()}(${data}, ${vSchema}[${i}])`
                : (0, codegen_1._) `${data} === ${sch}`;
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=enum.js.map

/***/ }),

/***/ 5481:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const limitNumber_1 = __nccwpck_require__(3723);
const multipleOf_1 = __nccwpck_require__(8132);
const limitLength_1 = __nccwpck_require__(6962);
const pattern_1 = __nccwpck_require__(6023);
const limitProperties_1 = __nccwpck_require__(895);
const required_1 = __nccwpck_require__(4504);
const limitItems_1 = __nccwpck_require__(6296);
const uniqueItems_1 = __nccwpck_require__(5132);
const const_1 = __nccwpck_require__(8026);
const enum_1 = __nccwpck_require__(3200);
const validation = [
    // number
    limitNumber_1.default,
    multipleOf_1.default,
    // string
    limitLength_1.default,
    pattern_1.default,
    // object
    limitProperties_1.default,
    required_1.default,
    // array
    limitItems_1.default,
    uniqueItems_1.default,
    // any
    { keyword: "type", schemaType: ["string", "array"] },
    { keyword: "nullable", schemaType: "boolean" },
    const_1.default,
    enum_1.default,
];
exports["default"] = validation;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 3907:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const util_1 = __nccwpck_require__(4464);
const def = {
    keyword: ["maxContains", "minContains"],
    type: "array",
    schemaType: "number",
    code({ keyword, parentSchema, it }) {
        if (parentSchema.contains === undefined) {
            (0, util_1.checkStrictMode)(it, `"${keyword}" without "contains" is ignored`);
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=limitContains.js.map

/***/ }),

/***/ 6296:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const error = {
    message({ keyword, schemaCode }) {
        const comp = keyword === "maxItems" ? "more" : "fewer";
        return (0, codegen_1.str) `must NOT have ${comp} than ${schemaCode} items`;
    },
    params: ({ schemaCode }) => (0, codegen_1._) `{limit: ${schemaCode}}`,
};
const def = {
    keyword: ["maxItems", "minItems"],
    type: "array",
    schemaType: "number",
    $data: true,
    error,
    code(cxt) {
        const { keyword, data, schemaCode } = cxt;
        const op = keyword === "maxItems" ? codegen_1.operators.GT : codegen_1.operators.LT;
        cxt.fail$data((0, codegen_1._) `${data}.length ${op} ${schemaCode}`);
    },
};
exports["default"] = def;
//# sourceMappingURL=limitItems.js.map

/***/ }),

/***/ 6962:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const ucs2length_1 = __nccwpck_require__(6214);
const error = {
    message({ keyword, schemaCode }) {
        const comp = keyword === "maxLength" ? "more" : "fewer";
        return (0, codegen_1.str) `must NOT have ${comp} than ${schemaCode} characters`;
    },
    params: ({ schemaCode }) => (0, codegen_1._) `{limit: ${schemaCode}}`,
};
const def = {
    keyword: ["maxLength", "minLength"],
    type: "string",
    schemaType: "number",
    $data: true,
    error,
    code(cxt) {
        const { keyword, data, schemaCode, it } = cxt;
        const op = keyword === "maxLength" ? codegen_1.operators.GT : codegen_1.operators.LT;
        const len = it.opts.unicode === false ? (0, codegen_1._) `${data}.length` : (0, codegen_1._) `${(0, util_1.useFunc)(cxt.gen, ucs2length_1.default)}(${data})`;
        cxt.fail$data((0, codegen_1._) `${len} ${op} ${schemaCode}`);
    },
};
exports["default"] = def;
//# sourceMappingURL=limitLength.js.map

/***/ }),

/***/ 3723:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const ops = codegen_1.operators;
const KWDs = {
    maximum: { okStr: "<=", ok: ops.LTE, fail: ops.GT },
    minimum: { okStr: ">=", ok: ops.GTE, fail: ops.LT },
    exclusiveMaximum: { okStr: "<", ok: ops.LT, fail: ops.GTE },
    exclusiveMinimum: { okStr: ">", ok: ops.GT, fail: ops.LTE },
};
const error = {
    message: ({ keyword, schemaCode }) => (0, codegen_1.str) `must be ${KWDs[keyword].okStr} ${schemaCode}`,
    params: ({ keyword, schemaCode }) => (0, codegen_1._) `{comparison: ${KWDs[keyword].okStr}, limit: ${schemaCode}}`,
};
const def = {
    keyword: Object.keys(KWDs),
    type: "number",
    schemaType: "number",
    $data: true,
    error,
    code(cxt) {
        const { keyword, data, schemaCode } = cxt;
        cxt.fail$data((0, codegen_1._) `${data} ${KWDs[keyword].fail} ${schemaCode} || isNaN(${data})`);
    },
};
exports["default"] = def;
//# sourceMappingURL=limitNumber.js.map

/***/ }),

/***/ 895:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const error = {
    message({ keyword, schemaCode }) {
        const comp = keyword === "maxProperties" ? "more" : "fewer";
        return (0, codegen_1.str) `must NOT have ${comp} than ${schemaCode} properties`;
    },
    params: ({ schemaCode }) => (0, codegen_1._) `{limit: ${schemaCode}}`,
};
const def = {
    keyword: ["maxProperties", "minProperties"],
    type: "object",
    schemaType: "number",
    $data: true,
    error,
    code(cxt) {
        const { keyword, data, schemaCode } = cxt;
        const op = keyword === "maxProperties" ? codegen_1.operators.GT : codegen_1.operators.LT;
        cxt.fail$data((0, codegen_1._) `Object.keys(${data}).length ${op} ${schemaCode}`);
    },
};
exports["default"] = def;
//# sourceMappingURL=limitProperties.js.map

/***/ }),

/***/ 8132:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const error = {
    message: ({ schemaCode }) => (0, codegen_1.str) `must be multiple of ${schemaCode}`,
    params: ({ schemaCode }) => (0, codegen_1._) `{multipleOf: ${schemaCode}}`,
};
const def = {
    keyword: "multipleOf",
    type: "number",
    schemaType: "number",
    $data: true,
    error,
    code(cxt) {
        const { gen, data, schemaCode, it } = cxt;
        // const bdt = bad$DataType(schemaCode, <string>def.schemaType, $data)
        const prec = it.opts.multipleOfPrecision;
        const res = gen.let("res");
        const invalid = prec
            ? (0, codegen_1._) `Math.abs(Math.round(${res}) - ${res}) > 1e-${prec}`
            : (0, codegen_1._) `${res} !== parseInt(${res})`;
        cxt.fail$data((0, codegen_1._) `(${schemaCode} === 0 || (${res} = ${data}/${schemaCode}, ${invalid}))`);
    },
};
exports["default"] = def;
//# sourceMappingURL=multipleOf.js.map

/***/ }),

/***/ 6023:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const code_1 = __nccwpck_require__(8484);
const util_1 = __nccwpck_require__(4464);
const codegen_1 = __nccwpck_require__(1436);
const error = {
    message: ({ schemaCode }) => (0, codegen_1.str) `must match pattern "${schemaCode}"`,
    params: ({ schemaCode }) => (0, codegen_1._) `{pattern: ${schemaCode}}`,
};
const def = {
    keyword: "pattern",
    type: "string",
    schemaType: "string",
    $data: true,
    error,
    code(cxt) {
        const { gen, data, $data, schema, schemaCode, it } = cxt;
        const u = it.opts.unicodeRegExp ? "u" : "";
        if ($data) {
            const { regExp } = it.opts.code;
            const regExpCode = regExp.code === "new RegExp" ? (0, codegen_1._) `new RegExp` : (0, util_1.useFunc)(gen, regExp);
            const valid = gen.let("valid");
            gen.try(() => gen.assign(valid, (0, codegen_1._) `${regExpCode}(${schemaCode}, ${u}).test(${data})`), () => gen.assign(valid, false));
            cxt.fail$data((0, codegen_1._) `!${valid}`);
        }
        else {
            const regExp = (0, code_1.usePattern)(cxt, schema);
            cxt.fail$data((0, codegen_1._) `!${regExp}.test(${data})`);
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=pattern.js.map

/***/ }),

/***/ 4504:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const code_1 = __nccwpck_require__(8484);
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: ({ params: { missingProperty } }) => (0, codegen_1.str) `must have required property '${missingProperty}'`,
    params: ({ params: { missingProperty } }) => (0, codegen_1._) `{missingProperty: ${missingProperty}}`,
};
const def = {
    keyword: "required",
    type: "object",
    schemaType: "array",
    $data: true,
    error,
    code(cxt) {
        const { gen, schema, schemaCode, data, $data, it } = cxt;
        const { opts } = it;
        if (!$data && schema.length === 0)
            return;
        const useLoop = schema.length >= opts.loopRequired;
        if (it.allErrors)
            allErrorsMode();
        else
            exitOnErrorMode();
        if (opts.strictRequired) {
            const props = cxt.parentSchema.properties;
            const { definedProperties } = cxt.it;
            for (const requiredKey of schema) {
                if ((props === null || props === void 0 ? void 0 : props[requiredKey]) === undefined && !definedProperties.has(requiredKey)) {
                    const schemaPath = it.schemaEnv.baseId + it.errSchemaPath;
                    const msg = `required property "${requiredKey}" is not defined at "${schemaPath}" (strictRequired)`;
                    (0, util_1.checkStrictMode)(it, msg, it.opts.strictRequired);
                }
            }
        }
        function allErrorsMode() {
            if (useLoop || $data) {
                cxt.block$data(codegen_1.nil, loopAllRequired);
            }
            else {
                for (const prop of schema) {
                    (0, code_1.checkReportMissingProp)(cxt, prop);
                }
            }
        }
        function exitOnErrorMode() {
            const missing = gen.let("missing");
            if (useLoop || $data) {
                const valid = gen.let("valid", true);
                cxt.block$data(valid, () => loopUntilMissing(missing, valid));
                cxt.ok(valid);
            }
            else {
                gen.if((0, code_1.checkMissingProp)(cxt, schema, missing));
                (0, code_1.reportMissingProp)(cxt, missing);
                gen.else();
            }
        }
        function loopAllRequired() {
            gen.forOf("prop", schemaCode, (prop) => {
                cxt.setParams({ missingProperty: prop });
                gen.if((0, code_1.noPropertyInData)(gen, data, prop, opts.ownProperties), () => cxt.error());
            });
        }
        function loopUntilMissing(missing, valid) {
            cxt.setParams({ missingProperty: missing });
            gen.forOf(missing, schemaCode, () => {
                gen.assign(valid, (0, code_1.propertyInData)(gen, data, missing, opts.ownProperties));
                gen.if((0, codegen_1.not)(valid), () => {
                    cxt.error();
                    gen.break();
                });
            }, codegen_1.nil);
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=required.js.map

/***/ }),

/***/ 5132:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const dataType_1 = __nccwpck_require__(6685);
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const equal_1 = __nccwpck_require__(4951);
const error = {
    message: ({ params: { i, j } }) => (0, codegen_1.str) `must NOT have duplicate items (items ## ${j} and ${i} are identical)`,
    params: ({ params: { i, j } }) => (0, codegen_1._) `{i: ${i}, j: ${j}}`,
};
const def = {
    keyword: "uniqueItems",
    type: "array",
    schemaType: "boolean",
    $data: true,
    error,
    code(cxt) {
        const { gen, data, $data, schema, parentSchema, schemaCode, it } = cxt;
        if (!$data && !schema)
            return;
        const valid = gen.let("valid");
        const itemTypes = parentSchema.items ? (0, dataType_1.getSchemaTypes)(parentSchema.items) : [];
        cxt.block$data(valid, validateUniqueItems, (0, codegen_1._) `${schemaCode} === false`);
        cxt.ok(valid);
        function validateUniqueItems() {
            const i = gen.let("i", (0, codegen_1._) `${data}.length`);
            const j = gen.let("j");
            cxt.setParams({ i, j });
            gen.assign(valid, true);
            gen.if((0, codegen_1._) `${i} > 1`, () => (canOptimize() ? loopN : loopN2)(i, j));
        }
        function canOptimize() {
            return itemTypes.length > 0 && !itemTypes.some((t) => t === "object" || t === "array");
        }
        function loopN(i, j) {
            const item = gen.name("item");
            const wrongType = (0, dataType_1.checkDataTypes)(itemTypes, item, it.opts.strictNumbers, dataType_1.DataType.Wrong);
            const indices = gen.const("indices", (0, codegen_1._) `{}`);
            gen.for((0, codegen_1._) `;${i}--;`, () => {
                gen.let(item, (0, codegen_1._) `${data}[${i}]`);
                gen.if(wrongType, (0, codegen_1._) `continue`);
                if (itemTypes.length > 1)
                    gen.if((0, codegen_1._) `typeof ${item} == "string"`, (0, codegen_1._) `${item} += "_"`);
                gen
                    .if((0, codegen_1._) `typeof ${indices}[${item}] == "number"`, () => {
                    gen.assign(j, (0, codegen_1._) `${indices}[${item}]`);
                    cxt.error();
                    gen.assign(valid, false).break();
                })
                    .code((0, codegen_1._) `${indices}[${item}] = ${i}`);
            });
        }
        function loopN2(i, j) {
            const eql = (0, util_1.useFunc)(gen, equal_1.default);
            const outer = gen.name("outer");
            gen.label(outer).for((0, codegen_1._) `;${i}--;`, () => gen.for((0, codegen_1._) `${j} = ${i}; ${j}--;`, () => gen.if((0, codegen_1._) `${eql}(${data}[${i}], ${data}[${j}])`, () => {
                cxt.error();
                gen.assign(valid, false).break(outer);
            })));
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=uniqueItems.js.map

/***/ }),

/***/ 3430:
/***/ ((module) => {



// do not edit .js files directly - edit src/index.jst



module.exports = function equal(a, b) {
  if (a === b) return true;

  if (a && b && typeof a == 'object' && typeof b == 'object') {
    if (a.constructor !== b.constructor) return false;

    var length, i, keys;
    if (Array.isArray(a)) {
      length = a.length;
      if (length != b.length) return false;
      for (i = length; i-- !== 0;)
        if (!equal(a[i], b[i])) return false;
      return true;
    }



    if (a.constructor === RegExp) return a.source === b.source && a.flags === b.flags;
    if (a.valueOf !== Object.prototype.valueOf) return a.valueOf() === b.valueOf();
    if (a.toString !== Object.prototype.toString) return a.toString() === b.toString();

    keys = Object.keys(a);
    length = keys.length;
    if (length !== Object.keys(b).length) return false;

    for (i = length; i-- !== 0;)
      if (!Object.prototype.hasOwnProperty.call(b, keys[i])) return false;

    for (i = length; i-- !== 0;) {
      var key = keys[i];

      if (!equal(a[key], b[key])) return false;
    }

    return true;
  }

  // true if both NaN, false otherwise
  return a!==a && b!==b;
};


/***/ }),

/***/ 1167:
/***/ ((module) => {



var traverse = module.exports = function (schema, opts, cb) {
  // Legacy support for v0.3.1 and earlier.
  if (typeof opts == 'function') {
    cb = opts;
    opts = {};
  }

  cb = opts.cb || cb;
  var pre = (typeof cb == 'function') ? cb : cb.pre || function() {};
  var post = cb.post || function() {};

  _traverse(opts, pre, post, schema, '', schema);
};


traverse.keywords = {
  additionalItems: true,
  items: true,
  contains: true,
  additionalProperties: true,
  propertyNames: true,
  not: true,
  if: true,
  then: true,
  else: true
};

traverse.arrayKeywords = {
  items: true,
  allOf: true,
  anyOf: true,
  oneOf: true
};

traverse.propsKeywords = {
  $defs: true,
  definitions: true,
  properties: true,
  patternProperties: true,
  dependencies: true
};

traverse.skipKeywords = {
  default: true,
  enum: true,
  const: true,
  required: true,
  maximum: true,
  minimum: true,
  exclusiveMaximum: true,
  exclusiveMinimum: true,
  multipleOf: true,
  maxLength: true,
  minLength: true,
  pattern: true,
  format: true,
  maxItems: true,
  minItems: true,
  uniqueItems: true,
  maxProperties: true,
  minProperties: true
};


function _traverse(opts, pre, post, schema, jsonPtr, rootSchema, parentJsonPtr, parentKeyword, parentSchema, keyIndex) {
  if (schema && typeof schema == 'object' && !Array.isArray(schema)) {
    pre(schema, jsonPtr, rootSchema, parentJsonPtr, parentKeyword, parentSchema, keyIndex);
    for (var key in schema) {
      var sch = schema[key];
      if (Array.isArray(sch)) {
        if (key in traverse.arrayKeywords) {
          for (var i=0; i<sch.length; i++)
            _traverse(opts, pre, post, sch[i], jsonPtr + '/' + key + '/' + i, rootSchema, jsonPtr, key, schema, i);
        }
      } else if (key in traverse.propsKeywords) {
        if (sch && typeof sch == 'object') {
          for (var prop in sch)
            _traverse(opts, pre, post, sch[prop], jsonPtr + '/' + key + '/' + escapeJsonPtr(prop), rootSchema, jsonPtr, key, schema, prop);
        }
      } else if (key in traverse.keywords || (opts.allKeys && !(key in traverse.skipKeywords))) {
        _traverse(opts, pre, post, sch, jsonPtr + '/' + key, rootSchema, jsonPtr, key, schema);
      }
    }
    post(schema, jsonPtr, rootSchema, parentJsonPtr, parentKeyword, parentSchema, keyIndex);
  }
}


function escapeJsonPtr(str) {
  return str.replace(/~/g, '~0').replace(/\//g, '~1');
}


/***/ }),

/***/ 2613:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("assert");

/***/ }),

/***/ 181:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("buffer");

/***/ }),

/***/ 5317:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("child_process");

/***/ }),

/***/ 6982:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("crypto");

/***/ }),

/***/ 4434:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("events");

/***/ }),

/***/ 9896:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("fs");

/***/ }),

/***/ 8611:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("http");

/***/ }),

/***/ 5692:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("https");

/***/ }),

/***/ 9278:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("net");

/***/ }),

/***/ 4589:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:assert");

/***/ }),

/***/ 6698:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:async_hooks");

/***/ }),

/***/ 4573:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:buffer");

/***/ }),

/***/ 1421:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:child_process");

/***/ }),

/***/ 7540:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:console");

/***/ }),

/***/ 7598:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:crypto");

/***/ }),

/***/ 3053:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:diagnostics_channel");

/***/ }),

/***/ 610:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:dns");

/***/ }),

/***/ 8474:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:events");

/***/ }),

/***/ 3024:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:fs");

/***/ }),

/***/ 7067:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:http");

/***/ }),

/***/ 2467:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:http2");

/***/ }),

/***/ 8995:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:module");

/***/ }),

/***/ 7030:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:net");

/***/ }),

/***/ 8161:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:os");

/***/ }),

/***/ 6760:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:path");

/***/ }),

/***/ 5881:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:perf_hooks");

/***/ }),

/***/ 1792:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:querystring");

/***/ }),

/***/ 7075:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:stream");

/***/ }),

/***/ 1692:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:tls");

/***/ }),

/***/ 3136:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:url");

/***/ }),

/***/ 7975:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:util");

/***/ }),

/***/ 3429:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:util/types");

/***/ }),

/***/ 5919:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:worker_threads");

/***/ }),

/***/ 8522:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:zlib");

/***/ }),

/***/ 857:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("os");

/***/ }),

/***/ 6928:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("path");

/***/ }),

/***/ 932:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("process");

/***/ }),

/***/ 3193:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("string_decoder");

/***/ }),

/***/ 3557:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("timers");

/***/ }),

/***/ 4756:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("tls");

/***/ }),

/***/ 9023:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("util");

/***/ }),

/***/ 4352:
/***/ ((module, __unused_webpack_exports, __nccwpck_require__) => {



const { normalizeIPv6, removeDotSegments, removeDotSegmentsRelative, recomposeAuthority, normalizePercentEncoding, normalizePathEncoding, serializePathEncoding, normalizeQueryFragmentEncoding, encodeQuery, encodeFragment, reescapeHostDelimiters, isIPv4, nonSimpleDomain } = __nccwpck_require__(5077)
const { SCHEMES, getSchemeHandler } = __nccwpck_require__(5300)

const VALID_SCHEME = /^[A-Za-z][A-Za-z0-9+.-]*$/u
const MALFORMED_SCHEME_ERROR = 'URI scheme is malformed.'
const MALFORMED_HOST_ERROR = 'URI host is malformed.'
// ASCII characters outside the RFC 3986 reg-name set (unreserved, sub-delims
// and "%" for pct-encoded): C0 controls, space, DEL, and "#/:<>?@[\]^`{|}.
const FORBIDDEN_DOMAIN_HOST_CHARACTER = /[\0-\x20"#/:<>?@[\\\]^`{|}\x7F]/u

/**
 * RFC 3986 section 3.1 does not allow percent-encoding in a scheme, so the
 * scheme is validated as-is and never decoded. Decoding would let inert input
 * such as `%6Aavascript:` become a live `javascript:` scheme.
 *
 * @param {string} scheme
 * @returns {string}
 */
function validateScheme (scheme) {
  const stringScheme = String(scheme)
  if (!VALID_SCHEME.test(stringScheme)) {
    throw new TypeError(MALFORMED_SCHEME_ERROR)
  }
  return stringScheme
}

/**
 * @template {import('./types/index').URIComponent|string} T
 * @param {T} uri
 * @param {import('./types/index').Options} [options]
 * @returns {T}
 */
function normalize (uri, options) {
  if (typeof uri === 'string') {
    uri = /** @type {T} */ (normalizeString(uri, options))
  } else if (typeof uri === 'object') {
    uri = /** @type {T} */ (parse(serialize(uri, options), options))
  }
  return uri
}

/**
 * @param {string} baseURI
 * @param {string} relativeURI
 * @param {import('./types/index').Options} [options]
 * @returns {string}
 */
function resolve (baseURI, relativeURI, options) {
  const schemelessOptions = options ? Object.assign({ scheme: 'null' }, options) : { scheme: 'null' }
  const {
    parsed: baseParsed,
    malformedAuthorityOrPort: baseMalformed,
    malformedPercentEncoding: baseMalformedPercentEncoding,
    malformedSchemeSpecific: baseMalformedSchemeSpecific,
    malformedHost: baseMalformedHost,
    malformedScheme: baseMalformedScheme
  } = parseWithStatus(baseURI, schemelessOptions)
  const {
    parsed: relativeParsed,
    malformedAuthorityOrPort: relativeMalformed,
    malformedPercentEncoding: relativeMalformedPercentEncoding,
    malformedSchemeSpecific: relativeMalformedSchemeSpecific,
    malformedHost: relativeMalformedHost,
    malformedScheme: relativeMalformedScheme
  } = parseWithStatus(relativeURI, schemelessOptions)
  if (
    baseMalformed ||
    relativeMalformed ||
    baseMalformedPercentEncoding ||
    relativeMalformedPercentEncoding ||
    baseMalformedSchemeSpecific ||
    relativeMalformedSchemeSpecific ||
    baseMalformedHost ||
    relativeMalformedHost ||
    baseMalformedScheme ||
    relativeMalformedScheme
  ) {
    throw new Error(baseParsed.error || relativeParsed.error || 'URI is malformed.')
  }
  const resolved = resolveComponent(baseParsed, relativeParsed, schemelessOptions, true)
  const resolvedSchemeHandler = getSchemeHandler((options && options.scheme) || resolved.scheme)
  const resolvedHost = resolved.host
  const resolvedHostIsIP = resolvedHost !== undefined && resolvedHost !== '' &&
    (isIPv4(resolvedHost) || normalizeIPv6(resolvedHost).isIPV6)
  // Inputs are parsed scheme-neutrally, so delimiters and controls in a domain
  // host are only detected here, once the final scheme is known. They always
  // fail closed, including in percent-encoded hosts.
  if (hasForbiddenDomainHost(resolved, options || {}, resolvedSchemeHandler, resolvedHostIsIP)) {
    throw new Error(MALFORMED_HOST_ERROR)
  }
  canonicalizeHost(resolved, options || {}, resolvedSchemeHandler, resolvedHostIsIP)
  // Percent escapes in an ASCII reg-name are encoded data. The WHATWG hostname
  // parser can reject them even though fast-uri preserves them safely as RFC
  // 3986 data. A raw non-ASCII host must still fail closed if conversion fails.
  const encodedASCIIHost = resolvedHost && resolvedHost.indexOf('%') !== -1 &&
    !/\P{ASCII}/u.test(resolvedHost)
  if (resolved.error && !encodedASCIIHost) {
    throw new Error(resolved.error)
  }
  schemelessOptions.skipEscape = true
  return serialize(resolved, schemelessOptions)
}

/**
 * @param {import ('./types/index').URIComponent} base
 * @param {import ('./types/index').URIComponent} relative
 * @param {import('./types/index').Options} [options]
 * @param {boolean} [skipNormalization=false]
 * @returns {import ('./types/index').URIComponent}
 */
function resolveComponent (base, relative, options, skipNormalization) {
  /** @type {import('./types/index').URIComponent} */
  const target = {}
  if (!skipNormalization) {
    base = parse(serialize(base, options), options) // normalize base component
    relative = parse(serialize(relative, options), options) // normalize relative component
  }
  options = options || {}

  if (!options.tolerant && relative.scheme) {
    target.scheme = relative.scheme
    // target.authority = relative.authority;
    target.userinfo = relative.userinfo
    target.host = relative.host
    target.port = relative.port
    target.path = removeDotSegments(relative.path || '')
    target.query = relative.query
  } else {
    if (relative.userinfo !== undefined || relative.host !== undefined || relative.port !== undefined) {
      // target.authority = relative.authority;
      target.userinfo = relative.userinfo
      target.host = relative.host
      target.port = relative.port
      target.path = removeDotSegments(relative.path || '')
      target.query = relative.query
    } else {
      if (!relative.path) {
        target.path = base.path
        if (relative.query !== undefined) {
          target.query = relative.query
        } else {
          target.query = base.query
        }
      } else {
        if (relative.path[0] === '/') {
          target.path = removeDotSegments(relative.path)
        } else {
          const baseHasAuthority = base.userinfo !== undefined || base.host !== undefined || base.port !== undefined
          if (baseHasAuthority && !base.path) {
            target.path = '/' + relative.path
          } else if (!base.path) {
            target.path = relative.path
          } else {
            target.path = base.path.slice(0, base.path.lastIndexOf('/') + 1) + relative.path
          }
          target.path = base.scheme === undefined && !baseHasAuthority && target.path[0] !== '/'
            ? removeDotSegmentsRelative(target.path)
            : removeDotSegments(target.path)
        }
        target.query = relative.query
      }
      // target.authority = base.authority;
      target.userinfo = base.userinfo
      target.host = base.host
      target.port = base.port
    }
    target.scheme = base.scheme
  }

  target.fragment = relative.fragment

  return target
}

/**
 * @param {import ('./types/index').URIComponent|string} uriA
 * @param {import ('./types/index').URIComponent|string} uriB
 * @param {import ('./types/index').Options} options
 * @returns {boolean}
 */
function equal (uriA, uriB, options) {
  const normalizedA = normalizeComparableURI(uriA, options)
  const normalizedB = normalizeComparableURI(uriB, options)

  return normalizedA !== undefined && normalizedB !== undefined && normalizedA === normalizedB
}

/**
 * @param {Readonly<import('./types/index').URIComponent>} cmpts
 * @param {import('./types/index').Options} [opts]
 * @returns {string}
 */
function serialize (cmpts, opts) {
  const component = {
    host: cmpts.host,
    scheme: cmpts.scheme,
    userinfo: cmpts.userinfo,
    port: cmpts.port,
    path: cmpts.path,
    query: cmpts.query,
    nid: cmpts.nid,
    nss: cmpts.nss,
    uuid: cmpts.uuid,
    fragment: cmpts.fragment,
    reference: cmpts.reference,
    resourceName: cmpts.resourceName,
    secure: cmpts.secure,
    error: ''
  }
  const options = Object.assign({}, opts)
  const uriTokens = []

  if (component.scheme) {
    component.scheme = validateScheme(component.scheme)
  }

  // find scheme handler
  const schemeHandler = getSchemeHandler(options.scheme || component.scheme)

  // perform scheme specific serialization
  if (schemeHandler && schemeHandler.serialize) schemeHandler.serialize(component, options)

  const hasAuthority = component.userinfo !== undefined || component.host !== undefined || component.port !== undefined
  // A reference with no emitted scheme is path-noscheme: a bare ':' in its
  // first path segment would reparse as a scheme (RFC 3986 3.3/4.2). Enforced
  // under skipEscape too (resolve()), so the reapply below gates on this flag.
  const schemelessReference = (component.scheme === undefined || options.reference === 'suffix') && !hasAuthority
  const pathNoScheme = !options.skipEscape && schemelessReference

  if (component.path !== undefined) {
    if (!options.skipEscape) {
      component.path = serializePathEncoding(component.path, pathNoScheme)
    } else {
      component.path = normalizePercentEncoding(component.path)
    }
  }

  if (options.reference !== 'suffix' && component.scheme) {
    // Scheme handlers may replace the scheme during serialization.
    component.scheme = validateScheme(component.scheme)
    uriTokens.push(component.scheme, ':')
  }

  const authority = recomposeAuthority(component)
  if (authority !== undefined) {
    if (options.reference !== 'suffix') {
      uriTokens.push('//')
    }

    uriTokens.push(authority)

    if (component.path && component.path[0] !== '/') {
      uriTokens.push('/')
    }
  }
  if (component.path !== undefined) {
    let s = component.path

    if (!options.absolutePath && (!schemeHandler || !schemeHandler.absolutePath)) {
      // A relative-path reference keeps its unresolvable leading ".." segments
      // and must never become root-relative (RFC 3986 section 5.2.4 applies to
      // merged target paths, not to the reference itself).
      s = schemelessReference && s[0] !== '/'
        ? removeDotSegmentsRelative(s)
        : removeDotSegments(s)
    }

    // Dot-segment removal can expose a colon that was not originally in the
    // first segment (for example, "./a:b"). Reapply path-noscheme encoding so
    // the serialized relative reference cannot be reparsed as a URI scheme.
    if (schemelessReference) {
      s = serializePathEncoding(s, true)
    }

    if (
      authority === undefined &&
      s[0] === '/' &&
      s[1] === '/'
    ) {
      // don't allow the path to start with "//"
      s = '/%2F' + s.slice(2)
    }

    uriTokens.push(s)
  }

  if (component.query !== undefined) {
    uriTokens.push('?', encodeQuery(component.query))
  }

  if (component.fragment !== undefined) {
    uriTokens.push('#', encodeFragment(component.fragment))
  }
  return uriTokens.join('')
}

const URI_PARSE = /^(?:([^#/:?]+):)?(?:\/\/((?:([^#/?@]*)@)?(\[[^#/?\]]+\]|[^#/:?]*)(?::(\d*))?))?([^#?]*)(?:\?([^#]*))?(?:#((?:.|[\n\r])*))?/u

// Captures the authority component (between "//" and the next "/", "?" or "#"),
// with or without a scheme prefix, for the literal-backslash rejection below.
const AUTHORITY_PREFIX = /^(?:[^#/:?]+:)?\/\/([^/?#]*)/

// Captures the leading authority-introducer region after an optional scheme: a
// run of forward slashes, backslashes, and the characters the WHATWG URL parser
// removes before parsing (TAB U+0009, LF U+000A, CR U+000D). A valid introducer
// is exactly "//". Node treats "\" as "/" on special schemes and strips those
// characters first, so forms like "\\", "/\", "\/", "/<TAB>/", or a leading
// "<TAB>//" reach an authority in Node while fast-uri's URI_PARSE folds them into
// the path group (host confusion / SSRF / redirect bypass).
const AUTHORITY_INTRODUCER_REGION = /^(?:[^#/:?]+:)?([/\\\t\n\r]*)/

/**
 * @param {import('./types/index').URIComponent} parsed
 * @param {RegExpMatchArray} matches
 * @returns {string|undefined}
 */
function getParseError (parsed, matches) {
  if (matches[2] !== undefined && parsed.path && parsed.path[0] !== '/') {
    return 'URI path must start with "/" when authority is present.'
  }

  if (typeof parsed.port === 'number' && (parsed.port < 0 || parsed.port > 65535)) {
    return 'URI port is malformed.'
  }

  return undefined
}

/**
 * Checks percent syntax without decoding the represented octets. RFC 3986
 * percent-encoding is byte-oriented, so sequences such as `%FF` are valid even
 * though they are not independently valid UTF-8.
 *
 * @param {string|undefined} component
 * @returns {boolean}
 */
function hasMalformedPercentEncoding (component) {
  if (component === undefined) return false

  let percent = component.indexOf('%')
  while (percent !== -1) {
    if (percent + 2 >= component.length || !/^[\da-f]{2}$/iu.test(component.slice(percent + 1, percent + 3))) {
      return true
    }
    percent = component.indexOf('%', percent + 3)
  }

  return false
}

/**
 * Whether the host is a bracketed IP literal (RFC 3986 `IP-literal`).
 * An unterminated `[` is not a literal, so it must still be validated as a
 * reg-name instead of being waved through as an IP.
 *
 * @param {string} host
 * @returns {boolean}
 */
function isIPLiteral (host) {
  return host[0] === '[' && host[host.length - 1] === ']'
}

/**
 * @param {RegExpMatchArray} matches
 * @returns {boolean}
 */
function hasMalformedComponentPercentEncoding (matches) {
  // Bracketed IP literals use a raw "%" as the zone separator for historical
  // compatibility. Their parsing is intentionally left to normalizeIPv6.
  const host = matches[4]
  return hasMalformedPercentEncoding(matches[3]) ||
    (host !== undefined && !isIPLiteral(host) && hasMalformedPercentEncoding(host)) ||
    hasMalformedPercentEncoding(matches[6]) ||
    hasMalformedPercentEncoding(matches[7]) ||
    hasMalformedPercentEncoding(matches[8])
}

/**
 * @param {import('./types/index').URIComponent} parsed
 * @param {import('./types/index').Options} options
 * @param {{ domainHost?: boolean, unicodeSupport?: boolean }|undefined} schemeHandler
 * @param {boolean} isIP
 * @returns {boolean} whether host conversion failed
 */
function canonicalizeHost (parsed, options, schemeHandler, isIP) {
  if (hasForbiddenDomainHost(parsed, options, schemeHandler, isIP)) {
    parsed.error = parsed.error || MALFORMED_HOST_ERROR
    return true
  }

  if (
    !options.unicodeSupport &&
    (!schemeHandler || !schemeHandler.unicodeSupport) &&
    parsed.host &&
    !isIPLiteral(parsed.host) &&
    (options.domainHost || (schemeHandler && schemeHandler.domainHost)) &&
    isIP === false &&
    nonSimpleDomain(parsed.host)
  ) {
    let url
    try {
      url = new URL('http://' + parsed.host)
    } catch (e) {
      parsed.error = parsed.error || "Host's domain name can not be converted to ASCII: " + e
      return true
    }
    // The WHATWG parser must have read the whole input as a host. Anything
    // else means it found a delimiter fast-uri did not, so its hostname would
    // describe a different authority.
    if (!isHostOnlyURL(url)) {
      parsed.error = parsed.error || MALFORMED_HOST_ERROR
      return true
    }
    parsed.host = url.hostname
  }
  return false
}

/**
 * Whether a domain host contains an ASCII character that RFC 3986 does not
 * allow in a reg-name (unreserved, sub-delims, or pct-encoded). Such a host is
 * rejected instead of being handed to the WHATWG URL parser, which would treat
 * "@" as a userinfo delimiter (silently dropping the data before it) and strip
 * TAB, LF, and CR. Non-ASCII characters remain allowed for IDNs.
 *
 * @param {import('./types/index').URIComponent} parsed
 * @param {import('./types/index').Options} options
 * @param {{ domainHost?: boolean }|undefined} schemeHandler
 * @param {boolean} isIP
 * @returns {boolean}
 */
function hasForbiddenDomainHost (parsed, options, schemeHandler, isIP) {
  return Boolean(
    parsed.host &&
    isIP === false &&
    !isIPLiteral(parsed.host) &&
    (options.domainHost || (schemeHandler && schemeHandler.domainHost)) &&
    FORBIDDEN_DOMAIN_HOST_CHARACTER.test(parsed.host)
  )
}

/**
 * @param {URL} url
 * @returns {boolean}
 */
function isHostOnlyURL (url) {
  return url.username === '' &&
    url.password === '' &&
    url.port === '' &&
    url.pathname === '/' &&
    url.search === '' &&
    url.hash === '' &&
    url.hostname !== ''
}

/**
 * @param {string} uri
 * @param {import('./types/index').Options} [opts]
 * @returns {{ parsed: import('./types/index').URIComponent, malformedAuthorityOrPort: boolean, malformedPercentEncoding: boolean, malformedSchemeSpecific: boolean, malformedHost: boolean, malformedScheme: boolean }}
 */
function parseWithStatus (uri, opts) {
  const options = Object.assign({}, opts)
  /** @type {import('./types/index').URIComponent} */
  const parsed = {
    scheme: undefined,
    userinfo: undefined,
    host: '',
    port: undefined,
    path: '',
    query: undefined,
    fragment: undefined
  }

  let malformedAuthorityOrPort = false
  let malformedPercentEncoding = false
  let malformedSchemeSpecific = false
  let malformedHost = false
  let malformedIPLiteral = false
  let malformedScheme = false

  let isIP = false
  if (options.reference === 'suffix') {
    if (options.scheme) {
      uri = options.scheme + ':' + uri
    } else {
      uri = '//' + uri
    }
  }

  // A literal backslash (U+005C) is not a valid RFC 3986 URI character and is
  // not an authority delimiter. Reject it in the authority rather than
  // rewriting it: normalizing "\" -> "/" (WHATWG error recovery) could silently
  // change the resource identified by an otherwise-invalid input, and lets "\"
  // act as a host delimiter here while Node's native URL parses a different
  // host (SSRF / redirect / origin-allowlist bypass). Percent-encoded %5C is
  // untouched and remains valid encoded data.
  const authorityMatch = uri.match(AUTHORITY_PREFIX)
  if (authorityMatch !== null && authorityMatch[1].indexOf('\\') !== -1) {
    parsed.error = 'URI authority must not contain a literal backslash.'
    malformedAuthorityOrPort = true
  }

  // Reject a malformed or whitespace-smuggled authority introducer. fast-uri
  // only recognizes a literal "//"; anything else in the leading separator run
  // (a backslash, or a "//" that appears only after removing the TAB/LF/CR that
  // Node strips) means the authority fast-uri parses differs from the one Node's
  // URL resolves. Reject rather than rewrite, mirroring the literal-backslash
  // guard above. Percent-encoded forms (%5C, %09) are untouched, valid data.
  const introducerMatch = uri.match(AUTHORITY_INTRODUCER_REGION)
  if (introducerMatch !== null) {
    const region = introducerMatch[1]
    const normalizedRegion = region.replace(/[\t\n\r]/g, '')
    // Two or more leading separators introduce an authority.
    if (normalizedRegion.length >= 2) {
      if (normalizedRegion.slice(0, 2) !== '//') {
        parsed.error = parsed.error || 'URI authority must not contain a literal backslash.'
        malformedAuthorityOrPort = true
      } else if (region.length !== normalizedRegion.length) {
        parsed.error = parsed.error || 'URI authority introducer must not contain whitespace.'
        malformedAuthorityOrPort = true
      }
    }
  }

  const matches = uri.match(URI_PARSE)

  if (matches) {
    // store each component
    parsed.scheme = matches[1]
    parsed.userinfo = matches[3]
    parsed.host = matches[4]
    parsed.port = parseInt(matches[5], 10)
    parsed.path = matches[6] || ''
    parsed.query = matches[7]
    parsed.fragment = matches[8]

    if (parsed.scheme !== undefined) {
      if (VALID_SCHEME.test(parsed.scheme)) {
        parsed.scheme = parsed.scheme.toLowerCase()
      } else {
        parsed.error = parsed.error || MALFORMED_SCHEME_ERROR
        malformedScheme = true
      }
    }

    malformedPercentEncoding = hasMalformedComponentPercentEncoding(matches)
    if (malformedPercentEncoding) {
      parsed.error = parsed.error || 'URI contains malformed percent-encoding.'
    }

    // fix port number
    if (isNaN(parsed.port)) {
      parsed.port = matches[5]
    }

    const parseError = getParseError(parsed, matches)
    if (parseError !== undefined) {
      parsed.error = parsed.error || parseError
      malformedAuthorityOrPort = true
    }

    if (parsed.host) {
      const ipv4result = isIPv4(parsed.host)
      if (ipv4result === false) {
        const bracketedIPLiteral = isIPLiteral(parsed.host)
        const hasIPLiteralBracket = parsed.host.indexOf('[') !== -1 || parsed.host.indexOf(']') !== -1
        const ipv6result = normalizeIPv6(parsed.host)
        isIP = ipv6result.isIPV6 || ipv6result.isIPVFuture === true
        malformedIPLiteral = hasIPLiteralBracket && (!bracketedIPLiteral || ipv6result.error === true)
        parsed.host = isIP ? ipv6result.host : ipv6result.host.toLowerCase()

        if (malformedIPLiteral) {
          parsed.error = parsed.error || MALFORMED_HOST_ERROR
          malformedAuthorityOrPort = true
        }
      } else {
        isIP = true
      }
    }
    if (parsed.scheme === undefined && parsed.userinfo === undefined && parsed.host === undefined && parsed.port === undefined && parsed.query === undefined && !parsed.path) {
      parsed.reference = 'same-document'
    } else if (parsed.scheme === undefined) {
      parsed.reference = 'relative'
    } else if (parsed.fragment === undefined) {
      parsed.reference = 'absolute'
    } else {
      parsed.reference = 'uri'
    }

    // check for reference errors
    if (options.reference && options.reference !== 'suffix' && options.reference !== parsed.reference) {
      parsed.error = parsed.error || 'URI is not a ' + options.reference + ' reference.'
    }

    // find scheme handler
    const schemeHandler = getSchemeHandler(options.scheme || parsed.scheme)

    // convert Unicode IDN -> ASCII IDN when the effective scheme uses domain hosts
    if (!malformedIPLiteral) {
      malformedHost = canonicalizeHost(parsed, options, schemeHandler, isIP)
    }

    if (uri.indexOf('%') !== -1 && parsed.host !== undefined && !malformedIPLiteral) {
      let host = isIP ? parsed.host : normalizePercentEncoding(parsed.host, true)
      if (!isIP) {
        // Fold reg-name case after decoding unreserved octets. The second
        // pass only restores uppercase hex in escapes that remain encoded.
        host = normalizePercentEncoding(host.toLowerCase())
      }
      // Resolution parses both inputs with the internal `null` scheme before
      // the effective scheme is known. Keep raw host delimiters for that step
      // so resolve() can reject them for domain-host schemes; the resolved
      // authority is encoded when it is serialized.
      parsed.host = isIP || options.scheme !== 'null' ? reescapeHostDelimiters(host, isIP) : host
    }

    if (!schemeHandler || (schemeHandler && !schemeHandler.skipNormalize)) {
      if (parsed.path) {
        parsed.path = normalizePathEncoding(parsed.path)
      }
      if (parsed.query) {
        parsed.query = normalizeQueryFragmentEncoding(parsed.query)
      }
      if (parsed.fragment) {
        parsed.fragment = normalizeQueryFragmentEncoding(parsed.fragment)
      }
    }

    // perform scheme specific parsing
    if (schemeHandler && schemeHandler.parse) {
      schemeHandler.parse(parsed, options)
      if (schemeHandler === SCHEMES.urn && parsed.nid === undefined) {
        malformedSchemeSpecific = true
      }
    }
  } else {
    parsed.error = parsed.error || 'URI can not be parsed.'
  }
  return { parsed, malformedAuthorityOrPort, malformedPercentEncoding, malformedSchemeSpecific, malformedHost, malformedScheme }
}

/**
 * @param {string} uri
 * @param {import('./types/index').Options} [opts]
 * @returns
 */
function parse (uri, opts) {
  return parseWithStatus(uri, opts).parsed
}

/**
 * @param {string} uri
 * @param {import('./types/index').Options} [opts]
 * @returns {string}
 */
function normalizeString (uri, opts) {
  return normalizeStringWithStatus(uri, opts).normalized
}

/**
 * @param {string} uri
 * @param {import('./types/index').Options} [opts]
 * @returns {{ normalized: string, malformedAuthorityOrPort: boolean, malformedPercentEncoding: boolean, malformedSchemeSpecific: boolean, malformedHost: boolean, malformedScheme: boolean }}
 */
function normalizeStringWithStatus (uri, opts) {
  const { parsed, malformedAuthorityOrPort, malformedPercentEncoding, malformedSchemeSpecific, malformedHost, malformedScheme } = parseWithStatus(uri, opts)
  return {
    normalized: malformedAuthorityOrPort || malformedPercentEncoding || malformedSchemeSpecific || malformedHost || malformedScheme ? uri : serialize(parsed, opts),
    malformedAuthorityOrPort,
    malformedPercentEncoding,
    malformedSchemeSpecific,
    malformedHost,
    malformedScheme
  }
}

/**
 * @param {import ('./types/index').URIComponent|string} uri
 * @param {import('./types/index').Options} [opts]
 * @returns {string|undefined}
 */
function normalizeComparableURI (uri, opts) {
  if (typeof uri !== 'string' && typeof uri !== 'object') {
    return undefined
  }

  let value
  try {
    value = typeof uri === 'string' ? uri : serialize(uri, opts)
  } catch {
    return undefined
  }
  const { normalized, malformedAuthorityOrPort, malformedPercentEncoding, malformedSchemeSpecific, malformedHost, malformedScheme } = normalizeStringWithStatus(value, opts)
  return malformedAuthorityOrPort || malformedPercentEncoding || malformedSchemeSpecific || malformedHost || malformedScheme ? undefined : normalized
}

const fastUri = {
  SCHEMES,
  normalize,
  resolve,
  resolveComponent,
  equal,
  serialize,
  parse
}

module.exports = fastUri
module.exports["default"] = fastUri
module.exports.fastUri = fastUri


/***/ }),

/***/ 5300:
/***/ ((module, __unused_webpack_exports, __nccwpck_require__) => {



const { isUUID } = __nccwpck_require__(5077)
const URN_REG = /^([\da-z][\d\-a-z]{0,31}):((?:[\w!$'()*+,\-./:;=@]|%[\da-f]{2})+)$/iu

const supportedSchemeNames = /** @type {const} */ (['http', 'https', 'ws',
  'wss', 'urn', 'urn:uuid'])

/** @typedef {supportedSchemeNames[number]} SchemeName */

/**
 * @param {string} name
 * @returns {name is SchemeName}
 */
function isValidSchemeName (name) {
  return supportedSchemeNames.indexOf(/** @type {*} */ (name)) !== -1
}

/**
 * @callback SchemeFn
 * @param {import('../types/index').URIComponent} component
 * @param {import('../types/index').Options} options
 * @returns {import('../types/index').URIComponent}
 */

/**
 * @typedef {Object} SchemeHandler
 * @property {SchemeName} scheme - The scheme name.
 * @property {boolean} [domainHost] - Indicates if the scheme supports domain hosts.
 * @property {SchemeFn} parse - Function to parse the URI component for this scheme.
 * @property {SchemeFn} serialize - Function to serialize the URI component for this scheme.
 * @property {boolean} [skipNormalize] - Indicates if normalization should be skipped for this scheme.
 * @property {boolean} [absolutePath] - Indicates if the scheme uses absolute paths.
 * @property {boolean} [unicodeSupport] - Indicates if the scheme supports Unicode.
 */

/**
 * @param {import('../types/index').URIComponent} wsComponent
 * @returns {boolean}
 */
function wsIsSecure (wsComponent) {
  if (wsComponent.secure === true) {
    return true
  } else if (wsComponent.secure === false) {
    return false
  } else if (wsComponent.scheme) {
    return (
      wsComponent.scheme.length === 3 &&
      (wsComponent.scheme[0] === 'w' || wsComponent.scheme[0] === 'W') &&
      (wsComponent.scheme[1] === 's' || wsComponent.scheme[1] === 'S') &&
      (wsComponent.scheme[2] === 's' || wsComponent.scheme[2] === 'S')
    )
  } else {
    return false
  }
}

/** @type {SchemeFn} */
function httpParse (component) {
  if (!component.host) {
    component.error = component.error || 'HTTP URIs must have a host.'
  }

  return component
}

/** @type {SchemeFn} */
function httpSerialize (component) {
  const secure = String(component.scheme).toLowerCase() === 'https'

  // normalize the default port
  if (component.port === (secure ? 443 : 80) || component.port === '') {
    component.port = undefined
  }

  // normalize the empty path
  if (!component.path) {
    component.path = '/'
  }

  // NOTE: We do not parse query strings for HTTP URIs
  // as WWW Form Url Encoded query strings are part of the HTML4+ spec,
  // and not the HTTP spec.

  return component
}

/** @type {SchemeFn} */
function wsParse (wsComponent) {
// indicate if the secure flag is set
  wsComponent.secure = wsIsSecure(wsComponent)

  // construct resouce name
  wsComponent.resourceName = (wsComponent.path || '/') + (wsComponent.query ? '?' + wsComponent.query : '')
  wsComponent.path = undefined
  wsComponent.query = undefined

  return wsComponent
}

/** @type {SchemeFn} */
function wsSerialize (wsComponent) {
// normalize the default port
  if (wsComponent.port === (wsIsSecure(wsComponent) ? 443 : 80) || wsComponent.port === '') {
    wsComponent.port = undefined
  }

  // ensure scheme matches secure flag
  if (typeof wsComponent.secure === 'boolean') {
    wsComponent.scheme = (wsComponent.secure ? 'wss' : 'ws')
    wsComponent.secure = undefined
  }

  // reconstruct path from resource name
  if (wsComponent.resourceName) {
    const queryIndex = wsComponent.resourceName.indexOf('?')
    const path = queryIndex === -1
      ? wsComponent.resourceName
      : wsComponent.resourceName.slice(0, queryIndex)
    wsComponent.path = (path && path !== '/' ? path : undefined)
    wsComponent.query = queryIndex === -1
      ? undefined
      : wsComponent.resourceName.slice(queryIndex + 1)
    wsComponent.resourceName = undefined
  }

  // forbid fragment component
  wsComponent.fragment = undefined

  return wsComponent
}

/** @type {SchemeFn} */
function urnParse (urnComponent, options) {
  if (!urnComponent.path) {
    urnComponent.error = 'URN can not be parsed'
    return urnComponent
  }
  const matches = urnComponent.path.match(URN_REG)
  if (matches && matches[0] === urnComponent.path) {
    const scheme = options.scheme || urnComponent.scheme || 'urn'
    urnComponent.nid = matches[1].toLowerCase()
    urnComponent.nss = matches[2]
    const urnScheme = `${scheme}:${options.nid || urnComponent.nid}`
    const schemeHandler = getSchemeHandler(urnScheme)
    urnComponent.path = undefined

    if (schemeHandler) {
      urnComponent = schemeHandler.parse(urnComponent, options)
    }
  } else {
    urnComponent.error = urnComponent.error || 'URN can not be parsed.'
  }

  return urnComponent
}

/** @type {SchemeFn} */
function urnSerialize (urnComponent, options) {
  if (urnComponent.nid === undefined) {
    throw new Error('URN without nid cannot be serialized')
  }
  const scheme = options.scheme || urnComponent.scheme || 'urn'
  const nid = urnComponent.nid.toLowerCase()
  const urnScheme = `${scheme}:${options.nid || nid}`
  const schemeHandler = getSchemeHandler(urnScheme)

  if (schemeHandler) {
    urnComponent = schemeHandler.serialize(urnComponent, options)
  }

  const uriComponent = urnComponent
  const nss = urnComponent.nss
  uriComponent.path = `${nid || options.nid}:${nss}`

  options.skipEscape = true
  return uriComponent
}

/** @type {SchemeFn} */
function urnuuidParse (urnComponent, options) {
  const uuidComponent = urnComponent
  uuidComponent.uuid = uuidComponent.nss
  uuidComponent.nss = undefined

  if (!options.tolerant && (!uuidComponent.uuid || !isUUID(uuidComponent.uuid))) {
    uuidComponent.error = uuidComponent.error || 'UUID is not valid.'
  }

  return uuidComponent
}

/** @type {SchemeFn} */
function urnuuidSerialize (uuidComponent) {
  const urnComponent = uuidComponent
  // normalize UUID
  urnComponent.nss = (uuidComponent.uuid || '').toLowerCase()
  return urnComponent
}

const http = /** @type {SchemeHandler} */ ({
  scheme: 'http',
  domainHost: true,
  parse: httpParse,
  serialize: httpSerialize
})

const https = /** @type {SchemeHandler} */ ({
  scheme: 'https',
  domainHost: http.domainHost,
  parse: httpParse,
  serialize: httpSerialize
})

const ws = /** @type {SchemeHandler} */ ({
  scheme: 'ws',
  domainHost: true,
  parse: wsParse,
  serialize: wsSerialize
})

const wss = /** @type {SchemeHandler} */ ({
  scheme: 'wss',
  domainHost: ws.domainHost,
  parse: ws.parse,
  serialize: ws.serialize
})

const urn = /** @type {SchemeHandler} */ ({
  scheme: 'urn',
  parse: urnParse,
  serialize: urnSerialize,
  skipNormalize: true
})

const urnuuid = /** @type {SchemeHandler} */ ({
  scheme: 'urn:uuid',
  parse: urnuuidParse,
  serialize: urnuuidSerialize,
  skipNormalize: true
})

const SCHEMES = /** @type {Record<SchemeName, SchemeHandler>} */ ({
  http,
  https,
  ws,
  wss,
  urn,
  'urn:uuid': urnuuid
})

Object.setPrototypeOf(SCHEMES, null)

/**
 * @param {string|undefined} scheme
 * @returns {SchemeHandler|undefined}
 */
function getSchemeHandler (scheme) {
  return (
    scheme && (
      SCHEMES[/** @type {SchemeName} */ (scheme)] ||
      SCHEMES[/** @type {SchemeName} */(scheme.toLowerCase())])
  ) ||
    undefined
}

module.exports = {
  wsIsSecure,
  SCHEMES,
  isValidSchemeName,
  getSchemeHandler,
}


/***/ }),

/***/ 5077:
/***/ ((module) => {



/** @type {(value: string) => boolean} */
const isUUID = RegExp.prototype.test.bind(/^[\da-f]{8}-[\da-f]{4}-[\da-f]{4}-[\da-f]{4}-[\da-f]{12}$/iu)

/** @type {(value: string) => boolean} */
const isIPv4 = RegExp.prototype.test.bind(/^(?:(?:25[0-5]|2[0-4]\d|1\d{2}|[1-9]\d|\d)\.){3}(?:25[0-5]|2[0-4]\d|1\d{2}|[1-9]\d|\d)$/u)

/** @type {(value: string) => boolean} */
const isPort = RegExp.prototype.test.bind(/^\d*$/u)

/** @type {(value: string) => boolean} */
const isHexPair = RegExp.prototype.test.bind(/^[\da-f]{2}$/iu)

/** @type {(value: string) => boolean} */
const isUnreserved = RegExp.prototype.test.bind(/^[\da-z\-._~]$/iu)

/** @type {(value: string) => boolean} */
const isPathCharacter = RegExp.prototype.test.bind(/^[A-Za-z0-9\-._~!$&'()*+,;=:@/]$/u)

/** @type {(value: string) => boolean} */
const isQueryFragmentCharacter = RegExp.prototype.test.bind(/^[A-Za-z0-9\-._~!$&'()*+,;=:@/?]$/u)

/** @type {(value: string) => boolean} */
const isUserinfoCharacter = RegExp.prototype.test.bind(/^[A-Za-z0-9\-._~!$&'()*+,;=:]$/u)

const BYTE_HEX = new Array(256)
{
  const HEX_DIGITS = '0123456789ABCDEF'
  for (let i = 0; i < 256; i++) {
    BYTE_HEX[i] = '%' + HEX_DIGITS[i >> 4] + HEX_DIGITS[i & 0xF]
  }
}
function percentEncodeNonAscii (cp) {
  if (cp < 0x800) {
    return BYTE_HEX[0xC0 | (cp >> 6)] +
           BYTE_HEX[0x80 | (cp & 0x3F)]
  }
  if (cp < 0x10000) {
    return BYTE_HEX[0xE0 | (cp >> 12)] +
           BYTE_HEX[0x80 | ((cp >> 6) & 0x3F)] +
           BYTE_HEX[0x80 | (cp & 0x3F)]
  }
  return BYTE_HEX[0xF0 | (cp >> 18)] +
         BYTE_HEX[0x80 | ((cp >> 12) & 0x3F)] +
         BYTE_HEX[0x80 | ((cp >> 6) & 0x3F)] +
         BYTE_HEX[0x80 | (cp & 0x3F)]
}

/**
 * @param {Array<string>} input
 * @returns {string}
 */
function stringArrayToHexStripped (input) {
  let acc = ''
  let code = 0
  let i = 0

  for (i = 0; i < input.length; i++) {
    code = input[i].charCodeAt(0)
    if (code === 48) {
      continue
    }
    if (!((code >= 48 && code <= 57) || (code >= 65 && code <= 70) || (code >= 97 && code <= 102))) {
      return ''
    }
    acc += input[i]
    break
  }

  for (i += 1; i < input.length; i++) {
    code = input[i].charCodeAt(0)
    if (!((code >= 48 && code <= 57) || (code >= 65 && code <= 70) || (code >= 97 && code <= 102))) {
      return ''
    }
    acc += input[i]
  }
  return acc
}

/** @type {(value: string) => boolean} */
const isHextet = RegExp.prototype.test.bind(/^[\dA-Fa-f]{1,4}$/)

/** @type {(value: string) => boolean} */
const isIPvFuture = RegExp.prototype.test.bind(/^[vV][\dA-Fa-f]+\.[A-Za-z\d\-._~!$&'()*+,;=:]+$/)

/** @type {(value: string) => boolean} */
const isZoneCharacter = RegExp.prototype.test.bind(/^[A-Za-z\d\-._~]$/)

/**
 * @param {string} value
 * @returns {boolean}
 */
const nonSimpleDomain = RegExp.prototype.test.bind(/[^!"$&'()*+,\-.;=_`a-z{}~]/u)

/**
 * @param {string} zone
 * @returns {boolean}
 */
function isZoneIdentifier (zone) {
  if (zone.length === 0) return false

  for (let i = 0; i < zone.length; i++) {
    if (isZoneCharacter(zone[i])) continue
    if (zone[i] === '%' && i + 2 < zone.length && isHexPair(zone.slice(i + 1, i + 3))) {
      i += 2
      continue
    }
    return false
  }

  return true
}

/**
 * Compresses the longest run of zero hextets to "::" per RFC 5952. A run of a
 * single zero hextet is left uncompressed. On ties the leftmost run wins.
 *
 * @param {string[]} hextets
 * @returns {string}
 */
function compressIPv6ZeroRun (hextets) {
  let bestStart = -1
  let bestLength = 0
  let runStart = -1
  let runLength = 0
  for (let i = 0; i < hextets.length; i++) {
    if (hextets[i] === '0') {
      if (runStart === -1) runStart = i
      runLength++
      if (runLength > bestLength) {
        bestLength = runLength
        bestStart = runStart
      }
    } else {
      runStart = -1
      runLength = 0
    }
  }

  if (bestLength < 2) return hextets.join(':')

  const head = hextets.slice(0, bestStart).join(':')
  const tail = hextets.slice(bestStart + bestLength).join(':')
  return head + '::' + tail
}

/**
 * Validates an IPv6 address against the alternatives in RFC 3986 section
 * 3.2.2 and returns the same address with leading hextet zeroes removed.
 * An embedded IPv4 address counts as two hextets and is only valid at the end.
 *
 * @param {string} input
 * @returns {string|undefined}
 */
function normalizeIPv6Address (input) {
  const compression = input.indexOf('::')
  if (compression !== -1 && input.indexOf('::', compression + 1) !== -1) return undefined

  const left = compression === -1 ? input.split(':') : input.slice(0, compression).split(':')
  const right = compression === -1 ? [] : input.slice(compression + 2).split(':')
  if (compression !== -1) {
    if (left.length === 1 && left[0] === '') left.length = 0
    if (right.length === 1 && right[0] === '') right.length = 0
  }

  const parts = left.concat(right)
  let hextetCount = 0
  for (let i = 0; i < parts.length; i++) {
    const part = parts[i]
    if (part === '') return undefined

    if (part.indexOf('.') !== -1) {
      if (i !== parts.length - 1 || (compression !== -1 && right.length === 0) || !isIPv4(part)) return undefined
      hextetCount += 2
      continue
    }

    if (!isHextet(part)) return undefined
    parts[i] = parseInt(part, 16).toString(16)
    hextetCount++
  }

  if (compression === -1) {
    if (hextetCount !== 8) return undefined
    return compressIPv6ZeroRun(parts)
  }
  if (hextetCount >= 8) return undefined

  // expand "::" then re-compress the longest run for a canonical result
  const expanded = parts.slice(0, left.length)
  for (let i = hextetCount; i < 8; i++) expanded.push('0')
  for (let i = left.length; i < parts.length; i++) expanded.push(parts[i])
  return compressIPv6ZeroRun(expanded)
}

/**
 * @typedef {Object} NormalizeIPv6Result
 * @property {string} host - The normalized host.
 * @property {string} [escapedHost] - The escaped host.
 * @property {boolean} isIPV6 - Indicates if the host is an IPv6 address.
 * @property {boolean} [isIPVFuture] - Indicates if the host is an IPvFuture literal.
 * @property {boolean} [error] - Indicates if a bracketed IP literal is malformed.
 */

/**
 * Validates and normalizes a bracketed IP literal. Raw zone separators remain
 * accepted for backwards compatibility, while encoded separators and zone
 * contents follow RFC 6874.
 *
 * @param {string} host
 * @returns {NormalizeIPv6Result}
 */
function normalizeIPv6 (host) {
  const bracketed = host[0] === '[' && host[host.length - 1] === ']'
  const hasBracket = host[0] === '[' || host[host.length - 1] === ']'
  if (hasBracket && !bracketed) return { host, isIPV6: false, error: true }

  let input = bracketed ? host.slice(1, -1) : host
  if (bracketed && isIPvFuture(input)) {
    input = input.toLowerCase()
    return { host: `[${input}]`, escapedHost: input, isIPV6: false, isIPVFuture: true }
  }

  if (findToken(input, ':') < 2) {
    return { host, isIPV6: false, error: bracketed }
  }

  let zoneIdentifier = ''
  const zoneSeparator = input.indexOf('%')
  if (zoneSeparator !== -1) {
    const separatorLength = input.slice(zoneSeparator, zoneSeparator + 3).toLowerCase() === '%25' ? 3 : 1
    zoneIdentifier = input.slice(zoneSeparator + separatorLength)
    if (!isZoneIdentifier(zoneIdentifier)) return { host, isIPV6: false, error: true }
    input = input.slice(0, zoneSeparator)
  }

  const address = normalizeIPv6Address(input)
  if (address === undefined) return { host, isIPV6: false, error: true }

  return {
    host: address + (zoneIdentifier ? '%' + zoneIdentifier : ''),
    escapedHost: address + (zoneIdentifier ? '%25' + zoneIdentifier : ''),
    isIPV6: true
  }
}

/**
 * @param {string} str
 * @param {string} token
 * @returns {number}
 */
function findToken (str, token) {
  let ind = 0
  for (let i = 0; i < str.length; i++) {
    if (str[i] === token) ind++
  }
  return ind
}

/**
 * @param {string} path
 * @returns {string}
 *
 * @see https://datatracker.ietf.org/doc/html/rfc3986#section-5.2.4
 */
function removeDotSegments (path) {
  let input = path
  const output = []
  let nextSlash = -1
  let len = 0

  // eslint-disable-next-line no-cond-assign
  while (len = input.length) {
    if (len === 1) {
      if (input === '.') {
        break
      } else if (input === '/') {
        output.push('/')
        break
      } else {
        output.push(input)
        break
      }
    } else if (len === 2) {
      if (input[0] === '.') {
        if (input[1] === '.') {
          break
        } else if (input[1] === '/') {
          input = input.slice(2)
          continue
        }
      } else if (input[0] === '/') {
        if (input[1] === '.' || input[1] === '/') {
          output.push('/')
          break
        }
      }
    } else if (len === 3) {
      if (input === '/..') {
        if (output.length !== 0) {
          output.pop()
        }
        output.push('/')
        break
      }
    }
    if (input[0] === '.') {
      if (input[1] === '.') {
        if (input[2] === '/') {
          input = input.slice(3)
          continue
        }
      } else if (input[1] === '/') {
        input = input.slice(2)
        continue
      }
    } else if (input[0] === '/') {
      if (input[1] === '.') {
        if (input[2] === '/') {
          input = input.slice(2)
          continue
        } else if (input[2] === '.') {
          if (input[3] === '/') {
            input = input.slice(3)
            if (output.length !== 0) {
              output.pop()
            }
            continue
          }
        }
      }
    }

    // Rule 2E: Move normal path segment to output
    if ((nextSlash = input.indexOf('/', 1)) === -1) {
      output.push(input)
      break
    } else {
      output.push(input.slice(0, nextSlash))
      input = input.slice(nextSlash)
    }
  }

  return output.join('')
}

/**
 * Removes dot segments from the path of a relative reference (a path that does
 * not start with "/") without changing what it resolves to against any base.
 * Unlike `removeDotSegments`, leading ".." segments that cannot be collapsed
 * are kept, the result never becomes root-relative, and a result that would be
 * empty or start with an empty segment is prefixed with "." (an empty path
 * means "same document" and a leading "//" would introduce an authority).
 *
 * @param {string} path
 * @returns {string}
 */
function removeDotSegmentsRelative (path) {
  if (path === '' || path[0] === '/') {
    return removeDotSegments(path)
  }

  const segments = path.split('/')
  const last = segments.length - 1
  /** @type {string[]} */
  const output = []
  let trailingDirectory = false

  for (let i = 0; i <= last; i++) {
    const segment = segments[i]
    if (segment === '.' || segment === '..') {
      if (segment === '..') {
        if (output.length !== 0 && output[output.length - 1] !== '..') {
          output.pop()
        } else {
          output.push('..')
        }
      }
      trailingDirectory = i === last
    } else {
      output.push(segment)
    }
  }

  if (trailingDirectory && output[output.length - 1] !== '..') {
    output.push('')
  }
  if (output.length === 0 || output[0] === '' || output[0].includes(':')) {
    // An empty path, a leading empty segment ("//"), or a first segment
    // containing ":" (which would be mistaken for a scheme, RFC 3986 section
    // 4.2) must stay behind a "." segment so the reference keeps its meaning.
    output.unshift('.')
  }

  return output.join('/')
}

/**
 * Re-escape RFC 3986 gen-delims that must not appear literally in the host.
 * After the URI regex parses, these characters cannot be literal in the host
 * field, so any that appear after decoding came from percent-encoding and
 * must be restored to prevent authority structure changes.
 *
 * @param {string} host
 * @param {boolean} isIP - true for IPv4/IPv6 hosts (skip colon re-escaping)
 * @returns {string}
 */
const HOST_DELIMS = { '@': '%40', '/': '%2F', '?': '%3F', '#': '%23', ':': '%3A' }
const HOST_DELIM_RE = /[@/?#:]/g
const HOST_DELIM_NO_COLON_RE = /[@/?#]/g

function reescapeHostDelimiters (host, isIP) {
  const re = isIP ? HOST_DELIM_NO_COLON_RE : HOST_DELIM_RE
  re.lastIndex = 0
  return host.replace(re, (ch) => HOST_DELIMS[ch])
}

/**
 * Normalizes percent escapes and optionally decodes only unreserved ASCII bytes.
 * Reserved delimiters such as `%2F` stay escaped; `%2E` is unreserved.
 *
 * @param {string} input
 * @param {boolean} [decodeUnreserved=false]
 * @returns {string}
 */
function normalizePercentEncoding (input, decodeUnreserved = false) {
  if (input.indexOf('%') === -1) {
    return input
  }

  let output = ''

  for (let i = 0; i < input.length; i++) {
    if (input[i] === '%' && i + 2 < input.length) {
      const hex = input.slice(i + 1, i + 3)
      if (isHexPair(hex)) {
        const normalizedHex = hex.toUpperCase()
        const decoded = String.fromCharCode(parseInt(normalizedHex, 16))

        if (decodeUnreserved && isUnreserved(decoded)) {
          output += decoded
        } else {
          output += '%' + normalizedHex
        }

        i += 2
        continue
      }
    }

    output += input[i]
  }

  return output
}

/**
 * Normalizes path data without turning reserved escapes into live path syntax.
 * Valid escapes are uppercased, raw unsafe characters are escaped, and only
 * unreserved bytes that are not `.` are decoded.
 *
 * @param {string} input
 * @returns {string}
 */
function normalizePathEncoding (input) {
  let output = ''

  for (let i = 0; i < input.length; i++) {
    const ch = input[i]
    if (ch === '%' && i + 2 < input.length) {
      const hex = input.slice(i + 1, i + 3)
      if (isHexPair(hex)) {
        const normalizedHex = hex.toUpperCase()
        const decoded = String.fromCharCode(parseInt(normalizedHex, 16))

        if (decoded !== '.' && isUnreserved(decoded)) {
          output += decoded
        } else {
          output += '%' + normalizedHex
        }

        i += 2
        continue
      }
    }

    if (isPathCharacter(ch)) {
      output += ch
    } else {
      const code = input.charCodeAt(i)
      if (code < 0x80) {
        output += isEscapeSafe(code) ? ch : BYTE_HEX[code]
      } else if (code < 0xD800 || code > 0xDFFF) {
        output += percentEncodeNonAscii(code)
      } else if (code <= 0xDBFF && i + 1 < input.length) {
        const low = input.charCodeAt(i + 1)
        if (low >= 0xDC00 && low <= 0xDFFF) {
          output += percentEncodeNonAscii(0x10000 + ((code - 0xD800) << 10) + (low - 0xDC00))
          i++
        } else {
          output += percentEncodeNonAscii(0xFFFD)
        }
      } else {
        output += percentEncodeNonAscii(0xFFFD)
      }
    }
  }

  return output
}

/**
 * Serializes a path without rewriting reserved data. Raw RFC 3986 path
 * characters remain literal, valid escapes are preserved and uppercased, and
 * everything else is UTF-8 percent-encoded. In a path-noscheme, a colon in the
 * first segment must be escaped so the result cannot be parsed as a scheme.
 *
 * @param {string} input
 * @param {boolean} [pathNoScheme=false]
 * @returns {string}
 */
function serializePathEncoding (input, pathNoScheme = false) {
  let output = ''
  let firstSegment = pathNoScheme && input[0] !== '/'

  for (let i = 0; i < input.length; i++) {
    const ch = input[i]
    if (ch === '%' && i + 2 < input.length) {
      const hex = input.slice(i + 1, i + 3)
      if (isHexPair(hex)) {
        output += '%' + hex.toUpperCase()
        i += 2
        continue
      }
    }

    if (ch === '/') {
      firstSegment = false
    }

    if (isPathCharacter(ch) && (ch !== ':' || !firstSegment)) {
      output += ch
    } else {
      const code = input.charCodeAt(i)
      if (code < 0x80) {
        output += BYTE_HEX[code]
      } else if (code < 0xD800 || code > 0xDFFF) {
        output += percentEncodeNonAscii(code)
      } else if (code <= 0xDBFF && i + 1 < input.length) {
        const low = input.charCodeAt(i + 1)
        if (low >= 0xDC00 && low <= 0xDFFF) {
          output += percentEncodeNonAscii(0x10000 + ((code - 0xD800) << 10) + (low - 0xDC00))
          i++
        } else {
          output += percentEncodeNonAscii(0xFFFD)
        }
      } else {
        output += percentEncodeNonAscii(0xFFFD)
      }
    }
  }

  return output
}

/**
 * Percent-encodes a URI component using its RFC 3986 literal character set.
 * Existing valid escapes are preserved and normalized to uppercase hex.
 *
 * @param {string} input
 * @param {(value: string) => boolean} isAllowed
 * @returns {string}
 */
function encodeComponent (input, isAllowed) {
  let output = ''

  for (let i = 0; i < input.length; i++) {
    const ch = input[i]
    if (ch === '%' && i + 2 < input.length) {
      const hex = input.slice(i + 1, i + 3)
      if (isHexPair(hex)) {
        output += '%' + hex.toUpperCase()
        i += 2
        continue
      }
    }

    if (isAllowed(ch)) {
      output += ch
    } else {
      const code = input.charCodeAt(i)
      if (code < 0x80) {
        output += BYTE_HEX[code]
      } else if (code < 0xD800 || code > 0xDFFF) {
        output += percentEncodeNonAscii(code)
      } else if (code <= 0xDBFF && i + 1 < input.length) {
        const low = input.charCodeAt(i + 1)
        if (low >= 0xDC00 && low <= 0xDFFF) {
          output += percentEncodeNonAscii(0x10000 + ((code - 0xD800) << 10) + (low - 0xDC00))
          i++
        } else {
          output += percentEncodeNonAscii(0xFFFD)
        }
      } else {
        output += percentEncodeNonAscii(0xFFFD)
      }
    }
  }

  return output
}

/**
 * Encodes userinfo while preserving its RFC 3986 §3.2.1 literal characters.
 * In particular, authority delimiters such as `@`, `/`, `?`, and `#` are data.
 *
 * @param {string} input
 * @returns {string}
 */
function encodeUserinfo (input) {
  return encodeComponent(input, isUserinfoCharacter)
}

/**
 * Encodes query data using the RFC 3986 §3.4 grammar. A literal `#` must be
 * escaped because it would otherwise begin the fragment component.
 *
 * @param {string} input
 * @returns {string}
 */
function encodeQuery (input) {
  return encodeComponent(input, isQueryFragmentCharacter)
}

/**
 * Encodes fragment data using the RFC 3986 §3.5 grammar.
 *
 * @param {string} input
 * @returns {string}
 */
function encodeFragment (input) {
  return encodeComponent(input, isQueryFragmentCharacter)
}

function isEscapeSafe (cp) {
  return (
    (cp >= 0x30 && cp <= 0x39) ||
    (cp >= 0x41 && cp <= 0x5A) ||
    (cp >= 0x61 && cp <= 0x7A) ||
    cp === 0x2A || cp === 0x2B || cp === 0x2D || cp === 0x2E ||
    cp === 0x2F || cp === 0x40 || cp === 0x5F
  )
}

/**
 * Normalizes the percent-encoding of a query or fragment component.
 *
 * Like `normalizePathEncoding`, but uses the query/fragment character set
 * (which additionally allows `?`) and decodes `.` since it has no dot-segment
 * meaning outside of a path.
 *
 * @param {string} input
 * @returns {string}
 */
function normalizeQueryFragmentEncoding (input) {
  let output = ''

  for (let i = 0; i < input.length; i++) {
    const ch = input[i]
    if (ch === '%' && i + 2 < input.length) {
      const hex = input.slice(i + 1, i + 3)
      if (isHexPair(hex)) {
        const normalizedHex = hex.toUpperCase()
        const decoded = String.fromCharCode(parseInt(normalizedHex, 16))

        if (isUnreserved(decoded)) {
          output += decoded
        } else {
          output += '%' + normalizedHex
        }

        i += 2
        continue
      }
    }

    if (isQueryFragmentCharacter(ch)) {
      output += ch
    } else {
      const code = input.charCodeAt(i)
      if (code < 0x80) {
        output += isEscapeSafe(code) ? ch : BYTE_HEX[code]
      } else if (code < 0xD800 || code > 0xDFFF) {
        output += percentEncodeNonAscii(code)
      } else if (code <= 0xDBFF && i + 1 < input.length) {
        const low = input.charCodeAt(i + 1)
        if (low >= 0xDC00 && low <= 0xDFFF) {
          output += percentEncodeNonAscii(0x10000 + ((code - 0xD800) << 10) + (low - 0xDC00))
          i++
        } else {
          output += percentEncodeNonAscii(0xFFFD)
        }
      } else {
        output += percentEncodeNonAscii(0xFFFD)
      }
    }
  }

  return output
}

/**
 * Escapes a component while preserving existing valid percent escapes.
 *
 * @param {string} input
 * @returns {string}
 */
function escapePreservingEscapes (input) {
  let output = ''

  for (let i = 0; i < input.length; i++) {
    if (input[i] === '%' && i + 2 < input.length) {
      const hex = input.slice(i + 1, i + 3)
      if (isHexPair(hex)) {
        output += '%' + hex.toUpperCase()
        i += 2
        continue
      }
    }

    output += escape(input[i])
  }

  return output
}

/**
 * @param {import('../types/index').URIComponent} component
 * @returns {string|undefined}
 */
function recomposeAuthority (component) {
  const uriTokens = []

  if (component.userinfo !== undefined) {
    uriTokens.push(encodeUserinfo(component.userinfo))
    uriTokens.push('@')
  }

  if (component.host !== undefined) {
    let host = component.host
    if (!isIPv4(host)) {
      let ipV6res = normalizeIPv6(host)
      if (ipV6res.isIPV6 !== true && ipV6res.isIPVFuture !== true) {
        // Decode only unreserved bytes, once. In particular, keep %25 encoded
        // so it cannot introduce a second escape during recomposition.
        host = normalizePercentEncoding(host, true)
        ipV6res = normalizeIPv6(host)
      }
      if (ipV6res.isIPV6 === true || ipV6res.isIPVFuture === true) {
        host = `[${ipV6res.escapedHost}]`
      } else {
        host = reescapeHostDelimiters(host, false)
      }
    }
    uriTokens.push(host)
  }

  if (typeof component.port === 'number' || typeof component.port === 'string') {
    const port = String(component.port)
    if (!isPort(port)) {
      throw new TypeError('URI port is malformed.')
    }
    uriTokens.push(':')
    uriTokens.push(port)
  }

  return uriTokens.length ? uriTokens.join('') : undefined
};

module.exports = {
  nonSimpleDomain,
  recomposeAuthority,
  reescapeHostDelimiters,
  normalizePercentEncoding,
  normalizePathEncoding,
  serializePathEncoding,
  normalizeQueryFragmentEncoding,
  encodeUserinfo,
  encodeQuery,
  encodeFragment,
  escapePreservingEscapes,
  removeDotSegments,
  removeDotSegmentsRelative,
  isIPv4,
  isUUID,
  normalizeIPv6,
  stringArrayToHexStripped
}


/***/ }),

/***/ 4468:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   IN: () => (/* binding */ engineEnvironment),
/* harmony export */   eB: () => (/* binding */ CREDENTIAL_VARIABLES)
/* harmony export */ });
/* unused harmony exports CONTEXT_VARIABLES, isCredentialName */
/* harmony import */ var _adapters_env_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(2387);
/**
 * The environment of the engine process (./engine-process.ts), the child process in which the optimizer
 * under test runs: an allow-list, never the step's own environment.
 *
 * A workflow step's environment holds the token input (INPUT_TOKEN), the runner's own credentials
 * (ACTIONS_RUNTIME_TOKEN, ACTIONS_ID_TOKEN_REQUEST_*), and whatever the workflow put under `env:` — job-wide
 * secrets included. A deny-list would pass on every secret nobody named, so the engine process gets only
 * what a Node.js process needs to run (the same allow-list as optimizer processes of the subprocess
 * adapter, src/adapters/env.ts) and a little non-secret context about the runner. The names of known
 * credentials, every INPUT_* and ACTIONS_* variable and every value that contains a secret are refused
 * on top, so that widening the allow-list by mistake still cannot pass them on.
 */

/** Variables that hold credentials in a workflow step. */
const CREDENTIAL_VARIABLES = Object.freeze([
    "INPUT_TOKEN",
    "GITHUB_TOKEN",
    "GH_TOKEN",
    "ACTIONS_RUNTIME_TOKEN",
    "ACTIONS_ID_TOKEN_REQUEST_TOKEN",
    "ACTIONS_ID_TOKEN_REQUEST_URL",
]);
/** Non-secret context about the runner passed to the engine process when set (on top of PASSED_VARIABLES). */
const CONTEXT_VARIABLES = Object.freeze([
    "CI",
    "GITHUB_ACTIONS",
    "GITHUB_WORKSPACE",
    "RUNNER_OS",
    "RUNNER_ARCH",
    "RUNNER_TEMP",
]);
/** True for a variable the engine process never receives, whatever the allow-list says. */
function isCredentialName(name) {
    const upper = name.toUpperCase();
    return CREDENTIAL_VARIABLES.includes(upper) || upper.startsWith("INPUT_") || upper.startsWith("ACTIONS_");
}
/**
 * The engine process's environment: the allow-listed variables of `parent` that are set, minus credential
 * names and minus any variable whose value contains one of `secrets` (non-empty values only).
 */
function engineEnvironment(parent, secrets) {
    const hidden = secrets.filter((s) => s !== "");
    const env = {};
    for (const name of [..._adapters_env_js__WEBPACK_IMPORTED_MODULE_0__/* .PASSED_VARIABLES */ .r, ...CONTEXT_VARIABLES]) {
        const value = parent[name];
        if (value === undefined || isCredentialName(name))
            continue;
        if (hidden.some((s) => value.includes(s)))
            continue;
        env[name] = value;
    }
    return env;
}


/***/ }),

/***/ 6645:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   q: () => (/* binding */ ENGINE_MARKER)
/* harmony export */ });
/**
 * The environment variable that marks the engine process: the Action's entry file, started with it set
 * to "1", runs the CLI on its arguments instead of the Action (see src/action/main.ts).
 */
const ENGINE_MARKER = "GRADGATE_ENGINE_PROCESS";


/***/ }),

/***/ 6142:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   F7: () => (/* binding */ EngineFailure),
/* harmony export */   NV: () => (/* binding */ setEngineEntry),
/* harmony export */   Yi: () => (/* binding */ OUTCOME_FD),
/* harmony export */   cn: () => (/* binding */ runEngine)
/* harmony export */ });
/* unused harmony export parseOutcome */
/* harmony import */ var node_child_process__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(1421);
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(3024);
/* harmony import */ var node_module__WEBPACK_IMPORTED_MODULE_2__ = __nccwpck_require__(8995);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_3__ = __nccwpck_require__(6760);
/* harmony import */ var node_url__WEBPACK_IMPORTED_MODULE_4__ = __nccwpck_require__(3136);
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_7__ = __nccwpck_require__(4552);
/* harmony import */ var _engine_env_js__WEBPACK_IMPORTED_MODULE_5__ = __nccwpck_require__(4468);
/* harmony import */ var _engine_marker_js__WEBPACK_IMPORTED_MODULE_6__ = __nccwpck_require__(6645);
/**
 * The engine process: every mode that runs code of the repository (gate, a shard's run, merge's extra-seed
 * re-runs and reference checks, rebaseline) runs it in a child Node.js process, never in the process that
 * holds the token. Optimizer code loaded in-process (ES modules, on worker threads or on the main thread)
 * can patch anything in its process — `fetch`, `http`/`https`, the API client — so it must not share a
 * process with the code that later sends the token to GitHub.
 *
 * The child is the Action's own entry file (dist/index.js; the TypeScript sources through tsx in tests),
 * started with ENGINE_MARKER set, which makes it run the CLI on its arguments (src/action/main.ts). It
 * gets the allow-listed environment of ./engine-env.ts: no token, no INPUT_*, no ACTIONS_*, no step files
 * (GITHUB_OUTPUT, GITHUB_STEP_SUMMARY). It writes the results, verdict and baseline files exactly as the CLI
 * does; this process only reads them, reports, and talks to the API. The child's output goes to the step
 * log line by line with workflow commands switched off, so nothing it prints is read as a command.
 *
 * Exit codes are the CLI's: 0 done, 1 gate failed (compare only), 2 input error (its message fails the
 * step as it is), 3 internal error. The engine reports its code and error message on a pipe of its own
 * (OUTCOME_FD) just before exiting; an exit without that report (process.exit or a signal, which optimizer
 * code can cause) is reported as the engine process ending early, never as a result.
 */








let engineEntry = null;
/** Lets a bundled entry file start the engine process from itself (see src/action/main.ts). */
function setEngineEntry(url) {
    engineEntry = { script: (0,node_url__WEBPACK_IMPORTED_MODULE_4__.fileURLToPath)(url), execArgv: [] };
}
/** Compiled: main.js beside this file. Sources (tests, development): main.ts through tsx's loader. */
function defaultEngineEntry() {
    const here = new URL(import.meta.url);
    if (!here.pathname.endsWith(".ts"))
        return { script: (0,node_url__WEBPACK_IMPORTED_MODULE_4__.fileURLToPath)(new URL("./main.js", here)), execArgv: [] };
    // Resolved from this file (an absolute URL), so the engine starts from any working directory.
    const tsx = (0,node_url__WEBPACK_IMPORTED_MODULE_4__.pathToFileURL)((0,node_module__WEBPACK_IMPORTED_MODULE_2__.createRequire)(here).resolve("tsx")).href;
    return { script: (0,node_url__WEBPACK_IMPORTED_MODULE_4__.fileURLToPath)(new URL("./main.ts", here)), execArgv: ["--import", tsx] };
}
/**
 * The engine process ended without one of the results its command promises. The message is for people
 * as it is (the step's failure message adds only the "gradgate: " prefix).
 */
class EngineFailure extends Error {
    name = "EngineFailure";
}
/** The file descriptor on which the engine process reports its outcome (see ./engine-main.ts). */
const OUTCOME_FD = 3;
/** Most bytes read from the outcome pipe. */
const MAX_OUTCOME = 1024 * 1024;
/** A line longer than this (characters) is logged in pieces. */
const MAX_LINE = 64 * 1024;
/** How long to wait for the output pipes after the engine exited (a grandchild may hold them open), ms. */
const DRAIN_MS = 2000;
/** Runs one CLI command in the engine process and returns its exit code (one of `command.codes`). */
async function runEngine(options, command) {
    const { host, cwd } = options;
    const target = command.writes === undefined ? null : (0,node_path__WEBPACK_IMPORTED_MODULE_3__.resolve)(cwd, command.writes);
    if (target !== null && (0,node_fs__WEBPACK_IMPORTED_MODULE_1__.existsSync)(target) && (0,node_fs__WEBPACK_IMPORTED_MODULE_1__.statSync)(target).isFile())
        (0,node_fs__WEBPACK_IMPORTED_MODULE_1__.rmSync)(target);
    const env = { ...(0,_engine_env_js__WEBPACK_IMPORTED_MODULE_5__/* .engineEnvironment */ .IN)(process.env, options.secrets), [_engine_marker_js__WEBPACK_IMPORTED_MODULE_6__/* .ENGINE_MARKER */ .q]: "1" };
    host.debug(`gradgate engine process: gradgate ${command.argv.join(" ")} (environment: ${Object.keys(env).sort().join(", ")})`);
    const ended = await host.withoutCommands(() => spawnEngine(host, cwd, env, command.argv));
    const what = `the engine process (gradgate ${command.argv[0]}, which runs the optimizer code)`;
    const outcome = ended.signal === null ? parseOutcome(ended.outcome) : null;
    if (outcome === null || outcome.code !== ended.code || !isCliExit(outcome.code, command.codes)) {
        const how = ended.signal !== null ? `was ended by ${ended.signal}` : `exited with code ${ended.code}`;
        throw new EngineFailure(`${what} ${how} before finishing its command; optimizer code can end it early (process.exit, a ` +
            `signal, running out of memory): see its output in the log above`);
    }
    if (outcome.code === 2)
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_7__/* .InputError */ .d(outcome.message || `${what} reported an input error`);
    if (outcome.code === 3)
        throw new EngineFailure(outcome.message || `${what} reported an internal error`);
    if (target !== null && !(0,node_fs__WEBPACK_IMPORTED_MODULE_1__.existsSync)(target)) {
        throw new EngineFailure(`${what} finished without writing ${command.writes}`);
    }
    return outcome.code;
}
/** Codes the CLI itself ends with for this command: its results, input error, internal error. */
function isCliExit(code, results) {
    return results.includes(code) || code === 2 || code === 3;
}
/** The last line of the outcome pipe, checked; null when there is none or it is not an outcome. */
function parseOutcome(text) {
    const line = text.trimEnd().split("\n").pop() ?? "";
    let data;
    try {
        data = JSON.parse(line);
    }
    catch {
        return null;
    }
    const o = data;
    if (o === null || typeof o !== "object" || !Number.isInteger(o.code) || typeof o.message !== "string") {
        return null;
    }
    return { code: o.code, message: o.message };
}
function spawnEngine(host, cwd, env, argv) {
    const entry = engineEntry ?? defaultEngineEntry();
    return new Promise((resolvePromise, reject) => {
        const child = (0,node_child_process__WEBPACK_IMPORTED_MODULE_0__.spawn)(process.execPath, [...entry.execArgv, entry.script, ...argv], {
            cwd,
            env,
            stdio: ["ignore", "pipe", "pipe", "pipe"],
            shell: false,
            windowsHide: true,
        });
        const out = lineSink((line) => host.info(line));
        const err = lineSink((line) => host.info(line));
        const pipe = child.stdio[OUTCOME_FD];
        let outcome = "";
        child.stdout.setEncoding("utf8");
        child.stderr.setEncoding("utf8");
        pipe.setEncoding("utf8");
        child.stdout.on("data", out.write);
        child.stderr.on("data", err.write);
        pipe.on("data", (text) => {
            if (outcome.length < MAX_OUTCOME)
                outcome += text;
        });
        let settled = false;
        let drain = null;
        const finish = (code, signal) => {
            if (settled)
                return;
            settled = true;
            if (drain)
                clearTimeout(drain);
            out.end();
            err.end();
            for (const stream of [child.stdout, child.stderr, pipe])
                stream.destroy();
            resolvePromise({ code, signal, outcome });
        };
        child.on("error", (error) => {
            if (settled)
                return;
            settled = true;
            reject(error);
        });
        // "close" comes once the output is drained too; a grandchild holding the pipes must not hold up the step.
        child.on("exit", (code, signal) => {
            drain = setTimeout(() => finish(code, signal), DRAIN_MS);
        });
        child.on("close", (code, signal) => finish(code, signal));
    });
}
/** Splits text into lines (blank ones dropped), emitting each whole line as it arrives. */
function lineSink(emit) {
    let pending = "";
    return {
        write(text) {
            pending += text.replace(/\r\n?/g, "\n");
            const lines = pending.split("\n");
            pending = lines.pop() ?? "";
            for (const line of lines)
                if (line.trim() !== "")
                    emit(line);
            while (pending.length > MAX_LINE) {
                emit(pending.slice(0, MAX_LINE));
                pending = pending.slice(MAX_LINE);
            }
        },
        end() {
            if (pending.trim() !== "")
                emit(pending);
            pending = "";
        },
    };
}


/***/ }),

/***/ 5742:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   X_: () => (/* binding */ ChildFault),
/* harmony export */   rl: () => (/* binding */ ChildLink),
/* harmony export */   tQ: () => (/* binding */ quoteLine)
/* harmony export */ });
/* unused harmony export QUOTE_CHARS */
/* harmony import */ var node_child_process__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(1421);
/**
 * One optimizer process: spawned without a shell, with the minimal environment (./env.ts), spoken to
 * in JSON lines. Turns everything that can go wrong with a child into a `ChildFault` with a precise
 * reason: it could not start, it exited, it stayed silent past a time-out, a line was too long, a line
 * was not JSON. Keeps the tail of its stderr for error reports.
 *
 * Lines are read in order: `next` resolves with the child's next line (`exchange` = `send` + `next`).
 * A line that arrives when no reply is awaited is kept for the next `next` (where it is judged: it is
 * usually not the expected message).
 *
 * While no exchange is outstanding the child's handles are unreferenced, so an idle child never keeps
 * the harness (or a worker thread) alive; a child whose harness goes away reads end-of-file on stdin
 * and should exit.
 */

/** Why the link to a child failed; `reason` is a complete sentence for the run's `error`. */
class ChildFault extends Error {
    reason;
    name = "ChildFault";
    constructor(reason) {
        super(reason);
        this.reason = reason;
    }
}
/** At most this many characters of an offending line are quoted in a reason. */
const QUOTE_CHARS = 120;
/** Quotes a line from a child for an error message: JSON string syntax, truncated. */
function quoteLine(line) {
    const cut = line.length > QUOTE_CHARS ? line.slice(0, QUOTE_CHARS) : line;
    return JSON.stringify(cut) + (line.length > QUOTE_CHARS ? ` (${line.length} characters, truncated)` : "");
}
class ChildLink {
    options;
    child;
    chunks = [];
    pendingBytes = 0;
    lines = [];
    waiter = null;
    fault = null;
    stderrText = "";
    exited = false;
    /** After an over-long line nothing more from this child is read. */
    discarding = false;
    /** Set by kill(): the child is being stopped and must not be used again. */
    killed = false;
    exitPromise;
    /** Lines received so far (for messages). */
    lineCount = 0;
    constructor(options) {
        this.options = options;
        const [program, ...args] = options.command;
        this.child = (0,node_child_process__WEBPACK_IMPORTED_MODULE_0__.spawn)(program, args, {
            cwd: options.cwd,
            env: options.env,
            stdio: ["pipe", "pipe", "pipe"],
            shell: false,
            windowsHide: true,
            // Own process group, so a time-out can kill the child's own children too.
            detached: process.platform !== "win32",
        });
        let markExited = () => { };
        this.exitPromise = new Promise((resolve) => (markExited = resolve));
        this.child.on("error", (err) => {
            const what = err.code === "ENOENT"
                ? `could not start ${quoteLine(program)}: not found (a bare name is looked up on PATH, a relative path ` +
                    `from the working directory ${quoteLine(options.cwd)})`
                : `could not start ${quoteLine(program)}: ${err.message}`;
            this.setFault(new ChildFault(`${options.label}: ${what}`));
            this.exited = true;
            markExited();
        });
        // "close" comes once the output is drained too, so a last line written before exiting is still
        // read; a grandchild holding the pipes open must not delay the fault for long, hence the timer.
        const exitFault = (code, signal) => {
            const how = signal !== null ? `was killed by ${signal}` : `exited with status ${code}`;
            this.setFault(new ChildFault(`${options.label}: the process ${how}`));
        };
        this.child.on("exit", (code, signal) => {
            this.exited = true;
            markExited();
            setTimeout(() => exitFault(code, signal), 500).unref();
        });
        this.child.on("close", (code, signal) => exitFault(code, signal));
        this.child.stdout.on("data", (chunk) => this.onData(chunk));
        this.child.stderr.setEncoding("utf8");
        this.child.stderr.on("data", (text) => {
            const keep = options.stderrKeep ?? 4000;
            this.stderrText = (this.stderrText + text).slice(-keep);
        });
        // A child that exits early makes writes fail with EPIPE; the exit handler reports it.
        this.child.stdin.on("error", () => { });
        this.idle();
    }
    get pid() {
        return this.child.pid;
    }
    get alive() {
        return !this.exited && !this.killed && this.fault === null;
    }
    /** The last `lines` lines of stderr (at most `chars` characters), or "" if it wrote none. */
    stderrTail(lines = 10, chars = 1000) {
        const all = this.stderrText.replace(/\s+$/, "").split("\n");
        return all.slice(-lines).join("\n").slice(-chars);
    }
    /**
     * Writes `line` (a newline is added) and resolves with the child's next line. Rejects with a
     * `ChildFault` when the child exits, writes a line that is too long, or stays silent `seconds`.
     */
    exchange(line, seconds, waitingFor) {
        if (this.fault !== null)
            return Promise.reject(this.fault);
        this.send(line);
        return this.next(seconds, waitingFor);
    }
    /** Writes `line` (a newline is added); a failed write shows up as the child's exit. */
    send(line) {
        if (this.fault !== null || this.killed)
            return;
        this.child.stdin.write(line + "\n");
    }
    /** Resolves with the next line (no write), with the same faults as `exchange`. */
    next(seconds, waitingFor) {
        if (this.lines.length > 0)
            return Promise.resolve(this.lines.shift());
        if (this.fault !== null)
            return Promise.reject(this.fault);
        this.busy();
        return new Promise((resolve, reject) => {
            const timer = setTimeout(() => {
                this.waiter = null;
                this.setFault(new ChildFault(`${this.options.label}: no ${waitingFor} within ${seconds} s (time-out); the process was stopped`));
                this.kill();
                reject(this.fault);
            }, seconds * 1000);
            this.waiter = {
                resolve: (l) => {
                    clearTimeout(timer);
                    this.idle();
                    resolve(l);
                },
                reject: (f) => {
                    clearTimeout(timer);
                    this.idle();
                    reject(f);
                },
            };
        });
    }
    /** Ends the session politely: writes `line`, closes stdin, kills after `graceSeconds`. */
    async close(line, graceSeconds = 2) {
        if (!this.exited) {
            if (line !== null && this.fault === null)
                this.child.stdin.write(line + "\n");
            this.child.stdin.end();
            const timer = setTimeout(() => this.kill(), graceSeconds * 1000);
            this.busy();
            await this.exitPromise;
            clearTimeout(timer);
        }
        this.setFault(new ChildFault(`${this.options.label}: the process was closed`));
    }
    /** Kills the child (and its process group) at once. */
    kill() {
        this.killed = true;
        this.discarding = true;
        if (this.exited)
            return;
        const pid = this.child.pid;
        try {
            if (pid !== undefined && process.platform !== "win32")
                process.kill(-pid, "SIGKILL");
            else
                this.child.kill("SIGKILL");
        }
        catch {
            this.child.kill("SIGKILL");
        }
    }
    /** Records a fault (the first one wins) and fails a waiting exchange. */
    setFault(fault) {
        if (this.fault === null)
            this.fault = fault;
        const w = this.waiter;
        if (w !== null) {
            this.waiter = null;
            w.reject(this.fault);
        }
    }
    onData(chunk) {
        if (this.discarding)
            return;
        let start = 0;
        for (;;) {
            const nl = chunk.indexOf(10, start);
            if (nl < 0)
                break;
            const piece = chunk.subarray(start, nl);
            if (this.pendingBytes + piece.length > this.options.maxLineBytes)
                return this.tooLong(piece);
            let text;
            if (this.chunks.length === 0)
                text = piece.toString("utf8");
            else {
                this.chunks.push(piece);
                text = Buffer.concat(this.chunks).toString("utf8");
                this.chunks = [];
            }
            this.pendingBytes = 0;
            start = nl + 1;
            this.lineCount++;
            this.deliver(text.endsWith("\r") ? text.slice(0, -1) : text);
        }
        if (start < chunk.length) {
            const rest = chunk.subarray(start);
            if (this.pendingBytes + rest.length > this.options.maxLineBytes)
                return this.tooLong(rest);
            // Copy: the stream may reuse its buffer.
            this.chunks.push(Buffer.from(rest));
            this.pendingBytes += rest.length;
        }
    }
    tooLong(piece) {
        const head = Buffer.concat([...this.chunks, piece.subarray(0, QUOTE_CHARS)])
            .subarray(0, QUOTE_CHARS)
            .toString("utf8");
        this.chunks = [];
        this.discarding = true;
        this.setFault(new ChildFault(`${this.options.label}: line ${this.lineCount + 1} of its output is longer than maxMessageBytes ` +
            `(${this.options.maxLineBytes} bytes), starting ${quoteLine(head)}; the process was stopped`));
        this.kill();
    }
    deliver(line) {
        const w = this.waiter;
        if (w !== null) {
            this.waiter = null;
            w.resolve(line);
        }
        else {
            this.lines.push(line);
        }
    }
    busy() {
        this.child.ref();
        for (const s of [this.child.stdin, this.child.stdout, this.child.stderr])
            s.ref?.();
    }
    idle() {
        this.child.unref();
        for (const s of [this.child.stdin, this.child.stdout, this.child.stderr])
            s.unref?.();
    }
}


/***/ }),

/***/ 2387:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   n: () => (/* binding */ minimalEnvironment),
/* harmony export */   r: () => (/* binding */ PASSED_VARIABLES)
/* harmony export */ });
/**
 * The environment an optimizer process gets: an allow-list, never the harness's own environment.
 *
 * The optimizer under test is untrusted code (a pull request can change it), while the harness may run
 * with a GitHub token and other secrets in its environment (GITHUB_TOKEN, INPUT_*, ACTIONS_*). So the
 * child receives only the variables named here, copied from the harness when set, plus the literal
 * values the config gives under `adapters.NAME.env`. A deny-list would leak every secret nobody
 * thought of; an allow-list leaks none by construction.
 */
/**
 * Variables copied from the harness's environment when set: what programs need to find executables,
 * a home directory, the locale, the time zone and a temporary directory (and their Windows spellings).
 */
const PASSED_VARIABLES = Object.freeze([
    "PATH",
    "HOME",
    "LANG",
    "LANGUAGE",
    "LC_ALL",
    "LC_CTYPE",
    "LC_NUMERIC",
    "TZ",
    "TMPDIR",
    "TEMP",
    "TMP",
    "SYSTEMROOT",
    "WINDIR",
    "PATHEXT",
    "COMSPEC",
    "USERPROFILE",
]);
/**
 * The child's environment: the allow-listed variables from `parent` (when set), then `extra` (literal
 * values from the config) on top. Nothing else.
 */
function minimalEnvironment(parent, extra = {}) {
    const env = {};
    for (const name of PASSED_VARIABLES) {
        const value = parent[name];
        if (value !== undefined)
            env[name] = value;
    }
    for (const [name, value] of Object.entries(extra))
        env[name] = value;
    return env;
}


/***/ }),

/***/ 6902:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   QN: () => (/* binding */ instanceCapabilities),
/* harmony export */   kD: () => (/* binding */ loadModuleOptimizer)
/* harmony export */ });
/* unused harmony exports checkFactory, mergeModuleHyper */
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(3024);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(6760);
/* harmony import */ var node_url__WEBPACK_IMPORTED_MODULE_2__ = __nccwpck_require__(3136);
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_3__ = __nccwpck_require__(4552);
/**
 * The in-process adapter: an optimizer from an ES module of the user's repository, implementing the
 * same `OptimizerFactory` contract as the reference optimizers (src/core/types.ts):
 *
 *   export const myAdam = {
 *     name: "my-adam", title: "...", defaults: { lr: 0.001 },      // name, title, defaults optional
 *     create(hyper, dim) { return { step(x, oracle) { ... }, exportState() {...}, ... }; },
 *   };
 *
 * JavaScript only (ESM; CommonJS through Node's interop). TypeScript sources need a build step first:
 * Node 20 cannot strip types (`use.ts` rejects .ts paths with that advice).
 *
 * Hyperparameters: the factory's `defaults` (if any) are merged under the config's values and the
 * result is passed through unchecked — the module validates its own. The code is untrusted: the run
 * loop double-checks the iterate before reusing a loss (LoadedOptimizer.untrusted → verifyIterate),
 * and `create` is wrapped so that a wrong shape becomes a clear error in the run, never a crash.
 */




const cache = new Map();
/**
 * Imports `path#exportName` relative to `baseDir` and checks its shape. Throws an `InputError` whose
 * message starts with `where` when the file is missing, cannot be imported, lacks the export, or the
 * export is not factory-shaped. Cached per file and export (per thread).
 */
function loadModuleOptimizer(path, exportName, baseDir, where) {
    const file = (0,node_path__WEBPACK_IMPORTED_MODULE_1__.resolve)(baseDir, path);
    const key = `${file}#${exportName}`;
    let loaded = cache.get(key);
    if (loaded === undefined) {
        loaded = load(file, path, exportName, where);
        cache.set(key, loaded);
        loaded.catch(() => cache.delete(key));
    }
    return loaded;
}
async function load(file, path, exportName, where) {
    const label = `module ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .quote */ .h)(`${path}#${exportName}`)}`;
    if (!(0,node_fs__WEBPACK_IMPORTED_MODULE_0__.existsSync)(file))
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d(`${where}: ${label}: no such file ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .quote */ .h)(file)}`);
    let namespace;
    try {
        namespace = (await import(/* webpackIgnore: true */ /* @vite-ignore */ (0,node_url__WEBPACK_IMPORTED_MODULE_2__.pathToFileURL)(file).href));
    }
    catch (err) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d(`${where}: ${label} could not be imported: ${firstLine(err)}`);
    }
    if (!(exportName in namespace)) {
        const names = Object.keys(namespace).sort();
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d(`${where}: ${label} has no export ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .quote */ .h)(exportName)} (exports: ${names.length > 0 ? names.join(", ") : "none"})`);
    }
    const value = namespace[exportName];
    return { factory: checkFactory(value, `${where}: ${label}`, exportName), file };
}
/**
 * Checks that `value` is factory-shaped and returns a wrapper: `defaults` validated once, `create`
 * given a frozen copy of the hyperparameters and its result checked for a `step` method.
 */
function checkFactory(value, where, fallbackName) {
    if (value === null ||
        typeof value !== "object" ||
        typeof value.create !== "function") {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d(`${where} must be an object with a create(hyper, dim) method (an OptimizerFactory), got ${describe(value)}`);
    }
    const source = value;
    const defaults = source.defaults ?? {};
    if (defaults === null || typeof defaults !== "object" || Array.isArray(defaults)) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d(`${where}: defaults must be a mapping of hyperparameter names to values, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .quote */ .h)(defaults)}`);
    }
    for (const [name, v] of Object.entries(defaults)) {
        if (!isHyperValue(v)) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d(`${where}: defaults.${name} must be a finite number, a boolean or a string, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .quote */ .h)(v)}`);
        }
    }
    const name = typeof source.name === "string" && source.name !== "" ? source.name : fallbackName;
    const title = typeof source.title === "string" ? source.title : name;
    const frozenDefaults = Object.freeze({ ...defaults });
    return Object.freeze({
        name,
        title,
        defaults: frozenDefaults,
        create(hyper, dim) {
            const instance = source.create.call(source, Object.freeze({ ...hyper }), dim);
            if (instance === null ||
                typeof instance !== "object" ||
                typeof instance.step !== "function") {
                throw new Error(`create(hyper, dim) must return an object with a step(x, oracle) method, got ${describe(instance)}`);
            }
            return instance;
        },
    });
}
/** The factory's defaults under the config's values (the config wins); nothing is checked. */
function mergeModuleHyper(factory, given) {
    return { ...factory.defaults, ...given };
}
/** Which optional capabilities an instance has (probed on an instance made for the purpose). */
function instanceCapabilities(instance) {
    return {
        state: typeof instance.exportState === "function" && typeof instance.importState === "function",
        lr: typeof instance.setLearningRate === "function",
    };
}
function isHyperValue(v) {
    return typeof v === "boolean" || typeof v === "string" || (typeof v === "number" && Number.isFinite(v));
}
function describe(value) {
    if (typeof value === "function")
        return "a function (export the factory object, not a class or function)";
    if (value === null || typeof value !== "object")
        return (0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .quote */ .h)(value);
    const keys = Object.keys(value);
    return keys.length === 0 ? "an object without methods" : `an object with ${keys.slice(0, 8).join(", ")}`;
}
function firstLine(err) {
    const text = err instanceof Error ? err.message : String(err);
    return text.split("\n")[0];
}


/***/ }),

/***/ 3065:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {


// EXPORTS
__nccwpck_require__.d(__webpack_exports__, {
  M: () => (/* binding */ ProcessSession)
});

// UNUSED EXPORTS: parseWithNonFinite

// EXTERNAL MODULE: external "node:fs"
var external_node_fs_ = __nccwpck_require__(3024);
// EXTERNAL MODULE: ./node_modules/ajv/dist/2020.js
var _2020 = __nccwpck_require__(2210);
// EXTERNAL MODULE: ./build/package/core/version.js
var version = __nccwpck_require__(6063);
// EXTERNAL MODULE: ./build/package/adapters/child.js
var child = __nccwpck_require__(5742);
// EXTERNAL MODULE: ./build/package/adapters/env.js
var env = __nccwpck_require__(2387);
// EXTERNAL MODULE: ./build/package/core/rng.js
var rng = __nccwpck_require__(2906);
// EXTERNAL MODULE: ./build/package/runner/recorder.js
var recorder = __nccwpck_require__(8022);
;// CONCATENATED MODULE: ./build/package/adapters/process-run.js


class ProtocolRun {
    request;
    now;
    problem;
    dim;
    /** The last reported iterate x_k. */
    x;
    grad;
    /** Scratch for a requested evaluation point. */
    point;
    recorder;
    status = "running";
    /** Id of the client-side instance (changes when a resume scenario restarts the run). */
    clientId = -1;
    /** Global step at which the current client instance started (its step 1 is step base + 1). */
    instanceBase = 0;
    /** Completed steps. */
    k = 0;
    evaluations = 0;
    /** True while x_k is not yet measured (waiting for the next evaluation or the end of the run). */
    pending = false;
    /** Evaluations used by the end of step k. */
    evalsAtK = 0;
    /** Set when the run waits for its exported state (resume scenario). */
    awaitingState = false;
    metrics = null;
    startedAt;
    seedHex;
    every;
    constructor(request, now) {
        this.request = request;
        this.now = now;
        const { spec, seedIndex, suiteSeed, definition } = request;
        const runSeed = (0,rng/* deriveRunSeed */.EK)(suiteSeed, spec.problemKey, seedIndex);
        this.seedHex = (0,rng/* seedToHex */.K$)(runSeed);
        this.problem = definition.create(spec.params, { noise: (0,rng/* runStream */.G5)(runSeed, rng/* STREAM */.dY.noise) });
        this.dim = this.problem.dim;
        this.x = new Float64Array(this.dim);
        this.grad = new Float64Array(this.dim);
        this.point = new Float64Array(this.dim);
        this.problem.start(this.x, (0,rng/* runStream */.G5)(runSeed, rng/* STREAM */.dY.start));
        this.recorder = new recorder/* RunRecorder */.K(spec, this.problem.fStar);
        this.every = this.problem.stochastic ? Math.max(1, spec.measureEvery) : 1;
        this.startedAt = now();
    }
    get spec() {
        return this.request.spec;
    }
    /** Measures f(x₀). Returns the metrics if the run must not start (non-finite f₀), else null. */
    begin() {
        const first = this.recorder.begin(this.problem.objective(this.x));
        return first === null ? null : this.end(first, 0);
    }
    /** The `start` entry for a client instance with id `clientId` (from x_k, with `state` for a restart). */
    startEntry(clientId, state) {
        this.clientId = clientId;
        this.instanceBase = this.k;
        const pauseAt = this.request.control?.pauseAt;
        const pause = pauseAt !== undefined && pauseAt > this.k ? pauseAt - this.k : undefined;
        return {
            run: clientId,
            optimizer: this.request.optimizer,
            hyper: this.spec.hyper,
            dim: this.dim,
            x: Array.from(this.x),
            ...(state !== undefined ? { state } : {}),
            ...(pause !== undefined ? { pause } : {}),
        };
    }
    /**
     * The client completed step k+1 with iterate `x` (already checked for length; null = not finite).
     * Records it, applies the budgets, and says whether the run goes on.
     */
    onStep(x) {
        if (this.pending && this.measure(this.problem.objective(this.x), this.evalsAtK))
            return this.status;
        const k = ++this.k;
        if (x === null) {
            this.x.fill(NaN);
            this.recorder.keepIterate(k, this.x);
            this.request.control?.afterStep?.(k, this.x);
            const verdict = this.recorder.record(k, NaN, this.evaluations);
            return this.stop(verdict ?? "diverged", this.evaluations);
        }
        const xs = this.x;
        for (let i = 0; i < xs.length; i++)
            xs[i] = x[i];
        this.recorder.keepIterate(k, xs);
        this.request.control?.afterStep?.(k, xs);
        this.evalsAtK = this.evaluations;
        const { steps: maxSteps, evaluations: maxEvals, seconds } = this.spec.budget;
        const stochastic = this.problem.stochastic;
        if (stochastic) {
            if (k % this.every === 0 || k === maxSteps) {
                const verdict = this.recorder.record(k, this.problem.objective(xs), this.evaluations);
                if (verdict !== null)
                    return this.stop(verdict, this.evaluations);
            }
        }
        else {
            this.pending = true;
        }
        let budget = null;
        if (maxEvals > 0 && this.evaluations >= maxEvals)
            budget = "evaluations";
        else if ((k & 63) === 0 && this.now() - this.startedAt > seconds * 1000)
            budget = "time";
        else if (k >= maxSteps)
            budget = "steps";
        if (budget !== null) {
            let verdict = null;
            if (this.pending) {
                this.pending = false;
                verdict = this.recorder.record(k, this.problem.objective(xs), this.evaluations);
            }
            else if (stochastic && k % this.every !== 0 && k !== maxSteps) {
                verdict = this.recorder.record(k, this.problem.objective(xs), this.evaluations);
            }
            return this.stop(verdict ?? budget, this.evaluations);
        }
        if (this.request.control?.pauseAt === k)
            this.status = "paused";
        return this.status;
    }
    /**
     * The client asks for the loss and gradient at `x` (length already checked; null = not finite;
     * "iterate" = at x_k, from a step entry's `eval: true`). Returns the answer (a values entry as JSON
     * text), or null when the run
     * ended instead (target reached or divergence found while measuring x_k).
     */
    onEval(x) {
        let atIterate = x === "iterate";
        if (x !== "iterate" && x !== null && this.pending)
            atIterate = sameBits(x, this.x);
        if (this.pending) {
            this.pending = false;
            if (atIterate) {
                const f = this.problem.evaluate(this.x, this.grad);
                this.evaluations++;
                const verdict = this.recorder.record(this.k, f, this.evalsAtK);
                if (verdict !== null) {
                    this.stop(verdict, this.evalsAtK);
                    return null;
                }
                return this.values(f);
            }
            const verdict = this.recorder.record(this.k, this.problem.objective(this.x), this.evalsAtK);
            if (verdict !== null) {
                this.stop(verdict, this.evalsAtK);
                return null;
            }
        }
        if (x === null) {
            // A point that is no longer finite: the run has diverged during step k+1.
            this.evaluations++;
            const verdict = this.recorder.record(this.k + 1, NaN, this.evaluations);
            this.stop(verdict ?? "diverged", this.evaluations);
            return null;
        }
        let f;
        if (atIterate) {
            f = this.problem.evaluate(this.x, this.grad);
        }
        else {
            const p = this.point;
            const xs = x;
            for (let i = 0; i < p.length; i++)
                p[i] = xs[i];
            f = this.problem.evaluate(p, this.grad);
        }
        this.evaluations++;
        return this.values(f);
    }
    /** The client's optimizer code failed: the run ends with an error naming the phase and the step. */
    onFailed(phase, message) {
        const next = this.k + 1;
        const text = phase === "create"
            ? `creating the optimizer failed: ${message}`
            : phase === "step"
                ? `step ${next} threw: ${message}`
                : phase === "exportState"
                    ? `exportState after step ${this.k} failed: ${message}`
                    : `${phase} before step ${next} failed: ${message}`;
        this.fail(text);
    }
    /** Ends the run with stop "error" and `reason` (no further measurement). */
    fail(reason) {
        return this.end("error", this.evaluations, reason);
    }
    /** The values entry as JSON text (non-finite numbers as null), built directly: the hot path. */
    values(f) {
        const g = this.grad;
        let text = `{"run":${this.clientId},"f":${jsonNumber(f)},"g":[`;
        for (let i = 0; i < g.length; i++)
            text += i === 0 ? jsonNumber(g[i]) : `,${jsonNumber(g[i])}`;
        return text + "]}";
    }
    /** Records f(x_k) for a pending measurement; true if the run ended. */
    measure(f, evaluations) {
        this.pending = false;
        const verdict = this.recorder.record(this.k, f, evaluations);
        if (verdict === null)
            return false;
        this.stop(verdict, evaluations);
        return true;
    }
    stop(reason, evaluations) {
        this.end(reason, evaluations);
        return this.status;
    }
    end(stop, evaluations, error) {
        if (this.metrics === null) {
            this.metrics = this.recorder.finish({
                seed: this.request.seedIndex,
                runSeed: this.seedHex,
                stop,
                evaluations,
                error,
            });
        }
        this.status = "ended";
        return this.metrics;
    }
}
/** A number as JSON writes it (the same digits as JSON.stringify), null for NaN and ±Infinity. */
function jsonNumber(x) {
    return Number.isFinite(x) ? String(x) : "null";
}
/** Bitwise equality of a requested point and the iterate (so -0 ≠ 0 and NaN never matches). */
function sameBits(a, b) {
    for (let i = 0; i < b.length; i++)
        if (!Object.is(a[i], b[i]))
            return false;
    return true;
}

;// CONCATENATED MODULE: ./build/package/adapters/protocol.js
/**
 * The subprocess protocol, version 1: the messages the harness and an optimizer process exchange as
 * JSON lines over the process's stdin (harness → client) and stdout (client → harness). The JSON
 * Schemas of these messages are in ./protocol-schema.ts and ship as files in schema/protocol/; the
 * design is recorded in docs/adapters.md ("The subprocess protocol").
 *
 * Shape of a session:
 *   harness: hello            client: ready      (version and the optimizers it serves, with capabilities)
 *   harness: orders           client: report     (repeated; exactly one report answers each orders)
 *   harness: bye              client exits
 *
 * One `orders` message carries work for many runs at once (start, evaluation values, resume, state
 * export, end); its `report` answers for exactly those runs (step boundaries with iterates, evaluation
 * requests, exported states, failures) and no others. A run the orders do not name waits. The client
 * answers orders one by one, in the order received; the harness may send a second orders (for other
 * runs) before the first report arrives, so both sides compute at the same time. The harness owns the
 * problems: the client never sees a problem, only points it asked about and the loss and gradient there.
 *
 * A run's life in the client: `start` → evaluation requests and step reports, each step ending with
 * the new iterate; after a step reported without an evaluation request for the next step (a step that
 * needed none, or the pause point) the run waits until an orders `resume`s it.
 *
 * Numbers: every number is a JSON number. JSON has no NaN or Infinity, so non-finite values are
 * spelled `null` where the protocol allows it: a non-finite loss or gradient entry the harness
 * computed, or a client iterate or evaluation point that is no longer finite (the run has diverged).
 * A bare NaN or Infinity token is not JSON and is a protocol fault.
 */
/** The protocol versions this harness speaks, newest last. */
const PROTOCOL_VERSIONS = [1];
/** Optional optimizer capabilities a client declares in its handshake. */
const CAPABILITIES = ["state", "lr"];
/** Where in a run a client-side failure happened. */
const FAILURE_PHASES = ["create", "step", "exportState", "importState", "setLearningRate"];

;// CONCATENATED MODULE: ./build/package/adapters/protocol-schema.js
/**
 * JSON Schemas (draft 2020-12) of every message of the subprocess protocol, version 1 (see
 * ./protocol.ts for the meaning of each field). The harness validates what a client sends against
 * `readySchema` and `reportSchema` with ajv; client authors validate what they receive against the
 * harness messages. scripts/write-schemas.ts writes these objects to schema/protocol/ and
 * tests/adapters/protocol-schema.test.ts fails when a shipped file differs from the object here.
 *
 * What a schema cannot say is checked by the harness in code: vector lengths (the run's dimension),
 * run ids that exist, and the order of a run's entries.
 */

const BASE = "https://gradgate.dev/schema/protocol/v1";
const DRAFT = "https://json-schema.org/draft/2020-12/schema";
const runId = { type: "integer", minimum: 0, maximum: 9007199254740991, description: "Run id." };
const runIds = { type: "array", items: runId };
const count = { type: "integer", minimum: 1, maximum: 9007199254740991 };
const finiteVector = { type: "array", items: { type: "number" } };
const vectorOrNull = {
    type: ["array", "null"],
    items: { type: "number" },
    description: "A point; null when it is not finite (NaN or ±Infinity cannot be written in JSON).",
};
const hyperValues = {
    type: "object",
    additionalProperties: { type: ["number", "boolean", "string"] },
};
const state = {
    type: "object",
    description: "An optimizer's exported state: named numbers and arrays of numbers.",
    additionalProperties: {
        anyOf: [{ type: "number" }, { type: "array", items: { type: "number" } }],
    },
};
const helloSchema = {
    $schema: DRAFT,
    $id: `${BASE}/hello.schema.json`,
    title: "gradgate protocol: hello (harness → client, first message)",
    type: "object",
    additionalProperties: false,
    required: ["type", "protocols", "harness"],
    properties: {
        type: { const: "hello" },
        protocols: {
            type: "array",
            minItems: 1,
            items: { type: "integer", minimum: 1 },
            description: "Protocol versions the harness speaks; the client answers with one of them.",
        },
        harness: { type: "string", description: "Name and version of the harness (informative)." },
    },
};
const readySchema = {
    $schema: DRAFT,
    $id: `${BASE}/ready.schema.json`,
    title: "gradgate protocol: ready (client → harness, answer to hello)",
    type: "object",
    additionalProperties: false,
    required: ["type", "protocol", "optimizers"],
    properties: {
        type: { const: "ready" },
        protocol: { type: "integer", minimum: 1, description: "The version chosen from hello.protocols." },
        client: { type: "string", maxLength: 200, description: "Name and version of the client (informative)." },
        optimizers: {
            type: "array",
            minItems: 1,
            description: "The optimizers this process serves.",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["name", "capabilities"],
                properties: {
                    name: { type: "string", pattern: "^[A-Za-z0-9][A-Za-z0-9_.-]*$", maxLength: 100 },
                    title: { type: "string", maxLength: 300 },
                    defaults: {
                        ...hyperValues,
                        description: "Default hyperparameters; the config's values override them.",
                    },
                    capabilities: {
                        type: "array",
                        uniqueItems: true,
                        items: { type: "string", enum: [...CAPABILITIES] },
                        description: '"state": exportState/importState (resume); "lr": setLearningRate between steps.',
                    },
                },
            },
        },
    },
};
const ordersSchema = {
    $schema: DRAFT,
    $id: `${BASE}/orders.schema.json`,
    title: "gradgate protocol: orders (harness → client; answered by exactly one report, in order)",
    type: "object",
    additionalProperties: false,
    required: ["type"],
    properties: {
        type: { const: "orders" },
        start: {
            type: "array",
            description: "New runs: create an instance, then begin stepping from x.",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["run", "optimizer", "hyper", "dim", "x"],
                properties: {
                    run: runId,
                    optimizer: { type: "string" },
                    hyper: { ...hyperValues, description: "Hyperparameters with the optimizer's defaults merged in." },
                    dim: count,
                    x: { ...finiteVector, description: "Start point, length dim." },
                    state: { ...state, description: "Import this state before the first step." },
                    pause: {
                        ...count,
                        description: "After completing this step (counted from 1 for this instance), wait for resume.",
                    },
                },
            },
        },
        values: {
            type: "array",
            description: "Loss and gradient at the point each run asked about; null = not finite.",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["run", "f", "g"],
                properties: {
                    run: runId,
                    f: { type: ["number", "null"] },
                    g: { type: "array", items: { type: ["number", "null"] } },
                },
            },
        },
        resume: {
            type: "array",
            description: "Waiting runs to continue: at their pause point, or after a step reported without an evaluation request.",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["run"],
                properties: {
                    run: runId,
                    lr: {
                        type: "number",
                        exclusiveMinimum: 0,
                        description: "Call setLearningRate(lr) before the next step.",
                    },
                    pause: {
                        ...count,
                        description: "New pause point: after this step (counted from 1 for this instance).",
                    },
                },
            },
        },
        exportState: { ...runIds, description: "Paused runs whose state the report must carry in states." },
        end: { ...runIds, description: "Runs that are over: forget them." },
    },
};
const byeSchema = {
    $schema: DRAFT,
    $id: `${BASE}/bye.schema.json`,
    title: "gradgate protocol: bye (harness → client, last message; the client exits with status 0)",
    type: "object",
    additionalProperties: false,
    required: ["type"],
    properties: { type: { const: "bye" } },
};
const reportSchema = {
    $schema: DRAFT,
    $id: `${BASE}/report.schema.json`,
    title: "gradgate protocol: report (client → harness; answers one orders, for exactly the runs it names)",
    type: "object",
    additionalProperties: false,
    required: ["type"],
    properties: {
        type: { const: "report" },
        steps: {
            type: "array",
            description: "Completed steps (at most one per run per report, before that run's evaluation request).",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["run", "x"],
                properties: {
                    run: runId,
                    x: { ...vectorOrNull, description: "The new iterate, length dim; null when it is not finite." },
                    eval: {
                        type: "boolean",
                        description: "true: the next step's first evaluation is at this iterate.",
                    },
                },
            },
        },
        evals: {
            type: "array",
            description: "Evaluation requests (at most one outstanding per run).",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["run", "x"],
                properties: { run: runId, x: vectorOrNull },
            },
        },
        states: {
            type: "array",
            description: "States asked for by orders.exportState.",
            items: {
                type: "object",
                additionalProperties: false,
                required: ["run", "state"],
                properties: { run: runId, state },
            },
        },
        failed: {
            type: "array",
            description: 'Runs whose optimizer code raised an error; each ends with stop "error".',
            items: {
                type: "object",
                additionalProperties: false,
                required: ["run", "phase", "message"],
                properties: {
                    run: runId,
                    phase: { type: "string", enum: [...FAILURE_PHASES] },
                    message: { type: "string" },
                },
            },
        },
    },
};
/** Every protocol schema with the file it ships as (paths relative to the repository root). */
const PROTOCOL_SCHEMAS = [
    { file: "schema/protocol/hello.schema.json", schema: helloSchema },
    { file: "schema/protocol/ready.schema.json", schema: readySchema },
    { file: "schema/protocol/orders.schema.json", schema: ordersSchema },
    { file: "schema/protocol/report.schema.json", schema: reportSchema },
    { file: "schema/protocol/bye.schema.json", schema: byeSchema },
];

;// CONCATENATED MODULE: ./build/package/adapters/session.js
/**
 * A process adapter session: one optimizer process (restarted when it dies) serving many runs at once.
 *
 * Each turn the harness sends one `orders` message — new runs to start, the loss and gradient for every
 * evaluation asked for in the last report, paused runs to resume, states to export, runs that are over
 * — and reads one `report` with the next evaluation requests and step boundaries of all its runs. Up to
 * `maxRuns` runs are in flight; a finished run's slot goes to the next queued run in the next turn, so
 * the traffic (and everything else) depends only on the requests, never on timing.
 *
 * Containment. Faults of one run end that run only, with a reason naming the report, the field, the
 * run and the bad value: a vector of the wrong length, NaN or Infinity in a point, a failure raised by
 * the optimizer code, an entry out of order. Faults of the process end every run in flight, with the
 * reason and the tail of the process's stderr: a crash, no report within the message time-out, a line
 * that is not JSON (anything a program prints to stdout by mistake), a message that is not a protocol
 * report, a line over `maxMessageBytes`. The process is then stopped and a fresh one serves the runs
 * still queued. Nothing a client does makes `run` throw. A run still going after the run time-out
 * ends with an error at the next report.
 */








let validators = null;
function getValidators() {
    if (validators === null) {
        const ajv = new _2020.Ajv2020({ allErrors: true, strict: true, allowUnionTypes: true });
        validators = { ready: ajv.compile(readySchema), report: ajv.compile(reportSchema) };
    }
    return validators;
}
/** Marker that replaces a bare NaN/Infinity token so the rest of a line can still be read. */
const NON_FINITE = "\u0000non-finite:";
const SECTIONS = ["steps", "evals", "states", "failed"];
class ProcessSession {
    settings;
    options;
    link = null;
    readyMessage = null;
    nextClientId = 0;
    reports = 0;
    queue = Promise.resolve();
    now;
    /** Runs ended in the last report of the previous `run` call, named in the next orders' `end`. */
    ends = [];
    label;
    constructor(settings, options = {}) {
        this.settings = settings;
        this.options = options;
        this.now = options.now ?? (() => performance.now());
        this.label = `adapter ${JSON.stringify(settings.name)}`;
    }
    /** The handshake: starts the process if needed and returns what it serves. Throws a `ChildFault`. */
    describe() {
        return this.exclusive(() => this.ensureStarted());
    }
    /** Runs every request; resolves with their metrics in request order. Never rejects for client faults. */
    run(requests) {
        return this.exclusive(() => this.runAll(requests));
    }
    /** Says bye and waits for the process to exit (killing it after a grace period). */
    close() {
        return this.exclusive(async () => {
            const link = this.link;
            this.link = null;
            if (link !== null) {
                const bye = JSON.stringify({ type: "bye" });
                if (link.alive)
                    this.options.onLine?.("out", bye);
                await link.close(bye);
            }
        });
    }
    /** Process id of the current child (tests). */
    get pid() {
        return this.link?.pid;
    }
    /** The tail of the current (or last) child's stderr. */
    stderrTail() {
        return this.link?.stderrTail() ?? "";
    }
    exclusive(task) {
        const result = this.queue.then(task, task);
        this.queue = result.catch(() => { });
        return result;
    }
    async ensureStarted() {
        if (this.link !== null && this.link.alive && this.readyMessage !== null)
            return this.readyMessage;
        if (this.link !== null)
            this.link.kill();
        const s = this.settings;
        if (!(0,external_node_fs_.existsSync)(s.cwd)) {
            throw new child/* ChildFault */.X_(`${this.label}: the working directory ${(0,child/* quoteLine */.tQ)(s.cwd)} does not exist (adapters.${s.name}.cwd)`);
        }
        const link = new child/* ChildLink */.rl({
            command: s.command,
            cwd: s.cwd,
            env: (0,env/* minimalEnvironment */.n)(this.options.parentEnv ?? process.env, s.env),
            maxLineBytes: s.maxMessageBytes,
            label: this.label,
        });
        this.link = link;
        this.readyMessage = null;
        this.ends = [];
        this.reports = 0;
        const hello = {
            type: "hello",
            protocols: [...PROTOCOL_VERSIONS],
            harness: `${version/* TOOL_NAME */.l} ${version/* TOOL_VERSION */.w}`,
        };
        let line;
        try {
            line = await this.exchange(link, JSON.stringify(hello), s.timeouts.start, "ready message (handshake)");
        }
        catch (err) {
            throw this.withStderr(err, link);
        }
        const fail = (why) => {
            link.kill();
            return this.withStderr(new child/* ChildFault */.X_(`${this.label}: handshake failed: ${why}`), link);
        };
        let message;
        try {
            message = JSON.parse(line);
        }
        catch {
            throw fail(`the first line is not JSON: ${(0,child/* quoteLine */.tQ)(line)}`);
        }
        const { ready } = getValidators();
        if (!ready(message))
            throw fail(`the first line is not a ready message (${ajvText(ready.errors)}): ${(0,child/* quoteLine */.tQ)(line)}`);
        const msg = message;
        if (!PROTOCOL_VERSIONS.includes(msg.protocol)) {
            throw fail(`protocol ${msg.protocol} is not spoken here (harness speaks ${PROTOCOL_VERSIONS.join(", ")})`);
        }
        const names = new Set();
        for (const o of msg.optimizers) {
            if (names.has(o.name))
                throw fail(`optimizer ${JSON.stringify(o.name)} is listed twice`);
            names.add(o.name);
        }
        this.readyMessage = msg;
        return msg;
    }
    async exchange(link, out, seconds, waitingFor) {
        const tap = this.options.onLine;
        if (tap === undefined)
            return link.exchange(out, seconds, waitingFor);
        tap("out", out);
        const line = await link.exchange(out, seconds, waitingFor);
        tap("in", line);
        return line;
    }
    withStderr(fault, link = this.link) {
        const tail = link?.stderrTail() ?? "";
        return tail === "" ? fault : new child/* ChildFault */.X_(`${fault.reason}\nstderr (last lines):\n${tail}`);
    }
    async runAll(requests) {
        const results = new Array(requests.length);
        const index = new Map();
        const settle = (run) => {
            results[index.get(run)] = run.metrics;
        };
        // Two lanes when there is room: the client works on one lane's orders while the harness works on
        // the other's report. Each lane is strictly request/reply; the client answers orders in the order
        // received, so the sequence of messages (and every decision) does not depend on timing.
        const max = this.settings.maxRuns;
        const lanes = (max >= 2 ? [Math.ceil(max / 2), Math.floor(max / 2)] : [max]).map((capacity) => ({
            capacity,
            active: new Map(),
            turn: new Turn([]),
        }));
        lanes[0].turn.end.push(...this.ends);
        this.ends = [];
        let next = 0;
        const inFlight = () => lanes.reduce((n, lane) => n + lane.active.size, 0);
        const fill = (lane) => {
            while (lane.active.size < lane.capacity && next < requests.length) {
                const run = new ProtocolRun(requests[next], this.now);
                index.set(run, next++);
                if (run.begin() !== null) {
                    settle(run);
                    continue;
                }
                const id = this.nextClientId++;
                lane.turn.start.push(run.startEntry(id));
                lane.turn.served.add(id);
                lane.active.set(id, run);
            }
        };
        while (next < requests.length || inFlight() > 0) {
            if (inFlight() === 0 && (this.link === null || !this.link.alive || this.readyMessage === null)) {
                try {
                    await this.ensureStarted();
                }
                catch (err) {
                    const reason = err instanceof child/* ChildFault */.X_ ? err.reason : String(err);
                    for (; next < requests.length; next++) {
                        const run = new ProtocolRun(requests[next], this.now);
                        index.set(run, next);
                        if (run.begin() === null)
                            run.fail(reason);
                        settle(run);
                    }
                    break;
                }
                for (const lane of lanes)
                    lane.turn = new Turn([]);
            }
            const link = this.link;
            const waiting = [];
            const send = (lane) => {
                fill(lane);
                if (lane.active.size === 0)
                    return;
                const text = lane.turn.message(lane.active);
                this.options.onLine?.("out", text);
                link.send(text);
                waiting.push(lane);
            };
            lanes.forEach(send);
            let fault = null;
            while (waiting.length > 0) {
                const lane = waiting.shift();
                let line;
                try {
                    line = await link.next(this.settings.timeouts.message, "report");
                }
                catch (err) {
                    fault = this.withStderr(err, link).reason;
                    break;
                }
                this.options.onLine?.("in", line);
                this.reports++;
                const following = new Turn([]);
                const processFault = this.processReport(line, lane.turn, following, lane.active, settle);
                if (processFault !== null) {
                    link.kill();
                    fault = this.withStderr(new child/* ChildFault */.X_(processFault), link).reason;
                    break;
                }
                lane.turn = following;
                send(lane);
            }
            if (fault !== null) {
                for (const lane of lanes) {
                    this.faultAll(lane.active, fault, settle);
                    lane.turn = new Turn([]);
                }
            }
        }
        // Runs ended in the last reports are still known to the client: name them in the next orders.
        for (const lane of lanes)
            this.ends.push(...lane.turn.end);
        return results;
    }
    faultAll(active, reason, settle) {
        for (const run of active.values()) {
            run.fail(reason);
            settle(run);
        }
        active.clear();
    }
    /**
     * Applies one report to the runs and assembles the next orders in `next`. Run-level faults end single
     * runs; returns the reason of a fault that concerns the whole process (the caller then stops it).
     */
    processReport(line, turn, next, active, settle) {
        const where = `${this.label}: report ${this.reports}`;
        let data;
        try {
            data = JSON.parse(line);
        }
        catch {
            data = parseWithNonFinite(line);
            if (data === undefined) {
                return `${where} is not JSON (stdout must carry protocol messages only; write diagnostics to stderr): ${(0,child/* quoteLine */.tQ)(line)}`;
            }
        }
        if (data === null ||
            typeof data !== "object" ||
            Array.isArray(data) ||
            data.type !== "report") {
            return `${where} is not a protocol report (expected a JSON object with "type": "report"): ${(0,child/* quoteLine */.tQ)(line)}`;
        }
        const report = data;
        const endRun = (id, reason) => {
            const run = active.get(id);
            if (run !== undefined && run.status !== "ended")
                run.fail(reason);
        };
        const isOver = (id) => active.get(id).status === "ended";
        // Schema check; an error inside one entry ends that entry's run only.
        const { report: validate } = getValidators();
        if (!validate(report)) {
            const bad = new Map();
            for (const e of validate.errors ?? []) {
                const m = /^\/(steps|evals|states|failed)\/(\d+)(.*)$/.exec(e.instancePath);
                const section = m?.[1];
                const list = section !== undefined ? report[section] : undefined;
                const entry = Array.isArray(list) && m ? list[Number(m[2])] : undefined;
                const id = entry?.run;
                if (m === null || section === undefined || typeof id !== "number" || !active.has(id)) {
                    return `${where} is not a valid report: ${e.instancePath || "the message"} ${e.message}: ${(0,child/* quoteLine */.tQ)(line)}`;
                }
                const path = `${section}[${m[2]}]${jsonPointerToPath(m[3])}`;
                const value = valueAt(entry, m[3]);
                const detail = typeof value === "string" && value.startsWith(NON_FINITE)
                    ? `is ${value.slice(NON_FINITE.length)}, which JSON cannot carry (send null for a point that is not finite)`
                    : `${e.message}, got ${(0,child/* quoteLine */.tQ)(JSON.stringify(value) ?? "nothing")}`;
                endRun(id, `${where}: ${path} of run ${id} ${detail}`);
                let set = bad.get(section);
                if (set === undefined)
                    bad.set(section, (set = new Set()));
                set.add(Number(m[2]));
            }
            for (const [section, indices] of bad) {
                const kept = report[section].filter((_, i) => !indices.has(i));
                report[section] = kept;
            }
        }
        const msg = report;
        // Every id must be a run in flight; anything else is a client bug that confuses all runs.
        for (const section of SECTIONS) {
            for (const entry of (msg[section] ?? [])) {
                if (!active.has(entry.run)) {
                    return `${where}: ${section} names run ${entry.run}, which is not in flight: ${(0,child/* quoteLine */.tQ)(line)}`;
                }
            }
        }
        const addressed = new Set();
        const stepped = new Set();
        const evaluated = new Set();
        (msg.steps ?? []).forEach((entry, i) => {
            const id = entry.run;
            addressed.add(id);
            if (isOver(id))
                return;
            const run = active.get(id);
            if (stepped.has(id))
                return endRun(id, `${where}: steps[${i}] is a second step of run ${id} in one report`);
            stepped.add(id);
            if (!turn.served.has(id)) {
                return endRun(id, `${where}: steps[${i}] reports a step of run ${id}, which is paused after step ${run.k}`);
            }
            if (entry.x !== null && entry.x.length !== run.dim) {
                return endRun(id, `${where}: steps[${i}].x of run ${id} has ${entry.x.length} numbers, expected ${run.dim}`);
            }
            const status = run.onStep(entry.x);
            if (entry.eval === true && status !== "ended") {
                if (status === "paused") {
                    return endRun(id, `${where}: steps[${i}] of run ${id} asks for an evaluation after pausing at step ${run.k}`);
                }
                evaluated.add(id);
                const values = run.onEval("iterate");
                if (values !== null)
                    next.answer(id, values);
            }
        });
        (msg.evals ?? []).forEach((entry, i) => {
            const id = entry.run;
            addressed.add(id);
            if (isOver(id))
                return;
            const run = active.get(id);
            if (evaluated.has(id))
                return endRun(id, `${where}: evals[${i}] is a second evaluation request of run ${id} in one report`);
            evaluated.add(id);
            if (run.status === "paused" || !turn.served.has(id)) {
                return endRun(id, `${where}: evals[${i}] asks for an evaluation for run ${id}, which is paused after step ${run.k}`);
            }
            if (entry.x !== null && entry.x.length !== run.dim) {
                return endRun(id, `${where}: evals[${i}].x of run ${id} has ${entry.x.length} numbers, expected ${run.dim}`);
            }
            const values = run.onEval(entry.x);
            if (values !== null)
                next.answer(id, values);
        });
        (msg.failed ?? []).forEach((entry) => {
            addressed.add(entry.run);
            if (!isOver(entry.run))
                active.get(entry.run).onFailed(entry.phase, truncate(entry.message, 500));
        });
        (msg.states ?? []).forEach((entry, i) => {
            const id = entry.run;
            addressed.add(id);
            if (isOver(id))
                return;
            const run = active.get(id);
            if (!run.awaitingState)
                return endRun(id, `${where}: states[${i}] carries a state of run ${id}, which was not asked for`);
            run.awaitingState = false;
            run.status = "running";
            // The run goes on in a fresh instance that imports the state (resume scenario).
            next.end.push(id);
            active.delete(id);
            const fresh = this.nextClientId++;
            next.start.push(run.startEntry(fresh, entry.state));
            next.served.add(fresh);
            active.set(fresh, run);
        });
        // Runs that were given something must answer; paused runs must send the state asked for.
        for (const id of turn.served) {
            if (active.has(id) && !addressed.has(id) && !isOver(id)) {
                endRun(id, `${where} says nothing about run ${id} (expected a step, an evaluation request or a failure)`);
            }
        }
        for (const id of turn.exportState) {
            const run = active.get(id);
            if (run !== undefined && run.awaitingState && run.status !== "ended") {
                endRun(id, `${where} does not carry the state of run ${id}, asked for after step ${run.k}`);
            }
        }
        const now = this.now();
        const limit = this.settings.timeouts.run;
        for (const [id, run] of active) {
            if (run.status !== "ended" && now - run.startedAt > limit * 1000) {
                endRun(id, `${this.label}: run time-out: run ${id} still going after ${limit} s (timeouts.run), at step ${run.k}`);
            }
            if (run.status === "ended") {
                active.delete(id);
                next.end.push(id);
                settle(run);
            }
            else if (run.status === "paused") {
                if (stepped.has(id))
                    this.atPause(run, id, next);
            }
            else if (!evaluated.has(id) && stepped.has(id)) {
                // A step without an evaluation request: the run waits until the next orders resume it.
                next.resume.push({ run: id });
                next.served.add(id);
            }
        }
        return null;
    }
    /** A run reached its pause point: put the scenario's action in the next orders. */
    atPause(run, id, next) {
        const action = run.request.control?.action;
        if (action?.kind === "restart") {
            run.awaitingState = true;
            next.exportState.push(id);
            return;
        }
        run.status = "running";
        next.resume.push(action?.kind === "lr" ? { run: id, lr: action.lr } : { run: id });
        next.served.add(id);
    }
}
/** One orders message being assembled, and the client runs it serves. */
class Turn {
    end;
    start = [];
    /** Values entries as JSON text (built without intermediate objects: the hot path). */
    values = [];
    resume = [];
    exportState = [];
    /** Client run ids that must be answered in the report to this turn. */
    served = new Set();
    constructor(end) {
        this.end = end;
    }
    answer(run, text) {
        this.values.push({ run, text });
        this.served.add(run);
    }
    /** The message as one JSON line; entries of runs that ended meanwhile are left out. */
    message(active) {
        const live = (id) => {
            const status = active.get(id)?.status;
            return status === "running" || status === "paused";
        };
        // Joined once at the end: one flat string, cheaper to write than a long chain of concatenations.
        const parts = ['{"type":"orders"'];
        if (this.end.length > 0)
            parts.push(`,"end":${JSON.stringify(this.end)}`);
        if (this.start.length > 0)
            parts.push(`,"start":${JSON.stringify(this.start)}`);
        let first = true;
        for (const v of this.values) {
            if (!live(v.run))
                continue;
            parts.push(first ? ',"values":[' : ",", v.text);
            first = false;
        }
        if (!first)
            parts.push("]");
        const resume = this.resume.filter((r) => live(r.run));
        if (resume.length > 0)
            parts.push(`,"resume":${JSON.stringify(resume)}`);
        const exportState = this.exportState.filter(live);
        if (exportState.length > 0)
            parts.push(`,"exportState":${JSON.stringify(exportState)}`);
        parts.push("}");
        return parts.join("");
    }
}
function truncate(text, max) {
    return text.length > max ? text.slice(0, max - 3) + "..." : text;
}
function ajvText(errors) {
    const e = errors?.[0];
    return e === undefined ? "invalid" : `${e.instancePath || "the message"} ${e.message}`;
}
/** "/x/1" → ".x[1]". */
function jsonPointerToPath(pointer) {
    let out = "";
    for (const part of pointer.split("/").slice(1))
        out += /^\d+$/.test(part) ? `[${part}]` : `.${part}`;
    return out;
}
function valueAt(data, pointer) {
    let v = data;
    for (const part of pointer.split("/").slice(1)) {
        if (v === null || typeof v !== "object")
            return undefined;
        v = v[part];
    }
    return v;
}
/**
 * Reads a line that failed JSON.parse once more with bare NaN, Infinity and -Infinity tokens (outside
 * strings) replaced by marker strings, so that the runs whose points hold them can be named. Returns
 * undefined when the line is not JSON even so.
 */
function parseWithNonFinite(line) {
    if (!/NaN|Infinity/.test(line))
        return undefined;
    let out = "";
    let inString = false;
    let i = 0;
    while (i < line.length) {
        const c = line[i];
        if (inString) {
            out += c;
            if (c === "\\") {
                out += line[i + 1] ?? "";
                i += 2;
                continue;
            }
            if (c === '"')
                inString = false;
            i++;
            continue;
        }
        if (c === '"') {
            inString = true;
            out += c;
            i++;
            continue;
        }
        const token = line.startsWith("-Infinity", i)
            ? "-Infinity"
            : line.startsWith("Infinity", i)
                ? "Infinity"
                : line.startsWith("NaN", i)
                    ? "NaN"
                    : null;
        if (token !== null) {
            out += JSON.stringify(NON_FINITE + token);
            i += token.length;
            continue;
        }
        out += c;
        i++;
    }
    try {
        return JSON.parse(out);
    }
    catch {
        return undefined;
    }
}


/***/ }),

/***/ 2683:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   f: () => (/* binding */ parseUse)
/* harmony export */ });
/* unused harmony export RESERVED_ADAPTER_NAMES */
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(4552);
/**
 * The spellings of `optimizers[].use` in a suite config, and their parser:
 *
 *   adam  |  reference:adam             a reference optimizer of gradgate itself
 *   module:./opt/my-adam.mjs#myAdam     an export of an ES module (JavaScript), path relative to the
 *                                       config file's directory; without "#name", the default export
 *   py:adam                             optimizer "adam" served by the process adapter declared as
 *                                       `adapters.py` in the same config
 *
 * "reference" and "module" are therefore reserved: no process adapter may take either name.
 */

/** Names a process adapter may not take. */
const RESERVED_ADAPTER_NAMES = Object.freeze(["reference", "module"]);
/** File extensions of TypeScript sources, which Node 20 cannot load without a build step. */
const TYPESCRIPT = /\.(ts|mts|cts|tsx)$/i;
/**
 * Parses a `use` string. `adapters` are the process adapters the config declares; `where` locates the
 * string for messages (e.g. `config gradgate.yml: optimizers[2].use`).
 */
function parseUse(use, adapters, where) {
    const colon = use.indexOf(":");
    if (colon < 0)
        return { kind: "reference", name: use };
    const prefix = use.slice(0, colon);
    const rest = use.slice(colon + 1);
    if (prefix === "reference")
        return { kind: "reference", name: rest };
    if (prefix === "module") {
        const hash = rest.lastIndexOf("#");
        const path = hash < 0 ? rest : rest.slice(0, hash);
        const exportName = hash < 0 ? "default" : rest.slice(hash + 1);
        const form = `expected module:PATH#EXPORT, e.g. "module:./opt/my-adam.mjs#myAdam"`;
        if (!(path.startsWith("./") || path.startsWith("../") || path.startsWith("/"))) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where} ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(use)}: the module path must start with "./" or "../" (relative to the config file's directory) or "/"; ${form}`);
        }
        if (TYPESCRIPT.test(path)) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where} ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(use)}: ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(path)} is TypeScript, which Node 20 cannot load directly; ` +
                `compile it to JavaScript first (e.g. tsc) and name the .js or .mjs file (see docs/adapters.md)`);
        }
        if (!/^[A-Za-z_$][A-Za-z0-9_$]*$/.test(exportName)) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where} ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(use)}: ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(exportName)} is not an export name; ${form}`);
        }
        return { kind: "module", path, exportName };
    }
    if (adapters.includes(prefix)) {
        if (rest === "")
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where} ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(use)}: name the optimizer after "${prefix}:"`);
        return { kind: "process", adapter: prefix, optimizer: rest };
    }
    const declared = adapters.length > 0 ? adapters.join(", ") : "none";
    throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where} ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(use)}: ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(prefix)} is neither "reference", "module" nor a process adapter declared under adapters (declared: ${declared})`);
}


/***/ }),

/***/ 4552:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   d: () => (/* binding */ InputError),
/* harmony export */   h: () => (/* binding */ quote)
/* harmony export */ });
/**
 * An error in what the user gave us (config, baseline file, adapter output, command line). Its message
 * names the file, the field, the bad value and the expected form; entry points print it as is and
 * exit with the input-error code.
 */
class InputError extends Error {
    name = "InputError";
}
/** Quotes a user-supplied value for an error message, shortened when long. */
function quote(value) {
    let text;
    if (typeof value === "string")
        text = JSON.stringify(value);
    else if (value === undefined)
        text = "nothing";
    else {
        try {
            text = JSON.stringify(value) ?? String(value);
        }
        catch {
            text = String(value);
        }
    }
    return text.length > 80 ? text.slice(0, 77) + "..." : text;
}


/***/ }),

/***/ 625:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   E: () => (/* binding */ finiteOrNull),
/* harmony export */   d: () => (/* binding */ canonicalJson)
/* harmony export */ });
/**
 * Canonical JSON: object keys sorted, arrays in order, numbers in JavaScript's shortest round-trip
 * form, two-space indentation and a final newline; an array of plain values (numbers, strings, null,
 * booleans) stays on one line, so a run's trace or iterate is one line of a diff. The same value always
 * gives the same bytes, so results and baselines diff cleanly and equal runs compare byte for byte.
 */
function canonicalJson(value) {
    return write(sortKeys(value), "") + "\n";
}
function isPlain(v) {
    return v === null || typeof v !== "object";
}
function write(value, indent) {
    if (Array.isArray(value)) {
        if (value.length === 0)
            return "[]";
        if (value.every(isPlain))
            return "[" + value.map((v) => JSON.stringify(v)).join(", ") + "]";
        const inner = indent + "  ";
        return "[\n" + value.map((v) => inner + write(v, inner)).join(",\n") + "\n" + indent + "]";
    }
    if (value !== null && typeof value === "object") {
        const entries = Object.entries(value);
        if (entries.length === 0)
            return "{}";
        const inner = indent + "  ";
        return ("{\n" +
            entries.map(([k, v]) => inner + JSON.stringify(k) + ": " + write(v, inner)).join(",\n") +
            "\n" +
            indent +
            "}");
    }
    return JSON.stringify(value);
}
function sortKeys(value) {
    if (Array.isArray(value))
        return value.map(sortKeys);
    if (value !== null && typeof value === "object") {
        const out = {};
        for (const key of Object.keys(value).sort()) {
            const v = value[key];
            if (v !== undefined)
                out[key] = sortKeys(v);
        }
        return out;
    }
    if (typeof value === "number" && !Number.isFinite(value)) {
        throw new TypeError(`canonicalJson: non-finite number ${value} cannot be written as JSON; store null instead`);
    }
    return value;
}
/** A finite number, or null for NaN and ±Infinity (JSON has no spelling for them). */
function finiteOrNull(x) {
    return Number.isFinite(x) ? x : null;
}


/***/ }),

/***/ 2906:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   EK: () => (/* binding */ deriveRunSeed),
/* harmony export */   G5: () => (/* binding */ runStream),
/* harmony export */   HS: () => (/* binding */ structureRng),
/* harmony export */   K$: () => (/* binding */ seedToHex),
/* harmony export */   Rq: () => (/* binding */ fnv1a64),
/* harmony export */   Tj: () => (/* binding */ splitmix64),
/* harmony export */   _8: () => (/* binding */ Pcg32),
/* harmony export */   dY: () => (/* binding */ STREAM)
/* harmony export */ });
/**
 * PCG32 — permuted congruential generator, variant XSH RR 64/32.
 *
 * O'Neill, M. E. (2014). "PCG: A Family of Simple Fast Space-Efficient Statistically Good
 * Algorithms for Random Number Generation", Harvey Mudd College, HMC-CS-2014-0905.
 * https://www.pcg-random.org/paper.html
 *
 * state ← state · 6364136223846793005 + inc   (mod 2⁶⁴), inc odd, chosen by the stream
 * out   ← rotr32(((old ≫ 18) ⊕ old) ≫ 27, old ≫ 59)
 *
 * The 64-bit state is held as two uint32 halves so each draw costs a few integer operations and no
 * allocation (BigInt is used only when seeding). Checked against the authors' published output
 * (pcg-c, test-high/expected/check-pcg32.out) in tests/core/rng.test.ts.
 *
 * Cost: O(1) per draw; uniform doubles take two draws, normals two uniforms (polar method).
 */
const MASK64 = (1n << 64n) - 1n;
const MUL_HI = 0x5851f42d;
const MUL_LO = 0x4c957f2d;
class Pcg32 {
    // State in typed arrays: uint32 halves above 2^31 and doubles then live unboxed, so a draw never
    // allocates (object fields holding such numbers may be boxed by the engine).
    /** [state hi, state lo, increment hi, increment lo] */
    s = new Uint32Array(4);
    spare = new Float64Array(1);
    hasSpare = false;
    /** `pcg32_srandom_r(initstate, initseq)` of the reference implementation. */
    constructor(initState, initSeq) {
        const inc = ((initSeq << 1n) | 1n) & MASK64;
        const st = this.s;
        st[2] = Number(inc >> 32n);
        st[3] = Number(inc & 0xffffffffn);
        this.advance();
        const s = ((BigInt(st[0]) << 32n) | BigInt(st[1])) + (initState & MASK64);
        st[0] = Number((s >> 32n) & 0xffffffffn);
        st[1] = Number(s & 0xffffffffn);
        this.advance();
    }
    /** state ← state·MUL + inc (mod 2⁶⁴), on 32-bit halves with 16-bit limbs for the low product. */
    advance() {
        const st = this.s;
        const hi = st[0];
        const lo = st[1];
        const a0 = lo & 0xffff;
        const a1 = lo >>> 16;
        const b0 = MUL_LO & 0xffff;
        const b1 = MUL_LO >>> 16;
        const p00 = a0 * b0;
        const p01 = a0 * b1;
        const p10 = a1 * b0;
        const p11 = a1 * b1;
        const mid = (p00 >>> 16) + (p01 & 0xffff) + (p10 & 0xffff);
        const prodLo = (((mid & 0xffff) << 16) | (p00 & 0xffff)) >>> 0;
        const prodHi = p11 + (p01 >>> 16) + (p10 >>> 16) + (mid >>> 16);
        const newHi = prodHi + Math.imul(hi, MUL_LO) + Math.imul(lo, MUL_HI);
        const sumLo = prodLo + st[3];
        st[1] = sumLo >>> 0;
        st[0] = (newHi + st[2] + (sumLo > 0xffffffff ? 1 : 0)) >>> 0;
    }
    /** Next uniformly distributed uint32 (`pcg32_random_r`). */
    nextU32() {
        const hi = this.s[0];
        const lo = this.s[1];
        this.advance();
        const xhi = hi ^ (hi >>> 18);
        const xlo = lo ^ ((lo >>> 18) | (hi << 14));
        const xs = ((xlo >>> 27) | (xhi << 5)) >>> 0;
        const rot = hi >>> 27;
        return ((xs >>> rot) | (xs << (-rot & 31))) >>> 0;
    }
    /** Uniform integer in [0, bound) without modulo bias (`pcg32_boundedrand_r`). */
    nextBelow(bound) {
        if (!Number.isInteger(bound) || bound < 1 || bound > 0xffffffff) {
            throw new RangeError(`nextBelow: bound must be an integer in [1, 2^32), got ${bound}`);
        }
        const threshold = (0x100000000 - bound) % bound;
        for (;;) {
            const r = this.nextU32();
            if (r >= threshold)
                return r % bound;
        }
    }
    /** Uniform double in [0, 1) with 53 random bits (two draws). */
    nextFloat() {
        const a = this.nextU32() >>> 5;
        const b = this.nextU32() >>> 6;
        return (a * 67108864 + b) / 9007199254740992;
    }
    /**
     * Standard normal N(0, 1) by the Marsaglia–Bray polar method (Marsaglia & Bray 1964, "A convenient
     * method for generating normal variables", SIAM Review 6(3):260–264). Pairs are cached.
     */
    nextNormal() {
        if (this.hasSpare) {
            this.hasSpare = false;
            return this.spare[0];
        }
        let u = 0;
        let v = 0;
        let s = 0;
        do {
            u = 2 * this.nextFloat() - 1;
            v = 2 * this.nextFloat() - 1;
            s = u * u + v * v;
        } while (s >= 1 || s === 0);
        const m = Math.sqrt((-2 * Math.log(s)) / s);
        this.spare[0] = v * m;
        this.hasSpare = true;
        return u * m;
    }
    /** Fills `out` with independent N(0, scale²) draws. */
    fillNormal(out, scale = 1) {
        for (let i = 0; i < out.length; i++)
            out[i] = scale * this.nextNormal();
    }
}
/**
 * FNV-1a, 64-bit, over the UTF-8 bytes of `text` (Fowler, Noll, Vo; IETF draft
 * draft-eastlake-fnv). Used only to turn a run's identity into seed material, once per run.
 */
function fnv1a64(text) {
    let h = 0xcbf29ce484222325n;
    for (const byte of new TextEncoder().encode(text)) {
        h ^= BigInt(byte);
        h = (h * 0x100000001b3n) & MASK64;
    }
    return h;
}
/**
 * SplitMix64 output function (Steele, Lea & Flood 2014, "Fast splittable pseudorandom number
 * generators", OOPSLA), used to mix seed material before it seeds a PCG32 stream.
 */
function splitmix64(x) {
    let z = (x + 0x9e3779b97f4a7c15n) & MASK64;
    z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
    z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
    return z ^ (z >> 31n);
}
/**
 * The seed of one run: a function of the suite seed, the problem instance and the seed index only,
 * so adding, removing or reordering cases never changes another run's numbers, and every optimizer
 * sees the same start points and noise for the same seed index (paired comparisons).
 */
function deriveRunSeed(suiteSeed, problemKey, seedIndex) {
    const base = splitmix64(BigInt(suiteSeed) & MASK64);
    return splitmix64(base ^ fnv1a64(`${problemKey}#${seedIndex}`));
}
/** Named streams of one run, so drawing more noise never shifts the start point. */
const STREAM = {
    start: 1n,
    noise: 2n,
    structure: 3n,
};
function runStream(runSeed, stream) {
    return new Pcg32(runSeed, stream);
}
/** Seed of a problem's fixed structure (rotation, data set): depends on the problem alone. */
function structureRng(problemKey, structureSeed) {
    return new Pcg32(splitmix64(fnv1a64(problemKey) ^ BigInt(structureSeed)), STREAM.structure);
}
function seedToHex(seed) {
    return seed.toString(16).padStart(16, "0");
}


/***/ }),

/***/ 6063:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   l: () => (/* binding */ TOOL_NAME),
/* harmony export */   w: () => (/* binding */ TOOL_VERSION)
/* harmony export */ });
/** gradgate's own version; tests/core/version.test.ts keeps it equal to package.json. */
const TOOL_NAME = "gradgate";
const TOOL_VERSION = "0.1.0";


/***/ }),

/***/ 650:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   B: () => (/* binding */ defineOptimizer),
/* harmony export */   N1: () => (/* binding */ checkLearningRate),
/* harmony export */   Vn: () => (/* binding */ resolveHyper),
/* harmony export */   rA: () => (/* binding */ checkIterate)
/* harmony export */ });
/* unused harmony exports defaultsOf, describeNumberSpec, checkDim, hyperJsonSchema */
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(4552);
/**
 * Hyperparameter specifications of the reference optimizers, and the one validator that applies them.
 *
 * Each reference optimizer declares its hyperparameters once, as a `HyperSpecs` table (type, admissible
 * range or choices, default, description). Everything else is derived from that table: the factory's
 * `defaults`, the validation in `resolveHyper` (used by the config loader and by every `create`), and
 * the JSON Schema fragment from `hyperJsonSchema` (for the config schema and the generated docs).
 *
 * Cost: O(number of hyperparameters) per call; nothing here runs inside a step.
 */

/** The defaults of a spec table, as a frozen `Hyper` in declaration order. */
function defaultsOf(specs) {
    const out = {};
    for (const [name, spec] of Object.entries(specs))
        out[name] = spec.default;
    return Object.freeze(out);
}
/** "a positive number", "a nonnegative number" or "a number in [0, 1)": the expected form of a value. */
function describeNumberSpec(spec) {
    const hasMax = spec.maximum !== undefined || spec.exclusiveMaximum !== undefined;
    if (!hasMax && spec.exclusiveMinimum === 0 && spec.minimum === undefined)
        return "a positive number";
    if (!hasMax && spec.minimum === 0 && spec.exclusiveMinimum === undefined)
        return "a nonnegative number";
    const lo = spec.minimum !== undefined
        ? `[${spec.minimum}`
        : spec.exclusiveMinimum !== undefined
            ? `(${spec.exclusiveMinimum}`
            : "(-∞";
    const hi = spec.maximum !== undefined
        ? `${spec.maximum}]`
        : spec.exclusiveMaximum !== undefined
            ? `${spec.exclusiveMaximum})`
            : "∞)";
    return `a number in ${lo}, ${hi}`;
}
/** Quotes a bad value; numbers keep their JavaScript spelling (NaN and Infinity are not JSON). */
function show(value) {
    return typeof value === "number" ? String(value) : (0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quote */ .h)(value);
}
function inRange(x, spec) {
    if (!Number.isFinite(x))
        return false;
    if (spec.minimum !== undefined && !(x >= spec.minimum))
        return false;
    if (spec.exclusiveMinimum !== undefined && !(x > spec.exclusiveMinimum))
        return false;
    if (spec.maximum !== undefined && !(x <= spec.maximum))
        return false;
    if (spec.exclusiveMaximum !== undefined && !(x < spec.exclusiveMaximum))
        return false;
    return true;
}
/** Throws unless `value` satisfies `spec`; the message names `${where}.${name}` and quotes the value. */
function checkValue(name, spec, value, where) {
    const field = `${where}.${name}`;
    switch (spec.type) {
        case "number":
            if (typeof value !== "number" || !inRange(value, spec)) {
                throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${field} must be ${describeNumberSpec(spec)}, got ${show(value)}`);
            }
            return;
        case "boolean":
            if (typeof value !== "boolean")
                throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${field} must be true or false, got ${show(value)}`);
            return;
        case "choice":
            if (typeof value !== "string" || !spec.choices.includes(value)) {
                const choices = spec.choices.map((c) => JSON.stringify(c)).join(", ");
                throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${field} must be one of ${choices}, got ${show(value)}`);
            }
            return;
    }
}
/**
 * Merges the user's hyperparameters over the factory's defaults and validates every given value.
 *
 * `where` locates the hyperparameter mapping for messages, e.g.
 * `config gradgate.yml: optimizers[1].hyper`, giving
 * `config gradgate.yml: optimizers[1].hyper.lr must be a positive number, got "fast"`.
 * Unknown names, wrong types and out-of-range values throw an `InputError`; nothing is coerced.
 * Returns a frozen mapping with every declared hyperparameter, in declaration order.
 */
function resolveHyper(factory, given, where) {
    if (given === undefined || given === null)
        given = {};
    if (typeof given !== "object" || Array.isArray(given)) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where} must be a mapping of hyperparameter names to values, got ${show(given)}`);
    }
    const specs = factory.hyperSpecs;
    const known = Object.keys(specs);
    const values = given;
    for (const [name, value] of Object.entries(values)) {
        if (!Object.prototype.hasOwnProperty.call(specs, name)) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${where}.${name} is not a hyperparameter of ${factory.name} (known: ${known.join(", ")})`);
        }
        checkValue(name, specs[name], value, where);
    }
    const out = {};
    for (const name of known) {
        out[name] = Object.prototype.hasOwnProperty.call(values, name)
            ? values[name]
            : specs[name].default;
    }
    factory.checkCombination?.(out, where);
    return Object.freeze(out);
}
/** Throws unless `dim` is a positive integer (the problem dimension handed to `create`). */
function checkDim(dim, who) {
    if (typeof dim !== "number" || !Number.isInteger(dim) || dim < 1) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${who}: dim must be a positive integer, got ${show(dim)}`);
    }
    return dim;
}
/** Throws unless `lr` is a positive finite number (for `setLearningRate`). */
function checkLearningRate(lr, who) {
    if (typeof lr !== "number" || !Number.isFinite(lr) || !(lr > 0)) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .d(`${who}: lr must be a positive number, got ${show(lr)}`);
    }
    return lr;
}
/**
 * Throws a `RangeError` unless the iterate has the dimension the instance was created for. Called at
 * the top of every step, so the message is built only on failure (no string work per step).
 */
function checkIterate(x, dim, optimizerName) {
    if (x.length !== dim) {
        throw new RangeError(`${optimizerName}.step: x must have length ${dim}, got length ${x.length}`);
    }
}
/**
 * Builds a reference factory from its spec table: `defaults` is derived from the specs, and `create`
 * validates through `resolveHyper` (so programmatic use is as safe as a config file) before calling
 * `build` with complete, valid values.
 */
function defineOptimizer(def) {
    const factory = {
        name: def.name,
        title: def.title,
        hyperSpecs: def.hyperSpecs,
        defaults: defaultsOf(def.hyperSpecs),
        checkCombination: def.checkCombination,
        create(hyper, dim) {
            const resolved = resolveHyper(factory, hyper, `optimizer ${def.name}: hyper`);
            return def.build(resolved, checkDim(dim, `optimizer ${def.name}`));
        },
    };
    return Object.freeze(factory);
}
/**
 * The JSON Schema (draft 2020-12 vocabulary, as ajv reads it) of one optimizer's hyperparameter
 * mapping, generated from its spec table: unknown names rejected, each value typed and bounded, with
 * its default and description.
 */
function hyperJsonSchema(factory) {
    const properties = {};
    for (const [name, spec] of Object.entries(factory.hyperSpecs)) {
        if (spec.type === "number") {
            const { type: _type, ...bounds } = spec;
            properties[name] = { type: "number", ...bounds };
        }
        else if (spec.type === "boolean") {
            properties[name] = { type: "boolean", default: spec.default, description: spec.description };
        }
        else {
            properties[name] = {
                type: "string",
                enum: [...spec.choices],
                default: spec.default,
                description: spec.description,
            };
        }
    }
    return {
        type: "object",
        description: `Hyperparameters of ${factory.title}.`,
        additionalProperties: false,
        properties,
    };
}


/***/ }),

/***/ 6372:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {


// EXPORTS
__nccwpck_require__.d(__webpack_exports__, {
  r9: () => (/* binding */ OPTIMIZERS),
  bw: () => (/* reexport */ adagrad),
  Ch: () => (/* reexport */ adam),
  dp: () => (/* reexport */ adamw),
  KH: () => (/* binding */ getOptimizer),
  Pg: () => (/* reexport */ momentum),
  fX: () => (/* reexport */ nesterov),
  Vn: () => (/* reexport */ hyper/* resolveHyper */.Vn),
  m0: () => (/* reexport */ rmsprop),
  D5: () => (/* reexport */ sgd)
});

// UNUSED EXPORTS: OPTIMIZER_NAMES, defaultsOf, describeNumberSpec, hyperJsonSchema

// EXTERNAL MODULE: ./build/package/core/errors.js
var errors = __nccwpck_require__(4552);
// EXTERNAL MODULE: ./build/package/optimizers/hyper.js
var hyper = __nccwpck_require__(650);
;// CONCATENATED MODULE: ./build/package/optimizers/state.js
/**
 * Export and import of a reference optimizer's state, for resuming a run in a fresh instance.
 *
 * A state is a flat JSON-safe record: `step` (the step counter, a nonnegative integer), `lr` (the
 * current learning rate, which `setLearningRate` may have changed) and one array of `dim` finite
 * numbers per internal buffer (moments, velocity, accumulator). Each optimizer names its keys in a
 * layout; an import is checked completely against that layout before anything is copied, so a
 * rejected state leaves the instance untouched. Keys differ between forms whose buffers mean
 * different things (e.g. momentum's `velocity` vs `buffer`), so a state cannot be resumed by the wrong
 * form by accident.
 *
 * Cost: O(dim · number of buffers); never called inside a step.
 */

/** Quotes a bad value; numbers (also inside arrays) keep their JavaScript spelling, so NaN shows as NaN. */
function show(value) {
    if (typeof value === "number")
        return String(value);
    if (Array.isArray(value)) {
        const text = `[${value.map((v) => (typeof v === "number" ? String(v) : (0,errors/* quote */.h)(v))).join(",")}]`;
        return text.length > 80 ? text.slice(0, 77) + "..." : text;
    }
    return (0,errors/* quote */.h)(value);
}
/**
 * Throws an `InputError` unless `state` matches `layout` exactly: no missing or unknown keys, counts
 * are nonnegative integers, `lr` is a positive finite number, vectors are arrays of `dim` finite numbers.
 * `who` names the caller, e.g. `importState adam`.
 */
function checkState(state, layout, dim, who) {
    const expected = Object.keys(layout);
    if (state === null || typeof state !== "object" || Array.isArray(state)) {
        throw new errors/* InputError */.d(`${who}: state must be an object with keys ${expected.join(", ")}, got ${show(state)}`);
    }
    const record = state;
    for (const key of Object.keys(record)) {
        if (!Object.prototype.hasOwnProperty.call(layout, key)) {
            throw new errors/* InputError */.d(`${who}: state.${key} is not part of this optimizer's state (expected: ${expected.join(", ")})`);
        }
    }
    for (const key of expected) {
        if (!Object.prototype.hasOwnProperty.call(record, key)) {
            throw new errors/* InputError */.d(`${who}: state.${key} is missing (expected: ${expected.join(", ")})`);
        }
        const value = record[key];
        switch (layout[key]) {
            case "count":
                if (typeof value !== "number" || !Number.isSafeInteger(value) || value < 0) {
                    throw new errors/* InputError */.d(`${who}: state.${key} must be a nonnegative integer, got ${show(value)}`);
                }
                break;
            case "lr":
                if (typeof value !== "number" || !Number.isFinite(value) || !(value > 0)) {
                    throw new errors/* InputError */.d(`${who}: state.${key} must be a positive number, got ${show(value)}`);
                }
                break;
            case "vector":
                if (!Array.isArray(value) ||
                    value.length !== dim ||
                    !value.every((v) => typeof v === "number" && Number.isFinite(v))) {
                    throw new errors/* InputError */.d(`${who}: state.${key} must be an array of ${dim} finite numbers, got ${show(value)}`);
                }
                break;
        }
    }
    return record;
}
/** Copies a checked state vector into an instance buffer. */
function loadVector(state, key, into) {
    const values = state[key];
    for (let i = 0; i < into.length; i++)
        into[i] = values[i];
}
/** A buffer as a plain array (JSON-safe, exact: doubles round-trip through JSON text). */
function saveVector(buffer) {
    return Array.from(buffer);
}

;// CONCATENATED MODULE: ./build/package/optimizers/adagrad.js


const ADAGRAD_HYPER = {
    lr: {
        type: "number",
        exclusiveMinimum: 0,
        default: 0.01,
        description: "Learning rate η. Default 0.01: common practice, the paper leaves it free.",
    },
    eps: {
        type: "number",
        minimum: 0,
        default: 1e-10,
        description: "δ added to √G (outside the square root). Default 1e−10: common practice.",
    },
    initialAccumulator: {
        type: "number",
        minimum: 0,
        default: 0,
        description: "Starting value of the per-coordinate sum of squared gradients G.",
    },
    weightDecay: {
        type: "number",
        minimum: 0,
        default: 0,
        description: "Coupled L2 coefficient λ: λ·x is added to the gradient.",
    },
};
const LAYOUT = { step: "count", lr: "lr", sumSquares: "vector" };
class Adagrad {
    dim;
    grad;
    sumSquares;
    lr;
    eps;
    weightDecay;
    t = 0;
    constructor(hyper, dim) {
        this.dim = dim;
        this.grad = new Float64Array(dim);
        this.sumSquares = new Float64Array(dim).fill(hyper.initialAccumulator);
        this.lr = hyper.lr;
        this.eps = hyper.eps;
        this.weightDecay = hyper.weightDecay;
    }
    step(x, oracle) {
        (0,hyper/* checkIterate */.rA)(x, this.dim, "adagrad");
        const g = this.grad;
        const G = this.sumSquares;
        oracle.evaluate(x, g);
        const lr = this.lr;
        const eps = this.eps;
        const wd = this.weightDecay;
        for (let i = 0; i < this.dim; i++) {
            const gi = g[i] + wd * x[i];
            const Gi = G[i] + gi * gi;
            G[i] = Gi;
            x[i] -= (lr * gi) / (eps + Math.sqrt(Gi));
        }
        this.t++;
    }
    exportState() {
        return { step: this.t, lr: this.lr, sumSquares: saveVector(this.sumSquares) };
    }
    importState(state) {
        const s = checkState(state, LAYOUT, this.dim, "importState adagrad");
        this.t = s.step;
        this.lr = s.lr;
        loadVector(s, "sumSquares", this.sumSquares);
    }
    setLearningRate(lr) {
        this.lr = (0,hyper/* checkLearningRate */.N1)(lr, "setLearningRate adagrad");
    }
}
const adagrad = (0,hyper/* defineOptimizer */.B)({
    name: "adagrad",
    title: "Adagrad, diagonal (Duchi, Hazan & Singer 2011, JMLR 12:2121–2159)",
    hyperSpecs: ADAGRAD_HYPER,
    build: (hyper, dim) => new Adagrad(hyper, dim),
});

;// CONCATENATED MODULE: ./build/package/optimizers/adam.js
/**
 * Adam (adaptive moment estimation), with the AMSGrad option — bias-corrected running means of the
 * gradient and of its square, used as a per-coordinate normalised step.
 *
 *   t ← t + 1
 *   g ← ∇f(θ) + λ·θ                            (λ = weightDecay: coupled L2, off by default)
 *   m ← β1·m + (1 − β1)·g
 *   v ← β2·v + (1 − β2)·g²
 *   epsPlacement "corrected" (Algorithm 1):
 *     m̂ = m/(1 − β1ᵗ);  v̂ = v/(1 − β2ᵗ);  θ ← θ − α·m̂/(√v̂ + ε)
 *   epsPlacement "efficient" (§2, last paragraph):
 *     αₜ = α·√(1 − β2ᵗ)/(1 − β1ᵗ);  θ ← θ − αₜ·m/(√v + ε)
 *     (the same as "corrected" with ε replaced by ε·√(1 − β2ᵗ); the two differ when ε matters)
 *
 * AMSGrad (amsgrad = true) keeps a running maximum and divides by it instead of v, so the
 * denominator can never shrink:
 *   amsgradMax "raw":       v_max ← max(v_max, v);        v is replaced by v_max above
 *                           (the maximum over raw v, as in Reddi et al. Algorithm 2; in the
 *                           "corrected" placement v_max/(1 − β2ᵗ) is used for v̂)
 *   amsgradMax "corrected": v̂_max ← max(v̂_max, v̂);       v̂ is replaced by v̂_max above
 *                           (the maximum over bias-corrected v̂; in the "efficient" placement
 *                           v̂_max·(1 − β2ᵗ) is used for v)
 * Both keep Adam's bias correction of m (Reddi et al.'s Algorithm 2 itself has none); they differ
 * when an early large gradient is followed by small ones, since 1 − β2ᵗ grows with t.
 *
 * Sources: Kingma, D. P. & Ba, J. (2015), "Adam: A Method for Stochastic Optimization", ICLR,
 * Algorithm 1 and §2, https://arxiv.org/abs/1412.6980. Reddi, S. J., Kale, S. & Kumar, S. (2018),
 * "On the Convergence of Adam and Beyond", ICLR, Algorithm 2, https://arxiv.org/abs/1904.09237
 * (arXiv number from memory).
 *
 * Hyperparameters: lr (α) = 0.001, beta1 = 0.9, beta2 = 0.999, eps = 1e−8 (Algorithm 1's defaults);
 * weightDecay = 0, amsgrad = false, amsgradMax = "raw", epsPlacement = "corrected".
 * Cost per step: one gradient evaluation at θ itself (the harness reuses its loss value), two powers,
 * and per coordinate one square root and about 15 flops; memory: gradient, m, v (and the AMSGrad
 * maximum) buffers. The bias corrections use β^t from the step counter, so the state needs only t.
 *
 * The same update with decoupled weight decay is AdamW (./adamw.ts), which shares `AdamFamily`.
 */



/** The hyperparameters Adam and AdamW share (AdamW changes weightDecay's meaning and default). */
const ADAM_COMMON_HYPER = {
    lr: {
        type: "number",
        exclusiveMinimum: 0,
        default: 0.001,
        description: "Step size α. Default 0.001 (Kingma & Ba 2015, Algorithm 1).",
    },
    beta1: {
        type: "number",
        minimum: 0,
        exclusiveMaximum: 1,
        default: 0.9,
        description: "Decay β1 of the first-moment estimate, in [0, 1). Default 0.9 (Kingma & Ba 2015, Algorithm 1).",
    },
    beta2: {
        type: "number",
        minimum: 0,
        exclusiveMaximum: 1,
        default: 0.999,
        description: "Decay β2 of the second-moment estimate, in [0, 1). Default 0.999 (Kingma & Ba 2015, Algorithm 1).",
    },
    eps: {
        type: "number",
        minimum: 0,
        default: 1e-8,
        description: "ε in the denominator. Default 1e−8 (Kingma & Ba 2015, Algorithm 1).",
    },
};
/** The AMSGrad and ε-placement options, shared by Adam and AdamW. */
const ADAM_VARIANT_HYPER = {
    amsgrad: {
        type: "boolean",
        default: false,
        description: "Divide by the running maximum of the second moment (Reddi, Kale & Kumar 2018, Algorithm 2).",
    },
    amsgradMax: {
        type: "choice",
        choices: ["raw", "corrected"],
        default: "raw",
        description: '"raw": maximum over raw v (as in Reddi et al. Algorithm 2); "corrected": maximum over bias-corrected v̂. ' +
            "Only with amsgrad: true.",
    },
    epsPlacement: {
        type: "choice",
        choices: ["corrected", "efficient"],
        default: "corrected",
        description: '"corrected": α·m̂/(√v̂ + ε) (Kingma & Ba 2015, Algorithm 1). ' +
            '"efficient": αₜ·m/(√v + ε) with αₜ = α·√(1−β2ᵗ)/(1−β1ᵗ) (Kingma & Ba 2015, §2).',
    },
};
const ADAM_HYPER = {
    ...ADAM_COMMON_HYPER,
    weightDecay: {
        type: "number",
        minimum: 0,
        default: 0,
        description: "Coupled L2 coefficient λ: λ·θ is added to the gradient before the moments (not AdamW).",
    },
    ...ADAM_VARIANT_HYPER,
};
/** Rejects amsgradMax "corrected" without amsgrad: it would silently do nothing. */
function checkAmsgradCombination(hyper, where) {
    if (hyper.amsgrad === false && hyper.amsgradMax !== "raw") {
        throw new errors/* InputError */.d(`${where}.amsgradMax ${JSON.stringify(hyper.amsgradMax)} has no effect unless amsgrad is true; ` +
            `set amsgrad: true or remove amsgradMax`);
    }
}
/** Adam and AdamW: one update, parameterised by the decay mode. */
class AdamFamily {
    name;
    dim;
    grad;
    m;
    v;
    /** AMSGrad maximum: of raw v ("raw") or of v̂ ("corrected"); length 0 without AMSGrad. */
    vMax;
    lr;
    beta1;
    beta2;
    eps;
    /** λ added to the gradient as λ·θ (coupled mode), else 0. */
    l2;
    /** λ of the decoupled decay that is multiplied by lr ("decoupled-scaled"), else 0. */
    decayPerLr;
    /** λ of the decoupled decay that is not multiplied by lr ("decoupled"), else 0. */
    decayFixed;
    amsgrad;
    maxCorrected;
    efficient;
    layout;
    maxKey;
    t = 0;
    constructor(name, hyper, decay, dim) {
        this.name = name;
        this.dim = dim;
        this.grad = new Float64Array(dim);
        this.m = new Float64Array(dim);
        this.v = new Float64Array(dim);
        this.amsgrad = hyper.amsgrad;
        this.maxCorrected = hyper.amsgradMax === "corrected";
        this.vMax = new Float64Array(this.amsgrad ? dim : 0);
        this.efficient = hyper.epsPlacement === "efficient";
        this.lr = hyper.lr;
        this.beta1 = hyper.beta1;
        this.beta2 = hyper.beta2;
        this.eps = hyper.eps;
        const lambda = hyper.weightDecay;
        this.l2 = decay === "coupled" ? lambda : 0;
        this.decayPerLr = decay === "decoupled-scaled" ? lambda : 0;
        this.decayFixed = decay === "decoupled" ? lambda : 0;
        this.maxKey = this.maxCorrected ? "vHatMax" : "vMax";
        this.layout = this.amsgrad
            ? { step: "count", lr: "lr", m: "vector", v: "vector", [this.maxKey]: "vector" }
            : { step: "count", lr: "lr", m: "vector", v: "vector" };
    }
    step(x, oracle) {
        (0,hyper/* checkIterate */.rA)(x, this.dim, this.name);
        const g = this.grad;
        const m = this.m;
        const v = this.v;
        const vMax = this.vMax;
        oracle.evaluate(x, g);
        const t = this.t + 1;
        const lr = this.lr;
        const b1 = this.beta1;
        const b2 = this.beta2;
        const eps = this.eps;
        const bc1 = 1 - Math.pow(b1, t);
        const bc2 = 1 - Math.pow(b2, t);
        // Per-step scalars are computed without branches: a conditional that mixes a field with a
        // computed double made V8 box the result once per step (seen by tests/optimizers/allocation).
        const stepSizeEfficient = (lr * Math.sqrt(bc2)) / bc1;
        const l2 = this.l2;
        const shrink = lr * this.decayPerLr + this.decayFixed;
        const amsgrad = this.amsgrad;
        const maxCorrected = this.maxCorrected;
        const efficient = this.efficient;
        for (let i = 0; i < this.dim; i++) {
            const xi = x[i];
            const gi = g[i] + l2 * xi;
            const mi = b1 * m[i] + (1 - b1) * gi;
            const vi = b2 * v[i] + (1 - b2) * gi * gi;
            m[i] = mi;
            v[i] = vi;
            let update;
            if (efficient) {
                let vRaw = vi;
                if (amsgrad) {
                    if (maxCorrected) {
                        vMax[i] = Math.max(vMax[i], vi / bc2);
                        vRaw = vMax[i] * bc2;
                    }
                    else {
                        vMax[i] = Math.max(vMax[i], vi);
                        vRaw = vMax[i];
                    }
                }
                update = (stepSizeEfficient * mi) / (Math.sqrt(vRaw) + eps);
            }
            else {
                let vHat = vi / bc2;
                if (amsgrad) {
                    if (maxCorrected) {
                        vMax[i] = Math.max(vMax[i], vHat);
                        vHat = vMax[i];
                    }
                    else {
                        vMax[i] = Math.max(vMax[i], vi);
                        vHat = vMax[i] / bc2;
                    }
                }
                const mHat = mi / bc1;
                update = (lr * mHat) / (Math.sqrt(vHat) + eps);
            }
            x[i] = xi - update - shrink * xi;
        }
        this.t = t;
    }
    exportState() {
        const state = { step: this.t, lr: this.lr, m: saveVector(this.m), v: saveVector(this.v) };
        if (this.amsgrad)
            state[this.maxKey] = saveVector(this.vMax);
        return state;
    }
    importState(state) {
        const s = checkState(state, this.layout, this.dim, `importState ${this.name}`);
        this.t = s.step;
        this.lr = s.lr;
        loadVector(s, "m", this.m);
        loadVector(s, "v", this.v);
        if (this.amsgrad)
            loadVector(s, this.maxKey, this.vMax);
    }
    setLearningRate(lr) {
        this.lr = (0,hyper/* checkLearningRate */.N1)(lr, `setLearningRate ${this.name}`);
    }
}
const adam = (0,hyper/* defineOptimizer */.B)({
    name: "adam",
    title: "Adam (Kingma & Ba 2015, ICLR, arXiv:1412.6980); AMSGrad option (Reddi, Kale & Kumar 2018, ICLR)",
    hyperSpecs: ADAM_HYPER,
    checkCombination: checkAmsgradCombination,
    build: (hyper, dim) => new AdamFamily("adam", hyper, "coupled", dim),
});

;// CONCATENATED MODULE: ./build/package/optimizers/adamw.js
/**
 * AdamW (Adam with decoupled weight decay) — Adam whose weight decay shrinks the parameters directly
 * instead of entering the gradient, so the decay is not rescaled by the adaptive denominator.
 *
 *   t ← t + 1;  g ← ∇f(θ)                                  (no λ·θ in the gradient)
 *   m, v, m̂, v̂ (and the AMSGrad maximum) exactly as in Adam (./adam.ts)
 *   decayScaledByLr true:   θ ← θ − α·m̂/(√v̂ + ε) − α·λ·θ      (as most frameworks write it)
 *   decayScaledByLr false:  θ ← θ − α·m̂/(√v̂ + ε) − λ·θ        (Algorithm 2 with schedule multiplier ηₜ = 1)
 *
 * Both terms use θ from before the step (Algorithm 2, line 12: θₜ ← θₜ₋₁ − ηₜ(α·m̂ₜ/(√v̂ₜ + ε) + λ·θₜ₋₁)),
 * so the decay is never applied to already-updated parameters. With a zero loss gradient the Adam
 * term vanishes and θ shrinks geometrically: θₙ = θ₀·(1 − α·λ)ⁿ (scaled) or θ₀·(1 − λ)ⁿ.
 *
 * Source: Loshchilov, I. & Hutter, F. (2019), "Decoupled Weight Decay Regularization", ICLR,
 * Algorithm 2, https://arxiv.org/abs/1711.05101. The Adam part: Kingma & Ba (2015), arXiv:1412.6980.
 *
 * Hyperparameters: lr (α) = 0.001, beta1 = 0.9, beta2 = 0.999, eps = 1e−8 (Adam's defaults, also used
 * in Algorithm 2); weightDecay (λ) = 0.01 (common practice; the paper sets no default);
 * decayScaledByLr = true; amsgrad = false, amsgradMax = "raw", epsPlacement = "corrected" as in Adam.
 * Cost per step: Adam's (one gradient evaluation at θ itself, O(dim) flops) plus 2 flops per coordinate.
 */


const ADAMW_HYPER = {
    ...ADAM_COMMON_HYPER,
    weightDecay: {
        type: "number",
        minimum: 0,
        default: 0.01,
        description: "Decoupled decay λ applied to θ directly. Default 0.01: common practice, the paper sets none.",
    },
    decayScaledByLr: {
        type: "boolean",
        default: true,
        description: "true: θ −= lr·λ·θ (as most frameworks write it); false: θ −= λ·θ (Loshchilov & Hutter 2019, Algorithm 2 with ηₜ = 1).",
    },
    ...ADAM_VARIANT_HYPER,
};
const adamw = (0,hyper/* defineOptimizer */.B)({
    name: "adamw",
    title: "AdamW, decoupled weight decay (Loshchilov & Hutter 2019, ICLR, arXiv:1711.05101)",
    hyperSpecs: ADAMW_HYPER,
    checkCombination: checkAmsgradCombination,
    build: (hyper, dim) => new AdamFamily("adamw", hyper, hyper.decayScaledByLr === true ? "decoupled-scaled" : "decoupled", dim),
});

;// CONCATENATED MODULE: ./build/package/optimizers/momentum.js


const MOMENTUM_HYPER = {
    lr: {
        type: "number",
        exclusiveMinimum: 0,
        default: 0.01,
        description: "Learning rate η. Default 0.01: common practice, no paper sets one.",
    },
    momentum: {
        type: "number",
        minimum: 0,
        exclusiveMaximum: 1,
        default: 0.9,
        description: "Momentum coefficient γ in [0, 1). Default 0.9: common practice.",
    },
    form: {
        type: "choice",
        choices: ["lr-inside", "lr-outside"],
        default: "lr-inside",
        description: '"lr-inside": v = γv + ηg, w −= v (Polyak 1964; Sutskever et al. 2013 eq. 1–2). ' +
            '"lr-outside": b = γb + g, w −= η·b. Same trajectory for a constant lr; they differ after an lr change.',
    },
    weightDecay: {
        type: "number",
        minimum: 0,
        default: 0,
        description: "Coupled L2 coefficient λ: λ·w is added to the gradient.",
    },
};
class Momentum {
    dim;
    grad;
    /** v (lr-inside) or b (lr-outside). */
    buf;
    lr;
    gamma;
    weightDecay;
    lrInside;
    layout;
    key;
    t = 0;
    constructor(hyper, dim) {
        this.dim = dim;
        this.grad = new Float64Array(dim);
        this.buf = new Float64Array(dim);
        this.lr = hyper.lr;
        this.gamma = hyper.momentum;
        this.weightDecay = hyper.weightDecay;
        this.lrInside = hyper.form === "lr-inside";
        this.key = this.lrInside ? "velocity" : "buffer";
        this.layout = { step: "count", lr: "lr", [this.key]: "vector" };
    }
    step(w, oracle) {
        (0,hyper/* checkIterate */.rA)(w, this.dim, "momentum");
        const g = this.grad;
        const b = this.buf;
        oracle.evaluate(w, g);
        const lr = this.lr;
        const gamma = this.gamma;
        const wd = this.weightDecay;
        if (this.lrInside) {
            for (let i = 0; i < this.dim; i++) {
                const v = gamma * b[i] + lr * (g[i] + wd * w[i]);
                b[i] = v;
                w[i] -= v;
            }
        }
        else {
            for (let i = 0; i < this.dim; i++) {
                const bi = gamma * b[i] + (g[i] + wd * w[i]);
                b[i] = bi;
                w[i] -= lr * bi;
            }
        }
        this.t++;
    }
    exportState() {
        return { step: this.t, lr: this.lr, [this.key]: saveVector(this.buf) };
    }
    importState(state) {
        const s = checkState(state, this.layout, this.dim, "importState momentum");
        this.t = s.step;
        this.lr = s.lr;
        loadVector(s, this.key, this.buf);
    }
    setLearningRate(lr) {
        this.lr = (0,hyper/* checkLearningRate */.N1)(lr, "setLearningRate momentum");
    }
}
const momentum = (0,hyper/* defineOptimizer */.B)({
    name: "momentum",
    title: "Heavy-ball momentum (Polyak 1964, USSR Comput. Math. Math. Phys. 4(5):1–17)",
    hyperSpecs: MOMENTUM_HYPER,
    build: (hyper, dim) => new Momentum(hyper, dim),
});

;// CONCATENATED MODULE: ./build/package/optimizers/nesterov.js


const NESTEROV_HYPER = {
    lr: {
        type: "number",
        exclusiveMinimum: 0,
        default: 0.01,
        description: "Learning rate η. Default 0.01: common practice, no paper sets one.",
    },
    momentum: {
        type: "number",
        minimum: 0,
        exclusiveMaximum: 1,
        default: 0.9,
        description: "Momentum coefficient γ in [0, 1). Default 0.9: common practice.",
    },
    form: {
        type: "choice",
        choices: ["lookahead", "stored-lookahead"],
        default: "lookahead",
        description: '"lookahead": gradient at w − γv (Nesterov 1983; Sutskever et al. 2013 eq. 3–4). ' +
            '"stored-lookahead": the parameters hold u = w − γv and the gradient is taken there ' +
            "(Bengio, Boulanger-Lewandowski & Pascanu 2013, §3.5). Same algorithm, shifted iterates.",
    },
    lrPlacement: {
        type: "choice",
        choices: ["lr-inside", "lr-outside"],
        default: "lr-inside",
        description: '"lr-inside": v = γv + η·g, as in Sutskever et al. 2013 eq. 3–4. "lr-outside": a buffer b = γb + g with ' +
            "steps of η·(…), as many frameworks write it (common practice); with v = η·b the same trajectory " +
            "while η is constant, different once η changes (the whole buffer is rescaled by the new η at once).",
    },
    weightDecay: {
        type: "number",
        minimum: 0,
        default: 0,
        description: "Coupled L2 coefficient λ: λ times the point where the gradient is taken is added to it.",
    },
};
/** The state's vector means v = η·b with the learning rate inside, b without: different keys, no mix-up. */
const LAYOUT_INSIDE = { step: "count", lr: "lr", velocity: "vector" };
const LAYOUT_OUTSIDE = { step: "count", lr: "lr", buffer: "vector" };
class Nesterov {
    dim;
    grad;
    velocity;
    /** w − γv in the "lookahead" form; unused (length 0) in the "stored-lookahead" form. */
    ahead;
    lr;
    gamma;
    weightDecay;
    stored;
    lrInside;
    t = 0;
    constructor(hyper, dim) {
        this.dim = dim;
        this.stored = hyper.form === "stored-lookahead";
        this.lrInside = hyper.lrPlacement !== "lr-outside";
        this.grad = new Float64Array(dim);
        this.velocity = new Float64Array(dim);
        this.ahead = new Float64Array(this.stored ? 0 : dim);
        this.lr = hyper.lr;
        this.gamma = hyper.momentum;
        this.weightDecay = hyper.weightDecay;
    }
    step(x, oracle) {
        (0,hyper/* checkIterate */.rA)(x, this.dim, "nesterov");
        const g = this.grad;
        const v = this.velocity;
        const lr = this.lr;
        const gamma = this.gamma;
        const wd = this.weightDecay;
        if (this.lrInside) {
            if (this.stored) {
                oracle.evaluate(x, g);
                for (let i = 0; i < this.dim; i++) {
                    const gi = g[i] + wd * x[i];
                    const vi = gamma * v[i] + lr * gi;
                    v[i] = vi;
                    x[i] -= gamma * vi + lr * gi;
                }
            }
            else {
                const a = this.ahead;
                for (let i = 0; i < this.dim; i++)
                    a[i] = x[i] - gamma * v[i];
                oracle.evaluate(a, g);
                for (let i = 0; i < this.dim; i++) {
                    const vi = gamma * v[i] + lr * (g[i] + wd * a[i]);
                    v[i] = vi;
                    x[i] -= vi;
                }
            }
        }
        else if (this.stored) {
            // v holds the buffer b: b ← γb + g; u ← u − η·(g + γb).
            oracle.evaluate(x, g);
            for (let i = 0; i < this.dim; i++) {
                const gi = g[i] + wd * x[i];
                const bi = gamma * v[i] + gi;
                v[i] = bi;
                x[i] -= lr * (gi + gamma * bi);
            }
        }
        else {
            // v holds the buffer b: the look-ahead point is w − η·γ·b; b ← γb + g; w ← w − η·b.
            const a = this.ahead;
            for (let i = 0; i < this.dim; i++)
                a[i] = x[i] - lr * gamma * v[i];
            oracle.evaluate(a, g);
            for (let i = 0; i < this.dim; i++) {
                const bi = gamma * v[i] + (g[i] + wd * a[i]);
                v[i] = bi;
                x[i] -= lr * bi;
            }
        }
        this.t++;
    }
    exportState() {
        const key = this.lrInside ? "velocity" : "buffer";
        return { step: this.t, lr: this.lr, [key]: saveVector(this.velocity) };
    }
    importState(state) {
        const layout = this.lrInside ? LAYOUT_INSIDE : LAYOUT_OUTSIDE;
        const s = checkState(state, layout, this.dim, "importState nesterov");
        this.t = s.step;
        this.lr = s.lr;
        loadVector(s, this.lrInside ? "velocity" : "buffer", this.velocity);
    }
    setLearningRate(lr) {
        this.lr = (0,hyper/* checkLearningRate */.N1)(lr, "setLearningRate nesterov");
    }
}
const nesterov = (0,hyper/* defineOptimizer */.B)({
    name: "nesterov",
    title: "Nesterov's accelerated gradient, momentum form (Nesterov 1983; Sutskever et al. 2013, ICML)",
    hyperSpecs: NESTEROV_HYPER,
    build: (hyper, dim) => new Nesterov(hyper, dim),
});

;// CONCATENATED MODULE: ./build/package/optimizers/rmsprop.js


const RMSPROP_HYPER = {
    lr: {
        type: "number",
        exclusiveMinimum: 0,
        default: 0.001,
        description: "Learning rate η. Default 0.001 as suggested in Ruder 2016, §4.5.",
    },
    rho: {
        type: "number",
        minimum: 0,
        exclusiveMaximum: 1,
        default: 0.9,
        description: "Decay ρ of the running mean of g², in [0, 1). Default 0.9 as suggested in Ruder 2016, §4.5.",
    },
    eps: {
        type: "number",
        minimum: 0,
        default: 1e-8,
        description: "ε in the denominator. Default 1e−8: common practice.",
    },
    epsPlacement: {
        type: "choice",
        choices: ["outside", "inside"],
        default: "outside",
        description: '"outside": η·g/(√E + ε) (common practice). "inside": η·g/√(E + ε) (Graves 2013; Ruder 2016).',
    },
    weightDecay: {
        type: "number",
        minimum: 0,
        default: 0,
        description: "Coupled L2 coefficient λ: λ·x is added to the gradient.",
    },
};
const rmsprop_LAYOUT = { step: "count", lr: "lr", meanSquare: "vector" };
class RmsProp {
    dim;
    grad;
    meanSquare;
    lr;
    rho;
    eps;
    inside;
    weightDecay;
    t = 0;
    constructor(hyper, dim) {
        this.dim = dim;
        this.grad = new Float64Array(dim);
        this.meanSquare = new Float64Array(dim);
        this.lr = hyper.lr;
        this.rho = hyper.rho;
        this.eps = hyper.eps;
        this.inside = hyper.epsPlacement === "inside";
        this.weightDecay = hyper.weightDecay;
    }
    step(x, oracle) {
        (0,hyper/* checkIterate */.rA)(x, this.dim, "rmsprop");
        const g = this.grad;
        const E = this.meanSquare;
        oracle.evaluate(x, g);
        const lr = this.lr;
        const rho = this.rho;
        const eps = this.eps;
        const wd = this.weightDecay;
        for (let i = 0; i < this.dim; i++) {
            const gi = g[i] + wd * x[i];
            const Ei = rho * E[i] + (1 - rho) * gi * gi;
            E[i] = Ei;
            const denom = this.inside ? Math.sqrt(Ei + eps) : Math.sqrt(Ei) + eps;
            x[i] -= (lr * gi) / denom;
        }
        this.t++;
    }
    exportState() {
        return { step: this.t, lr: this.lr, meanSquare: saveVector(this.meanSquare) };
    }
    importState(state) {
        const s = checkState(state, rmsprop_LAYOUT, this.dim, "importState rmsprop");
        this.t = s.step;
        this.lr = s.lr;
        loadVector(s, "meanSquare", this.meanSquare);
    }
    setLearningRate(lr) {
        this.lr = (0,hyper/* checkLearningRate */.N1)(lr, "setLearningRate rmsprop");
    }
}
const rmsprop = (0,hyper/* defineOptimizer */.B)({
    name: "rmsprop",
    title: "RMSProp (described in Graves 2013, arXiv:1308.0850 §4; Ruder 2016, arXiv:1609.04747 §4.5)",
    hyperSpecs: RMSPROP_HYPER,
    build: (hyper, dim) => new RmsProp(hyper, dim),
});

;// CONCATENATED MODULE: ./build/package/optimizers/sgd.js


const SGD_HYPER = {
    lr: {
        type: "number",
        exclusiveMinimum: 0,
        default: 0.01,
        description: "Learning rate η (step size). Default 0.01: common practice, no paper sets one.",
    },
    weightDecay: {
        type: "number",
        minimum: 0,
        default: 0,
        description: "Coupled L2 coefficient λ: λ·x is added to the gradient.",
    },
};
const sgd_LAYOUT = { step: "count", lr: "lr" };
class Sgd {
    dim;
    grad;
    lr;
    weightDecay;
    t = 0;
    constructor(hyper, dim) {
        this.dim = dim;
        this.grad = new Float64Array(dim);
        this.lr = hyper.lr;
        this.weightDecay = hyper.weightDecay;
    }
    step(x, oracle) {
        (0,hyper/* checkIterate */.rA)(x, this.dim, "sgd");
        const g = this.grad;
        oracle.evaluate(x, g);
        const lr = this.lr;
        const wd = this.weightDecay;
        for (let i = 0; i < this.dim; i++)
            x[i] -= lr * (g[i] + wd * x[i]);
        this.t++;
    }
    exportState() {
        return { step: this.t, lr: this.lr };
    }
    importState(state) {
        const s = checkState(state, sgd_LAYOUT, this.dim, "importState sgd");
        this.t = s.step;
        this.lr = s.lr;
    }
    setLearningRate(lr) {
        this.lr = (0,hyper/* checkLearningRate */.N1)(lr, "setLearningRate sgd");
    }
}
const sgd = (0,hyper/* defineOptimizer */.B)({
    name: "sgd",
    title: "Gradient descent / SGD (Robbins & Monro 1951, Ann. Math. Statist. 22(3):400–407)",
    hyperSpecs: SGD_HYPER,
    build: (hyper, dim) => new Sgd(hyper, dim),
});

;// CONCATENATED MODULE: ./build/package/optimizers/index.js
/**
 * Registry of the reference optimizers: the published methods, implemented plainly in this folder,
 * that the suite runs beside (and checks) the optimizer under test.
 *
 * `OPTIMIZERS` is in a stable order (simplest first), used wherever they are listed. Each factory
 * declares its hyperparameters in `hyperSpecs`; `resolveHyper` validates a user's mapping against
 * them and `hyperJsonSchema` turns them into a JSON Schema fragment.
 */










/** All reference optimizers, in a stable order. */
const OPTIMIZERS = Object.freeze([
    sgd,
    momentum,
    nesterov,
    adagrad,
    rmsprop,
    adam,
    adamw,
]);
/** Names of the reference optimizers, in registry order. */
const OPTIMIZER_NAMES = Object.freeze(OPTIMIZERS.map((f) => f.name));
/**
 * The reference optimizer called `name`. Throws an `InputError` listing the known names otherwise;
 * `where` locates the name for the message (e.g. `config gradgate.yml: optimizers[1].name`).
 */
function getOptimizer(name, where = "optimizer name") {
    const found = OPTIMIZERS.find((f) => f.name === name);
    if (found === undefined) {
        throw new errors/* InputError */.d(`${where} must name a reference optimizer (known: ${OPTIMIZER_NAMES.join(", ")}), got ${(0,errors/* quote */.h)(name)}`);
    }
    return found;
}


/***/ }),

/***/ 5006:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {


// EXPORTS
__nccwpck_require__.d(__webpack_exports__, {
  D3: () => (/* binding */ PROBLEMS),
  Yx: () => (/* binding */ createProblem),
  Ai: () => (/* binding */ getProblem),
  ZL: () => (/* reexport */ problemKey),
  wN: () => (/* reexport */ resolveProblemParams)
});

// UNUSED EXPORTS: createNoisyQuadratic, createQuadratic, describeSpec, quadraticSpectrum, sgdStationaryLoss, structureKey

;// CONCATENATED MODULE: ./build/package/problems/mgh.js
/**
 * Common text of the Moré–Garbow–Hillstrom problems.
 *
 * Moré, J. J., Garbow, B. S. & Hillstrom, K. E. (1981). "Testing Unconstrained Optimization
 * Software", ACM Transactions on Mathematical Software 7(1):17–41, doi:10.1145/355934.355936.
 * Each problem is f(x) = Σᵢ fᵢ(x)² with the residuals fᵢ, the standard start x0 and the minimum
 * f* given in §3 of the paper under the problem's number.
 */
const MGH_SOURCE = 'Moré, Garbow & Hillstrom (1981), "Testing Unconstrained Optimization Software", ACM TOMS 7(1):17–41, doi:10.1145/355934.355936';
/** Source line of MGH problem `n`. */
function mghSource(n) {
    return `${MGH_SOURCE}, problem ${n}`;
}

;// CONCATENATED MODULE: ./build/package/problems/params.js
/** How a rejected value is quoted in an error message: strings in JSON quotes, numbers as written. */
function quote(value) {
    if (typeof value === "string")
        return JSON.stringify(value);
    if (typeof value === "number" || typeof value === "boolean" || typeof value === "bigint")
        return String(value);
    if (value === undefined)
        return "undefined";
    try {
        return JSON.stringify(value);
    }
    catch {
        return String(value);
    }
}
/** The admissible form of a parameter, e.g. "an even integer ≥ 2" or "a number in [0, 1]". */
function describeSpec(spec) {
    const kind = spec.even ? "an even integer" : spec.integer ? "an integer" : "a number";
    const { min, max } = spec;
    if (min !== undefined && max !== undefined)
        return `${kind} in [${min}, ${max}]`;
    if (min !== undefined)
        return `${kind} ≥ ${min}`;
    if (max !== undefined)
        return `${kind} ≤ ${max}`;
    return spec.integer || spec.even ? kind : "a finite number";
}
/** True when `value` satisfies `spec`. */
function satisfiesSpec(spec, value) {
    if (typeof value !== "number" || !Number.isFinite(value))
        return false;
    if ((spec.integer || spec.even) && !Number.isInteger(value))
        return false;
    if (spec.even && value % 2 !== 0)
        return false;
    if (spec.min !== undefined && value < spec.min)
        return false;
    if (spec.max !== undefined && value > spec.max)
        return false;
    return true;
}
/**
 * Merges the user's parameters over the problem's defaults and validates every value once.
 * `where` names the place in the input, e.g. `config gradgate.yml: problems[2]`; errors read
 * `${where}.params.n must be an even integer ≥ 2, got 3`. Unknown names and non-mapping input are
 * errors too (never ignored). Returns a frozen object holding every declared parameter.
 */
function resolveProblemParams(def, given, where) {
    const names = Object.keys(def.params).sort();
    if (given !== undefined && given !== null && (typeof given !== "object" || Array.isArray(given))) {
        throw new Error(`${where}.params must be a mapping from parameter name to number (${names.join(", ") || "none"}), got ${quote(given)}`);
    }
    const input = (given ?? {});
    for (const key of Object.keys(input)) {
        if (!Object.prototype.hasOwnProperty.call(def.params, key)) {
            const known = names.length > 0 ? `expected one of: ${names.join(", ")}` : "it takes no parameters";
            throw new Error(`${where}.params.${key} is not a parameter of problem "${def.name}"; ${known}`);
        }
    }
    const out = {};
    for (const name of names) {
        const spec = def.params[name];
        const value = Object.prototype.hasOwnProperty.call(input, name) ? input[name] : spec.default;
        if (!satisfiesSpec(spec, value)) {
            throw new Error(`${where}.params.${name} must be ${describeSpec(spec)}, got ${quote(value)}`);
        }
        out[name] = value;
    }
    return Object.freeze(out);
}
/**
 * Canonical key of a problem instance: the bare name when every parameter has its default, else
 * `name(k=v,...)` listing only the non-default parameters, sorted by name, numbers as JavaScript
 * prints them (`String(v)`). Missing parameters count as defaults; names not declared are ignored.
 */
function problemKey(def, params) {
    const parts = [];
    for (const name of Object.keys(def.params).sort()) {
        const value = params[name];
        if (value !== undefined && value !== def.params[name].default)
            parts.push(`${name}=${String(value)}`);
    }
    return parts.length === 0 ? def.name : `${def.name}(${parts.join(",")})`;
}
/**
 * Key of a problem's fixed structure (rotation, data set): the name and the listed parameters,
 * always spelled out, so that parameters that do not shape the structure (a mini-batch size, a
 * regularisation weight, a condition number) never change it. Seeds `structureRng`.
 */
function structureKey(name, params, structural) {
    const parts = [...structural].sort().map((k) => `${k}=${String(params[k])}`);
    return `${name}[${parts.join(",")}]`;
}
/** What every `create` does first: defaults merged and validated, and the instance key. */
function prepare(def, params) {
    const p = resolveProblemParams(def, params, `problem "${def.name}"`);
    return { p, key: problemKey(def, p) };
}

;// CONCATENATED MODULE: ./build/package/problems/util.js
/**
 * Half-widths of the default start perturbation: `rel·|x0ᵢ| + abs` per coordinate, i.e. relative
 * `rel` of the coordinate plus an absolute floor so that zero coordinates move too.
 */
function halfWidths(x0, rel = 0.01, abs = 1e-3) {
    const out = new Float64Array(x0.length);
    for (let i = 0; i < x0.length; i++)
        out[i] = rel * Math.abs(x0[i]) + abs;
    return out;
}
/**
 * Writes the start point: `x0` exactly when `rng` is null, else `x0ᵢ + wᵢ·(2uᵢ − 1)` with uᵢ uniform
 * in [0, 1) drawn from `rng` in coordinate order (one `nextFloat` per coordinate). A uniform, not a
 * normal, perturbation so that it is bounded by wᵢ and cannot change the problem's character.
 */
function writeStart(out, x0, widths, rng, name) {
    if (out.length !== x0.length) {
        throw new Error(`problem "${name}": start(out) needs out of length ${x0.length} (the dimension), got ${out.length}`);
    }
    out.set(x0);
    if (rng === null)
        return;
    for (let i = 0; i < out.length; i++)
        out[i] += widths[i] * (2 * rng.nextFloat() - 1);
}
/** A deterministic `ProblemInstance` (no noise: `evaluate` and `objective` agree). */
function deterministicInstance(spec) {
    const { fg, x0, widths, name } = spec;
    const scratch = new Float64Array(x0.length);
    const f = spec.f ?? ((x) => fg(x, scratch));
    return {
        key: spec.key,
        dim: x0.length,
        fStar: spec.fStar,
        fStarKind: spec.fStarKind,
        xStar: spec.xStar,
        stochastic: false,
        evaluate: fg,
        objective: f,
        start: (out, rng) => writeStart(out, x0, widths, rng, name),
    };
}
/**
 * n values log-spaced from `lo` to `hi` inclusive: lo·(hi/lo)^(i/(n−1)); a single value `lo` when
 * n = 1. The end points are exact.
 */
function logSpaced(n, lo, hi) {
    const out = new Float64Array(n);
    if (n === 1) {
        out[0] = lo;
        return out;
    }
    const ratio = hi / lo;
    for (let i = 0; i < n; i++)
        out[i] = lo * Math.pow(ratio, i / (n - 1));
    out[n - 1] = hi;
    return out;
}
/**
 * A seeded n×n orthogonal matrix Q (row-major; rows orthonormal): Gram–Schmidt QR of a matrix of
 * independent N(0, 1) draws taken row by row from `rng`, each row orthogonalised twice against the
 * previous ones (classical Gram–Schmidt with one reorthogonalisation, "twice is enough": Giraud,
 * Langou, Rozložník & van den Eshof 2005, Numer. Math. 101:87–100) and then normalised. Because
 * Gram–Schmidt makes R's diagonal positive, Q is Haar-distributed (Mezzadri 2007, "How to generate
 * random matrices from the classical compact groups", Notices AMS 54(5):592–604,
 * arXiv:math-ph/0609050). A row that collapses (probability zero) is redrawn. Cost O(n³), once.
 */
function orthogonalMatrix(rng, n) {
    const q = new Float64Array(n * n);
    const v = new Float64Array(n);
    for (let i = 0; i < n; i++) {
        for (;;) {
            for (let k = 0; k < n; k++)
                v[k] = rng.nextNormal();
            const before = norm2(v);
            for (let pass = 0; pass < 2; pass++) {
                for (let j = 0; j < i; j++) {
                    let dot = 0;
                    for (let k = 0; k < n; k++)
                        dot += q[j * n + k] * v[k];
                    for (let k = 0; k < n; k++)
                        v[k] -= dot * q[j * n + k];
                }
            }
            const after = norm2(v);
            if (after > 1e-8 * before) {
                for (let k = 0; k < n; k++)
                    q[i * n + k] = v[k] / after;
                break;
            }
        }
    }
    return q;
}
/** Euclidean norm. */
function norm2(v) {
    let s = 0;
    for (let i = 0; i < v.length; i++)
        s += v[i] * v[i];
    return Math.sqrt(s);
}
/**
 * In-place Cholesky factorisation A = L·Lᵀ of a symmetric positive definite n×n matrix (row-major;
 * only the lower triangle is read; L overwrites it, the strict upper triangle is zeroed). Returns
 * false when a pivot is not positive (A not numerically positive definite). Golub & Van Loan,
 * Matrix Computations, 4th ed. (2013), Algorithm 4.2.1. Cost n³/3 flops.
 */
function cholesky(a, n) {
    for (let j = 0; j < n; j++) {
        let d = a[j * n + j];
        for (let k = 0; k < j; k++)
            d -= a[j * n + k] * a[j * n + k];
        if (!(d > 0))
            return false;
        const ljj = Math.sqrt(d);
        a[j * n + j] = ljj;
        for (let i = j + 1; i < n; i++) {
            let s = a[i * n + j];
            for (let k = 0; k < j; k++)
                s -= a[i * n + k] * a[j * n + k];
            a[i * n + j] = s / ljj;
        }
        for (let k = j + 1; k < n; k++)
            a[j * n + k] = 0;
    }
    return true;
}
/** Solves L·Lᵀ·x = b with the factor from `cholesky`; `b` is overwritten by x. Cost 2n² flops. */
function choleskySolve(l, n, b) {
    for (let i = 0; i < n; i++) {
        let s = b[i];
        for (let k = 0; k < i; k++)
            s -= l[i * n + k] * b[k];
        b[i] = s / l[i * n + i];
    }
    for (let i = n - 1; i >= 0; i--) {
        let s = b[i];
        for (let k = i + 1; k < n; k++)
            s -= l[k * n + i] * b[k];
        b[i] = s / l[i * n + i];
    }
}
/** Logistic function 1/(1 + e^(−z)) without overflow. */
function sigmoid(z) {
    if (z >= 0)
        return 1 / (1 + Math.exp(-z));
    const e = Math.exp(z);
    return e / (1 + e);
}
/**
 * Returns the cached value for `key`, building and storing it on first use. Used for a problem's
 * fixed structure (rotation, data set, f*) so that it is built once per parameter set, not per run.
 * Cached values are shared between instances and must be treated as read-only.
 */
function cached(cache, key, build) {
    let value = cache.get(key);
    if (value === undefined) {
        value = build();
        cache.set(key, value);
    }
    return value;
}

;// CONCATENATED MODULE: ./build/package/problems/beale.js



function fg(x, g) {
    const x1 = x[0];
    const x2 = x[1];
    const p2 = x2 * x2;
    const p3 = p2 * x2;
    const f1 = 1.5 - x1 * (1 - x2);
    const f2 = 2.25 - x1 * (1 - p2);
    const f3 = 2.625 - x1 * (1 - p3);
    g[0] = -2 * (f1 * (1 - x2) + f2 * (1 - p2) + f3 * (1 - p3));
    g[1] = 2 * x1 * (f1 + 2 * x2 * f2 + 3 * p2 * f3);
    return f1 * f1 + f2 * f2 + f3 * f3;
}
const X0 = new Float64Array([1, 1]);
const beale = {
    name: "beale",
    title: "Beale function (Moré–Garbow–Hillstrom #5)",
    tags: ["valley", "nonconvex", "mgh"],
    source: mghSource(5),
    params: {},
    create(params) {
        const { key } = prepare(beale, params);
        return deterministicInstance({
            name: beale.name,
            key,
            x0: X0,
            widths: halfWidths(X0),
            fStar: 0,
            fStarKind: "published",
            xStar: new Float64Array([3, 0.5]),
            fg,
        });
    },
};

;// CONCATENATED MODULE: ./build/package/problems/brown-badly-scaled.js



function brown_badly_scaled_fg(x, g) {
    const x1 = x[0];
    const x2 = x[1];
    const f1 = x1 - 1e6;
    const f2 = x2 - 2e-6;
    const f3 = x1 * x2 - 2;
    g[0] = 2 * (f1 + x2 * f3);
    g[1] = 2 * (f2 + x1 * f3);
    return f1 * f1 + f2 * f2 + f3 * f3;
}
const brown_badly_scaled_X0 = new Float64Array([1, 1]);
const brownBadlyScaled = {
    name: "brown-badly-scaled",
    title: "Brown badly scaled function (Moré–Garbow–Hillstrom #4)",
    tags: ["badly-scaled", "per-parameter-scaling", "mgh"],
    source: mghSource(4),
    params: {},
    create(params) {
        const { key } = prepare(brownBadlyScaled, params);
        return deterministicInstance({
            name: brownBadlyScaled.name,
            key,
            x0: brown_badly_scaled_X0,
            widths: halfWidths(brown_badly_scaled_X0, 0.01, 0),
            fStar: 0,
            fStarKind: "published",
            xStar: new Float64Array([1e6, 2e-6]),
            fg: brown_badly_scaled_fg,
        });
    },
};

;// CONCATENATED MODULE: ./build/package/problems/extended-rosenbrock.js



function extended_rosenbrock_fg(x, g) {
    const n = x.length;
    let f = 0;
    for (let i = 0; i < n; i += 2) {
        const a = x[i];
        const f1 = 10 * (x[i + 1] - a * a);
        const f2 = 1 - a;
        g[i] = -40 * a * f1 - 2 * f2;
        g[i + 1] = 20 * f1;
        f += f1 * f1 + f2 * f2;
    }
    return f;
}
function value(x) {
    const n = x.length;
    let f = 0;
    for (let i = 0; i < n; i += 2) {
        const a = x[i];
        const f1 = 10 * (x[i + 1] - a * a);
        const f2 = 1 - a;
        f += f1 * f1 + f2 * f2;
    }
    return f;
}
const extendedRosenbrock = {
    name: "extended-rosenbrock",
    title: "Extended Rosenbrock function (Moré–Garbow–Hillstrom #21)",
    tags: ["valley", "large-scale", "mgh"],
    source: mghSource(21),
    params: {
        n: { default: 10, min: 2, integer: true, even: true, description: "dimension (even)" },
    },
    create(params) {
        const { p, key } = prepare(extendedRosenbrock, params);
        const n = p.n;
        const x0 = new Float64Array(n);
        for (let i = 0; i < n; i += 2) {
            x0[i] = -1.2;
            x0[i + 1] = 1;
        }
        return deterministicInstance({
            name: extendedRosenbrock.name,
            key,
            x0,
            widths: halfWidths(x0),
            fStar: 0,
            fStarKind: "published",
            xStar: new Float64Array(n).fill(1),
            fg: extended_rosenbrock_fg,
            f: value,
        });
    },
};

;// CONCATENATED MODULE: ./build/package/problems/freudenstein-roth.js



function freudenstein_roth_fg(x, g) {
    const x1 = x[0];
    const x2 = x[1];
    const f1 = -13 + x1 + ((5 - x2) * x2 - 2) * x2;
    const f2 = -29 + x1 + ((x2 + 1) * x2 - 14) * x2;
    const d1 = (10 - 3 * x2) * x2 - 2;
    const d2 = (3 * x2 + 2) * x2 - 14;
    g[0] = 2 * (f1 + f2);
    g[1] = 2 * (f1 * d1 + f2 * d2);
    return f1 * f1 + f2 * f2;
}
const freudenstein_roth_X0 = new Float64Array([0.5, -2]);
const freudensteinRoth = {
    name: "freudenstein-roth",
    title: "Freudenstein and Roth function (Moré–Garbow–Hillstrom #2)",
    tags: ["local-minimum", "nonconvex", "mgh"],
    source: mghSource(2),
    params: {},
    basins: [
        {
            name: "local",
            f: 48.9842,
            x: [11.4128, -0.896805],
            source: `${mghSource(2)} (local minimum stated beside f*)`,
        },
    ],
    create(params) {
        const { key } = prepare(freudensteinRoth, params);
        return deterministicInstance({
            name: freudensteinRoth.name,
            key,
            x0: freudenstein_roth_X0,
            widths: halfWidths(freudenstein_roth_X0),
            fStar: 0,
            fStarKind: "published",
            xStar: new Float64Array([5, 4]),
            fg: freudenstein_roth_fg,
        });
    },
};

;// CONCATENATED MODULE: ./build/package/problems/gaussian.js



const Y = new Float64Array([
    0.0009, 0.0044, 0.0175, 0.054, 0.1295, 0.242, 0.3521, 0.3989, 0.3521, 0.242, 0.1295, 0.054, 0.0175, 0.0044,
    0.0009,
]);
function gaussian_fg(x, g) {
    const x1 = x[0];
    const x2 = x[1];
    const x3 = x[2];
    let f = 0;
    let g1 = 0;
    let g2 = 0;
    let g3 = 0;
    for (let i = 1; i <= 15; i++) {
        const d = (8 - i) / 2 - x3;
        const e = Math.exp((-x2 * d * d) / 2);
        const r = x1 * e - Y[i - 1];
        f += r * r;
        g1 += r * e;
        g2 += (r * -x1 * e * d * d) / 2;
        g3 += r * x1 * x2 * e * d;
    }
    g[0] = 2 * g1;
    g[1] = 2 * g2;
    g[2] = 2 * g3;
    return f;
}
const gaussian_X0 = new Float64Array([0.4, 1, 0]);
const gaussian = {
    name: "gaussian",
    title: "Gaussian function (Moré–Garbow–Hillstrom #9)",
    tags: ["least-squares", "small-residual", "mgh"],
    source: mghSource(9),
    fStarNote: "Published f* = 1.12793e−8 (MGH 1981, problem 9); the full digits 1.1279327696186480e−8 and x* are recomputed by damped Newton at 60 digits (tests/problems/fixtures/recompute_mgh.py).",
    params: {},
    create(params) {
        const { key } = prepare(gaussian, params);
        return deterministicInstance({
            name: gaussian.name,
            key,
            x0: gaussian_X0,
            widths: halfWidths(gaussian_X0),
            fStar: 1.127932769618648e-8,
            fStarKind: "published",
            xStar: new Float64Array([0.39895613783875666, 1.0000190844878056, 0]),
            fg: gaussian_fg,
        });
    },
};

;// CONCATENATED MODULE: ./build/package/problems/helical-valley.js



const TWO_PI = 2 * Math.PI;
/** The paper's θ(x₁, x₂), extended to x₁ = 0 as described above. */
function helicalTheta(x1, x2) {
    if (x1 === 0)
        return x2 >= 0 ? 0.25 : -0.25;
    const t = Math.atan2(x2, x1) / TWO_PI;
    return t < -0.25 ? t + 1 : t;
}
function helical_valley_fg(x, g) {
    const x1 = x[0];
    const x2 = x[1];
    const x3 = x[2];
    const r2 = x1 * x1 + x2 * x2;
    const r = Math.sqrt(r2);
    const f1 = 10 * (x3 - 10 * helicalTheta(x1, x2));
    const f2 = 10 * (r - 1);
    if (r2 > 0) {
        // ∂f₁/∂x = −100∇θ, ∂f₂/∂x = 10∇r
        const c = 100 / (TWO_PI * r2);
        g[0] = 2 * (f1 * c * x2 + (f2 * 10 * x1) / r);
        g[1] = 2 * (-f1 * c * x1 + (f2 * 10 * x2) / r);
    }
    else {
        g[0] = 0;
        g[1] = 0;
    }
    g[2] = 2 * (10 * f1 + x3);
    return f1 * f1 + f2 * f2 + x3 * x3;
}
const helical_valley_X0 = new Float64Array([-1, 0, 0]);
const helicalValley = {
    name: "helical-valley",
    title: "Helical valley function (Moré–Garbow–Hillstrom #7)",
    tags: ["valley", "curved", "mgh"],
    source: mghSource(7),
    params: {},
    create(params) {
        const { key } = prepare(helicalValley, params);
        return deterministicInstance({
            name: helicalValley.name,
            key,
            x0: helical_valley_X0,
            widths: halfWidths(helical_valley_X0),
            fStar: 0,
            fStarKind: "published",
            xStar: new Float64Array([1, 0, 0]),
            fg: helical_valley_fg,
        });
    },
};

// EXTERNAL MODULE: ./build/package/core/rng.js
var rng = __nccwpck_require__(2906);
;// CONCATENATED MODULE: ./build/package/problems/logistic-regression.js



const DATA = new Map();
const SOLUTIONS = new Map();
function buildData(rng, m, n) {
    const x = new Float64Array(m * n);
    for (let i = 0; i < m * n; i++)
        x[i] = rng.nextNormal();
    const wTrue = new Float64Array(n);
    const scale = 2 / Math.sqrt(n);
    for (let j = 0; j < n; j++)
        wTrue[j] = scale * rng.nextNormal();
    const y = new Float64Array(m);
    for (let i = 0; i < m; i++) {
        let z = 0;
        for (let j = 0; j < n; j++)
            z += x[i * n + j] * wTrue[j];
        y[i] = rng.nextFloat() < sigmoid(z) ? 1 : -1;
    }
    return { m, n, x, y };
}
/** Full-batch loss and gradient (into g); no allocation. */
function fullLossGrad(data, l2, w, g) {
    const { m, n, x, y } = data;
    if (g)
        g.fill(0);
    let loss = 0;
    for (let i = 0; i < m; i++) {
        const row = i * n;
        let z = 0;
        for (let j = 0; j < n; j++)
            z += x[row + j] * w[j];
        const yz = y[i] * z;
        // log(1 + e^(−yz)) = max(−yz, 0) + log1p(e^(−|yz|)) and σ(−yz) = 1/(1 + e^(yz)), both from
        // e = e^(−|yz|) without overflow; written out so that no call in the loop returns a double
        const e = Math.exp(-Math.abs(yz));
        loss += yz < 0 ? -yz + Math.log1p(e) : Math.log1p(e);
        if (g) {
            const sig = yz < 0 ? 1 / (1 + e) : e / (1 + e);
            const c = (-y[i] * sig) / m;
            for (let j = 0; j < n; j++)
                g[j] += c * x[row + j];
        }
    }
    let reg = 0;
    for (let j = 0; j < n; j++) {
        reg += w[j] * w[j];
        if (g)
            g[j] += l2 * w[j];
    }
    return loss / m + 0.5 * l2 * reg;
}
function solve(data, l2) {
    const { m, n, x } = data;
    const w = new Float64Array(n);
    const g = new Float64Array(n);
    const h = new Float64Array(n * n);
    const step = new Float64Array(n);
    const trial = new Float64Array(n);
    let f = fullLossGrad(data, l2, w, g);
    let iterations = 0;
    for (; iterations < 100; iterations++) {
        h.fill(0);
        for (let i = 0; i < m; i++) {
            const row = i * n;
            let z = 0;
            for (let j = 0; j < n; j++)
                z += x[row + j] * w[j];
            const s = sigmoid(z);
            const c = (s * (1 - s)) / m;
            for (let j = 0; j < n; j++)
                for (let k = 0; k <= j; k++)
                    h[j * n + k] += c * x[row + j] * x[row + k];
        }
        for (let j = 0; j < n; j++)
            h[j * n + j] += l2;
        if (!cholesky(h, n))
            throw new Error("logistic-regression: Newton Hessian not positive definite");
        for (let j = 0; j < n; j++)
            step[j] = -g[j];
        choleskySolve(h, n, step);
        let t = 1;
        let fNew = f;
        for (let halvings = 0; halvings < 60; halvings++, t /= 2) {
            for (let j = 0; j < n; j++)
                trial[j] = w[j] + t * step[j];
            fNew = fullLossGrad(data, l2, trial, null);
            if (fNew <= f)
                break;
        }
        let stepInf = 0;
        let wInf = 0;
        for (let j = 0; j < n; j++) {
            stepInf = Math.max(stepInf, Math.abs(trial[j] - w[j]));
            wInf = Math.max(wInf, Math.abs(trial[j]));
        }
        if (fNew > f)
            break; // no decrease possible at this precision: w is converged
        w.set(trial);
        f = fullLossGrad(data, l2, w, g);
        if (stepInf <= 1e-15 * (1 + wInf))
            break;
    }
    let gradInf = 0;
    for (let j = 0; j < n; j++)
        gradInf = Math.max(gradInf, Math.abs(g[j]));
    if (!(gradInf <= 1e-12)) {
        throw new Error(`logistic-regression: Newton solve for f* did not converge (‖∇f‖∞ = ${gradInf} after ${iterations} iterations)`);
    }
    return { w, f, gradInf, iterations };
}
const logisticRegression = {
    name: "logistic-regression",
    title: "L2-regularised logistic regression on seeded synthetic data",
    tags: ["convex", "stochastic", "mini-batch", "machine-learning"],
    source: "Constructed here (common practice); model and Newton/IRLS solve: Bishop (2006), Pattern Recognition and Machine Learning, §4.3.2–4.3.3",
    fStarNote: "Computed once per parameter set (cached) by a damped Newton solve of the full-batch objective, converged until the step stops changing w and checked to ‖∇f(w*)‖∞ ≤ 1e−12 (src/problems/logistic-regression.ts).",
    params: {
        n: { default: 10, min: 1, max: 1000, integer: true, description: "number of features (dimension)" },
        m: { default: 128, min: 1, max: 1000000, integer: true, description: "number of examples" },
        l2: { default: 0.01, min: 1e-8, max: 1e4, description: "L2 regularisation weight λ (> 0)" },
        batch: {
            default: 20,
            min: 0,
            max: 1000000,
            integer: true,
            description: "mini-batch size; 0 = full batch",
        },
        seed: {
            default: 0,
            min: 0,
            max: 4294967295,
            integer: true,
            description: "structure seed of the data set",
        },
    },
    // The exact objective is a full pass over m examples (≈ m/batch = 6 mini-batch evaluations).
    measureEvery: 5,
    create: (params, ctx) => createLogisticRegression(params, ctx),
};
/** The data set of a parameter set (shared, read-only). */
function logisticData(params) {
    const { p } = prepare(logisticRegression, params);
    const sKey = structureKey(logisticRegression.name, p, ["m", "n"]);
    return cached(DATA, `${sKey}#${p.seed}`, () => buildData((0,rng/* structureRng */.HS)(sKey, p.seed), p.m, p.n));
}
/** The full-batch minimiser of a parameter set (computed once, cached; shared, read-only). */
function logisticSolution(params) {
    const { p } = prepare(logisticRegression, params);
    const sKey = structureKey(logisticRegression.name, p, ["m", "n"]);
    const data = logisticData(p);
    return cached(SOLUTIONS, `${sKey}#${p.seed}#${p.l2}`, () => solve(data, p.l2));
}
function createLogisticRegression(params, ctx) {
    const { p, key } = prepare(logisticRegression, params);
    const data = logisticData(p);
    const solution = logisticSolution(p);
    const { m, n, x, y } = data;
    const l2 = p.l2;
    const batch = p.batch;
    const noise = ctx.noise;
    const w0 = new Float64Array(n);
    const widths = new Float64Array(n).fill(0.01);
    const evaluate = batch > 0
        ? (w, g) => {
            let reg = 0;
            for (let j = 0; j < n; j++) {
                reg += w[j] * w[j];
                g[j] = l2 * w[j];
            }
            let loss = 0;
            const inv = 1 / batch;
            for (let t = 0; t < batch; t++) {
                const i = noise.nextBelow(m);
                const row = i * n;
                const yi = y[i];
                let z = 0;
                for (let j = 0; j < n; j++)
                    z += x[row + j] * w[j];
                const yz = yi * z;
                const e = Math.exp(-Math.abs(yz));
                loss += yz < 0 ? -yz + Math.log1p(e) : Math.log1p(e);
                const c = -yi * (yz < 0 ? 1 / (1 + e) : e / (1 + e)) * inv;
                for (let j = 0; j < n; j++)
                    g[j] += c * x[row + j];
            }
            return loss * inv + 0.5 * l2 * reg;
        }
        : (w, g) => fullLossGrad(data, l2, w, g);
    return {
        key,
        dim: n,
        fStar: solution.f,
        fStarKind: "computed",
        xStar: Float64Array.from(solution.w),
        stochastic: batch > 0,
        evaluate,
        objective: (w) => fullLossGrad(data, l2, w, null),
        start: (out, rng) => writeStart(out, w0, widths, rng, logisticRegression.name),
    };
}

;// CONCATENATED MODULE: ./build/package/problems/noisy-quadratic.js


/**
 * Stationary mean loss of plain SGD with constant step `lr` on the noisy quadratic:
 * Σᵢ lr·σ²/(2(2 − lr·λᵢ)) (derivation in the doc comment above). Throws unless 0 < lr·λᵢ < 2 for
 * every i (otherwise SGD diverges and there is no stationary distribution).
 */
function sgdStationaryLoss(eigenvalues, sigma, lr) {
    let s = 0;
    for (let i = 0; i < eigenvalues.length; i++) {
        const t = lr * eigenvalues[i];
        if (!(t > 0 && t < 2)) {
            throw new Error(`sgdStationaryLoss: lr·λ must lie in (0, 2) for every eigenvalue, got lr = ${lr}, λ = ${eigenvalues[i]}`);
        }
        s += (lr * sigma * sigma) / (2 * (2 - t));
    }
    return s;
}
const noisyQuadratic = {
    name: "noisy-quadratic",
    title: "Noisy diagonal quadratic, gradient noise σ·N(0, I)",
    tags: ["convex", "quadratic", "stochastic", "noise-floor"],
    source: 'Constructed here (common practice); noisy-quadratic model as used by Schaul, Zhang & LeCun (2013), "No more pesky learning rates", ICML, arXiv:1206.1106',
    fStarNote: "f* = 0 at x* = 0 by construction; SGD's stationary mean loss has a closed form (sgdStationaryLoss).",
    params: {
        kappa: { default: 10, min: 1, max: 1e12, description: "condition number κ (λ from 1 to κ)" },
        n: { default: 10, min: 1, max: 1000000, integer: true, description: "dimension" },
        sigma: {
            default: 0.1,
            min: 0,
            max: 1e6,
            description: "standard deviation of the gradient noise per coordinate",
        },
    },
    create: (params, ctx) => createNoisyQuadratic(params, ctx),
};
/** Creates a noisy-quadratic instance bound to the run's noise stream. */
function createNoisyQuadratic(params, ctx) {
    const { p, key } = prepare(noisyQuadratic, params);
    const n = p.n;
    const sigma = p.sigma;
    const lambda = logSpaced(n, 1, p.kappa);
    const noise = ctx.noise;
    const x0 = new Float64Array(n).fill(1);
    const widths = halfWidths(x0);
    const z = new Float64Array(n);
    const objective = (x) => {
        let f = 0;
        for (let i = 0; i < n; i++)
            f += lambda[i] * x[i] * x[i];
        return 0.5 * f;
    };
    const evaluate = sigma > 0
        ? (x, g) => {
            noise.fillNormal(z, sigma); // σ·N(0, 1) per coordinate, into a buffer made once
            let f = 0;
            for (let i = 0; i < n; i++) {
                const s = lambda[i] * x[i];
                f += s * x[i];
                g[i] = s + z[i];
            }
            return 0.5 * f;
        }
        : (x, g) => {
            let f = 0;
            for (let i = 0; i < n; i++) {
                const s = lambda[i] * x[i];
                f += s * x[i];
                g[i] = s;
            }
            return 0.5 * f;
        };
    return {
        key,
        dim: n,
        fStar: 0,
        fStarKind: "computed",
        xStar: new Float64Array(n),
        stochastic: sigma > 0,
        evaluate,
        objective,
        start: (out, rng) => writeStart(out, x0, widths, rng, noisyQuadratic.name),
        eigenvalues: lambda,
        sigma,
    };
}

;// CONCATENATED MODULE: ./build/package/problems/penalty-1.js



const A = 1e-5;
function penalty_1_fg(x, g) {
    const n = x.length;
    let s = 0;
    let q = 0;
    for (let i = 0; i < n; i++) {
        const xi = x[i];
        s += xi * xi;
        q += (xi - 1) * (xi - 1);
    }
    const c = s - 0.25;
    for (let i = 0; i < n; i++)
        g[i] = 2 * A * (x[i] - 1) + 4 * x[i] * c;
    return A * q + c * c;
}
function penalty_1_value(x) {
    const n = x.length;
    let s = 0;
    let q = 0;
    for (let i = 0; i < n; i++) {
        const xi = x[i];
        s += xi * xi;
        q += (xi - 1) * (xi - 1);
    }
    const c = s - 0.25;
    return A * q + c * c;
}
/** The common coordinate t of Penalty I's minimiser for dimension n (see the doc comment). */
function penalty1Minimiser(n) {
    let t = 1 / (2 * Math.sqrt(n));
    for (let k = 0; k < 100; k++) {
        const g = 2 * n * t * t * t + (A - 0.5) * t - A;
        const dg = 6 * n * t * t + A - 0.5;
        const next = t - g / dg;
        if (next === t)
            break;
        t = next;
    }
    return t;
}
const penalty1 = {
    name: "penalty-1",
    title: "Penalty function I (Moré–Garbow–Hillstrom #23)",
    tags: ["penalty", "badly-scaled", "mgh"],
    source: mghSource(23),
    fStarNote: "Published for n = 4 (2.24997e−5) and n = 10 (7.08765e−5); for every n computed at create time as the minimum over x = t·(1,…,1) by Newton's method on 2nt³ + (a − ½)t − a = 0 (the minimiser has equal coordinates, see src/problems/penalty-1.ts).",
    params: {
        n: { default: 4, min: 1, max: 100000, integer: true, description: "dimension" },
    },
    create(params) {
        const { p, key } = prepare(penalty1, params);
        const n = p.n;
        const x0 = new Float64Array(n);
        for (let i = 0; i < n; i++)
            x0[i] = i + 1;
        const t = penalty1Minimiser(n);
        const xStar = new Float64Array(n).fill(t);
        return deterministicInstance({
            name: penalty1.name,
            key,
            x0,
            widths: halfWidths(x0),
            fStar: penalty_1_value(xStar),
            fStarKind: n === 4 || n === 10 ? "published" : "computed",
            xStar,
            fg: penalty_1_fg,
            f: penalty_1_value,
        });
    },
};

;// CONCATENATED MODULE: ./build/package/problems/penalty-2.js



const penalty_2_A = 1e-5;
const E_MINUS = Math.exp(-0.1);
/** Minimisers recomputed at 60 digits (recompute_mgh.py), rounded to double. */
const KNOWN = {
    4: {
        fStar: 9.376293007355442e-6,
        xStar: [0.1999993333503804, 0.19131670099277245, 0.48010148533262315, 0.5188454043902005],
    },
    10: {
        fStar: 2.9366053745674594e-4,
        xStar: [
            0.1999836051978236, 0.010350648471292297, 0.019604934480438402, 0.03208906722068565,
            0.049932677399641294, 0.07651399515399361, 0.11862407286950417, 0.19214487233557667,
            0.34732058694184365, 0.3691643741593508,
        ],
    },
};
function makeFg(n) {
    const y = new Float64Array(n);
    for (let i = 1; i < n; i++)
        y[i] = Math.exp((i + 1) / 10) + Math.exp(i / 10);
    const e = new Float64Array(n);
    const fg = (x, g) => {
        let w = 0;
        for (let j = 0; j < n; j++) {
            e[j] = Math.exp(x[j] / 10);
            w += (n - j) * x[j] * x[j];
        }
        const r1 = x[0] - 0.2;
        const last = w - 1;
        let f = r1 * r1 + last * last;
        for (let j = 0; j < n; j++)
            g[j] = 4 * last * (n - j) * x[j];
        g[0] += 2 * r1;
        for (let i = 1; i < n; i++) {
            const d = e[i] + e[i - 1] - y[i];
            const h = e[i] - E_MINUS;
            f += penalty_2_A * (d * d + h * h);
            // ∂/∂xᵢ of a·d² is 2a·d·eᵢ/10; of a·h² is 2a·h·eᵢ/10; ∂/∂xᵢ₋₁ of a·d² is 2a·d·eᵢ₋₁/10
            g[i] += 0.2 * penalty_2_A * (d + h) * e[i];
            g[i - 1] += 0.2 * penalty_2_A * d * e[i - 1];
        }
        return f;
    };
    return fg;
}
const penalty2 = {
    name: "penalty-2",
    title: "Penalty function II (Moré–Garbow–Hillstrom #24)",
    tags: ["penalty", "badly-scaled", "mgh"],
    source: mghSource(24),
    fStarNote: "Published for n = 4 (9.37629e−6) and n = 10 (2.93660e−4); full digits and x* recomputed by damped Newton at 60 digits (tests/problems/fixtures/recompute_mgh.py). Other n: f* = 0 is only a lower bound.",
    params: {
        n: { default: 4, min: 1, max: 100000, integer: true, description: "dimension" },
    },
    create(params) {
        const { p, key } = prepare(penalty2, params);
        const n = p.n;
        const x0 = new Float64Array(n).fill(0.5);
        const known = KNOWN[n];
        return deterministicInstance({
            name: penalty2.name,
            key,
            x0,
            widths: halfWidths(x0),
            fStar: known ? known.fStar : 0,
            fStarKind: known ? "published" : "lower-bound",
            xStar: known ? Float64Array.from(known.xStar) : null,
            fg: makeFg(n),
        });
    },
};

;// CONCATENATED MODULE: ./build/package/problems/plateau.js


function plateau_fg(x, g) {
    const n = x.length;
    let r2 = 0;
    for (let i = 0; i < n; i++)
        r2 += x[i] * x[i];
    const e = Math.exp(-0.5 * r2);
    for (let i = 0; i < n; i++)
        g[i] = x[i] * e;
    return -Math.expm1(-0.5 * r2);
}
function plateau_value(x) {
    let r2 = 0;
    for (let i = 0; i < x.length; i++)
        r2 += x[i] * x[i];
    return -Math.expm1(-0.5 * r2);
}
const plateau = {
    name: "plateau",
    title: "Gaussian-well plateau 1 − exp(−‖x‖²/2), start on the plateau",
    tags: ["plateau", "vanishing-gradient", "nonconvex"],
    source: 'Constructed here (common practice); plateaus: Saad & Solla (1995), "On-line learning in soft committee machines", Phys. Rev. E 52(4)',
    fStarNote: "f* = 0 at x* = 0 by construction (exact).",
    params: {
        n: { default: 2, min: 1, max: 1000000, integer: true, description: "dimension" },
        r0: { default: 3, min: 0, max: 30, description: "distance of the standard start from the minimum" },
    },
    create(params) {
        const { p, key } = prepare(plateau, params);
        const n = p.n;
        const x0 = new Float64Array(n).fill(p.r0 / Math.sqrt(n));
        return deterministicInstance({
            name: plateau.name,
            key,
            x0,
            widths: halfWidths(x0),
            fStar: 0,
            fStarKind: "computed",
            xStar: new Float64Array(n),
            fg: plateau_fg,
            f: plateau_value,
        });
    },
};

;// CONCATENATED MODULE: ./build/package/problems/powell-badly-scaled.js



function powell_badly_scaled_fg(x, g) {
    const x1 = x[0];
    const x2 = x[1];
    const e1 = Math.exp(-x1);
    const e2 = Math.exp(-x2);
    const f1 = 1e4 * x1 * x2 - 1;
    const f2 = e1 + e2 - 1.0001;
    g[0] = 2 * (1e4 * x2 * f1 - e1 * f2);
    g[1] = 2 * (1e4 * x1 * f1 - e2 * f2);
    return f1 * f1 + f2 * f2;
}
const powell_badly_scaled_X0 = new Float64Array([0, 1]);
const WIDTHS = new Float64Array([1e-6, 0.01]);
const powellBadlyScaled = {
    name: "powell-badly-scaled",
    title: "Powell badly scaled function (Moré–Garbow–Hillstrom #3)",
    tags: ["badly-scaled", "mgh"],
    source: mghSource(3),
    params: {},
    create(params) {
        const { key } = prepare(powellBadlyScaled, params);
        return deterministicInstance({
            name: powellBadlyScaled.name,
            key,
            x0: powell_badly_scaled_X0,
            widths: WIDTHS,
            fStar: 0,
            fStarKind: "published",
            xStar: new Float64Array([1.0981593296998175e-5, 9.106146739866524]),
            fg: powell_badly_scaled_fg,
        });
    },
};

;// CONCATENATED MODULE: ./build/package/problems/powell-singular.js



function powell_singular_fg(x, g) {
    const a = x[0] + 10 * x[1];
    const b = x[2] - x[3];
    const c = x[1] - 2 * x[2];
    const d = x[0] - x[3];
    const c3 = c * c * c;
    const d3 = d * d * d;
    g[0] = 2 * a + 40 * d3;
    g[1] = 20 * a + 4 * c3;
    g[2] = 10 * b - 8 * c3;
    g[3] = -10 * b - 40 * d3;
    return a * a + 5 * b * b + c3 * c + 10 * d3 * d;
}
const powell_singular_X0 = new Float64Array([3, -1, 0, 1]);
const powellSingular = {
    name: "powell-singular",
    title: "Powell singular function (Moré–Garbow–Hillstrom #13)",
    tags: ["singular-hessian", "mgh"],
    source: mghSource(13),
    params: {},
    create(params) {
        const { key } = prepare(powellSingular, params);
        return deterministicInstance({
            name: powellSingular.name,
            key,
            x0: powell_singular_X0,
            widths: halfWidths(powell_singular_X0),
            fStar: 0,
            fStarKind: "published",
            xStar: new Float64Array(4),
            fg: powell_singular_fg,
        });
    },
};

;// CONCATENATED MODULE: ./build/package/problems/quadratic.js
/**
 * Ill-conditioned quadratic (rotated, log-spaced spectrum).
 *
 * What it is for: the problem on which first-order methods have known convergence rates. With
 * eigenvalues in [μ, L] = [1, κ], gradient descent contracts like 1 − 1/κ, heavy ball and Nesterov
 * like 1 − 1/√κ (Nesterov 2004, Introductory Lectures on Convex Optimization, Thm 2.1.15 and §2.2;
 * Polyak 1964, doi:10.1016/0041-5553(64)90137-5). The rotation makes the Hessian non-diagonal, so
 * per-coordinate methods (Adagrad, RMSProp, Adam) get no free preconditioning; `rotate = 0` keeps it
 * diagonal, where they do.
 *
 * f(x) = ½ (x − x*)ᵀ A (x − x*),  A = Qᵀ diag(λ) Q,  ∇f(x) = A (x − x*),  f* = 0,
 * λᵢ = κ^(i/(n−1)), i = 0..n−1 (log-spaced from 1 to κ, both exact; λ = (1) when n = 1),
 * x* = (1, …, 1), standard start x0 = (0, …, 0), so f(x0) = ½ Σᵢ λᵢ (qᵢ · 1)² with qᵢ the rows of Q.
 * Q: Haar-random orthogonal matrix, Gram–Schmidt QR (with reorthogonalisation) of an n×n matrix of
 * N(0, 1) draws from `structureRng("quadratic[n=…]", seed)` (see util.orthogonalMatrix). Q depends on
 * n and `seed` only, so the same rotation serves every κ. With `rotate = 0`, Q = I.
 *
 * Source: constructed here (common practice); rates as cited above.
 * Start perturbation: ±0.01 absolute, uniform per coordinate (x0 is all zeros).
 * Cost: O(n²) per evaluation with rotation (one dense symmetric matrix–vector product; A is built
 * once per (n, κ, seed) in O(n³) and cached), O(n) without. Memory 16n² bytes for Q and A.
 */



/** Eigenvalues, μ and L for the given (possibly partial) parameters; defaults fill the rest. */
function quadraticSpectrum(params = {}) {
    const { p } = prepare(quadratic, params);
    const eigenvalues = logSpaced(p.n, 1, p.kappa);
    return { eigenvalues, mu: eigenvalues[0], L: eigenvalues[p.n - 1] };
}
const ROTATIONS = new Map();
const HESSIANS = new Map();
function buildHessian(q, lambda, n) {
    const a = new Float64Array(n * n);
    for (let j = 0; j < n; j++) {
        for (let k = j; k < n; k++) {
            let s = 0;
            for (let i = 0; i < n; i++)
                s += q[i * n + j] * lambda[i] * q[i * n + k];
            a[j * n + k] = s;
            a[k * n + j] = s;
        }
    }
    return a;
}
const quadratic = {
    name: "quadratic",
    title: "Ill-conditioned quadratic, log-spaced spectrum in [1, κ], seeded rotation",
    tags: ["convex", "ill-conditioned", "quadratic", "rates"],
    source: "Constructed here (common practice); rates: Nesterov (2004), Introductory Lectures on Convex Optimization, Thm 2.1.15 and §2.2; Polyak (1964), USSR Comput. Math. Math. Phys. 4(5):1–17, doi:10.1016/0041-5553(64)90137-5",
    fStarNote: "f* = 0 at x* = (1, …, 1) by construction (A is positive definite).",
    params: {
        kappa: { default: 100, min: 1, max: 1e12, description: "condition number κ = L/μ (λ from 1 to κ)" },
        n: { default: 10, min: 1, max: 2000, integer: true, description: "dimension" },
        rotate: { default: 1, min: 0, max: 1, integer: true, description: "1: random rotation Q; 0: diagonal A" },
        seed: {
            default: 0,
            min: 0,
            max: 4294967295,
            integer: true,
            description: "structure seed of the rotation",
        },
    },
    create: (params) => createQuadratic(params),
};
/** Creates a quadratic instance with its spectrum and rotation exposed (see `QuadraticInstance`). */
function createQuadratic(params = {}) {
    const { p, key } = prepare(quadratic, params);
    const n = p.n;
    const { eigenvalues, mu, L } = quadraticSpectrum(p);
    const rotated = p.rotate === 1;
    let rotation = null;
    let hessian = null;
    if (rotated) {
        const sKey = structureKey(quadratic.name, p, ["n"]);
        const q = cached(ROTATIONS, `${sKey}#${p.seed}`, () => orthogonalMatrix((0,rng/* structureRng */.HS)(sKey, p.seed), n));
        rotation = q;
        hessian = cached(HESSIANS, `${sKey}#${p.seed}#${p.kappa}`, () => buildHessian(q, eigenvalues, n));
    }
    const x0 = new Float64Array(n);
    const widths = new Float64Array(n).fill(0.01);
    const d = new Float64Array(n);
    const a = hessian;
    const lambda = eigenvalues;
    const evaluate = a
        ? (x, g) => {
            for (let j = 0; j < n; j++)
                d[j] = x[j] - 1;
            let f = 0;
            for (let j = 0; j < n; j++) {
                const row = j * n;
                let s = 0;
                for (let k = 0; k < n; k++)
                    s += a[row + k] * d[k];
                g[j] = s;
                f += d[j] * s;
            }
            return 0.5 * f;
        }
        : (x, g) => {
            let f = 0;
            for (let j = 0; j < n; j++) {
                const dj = x[j] - 1;
                const s = lambda[j] * dj;
                g[j] = s;
                f += dj * s;
            }
            return 0.5 * f;
        };
    const objective = a
        ? (x) => {
            for (let j = 0; j < n; j++)
                d[j] = x[j] - 1;
            let f = 0;
            for (let j = 0; j < n; j++) {
                const row = j * n;
                let s = 0;
                for (let k = 0; k < n; k++)
                    s += a[row + k] * d[k];
                f += d[j] * s;
            }
            return 0.5 * f;
        }
        : (x) => {
            let f = 0;
            for (let j = 0; j < n; j++) {
                const dj = x[j] - 1;
                f += lambda[j] * dj * dj;
            }
            return 0.5 * f;
        };
    return {
        key,
        dim: n,
        fStar: 0,
        fStarKind: "computed",
        xStar: new Float64Array(n).fill(1),
        stochastic: false,
        evaluate,
        objective,
        start: (out, rng) => writeStart(out, x0, widths, rng, quadratic.name),
        eigenvalues,
        mu,
        L,
        rotation,
        hessian,
    };
}

;// CONCATENATED MODULE: ./build/package/problems/rosenbrock.js



function rosenbrock_fg(x, g) {
    const x1 = x[0];
    const x2 = x[1];
    const f1 = 10 * (x2 - x1 * x1);
    const f2 = 1 - x1;
    g[0] = -40 * x1 * f1 - 2 * f2;
    g[1] = 20 * f1;
    return f1 * f1 + f2 * f2;
}
const rosenbrock_X0 = new Float64Array([-1.2, 1]);
const rosenbrock = {
    name: "rosenbrock",
    title: "Rosenbrock function (Moré–Garbow–Hillstrom #1)",
    tags: ["valley", "nonconvex", "mgh"],
    source: `${mghSource(1)}; Rosenbrock (1960), The Computer Journal 3(3):175–184`,
    params: {},
    create(params) {
        const { key } = prepare(rosenbrock, params);
        return deterministicInstance({
            name: rosenbrock.name,
            key,
            x0: rosenbrock_X0,
            widths: halfWidths(rosenbrock_X0),
            fStar: 0,
            fStarKind: "published",
            xStar: new Float64Array([1, 1]),
            fg: rosenbrock_fg,
        });
    },
};

;// CONCATENATED MODULE: ./build/package/problems/saddle.js


const saddle_X0 = new Float64Array([1, 1e-6]);
const NO_WIDTHS = new Float64Array(2);
function saddle_fg(x, g) {
    const a = x[0];
    const b = x[1];
    const b2 = b * b;
    g[0] = a;
    g[1] = b * (b2 - 1);
    return 0.5 * a * a + b2 * (0.25 * b2 - 0.5);
}
function saddle_value(x) {
    const a = x[0];
    const b2 = x[1] * x[1];
    return 0.5 * a * a + b2 * (0.25 * b2 - 0.5);
}
function start(out, rng) {
    writeStart(out, saddle_X0, NO_WIDTHS, null, saddle.name);
    if (rng === null)
        return;
    out[0] = saddle_X0[0] * (1 + 0.01 * (2 * rng.nextFloat() - 1));
    out[1] = saddle_X0[1] * (1 + 0.5 * (2 * rng.nextFloat() - 1));
}
const saddle = {
    name: "saddle",
    title: "Saddle escape: ½x² − ½y² + ¼y⁴ from next to the stable manifold",
    tags: ["saddle", "nonconvex"],
    source: 'Constructed here (common practice); motivated by Dauphin et al. (2014), "Identifying and attacking the saddle point problem in high-dimensional non-convex optimization", NeurIPS, arXiv:1406.2572',
    fStarNote: "f* = −¼ at (0, ±1), derived analytically in src/problems/saddle.ts (exact).",
    params: {},
    create(params) {
        const { key } = prepare(saddle, params);
        return {
            key,
            dim: 2,
            fStar: -0.25,
            fStarKind: "computed",
            xStar: new Float64Array([0, 1]),
            stochastic: false,
            evaluate: saddle_fg,
            objective: saddle_value,
            start,
        };
    },
};

;// CONCATENATED MODULE: ./build/package/problems/sparse-least-squares.js



const sparse_least_squares_DATA = new Map();
function sparse_least_squares_buildData(rng, m, n) {
    const frequency = new Float64Array(n);
    for (let j = 0; j < n; j++)
        frequency[j] = n === 1 ? 0.5 : 0.5 * Math.pow(0.01, j / (n - 1));
    const rowPtr = new Int32Array(m + 1);
    const cols = [];
    const vals = [];
    for (let r = 0; r < m; r++) {
        for (let j = 0; j < n; j++) {
            const present = rng.nextFloat() < frequency[j];
            if (present) {
                cols.push(j);
                vals.push(rng.nextNormal());
            }
            else if (r === j) {
                cols.push(j);
                vals.push(rng.nextNormal());
            }
        }
        rowPtr[r + 1] = cols.length;
    }
    const col = Int32Array.from(cols);
    const val = Float64Array.from(vals);
    const xTrue = new Float64Array(n);
    for (let j = 0; j < n; j++)
        xTrue[j] = rng.nextNormal();
    const b = new Float64Array(m);
    for (let r = 0; r < m; r++) {
        let s = 0;
        for (let k = rowPtr[r]; k < rowPtr[r + 1]; k++)
            s += val[k] * xTrue[col[k]];
        b[r] = s;
    }
    return { m, n, rowPtr, col, val, b, xTrue, frequency };
}
const sparseLeastSquares = {
    name: "sparse-least-squares",
    title: "Sparse least squares with rare features (frequencies 0.5 down to 0.005)",
    tags: ["convex", "sparse", "per-parameter-scaling", "least-squares"],
    source: 'Constructed here (common practice), after the sparse-feature setting of Duchi, Hazan & Singer (2011), "Adaptive subgradient methods for online learning and stochastic optimization", JMLR 12:2121–2159, https://jmlr.org/papers/v12/duchi11a.html',
    fStarNote: "f* = 0 at x* = x_true by construction (consistent targets b = A·x_true; A has full column rank).",
    params: {
        n: { default: 20, min: 1, max: 10000, integer: true, description: "number of features (dimension)" },
        m: { default: 300, min: 1, max: 1000000, integer: true, description: "number of rows (must be ≥ n)" },
        batch: {
            default: 0,
            min: 0,
            max: 1000000,
            integer: true,
            description: "mini-batch size; 0 = full batch",
        },
        seed: {
            default: 0,
            min: 0,
            max: 4294967295,
            integer: true,
            description: "structure seed of the data set",
        },
    },
    create: (params, ctx) => createSparseLeastSquares(params, ctx),
};
/** The data set of a parameter set (shared, read-only). */
function sparseLeastSquaresData(params) {
    const { p } = prepare(sparseLeastSquares, params);
    if (p.m < p.n) {
        throw new Error(`problem "sparse-least-squares": params.m must be ≥ params.n (${p.n}) so that x* is unique, got ${p.m}`);
    }
    const sKey = structureKey(sparseLeastSquares.name, p, ["m", "n"]);
    return cached(sparse_least_squares_DATA, `${sKey}#${p.seed}`, () => sparse_least_squares_buildData((0,rng/* structureRng */.HS)(sKey, p.seed), p.m, p.n));
}
function createSparseLeastSquares(params, ctx) {
    const { p, key } = prepare(sparseLeastSquares, params);
    const data = sparseLeastSquaresData(p);
    const { m, n, rowPtr, col, val, b } = data;
    const batch = p.batch;
    const noise = ctx.noise;
    const x0 = new Float64Array(n);
    const widths = new Float64Array(n).fill(0.01);
    const objective = (x) => {
        let f = 0;
        for (let r = 0; r < m; r++) {
            let s = 0;
            for (let k = rowPtr[r]; k < rowPtr[r + 1]; k++)
                s += val[k] * x[col[k]];
            s -= b[r];
            f += s * s;
        }
        return f / (2 * m);
    };
    // The per-row work is written out inside the loop (no helper returning a double), so that no call in
    // the hot loop depends on V8 inlining it to avoid boxing its result.
    const evaluate = (x, g) => {
        g.fill(0);
        const count = batch > 0 ? batch : m;
        const w = 1 / count;
        let f = 0;
        for (let t = 0; t < count; t++) {
            const r = batch > 0 ? noise.nextBelow(m) : t;
            const lo = rowPtr[r];
            const hi = rowPtr[r + 1];
            let s = 0;
            for (let k = lo; k < hi; k++)
                s += val[k] * x[col[k]];
            s -= b[r]; // same order as b was built: exactly 0 at x_true
            f += s * s;
            const ws = w * s;
            for (let k = lo; k < hi; k++)
                g[col[k]] += ws * val[k];
        }
        return f / (2 * count);
    };
    return {
        key,
        dim: n,
        fStar: 0,
        fStarKind: "computed",
        xStar: Float64Array.from(data.xTrue),
        stochastic: batch > 0,
        evaluate,
        objective,
        start: (out, rng) => writeStart(out, x0, widths, rng, sparseLeastSquares.name),
    };
}

;// CONCATENATED MODULE: ./build/package/problems/two-layer-network.js



const two_layer_network_DATA = new Map();
/**
 * Network output at input row `xi` (offset into `x`); writes the hidden activations into `z`. Used to
 * build the targets; `evaluate` and `objective` repeat the same arithmetic in the same order (so
 * f(θ_teacher) is exactly 0).
 */
function forward(theta, d, h, x, xi, z) {
    const b1 = h * d;
    const w2 = b1 + h;
    let out = theta[w2 + h];
    for (let k = 0; k < h; k++) {
        let a = theta[b1 + k];
        const row = k * d;
        for (let j = 0; j < d; j++)
            a += theta[row + j] * x[xi + j];
        const zk = Math.tanh(a);
        z[k] = zk;
        out += theta[w2 + k] * zk;
    }
    return out;
}
function two_layer_network_buildData(rng, d, h, m) {
    const dim = h * (d + 2) + 1;
    const b1 = h * d;
    const w2 = b1 + h;
    const teacher = new Float64Array(dim);
    for (let i = 0; i < b1; i++)
        teacher[i] = rng.nextNormal() / Math.sqrt(d);
    for (let k = 0; k < h; k++)
        teacher[b1 + k] = 0.5 * rng.nextNormal();
    for (let k = 0; k < h; k++)
        teacher[w2 + k] = rng.nextNormal() / Math.sqrt(h);
    teacher[w2 + h] = 0.5 * rng.nextNormal();
    const x = new Float64Array(m * d);
    for (let i = 0; i < m * d; i++)
        x[i] = rng.nextNormal();
    const z = new Float64Array(h);
    const y = new Float64Array(m);
    for (let i = 0; i < m; i++)
        y[i] = forward(teacher, d, h, x, i * d, z);
    const start = new Float64Array(dim);
    for (let i = 0; i < b1; i++)
        start[i] = rng.nextNormal() / Math.sqrt(d);
    for (let k = 0; k < h; k++)
        start[w2 + k] = rng.nextNormal() / Math.sqrt(h);
    return { d, h, m, teacher, x, y, start };
}
const twoLayerNetwork = {
    name: "two-layer-network",
    title: "Two-layer tanh network, regression on a same-shape teacher (f* = 0 attained)",
    tags: ["nonconvex", "stochastic", "mini-batch", "machine-learning", "neural-network"],
    source: 'Constructed here (common practice), after the teacher–student setting of Saad & Solla (1995), "On-line learning in soft committee machines", Phys. Rev. E 52(4)',
    fStarNote: "f* = 0 by construction: the targets are the outputs of a teacher network of the same shape, reached exactly at the teacher's weights (and their symmetric images).",
    params: {
        d: { default: 3, min: 1, max: 1000, integer: true, description: "number of inputs" },
        h: { default: 5, min: 1, max: 1000, integer: true, description: "number of hidden tanh units" },
        m: { default: 64, min: 1, max: 1000000, integer: true, description: "number of training examples" },
        batch: {
            default: 16,
            min: 0,
            max: 1000000,
            integer: true,
            description: "mini-batch size; 0 = full batch",
        },
        seed: {
            default: 0,
            min: 0,
            max: 4294967295,
            integer: true,
            description: "structure seed (teacher, data, init)",
        },
    },
    // The exact objective is a full pass over m examples (≈ m/batch = 4 mini-batch evaluations).
    measureEvery: 5,
    create: (params, ctx) => createTwoLayerNetwork(params, ctx),
};
/** The fixed structure of a parameter set (shared, read-only). */
function networkData(params) {
    const { p } = prepare(twoLayerNetwork, params);
    const sKey = structureKey(twoLayerNetwork.name, p, ["d", "h", "m"]);
    return cached(two_layer_network_DATA, `${sKey}#${p.seed}`, () => two_layer_network_buildData((0,rng/* structureRng */.HS)(sKey, p.seed), p.d, p.h, p.m));
}
function createTwoLayerNetwork(params, ctx) {
    const { p, key } = prepare(twoLayerNetwork, params);
    const data = networkData(p);
    const { d, h, m, x, y } = data;
    const dim = h * (d + 2) + 1;
    const b1 = h * d;
    const w2 = b1 + h;
    const batch = p.batch;
    const noise = ctx.noise;
    const z = new Float64Array(h);
    const widths = halfWidths(data.start);
    // The per-example work is written out inside each loop (no helper returning a double), so that no
    // call in the hot loop depends on V8 inlining it to avoid boxing its result.
    const evaluate = (theta, g) => {
        g.fill(0);
        const count = batch > 0 ? batch : m;
        const w = 1 / count;
        let s = 0;
        for (let t = 0; t < count; t++) {
            const i = batch > 0 ? noise.nextBelow(m) : t;
            const xi = i * d;
            let out = theta[w2 + h];
            for (let k = 0; k < h; k++) {
                let a = theta[b1 + k];
                const row = k * d;
                for (let j = 0; j < d; j++)
                    a += theta[row + j] * x[xi + j];
                const zk = Math.tanh(a);
                z[k] = zk;
                out += theta[w2 + k] * zk;
            }
            const r = out - y[i];
            s += r * r;
            const wr = w * r;
            g[w2 + h] += wr;
            for (let k = 0; k < h; k++) {
                const zk = z[k];
                g[w2 + k] += wr * zk;
                const delta = wr * theta[w2 + k] * (1 - zk * zk);
                g[b1 + k] += delta;
                const row = k * d;
                for (let j = 0; j < d; j++)
                    g[row + j] += delta * x[xi + j];
            }
        }
        return (0.5 * s) / count;
    };
    const objective = (theta) => {
        let s = 0;
        for (let i = 0; i < m; i++) {
            const xi = i * d;
            let out = theta[w2 + h];
            for (let k = 0; k < h; k++) {
                let a = theta[b1 + k];
                const row = k * d;
                for (let j = 0; j < d; j++)
                    a += theta[row + j] * x[xi + j];
                out += theta[w2 + k] * Math.tanh(a);
            }
            const r = out - y[i];
            s += r * r;
        }
        return (0.5 * s) / m;
    };
    return {
        key,
        dim,
        fStar: 0,
        fStarKind: "computed",
        xStar: Float64Array.from(data.teacher),
        stochastic: batch > 0,
        evaluate,
        objective,
        start: (out, rng) => writeStart(out, data.start, widths, rng, twoLayerNetwork.name),
    };
}

;// CONCATENATED MODULE: ./build/package/problems/wood.js



function wood_fg(x, g) {
    const x1 = x[0];
    const x2 = x[1];
    const x3 = x[2];
    const x4 = x[3];
    const a = x2 - x1 * x1; // f₁ = 10a
    const b = 1 - x1;
    const c = x4 - x3 * x3; // f₃ = √90·c
    const d = 1 - x3;
    const e = x2 + x4 - 2; // f₅ = √10·e
    const h = x2 - x4; // f₆ = h/√10
    g[0] = -400 * x1 * a - 2 * b;
    g[1] = 200 * a + 20 * e + 0.2 * h;
    g[2] = -360 * x3 * c - 2 * d;
    g[3] = 180 * c + 20 * e - 0.2 * h;
    return 100 * a * a + b * b + 90 * c * c + d * d + 10 * e * e + 0.1 * h * h;
}
const wood_X0 = new Float64Array([-3, -1, -3, -1]);
const wood = {
    name: "wood",
    title: "Wood function (Moré–Garbow–Hillstrom #14)",
    tags: ["valley", "nonconvex", "mgh"],
    source: mghSource(14),
    params: {},
    create(params) {
        const { key } = prepare(wood, params);
        return deterministicInstance({
            name: wood.name,
            key,
            x0: wood_X0,
            widths: halfWidths(wood_X0),
            fStar: 0,
            fStarKind: "published",
            xStar: new Float64Array([1, 1, 1, 1]),
            fg: wood_fg,
        });
    },
};

;// CONCATENATED MODULE: ./build/package/problems/index.js























/**
 * Every problem, in a stable order: the quadratic, the Moré–Garbow–Hillstrom problems by number,
 * then the constructed and machine-learning problems. Append new problems at the end.
 */
const PROBLEMS = Object.freeze([
    quadratic,
    rosenbrock,
    freudensteinRoth,
    powellBadlyScaled,
    brownBadlyScaled,
    beale,
    helicalValley,
    gaussian,
    powellSingular,
    wood,
    extendedRosenbrock,
    penalty1,
    penalty2,
    saddle,
    plateau,
    noisyQuadratic,
    sparseLeastSquares,
    logisticRegression,
    twoLayerNetwork,
]);
const BY_NAME = new Map(PROBLEMS.map((def) => [def.name, def]));
/** The problem called `name`; an unknown name is an error listing the known names. */
function getProblem(name) {
    const def = BY_NAME.get(name);
    if (!def) {
        throw new Error(`unknown problem ${JSON.stringify(name)}; expected one of: ${PROBLEMS.map((p) => p.name).join(", ")}`);
    }
    return def;
}
/**
 * Creates an instance of problem `name` with `params` (missing ones take their defaults; errors
 * name `problem "<name>"` as the place), bound to the run context `ctx`.
 */
function createProblem(name, params, ctx) {
    const def = getProblem(name);
    return def.create(resolveProblemParams(def, params, `problem "${name}"`), ctx);
}


/***/ }),

/***/ 8550:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   A: () => (/* binding */ RunBatch)
/* harmony export */ });
/* harmony import */ var _problems_index_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(5006);
/* harmony import */ var _adapters_session_js__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(3065);
/* harmony import */ var _execute_js__WEBPACK_IMPORTED_MODULE_2__ = __nccwpck_require__(5585);
/* harmony import */ var _resolve_js__WEBPACK_IMPORTED_MODULE_3__ = __nccwpck_require__(5966);
/* harmony import */ var _scenarios_js__WEBPACK_IMPORTED_MODULE_4__ = __nccwpck_require__(8857);





class RunBatch {
    suite;
    optimizers = new Map();
    problems = new Map();
    sessions = new Map();
    scratch;
    starts = [];
    total;
    constructor(suite) {
        this.suite = suite;
        let n = 0;
        for (const c of suite.cases) {
            this.starts.push(n);
            n += c.seeds;
        }
        this.total = n;
    }
    /** Number of runs in the suite. */
    get size() {
        return this.total;
    }
    /** (case index, seed index) of an item. */
    locate(item) {
        let lo = 0;
        let hi = this.starts.length - 1;
        while (lo < hi) {
            const mid = (lo + hi + 1) >> 1;
            if (this.starts[mid] <= item)
                lo = mid;
            else
                hi = mid - 1;
        }
        return [lo, item - this.starts[lo]];
    }
    async runItems(items) {
        const out = new Array(items.length);
        const byAdapter = new Map();
        const local = [];
        items.forEach((item, j) => {
            const adapter = this.processAdapterOf(this.suite.cases[this.locate(item)[0]].use);
            if (adapter === null)
                local.push(j);
            else {
                let positions = byAdapter.get(adapter);
                if (positions === undefined)
                    byAdapter.set(adapter, (positions = []));
                positions.push(j);
            }
        });
        await Promise.all([...byAdapter].map(async ([adapter, positions]) => {
            const metrics = await this.runProcessItems(adapter, positions.map((j) => items[j]));
            positions.forEach((j, i) => (out[j] = metrics[i]));
        }));
        for (const j of local)
            out[j] = await this.runLocalItem(items[j]);
        return out;
    }
    async runItem(item) {
        return (await this.runItems([item]))[0];
    }
    /** Ends the optimizer processes this batch started. */
    async close() {
        const sessions = [...this.sessions.values()];
        this.sessions.clear();
        await Promise.all(sessions.map((s) => s.close()));
    }
    async runLocalItem(item) {
        const [ci, si] = this.locate(item);
        const spec = this.suite.cases[ci];
        let loaded = this.optimizers.get(spec.use);
        if (loaded === undefined) {
            loaded = (0,_resolve_js__WEBPACK_IMPORTED_MODULE_3__/* .loadOptimizer */ .uk)(spec.use, `case ${spec.id}`, this.suite.adapters);
            this.optimizers.set(spec.use, loaded);
        }
        const { factory, untrusted } = await loaded;
        const def = this.problem(spec.problem);
        const run = spec.scenario?.resume || spec.scenario?.lrChange ? _scenarios_js__WEBPACK_IMPORTED_MODULE_4__/* .executeScenarioRun */ .rC : _execute_js__WEBPACK_IMPORTED_MODULE_2__/* .executeRun */ .l;
        const { metrics, scratch } = run(spec, si, this.suite.seed, factory, def, {
            verifyIterate: untrusted,
            scratch: this.scratch,
        });
        this.scratch = scratch;
        return metrics;
    }
    /** The process adapter serving `use` ("NAME:optimizer" with NAME declared), or null. */
    processAdapterOf(use) {
        const i = use.indexOf(":");
        const name = i < 0 ? "" : use.slice(0, i);
        return this.suite.adapters?.processes[name] !== undefined ? name : null;
    }
    problem(name) {
        let def = this.problems.get(name);
        if (def === undefined) {
            def = (0,_problems_index_js__WEBPACK_IMPORTED_MODULE_0__/* .getProblem */ .Ai)(name);
            this.problems.set(name, def);
        }
        return def;
    }
    /** Runs items of one process adapter together; resume scenarios add an uninterrupted twin per run. */
    async runProcessItems(adapter, items) {
        let session = this.sessions.get(adapter);
        if (session === undefined) {
            session = new _adapters_session_js__WEBPACK_IMPORTED_MODULE_1__/* .ProcessSession */ .M(this.suite.adapters.processes[adapter]);
            this.sessions.set(adapter, session);
        }
        const requests = [];
        const plan = [];
        for (const item of items) {
            const [ci, si] = this.locate(item);
            const spec = this.suite.cases[ci];
            const base = {
                spec,
                seedIndex: si,
                suiteSeed: this.suite.seed,
                definition: this.problem(spec.problem),
                optimizer: spec.use.slice(adapter.length + 1),
            };
            const sc = spec.scenario;
            if (sc?.resume) {
                const plain = new _scenarios_js__WEBPACK_IMPORTED_MODULE_4__/* .TrajectoryHashes */ .k$(spec.budget.steps);
                const resumed = new _scenarios_js__WEBPACK_IMPORTED_MODULE_4__/* .TrajectoryHashes */ .k$(spec.budget.steps);
                requests.push({ ...base, control: { afterStep: plain.record } });
                const control = {
                    pauseAt: sc.resume.at,
                    action: { kind: "restart" },
                    afterStep: resumed.record,
                };
                plan.push({ at: requests.length, twin: { plain, resumed } });
                requests.push({ ...base, control });
            }
            else {
                const control = sc?.lrChange
                    ? { pauseAt: sc.lrChange.at, action: { kind: "lr", lr: sc.lrChange.lr } }
                    : undefined;
                plan.push({ at: requests.length });
                requests.push(control ? { ...base, control } : base);
            }
        }
        const metrics = await session.run(requests);
        return plan.map(({ at, twin }) => {
            const m = metrics[at];
            return twin ? { ...m, resume: (0,_scenarios_js__WEBPACK_IMPORTED_MODULE_4__/* .resumeVerdict */ .HC)(twin.plain, twin.resumed, m) } : m;
        });
    }
}


/***/ }),

/***/ 5585:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   l: () => (/* binding */ executeRun)
/* harmony export */ });
/* harmony import */ var _core_rng_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(2906);
/* harmony import */ var _recorder_js__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(8022);


/** Counts evaluations and catches the value at the iterate, once per step. */
class HarnessOracle {
    problem;
    iterate;
    before;
    evaluations = 0;
    captured = false;
    capturedValue = NaN;
    constructor(problem, iterate, before) {
        this.problem = problem;
        this.iterate = iterate;
        this.before = before;
    }
    evaluate(x, grad) {
        const n = this.iterate.length;
        if (x.length !== n || grad.length !== n)
            throw lengthError(n, x, grad);
        this.evaluations++;
        const f = this.problem.evaluate(x, grad);
        if (x === this.iterate && !this.captured) {
            this.captured = true;
            this.capturedValue = this.before === null || sameValues(x, this.before) ? f : NaN;
        }
        return f;
    }
}
function lengthError(n, x, grad) {
    return new RangeError(`evaluate: point and gradient must have length ${n}, got ${x.length} and ${grad.length}`);
}
function sameValues(a, b) {
    for (let i = 0; i < a.length; i++)
        if (a[i] !== b[i] && !(Number.isNaN(a[i]) && Number.isNaN(b[i])))
            return false;
    return true;
}
/** Runs one case with one seed and returns its metrics. Never throws for optimizer faults. */
function executeRun(spec, seedIndex, suiteSeed, factory, definition, options = {}) {
    const runSeed = (0,_core_rng_js__WEBPACK_IMPORTED_MODULE_0__/* .deriveRunSeed */ .EK)(suiteSeed, spec.problemKey, seedIndex);
    const seedHex = (0,_core_rng_js__WEBPACK_IMPORTED_MODULE_0__/* .seedToHex */ .K$)(runSeed);
    const problem = definition.create(spec.params, { noise: (0,_core_rng_js__WEBPACK_IMPORTED_MODULE_0__/* .runStream */ .G5)(runSeed, _core_rng_js__WEBPACK_IMPORTED_MODULE_0__/* .STREAM */ .dY.noise) });
    const dim = problem.dim;
    const x = new Float64Array(dim);
    problem.start(x, (0,_core_rng_js__WEBPACK_IMPORTED_MODULE_0__/* .runStream */ .G5)(runSeed, _core_rng_js__WEBPACK_IMPORTED_MODULE_0__/* .STREAM */ .dY.start));
    const recorder = new _recorder_js__WEBPACK_IMPORTED_MODULE_1__/* .RunRecorder */ .K(spec, problem.fStar, options.scratch);
    const done = (stop, evaluations, error) => ({
        metrics: recorder.finish({ seed: seedIndex, runSeed: seedHex, stop, evaluations, error }),
        scratch: recorder.scratch,
    });
    const first = recorder.begin(problem.objective(x));
    if (first !== null)
        return done(first, 0);
    let optimizer;
    try {
        optimizer = factory.create(spec.hyper, dim);
    }
    catch (err) {
        return done("error", 0, `creating the optimizer failed: ${message(err)}`);
    }
    const verify = options.verifyIterate === true;
    const before = verify ? new Float64Array(dim) : null;
    const oracle = new HarnessOracle(problem, x, before);
    const now = options.now ?? (() => performance.now());
    const started = now();
    const { steps: maxSteps, evaluations: maxEvals, seconds } = spec.budget;
    const stochastic = problem.stochastic;
    const every = stochastic ? Math.max(1, spec.measureEvery) : 1;
    // Decided after step 1: does the optimizer evaluate at the iterate first thing in a step?
    let reuse = false;
    let evalsBefore = 0;
    let stop = "steps";
    const keep = spec.fingerprintSteps;
    const { beforeStep, afterStep } = options;
    for (let k = 1; k <= maxSteps; k++) {
        if (beforeStep !== undefined) {
            try {
                optimizer = beforeStep(k, optimizer) ?? optimizer;
            }
            catch (err) {
                return done("error", oracle.evaluations, message(err));
            }
        }
        if (before !== null)
            before.set(x);
        oracle.captured = false;
        try {
            optimizer.step(x, oracle);
        }
        catch (err) {
            return done("error", oracle.evaluations, `step ${k} threw: ${message(err)}`);
        }
        if (k <= keep)
            recorder.keepIterate(k, x);
        afterStep?.(k, x);
        let verdict = null;
        if (stochastic) {
            if (k % every === 0 || k === maxSteps)
                verdict = recorder.record(k, problem.objective(x), oracle.evaluations);
        }
        else {
            if (k === 1)
                reuse = oracle.captured && !Number.isNaN(oracle.capturedValue);
            if (reuse) {
                if (k > 1) {
                    let value = oracle.capturedValue;
                    if (!oracle.captured) {
                        return done("error", evalsBefore, `step ${k} did not evaluate at the iterate although step 1 did; pass a separate buffer when evaluating elsewhere`);
                    }
                    if (Number.isNaN(value) && before !== null)
                        value = problem.objective(before);
                    verdict = recorder.record(k - 1, value, evalsBefore);
                    if (verdict !== null)
                        return done(verdict, evalsBefore);
                }
            }
            else {
                verdict = recorder.record(k, problem.objective(x), oracle.evaluations);
            }
        }
        evalsBefore = oracle.evaluations;
        if (verdict !== null)
            return done(verdict, oracle.evaluations);
        if (maxEvals > 0 && oracle.evaluations >= maxEvals) {
            stop = "evaluations";
            if (reuse)
                verdict = recorder.record(k, problem.objective(x), oracle.evaluations);
            else if (stochastic && k % every !== 0)
                verdict = recorder.record(k, problem.objective(x), oracle.evaluations);
            return done(verdict ?? stop, oracle.evaluations);
        }
        if ((k & 63) === 0 && now() - started > seconds * 1000) {
            stop = "time";
            if (reuse || (stochastic && k % every !== 0))
                verdict = recorder.record(k, problem.objective(x), oracle.evaluations);
            return done(verdict ?? stop, oracle.evaluations);
        }
    }
    // The last iterate of a run that reused values is still unmeasured.
    if (reuse && maxSteps > 0) {
        const verdict = recorder.record(maxSteps, problem.objective(x), oracle.evaluations);
        if (verdict !== null)
            return done(verdict, oracle.evaluations);
    }
    return done(stop, oracle.evaluations);
}
function message(err) {
    return err instanceof Error ? err.message : String(err);
}


/***/ }),

/***/ 9442:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   HU: () => (/* binding */ setWorkerEntry),
/* harmony export */   og: () => (/* binding */ runSuite)
/* harmony export */ });
/* unused harmony export SuitePool */
/* harmony import */ var node_module__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(8995);
/* harmony import */ var node_url__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(3136);
/* harmony import */ var node_worker_threads__WEBPACK_IMPORTED_MODULE_2__ = __nccwpck_require__(5919);
/* harmony import */ var _batch_js__WEBPACK_IMPORTED_MODULE_3__ = __nccwpck_require__(8550);
/**
 * Runs a whole suite, in this thread or on worker threads. Items are handed out in chunks from one
 * queue (so a slow case does not hold up a worker's share) and put back in item order, so the results
 * are identical whatever the number of workers.
 */




/** Where the worker script lives; a bundle may point this at itself (see setWorkerEntry). */
let workerEntry = null;
/** Lets a bundled entry point run workers from its own file, marking them with `data`. */
function setWorkerEntry(url, data = {}) {
    workerEntry = { script: url, eval: false, data };
}
function defaultWorkerEntry() {
    const here = new URL(import.meta.url);
    if (!here.pathname.endsWith(".ts"))
        return { script: new URL("./worker.js", here), eval: false, data: {} };
    // Sources (development, tests) run through tsx: register its loader in the worker, then load worker.ts.
    const target = JSON.stringify(new URL("./worker.ts", here).href);
    // Resolved from this file, not from the working directory, so sources run from anywhere.
    const tsx = JSON.stringify((0,node_url__WEBPACK_IMPORTED_MODULE_1__.pathToFileURL)((0,node_module__WEBPACK_IMPORTED_MODULE_0__.createRequire)(here)
        .resolve("tsx/esm/api")
        .replace(/\.cjs$/, ".mjs")).href);
    return {
        script: `import(/* webpackIgnore: true */ ${tsx}).then((m) => { m.register(); return import(/* webpackIgnore: true */ ${target}); });`,
        eval: true,
        data: {},
    };
}
async function runSuite(suite, options = {}) {
    const batch = new _batch_js__WEBPACK_IMPORTED_MODULE_3__/* .RunBatch */ .A(suite);
    const items = options.items ?? Array.from({ length: batch.size }, (_, i) => i);
    const metrics = new Map();
    const workers = Math.max(1, Math.min(options.workers ?? 1, items.length));
    const progress = options.onProgress ?? (() => { });
    if (workers === 1) {
        // In chunks, so runs of a process adapter travel batched as they do on worker threads.
        const size = 64;
        try {
            for (let i = 0; i < items.length; i += size) {
                const chunk = items.slice(i, i + size);
                const got = await batch.runItems(chunk);
                chunk.forEach((item, j) => metrics.set(item, got[j]));
                progress(Math.min(i + size, items.length), items.length);
            }
        }
        finally {
            await batch.close();
        }
        return assemble(suite, batch, items, metrics);
    }
    const pool = new SuitePool(suite, workers);
    try {
        return await pool.run(items, progress);
    }
    finally {
        await pool.close();
    }
}
/**
 * Worker threads bound to one suite. They stay up between runs, so a later run (extra seeds, a
 * benchmark's second pass) finds their code already compiled; `close` ends them. Items are handed out
 * in small chunks from one queue, one job at a time.
 */
class SuitePool {
    suite;
    workers = [];
    exits = [];
    job = null;
    failure = null;
    closing = false;
    constructor(suite, count) {
        this.suite = suite;
        const entry = workerEntry ?? defaultWorkerEntry();
        for (let w = 0; w < count; w++) {
            const worker = new node_worker_threads__WEBPACK_IMPORTED_MODULE_2__.Worker(entry.script, { eval: entry.eval, workerData: { ...entry.data, suite } });
            worker.on("message", (msg) => this.onMessage(worker, msg));
            worker.on("error", (err) => this.fail(err));
            this.exits.push(new Promise((resolve) => worker.on("exit", () => {
                if (!this.closing)
                    this.fail(new Error("a worker thread exited while runs were unfinished"));
                resolve();
            })));
            this.workers.push(worker);
        }
    }
    /** Runs `items` (indices into the flat run list) and returns their results in case order. */
    run(items, onProgress = () => { }) {
        if (this.failure)
            return Promise.reject(this.failure);
        if (this.job !== null)
            return Promise.reject(new Error("SuitePool runs one job at a time"));
        // Small chunks: the slowest cases cannot leave one worker busy long after the others.
        const size = Math.max(1, Math.min(8, Math.ceil(items.length / (this.workers.length * 32))));
        const chunks = [];
        for (let i = 0; i < items.length; i += size)
            chunks.push(items.slice(i, i + size));
        const batch = new _batch_js__WEBPACK_IMPORTED_MODULE_3__/* .RunBatch */ .A(this.suite);
        return new Promise((resolve, reject) => {
            const job = {
                chunks,
                next: 0,
                busy: 0,
                done: 0,
                total: items.length,
                metrics: new Map(),
                progress: onProgress,
                resolve,
                reject,
            };
            this.job = job;
            if (chunks.length === 0) {
                this.job = null;
                resolve(job.metrics);
                return;
            }
            for (const w of this.workers)
                this.feed(w, job);
        }).then((metrics) => assemble(this.suite, batch, items, metrics));
    }
    /** Ends the worker threads (after their optimizer processes). */
    async close() {
        this.closing = true;
        for (const w of this.workers)
            w.postMessage({ type: "close" });
        await Promise.all(this.exits);
    }
    feed(worker, job) {
        if (job.next >= job.chunks.length)
            return;
        const id = job.next++;
        job.busy++;
        worker.postMessage({ type: "chunk", id, items: job.chunks[id] });
    }
    onMessage(worker, msg) {
        const job = this.job;
        if (job === null)
            return;
        if (msg.type === "failed")
            return this.fail(new Error(`worker failed: ${msg.error}`));
        job.busy--;
        const chunk = job.chunks[msg.id];
        chunk.forEach((item, j) => job.metrics.set(item, msg.metrics[j]));
        job.done += chunk.length;
        job.progress(job.done, job.total);
        if (job.next < job.chunks.length)
            this.feed(worker, job);
        else if (job.busy === 0) {
            this.job = null;
            job.resolve(job.metrics);
        }
    }
    fail(err) {
        if (this.failure !== null || this.closing)
            return;
        this.failure = err;
        this.closing = true;
        for (const w of this.workers)
            void w.terminate();
        const job = this.job;
        this.job = null;
        job?.reject(err);
    }
}
function assemble(suite, batch, items, metrics) {
    const byCase = new Map();
    for (const item of [...items].sort((a, b) => a - b)) {
        const [ci] = batch.locate(item);
        let runs = byCase.get(ci);
        if (runs === undefined)
            byCase.set(ci, (runs = []));
        runs.push(metrics.get(item));
    }
    return [...byCase.entries()]
        .sort(([a], [b]) => a - b)
        .map(([ci, runs]) => ({ case: suite.cases[ci], runs }));
}


/***/ }),

/***/ 8022:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   K: () => (/* binding */ RunRecorder),
/* harmony export */   M: () => (/* binding */ logCheckpoints)
/* harmony export */ });
/* harmony import */ var _core_json_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(625);

/** Smallest scale used for relative tolerances when a run starts at (or below) f*. */
const TINY_GAP = 1e-300;
class RunRecorder {
    spec;
    fStar;
    thresholds;
    stopThreshold = 0;
    blowLimit = Infinity;
    nextRung = 0;
    stepsTo;
    evaluationsTo;
    gaps;
    lastStep = 0;
    lastGap = NaN;
    best = Infinity;
    f0 = NaN;
    divergedAt = null;
    divergence = null;
    iterates = [];
    constructor(spec, fStar, scratch) {
        this.spec = spec;
        this.fStar = fStar;
        const n = spec.budget.steps + 1;
        this.gaps = scratch && scratch.length >= n ? scratch : new Float64Array(n);
        this.gaps.fill(NaN, 0, n);
        this.thresholds = new Float64Array(spec.ladder.length);
        this.stepsTo = spec.ladder.map(() => null);
        this.evaluationsTo = spec.ladder.map(() => null);
    }
    /** The scratch buffer, so the caller can hand it to the next run. */
    get scratch() {
        return this.gaps;
    }
    /** Records f(x₀). Returns the stop reason if the run must not start (non-finite f₀), else null. */
    begin(f0) {
        this.f0 = f0;
        const gap0 = f0 - this.fStar;
        const scale = gap0 > TINY_GAP ? gap0 : TINY_GAP;
        for (let i = 0; i < this.thresholds.length; i++)
            this.thresholds[i] = this.spec.ladder[i] * scale;
        this.stopThreshold = this.spec.stopAt * scale;
        this.blowLimit = this.spec.blowUp * Math.max(gap0, 1);
        return this.record(0, f0, 0);
    }
    /**
     * Records the exact objective f(x_step) after `evaluations` evaluations. Returns a stop reason
     * ("target" or "diverged") or null to go on.
     */
    record(step, f, evaluations) {
        const gap = f - this.fStar;
        this.gaps[step] = gap;
        this.lastStep = step;
        this.lastGap = gap;
        if (!Number.isFinite(f))
            return this.diverge(step, "non-finite");
        if (gap > this.blowLimit)
            return this.diverge(step, "blow-up");
        if (gap < this.best)
            this.best = gap;
        const thresholds = this.thresholds;
        while (this.nextRung < thresholds.length && gap <= thresholds[this.nextRung]) {
            this.stepsTo[this.nextRung] = step;
            this.evaluationsTo[this.nextRung] = evaluations;
            this.nextRung++;
        }
        if (this.spec.stopAt > 0 && gap <= this.stopThreshold)
            return "target";
        return null;
    }
    /** Keeps a copy of x_step for the trajectory fingerprint (first F steps only). */
    keepIterate(step, x) {
        if (step >= 1 && step <= this.spec.fingerprintSteps && this.iterates.length === step - 1) {
            // JSON has no spelling for NaN or ±Infinity: a coordinate that left the finite range is kept as null.
            const copy = Array.from(x, (v) => (Number.isFinite(v) ? v : null));
            this.iterates.push(copy);
        }
    }
    diverge(step, kind) {
        this.divergedAt = step;
        this.divergence = kind;
        return "diverged";
    }
    /** Final metrics of the run. `steps` and `evaluations` are what the run used. */
    finish(args) {
        const steps = this.lastStep;
        const diverged = this.divergence !== null;
        const metrics = {
            seed: args.seed,
            runSeed: args.runSeed,
            stop: args.stop,
            steps,
            evaluations: args.evaluations,
            f0: (0,_core_json_js__WEBPACK_IMPORTED_MODULE_0__/* .finiteOrNull */ .E)(this.f0),
            finalGap: diverged ? null : (0,_core_json_js__WEBPACK_IMPORTED_MODULE_0__/* .finiteOrNull */ .E)(this.lastGap),
            bestGap: (0,_core_json_js__WEBPACK_IMPORTED_MODULE_0__/* .finiteOrNull */ .E)(this.best),
            stepsTo: this.stepsTo.slice(),
            evaluationsTo: this.evaluationsTo.slice(),
            divergedAt: this.divergedAt,
            divergence: this.divergence,
            rate: diverged ? null : this.fitRate(),
            trace: this.trace(),
            ...(this.spec.fingerprintSteps > 0 ? { iterates: this.iterates.slice(0, steps) } : {}),
            ...(args.error !== undefined ? { error: args.error } : {}),
        };
        return metrics;
    }
    /**
     * Least-squares slope of ln(gap) against the step over the late window [K/2, K], K being the last
     * measured step whose gap is above the rounding floor; rate = e^slope. A floor of 64 ulp of |f*|
     * keeps float noise near the optimum out of the fit. Null when fewer than 5 points qualify.
     */
    fitRate() {
        const floor = Math.max(64 * Number.EPSILON * Math.abs(this.fStar), TINY_GAP);
        let k = this.lastStep;
        const gaps = this.gaps;
        while (k > 0 && !(gaps[k] > floor))
            k--;
        if (k < 8)
            return null;
        const from = Math.ceil(k / 2);
        let n = 0;
        let sx = 0;
        let sy = 0;
        let sxx = 0;
        let sxy = 0;
        for (let i = from; i <= k; i++) {
            const g = gaps[i];
            if (!(g > floor))
                continue;
            const y = Math.log(g);
            n++;
            sx += i;
            sy += y;
            sxx += i * i;
            sxy += i * y;
        }
        if (n < 5)
            return null;
        const den = n * sxx - sx * sx;
        if (den <= 0)
            return null;
        const slope = (n * sxy - sx * sy) / den;
        return (0,_core_json_js__WEBPACK_IMPORTED_MODULE_0__/* .finiteOrNull */ .E)(Math.exp(slope));
    }
    /** Gap at each checkpoint: the last measurement at or before it; null past the run's end. */
    trace() {
        const out = [];
        const gaps = this.gaps;
        for (const c of this.spec.checkpoints) {
            if (c > this.lastStep) {
                out.push(null);
                continue;
            }
            let i = c;
            while (i > 0 && Number.isNaN(gaps[i]))
                i--;
            out.push((0,_core_json_js__WEBPACK_IMPORTED_MODULE_0__/* .finiteOrNull */ .E)(gaps[i]));
        }
        return out;
    }
}
/** Log-spaced checkpoint steps 0, 1, 2, … , steps (about `count` of them, no duplicates). */
function logCheckpoints(steps, count = 32) {
    const out = [0];
    if (steps <= 0)
        return out;
    const top = Math.log10(steps);
    for (let i = 0; i <= count; i++) {
        const s = Math.round(10 ** ((i * top) / count));
        if (s > out[out.length - 1] && s <= steps)
            out.push(s);
    }
    if (out[out.length - 1] !== steps)
        out.push(steps);
    return out;
}


/***/ }),

/***/ 5966:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   eW: () => (/* binding */ referenceFactory),
/* harmony export */   sx: () => (/* binding */ canonicalUse),
/* harmony export */   uk: () => (/* binding */ loadOptimizer)
/* harmony export */ });
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_3__ = __nccwpck_require__(4552);
/* harmony import */ var _optimizers_index_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(6372);
/* harmony import */ var _adapters_module_js__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(6902);
/* harmony import */ var _adapters_use_js__WEBPACK_IMPORTED_MODULE_2__ = __nccwpck_require__(2683);
/**
 * From a config's `use` string to something that can run in-process: a reference optimizer or a module
 * optimizer (src/adapters/module.ts). Process optimizers run through their adapter (src/runner/batch.ts).
 */




/** Canonical form of a `use` string: "reference:adam" for "adam". */
function canonicalUse(use) {
    return use.includes(":") ? use : `reference:${use}`;
}
/** Synchronous lookup for reference optimizers (also used while resolving a suite). */
function referenceFactory(use, where) {
    const canonical = canonicalUse(use);
    const [kind, name] = splitUse(canonical);
    if (kind !== "reference") {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d(`${where}.use ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .quote */ .h)(use)}: "${kind}:" is not a reference optimizer (see src/adapters/use.ts)`);
    }
    try {
        return (0,_optimizers_index_js__WEBPACK_IMPORTED_MODULE_0__/* .getOptimizer */ .KH)(name);
    }
    catch {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d(`${where}.use ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .quote */ .h)(use)} is not a reference optimizer (known: ${_optimizers_index_js__WEBPACK_IMPORTED_MODULE_0__/* .OPTIMIZERS */ .r9.map((o) => o.name).join(", ")})`);
    }
}
/**
 * A factory for an in-process optimizer: a reference optimizer, or a module optimizer (`module:PATH#EXPORT`,
 * loaded relative to `context.baseDir`, untrusted). Process optimizers do not run in-process: RunBatch
 * hands them to their adapter's session.
 */
async function loadOptimizer(use, where, context) {
    const spec = (0,_adapters_use_js__WEBPACK_IMPORTED_MODULE_2__/* .parseUse */ .f)(canonicalUse(use), Object.keys(context?.processes ?? {}), `${where}.use`);
    if (spec.kind === "module") {
        if (context === undefined) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d(`${where}.use ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .quote */ .h)(use)}: module paths are relative to the config file's directory, which this ` +
                `suite does not carry; prepare it with prepareSuite (src/adapters/prepare.ts)`);
        }
        const { factory } = await (0,_adapters_module_js__WEBPACK_IMPORTED_MODULE_1__/* .loadModuleOptimizer */ .kD)(spec.path, spec.exportName, context.baseDir, where);
        return { factory, untrusted: true };
    }
    if (spec.kind === "process") {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d(`${where}.use ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .quote */ .h)(use)} is served by process adapter "${spec.adapter}", not in-process`);
    }
    return { factory: referenceFactory(use, where), untrusted: false };
}
function splitUse(use) {
    const i = use.indexOf(":");
    return [use.slice(0, i), use.slice(i + 1)];
}


/***/ }),

/***/ 8857:
/***/ ((__unused_webpack___webpack_module__, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   Ed: () => (/* binding */ expandScenarios),
/* harmony export */   HC: () => (/* binding */ resumeVerdict),
/* harmony export */   k$: () => (/* binding */ TrajectoryHashes),
/* harmony export */   rC: () => (/* binding */ executeScenarioRun)
/* harmony export */ });
/* unused harmony export copyState */
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_3__ = __nccwpck_require__(4552);
/* harmony import */ var _core_rng_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(2906);
/* harmony import */ var _problems_index_js__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(5006);
/* harmony import */ var _execute_js__WEBPACK_IMPORTED_MODULE_2__ = __nccwpck_require__(5585);
/* harmony import */ var _recorder_js__WEBPACK_IMPORTED_MODULE_4__ = __nccwpck_require__(8022);
/**
 * Scenarios: extra cases that run optimizers under the conditions real regressions hid behind — a
 * resume from exported state, a learning-rate change mid-run, hyperparameters such as a large ε, a
 * problem with sparse gradients or a zero loss gradient under weight decay (config `scenarios:`,
 * docs/adapters.md). A scenario runs for every optimizer that declares what it needs: the capability
 * (`exportState`/`importState` for a resume, `setLearningRate` for a learning-rate change) and every
 * hyperparameter it sets. Each scenario case is a normal case with its own metrics, named
 * `optimizer/default@scenario/problemKey`.
 *
 * A resume case runs each seed twice: uninterrupted, and interrupted after step `at` (state exported
 * through JSON, imported into a fresh instance, run continued on the same problem instance). Its metrics
 * are those of the interrupted run, plus `resume`: equal when every iterate matched the uninterrupted
 * run's bit for bit, else the first step that differed.
 *
 * Cost: a resume case costs two runs per seed, plus one 64-bit hash of the iterate per step per run.
 */





/** The cases the config's scenarios add to `cases` (the suite's ordinary cases), in a stable order. */
function expandScenarios(config, cases, file, options) {
    const out = [];
    (config.scenarios ?? []).forEach((sc, si) => {
        const where = `config ${file}: scenarios[${si}]`;
        for (const o of config.optimizers) {
            if (sc.optimizers && !sc.optimizers.includes(o.name))
                continue;
            const explicit = sc.optimizers?.includes(o.name) === true;
            const bases = sc.problem
                ? [scenarioProblemCase(config, sc, cases, o.name, `${where}.problem`)].filter((c) => c !== null)
                : cases.filter((c) => c.optimizer === o.name &&
                    c.set === "default" &&
                    (!sc.problems || sc.problems.includes(c.problem)));
            for (const base of bases) {
                const missing = missingNeeds(sc, options.declare(o.name, base), base);
                if (missing !== null) {
                    if (explicit)
                        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d(`${where} (${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .quote */ .h)(sc.name)}) lists optimizer ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .quote */ .h)(o.name)}, which ${missing}`);
                    continue;
                }
                for (const [key, step] of [
                    ["resume", sc.resume?.at],
                    ["lrChange", sc.lrChange?.at],
                ]) {
                    if (step !== undefined && step >= base.budget.steps) {
                        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d(`${where}.${key}.at must be below the step budget (${base.budget.steps}) of case ${base.id}, got ${step}`);
                    }
                }
                const given = { ...base.hyper, ...(sc.hyper ?? {}) };
                const hyper = sortObject(options.resolveHyper(base.use, given, `${where}.hyper`));
                const scenario = {
                    name: sc.name,
                    ...(sc.resume ? { resume: { at: sc.resume.at } } : {}),
                    ...(sc.lrChange
                        ? {
                            lrChange: {
                                at: sc.lrChange.at,
                                lr: sc.lrChange.lr ?? sc.lrChange.factor * hyper.lr,
                            },
                        }
                        : {}),
                };
                const set = `${base.set}@${sc.name}`;
                out.push({ ...base, id: `${o.name}/${set}/${base.problemKey}`, set, hyper, scenario });
            }
        }
    });
    return out;
}
/** Why an optimizer cannot run a scenario (completes "which ..."), or null if it can. */
function missingNeeds(sc, decl, base) {
    if (sc.resume && !decl.state)
        return "has no exportState/importState (needed by resume)";
    if (sc.lrChange && !decl.lr)
        return "has no setLearningRate (needed by lrChange)";
    if (sc.lrChange?.factor !== undefined && typeof base.hyper.lr !== "number") {
        return "has no numeric lr hyperparameter (needed by lrChange.factor)";
    }
    const absent = Object.keys(sc.hyper ?? {}).filter((name) => !decl.hyperNames.includes(name));
    if (absent.length > 0)
        return `does not declare the hyperparameter${absent.length > 1 ? "s" : ""} ${absent.join(", ")}`;
    return null;
}
/** A default-set case of `optimizer` on the scenario's own problem, built as the suite builds cases. */
function scenarioProblemCase(config, sc, cases, optimizer, where) {
    const template = cases.find((c) => c.optimizer === optimizer && c.set === "default");
    if (template === undefined)
        return null;
    const p = sc.problem;
    let def;
    try {
        def = (0,_problems_index_js__WEBPACK_IMPORTED_MODULE_1__/* .getProblem */ .Ai)(p.use);
    }
    catch {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .d(`${where}.use ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .quote */ .h)(p.use)} is not a known problem (see gradgate problems)`);
    }
    const params = (0,_problems_index_js__WEBPACK_IMPORTED_MODULE_1__/* .resolveProblemParams */ .wN)(def, p.params ?? {}, where);
    const probe = (0,_problems_index_js__WEBPACK_IMPORTED_MODULE_1__/* .createProblem */ .Yx)(def.name, params, { noise: new _core_rng_js__WEBPACK_IMPORTED_MODULE_0__/* .Pcg32 */ ._8(0n, 0n) });
    const budget = { ...config.budget, ...(p.budget ?? {}) };
    const optimizerConfig = config.optimizers.find((o) => o.name === optimizer);
    return {
        ...template,
        // Completed with the optimizer's defaults by ExpandOptions.resolveHyper.
        hyper: { ...(optimizerConfig.hyper ?? {}) },
        problem: def.name,
        problemKey: (0,_problems_index_js__WEBPACK_IMPORTED_MODULE_1__/* .problemKey */ .ZL)(def, params),
        params: sortObject(params),
        dim: probe.dim,
        fStar: probe.fStar,
        fStarKind: probe.fStarKind,
        budget,
        checkpoints: (0,_recorder_js__WEBPACK_IMPORTED_MODULE_4__/* .logCheckpoints */ .M)(budget.steps),
        fingerprintSteps: probe.dim <= config.fingerprint.maxDim ? Math.min(config.fingerprint.steps, budget.steps) : 0,
        measureEvery: def.measureEvery ?? 1,
    };
}
// ------------------------------------------------------------------ running
/**
 * Per-step 64-bit hashes of the iterates of one run (two 32-bit FNV-1a lanes over the bytes), enough to
 * find the first step where two trajectories differ without keeping them.
 */
class TrajectoryHashes {
    hashes;
    /** Steps recorded (1 … count). */
    count = 0;
    constructor(steps) {
        this.hashes = new Uint32Array(2 * Math.min(Math.max(steps, 1), 1 << 24));
    }
    /** Records x_step (steps arrive in order from 1). */
    record = (step, x) => {
        if (2 * step > this.hashes.length) {
            const grown = new Uint32Array(this.hashes.length * 2);
            grown.set(this.hashes);
            this.hashes = grown;
        }
        const words = new Uint32Array(x.buffer, x.byteOffset, x.length * 2);
        let a = 0x811c9dc5;
        let b = 0x01000193 ^ 0x9e3779b9;
        for (let i = 0; i < words.length; i++) {
            const w = words[i];
            a = Math.imul(a ^ (w & 0xffff), 0x01000193);
            a = Math.imul(a ^ (w >>> 16), 0x01000193);
            b = Math.imul(b ^ w, 0x5bd1e995);
            b ^= b >>> 15;
        }
        this.hashes[2 * (step - 1)] = a >>> 0;
        this.hashes[2 * (step - 1) + 1] = b >>> 0;
        this.count = step;
    };
    /** First step (from 1) where the trajectories differ, or null when they are equal step for step. */
    firstDifference(other) {
        const n = Math.min(this.count, other.count);
        for (let i = 0; i < 2 * n; i++)
            if (this.hashes[i] !== other.hashes[i])
                return (i >> 1) + 1;
        return this.count === other.count ? null : n + 1;
    }
}
/** The `resume` field of a resume scenario's metrics. */
function resumeVerdict(plain, resumed, resumedMetrics) {
    if (resumedMetrics.stop === "error")
        return { equal: false, firstDifference: null };
    const first = plain.firstDifference(resumed);
    return { equal: first === null, firstDifference: first };
}
/** A deep copy of a state through JSON, as a checkpoint file (or the protocol) would carry it. */
function copyState(state) {
    return JSON.parse(JSON.stringify(state));
}
/**
 * Runs one seed of a scenario case in-process (cases with `scenario.resume` or `scenario.lrChange`;
 * other scenario cases are ordinary runs). Never throws for optimizer faults.
 */
function executeScenarioRun(spec, seedIndex, suiteSeed, factory, definition, options = {}) {
    const sc = spec.scenario;
    if (sc?.lrChange) {
        const { at, lr } = sc.lrChange;
        return (0,_execute_js__WEBPACK_IMPORTED_MODULE_2__/* .executeRun */ .l)(spec, seedIndex, suiteSeed, factory, definition, {
            ...options,
            beforeStep: (k, optimizer) => {
                if (k !== at + 1)
                    return;
                if (typeof optimizer.setLearningRate !== "function") {
                    throw new Error(`setLearningRate before step ${k} failed: the optimizer has no setLearningRate`);
                }
                try {
                    optimizer.setLearningRate(lr);
                }
                catch (err) {
                    throw new Error(`setLearningRate before step ${k} failed: ${text(err)}`);
                }
            },
        });
    }
    if (sc?.resume) {
        const { at } = sc.resume;
        const plain = new TrajectoryHashes(spec.budget.steps);
        const first = (0,_execute_js__WEBPACK_IMPORTED_MODULE_2__/* .executeRun */ .l)(spec, seedIndex, suiteSeed, factory, definition, {
            ...options,
            afterStep: plain.record,
        });
        const resumed = new TrajectoryHashes(spec.budget.steps);
        const second = (0,_execute_js__WEBPACK_IMPORTED_MODULE_2__/* .executeRun */ .l)(spec, seedIndex, suiteSeed, factory, definition, {
            ...options,
            scratch: first.scratch,
            afterStep: resumed.record,
            beforeStep: (k, optimizer) => (k === at + 1 ? restart(optimizer, factory, spec, at) : undefined),
        });
        return {
            metrics: { ...second.metrics, resume: resumeVerdict(plain, resumed, second.metrics) },
            scratch: second.scratch,
        };
    }
    return (0,_execute_js__WEBPACK_IMPORTED_MODULE_2__/* .executeRun */ .l)(spec, seedIndex, suiteSeed, factory, definition, options);
}
/** Exports the state after step `at` and imports a JSON copy into a fresh instance. */
function restart(optimizer, factory, spec, at) {
    if (typeof optimizer.exportState !== "function") {
        throw new Error(`exportState after step ${at} failed: the optimizer has no exportState`);
    }
    let state;
    try {
        state = copyState(optimizer.exportState());
    }
    catch (err) {
        throw new Error(`exportState after step ${at} failed: ${text(err)}`);
    }
    let fresh;
    try {
        fresh = factory.create(spec.hyper, spec.dim);
    }
    catch (err) {
        throw new Error(`creating the optimizer failed: ${text(err)}`);
    }
    if (typeof fresh.importState !== "function") {
        throw new Error(`importState before step ${at + 1} failed: the optimizer has no importState`);
    }
    try {
        fresh.importState(state);
    }
    catch (err) {
        throw new Error(`importState before step ${at + 1} failed: ${text(err)}`);
    }
    return fresh;
}
function text(err) {
    return err instanceof Error ? err.message : String(err);
}
function sortObject(o) {
    return Object.fromEntries(Object.entries(o).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
}


/***/ }),

/***/ 3837:
/***/ ((module) => {

module.exports = /*#__PURE__*/JSON.parse('{"$id":"https://raw.githubusercontent.com/ajv-validator/ajv/master/lib/refs/data.json#","description":"Meta-schema for $data reference (JSON AnySchema extension proposal)","type":"object","required":["$data"],"properties":{"$data":{"type":"string","anyOf":[{"format":"relative-json-pointer"},{"format":"json-pointer"}]}},"additionalProperties":false}');

/***/ }),

/***/ 7216:
/***/ ((module) => {

module.exports = /*#__PURE__*/JSON.parse('{"$schema":"https://json-schema.org/draft/2020-12/schema","$id":"https://json-schema.org/draft/2020-12/meta/applicator","$vocabulary":{"https://json-schema.org/draft/2020-12/vocab/applicator":true},"$dynamicAnchor":"meta","title":"Applicator vocabulary meta-schema","type":["object","boolean"],"properties":{"prefixItems":{"$ref":"#/$defs/schemaArray"},"items":{"$dynamicRef":"#meta"},"contains":{"$dynamicRef":"#meta"},"additionalProperties":{"$dynamicRef":"#meta"},"properties":{"type":"object","additionalProperties":{"$dynamicRef":"#meta"},"default":{}},"patternProperties":{"type":"object","additionalProperties":{"$dynamicRef":"#meta"},"propertyNames":{"format":"regex"},"default":{}},"dependentSchemas":{"type":"object","additionalProperties":{"$dynamicRef":"#meta"},"default":{}},"propertyNames":{"$dynamicRef":"#meta"},"if":{"$dynamicRef":"#meta"},"then":{"$dynamicRef":"#meta"},"else":{"$dynamicRef":"#meta"},"allOf":{"$ref":"#/$defs/schemaArray"},"anyOf":{"$ref":"#/$defs/schemaArray"},"oneOf":{"$ref":"#/$defs/schemaArray"},"not":{"$dynamicRef":"#meta"}},"$defs":{"schemaArray":{"type":"array","minItems":1,"items":{"$dynamicRef":"#meta"}}}}');

/***/ }),

/***/ 8226:
/***/ ((module) => {

module.exports = /*#__PURE__*/JSON.parse('{"$schema":"https://json-schema.org/draft/2020-12/schema","$id":"https://json-schema.org/draft/2020-12/meta/content","$vocabulary":{"https://json-schema.org/draft/2020-12/vocab/content":true},"$dynamicAnchor":"meta","title":"Content vocabulary meta-schema","type":["object","boolean"],"properties":{"contentEncoding":{"type":"string"},"contentMediaType":{"type":"string"},"contentSchema":{"$dynamicRef":"#meta"}}}');

/***/ }),

/***/ 518:
/***/ ((module) => {

module.exports = /*#__PURE__*/JSON.parse('{"$schema":"https://json-schema.org/draft/2020-12/schema","$id":"https://json-schema.org/draft/2020-12/meta/core","$vocabulary":{"https://json-schema.org/draft/2020-12/vocab/core":true},"$dynamicAnchor":"meta","title":"Core vocabulary meta-schema","type":["object","boolean"],"properties":{"$id":{"$ref":"#/$defs/uriReferenceString","$comment":"Non-empty fragments not allowed.","pattern":"^[^#]*#?$"},"$schema":{"$ref":"#/$defs/uriString"},"$ref":{"$ref":"#/$defs/uriReferenceString"},"$anchor":{"$ref":"#/$defs/anchorString"},"$dynamicRef":{"$ref":"#/$defs/uriReferenceString"},"$dynamicAnchor":{"$ref":"#/$defs/anchorString"},"$vocabulary":{"type":"object","propertyNames":{"$ref":"#/$defs/uriString"},"additionalProperties":{"type":"boolean"}},"$comment":{"type":"string"},"$defs":{"type":"object","additionalProperties":{"$dynamicRef":"#meta"}}},"$defs":{"anchorString":{"type":"string","pattern":"^[A-Za-z_][-A-Za-z0-9._]*$"},"uriString":{"type":"string","format":"uri"},"uriReferenceString":{"type":"string","format":"uri-reference"}}}');

/***/ }),

/***/ 4588:
/***/ ((module) => {

module.exports = /*#__PURE__*/JSON.parse('{"$schema":"https://json-schema.org/draft/2020-12/schema","$id":"https://json-schema.org/draft/2020-12/meta/format-annotation","$vocabulary":{"https://json-schema.org/draft/2020-12/vocab/format-annotation":true},"$dynamicAnchor":"meta","title":"Format vocabulary meta-schema for annotation results","type":["object","boolean"],"properties":{"format":{"type":"string"}}}');

/***/ }),

/***/ 5707:
/***/ ((module) => {

module.exports = /*#__PURE__*/JSON.parse('{"$schema":"https://json-schema.org/draft/2020-12/schema","$id":"https://json-schema.org/draft/2020-12/meta/meta-data","$vocabulary":{"https://json-schema.org/draft/2020-12/vocab/meta-data":true},"$dynamicAnchor":"meta","title":"Meta-data vocabulary meta-schema","type":["object","boolean"],"properties":{"title":{"type":"string"},"description":{"type":"string"},"default":true,"deprecated":{"type":"boolean","default":false},"readOnly":{"type":"boolean","default":false},"writeOnly":{"type":"boolean","default":false},"examples":{"type":"array","items":true}}}');

/***/ }),

/***/ 9547:
/***/ ((module) => {

module.exports = /*#__PURE__*/JSON.parse('{"$schema":"https://json-schema.org/draft/2020-12/schema","$id":"https://json-schema.org/draft/2020-12/meta/unevaluated","$vocabulary":{"https://json-schema.org/draft/2020-12/vocab/unevaluated":true},"$dynamicAnchor":"meta","title":"Unevaluated applicator vocabulary meta-schema","type":["object","boolean"],"properties":{"unevaluatedItems":{"$dynamicRef":"#meta"},"unevaluatedProperties":{"$dynamicRef":"#meta"}}}');

/***/ }),

/***/ 7082:
/***/ ((module) => {

module.exports = /*#__PURE__*/JSON.parse('{"$schema":"https://json-schema.org/draft/2020-12/schema","$id":"https://json-schema.org/draft/2020-12/meta/validation","$vocabulary":{"https://json-schema.org/draft/2020-12/vocab/validation":true},"$dynamicAnchor":"meta","title":"Validation vocabulary meta-schema","type":["object","boolean"],"properties":{"type":{"anyOf":[{"$ref":"#/$defs/simpleTypes"},{"type":"array","items":{"$ref":"#/$defs/simpleTypes"},"minItems":1,"uniqueItems":true}]},"const":true,"enum":{"type":"array","items":true},"multipleOf":{"type":"number","exclusiveMinimum":0},"maximum":{"type":"number"},"exclusiveMaximum":{"type":"number"},"minimum":{"type":"number"},"exclusiveMinimum":{"type":"number"},"maxLength":{"$ref":"#/$defs/nonNegativeInteger"},"minLength":{"$ref":"#/$defs/nonNegativeIntegerDefault0"},"pattern":{"type":"string","format":"regex"},"maxItems":{"$ref":"#/$defs/nonNegativeInteger"},"minItems":{"$ref":"#/$defs/nonNegativeIntegerDefault0"},"uniqueItems":{"type":"boolean","default":false},"maxContains":{"$ref":"#/$defs/nonNegativeInteger"},"minContains":{"$ref":"#/$defs/nonNegativeInteger","default":1},"maxProperties":{"$ref":"#/$defs/nonNegativeInteger"},"minProperties":{"$ref":"#/$defs/nonNegativeIntegerDefault0"},"required":{"$ref":"#/$defs/stringArray"},"dependentRequired":{"type":"object","additionalProperties":{"$ref":"#/$defs/stringArray"}}},"$defs":{"nonNegativeInteger":{"type":"integer","minimum":0},"nonNegativeIntegerDefault0":{"$ref":"#/$defs/nonNegativeInteger","default":0},"simpleTypes":{"enum":["array","boolean","integer","null","number","object","string"]},"stringArray":{"type":"array","items":{"type":"string"},"uniqueItems":true,"default":[]}}}');

/***/ }),

/***/ 1678:
/***/ ((module) => {

module.exports = /*#__PURE__*/JSON.parse('{"$schema":"https://json-schema.org/draft/2020-12/schema","$id":"https://json-schema.org/draft/2020-12/schema","$vocabulary":{"https://json-schema.org/draft/2020-12/vocab/core":true,"https://json-schema.org/draft/2020-12/vocab/applicator":true,"https://json-schema.org/draft/2020-12/vocab/unevaluated":true,"https://json-schema.org/draft/2020-12/vocab/validation":true,"https://json-schema.org/draft/2020-12/vocab/meta-data":true,"https://json-schema.org/draft/2020-12/vocab/format-annotation":true,"https://json-schema.org/draft/2020-12/vocab/content":true},"$dynamicAnchor":"meta","title":"Core and Validation specifications meta-schema","allOf":[{"$ref":"meta/core"},{"$ref":"meta/applicator"},{"$ref":"meta/unevaluated"},{"$ref":"meta/validation"},{"$ref":"meta/meta-data"},{"$ref":"meta/format-annotation"},{"$ref":"meta/content"}],"type":["object","boolean"],"$comment":"This meta-schema also defines keywords that have appeared in previous drafts in order to prevent incompatible extensions as they remain in common use.","properties":{"definitions":{"$comment":"\\"definitions\\" has been replaced by \\"$defs\\".","type":"object","additionalProperties":{"$dynamicRef":"#meta"},"deprecated":true,"default":{}},"dependencies":{"$comment":"\\"dependencies\\" has been split and replaced by \\"dependentSchemas\\" and \\"dependentRequired\\" in order to serve their differing semantics.","type":"object","additionalProperties":{"anyOf":[{"$dynamicRef":"#meta"},{"$ref":"meta/validation#/$defs/stringArray"}]},"deprecated":true,"default":{}},"$recursiveAnchor":{"$comment":"\\"$recursiveAnchor\\" has been replaced by \\"$dynamicAnchor\\".","$ref":"meta/core#/$defs/anchorString","deprecated":true},"$recursiveRef":{"$comment":"\\"$recursiveRef\\" has been replaced by \\"$dynamicRef\\".","$ref":"meta/core#/$defs/uriReferenceString","deprecated":true}}}');

/***/ })

/******/ });
/************************************************************************/
/******/ // The module cache
/******/ var __webpack_module_cache__ = {};
/******/ 
/******/ // The require function
/******/ function __nccwpck_require__(moduleId) {
/******/ 	// Check if module is in cache
/******/ 	var cachedModule = __webpack_module_cache__[moduleId];
/******/ 	if (cachedModule !== undefined) {
/******/ 		return cachedModule.exports;
/******/ 	}
/******/ 	// Create a new module (and put it into the cache)
/******/ 	var module = __webpack_module_cache__[moduleId] = {
/******/ 		// no module.id needed
/******/ 		// no module.loaded needed
/******/ 		exports: {}
/******/ 	};
/******/ 
/******/ 	// Execute the module function
/******/ 	var threw = true;
/******/ 	try {
/******/ 		__webpack_modules__[moduleId](module, module.exports, __nccwpck_require__);
/******/ 		threw = false;
/******/ 	} finally {
/******/ 		if(threw) delete __webpack_module_cache__[moduleId];
/******/ 	}
/******/ 
/******/ 	// Return the exports of the module
/******/ 	return module.exports;
/******/ }
/******/ 
/******/ // expose the modules object (__webpack_modules__)
/******/ __nccwpck_require__.m = __webpack_modules__;
/******/ 
/************************************************************************/
/******/ /* webpack/runtime/asset-relocator-loader */
/******/ if (typeof __nccwpck_require__ !== 'undefined') __nccwpck_require__.ab = decodeURIComponent(new URL('.', import.meta.url).pathname).slice(import.meta.url.match(/^file:\/\/\/\w:/) ? 1 : 0, -1) + "/";
/******/ 
/******/ /* webpack/runtime/define property getters */
/******/ (() => {
/******/ 	// define getter functions for harmony exports
/******/ 	__nccwpck_require__.d = (exports, definition) => {
/******/ 		for(var key in definition) {
/******/ 			if(__nccwpck_require__.o(definition, key) && !__nccwpck_require__.o(exports, key)) {
/******/ 				Object.defineProperty(exports, key, { enumerable: true, get: definition[key] });
/******/ 			}
/******/ 		}
/******/ 	};
/******/ })();
/******/ 
/******/ /* webpack/runtime/ensure chunk */
/******/ (() => {
/******/ 	__nccwpck_require__.f = {};
/******/ 	// This file contains only the entry chunk.
/******/ 	// The chunk loading function for additional chunks
/******/ 	__nccwpck_require__.e = (chunkId) => {
/******/ 		return Promise.all(Object.keys(__nccwpck_require__.f).reduce((promises, key) => {
/******/ 			__nccwpck_require__.f[key](chunkId, promises);
/******/ 			return promises;
/******/ 		}, []));
/******/ 	};
/******/ })();
/******/ 
/******/ /* webpack/runtime/get javascript chunk filename */
/******/ (() => {
/******/ 	// This function allow to reference async chunks
/******/ 	__nccwpck_require__.u = (chunkId) => {
/******/ 		// return url for filenames based on template
/******/ 		return "" + chunkId + ".index.js";
/******/ 	};
/******/ })();
/******/ 
/******/ /* webpack/runtime/hasOwnProperty shorthand */
/******/ (() => {
/******/ 	__nccwpck_require__.o = (obj, prop) => (Object.prototype.hasOwnProperty.call(obj, prop))
/******/ })();
/******/ 
/******/ /* webpack/runtime/make namespace object */
/******/ (() => {
/******/ 	// define __esModule on exports
/******/ 	__nccwpck_require__.r = (exports) => {
/******/ 		if(typeof Symbol !== 'undefined' && Symbol.toStringTag) {
/******/ 			Object.defineProperty(exports, Symbol.toStringTag, { value: 'Module' });
/******/ 		}
/******/ 		Object.defineProperty(exports, '__esModule', { value: true });
/******/ 	};
/******/ })();
/******/ 
/******/ /* webpack/runtime/import chunk loading */
/******/ (() => {
/******/ 	// no baseURI
/******/ 	
/******/ 	// object to store loaded and loading chunks
/******/ 	// undefined = chunk not loaded, null = chunk preloaded/prefetched
/******/ 	// [resolve, Promise] = chunk loading, 0 = chunk loaded
/******/ 	var installedChunks = {
/******/ 		792: 0
/******/ 	};
/******/ 	
/******/ 	var installChunk = (data) => {
/******/ 		var {ids, modules, runtime} = data;
/******/ 		// add "modules" to the modules object,
/******/ 		// then flag all "ids" as loaded and fire callback
/******/ 		var moduleId, chunkId, i = 0;
/******/ 		for(moduleId in modules) {
/******/ 			if(__nccwpck_require__.o(modules, moduleId)) {
/******/ 				__nccwpck_require__.m[moduleId] = modules[moduleId];
/******/ 			}
/******/ 		}
/******/ 		if(runtime) runtime(__nccwpck_require__);
/******/ 		for(;i < ids.length; i++) {
/******/ 			chunkId = ids[i];
/******/ 			if(__nccwpck_require__.o(installedChunks, chunkId) && installedChunks[chunkId]) {
/******/ 				installedChunks[chunkId][0]();
/******/ 			}
/******/ 			installedChunks[ids[i]] = 0;
/******/ 		}
/******/ 	
/******/ 	}
/******/ 	
/******/ 	__nccwpck_require__.f.j = (chunkId, promises) => {
/******/ 			// import() chunk loading for javascript
/******/ 			var installedChunkData = __nccwpck_require__.o(installedChunks, chunkId) ? installedChunks[chunkId] : undefined;
/******/ 			if(installedChunkData !== 0) { // 0 means "already installed".
/******/ 	
/******/ 				// a Promise means "currently loading".
/******/ 				if(installedChunkData) {
/******/ 					promises.push(installedChunkData[1]);
/******/ 				} else {
/******/ 					if(true) { // all chunks have JS
/******/ 						// setup Promise in chunk cache
/******/ 						var promise = import("./" + __nccwpck_require__.u(chunkId)).then(installChunk, (e) => {
/******/ 							if(installedChunks[chunkId] !== 0) installedChunks[chunkId] = undefined;
/******/ 							throw e;
/******/ 						});
/******/ 						var promise = Promise.race([promise, new Promise((resolve) => (installedChunkData = installedChunks[chunkId] = [resolve]))])
/******/ 						promises.push(installedChunkData[1] = promise);
/******/ 					}
/******/ 				}
/******/ 			}
/******/ 	};
/******/ 	
/******/ 	// no prefetching
/******/ 	
/******/ 	// no preloaded
/******/ 	
/******/ 	// no external install chunk
/******/ 	
/******/ 	// no on chunks loaded
/******/ })();
/******/ 
/************************************************************************/
var __webpack_exports__ = {};

// EXTERNAL MODULE: external "node:worker_threads"
var external_node_worker_threads_ = __nccwpck_require__(5919);
// EXTERNAL MODULE: ./build/package/runner/pool.js
var pool = __nccwpck_require__(9442);
// EXTERNAL MODULE: ./build/package/action/engine-marker.js
var engine_marker = __nccwpck_require__(6645);
// EXTERNAL MODULE: ./build/package/action/engine-process.js
var engine_process = __nccwpck_require__(6142);
;// CONCATENATED MODULE: ./build/package/action/worker-marker.js
/** The key in workerData that marks a worker thread started from the bundle (see src/action/main.ts). */
const WORKER_MARKER = "gradgateWorker";

;// CONCATENATED MODULE: ./build/package/action/main.js
/**
 * Entry file of the Action (bundled into dist/index.js). It is three programs in one file, told apart by a
 * marker:
 * - a worker thread marked in workerData: the runner's worker code (the pool starts workers from this
 *   very file when it is a bundle);
 * - a process started with ENGINE_MARKER set: the engine process, which runs the CLI on its arguments and
 *   with it the optimizer code, without the token (see ./engine-process.ts);
 * - otherwise the Action itself: it only calls `run()`.
 * (No top-level await: the bundler reads this file as a script.)
 */





const marked = !external_node_worker_threads_.isMainThread && external_node_worker_threads_.workerData?.[WORKER_MARKER] === true;
// Only a compiled file (plain .js) can start workers and the engine from itself; from the sources the
// pool uses runner/worker.ts and the engine starts main.ts through tsx.
const compiled = import.meta.url.endsWith(".js");
if (marked) {
    void __nccwpck_require__.e(/* import() */ 410).then(__nccwpck_require__.bind(__nccwpck_require__, 6410));
}
else {
    if (compiled)
        (0,pool/* setWorkerEntry */.HU)(new URL(import.meta.url), { [WORKER_MARKER]: true });
    if (process.env[engine_marker/* ENGINE_MARKER */.q] === "1") {
        void Promise.all(/* import() */[__nccwpck_require__.e(815), __nccwpck_require__.e(846), __nccwpck_require__.e(922)]).then(__nccwpck_require__.bind(__nccwpck_require__, 922)).then(({ engineMain }) => engineMain(process.argv.slice(2)));
    }
    else {
        if (compiled)
            (0,engine_process/* setEngineEntry */.NV)(new URL(import.meta.url));
        void Promise.all(/* import() */[__nccwpck_require__.e(421), __nccwpck_require__.e(846), __nccwpck_require__.e(995)]).then(__nccwpck_require__.bind(__nccwpck_require__, 6376)).then(({ run }) => run());
    }
}

