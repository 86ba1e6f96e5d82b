import { createRequire as __WEBPACK_EXTERNAL_createRequire } from "module";
/******/ var __webpack_modules__ = ({

/***/ 181:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("buffer");

/***/ }),

/***/ 932:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("process");

/***/ }),

/***/ 7349:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);
var YAMLMap = __nccwpck_require__(4454);
var YAMLSeq = __nccwpck_require__(2223);
var resolveBlockMap = __nccwpck_require__(7103);
var resolveBlockSeq = __nccwpck_require__(334);
var resolveFlowCollection = __nccwpck_require__(3142);

function resolveCollection(CN, ctx, token, onError, tagName, tag) {
    const coll = token.type === 'block-map'
        ? resolveBlockMap.resolveBlockMap(CN, ctx, token, onError, tag)
        : token.type === 'block-seq'
            ? resolveBlockSeq.resolveBlockSeq(CN, ctx, token, onError, tag)
            : resolveFlowCollection.resolveFlowCollection(CN, ctx, token, onError, tag);
    const Coll = coll.constructor;
    // If we got a tagName matching the class, or the tag name is '!',
    // then use the tagName from the node class used to create it.
    if (tagName === '!' || tagName === Coll.tagName) {
        coll.tag = Coll.tagName;
        return coll;
    }
    if (tagName)
        coll.tag = tagName;
    return coll;
}
function composeCollection(CN, ctx, token, props, onError) {
    const tagToken = props.tag;
    const tagName = !tagToken
        ? null
        : ctx.directives.tagName(tagToken.source, msg => onError(tagToken, 'TAG_RESOLVE_FAILED', msg));
    if (token.type === 'block-seq') {
        const { anchor, newlineAfterProp: nl } = props;
        const lastProp = anchor && tagToken
            ? anchor.offset > tagToken.offset
                ? anchor
                : tagToken
            : (anchor ?? tagToken);
        if (lastProp && (!nl || nl.offset < lastProp.offset)) {
            const message = 'Missing newline after block sequence props';
            onError(lastProp, 'MISSING_CHAR', message);
        }
    }
    const expType = token.type === 'block-map'
        ? 'map'
        : token.type === 'block-seq'
            ? 'seq'
            : token.start.source === '{'
                ? 'map'
                : 'seq';
    // shortcut: check if it's a generic YAMLMap or YAMLSeq
    // before jumping into the custom tag logic.
    if (!tagToken ||
        !tagName ||
        tagName === '!' ||
        (tagName === YAMLMap.YAMLMap.tagName && expType === 'map') ||
        (tagName === YAMLSeq.YAMLSeq.tagName && expType === 'seq')) {
        return resolveCollection(CN, ctx, token, onError, tagName);
    }
    let tag = ctx.schema.tags.find(t => t.tag === tagName && t.collection === expType);
    if (!tag) {
        const kt = ctx.schema.knownTags[tagName];
        if (kt?.collection === expType) {
            ctx.schema.tags.push(Object.assign({}, kt, { default: false }));
            tag = kt;
        }
        else {
            if (kt) {
                onError(tagToken, 'BAD_COLLECTION_TYPE', `${kt.tag} used for ${expType} collection, but expects ${kt.collection ?? 'scalar'}`, true);
            }
            else {
                onError(tagToken, 'TAG_RESOLVE_FAILED', `Unresolved tag: ${tagName}`, true);
            }
            return resolveCollection(CN, ctx, token, onError, tagName);
        }
    }
    const coll = resolveCollection(CN, ctx, token, onError, tagName, tag);
    const res = tag.resolve?.(coll, msg => onError(tagToken, 'TAG_RESOLVE_FAILED', msg), ctx.options) ?? coll;
    const node = identity.isNode(res)
        ? res
        : new Scalar.Scalar(res);
    node.range = coll.range;
    node.tag = tagName;
    if (tag?.format)
        node.format = tag.format;
    return node;
}

exports.composeCollection = composeCollection;


/***/ }),

/***/ 3683:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Document = __nccwpck_require__(3021);
var composeNode = __nccwpck_require__(5937);
var resolveEnd = __nccwpck_require__(7788);
var resolveProps = __nccwpck_require__(4631);

function composeDoc(options, directives, { offset, start, value, end }, onError) {
    const opts = Object.assign({ _directives: directives }, options);
    const doc = new Document.Document(undefined, opts);
    const ctx = {
        atKey: false,
        atRoot: true,
        directives: doc.directives,
        options: doc.options,
        schema: doc.schema
    };
    const props = resolveProps.resolveProps(start, {
        indicator: 'doc-start',
        next: value ?? end?.[0],
        offset,
        onError,
        parentIndent: 0,
        startOnNewline: true
    });
    if (props.found) {
        doc.directives.docStart = true;
        if (value &&
            (value.type === 'block-map' || value.type === 'block-seq') &&
            !props.hasNewline)
            onError(props.end, 'MISSING_CHAR', 'Block collection cannot start on same line with directives-end marker');
    }
    // @ts-expect-error If Contents is set, let's trust the user
    doc.contents = value
        ? composeNode.composeNode(ctx, value, props, onError)
        : composeNode.composeEmptyNode(ctx, props.end, start, null, props, onError);
    const contentEnd = doc.contents.range[2];
    const re = resolveEnd.resolveEnd(end, contentEnd, false, onError);
    if (re.comment)
        doc.comment = re.comment;
    doc.range = [offset, contentEnd, re.offset];
    return doc;
}

exports.composeDoc = composeDoc;


/***/ }),

/***/ 5937:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Alias = __nccwpck_require__(4065);
var identity = __nccwpck_require__(1127);
var composeCollection = __nccwpck_require__(7349);
var composeScalar = __nccwpck_require__(5413);
var resolveEnd = __nccwpck_require__(7788);
var utilEmptyScalarPosition = __nccwpck_require__(2599);

const CN = { composeNode, composeEmptyNode };
function composeNode(ctx, token, props, onError) {
    const atKey = ctx.atKey;
    const { spaceBefore, comment, anchor, tag } = props;
    let node;
    let isSrcToken = true;
    switch (token.type) {
        case 'alias':
            node = composeAlias(ctx, token, onError);
            if (anchor || tag)
                onError(token, 'ALIAS_PROPS', 'An alias node must not specify any properties');
            break;
        case 'scalar':
        case 'single-quoted-scalar':
        case 'double-quoted-scalar':
        case 'block-scalar':
            node = composeScalar.composeScalar(ctx, token, tag, onError);
            if (anchor)
                node.anchor = anchor.source.substring(1);
            break;
        case 'block-map':
        case 'block-seq':
        case 'flow-collection':
            try {
                node = composeCollection.composeCollection(CN, ctx, token, props, onError);
                if (anchor)
                    node.anchor = anchor.source.substring(1);
            }
            catch (error) {
                // Almost certainly here due to a stack overflow
                const message = error instanceof Error ? error.message : String(error);
                onError(token, 'RESOURCE_EXHAUSTION', message);
            }
            break;
        default: {
            const message = token.type === 'error'
                ? token.message
                : `Unsupported token (type: ${token.type})`;
            onError(token, 'UNEXPECTED_TOKEN', message);
            isSrcToken = false;
        }
    }
    node ?? (node = composeEmptyNode(ctx, token.offset, undefined, null, props, onError));
    if (anchor && node.anchor === '')
        onError(anchor, 'BAD_ALIAS', 'Anchor cannot be an empty string');
    if (atKey &&
        ctx.options.stringKeys &&
        (!identity.isScalar(node) ||
            typeof node.value !== 'string' ||
            (node.tag && node.tag !== 'tag:yaml.org,2002:str'))) {
        const msg = 'With stringKeys, all keys must be strings';
        onError(tag ?? token, 'NON_STRING_KEY', msg);
    }
    if (spaceBefore)
        node.spaceBefore = true;
    if (comment) {
        if (token.type === 'scalar' && token.source === '')
            node.comment = comment;
        else
            node.commentBefore = comment;
    }
    // @ts-expect-error Type checking misses meaning of isSrcToken
    if (ctx.options.keepSourceTokens && isSrcToken)
        node.srcToken = token;
    return node;
}
function composeEmptyNode(ctx, offset, before, pos, { spaceBefore, comment, anchor, tag, end }, onError) {
    const token = {
        type: 'scalar',
        offset: utilEmptyScalarPosition.emptyScalarPosition(offset, before, pos),
        indent: -1,
        source: ''
    };
    const node = composeScalar.composeScalar(ctx, token, tag, onError);
    if (anchor) {
        node.anchor = anchor.source.substring(1);
        if (node.anchor === '')
            onError(anchor, 'BAD_ALIAS', 'Anchor cannot be an empty string');
    }
    if (spaceBefore)
        node.spaceBefore = true;
    if (comment) {
        node.comment = comment;
        node.range[2] = end;
    }
    return node;
}
function composeAlias({ options }, { offset, source, end }, onError) {
    const alias = new Alias.Alias(source.substring(1));
    if (alias.source === '')
        onError(offset, 'BAD_ALIAS', 'Alias cannot be an empty string');
    if (alias.source.endsWith(':'))
        onError(offset + source.length - 1, 'BAD_ALIAS', 'Alias ending in : is ambiguous', true);
    const valueEnd = offset + source.length;
    const re = resolveEnd.resolveEnd(end, valueEnd, options.strict, onError);
    alias.range = [offset, valueEnd, re.offset];
    if (re.comment)
        alias.comment = re.comment;
    return alias;
}

exports.composeEmptyNode = composeEmptyNode;
exports.composeNode = composeNode;


/***/ }),

/***/ 5413:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);
var resolveBlockScalar = __nccwpck_require__(8913);
var resolveFlowScalar = __nccwpck_require__(6842);

function composeScalar(ctx, token, tagToken, onError) {
    const { value, type, comment, range } = token.type === 'block-scalar'
        ? resolveBlockScalar.resolveBlockScalar(ctx, token, onError)
        : resolveFlowScalar.resolveFlowScalar(token, ctx.options.strict, onError);
    const tagName = tagToken
        ? ctx.directives.tagName(tagToken.source, msg => onError(tagToken, 'TAG_RESOLVE_FAILED', msg))
        : null;
    let tag;
    if (ctx.options.stringKeys && ctx.atKey) {
        tag = ctx.schema[identity.SCALAR];
    }
    else if (tagName)
        tag = findScalarTagByName(ctx.schema, value, tagName, tagToken, onError);
    else if (token.type === 'scalar')
        tag = findScalarTagByTest(ctx, value, token, onError);
    else
        tag = ctx.schema[identity.SCALAR];
    let scalar;
    try {
        const res = tag.resolve(value, msg => onError(tagToken ?? token, 'TAG_RESOLVE_FAILED', msg), ctx.options);
        scalar = identity.isScalar(res) ? res : new Scalar.Scalar(res);
    }
    catch (error) {
        const msg = error instanceof Error ? error.message : String(error);
        onError(tagToken ?? token, 'TAG_RESOLVE_FAILED', msg);
        scalar = new Scalar.Scalar(value);
    }
    scalar.range = range;
    scalar.source = value;
    if (type)
        scalar.type = type;
    if (tagName)
        scalar.tag = tagName;
    if (tag.format)
        scalar.format = tag.format;
    if (comment)
        scalar.comment = comment;
    return scalar;
}
function findScalarTagByName(schema, value, tagName, tagToken, onError) {
    if (tagName === '!')
        return schema[identity.SCALAR]; // non-specific tag
    const matchWithTest = [];
    for (const tag of schema.tags) {
        if (!tag.collection && tag.tag === tagName) {
            if (tag.default && tag.test)
                matchWithTest.push(tag);
            else
                return tag;
        }
    }
    for (const tag of matchWithTest)
        if (tag.test?.test(value))
            return tag;
    const kt = schema.knownTags[tagName];
    if (kt && !kt.collection) {
        // Ensure that the known tag is available for stringifying,
        // but does not get used by default.
        schema.tags.push(Object.assign({}, kt, { default: false, test: undefined }));
        return kt;
    }
    onError(tagToken, 'TAG_RESOLVE_FAILED', `Unresolved tag: ${tagName}`, tagName !== 'tag:yaml.org,2002:str');
    return schema[identity.SCALAR];
}
function findScalarTagByTest({ atKey, directives, schema }, value, token, onError) {
    const tag = schema.tags.find(tag => (tag.default === true || (atKey && tag.default === 'key')) &&
        tag.test?.test(value)) || schema[identity.SCALAR];
    if (schema.compat) {
        const compat = schema.compat.find(tag => tag.default && tag.test?.test(value)) ??
            schema[identity.SCALAR];
        if (tag.tag !== compat.tag) {
            const ts = directives.tagString(tag.tag);
            const cs = directives.tagString(compat.tag);
            const msg = `Value may be parsed as either ${ts} or ${cs}`;
            onError(token, 'TAG_RESOLVE_FAILED', msg, true);
        }
    }
    return tag;
}

exports.composeScalar = composeScalar;


/***/ }),

/***/ 9984:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var node_process = __nccwpck_require__(932);
var directives = __nccwpck_require__(1342);
var Document = __nccwpck_require__(3021);
var errors = __nccwpck_require__(1464);
var identity = __nccwpck_require__(1127);
var composeDoc = __nccwpck_require__(3683);
var resolveEnd = __nccwpck_require__(7788);

function getErrorPos(src) {
    if (typeof src === 'number')
        return [src, src + 1];
    if (Array.isArray(src))
        return src.length === 2 ? src : [src[0], src[1]];
    const { offset, source } = src;
    return [offset, offset + (typeof source === 'string' ? source.length : 1)];
}
function parsePrelude(prelude) {
    let comment = '';
    let atComment = false;
    let afterEmptyLine = false;
    for (let i = 0; i < prelude.length; ++i) {
        const source = prelude[i];
        switch (source[0]) {
            case '#':
                comment +=
                    (comment === '' ? '' : afterEmptyLine ? '\n\n' : '\n') +
                        (source.substring(1) || ' ');
                atComment = true;
                afterEmptyLine = false;
                break;
            case '%':
                if (prelude[i + 1]?.[0] !== '#')
                    i += 1;
                atComment = false;
                break;
            default:
                // This may be wrong after doc-end, but in that case it doesn't matter
                if (!atComment)
                    afterEmptyLine = true;
                atComment = false;
        }
    }
    return { comment, afterEmptyLine };
}
/**
 * Compose a stream of CST nodes into a stream of YAML Documents.
 *
 * ```ts
 * import { Composer, Parser } from 'yaml'
 *
 * const src: string = ...
 * const tokens = new Parser().parse(src)
 * const docs = new Composer().compose(tokens)
 * ```
 */
class Composer {
    constructor(options = {}) {
        this.doc = null;
        this.atDirectives = false;
        this.prelude = [];
        this.errors = [];
        this.warnings = [];
        this.onError = (source, code, message, warning) => {
            const pos = getErrorPos(source);
            if (warning)
                this.warnings.push(new errors.YAMLWarning(pos, code, message));
            else
                this.errors.push(new errors.YAMLParseError(pos, code, message));
        };
        // eslint-disable-next-line @typescript-eslint/prefer-nullish-coalescing
        this.directives = new directives.Directives({ version: options.version || '1.2' });
        this.options = options;
    }
    decorate(doc, afterDoc) {
        const { comment, afterEmptyLine } = parsePrelude(this.prelude);
        //console.log({ dc: doc.comment, prelude, comment })
        if (comment) {
            const dc = doc.contents;
            if (afterDoc) {
                doc.comment = doc.comment ? `${doc.comment}\n${comment}` : comment;
            }
            else if (afterEmptyLine || doc.directives.docStart || !dc) {
                doc.commentBefore = comment;
            }
            else if (identity.isCollection(dc) && !dc.flow && dc.items.length > 0) {
                let it = dc.items[0];
                if (identity.isPair(it))
                    it = it.key;
                const cb = it.commentBefore;
                it.commentBefore = cb ? `${comment}\n${cb}` : comment;
            }
            else {
                const cb = dc.commentBefore;
                dc.commentBefore = cb ? `${comment}\n${cb}` : comment;
            }
        }
        if (afterDoc) {
            for (let i = 0; i < this.errors.length; ++i)
                doc.errors.push(this.errors[i]);
            for (let i = 0; i < this.warnings.length; ++i)
                doc.warnings.push(this.warnings[i]);
        }
        else {
            doc.errors = this.errors;
            doc.warnings = this.warnings;
        }
        this.prelude = [];
        this.errors = [];
        this.warnings = [];
    }
    /**
     * Current stream status information.
     *
     * Mostly useful at the end of input for an empty stream.
     */
    streamInfo() {
        return {
            comment: parsePrelude(this.prelude).comment,
            directives: this.directives,
            errors: this.errors,
            warnings: this.warnings
        };
    }
    /**
     * Compose tokens into documents.
     *
     * @param forceDoc - If the stream contains no document, still emit a final document including any comments and directives that would be applied to a subsequent document.
     * @param endOffset - Should be set if `forceDoc` is also set, to set the document range end and to indicate errors correctly.
     */
    *compose(tokens, forceDoc = false, endOffset = -1) {
        for (const token of tokens)
            yield* this.next(token);
        yield* this.end(forceDoc, endOffset);
    }
    /** Advance the composer by one CST token. */
    *next(token) {
        if (node_process.env.LOG_STREAM)
            console.dir(token, { depth: null });
        switch (token.type) {
            case 'directive':
                this.directives.add(token.source, (offset, message, warning) => {
                    const pos = getErrorPos(token);
                    pos[0] += offset;
                    this.onError(pos, 'BAD_DIRECTIVE', message, warning);
                });
                this.prelude.push(token.source);
                this.atDirectives = true;
                break;
            case 'document': {
                const doc = composeDoc.composeDoc(this.options, this.directives, token, this.onError);
                if (this.atDirectives && !doc.directives.docStart)
                    this.onError(token, 'MISSING_CHAR', 'Missing directives-end/doc-start indicator line');
                this.decorate(doc, false);
                if (this.doc)
                    yield this.doc;
                this.doc = doc;
                this.atDirectives = false;
                break;
            }
            case 'byte-order-mark':
            case 'space':
                break;
            case 'comment':
            case 'newline':
                this.prelude.push(token.source);
                break;
            case 'error': {
                const msg = token.source
                    ? `${token.message}: ${JSON.stringify(token.source)}`
                    : token.message;
                const error = new errors.YAMLParseError(getErrorPos(token), 'UNEXPECTED_TOKEN', msg);
                if (this.atDirectives || !this.doc)
                    this.errors.push(error);
                else
                    this.doc.errors.push(error);
                break;
            }
            case 'doc-end': {
                if (!this.doc) {
                    const msg = 'Unexpected doc-end without preceding document';
                    this.errors.push(new errors.YAMLParseError(getErrorPos(token), 'UNEXPECTED_TOKEN', msg));
                    break;
                }
                this.doc.directives.docEnd = true;
                const end = resolveEnd.resolveEnd(token.end, token.offset + token.source.length, this.doc.options.strict, this.onError);
                this.decorate(this.doc, true);
                if (end.comment) {
                    const dc = this.doc.comment;
                    this.doc.comment = dc ? `${dc}\n${end.comment}` : end.comment;
                }
                this.doc.range[2] = end.offset;
                break;
            }
            default:
                this.errors.push(new errors.YAMLParseError(getErrorPos(token), 'UNEXPECTED_TOKEN', `Unsupported token ${token.type}`));
        }
    }
    /**
     * Call at end of input to yield any remaining document.
     *
     * @param forceDoc - If the stream contains no document, still emit a final document including any comments and directives that would be applied to a subsequent document.
     * @param endOffset - Should be set if `forceDoc` is also set, to set the document range end and to indicate errors correctly.
     */
    *end(forceDoc = false, endOffset = -1) {
        if (this.doc) {
            this.decorate(this.doc, true);
            yield this.doc;
            this.doc = null;
        }
        else if (forceDoc) {
            const opts = Object.assign({ _directives: this.directives }, this.options);
            const doc = new Document.Document(undefined, opts);
            if (this.atDirectives)
                this.onError(endOffset, 'MISSING_CHAR', 'Missing directives-end indicator line');
            doc.range = [0, endOffset, endOffset];
            this.decorate(doc, false);
            yield doc;
        }
    }
}

exports.Composer = Composer;


/***/ }),

/***/ 7103:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Pair = __nccwpck_require__(7165);
var YAMLMap = __nccwpck_require__(4454);
var resolveProps = __nccwpck_require__(4631);
var utilContainsNewline = __nccwpck_require__(9499);
var utilFlowIndentCheck = __nccwpck_require__(4051);
var utilMapIncludes = __nccwpck_require__(1187);

const startColMsg = 'All mapping items must start at the same column';
function resolveBlockMap({ composeNode, composeEmptyNode }, ctx, bm, onError, tag) {
    const NodeClass = tag?.nodeClass ?? YAMLMap.YAMLMap;
    const map = new NodeClass(ctx.schema);
    if (ctx.atRoot)
        ctx.atRoot = false;
    let offset = bm.offset;
    let commentEnd = null;
    for (const collItem of bm.items) {
        const { start, key, sep, value } = collItem;
        // key properties
        const keyProps = resolveProps.resolveProps(start, {
            indicator: 'explicit-key-ind',
            next: key ?? sep?.[0],
            offset,
            onError,
            parentIndent: bm.indent,
            startOnNewline: true
        });
        const implicitKey = !keyProps.found;
        if (implicitKey) {
            if (key) {
                if (key.type === 'block-seq')
                    onError(offset, 'BLOCK_AS_IMPLICIT_KEY', 'A block sequence may not be used as an implicit map key');
                else if ('indent' in key && key.indent !== bm.indent)
                    onError(offset, 'BAD_INDENT', startColMsg);
            }
            if (!keyProps.anchor && !keyProps.tag && !sep) {
                commentEnd = keyProps.end;
                if (keyProps.comment) {
                    if (map.comment)
                        map.comment += '\n' + keyProps.comment;
                    else
                        map.comment = keyProps.comment;
                }
                continue;
            }
            if (keyProps.newlineAfterProp || utilContainsNewline.containsNewline(key)) {
                onError(key ?? start[start.length - 1], 'MULTILINE_IMPLICIT_KEY', 'Implicit keys need to be on a single line');
            }
        }
        else if (keyProps.found?.indent !== bm.indent) {
            onError(offset, 'BAD_INDENT', startColMsg);
        }
        // key value
        ctx.atKey = true;
        const keyStart = keyProps.end;
        const keyNode = key
            ? composeNode(ctx, key, keyProps, onError)
            : composeEmptyNode(ctx, keyStart, start, null, keyProps, onError);
        if (ctx.schema.compat)
            utilFlowIndentCheck.flowIndentCheck(bm.indent, key, onError);
        ctx.atKey = false;
        if (utilMapIncludes.mapIncludes(ctx, map.items, keyNode))
            onError(keyStart, 'DUPLICATE_KEY', 'Map keys must be unique');
        // value properties
        const valueProps = resolveProps.resolveProps(sep ?? [], {
            indicator: 'map-value-ind',
            next: value,
            offset: keyNode.range[2],
            onError,
            parentIndent: bm.indent,
            startOnNewline: !key || key.type === 'block-scalar'
        });
        offset = valueProps.end;
        if (valueProps.found) {
            if (implicitKey) {
                if (value?.type === 'block-map' && !valueProps.hasNewline)
                    onError(offset, 'BLOCK_AS_IMPLICIT_KEY', 'Nested mappings are not allowed in compact mappings');
                if (ctx.options.strict &&
                    keyProps.start < valueProps.found.offset - 1024)
                    onError(keyNode.range, 'KEY_OVER_1024_CHARS', 'The : indicator must be at most 1024 chars after the start of an implicit block mapping key');
            }
            // value value
            const valueNode = value
                ? composeNode(ctx, value, valueProps, onError)
                : composeEmptyNode(ctx, offset, sep, null, valueProps, onError);
            if (ctx.schema.compat)
                utilFlowIndentCheck.flowIndentCheck(bm.indent, value, onError);
            offset = valueNode.range[2];
            const pair = new Pair.Pair(keyNode, valueNode);
            if (ctx.options.keepSourceTokens)
                pair.srcToken = collItem;
            map.items.push(pair);
        }
        else {
            // key with no value
            if (implicitKey)
                onError(keyNode.range, 'MISSING_CHAR', 'Implicit map keys need to be followed by map values');
            if (valueProps.comment) {
                if (keyNode.comment)
                    keyNode.comment += '\n' + valueProps.comment;
                else
                    keyNode.comment = valueProps.comment;
            }
            const pair = new Pair.Pair(keyNode);
            if (ctx.options.keepSourceTokens)
                pair.srcToken = collItem;
            map.items.push(pair);
        }
    }
    if (commentEnd && commentEnd < offset)
        onError(commentEnd, 'IMPOSSIBLE', 'Map comment with trailing content');
    map.range = [bm.offset, offset, commentEnd ?? offset];
    return map;
}

exports.resolveBlockMap = resolveBlockMap;


/***/ }),

/***/ 8913:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);

function resolveBlockScalar(ctx, scalar, onError) {
    const start = scalar.offset;
    const header = parseBlockScalarHeader(scalar, ctx.options.strict, onError);
    if (!header)
        return { value: '', type: null, comment: '', range: [start, start, start] };
    const type = header.mode === '>' ? Scalar.Scalar.BLOCK_FOLDED : Scalar.Scalar.BLOCK_LITERAL;
    const lines = scalar.source ? splitLines(scalar.source) : [];
    // determine the end of content & start of chomping
    let chompStart = lines.length;
    for (let i = lines.length - 1; i >= 0; --i) {
        const content = lines[i][1];
        if (content === '' || content === '\r')
            chompStart = i;
        else
            break;
    }
    // shortcut for empty contents
    if (chompStart === 0) {
        const value = header.chomp === '+' && lines.length > 0
            ? '\n'.repeat(Math.max(1, lines.length - 1))
            : '';
        let end = start + header.length;
        if (scalar.source)
            end += scalar.source.length;
        return { value, type, comment: header.comment, range: [start, end, end] };
    }
    // find the indentation level to trim from start
    let trimIndent = scalar.indent + header.indent;
    let offset = scalar.offset + header.length;
    let contentStart = 0;
    for (let i = 0; i < chompStart; ++i) {
        const [indent, content] = lines[i];
        if (content === '' || content === '\r') {
            if (header.indent === 0 && indent.length > trimIndent)
                trimIndent = indent.length;
        }
        else {
            if (indent.length < trimIndent) {
                const message = 'Block scalars with more-indented leading empty lines must use an explicit indentation indicator';
                onError(offset + indent.length, 'MISSING_CHAR', message);
            }
            if (header.indent === 0)
                trimIndent = indent.length;
            contentStart = i;
            if (trimIndent === 0 && !ctx.atRoot) {
                const message = 'Block scalar values in collections must be indented';
                onError(offset, 'BAD_INDENT', message);
            }
            break;
        }
        offset += indent.length + content.length + 1;
    }
    // include trailing more-indented empty lines in content
    for (let i = lines.length - 1; i >= chompStart; --i) {
        if (lines[i][0].length > trimIndent)
            chompStart = i + 1;
    }
    let value = '';
    let sep = '';
    let prevMoreIndented = false;
    // leading whitespace is kept intact
    for (let i = 0; i < contentStart; ++i)
        value += lines[i][0].slice(trimIndent) + '\n';
    for (let i = contentStart; i < chompStart; ++i) {
        let [indent, content] = lines[i];
        offset += indent.length + content.length + 1;
        const crlf = content[content.length - 1] === '\r';
        if (crlf)
            content = content.slice(0, -1);
        /* istanbul ignore if already caught in lexer */
        if (content && indent.length < trimIndent) {
            const src = header.indent
                ? 'explicit indentation indicator'
                : 'first line';
            const message = `Block scalar lines must not be less indented than their ${src}`;
            onError(offset - content.length - (crlf ? 2 : 1), 'BAD_INDENT', message);
            indent = '';
        }
        if (type === Scalar.Scalar.BLOCK_LITERAL) {
            value += sep + indent.slice(trimIndent) + content;
            sep = '\n';
        }
        else if (indent.length > trimIndent || content[0] === '\t') {
            // more-indented content within a folded block
            if (sep === ' ')
                sep = '\n';
            else if (!prevMoreIndented && sep === '\n')
                sep = '\n\n';
            value += sep + indent.slice(trimIndent) + content;
            sep = '\n';
            prevMoreIndented = true;
        }
        else if (content === '') {
            // empty line
            if (sep === '\n')
                value += '\n';
            else
                sep = '\n';
        }
        else {
            value += sep + content;
            sep = ' ';
            prevMoreIndented = false;
        }
    }
    switch (header.chomp) {
        case '-':
            break;
        case '+':
            for (let i = chompStart; i < lines.length; ++i)
                value += '\n' + lines[i][0].slice(trimIndent);
            if (value[value.length - 1] !== '\n')
                value += '\n';
            break;
        default:
            value += '\n';
    }
    const end = start + header.length + scalar.source.length;
    return { value, type, comment: header.comment, range: [start, end, end] };
}
function parseBlockScalarHeader({ offset, props }, strict, onError) {
    /* istanbul ignore if should not happen */
    if (props[0].type !== 'block-scalar-header') {
        onError(props[0], 'IMPOSSIBLE', 'Block scalar header not found');
        return null;
    }
    const { source } = props[0];
    const mode = source[0];
    let indent = 0;
    let chomp = '';
    let error = -1;
    for (let i = 1; i < source.length; ++i) {
        const ch = source[i];
        if (!chomp && (ch === '-' || ch === '+'))
            chomp = ch;
        else {
            const n = Number(ch);
            if (!indent && n)
                indent = n;
            else if (error === -1)
                error = offset + i;
        }
    }
    if (error !== -1)
        onError(error, 'UNEXPECTED_TOKEN', `Block scalar header includes extra characters: ${source}`);
    let hasSpace = false;
    let comment = '';
    let length = source.length;
    for (let i = 1; i < props.length; ++i) {
        const token = props[i];
        switch (token.type) {
            case 'space':
                hasSpace = true;
            // fallthrough
            case 'newline':
                length += token.source.length;
                break;
            case 'comment':
                if (strict && !hasSpace) {
                    const message = 'Comments must be separated from other tokens by white space characters';
                    onError(token, 'MISSING_CHAR', message);
                }
                length += token.source.length;
                comment = token.source.substring(1);
                break;
            case 'error':
                onError(token, 'UNEXPECTED_TOKEN', token.message);
                length += token.source.length;
                break;
            /* istanbul ignore next should not happen */
            default: {
                const message = `Unexpected token in block scalar header: ${token.type}`;
                onError(token, 'UNEXPECTED_TOKEN', message);
                const ts = token.source;
                if (ts && typeof ts === 'string')
                    length += ts.length;
            }
        }
    }
    return { mode, indent, chomp, comment, length };
}
/** @returns Array of lines split up as `[indent, content]` */
function splitLines(source) {
    const split = source.split(/\n( *)/);
    const first = split[0];
    const m = first.match(/^( *)/);
    const line0 = m?.[1]
        ? [m[1], first.slice(m[1].length)]
        : ['', first];
    const lines = [line0];
    for (let i = 1; i < split.length; i += 2)
        lines.push([split[i], split[i + 1]]);
    return lines;
}

exports.resolveBlockScalar = resolveBlockScalar;


/***/ }),

/***/ 334:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var YAMLSeq = __nccwpck_require__(2223);
var resolveProps = __nccwpck_require__(4631);
var utilFlowIndentCheck = __nccwpck_require__(4051);

function resolveBlockSeq({ composeNode, composeEmptyNode }, ctx, bs, onError, tag) {
    const NodeClass = tag?.nodeClass ?? YAMLSeq.YAMLSeq;
    const seq = new NodeClass(ctx.schema);
    if (ctx.atRoot)
        ctx.atRoot = false;
    if (ctx.atKey)
        ctx.atKey = false;
    let offset = bs.offset;
    let commentEnd = null;
    for (const { start, value } of bs.items) {
        const props = resolveProps.resolveProps(start, {
            indicator: 'seq-item-ind',
            next: value,
            offset,
            onError,
            parentIndent: bs.indent,
            startOnNewline: true
        });
        if (!props.found) {
            if (props.anchor || props.tag || value) {
                if (value?.type === 'block-seq')
                    onError(props.end, 'BAD_INDENT', 'All sequence items must start at the same column');
                else
                    onError(offset, 'MISSING_CHAR', 'Sequence item without - indicator');
            }
            else {
                commentEnd = props.end;
                if (props.comment)
                    seq.comment = props.comment;
                continue;
            }
        }
        const node = value
            ? composeNode(ctx, value, props, onError)
            : composeEmptyNode(ctx, props.end, start, null, props, onError);
        if (ctx.schema.compat)
            utilFlowIndentCheck.flowIndentCheck(bs.indent, value, onError);
        offset = node.range[2];
        seq.items.push(node);
    }
    seq.range = [bs.offset, offset, commentEnd ?? offset];
    return seq;
}

exports.resolveBlockSeq = resolveBlockSeq;


/***/ }),

/***/ 7788:
/***/ ((__unused_webpack_module, exports) => {



function resolveEnd(end, offset, reqSpace, onError) {
    let comment = '';
    if (end) {
        let hasSpace = false;
        let sep = '';
        for (const token of end) {
            const { source, type } = token;
            switch (type) {
                case 'space':
                    hasSpace = true;
                    break;
                case 'comment': {
                    if (reqSpace && !hasSpace)
                        onError(token, 'MISSING_CHAR', 'Comments must be separated from other tokens by white space characters');
                    const cb = source.substring(1) || ' ';
                    if (!comment)
                        comment = cb;
                    else
                        comment += sep + cb;
                    sep = '';
                    break;
                }
                case 'newline':
                    if (comment)
                        sep += source;
                    hasSpace = true;
                    break;
                default:
                    onError(token, 'UNEXPECTED_TOKEN', `Unexpected ${type} at node end`);
            }
            offset += source.length;
        }
    }
    return { comment, offset };
}

exports.resolveEnd = resolveEnd;


/***/ }),

/***/ 3142:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var YAMLMap = __nccwpck_require__(4454);
var YAMLSeq = __nccwpck_require__(2223);
var resolveEnd = __nccwpck_require__(7788);
var resolveProps = __nccwpck_require__(4631);
var utilContainsNewline = __nccwpck_require__(9499);
var utilMapIncludes = __nccwpck_require__(1187);

const blockMsg = 'Block collections are not allowed within flow collections';
const isBlock = (token) => token && (token.type === 'block-map' || token.type === 'block-seq');
function resolveFlowCollection({ composeNode, composeEmptyNode }, ctx, fc, onError, tag) {
    const isMap = fc.start.source === '{';
    const fcName = isMap ? 'flow map' : 'flow sequence';
    const NodeClass = (tag?.nodeClass ?? (isMap ? YAMLMap.YAMLMap : YAMLSeq.YAMLSeq));
    const coll = new NodeClass(ctx.schema);
    coll.flow = true;
    const atRoot = ctx.atRoot;
    if (atRoot)
        ctx.atRoot = false;
    if (ctx.atKey)
        ctx.atKey = false;
    let offset = fc.offset + fc.start.source.length;
    for (let i = 0; i < fc.items.length; ++i) {
        const collItem = fc.items[i];
        const { start, key, sep, value } = collItem;
        const props = resolveProps.resolveProps(start, {
            flow: fcName,
            indicator: 'explicit-key-ind',
            next: key ?? sep?.[0],
            offset,
            onError,
            parentIndent: fc.indent,
            startOnNewline: false
        });
        if (!props.found) {
            if (!props.anchor && !props.tag && !sep && !value) {
                if (i === 0 && props.comma)
                    onError(props.comma, 'UNEXPECTED_TOKEN', `Unexpected , in ${fcName}`);
                else if (i < fc.items.length - 1)
                    onError(props.start, 'UNEXPECTED_TOKEN', `Unexpected empty item in ${fcName}`);
                if (props.comment) {
                    if (coll.comment)
                        coll.comment += '\n' + props.comment;
                    else
                        coll.comment = props.comment;
                }
                offset = props.end;
                continue;
            }
            if (!isMap && ctx.options.strict && utilContainsNewline.containsNewline(key))
                onError(key, // checked by containsNewline()
                'MULTILINE_IMPLICIT_KEY', 'Implicit keys of flow sequence pairs need to be on a single line');
        }
        if (i === 0) {
            if (props.comma)
                onError(props.comma, 'UNEXPECTED_TOKEN', `Unexpected , in ${fcName}`);
        }
        else {
            if (!props.comma)
                onError(props.start, 'MISSING_CHAR', `Missing , between ${fcName} items`);
            if (props.comment) {
                let prevItemComment = '';
                loop: for (const st of start) {
                    switch (st.type) {
                        case 'comma':
                        case 'space':
                            break;
                        case 'comment':
                            prevItemComment = st.source.substring(1);
                            break loop;
                        default:
                            break loop;
                    }
                }
                if (prevItemComment) {
                    let prev = coll.items[coll.items.length - 1];
                    if (identity.isPair(prev))
                        prev = prev.value ?? prev.key;
                    if (prev.comment)
                        prev.comment += '\n' + prevItemComment;
                    else
                        prev.comment = prevItemComment;
                    props.comment = props.comment.substring(prevItemComment.length + 1);
                }
            }
        }
        if (!isMap && !sep && !props.found) {
            // item is a value in a seq
            // → key & sep are empty, start does not include ? or :
            const valueNode = value
                ? composeNode(ctx, value, props, onError)
                : composeEmptyNode(ctx, props.end, sep, null, props, onError);
            coll.items.push(valueNode);
            offset = valueNode.range[2];
            if (isBlock(value))
                onError(valueNode.range, 'BLOCK_IN_FLOW', blockMsg);
        }
        else {
            // item is a key+value pair
            // key value
            ctx.atKey = true;
            const keyStart = props.end;
            const keyNode = key
                ? composeNode(ctx, key, props, onError)
                : composeEmptyNode(ctx, keyStart, start, null, props, onError);
            if (isBlock(key))
                onError(keyNode.range, 'BLOCK_IN_FLOW', blockMsg);
            ctx.atKey = false;
            // value properties
            const valueProps = resolveProps.resolveProps(sep ?? [], {
                flow: fcName,
                indicator: 'map-value-ind',
                next: value,
                offset: keyNode.range[2],
                onError,
                parentIndent: fc.indent,
                startOnNewline: false
            });
            if (valueProps.found) {
                if (!isMap && !props.found && ctx.options.strict) {
                    if (sep)
                        for (const st of sep) {
                            if (st === valueProps.found)
                                break;
                            if (st.type === 'newline') {
                                onError(st, 'MULTILINE_IMPLICIT_KEY', 'Implicit keys of flow sequence pairs need to be on a single line');
                                break;
                            }
                        }
                    if (props.start < valueProps.found.offset - 1024)
                        onError(valueProps.found, 'KEY_OVER_1024_CHARS', 'The : indicator must be at most 1024 chars after the start of an implicit flow sequence key');
                }
            }
            else if (value) {
                if ('source' in value && value.source?.[0] === ':')
                    onError(value, 'MISSING_CHAR', `Missing space after : in ${fcName}`);
                else
                    onError(valueProps.start, 'MISSING_CHAR', `Missing , or : between ${fcName} items`);
            }
            // value value
            const valueNode = value
                ? composeNode(ctx, value, valueProps, onError)
                : valueProps.found
                    ? composeEmptyNode(ctx, valueProps.end, sep, null, valueProps, onError)
                    : null;
            if (valueNode) {
                if (isBlock(value))
                    onError(valueNode.range, 'BLOCK_IN_FLOW', blockMsg);
            }
            else if (valueProps.comment) {
                if (keyNode.comment)
                    keyNode.comment += '\n' + valueProps.comment;
                else
                    keyNode.comment = valueProps.comment;
            }
            const pair = new Pair.Pair(keyNode, valueNode);
            if (ctx.options.keepSourceTokens)
                pair.srcToken = collItem;
            if (isMap) {
                const map = coll;
                if (utilMapIncludes.mapIncludes(ctx, map.items, keyNode))
                    onError(keyStart, 'DUPLICATE_KEY', 'Map keys must be unique');
                map.items.push(pair);
            }
            else {
                const map = new YAMLMap.YAMLMap(ctx.schema);
                map.flow = true;
                map.items.push(pair);
                const endRange = (valueNode ?? keyNode).range;
                map.range = [keyNode.range[0], endRange[1], endRange[2]];
                coll.items.push(map);
            }
            offset = valueNode ? valueNode.range[2] : valueProps.end;
        }
    }
    const expectedEnd = isMap ? '}' : ']';
    const [ce, ...ee] = fc.end;
    let cePos = offset;
    if (ce?.source === expectedEnd)
        cePos = ce.offset + ce.source.length;
    else {
        const name = fcName[0].toUpperCase() + fcName.substring(1);
        const msg = atRoot
            ? `${name} must end with a ${expectedEnd}`
            : `${name} in block collection must be sufficiently indented and end with a ${expectedEnd}`;
        onError(offset, atRoot ? 'MISSING_CHAR' : 'BAD_INDENT', msg);
        if (ce && ce.source.length !== 1)
            ee.unshift(ce);
    }
    if (ee.length > 0) {
        const end = resolveEnd.resolveEnd(ee, cePos, ctx.options.strict, onError);
        if (end.comment) {
            if (coll.comment)
                coll.comment += '\n' + end.comment;
            else
                coll.comment = end.comment;
        }
        coll.range = [fc.offset, cePos, end.offset];
    }
    else {
        coll.range = [fc.offset, cePos, cePos];
    }
    return coll;
}

exports.resolveFlowCollection = resolveFlowCollection;


/***/ }),

/***/ 6842:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var resolveEnd = __nccwpck_require__(7788);

function resolveFlowScalar(scalar, strict, onError) {
    const { offset, type, source, end } = scalar;
    let _type;
    let value;
    const _onError = (rel, code, msg) => onError(offset + rel, code, msg);
    switch (type) {
        case 'scalar':
            _type = Scalar.Scalar.PLAIN;
            value = plainValue(source, _onError);
            break;
        case 'single-quoted-scalar':
            _type = Scalar.Scalar.QUOTE_SINGLE;
            value = singleQuotedValue(source, _onError);
            break;
        case 'double-quoted-scalar':
            _type = Scalar.Scalar.QUOTE_DOUBLE;
            value = doubleQuotedValue(source, _onError);
            break;
        /* istanbul ignore next should not happen */
        default:
            onError(scalar, 'UNEXPECTED_TOKEN', `Expected a flow scalar value, but found: ${type}`);
            return {
                value: '',
                type: null,
                comment: '',
                range: [offset, offset + source.length, offset + source.length]
            };
    }
    const valueEnd = offset + source.length;
    const re = resolveEnd.resolveEnd(end, valueEnd, strict, onError);
    return {
        value,
        type: _type,
        comment: re.comment,
        range: [offset, valueEnd, re.offset]
    };
}
function plainValue(source, onError) {
    let badChar = '';
    switch (source[0]) {
        /* istanbul ignore next should not happen */
        case '\t':
            badChar = 'a tab character';
            break;
        case ',':
            badChar = 'flow indicator character ,';
            break;
        case '%':
            badChar = 'directive indicator character %';
            break;
        case '|':
        case '>': {
            badChar = `block scalar indicator ${source[0]}`;
            break;
        }
        case '@':
        case '`': {
            badChar = `reserved character ${source[0]}`;
            break;
        }
    }
    if (badChar)
        onError(0, 'BAD_SCALAR_START', `Plain value cannot start with ${badChar}`);
    return unfoldLines(source);
}
function singleQuotedValue(source, onError) {
    if (source[source.length - 1] !== "'" || source.length === 1)
        onError(source.length, 'MISSING_CHAR', "Missing closing 'quote");
    return unfoldLines(source.slice(1, -1)).replace(/''/g, "'");
}
function unfoldLines(source) {
    const line = /(.*?)\r?\n/sy;
    let match = line.exec(source);
    if (!match)
        return source;
    /**
     * The negative lookbehinds in these RegExps are to
     * prevent causing a polynomial search time in certain cases.
     *
     * The try-catch is for Safari < 16.4 and other old browsers:
     * https://caniuse.com/js-regexp-lookbehind
     */
    let trimEnd, trimBoth;
    try {
        trimEnd = new RegExp('(?<![ \t])[ \t]+$');
        trimBoth = new RegExp('^[ \t]+|(?<![ \t])[ \t]+$', 'g');
    }
    catch {
        trimEnd = /[ \t]+$/;
        trimBoth = /^[ \t]+|[ \t]+$/g;
    }
    let res = match[1].replace(trimEnd, '');
    let sep = ' ';
    let pos = line.lastIndex;
    while ((match = line.exec(source))) {
        const lm = match[1].replace(trimBoth, '');
        if (lm === '') {
            if (sep === '\n')
                res += sep;
            else
                sep = '\n';
        }
        else {
            res += sep + lm;
            sep = ' ';
        }
        pos = line.lastIndex;
    }
    const last = /[ \t]*(.*)/sy;
    last.lastIndex = pos;
    match = last.exec(source);
    return res + sep + (match?.[1] ?? '');
}
function doubleQuotedValue(source, onError) {
    let res = '';
    for (let i = 1; i < source.length - 1; ++i) {
        const ch = source[i];
        if (ch === '\r' && source[i + 1] === '\n')
            continue;
        if (ch === '\n') {
            const { fold, offset } = foldNewline(source, i);
            res += fold;
            i = offset;
        }
        else if (ch === '\\') {
            let next = source[++i];
            const cc = escapeCodes[next];
            if (cc)
                res += cc;
            else if (next === '\n') {
                // skip escaped newlines, but still trim the following line
                next = source[i + 1];
                while (next === ' ' || next === '\t')
                    next = source[++i + 1];
            }
            else if (next === '\r' && source[i + 1] === '\n') {
                // skip escaped CRLF newlines, but still trim the following line
                next = source[++i + 1];
                while (next === ' ' || next === '\t')
                    next = source[++i + 1];
            }
            else if (next === 'x' || next === 'u' || next === 'U') {
                const length = next === 'x' ? 2 : next === 'u' ? 4 : 8;
                res += parseCharCode(source, i + 1, length, onError);
                i += length;
            }
            else {
                const raw = source.substr(i - 1, 2);
                onError(i - 1, 'BAD_DQ_ESCAPE', `Invalid escape sequence ${raw}`);
                res += raw;
            }
        }
        else if (ch === ' ' || ch === '\t') {
            // trim trailing whitespace
            const wsStart = i;
            let next = source[i + 1];
            while (next === ' ' || next === '\t')
                next = source[++i + 1];
            if (next !== '\n' && !(next === '\r' && source[i + 2] === '\n'))
                res += i > wsStart ? source.slice(wsStart, i + 1) : ch;
        }
        else {
            res += ch;
        }
    }
    if (source[source.length - 1] !== '"' || source.length === 1)
        onError(source.length, 'MISSING_CHAR', 'Missing closing "quote');
    return res;
}
/**
 * Fold a single newline into a space, multiple newlines to N - 1 newlines.
 * Presumes `source[offset] === '\n'`
 */
function foldNewline(source, offset) {
    let fold = '';
    let ch = source[offset + 1];
    while (ch === ' ' || ch === '\t' || ch === '\n' || ch === '\r') {
        if (ch === '\r' && source[offset + 2] !== '\n')
            break;
        if (ch === '\n')
            fold += '\n';
        offset += 1;
        ch = source[offset + 1];
    }
    if (!fold)
        fold = ' ';
    return { fold, offset };
}
const escapeCodes = {
    '0': '\0', // null character
    a: '\x07', // bell character
    b: '\b', // backspace
    e: '\x1b', // escape character
    f: '\f', // form feed
    n: '\n', // line feed
    r: '\r', // carriage return
    t: '\t', // horizontal tab
    v: '\v', // vertical tab
    N: '\u0085', // Unicode next line
    _: '\u00a0', // Unicode non-breaking space
    L: '\u2028', // Unicode line separator
    P: '\u2029', // Unicode paragraph separator
    ' ': ' ',
    '"': '"',
    '/': '/',
    '\\': '\\',
    '\t': '\t'
};
function parseCharCode(source, offset, length, onError) {
    const cc = source.substr(offset, length);
    const ok = cc.length === length && /^[0-9a-fA-F]+$/.test(cc);
    const code = ok ? parseInt(cc, 16) : NaN;
    try {
        return String.fromCodePoint(code);
    }
    catch {
        const raw = source.substr(offset - 2, length + 2);
        onError(offset - 2, 'BAD_DQ_ESCAPE', `Invalid escape sequence ${raw}`);
        return raw;
    }
}

exports.resolveFlowScalar = resolveFlowScalar;


/***/ }),

/***/ 4631:
/***/ ((__unused_webpack_module, exports) => {



function resolveProps(tokens, { flow, indicator, next, offset, onError, parentIndent, startOnNewline }) {
    let spaceBefore = false;
    let atNewline = startOnNewline;
    let hasSpace = startOnNewline;
    let comment = '';
    let commentSep = '';
    let hasNewline = false;
    let reqSpace = false;
    let tab = null;
    let anchor = null;
    let tag = null;
    let newlineAfterProp = null;
    let comma = null;
    let found = null;
    let start = null;
    for (const token of tokens) {
        if (reqSpace) {
            if (token.type !== 'space' &&
                token.type !== 'newline' &&
                token.type !== 'comma')
                onError(token.offset, 'MISSING_CHAR', 'Tags and anchors must be separated from the next token by white space');
            reqSpace = false;
        }
        if (tab) {
            if (atNewline && token.type !== 'comment' && token.type !== 'newline') {
                onError(tab, 'TAB_AS_INDENT', 'Tabs are not allowed as indentation');
            }
            tab = null;
        }
        switch (token.type) {
            case 'space':
                // At the doc level, tabs at line start may be parsed
                // as leading white space rather than indentation.
                // In a flow collection, only the parser handles indent.
                if (!flow &&
                    (indicator !== 'doc-start' || next?.type !== 'flow-collection') &&
                    token.source.includes('\t')) {
                    tab = token;
                }
                hasSpace = true;
                break;
            case 'comment': {
                if (!hasSpace)
                    onError(token, 'MISSING_CHAR', 'Comments must be separated from other tokens by white space characters');
                const cb = token.source.substring(1) || ' ';
                if (!comment)
                    comment = cb;
                else
                    comment += commentSep + cb;
                commentSep = '';
                atNewline = false;
                break;
            }
            case 'newline':
                if (atNewline) {
                    if (comment)
                        comment += token.source;
                    else if (!found || indicator !== 'seq-item-ind')
                        spaceBefore = true;
                }
                else
                    commentSep += token.source;
                atNewline = true;
                hasNewline = true;
                if (anchor || tag)
                    newlineAfterProp = token;
                hasSpace = true;
                break;
            case 'anchor':
                if (anchor)
                    onError(token, 'MULTIPLE_ANCHORS', 'A node can have at most one anchor');
                if (token.source.endsWith(':'))
                    onError(token.offset + token.source.length - 1, 'BAD_ALIAS', 'Anchor ending in : is ambiguous', true);
                anchor = token;
                start ?? (start = token.offset);
                atNewline = false;
                hasSpace = false;
                reqSpace = true;
                break;
            case 'tag': {
                if (tag)
                    onError(token, 'MULTIPLE_TAGS', 'A node can have at most one tag');
                tag = token;
                start ?? (start = token.offset);
                atNewline = false;
                hasSpace = false;
                reqSpace = true;
                break;
            }
            case indicator:
                // Could here handle preceding comments differently
                if (anchor || tag)
                    onError(token, 'BAD_PROP_ORDER', `Anchors and tags must be after the ${token.source} indicator`);
                if (found)
                    onError(token, 'UNEXPECTED_TOKEN', `Unexpected ${token.source} in ${flow ?? 'collection'}`);
                found = token;
                atNewline =
                    indicator === 'seq-item-ind' || indicator === 'explicit-key-ind';
                hasSpace = false;
                break;
            case 'comma':
                if (flow) {
                    if (comma)
                        onError(token, 'UNEXPECTED_TOKEN', `Unexpected , in ${flow}`);
                    comma = token;
                    atNewline = false;
                    hasSpace = false;
                    break;
                }
            // else fallthrough
            default:
                onError(token, 'UNEXPECTED_TOKEN', `Unexpected ${token.type} token`);
                atNewline = false;
                hasSpace = false;
        }
    }
    const last = tokens[tokens.length - 1];
    const end = last ? last.offset + last.source.length : offset;
    if (reqSpace &&
        next &&
        next.type !== 'space' &&
        next.type !== 'newline' &&
        next.type !== 'comma' &&
        (next.type !== 'scalar' || next.source !== '')) {
        onError(next.offset, 'MISSING_CHAR', 'Tags and anchors must be separated from the next token by white space');
    }
    if (tab &&
        ((atNewline && tab.indent <= parentIndent) ||
            next?.type === 'block-map' ||
            next?.type === 'block-seq'))
        onError(tab, 'TAB_AS_INDENT', 'Tabs are not allowed as indentation');
    return {
        comma,
        found,
        spaceBefore,
        comment,
        hasNewline,
        anchor,
        tag,
        newlineAfterProp,
        end,
        start: start ?? end
    };
}

exports.resolveProps = resolveProps;


/***/ }),

/***/ 9499:
/***/ ((__unused_webpack_module, exports) => {



function containsNewline(key) {
    if (!key)
        return null;
    switch (key.type) {
        case 'alias':
        case 'scalar':
        case 'double-quoted-scalar':
        case 'single-quoted-scalar':
            if (key.source.includes('\n'))
                return true;
            if (key.end)
                for (const st of key.end)
                    if (st.type === 'newline')
                        return true;
            return false;
        case 'flow-collection':
            for (const it of key.items) {
                for (const st of it.start)
                    if (st.type === 'newline')
                        return true;
                if (it.sep)
                    for (const st of it.sep)
                        if (st.type === 'newline')
                            return true;
                if (containsNewline(it.key) || containsNewline(it.value))
                    return true;
            }
            return false;
        default:
            return true;
    }
}

exports.containsNewline = containsNewline;


/***/ }),

/***/ 2599:
/***/ ((__unused_webpack_module, exports) => {



function emptyScalarPosition(offset, before, pos) {
    if (before) {
        pos ?? (pos = before.length);
        for (let i = pos - 1; i >= 0; --i) {
            let st = before[i];
            switch (st.type) {
                case 'space':
                case 'comment':
                case 'newline':
                    offset -= st.source.length;
                    continue;
            }
            // Technically, an empty scalar is immediately after the last non-empty
            // node, but it's more useful to place it after any whitespace.
            st = before[++i];
            while (st?.type === 'space') {
                offset += st.source.length;
                st = before[++i];
            }
            break;
        }
    }
    return offset;
}

exports.emptyScalarPosition = emptyScalarPosition;


/***/ }),

/***/ 4051:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var utilContainsNewline = __nccwpck_require__(9499);

function flowIndentCheck(indent, fc, onError) {
    if (fc?.type === 'flow-collection') {
        const end = fc.end[0];
        if (end.indent === indent &&
            (end.source === ']' || end.source === '}') &&
            utilContainsNewline.containsNewline(fc)) {
            const msg = 'Flow end indicator should be more indented than parent';
            onError(end, 'BAD_INDENT', msg, true);
        }
    }
}

exports.flowIndentCheck = flowIndentCheck;


/***/ }),

/***/ 1187:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);

function mapIncludes(ctx, items, search) {
    const { uniqueKeys } = ctx.options;
    if (uniqueKeys === false)
        return false;
    const isEqual = typeof uniqueKeys === 'function'
        ? uniqueKeys
        : (a, b) => a === b || (identity.isScalar(a) && identity.isScalar(b) && a.value === b.value);
    return items.some(pair => isEqual(pair.key, search));
}

exports.mapIncludes = mapIncludes;


/***/ }),

/***/ 3021:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Alias = __nccwpck_require__(4065);
var Collection = __nccwpck_require__(101);
var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var toJS = __nccwpck_require__(4043);
var Schema = __nccwpck_require__(5840);
var stringifyDocument = __nccwpck_require__(6829);
var anchors = __nccwpck_require__(1596);
var applyReviver = __nccwpck_require__(3661);
var createNode = __nccwpck_require__(2404);
var directives = __nccwpck_require__(1342);

class Document {
    constructor(value, replacer, options) {
        /** A comment before this Document */
        this.commentBefore = null;
        /** A comment immediately after this Document */
        this.comment = null;
        /** Errors encountered during parsing. */
        this.errors = [];
        /** Warnings encountered during parsing. */
        this.warnings = [];
        Object.defineProperty(this, identity.NODE_TYPE, { value: identity.DOC });
        let _replacer = null;
        if (typeof replacer === 'function' || Array.isArray(replacer)) {
            _replacer = replacer;
        }
        else if (options === undefined && replacer) {
            options = replacer;
            replacer = undefined;
        }
        const opt = Object.assign({
            intAsBigInt: false,
            keepSourceTokens: false,
            logLevel: 'warn',
            prettyErrors: true,
            strict: true,
            stringKeys: false,
            uniqueKeys: true,
            version: '1.2'
        }, options);
        this.options = opt;
        let { version } = opt;
        if (options?._directives) {
            this.directives = options._directives.atDocument();
            if (this.directives.yaml.explicit)
                version = this.directives.yaml.version;
        }
        else
            this.directives = new directives.Directives({ version });
        this.setSchema(version, options);
        // @ts-expect-error We can't really know that this matches Contents.
        this.contents =
            value === undefined ? null : this.createNode(value, _replacer, options);
    }
    /**
     * Create a deep copy of this Document and its contents.
     *
     * Custom Node values that inherit from `Object` still refer to their original instances.
     */
    clone() {
        const copy = Object.create(Document.prototype, {
            [identity.NODE_TYPE]: { value: identity.DOC }
        });
        copy.commentBefore = this.commentBefore;
        copy.comment = this.comment;
        copy.errors = this.errors.slice();
        copy.warnings = this.warnings.slice();
        copy.options = Object.assign({}, this.options);
        if (this.directives)
            copy.directives = this.directives.clone();
        copy.schema = this.schema.clone();
        // @ts-expect-error We can't really know that this matches Contents.
        copy.contents = identity.isNode(this.contents)
            ? this.contents.clone(copy.schema)
            : this.contents;
        if (this.range)
            copy.range = this.range.slice();
        return copy;
    }
    /** Adds a value to the document. */
    add(value) {
        if (assertCollection(this.contents))
            this.contents.add(value);
    }
    /** Adds a value to the document. */
    addIn(path, value) {
        if (assertCollection(this.contents))
            this.contents.addIn(path, value);
    }
    /**
     * Create a new `Alias` node, ensuring that the target `node` has the required anchor.
     *
     * If `node` already has an anchor, `name` is ignored.
     * Otherwise, the `node.anchor` value will be set to `name`,
     * or if an anchor with that name is already present in the document,
     * `name` will be used as a prefix for a new unique anchor.
     * If `name` is undefined, the generated anchor will use 'a' as a prefix.
     */
    createAlias(node, name) {
        if (!node.anchor) {
            const prev = anchors.anchorNames(this);
            node.anchor =
                // eslint-disable-next-line @typescript-eslint/prefer-nullish-coalescing
                !name || prev.has(name) ? anchors.findNewAnchor(name || 'a', prev) : name;
        }
        return new Alias.Alias(node.anchor);
    }
    createNode(value, replacer, options) {
        let _replacer = undefined;
        if (typeof replacer === 'function') {
            value = replacer.call({ '': value }, '', value);
            _replacer = replacer;
        }
        else if (Array.isArray(replacer)) {
            const keyToStr = (v) => typeof v === 'number' || v instanceof String || v instanceof Number;
            const asStr = replacer.filter(keyToStr).map(String);
            if (asStr.length > 0)
                replacer = replacer.concat(asStr);
            _replacer = replacer;
        }
        else if (options === undefined && replacer) {
            options = replacer;
            replacer = undefined;
        }
        const { aliasDuplicateObjects, anchorPrefix, flow, keepUndefined, onTagObj, tag } = options ?? {};
        const { onAnchor, setAnchors, sourceObjects } = anchors.createNodeAnchors(this, 
        // eslint-disable-next-line @typescript-eslint/prefer-nullish-coalescing
        anchorPrefix || 'a');
        const ctx = {
            aliasDuplicateObjects: aliasDuplicateObjects ?? true,
            keepUndefined: keepUndefined ?? false,
            onAnchor,
            onTagObj,
            replacer: _replacer,
            schema: this.schema,
            sourceObjects
        };
        const node = createNode.createNode(value, tag, ctx);
        if (flow && identity.isCollection(node))
            node.flow = true;
        setAnchors();
        return node;
    }
    /**
     * Convert a key and a value into a `Pair` using the current schema,
     * recursively wrapping all values as `Scalar` or `Collection` nodes.
     */
    createPair(key, value, options = {}) {
        const k = this.createNode(key, null, options);
        const v = this.createNode(value, null, options);
        return new Pair.Pair(k, v);
    }
    /**
     * Removes a value from the document.
     * @returns `true` if the item was found and removed.
     */
    delete(key) {
        return assertCollection(this.contents) ? this.contents.delete(key) : false;
    }
    /**
     * Removes a value from the document.
     * @returns `true` if the item was found and removed.
     */
    deleteIn(path) {
        if (Collection.isEmptyPath(path)) {
            if (this.contents == null)
                return false;
            // @ts-expect-error Presumed impossible if Strict extends false
            this.contents = null;
            return true;
        }
        return assertCollection(this.contents)
            ? this.contents.deleteIn(path)
            : false;
    }
    /**
     * Returns item at `key`, or `undefined` if not found. By default unwraps
     * scalar values from their surrounding node; to disable set `keepScalar` to
     * `true` (collections are always returned intact).
     */
    get(key, keepScalar) {
        return identity.isCollection(this.contents)
            ? this.contents.get(key, keepScalar)
            : undefined;
    }
    /**
     * Returns item at `path`, or `undefined` if not found. By default unwraps
     * scalar values from their surrounding node; to disable set `keepScalar` to
     * `true` (collections are always returned intact).
     */
    getIn(path, keepScalar) {
        if (Collection.isEmptyPath(path))
            return !keepScalar && identity.isScalar(this.contents)
                ? this.contents.value
                : this.contents;
        return identity.isCollection(this.contents)
            ? this.contents.getIn(path, keepScalar)
            : undefined;
    }
    /**
     * Checks if the document includes a value with the key `key`.
     */
    has(key) {
        return identity.isCollection(this.contents) ? this.contents.has(key) : false;
    }
    /**
     * Checks if the document includes a value at `path`.
     */
    hasIn(path) {
        if (Collection.isEmptyPath(path))
            return this.contents !== undefined;
        return identity.isCollection(this.contents) ? this.contents.hasIn(path) : false;
    }
    /**
     * Sets a value in this document. For `!!set`, `value` needs to be a
     * boolean to add/remove the item from the set.
     */
    set(key, value) {
        if (this.contents == null) {
            // @ts-expect-error We can't really know that this matches Contents.
            this.contents = Collection.collectionFromPath(this.schema, [key], value);
        }
        else if (assertCollection(this.contents)) {
            this.contents.set(key, value);
        }
    }
    /**
     * Sets a value in this document. For `!!set`, `value` needs to be a
     * boolean to add/remove the item from the set.
     */
    setIn(path, value) {
        if (Collection.isEmptyPath(path)) {
            // @ts-expect-error We can't really know that this matches Contents.
            this.contents = value;
        }
        else if (this.contents == null) {
            // @ts-expect-error We can't really know that this matches Contents.
            this.contents = Collection.collectionFromPath(this.schema, Array.from(path), value);
        }
        else if (assertCollection(this.contents)) {
            this.contents.setIn(path, value);
        }
    }
    /**
     * Change the YAML version and schema used by the document.
     * A `null` version disables support for directives, explicit tags, anchors, and aliases.
     * It also requires the `schema` option to be given as a `Schema` instance value.
     *
     * Overrides all previously set schema options.
     */
    setSchema(version, options = {}) {
        if (typeof version === 'number')
            version = String(version);
        let opt;
        switch (version) {
            case '1.1':
                if (this.directives)
                    this.directives.yaml.version = '1.1';
                else
                    this.directives = new directives.Directives({ version: '1.1' });
                opt = { resolveKnownTags: false, schema: 'yaml-1.1' };
                break;
            case '1.2':
            case 'next':
                if (this.directives)
                    this.directives.yaml.version = version;
                else
                    this.directives = new directives.Directives({ version });
                opt = { resolveKnownTags: true, schema: 'core' };
                break;
            case null:
                if (this.directives)
                    delete this.directives;
                opt = null;
                break;
            default: {
                const sv = JSON.stringify(version);
                throw new Error(`Expected '1.1', '1.2' or null as first argument, but found: ${sv}`);
            }
        }
        // Not using `instanceof Schema` to allow for duck typing
        if (options.schema instanceof Object)
            this.schema = options.schema;
        else if (opt)
            this.schema = new Schema.Schema(Object.assign(opt, options));
        else
            throw new Error(`With a null YAML version, the { schema: Schema } option is required`);
    }
    // json & jsonArg are only used from toJSON()
    toJS({ json, jsonArg, mapAsMap, maxAliasCount, onAnchor, reviver } = {}) {
        const ctx = {
            anchors: new Map(),
            doc: this,
            keep: !json,
            mapAsMap: mapAsMap === true,
            mapKeyWarned: false,
            maxAliasCount: typeof maxAliasCount === 'number' ? maxAliasCount : 100
        };
        const res = toJS.toJS(this.contents, jsonArg ?? '', ctx);
        if (typeof onAnchor === 'function')
            for (const { count, res } of ctx.anchors.values())
                onAnchor(res, count);
        return typeof reviver === 'function'
            ? applyReviver.applyReviver(reviver, { '': res }, '', res)
            : res;
    }
    /**
     * A JSON representation of the document `contents`.
     *
     * @param jsonArg Used by `JSON.stringify` to indicate the array index or
     *   property name.
     */
    toJSON(jsonArg, onAnchor) {
        return this.toJS({ json: true, jsonArg, mapAsMap: false, onAnchor });
    }
    /** A YAML representation of the document. */
    toString(options = {}) {
        if (this.errors.length > 0)
            throw new Error('Document with errors cannot be stringified');
        if ('indent' in options &&
            (!Number.isInteger(options.indent) || Number(options.indent) <= 0)) {
            const s = JSON.stringify(options.indent);
            throw new Error(`"indent" option must be a positive integer, not ${s}`);
        }
        return stringifyDocument.stringifyDocument(this, options);
    }
}
function assertCollection(contents) {
    if (identity.isCollection(contents))
        return true;
    throw new Error('Expected a YAML collection as document contents');
}

exports.Document = Document;


/***/ }),

/***/ 1596:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var visit = __nccwpck_require__(204);

/**
 * Verify that the input string is a valid anchor.
 *
 * Will throw on errors.
 */
function anchorIsValid(anchor) {
    if (/[\x00-\x19\s,[\]{}]/.test(anchor)) {
        const sa = JSON.stringify(anchor);
        const msg = `Anchor must not contain whitespace or control characters: ${sa}`;
        throw new Error(msg);
    }
    return true;
}
function anchorNames(root) {
    const anchors = new Set();
    visit.visit(root, {
        Value(_key, node) {
            if (node.anchor)
                anchors.add(node.anchor);
        }
    });
    return anchors;
}
/** Find a new anchor name with the given `prefix` and a one-indexed suffix. */
function findNewAnchor(prefix, exclude) {
    for (let i = 1; true; ++i) {
        const name = `${prefix}${i}`;
        if (!exclude.has(name))
            return name;
    }
}
function createNodeAnchors(doc, prefix) {
    const aliasObjects = [];
    const sourceObjects = new Map();
    let prevAnchors = null;
    return {
        onAnchor: (source) => {
            aliasObjects.push(source);
            prevAnchors ?? (prevAnchors = anchorNames(doc));
            const anchor = findNewAnchor(prefix, prevAnchors);
            prevAnchors.add(anchor);
            return anchor;
        },
        /**
         * With circular references, the source node is only resolved after all
         * of its child nodes are. This is why anchors are set only after all of
         * the nodes have been created.
         */
        setAnchors: () => {
            for (const source of aliasObjects) {
                const ref = sourceObjects.get(source);
                if (typeof ref === 'object' &&
                    ref.anchor &&
                    (identity.isScalar(ref.node) || identity.isCollection(ref.node))) {
                    ref.node.anchor = ref.anchor;
                }
                else {
                    const error = new Error('Failed to resolve repeated object (this should not happen)');
                    error.source = source;
                    throw error;
                }
            }
        },
        sourceObjects
    };
}

exports.anchorIsValid = anchorIsValid;
exports.anchorNames = anchorNames;
exports.createNodeAnchors = createNodeAnchors;
exports.findNewAnchor = findNewAnchor;


/***/ }),

/***/ 3661:
/***/ ((__unused_webpack_module, exports) => {



/**
 * Applies the JSON.parse reviver algorithm as defined in the ECMA-262 spec,
 * in section 24.5.1.1 "Runtime Semantics: InternalizeJSONProperty" of the
 * 2021 edition: https://tc39.es/ecma262/#sec-json.parse
 *
 * Includes extensions for handling Map and Set objects.
 */
function applyReviver(reviver, obj, key, val) {
    if (val && typeof val === 'object') {
        if (Array.isArray(val)) {
            for (let i = 0, len = val.length; i < len; ++i) {
                const v0 = val[i];
                const v1 = applyReviver(reviver, val, String(i), v0);
                // eslint-disable-next-line @typescript-eslint/no-array-delete
                if (v1 === undefined)
                    delete val[i];
                else if (v1 !== v0)
                    val[i] = v1;
            }
        }
        else if (val instanceof Map) {
            for (const k of Array.from(val.keys())) {
                const v0 = val.get(k);
                const v1 = applyReviver(reviver, val, k, v0);
                if (v1 === undefined)
                    val.delete(k);
                else if (v1 !== v0)
                    val.set(k, v1);
            }
        }
        else if (val instanceof Set) {
            for (const v0 of Array.from(val)) {
                const v1 = applyReviver(reviver, val, v0, v0);
                if (v1 === undefined)
                    val.delete(v0);
                else if (v1 !== v0) {
                    val.delete(v0);
                    val.add(v1);
                }
            }
        }
        else {
            for (const [k, v0] of Object.entries(val)) {
                const v1 = applyReviver(reviver, val, k, v0);
                if (v1 === undefined)
                    delete val[k];
                else if (v1 !== v0)
                    val[k] = v1;
            }
        }
    }
    return reviver.call(obj, key, val);
}

exports.applyReviver = applyReviver;


/***/ }),

/***/ 2404:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Alias = __nccwpck_require__(4065);
var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);

const defaultTagPrefix = 'tag:yaml.org,2002:';
function findTagObject(value, tagName, tags) {
    if (tagName) {
        const match = tags.filter(t => t.tag === tagName);
        const tagObj = match.find(t => !t.format) ?? match[0];
        if (!tagObj)
            throw new Error(`Tag ${tagName} not found`);
        return tagObj;
    }
    return tags.find(t => t.identify?.(value) && !t.format);
}
function createNode(value, tagName, ctx) {
    if (identity.isDocument(value))
        value = value.contents;
    if (identity.isNode(value))
        return value;
    if (identity.isPair(value)) {
        const map = ctx.schema[identity.MAP].createNode?.(ctx.schema, null, ctx);
        map.items.push(value);
        return map;
    }
    if (value instanceof String ||
        value instanceof Number ||
        value instanceof Boolean ||
        (typeof BigInt !== 'undefined' && value instanceof BigInt) // not supported everywhere
    ) {
        // https://tc39.es/ecma262/#sec-serializejsonproperty
        value = value.valueOf();
    }
    const { aliasDuplicateObjects, onAnchor, onTagObj, schema, sourceObjects } = ctx;
    // Detect duplicate references to the same object & use Alias nodes for all
    // after first. The `ref` wrapper allows for circular references to resolve.
    let ref = undefined;
    if (aliasDuplicateObjects && value && typeof value === 'object') {
        ref = sourceObjects.get(value);
        if (ref) {
            ref.anchor ?? (ref.anchor = onAnchor(value));
            return new Alias.Alias(ref.anchor);
        }
        else {
            ref = { anchor: null, node: null };
            sourceObjects.set(value, ref);
        }
    }
    if (tagName?.startsWith('!!'))
        tagName = defaultTagPrefix + tagName.slice(2);
    let tagObj = findTagObject(value, tagName, schema.tags);
    if (!tagObj) {
        if (value && typeof value.toJSON === 'function') {
            // eslint-disable-next-line @typescript-eslint/no-unsafe-call
            value = value.toJSON();
        }
        if (!value || typeof value !== 'object') {
            const node = new Scalar.Scalar(value);
            if (ref)
                ref.node = node;
            return node;
        }
        tagObj =
            value instanceof Map
                ? schema[identity.MAP]
                : Symbol.iterator in Object(value)
                    ? schema[identity.SEQ]
                    : schema[identity.MAP];
    }
    if (onTagObj) {
        onTagObj(tagObj);
        delete ctx.onTagObj;
    }
    const node = tagObj?.createNode
        ? tagObj.createNode(ctx.schema, value, ctx)
        : typeof tagObj?.nodeClass?.from === 'function'
            ? tagObj.nodeClass.from(ctx.schema, value, ctx)
            : new Scalar.Scalar(value);
    if (tagName)
        node.tag = tagName;
    else if (!tagObj.default)
        node.tag = tagObj.tag;
    if (ref)
        ref.node = node;
    return node;
}

exports.createNode = createNode;


/***/ }),

/***/ 1342:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var visit = __nccwpck_require__(204);

const escapeChars = {
    '!': '%21',
    ',': '%2C',
    '[': '%5B',
    ']': '%5D',
    '{': '%7B',
    '}': '%7D'
};
const escapeTagName = (tn) => tn.replace(/[!,[\]{}]/g, ch => escapeChars[ch]);
class Directives {
    constructor(yaml, tags) {
        /**
         * The directives-end/doc-start marker `---`. If `null`, a marker may still be
         * included in the document's stringified representation.
         */
        this.docStart = null;
        /** The doc-end marker `...`.  */
        this.docEnd = false;
        this.yaml = Object.assign({}, Directives.defaultYaml, yaml);
        this.tags = Object.assign({}, Directives.defaultTags, tags);
    }
    clone() {
        const copy = new Directives(this.yaml, this.tags);
        copy.docStart = this.docStart;
        return copy;
    }
    /**
     * During parsing, get a Directives instance for the current document and
     * update the stream state according to the current version's spec.
     */
    atDocument() {
        const res = new Directives(this.yaml, this.tags);
        switch (this.yaml.version) {
            case '1.1':
                this.atNextDocument = true;
                break;
            case '1.2':
                this.atNextDocument = false;
                this.yaml = {
                    explicit: Directives.defaultYaml.explicit,
                    version: '1.2'
                };
                this.tags = Object.assign({}, Directives.defaultTags);
                break;
        }
        return res;
    }
    /**
     * @param onError - May be called even if the action was successful
     * @returns `true` on success
     */
    add(line, onError) {
        if (this.atNextDocument) {
            this.yaml = { explicit: Directives.defaultYaml.explicit, version: '1.1' };
            this.tags = Object.assign({}, Directives.defaultTags);
            this.atNextDocument = false;
        }
        const parts = line.trim().split(/[ \t]+/);
        const name = parts.shift();
        switch (name) {
            case '%TAG': {
                if (parts.length !== 2) {
                    onError(0, '%TAG directive should contain exactly two parts');
                    if (parts.length < 2)
                        return false;
                }
                const [handle, prefix] = parts;
                this.tags[handle] = prefix;
                return true;
            }
            case '%YAML': {
                this.yaml.explicit = true;
                if (parts.length !== 1) {
                    onError(0, '%YAML directive should contain exactly one part');
                    return false;
                }
                const [version] = parts;
                if (version === '1.1' || version === '1.2') {
                    this.yaml.version = version;
                    return true;
                }
                else {
                    const isValid = /^\d+\.\d+$/.test(version);
                    onError(6, `Unsupported YAML version ${version}`, isValid);
                    return false;
                }
            }
            default:
                onError(0, `Unknown directive ${name}`, true);
                return false;
        }
    }
    /**
     * Resolves a tag, matching handles to those defined in %TAG directives.
     *
     * @returns Resolved tag, which may also be the non-specific tag `'!'` or a
     *   `'!local'` tag, or `null` if unresolvable.
     */
    tagName(source, onError) {
        if (source === '!')
            return '!'; // non-specific tag
        if (source[0] !== '!') {
            onError(`Not a valid tag: ${source}`);
            return null;
        }
        if (source[1] === '<') {
            const verbatim = source.slice(2, -1);
            if (verbatim === '!' || verbatim === '!!') {
                onError(`Verbatim tags aren't resolved, so ${source} is invalid.`);
                return null;
            }
            if (source[source.length - 1] !== '>')
                onError('Verbatim tags must end with a >');
            return verbatim;
        }
        const [, handle, suffix] = source.match(/^(.*!)([^!]*)$/s);
        if (!suffix)
            onError(`The ${source} tag has no suffix`);
        const prefix = this.tags[handle];
        if (prefix) {
            try {
                return prefix + decodeURIComponent(suffix);
            }
            catch (error) {
                onError(String(error));
                return null;
            }
        }
        if (handle === '!')
            return source; // local tag
        onError(`Could not resolve tag: ${source}`);
        return null;
    }
    /**
     * Given a fully resolved tag, returns its printable string form,
     * taking into account current tag prefixes and defaults.
     */
    tagString(tag) {
        for (const [handle, prefix] of Object.entries(this.tags)) {
            if (tag.startsWith(prefix))
                return handle + escapeTagName(tag.substring(prefix.length));
        }
        return tag[0] === '!' ? tag : `!<${tag}>`;
    }
    toString(doc) {
        const lines = this.yaml.explicit
            ? [`%YAML ${this.yaml.version || '1.2'}`]
            : [];
        const tagEntries = Object.entries(this.tags);
        let tagNames;
        if (doc && tagEntries.length > 0 && identity.isNode(doc.contents)) {
            const tags = {};
            visit.visit(doc.contents, (_key, node) => {
                if (identity.isNode(node) && node.tag)
                    tags[node.tag] = true;
            });
            tagNames = Object.keys(tags);
        }
        else
            tagNames = [];
        for (const [handle, prefix] of tagEntries) {
            if (handle === '!!' && prefix === 'tag:yaml.org,2002:')
                continue;
            if (!doc || tagNames.some(tn => tn.startsWith(prefix)))
                lines.push(`%TAG ${handle} ${prefix}`);
        }
        return lines.join('\n');
    }
}
Directives.defaultYaml = { explicit: false, version: '1.2' };
Directives.defaultTags = { '!!': 'tag:yaml.org,2002:' };

exports.Directives = Directives;


/***/ }),

/***/ 1464:
/***/ ((__unused_webpack_module, exports) => {



class YAMLError extends Error {
    constructor(name, pos, code, message) {
        super();
        this.name = name;
        this.code = code;
        this.message = message;
        this.pos = pos;
    }
}
class YAMLParseError extends YAMLError {
    constructor(pos, code, message) {
        super('YAMLParseError', pos, code, message);
    }
}
class YAMLWarning extends YAMLError {
    constructor(pos, code, message) {
        super('YAMLWarning', pos, code, message);
    }
}
const prettifyError = (src, lc) => (error) => {
    if (error.pos[0] === -1)
        return;
    error.linePos = error.pos.map(pos => lc.linePos(pos));
    const { line, col } = error.linePos[0];
    error.message += ` at line ${line}, column ${col}`;
    let ci = col - 1;
    let lineStr = src
        .substring(lc.lineStarts[line - 1], lc.lineStarts[line])
        .replace(/[\n\r]+$/, '');
    // Trim to max 80 chars, keeping col position near the middle
    if (ci >= 60 && lineStr.length > 80) {
        const trimStart = Math.min(ci - 39, lineStr.length - 79);
        lineStr = '…' + lineStr.substring(trimStart);
        ci -= trimStart - 1;
    }
    if (lineStr.length > 80)
        lineStr = lineStr.substring(0, 79) + '…';
    // Include previous line in context if pointing at line start
    if (line > 1 && /^ *$/.test(lineStr.substring(0, ci))) {
        // Regexp won't match if start is trimmed
        let prev = src.substring(lc.lineStarts[line - 2], lc.lineStarts[line - 1]);
        if (prev.length > 80)
            prev = prev.substring(0, 79) + '…\n';
        lineStr = prev + lineStr;
    }
    if (/[^ ]/.test(lineStr)) {
        let count = 1;
        const end = error.linePos[1];
        if (end?.line === line && end.col > col) {
            count = Math.max(1, Math.min(end.col - col, 80 - ci));
        }
        const pointer = ' '.repeat(ci) + '^'.repeat(count);
        error.message += `:\n\n${lineStr}\n${pointer}\n`;
    }
};

exports.YAMLError = YAMLError;
exports.YAMLParseError = YAMLParseError;
exports.YAMLWarning = YAMLWarning;
exports.prettifyError = prettifyError;


/***/ }),

/***/ 8815:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {

var __webpack_unused_export__;


var composer = __nccwpck_require__(9984);
var Document = __nccwpck_require__(3021);
var Schema = __nccwpck_require__(5840);
var errors = __nccwpck_require__(1464);
var Alias = __nccwpck_require__(4065);
var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var Scalar = __nccwpck_require__(3301);
var YAMLMap = __nccwpck_require__(4454);
var YAMLSeq = __nccwpck_require__(2223);
var cst = __nccwpck_require__(3461);
var lexer = __nccwpck_require__(361);
var lineCounter = __nccwpck_require__(6628);
var parser = __nccwpck_require__(3456);
var publicApi = __nccwpck_require__(4047);
var visit = __nccwpck_require__(204);



__webpack_unused_export__ = composer.Composer;
__webpack_unused_export__ = Document.Document;
__webpack_unused_export__ = Schema.Schema;
__webpack_unused_export__ = errors.YAMLError;
__webpack_unused_export__ = errors.YAMLParseError;
__webpack_unused_export__ = errors.YAMLWarning;
__webpack_unused_export__ = Alias.Alias;
exports.Vj = identity.isAlias;
__webpack_unused_export__ = identity.isCollection;
__webpack_unused_export__ = identity.isDocument;
exports.jh = identity.isMap;
__webpack_unused_export__ = identity.isNode;
__webpack_unused_export__ = identity.isPair;
exports.jn = identity.isScalar;
exports.oP = identity.isSeq;
__webpack_unused_export__ = Pair.Pair;
__webpack_unused_export__ = Scalar.Scalar;
__webpack_unused_export__ = YAMLMap.YAMLMap;
__webpack_unused_export__ = YAMLSeq.YAMLSeq;
__webpack_unused_export__ = cst;
__webpack_unused_export__ = lexer.Lexer;
exports.HN = lineCounter.LineCounter;
__webpack_unused_export__ = parser.Parser;
__webpack_unused_export__ = publicApi.parse;
__webpack_unused_export__ = publicApi.parseAllDocuments;
exports.Tp = publicApi.parseDocument;
__webpack_unused_export__ = publicApi.stringify;
exports.YR = visit.visit;
__webpack_unused_export__ = visit.visitAsync;


/***/ }),

/***/ 7249:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var node_process = __nccwpck_require__(932);

function debug(logLevel, ...messages) {
    if (logLevel === 'debug')
        console.log(...messages);
}
function warn(logLevel, warning) {
    if (logLevel === 'debug' || logLevel === 'warn') {
        if (typeof node_process.emitWarning === 'function')
            node_process.emitWarning(warning);
        else
            console.warn(warning);
    }
}

exports.debug = debug;
exports.warn = warn;


/***/ }),

/***/ 4065:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var anchors = __nccwpck_require__(1596);
var visit = __nccwpck_require__(204);
var identity = __nccwpck_require__(1127);
var Node = __nccwpck_require__(6673);
var toJS = __nccwpck_require__(4043);

class Alias extends Node.NodeBase {
    constructor(source) {
        super(identity.ALIAS);
        this.source = source;
        Object.defineProperty(this, 'tag', {
            set() {
                throw new Error('Alias nodes cannot have tags');
            }
        });
    }
    /**
     * Resolve the value of this alias within `doc`, finding the last
     * instance of the `source` anchor before this node.
     */
    resolve(doc, ctx) {
        if (ctx?.maxAliasCount === 0)
            throw new ReferenceError('Alias resolution is disabled');
        let nodes;
        if (ctx?.aliasResolveCache) {
            nodes = ctx.aliasResolveCache;
        }
        else {
            nodes = [];
            visit.visit(doc, {
                Node: (_key, node) => {
                    if (identity.isAlias(node) || identity.hasAnchor(node))
                        nodes.push(node);
                }
            });
            if (ctx)
                ctx.aliasResolveCache = nodes;
        }
        let found = undefined;
        for (const node of nodes) {
            if (node === this)
                break;
            if (node.anchor === this.source)
                found = node;
        }
        if (found && ctx) {
            const { anchors, doc, maxAliasCount } = ctx;
            let data = anchors.get(found);
            if (!data) {
                // Resolve anchors for Node.prototype.toJS()
                toJS.toJS(found, null, ctx);
                data = anchors.get(found);
            }
            /* istanbul ignore if */
            if (data?.res === undefined) {
                const msg = 'This should not happen: Alias anchor was not resolved?';
                throw new ReferenceError(msg);
            }
            if (maxAliasCount >= 0) {
                data.count += 1;
                if (data.aliasCount === 0)
                    data.aliasCount = getAliasCount(doc, found, anchors);
                if (data.count * data.aliasCount > maxAliasCount) {
                    const msg = 'Excessive alias count indicates a resource exhaustion attack';
                    throw new ReferenceError(msg);
                }
            }
        }
        return found;
    }
    toJSON(_arg, ctx) {
        if (!ctx)
            return { source: this.source };
        const source = this.resolve(ctx.doc, ctx);
        if (!source) {
            const msg = `Unresolved alias (the anchor must be set before the alias): ${this.source}`;
            throw new ReferenceError(msg);
        }
        return ctx.anchors.get(source).res;
    }
    toString(ctx, _onComment, _onChompKeep) {
        const src = `*${this.source}`;
        if (ctx) {
            anchors.anchorIsValid(this.source);
            if (ctx.options.verifyAliasOrder && !ctx.anchors.has(this.source)) {
                const msg = `Unresolved alias (the anchor must be set before the alias): ${this.source}`;
                throw new Error(msg);
            }
            if (ctx.implicitKey)
                return `${src} `;
        }
        return src;
    }
}
function getAliasCount(doc, node, anchors) {
    if (identity.isAlias(node)) {
        const source = node.resolve(doc);
        const anchor = anchors && source && anchors.get(source);
        return anchor ? anchor.count * anchor.aliasCount : 0;
    }
    else if (identity.isCollection(node)) {
        let count = 0;
        for (const item of node.items) {
            const c = getAliasCount(doc, item, anchors);
            if (c > count)
                count = c;
        }
        return count;
    }
    else if (identity.isPair(node)) {
        const kc = getAliasCount(doc, node.key, anchors);
        const vc = getAliasCount(doc, node.value, anchors);
        return Math.max(kc, vc);
    }
    return 1;
}

exports.Alias = Alias;


/***/ }),

/***/ 101:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var createNode = __nccwpck_require__(2404);
var identity = __nccwpck_require__(1127);
var Node = __nccwpck_require__(6673);

function collectionFromPath(schema, path, value) {
    let v = value;
    for (let i = path.length - 1; i >= 0; --i) {
        const k = path[i];
        if (typeof k === 'number' && Number.isInteger(k) && k >= 0) {
            const a = [];
            a[k] = v;
            v = a;
        }
        else {
            v = new Map([[k, v]]);
        }
    }
    return createNode.createNode(v, undefined, {
        aliasDuplicateObjects: false,
        keepUndefined: false,
        onAnchor: () => {
            throw new Error('This should not happen, please report a bug.');
        },
        schema,
        sourceObjects: new Map()
    });
}
// Type guard is intentionally a little wrong so as to be more useful,
// as it does not cover untypable empty non-string iterables (e.g. []).
const isEmptyPath = (path) => path == null ||
    (typeof path === 'object' && !!path[Symbol.iterator]().next().done);
class Collection extends Node.NodeBase {
    constructor(type, schema) {
        super(type);
        Object.defineProperty(this, 'schema', {
            value: schema,
            configurable: true,
            enumerable: false,
            writable: true
        });
    }
    /**
     * Create a copy of this collection.
     *
     * @param schema - If defined, overwrites the original's schema
     */
    clone(schema) {
        const copy = Object.create(Object.getPrototypeOf(this), Object.getOwnPropertyDescriptors(this));
        if (schema)
            copy.schema = schema;
        copy.items = copy.items.map(it => identity.isNode(it) || identity.isPair(it) ? it.clone(schema) : it);
        if (this.range)
            copy.range = this.range.slice();
        return copy;
    }
    /**
     * Adds a value to the collection. For `!!map` and `!!omap` the value must
     * be a Pair instance or a `{ key, value }` object, which may not have a key
     * that already exists in the map.
     */
    addIn(path, value) {
        if (isEmptyPath(path))
            this.add(value);
        else {
            const [key, ...rest] = path;
            const node = this.get(key, true);
            if (identity.isCollection(node))
                node.addIn(rest, value);
            else if (node === undefined && this.schema)
                this.set(key, collectionFromPath(this.schema, rest, value));
            else
                throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
        }
    }
    /**
     * Removes a value from the collection.
     * @returns `true` if the item was found and removed.
     */
    deleteIn(path) {
        const [key, ...rest] = path;
        if (rest.length === 0)
            return this.delete(key);
        const node = this.get(key, true);
        if (identity.isCollection(node))
            return node.deleteIn(rest);
        else
            throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
    }
    /**
     * Returns item at `key`, or `undefined` if not found. By default unwraps
     * scalar values from their surrounding node; to disable set `keepScalar` to
     * `true` (collections are always returned intact).
     */
    getIn(path, keepScalar) {
        const [key, ...rest] = path;
        const node = this.get(key, true);
        if (rest.length === 0)
            return !keepScalar && identity.isScalar(node) ? node.value : node;
        else
            return identity.isCollection(node) ? node.getIn(rest, keepScalar) : undefined;
    }
    hasAllNullValues(allowScalar) {
        return this.items.every(node => {
            if (!identity.isPair(node))
                return false;
            const n = node.value;
            return (n == null ||
                (allowScalar &&
                    identity.isScalar(n) &&
                    n.value == null &&
                    !n.commentBefore &&
                    !n.comment &&
                    !n.tag));
        });
    }
    /**
     * Checks if the collection includes a value with the key `key`.
     */
    hasIn(path) {
        const [key, ...rest] = path;
        if (rest.length === 0)
            return this.has(key);
        const node = this.get(key, true);
        return identity.isCollection(node) ? node.hasIn(rest) : false;
    }
    /**
     * Sets a value in this collection. For `!!set`, `value` needs to be a
     * boolean to add/remove the item from the set.
     */
    setIn(path, value) {
        const [key, ...rest] = path;
        if (rest.length === 0) {
            this.set(key, value);
        }
        else {
            const node = this.get(key, true);
            if (identity.isCollection(node))
                node.setIn(rest, value);
            else if (node === undefined && this.schema)
                this.set(key, collectionFromPath(this.schema, rest, value));
            else
                throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
        }
    }
}

exports.Collection = Collection;
exports.collectionFromPath = collectionFromPath;
exports.isEmptyPath = isEmptyPath;


/***/ }),

/***/ 6673:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var applyReviver = __nccwpck_require__(3661);
var identity = __nccwpck_require__(1127);
var toJS = __nccwpck_require__(4043);

class NodeBase {
    constructor(type) {
        Object.defineProperty(this, identity.NODE_TYPE, { value: type });
    }
    /** Create a copy of this node.  */
    clone() {
        const copy = Object.create(Object.getPrototypeOf(this), Object.getOwnPropertyDescriptors(this));
        if (this.range)
            copy.range = this.range.slice();
        return copy;
    }
    /** A plain JavaScript representation of this node. */
    toJS(doc, { mapAsMap, maxAliasCount, onAnchor, reviver } = {}) {
        if (!identity.isDocument(doc))
            throw new TypeError('A document argument is required');
        const ctx = {
            anchors: new Map(),
            doc,
            keep: true,
            mapAsMap: mapAsMap === true,
            mapKeyWarned: false,
            maxAliasCount: typeof maxAliasCount === 'number' ? maxAliasCount : 100
        };
        const res = toJS.toJS(this, '', ctx);
        if (typeof onAnchor === 'function')
            for (const { count, res } of ctx.anchors.values())
                onAnchor(res, count);
        return typeof reviver === 'function'
            ? applyReviver.applyReviver(reviver, { '': res }, '', res)
            : res;
    }
}

exports.NodeBase = NodeBase;


/***/ }),

/***/ 7165:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var createNode = __nccwpck_require__(2404);
var stringifyPair = __nccwpck_require__(9748);
var addPairToJSMap = __nccwpck_require__(7104);
var identity = __nccwpck_require__(1127);

function createPair(key, value, ctx) {
    const k = createNode.createNode(key, undefined, ctx);
    const v = createNode.createNode(value, undefined, ctx);
    return new Pair(k, v);
}
class Pair {
    constructor(key, value = null) {
        Object.defineProperty(this, identity.NODE_TYPE, { value: identity.PAIR });
        this.key = key;
        this.value = value;
    }
    clone(schema) {
        let { key, value } = this;
        if (identity.isNode(key))
            key = key.clone(schema);
        if (identity.isNode(value))
            value = value.clone(schema);
        return new Pair(key, value);
    }
    toJSON(_, ctx) {
        const pair = ctx?.mapAsMap ? new Map() : {};
        return addPairToJSMap.addPairToJSMap(ctx, pair, this);
    }
    toString(ctx, onComment, onChompKeep) {
        return ctx?.doc
            ? stringifyPair.stringifyPair(this, ctx, onComment, onChompKeep)
            : JSON.stringify(this);
    }
}

exports.Pair = Pair;
exports.createPair = createPair;


/***/ }),

/***/ 3301:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Node = __nccwpck_require__(6673);
var toJS = __nccwpck_require__(4043);

const isScalarValue = (value) => !value || (typeof value !== 'function' && typeof value !== 'object');
class Scalar extends Node.NodeBase {
    constructor(value) {
        super(identity.SCALAR);
        this.value = value;
    }
    toJSON(arg, ctx) {
        return ctx?.keep ? this.value : toJS.toJS(this.value, arg, ctx);
    }
    toString() {
        return String(this.value);
    }
}
Scalar.BLOCK_FOLDED = 'BLOCK_FOLDED';
Scalar.BLOCK_LITERAL = 'BLOCK_LITERAL';
Scalar.PLAIN = 'PLAIN';
Scalar.QUOTE_DOUBLE = 'QUOTE_DOUBLE';
Scalar.QUOTE_SINGLE = 'QUOTE_SINGLE';

exports.Scalar = Scalar;
exports.isScalarValue = isScalarValue;


/***/ }),

/***/ 4454:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyCollection = __nccwpck_require__(1212);
var addPairToJSMap = __nccwpck_require__(7104);
var Collection = __nccwpck_require__(101);
var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var Scalar = __nccwpck_require__(3301);

function findPair(items, key) {
    const k = identity.isScalar(key) ? key.value : key;
    for (const it of items) {
        if (identity.isPair(it)) {
            if (it.key === key || it.key === k)
                return it;
            if (identity.isScalar(it.key) && it.key.value === k)
                return it;
        }
    }
    return undefined;
}
class YAMLMap extends Collection.Collection {
    static get tagName() {
        return 'tag:yaml.org,2002:map';
    }
    constructor(schema) {
        super(identity.MAP, schema);
        this.items = [];
    }
    /**
     * A generic collection parsing method that can be extended
     * to other node classes that inherit from YAMLMap
     */
    static from(schema, obj, ctx) {
        const { keepUndefined, replacer } = ctx;
        const map = new this(schema);
        const add = (key, value) => {
            if (typeof replacer === 'function')
                value = replacer.call(obj, key, value);
            else if (Array.isArray(replacer) && !replacer.includes(key))
                return;
            if (value !== undefined || keepUndefined)
                map.items.push(Pair.createPair(key, value, ctx));
        };
        if (obj instanceof Map) {
            for (const [key, value] of obj)
                add(key, value);
        }
        else if (obj && typeof obj === 'object') {
            for (const key of Object.keys(obj))
                add(key, obj[key]);
        }
        if (typeof schema.sortMapEntries === 'function') {
            map.items.sort(schema.sortMapEntries);
        }
        return map;
    }
    /**
     * Adds a value to the collection.
     *
     * @param overwrite - If not set `true`, using a key that is already in the
     *   collection will throw. Otherwise, overwrites the previous value.
     */
    add(pair, overwrite) {
        let _pair;
        if (identity.isPair(pair))
            _pair = pair;
        else if (!pair || typeof pair !== 'object' || !('key' in pair)) {
            // In TypeScript, this never happens.
            _pair = new Pair.Pair(pair, pair?.value);
        }
        else
            _pair = new Pair.Pair(pair.key, pair.value);
        const prev = findPair(this.items, _pair.key);
        const sortEntries = this.schema?.sortMapEntries;
        if (prev) {
            if (!overwrite)
                throw new Error(`Key ${_pair.key} already set`);
            // For scalars, keep the old node & its comments and anchors
            if (identity.isScalar(prev.value) && Scalar.isScalarValue(_pair.value))
                prev.value.value = _pair.value;
            else
                prev.value = _pair.value;
        }
        else if (sortEntries) {
            const i = this.items.findIndex(item => sortEntries(_pair, item) < 0);
            if (i === -1)
                this.items.push(_pair);
            else
                this.items.splice(i, 0, _pair);
        }
        else {
            this.items.push(_pair);
        }
    }
    delete(key) {
        const it = findPair(this.items, key);
        if (!it)
            return false;
        const del = this.items.splice(this.items.indexOf(it), 1);
        return del.length > 0;
    }
    get(key, keepScalar) {
        const it = findPair(this.items, key);
        const node = it?.value;
        return (!keepScalar && identity.isScalar(node) ? node.value : node) ?? undefined;
    }
    has(key) {
        return !!findPair(this.items, key);
    }
    set(key, value) {
        this.add(new Pair.Pair(key, value), true);
    }
    /**
     * @param ctx - Conversion context, originally set in Document#toJS()
     * @param {Class} Type - If set, forces the returned collection type
     * @returns Instance of Type, Map, or Object
     */
    toJSON(_, ctx, Type) {
        const map = Type ? new Type() : ctx?.mapAsMap ? new Map() : {};
        if (ctx?.onCreate)
            ctx.onCreate(map);
        for (const item of this.items)
            addPairToJSMap.addPairToJSMap(ctx, map, item);
        return map;
    }
    toString(ctx, onComment, onChompKeep) {
        if (!ctx)
            return JSON.stringify(this);
        for (const item of this.items) {
            if (!identity.isPair(item))
                throw new Error(`Map items must all be pairs; found ${JSON.stringify(item)} instead`);
        }
        if (!ctx.allNullValues && this.hasAllNullValues(false))
            ctx = Object.assign({}, ctx, { allNullValues: true });
        return stringifyCollection.stringifyCollection(this, ctx, {
            blockItemPrefix: '',
            flowChars: { start: '{', end: '}' },
            itemIndent: ctx.indent || '',
            onChompKeep,
            onComment
        });
    }
}

exports.YAMLMap = YAMLMap;
exports.findPair = findPair;


/***/ }),

/***/ 2223:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var createNode = __nccwpck_require__(2404);
var stringifyCollection = __nccwpck_require__(1212);
var Collection = __nccwpck_require__(101);
var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);
var toJS = __nccwpck_require__(4043);

class YAMLSeq extends Collection.Collection {
    static get tagName() {
        return 'tag:yaml.org,2002:seq';
    }
    constructor(schema) {
        super(identity.SEQ, schema);
        this.items = [];
    }
    add(value) {
        this.items.push(value);
    }
    /**
     * Removes a value from the collection.
     *
     * `key` must contain a representation of an integer for this to succeed.
     * It may be wrapped in a `Scalar`.
     *
     * @returns `true` if the item was found and removed.
     */
    delete(key) {
        const idx = asItemIndex(key);
        if (typeof idx !== 'number')
            return false;
        const del = this.items.splice(idx, 1);
        return del.length > 0;
    }
    get(key, keepScalar) {
        const idx = asItemIndex(key);
        if (typeof idx !== 'number')
            return undefined;
        const it = this.items[idx];
        return !keepScalar && identity.isScalar(it) ? it.value : it;
    }
    /**
     * Checks if the collection includes a value with the key `key`.
     *
     * `key` must contain a representation of an integer for this to succeed.
     * It may be wrapped in a `Scalar`.
     */
    has(key) {
        const idx = asItemIndex(key);
        return typeof idx === 'number' && idx < this.items.length;
    }
    /**
     * Sets a value in this collection. For `!!set`, `value` needs to be a
     * boolean to add/remove the item from the set.
     *
     * If `key` does not contain a representation of an integer, this will throw.
     * It may be wrapped in a `Scalar`.
     */
    set(key, value) {
        const idx = asItemIndex(key);
        if (typeof idx !== 'number')
            throw new Error(`Expected a valid index, not ${key}.`);
        const prev = this.items[idx];
        if (identity.isScalar(prev) && Scalar.isScalarValue(value))
            prev.value = value;
        else
            this.items[idx] = value;
    }
    toJSON(_, ctx) {
        const seq = [];
        if (ctx?.onCreate)
            ctx.onCreate(seq);
        let i = 0;
        for (const item of this.items)
            seq.push(toJS.toJS(item, String(i++), ctx));
        return seq;
    }
    toString(ctx, onComment, onChompKeep) {
        if (!ctx)
            return JSON.stringify(this);
        return stringifyCollection.stringifyCollection(this, ctx, {
            blockItemPrefix: '- ',
            flowChars: { start: '[', end: ']' },
            itemIndent: (ctx.indent || '') + '  ',
            onChompKeep,
            onComment
        });
    }
    static from(schema, obj, ctx) {
        const { replacer } = ctx;
        const seq = new this(schema);
        if (obj && Symbol.iterator in Object(obj)) {
            let i = 0;
            for (let it of obj) {
                if (typeof replacer === 'function') {
                    const key = obj instanceof Set ? it : String(i++);
                    it = replacer.call(obj, key, it);
                }
                seq.items.push(createNode.createNode(it, undefined, ctx));
            }
        }
        return seq;
    }
}
function asItemIndex(key) {
    let idx = identity.isScalar(key) ? key.value : key;
    if (idx && typeof idx === 'string')
        idx = Number(idx);
    return typeof idx === 'number' && Number.isInteger(idx) && idx >= 0
        ? idx
        : null;
}

exports.YAMLSeq = YAMLSeq;


/***/ }),

/***/ 7104:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var log = __nccwpck_require__(7249);
var merge = __nccwpck_require__(452);
var stringify = __nccwpck_require__(2148);
var identity = __nccwpck_require__(1127);
var toJS = __nccwpck_require__(4043);

function addPairToJSMap(ctx, map, { key, value }) {
    if (identity.isNode(key) && key.addToJSMap)
        key.addToJSMap(ctx, map, value);
    // TODO: Should drop this special case for bare << handling
    else if (merge.isMergeKey(ctx, key))
        merge.addMergeToJSMap(ctx, map, value);
    else {
        const jsKey = toJS.toJS(key, '', ctx);
        if (map instanceof Map) {
            map.set(jsKey, toJS.toJS(value, jsKey, ctx));
        }
        else if (map instanceof Set) {
            map.add(jsKey);
        }
        else {
            const stringKey = stringifyKey(key, jsKey, ctx);
            const jsValue = toJS.toJS(value, stringKey, ctx);
            if (stringKey in map)
                Object.defineProperty(map, stringKey, {
                    value: jsValue,
                    writable: true,
                    enumerable: true,
                    configurable: true
                });
            else
                map[stringKey] = jsValue;
        }
    }
    return map;
}
function stringifyKey(key, jsKey, ctx) {
    if (jsKey === null)
        return '';
    // eslint-disable-next-line @typescript-eslint/no-base-to-string
    if (typeof jsKey !== 'object')
        return String(jsKey);
    if (identity.isNode(key) && ctx?.doc) {
        const strCtx = stringify.createStringifyContext(ctx.doc, {});
        strCtx.anchors = new Set();
        for (const node of ctx.anchors.keys())
            strCtx.anchors.add(node.anchor);
        strCtx.inFlow = true;
        strCtx.inStringifyKey = true;
        const strKey = key.toString(strCtx);
        if (!ctx.mapKeyWarned) {
            let jsonStr = JSON.stringify(strKey);
            if (jsonStr.length > 40)
                jsonStr = jsonStr.substring(0, 36) + '..."';
            log.warn(ctx.doc.options.logLevel, `Keys with collection values will be stringified due to JS Object restrictions: ${jsonStr}. Set mapAsMap: true to use object keys.`);
            ctx.mapKeyWarned = true;
        }
        return strKey;
    }
    return JSON.stringify(jsKey);
}

exports.addPairToJSMap = addPairToJSMap;


/***/ }),

/***/ 1127:
/***/ ((__unused_webpack_module, exports) => {



const ALIAS = Symbol.for('yaml.alias');
const DOC = Symbol.for('yaml.document');
const MAP = Symbol.for('yaml.map');
const PAIR = Symbol.for('yaml.pair');
const SCALAR = Symbol.for('yaml.scalar');
const SEQ = Symbol.for('yaml.seq');
const NODE_TYPE = Symbol.for('yaml.node.type');
const isAlias = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === ALIAS;
const isDocument = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === DOC;
const isMap = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === MAP;
const isPair = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === PAIR;
const isScalar = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === SCALAR;
const isSeq = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === SEQ;
function isCollection(node) {
    if (node && typeof node === 'object')
        switch (node[NODE_TYPE]) {
            case MAP:
            case SEQ:
                return true;
        }
    return false;
}
function isNode(node) {
    if (node && typeof node === 'object')
        switch (node[NODE_TYPE]) {
            case ALIAS:
            case MAP:
            case SCALAR:
            case SEQ:
                return true;
        }
    return false;
}
const hasAnchor = (node) => (isScalar(node) || isCollection(node)) && !!node.anchor;

exports.ALIAS = ALIAS;
exports.DOC = DOC;
exports.MAP = MAP;
exports.NODE_TYPE = NODE_TYPE;
exports.PAIR = PAIR;
exports.SCALAR = SCALAR;
exports.SEQ = SEQ;
exports.hasAnchor = hasAnchor;
exports.isAlias = isAlias;
exports.isCollection = isCollection;
exports.isDocument = isDocument;
exports.isMap = isMap;
exports.isNode = isNode;
exports.isPair = isPair;
exports.isScalar = isScalar;
exports.isSeq = isSeq;


/***/ }),

/***/ 4043:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);

/**
 * Recursively convert any node or its contents to native JavaScript
 *
 * @param value - The input value
 * @param arg - If `value` defines a `toJSON()` method, use this
 *   as its first argument
 * @param ctx - Conversion context, originally set in Document#toJS(). If
 *   `{ keep: true }` is not set, output should be suitable for JSON
 *   stringification.
 */
function toJS(value, arg, ctx) {
    // eslint-disable-next-line @typescript-eslint/no-unsafe-return
    if (Array.isArray(value))
        return value.map((v, i) => toJS(v, String(i), ctx));
    if (value && typeof value.toJSON === 'function') {
        // eslint-disable-next-line @typescript-eslint/no-unsafe-call
        if (!ctx || !identity.hasAnchor(value))
            return value.toJSON(arg, ctx);
        const data = { aliasCount: 0, count: 1, res: undefined };
        ctx.anchors.set(value, data);
        ctx.onCreate = res => {
            data.res = res;
            delete ctx.onCreate;
        };
        const res = value.toJSON(arg, ctx);
        if (ctx.onCreate)
            ctx.onCreate(res);
        return res;
    }
    if (typeof value === 'bigint' && !ctx?.keep)
        return Number(value);
    return value;
}

exports.toJS = toJS;


/***/ }),

/***/ 110:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var resolveBlockScalar = __nccwpck_require__(8913);
var resolveFlowScalar = __nccwpck_require__(6842);
var errors = __nccwpck_require__(1464);
var stringifyString = __nccwpck_require__(3069);

function resolveAsScalar(token, strict = true, onError) {
    if (token) {
        const _onError = (pos, code, message) => {
            const offset = typeof pos === 'number' ? pos : Array.isArray(pos) ? pos[0] : pos.offset;
            if (onError)
                onError(offset, code, message);
            else
                throw new errors.YAMLParseError([offset, offset + 1], code, message);
        };
        switch (token.type) {
            case 'scalar':
            case 'single-quoted-scalar':
            case 'double-quoted-scalar':
                return resolveFlowScalar.resolveFlowScalar(token, strict, _onError);
            case 'block-scalar':
                return resolveBlockScalar.resolveBlockScalar({ options: { strict } }, token, _onError);
        }
    }
    return null;
}
/**
 * Create a new scalar token with `value`
 *
 * Values that represent an actual string but may be parsed as a different type should use a `type` other than `'PLAIN'`,
 * as this function does not support any schema operations and won't check for such conflicts.
 *
 * @param value The string representation of the value, which will have its content properly indented.
 * @param context.end Comments and whitespace after the end of the value, or after the block scalar header. If undefined, a newline will be added.
 * @param context.implicitKey Being within an implicit key may affect the resolved type of the token's value.
 * @param context.indent The indent level of the token.
 * @param context.inFlow Is this scalar within a flow collection? This may affect the resolved type of the token's value.
 * @param context.offset The offset position of the token.
 * @param context.type The preferred type of the scalar token. If undefined, the previous type of the `token` will be used, defaulting to `'PLAIN'`.
 */
function createScalarToken(value, context) {
    const { implicitKey = false, indent, inFlow = false, offset = -1, type = 'PLAIN' } = context;
    const source = stringifyString.stringifyString({ type, value }, {
        implicitKey,
        indent: indent > 0 ? ' '.repeat(indent) : '',
        inFlow,
        options: { blockQuote: true, lineWidth: -1 }
    });
    const end = context.end ?? [
        { type: 'newline', offset: -1, indent, source: '\n' }
    ];
    switch (source[0]) {
        case '|':
        case '>': {
            const he = source.indexOf('\n');
            const head = source.substring(0, he);
            const body = source.substring(he + 1) + '\n';
            const props = [
                { type: 'block-scalar-header', offset, indent, source: head }
            ];
            if (!addEndtoBlockProps(props, end))
                props.push({ type: 'newline', offset: -1, indent, source: '\n' });
            return { type: 'block-scalar', offset, indent, props, source: body };
        }
        case '"':
            return { type: 'double-quoted-scalar', offset, indent, source, end };
        case "'":
            return { type: 'single-quoted-scalar', offset, indent, source, end };
        default:
            return { type: 'scalar', offset, indent, source, end };
    }
}
/**
 * Set the value of `token` to the given string `value`, overwriting any previous contents and type that it may have.
 *
 * Best efforts are made to retain any comments previously associated with the `token`,
 * though all contents within a collection's `items` will be overwritten.
 *
 * Values that represent an actual string but may be parsed as a different type should use a `type` other than `'PLAIN'`,
 * as this function does not support any schema operations and won't check for such conflicts.
 *
 * @param token Any token. If it does not include an `indent` value, the value will be stringified as if it were an implicit key.
 * @param value The string representation of the value, which will have its content properly indented.
 * @param context.afterKey In most cases, values after a key should have an additional level of indentation.
 * @param context.implicitKey Being within an implicit key may affect the resolved type of the token's value.
 * @param context.inFlow Being within a flow collection may affect the resolved type of the token's value.
 * @param context.type The preferred type of the scalar token. If undefined, the previous type of the `token` will be used, defaulting to `'PLAIN'`.
 */
function setScalarValue(token, value, context = {}) {
    let { afterKey = false, implicitKey = false, inFlow = false, type } = context;
    let indent = 'indent' in token ? token.indent : null;
    if (afterKey && typeof indent === 'number')
        indent += 2;
    if (!type)
        switch (token.type) {
            case 'single-quoted-scalar':
                type = 'QUOTE_SINGLE';
                break;
            case 'double-quoted-scalar':
                type = 'QUOTE_DOUBLE';
                break;
            case 'block-scalar': {
                const header = token.props[0];
                if (header.type !== 'block-scalar-header')
                    throw new Error('Invalid block scalar header');
                type = header.source[0] === '>' ? 'BLOCK_FOLDED' : 'BLOCK_LITERAL';
                break;
            }
            default:
                type = 'PLAIN';
        }
    const source = stringifyString.stringifyString({ type, value }, {
        implicitKey: implicitKey || indent === null,
        indent: indent !== null && indent > 0 ? ' '.repeat(indent) : '',
        inFlow,
        options: { blockQuote: true, lineWidth: -1 }
    });
    switch (source[0]) {
        case '|':
        case '>':
            setBlockScalarValue(token, source);
            break;
        case '"':
            setFlowScalarValue(token, source, 'double-quoted-scalar');
            break;
        case "'":
            setFlowScalarValue(token, source, 'single-quoted-scalar');
            break;
        default:
            setFlowScalarValue(token, source, 'scalar');
    }
}
function setBlockScalarValue(token, source) {
    const he = source.indexOf('\n');
    const head = source.substring(0, he);
    const body = source.substring(he + 1) + '\n';
    if (token.type === 'block-scalar') {
        const header = token.props[0];
        if (header.type !== 'block-scalar-header')
            throw new Error('Invalid block scalar header');
        header.source = head;
        token.source = body;
    }
    else {
        const { offset } = token;
        const indent = 'indent' in token ? token.indent : -1;
        const props = [
            { type: 'block-scalar-header', offset, indent, source: head }
        ];
        if (!addEndtoBlockProps(props, 'end' in token ? token.end : undefined))
            props.push({ type: 'newline', offset: -1, indent, source: '\n' });
        for (const key of Object.keys(token))
            if (key !== 'type' && key !== 'offset')
                delete token[key];
        Object.assign(token, { type: 'block-scalar', indent, props, source: body });
    }
}
/** @returns `true` if last token is a newline */
function addEndtoBlockProps(props, end) {
    if (end)
        for (const st of end)
            switch (st.type) {
                case 'space':
                case 'comment':
                    props.push(st);
                    break;
                case 'newline':
                    props.push(st);
                    return true;
            }
    return false;
}
function setFlowScalarValue(token, source, type) {
    switch (token.type) {
        case 'scalar':
        case 'double-quoted-scalar':
        case 'single-quoted-scalar':
            token.type = type;
            token.source = source;
            break;
        case 'block-scalar': {
            const end = token.props.slice(1);
            let oa = source.length;
            if (token.props[0].type === 'block-scalar-header')
                oa -= token.props[0].source.length;
            for (const tok of end)
                tok.offset += oa;
            delete token.props;
            Object.assign(token, { type, source, end });
            break;
        }
        case 'block-map':
        case 'block-seq': {
            const offset = token.offset + source.length;
            const nl = { type: 'newline', offset, indent: token.indent, source: '\n' };
            delete token.items;
            Object.assign(token, { type, source, end: [nl] });
            break;
        }
        default: {
            const indent = 'indent' in token ? token.indent : -1;
            const end = 'end' in token && Array.isArray(token.end)
                ? token.end.filter(st => st.type === 'space' ||
                    st.type === 'comment' ||
                    st.type === 'newline')
                : [];
            for (const key of Object.keys(token))
                if (key !== 'type' && key !== 'offset')
                    delete token[key];
            Object.assign(token, { type, indent, source, end });
        }
    }
}

exports.createScalarToken = createScalarToken;
exports.resolveAsScalar = resolveAsScalar;
exports.setScalarValue = setScalarValue;


/***/ }),

/***/ 1733:
/***/ ((__unused_webpack_module, exports) => {



/**
 * Stringify a CST document, token, or collection item
 *
 * Fair warning: This applies no validation whatsoever, and
 * simply concatenates the sources in their logical order.
 */
const stringify = (cst) => 'type' in cst ? stringifyToken(cst) : stringifyItem(cst);
function stringifyToken(token) {
    switch (token.type) {
        case 'block-scalar': {
            let res = '';
            for (const tok of token.props)
                res += stringifyToken(tok);
            return res + token.source;
        }
        case 'block-map':
        case 'block-seq': {
            let res = '';
            for (const item of token.items)
                res += stringifyItem(item);
            return res;
        }
        case 'flow-collection': {
            let res = token.start.source;
            for (const item of token.items)
                res += stringifyItem(item);
            for (const st of token.end)
                res += st.source;
            return res;
        }
        case 'document': {
            let res = stringifyItem(token);
            if (token.end)
                for (const st of token.end)
                    res += st.source;
            return res;
        }
        default: {
            let res = token.source;
            if ('end' in token && token.end)
                for (const st of token.end)
                    res += st.source;
            return res;
        }
    }
}
function stringifyItem({ start, key, sep, value }) {
    let res = '';
    for (const st of start)
        res += st.source;
    if (key)
        res += stringifyToken(key);
    if (sep)
        for (const st of sep)
            res += st.source;
    if (value)
        res += stringifyToken(value);
    return res;
}

exports.stringify = stringify;


/***/ }),

/***/ 7715:
/***/ ((__unused_webpack_module, exports) => {



const BREAK = Symbol('break visit');
const SKIP = Symbol('skip children');
const REMOVE = Symbol('remove item');
/**
 * Apply a visitor to a CST document or item.
 *
 * Walks through the tree (depth-first) starting from the root, calling a
 * `visitor` function with two arguments when entering each item:
 *   - `item`: The current item, which included the following members:
 *     - `start: SourceToken[]` – Source tokens before the key or value,
 *       possibly including its anchor or tag.
 *     - `key?: Token | null` – Set for pair values. May then be `null`, if
 *       the key before the `:` separator is empty.
 *     - `sep?: SourceToken[]` – Source tokens between the key and the value,
 *       which should include the `:` map value indicator if `value` is set.
 *     - `value?: Token` – The value of a sequence item, or of a map pair.
 *   - `path`: The steps from the root to the current node, as an array of
 *     `['key' | 'value', number]` tuples.
 *
 * The return value of the visitor may be used to control the traversal:
 *   - `undefined` (default): Do nothing and continue
 *   - `visit.SKIP`: Do not visit the children of this token, continue with
 *      next sibling
 *   - `visit.BREAK`: Terminate traversal completely
 *   - `visit.REMOVE`: Remove the current item, then continue with the next one
 *   - `number`: Set the index of the next step. This is useful especially if
 *     the index of the current token has changed.
 *   - `function`: Define the next visitor for this item. After the original
 *     visitor is called on item entry, next visitors are called after handling
 *     a non-empty `key` and when exiting the item.
 */
function visit(cst, visitor) {
    if ('type' in cst && cst.type === 'document')
        cst = { start: cst.start, value: cst.value };
    _visit(Object.freeze([]), cst, visitor);
}
// Without the `as symbol` casts, TS declares these in the `visit`
// namespace using `var`, but then complains about that because
// `unique symbol` must be `const`.
/** Terminate visit traversal completely */
visit.BREAK = BREAK;
/** Do not visit the children of the current item */
visit.SKIP = SKIP;
/** Remove the current item */
visit.REMOVE = REMOVE;
/** Find the item at `path` from `cst` as the root */
visit.itemAtPath = (cst, path) => {
    let item = cst;
    for (const [field, index] of path) {
        const tok = item?.[field];
        if (tok && 'items' in tok) {
            item = tok.items[index];
        }
        else
            return undefined;
    }
    return item;
};
/**
 * Get the immediate parent collection of the item at `path` from `cst` as the root.
 *
 * Throws an error if the collection is not found, which should never happen if the item itself exists.
 */
visit.parentCollection = (cst, path) => {
    const parent = visit.itemAtPath(cst, path.slice(0, -1));
    const field = path[path.length - 1][0];
    const coll = parent?.[field];
    if (coll && 'items' in coll)
        return coll;
    throw new Error('Parent collection not found');
};
function _visit(path, item, visitor) {
    let ctrl = visitor(item, path);
    if (typeof ctrl === 'symbol')
        return ctrl;
    for (const field of ['key', 'value']) {
        const token = item[field];
        if (token && 'items' in token) {
            for (let i = 0; i < token.items.length; ++i) {
                const ci = _visit(Object.freeze(path.concat([[field, i]])), token.items[i], visitor);
                if (typeof ci === 'number')
                    i = ci - 1;
                else if (ci === BREAK)
                    return BREAK;
                else if (ci === REMOVE) {
                    token.items.splice(i, 1);
                    i -= 1;
                }
            }
            if (typeof ctrl === 'function' && field === 'key')
                ctrl = ctrl(item, path);
        }
    }
    return typeof ctrl === 'function' ? ctrl(item, path) : ctrl;
}

exports.visit = visit;


/***/ }),

/***/ 3461:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var cstScalar = __nccwpck_require__(110);
var cstStringify = __nccwpck_require__(1733);
var cstVisit = __nccwpck_require__(7715);

/** The byte order mark */
const BOM = '\u{FEFF}';
/** Start of doc-mode */
const DOCUMENT = '\x02'; // C0: Start of Text
/** Unexpected end of flow-mode */
const FLOW_END = '\x18'; // C0: Cancel
/** Next token is a scalar value */
const SCALAR = '\x1f'; // C0: Unit Separator
/** @returns `true` if `token` is a flow or block collection */
const isCollection = (token) => !!token && 'items' in token;
/** @returns `true` if `token` is a flow or block scalar; not an alias */
const isScalar = (token) => !!token &&
    (token.type === 'scalar' ||
        token.type === 'single-quoted-scalar' ||
        token.type === 'double-quoted-scalar' ||
        token.type === 'block-scalar');
/* istanbul ignore next */
/** Get a printable representation of a lexer token */
function prettyToken(token) {
    switch (token) {
        case BOM:
            return '<BOM>';
        case DOCUMENT:
            return '<DOC>';
        case FLOW_END:
            return '<FLOW_END>';
        case SCALAR:
            return '<SCALAR>';
        default:
            return JSON.stringify(token);
    }
}
/** Identify the type of a lexer token. May return `null` for unknown tokens. */
function tokenType(source) {
    switch (source) {
        case BOM:
            return 'byte-order-mark';
        case DOCUMENT:
            return 'doc-mode';
        case FLOW_END:
            return 'flow-error-end';
        case SCALAR:
            return 'scalar';
        case '---':
            return 'doc-start';
        case '...':
            return 'doc-end';
        case '':
        case '\n':
        case '\r\n':
            return 'newline';
        case '-':
            return 'seq-item-ind';
        case '?':
            return 'explicit-key-ind';
        case ':':
            return 'map-value-ind';
        case '{':
            return 'flow-map-start';
        case '}':
            return 'flow-map-end';
        case '[':
            return 'flow-seq-start';
        case ']':
            return 'flow-seq-end';
        case ',':
            return 'comma';
    }
    switch (source[0]) {
        case ' ':
        case '\t':
            return 'space';
        case '#':
            return 'comment';
        case '%':
            return 'directive-line';
        case '*':
            return 'alias';
        case '&':
            return 'anchor';
        case '!':
            return 'tag';
        case "'":
            return 'single-quoted-scalar';
        case '"':
            return 'double-quoted-scalar';
        case '|':
        case '>':
            return 'block-scalar-header';
    }
    return null;
}

exports.createScalarToken = cstScalar.createScalarToken;
exports.resolveAsScalar = cstScalar.resolveAsScalar;
exports.setScalarValue = cstScalar.setScalarValue;
exports.stringify = cstStringify.stringify;
exports.visit = cstVisit.visit;
exports.BOM = BOM;
exports.DOCUMENT = DOCUMENT;
exports.FLOW_END = FLOW_END;
exports.SCALAR = SCALAR;
exports.isCollection = isCollection;
exports.isScalar = isScalar;
exports.prettyToken = prettyToken;
exports.tokenType = tokenType;


/***/ }),

/***/ 361:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var cst = __nccwpck_require__(3461);

/*
START -> stream

stream
  directive -> line-end -> stream
  indent + line-end -> stream
  [else] -> line-start

line-end
  comment -> line-end
  newline -> .
  input-end -> END

line-start
  doc-start -> doc
  doc-end -> stream
  [else] -> indent -> block-start

block-start
  seq-item-start -> block-start
  explicit-key-start -> block-start
  map-value-start -> block-start
  [else] -> doc

doc
  line-end -> line-start
  spaces -> doc
  anchor -> doc
  tag -> doc
  flow-start -> flow -> doc
  flow-end -> error -> doc
  seq-item-start -> error -> doc
  explicit-key-start -> error -> doc
  map-value-start -> doc
  alias -> doc
  quote-start -> quoted-scalar -> doc
  block-scalar-header -> line-end -> block-scalar(min) -> line-start
  [else] -> plain-scalar(false, min) -> doc

flow
  line-end -> flow
  spaces -> flow
  anchor -> flow
  tag -> flow
  flow-start -> flow -> flow
  flow-end -> .
  seq-item-start -> error -> flow
  explicit-key-start -> flow
  map-value-start -> flow
  alias -> flow
  quote-start -> quoted-scalar -> flow
  comma -> flow
  [else] -> plain-scalar(true, 0) -> flow

quoted-scalar
  quote-end -> .
  [else] -> quoted-scalar

block-scalar(min)
  newline + peek(indent < min) -> .
  [else] -> block-scalar(min)

plain-scalar(is-flow, min)
  scalar-end(is-flow) -> .
  peek(newline + (indent < min)) -> .
  [else] -> plain-scalar(min)
*/
function isEmpty(ch) {
    switch (ch) {
        case undefined:
        case ' ':
        case '\n':
        case '\r':
        case '\t':
            return true;
        default:
            return false;
    }
}
const hexDigits = new Set('0123456789ABCDEFabcdef');
const tagChars = new Set("0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz-#;/?:@&=+$_.!~*'()");
const flowIndicatorChars = new Set(',[]{}');
const invalidAnchorChars = new Set(' ,[]{}\n\r\t');
const isNotAnchorChar = (ch) => !ch || invalidAnchorChars.has(ch);
/**
 * Splits an input string into lexical tokens, i.e. smaller strings that are
 * easily identifiable by `tokens.tokenType()`.
 *
 * Lexing starts always in a "stream" context. Incomplete input may be buffered
 * until a complete token can be emitted.
 *
 * In addition to slices of the original input, the following control characters
 * may also be emitted:
 *
 * - `\x02` (Start of Text): A document starts with the next token
 * - `\x18` (Cancel): Unexpected end of flow-mode (indicates an error)
 * - `\x1f` (Unit Separator): Next token is a scalar value
 * - `\u{FEFF}` (Byte order mark): Emitted separately outside documents
 */
class Lexer {
    constructor() {
        /**
         * Flag indicating whether the end of the current buffer marks the end of
         * all input
         */
        this.atEnd = false;
        /**
         * Explicit indent set in block scalar header, as an offset from the current
         * minimum indent, so e.g. set to 1 from a header `|2+`. Set to -1 if not
         * explicitly set.
         */
        this.blockScalarIndent = -1;
        /**
         * Block scalars that include a + (keep) chomping indicator in their header
         * include trailing empty lines, which are otherwise excluded from the
         * scalar's contents.
         */
        this.blockScalarKeep = false;
        /** Current input */
        this.buffer = '';
        /**
         * Flag noting whether the map value indicator : can immediately follow this
         * node within a flow context.
         */
        this.flowKey = false;
        /** Count of surrounding flow collection levels. */
        this.flowLevel = 0;
        /**
         * Minimum level of indentation required for next lines to be parsed as a
         * part of the current scalar value.
         */
        this.indentNext = 0;
        /** Indentation level of the current line. */
        this.indentValue = 0;
        /** Position of the next \n character. */
        this.lineEndPos = null;
        /** Stores the state of the lexer if reaching the end of incpomplete input */
        this.next = null;
        /** A pointer to `buffer`; the current position of the lexer. */
        this.pos = 0;
    }
    /**
     * Generate YAML tokens from the `source` string. If `incomplete`,
     * a part of the last line may be left as a buffer for the next call.
     *
     * @returns A generator of lexical tokens
     */
    *lex(source, incomplete = false) {
        if (source) {
            if (typeof source !== 'string')
                throw TypeError('source is not a string');
            this.buffer = this.buffer ? this.buffer + source : source;
            this.lineEndPos = null;
        }
        this.atEnd = !incomplete;
        let next = this.next ?? 'stream';
        while (next && (incomplete || this.hasChars(1)))
            next = yield* this.parseNext(next);
    }
    atLineEnd() {
        let i = this.pos;
        let ch = this.buffer[i];
        while (ch === ' ' || ch === '\t')
            ch = this.buffer[++i];
        if (!ch || ch === '#' || ch === '\n')
            return true;
        if (ch === '\r')
            return this.buffer[i + 1] === '\n';
        return false;
    }
    charAt(n) {
        return this.buffer[this.pos + n];
    }
    continueScalar(offset) {
        let ch = this.buffer[offset];
        if (this.indentNext > 0) {
            let indent = 0;
            while (ch === ' ')
                ch = this.buffer[++indent + offset];
            if (ch === '\r') {
                const next = this.buffer[indent + offset + 1];
                if (next === '\n' || (!next && !this.atEnd))
                    return offset + indent + 1;
            }
            return ch === '\n' || indent >= this.indentNext || (!ch && !this.atEnd)
                ? offset + indent
                : -1;
        }
        if (ch === '-' || ch === '.') {
            const dt = this.buffer.substr(offset, 3);
            if ((dt === '---' || dt === '...') && isEmpty(this.buffer[offset + 3]))
                return -1;
        }
        return offset;
    }
    getLine() {
        let end = this.lineEndPos;
        if (typeof end !== 'number' || (end !== -1 && end < this.pos)) {
            end = this.buffer.indexOf('\n', this.pos);
            this.lineEndPos = end;
        }
        if (end === -1)
            return this.atEnd ? this.buffer.substring(this.pos) : null;
        if (this.buffer[end - 1] === '\r')
            end -= 1;
        return this.buffer.substring(this.pos, end);
    }
    hasChars(n) {
        return this.pos + n <= this.buffer.length;
    }
    setNext(state) {
        this.buffer = this.buffer.substring(this.pos);
        this.pos = 0;
        this.lineEndPos = null;
        this.next = state;
        return null;
    }
    peek(n) {
        return this.buffer.substr(this.pos, n);
    }
    *parseNext(next) {
        switch (next) {
            case 'stream':
                return yield* this.parseStream();
            case 'line-start':
                return yield* this.parseLineStart();
            case 'block-start':
                return yield* this.parseBlockStart();
            case 'doc':
                return yield* this.parseDocument();
            case 'flow':
                return yield* this.parseFlowCollection();
            case 'quoted-scalar':
                return yield* this.parseQuotedScalar();
            case 'block-scalar':
                return yield* this.parseBlockScalar();
            case 'plain-scalar':
                return yield* this.parsePlainScalar();
        }
    }
    *parseStream() {
        let line = this.getLine();
        if (line === null)
            return this.setNext('stream');
        if (line[0] === cst.BOM) {
            yield* this.pushCount(1);
            line = line.substring(1);
        }
        if (line[0] === '%') {
            let dirEnd = line.length;
            let cs = line.indexOf('#');
            while (cs !== -1) {
                const ch = line[cs - 1];
                if (ch === ' ' || ch === '\t') {
                    dirEnd = cs - 1;
                    break;
                }
                else {
                    cs = line.indexOf('#', cs + 1);
                }
            }
            while (true) {
                const ch = line[dirEnd - 1];
                if (ch === ' ' || ch === '\t')
                    dirEnd -= 1;
                else
                    break;
            }
            const n = (yield* this.pushCount(dirEnd)) + (yield* this.pushSpaces(true));
            yield* this.pushCount(line.length - n); // possible comment
            this.pushNewline();
            return 'stream';
        }
        if (this.atLineEnd()) {
            const sp = yield* this.pushSpaces(true);
            yield* this.pushCount(line.length - sp);
            yield* this.pushNewline();
            return 'stream';
        }
        yield cst.DOCUMENT;
        return yield* this.parseLineStart();
    }
    *parseLineStart() {
        const ch = this.charAt(0);
        if (!ch && !this.atEnd)
            return this.setNext('line-start');
        if (ch === '-' || ch === '.') {
            if (!this.atEnd && !this.hasChars(4))
                return this.setNext('line-start');
            const s = this.peek(3);
            if ((s === '---' || s === '...') && isEmpty(this.charAt(3))) {
                yield* this.pushCount(3);
                this.indentValue = 0;
                this.indentNext = 0;
                return s === '---' ? 'doc' : 'stream';
            }
        }
        this.indentValue = yield* this.pushSpaces(false);
        if (this.indentNext > this.indentValue && !isEmpty(this.charAt(1)))
            this.indentNext = this.indentValue;
        return yield* this.parseBlockStart();
    }
    *parseBlockStart() {
        const [ch0, ch1] = this.peek(2);
        if (!ch1 && !this.atEnd)
            return this.setNext('block-start');
        if ((ch0 === '-' || ch0 === '?' || ch0 === ':') && isEmpty(ch1)) {
            const n = (yield* this.pushCount(1)) + (yield* this.pushSpaces(true));
            this.indentNext = this.indentValue + 1;
            this.indentValue += n;
            return 'block-start';
        }
        return 'doc';
    }
    *parseDocument() {
        yield* this.pushSpaces(true);
        const line = this.getLine();
        if (line === null)
            return this.setNext('doc');
        let n = yield* this.pushIndicators();
        switch (line[n]) {
            case '#':
                yield* this.pushCount(line.length - n);
            // fallthrough
            case undefined:
                yield* this.pushNewline();
                return yield* this.parseLineStart();
            case '{':
            case '[':
                yield* this.pushCount(1);
                this.flowKey = false;
                this.flowLevel = 1;
                return 'flow';
            case '}':
            case ']':
                // this is an error
                yield* this.pushCount(1);
                return 'doc';
            case '*':
                yield* this.pushUntil(isNotAnchorChar);
                return 'doc';
            case '"':
            case "'":
                return yield* this.parseQuotedScalar();
            case '|':
            case '>':
                n += yield* this.parseBlockScalarHeader();
                n += yield* this.pushSpaces(true);
                yield* this.pushCount(line.length - n);
                yield* this.pushNewline();
                return yield* this.parseBlockScalar();
            default:
                return yield* this.parsePlainScalar();
        }
    }
    *parseFlowCollection() {
        let nl, sp;
        let indent = -1;
        do {
            nl = yield* this.pushNewline();
            if (nl > 0) {
                sp = yield* this.pushSpaces(false);
                this.indentValue = indent = sp;
            }
            else {
                sp = 0;
            }
            sp += yield* this.pushSpaces(true);
        } while (nl + sp > 0);
        const line = this.getLine();
        if (line === null)
            return this.setNext('flow');
        if ((indent !== -1 && indent < this.indentNext && line[0] !== '#') ||
            (indent === 0 &&
                (line.startsWith('---') || line.startsWith('...')) &&
                isEmpty(line[3]))) {
            // Allowing for the terminal ] or } at the same (rather than greater)
            // indent level as the initial [ or { is technically invalid, but
            // failing here would be surprising to users.
            const atFlowEndMarker = indent === this.indentNext - 1 &&
                this.flowLevel === 1 &&
                (line[0] === ']' || line[0] === '}');
            if (!atFlowEndMarker) {
                // this is an error
                this.flowLevel = 0;
                yield cst.FLOW_END;
                return yield* this.parseLineStart();
            }
        }
        let n = 0;
        while (line[n] === ',') {
            n += yield* this.pushCount(1);
            n += yield* this.pushSpaces(true);
            this.flowKey = false;
        }
        n += yield* this.pushIndicators();
        switch (line[n]) {
            case undefined:
                return 'flow';
            case '#':
                yield* this.pushCount(line.length - n);
                return 'flow';
            case '{':
            case '[':
                yield* this.pushCount(1);
                this.flowKey = false;
                this.flowLevel += 1;
                return 'flow';
            case '}':
            case ']':
                yield* this.pushCount(1);
                this.flowKey = true;
                this.flowLevel -= 1;
                return this.flowLevel ? 'flow' : 'doc';
            case '*':
                yield* this.pushUntil(isNotAnchorChar);
                return 'flow';
            case '"':
            case "'":
                this.flowKey = true;
                return yield* this.parseQuotedScalar();
            case ':': {
                const next = this.charAt(1);
                if (this.flowKey || isEmpty(next) || next === ',') {
                    this.flowKey = false;
                    yield* this.pushCount(1);
                    yield* this.pushSpaces(true);
                    return 'flow';
                }
            }
            // fallthrough
            default:
                this.flowKey = false;
                return yield* this.parsePlainScalar();
        }
    }
    *parseQuotedScalar() {
        const quote = this.charAt(0);
        let end = this.buffer.indexOf(quote, this.pos + 1);
        if (quote === "'") {
            while (end !== -1 && this.buffer[end + 1] === "'")
                end = this.buffer.indexOf("'", end + 2);
        }
        else {
            // double-quote
            while (end !== -1) {
                let n = 0;
                while (this.buffer[end - 1 - n] === '\\')
                    n += 1;
                if (n % 2 === 0)
                    break;
                end = this.buffer.indexOf('"', end + 1);
            }
        }
        // Only looking for newlines within the quotes
        const qb = this.buffer.substring(0, end);
        let nl = qb.indexOf('\n', this.pos);
        if (nl !== -1) {
            while (nl !== -1) {
                const cs = this.continueScalar(nl + 1);
                if (cs === -1)
                    break;
                nl = qb.indexOf('\n', cs);
            }
            if (nl !== -1) {
                // this is an error caused by an unexpected unindent
                end = nl - (qb[nl - 1] === '\r' ? 2 : 1);
            }
        }
        if (end === -1) {
            if (!this.atEnd)
                return this.setNext('quoted-scalar');
            end = this.buffer.length;
        }
        yield* this.pushToIndex(end + 1, false);
        return this.flowLevel ? 'flow' : 'doc';
    }
    *parseBlockScalarHeader() {
        this.blockScalarIndent = -1;
        this.blockScalarKeep = false;
        let i = this.pos;
        while (true) {
            const ch = this.buffer[++i];
            if (ch === '+')
                this.blockScalarKeep = true;
            else if (ch > '0' && ch <= '9')
                this.blockScalarIndent = Number(ch) - 1;
            else if (ch !== '-')
                break;
        }
        return yield* this.pushUntil(ch => isEmpty(ch) || ch === '#');
    }
    *parseBlockScalar() {
        let nl = this.pos - 1; // may be -1 if this.pos === 0
        let indent = 0;
        let ch;
        loop: for (let i = this.pos; (ch = this.buffer[i]); ++i) {
            switch (ch) {
                case ' ':
                    indent += 1;
                    break;
                case '\n':
                    nl = i;
                    indent = 0;
                    break;
                case '\r': {
                    const next = this.buffer[i + 1];
                    if (!next && !this.atEnd)
                        return this.setNext('block-scalar');
                    if (next === '\n')
                        break;
                } // fallthrough
                default:
                    break loop;
            }
        }
        if (!ch && !this.atEnd)
            return this.setNext('block-scalar');
        if (indent >= this.indentNext) {
            if (this.blockScalarIndent === -1)
                this.indentNext = indent;
            else {
                this.indentNext =
                    this.blockScalarIndent + (this.indentNext === 0 ? 1 : this.indentNext);
            }
            do {
                const cs = this.continueScalar(nl + 1);
                if (cs === -1)
                    break;
                nl = this.buffer.indexOf('\n', cs);
            } while (nl !== -1);
            if (nl === -1) {
                if (!this.atEnd)
                    return this.setNext('block-scalar');
                nl = this.buffer.length;
            }
        }
        // Trailing insufficiently indented tabs are invalid.
        // To catch that during parsing, we include them in the block scalar value.
        let i = nl + 1;
        ch = this.buffer[i];
        while (ch === ' ')
            ch = this.buffer[++i];
        if (ch === '\t') {
            while (ch === '\t' || ch === ' ' || ch === '\r' || ch === '\n')
                ch = this.buffer[++i];
            nl = i - 1;
        }
        else if (!this.blockScalarKeep) {
            do {
                let i = nl - 1;
                let ch = this.buffer[i];
                if (ch === '\r')
                    ch = this.buffer[--i];
                const lastChar = i; // Drop the line if last char not more indented
                while (ch === ' ')
                    ch = this.buffer[--i];
                if (ch === '\n' && i >= this.pos && i + 1 + indent > lastChar)
                    nl = i;
                else
                    break;
            } while (true);
        }
        yield cst.SCALAR;
        yield* this.pushToIndex(nl + 1, true);
        return yield* this.parseLineStart();
    }
    *parsePlainScalar() {
        const inFlow = this.flowLevel > 0;
        let end = this.pos - 1;
        let i = this.pos - 1;
        let ch;
        while ((ch = this.buffer[++i])) {
            if (ch === ':') {
                const next = this.buffer[i + 1];
                if (isEmpty(next) || (inFlow && flowIndicatorChars.has(next)))
                    break;
                end = i;
            }
            else if (isEmpty(ch)) {
                let next = this.buffer[i + 1];
                if (ch === '\r') {
                    if (next === '\n') {
                        i += 1;
                        ch = '\n';
                        next = this.buffer[i + 1];
                    }
                    else
                        end = i;
                }
                if (next === '#' || (inFlow && flowIndicatorChars.has(next)))
                    break;
                if (ch === '\n') {
                    const cs = this.continueScalar(i + 1);
                    if (cs === -1)
                        break;
                    i = Math.max(i, cs - 2); // to advance, but still account for ' #'
                }
            }
            else {
                if (inFlow && flowIndicatorChars.has(ch))
                    break;
                end = i;
            }
        }
        if (!ch && !this.atEnd)
            return this.setNext('plain-scalar');
        yield cst.SCALAR;
        yield* this.pushToIndex(end + 1, true);
        return inFlow ? 'flow' : 'doc';
    }
    *pushCount(n) {
        if (n > 0) {
            yield this.buffer.substr(this.pos, n);
            this.pos += n;
            return n;
        }
        return 0;
    }
    *pushToIndex(i, allowEmpty) {
        const s = this.buffer.slice(this.pos, i);
        if (s) {
            yield s;
            this.pos += s.length;
            return s.length;
        }
        else if (allowEmpty)
            yield '';
        return 0;
    }
    *pushIndicators() {
        let n = 0;
        loop: while (true) {
            switch (this.charAt(0)) {
                case '!':
                    n += yield* this.pushTag();
                    n += yield* this.pushSpaces(true);
                    continue loop;
                case '&':
                    n += yield* this.pushUntil(isNotAnchorChar);
                    n += yield* this.pushSpaces(true);
                    continue loop;
                case '-': // this is an error
                case '?': // this is an error outside flow collections
                case ':': {
                    const inFlow = this.flowLevel > 0;
                    const ch1 = this.charAt(1);
                    if (isEmpty(ch1) || (inFlow && flowIndicatorChars.has(ch1))) {
                        if (!inFlow)
                            this.indentNext = this.indentValue + 1;
                        else if (this.flowKey)
                            this.flowKey = false;
                        n += yield* this.pushCount(1);
                        n += yield* this.pushSpaces(true);
                        continue loop;
                    }
                }
            }
            break loop;
        }
        return n;
    }
    *pushTag() {
        if (this.charAt(1) === '<') {
            let i = this.pos + 2;
            let ch = this.buffer[i];
            while (!isEmpty(ch) && ch !== '>')
                ch = this.buffer[++i];
            return yield* this.pushToIndex(ch === '>' ? i + 1 : i, false);
        }
        else {
            let i = this.pos + 1;
            let ch = this.buffer[i];
            while (ch) {
                if (tagChars.has(ch))
                    ch = this.buffer[++i];
                else if (ch === '%' &&
                    hexDigits.has(this.buffer[i + 1]) &&
                    hexDigits.has(this.buffer[i + 2])) {
                    ch = this.buffer[(i += 3)];
                }
                else
                    break;
            }
            return yield* this.pushToIndex(i, false);
        }
    }
    *pushNewline() {
        const ch = this.buffer[this.pos];
        if (ch === '\n')
            return yield* this.pushCount(1);
        else if (ch === '\r' && this.charAt(1) === '\n')
            return yield* this.pushCount(2);
        else
            return 0;
    }
    *pushSpaces(allowTabs) {
        let i = this.pos - 1;
        let ch;
        do {
            ch = this.buffer[++i];
        } while (ch === ' ' || (allowTabs && ch === '\t'));
        const n = i - this.pos;
        if (n > 0) {
            yield this.buffer.substr(this.pos, n);
            this.pos = i;
        }
        return n;
    }
    *pushUntil(test) {
        let i = this.pos;
        let ch = this.buffer[i];
        while (!test(ch))
            ch = this.buffer[++i];
        return yield* this.pushToIndex(i, false);
    }
}

exports.Lexer = Lexer;


/***/ }),

/***/ 6628:
/***/ ((__unused_webpack_module, exports) => {



/**
 * Tracks newlines during parsing in order to provide an efficient API for
 * determining the one-indexed `{ line, col }` position for any offset
 * within the input.
 */
class LineCounter {
    constructor() {
        this.lineStarts = [];
        /**
         * Should be called in ascending order. Otherwise, call
         * `lineCounter.lineStarts.sort()` before calling `linePos()`.
         */
        this.addNewLine = (offset) => this.lineStarts.push(offset);
        /**
         * Performs a binary search and returns the 1-indexed { line, col }
         * position of `offset`. If `line === 0`, `addNewLine` has never been
         * called or `offset` is before the first known newline.
         */
        this.linePos = (offset) => {
            let low = 0;
            let high = this.lineStarts.length;
            while (low < high) {
                const mid = (low + high) >> 1; // Math.floor((low + high) / 2)
                if (this.lineStarts[mid] < offset)
                    low = mid + 1;
                else
                    high = mid;
            }
            if (this.lineStarts[low] === offset)
                return { line: low + 1, col: 1 };
            if (low === 0)
                return { line: 0, col: offset };
            const start = this.lineStarts[low - 1];
            return { line: low, col: offset - start + 1 };
        };
    }
}

exports.LineCounter = LineCounter;


/***/ }),

/***/ 3456:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var node_process = __nccwpck_require__(932);
var cst = __nccwpck_require__(3461);
var lexer = __nccwpck_require__(361);

function includesToken(list, type) {
    for (let i = 0; i < list.length; ++i)
        if (list[i].type === type)
            return true;
    return false;
}
function findNonEmptyIndex(list) {
    for (let i = 0; i < list.length; ++i) {
        switch (list[i].type) {
            case 'space':
            case 'comment':
            case 'newline':
                break;
            default:
                return i;
        }
    }
    return -1;
}
function isFlowToken(token) {
    switch (token?.type) {
        case 'alias':
        case 'scalar':
        case 'single-quoted-scalar':
        case 'double-quoted-scalar':
        case 'flow-collection':
            return true;
        default:
            return false;
    }
}
function getPrevProps(parent) {
    switch (parent.type) {
        case 'document':
            return parent.start;
        case 'block-map': {
            const it = parent.items[parent.items.length - 1];
            return it.sep ?? it.start;
        }
        case 'block-seq':
            return parent.items[parent.items.length - 1].start;
        /* istanbul ignore next should not happen */
        default:
            return [];
    }
}
/** Note: May modify input array */
function getFirstKeyStartProps(prev) {
    if (prev.length === 0)
        return [];
    let i = prev.length;
    loop: while (--i >= 0) {
        switch (prev[i].type) {
            case 'doc-start':
            case 'explicit-key-ind':
            case 'map-value-ind':
            case 'seq-item-ind':
            case 'newline':
                break loop;
        }
    }
    while (prev[++i]?.type === 'space') {
        /* loop */
    }
    return prev.splice(i, prev.length);
}
function arrayPushArray(target, source) {
    // May exhaust call stack with large `source` array
    if (source.length < 1e5)
        Array.prototype.push.apply(target, source);
    else
        for (let i = 0; i < source.length; ++i)
            target.push(source[i]);
}
function fixFlowSeqItems(fc) {
    if (fc.start.type === 'flow-seq-start') {
        for (const it of fc.items) {
            if (it.sep &&
                !it.value &&
                !includesToken(it.start, 'explicit-key-ind') &&
                !includesToken(it.sep, 'map-value-ind')) {
                if (it.key)
                    it.value = it.key;
                delete it.key;
                if (isFlowToken(it.value)) {
                    if (it.value.end)
                        arrayPushArray(it.value.end, it.sep);
                    else
                        it.value.end = it.sep;
                }
                else
                    arrayPushArray(it.start, it.sep);
                delete it.sep;
            }
        }
    }
}
/**
 * A YAML concrete syntax tree (CST) parser
 *
 * ```ts
 * const src: string = ...
 * for (const token of new Parser().parse(src)) {
 *   // token: Token
 * }
 * ```
 *
 * To use the parser with a user-provided lexer:
 *
 * ```ts
 * function* parse(source: string, lexer: Lexer) {
 *   const parser = new Parser()
 *   for (const lexeme of lexer.lex(source))
 *     yield* parser.next(lexeme)
 *   yield* parser.end()
 * }
 *
 * const src: string = ...
 * const lexer = new Lexer()
 * for (const token of parse(src, lexer)) {
 *   // token: Token
 * }
 * ```
 */
class Parser {
    /**
     * @param onNewLine - If defined, called separately with the start position of
     *   each new line (in `parse()`, including the start of input).
     */
    constructor(onNewLine) {
        /** If true, space and sequence indicators count as indentation */
        this.atNewLine = true;
        /** If true, next token is a scalar value */
        this.atScalar = false;
        /** Current indentation level */
        this.indent = 0;
        /** Current offset since the start of parsing */
        this.offset = 0;
        /** On the same line with a block map key */
        this.onKeyLine = false;
        /** Top indicates the node that's currently being built */
        this.stack = [];
        /** The source of the current token, set in parse() */
        this.source = '';
        /** The type of the current token, set in parse() */
        this.type = '';
        // Must be defined after `next()`
        this.lexer = new lexer.Lexer();
        this.onNewLine = onNewLine;
    }
    /**
     * Parse `source` as a YAML stream.
     * If `incomplete`, a part of the last line may be left as a buffer for the next call.
     *
     * Errors are not thrown, but yielded as `{ type: 'error', message }` tokens.
     *
     * @returns A generator of tokens representing each directive, document, and other structure.
     */
    *parse(source, incomplete = false) {
        if (this.onNewLine && this.offset === 0)
            this.onNewLine(0);
        for (const lexeme of this.lexer.lex(source, incomplete))
            yield* this.next(lexeme);
        if (!incomplete)
            yield* this.end();
    }
    /**
     * Advance the parser by the `source` of one lexical token.
     */
    *next(source) {
        this.source = source;
        if (node_process.env.LOG_TOKENS)
            console.log('|', cst.prettyToken(source));
        if (this.atScalar) {
            this.atScalar = false;
            yield* this.step();
            this.offset += source.length;
            return;
        }
        const type = cst.tokenType(source);
        if (!type) {
            const message = `Not a YAML token: ${source}`;
            yield* this.pop({ type: 'error', offset: this.offset, message, source });
            this.offset += source.length;
        }
        else if (type === 'scalar') {
            this.atNewLine = false;
            this.atScalar = true;
            this.type = 'scalar';
        }
        else {
            this.type = type;
            yield* this.step();
            switch (type) {
                case 'newline':
                    this.atNewLine = true;
                    this.indent = 0;
                    if (this.onNewLine)
                        this.onNewLine(this.offset + source.length);
                    break;
                case 'space':
                    if (this.atNewLine && source[0] === ' ')
                        this.indent += source.length;
                    break;
                case 'explicit-key-ind':
                case 'map-value-ind':
                case 'seq-item-ind':
                    if (this.atNewLine)
                        this.indent += source.length;
                    break;
                case 'doc-mode':
                case 'flow-error-end':
                    return;
                default:
                    this.atNewLine = false;
            }
            this.offset += source.length;
        }
    }
    /** Call at end of input to push out any remaining constructions */
    *end() {
        while (this.stack.length > 0)
            yield* this.pop();
    }
    get sourceToken() {
        const st = {
            type: this.type,
            offset: this.offset,
            indent: this.indent,
            source: this.source
        };
        return st;
    }
    *step() {
        const top = this.peek(1);
        if (this.type === 'doc-end' && top?.type !== 'doc-end') {
            while (this.stack.length > 0)
                yield* this.pop();
            this.stack.push({
                type: 'doc-end',
                offset: this.offset,
                source: this.source
            });
            return;
        }
        if (!top)
            return yield* this.stream();
        switch (top.type) {
            case 'document':
                return yield* this.document(top);
            case 'alias':
            case 'scalar':
            case 'single-quoted-scalar':
            case 'double-quoted-scalar':
                return yield* this.scalar(top);
            case 'block-scalar':
                return yield* this.blockScalar(top);
            case 'block-map':
                return yield* this.blockMap(top);
            case 'block-seq':
                return yield* this.blockSequence(top);
            case 'flow-collection':
                return yield* this.flowCollection(top);
            case 'doc-end':
                return yield* this.documentEnd(top);
        }
        /* istanbul ignore next should not happen */
        yield* this.pop();
    }
    peek(n) {
        return this.stack[this.stack.length - n];
    }
    *pop(error) {
        const token = error ?? this.stack.pop();
        /* istanbul ignore if should not happen */
        if (!token) {
            const message = 'Tried to pop an empty stack';
            yield { type: 'error', offset: this.offset, source: '', message };
        }
        else if (this.stack.length === 0) {
            yield token;
        }
        else {
            const top = this.peek(1);
            if (token.type === 'block-scalar') {
                // Block scalars use their parent rather than header indent
                token.indent = 'indent' in top ? top.indent : 0;
            }
            else if (token.type === 'flow-collection' && top.type === 'document') {
                // Ignore all indent for top-level flow collections
                token.indent = 0;
            }
            if (token.type === 'flow-collection')
                fixFlowSeqItems(token);
            switch (top.type) {
                case 'document':
                    top.value = token;
                    break;
                case 'block-scalar':
                    top.props.push(token); // error
                    break;
                case 'block-map': {
                    const it = top.items[top.items.length - 1];
                    if (it.value) {
                        top.items.push({ start: [], key: token, sep: [] });
                        this.onKeyLine = true;
                        return;
                    }
                    else if (it.sep) {
                        it.value = token;
                    }
                    else {
                        Object.assign(it, { key: token, sep: [] });
                        this.onKeyLine = !it.explicitKey;
                        return;
                    }
                    break;
                }
                case 'block-seq': {
                    const it = top.items[top.items.length - 1];
                    if (it.value)
                        top.items.push({ start: [], value: token });
                    else
                        it.value = token;
                    break;
                }
                case 'flow-collection': {
                    const it = top.items[top.items.length - 1];
                    if (!it || it.value)
                        top.items.push({ start: [], key: token, sep: [] });
                    else if (it.sep)
                        it.value = token;
                    else
                        Object.assign(it, { key: token, sep: [] });
                    return;
                }
                /* istanbul ignore next should not happen */
                default:
                    yield* this.pop();
                    yield* this.pop(token);
            }
            if ((top.type === 'document' ||
                top.type === 'block-map' ||
                top.type === 'block-seq') &&
                (token.type === 'block-map' || token.type === 'block-seq')) {
                const last = token.items[token.items.length - 1];
                if (last &&
                    !last.sep &&
                    !last.value &&
                    last.start.length > 0 &&
                    findNonEmptyIndex(last.start) === -1 &&
                    (token.indent === 0 ||
                        last.start.every(st => st.type !== 'comment' || st.indent < token.indent))) {
                    if (top.type === 'document')
                        top.end = last.start;
                    else
                        top.items.push({ start: last.start });
                    token.items.splice(-1, 1);
                }
            }
        }
    }
    *stream() {
        switch (this.type) {
            case 'directive-line':
                yield { type: 'directive', offset: this.offset, source: this.source };
                return;
            case 'byte-order-mark':
            case 'space':
            case 'comment':
            case 'newline':
                yield this.sourceToken;
                return;
            case 'doc-mode':
            case 'doc-start': {
                const doc = {
                    type: 'document',
                    offset: this.offset,
                    start: []
                };
                if (this.type === 'doc-start')
                    doc.start.push(this.sourceToken);
                this.stack.push(doc);
                return;
            }
        }
        yield {
            type: 'error',
            offset: this.offset,
            message: `Unexpected ${this.type} token in YAML stream`,
            source: this.source
        };
    }
    *document(doc) {
        if (doc.value)
            return yield* this.lineEnd(doc);
        switch (this.type) {
            case 'doc-start': {
                if (findNonEmptyIndex(doc.start) !== -1) {
                    yield* this.pop();
                    yield* this.step();
                }
                else
                    doc.start.push(this.sourceToken);
                return;
            }
            case 'anchor':
            case 'tag':
            case 'space':
            case 'comment':
            case 'newline':
                doc.start.push(this.sourceToken);
                return;
        }
        const bv = this.startBlockValue(doc);
        if (bv)
            this.stack.push(bv);
        else {
            yield {
                type: 'error',
                offset: this.offset,
                message: `Unexpected ${this.type} token in YAML document`,
                source: this.source
            };
        }
    }
    *scalar(scalar) {
        if (this.type === 'map-value-ind') {
            const prev = getPrevProps(this.peek(2));
            const start = getFirstKeyStartProps(prev);
            let sep;
            if (scalar.end) {
                sep = scalar.end;
                sep.push(this.sourceToken);
                delete scalar.end;
            }
            else
                sep = [this.sourceToken];
            const map = {
                type: 'block-map',
                offset: scalar.offset,
                indent: scalar.indent,
                items: [{ start, key: scalar, sep }]
            };
            this.onKeyLine = true;
            this.stack[this.stack.length - 1] = map;
        }
        else
            yield* this.lineEnd(scalar);
    }
    *blockScalar(scalar) {
        switch (this.type) {
            case 'space':
            case 'comment':
            case 'newline':
                scalar.props.push(this.sourceToken);
                return;
            case 'scalar':
                scalar.source = this.source;
                // block-scalar source includes trailing newline
                this.atNewLine = true;
                this.indent = 0;
                if (this.onNewLine) {
                    let nl = this.source.indexOf('\n') + 1;
                    while (nl !== 0) {
                        this.onNewLine(this.offset + nl);
                        nl = this.source.indexOf('\n', nl) + 1;
                    }
                }
                yield* this.pop();
                break;
            /* istanbul ignore next should not happen */
            default:
                yield* this.pop();
                yield* this.step();
        }
    }
    *blockMap(map) {
        const it = map.items[map.items.length - 1];
        // it.sep is true-ish if pair already has key or : separator
        switch (this.type) {
            case 'newline':
                this.onKeyLine = false;
                if (it.value) {
                    const end = 'end' in it.value ? it.value.end : undefined;
                    const last = Array.isArray(end) ? end[end.length - 1] : undefined;
                    if (last?.type === 'comment')
                        end?.push(this.sourceToken);
                    else
                        map.items.push({ start: [this.sourceToken] });
                }
                else if (it.sep) {
                    it.sep.push(this.sourceToken);
                }
                else {
                    it.start.push(this.sourceToken);
                }
                return;
            case 'space':
            case 'comment':
                if (it.value) {
                    map.items.push({ start: [this.sourceToken] });
                }
                else if (it.sep) {
                    it.sep.push(this.sourceToken);
                }
                else {
                    if (this.atIndentedComment(it.start, map.indent)) {
                        const prev = map.items[map.items.length - 2];
                        const end = prev?.value?.end;
                        if (Array.isArray(end)) {
                            arrayPushArray(end, it.start);
                            end.push(this.sourceToken);
                            map.items.pop();
                            return;
                        }
                    }
                    it.start.push(this.sourceToken);
                }
                return;
        }
        if (this.indent >= map.indent) {
            const atMapIndent = !this.onKeyLine && this.indent === map.indent;
            const atNextItem = atMapIndent &&
                (it.sep || it.explicitKey) &&
                this.type !== 'seq-item-ind';
            // For empty nodes, assign newline-separated not indented empty tokens to following node
            let start = [];
            if (atNextItem && it.sep && !it.value) {
                const nl = [];
                for (let i = 0; i < it.sep.length; ++i) {
                    const st = it.sep[i];
                    switch (st.type) {
                        case 'newline':
                            nl.push(i);
                            break;
                        case 'space':
                            break;
                        case 'comment':
                            if (st.indent > map.indent)
                                nl.length = 0;
                            break;
                        default:
                            nl.length = 0;
                    }
                }
                if (nl.length >= 2)
                    start = it.sep.splice(nl[1]);
            }
            switch (this.type) {
                case 'anchor':
                case 'tag':
                    if (atNextItem || it.value) {
                        start.push(this.sourceToken);
                        map.items.push({ start });
                        this.onKeyLine = true;
                    }
                    else if (it.sep) {
                        it.sep.push(this.sourceToken);
                    }
                    else {
                        it.start.push(this.sourceToken);
                    }
                    return;
                case 'explicit-key-ind':
                    if (!it.sep && !it.explicitKey) {
                        it.start.push(this.sourceToken);
                        it.explicitKey = true;
                    }
                    else if (atNextItem || it.value) {
                        start.push(this.sourceToken);
                        map.items.push({ start, explicitKey: true });
                    }
                    else {
                        this.stack.push({
                            type: 'block-map',
                            offset: this.offset,
                            indent: this.indent,
                            items: [{ start: [this.sourceToken], explicitKey: true }]
                        });
                    }
                    this.onKeyLine = true;
                    return;
                case 'map-value-ind':
                    if (it.explicitKey) {
                        if (!it.sep) {
                            if (includesToken(it.start, 'newline')) {
                                Object.assign(it, { key: null, sep: [this.sourceToken] });
                            }
                            else {
                                const start = getFirstKeyStartProps(it.start);
                                this.stack.push({
                                    type: 'block-map',
                                    offset: this.offset,
                                    indent: this.indent,
                                    items: [{ start, key: null, sep: [this.sourceToken] }]
                                });
                            }
                        }
                        else if (it.value) {
                            map.items.push({ start: [], key: null, sep: [this.sourceToken] });
                        }
                        else if (includesToken(it.sep, 'map-value-ind')) {
                            this.stack.push({
                                type: 'block-map',
                                offset: this.offset,
                                indent: this.indent,
                                items: [{ start, key: null, sep: [this.sourceToken] }]
                            });
                        }
                        else if (isFlowToken(it.key) &&
                            !includesToken(it.sep, 'newline')) {
                            const start = getFirstKeyStartProps(it.start);
                            const key = it.key;
                            const sep = it.sep;
                            sep.push(this.sourceToken);
                            // @ts-expect-error type guard is wrong here
                            delete it.key;
                            // @ts-expect-error type guard is wrong here
                            delete it.sep;
                            this.stack.push({
                                type: 'block-map',
                                offset: this.offset,
                                indent: this.indent,
                                items: [{ start, key, sep }]
                            });
                        }
                        else if (start.length > 0) {
                            // Not actually at next item
                            it.sep = it.sep.concat(start, this.sourceToken);
                        }
                        else {
                            it.sep.push(this.sourceToken);
                        }
                    }
                    else {
                        if (!it.sep) {
                            Object.assign(it, { key: null, sep: [this.sourceToken] });
                        }
                        else if (it.value || atNextItem) {
                            map.items.push({ start, key: null, sep: [this.sourceToken] });
                        }
                        else if (includesToken(it.sep, 'map-value-ind')) {
                            this.stack.push({
                                type: 'block-map',
                                offset: this.offset,
                                indent: this.indent,
                                items: [{ start: [], key: null, sep: [this.sourceToken] }]
                            });
                        }
                        else {
                            it.sep.push(this.sourceToken);
                        }
                    }
                    this.onKeyLine = true;
                    return;
                case 'alias':
                case 'scalar':
                case 'single-quoted-scalar':
                case 'double-quoted-scalar': {
                    const fs = this.flowScalar(this.type);
                    if (atNextItem || it.value) {
                        map.items.push({ start, key: fs, sep: [] });
                        this.onKeyLine = true;
                    }
                    else if (it.sep) {
                        this.stack.push(fs);
                    }
                    else {
                        Object.assign(it, { key: fs, sep: [] });
                        this.onKeyLine = true;
                    }
                    return;
                }
                default: {
                    const bv = this.startBlockValue(map);
                    if (bv) {
                        if (bv.type === 'block-seq') {
                            if (!it.explicitKey &&
                                it.sep &&
                                !includesToken(it.sep, 'newline')) {
                                yield* this.pop({
                                    type: 'error',
                                    offset: this.offset,
                                    message: 'Unexpected block-seq-ind on same line with key',
                                    source: this.source
                                });
                                return;
                            }
                        }
                        else if (atMapIndent) {
                            map.items.push({ start });
                        }
                        this.stack.push(bv);
                        return;
                    }
                }
            }
        }
        yield* this.pop();
        yield* this.step();
    }
    *blockSequence(seq) {
        const it = seq.items[seq.items.length - 1];
        switch (this.type) {
            case 'newline':
                if (it.value) {
                    const end = 'end' in it.value ? it.value.end : undefined;
                    const last = Array.isArray(end) ? end[end.length - 1] : undefined;
                    if (last?.type === 'comment')
                        end?.push(this.sourceToken);
                    else
                        seq.items.push({ start: [this.sourceToken] });
                }
                else
                    it.start.push(this.sourceToken);
                return;
            case 'space':
            case 'comment':
                if (it.value)
                    seq.items.push({ start: [this.sourceToken] });
                else {
                    if (this.atIndentedComment(it.start, seq.indent)) {
                        const prev = seq.items[seq.items.length - 2];
                        const end = prev?.value?.end;
                        if (Array.isArray(end)) {
                            arrayPushArray(end, it.start);
                            end.push(this.sourceToken);
                            seq.items.pop();
                            return;
                        }
                    }
                    it.start.push(this.sourceToken);
                }
                return;
            case 'anchor':
            case 'tag':
                if (it.value || this.indent <= seq.indent)
                    break;
                it.start.push(this.sourceToken);
                return;
            case 'seq-item-ind':
                if (this.indent !== seq.indent)
                    break;
                if (it.value || includesToken(it.start, 'seq-item-ind'))
                    seq.items.push({ start: [this.sourceToken] });
                else
                    it.start.push(this.sourceToken);
                return;
        }
        if (this.indent > seq.indent) {
            const bv = this.startBlockValue(seq);
            if (bv) {
                this.stack.push(bv);
                return;
            }
        }
        yield* this.pop();
        yield* this.step();
    }
    *flowCollection(fc) {
        const it = fc.items[fc.items.length - 1];
        if (this.type === 'flow-error-end') {
            let top;
            do {
                yield* this.pop();
                top = this.peek(1);
            } while (top?.type === 'flow-collection');
        }
        else if (fc.end.length === 0) {
            switch (this.type) {
                case 'comma':
                case 'explicit-key-ind':
                    if (!it || it.sep)
                        fc.items.push({ start: [this.sourceToken] });
                    else
                        it.start.push(this.sourceToken);
                    return;
                case 'map-value-ind':
                    if (!it || it.value)
                        fc.items.push({ start: [], key: null, sep: [this.sourceToken] });
                    else if (it.sep)
                        it.sep.push(this.sourceToken);
                    else
                        Object.assign(it, { key: null, sep: [this.sourceToken] });
                    return;
                case 'space':
                case 'comment':
                case 'newline':
                case 'anchor':
                case 'tag':
                    if (!it || it.value)
                        fc.items.push({ start: [this.sourceToken] });
                    else if (it.sep)
                        it.sep.push(this.sourceToken);
                    else
                        it.start.push(this.sourceToken);
                    return;
                case 'alias':
                case 'scalar':
                case 'single-quoted-scalar':
                case 'double-quoted-scalar': {
                    const fs = this.flowScalar(this.type);
                    if (!it || it.value)
                        fc.items.push({ start: [], key: fs, sep: [] });
                    else if (it.sep)
                        this.stack.push(fs);
                    else
                        Object.assign(it, { key: fs, sep: [] });
                    return;
                }
                case 'flow-map-end':
                case 'flow-seq-end':
                    fc.end.push(this.sourceToken);
                    return;
            }
            const bv = this.startBlockValue(fc);
            /* istanbul ignore else should not happen */
            if (bv)
                this.stack.push(bv);
            else {
                yield* this.pop();
                yield* this.step();
            }
        }
        else {
            const parent = this.peek(2);
            if (parent.type === 'block-map' &&
                ((this.type === 'map-value-ind' && parent.indent === fc.indent) ||
                    (this.type === 'newline' &&
                        !parent.items[parent.items.length - 1].sep))) {
                yield* this.pop();
                yield* this.step();
            }
            else if (this.type === 'map-value-ind' &&
                parent.type !== 'flow-collection') {
                const prev = getPrevProps(parent);
                const start = getFirstKeyStartProps(prev);
                fixFlowSeqItems(fc);
                const sep = fc.end.splice(1, fc.end.length);
                sep.push(this.sourceToken);
                const map = {
                    type: 'block-map',
                    offset: fc.offset,
                    indent: fc.indent,
                    items: [{ start, key: fc, sep }]
                };
                this.onKeyLine = true;
                this.stack[this.stack.length - 1] = map;
            }
            else {
                yield* this.lineEnd(fc);
            }
        }
    }
    flowScalar(type) {
        if (this.onNewLine) {
            let nl = this.source.indexOf('\n') + 1;
            while (nl !== 0) {
                this.onNewLine(this.offset + nl);
                nl = this.source.indexOf('\n', nl) + 1;
            }
        }
        return {
            type,
            offset: this.offset,
            indent: this.indent,
            source: this.source
        };
    }
    startBlockValue(parent) {
        switch (this.type) {
            case 'alias':
            case 'scalar':
            case 'single-quoted-scalar':
            case 'double-quoted-scalar':
                return this.flowScalar(this.type);
            case 'block-scalar-header':
                return {
                    type: 'block-scalar',
                    offset: this.offset,
                    indent: this.indent,
                    props: [this.sourceToken],
                    source: ''
                };
            case 'flow-map-start':
            case 'flow-seq-start':
                return {
                    type: 'flow-collection',
                    offset: this.offset,
                    indent: this.indent,
                    start: this.sourceToken,
                    items: [],
                    end: []
                };
            case 'seq-item-ind':
                return {
                    type: 'block-seq',
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start: [this.sourceToken] }]
                };
            case 'explicit-key-ind': {
                this.onKeyLine = true;
                const prev = getPrevProps(parent);
                const start = getFirstKeyStartProps(prev);
                start.push(this.sourceToken);
                return {
                    type: 'block-map',
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start, explicitKey: true }]
                };
            }
            case 'map-value-ind': {
                this.onKeyLine = true;
                const prev = getPrevProps(parent);
                const start = getFirstKeyStartProps(prev);
                return {
                    type: 'block-map',
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start, key: null, sep: [this.sourceToken] }]
                };
            }
        }
        return null;
    }
    atIndentedComment(start, indent) {
        if (this.type !== 'comment')
            return false;
        if (this.indent <= indent)
            return false;
        return start.every(st => st.type === 'newline' || st.type === 'space');
    }
    *documentEnd(docEnd) {
        if (this.type !== 'doc-mode') {
            if (docEnd.end)
                docEnd.end.push(this.sourceToken);
            else
                docEnd.end = [this.sourceToken];
            if (this.type === 'newline')
                yield* this.pop();
        }
    }
    *lineEnd(token) {
        switch (this.type) {
            case 'comma':
            case 'doc-start':
            case 'doc-end':
            case 'flow-seq-end':
            case 'flow-map-end':
            case 'map-value-ind':
                yield* this.pop();
                yield* this.step();
                break;
            case 'newline':
                this.onKeyLine = false;
            // fallthrough
            case 'space':
            case 'comment':
            default:
                // all other values are errors
                if (token.end)
                    token.end.push(this.sourceToken);
                else
                    token.end = [this.sourceToken];
                if (this.type === 'newline')
                    yield* this.pop();
        }
    }
}

exports.Parser = Parser;


/***/ }),

/***/ 4047:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var composer = __nccwpck_require__(9984);
var Document = __nccwpck_require__(3021);
var errors = __nccwpck_require__(1464);
var log = __nccwpck_require__(7249);
var identity = __nccwpck_require__(1127);
var lineCounter = __nccwpck_require__(6628);
var parser = __nccwpck_require__(3456);

function parseOptions(options) {
    const prettyErrors = options.prettyErrors !== false;
    const lineCounter$1 = options.lineCounter || (prettyErrors && new lineCounter.LineCounter()) || null;
    return { lineCounter: lineCounter$1, prettyErrors };
}
/**
 * Parse the input as a stream of YAML documents.
 *
 * Documents should be separated from each other by `...` or `---` marker lines.
 *
 * @returns If an empty `docs` array is returned, it will be of type
 *   EmptyStream and contain additional stream information. In
 *   TypeScript, you should use `'empty' in docs` as a type guard for it.
 */
function parseAllDocuments(source, options = {}) {
    const { lineCounter, prettyErrors } = parseOptions(options);
    const parser$1 = new parser.Parser(lineCounter?.addNewLine);
    const composer$1 = new composer.Composer(options);
    const docs = Array.from(composer$1.compose(parser$1.parse(source)));
    if (prettyErrors && lineCounter)
        for (const doc of docs) {
            doc.errors.forEach(errors.prettifyError(source, lineCounter));
            doc.warnings.forEach(errors.prettifyError(source, lineCounter));
        }
    if (docs.length > 0)
        return docs;
    return Object.assign([], { empty: true }, composer$1.streamInfo());
}
/** Parse an input string into a single YAML.Document */
function parseDocument(source, options = {}) {
    const { lineCounter, prettyErrors } = parseOptions(options);
    const parser$1 = new parser.Parser(lineCounter?.addNewLine);
    const composer$1 = new composer.Composer(options);
    // `doc` is always set by compose.end(true) at the very latest
    let doc = null;
    for (const _doc of composer$1.compose(parser$1.parse(source), true, source.length)) {
        if (!doc)
            doc = _doc;
        else if (doc.options.logLevel !== 'silent') {
            doc.errors.push(new errors.YAMLParseError(_doc.range.slice(0, 2), 'MULTIPLE_DOCS', 'Source contains multiple documents; please use YAML.parseAllDocuments()'));
            break;
        }
    }
    if (prettyErrors && lineCounter) {
        doc.errors.forEach(errors.prettifyError(source, lineCounter));
        doc.warnings.forEach(errors.prettifyError(source, lineCounter));
    }
    return doc;
}
function parse(src, reviver, options) {
    let _reviver = undefined;
    if (typeof reviver === 'function') {
        _reviver = reviver;
    }
    else if (options === undefined && reviver && typeof reviver === 'object') {
        options = reviver;
    }
    const doc = parseDocument(src, options);
    if (!doc)
        return null;
    doc.warnings.forEach(warning => log.warn(doc.options.logLevel, warning));
    if (doc.errors.length > 0) {
        if (doc.options.logLevel !== 'silent')
            throw doc.errors[0];
        else
            doc.errors = [];
    }
    return doc.toJS(Object.assign({ reviver: _reviver }, options));
}
function stringify(value, replacer, options) {
    let _replacer = null;
    if (typeof replacer === 'function' || Array.isArray(replacer)) {
        _replacer = replacer;
    }
    else if (options === undefined && replacer) {
        options = replacer;
    }
    if (typeof options === 'string')
        options = options.length;
    if (typeof options === 'number') {
        const indent = Math.round(options);
        options = indent < 1 ? undefined : indent > 8 ? { indent: 8 } : { indent };
    }
    if (value === undefined) {
        const { keepUndefined } = options ?? replacer ?? {};
        if (!keepUndefined)
            return undefined;
    }
    if (identity.isDocument(value) && !_replacer)
        return value.toString(options);
    return new Document.Document(value, _replacer, options).toString(options);
}

exports.parse = parse;
exports.parseAllDocuments = parseAllDocuments;
exports.parseDocument = parseDocument;
exports.stringify = stringify;


/***/ }),

/***/ 5840:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var map = __nccwpck_require__(7451);
var seq = __nccwpck_require__(1706);
var string = __nccwpck_require__(6464);
var tags = __nccwpck_require__(18);

const sortMapEntriesByKey = (a, b) => a.key < b.key ? -1 : a.key > b.key ? 1 : 0;
class Schema {
    constructor({ compat, customTags, merge, resolveKnownTags, schema, sortMapEntries, toStringDefaults }) {
        this.compat = Array.isArray(compat)
            ? tags.getTags(compat, 'compat')
            : compat
                ? tags.getTags(null, compat)
                : null;
        this.name = (typeof schema === 'string' && schema) || 'core';
        this.knownTags = resolveKnownTags ? tags.coreKnownTags : {};
        this.tags = tags.getTags(customTags, this.name, merge);
        this.toStringOptions = toStringDefaults ?? null;
        Object.defineProperty(this, identity.MAP, { value: map.map });
        Object.defineProperty(this, identity.SCALAR, { value: string.string });
        Object.defineProperty(this, identity.SEQ, { value: seq.seq });
        // Used by createMap()
        this.sortMapEntries =
            typeof sortMapEntries === 'function'
                ? sortMapEntries
                : sortMapEntries === true
                    ? sortMapEntriesByKey
                    : null;
    }
    clone() {
        const copy = Object.create(Schema.prototype, Object.getOwnPropertyDescriptors(this));
        copy.tags = this.tags.slice();
        return copy;
    }
}

exports.Schema = Schema;


/***/ }),

/***/ 7451:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var YAMLMap = __nccwpck_require__(4454);

const map = {
    collection: 'map',
    default: true,
    nodeClass: YAMLMap.YAMLMap,
    tag: 'tag:yaml.org,2002:map',
    resolve(map, onError) {
        if (!identity.isMap(map))
            onError('Expected a mapping for this tag');
        return map;
    },
    createNode: (schema, obj, ctx) => YAMLMap.YAMLMap.from(schema, obj, ctx)
};

exports.map = map;


/***/ }),

/***/ 3632:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);

const nullTag = {
    identify: value => value == null,
    createNode: () => new Scalar.Scalar(null),
    default: true,
    tag: 'tag:yaml.org,2002:null',
    test: /^(?:~|[Nn]ull|NULL)?$/,
    resolve: () => new Scalar.Scalar(null),
    stringify: ({ source }, ctx) => typeof source === 'string' && nullTag.test.test(source)
        ? source
        : ctx.options.nullStr
};

exports.nullTag = nullTag;


/***/ }),

/***/ 1706:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var YAMLSeq = __nccwpck_require__(2223);

const seq = {
    collection: 'seq',
    default: true,
    nodeClass: YAMLSeq.YAMLSeq,
    tag: 'tag:yaml.org,2002:seq',
    resolve(seq, onError) {
        if (!identity.isSeq(seq))
            onError('Expected a sequence for this tag');
        return seq;
    },
    createNode: (schema, obj, ctx) => YAMLSeq.YAMLSeq.from(schema, obj, ctx)
};

exports.seq = seq;


/***/ }),

/***/ 6464:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyString = __nccwpck_require__(3069);

const string = {
    identify: value => typeof value === 'string',
    default: true,
    tag: 'tag:yaml.org,2002:str',
    resolve: str => str,
    stringify(item, ctx, onComment, onChompKeep) {
        ctx = Object.assign({ actualString: true }, ctx);
        return stringifyString.stringifyString(item, ctx, onComment, onChompKeep);
    }
};

exports.string = string;


/***/ }),

/***/ 3959:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);

const boolTag = {
    identify: value => typeof value === 'boolean',
    default: true,
    tag: 'tag:yaml.org,2002:bool',
    test: /^(?:[Tt]rue|TRUE|[Ff]alse|FALSE)$/,
    resolve: str => new Scalar.Scalar(str[0] === 't' || str[0] === 'T'),
    stringify({ source, value }, ctx) {
        if (source && boolTag.test.test(source)) {
            const sv = source[0] === 't' || source[0] === 'T';
            if (value === sv)
                return source;
        }
        return value ? ctx.options.trueStr : ctx.options.falseStr;
    }
};

exports.boolTag = boolTag;


/***/ }),

/***/ 8405:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var stringifyNumber = __nccwpck_require__(8689);

const floatNaN = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    test: /^(?:[-+]?\.(?:inf|Inf|INF)|\.nan|\.NaN|\.NAN)$/,
    resolve: str => str.slice(-3).toLowerCase() === 'nan'
        ? NaN
        : str[0] === '-'
            ? Number.NEGATIVE_INFINITY
            : Number.POSITIVE_INFINITY,
    stringify: stringifyNumber.stringifyNumber
};
const floatExp = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    format: 'EXP',
    test: /^[-+]?(?:\.[0-9]+|[0-9]+(?:\.[0-9]*)?)[eE][-+]?[0-9]+$/,
    resolve: str => parseFloat(str),
    stringify(node) {
        const num = Number(node.value);
        return isFinite(num) ? num.toExponential() : stringifyNumber.stringifyNumber(node);
    }
};
const float = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    test: /^[-+]?(?:\.[0-9]+|[0-9]+\.[0-9]*)$/,
    resolve(str) {
        const node = new Scalar.Scalar(parseFloat(str));
        const dot = str.indexOf('.');
        if (dot !== -1 && str[str.length - 1] === '0')
            node.minFractionDigits = str.length - dot - 1;
        return node;
    },
    stringify: stringifyNumber.stringifyNumber
};

exports.float = float;
exports.floatExp = floatExp;
exports.floatNaN = floatNaN;


/***/ }),

/***/ 9874:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyNumber = __nccwpck_require__(8689);

const intIdentify = (value) => typeof value === 'bigint' || Number.isInteger(value);
const intResolve = (str, offset, radix, { intAsBigInt }) => (intAsBigInt ? BigInt(str) : parseInt(str.substring(offset), radix));
function intStringify(node, radix, prefix) {
    const { value } = node;
    if (intIdentify(value) && value >= 0)
        return prefix + value.toString(radix);
    return stringifyNumber.stringifyNumber(node);
}
const intOct = {
    identify: value => intIdentify(value) && value >= 0,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'OCT',
    test: /^0o[0-7]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 2, 8, opt),
    stringify: node => intStringify(node, 8, '0o')
};
const int = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    test: /^[-+]?[0-9]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 0, 10, opt),
    stringify: stringifyNumber.stringifyNumber
};
const intHex = {
    identify: value => intIdentify(value) && value >= 0,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'HEX',
    test: /^0x[0-9a-fA-F]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 2, 16, opt),
    stringify: node => intStringify(node, 16, '0x')
};

exports.int = int;
exports.intHex = intHex;
exports.intOct = intOct;


/***/ }),

/***/ 896:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var map = __nccwpck_require__(7451);
var _null = __nccwpck_require__(3632);
var seq = __nccwpck_require__(1706);
var string = __nccwpck_require__(6464);
var bool = __nccwpck_require__(3959);
var float = __nccwpck_require__(8405);
var int = __nccwpck_require__(9874);

const schema = [
    map.map,
    seq.seq,
    string.string,
    _null.nullTag,
    bool.boolTag,
    int.intOct,
    int.int,
    int.intHex,
    float.floatNaN,
    float.floatExp,
    float.float
];

exports.schema = schema;


/***/ }),

/***/ 3559:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var map = __nccwpck_require__(7451);
var seq = __nccwpck_require__(1706);

function intIdentify(value) {
    return typeof value === 'bigint' || Number.isInteger(value);
}
const stringifyJSON = ({ value }) => JSON.stringify(value);
const jsonScalars = [
    {
        identify: value => typeof value === 'string',
        default: true,
        tag: 'tag:yaml.org,2002:str',
        resolve: str => str,
        stringify: stringifyJSON
    },
    {
        identify: value => value == null,
        createNode: () => new Scalar.Scalar(null),
        default: true,
        tag: 'tag:yaml.org,2002:null',
        test: /^null$/,
        resolve: () => null,
        stringify: stringifyJSON
    },
    {
        identify: value => typeof value === 'boolean',
        default: true,
        tag: 'tag:yaml.org,2002:bool',
        test: /^true$|^false$/,
        resolve: str => str === 'true',
        stringify: stringifyJSON
    },
    {
        identify: intIdentify,
        default: true,
        tag: 'tag:yaml.org,2002:int',
        test: /^-?(?:0|[1-9][0-9]*)$/,
        resolve: (str, _onError, { intAsBigInt }) => intAsBigInt ? BigInt(str) : parseInt(str, 10),
        stringify: ({ value }) => intIdentify(value) ? value.toString() : JSON.stringify(value)
    },
    {
        identify: value => typeof value === 'number',
        default: true,
        tag: 'tag:yaml.org,2002:float',
        test: /^-?(?:0|[1-9][0-9]*)(?:\.[0-9]*)?(?:[eE][-+]?[0-9]+)?$/,
        resolve: str => parseFloat(str),
        stringify: stringifyJSON
    }
];
const jsonError = {
    default: true,
    tag: '',
    test: /^/,
    resolve(str, onError) {
        onError(`Unresolved plain scalar ${JSON.stringify(str)}`);
        return str;
    }
};
const schema = [map.map, seq.seq].concat(jsonScalars, jsonError);

exports.schema = schema;


/***/ }),

/***/ 18:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var map = __nccwpck_require__(7451);
var _null = __nccwpck_require__(3632);
var seq = __nccwpck_require__(1706);
var string = __nccwpck_require__(6464);
var bool = __nccwpck_require__(3959);
var float = __nccwpck_require__(8405);
var int = __nccwpck_require__(9874);
var schema = __nccwpck_require__(896);
var schema$1 = __nccwpck_require__(3559);
var binary = __nccwpck_require__(6083);
var merge = __nccwpck_require__(452);
var omap = __nccwpck_require__(303);
var pairs = __nccwpck_require__(8385);
var schema$2 = __nccwpck_require__(5913);
var set = __nccwpck_require__(1528);
var timestamp = __nccwpck_require__(6752);

const schemas = new Map([
    ['core', schema.schema],
    ['failsafe', [map.map, seq.seq, string.string]],
    ['json', schema$1.schema],
    ['yaml11', schema$2.schema],
    ['yaml-1.1', schema$2.schema]
]);
const tagsByName = {
    binary: binary.binary,
    bool: bool.boolTag,
    float: float.float,
    floatExp: float.floatExp,
    floatNaN: float.floatNaN,
    floatTime: timestamp.floatTime,
    int: int.int,
    intHex: int.intHex,
    intOct: int.intOct,
    intTime: timestamp.intTime,
    map: map.map,
    merge: merge.merge,
    null: _null.nullTag,
    omap: omap.omap,
    pairs: pairs.pairs,
    seq: seq.seq,
    set: set.set,
    timestamp: timestamp.timestamp
};
const coreKnownTags = {
    'tag:yaml.org,2002:binary': binary.binary,
    'tag:yaml.org,2002:merge': merge.merge,
    'tag:yaml.org,2002:omap': omap.omap,
    'tag:yaml.org,2002:pairs': pairs.pairs,
    'tag:yaml.org,2002:set': set.set,
    'tag:yaml.org,2002:timestamp': timestamp.timestamp
};
function getTags(customTags, schemaName, addMergeTag) {
    const schemaTags = schemas.get(schemaName);
    if (schemaTags && !customTags) {
        return addMergeTag && !schemaTags.includes(merge.merge)
            ? schemaTags.concat(merge.merge)
            : schemaTags.slice();
    }
    let tags = schemaTags;
    if (!tags) {
        if (Array.isArray(customTags))
            tags = [];
        else {
            const keys = Array.from(schemas.keys())
                .filter(key => key !== 'yaml11')
                .map(key => JSON.stringify(key))
                .join(', ');
            throw new Error(`Unknown schema "${schemaName}"; use one of ${keys} or define customTags array`);
        }
    }
    if (Array.isArray(customTags)) {
        for (const tag of customTags)
            tags = tags.concat(tag);
    }
    else if (typeof customTags === 'function') {
        tags = customTags(tags.slice());
    }
    if (addMergeTag)
        tags = tags.concat(merge.merge);
    return tags.reduce((tags, tag) => {
        const tagObj = typeof tag === 'string' ? tagsByName[tag] : tag;
        if (!tagObj) {
            const tagName = JSON.stringify(tag);
            const keys = Object.keys(tagsByName)
                .map(key => JSON.stringify(key))
                .join(', ');
            throw new Error(`Unknown custom tag ${tagName}; use one of ${keys}`);
        }
        if (!tags.includes(tagObj))
            tags.push(tagObj);
        return tags;
    }, []);
}

exports.coreKnownTags = coreKnownTags;
exports.getTags = getTags;


/***/ }),

/***/ 6083:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var node_buffer = __nccwpck_require__(181);
var Scalar = __nccwpck_require__(3301);
var stringifyString = __nccwpck_require__(3069);

const binary = {
    identify: value => value instanceof Uint8Array, // Buffer inherits from Uint8Array
    default: false,
    tag: 'tag:yaml.org,2002:binary',
    /**
     * Returns a Buffer in node and an Uint8Array in browsers
     *
     * To use the resulting buffer as an image, you'll want to do something like:
     *
     *   const blob = new Blob([buffer], { type: 'image/jpeg' })
     *   document.querySelector('#photo').src = URL.createObjectURL(blob)
     */
    resolve(src, onError) {
        if (typeof node_buffer.Buffer === 'function') {
            return node_buffer.Buffer.from(src, 'base64');
        }
        else if (typeof atob === 'function') {
            // On IE 11, atob() can't handle newlines
            const str = atob(src.replace(/[\n\r]/g, ''));
            const buffer = new Uint8Array(str.length);
            for (let i = 0; i < str.length; ++i)
                buffer[i] = str.charCodeAt(i);
            return buffer;
        }
        else {
            onError('This environment does not support reading binary tags; either Buffer or atob is required');
            return src;
        }
    },
    stringify({ comment, type, value }, ctx, onComment, onChompKeep) {
        if (!value)
            return '';
        const buf = value; // checked earlier by binary.identify()
        let str;
        if (typeof node_buffer.Buffer === 'function') {
            str =
                buf instanceof node_buffer.Buffer
                    ? buf.toString('base64')
                    : node_buffer.Buffer.from(buf.buffer).toString('base64');
        }
        else if (typeof btoa === 'function') {
            let s = '';
            for (let i = 0; i < buf.length; ++i)
                s += String.fromCharCode(buf[i]);
            str = btoa(s);
        }
        else {
            throw new Error('This environment does not support writing binary tags; either Buffer or btoa is required');
        }
        type ?? (type = Scalar.Scalar.BLOCK_LITERAL);
        if (type !== Scalar.Scalar.QUOTE_DOUBLE) {
            const lineWidth = Math.max(ctx.options.lineWidth - ctx.indent.length, ctx.options.minContentWidth);
            const n = Math.ceil(str.length / lineWidth);
            const lines = new Array(n);
            for (let i = 0, o = 0; i < n; ++i, o += lineWidth) {
                lines[i] = str.substr(o, lineWidth);
            }
            str = lines.join(type === Scalar.Scalar.BLOCK_LITERAL ? '\n' : ' ');
        }
        return stringifyString.stringifyString({ comment, type, value: str }, ctx, onComment, onChompKeep);
    }
};

exports.binary = binary;


/***/ }),

/***/ 8398:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);

function boolStringify({ value, source }, ctx) {
    const boolObj = value ? trueTag : falseTag;
    if (source && boolObj.test.test(source))
        return source;
    return value ? ctx.options.trueStr : ctx.options.falseStr;
}
const trueTag = {
    identify: value => value === true,
    default: true,
    tag: 'tag:yaml.org,2002:bool',
    test: /^(?:Y|y|[Yy]es|YES|[Tt]rue|TRUE|[Oo]n|ON)$/,
    resolve: () => new Scalar.Scalar(true),
    stringify: boolStringify
};
const falseTag = {
    identify: value => value === false,
    default: true,
    tag: 'tag:yaml.org,2002:bool',
    test: /^(?:N|n|[Nn]o|NO|[Ff]alse|FALSE|[Oo]ff|OFF)$/,
    resolve: () => new Scalar.Scalar(false),
    stringify: boolStringify
};

exports.falseTag = falseTag;
exports.trueTag = trueTag;


/***/ }),

/***/ 5782:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var stringifyNumber = __nccwpck_require__(8689);

const floatNaN = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    test: /^(?:[-+]?\.(?:inf|Inf|INF)|\.nan|\.NaN|\.NAN)$/,
    resolve: (str) => str.slice(-3).toLowerCase() === 'nan'
        ? NaN
        : str[0] === '-'
            ? Number.NEGATIVE_INFINITY
            : Number.POSITIVE_INFINITY,
    stringify: stringifyNumber.stringifyNumber
};
const floatExp = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    format: 'EXP',
    test: /^[-+]?(?:[0-9][0-9_]*)?(?:\.[0-9_]*)?[eE][-+]?[0-9]+$/,
    resolve: (str) => parseFloat(str.replace(/_/g, '')),
    stringify(node) {
        const num = Number(node.value);
        return isFinite(num) ? num.toExponential() : stringifyNumber.stringifyNumber(node);
    }
};
const float = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    test: /^[-+]?(?:[0-9][0-9_]*)?\.[0-9_]*$/,
    resolve(str) {
        const node = new Scalar.Scalar(parseFloat(str.replace(/_/g, '')));
        const dot = str.indexOf('.');
        if (dot !== -1) {
            const f = str.substring(dot + 1).replace(/_/g, '');
            if (f[f.length - 1] === '0')
                node.minFractionDigits = f.length;
        }
        return node;
    },
    stringify: stringifyNumber.stringifyNumber
};

exports.float = float;
exports.floatExp = floatExp;
exports.floatNaN = floatNaN;


/***/ }),

/***/ 873:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyNumber = __nccwpck_require__(8689);

const intIdentify = (value) => typeof value === 'bigint' || Number.isInteger(value);
function intResolve(str, offset, radix, { intAsBigInt }) {
    const sign = str[0];
    if (sign === '-' || sign === '+')
        offset += 1;
    str = str.substring(offset).replace(/_/g, '');
    if (intAsBigInt) {
        switch (radix) {
            case 2:
                str = `0b${str}`;
                break;
            case 8:
                str = `0o${str}`;
                break;
            case 16:
                str = `0x${str}`;
                break;
        }
        const n = BigInt(str);
        return sign === '-' ? BigInt(-1) * n : n;
    }
    const n = parseInt(str, radix);
    return sign === '-' ? -1 * n : n;
}
function intStringify(node, radix, prefix) {
    const { value } = node;
    if (intIdentify(value)) {
        const str = value.toString(radix);
        return value < 0 ? '-' + prefix + str.substr(1) : prefix + str;
    }
    return stringifyNumber.stringifyNumber(node);
}
const intBin = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'BIN',
    test: /^[-+]?0b[0-1_]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 2, 2, opt),
    stringify: node => intStringify(node, 2, '0b')
};
const intOct = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'OCT',
    test: /^[-+]?0[0-7_]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 1, 8, opt),
    stringify: node => intStringify(node, 8, '0')
};
const int = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    test: /^[-+]?[0-9][0-9_]*$/,
    resolve: (str, _onError, opt) => intResolve(str, 0, 10, opt),
    stringify: stringifyNumber.stringifyNumber
};
const intHex = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'HEX',
    test: /^[-+]?0x[0-9a-fA-F_]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 2, 16, opt),
    stringify: node => intStringify(node, 16, '0x')
};

exports.int = int;
exports.intBin = intBin;
exports.intHex = intHex;
exports.intOct = intOct;


/***/ }),

/***/ 452:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);

// If the value associated with a merge key is a single mapping node, each of
// its key/value pairs is inserted into the current mapping, unless the key
// already exists in it. If the value associated with the merge key is a
// sequence, then this sequence is expected to contain mapping nodes and each
// of these nodes is merged in turn according to its order in the sequence.
// Keys in mapping nodes earlier in the sequence override keys specified in
// later mapping nodes. -- http://yaml.org/type/merge.html
const MERGE_KEY = '<<';
const merge = {
    identify: value => value === MERGE_KEY ||
        (typeof value === 'symbol' && value.description === MERGE_KEY),
    default: 'key',
    tag: 'tag:yaml.org,2002:merge',
    test: /^<<$/,
    resolve: () => Object.assign(new Scalar.Scalar(Symbol(MERGE_KEY)), {
        addToJSMap: addMergeToJSMap
    }),
    stringify: () => MERGE_KEY
};
const isMergeKey = (ctx, key) => (merge.identify(key) ||
    (identity.isScalar(key) &&
        (!key.type || key.type === Scalar.Scalar.PLAIN) &&
        merge.identify(key.value))) &&
    ctx?.doc.schema.tags.some(tag => tag.tag === merge.tag && tag.default);
function addMergeToJSMap(ctx, map, value) {
    const source = resolveAliasValue(ctx, value);
    if (identity.isSeq(source))
        for (const it of source.items)
            mergeValue(ctx, map, it);
    else if (Array.isArray(source))
        for (const it of source)
            mergeValue(ctx, map, it);
    else
        mergeValue(ctx, map, source);
}
function mergeValue(ctx, map, value) {
    const source = resolveAliasValue(ctx, value);
    if (!identity.isMap(source))
        throw new Error('Merge sources must be maps or map aliases');
    const srcMap = source.toJSON(null, ctx, Map);
    for (const [key, value] of srcMap) {
        if (map instanceof Map) {
            if (!map.has(key))
                map.set(key, value);
        }
        else if (map instanceof Set) {
            map.add(key);
        }
        else if (!Object.prototype.hasOwnProperty.call(map, key)) {
            Object.defineProperty(map, key, {
                value,
                writable: true,
                enumerable: true,
                configurable: true
            });
        }
    }
    return map;
}
function resolveAliasValue(ctx, value) {
    return ctx && identity.isAlias(value) ? value.resolve(ctx.doc, ctx) : value;
}

exports.addMergeToJSMap = addMergeToJSMap;
exports.isMergeKey = isMergeKey;
exports.merge = merge;


/***/ }),

/***/ 303:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var toJS = __nccwpck_require__(4043);
var YAMLMap = __nccwpck_require__(4454);
var YAMLSeq = __nccwpck_require__(2223);
var pairs = __nccwpck_require__(8385);

class YAMLOMap extends YAMLSeq.YAMLSeq {
    constructor() {
        super();
        this.add = YAMLMap.YAMLMap.prototype.add.bind(this);
        this.delete = YAMLMap.YAMLMap.prototype.delete.bind(this);
        this.get = YAMLMap.YAMLMap.prototype.get.bind(this);
        this.has = YAMLMap.YAMLMap.prototype.has.bind(this);
        this.set = YAMLMap.YAMLMap.prototype.set.bind(this);
        this.tag = YAMLOMap.tag;
    }
    /**
     * If `ctx` is given, the return type is actually `Map<unknown, unknown>`,
     * but TypeScript won't allow widening the signature of a child method.
     */
    toJSON(_, ctx) {
        if (!ctx)
            return super.toJSON(_);
        const map = new Map();
        if (ctx?.onCreate)
            ctx.onCreate(map);
        for (const pair of this.items) {
            let key, value;
            if (identity.isPair(pair)) {
                key = toJS.toJS(pair.key, '', ctx);
                value = toJS.toJS(pair.value, key, ctx);
            }
            else {
                key = toJS.toJS(pair, '', ctx);
            }
            if (map.has(key))
                throw new Error('Ordered maps must not include duplicate keys');
            map.set(key, value);
        }
        return map;
    }
    static from(schema, iterable, ctx) {
        const pairs$1 = pairs.createPairs(schema, iterable, ctx);
        const omap = new this();
        omap.items = pairs$1.items;
        return omap;
    }
}
YAMLOMap.tag = 'tag:yaml.org,2002:omap';
const omap = {
    collection: 'seq',
    identify: value => value instanceof Map,
    nodeClass: YAMLOMap,
    default: false,
    tag: 'tag:yaml.org,2002:omap',
    resolve(seq, onError) {
        const pairs$1 = pairs.resolvePairs(seq, onError);
        const seenKeys = [];
        for (const { key } of pairs$1.items) {
            if (identity.isScalar(key)) {
                if (seenKeys.includes(key.value)) {
                    onError(`Ordered maps must not include duplicate keys: ${key.value}`);
                }
                else {
                    seenKeys.push(key.value);
                }
            }
        }
        return Object.assign(new YAMLOMap(), pairs$1);
    },
    createNode: (schema, iterable, ctx) => YAMLOMap.from(schema, iterable, ctx)
};

exports.YAMLOMap = YAMLOMap;
exports.omap = omap;


/***/ }),

/***/ 8385:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var Scalar = __nccwpck_require__(3301);
var YAMLSeq = __nccwpck_require__(2223);

function resolvePairs(seq, onError) {
    if (identity.isSeq(seq)) {
        for (let i = 0; i < seq.items.length; ++i) {
            let item = seq.items[i];
            if (identity.isPair(item))
                continue;
            else if (identity.isMap(item)) {
                if (item.items.length > 1)
                    onError('Each pair must have its own sequence indicator');
                const pair = item.items[0] || new Pair.Pair(new Scalar.Scalar(null));
                if (item.commentBefore)
                    pair.key.commentBefore = pair.key.commentBefore
                        ? `${item.commentBefore}\n${pair.key.commentBefore}`
                        : item.commentBefore;
                if (item.comment) {
                    const cn = pair.value ?? pair.key;
                    cn.comment = cn.comment
                        ? `${item.comment}\n${cn.comment}`
                        : item.comment;
                }
                item = pair;
            }
            seq.items[i] = identity.isPair(item) ? item : new Pair.Pair(item);
        }
    }
    else
        onError('Expected a sequence for this tag');
    return seq;
}
function createPairs(schema, iterable, ctx) {
    const { replacer } = ctx;
    const pairs = new YAMLSeq.YAMLSeq(schema);
    pairs.tag = 'tag:yaml.org,2002:pairs';
    let i = 0;
    if (iterable && Symbol.iterator in Object(iterable))
        for (let it of iterable) {
            if (typeof replacer === 'function')
                it = replacer.call(iterable, String(i++), it);
            let key, value;
            if (Array.isArray(it)) {
                if (it.length === 2) {
                    key = it[0];
                    value = it[1];
                }
                else
                    throw new TypeError(`Expected [key, value] tuple: ${it}`);
            }
            else if (it && it instanceof Object) {
                const keys = Object.keys(it);
                if (keys.length === 1) {
                    key = keys[0];
                    value = it[key];
                }
                else {
                    throw new TypeError(`Expected tuple with one key, not ${keys.length} keys`);
                }
            }
            else {
                key = it;
            }
            pairs.items.push(Pair.createPair(key, value, ctx));
        }
    return pairs;
}
const pairs = {
    collection: 'seq',
    default: false,
    tag: 'tag:yaml.org,2002:pairs',
    resolve: resolvePairs,
    createNode: createPairs
};

exports.createPairs = createPairs;
exports.pairs = pairs;
exports.resolvePairs = resolvePairs;


/***/ }),

/***/ 5913:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var map = __nccwpck_require__(7451);
var _null = __nccwpck_require__(3632);
var seq = __nccwpck_require__(1706);
var string = __nccwpck_require__(6464);
var binary = __nccwpck_require__(6083);
var bool = __nccwpck_require__(8398);
var float = __nccwpck_require__(5782);
var int = __nccwpck_require__(873);
var merge = __nccwpck_require__(452);
var omap = __nccwpck_require__(303);
var pairs = __nccwpck_require__(8385);
var set = __nccwpck_require__(1528);
var timestamp = __nccwpck_require__(6752);

const schema = [
    map.map,
    seq.seq,
    string.string,
    _null.nullTag,
    bool.trueTag,
    bool.falseTag,
    int.intBin,
    int.intOct,
    int.int,
    int.intHex,
    float.floatNaN,
    float.floatExp,
    float.float,
    binary.binary,
    merge.merge,
    omap.omap,
    pairs.pairs,
    set.set,
    timestamp.intTime,
    timestamp.floatTime,
    timestamp.timestamp
];

exports.schema = schema;


/***/ }),

/***/ 1528:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var YAMLMap = __nccwpck_require__(4454);

class YAMLSet extends YAMLMap.YAMLMap {
    constructor(schema) {
        super(schema);
        this.tag = YAMLSet.tag;
    }
    add(key) {
        let pair;
        if (identity.isPair(key))
            pair = key;
        else if (key &&
            typeof key === 'object' &&
            'key' in key &&
            'value' in key &&
            key.value === null)
            pair = new Pair.Pair(key.key, null);
        else
            pair = new Pair.Pair(key, null);
        const prev = YAMLMap.findPair(this.items, pair.key);
        if (!prev)
            this.items.push(pair);
    }
    /**
     * If `keepPair` is `true`, returns the Pair matching `key`.
     * Otherwise, returns the value of that Pair's key.
     */
    get(key, keepPair) {
        const pair = YAMLMap.findPair(this.items, key);
        return !keepPair && identity.isPair(pair)
            ? identity.isScalar(pair.key)
                ? pair.key.value
                : pair.key
            : pair;
    }
    set(key, value) {
        if (typeof value !== 'boolean')
            throw new Error(`Expected boolean value for set(key, value) in a YAML set, not ${typeof value}`);
        const prev = YAMLMap.findPair(this.items, key);
        if (prev && !value) {
            this.items.splice(this.items.indexOf(prev), 1);
        }
        else if (!prev && value) {
            this.items.push(new Pair.Pair(key));
        }
    }
    toJSON(_, ctx) {
        return super.toJSON(_, ctx, Set);
    }
    toString(ctx, onComment, onChompKeep) {
        if (!ctx)
            return JSON.stringify(this);
        if (this.hasAllNullValues(true))
            return super.toString(Object.assign({}, ctx, { allNullValues: true }), onComment, onChompKeep);
        else
            throw new Error('Set items must all have null values');
    }
    static from(schema, iterable, ctx) {
        const { replacer } = ctx;
        const set = new this(schema);
        if (iterable && Symbol.iterator in Object(iterable))
            for (let value of iterable) {
                if (typeof replacer === 'function')
                    value = replacer.call(iterable, value, value);
                set.items.push(Pair.createPair(value, null, ctx));
            }
        return set;
    }
}
YAMLSet.tag = 'tag:yaml.org,2002:set';
const set = {
    collection: 'map',
    identify: value => value instanceof Set,
    nodeClass: YAMLSet,
    default: false,
    tag: 'tag:yaml.org,2002:set',
    createNode: (schema, iterable, ctx) => YAMLSet.from(schema, iterable, ctx),
    resolve(map, onError) {
        if (identity.isMap(map)) {
            if (map.hasAllNullValues(true))
                return Object.assign(new YAMLSet(), map);
            else
                onError('Set items must all have null values');
        }
        else
            onError('Expected a mapping for this tag');
        return map;
    }
};

exports.YAMLSet = YAMLSet;
exports.set = set;


/***/ }),

/***/ 6752:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyNumber = __nccwpck_require__(8689);

/** Internal types handle bigint as number, because TS can't figure it out. */
function parseSexagesimal(str, asBigInt) {
    const sign = str[0];
    const parts = sign === '-' || sign === '+' ? str.substring(1) : str;
    const num = (n) => asBigInt ? BigInt(n) : Number(n);
    const res = parts
        .replace(/_/g, '')
        .split(':')
        .reduce((res, p) => res * num(60) + num(p), num(0));
    return (sign === '-' ? num(-1) * res : res);
}
/**
 * hhhh:mm:ss.sss
 *
 * Internal types handle bigint as number, because TS can't figure it out.
 */
function stringifySexagesimal(node) {
    let { value } = node;
    let num = (n) => n;
    if (typeof value === 'bigint')
        num = n => BigInt(n);
    else if (isNaN(value) || !isFinite(value))
        return stringifyNumber.stringifyNumber(node);
    let sign = '';
    if (value < 0) {
        sign = '-';
        value *= num(-1);
    }
    const _60 = num(60);
    const parts = [value % _60]; // seconds, including ms
    if (value < 60) {
        parts.unshift(0); // at least one : is required
    }
    else {
        value = (value - parts[0]) / _60;
        parts.unshift(value % _60); // minutes
        if (value >= 60) {
            value = (value - parts[0]) / _60;
            parts.unshift(value); // hours
        }
    }
    return (sign +
        parts
            .map(n => String(n).padStart(2, '0'))
            .join(':')
            .replace(/000000\d*$/, '') // % 60 may introduce error
    );
}
const intTime = {
    identify: value => typeof value === 'bigint' || Number.isInteger(value),
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'TIME',
    test: /^[-+]?[0-9][0-9_]*(?::[0-5]?[0-9])+$/,
    resolve: (str, _onError, { intAsBigInt }) => parseSexagesimal(str, intAsBigInt),
    stringify: stringifySexagesimal
};
const floatTime = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    format: 'TIME',
    test: /^[-+]?[0-9][0-9_]*(?::[0-5]?[0-9])+\.[0-9_]*$/,
    resolve: str => parseSexagesimal(str, false),
    stringify: stringifySexagesimal
};
const timestamp = {
    identify: value => value instanceof Date,
    default: true,
    tag: 'tag:yaml.org,2002:timestamp',
    // If the time zone is omitted, the timestamp is assumed to be specified in UTC. The time part
    // may be omitted altogether, resulting in a date format. In such a case, the time part is
    // assumed to be 00:00:00Z (start of day, UTC).
    test: RegExp('^([0-9]{4})-([0-9]{1,2})-([0-9]{1,2})' + // YYYY-Mm-Dd
        '(?:' + // time is optional
        '(?:t|T|[ \\t]+)' + // t | T | whitespace
        '([0-9]{1,2}):([0-9]{1,2}):([0-9]{1,2}(\\.[0-9]+)?)' + // Hh:Mm:Ss(.ss)?
        '(?:[ \\t]*(Z|[-+][012]?[0-9](?::[0-9]{2})?))?' + // Z | +5 | -03:30
        ')?$'),
    resolve(str) {
        const match = str.match(timestamp.test);
        if (!match)
            throw new Error('!!timestamp expects a date, starting with yyyy-mm-dd');
        const [, year, month, day, hour, minute, second] = match.map(Number);
        const millisec = match[7] ? Number((match[7] + '00').substr(1, 3)) : 0;
        let date = Date.UTC(year, month - 1, day, hour || 0, minute || 0, second || 0, millisec);
        const tz = match[8];
        if (tz && tz !== 'Z') {
            let d = parseSexagesimal(tz, false);
            if (Math.abs(d) < 30)
                d *= 60;
            date -= 60000 * d;
        }
        return new Date(date);
    },
    stringify: ({ value }) => value?.toISOString().replace(/(T00:00:00)?\.000Z$/, '') ?? ''
};

exports.floatTime = floatTime;
exports.intTime = intTime;
exports.timestamp = timestamp;


/***/ }),

/***/ 4475:
/***/ ((__unused_webpack_module, exports) => {



const FOLD_FLOW = 'flow';
const FOLD_BLOCK = 'block';
const FOLD_QUOTED = 'quoted';
/**
 * Tries to keep input at up to `lineWidth` characters, splitting only on spaces
 * not followed by newlines or spaces unless `mode` is `'quoted'`. Lines are
 * terminated with `\n` and started with `indent`.
 */
function foldFlowLines(text, indent, mode = 'flow', { indentAtStart, lineWidth = 80, minContentWidth = 20, onFold, onOverflow } = {}) {
    if (!lineWidth || lineWidth < 0)
        return text;
    if (lineWidth < minContentWidth)
        minContentWidth = 0;
    const endStep = Math.max(1 + minContentWidth, 1 + lineWidth - indent.length);
    if (text.length <= endStep)
        return text;
    const folds = [];
    const escapedFolds = {};
    let end = lineWidth - indent.length;
    if (typeof indentAtStart === 'number') {
        if (indentAtStart > lineWidth - Math.max(2, minContentWidth))
            folds.push(0);
        else
            end = lineWidth - indentAtStart;
    }
    let split = undefined;
    let prev = undefined;
    let overflow = false;
    let i = -1;
    let escStart = -1;
    let escEnd = -1;
    if (mode === FOLD_BLOCK) {
        i = consumeMoreIndentedLines(text, i, indent.length);
        if (i !== -1)
            end = i + endStep;
    }
    for (let ch; (ch = text[(i += 1)]);) {
        if (mode === FOLD_QUOTED && ch === '\\') {
            escStart = i;
            switch (text[i + 1]) {
                case 'x':
                    i += 3;
                    break;
                case 'u':
                    i += 5;
                    break;
                case 'U':
                    i += 9;
                    break;
                default:
                    i += 1;
            }
            escEnd = i;
        }
        if (ch === '\n') {
            if (mode === FOLD_BLOCK)
                i = consumeMoreIndentedLines(text, i, indent.length);
            end = i + indent.length + endStep;
            split = undefined;
        }
        else {
            if (ch === ' ' &&
                prev &&
                prev !== ' ' &&
                prev !== '\n' &&
                prev !== '\t') {
                // space surrounded by non-space can be replaced with newline + indent
                const next = text[i + 1];
                if (next && next !== ' ' && next !== '\n' && next !== '\t')
                    split = i;
            }
            if (i >= end) {
                if (split) {
                    folds.push(split);
                    end = split + endStep;
                    split = undefined;
                }
                else if (mode === FOLD_QUOTED) {
                    // white-space collected at end may stretch past lineWidth
                    while (prev === ' ' || prev === '\t') {
                        prev = ch;
                        ch = text[(i += 1)];
                        overflow = true;
                    }
                    // Account for newline escape, but don't break preceding escape
                    const j = i > escEnd + 1 ? i - 2 : escStart - 1;
                    // Bail out if lineWidth & minContentWidth are shorter than an escape string
                    if (escapedFolds[j])
                        return text;
                    folds.push(j);
                    escapedFolds[j] = true;
                    end = j + endStep;
                    split = undefined;
                }
                else {
                    overflow = true;
                }
            }
        }
        prev = ch;
    }
    if (overflow && onOverflow)
        onOverflow();
    if (folds.length === 0)
        return text;
    if (onFold)
        onFold();
    let res = text.slice(0, folds[0]);
    for (let i = 0; i < folds.length; ++i) {
        const fold = folds[i];
        const end = folds[i + 1] || text.length;
        if (fold === 0)
            res = `\n${indent}${text.slice(0, end)}`;
        else {
            if (mode === FOLD_QUOTED && escapedFolds[fold])
                res += `${text[fold]}\\`;
            res += `\n${indent}${text.slice(fold + 1, end)}`;
        }
    }
    return res;
}
/**
 * Presumes `i + 1` is at the start of a line
 * @returns index of last newline in more-indented block
 */
function consumeMoreIndentedLines(text, i, indent) {
    let end = i;
    let start = i + 1;
    let ch = text[start];
    while (ch === ' ' || ch === '\t') {
        if (i < start + indent) {
            ch = text[++i];
        }
        else {
            do {
                ch = text[++i];
            } while (ch && ch !== '\n');
            end = i;
            start = i + 1;
            ch = text[start];
        }
    }
    return end;
}

exports.FOLD_BLOCK = FOLD_BLOCK;
exports.FOLD_FLOW = FOLD_FLOW;
exports.FOLD_QUOTED = FOLD_QUOTED;
exports.foldFlowLines = foldFlowLines;


/***/ }),

/***/ 2148:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var anchors = __nccwpck_require__(1596);
var identity = __nccwpck_require__(1127);
var stringifyComment = __nccwpck_require__(9799);
var stringifyString = __nccwpck_require__(3069);

function createStringifyContext(doc, options) {
    const opt = Object.assign({
        blockQuote: true,
        commentString: stringifyComment.stringifyComment,
        defaultKeyType: null,
        defaultStringType: 'PLAIN',
        directives: null,
        doubleQuotedAsJSON: false,
        doubleQuotedMinMultiLineLength: 40,
        falseStr: 'false',
        flowCollectionPadding: true,
        indentSeq: true,
        lineWidth: 80,
        minContentWidth: 20,
        nullStr: 'null',
        simpleKeys: false,
        singleQuote: null,
        trailingComma: false,
        trueStr: 'true',
        verifyAliasOrder: true
    }, doc.schema.toStringOptions, options);
    let inFlow;
    switch (opt.collectionStyle) {
        case 'block':
            inFlow = false;
            break;
        case 'flow':
            inFlow = true;
            break;
        default:
            inFlow = null;
    }
    return {
        anchors: new Set(),
        doc,
        flowCollectionPadding: opt.flowCollectionPadding ? ' ' : '',
        indent: '',
        indentStep: typeof opt.indent === 'number' ? ' '.repeat(opt.indent) : '  ',
        inFlow,
        options: opt
    };
}
function getTagObject(tags, item) {
    if (item.tag) {
        const match = tags.filter(t => t.tag === item.tag);
        if (match.length > 0)
            return match.find(t => t.format === item.format) ?? match[0];
    }
    let tagObj = undefined;
    let obj;
    if (identity.isScalar(item)) {
        obj = item.value;
        let match = tags.filter(t => t.identify?.(obj));
        if (match.length > 1) {
            const testMatch = match.filter(t => t.test);
            if (testMatch.length > 0)
                match = testMatch;
        }
        tagObj =
            match.find(t => t.format === item.format) ?? match.find(t => !t.format);
    }
    else {
        obj = item;
        tagObj = tags.find(t => t.nodeClass && obj instanceof t.nodeClass);
    }
    if (!tagObj) {
        const name = obj?.constructor?.name ?? (obj === null ? 'null' : typeof obj);
        throw new Error(`Tag not resolved for ${name} value`);
    }
    return tagObj;
}
// needs to be called before value stringifier to allow for circular anchor refs
function stringifyProps(node, tagObj, { anchors: anchors$1, doc }) {
    if (!doc.directives)
        return '';
    const props = [];
    const anchor = (identity.isScalar(node) || identity.isCollection(node)) && node.anchor;
    if (anchor && anchors.anchorIsValid(anchor)) {
        anchors$1.add(anchor);
        props.push(`&${anchor}`);
    }
    const tag = node.tag ?? (tagObj.default ? null : tagObj.tag);
    if (tag)
        props.push(doc.directives.tagString(tag));
    return props.join(' ');
}
function stringify(item, ctx, onComment, onChompKeep) {
    if (identity.isPair(item))
        return item.toString(ctx, onComment, onChompKeep);
    if (identity.isAlias(item)) {
        if (ctx.doc.directives)
            return item.toString(ctx);
        if (ctx.resolvedAliases?.has(item)) {
            throw new TypeError(`Cannot stringify circular structure without alias nodes`);
        }
        else {
            if (ctx.resolvedAliases)
                ctx.resolvedAliases.add(item);
            else
                ctx.resolvedAliases = new Set([item]);
            item = item.resolve(ctx.doc);
        }
    }
    let tagObj = undefined;
    const node = identity.isNode(item)
        ? item
        : ctx.doc.createNode(item, { onTagObj: o => (tagObj = o) });
    tagObj ?? (tagObj = getTagObject(ctx.doc.schema.tags, node));
    const props = stringifyProps(node, tagObj, ctx);
    if (props.length > 0)
        ctx.indentAtStart = (ctx.indentAtStart ?? 0) + props.length + 1;
    const str = typeof tagObj.stringify === 'function'
        ? tagObj.stringify(node, ctx, onComment, onChompKeep)
        : identity.isScalar(node)
            ? stringifyString.stringifyString(node, ctx, onComment, onChompKeep)
            : node.toString(ctx, onComment, onChompKeep);
    if (!props)
        return str;
    return identity.isScalar(node) || str[0] === '{' || str[0] === '['
        ? `${props} ${str}`
        : `${props}\n${ctx.indent}${str}`;
}

exports.createStringifyContext = createStringifyContext;
exports.stringify = stringify;


/***/ }),

/***/ 1212:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var stringify = __nccwpck_require__(2148);
var stringifyComment = __nccwpck_require__(9799);

function stringifyCollection(collection, ctx, options) {
    const flow = ctx.inFlow ?? collection.flow;
    const stringify = flow ? stringifyFlowCollection : stringifyBlockCollection;
    return stringify(collection, ctx, options);
}
function stringifyBlockCollection({ comment, items }, ctx, { blockItemPrefix, flowChars, itemIndent, onChompKeep, onComment }) {
    const { indent, options: { commentString } } = ctx;
    const itemCtx = Object.assign({}, ctx, { indent: itemIndent, type: null });
    let chompKeep = false; // flag for the preceding node's status
    const lines = [];
    for (let i = 0; i < items.length; ++i) {
        const item = items[i];
        let comment = null;
        if (identity.isNode(item)) {
            if (!chompKeep && item.spaceBefore)
                lines.push('');
            addCommentBefore(ctx, lines, item.commentBefore, chompKeep);
            if (item.comment)
                comment = item.comment;
        }
        else if (identity.isPair(item)) {
            const ik = identity.isNode(item.key) ? item.key : null;
            if (ik) {
                if (!chompKeep && ik.spaceBefore)
                    lines.push('');
                addCommentBefore(ctx, lines, ik.commentBefore, chompKeep);
            }
        }
        chompKeep = false;
        let str = stringify.stringify(item, itemCtx, () => (comment = null), () => (chompKeep = true));
        if (comment)
            str += stringifyComment.lineComment(str, itemIndent, commentString(comment));
        if (chompKeep && comment)
            chompKeep = false;
        lines.push(blockItemPrefix + str);
    }
    let str;
    if (lines.length === 0) {
        str = flowChars.start + flowChars.end;
    }
    else {
        str = lines[0];
        for (let i = 1; i < lines.length; ++i) {
            const line = lines[i];
            str += line ? `\n${indent}${line}` : '\n';
        }
    }
    if (comment) {
        str += '\n' + stringifyComment.indentComment(commentString(comment), indent);
        if (onComment)
            onComment();
    }
    else if (chompKeep && onChompKeep)
        onChompKeep();
    return str;
}
function stringifyFlowCollection({ items }, ctx, { flowChars, itemIndent }) {
    const { indent, indentStep, flowCollectionPadding: fcPadding, options: { commentString } } = ctx;
    itemIndent += indentStep;
    const itemCtx = Object.assign({}, ctx, {
        indent: itemIndent,
        inFlow: true,
        type: null
    });
    let reqNewline = false;
    let linesAtValue = 0;
    const lines = [];
    for (let i = 0; i < items.length; ++i) {
        const item = items[i];
        let comment = null;
        if (identity.isNode(item)) {
            if (item.spaceBefore)
                lines.push('');
            addCommentBefore(ctx, lines, item.commentBefore, false);
            if (item.comment)
                comment = item.comment;
        }
        else if (identity.isPair(item)) {
            const ik = identity.isNode(item.key) ? item.key : null;
            if (ik) {
                if (ik.spaceBefore)
                    lines.push('');
                addCommentBefore(ctx, lines, ik.commentBefore, false);
                if (ik.comment)
                    reqNewline = true;
            }
            const iv = identity.isNode(item.value) ? item.value : null;
            if (iv) {
                if (iv.comment)
                    comment = iv.comment;
                if (iv.commentBefore)
                    reqNewline = true;
            }
            else if (item.value == null && ik?.comment) {
                comment = ik.comment;
            }
        }
        if (comment)
            reqNewline = true;
        let str = stringify.stringify(item, itemCtx, () => (comment = null));
        reqNewline || (reqNewline = lines.length > linesAtValue || str.includes('\n'));
        if (i < items.length - 1) {
            str += ',';
        }
        else if (ctx.options.trailingComma) {
            if (ctx.options.lineWidth > 0) {
                reqNewline || (reqNewline = lines.reduce((sum, line) => sum + line.length + 2, 2) +
                    (str.length + 2) >
                    ctx.options.lineWidth);
            }
            if (reqNewline) {
                str += ',';
            }
        }
        if (comment)
            str += stringifyComment.lineComment(str, itemIndent, commentString(comment));
        lines.push(str);
        linesAtValue = lines.length;
    }
    const { start, end } = flowChars;
    if (lines.length === 0) {
        return start + end;
    }
    else {
        if (!reqNewline) {
            const len = lines.reduce((sum, line) => sum + line.length + 2, 2);
            reqNewline = ctx.options.lineWidth > 0 && len > ctx.options.lineWidth;
        }
        if (reqNewline) {
            let str = start;
            for (const line of lines)
                str += line ? `\n${indentStep}${indent}${line}` : '\n';
            return `${str}\n${indent}${end}`;
        }
        else {
            return `${start}${fcPadding}${lines.join(' ')}${fcPadding}${end}`;
        }
    }
}
function addCommentBefore({ indent, options: { commentString } }, lines, comment, chompKeep) {
    if (comment && chompKeep)
        comment = comment.replace(/^\n+/, '');
    if (comment) {
        const ic = stringifyComment.indentComment(commentString(comment), indent);
        lines.push(ic.trimStart()); // Avoid double indent on first line
    }
}

exports.stringifyCollection = stringifyCollection;


/***/ }),

/***/ 9799:
/***/ ((__unused_webpack_module, exports) => {



/**
 * Stringifies a comment.
 *
 * Empty comment lines are left empty,
 * lines consisting of a single space are replaced by `#`,
 * and all other lines are prefixed with a `#`.
 */
const stringifyComment = (str) => str.replace(/^(?!$)(?: $)?/gm, '#');
function indentComment(comment, indent) {
    if (/^\n+$/.test(comment))
        return comment.substring(1);
    return indent ? comment.replace(/^(?! *$)/gm, indent) : comment;
}
const lineComment = (str, indent, comment) => str.endsWith('\n')
    ? indentComment(comment, indent)
    : comment.includes('\n')
        ? '\n' + indentComment(comment, indent)
        : (str.endsWith(' ') ? '' : ' ') + comment;

exports.indentComment = indentComment;
exports.lineComment = lineComment;
exports.stringifyComment = stringifyComment;


/***/ }),

/***/ 6829:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var stringify = __nccwpck_require__(2148);
var stringifyComment = __nccwpck_require__(9799);

function stringifyDocument(doc, options) {
    const lines = [];
    let hasDirectives = options.directives === true;
    if (options.directives !== false && doc.directives) {
        const dir = doc.directives.toString(doc);
        if (dir) {
            lines.push(dir);
            hasDirectives = true;
        }
        else if (doc.directives.docStart)
            hasDirectives = true;
    }
    if (hasDirectives)
        lines.push('---');
    const ctx = stringify.createStringifyContext(doc, options);
    const { commentString } = ctx.options;
    if (doc.commentBefore) {
        if (lines.length !== 1)
            lines.unshift('');
        const cs = commentString(doc.commentBefore);
        lines.unshift(stringifyComment.indentComment(cs, ''));
    }
    let chompKeep = false;
    let contentComment = null;
    if (doc.contents) {
        if (identity.isNode(doc.contents)) {
            if (doc.contents.spaceBefore && hasDirectives)
                lines.push('');
            if (doc.contents.commentBefore) {
                const cs = commentString(doc.contents.commentBefore);
                lines.push(stringifyComment.indentComment(cs, ''));
            }
            // top-level block scalars need to be indented if followed by a comment
            ctx.forceBlockIndent = !!doc.comment;
            contentComment = doc.contents.comment;
        }
        const onChompKeep = contentComment ? undefined : () => (chompKeep = true);
        let body = stringify.stringify(doc.contents, ctx, () => (contentComment = null), onChompKeep);
        if (contentComment)
            body += stringifyComment.lineComment(body, '', commentString(contentComment));
        if ((body[0] === '|' || body[0] === '>') &&
            lines[lines.length - 1] === '---') {
            // Top-level block scalars with a preceding doc marker ought to use the
            // same line for their header.
            lines[lines.length - 1] = `--- ${body}`;
        }
        else
            lines.push(body);
    }
    else {
        lines.push(stringify.stringify(doc.contents, ctx));
    }
    if (doc.directives?.docEnd) {
        if (doc.comment) {
            const cs = commentString(doc.comment);
            if (cs.includes('\n')) {
                lines.push('...');
                lines.push(stringifyComment.indentComment(cs, ''));
            }
            else {
                lines.push(`... ${cs}`);
            }
        }
        else {
            lines.push('...');
        }
    }
    else {
        let dc = doc.comment;
        if (dc && chompKeep)
            dc = dc.replace(/^\n+/, '');
        if (dc) {
            if ((!chompKeep || contentComment) && lines[lines.length - 1] !== '')
                lines.push('');
            lines.push(stringifyComment.indentComment(commentString(dc), ''));
        }
    }
    return lines.join('\n') + '\n';
}

exports.stringifyDocument = stringifyDocument;


/***/ }),

/***/ 8689:
/***/ ((__unused_webpack_module, exports) => {



function stringifyNumber({ format, minFractionDigits, tag, value }) {
    if (typeof value === 'bigint')
        return String(value);
    const num = typeof value === 'number' ? value : Number(value);
    if (!isFinite(num))
        return isNaN(num) ? '.nan' : num < 0 ? '-.inf' : '.inf';
    let n = Object.is(value, -0) ? '-0' : JSON.stringify(value);
    if (!format &&
        minFractionDigits &&
        (!tag || tag === 'tag:yaml.org,2002:float') &&
        /^-?\d/.test(n) &&
        !n.includes('e')) {
        let i = n.indexOf('.');
        if (i < 0) {
            i = n.length;
            n += '.';
        }
        let d = minFractionDigits - (n.length - i - 1);
        while (d-- > 0)
            n += '0';
    }
    return n;
}

exports.stringifyNumber = stringifyNumber;


/***/ }),

/***/ 9748:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);
var stringify = __nccwpck_require__(2148);
var stringifyComment = __nccwpck_require__(9799);

function stringifyPair({ key, value }, ctx, onComment, onChompKeep) {
    const { allNullValues, doc, indent, indentStep, options: { commentString, indentSeq, simpleKeys } } = ctx;
    let keyComment = (identity.isNode(key) && key.comment) || null;
    if (simpleKeys) {
        if (keyComment) {
            throw new Error('With simple keys, key nodes cannot have comments');
        }
        if (identity.isCollection(key) || (!identity.isNode(key) && typeof key === 'object')) {
            const msg = 'With simple keys, collection cannot be used as a key value';
            throw new Error(msg);
        }
    }
    let explicitKey = !simpleKeys &&
        (!key ||
            (keyComment && value == null && !ctx.inFlow) ||
            identity.isCollection(key) ||
            (identity.isScalar(key)
                ? key.type === Scalar.Scalar.BLOCK_FOLDED || key.type === Scalar.Scalar.BLOCK_LITERAL
                : typeof key === 'object'));
    ctx = Object.assign({}, ctx, {
        allNullValues: false,
        implicitKey: !explicitKey && (simpleKeys || !allNullValues),
        indent: indent + indentStep
    });
    let keyCommentDone = false;
    let chompKeep = false;
    let str = stringify.stringify(key, ctx, () => (keyCommentDone = true), () => (chompKeep = true));
    if (!explicitKey && !ctx.inFlow && str.length > 1024) {
        if (simpleKeys)
            throw new Error('With simple keys, single line scalar must not span more than 1024 characters');
        explicitKey = true;
    }
    if (ctx.inFlow) {
        if (allNullValues || value == null) {
            if (keyCommentDone && onComment)
                onComment();
            return str === '' ? '?' : explicitKey ? `? ${str}` : str;
        }
    }
    else if ((allNullValues && !simpleKeys) || (value == null && explicitKey)) {
        str = `? ${str}`;
        if (keyComment && !keyCommentDone) {
            str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
        }
        else if (chompKeep && onChompKeep)
            onChompKeep();
        return str;
    }
    if (keyCommentDone)
        keyComment = null;
    if (explicitKey) {
        if (keyComment)
            str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
        str = `? ${str}\n${indent}:`;
    }
    else {
        str = `${str}:`;
        if (keyComment)
            str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
    }
    let vsb, vcb, valueComment;
    if (identity.isNode(value)) {
        vsb = !!value.spaceBefore;
        vcb = value.commentBefore;
        valueComment = value.comment;
    }
    else {
        vsb = false;
        vcb = null;
        valueComment = null;
        if (value && typeof value === 'object')
            value = doc.createNode(value);
    }
    ctx.implicitKey = false;
    if (!explicitKey && !keyComment && identity.isScalar(value))
        ctx.indentAtStart = str.length + 1;
    chompKeep = false;
    if (!indentSeq &&
        indentStep.length >= 2 &&
        !ctx.inFlow &&
        !explicitKey &&
        identity.isSeq(value) &&
        !value.flow &&
        !value.tag &&
        !value.anchor) {
        // If indentSeq === false, consider '- ' as part of indentation where possible
        ctx.indent = ctx.indent.substring(2);
    }
    let valueCommentDone = false;
    const valueStr = stringify.stringify(value, ctx, () => (valueCommentDone = true), () => (chompKeep = true));
    let ws = ' ';
    if (keyComment || vsb || vcb) {
        ws = vsb ? '\n' : '';
        if (vcb) {
            const cs = commentString(vcb);
            ws += `\n${stringifyComment.indentComment(cs, ctx.indent)}`;
        }
        if (valueStr === '' && !ctx.inFlow) {
            if (ws === '\n' && valueComment)
                ws = '\n\n';
        }
        else {
            ws += `\n${ctx.indent}`;
        }
    }
    else if (!explicitKey && identity.isCollection(value)) {
        const vs0 = valueStr[0];
        const nl0 = valueStr.indexOf('\n');
        const hasNewline = nl0 !== -1;
        const flow = ctx.inFlow ?? value.flow ?? value.items.length === 0;
        if (hasNewline || !flow) {
            let hasPropsLine = false;
            if (hasNewline && (vs0 === '&' || vs0 === '!')) {
                let sp0 = valueStr.indexOf(' ');
                if (vs0 === '&' &&
                    sp0 !== -1 &&
                    sp0 < nl0 &&
                    valueStr[sp0 + 1] === '!') {
                    sp0 = valueStr.indexOf(' ', sp0 + 1);
                }
                if (sp0 === -1 || nl0 < sp0)
                    hasPropsLine = true;
            }
            if (!hasPropsLine)
                ws = `\n${ctx.indent}`;
        }
    }
    else if (valueStr === '' || valueStr[0] === '\n') {
        ws = '';
    }
    str += ws + valueStr;
    if (ctx.inFlow) {
        if (valueCommentDone && onComment)
            onComment();
    }
    else if (valueComment && !valueCommentDone) {
        str += stringifyComment.lineComment(str, ctx.indent, commentString(valueComment));
    }
    else if (chompKeep && onChompKeep) {
        onChompKeep();
    }
    return str;
}

exports.stringifyPair = stringifyPair;


/***/ }),

/***/ 3069:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var foldFlowLines = __nccwpck_require__(4475);

const getFoldOptions = (ctx, isBlock) => ({
    indentAtStart: isBlock ? ctx.indent.length : ctx.indentAtStart,
    lineWidth: ctx.options.lineWidth,
    minContentWidth: ctx.options.minContentWidth
});
// Also checks for lines starting with %, as parsing the output as YAML 1.1 will
// presume that's starting a new document.
const containsDocumentMarker = (str) => /^(%|---|\.\.\.)/m.test(str);
function lineLengthOverLimit(str, lineWidth, indentLength) {
    if (!lineWidth || lineWidth < 0)
        return false;
    const limit = lineWidth - indentLength;
    const strLen = str.length;
    if (strLen <= limit)
        return false;
    for (let i = 0, start = 0; i < strLen; ++i) {
        if (str[i] === '\n') {
            if (i - start > limit)
                return true;
            start = i + 1;
            if (strLen - start <= limit)
                return false;
        }
    }
    return true;
}
function doubleQuotedString(value, ctx) {
    const json = JSON.stringify(value);
    if (ctx.options.doubleQuotedAsJSON)
        return json;
    const { implicitKey } = ctx;
    const minMultiLineLength = ctx.options.doubleQuotedMinMultiLineLength;
    const indent = ctx.indent || (containsDocumentMarker(value) ? '  ' : '');
    let str = '';
    let start = 0;
    for (let i = 0, ch = json[i]; ch; ch = json[++i]) {
        if (ch === ' ' && json[i + 1] === '\\' && json[i + 2] === 'n') {
            // space before newline needs to be escaped to not be folded
            str += json.slice(start, i) + '\\ ';
            i += 1;
            start = i;
            ch = '\\';
        }
        if (ch === '\\')
            switch (json[i + 1]) {
                case 'u':
                    {
                        str += json.slice(start, i);
                        const code = json.substr(i + 2, 4);
                        switch (code) {
                            case '0000':
                                str += '\\0';
                                break;
                            case '0007':
                                str += '\\a';
                                break;
                            case '000b':
                                str += '\\v';
                                break;
                            case '001b':
                                str += '\\e';
                                break;
                            case '0085':
                                str += '\\N';
                                break;
                            case '00a0':
                                str += '\\_';
                                break;
                            case '2028':
                                str += '\\L';
                                break;
                            case '2029':
                                str += '\\P';
                                break;
                            default:
                                if (code.substr(0, 2) === '00')
                                    str += '\\x' + code.substr(2);
                                else
                                    str += json.substr(i, 6);
                        }
                        i += 5;
                        start = i + 1;
                    }
                    break;
                case 'n':
                    if (implicitKey ||
                        json[i + 2] === '"' ||
                        json.length < minMultiLineLength) {
                        i += 1;
                    }
                    else {
                        // folding will eat first newline
                        str += json.slice(start, i) + '\n\n';
                        while (json[i + 2] === '\\' &&
                            json[i + 3] === 'n' &&
                            json[i + 4] !== '"') {
                            str += '\n';
                            i += 2;
                        }
                        str += indent;
                        // space after newline needs to be escaped to not be folded
                        if (json[i + 2] === ' ')
                            str += '\\';
                        i += 1;
                        start = i + 1;
                    }
                    break;
                default:
                    i += 1;
            }
    }
    str = start ? str + json.slice(start) : json;
    return implicitKey
        ? str
        : foldFlowLines.foldFlowLines(str, indent, foldFlowLines.FOLD_QUOTED, getFoldOptions(ctx, false));
}
function singleQuotedString(value, ctx) {
    if (ctx.options.singleQuote === false ||
        (ctx.implicitKey && value.includes('\n')) ||
        /[ \t]\n|\n[ \t]/.test(value) // single quoted string can't have leading or trailing whitespace around newline
    )
        return doubleQuotedString(value, ctx);
    const indent = ctx.indent || (containsDocumentMarker(value) ? '  ' : '');
    const res = "'" + value.replace(/'/g, "''").replace(/\n+/g, `$&\n${indent}`) + "'";
    return ctx.implicitKey
        ? res
        : foldFlowLines.foldFlowLines(res, indent, foldFlowLines.FOLD_FLOW, getFoldOptions(ctx, false));
}
function quotedString(value, ctx) {
    const { singleQuote } = ctx.options;
    let qs;
    if (singleQuote === false)
        qs = doubleQuotedString;
    else {
        const hasDouble = value.includes('"');
        const hasSingle = value.includes("'");
        if (hasDouble && !hasSingle)
            qs = singleQuotedString;
        else if (hasSingle && !hasDouble)
            qs = doubleQuotedString;
        else
            qs = singleQuote ? singleQuotedString : doubleQuotedString;
    }
    return qs(value, ctx);
}
// The negative lookbehind avoids a polynomial search,
// but isn't supported yet on Safari: https://caniuse.com/js-regexp-lookbehind
let blockEndNewlines;
try {
    blockEndNewlines = new RegExp('(^|(?<!\n))\n+(?!\n|$)', 'g');
}
catch {
    blockEndNewlines = /\n+(?!\n|$)/g;
}
function blockString({ comment, type, value }, ctx, onComment, onChompKeep) {
    const { blockQuote, commentString, lineWidth } = ctx.options;
    // 1. Block can't end in whitespace unless the last line is non-empty.
    // 2. Strings consisting of only whitespace are best rendered explicitly.
    if (!blockQuote || /\n[\t ]+$/.test(value)) {
        return quotedString(value, ctx);
    }
    const indent = ctx.indent ||
        (ctx.forceBlockIndent || containsDocumentMarker(value) ? '  ' : '');
    const literal = blockQuote === 'literal'
        ? true
        : blockQuote === 'folded' || type === Scalar.Scalar.BLOCK_FOLDED
            ? false
            : type === Scalar.Scalar.BLOCK_LITERAL
                ? true
                : !lineLengthOverLimit(value, lineWidth, indent.length);
    if (!value)
        return literal ? '|\n' : '>\n';
    // determine chomping from whitespace at value end
    let chomp;
    let endStart;
    for (endStart = value.length; endStart > 0; --endStart) {
        const ch = value[endStart - 1];
        if (ch !== '\n' && ch !== '\t' && ch !== ' ')
            break;
    }
    let end = value.substring(endStart);
    const endNlPos = end.indexOf('\n');
    if (endNlPos === -1) {
        chomp = '-'; // strip
    }
    else if (value === end || endNlPos !== end.length - 1) {
        chomp = '+'; // keep
        if (onChompKeep)
            onChompKeep();
    }
    else {
        chomp = ''; // clip
    }
    if (end) {
        value = value.slice(0, -end.length);
        if (end[end.length - 1] === '\n')
            end = end.slice(0, -1);
        end = end.replace(blockEndNewlines, `$&${indent}`);
    }
    // determine indent indicator from whitespace at value start
    let startWithSpace = false;
    let startEnd;
    let startNlPos = -1;
    for (startEnd = 0; startEnd < value.length; ++startEnd) {
        const ch = value[startEnd];
        if (ch === ' ')
            startWithSpace = true;
        else if (ch === '\n')
            startNlPos = startEnd;
        else
            break;
    }
    let start = value.substring(0, startNlPos < startEnd ? startNlPos + 1 : startEnd);
    if (start) {
        value = value.substring(start.length);
        start = start.replace(/\n+/g, `$&${indent}`);
    }
    const indentSize = indent ? '2' : '1'; // root is at -1
    // Leading | or > is added later
    let header = (startWithSpace ? indentSize : '') + chomp;
    if (comment) {
        header += ' ' + commentString(comment.replace(/ ?[\r\n]+/g, ' '));
        if (onComment)
            onComment();
    }
    if (!literal) {
        const foldedValue = value
            .replace(/\n+/g, '\n$&')
            .replace(/(?:^|\n)([\t ].*)(?:([\n\t ]*)\n(?![\n\t ]))?/g, '$1$2') // more-indented lines aren't folded
            //                ^ more-ind. ^ empty     ^ capture next empty lines only at end of indent
            .replace(/\n+/g, `$&${indent}`);
        let literalFallback = false;
        const foldOptions = getFoldOptions(ctx, true);
        if (blockQuote !== 'folded' && type !== Scalar.Scalar.BLOCK_FOLDED) {
            foldOptions.onOverflow = () => {
                literalFallback = true;
            };
        }
        const body = foldFlowLines.foldFlowLines(`${start}${foldedValue}${end}`, indent, foldFlowLines.FOLD_BLOCK, foldOptions);
        if (!literalFallback)
            return `>${header}\n${indent}${body}`;
    }
    value = value.replace(/\n+/g, `$&${indent}`);
    return `|${header}\n${indent}${start}${value}${end}`;
}
function plainString(item, ctx, onComment, onChompKeep) {
    const { type, value } = item;
    const { actualString, implicitKey, indent, indentStep, inFlow } = ctx;
    if ((implicitKey && value.includes('\n')) ||
        (inFlow && /[[\]{},]/.test(value))) {
        return quotedString(value, ctx);
    }
    if (/^[\n\t ,[\]{}#&*!|>'"%@`]|^[?-]$|^[?-][ \t]|[\n:][ \t]|[ \t]\n|[\n\t ]#|[\n\t :]$/.test(value)) {
        // not allowed:
        // - '-' or '?'
        // - start with an indicator character (except [?:-]) or /[?-] /
        // - '\n ', ': ' or ' \n' anywhere
        // - '#' not preceded by a non-space char
        // - end with ' ' or ':'
        return implicitKey || inFlow || !value.includes('\n')
            ? quotedString(value, ctx)
            : blockString(item, ctx, onComment, onChompKeep);
    }
    if (!implicitKey &&
        !inFlow &&
        type !== Scalar.Scalar.PLAIN &&
        value.includes('\n')) {
        // Where allowed & type not set explicitly, prefer block style for multiline strings
        return blockString(item, ctx, onComment, onChompKeep);
    }
    if (containsDocumentMarker(value)) {
        if (indent === '') {
            ctx.forceBlockIndent = true;
            return blockString(item, ctx, onComment, onChompKeep);
        }
        else if (implicitKey && indent === indentStep) {
            return quotedString(value, ctx);
        }
    }
    const str = value.replace(/\n+/g, `$&\n${indent}`);
    // Verify that output will be parsed as a string, as e.g. plain numbers and
    // booleans get parsed with those types in v1.2 (e.g. '42', 'true' & '0.9e-3'),
    // and others in v1.1.
    if (actualString) {
        const test = (tag) => tag.default && tag.tag !== 'tag:yaml.org,2002:str' && tag.test?.test(str);
        const { compat, tags } = ctx.doc.schema;
        if (tags.some(test) || compat?.some(test))
            return quotedString(value, ctx);
    }
    return implicitKey
        ? str
        : foldFlowLines.foldFlowLines(str, indent, foldFlowLines.FOLD_FLOW, getFoldOptions(ctx, false));
}
function stringifyString(item, ctx, onComment, onChompKeep) {
    const { implicitKey, inFlow } = ctx;
    const ss = typeof item.value === 'string'
        ? item
        : Object.assign({}, item, { value: String(item.value) });
    let { type } = item;
    if (type !== Scalar.Scalar.QUOTE_DOUBLE) {
        // force double quotes on control characters & unpaired surrogates
        if (/[\x00-\x08\x0b-\x1f\x7f-\x9f\u{D800}-\u{DFFF}]/u.test(ss.value))
            type = Scalar.Scalar.QUOTE_DOUBLE;
    }
    const _stringify = (_type) => {
        switch (_type) {
            case Scalar.Scalar.BLOCK_FOLDED:
            case Scalar.Scalar.BLOCK_LITERAL:
                return implicitKey || inFlow
                    ? quotedString(ss.value, ctx) // blocks are not valid inside flow containers
                    : blockString(ss, ctx, onComment, onChompKeep);
            case Scalar.Scalar.QUOTE_DOUBLE:
                return doubleQuotedString(ss.value, ctx);
            case Scalar.Scalar.QUOTE_SINGLE:
                return singleQuotedString(ss.value, ctx);
            case Scalar.Scalar.PLAIN:
                return plainString(ss, ctx, onComment, onChompKeep);
            default:
                return null;
        }
    };
    let res = _stringify(type);
    if (res === null) {
        const { defaultKeyType, defaultStringType } = ctx.options;
        const t = (implicitKey && defaultKeyType) || defaultStringType;
        res = _stringify(t);
        if (res === null)
            throw new Error(`Unsupported default string type ${t}`);
    }
    return res;
}

exports.stringifyString = stringifyString;


/***/ }),

/***/ 204:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);

const BREAK = Symbol('break visit');
const SKIP = Symbol('skip children');
const REMOVE = Symbol('remove node');
/**
 * Apply a visitor to an AST node or document.
 *
 * Walks through the tree (depth-first) starting from `node`, calling a
 * `visitor` function with three arguments:
 *   - `key`: For sequence values and map `Pair`, the node's index in the
 *     collection. Within a `Pair`, `'key'` or `'value'`, correspondingly.
 *     `null` for the root node.
 *   - `node`: The current node.
 *   - `path`: The ancestry of the current node.
 *
 * The return value of the visitor may be used to control the traversal:
 *   - `undefined` (default): Do nothing and continue
 *   - `visit.SKIP`: Do not visit the children of this node, continue with next
 *     sibling
 *   - `visit.BREAK`: Terminate traversal completely
 *   - `visit.REMOVE`: Remove the current node, then continue with the next one
 *   - `Node`: Replace the current node, then continue by visiting it
 *   - `number`: While iterating the items of a sequence or map, set the index
 *     of the next step. This is useful especially if the index of the current
 *     node has changed.
 *
 * If `visitor` is a single function, it will be called with all values
 * encountered in the tree, including e.g. `null` values. Alternatively,
 * separate visitor functions may be defined for each `Map`, `Pair`, `Seq`,
 * `Alias` and `Scalar` node. To define the same visitor function for more than
 * one node type, use the `Collection` (map and seq), `Value` (map, seq & scalar)
 * and `Node` (alias, map, seq & scalar) targets. Of all these, only the most
 * specific defined one will be used for each node.
 */
function visit(node, visitor) {
    const visitor_ = initVisitor(visitor);
    if (identity.isDocument(node)) {
        const cd = visit_(null, node.contents, visitor_, Object.freeze([node]));
        if (cd === REMOVE)
            node.contents = null;
    }
    else
        visit_(null, node, visitor_, Object.freeze([]));
}
// Without the `as symbol` casts, TS declares these in the `visit`
// namespace using `var`, but then complains about that because
// `unique symbol` must be `const`.
/** Terminate visit traversal completely */
visit.BREAK = BREAK;
/** Do not visit the children of the current node */
visit.SKIP = SKIP;
/** Remove the current node */
visit.REMOVE = REMOVE;
function visit_(key, node, visitor, path) {
    const ctrl = callVisitor(key, node, visitor, path);
    if (identity.isNode(ctrl) || identity.isPair(ctrl)) {
        replaceNode(key, path, ctrl);
        return visit_(key, ctrl, visitor, path);
    }
    if (typeof ctrl !== 'symbol') {
        if (identity.isCollection(node)) {
            path = Object.freeze(path.concat(node));
            for (let i = 0; i < node.items.length; ++i) {
                const ci = visit_(i, node.items[i], visitor, path);
                if (typeof ci === 'number')
                    i = ci - 1;
                else if (ci === BREAK)
                    return BREAK;
                else if (ci === REMOVE) {
                    node.items.splice(i, 1);
                    i -= 1;
                }
            }
        }
        else if (identity.isPair(node)) {
            path = Object.freeze(path.concat(node));
            const ck = visit_('key', node.key, visitor, path);
            if (ck === BREAK)
                return BREAK;
            else if (ck === REMOVE)
                node.key = null;
            const cv = visit_('value', node.value, visitor, path);
            if (cv === BREAK)
                return BREAK;
            else if (cv === REMOVE)
                node.value = null;
        }
    }
    return ctrl;
}
/**
 * Apply an async visitor to an AST node or document.
 *
 * Walks through the tree (depth-first) starting from `node`, calling a
 * `visitor` function with three arguments:
 *   - `key`: For sequence values and map `Pair`, the node's index in the
 *     collection. Within a `Pair`, `'key'` or `'value'`, correspondingly.
 *     `null` for the root node.
 *   - `node`: The current node.
 *   - `path`: The ancestry of the current node.
 *
 * The return value of the visitor may be used to control the traversal:
 *   - `Promise`: Must resolve to one of the following values
 *   - `undefined` (default): Do nothing and continue
 *   - `visit.SKIP`: Do not visit the children of this node, continue with next
 *     sibling
 *   - `visit.BREAK`: Terminate traversal completely
 *   - `visit.REMOVE`: Remove the current node, then continue with the next one
 *   - `Node`: Replace the current node, then continue by visiting it
 *   - `number`: While iterating the items of a sequence or map, set the index
 *     of the next step. This is useful especially if the index of the current
 *     node has changed.
 *
 * If `visitor` is a single function, it will be called with all values
 * encountered in the tree, including e.g. `null` values. Alternatively,
 * separate visitor functions may be defined for each `Map`, `Pair`, `Seq`,
 * `Alias` and `Scalar` node. To define the same visitor function for more than
 * one node type, use the `Collection` (map and seq), `Value` (map, seq & scalar)
 * and `Node` (alias, map, seq & scalar) targets. Of all these, only the most
 * specific defined one will be used for each node.
 */
async function visitAsync(node, visitor) {
    const visitor_ = initVisitor(visitor);
    if (identity.isDocument(node)) {
        const cd = await visitAsync_(null, node.contents, visitor_, Object.freeze([node]));
        if (cd === REMOVE)
            node.contents = null;
    }
    else
        await visitAsync_(null, node, visitor_, Object.freeze([]));
}
// Without the `as symbol` casts, TS declares these in the `visit`
// namespace using `var`, but then complains about that because
// `unique symbol` must be `const`.
/** Terminate visit traversal completely */
visitAsync.BREAK = BREAK;
/** Do not visit the children of the current node */
visitAsync.SKIP = SKIP;
/** Remove the current node */
visitAsync.REMOVE = REMOVE;
async function visitAsync_(key, node, visitor, path) {
    const ctrl = await callVisitor(key, node, visitor, path);
    if (identity.isNode(ctrl) || identity.isPair(ctrl)) {
        replaceNode(key, path, ctrl);
        return visitAsync_(key, ctrl, visitor, path);
    }
    if (typeof ctrl !== 'symbol') {
        if (identity.isCollection(node)) {
            path = Object.freeze(path.concat(node));
            for (let i = 0; i < node.items.length; ++i) {
                const ci = await visitAsync_(i, node.items[i], visitor, path);
                if (typeof ci === 'number')
                    i = ci - 1;
                else if (ci === BREAK)
                    return BREAK;
                else if (ci === REMOVE) {
                    node.items.splice(i, 1);
                    i -= 1;
                }
            }
        }
        else if (identity.isPair(node)) {
            path = Object.freeze(path.concat(node));
            const ck = await visitAsync_('key', node.key, visitor, path);
            if (ck === BREAK)
                return BREAK;
            else if (ck === REMOVE)
                node.key = null;
            const cv = await visitAsync_('value', node.value, visitor, path);
            if (cv === BREAK)
                return BREAK;
            else if (cv === REMOVE)
                node.value = null;
        }
    }
    return ctrl;
}
function initVisitor(visitor) {
    if (typeof visitor === 'object' &&
        (visitor.Collection || visitor.Node || visitor.Value)) {
        return Object.assign({
            Alias: visitor.Node,
            Map: visitor.Node,
            Scalar: visitor.Node,
            Seq: visitor.Node
        }, visitor.Value && {
            Map: visitor.Value,
            Scalar: visitor.Value,
            Seq: visitor.Value
        }, visitor.Collection && {
            Map: visitor.Collection,
            Seq: visitor.Collection
        }, visitor);
    }
    return visitor;
}
function callVisitor(key, node, visitor, path) {
    if (typeof visitor === 'function')
        return visitor(key, node, path);
    if (identity.isMap(node))
        return visitor.Map?.(key, node, path);
    if (identity.isSeq(node))
        return visitor.Seq?.(key, node, path);
    if (identity.isPair(node))
        return visitor.Pair?.(key, node, path);
    if (identity.isScalar(node))
        return visitor.Scalar?.(key, node, path);
    if (identity.isAlias(node))
        return visitor.Alias?.(key, node, path);
    return undefined;
}
function replaceNode(key, path, node) {
    const parent = path[path.length - 1];
    if (identity.isCollection(parent)) {
        parent.items[key] = node;
    }
    else if (identity.isPair(parent)) {
        if (key === 'key')
            parent.key = node;
        else
            parent.value = node;
    }
    else if (identity.isDocument(parent)) {
        parent.contents = node;
    }
    else {
        const pt = identity.isAlias(parent) ? 'alias' : 'scalar';
        throw new Error(`Cannot replace node with ${pt} parent`);
    }
}

exports.visit = visit;
exports.visitAsync = visitAsync;


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
/************************************************************************/
/******/ /* webpack/runtime/asset-relocator-loader */
/******/ if (typeof __nccwpck_require__ !== 'undefined') __nccwpck_require__.ab = decodeURIComponent(new URL('.', import.meta.url).pathname).slice(import.meta.url.match(/^file:\/\/\/\w:/) ? 1 : 0, -1) + "/";
/******/ 
/************************************************************************/
var __webpack_exports__ = {};

;// CONCATENATED MODULE: external "node:worker_threads"
const external_node_worker_threads_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:worker_threads");
;// CONCATENATED MODULE: external "node:path"
const external_node_path_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:path");
;// CONCATENATED MODULE: external "node:url"
const external_node_url_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:url");
;// CONCATENATED MODULE: ./src/common/escape.ts
/**
 * The one sanitiser for strings from the repository (column names, class labels, categories,
 * paths, YAML values, and sentences that quote them). A data file is written by whoever opens
 * the pull request, so its strings are hostile until shown otherwise.
 *
 * - `escapeText`: for logs, the terminal and messages. Control characters (C0, DEL, C1) and
 *   invisible or bidirectional formatting characters are shown escaped (`\n`, `\x1b`,
 *   `\u202e`), never raw, so a string can neither start a line nor move the cursor; and `::`
 *   is broken up, so even a line that starts with a repository string cannot be read by the
 *   Actions runner as a workflow command (`::error …::`).
 * - `quote`: a value inside a message: clipped, escaped, in double quotes.
 * - `escapeMarkdown`: for the pull-request comment and the job summary.
 * - `clip`: shortens a string to a bounded number of characters with an ellipsis.
 */
/** Most characters of one repository string shown on any screen. */
const MAX_SHOWN = 200;
/** Most characters of one value quoted inside a message. */
const MAX_QUOTED = 80;
const ELLIPSIS = '…';
/** Invisible and bidirectional formatting characters that could disguise text. */
const INVISIBLE = /[\u00ad\u061c\u180e\u200b-\u200f\u2028\u2029\u202a-\u202e\u2060-\u2064\u2066-\u2069\ufeff]/u;
const SHORT_ESCAPES = { 0x0a: '\\n', 0x0d: '\\r', 0x09: '\\t' };
/** At most `max` characters (code points), the last of them an ellipsis when cut. */
function clip(s, max = MAX_SHOWN) {
    if (s.length <= max)
        return s;
    // A code point takes one or two code units, so the first 2 × (max + 1) units hold more than
    // `max` code points whenever the whole string does.
    const chars = Array.from(s.slice(0, 2 * max + 2));
    return chars.length > max ? `${chars.slice(0, max - 1).join('')}${ELLIPSIS}` : s;
}
function hex(c, width) {
    return c.toString(16).padStart(width, '0');
}
/** Is this code point one that `escapeText` shows escaped? (A lone surrogate is not text either.) */
function needsEscape(c, ch) {
    return c < 0x20 || c === 0x7f || (c >= 0x80 && c < 0xa0) || (c >= 0xd800 && c <= 0xdfff) || INVISIBLE.test(ch);
}
/** Whether `escapeText` would show every character of `s` as it is (no control, invisible or bidi character). */
function isPrintable(s) {
    for (const ch of s)
        if (needsEscape(ch.codePointAt(0) ?? 0, ch))
            return false;
    return true;
}
/** Text for logs, the terminal and messages: clipped, control and invisible characters escaped, `::` broken. */
function escapeText(raw, max = MAX_SHOWN) {
    const s = clip(raw, max);
    let out = '';
    for (const ch of s) {
        const c = ch.codePointAt(0) ?? 0;
        if (!needsEscape(c, ch))
            out += ch;
        else if (SHORT_ESCAPES[c] !== undefined)
            out += SHORT_ESCAPES[c];
        else if (c < 0x100)
            out += `\\x${hex(c, 2)}`;
        else
            out += `\\u${hex(c, 4)}`;
    }
    // The runner reads a line that starts with "::" as a command; "::" never survives whole.
    return out.replace(/::/g, ':\\x3a');
}
/** A repository value inside a message: `"name"`, clipped and escaped. */
function escape_quote(raw, max = MAX_QUOTED) {
    return `"${escapeText(raw, max).replace(/"/g, '\\"')}"`;
}
/** Whole lines of text (our own line breaks kept), each escaped as `escapeText` does. */
function escapeLines(text) {
    return text
        .split('\n')
        .map((line) => escapeText(line, Number.MAX_SAFE_INTEGER))
        .join('\n');
}
/**
 * ASCII punctuation that is Markdown syntax in the middle of a line (emphasis, code, links and
 * images, HTML, entities, table pipes, strikethrough, math); a backslash makes it literal.
 */
const MARKDOWN_PUNCTUATION = new Set('\\`*_[]<|~&$'.split(''));
/** Characters GitHub may turn into a mention, reference, URL or emoji when a word follows. */
const LINK_STARTS = new Set(['@', '#', ':', '\uff20', '\ufe6b']);
const ZWSP = '\u200b';
/** Between two of these, "_" cannot open or close emphasis (CommonMark's intraword rule), so it stays bare. */
const WORD = /^[\p{L}\p{N}]$/u;
const REPLACEMENT = '\ufffd';
/**
 * Markdown that reads as written: the ASCII punctuation that GitHub-flavoured Markdown could
 * read as syntax mid-line gets a backslash, which CommonMark defines as "this character, literally"; everything else stays
 * as it is, so the raw comment (in e-mail notifications and the raw view) stays readable.
 * GitHub also turns some plain text into links after rendering (@-mentions, #123 references,
 * URLs, :emoji:; GitHub behaviour as we know it, not checked against GitHub here), which no
 * escape prevents, so a zero-width space breaks exactly those patterns: after "@", "#" or ":"
 * when a word character or "/" follows, and before the dot of "www.". Line breaks become
 * spaces, so a string never leaves its line or table cell; control and invisible or
 * bidirectional characters become U+FFFD. Meant for the middle of a line, where these
 * strings always go.
 */
function escapeMarkdown(raw, max = MAX_SHOWN) {
    const s = clip(raw, max);
    let out = '';
    for (let i = 0; i < s.length; i++) {
        const ch = s[i];
        const c = s.charCodeAt(i);
        const next = s[i + 1] ?? '';
        if (c === 0x0a || c === 0x0d || c === 0x09)
            out += ' ';
        else if (c < 0x20 || c === 0x7f || (c >= 0x80 && c < 0xa0) || INVISIBLE.test(ch))
            out += REPLACEMENT;
        else if (ch === '_' && WORD.test(s[i - 1] ?? '') && WORD.test(next))
            out += ch;
        else if (MARKDOWN_PUNCTUATION.has(ch))
            out += `\\${ch}`;
        else if (ch === '.' && /www$/i.test(s.slice(Math.max(0, i - 3), i)))
            out += `${ZWSP}.`;
        else if (LINK_STARTS.has(ch) && /^[\p{L}\p{N}_/]/u.test(next))
            out += `${ch}${ZWSP}`;
        else
            out += ch;
    }
    return escapeLineStart(out);
}
/**
 * A list item or a cell may begin with the string, where a heading (`# `), quote (`>`), list
 * item (`- `, `+ `, `1. `), rule or underline (`---`, `===`) or an indent would start a block:
 * those get a backslash too (an indent becomes no-break spaces). Anything else, such as "-3" or
 * "1.5", stays as it is.
 */
function escapeLineStart(s) {
    const indent = /^ +/.exec(s)?.[0].length ?? 0;
    const rest = s.slice(indent);
    const lead = '\u00a0'.repeat(indent);
    if (/^(>|#{1,6}(\s|$)|[+-](\s|$)|[-= ]+$)/.test(rest))
        return `${lead}\\${rest}`;
    const ordered = /^(\d{1,9})([.)](\s|$))/.exec(rest);
    if (ordered)
        return `${lead}${ordered[1]}\\${rest.slice(ordered[1].length)}`;
    return `${lead}${rest}`;
}

;// CONCATENATED MODULE: ./src/common/errors.ts
/**
 * An error the user caused (bad config, bad data, bad arguments). The shells print
 * `message` without a stack trace, exit with code 2, and (in the action) turn
 * `file`/`line`/`column` into an error annotation.
 *
 * Messages quote repository strings (column names, values, paths), so the whole message is
 * passed through the one sanitiser here: whoever builds a message cannot forget it.
 */

/** Longest message shown; the values inside are clipped where they are quoted, this bounds the rest. */
const MAX_MESSAGE = 2000;
class errors_UserError extends Error {
    file;
    line;
    column;
    key;
    constructor(message, where = {}) {
        super(escapeText(message, MAX_MESSAGE));
        this.name = 'UserError';
        this.file = where.file;
        this.line = where.line;
        this.column = where.column;
        this.key = where.key;
    }
}
function isUserError(e) {
    return e instanceof errors_UserError;
}

;// CONCATENATED MODULE: ./src/common/exit-codes.ts
/** Exit codes, the same for the command line and the action. */
const EXIT = {
    /** pass, improved or new. */
    ok: 0,
    /** fail or inconclusive: the gate says no. */
    gate: 1,
    /** Bad input or usage: a message names the file, line and column or key; nothing was written. */
    badInput: 2,
    /** A bug in neuron-budget (never for anything a user can put in a file). */
    internal: 3,
};

;// CONCATENATED MODULE: external "node:util"
const external_node_util_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:util");
;// CONCATENATED MODULE: external "node:fs"
const external_node_fs_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:fs");
;// CONCATENATED MODULE: ./src/common/paths.ts
/**
 * Workspace confinement for every path a user gives (config paths, action inputs).
 * A gate that runs on pull requests must not read or write outside the checkout, so a
 * path may not climb out with `../`, be absolute somewhere else, or pass through a
 * symbolic link that points outside.
 */




/** True when `child` is `parent` or lies below it (both absolute and normalised). @testOnly */
function isInside(parent, child) {
    return relativeInside(parent, child) !== null;
}
/**
 * `child` relative to `parent` with forward slashes ('' for `parent` itself), or null when it
 * lies outside. A name that merely starts with two dots (`..x`) is inside.
 */
function relativeInside(parent, child) {
    const rel = (0,external_node_path_namespaceObject.relative)((0,external_node_path_namespaceObject.resolve)(parent), (0,external_node_path_namespaceObject.resolve)(child));
    if (rel === '..' || rel.startsWith('..' + external_node_path_namespaceObject.sep) || (0,external_node_path_namespaceObject.isAbsolute)(rel))
        return null;
    return rel.split(external_node_path_namespaceObject.sep).join('/');
}
/** How a file is named in messages: relative to the workspace root when inside it, forward slashes. */
function displayPath(root, file) {
    const rel = relativeInside(root, file);
    return rel === null ? (0,external_node_path_namespaceObject.resolve)(file) : rel || '.';
}
/** The real location of `p`, following links through its longest existing prefix. */
function realLocation(p) {
    let existing = p;
    const rest = [];
    while (!(0,external_node_fs_namespaceObject.existsSync)(existing)) {
        const parent = (0,external_node_path_namespaceObject.dirname)(existing);
        if (parent === existing)
            return p;
        rest.unshift(existing.slice(parent.length).replace(/^[\\/]+/, ''));
        existing = parent;
    }
    return (0,external_node_path_namespaceObject.resolve)((0,external_node_fs_namespaceObject.realpathSync)(existing), ...rest);
}
/**
 * Resolves `p` against `baseDir` and checks that the result stays inside `root`.
 * Returns the absolute path, or the reason it was refused (for the caller to locate).
 */
function checkInside(root, baseDir, p) {
    if (p.trim() === '')
        return { ok: false, reason: 'expected a path, found an empty string' };
    if (p.includes('\0'))
        return { ok: false, reason: 'a path may not contain a NUL character' };
    const absoluteRoot = (0,external_node_path_namespaceObject.resolve)(root);
    const target = (0,external_node_path_namespaceObject.resolve)(baseDir, p);
    const where = (0,external_node_path_namespaceObject.isAbsolute)(p) ? 'is an absolute path outside' : 'leads outside';
    if (!isInside(absoluteRoot, target)) {
        return { ok: false, reason: `${escape_quote(p)} ${where} the workspace ${absoluteRoot}` };
    }
    const realRoot = realLocation(absoluteRoot);
    if (!isInside(realRoot, realLocation(target))) {
        return {
            ok: false,
            reason: `${escape_quote(p)} goes through a symbolic link that leads outside the workspace ${absoluteRoot}`,
        };
    }
    return { ok: true, path: target };
}
/** As checkInside, but throws a UserError (with `key` when given) instead of returning the reason. */
function resolveInside(root, baseDir, p, key) {
    const result = checkInside(root, baseDir, p);
    if (!result.ok)
        throw new UserError(key ? `${key}: ${result.reason}` : result.reason, key ? { key } : {});
    return result.path;
}
/** The config file the command line and the action read when none is named. */
const DEFAULT_CONFIG = 'neuron-budget.yml';

;// CONCATENATED MODULE: ./src/common/suggest.ts
/** "Did you mean …?" help for misspelt names (config keys, flags, commands, columns). */
/** Levenshtein distance (insert, delete, substitute; each costs 1). @testOnly */
function editDistance(a, b) {
    if (a === b)
        return 0;
    if (a.length === 0)
        return b.length;
    if (b.length === 0)
        return a.length;
    let previous = new Array(b.length + 1);
    let current = new Array(b.length + 1);
    for (let j = 0; j <= b.length; j++)
        previous[j] = j;
    for (let i = 1; i <= a.length; i++) {
        current[0] = i;
        for (let j = 1; j <= b.length; j++) {
            const substitution = previous[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1);
            current[j] = Math.min(previous[j] + 1, current[j - 1] + 1, substitution);
        }
        [previous, current] = [current, previous];
    }
    return previous[b.length];
}
/**
 * The candidate closest to `name` (case-insensitive, `_` and `-` treated alike), or null
 * when none is close enough to be a plausible typo: at most a third of the longer name's
 * letters may differ, but always two (a rule of thumb, no source); ties keep the first candidate.
 */
function nearest(name, candidates) {
    const norm = (s) => s.toLowerCase().replace(/_/g, '-');
    const wanted = norm(name);
    let best = null;
    let bestDistance = Infinity;
    for (const candidate of candidates) {
        const d = editDistance(wanted, norm(candidate));
        if (d < bestDistance) {
            best = candidate;
            bestDistance = d;
        }
    }
    if (best === null)
        return null;
    const limit = Math.max(2, Math.ceil(Math.max(wanted.length, best.length) / 3));
    return bestDistance <= limit ? best : null;
}
/** " (did you mean `x`?)" or "" when nothing is close. */
function didYouMean(name, candidates) {
    const match = nearest(name, candidates);
    return match === null ? '' : ` (did you mean "${match}"?)`;
}

;// CONCATENATED MODULE: ./src/common/workers.ts
/** The worker-thread count a user may ask for, read the same way by the command line and the action. */
const MAX_WORKERS = 256;
/** A whole number from 1 to MAX_WORKERS, or null when `text` is not one. */
function parseWorkerCount(text) {
    if (!/^[0-9]+$/.test(text))
        return null;
    const n = Number(text);
    return n >= 1 && n <= MAX_WORKERS ? n : null;
}

;// CONCATENATED MODULE: ./package.json
const package_namespaceObject = {"rE":"0.1.0"};
;// CONCATENATED MODULE: ./src/version.ts
/** The tool's version, taken from package.json when the bundle is built (ncc inlines the JSON). */

const TOOL_NAME = 'neuron-budget';
const TOOL_VERSION = package_namespaceObject.rE;

;// CONCATENATED MODULE: ./src/cli/args.ts
/**
 * The command line's grammar: commands, their options and positional arguments, parsed with
 * Node's util.parseArgs and checked with messages that say what was expected and what was found.
 */








const FLAGS = {
    config: { value: 'FILE', help: `config file (default: ${DEFAULT_CONFIG} in the current folder)` },
    report: { value: 'FILE', help: 'also write the full result as JSON to FILE' },
    model: { value: 'FILE', help: 'write the smallest network found (weights and encoding) to FILE' },
    baseline: { value: 'FILE', help: 'baseline file to use instead of the one named in the config' },
    workers: { value: 'N', help: `worker threads, 1 to ${MAX_WORKERS} (default: config, else one per core)` },
    shards: { value: 'N', help: 'shards to split the trainings into, 1 to 256 (a matrix job each)' },
    plan: { value: 'FILE', help: 'the plan written by `plan`' },
    index: { value: 'I', help: 'which shard of the plan to run, from 0' },
    format: { value: 'FORMAT', help: 'what to write: c (C99 source, a float32 and an int8 path)' },
    out: {
        value: 'PATH',
        help: 'where to write (plan: the plan; shard: the part; export: a folder; predict: a CSV file, default stdout)',
    },
    name: { value: 'NAME', help: 'C name of the model: its files and the prefix of its functions (default nb_model)' },
};
const COMMANDS = {
    check: {
        summary: 'search the smallest adequate width and compare it with the baseline',
        flags: ['config', 'report', 'model', 'baseline', 'workers'],
    },
    baseline: {
        summary: 'search the smallest adequate width and write it as the new baseline',
        flags: ['config', 'baseline', 'workers'],
    },
    plan: {
        summary: 'split the search into shards for a job matrix and write the plan',
        flags: ['config', 'baseline', 'shards', 'out'],
        required: ['shards', 'out'],
    },
    shard: {
        summary: "run one shard of a plan and write its part (the trainings' outcomes)",
        flags: ['config', 'baseline', 'plan', 'index', 'out', 'workers'],
        required: ['plan', 'index', 'out'],
    },
    merge: {
        summary: 'merge the parts of every shard and finish as check does',
        flags: ['config', 'report', 'model', 'baseline', 'workers'],
        rest: 'PART.json',
    },
    export: {
        summary: 'write firmware source for a model file (written by check --model)',
        flags: ['format', 'out', 'name'],
        positionals: ['MODEL.json'],
        required: ['format', 'out'],
    },
    predict: {
        summary: 'score the rows of a CSV file with a model file, as CSV',
        flags: ['out'],
        positionals: ['MODEL.json', 'DATA.csv'],
    },
};
/** A mistake on the command line: exit 2, one line, with a pointer to --help. */
class UsageError extends errors_UserError {
}
function isCommand(s) {
    return Object.hasOwn(COMMANDS, s);
}
const commandList = (sep) => Object.keys(COMMANDS).join(sep);
/** Parses argv (without node and script) into what to do. Throws UsageError. */
function parseInvocation(argv) {
    if (argv.includes('--help') || argv.includes('-h'))
        return { kind: 'help', command: argv.find(isCommand) ?? null };
    if (argv.includes('--version') || argv.includes('-V'))
        return { kind: 'version' };
    const [first, ...rest] = argv;
    if (first === undefined)
        throw new UsageError(`a command is needed: ${commandList(' or ')}`);
    if (first === 'help') {
        const topic = rest[0];
        if (topic !== undefined && !isCommand(topic)) {
            throw new UsageError(`no help for ${escape_quote(topic)}${didYouMean(topic, Object.keys(COMMANDS))}; commands: ${commandList(', ')}`);
        }
        return { kind: 'help', command: topic ?? null };
    }
    if (first.startsWith('-'))
        throw new UsageError(`expected a command (${commandList(' or ')}) before options, found ${escape_quote(first)}`);
    if (!isCommand(first)) {
        throw new UsageError(`unknown command ${escape_quote(first)}${didYouMean(first, Object.keys(COMMANDS))}; commands: ${commandList(', ')}`);
    }
    const command = first;
    const { flags, args } = readFlags(command, rest);
    let workers = null;
    if (flags.workers !== undefined) {
        workers = parseWorkerCount(flags.workers);
        if (workers === null) {
            throw new UsageError(`${command}: --workers: expected an integer from 1 to ${MAX_WORKERS}, found ${escape_quote(flags.workers)}`);
        }
    }
    return { kind: 'run', command, flags, workers, args };
}
function readFlags(command, args) {
    const spec = COMMANDS[command];
    const allowed = spec.flags;
    const wanted = spec.positionals ?? [];
    const positional = [];
    const options = Object.fromEntries(Object.keys(FLAGS).map((f) => [f, { type: 'string' }]));
    // Not strict: unknown options and missing values get our own messages below.
    const { tokens } = (0,external_node_util_namespaceObject.parseArgs)({ args, options, strict: false, allowPositionals: true, tokens: true });
    const flags = {};
    for (const token of tokens) {
        if (token.kind === 'positional') {
            if (positional.length < wanted.length || spec.rest !== undefined) {
                positional.push(token.value);
                continue;
            }
            throw new UsageError(`${command}: unexpected argument ${escape_quote(token.value)}; options are written --name VALUE`);
        }
        if (token.kind !== 'option')
            continue;
        const name = token.name;
        if (!allowed.includes(name)) {
            const elsewhere = Object.hasOwn(FLAGS, name) ? ` (${command} has no --${name})` : '';
            const suggestion = didYouMean(name, allowed).replace(/"([^"]+)"/, '"--$1"');
            throw new UsageError(`${command}: unknown option ${escape_quote(`--${name}`)}${elsewhere}${suggestion}; see ${TOOL_NAME} ${command} --help`);
        }
        const flag = name;
        // `--config --report x`: the next option is not this one's value.
        const value = !token.inlineValue && token.value?.startsWith('--') ? undefined : token.value;
        if (value === undefined || value === '')
            throw new UsageError(`${command}: --${flag} needs a value (${FLAGS[flag].value})`);
        if (flags[flag] !== undefined)
            throw new UsageError(`${command}: --${flag} is given twice`);
        flags[flag] = value;
    }
    if (positional.length < wanted.length) {
        throw new UsageError(`${command}: expected ${wanted.join(' ')}, found ${positional.length === 0 ? 'nothing' : positional.map((p) => escape_quote(p)).join(' ')}`);
    }
    if (spec.rest !== undefined && positional.length === wanted.length)
        throw new UsageError(`${command}: expected one or more ${spec.rest} files, found none`);
    for (const flag of spec.required ?? []) {
        if (flags[flag] === undefined)
            throw new UsageError(`${command}: --${flag} ${FLAGS[flag].value} is required`);
    }
    return { flags, args: positional };
}

;// CONCATENATED MODULE: external "node:fs/promises"
const promises_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:fs/promises");
;// CONCATENATED MODULE: ./src/common/metric.ts
/**
 * The target metrics and what "better" and "meets the target" mean for each: one definition,
 * used by the engine, the search, the gate and every screen.
 */
/**
 * With data.task auto, a numeric target with at most this many distinct values is read as class
 * labels (0/1/2), any other numeric target as a measurement (a rule of thumb, no source).
 */
const AUTO_MAX_CLASSES = 10;
const ERROR_METRICS = ['rmse', 'mae', 'max-abs-error'];
/** Accuracy is better when higher; the error metrics when lower. */
function higherIsBetter(metric) {
    return metric === 'accuracy';
}
/** True when `value` meets the target (accuracy: ≥ threshold; error metrics: ≤ threshold). NaN never does. */
function meetsThreshold(value, target) {
    if (!(value === value))
        return false;
    return higherIsBetter(target.metric) ? value >= target.threshold : value <= target.threshold;
}
/** True when `a` is strictly better than `b` for this metric; a finite value beats NaN. */
function isBetter(metric, a, b) {
    if (!(a === a))
        return false;
    if (!(b === b))
        return true;
    return higherIsBetter(metric) ? a > b : a < b;
}
/** The metrics that can judge a task. */
function metricsFor(task) {
    return task === 'classification' ? ['accuracy'] : ERROR_METRICS;
}
function metricFitsTask(metric, task) {
    return metricsFor(task).includes(metric);
}
/** The metric used when the config names none. */
function defaultMetric(task) {
    return task === 'regression' ? 'rmse' : 'accuracy';
}
/** "≥" for accuracy, "≤" for the error metrics. */
function comparator(metric) {
    return higherIsBetter(metric) ? '≥' : '≤';
}

;// CONCATENATED MODULE: ./src/common/format.ts
/** Number and word formatting shared by the search's notes, the gate's reasons and every renderer. Locale-free. */

/**
 * A metric value with up to 4 decimals, trailing zeros trimmed (0.95, 0.9625, 0.9615),
 * never in exponent form so it is also a valid Mermaid number.
 */
function formatMetric(value) {
    if (!Number.isFinite(value))
        return String(value);
    const abs = Math.abs(value);
    const decimals = abs >= 1000 ? 1 : abs >= 100 ? 2 : 4;
    let s = value.toFixed(decimals);
    if (s.includes('e'))
        s = BigInt(Math.round(value)).toString();
    if (s.includes('.'))
        s = s.replace(/0+$/, '').replace(/\.$/, '');
    return s === '-0' ? '0' : s;
}
/** Whole numbers with thin grouping commas: 12,345. */
function formatCount(n) {
    const s = String(Math.trunc(Math.abs(n)));
    const grouped = s.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
    return n < 0 ? `-${grouped}` : grouped;
}
/** Signed difference: +12, -3, 0 (ASCII minus, the same in tables, lists and the terminal). */
function formatDelta(n) {
    if (n > 0)
        return `+${formatCount(n)}`;
    if (n < 0)
        return `-${formatCount(-n)}`;
    return '0';
}
/**
 * A measured duration as every file holds it: seconds, rounded to whole milliseconds (a clock
 * reading's last digits are noise, and 0.06729538599999978 reads as a bug).
 */
function secondsFromMs(ms) {
    return Math.round(ms) / 1000;
}
function formatSeconds(seconds) {
    if (seconds === null || seconds === undefined || !Number.isFinite(seconds))
        return '—';
    if (seconds < 10)
        return `${seconds.toFixed(2)} s`;
    if (seconds < 120)
        return `${seconds.toFixed(1)} s`;
    const m = Math.floor(seconds / 60);
    return `${m} min ${Math.round(seconds - m * 60)} s`;
}
function neurons(n) {
    return n === 1 ? '1 hidden neuron' : `${formatCount(n)} hidden neurons`;
}
/** "accuracy ≥ 0.95" / "rmse ≤ 0.3". */
function targetShort(metric, threshold) {
    return `${metric} ${comparator(metric)} ${formatMetric(threshold)}`;
}
/** "accuracy of at least 0.95" / "rmse of at most 0.3". */
function targetPhrase(metric, threshold) {
    return `${metric} of ${higherIsBetter(metric) ? 'at least' : 'at most'} ${formatMetric(threshold)}`;
}

;// CONCATENATED MODULE: ./src/device/cost.ts
const C_TYPE_BYTES = { float: 4, int8_t: 1, int32_t: 4 };
/** Entries of the activation lookup table (indexed by an int8 pre-activation). */
const LUT_ENTRIES = 256;
/** The constant objects each path of the exported C declares, in declaration order. */
function storedObjects(s) {
    const { inputs: D, width: H, outputs: K } = s;
    const float32 = [];
    const int8 = [];
    if (s.numericFeatures > 0) {
        float32.push({ suffix: 'f_in_mean', type: 'float', count: s.numericFeatures, role: 'feature means' });
        float32.push({ suffix: 'f_in_std', type: 'float', count: s.numericFeatures, role: 'feature deviations' });
    }
    float32.push({ suffix: 'f_w1', type: 'float', count: H * D, role: 'hidden weights' }, { suffix: 'f_b1', type: 'float', count: H, role: 'hidden biases' }, { suffix: 'f_w2', type: 'float', count: K * H, role: 'output weights' }, { suffix: 'f_b2', type: 'float', count: K, role: 'output biases' });
    if (s.regression)
        float32.push({ suffix: 'f_target', type: 'float', count: 2, role: 'target mean and deviation' });
    if (s.numericFeatures > 0) {
        int8.push({ suffix: 'q_in_mean', type: 'float', count: s.numericFeatures, role: 'feature means' });
        int8.push({ suffix: 'q_in_mul', type: 'float', count: s.numericFeatures, role: '1 / (deviation · input scale)' });
    }
    int8.push({ suffix: 'q_in_zero', type: 'int8_t', count: 1, role: 'input zero-point', scalar: true });
    if (s.categoricalFeatures > 0)
        int8.push({ suffix: 'q_in_one', type: 'int8_t', count: 1, role: 'code of a one-hot 1', scalar: true });
    int8.push({ suffix: 'q_w1', type: 'int8_t', count: H * D, role: 'hidden weights' }, { suffix: 'q_b1', type: 'int32_t', count: H, role: 'hidden biases (zero-point folded in)' }, { suffix: 'q_m0', type: 'int32_t', count: H, role: 'requantisation multipliers M0' }, { suffix: 'q_shift', type: 'int8_t', count: H, role: 'requantisation shifts n' }, { suffix: 'q_act_zero', type: 'int8_t', count: 1, role: 'pre-activation zero-point', scalar: true }, { suffix: 'q_lut', type: 'int8_t', count: LUT_ENTRIES, role: 'activation lookup table' }, { suffix: 'q_w2', type: 'int8_t', count: K * H, role: 'output weights' }, { suffix: 'q_b2', type: 'int32_t', count: K, role: 'output biases (zero-point folded in)' }, { suffix: 'q_out_scale', type: 'float', count: K, role: 'output dequantisation scales' });
    return { float32, int8 };
}
function objectBytes(o) {
    return o.count * C_TYPE_BYTES[o.type];
}
function sumBytes(objects) {
    return objects.reduce((n, o) => n + objectBytes(o), 0);
}
function deviceCost(s) {
    const { inputs: D, width: H, outputs: K } = s;
    const stored = storedObjects(s);
    return {
        parameters: D * H + H + H * K + K,
        macs: D * H + H * K,
        flashBytes: { float32: sumBytes(stored.float32), int8: sumBytes(stored.int8) },
        ramBytes: { float32: 4 * (D + H), int8: D + H },
    };
}
/** The cost shape of a network of `width` hidden neurons on data encoded as `encoding`. */
function costShapeOf(net, encoding) {
    return {
        inputs: net.inputs,
        width: net.width,
        outputs: net.outputs,
        numericFeatures: encoding.features.filter((f) => f.kind === 'numeric').length,
        categoricalFeatures: encoding.features.filter((f) => f.kind === 'categorical').length,
        regression: encoding.target.task === 'regression',
    };
}

;// CONCATENATED MODULE: ./src/nn/kernel/constants.ts
/**
 * The numbers both kernels must share to give the same bits: the constants of the elementary
 * functions (detmath.ts), the gradient block size and the activation and head codes. This file is
 * the one source: scripts/build-kernel.mjs writes them into kernel.as (between its "generated
 * constants" markers) and `build-kernel.mjs --check` fails when kernel.as or its bytes disagree.
 * Plain numeric literals only, so the script can read them without a TypeScript compiler.
 */
/** ln 2 split so that k * LN2_HI is exact for |k| < 2^11 (the classic Cody-Waite reduction). */
const LN2_HI = 6.9314718036912381649e-1;
const LN2_LO = 1.90821492927058770002e-10;
const INV_LN2 = 1.442695040888963387;
/** Taylor coefficients 1/n! for n = 2..13 of expm1 on |r| <= ln2/2 (truncation < 1e-17 relative). */
const C2 = 0.5;
const C3 = 0.16666666666666666;
const C4 = 0.041666666666666664;
const C5 = 0.008333333333333333;
const C6 = 0.001388888888888889;
const C7 = 0.0001984126984126984;
const C8 = 0.0000248015873015873;
const C9 = 0.0000027557319223985893;
const C10 = 2.755731922398589e-7;
const C11 = 2.505210838544172e-8;
const C12 = 2.08767569878681e-9;
const C13 = 1.6059043836821613e-10;
/** |x| beyond this has tanh(x) === ±1 in double precision. */
const TANH_CLAMP = 22;
/** 1.5·2^52: adding it rounds a double of magnitude below 2^51 to a whole number. */
const ROUND_MAGIC = 6755399441055744;
const SQRT2 = 1.4142135623730951;
/**
 * Rows per gradient block. The input-weight gradient is summed block by block: for each weight,
 * the products of a block's rows are added in row order starting from +0, and that block sum is
 * then added to the running gradient, in both kernels.
 */
const GRAD_BLOCK_ROWS = 32;
const ACT_TANH = 0;
const ACT_LOGISTIC = 1;
const ACT_RELU = 2;
const HEAD_LINEAR = 0;
const HEAD_LOGISTIC = 1;
const HEAD_SOFTMAX = 2;

;// CONCATENATED MODULE: ./src/nn/kernel/detmath.ts
/**
 * Elementary functions whose results we control. ECMAScript leaves Math.exp, Math.tanh and
 * Math.log implementation-approximated, so their last bits may change between Node versions;
 * these use only +, -, *, / and exact bit operations, which IEEE 754 fixes, so every engine
 * gives the same bits. The WebAssembly kernel evaluates tanh with the very same sequence of
 * operations and constants, so both paths agree bit for bit.
 *
 * Accuracy against Math.*: a few units in the last place (test/nn/detmath.test.ts states the bound).
 */

const f64 = new Float64Array(1);
const u32 = new Uint32Array(f64.buffer);
const HI = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1 ? 1 : 0; // little-endian: high word at index 1
/** 2^k for integer k in [-1022, 1023], built from its bits. */
function pow2(k) {
    u32[1 - HI] = 0;
    u32[HI] = (k + 1023) << 20;
    return f64[0];
}
/** expm1(r) for |r| <= ~0.35 by Horner's rule. */
function expm1Poly(r) {
    let q = C12 + r * C13;
    q = C11 + r * q;
    q = C10 + r * q;
    q = C9 + r * q;
    q = C8 + r * q;
    q = C7 + r * q;
    q = C6 + r * q;
    q = C5 + r * q;
    q = C4 + r * q;
    q = C3 + r * q;
    q = C2 + r * q;
    q = 1 + r * q;
    return r * q;
}
/**
 * The same polynomial by Estrin's scheme: more operations run side by side, which is what the
 * SIMD kernel needs for speed (tanh uses this form in both paths).
 */
function expm1PolyEstrin(r) {
    const r2 = r * r;
    const r4 = r2 * r2;
    const r8 = r4 * r4;
    const b0 = 1 + C2 * r + (C3 + C4 * r) * r2;
    const b1 = C5 + C6 * r + (C7 + C8 * r) * r2;
    const b2 = C9 + C10 * r + (C11 + C12 * r) * r2;
    const c0 = b0 + b1 * r4;
    const c1 = b2 + C13 * r4;
    return r * (c0 + c1 * r8);
}
/** e^x. */
function detExp(x) {
    if (x !== x)
        return x;
    if (x > 709.782712893384)
        return Infinity;
    if (x < -745.1332191019412)
        return 0;
    const k = Math.floor(x * INV_LN2 + 0.5);
    const r = x - k * LN2_HI - k * LN2_LO;
    const m = 1 + expm1Poly(r);
    if (k > 1023)
        return m * pow2(1023) * pow2(k - 1023);
    if (k < -1022)
        return m * pow2(k + 1000) * pow2(-1000);
    return m * pow2(k);
}
/** Powers of two 2^0..2^64 for the tanh reduction (k never leaves that range). */
const POW2_TANH = new Float64Array(65);
for (let k = 0; k <= 64; k++)
    POW2_TANH[k] = pow2(k);
/**
 * tanh(x) = expm1(2|x|) / (expm1(2|x|) + 2) with the sign of x. Branch-free apart from the
 * clamp, so the SIMD kernel can evaluate the same operations lane by lane.
 */
function detTanh(x) {
    const ax = Math.min(x < 0 ? -x : x, TANH_CLAMP);
    const y = ax + ax;
    // Round y/ln2 to the nearest whole number (ties to even) by adding and removing 1.5·2^52.
    const k = y * INV_LN2 + ROUND_MAGIC - ROUND_MAGIC;
    const r = y - k * LN2_HI - k * LN2_LO;
    const p = expm1PolyEstrin(r);
    const s = POW2_TANH[k];
    const em = s * p + (s - 1);
    const t = em / (em + 2);
    return x < 0 ? -t : t;
}
/** Logistic function through tanh, so it inherits tanh's determinism: 1/(1+e^-x) = (1 + tanh(x/2))/2. */
function detLogistic(x) {
    return 0.5 + 0.5 * detTanh(0.5 * x);
}
/** Natural logarithm. */
function detLog(x) {
    if (x !== x || x < 0)
        return NaN;
    if (x === 0)
        return -Infinity;
    if (x === Infinity)
        return Infinity;
    let e = 0;
    if (x < 2.2250738585072014e-308) {
        x *= 18014398509481984; // 2^54: lift subnormals into the normal range
        e = -54;
    }
    f64[0] = x;
    const hi = u32[HI];
    e += ((hi >>> 20) & 0x7ff) - 1023;
    u32[HI] = (hi & 0x000fffff) | 0x3ff00000; // mantissa in [1, 2)
    let m = f64[0];
    if (m > SQRT2) {
        m *= 0.5;
        e += 1;
    }
    const f = m - 1;
    const s = f / (2 + f);
    const s2 = s * s;
    // 2 atanh(s) = 2 (s + s^3/3 + ... + s^23/23); |s| <= 0.1716 so the tail is below 1e-18.
    let q = 1 / 21 + s2 * (1 / 23);
    q = 1 / 19 + s2 * q;
    q = 1 / 17 + s2 * q;
    q = 1 / 15 + s2 * q;
    q = 1 / 13 + s2 * q;
    q = 1 / 11 + s2 * q;
    q = 1 / 9 + s2 * q;
    q = 1 / 7 + s2 * q;
    q = 1 / 5 + s2 * q;
    q = 1 / 3 + s2 * q;
    const series = s2 * q;
    const logm = 2 * s + 2 * s * series;
    return e * LN2_HI + (logm + e * LN2_LO);
}
/** log(1 + u) for u > -1, keeping the bits of u that 1 + u rounds away. @testOnly */
function detLog1p(u) {
    const w = 1 + u;
    if (w === 1)
        return u;
    return detLog(w) + (u - (w - 1)) / w;
}
/** log(1 + e^z) without overflow. */
function detSoftplus(z) {
    return (z > 0 ? z : 0) + detLog1p(detExp(z > 0 ? -z : z));
}

;// CONCATENATED MODULE: ./src/device/fixed-point.ts
/**
 * The integer arithmetic of the int8 inference, written so that this TypeScript and the
 * exported C compute the same integers. Every value here is an integer held exactly in a
 * double (all magnitudes stay below 2^53), so no step depends on JavaScript's number type.
 *
 * Requantisation follows Jacob et al. 2018, "Quantization and Training of Neural Networks for
 * Efficient Integer-Arithmetic-Only Inference", section 2.2: the real multiplier M (eq. 5) is
 * written M = 2^−n · M0 with M0 in [0.5, 1) (eq. 6), M0 held as a 32-bit fixed-point integer.
 * The fixed-point multiply and the rounding shift are the documented rules of the
 * general-purpose gemmlowp library (fixedpoint/fixedpoint.h): SaturatingRoundingDoublingHighMul
 * and RoundingDivideByPOT.
 * @testOnly
 */
const INT32_MIN = -2147483648;
/** @testOnly */
const INT32_MAX = 2147483647;
const TWO_15 = 32768;
const TWO_30 = 1073741824;
const TWO_31 = 2147483648;
/** Largest right shift RoundingDivideByPOT takes (gemmlowp asserts exponent ≤ 31). */
const MAX_SHIFT = 31;
/**
 * Round to nearest, ties away from zero. Exact for every double: trunc(x) and x − trunc(x)
 * are both exact, so no addition of 0.5 can round the wrong way.
 */
function roundHalfAway(x) {
    const i = Math.trunc(x);
    const f = x - i;
    const r = f >= 0.5 ? i + 1 : f <= -0.5 ? i - 1 : i;
    return r === 0 ? 0 : r; // no −0 in the JSON
}
function clamp(x, lo, hi) {
    return x < lo ? lo : x > hi ? hi : x;
}
/**
 * gemmlowp's SaturatingRoundingDoublingHighMul for int32 a, b: (a·b + nudge) / 2^31 truncated
 * toward zero, nudge = 2^30 when a·b ≥ 0 and 1 − 2^30 otherwise (so a tie rounds toward +∞);
 * INT32_MIN · INT32_MIN saturates to INT32_MAX.
 *
 * a·b reaches 2^62, beyond a double's 53 bits, so the product is split: b = bh·2^16 + bl,
 * a·bh = ph·2^15 + pl, and a·b + nudge = ph·2^31 + r with every part exact.
 */
function saturatingRoundingDoublingHighMul(a, b) {
    if (a === INT32_MIN && b === INT32_MIN)
        return INT32_MAX;
    const bh = b >> 16; // signed high half
    const bl = b & 0xffff; // unsigned low half
    const p = a * bh; // |p| ≤ 2^46: exact
    const q = a * bl; // |q| < 2^47: exact
    const ph = Math.floor(p / TWO_15);
    const pl = p - ph * TWO_15; // in [0, 2^15)
    const negative = (a < 0 && b > 0) || (a > 0 && b < 0);
    const nudge = negative ? 1 - TWO_30 : TWO_30;
    const r = pl * 65536 + q + nudge; // |r| < 2^48: exact
    const rh = Math.floor(r / TWO_31);
    const rl = r - rh * TWO_31; // in [0, 2^31)
    const floor = ph + rh; // floor((a·b + nudge) / 2^31)
    const truncated = floor < 0 && rl !== 0 ? floor + 1 : floor;
    return truncated === 0 ? 0 : truncated;
}
/**
 * gemmlowp's RoundingDivideByPOT: x / 2^exponent rounded to nearest, ties away from zero,
 * for int32 x and 0 ≤ exponent ≤ 31.
 */
function roundingDivideByPot(x, exponent) {
    const mask = 2 ** exponent - 1;
    const remainder = x & mask;
    const threshold = Math.floor(mask / 2) + (x < 0 ? 1 : 0);
    return (x >> exponent) + (remainder > threshold ? 1 : 0);
}
/**
 * M = 2^−n · M0, M0 in [0.5, 1), M0 stored as round(M0 · 2^31) (eq. 6). Two limits, both exact
 * in their effect on an int32 accumulator acc: for M < 2^−32, |acc · M| < 1/2 always rounds to
 * 0, so the multiplier is 0; for M ≥ 2^31 every nonzero acc saturates an int8, and so does
 * 2^30 · 2^31 (the left shift capped at 31), which stands in for it.
 */
function quantizeMultiplier(m) {
    if (!(m > 0) || !Number.isFinite(m))
        return { multiplier: 0, shift: 0 };
    let n = 0;
    let f = m;
    while (f < 0.5 && n <= MAX_SHIFT + 1) {
        f *= 2; // exact
        n++;
    }
    while (f >= 1 && n >= -MAX_SHIFT - 1) {
        f /= 2; // exact
        n--;
    }
    if (n > MAX_SHIFT)
        return { multiplier: 0, shift: 0 };
    let m0 = roundHalfAway(f * TWO_31);
    if (m0 === TWO_31) {
        m0 = TWO_30;
        n--;
    }
    if (n < -MAX_SHIFT)
        return { multiplier: TWO_30, shift: -MAX_SHIFT };
    return { multiplier: m0, shift: n };
}
/**
 * acc · M for an int32 acc: a left shift (saturating to int32) when shift < 0, then the
 * fixed-point multiply by M0, then the rounding right shift when shift > 0.
 */
function multiplyByQuantizedMultiplier(acc, q) {
    if (q.multiplier === 0)
        return 0;
    let x = acc;
    if (q.shift < 0)
        x = clamp(acc * 2 ** -q.shift, INT32_MIN, INT32_MAX); // power-of-two product: exact
    const high = saturatingRoundingDoublingHighMul(x, q.multiplier);
    return q.shift > 0 ? roundingDivideByPot(high, q.shift) : high;
}

;// CONCATENATED MODULE: ./src/device/quantize.ts



/** Largest |int32 bias|; with at most MAX_QUANT_INPUTS terms of |q_w·q_x| ≤ 127·128 the accumulator stays in int32. */
const BIAS_LIMIT = 2 ** 30;
const MAX_QUANT_INPUTS = 16384;
const INT8_MIN = -128;
const INT8_MAX = 127;
/**
 * Pre-activation range and activation codes per activation. The calibrated range is
 * R = max |a| over the calibration rows (ReLU: max a), clipped where the activation is within
 * half an output step of its limit (beyond that every pre-activation gives the same code):
 *   tanh      a in [−R, R], S_a = R/127, Z_a = 0; h in [−tanh R, tanh R], S_h = tanh(R)/127, Z_h = 0
 *             (odd function: symmetric codes). Clip: atanh(1 − 1/254) = ln(507)/2 ≈ 3.11.
 *   logistic  a in [−R, R], S_a = R/127, Z_a = 0; h in [0, σ(R)] (widened to hold 0),
 *             S_h = σ(R)/255, Z_h = −128. Clip: σ(a) = 1 − 1/510 at a = ln(509) ≈ 6.23.
 *   relu      a in [0, R], S_a = R/255, Z_a = −128 (a negative pre-activation clamps to code
 *             −128, which is relu's 0); h = a: S_h = S_a, Z_h = −128.
 * The output range is the image of the pre-activation range, so it needs no calibration of its own.
 */
function activationRanges(activation, calibrated) {
    if (activation === 'relu') {
        const r = calibrated > 0 && Number.isFinite(calibrated) ? calibrated : 1;
        const s = r / 255;
        return { preActivation: { scale: s, zeroPoint: INT8_MIN }, activation: { scale: s, zeroPoint: INT8_MIN } };
    }
    const clip = activation === 'tanh' ? detLog(507) / 2 : detLog(509);
    const r = calibrated > 0 && calibrated < clip ? calibrated : clip;
    const preActivation = { scale: r / 127, zeroPoint: 0 };
    if (activation === 'tanh')
        return { preActivation, activation: { scale: detTanh(r) / 127, zeroPoint: 0 } };
    return { preActivation, activation: { scale: detLogistic(r) / 255, zeroPoint: INT8_MIN } };
}
function activate(activation, a) {
    if (activation === 'tanh')
        return detTanh(a);
    if (activation === 'logistic')
        return detLogistic(a);
    return a > 0 ? a : 0;
}
/** q = clamp(Z + round(r / S)) into int8. */
function quantizeValue(r, p) {
    return clamp(p.zeroPoint + roundHalfAway(r / p.scale), INT8_MIN, INT8_MAX);
}
/** r = S · (q − Z) (the paper's eq. 1). */
function dequantizeValue(q, p) {
    return p.scale * (q - p.zeroPoint);
}
/**
 * The asymmetric int8 parameters of the range [lo, hi], widened to hold 0, with the
 * zero-point rounded to an integer so that real 0 is exactly representable.
 */
function rangeParams(lo, hi) {
    let a = Math.min(lo, 0);
    let b = Math.max(hi, 0);
    if (!(b > a)) {
        a = 0;
        b = 1;
    }
    const scale = (b - a) / 255;
    return { scale, zeroPoint: clamp(roundHalfAway(INT8_MIN - a / scale), INT8_MIN, INT8_MAX) };
}
/** The table of activation codes for every int8 pre-activation code. */
function activationTable(activation, pre, out) {
    const table = [];
    for (let q = INT8_MIN; q < INT8_MIN + LUT_ENTRIES; q++) {
        table.push(quantizeValue(activate(activation, dequantizeValue(q, pre)), out));
    }
    return table;
}
/**
 * One layer's symmetric per-output-channel weights and int32 biases. The scale is at least
 * |bias| / (S_in · BIAS_LIMIT), so the bias always fits (coarser weights only when they are
 * negligible beside the bias); an all-zero channel gets scale 1.
 */
function quantizeLayer(weights, bias, inputScale) {
    const scales = [];
    const qWeights = [];
    const qBias = [];
    weights.forEach((row, j) => {
        let maxAbs = 0;
        for (const w of row)
            maxAbs = Math.max(maxAbs, Math.abs(w));
        let s = Math.max(maxAbs / INT8_MAX, Math.abs(bias[j]) / (inputScale * BIAS_LIMIT));
        if (!(s > 0) || !Number.isFinite(s))
            s = 1;
        scales.push(s);
        qWeights.push(row.map((w) => clamp(roundHalfAway(w / s), -INT8_MAX, INT8_MAX)));
        qBias.push(clamp(roundHalfAway(bias[j] / (inputScale * s)), -BIAS_LIMIT, BIAS_LIMIT));
    });
    return { weights: qWeights, scales, bias: qBias };
}
/** bias − Z · Σ weights: the accumulator then sums weight · code directly (the paper's section 2.3). */
function foldZeroPoint(bias, weights, zero) {
    return bias.map((b, j) => b - zero * weights[j].reduce((s, w) => s + w, 0));
}
function checkFinite(net) {
    const all = [...net.hiddenWeights.flat(), ...net.hiddenBias, ...net.outputWeights.flat(), ...net.outputBias];
    if (!all.every(Number.isFinite))
        throw new RangeError('cannot quantise a network with non-finite weights');
}
/** Largest |a| (ReLU: largest a) of the hidden pre-activations over the calibration rows, in float64. */
function calibratePreActivation(net, cal) {
    const D = net.inputs;
    let extreme = 0;
    for (let p = 0; p < cal.rows; p++) {
        for (let j = 0; j < net.width; j++) {
            let a = net.hiddenBias[j];
            const w = net.hiddenWeights[j];
            for (let i = 0; i < D; i++)
                a += cal.x[p * D + i] * w[i];
            const v = net.activation === 'relu' ? a : Math.abs(a);
            if (v > extreme)
                extreme = v;
        }
    }
    return extreme;
}
function inputRange(cal, D) {
    let lo = 0;
    let hi = 0;
    for (let q = 0; q < cal.rows * D; q++) {
        const v = cal.x[q];
        if (v < lo)
            lo = v;
        if (v > hi)
            hi = v;
    }
    return rangeParams(lo, hi);
}
/** The int8 form of `net`, its activation ranges calibrated on `calibration` (the training rows). */
function quantizeNetwork(net, encoding, calibration) {
    const D = net.inputs;
    const H = net.width;
    const K = net.outputs;
    if (D > MAX_QUANT_INPUTS || H > MAX_QUANT_INPUTS) {
        throw new RangeError(`int8 quantisation takes at most ${MAX_QUANT_INPUTS} inputs and hidden neurons`);
    }
    if (calibration.rows < 1)
        throw new RangeError('int8 quantisation needs at least one calibration row');
    checkFinite(net);
    const encoded = encoding.features.reduce((n, f) => n + (f.kind === 'numeric' ? 1 : f.categories.length), 0);
    if (encoded !== D)
        throw new RangeError(`the encoding gives ${encoded} inputs, the network takes ${D}`);
    const input = inputRange(calibration, D);
    const features = encoding.features.map((f) => f.kind === 'numeric'
        ? {
            kind: 'numeric',
            mean: Math.fround(f.mean),
            multiplier: Math.fround(1 / ((f.std > 0 ? f.std : 1) * input.scale)),
        }
        : { kind: 'categorical', categories: f.categories.length });
    const hidden = quantizeLayer(net.hiddenWeights, net.hiddenBias, input.scale);
    const ranges = activationRanges(net.activation, calibratePreActivation(net, calibration));
    const multipliers = hidden.scales.map((s) => quantizeMultiplier((input.scale * s) / ranges.preActivation.scale));
    const t = encoding.target;
    const regression = t.task === 'regression';
    const outBias = net.outputBias.map((b) => (regression ? b + t.mean / t.std : b));
    const S_h = ranges.activation.scale;
    const output = quantizeLayer(net.outputWeights, outBias, S_h);
    return {
        inputs: D,
        width: H,
        outputs: K,
        activation: net.activation,
        head: net.head,
        input: { ...input, one: quantizeValue(1, input), features },
        hidden: {
            weights: hidden.weights,
            weightScales: hidden.scales,
            bias: hidden.bias,
            multiplier: multipliers.map((m) => m.multiplier),
            shift: multipliers.map((m) => m.shift),
            preActivation: ranges.preActivation,
            activation: ranges.activation,
            table: activationTable(net.activation, ranges.preActivation, ranges.activation),
        },
        output: {
            weights: output.weights,
            weightScales: output.scales,
            bias: output.bias,
            scale: output.scales.map((s) => Math.fround(S_h * s * (regression ? t.std : 1))),
        },
    };
}

;// CONCATENATED MODULE: ./src/device/int8-forward.ts
/**
 * The int8 inference exactly as the exported C runs it (export-c.ts, NAME_predict_int8), so
 * that both give the same bits. The only float operations are the ones the C performs, each
 * rounded to float32 with Math.fround: the centring of a raw numeric feature (x − mean), its
 * scaling into quantisation steps (· multiplier), the int32 accumulator's conversion to float
 * and the output's dequantisation (· scale). Everything else is integer arithmetic.
 *
 * None of these float steps is a product feeding a sum, so a C compiler that contracts
 * a·b + c into a fused multiply-add cannot change them; they need IEEE 754 single precision
 * with each assignment rounded to float (FLT_EVAL_METHOD 0, or a compiler that honours C99's
 * rounding on assignment, as GCC does in its ISO modes).
 */



/** A raw value's clamp before it is rounded to an integer (keeps the C's float → int conversion defined). */
const INPUT_STEP_LIMIT = 512;
/** The requantised pre-activation's clamp before its zero-point is added (keeps the C's sum in int32). */
const PRE_ACTIVATION_LIMIT = 255;
/**
 * A value in input quantisation steps to its int8 code: clamp t to ±512 (NaN to −512), round
 * half away from zero through truncation (t − trunc(t) is exact in float32), add Z, clamp.
 */
function inputCode(t, zeroPoint) {
    let v = t;
    if (!(v > -INPUT_STEP_LIMIT))
        v = -INPUT_STEP_LIMIT;
    else if (v > INPUT_STEP_LIMIT)
        v = INPUT_STEP_LIMIT;
    let i = Math.trunc(v);
    const f = Math.fround(v - i);
    if (f >= 0.5)
        i++;
    else if (f <= -0.5)
        i--;
    return clamp(zeroPoint + i, -128, 127);
}
/** A categorical feature's raw value as a category index: a whole number in [0, n), else −1 (all zeros). */
function categoryIndex(v, n) {
    if (v >= 0 && v < n) {
        const c = Math.trunc(v);
        if (c === v)
            return c;
    }
    return -1;
}
/**
 * Run the int8 network on `rows` rows of raw features (rows × features, float32 values).
 * With `trace`, also records the input and hidden codes of every row.
 */
function int8Forward(q, features, rows, trace = null) {
    const F = q.input.features.length;
    const D = q.inputs;
    const H = q.width;
    const K = q.outputs;
    const b1 = foldZeroPoint(q.hidden.bias, q.hidden.weights, q.input.zeroPoint);
    const b2 = foldZeroPoint(q.output.bias, q.output.weights, q.hidden.activation.zeroPoint);
    const requant = q.hidden.multiplier.map((multiplier, j) => ({ multiplier, shift: q.hidden.shift[j] }));
    const zx = q.input.zeroPoint;
    const za = q.hidden.preActivation.zeroPoint;
    const xq = new Int32Array(D);
    const hq = new Int32Array(H);
    const classes = new Int32Array(rows);
    const outputs = new Float32Array(rows * K);
    for (let p = 0; p < rows; p++) {
        let c = 0;
        for (let f = 0; f < F; f++) {
            const v = Math.fround(features[p * F + f]);
            const e = q.input.features[f];
            if (e.kind === 'numeric') {
                const d = Math.fround(v - e.mean);
                xq[c++] = inputCode(Math.fround(d * e.multiplier), zx);
            }
            else {
                const k = categoryIndex(v, e.categories);
                for (let j = 0; j < e.categories; j++)
                    xq[c + j] = j === k ? q.input.one : zx;
                c += e.categories;
            }
        }
        for (let j = 0; j < H; j++) {
            const w = q.hidden.weights[j];
            let acc = b1[j];
            for (let i = 0; i < D; i++)
                acc += w[i] * xq[i];
            const r = clamp(multiplyByQuantizedMultiplier(acc, requant[j]), -PRE_ACTIVATION_LIMIT, PRE_ACTIVATION_LIMIT);
            const code = clamp(za + r, -128, 127);
            hq[j] = q.hidden.table[code + 128];
            if (trace)
                trace.preActivation[p * H + j] = code;
        }
        if (trace) {
            trace.inputs.set(xq, p * D);
            trace.hidden.set(hq, p * H);
        }
        let best = 0;
        for (let k = 0; k < K; k++) {
            const w = q.output.weights[k];
            let acc = b2[k];
            for (let j = 0; j < H; j++)
                acc += w[j] * hq[j];
            const z = Math.fround(Math.fround(acc) * q.output.scale[k]);
            outputs[p * K + k] = z;
            if (z > outputs[p * K + best])
                best = k;
        }
        classes[p] = q.head === 'softmax' ? best : q.head === 'logistic' ? (outputs[p * K] > 0 ? 1 : 0) : 0;
    }
    return { classes, outputs };
}
/**
 * Raw CSV rows as the device's raw features (rows × features, float32): a numeric feature's
 * number, a categorical feature's category index (−1 for a category the model has not seen,
 * which encodes as all zeros, as encodeRows does).
 */
function rawFeatureRows(encoding, rows) {
    const F = encoding.features.length;
    const out = new Float32Array(rows.length * F);
    rows.forEach((row, r) => {
        encoding.features.forEach((f, i) => {
            const cell = row[f.name];
            if (cell === undefined)
                throw new UserError(`row ${r + 1}: column "${f.name}" is missing`, { key: f.name });
            const text = cell.trim();
            if (f.kind === 'categorical') {
                out[r * F + i] = f.categories.indexOf(text);
                return;
            }
            const v = text === '' ? Number.NaN : Number(text);
            if (!Number.isFinite(v)) {
                throw new UserError(`row ${r + 1}, column "${f.name}": expected a number, found "${cell}"`, { key: f.name });
            }
            out[r * F + i] = v;
        });
    });
    return out;
}

;// CONCATENATED MODULE: ./src/device/int8-check.ts



const isInt = (v, lo, hi) => Number.isInteger(v) && v >= lo && v <= hi;
const isF32 = (v) => typeof v === 'number' && Number.isFinite(v) && Math.fround(v) === v;
const isPositive = (v) => typeof v === 'number' && Number.isFinite(v) && v > 0;
function list(v, n, ok) {
    return Array.isArray(v) && v.length === n && v.every(ok);
}
function matrix(v, rows, cols, ok) {
    return Array.isArray(v) && v.length === rows && v.every((r) => list(r, cols, ok));
}
const obj = (v) => typeof v === 'object' && v !== null && !Array.isArray(v) ? v : null;
function quantParams(v) {
    const p = obj(v);
    return p !== null && isPositive(p.scale) && isInt(p.zeroPoint, -128, 127);
}
function checkInt8Network(value, shape, encoding) {
    const { inputs: D, width: H, outputs: K } = shape;
    const q = obj(value);
    if (q === null)
        return { key: 'int8', expected: 'an object or null' };
    if (q.inputs !== D || q.width !== H || q.outputs !== K) {
        return { key: 'int8', expected: `the shape of the network (${D} inputs, ${H} hidden, ${K} outputs)` };
    }
    const input = obj(q.input);
    if (input === null || !quantParams(input) || !isInt(input.one, -128, 127)) {
        return { key: 'int8.input', expected: 'a scale, an int8 zero-point and an int8 one-hot code' };
    }
    const features = input.features;
    const fine = Array.isArray(features) &&
        features.length === encoding.features.length &&
        features.every((f, i) => {
            const e = encoding.features[i];
            const g = obj(f);
            if (g === null || g.kind !== e.kind)
                return false;
            if (e.kind === 'categorical')
                return g.categories === e.categories.length;
            return isF32(g.mean) && isF32(g.multiplier);
        });
    if (!fine)
        return { key: 'int8.input.features', expected: 'one entry per feature of the encoding, of its kind' };
    const hidden = obj(q.hidden);
    if (hidden === null)
        return { key: 'int8.hidden', expected: 'an object' };
    const checks = [
        ['weights', matrix(hidden.weights, H, D, (w) => isInt(w, -127, 127)), `${H} rows of ${D} integers in [-127, 127]`],
        ['weightScales', list(hidden.weightScales, H, isPositive), `${H} positive numbers`],
        ['bias', list(hidden.bias, H, (b) => isInt(b, -BIAS_LIMIT, BIAS_LIMIT)), `${H} integers within ±2^30`],
        ['multiplier', list(hidden.multiplier, H, (m) => isInt(m, 0, 2 ** 31 - 1)), `${H} integers in [0, 2^31)`],
        ['shift', list(hidden.shift, H, (n) => isInt(n, -MAX_SHIFT, MAX_SHIFT)), `${H} integers in [-31, 31]`],
        ['preActivation', quantParams(hidden.preActivation), 'a scale and an int8 zero-point'],
        ['activation', quantParams(hidden.activation), 'a scale and an int8 zero-point'],
        ['table', list(hidden.table, LUT_ENTRIES, (t) => isInt(t, -128, 127)), `${LUT_ENTRIES} integers in [-128, 127]`],
    ];
    for (const [key, ok, expected] of checks)
        if (!ok)
            return { key: `int8.hidden.${key}`, expected };
    const output = obj(q.output);
    if (output === null)
        return { key: 'int8.output', expected: 'an object' };
    const outChecks = [
        ['weights', matrix(output.weights, K, H, (w) => isInt(w, -127, 127)), `${K} rows of ${H} integers in [-127, 127]`],
        ['weightScales', list(output.weightScales, K, isPositive), `${K} positive numbers`],
        ['bias', list(output.bias, K, (b) => isInt(b, -BIAS_LIMIT, BIAS_LIMIT)), `${K} integers within ±2^30`],
        ['scale', list(output.scale, K, isF32), `${K} finite float32 numbers`],
    ];
    for (const [key, ok, expected] of outChecks)
        if (!ok)
            return { key: `int8.output.${key}`, expected };
    return null;
}

;// CONCATENATED MODULE: ./src/device/c-text.ts
/**
 * Pieces of C source text: checked identifiers, safe comment text and exact float32 literals.
 * Names from a repository (features, categories, classes, config paths) are untrusted: they
 * only ever reach the C inside comments, through `commentText`.
 */

/** Letters, digits and underscores, a letter first (a leading underscore is reserved in C), at most 31 (C99's portable length). */
const C_NAME = /^[A-Za-z][A-Za-z0-9_]{0,30}$/;
/**
 * The NAME of NAME.h, NAME.c and NAME_predict; a clear error for anything that is not a plain C
 * identifier (the value shown JSON-escaped, so no control character reaches a log line).
 */
function checkCName(name, key = '--name') {
    if (!C_NAME.test(name)) {
        const shown = JSON.stringify(name.length > 40 ? `${name.slice(0, 40)}…` : name).replace(/[\u007f-\u009f\u2028\u2029]/g, '?');
        throw new errors_UserError(`${key}: expected a C identifier (a letter, then up to 30 letters, digits or underscores), found ${shown}`, { key });
    }
    return name;
}
/** Longest untrusted text kept in a comment, in characters, before the escapes. */
const COMMENT_CLIP = 64;
/**
 * Untrusted text made safe inside a C block comment: clipped to `max` characters (with "..."),
 * every character outside printable ASCII, and the backslash, written as <U+XXXX> (no line
 * break, control character or line splice survives), "??" broken so no trigraph forms, and
 * every "*\/" and "/*" broken with a space.
 */
function commentText(text, max = COMMENT_CLIP) {
    const chars = Array.from(text);
    const clipped = chars.length > max ? [...chars.slice(0, max), '.', '.', '.'] : chars;
    let out = '';
    for (const ch of clipped) {
        const code = ch.codePointAt(0) ?? 0;
        const printable = code >= 0x20 && code <= 0x7e && ch !== '\\';
        out += printable ? ch : `<U+${code.toString(16).toUpperCase().padStart(4, '0')}>`;
    }
    out = out.replace(/\?\?/g, '?<U+003F>');
    let before;
    do {
        before = out;
        out = out.replace(/\*\//g, '* /').replace(/\/\*/g, '/ *');
    } while (out !== before);
    return out;
}
const f32 = new Float32Array(1);
const c_text_u32 = new Uint32Array(f32.buffer);
/** A float32 value as a C99 hexadecimal float literal with an f suffix: exact by construction. */
function floatLiteral(x) {
    if (!Number.isFinite(x) || Math.fround(x) !== x) {
        throw new RangeError(`not a finite float32 value: ${x}`);
    }
    f32[0] = x;
    const bits = c_text_u32[0];
    const sign = bits >>> 31 ? '-' : '';
    const exp = (bits >>> 23) & 0xff;
    const mant = bits & 0x7fffff;
    if (exp === 0 && mant === 0)
        return `${sign}0x0p+0f`;
    // 23 fraction bits shifted to 24 fill six hex digits.
    const digits = (mant << 1).toString(16).padStart(6, '0').replace(/0+$/, '');
    const frac = digits === '' ? '' : `.${digits}`;
    const e = exp === 0 ? -126 : exp - 127;
    return `${sign}0x${exp === 0 ? 0 : 1}${frac}p${e < 0 ? '-' : '+'}${Math.abs(e)}f`;
}
/** An int8 or int32 constant as a C literal (INT32_MIN would need a cast; the scheme never stores it). */
function intLiteral(v) {
    if (!Number.isInteger(v) || v <= -2147483648 || v > 2147483647)
        throw new RangeError(`not an int32 literal: ${v}`);
    return String(v);
}

;// CONCATENATED MODULE: ./src/device/c-code.ts

function encodeStatements(model, name, int8Path) {
    const out = [];
    let offset = 0;
    let m = 0;
    model.encoding.features.forEach((f, i) => {
        if (f.kind === 'numeric') {
            out.push(int8Path
                ? `  {\n    const float d = features[${i}] - ${name}_q_in_mean[${m}];\n    const float t = d * ${name}_q_in_mul[${m}];\n    xq[${offset}] = ${name}_input_code(t);\n  }`
                : `  x[${offset}] = (features[${i}] - ${name}_f_in_mean[${m}]) / ${name}_f_in_std[${m}];`);
            m++;
            offset++;
        }
        else {
            const n = f.categories.length;
            out.push(`  c = ${name}_category(features[${i}], ${n});`, int8Path
                ? `  for (j = 0; j < ${n}; j++) xq[${offset} + j] = j == c ? ${name}_q_in_one : ${name}_q_in_zero;`
                : `  for (j = 0; j < ${n}; j++) x[${offset} + j] = j == c ? 1.0f : 0.0f;`);
            offset += n;
        }
    });
    return out;
}
function helpers(name, hasNumeric, hasCategorical) {
    const out = [];
    if (hasCategorical) {
        out.push(`/* A raw categorical value as a category index: a whole number in [0, n), else -1. */`, `static int ${name}_category(float v, int n) {`, `  if (v >= 0.0f && v < (float)n) {`, `    const int c = (int)v;`, `    if ((float)c == v) return c;`, `  }`, `  return -1;`, `}`, ``);
    }
    if (hasNumeric) {
        out.push(`/* Input steps to an int8 code: clamp, round half away from zero (t - trunc(t) is exact), add the zero-point. */`, `static int8_t ${name}_input_code(float t) {`, `  int32_t i;`, `  float f;`, `  if (!(t > -${INPUT_STEP_LIMIT}.0f)) t = -${INPUT_STEP_LIMIT}.0f;`, `  else if (t > ${INPUT_STEP_LIMIT}.0f) t = ${INPUT_STEP_LIMIT}.0f;`, `  i = (int32_t)t;`, `  f = t - (float)i;`, `  if (f >= 0.5f) i++;`, `  else if (f <= -0.5f) i--;`, `  i += ${name}_q_in_zero;`, `  return (int8_t)(i < -128 ? -128 : i > 127 ? 127 : i);`, `}`, ``);
    }
    out.push(`/*`, ` * acc * M with M = m0 * 2^-31 * 2^-shift: a saturating left shift when shift < 0, the fixed-point`, ` * multiply (nudge, then division by 2^31 truncating toward zero) and a rounding right shift (ties`, ` * away from zero) when shift > 0: gemmlowp's SaturatingRoundingDoublingHighMul and RoundingDivideByPOT.`, ` */`, `static int32_t ${name}_requantize(int32_t acc, int32_t m0, int shift) {`, `  int64_t x = acc;`, `  int64_t ab;`, `  int32_t high, mask, remainder, threshold, floor_shift;`, `  if (m0 == 0) return 0;`, `  if (shift < 0) {`, `    x *= (int64_t)1 << -shift;`, `    if (x > INT32_MAX) x = INT32_MAX;`, `    if (x < INT32_MIN) x = INT32_MIN;`, `  }`, `  if (x == INT32_MIN && m0 == INT32_MIN) return INT32_MAX;`, `  ab = x * (int64_t)m0;`, `  high = (int32_t)((ab + (ab >= 0 ? ((int64_t)1 << 30) : (1 - ((int64_t)1 << 30)))) / ((int64_t)1 << 31));`, `  if (shift <= 0) return high;`, `  mask = (int32_t)(((int64_t)1 << shift) - 1);`, `  remainder = (int32_t)((uint32_t)high & (uint32_t)mask);`, `  threshold = (mask >> 1) + (high < 0 ? 1 : 0);`, `  floor_shift = high >= 0 ? (high >> shift) : ~((~high) >> shift);`, `  return floor_shift + (remainder > threshold ? 1 : 0);`, `}`, ``);
    return out;
}
function floatPath(model, name) {
    const N = name.toUpperCase();
    const net = model.network;
    const hasCategorical = model.encoding.features.some((f) => f.kind === 'categorical');
    const activation = net.activation === 'tanh'
        ? 'tanhf(a)'
        : net.activation === 'logistic'
            ? '1.0f / (1.0f + expf(-a))'
            : 'a > 0.0f ? a : 0.0f';
    const out = [
        `int ${name}_predict(const float features[${N}_FEATURES], float outputs[${N}_OUTPUTS]) {`,
        `  float x[${N}_INPUTS];`,
        `  float h[${N}_HIDDEN];`,
        `  int i, j, k;`,
        ...(hasCategorical ? [`  int c;`] : []),
        ...encodeStatements(model, name, false),
        `  for (j = 0; j < ${N}_HIDDEN; j++) {`,
        `    float a = ${name}_f_b1[j];`,
        `    for (i = 0; i < ${N}_INPUTS; i++) a += ${name}_f_w1[j][i] * x[i];`,
        `    h[j] = ${activation};`,
        `  }`,
        `  for (k = 0; k < ${N}_OUTPUTS; k++) {`,
        `    float z = ${name}_f_b2[k];`,
        `    for (j = 0; j < ${N}_HIDDEN; j++) z += ${name}_f_w2[k][j] * h[j];`,
        `    outputs[k] = z;`,
        `  }`,
    ];
    if (net.head === 'softmax') {
        out.push(`  {`, `    float m = outputs[0], s = 0.0f;`, `    int best = 0;`, `    for (k = 1; k < ${N}_OUTPUTS; k++) if (outputs[k] > m) m = outputs[k];`, `    for (k = 0; k < ${N}_OUTPUTS; k++) {`, `      outputs[k] = expf(outputs[k] - m);`, `      s += outputs[k];`, `    }`, `    for (k = 0; k < ${N}_OUTPUTS; k++) outputs[k] /= s;`, `    for (k = 1; k < ${N}_OUTPUTS; k++) if (outputs[k] > outputs[best]) best = k;`, `    return best;`, `  }`);
    }
    else if (net.head === 'logistic') {
        out.push(`  outputs[0] = 1.0f / (1.0f + expf(-outputs[0]));`, `  return outputs[0] > 0.5f ? 1 : 0;`);
    }
    else {
        out.push(`  outputs[0] = outputs[0] * ${name}_f_target[1] + ${name}_f_target[0];`, `  return 0;`);
    }
    out.push(`}`, ``);
    return out;
}
function int8Path(model, name) {
    const N = name.toUpperCase();
    const head = model.network.head;
    const hasCategorical = model.encoding.features.some((f) => f.kind === 'categorical');
    const out = [
        `int ${name}_predict_int8(const float features[${N}_FEATURES], float outputs[${N}_OUTPUTS]) {`,
        `  int8_t xq[${N}_INPUTS];`,
        `  int8_t hq[${N}_HIDDEN];`,
        `  int i, j, k;`,
        ...(hasCategorical ? [`  int c;`] : []),
        ...(head === 'softmax' ? [`  int best = 0;`] : []),
        ...encodeStatements(model, name, true),
        `  for (j = 0; j < ${N}_HIDDEN; j++) {`,
        `    int32_t acc = ${name}_q_b1[j], r;`,
        `    for (i = 0; i < ${N}_INPUTS; i++) acc += (int32_t)${name}_q_w1[j][i] * (int32_t)xq[i];`,
        `    r = ${name}_requantize(acc, ${name}_q_m0[j], ${name}_q_shift[j]);`,
        `    if (r < -${PRE_ACTIVATION_LIMIT}) r = -${PRE_ACTIVATION_LIMIT};`,
        `    else if (r > ${PRE_ACTIVATION_LIMIT}) r = ${PRE_ACTIVATION_LIMIT};`,
        `    r += ${name}_q_act_zero;`,
        `    if (r < -128) r = -128;`,
        `    else if (r > 127) r = 127;`,
        `    hq[j] = ${name}_q_lut[r + 128];`,
        `  }`,
        `  for (k = 0; k < ${N}_OUTPUTS; k++) {`,
        `    int32_t acc = ${name}_q_b2[k];`,
        `    for (j = 0; j < ${N}_HIDDEN; j++) acc += (int32_t)${name}_q_w2[k][j] * (int32_t)hq[j];`,
        `    outputs[k] = (float)acc * ${name}_q_out_scale[k];`,
        `  }`,
    ];
    if (head === 'softmax') {
        out.push(`  for (k = 1; k < ${N}_OUTPUTS; k++) if (outputs[k] > outputs[best]) best = k;`, `  return best;`);
    }
    else if (head === 'logistic') {
        out.push(`  return outputs[0] > 0.0f ? 1 : 0;`);
    }
    else {
        out.push(`  return 0;`);
    }
    out.push(`}`, ``);
    return out;
}

;// CONCATENATED MODULE: ./src/device/export-c.ts
/**
 * Firmware export: a model as C99 source, NAME.h and NAME.c, with a float32 and an int8 path.
 * No dynamic allocation, nothing beyond the C standard library (math.h on the float path).
 * The constant objects are exactly those cost.ts counts (`storedObjects`), and the int8 path
 * does exactly what int8-forward.ts simulates, operation for operation.
 */





const DEFAULT_C_NAME = 'nb_model';
const q = (s) => `"${commentText(s)}"`;
function checkModel(model) {
    const net = model.network;
    const int8 = model.int8;
    if (int8 === null) {
        throw new errors_UserError('model: no int8 network (key "int8" is null); write the model again with this version');
    }
    const values = [...net.hiddenWeights.flat(), ...net.hiddenBias, ...net.outputWeights.flat(), ...net.outputBias];
    if (!values.every(Number.isFinite))
        throw new errors_UserError('model: network weights must be finite numbers');
    if (int8.inputs !== net.inputs || int8.width !== net.width || int8.outputs !== net.outputs) {
        throw new errors_UserError('model: the int8 network does not have the shape of the float network', { key: 'int8' });
    }
    return int8;
}
function headerText(model, name, p) {
    const N = name.toUpperCase();
    const net = model.network;
    const enc = model.encoding;
    const classes = enc.target.classes ?? [];
    const regression = model.task === 'regression';
    const act = net.activation;
    const lines = [
        `/*`,
        ` * ${name}.h: a neural network for the device, written by neuron-budget ${commentText(p.toolVersion, 32)}.`,
        ` * Do not edit: export it again from the model file instead.`,
        ` *`,
        ` * Data fingerprint: ${commentText(p.dataFingerprint, 80)}`,
        ` * Config: ${commentText(p.config, 120)}`,
        ` * Network: ${net.inputs} inputs after encoding, ${net.width} hidden neurons (${act}), ${net.outputs} output${net.outputs === 1 ? '' : 's'} (${net.head} head).`,
        ` *`,
        ` * features[] holds the raw values, in this order:`,
    ];
    enc.features.forEach((f, i) => {
        if (f.kind === 'numeric') {
            lines.push(` *   [${i}] ${q(f.name)}: a number, standardised on the device`);
        }
        else {
            lines.push(` *   [${i}] ${q(f.name)}: the category's index, one-hot encoded on the device:`);
            f.categories.forEach((c, k) => lines.push(` *         ${k} = ${q(c)}`));
        }
    });
    if (enc.features.some((f) => f.kind === 'categorical')) {
        lines.push(` * A category index that is not a whole number in range encodes as no category (all zeros).`);
    }
    lines.push(` *`);
    if (regression) {
        lines.push(` * Both functions return 0 and write the prediction of ${q(enc.target.name)}, in its own units, to outputs[0].`);
    }
    else {
        lines.push(` * Both functions return the class index of ${q(enc.target.name)}:`);
        classes.forEach((c, k) => lines.push(` *         ${k} = ${q(c)}`));
        lines.push(` * ${name}_predict: the float32 network; outputs[] gets ${net.head === 'softmax' ? 'the probability of each class, in class order' : 'the probability of class 1'}.`, ` * ${name}_predict_int8: the int8 network; outputs[] gets the dequantised logit${net.outputs === 1 ? ' of class 1 (class 1 when it is above 0)' : ' of each class (the largest wins)'}.`);
    }
    lines.push(` * The int8 path is integer arithmetic apart from the input scaling and the output's dequantisation;`, ` * its outputs equal neuron-budget's simulation of it bit for bit on IEEE 754 single precision with`, ` * each assignment rounded to float (FLT_EVAL_METHOD 0, or GCC in an ISO mode such as -std=c99).`, ` * The float path runs the trained network in float32 arithmetic; it needs tanhf and expf (link -lm).`, ` */`, `#ifndef ${N}_H`, `#define ${N}_H`, ``, `#ifdef __cplusplus`, `extern "C" {`, `#endif`, ``, `#define ${N}_FEATURES ${enc.features.length}`, `#define ${N}_OUTPUTS ${net.outputs}`, `#define ${N}_INPUTS ${net.inputs}`, `#define ${N}_HIDDEN ${net.width}`);
    if (!regression)
        lines.push(`#define ${N}_CLASSES ${classes.length}`);
    lines.push(``, `int ${name}_predict(const float features[${N}_FEATURES], float outputs[${N}_OUTPUTS]);`, `int ${name}_predict_int8(const float features[${N}_FEATURES], float outputs[${N}_OUTPUTS]);`, ``, `#ifdef __cplusplus`, `}`, `#endif`, ``, `#endif`, ``);
    return lines.join('\n');
}
/** Values wrapped into lines of at most ~100 characters, indented. */
function wrap(values, indent) {
    const lines = [];
    let line = '';
    for (const v of values) {
        if (line !== '' && line.length + v.length + 2 > 100 - indent.length) {
            lines.push(`${indent}${line},`);
            line = '';
        }
        line = line === '' ? v : `${line}, ${v}`;
    }
    if (line !== '')
        lines.push(`${indent}${line}`);
    return lines.join('\n');
}
function literal(type, v) {
    return type === 'float' ? floatLiteral(v) : intLiteral(v);
}
function declare(name, o, values) {
    const decl = `static const ${o.type} ${name}_${o.suffix}`;
    const flat = values.flat();
    if (flat.length !== o.count)
        throw new Error(`internal: ${o.suffix} has ${flat.length} values, expected ${o.count}`);
    const cells = (row, indent) => wrap(row.map((v) => literal(o.type, v)), indent);
    if (o.scalar)
        return `${decl} = ${literal(o.type, flat[0])};`;
    if (isMatrix(values)) {
        const rows = values.map((r) => `  {\n${cells(r, '    ')}\n  }`);
        return `${decl}[${values.length}][${values[0].length}] = {\n${rows.join(',\n')}\n};`;
    }
    return `${decl}[${o.count}] = {\n${cells(flat, '  ')}\n};`;
}
function isMatrix(values) {
    return Array.isArray(values[0]);
}
/** The values of each stored object, keyed by suffix. */
function objectValues(model, int8) {
    const net = model.network;
    const enc = model.encoding;
    const numeric = enc.features.flatMap((f) => (f.kind === 'numeric' ? [f] : []));
    const qNumeric = int8.input.features.flatMap((f) => (f.kind === 'numeric' ? [f] : []));
    const f = (v) => Math.fround(v);
    const rows = (m) => m.map((r) => r.map(f));
    return {
        f_in_mean: numeric.map((e) => f(e.mean)),
        f_in_std: numeric.map((e) => f(e.std > 0 ? e.std : 1)),
        f_w1: rows(net.hiddenWeights),
        f_b1: net.hiddenBias.map(f),
        f_w2: rows(net.outputWeights),
        f_b2: net.outputBias.map(f),
        f_target: [f(enc.target.mean), f(enc.target.std)],
        q_in_mean: qNumeric.map((e) => e.mean),
        q_in_mul: qNumeric.map((e) => e.multiplier),
        q_in_zero: [int8.input.zeroPoint],
        q_in_one: [int8.input.one],
        q_w1: int8.hidden.weights,
        q_b1: foldZeroPoint(int8.hidden.bias, int8.hidden.weights, int8.input.zeroPoint),
        q_m0: int8.hidden.multiplier,
        q_shift: int8.hidden.shift,
        q_act_zero: [int8.hidden.preActivation.zeroPoint],
        q_lut: int8.hidden.table,
        q_w2: int8.output.weights,
        q_b2: foldZeroPoint(int8.output.bias, int8.output.weights, int8.hidden.activation.zeroPoint),
        q_out_scale: int8.output.scale,
    };
}
function sourceText(model, int8, name, p) {
    const stored = storedObjects(costShapeOf(model.network, model.encoding));
    const values = objectValues(model, int8);
    const numeric = model.encoding.features.some((f) => f.kind === 'numeric');
    const categorical = model.encoding.features.some((f) => f.kind === 'categorical');
    const s = int8.hidden;
    return [
        `/*`,
        ` * ${name}.c: written by neuron-budget ${commentText(p.toolVersion, 32)}; see ${name}.h. Do not edit.`,
        ` *`,
        ` * int8 scheme: input scale ${int8.input.scale.toPrecision(6)}, zero-point ${int8.input.zeroPoint};`,
        ` * pre-activation scale ${s.preActivation.scale.toPrecision(6)}, zero-point ${s.preActivation.zeroPoint};`,
        ` * hidden activation scale ${s.activation.scale.toPrecision(6)}, zero-point ${s.activation.zeroPoint};`,
        ` * symmetric per-neuron int8 weights, int32 biases (zero-points folded in), ${model.network.activation} by table.`,
        ` */`,
        `#include "${name}.h"`,
        `#include <math.h>`,
        `#include <stdint.h>`,
        ``,
        `/* float32 network */`,
        ...stored.float32.map((o) => declare(name, o, values[o.suffix])),
        ``,
        `/* int8 network */`,
        ...stored.int8.map((o) => declare(name, o, values[o.suffix])),
        ``,
        ...helpers(name, numeric, categorical),
        ...floatPath(model, name),
        ...int8Path(model, name),
    ].join('\n');
}
/** NAME.h and NAME.c for `model`; `name` must be a C identifier. */
function exportC(model, name, provenance) {
    checkCName(name);
    const int8 = checkModel(model);
    return {
        headerFile: `${name}.h`,
        sourceFile: `${name}.c`,
        header: headerText(model, name, provenance),
        source: sourceText(model, int8, name, provenance),
    };
}

;// CONCATENATED MODULE: ./src/device/index.ts
/**
 * Device reality: what a network costs on a microcontroller, its int8 form, and firmware
 * source for both forms. Pure functions; no I/O.
 */








;// CONCATENATED MODULE: external "node:crypto"
const external_node_crypto_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:crypto");
;// CONCATENATED MODULE: ./src/files/process.ts
/** Whether a process of this machine still runs, for telling a dead writer's leftovers from a live one's. */
/**
 * True only when `pid` certainly names no running process here (ESRCH). A process of
 * another user (EPERM) runs; anything unclear counts as running, so nothing live is touched.
 */
function processIsGone(pid) {
    if (!Number.isSafeInteger(pid) || pid <= 0)
        return false;
    try {
        process.kill(pid, 0);
        return false;
    }
    catch (e) {
        return e.code === 'ESRCH';
    }
}

;// CONCATENATED MODULE: ./src/files/atomic.ts
/**
 * Writes a file so that readers see either the old content or the whole new content,
 * never a half-written file: write a temp file in the same folder, then rename it over
 * the target (rename is atomic within one file system, which is why the temp file must
 * live beside the target rather than in the OS temp folder).
 *
 * A writer killed between the two steps leaves its temp file behind. The names follow one
 * pattern, `.NAME.PID.HEX.neuron-budget.tmp`, which users can ignore in git
 * (`*.neuron-budget.tmp`), and the next write of the same target removes those whose
 * writer is gone.
 */




const TEMP_SUFFIX = '.neuron-budget.tmp';
/** A temp file this old is stale whatever its PID says (a PID can be reused, or belong to another machine). @testOnly */
const STALE_TEMP_AGE_MS = 60 * 60 * 1000;
async function writeFileAtomic(path, text) {
    await removeStaleTempFiles(path);
    // The random suffix only names the temp file; it never reaches any output.
    const temp = (0,external_node_path_namespaceObject.join)((0,external_node_path_namespaceObject.dirname)(path), `.${(0,external_node_path_namespaceObject.basename)(path)}.${process.pid}.${(0,external_node_crypto_namespaceObject.randomBytes)(6).toString('hex')}${TEMP_SUFFIX}`);
    let handle = null;
    try {
        handle = await (0,promises_namespaceObject.open)(temp, 'wx');
        await handle.writeFile(text, 'utf8');
        await handle.sync();
        await handle.close();
        handle = null;
        await (0,promises_namespaceObject.rename)(temp, path);
    }
    catch (error) {
        if (handle)
            await handle.close().catch(() => undefined);
        await (0,promises_namespaceObject.rm)(temp, { force: true }).catch(() => undefined);
        throw error;
    }
}
function escapeRegExp(s) {
    return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
/**
 * Removes the temp files that earlier writes of `path` left behind: only names of exactly
 * our pattern for this target, and only when their writer process is gone (on this machine)
 * or the file is older than STALE_TEMP_AGE_MS. Never throws: a leftover it cannot remove
 * must not stop the write. Returns the names removed.
 * @testOnly
 */
async function removeStaleTempFiles(path, now = Date.now()) {
    const folder = (0,external_node_path_namespaceObject.dirname)(path);
    // A bare `.tmp` ending is the name neuron-budget 0.1.0 gave them: an upgrade cleans those up too.
    const pattern = new RegExp(`^\\.${escapeRegExp((0,external_node_path_namespaceObject.basename)(path))}\\.(\\d{1,10})\\.[0-9a-f]{12}(?:${escapeRegExp(TEMP_SUFFIX)}|\\.tmp)$`);
    let names;
    try {
        names = await (0,promises_namespaceObject.readdir)(folder);
    }
    catch {
        return [];
    }
    const removed = [];
    for (const name of names) {
        const m = pattern.exec(name);
        if (!m)
            continue;
        const pid = Number(m[1]);
        if (pid === process.pid)
            continue; // a write of this process may be under way
        const full = (0,external_node_path_namespaceObject.join)(folder, name);
        try {
            const info = await (0,promises_namespaceObject.stat)(full);
            if (!info.isFile())
                continue;
            if (!processIsGone(pid) && now - info.mtimeMs < STALE_TEMP_AGE_MS)
                continue;
            await (0,promises_namespaceObject.rm)(full, { force: true });
            removed.push(name);
        }
        catch {
            // Gone already (another run cleaned it) or not ours to touch: leave it.
        }
    }
    return removed;
}

;// CONCATENATED MODULE: ./src/files/output.ts
/**
 * Output files a user asked for (report, model): checked before minutes of work, written
 * atomically after. A refusal by the file system is the user's to fix, not a bug.
 */





/** Writes an output file atomically; a refusal by the file system is the user's to fix, not a bug. */
async function writeOutput(path, text, what, root) {
    try {
        await writeFileAtomic(path, text);
    }
    catch (error) {
        const code = error.code;
        const reasons = {
            EACCES: 'permission denied',
            EPERM: 'permission denied',
            EROFS: 'the file system is read-only',
            ENOSPC: 'no space left on the device',
            EISDIR: 'it is a folder',
            ENOENT: 'its folder does not exist',
            ENOTDIR: 'a part of the path is not a folder',
        };
        const reason = code === undefined ? undefined : reasons[code];
        if (reason === undefined)
            throw error;
        const shown = displayPath(root, path);
        throw new errors_UserError(`${what} file ${shown}: cannot be written (${reason}); nothing was written`, { file: shown });
    }
}
/** Fails early when `path` cannot be an output file (its folder is missing, or it is a folder). */
async function checkOutputFolder(path, what, root) {
    const folder = (0,external_node_path_namespaceObject.dirname)(path);
    const shown = displayPath(root, folder);
    const info = await (0,promises_namespaceObject.stat)(folder).catch(() => null);
    if (info === null)
        throw new errors_UserError(`${what} file ${displayPath(root, path)}: folder ${shown} does not exist`, {
            file: displayPath(root, path),
        });
    if (!info.isDirectory())
        throw new errors_UserError(`${what} file ${displayPath(root, path)}: ${shown} is not a folder`, {
            file: displayPath(root, path),
        });
    const target = await (0,promises_namespaceObject.stat)(path).catch(() => null);
    if (target?.isDirectory())
        throw new errors_UserError(`${what} file ${displayPath(root, path)}: is a folder, expected a file name`, {
            file: displayPath(root, path),
        });
}

;// CONCATENATED MODULE: ./src/model/document.ts

const MODEL_SCHEMA = 'neuron-budget/model@2';
/**
 * The witness as a document. With `calibration` (the encoded training rows) it carries the
 * int8 form too.
 */
function modelDocument(witness, encoding, target, backing, calibration = null, provenance = null) {
    return {
        schema: MODEL_SCHEMA,
        task: encoding.target.task,
        width: witness.network.width,
        target: {
            metric: target.metric,
            threshold: target.threshold,
            value: witness.judged,
            on: backing.on,
            met: witness.met,
            adequate: backing.adequate,
        },
        origin: { seed: witness.seed, width: witness.source.width, restart: witness.source.restart + 1, how: witness.how },
        encoding: structuredClone(encoding),
        network: structuredClone(witness.network),
        cost: deviceCost(costShapeOf(witness.network, encoding)),
        int8: calibration === null ? null : quantizeNetwork(witness.network, encoding, calibration),
        provenance,
    };
}
/** Stable, human-diffable text: two-space indent, key order as built, trailing newline. */
function serializeModel(doc) {
    return `${JSON.stringify(doc, null, 2)}\n`;
}

;// CONCATENATED MODULE: ./schema/model.schema.json
const model_schema_namespaceObject = /*#__PURE__*/JSON.parse('{"$schema":"https://json-schema.org/draft/2020-12/schema","title":"neuron-budget model","description":"A trained network as a self-contained file: the network, how raw rows become its inputs and its outputs labels or values, what it costs on a device, and its int8 form. Written by neuron-budget for the witness of a search.","type":"object","additionalProperties":false,"required":["schema","task","width","target","origin","encoding","network","cost","int8","provenance"],"properties":{"schema":{"const":"neuron-budget/model@2","description":"Format and version of this file."},"task":{"enum":["classification","regression"],"description":"What the network predicts: a class or a number."},"width":{"type":"integer","description":"Hidden neurons of the network (the same as network.width).","minimum":1},"target":{"type":"object","description":"The target the network was judged against and what it reached.","additionalProperties":false,"required":["metric","threshold","value","on","met","adequate"],"properties":{"metric":{"enum":["accuracy","rmse","mae","max-abs-error"],"description":"The target metric of the config."},"threshold":{"type":"number","description":"The config\'s threshold: accuracy at least this, error metrics at most this (in the target\'s units)."},"value":{"type":"number","description":"The metric on the rows that judged the network (target.on)."},"on":{"enum":["judging","validation","training"],"description":"Which rows judged it: the judging rows, never seen in training; or the validation rows, or the training rows, when there were none."},"met":{"type":"boolean","description":"The network met the target on those rows."},"adequate":{"type":"boolean","description":"Its width is adequate: at least search.required networks of that width met the target."}}},"origin":{"type":"object","description":"Where the network came from: with the same config and data, enough to train it again.","additionalProperties":false,"required":["seed","width","restart","how"],"properties":{"seed":{"type":"integer","description":"The config\'s base seed."},"width":{"type":"integer","minimum":1,"description":"Width of the fresh training the network started as."},"restart":{"type":"integer","minimum":1,"description":"Restart of that width (counted from 1) whose seeded stream trained it."},"how":{"enum":["fresh","pruned"],"description":"fresh: trained at its width; pruned: pruned down to it from origin.width."}}},"encoding":{"$ref":"#/$defs/encoding","description":"How raw rows become the network\'s inputs (numeric: standardised; categorical: one-hot) and its outputs labels or values."},"network":{"$ref":"#/$defs/network","description":"The trained network\'s weights in float64, with their layout."},"cost":{"$ref":"#/$defs/cost","description":"What the network costs on a device: parameters, multiply-accumulates, flash and RAM bytes in float32 and int8."},"int8":{"description":"The int8 form of the network, calibrated on the training rows; null when the writer had no training rows to calibrate on.","oneOf":[{"type":"null"},{"$ref":"#/$defs/int8"}]},"provenance":{"description":"What produced the file, for the header of exported firmware; null in files of version 1.","oneOf":[{"type":"null"},{"type":"object","additionalProperties":false,"required":["tool","data","config"],"properties":{"tool":{"type":"object","additionalProperties":false,"required":["name","version"],"properties":{"name":{"const":"neuron-budget","description":"The tool that wrote the file."},"version":{"type":"string","description":"Its version."}},"description":"The tool that wrote the file."},"data":{"type":"string","pattern":"^[0-9a-f]{64}$","description":"sha256 fingerprint of the data as used (64 hex digits)."},"config":{"type":"string","description":"The config file, relative to the workspace."}}}]}},"$defs":{"encoding":{"type":"object","description":"How raw rows become the network\'s inputs, and its outputs labels or values.","additionalProperties":false,"required":["features","target"],"properties":{"features":{"type":"array","description":"The features in input order; they encode to network.inputs inputs.","items":{"oneOf":[{"type":"object","description":"A numeric feature: one input, standardised.","additionalProperties":false,"required":["kind","name","mean","std"],"properties":{"kind":{"const":"numeric","description":"A number column."},"name":{"type":"string","description":"The column\'s name in the data file (text from the repository)."},"mean":{"type":"number","description":"Mean over the training rows; the input is (x − mean) / std."},"std":{"type":"number","description":"Population standard deviation over the training rows (1 for a constant column, which is only centred)."}}},{"type":"object","description":"A categorical feature: one input per category, one-hot.","additionalProperties":false,"required":["kind","name","categories"],"properties":{"kind":{"const":"categorical","description":"A text column."},"name":{"type":"string","description":"The column\'s name in the data file (text from the repository)."},"categories":{"type":"array","description":"The categories in input order: category k sets input k of this feature\'s block to 1, the others to 0. A category not listed sets them all to 0.","items":{"type":"string"},"minItems":1}}}]}},"target":{"type":"object","description":"How the network\'s outputs become labels or values.","additionalProperties":false,"required":["name","task","classes","mean","std"],"properties":{"name":{"type":"string","description":"The target column\'s name (text from the repository)."},"task":{"enum":["classification","regression"],"description":"The same as the document\'s task."},"classes":{"type":["array","null"],"items":{"type":"string"},"description":"Classification: the class labels in index order (sorted); null for regression."},"mean":{"type":"number","description":"Regression: the network\'s output is (y − mean) / std; classification: 0."},"std":{"type":"number","description":"Regression: see mean; classification: 1."}}}}},"network":{"type":"object","description":"The one-hidden-layer network in float64: a_j = hiddenBias[j] + Σ_i hiddenWeights[j][i]·x_i, h_j = activation(a_j), z_k = outputBias[k] + Σ_j outputWeights[k][j]·h_j, then the head.","additionalProperties":false,"required":["inputs","width","outputs","activation","head","hiddenWeights","hiddenBias","outputWeights","outputBias"],"properties":{"inputs":{"type":"integer","description":"Inputs after encoding (D).","minimum":1},"width":{"type":"integer","description":"Hidden neurons (H).","minimum":1},"outputs":{"type":"integer","description":"Output units (K): the classes for three or more, 1 for two classes (logistic) and for regression.","minimum":1},"activation":{"enum":["tanh","logistic","relu"],"description":"The hidden neurons\' activation."},"head":{"enum":["softmax","logistic","linear"],"description":"softmax: class probabilities; logistic: the probability of the second class; linear: the standardised value."},"hiddenWeights":{"type":"array","description":"H rows: hiddenWeights[j][i] is the weight from input i to hidden neuron j.","items":{"type":"array","description":"Hidden neuron j\'s weight from each input i, in input order.","items":{"type":"number"}}},"hiddenBias":{"type":"array","description":"One bias per hidden neuron.","items":{"type":"number"}},"outputWeights":{"type":"array","description":"K rows: outputWeights[k][j] is the weight from hidden neuron j to output k.","items":{"type":"array","description":"Output k\'s weight from each hidden neuron j.","items":{"type":"number"}}},"outputBias":{"type":"array","description":"One bias per output.","items":{"type":"number"}}}},"bytesByForm":{"type":"object","description":"A figure for each form of the network.","additionalProperties":false,"required":["float32","int8"],"properties":{"float32":{"type":"integer","description":"The float32 form.","minimum":0},"int8":{"type":"integer","description":"The int8 form.","minimum":0}}},"cost":{"type":"object","description":"What the network costs on a device, by the definitions of src/device/cost.ts.","additionalProperties":false,"required":["parameters","macs","flashBytes","ramBytes"],"properties":{"parameters":{"type":"integer","description":"Weights and biases: D·H + H + H·K + K.","minimum":0},"macs":{"type":"integer","description":"Multiply-accumulates per inference: D·H + H·K.","minimum":0},"flashBytes":{"$ref":"#/$defs/bytesByForm","description":"Bytes of the constant objects the exported C stores for each form (weights, biases, scales, zero-points, multipliers, shifts, the activation table, the input encoding\'s constants); code and padding not counted."},"ramBytes":{"$ref":"#/$defs/bytesByForm","description":"Bytes of the activation buffers of one inference (the encoded input vector and the hidden vector, in the form\'s type); the caller\'s arrays, scalars and the stack frame not counted."}}},"quantParams":{"type":"object","description":"An int8 quantisation: real = scale · (code − zeroPoint).","additionalProperties":false,"required":["scale","zeroPoint"],"properties":{"scale":{"type":"number","description":"S: the real value of one code step.","exclusiveMinimum":0},"zeroPoint":{"type":"integer","minimum":-128,"maximum":127,"description":"Z: the code of real 0 (real = S · (q − Z))."}}},"int8":{"type":"object","description":"The int8 form (integer-only inference after Jacob et al. 2018, per-channel symmetric weights after Krishnamoorthi 2018).","additionalProperties":false,"required":["inputs","width","outputs","activation","head","input","hidden","output"],"properties":{"inputs":{"type":"integer","description":"The same as network.inputs.","minimum":1},"width":{"type":"integer","description":"The same as network.width.","minimum":1},"outputs":{"type":"integer","description":"The same as network.outputs.","minimum":1},"activation":{"enum":["tanh","logistic","relu"],"description":"The same as network.activation."},"head":{"enum":["softmax","logistic","linear"],"description":"The same as network.head."},"input":{"type":"object","description":"The quantisation of the encoded inputs (asymmetric int8).","additionalProperties":false,"required":["scale","zeroPoint","one","features"],"properties":{"scale":{"type":"number","description":"S_x of the whole encoded input vector: (hi − lo) / 255 over the training rows, the range widened to hold 0.","exclusiveMinimum":0},"zeroPoint":{"type":"integer","minimum":-128,"maximum":127,"description":"Z_x: the code of an input of 0, round(−128 − lo / S_x)."},"one":{"type":"integer","minimum":-128,"maximum":127,"description":"The code of a one-hot 1: clamp(Z_x + round(1 / S_x))."},"features":{"type":"array","description":"One entry per feature of encoding.features, in the same order.","items":{"oneOf":[{"type":"object","description":"A numeric feature\'s input stage.","additionalProperties":false,"required":["kind","mean","multiplier"],"properties":{"kind":{"const":"numeric","description":"A numeric feature."},"mean":{"type":"number","description":"The feature\'s mean as float32, subtracted from the raw value in float32."},"multiplier":{"type":"number","description":"float32 1 / (std · S_x): the centred value times this, in float32, is the input in code steps before rounding."}}},{"type":"object","description":"A categorical feature\'s input stage.","additionalProperties":false,"required":["kind","categories"],"properties":{"kind":{"const":"categorical","description":"A categorical feature."},"categories":{"type":"integer","description":"Its number of categories (one-hot inputs).","minimum":1}}}]}}}},"hidden":{"type":"object","description":"The hidden layer: int32 accumulation, requantisation to an int8 pre-activation, the activation by table.","additionalProperties":false,"required":["weights","weightScales","bias","multiplier","shift","preActivation","activation","table"],"properties":{"weights":{"type":"array","description":"H rows of D int8 weight codes (symmetric: zero-point 0, range ±127).","items":{"type":"array","description":"Neuron j\'s weight codes, in input order.","items":{"type":"integer","minimum":-127,"maximum":127}}},"weightScales":{"type":"array","description":"S_w per hidden neuron: max |w| / 127 (larger only when the bias would not fit in ±2^30 steps).","items":{"type":"number","exclusiveMinimum":0}},"bias":{"type":"array","description":"int32 bias per hidden neuron at scale S_x · S_w[j], zero-point 0, before the input zero-point is folded in.","items":{"type":"integer","minimum":-1073741824,"maximum":1073741824}},"multiplier":{"type":"array","description":"M0 per hidden neuron as round(M0 · 2^31) in [2^30, 2^31), with M = S_x · S_w[j] / S_a = M0 · 2^−shift; 0 when M < 2^−32.","items":{"type":"integer","minimum":0,"maximum":2147483647}},"shift":{"type":"array","description":"n per hidden neuron: a rounding right shift when positive, a saturating left shift when negative.","items":{"type":"integer","minimum":-31,"maximum":31}},"preActivation":{"$ref":"#/$defs/quantParams","description":"The int8 pre-activation that indexes the table (S_a, Z_a)."},"activation":{"$ref":"#/$defs/quantParams","description":"The int8 hidden activation the table holds (S_h, Z_h)."},"table":{"type":"array","description":"table[q + 128]: the activation code of pre-activation code q, for q = −128..127.","items":{"type":"integer","minimum":-128,"maximum":127},"minItems":256,"maxItems":256}}},"output":{"type":"object","description":"The output layer: int32 accumulation, then dequantisation to float for the head.","additionalProperties":false,"required":["weights","weightScales","bias","scale"],"properties":{"weights":{"type":"array","description":"K rows of H int8 weight codes (symmetric, ±127).","items":{"type":"array","description":"Output k\'s weight codes, by hidden neuron.","items":{"type":"integer","minimum":-127,"maximum":127}}},"weightScales":{"type":"array","description":"S_w per output.","items":{"type":"number","exclusiveMinimum":0}},"bias":{"type":"array","description":"int32 bias per output at scale S_h · S_w[k] (regression: with the target\'s mean / std added), before the hidden zero-point is folded in.","items":{"type":"integer","minimum":-1073741824,"maximum":1073741824}},"scale":{"type":"array","description":"float32 per output: the dequantised output per accumulator step (S_h · S_w[k]; regression: times the target\'s std, giving target units).","items":{"type":"number"}}}}}}}}');
;// CONCATENATED MODULE: ./src/common/json-position.ts
/**
 * Finds where a JSON text first goes wrong. JSON.parse's messages differ between Node
 * versions and some carry no position at all, so a small scanner (RFC 8259 grammar)
 * gives every user the same line and column.
 */

/** Returns null when `text` is valid JSON. */
function findJsonSyntaxProblem(text) {
    let i = 0;
    const n = text.length;
    const fail = (expected) => {
        throw new ScanError(i, expected);
    };
    const ws = () => {
        while (i < n) {
            const c = text.charCodeAt(i);
            if (c === 0x20 || c === 0x09 || c === 0x0a || c === 0x0d)
                i++;
            else
                break;
        }
    };
    const literal = (word) => {
        if (text.startsWith(word, i))
            i += word.length;
        else
            fail(`"${word}"`);
    };
    const digits = () => {
        const start = i;
        while (i < n && text.charCodeAt(i) >= 0x30 && text.charCodeAt(i) <= 0x39)
            i++;
        if (i === start)
            fail('a digit');
    };
    const number = () => {
        if (text[i] === '-')
            i++;
        if (text[i] === '0')
            i++;
        else
            digits();
        if (text[i] === '.') {
            i++;
            digits();
        }
        if (text[i] === 'e' || text[i] === 'E') {
            i++;
            if (text[i] === '+' || text[i] === '-')
                i++;
            digits();
        }
    };
    const string = () => {
        i++; // opening quote
        while (i < n) {
            const c = text.charCodeAt(i);
            if (c === 0x22) {
                i++;
                return;
            }
            if (c < 0x20)
                fail('a closing quote (a string cannot contain a line break or control character)');
            if (c === 0x5c) {
                i++;
                const e = text[i];
                if (e === 'u') {
                    for (let k = 1; k <= 4; k++) {
                        if (!/[0-9a-fA-F]/.test(text[i + k] ?? '')) {
                            i += k;
                            fail('four hex digits after \\u');
                        }
                    }
                    i += 5;
                }
                else if (e !== undefined && '"\\/bfnrt'.includes(e))
                    i++;
                else
                    fail('a valid escape (\\" \\\\ \\/ \\b \\f \\n \\r \\t \\uXXXX)');
            }
            else
                i++;
        }
        fail('a closing quote');
    };
    const value = () => {
        ws();
        const c = text[i];
        if (c === '{') {
            i++;
            ws();
            if (text[i] === '}') {
                i++;
                return;
            }
            for (;;) {
                ws();
                if (text[i] !== '"')
                    fail('a key in double quotes');
                string();
                ws();
                if (text[i] !== ':')
                    fail('":"');
                i++;
                value();
                ws();
                if (text[i] === ',') {
                    i++;
                    continue;
                }
                if (text[i] === '}') {
                    i++;
                    return;
                }
                fail('"," or "}"');
            }
        }
        else if (c === '[') {
            i++;
            ws();
            if (text[i] === ']') {
                i++;
                return;
            }
            for (;;) {
                value();
                ws();
                if (text[i] === ',') {
                    i++;
                    continue;
                }
                if (text[i] === ']') {
                    i++;
                    return;
                }
                fail('"," or "]"');
            }
        }
        else if (c === '"')
            string();
        else if (c === '-' || (c !== undefined && c >= '0' && c <= '9'))
            number();
        else if (c === 't')
            literal('true');
        else if (c === 'f')
            literal('false');
        else if (c === 'n')
            literal('null');
        else
            fail('a value');
    };
    try {
        if (text.charCodeAt(0) === 0xfeff)
            i = 1;
        value();
        ws();
        if (i < n)
            fail('the end of the file');
        return null;
    }
    catch (e) {
        if (!(e instanceof ScanError))
            throw e;
        const { line, column } = lineAndColumn(text, e.offset);
        const found = e.offset >= n ? 'the end of the file' : describeChar(text, e.offset);
        return { line, column, detail: `expected ${e.expected}, found ${found}` };
    }
}
class ScanError extends Error {
    offset;
    expected;
    constructor(offset, expected) {
        super(`expected ${expected} at offset ${offset}`);
        this.offset = offset;
        this.expected = expected;
    }
}
/**
 * 1-based line and column as a text editor counts them: LF, CRLF and a lone CR each end a
 * line, and the column counts characters (a character outside the BMP is one, not two).
 */
function lineAndColumn(text, offset) {
    let line = 1;
    let column = 1;
    for (let k = 0; k < offset && k < text.length; k++) {
        const c = text.charCodeAt(k);
        if (c === 0x0a || (c === 0x0d && text.charCodeAt(k + 1) !== 0x0a)) {
            line++;
            column = 1;
        }
        else if (c !== 0x0d && (c < 0xdc00 || c > 0xdfff)) {
            column++;
        }
    }
    return { line, column };
}
function describeChar(text, offset) {
    const c = text.codePointAt(offset) ?? 0;
    if (c === 0x0a || c === 0x0d)
        return 'a line break';
    if (c < 0x20 || (c >= 0x7f && c < 0xa0))
        return `control character U+${c.toString(16).toUpperCase().padStart(4, '0')}`;
    return escape_quote(String.fromCodePoint(c));
}

;// CONCATENATED MODULE: ./src/common/json-schema.ts
/**
 * Checks a parsed JSON document against one of our own JSON Schemas (schema/*.json), so each
 * file format has one definition: the schema editors read is the one the tool enforces. Only
 * the keywords our schemas use are understood (type, const, enum, properties, required,
 * additionalProperties, items, minItems, maxItems, minimum, maximum, pattern, maxLength, $ref
 * into $defs, anyOf, oneOf); a schema that uses any other keyword is refused when it is loaded,
 * so a schema cannot silently say more than is checked.
 *
 * The first problem is reported as `key: expected …, found …`, with the key written as a path
 * (`history[0].date`). A schema node's `title` is the "expected" phrase when it has one.
 */

class SchemaProblem extends Error {
    key;
    expected;
    found;
    constructor(
    /** Where, as a path (`result.width`, `history[0]`); '(top level)' for the document itself. */
    key, expected, 
    /** What was found, described for a reader. */
    found) {
        super(`${key}: expected ${expected}, found ${found}`);
        this.key = key;
        this.expected = expected;
        this.found = found;
        this.name = 'SchemaProblem';
    }
}
const KNOWN = new Set([
    'title',
    'description',
    'type',
    'const',
    'enum',
    'properties',
    'required',
    'additionalProperties',
    'items',
    'minItems',
    'maxItems',
    'minimum',
    'maximum',
    'exclusiveMinimum',
    'minProperties',
    'pattern',
    'maxLength',
    '$ref',
    'anyOf',
    'oneOf',
    '$defs',
    '$schema',
    '$id',
    '$comment',
]);
/** A validator for documents of one schema. Throws when the schema uses a keyword it does not check. */
function schemaValidator(root) {
    checkKeywords(root, '#');
    const patterns = new Map();
    const regex = (p) => {
        let re = patterns.get(p);
        if (re === undefined)
            patterns.set(p, (re = new RegExp(p, 'u')));
        return re;
    };
    const resolve = (node) => {
        if (node.$ref === undefined)
            return node;
        const m = /^#\/\$defs\/(.+)$/.exec(node.$ref);
        const target = m ? root.$defs?.[m[1]] : undefined;
        if (target === undefined)
            throw new Error(`schema: unresolved $ref ${node.$ref}`);
        return { ...target, ...(node.title ? { title: node.title } : {}) };
    };
    const check = (raw, value, key) => {
        const node = resolve(raw);
        const fail = (expected, found = value) => {
            throw new SchemaProblem(key || '(top level)', node.title ?? expected, describe(found));
        };
        if (node.const !== undefined && value !== node.const)
            fail(JSON.stringify(node.const));
        if (node.enum !== undefined && !node.enum.includes(value))
            fail(`one of ${node.enum.map((v) => JSON.stringify(v)).join(', ')}`);
        if (node.type !== undefined) {
            const types = Array.isArray(node.type) ? node.type : [node.type];
            if (value === null && types.includes('null'))
                return;
            if (!types.some((t) => hasType(value, t)))
                fail(typePhrase(node, types.filter((t) => t !== 'null')));
        }
        if (typeof value === 'number') {
            if (node.minimum !== undefined && value < node.minimum)
                fail(typePhrase(node, types(node)));
            if (node.maximum !== undefined && value > node.maximum)
                fail(typePhrase(node, types(node)));
            if (node.exclusiveMinimum !== undefined && value <= node.exclusiveMinimum)
                fail(typePhrase(node, types(node)));
        }
        if (typeof value === 'string') {
            if (node.maxLength !== undefined && value.length > node.maxLength)
                fail(`a string of at most ${node.maxLength} characters`);
            if (node.pattern !== undefined && !regex(node.pattern).test(value))
                fail(`a string matching ${node.pattern}`);
        }
        if (Array.isArray(value)) {
            if (node.maxItems !== undefined && value.length > node.maxItems)
                fail(`a list of at most ${node.maxItems} entries`, value.length);
            if (node.minItems !== undefined && value.length < node.minItems)
                fail(`a list of at least ${node.minItems} entries`, value.length);
            if (node.items !== undefined)
                value.forEach((v, i) => check(node.items, v, `${key}[${i}]`));
        }
        if (isObject(value)) {
            const props = node.properties ?? {};
            if (node.minProperties !== undefined && Object.keys(value).length < node.minProperties) {
                fail(`an object with at least ${node.minProperties} key${node.minProperties === 1 ? '' : 's'}`);
            }
            for (const [name, child] of Object.entries(value)) {
                if (Object.hasOwn(props, name))
                    check(props[name], child, join(key, name));
                else if (node.additionalProperties === false) {
                    throw new SchemaProblem(join(key, name), `no such key (allowed: ${Object.keys(props).join(', ')})`, describe(child));
                }
                else if (typeof node.additionalProperties === 'object')
                    check(node.additionalProperties, child, join(key, name));
            }
            // What is there is checked before what is missing: a wrong value says more than a later absent key.
            for (const name of node.required ?? []) {
                if (!Object.hasOwn(value, name))
                    throw new SchemaProblem(join(key, name), expectedOf(resolve(props[name] ?? {})), MISSING_KEY);
            }
        }
        if (node.anyOf !== undefined) {
            if (!node.anyOf.some((branch) => passes(branch, value, key)))
                fail(node.anyOf.map((b) => expectedOf(resolve(b))).join(' or '));
        }
        if (node.oneOf !== undefined) {
            // Our oneOf branches are told apart by a `kind` constant: check the branch the document names.
            const kinds = node.oneOf.map((b) => resolve(b).properties?.['kind']?.const);
            if (!kinds.includes(undefined) && isObject(value)) {
                const at = kinds.indexOf(value['kind']);
                if (at < 0)
                    throw new SchemaProblem(join(key, 'kind'), `one of ${kinds.map((k) => JSON.stringify(k)).join(', ')}`, describe(Object.hasOwn(value, 'kind') ? value['kind'] : MISSING));
                check(node.oneOf[at], value, key);
            }
            else {
                // When the value's type leaves one branch (null or an object, say), check that one: its error is the precise one.
                const typed = node.oneOf.filter((b) => {
                    const t = resolve(b).type;
                    const all = t === undefined ? [] : Array.isArray(t) ? t : [t];
                    return all.length === 0 || all.some((x) => hasType(value, x));
                });
                if (typed.length === 1)
                    check(typed[0], value, key);
                else if (node.oneOf.filter((branch) => passes(branch, value, key)).length !== 1) {
                    fail(node.oneOf.map((b) => expectedOf(resolve(b))).join(' or '));
                }
            }
        }
    };
    const passes = (node, value, key) => {
        try {
            check(node, value, key);
            return true;
        }
        catch (e) {
            if (e instanceof SchemaProblem)
                return false;
            throw e;
        }
    };
    return (value) => check(root, value, '');
}
const MISSING = Symbol('missing');
const MISSING_KEY = 'nothing (the key is missing)';
function checkKeywords(node, where) {
    for (const [k, v] of Object.entries(node)) {
        if (!KNOWN.has(k))
            throw new Error(`schema: keyword ${k} at ${where} is not checked by schemaValidator`);
        if (k === 'properties' || k === '$defs')
            for (const [name, child] of Object.entries(v))
                checkKeywords(child, `${where}/${k}/${name}`);
        if ((k === 'items' || k === 'additionalProperties') && typeof v === 'object')
            checkKeywords(v, `${where}/${k}`);
        if (k === 'anyOf' || k === 'oneOf')
            v.forEach((child, i) => checkKeywords(child, `${where}/${k}/${i}`));
    }
}
function types(node) {
    const t = node.type === undefined ? [] : Array.isArray(node.type) ? node.type : [node.type];
    return t.filter((x) => x !== 'null');
}
function hasType(value, type) {
    switch (type) {
        case 'object':
            return isObject(value);
        case 'array':
            return Array.isArray(value);
        case 'string':
            return typeof value === 'string';
        case 'number':
            return typeof value === 'number' && Number.isFinite(value);
        case 'integer':
            return typeof value === 'number' && Number.isInteger(value);
        case 'boolean':
            return typeof value === 'boolean';
        case 'null':
            return value === null;
    }
}
/** "an integer of at least 1", "a number", "a list", … */
function typePhrase(node, ts) {
    const bound = () => {
        const parts = [];
        if (node.minimum !== undefined && node.maximum !== undefined)
            return ` from ${node.minimum} to ${node.maximum}`;
        if (node.exclusiveMinimum !== undefined)
            parts.push(` above ${node.exclusiveMinimum}`);
        if (node.minimum !== undefined)
            parts.push(` of at least ${node.minimum}`);
        if (node.maximum !== undefined)
            parts.push(` of at most ${node.maximum}`);
        return parts.join('');
    };
    const one = (t) => {
        switch (t) {
            case 'object':
                return 'an object';
            case 'array':
                return 'a list';
            case 'string':
                return 'a string';
            case 'number':
                return `a number${bound()}`;
            case 'integer':
                return `an integer${bound()}`;
            case 'boolean':
                return 'true or false';
            case 'null':
                return 'null';
        }
    };
    return ts.length === 0 ? 'a value' : ts.map(one).join(' or ');
}
function expectedOf(node) {
    if (node.title !== undefined)
        return node.title;
    if (node.const !== undefined)
        return JSON.stringify(node.const);
    if (node.enum !== undefined)
        return `one of ${node.enum.map((v) => JSON.stringify(v)).join(', ')}`;
    return typePhrase(node, types(node));
}
function join(key, child) {
    return key === '' ? child : `${key}.${child}`;
}
function isObject(v) {
    return typeof v === 'object' && v !== null && !Array.isArray(v);
}
/** A found value for a message: short, and never a repository string in full. */
function describe(v) {
    if (v === MISSING)
        return 'nothing';
    if (v === null)
        return 'null';
    if (Array.isArray(v))
        return 'a list';
    if (typeof v === 'object')
        return 'an object';
    if (typeof v === 'string')
        return escape_quote(v, 60);
    return typeof v === 'number' || typeof v === 'boolean' ? String(v) : typeof v;
}

;// CONCATENATED MODULE: ./src/model/parse.ts
/**
 * Reading a model file: JSON syntax with line and column, then the shape by
 * schema/model.schema.json itself, then what a schema cannot say (array lengths that follow
 * the network's shape, the int8 form's consistency). Every problem is one message naming the
 * file and the key. Files of version 1 (before judging rows and the int8 form) are read too.
 */






/** The first version: no cost, no int8 form, judged on the validation rows, a 0-based restart and the grown width. */
const MODEL_SCHEMA_V1 = 'neuron-budget/model@1';
const checkShape = schemaValidator(model_schema_namespaceObject);
function inputsOf(features) {
    return features.reduce((n, f) => n + (f.kind === 'numeric' ? 1 : f.categories.length), 0);
}
/** A version-1 document in this version's shape (what it could not know is marked as such). */
function upgrade(d) {
    const v1target = d['target'];
    const v1origin = d['origin'];
    const net = d['network'];
    const enc = d['encoding'];
    const cost = net && enc && Array.isArray(enc.features)
        ? deviceCost(costShapeOf(net, enc))
        : undefined;
    return {
        ...d,
        schema: MODEL_SCHEMA,
        target: v1target && { ...v1target, on: 'validation', met: true, adequate: true },
        origin: v1origin && {
            seed: v1origin.seed,
            width: v1origin.grownWidth,
            restart: typeof v1origin.restart === 'number' ? v1origin.restart + 1 : v1origin.restart,
            how: 'fresh',
        },
        cost,
        int8: null,
        provenance: null,
    };
}
/** Parse and check a model file; a bad file gets a message naming the file and the key. */
function parseModel(text, file = 'model') {
    const syntax = findJsonSyntaxProblem(text);
    if (syntax) {
        throw new errors_UserError(`${file}:${syntax.line}:${syntax.column}: the model is not valid JSON: ${syntax.detail}`, {
            file,
            line: syntax.line,
            column: syntax.column,
        });
    }
    let doc = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
    const bad = (key, expected, found) => {
        throw new errors_UserError(`${file}: ${key}: expected ${expected}, found ${found}`, { file, key });
    };
    if (typeof doc !== 'object' || doc === null || Array.isArray(doc))
        return bad('(top level)', 'a neuron-budget model (a JSON object)', Array.isArray(doc) ? 'a list' : String(doc));
    const schema = doc['schema'];
    if (schema === MODEL_SCHEMA_V1)
        doc = upgrade(doc);
    else if (schema !== MODEL_SCHEMA) {
        bad('schema', `"${MODEL_SCHEMA}"`, typeof schema === 'string' ? JSON.stringify(schema.slice(0, 60)) : 'nothing');
    }
    try {
        checkShape(doc);
    }
    catch (e) {
        if (e instanceof SchemaProblem)
            bad(e.key, e.expected, e.found);
        throw e;
    }
    const d = doc;
    const net = d.network;
    const enc = d.encoding;
    if (inputsOf(enc.features) !== net.inputs)
        bad('encoding.features', `features that encode to ${net.inputs} inputs (network.inputs)`, `${inputsOf(enc.features)}`);
    const rows = (key, list, count, length) => {
        if (list.length !== count)
            bad(key, `${count} rows`, `${list.length}`);
        list.forEach((r, i) => {
            if (r.length !== length)
                bad(`${key}[${i}]`, `${length} numbers`, `${r.length}`);
        });
    };
    rows('network.hiddenWeights', net.hiddenWeights, net.width, net.inputs);
    rows('network.outputWeights', net.outputWeights, net.outputs, net.width);
    if (net.hiddenBias.length !== net.width)
        bad('network.hiddenBias', `${net.width} numbers`, `${net.hiddenBias.length}`);
    if (net.outputBias.length !== net.outputs)
        bad('network.outputBias', `${net.outputs} numbers`, `${net.outputBias.length}`);
    if (d.width !== net.width)
        bad('width', `network.width (${net.width})`, `${d.width}`);
    if (d.task === 'classification' && !Array.isArray(enc.target.classes))
        bad('encoding.target.classes', 'a list of class labels', 'null');
    if (d.int8 !== null) {
        const problem = checkInt8Network(d.int8, net, enc);
        if (problem)
            bad(problem.key, problem.expected, 'something else');
    }
    // The cost is derived: recompute it rather than trust the file.
    return { ...d, cost: deviceCost(costShapeOf(net, enc)) };
}

;// CONCATENATED MODULE: ./src/nn/kernel/layout.ts
function layoutOf(s) {
    const w1 = 0;
    const b1 = s.inputs * s.width;
    const w2 = b1 + s.width;
    const b2 = w2 + s.width * s.outputs;
    return { w1, b1, w2, b2, size: b2 + s.outputs };
}

;// CONCATENATED MODULE: ./src/nn/kernel/reference.ts




function activationCode(a) {
    return a === 'tanh' ? ACT_TANH : a === 'logistic' ? ACT_LOGISTIC : ACT_RELU;
}
function headCode(h) {
    return h === 'linear' ? HEAD_LINEAR : h === 'logistic' ? HEAD_LOGISTIC : HEAD_SOFTMAX;
}
function makeScratch(width, outputs) {
    return {
        a: new Float64Array(width),
        h: new Float64Array(width),
        dh: new Float64Array(GRAD_BLOCK_ROWS * width),
        acc: new Float64Array(width),
        z: new Float64Array(outputs),
        dz: new Float64Array(outputs),
    };
}
/** Hidden pre-activations a and activations h of row p. */
function hiddenRow(act, D, H, params, b1, x, p, a, h) {
    for (let j = 0; j < H; j++)
        a[j] = params[b1 + j];
    const xo = p * D;
    for (let i = 0; i < D; i++) {
        const xi = x[xo + i];
        const wo = i * H;
        for (let j = 0; j < H; j++)
            a[j] += xi * params[wo + j];
    }
    if (act === ACT_TANH)
        for (let j = 0; j < H; j++)
            h[j] = detTanh(a[j]);
    else if (act === ACT_LOGISTIC)
        for (let j = 0; j < H; j++)
            h[j] = detLogistic(a[j]);
    else
        for (let j = 0; j < H; j++)
            h[j] = a[j] > 0 ? a[j] : 0;
}
function outputRow(H, K, params, w2, b2, h, z) {
    for (let k = 0; k < K; k++)
        z[k] = params[b2 + k];
    for (let j = 0; j < H; j++) {
        const hj = h[j];
        const wo = w2 + j * K;
        for (let k = 0; k < K; k++)
            z[k] += hj * params[wo + k];
    }
}
/**
 * Loss of one row from its logits z; writes dLoss/dz into dz. `t` is the class index
 * (classification) or the standardised target (regression).
 */
function headLossAndDelta(head, K, z, t, dz) {
    if (head === HEAD_LINEAR) {
        const d = z[0] - t;
        dz[0] = d;
        return 0.5 * d * d;
    }
    if (head === HEAD_LOGISTIC) {
        dz[0] = detLogistic(z[0]) - t;
        return detSoftplus(z[0]) - t * z[0];
    }
    let m = z[0];
    for (let k = 1; k < K; k++)
        if (z[k] > m)
            m = z[k];
    let s = 0;
    for (let k = 0; k < K; k++) {
        const e = detExp(z[k] - m);
        dz[k] = e;
        s += e;
    }
    const inv = 1 / s;
    for (let k = 0; k < K; k++)
        dz[k] *= inv;
    dz[t] -= 1;
    return detLog(s) - (z[t] - m);
}
/** Head outputs (probabilities or standardised values) from logits. */
function headOutputs(head, K, z, zo, out, oo) {
    if (head === HEAD_LINEAR) {
        for (let k = 0; k < K; k++)
            out[oo + k] = z[zo + k];
    }
    else if (head === HEAD_LOGISTIC) {
        out[oo] = detLogistic(z[zo]);
    }
    else {
        let m = z[zo];
        for (let k = 1; k < K; k++)
            if (z[zo + k] > m)
                m = z[zo + k];
        let s = 0;
        for (let k = 0; k < K; k++) {
            const e = detExp(z[zo + k] - m);
            out[oo + k] = e;
            s += e;
        }
        const inv = 1 / s;
        for (let k = 0; k < K; k++)
            out[oo + k] *= inv;
    }
}
/**
 * Sum over rows [start, end) of the per-row loss; the summed gradient goes into `grad`
 * (overwritten). No allocation.
 */
function referenceLossAndGradient(shape, params, x, y, start, end, grad, s) {
    const D = shape.inputs;
    const H = shape.width;
    const K = shape.outputs;
    const act = activationCode(shape.activation);
    const head = headCode(shape.head);
    const lay = layoutOf(shape);
    const { a, h, dh, acc, z, dz } = s;
    grad.fill(0);
    let loss = 0;
    for (let p = start; p < end; p++) {
        const q = (p - start) % GRAD_BLOCK_ROWS; // this row's place in its gradient block
        const qo = q * H;
        hiddenRow(act, D, H, params, lay.b1, x, p, a, h);
        outputRow(H, K, params, lay.w2, lay.b2, h, z);
        loss += headLossAndDelta(head, K, z, y[p], dz);
        for (let k = 0; k < K; k++)
            grad[lay.b2 + k] += dz[k];
        for (let j = 0; j < H; j++) {
            const hj = h[j];
            const wo = lay.w2 + j * K;
            let sum = 0;
            for (let k = 0; k < K; k++) {
                grad[wo + k] += hj * dz[k];
                sum += params[wo + k] * dz[k];
            }
            const fp = act === ACT_TANH ? 1 - hj * hj : act === ACT_LOGISTIC ? hj * (1 - hj) : a[j] > 0 ? 1 : 0;
            dh[qo + j] = sum * fp;
        }
        for (let j = 0; j < H; j++)
            grad[lay.b1 + j] += dh[qo + j];
        if (q === GRAD_BLOCK_ROWS - 1 || p === end - 1)
            addInputGradient(D, H, x, p - q, q + 1, dh, acc, grad);
    }
    return loss;
}
/** Adds the block sums Σ_q x[first+q, i]·dh[q, j] (q = 0..n−1 in order, from +0) to the W1 gradient. */
function addInputGradient(D, H, x, first, n, dh, acc, grad) {
    for (let i = 0; i < D; i++) {
        acc.fill(0);
        for (let q = 0; q < n; q++) {
            const xi = x[(first + q) * D + i];
            const qo = q * H;
            for (let j = 0; j < H; j++)
                acc[j] += xi * dh[qo + j];
        }
        const go = i * H;
        for (let j = 0; j < H; j++)
            grad[go + j] += acc[j];
    }
}
/**
 * Forward pass over `rows` rows. Writes logits (rows × K) into `logits`; when `hidden`
 * is given, also the hidden activations (rows × H).
 */
function referenceForward(shape, params, x, rows, logits, hidden, s) {
    const D = shape.inputs;
    const H = shape.width;
    const K = shape.outputs;
    const act = activationCode(shape.activation);
    const lay = layoutOf(shape);
    for (let p = 0; p < rows; p++) {
        hiddenRow(act, D, H, params, lay.b1, x, p, s.a, s.h);
        outputRow(H, K, params, lay.w2, lay.b2, s.h, s.z);
        for (let k = 0; k < K; k++)
            logits[p * K + k] = s.z[k];
        if (hidden)
            for (let j = 0; j < H; j++)
                hidden[p * H + j] = s.h[j];
    }
}
/** Per-row loss from logits (no gradient). */
function rowLoss(head, K, z, zo, t) {
    if (head === HEAD_LINEAR) {
        const d = z[zo] - t;
        return 0.5 * d * d;
    }
    if (head === HEAD_LOGISTIC)
        return detSoftplus(z[zo]) - t * z[zo];
    let m = z[zo];
    for (let k = 1; k < K; k++)
        if (z[zo + k] > m)
            m = z[zo + k];
    let s = 0;
    for (let k = 0; k < K; k++)
        s += detExp(z[zo + k] - m);
    return detLog(s) - (z[zo + t] - m);
}

;// CONCATENATED MODULE: ./src/nn/kernel/kernel.ts

function referenceKernel() {
    let scratch = makeScratch(0, 0);
    let width = -1;
    let outputs = -1;
    const sized = (shape) => {
        if (shape.width !== width || shape.outputs !== outputs) {
            scratch = makeScratch(shape.width, shape.outputs);
            width = shape.width;
            outputs = shape.outputs;
        }
        return scratch;
    };
    return {
        name: 'reference-f64',
        lossAndGradient(shape, params, x, y, start, end, grad) {
            return referenceLossAndGradient(shape, params, x, y, start, end, grad, sized(shape));
        },
        forward(shape, params, x, rows, logits, hidden) {
            referenceForward(shape, params, x, rows, logits, hidden, sized(shape));
        },
    };
}

;// CONCATENATED MODULE: ./src/nn/kernel/kernel-bytes.ts
// Generated by scripts/build-kernel.mjs from kernel.as; do not edit.
// 26165 bytes, sha256 33bfaeba01b11b81648d7eec06a252e79a9dc546042a201c892daf50f92a730e
const KERNEL_SHA256 = '33bfaeba01b11b81648d7eec06a252e79a9dc546042a201c892daf50f92a730e';
const KERNEL_BASE64 = 'AGFzbQEAAAABTgpgAX8AYAJ/fwBgAXwBfGAHf39/f39/fwBgBH9/f38AYAJ/fAF8YAN/f38Bf2AMf39/f39/f39/f39/AXxgAAF/' +
    'YAp/f39/f39/f39/AAMPDgMBAAIEAAUCBgcICQABBQMBAAEGWxJ/AUEAC38BQQALfwFBAAt/AUEAC38BQQALfwFBAAt/AUEAC38B' +
    'QQALfwFBAAt/AUEAC38BQQALfwFBAAt/AUEAC38BQQALfwFBAAt/AUEAC38BQQALfwFBAAsHNgUJd29ya0J5dGVzAAgIbG9zc0dy' +
    'YWQACQdmb3J3YXJkAAsIaGVhcEJhc2UACgZtZW1vcnkCAAquygEOqQQAIAAkBCABJAUgAiQAIAMkASAEJAIgA0EBakF+cSQDIAZB' +
    'D2pBcHEiACQGIwMjAEEDdGwiASAAaiIAJAkgACABaiIAJAcjA0EDdCIBIABqIgAkCiAAIAFqIgAkCCMDIwJBA3RsIgEgAGoiACQL' +
    'IAAgAWoiACQNIwNBBXQiASAAaiIAJA4gACMDQQh0aiIAJA8jAkEFdCICIABqIgAkECAAIAJqIgAkESAAIAFqJAxBACEAA0AgACMA' +
    'SARAQQAhAQNAIAEjAUgEQCMGIAFBfHEiAiMAbEEEQQIjAyACQQRqThsgAGxqIAEgAmtqQQN0aiAFIAAjAWwgAWpBA3RqKwMAOQMA' +
    'IAFBAWohAQwBCwsjAyMBSgRAIwYjASIBQXxxIgIjAGxBBEECIwMgAkEEak4bIABsaiABIAJrakEDdGpEAAAAAAAAAAA5AwALIABB' +
    'AWohAAwBCwsgBSMBIwBBA3RsaiIBIwFBA3RqIQJBACEAA0AgACMBSARAIABBA3QiAyMHaiABIANqKwMAOQMAIABBAWohAAwBCwsj' +
    'AyMBSgRAIwcjAUEDdGpEAAAAAAAAAAA5AwALQQAhAANAIAAjAkgEQEEAIQEDQCABIwFIBEAjCCAAIwNsIAFqQQN0aiACIAEjAmwg' +
    'AGpBA3RqKwMAOQMAIAFBAWohAQwBCwsjAyMBSgRAIwgjASAAIwNsakEDdGpEAAAAAAAAAAA5AwALIABBAWohAAwBCwsLuQMCBn8E' +
    'eyMDQQN0IQMDQCACIwNIBEAgAkEDdCIFIw1q/QAEACEJIw0gA0EBdGogBWr9AAQAIQojDSADQQNsaiAFav0ABAAhCyMRIAJBBXRq' +
    'IgYgCSMNIANqIAVq/QAEACII/Q0AAQIDBAUGBxAREhMUFRYX/QsEACAGIAogC/0NAAECAwQFBgcQERITFBUWF/0LBBAgBiAJIAj9' +
    'DQgJCgsMDQ4PGBkaGxwdHh/9CwQgIAYgCiAL/Q0ICQoLDA0ODxgZGhscHR4f/QsEMCACQQJqIQIMAQsLIAAjASMAIwFsakEDdGoi' +
    'BiMCIwFBA3RsaiEFIwJBA3QhBwNAIAQjAkgEQCAFIARBA3QiAGr9CgMAIgghCSAAIAZqIQMjESECQQAhAANAIAAjAUgEQCAIIAL9' +
    'AAQAIAP9CgMAIgr98gH98AEhCCAJIAL9AAQQIAr98gH98AEhCSADIAdqIQMgAkEgaiECIABBAWohAAwBCwsgASAEQQN0aiIAIAj9' +
    'IQA5AwAgACAHaiAI/SEBOQMAIAAgB0EBdGogCf0hADkDACAAIAdBA2xqIAn9IQE5AwAgBEEBaiEEDAELCwuRAQIFfwF8Iw0hAiMP' +
    'IQMgACMBIwAjAWxqQQN0aiIEIwIjAUEDdGxqIQUDQCABIwJIBEAgBSABQQN0aisDACEGQQAhAANAIAAjAUgEQCAGIAIgAEEDdGor' +
    'AwAgBCAAIwJsIAFqQQN0aisDAKKgIQYgAEEBaiEADAELCyADIAFBA3RqIAY5AwAgAUEBaiEBDAELCwufAwICfgJ8IAAgAGIgAEQA' +
    'AAAAAAAAAGNyBEBEAAAAAAAA+H8PCyAARAAAAAAAAAAAYQRARAAAAAAAAPD/DwsgAEQAAAAAAADwf2EEQEQAAAAAAADwfw8LIABE' +
    'AAAAAAAAEABjBHxCSiEBIABEAAAAAAAAUEOiBSAAC70iAkI0iEL/D4NC/wd9IAF8IQEgAkL/////////B4NCgICAgICAgPg/hL8i' +
    'AETNO39mnqD2P2QEfCABQgF8IQEgAEQAAAAAAADgP6IFIAALRAAAAAAAAPC/oCIAIABEAAAAAAAAAECgoyIDIAOiIQAgAbkiBEQA' +
    'AOD+Qi7mP6IgAyADoCIDIAMgACAAIAAgACAAIAAgACAAIAAgACAARGQhC1nIQqY/okQYhmEYhmGoP6CiRCivobyG8qo/oKJEHh4e' +
    'Hh4erj+gokQRERERERGxP6CiRBQ7sRM7sbM/oKJERhdddNFFtz+gokQcx3Ecx3G8P6CiRJIkSZIkScI/oKJEmpmZmZmZyT+gokRV' +
    'VVVVVVXVP6CioqAgBER2PHk17znqPaKgoAuCiQECDXsGfyMDQQN0IRYDQCMDIBNBBGpOBEAgE0EDdCISIwdq/QAEACIGIQ8gBiIH' +
    'IRAjByASav0ABBAiBCEOIAQiBSENIwYgEiMAbGohFUEAIRQDQCAUIwBIBEAgBiAUQQN0IhEgAGr9CgMAIgggFf0ABAAiCv3yAf3w' +
    'ASEGIA4gCCAV/QAEECIJ/fIB/fABIQ4gDyABIBFq/QoDACIIIAr98gH98AEhDyAFIAggCf3yAf3wASEFIAcgAiARav0KAwAiCCAK' +
    '/fIB/fABIQcgDSAIIAn98gH98AEhDSAQIAMgEWr9CgMAIgggCv3yAf3wASEQIAQgCCAJ/fIB/fABIQQgFUEgaiEVIBRBAWohFAwB' +
    'CwsjDSASaiMEBHsjBEEBRgR7/QwAAAAAAADgPwAAAAAAAOA/IAb98gEiDP3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIGIAb98AEi' +
    'CP0M/oIrZUcV9z/+gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIL/QwAAAAAAAA4QwAAAAAAADhD/fEBIQYgCCAG/QwA' +
    'AOD+Qi7mPwAA4P5CLuY//fIB/fEBIAb9DHY8eTXvOeo9djx5Ne856j398gH98QEiCiAK/fIBIgkgCf3yASEI/QwAAAAAAADgPwAA' +
    'AAAAAOA//QwAAAAAAADgPwAAAAAAAOA/IAv9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIGIAr9DAAAAAAAAPA/AAAAAAAA8D/9' +
    'DAAAAAAAAOA/AAAAAAAA4D8gCv3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAK/fIB/fABIAn98gH9' +
    '8AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCv3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0MGqABGqAB+j4a' +
    'oAEaoAH6PiAK/fIB/fABIAn98gH98AEgCP3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36SPiAK/fIB/fAB' +
    '/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAr98gH98AEgCf3yAf3wAf0MCW2oE0YS5j0JbagTRhLmPSAI/fIB' +
    '/fABIAggCP3yAf3yAf3wAf3yAf3yASAG/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgYgBv0MAAAAAAAAAEAAAAAAAAAAQP3wAf3z' +
    'ASAM/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R/fIB/fABBSAG/QwAAAAAAAAAAAAAAAAAAAAAIAb9' +
    'DAAAAAAAAAAAAAAAAAAAAAD9Sv1SCwUgBv3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIIIAj98AEiCf0M/oIrZUcV9z/+gitlRxX3' +
    'P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIM/QwAAAAAAAA4QwAAAAAAADhD/fEBIQggCSAI/QwAAOD+Qi7mPwAA4P5CLuY//fIB' +
    '/fEBIAj9DHY8eTXvOeo9djx5Ne856j398gH98QEiCyAL/fIBIgogCv3yASEJIAz9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASII' +
    'IAv9DAAAAAAAAPA/AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gC/3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9V' +
    'VVVVVVWlPyAL/fIB/fABIAr98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gC/3yAf3wAf0MGqABGqAB' +
    'Kj8aoAEaoAEqP/0MGqABGqAB+j4aoAEaoAH6PiAL/fIB/fABIAr98gH98AEgCf3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94' +
    't09+kj5cn3i3T36SPiAL/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAv98gH98AEgCv3yAf3wAf0M' +
    'CW2oE0YS5j0JbagTRhLmPSAJ/fIB/fABIAkgCf3yAf3yAf3wAf3yAf3yASAI/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgggCP0M' +
    'AAAAAAAAAEAAAAAAAAAAQP3wAf3zASAG/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1RC/0LBAAjDSAS' +
    'aiMEBHsjBEEBRgR7/QwAAAAAAADgPwAAAAAAAOA/IA798gEiDP3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIGIAb98AEiCP0M/oIr' +
    'ZUcV9z/+gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIL/QwAAAAAAAA4QwAAAAAAADhD/fEBIQYgCCAG/QwAAOD+Qi7m' +
    'PwAA4P5CLuY//fIB/fEBIAb9DHY8eTXvOeo9djx5Ne856j398gH98QEiCiAK/fIBIgkgCf3yASEI/QwAAAAAAADgPwAAAAAAAOA/' +
    '/QwAAAAAAADgPwAAAAAAAOA/IAv9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIGIAr9DAAAAAAAAPA/AAAAAAAA8D/9DAAAAAAA' +
    'AOA/AAAAAAAA4D8gCv3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAK/fIB/fABIAn98gH98AH9DBER' +
    'EREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCv3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0MGqABGqAB+j4aoAEaoAH6' +
    'PiAK/fIB/fABIAn98gH98AEgCP3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36SPiAK/fIB/fAB/QzkRPVn' +
    'ReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAr98gH98AEgCf3yAf3wAf0MCW2oE0YS5j0JbagTRhLmPSAI/fIB/fABIAgg' +
    'CP3yAf3yAf3wAf3yAf3yASAG/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgYgBv0MAAAAAAAAAEAAAAAAAAAAQP3wAf3zASAM/QwA' +
    'AAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R/fIB/fABBSAO/QwAAAAAAAAAAAAAAAAAAAAAIA79DAAAAAAA' +
    'AAAAAAAAAAAAAAD9Sv1SCwUgDv3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIGIAb98AEiCP0M/oIrZUcV9z/+gitlRxX3P/3yAf0M' +
    'AAAAAAAAOEMAAAAAAAA4Q/3wASIL/QwAAAAAAAA4QwAAAAAAADhD/fEBIQYgCCAG/QwAAOD+Qi7mPwAA4P5CLuY//fIB/fEBIAb9' +
    'DHY8eTXvOeo9djx5Ne856j398gH98QEiCiAK/fIBIgkgCf3yASEIIAv9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIGIAr9DAAA' +
    'AAAAAPA/AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCv3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWl' +
    'PyAK/fIB/fABIAn98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCv3yAf3wAf0MGqABGqABKj8aoAEa' +
    'oAEqP/0MGqABGqAB+j4aoAEaoAH6PiAK/fIB/fABIAn98gH98AEgCP3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5c' +
    'n3i3T36SPiAK/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAr98gH98AEgCf3yAf3wAf0MCW2oE0YS' +
    '5j0JbagTRhLmPSAI/fIB/fABIAggCP3yAf3yAf3wAf3yAf3yASAG/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgYgBv0MAAAAAAAA' +
    'AEAAAAAAAAAAQP3wAf3zASAO/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1RC/0LBBAjDSAWaiASaiME' +
    'BHsjBEEBRgR7/QwAAAAAAADgPwAAAAAAAOA/IA/98gEiDP3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIGIAb98AEiCP0M/oIrZUcV' +
    '9z/+gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIL/QwAAAAAAAA4QwAAAAAAADhD/fEBIQYgCCAG/QwAAOD+Qi7mPwAA' +
    '4P5CLuY//fIB/fEBIAb9DHY8eTXvOeo9djx5Ne856j398gH98QEiCiAK/fIBIgkgCf3yASEI/QwAAAAAAADgPwAAAAAAAOA//QwA' +
    'AAAAAADgPwAAAAAAAOA/IAv9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIGIAr9DAAAAAAAAPA/AAAAAAAA8D/9DAAAAAAAAOA/' +
    'AAAAAAAA4D8gCv3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAK/fIB/fABIAn98gH98AH9DBERERER' +
    'EYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCv3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0MGqABGqAB+j4aoAEaoAH6PiAK' +
    '/fIB/fABIAn98gH98AEgCP3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36SPiAK/fIB/fAB/QzkRPVnReZa' +
    'PuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAr98gH98AEgCf3yAf3wAf0MCW2oE0YS5j0JbagTRhLmPSAI/fIB/fABIAggCP3y' +
    'Af3yAf3wAf3yAf3yASAG/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgYgBv0MAAAAAAAAAEAAAAAAAAAAQP3wAf3zASAM/QwAAAAA' +
    'AAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R/fIB/fABBSAP/QwAAAAAAAAAAAAAAAAAAAAAIA/9DAAAAAAAAAAA' +
    'AAAAAAAAAAD9Sv1SCwUgD/3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIGIAb98AEiCP0M/oIrZUcV9z/+gitlRxX3P/3yAf0MAAAA' +
    'AAAAOEMAAAAAAAA4Q/3wASIL/QwAAAAAAAA4QwAAAAAAADhD/fEBIQYgCCAG/QwAAOD+Qi7mPwAA4P5CLuY//fIB/fEBIAb9DHY8' +
    'eTXvOeo9djx5Ne856j398gH98QEiCiAK/fIBIgkgCf3yASEIIAv9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIGIAr9DAAAAAAA' +
    'APA/AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCv3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAK' +
    '/fIB/fABIAn98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCv3yAf3wAf0MGqABGqABKj8aoAEaoAEq' +
    'P/0MGqABGqAB+j4aoAEaoAH6PiAK/fIB/fABIAn98gH98AEgCP3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3' +
    'T36SPiAK/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAr98gH98AEgCf3yAf3wAf0MCW2oE0YS5j0J' +
    'bagTRhLmPSAI/fIB/fABIAggCP3yAf3yAf3wAf3yAf3yASAG/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgYgBv0MAAAAAAAAAEAA' +
    'AAAAAAAAQP3wAf3zASAP/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1RC/0LBAAjDSAWaiASaiMEBHsj' +
    'BEEBRgR7/QwAAAAAAADgPwAAAAAAAOA/IAX98gEiC/3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIFIAX98AEiBv0M/oIrZUcV9z/+' +
    'gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIK/QwAAAAAAAA4QwAAAAAAADhD/fEBIQUgBiAF/QwAAOD+Qi7mPwAA4P5C' +
    'LuY//fIB/fEBIAX9DHY8eTXvOeo9djx5Ne856j398gH98QEiCSAJ/fIBIgggCP3yASEG/QwAAAAAAADgPwAAAAAAAOA//QwAAAAA' +
    'AADgPwAAAAAAAOA/IAr9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIFIAn9DAAAAAAAAPA/AAAAAAAA8D/9DAAAAAAAAOA/AAAA' +
    'AAAA4D8gCf3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAJ/fIB/fABIAj98gH98AH9DBEREREREYE/' +
    'ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCf3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0MGqABGqAB+j4aoAEaoAH6PiAJ/fIB' +
    '/fABIAj98gH98AEgBv3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36SPiAJ/fIB/fAB/QzkRPVnReZaPuRE' +
    '9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAn98gH98AEgCP3yAf3wAf0MCW2oE0YS5j0JbagTRhLmPSAG/fIB/fABIAYgBv3yAf3y' +
    'Af3wAf3yAf3yASAF/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgUgBf0MAAAAAAAAAEAAAAAAAAAAQP3wAf3zASAL/QwAAAAAAAAA' +
    'AAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R/fIB/fABBSAF/QwAAAAAAAAAAAAAAAAAAAAAIAX9DAAAAAAAAAAAAAAA' +
    'AAAAAAD9Sv1SCwUgBf3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIGIAb98AEiCP0M/oIrZUcV9z/+gitlRxX3P/3yAf0MAAAAAAAA' +
    'OEMAAAAAAAA4Q/3wASIL/QwAAAAAAAA4QwAAAAAAADhD/fEBIQYgCCAG/QwAAOD+Qi7mPwAA4P5CLuY//fIB/fEBIAb9DHY8eTXv' +
    'Oeo9djx5Ne856j398gH98QEiCiAK/fIBIgkgCf3yASEIIAv9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIGIAr9DAAAAAAAAPA/' +
    'AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCv3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAK/fIB' +
    '/fABIAn98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCv3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0M' +
    'GqABGqAB+j4aoAEaoAH6PiAK/fIB/fABIAn98gH98AEgCP3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36S' +
    'PiAK/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAr98gH98AEgCf3yAf3wAf0MCW2oE0YS5j0JbagT' +
    'RhLmPSAI/fIB/fABIAggCP3yAf3yAf3wAf3yAf3yASAG/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgYgBv0MAAAAAAAAAEAAAAAA' +
    'AAAAQP3wAf3zASAF/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1RC/0LBBAjDSAWQQF0aiASaiMEBHsj' +
    'BEEBRgR7/QwAAAAAAADgPwAAAAAAAOA/IAf98gEiCv3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIFIAX98AEiBv0M/oIrZUcV9z/+' +
    'gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIJ/QwAAAAAAAA4QwAAAAAAADhD/fEBIQUgBiAF/QwAAOD+Qi7mPwAA4P5C' +
    'LuY//fIB/fEBIAX9DHY8eTXvOeo9djx5Ne856j398gH98QEiCCAI/fIBIgcgB/3yASEG/QwAAAAAAADgPwAAAAAAAOA//QwAAAAA' +
    'AADgPwAAAAAAAOA/IAn9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIFIAj9DAAAAAAAAPA/AAAAAAAA8D/9DAAAAAAAAOA/AAAA' +
    'AAAA4D8gCP3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAI/fIB/fABIAf98gH98AH9DBEREREREYE/' +
    'ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCP3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0MGqABGqAB+j4aoAEaoAH6PiAI/fIB' +
    '/fABIAf98gH98AEgBv3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36SPiAI/fIB/fAB/QzkRPVnReZaPuRE' +
    '9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAj98gH98AEgB/3yAf3wAf0MCW2oE0YS5j0JbagTRhLmPSAG/fIB/fABIAYgBv3yAf3y' +
    'Af3wAf3yAf3yASAF/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgUgBf0MAAAAAAAAAEAAAAAAAAAAQP3wAf3zASAK/QwAAAAAAAAA' +
    'AAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R/fIB/fABBSAH/QwAAAAAAAAAAAAAAAAAAAAAIAf9DAAAAAAAAAAAAAAA' +
    'AAAAAAD9Sv1SCwUgB/3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIFIAX98AEiBv0M/oIrZUcV9z/+gitlRxX3P/3yAf0MAAAAAAAA' +
    'OEMAAAAAAAA4Q/3wASIK/QwAAAAAAAA4QwAAAAAAADhD/fEBIQUgBiAF/QwAAOD+Qi7mPwAA4P5CLuY//fIB/fEBIAX9DHY8eTXv' +
    'Oeo9djx5Ne856j398gH98QEiCSAJ/fIBIgggCP3yASEGIAr9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIFIAn9DAAAAAAAAPA/' +
    'AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCf3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAJ/fIB' +
    '/fABIAj98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCf3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0M' +
    'GqABGqAB+j4aoAEaoAH6PiAJ/fIB/fABIAj98gH98AEgBv3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36S' +
    'PiAJ/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAn98gH98AEgCP3yAf3wAf0MCW2oE0YS5j0JbagT' +
    'RhLmPSAG/fIB/fABIAYgBv3yAf3yAf3wAf3yAf3yASAF/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgUgBf0MAAAAAAAAAEAAAAAA' +
    'AAAAQP3wAf3zASAH/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1RC/0LBAAjDSAWQQF0aiASaiMEBHsj' +
    'BEEBRgR7/QwAAAAAAADgPwAAAAAAAOA/IA398gEiCv3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIFIAX98AEiBv0M/oIrZUcV9z/+' +
    'gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIJ/QwAAAAAAAA4QwAAAAAAADhD/fEBIQUgBiAF/QwAAOD+Qi7mPwAA4P5C' +
    'LuY//fIB/fEBIAX9DHY8eTXvOeo9djx5Ne856j398gH98QEiCCAI/fIBIgcgB/3yASEG/QwAAAAAAADgPwAAAAAAAOA//QwAAAAA' +
    'AADgPwAAAAAAAOA/IAn9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIFIAj9DAAAAAAAAPA/AAAAAAAA8D/9DAAAAAAAAOA/AAAA' +
    'AAAA4D8gCP3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAI/fIB/fABIAf98gH98AH9DBEREREREYE/' +
    'ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCP3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0MGqABGqAB+j4aoAEaoAH6PiAI/fIB' +
    '/fABIAf98gH98AEgBv3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36SPiAI/fIB/fAB/QzkRPVnReZaPuRE' +
    '9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAj98gH98AEgB/3yAf3wAf0MCW2oE0YS5j0JbagTRhLmPSAG/fIB/fABIAYgBv3yAf3y' +
    'Af3wAf3yAf3yASAF/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgUgBf0MAAAAAAAAAEAAAAAAAAAAQP3wAf3zASAK/QwAAAAAAAAA' +
    'AAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R/fIB/fABBSAN/QwAAAAAAAAAAAAAAAAAAAAAIA39DAAAAAAAAAAAAAAA' +
    'AAAAAAD9Sv1SCwUgDf3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIFIAX98AEiBv0M/oIrZUcV9z/+gitlRxX3P/3yAf0MAAAAAAAA' +
    'OEMAAAAAAAA4Q/3wASIJ/QwAAAAAAAA4QwAAAAAAADhD/fEBIQUgBiAF/QwAAOD+Qi7mPwAA4P5CLuY//fIB/fEBIAX9DHY8eTXv' +
    'Oeo9djx5Ne856j398gH98QEiCCAI/fIBIgcgB/3yASEGIAn9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIFIAj9DAAAAAAAAPA/' +
    'AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCP3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAI/fIB' +
    '/fABIAf98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCP3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0M' +
    'GqABGqAB+j4aoAEaoAH6PiAI/fIB/fABIAf98gH98AEgBv3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36S' +
    'PiAI/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAj98gH98AEgB/3yAf3wAf0MCW2oE0YS5j0JbagT' +
    'RhLmPSAG/fIB/fABIAYgBv3yAf3yAf3wAf3yAf3yASAF/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgUgBf0MAAAAAAAAAEAAAAAA' +
    'AAAAQP3wAf3zASAN/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1RC/0LBBAjDSAWQQNsaiASaiMEBHsj' +
    'BEEBRgR7/QwAAAAAAADgPwAAAAAAAOA/IBD98gEiCv3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIFIAX98AEiBv0M/oIrZUcV9z/+' +
    'gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIJ/QwAAAAAAAA4QwAAAAAAADhD/fEBIQUgBiAF/QwAAOD+Qi7mPwAA4P5C' +
    'LuY//fIB/fEBIAX9DHY8eTXvOeo9djx5Ne856j398gH98QEiCCAI/fIBIgcgB/3yASEG/QwAAAAAAADgPwAAAAAAAOA//QwAAAAA' +
    'AADgPwAAAAAAAOA/IAn9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIFIAj9DAAAAAAAAPA/AAAAAAAA8D/9DAAAAAAAAOA/AAAA' +
    'AAAA4D8gCP3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAI/fIB/fABIAf98gH98AH9DBEREREREYE/' +
    'ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCP3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0MGqABGqAB+j4aoAEaoAH6PiAI/fIB' +
    '/fABIAf98gH98AEgBv3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36SPiAI/fIB/fAB/QzkRPVnReZaPuRE' +
    '9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAj98gH98AEgB/3yAf3wAf0MCW2oE0YS5j0JbagTRhLmPSAG/fIB/fABIAYgBv3yAf3y' +
    'Af3wAf3yAf3yASAF/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgUgBf0MAAAAAAAAAEAAAAAAAAAAQP3wAf3zASAK/QwAAAAAAAAA' +
    'AAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R/fIB/fABBSAQ/QwAAAAAAAAAAAAAAAAAAAAAIBD9DAAAAAAAAAAAAAAA' +
    'AAAAAAD9Sv1SCwUgEP3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIFIAX98AEiBv0M/oIrZUcV9z/+gitlRxX3P/3yAf0MAAAAAAAA' +
    'OEMAAAAAAAA4Q/3wASIJ/QwAAAAAAAA4QwAAAAAAADhD/fEBIQUgBiAF/QwAAOD+Qi7mPwAA4P5CLuY//fIB/fEBIAX9DHY8eTXv' +
    'Oeo9djx5Ne856j398gH98QEiCCAI/fIBIgcgB/3yASEGIAn9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIFIAj9DAAAAAAAAPA/' +
    'AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCP3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAI/fIB' +
    '/fABIAf98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCP3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0M' +
    'GqABGqAB+j4aoAEaoAH6PiAI/fIB/fABIAf98gH98AEgBv3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36S' +
    'PiAI/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAj98gH98AEgB/3yAf3wAf0MCW2oE0YS5j0JbagT' +
    'RhLmPSAG/fIB/fABIAYgBv3yAf3yAf3wAf3yAf3yASAF/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgUgBf0MAAAAAAAAAEAAAAAA' +
    'AAAAQP3wAf3zASAQ/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1RC/0LBAAjDSAWQQNsaiASaiMEBHsj' +
    'BEEBRgR7/QwAAAAAAADgPwAAAAAAAOA/IAT98gEiCf3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIEIAT98AEiBf0M/oIrZUcV9z/+' +
    'gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASII/QwAAAAAAAA4QwAAAAAAADhD/fEBIQQgBSAE/QwAAOD+Qi7mPwAA4P5C' +
    'LuY//fIB/fEBIAT9DHY8eTXvOeo9djx5Ne856j398gH98QEiByAH/fIBIgYgBv3yASEF/QwAAAAAAADgPwAAAAAAAOA//QwAAAAA' +
    'AADgPwAAAAAAAOA/IAj9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIEIAf9DAAAAAAAAPA/AAAAAAAA8D/9DAAAAAAAAOA/AAAA' +
    'AAAA4D8gB/3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAH/fIB/fABIAb98gH98AH9DBEREREREYE/' +
    'ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gB/3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0MGqABGqAB+j4aoAEaoAH6PiAH/fIB' +
    '/fABIAb98gH98AEgBf3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36SPiAH/fIB/fAB/QzkRPVnReZaPuRE' +
    '9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAf98gH98AEgBv3yAf3wAf0MCW2oE0YS5j0JbagTRhLmPSAF/fIB/fABIAUgBf3yAf3y' +
    'Af3wAf3yAf3yASAE/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgQgBP0MAAAAAAAAAEAAAAAAAAAAQP3wAf3zASAJ/QwAAAAAAAAA' +
    'AAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R/fIB/fABBSAE/QwAAAAAAAAAAAAAAAAAAAAAIAT9DAAAAAAAAAAAAAAA' +
    'AAAAAAD9Sv1SCwUgBP3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIFIAX98AEiBv0M/oIrZUcV9z/+gitlRxX3P/3yAf0MAAAAAAAA' +
    'OEMAAAAAAAA4Q/3wASIJ/QwAAAAAAAA4QwAAAAAAADhD/fEBIQUgBiAF/QwAAOD+Qi7mPwAA4P5CLuY//fIB/fEBIAX9DHY8eTXv' +
    'Oeo9djx5Ne856j398gH98QEiCCAI/fIBIgcgB/3yASEGIAn9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIFIAj9DAAAAAAAAPA/' +
    'AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCP3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAI/fIB' +
    '/fABIAf98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCP3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0M' +
    'GqABGqAB+j4aoAEaoAH6PiAI/fIB/fABIAf98gH98AEgBv3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36S' +
    'PiAI/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAj98gH98AEgB/3yAf3wAf0MCW2oE0YS5j0JbagT' +
    'RhLmPSAG/fIB/fABIAYgBv3yAf3yAf3wAf3yAf3yASAF/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgUgBf0MAAAAAAAAAEAAAAAA' +
    'AAAAQP3wAf3zASAE/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1RC/0LBBAgE0EEaiETDAELCwNAIBMj' +
    'A0gEQCATQQN0IhIjB2r9AAQAIgQhECAEIgUhDSMGIBIjAGxqIRRBACEVA0AgFSMASARAIBAgFUEDdCIRIABq/QoDACAU/QAEACIG' +
    '/fIB/fABIRAgBSABIBFq/QoDACAG/fIB/fABIQUgDSACIBFq/QoDACAG/fIB/fABIQ0gBCADIBFq/QoDACAG/fIB/fABIQQgFEEQ' +
    'aiEUIBVBAWohFQwBCwsjDSASaiMEBHsjBEEBRgR7/QwAAAAAAADgPwAAAAAAAOA/IBD98gEiC/3sAf0MAAAAAAAANkAAAAAAAAA2' +
    'QP32ASIGIAb98AEiB/0M/oIrZUcV9z/+gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIK/QwAAAAAAAA4QwAAAAAAADhD' +
    '/fEBIQYgByAG/QwAAOD+Qi7mPwAA4P5CLuY//fIB/fEBIAb9DHY8eTXvOeo9djx5Ne856j398gH98QEiCSAJ/fIBIgggCP3yASEH' +
    '/QwAAAAAAADgPwAAAAAAAOA//QwAAAAAAADgPwAAAAAAAOA/IAr9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIGIAn9DAAAAAAA' +
    'APA/AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCf3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAJ' +
    '/fIB/fABIAj98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCf3yAf3wAf0MGqABGqABKj8aoAEaoAEq' +
    'P/0MGqABGqAB+j4aoAEaoAH6PiAJ/fIB/fABIAj98gH98AEgB/3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3' +
    'T36SPiAJ/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAn98gH98AEgCP3yAf3wAf0MCW2oE0YS5j0J' +
    'bagTRhLmPSAH/fIB/fABIAcgB/3yAf3yAf3wAf3yAf3yASAG/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgYgBv0MAAAAAAAAAEAA' +
    'AAAAAAAAQP3wAf3zASAL/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R/fIB/fABBSAQ/QwAAAAAAAAA' +
    'AAAAAAAAAAAAIBD9DAAAAAAAAAAAAAAAAAAAAAD9Sv1SCwUgEP3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIGIAb98AEiB/0M/oIr' +
    'ZUcV9z/+gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIK/QwAAAAAAAA4QwAAAAAAADhD/fEBIQYgByAG/QwAAOD+Qi7m' +
    'PwAA4P5CLuY//fIB/fEBIAb9DHY8eTXvOeo9djx5Ne856j398gH98QEiCSAJ/fIBIgggCP3yASEHIAr9DP8DAAAAAAAA/wMAAAAA' +
    'AAD9zgFBNP3LASIGIAn9DAAAAAAAAPA/AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCf3yAf3wAf0MVVVVVVVVxT9VVVVVVVXF' +
    'P/0MVVVVVVVVpT9VVVVVVVWlPyAJ/fIB/fABIAj98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCf3y' +
    'Af3wAf0MGqABGqABKj8aoAEaoAEqP/0MGqABGqAB+j4aoAEaoAH6PiAJ/fIB/fABIAj98gH98AEgB/3yAf3wAf0MNMdWpeMdxz40' +
    'x1al4x3HPv0MXJ94t09+kj5cn3i3T36SPiAJ/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAn98gH9' +
    '8AEgCP3yAf3wAf0MCW2oE0YS5j0JbagTRhLmPSAH/fIB/fABIAcgB/3yAf3yAf3wAf3yAf3yASAG/QwAAAAAAADwPwAAAAAAAPA/' +
    '/fEB/fABIgYgBv0MAAAAAAAAAEAAAAAAAAAAQP3wAf3zASAQ/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9' +
    'Tv1RC/0LBAAjDSAWaiASaiMEBHsjBEEBRgR7/QwAAAAAAADgPwAAAAAAAOA/IAX98gEiCv3sAf0MAAAAAAAANkAAAAAAAAA2QP32' +
    'ASIFIAX98AEiBv0M/oIrZUcV9z/+gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIJ/QwAAAAAAAA4QwAAAAAAADhD/fEB' +
    'IQUgBiAF/QwAAOD+Qi7mPwAA4P5CLuY//fIB/fEBIAX9DHY8eTXvOeo9djx5Ne856j398gH98QEiCCAI/fIBIgcgB/3yASEG/QwA' +
    'AAAAAADgPwAAAAAAAOA//QwAAAAAAADgPwAAAAAAAOA/IAn9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIFIAj9DAAAAAAAAPA/' +
    'AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCP3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAI/fIB' +
    '/fABIAf98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCP3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0M' +
    'GqABGqAB+j4aoAEaoAH6PiAI/fIB/fABIAf98gH98AEgBv3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36S' +
    'PiAI/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAj98gH98AEgB/3yAf3wAf0MCW2oE0YS5j0JbagT' +
    'RhLmPSAG/fIB/fABIAYgBv3yAf3yAf3wAf3yAf3yASAF/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgUgBf0MAAAAAAAAAEAAAAAA' +
    'AAAAQP3wAf3zASAK/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R/fIB/fABBSAF/QwAAAAAAAAAAAAA' +
    'AAAAAAAAIAX9DAAAAAAAAAAAAAAAAAAAAAD9Sv1SCwUgBf3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIGIAb98AEiB/0M/oIrZUcV' +
    '9z/+gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIK/QwAAAAAAAA4QwAAAAAAADhD/fEBIQYgByAG/QwAAOD+Qi7mPwAA' +
    '4P5CLuY//fIB/fEBIAb9DHY8eTXvOeo9djx5Ne856j398gH98QEiCSAJ/fIBIgggCP3yASEHIAr9DP8DAAAAAAAA/wMAAAAAAAD9' +
    'zgFBNP3LASIGIAn9DAAAAAAAAPA/AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCf3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0M' +
    'VVVVVVVVpT9VVVVVVVWlPyAJ/fIB/fABIAj98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCf3yAf3w' +
    'Af0MGqABGqABKj8aoAEaoAEqP/0MGqABGqAB+j4aoAEaoAH6PiAJ/fIB/fABIAj98gH98AEgB/3yAf3wAf0MNMdWpeMdxz40x1al' +
    '4x3HPv0MXJ94t09+kj5cn3i3T36SPiAJ/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAn98gH98AEg' +
    'CP3yAf3wAf0MCW2oE0YS5j0JbagTRhLmPSAH/fIB/fABIAcgB/3yAf3yAf3wAf3yAf3yASAG/QwAAAAAAADwPwAAAAAAAPA//fEB' +
    '/fABIgYgBv0MAAAAAAAAAEAAAAAAAAAAQP3wAf3zASAF/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R' +
    'C/0LBAAjDSAWQQF0aiASaiMEBHsjBEEBRgR7/QwAAAAAAADgPwAAAAAAAOA/IA398gEiCv3sAf0MAAAAAAAANkAAAAAAAAA2QP32' +
    'ASIFIAX98AEiBv0M/oIrZUcV9z/+gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIJ/QwAAAAAAAA4QwAAAAAAADhD/fEB' +
    'IQUgBiAF/QwAAOD+Qi7mPwAA4P5CLuY//fIB/fEBIAX9DHY8eTXvOeo9djx5Ne856j398gH98QEiCCAI/fIBIgcgB/3yASEG/QwA' +
    'AAAAAADgPwAAAAAAAOA//QwAAAAAAADgPwAAAAAAAOA/IAn9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIFIAj9DAAAAAAAAPA/' +
    'AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCP3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAI/fIB' +
    '/fABIAf98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCP3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0M' +
    'GqABGqAB+j4aoAEaoAH6PiAI/fIB/fABIAf98gH98AEgBv3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36S' +
    'PiAI/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAj98gH98AEgB/3yAf3wAf0MCW2oE0YS5j0JbagT' +
    'RhLmPSAG/fIB/fABIAYgBv3yAf3yAf3wAf3yAf3yASAF/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgUgBf0MAAAAAAAAAEAAAAAA' +
    'AAAAQP3wAf3zASAK/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R/fIB/fABBSAN/QwAAAAAAAAAAAAA' +
    'AAAAAAAAIA39DAAAAAAAAAAAAAAAAAAAAAD9Sv1SCwUgDf3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIFIAX98AEiBv0M/oIrZUcV' +
    '9z/+gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIJ/QwAAAAAAAA4QwAAAAAAADhD/fEBIQUgBiAF/QwAAOD+Qi7mPwAA' +
    '4P5CLuY//fIB/fEBIAX9DHY8eTXvOeo9djx5Ne856j398gH98QEiCCAI/fIBIgcgB/3yASEGIAn9DP8DAAAAAAAA/wMAAAAAAAD9' +
    'zgFBNP3LASIFIAj9DAAAAAAAAPA/AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCP3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0M' +
    'VVVVVVVVpT9VVVVVVVWlPyAI/fIB/fABIAf98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCP3yAf3w' +
    'Af0MGqABGqABKj8aoAEaoAEqP/0MGqABGqAB+j4aoAEaoAH6PiAI/fIB/fABIAf98gH98AEgBv3yAf3wAf0MNMdWpeMdxz40x1al' +
    '4x3HPv0MXJ94t09+kj5cn3i3T36SPiAI/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAj98gH98AEg' +
    'B/3yAf3wAf0MCW2oE0YS5j0JbagTRhLmPSAG/fIB/fABIAYgBv3yAf3yAf3wAf3yAf3yASAF/QwAAAAAAADwPwAAAAAAAPA//fEB' +
    '/fABIgUgBf0MAAAAAAAAAEAAAAAAAAAAQP3wAf3zASAN/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R' +
    'C/0LBAAjDSAWQQNsaiASaiMEBHsjBEEBRgR7/QwAAAAAAADgPwAAAAAAAOA/IAT98gEiCf3sAf0MAAAAAAAANkAAAAAAAAA2QP32' +
    'ASIEIAT98AEiBf0M/oIrZUcV9z/+gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASII/QwAAAAAAAA4QwAAAAAAADhD/fEB' +
    'IQQgBSAE/QwAAOD+Qi7mPwAA4P5CLuY//fIB/fEBIAT9DHY8eTXvOeo9djx5Ne856j398gH98QEiByAH/fIBIgYgBv3yASEF/QwA' +
    'AAAAAADgPwAAAAAAAOA//QwAAAAAAADgPwAAAAAAAOA/IAj9DP8DAAAAAAAA/wMAAAAAAAD9zgFBNP3LASIEIAf9DAAAAAAAAPA/' +
    'AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gB/3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0MVVVVVVVVpT9VVVVVVVWlPyAH/fIB' +
    '/fABIAb98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gB/3yAf3wAf0MGqABGqABKj8aoAEaoAEqP/0M' +
    'GqABGqAB+j4aoAEaoAH6PiAH/fIB/fABIAb98gH98AEgBf3yAf3wAf0MNMdWpeMdxz40x1al4x3HPv0MXJ94t09+kj5cn3i3T36S' +
    'PiAH/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAf98gH98AEgBv3yAf3wAf0MCW2oE0YS5j0JbagT' +
    'RhLmPSAF/fIB/fABIAUgBf3yAf3yAf3wAf3yAf3yASAE/QwAAAAAAADwPwAAAAAAAPA//fEB/fABIgQgBP0MAAAAAAAAAEAAAAAA' +
    'AAAAQP3wAf3zASAJ/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R/fIB/fABBSAE/QwAAAAAAAAAAAAA' +
    'AAAAAAAAIAT9DAAAAAAAAAAAAAAAAAAAAAD9Sv1SCwUgBP3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIFIAX98AEiBv0M/oIrZUcV' +
    '9z/+gitlRxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIJ/QwAAAAAAAA4QwAAAAAAADhD/fEBIQUgBiAF/QwAAOD+Qi7mPwAA' +
    '4P5CLuY//fIB/fEBIAX9DHY8eTXvOeo9djx5Ne856j398gH98QEiCCAI/fIBIgcgB/3yASEGIAn9DP8DAAAAAAAA/wMAAAAAAAD9' +
    'zgFBNP3LASIFIAj9DAAAAAAAAPA/AAAAAAAA8D/9DAAAAAAAAOA/AAAAAAAA4D8gCP3yAf3wAf0MVVVVVVVVxT9VVVVVVVXFP/0M' +
    'VVVVVVVVpT9VVVVVVVWlPyAI/fIB/fABIAf98gH98AH9DBEREREREYE/ERERERERgT/9DBdswRZswVY/F2zBFmzBVj8gCP3yAf3w' +
    'Af0MGqABGqABKj8aoAEaoAEqP/0MGqABGqAB+j4aoAEaoAH6PiAI/fIB/fABIAf98gH98AEgBv3yAf3wAf0MNMdWpeMdxz40x1al' +
    '4x3HPv0MXJ94t09+kj5cn3i3T36SPiAI/fIB/fAB/QzkRPVnReZaPuRE9WdF5lo+/QyY2Pjv2O4hPpjY+O/Y7iE+IAj98gH98AEg' +
    'B/3yAf3wAf0MCW2oE0YS5j0JbagTRhLmPSAG/fIB/fABIAYgBv3yAf3yAf3wAf3yAf3yASAF/QwAAAAAAADwPwAAAAAAAPA//fEB' +
    '/fABIgUgBf0MAAAAAAAAAEAAAAAAAAAAQP3wAf3zASAE/QwAAAAAAAAAAAAAAAAAAAAA/Un9DAAAAAAAAACAAAAAAAAAAID9Tv1R' +
    'C/0LBAAgE0ECaiETDAELCwubDAIFewZ/Iw0hCQNAIAcjA0gEQCAHQQN0IgojB2r9AAQAIQEjBiAHIAdBfHEiBmsgBiMAbGpBA3Rq' +
    'IQhBIEEQIwMgBkEEak4bIQtBACEGA0AgBiMASARAIAEgACAGQQN0av0KAwAgCP0ABAD98gH98AEhASAIIAtqIQggBkEBaiEGDAEL' +
    'CyAJIApqIwQEeyMEQQFGBHv9DAAAAAAAAOA/AAAAAAAA4D8gAf3yASIB/ewB/QwAAAAAAAA2QAAAAAAAADZA/fYBIgIgAv3wASIC' +
    '/Qz+gitlRxX3P/6CK2VHFfc//fIB/QwAAAAAAAA4QwAAAAAAADhD/fABIgP9DAAAAAAAADhDAAAAAAAAOEP98QEhBCACIAT9DAAA' +
    '4P5CLuY/AADg/kIu5j/98gH98QEgBP0Mdjx5Ne856j12PHk17znqPf3yAf3xASICIAL98gEiBCAE/fIBIQX9DAAAAAAAAOA/AAAA' +
    'AAAA4D/9DAAAAAAAAOA/AAAAAAAA4D8gA/0M/wMAAAAAAAD/AwAAAAAAAP3OAUE0/csBIgMgAv0MAAAAAAAA8D8AAAAAAADwP/0M' +
    'AAAAAAAA4D8AAAAAAADgPyAC/fIB/fAB/QxVVVVVVVXFP1VVVVVVVcU//QxVVVVVVVWlP1VVVVVVVaU/IAL98gH98AEgBP3yAf3w' +
    'Af0MERERERERgT8RERERERGBP/0MF2zBFmzBVj8XbMEWbMFWPyAC/fIB/fAB/QwaoAEaoAEqPxqgARqgASo//QwaoAEaoAH6Phqg' +
    'ARqgAfo+IAL98gH98AEgBP3yAf3wASAF/fIB/fAB/Qw0x1al4x3HPjTHVqXjHcc+/Qxcn3i3T36SPlyfeLdPfpI+IAL98gH98AH9' +
    'DORE9WdF5lo+5ET1Z0XmWj79DJjY+O/Y7iE+mNj479juIT4gAv3yAf3wASAE/fIB/fAB/QwJbagTRhLmPQltqBNGEuY9IAX98gH9' +
    '8AEgBSAF/fIB/fIB/fAB/fIB/fIBIAP9DAAAAAAAAPA/AAAAAAAA8D/98QH98AEiAiAC/QwAAAAAAAAAQAAAAAAAAABA/fAB/fMB' +
    'IAH9DAAAAAAAAAAAAAAAAAAAAAD9Sf0MAAAAAAAAAIAAAAAAAAAAgP1O/VH98gH98AEFIAH9DAAAAAAAAAAAAAAAAAAAAAAgAf0M' +
    'AAAAAAAAAAAAAAAAAAAAAP1K/VILBSAB/ewB/QwAAAAAAAA2QAAAAAAAADZA/fYBIgIgAv3wASIC/Qz+gitlRxX3P/6CK2VHFfc/' +
    '/fIB/QwAAAAAAAA4QwAAAAAAADhD/fABIgP9DAAAAAAAADhDAAAAAAAAOEP98QEhBCACIAT9DAAA4P5CLuY/AADg/kIu5j/98gH9' +
    '8QEgBP0Mdjx5Ne856j12PHk17znqPf3yAf3xASICIAL98gEiBCAE/fIBIQUgA/0M/wMAAAAAAAD/AwAAAAAAAP3OAUE0/csBIgMg' +
    'Av0MAAAAAAAA8D8AAAAAAADwP/0MAAAAAAAA4D8AAAAAAADgPyAC/fIB/fAB/QxVVVVVVVXFP1VVVVVVVcU//QxVVVVVVVWlP1VV' +
    'VVVVVaU/IAL98gH98AEgBP3yAf3wAf0MERERERERgT8RERERERGBP/0MF2zBFmzBVj8XbMEWbMFWPyAC/fIB/fAB/QwaoAEaoAEq' +
    'PxqgARqgASo//QwaoAEaoAH6PhqgARqgAfo+IAL98gH98AEgBP3yAf3wASAF/fIB/fAB/Qw0x1al4x3HPjTHVqXjHcc+/Qxcn3i3' +
    'T36SPlyfeLdPfpI+IAL98gH98AH9DORE9WdF5lo+5ET1Z0XmWj79DJjY+O/Y7iE+mNj479juIT4gAv3yAf3wASAE/fIB/fAB/QwJ' +
    'bagTRhLmPQltqBNGEuY9IAX98gH98AEgBSAF/fIB/fIB/fAB/fIB/fIBIAP9DAAAAAAAAPA/AAAAAAAA8D/98QH98AEiAiAC/QwA' +
    'AAAAAAAAQAAAAAAAAABA/fAB/fMBIAH9DAAAAAAAAAAAAAAAAAAAAAD9Sf0MAAAAAAAAAIAAAAAAAAAAgP1O/VEL/QsEACAHQQJq' +
    'IQcMAQsLC78IAwN8A38GeyMCIABBA3RsIgAjD2ohByMQIABqIQYjBUUEQCAGIAcrAwAgAaEiATkDACABRAAAAAAAAOA/oiABog8L' +
    'IwVBAUYEQCAHKwMAIgNEAAAAAAAA4D+i/RQiDf3sAf0MAAAAAAAANkAAAAAAAAA2QP32ASIIIAj98AEiCf0M/oIrZUcV9z/+gitl' +
    'RxX3P/3yAf0MAAAAAAAAOEMAAAAAAAA4Q/3wASIL/QwAAAAAAAA4QwAAAAAAADhD/fEBIQggCSAI/QwAAOD+Qi7mPwAA4P5CLuY/' +
    '/fIB/fEBIAj9DHY8eTXvOeo9djx5Ne856j398gH98QEiCiAK/fIBIgwgDP3yASEJIAYgC/0M/wMAAAAAAAD/AwAAAAAAAP3OAUE0' +
    '/csBIgggCv0MAAAAAAAA8D8AAAAAAADwP/0MAAAAAAAA4D8AAAAAAADgPyAK/fIB/fAB/QxVVVVVVVXFP1VVVVVVVcU//QxVVVVV' +
    'VVWlP1VVVVVVVaU/IAr98gH98AEgDP3yAf3wAf0MERERERERgT8RERERERGBP/0MF2zBFmzBVj8XbMEWbMFWPyAK/fIB/fAB/Qwa' +
    'oAEaoAEqPxqgARqgASo//QwaoAEaoAH6PhqgARqgAfo+IAr98gH98AEgDP3yAf3wASAJ/fIB/fAB/Qw0x1al4x3HPjTHVqXjHcc+' +
    '/Qxcn3i3T36SPlyfeLdPfpI+IAr98gH98AH9DORE9WdF5lo+5ET1Z0XmWj79DJjY+O/Y7iE+mNj479juIT4gCv3yAf3wASAM/fIB' +
    '/fAB/QwJbagTRhLmPQltqBNGEuY9IAn98gH98AEgCSAJ/fIB/fIB/fAB/fIB/fIBIAj9DAAAAAAAAPA/AAAAAAAA8D/98QH98AEi' +
    'CCAI/QwAAAAAAAAAQAAAAAAAAABA/fAB/fMBIA39DAAAAAAAAAAAAAAAAAAAAAD9Sf0MAAAAAAAAAIAAAAAAAAAAgP1O/VH9IQBE' +
    'AAAAAAAA4D+iRAAAAAAAAOA/oCABoTkDACADRAAAAAAAAAAAIANEAAAAAAAAAABkIgAbIAOaIAMgABsQByICRAAAAAAAAPA/oCIE' +
    'RAAAAAAAAPA/YgR8IAQQAyACIAREAAAAAAAA8L+goSAEo6AFIAILoCABIAOioQ8LIAcrAwAhA0EBIQADQCAAIwJIBEAgByAAQQN0' +
    'aisDACICIANkBEAgAiEDCyAAQQFqIQAMAQsLQQAhAANAIAAjAkgEQCAAQQN0IgUgB2orAwAgA6EQByECIAUgBmogAjkDACAEIAKg' +
    'IQQgAEEBaiEADAELC0QAAAAAAADwPyAEoyECQQAhAANAIAAjAkgEQCAGIABBA3RqIgUgBSsDACACojkDACAAQQFqIQAMAQsLIAYg' +
    'AfwCQQN0IgVqIgAgACsDAEQAAAAAAADwv6A5AwAgBBADIAUgB2orAwAgA6GhC/kCAgF+AXwgACAAYgRAIAAPCyAARO85+v5CLoZA' +
    'ZARARAAAAAAAAPB/DwsgAERSMC3VEEmHwGMEQEQAAAAAAAAAAA8LIAAgAET+gitlRxX3P6JEAAAAAAAA4D+gnCIARAAA4P5CLuY/' +
    'oqEgAER2PHk17znqPaKhIgIgAiACIAIgAiACIAIgAiACIAIgAiACIAJECW2oE0YS5j2iRJjY+O/Y7iE+oKJE5ET1Z0XmWj6gokRc' +
    'n3i3T36SPqCiRDTHVqXjHcc+oKJEGqABGqAB+j6gokQaoAEaoAEqP6CiRBdswRZswVY/oKJEERERERERgT+gokRVVVVVVVWlP6Ci' +
    'RFVVVVVVVcU/oKJEAAAAAAAA4D+gokQAAAAAAADwP6CiRAAAAAAAAPA/oCECIAD8BiIBQv8HVQRAIAJEAAAAAAAA4H+iIAFCNIa/' +
    'og8LIAFCgnhTBEAgAiABQucPfEI0hr+iRAAAAAAAAHABog8LIAIgAUL/B3xCNIa/ogs2ACABQQFqQX5xIgEgAEEBdGwgAUEBdGog' +
    'AkEBdCABbGogAmogAUEobGogAkEDdGpBA3RBQGsL7gcDA3sHfwF8IAAgASACIAMgBCAFIAsQACMJQQAjAEEDdCIDIwNs/AsAIwpB' +
    'ACMDQQN0IhP8CwAjC0EAIwJBA3QiACMDbPwLACMMQQAgAPwLAANAIAggCUgEQEEgIAkgCGsiACAAQSBOGyEBIAYgAyAIbGohEkEA' +
    'IQADQCAAQQRqIAFMBEAgEiAAIANsaiICIAIgA2ogAiADQQF0aiACIANBA2xqEAQgBSMPEAFBACECA0AgAkEESARAIBYgAiAHIAAg' +
    'CGogAmpBA3RqKwMAEAagIRYgAkEBaiECDAELCyMOIAAgE2xqEAwgAEEEaiEADAELCwNAIAAgAUgEQCASIAAgA2xqEAUgBRACIBZB' +
    'ACAHIAAgCGpBA3RqKwMAEAagIRYjDiAAIBNsaiEQIwNBA3QhDyMNIQQjECERQQAhCwNAIAsjA0gEQP0MAAAAAAAAAAAAAAAAAAAA' +
    'ACEMIAQgC0EDdCIUav0ABAAhDUEAIQIDQCACIwJIBEAgDCACIA9sIBRqIhUjCGr9AAQAIBEgAkEDdGr9CgMAIg798gH98AEhDCML' +
    'IBVqIhUgFf0ABAAgDSAO/fIB/fAB/QsEACACQQFqIQIMAQsLIBAgFGogDAJ7/QwAAAAAAADwPwAAAAAAAPA/IA0gDf3yAf3xASME' +
    'RQ0AGiAN/QwAAAAAAADwPwAAAAAAAPA/IA398QH98gEjBEEBRg0AGv0MAAAAAAAA8D8AAAAAAADwP/0MAAAAAAAAAAAAAAAAAAAA' +
    'ACAN/QwAAAAAAAAAAAAAAAAAAAAA/Ur9Ugv98gEiDP0LBAAjCiAUaiICIAL9AAQAIAz98AH9CwQAIAtBAmohCwwBCwtBACECA0Ag' +
    'AiMCSARAIAJBA3QiBCMMaiILIAsrAwAgBCARaisDAKA5AwAgAkEBaiECDAELCyAAQQFqIQAMAQsLIBIgARANIAEgCGohCAwBCwtB' +
    'ACEBA0AgASMASARAQQAhAANAIAAjAUgEQCAKIAEjAWwgAGpBA3RqIwkgAEF8cSICIwBsQQRBAiMDIAJBBGpOGyABbGogACACa2pB' +
    'A3RqKwMAOQMAIABBAWohAAwBCwsgAUEBaiEBDAELCyAKIwEjAEEDdGxqIgEjAUEDdCIAaiICIwIgAGxqIQNBACEAA0AgACMBSARA' +
    'IABBA3QiBCABaiMKIARqKwMAOQMAIABBAWohAAwBCwtBACEAA0AgACMCSARAQQAhAQNAIAEjAUgEQCACIAEjAmwgAGpBA3RqIwsg' +
    'ACMDbCABakEDdGorAwA5AwAgAUEBaiEBDAELCyADIABBA3QiAWojDCABaisDADkDACAAQQFqIQAMAQsLIBYLBQBBgAgLlQIBAX8g' +
    'AEEAIAEgAiADIAQgCRAAIwBBA3QhCUEAIQADQCAAIAZIBEAgBSAAIAlsaiEBQQRBASAGIABrQQROGyIDQQRGBEAgASABIAlqIAEg' +
    'CUEBdGogASAJQQNsahAEIAQgByMCIABBA3RsahABBSABEAUgBBACQQAhAQNAIAEjAkgEQCAHIAAjAmwgAWpBA3RqIw8gAUEDdGor' +
    'AwA5AwAgAUEBaiEBDAELCwtBACEBA0AgASADSARAIAgEQCAAIAFqIQpBACECA0AgAiMBSARAIAggCiMBbCACakEDdGojDSABIwNs' +
    'IAJqQQN0aisDADkDACACQQFqIQIMAQsLCyABQQFqIQEMAQsLIAAgA2ohAAwBCwsL4QgCDHsHfyMDQQN0IRAjAkEDdCENA0AgDyMD' +
    'SARA/QwAAAAAAAAAAAAAAAAAAAAAIQH9DAAAAAAAAAAAAAAAAAAAAAAhAv0MAAAAAAAAAAAAAAAAAAAAACED/QwAAAAAAAAAAAAA' +
    'AAAAAAAAIQQgD0EDdCIRIw1q/QAEACEIIw0gEGogEWr9AAQAIQkjDSAQQQF0aiARav0ABAAhCiMNIBBBA2xqIBFq/QAEACELQQAh' +
    'DgNAIA4jAkgEQCABIA4gEGwgEWoiEyMIav0ABAAiDCMQIA5BA3RqIhL9CgMAIgX98gH98AEhASACIAwgDSASav0KAwAiBv3yAf3w' +
    'ASECIAMgDCASIA1BAXRq/QoDACIH/fIB/fABIQMgBCAMIBIgDUEDbGr9CgMAIgz98gH98AEhBCMLIBNqIhIgEv0ABAAgCCAF/fIB' +
    '/fABIAkgBv3yAf3wASAKIAf98gH98AEgCyAM/fIB/fAB/QsEACAOQQFqIQ4MAQsLIAAgEWogAQJ7/QwAAAAAAADwPwAAAAAAAPA/' +
    'IAggCP3yAf3xASMERQ0AGiAI/QwAAAAAAADwPwAAAAAAAPA/IAj98QH98gEjBEEBRg0AGv0MAAAAAAAA8D8AAAAAAADwP/0MAAAA' +
    'AAAAAAAAAAAAAAAAACAI/QwAAAAAAAAAAAAAAAAAAAAA/Ur9Ugv98gEiAf0LBAAgACAQaiARaiACAnv9DAAAAAAAAPA/AAAAAAAA' +
    '8D8gCSAJ/fIB/fEBIwRFDQAaIAn9DAAAAAAAAPA/AAAAAAAA8D8gCf3xAf3yASMEQQFGDQAa/QwAAAAAAADwPwAAAAAAAPA//QwA' +
    'AAAAAAAAAAAAAAAAAAAAIAn9DAAAAAAAAAAAAAAAAAAAAAD9Sv1SC/3yASIC/QsEACAAIBBBAXRqIBFqIAMCe/0MAAAAAAAA8D8A' +
    'AAAAAADwPyAKIAr98gH98QEjBEUNABogCv0MAAAAAAAA8D8AAAAAAADwPyAK/fEB/fIBIwRBAUYNABr9DAAAAAAAAPA/AAAAAAAA' +
    '8D/9DAAAAAAAAAAAAAAAAAAAAAAgCv0MAAAAAAAAAAAAAAAAAAAAAP1K/VIL/fIBIgP9CwQAIAAgEEEDbGogEWogBAJ7/QwAAAAA' +
    'AADwPwAAAAAAAPA/IAsgC/3yAf3xASMERQ0AGiAL/QwAAAAAAADwPwAAAAAAAPA/IAv98QH98gEjBEEBRg0AGv0MAAAAAAAA8D8A' +
    'AAAAAADwP/0MAAAAAAAAAAAAAAAAAAAAACAL/QwAAAAAAAAAAAAAAAAAAAAA/Ur9Ugv98gEiBP0LBAAjCiARaiIOIA79AAQAIAH9' +
    '8AEgAv3wASAD/fABIAT98AH9CwQAIA9BAmohDwwBCwtBACEAA0AgACMCSARAIABBA3QiDiMMaiIPIA8rAwAjECAOaiIOKwMAoCAN' +
    'IA5qKwMAoCAOIA1BAXRqKwMAoCAOIA1BA2xqKwMAoDkDACAAQQFqIQAMAQsLC4wKAgh/C3sjA0EDdCEHIwBBA3QhCANAIwMgBkEE' +
    'ak4EQCAGQQN0IQlBACEDA0AjACADQQRqTgRA/QwAAAAAAAAAAAAAAAAAAAAAIQr9DAAAAAAAAAAAAAAAAAAAAAAhDP0MAAAAAAAA' +
    'AAAAAAAAAAAAACEN/QwAAAAAAAAAAAAAAAAAAAAAIQv9DAAAAAAAAAAAAAAAAAAAAAAhDv0MAAAAAAAAAAAAAAAAAAAAACEP/QwA' +
    'AAAAAAAAAAAAAAAAAAAAIRD9DAAAAAAAAAAAAAAAAAAAAAAhESAAIANBA3RqIQIjDiAJaiEEQQAhBQNAIAEgBUoEQCAKIAL9CgMA' +
    'IhMgBP0ABAAiEv3yAf3wASEKIAwgEyAE/QAEECIT/fIB/fABIQwgDSAC/QoDCCIUIBL98gH98AEhDSALIBQgE/3yAf3wASELIA4g' +
    'Av0KAxAiFCAS/fIB/fABIQ4gDyAUIBP98gH98AEhDyAQIAL9CgMYIhQgEv3yAf3wASEQIBEgFCAT/fIB/fABIREgAiAIaiECIAQg' +
    'B2ohBCAFQQFqIQUMAQsLIwkgCSMAbGogA0EFdGoiAiAC/QAEACAK/fAB/QsEACACIAL9AAQQIAz98AH9CwQQIAIgAv0ABCAgDf3w' +
    'Af0LBCAgAiAC/QAEMCAL/fAB/QsEMCACIAL9AARAIA798AH9CwRAIAIgAv0ABFAgD/3wAf0LBFAgAiAC/QAEYCAQ/fAB/QsEYCAC' +
    'IAL9AARwIBH98AH9CwRwIANBBGohAwwBCwsDQCADIwBIBED9DAAAAAAAAAAAAAAAAAAAAAAhCv0MAAAAAAAAAAAAAAAAAAAAACEL' +
    'IAAgA0EDdGohBCMOIAlqIQJBACEFA0AgASAFSgRAIAogBP0KAwAiDCAC/QAEAP3yAf3wASEKIAsgDCAC/QAEEP3yAf3wASELIAQg' +
    'CGohBCACIAdqIQIgBUEBaiEFDAELCyMJIAkjAGxqIANBBXRqIgIgAv0ABAAgCv3wAf0LBAAgAiAC/QAEECAL/fAB/QsEECADQQFq' +
    'IQMMAQsLIAZBBGohBgwBCwsDQCAGIwNIBEAgBkEDdCEJQQAhAgNAIwAgAkEEak4EQP0MAAAAAAAAAAAAAAAAAAAAACEL/QwAAAAA' +
    'AAAAAAAAAAAAAAAAIQr9DAAAAAAAAAAAAAAAAAAAAAAhDP0MAAAAAAAAAAAAAAAAAAAAACENIAAgAkEDdGohAyMOIAlqIQRBACEF' +
    'A0AgASAFSgRAIAsgA/0KAwAgBP0ABAAiDv3yAf3wASELIAogA/0KAwggDv3yAf3wASEKIAwgA/0KAxAgDv3yAf3wASEMIA0gA/0K' +
    'AxggDv3yAf3wASENIAMgCGohAyAEIAdqIQQgBUEBaiEFDAELCyMJIAkjAGxqIAJBBHRqIgMgA/0ABAAgC/3wAf0LBAAgAyAD/QAE' +
    'ECAK/fAB/QsEECADIAP9AAQgIAz98AH9CwQgIAMgA/0ABDAgDf3wAf0LBDAgAkEEaiECDAELCwNAIAIjAEgEQP0MAAAAAAAAAAAA' +
    'AAAAAAAAACEKIAAgAkEDdGohAyMOIAlqIQRBACEFA0AgASAFSgRAIAogA/0KAwAgBP0ABAD98gH98AEhCiADIAhqIQMgBCAHaiEE' +
    'IAVBAWohBQwBCwsjCSAJIwBsaiACQQR0aiIDIAP9AAQAIAr98AH9CwQAIAJBAWohAgwBCwsgBkECaiEGDAELCws=';

;// CONCATENATED MODULE: ./src/nn/kernel/wasm.ts



const wasmApi = globalThis.WebAssembly;
/** Data arrays stay resident in wasm memory until this many bytes are cached; then the cache starts over. */
const CACHE_LIMIT_BYTES = 1 << 30;
const CACHE_LIMIT_ENTRIES = 32;
const PAGE = 65536;
class Runtime {
    ex;
    f64;
    base;
    top;
    cache = new Map();
    /** Changes whenever cached data or the memory itself changed, so kernels know to re-resolve their offsets. */
    version = 0;
    constructor(ex) {
        this.ex = ex;
        this.base = align(ex.heapBase());
        this.top = this.base;
        this.f64 = new Float64Array(ex.memory.buffer);
    }
    /** A Float64Array over the whole memory, renewed after the memory grew. */
    view() {
        if (this.f64.buffer !== this.ex.memory.buffer)
            this.f64 = new Float64Array(this.ex.memory.buffer);
        return this.f64;
    }
    ensure(bytes) {
        const have = this.ex.memory.buffer.byteLength;
        if (bytes > have) {
            this.ex.memory.grow(Math.ceil((bytes - have) / PAGE));
            this.version++;
        }
    }
    /** Byte offset of one data array inside wasm memory (copied in on first use). */
    residentOne(a) {
        const at = this.cache.get(a);
        return at !== undefined ? at : this.resident(a, null)[0];
    }
    /**
     * Byte offsets of the given data arrays inside wasm memory (copied in on first use). Data
     * arrays are treated as immutable once a trainer has used them, as EncodedDataset promises.
     */
    resident(a, b) {
        let pa = this.cache.get(a);
        let pb = b === null ? 0 : this.cache.get(b);
        if (pa !== undefined && pb !== undefined)
            return [pa, pb];
        const need = (pa === undefined ? a.byteLength + 16 : 0) + (b !== null && pb === undefined ? b.byteLength + 16 : 0);
        if (this.top + need - this.base > CACHE_LIMIT_BYTES || this.cache.size + 2 > CACHE_LIMIT_ENTRIES) {
            this.cache.clear();
            this.top = this.base;
            this.version++;
            pa = undefined;
            pb = b === null ? 0 : undefined;
        }
        if (pa === undefined)
            pa = this.copyIn(a);
        if (pb === undefined && b !== null)
            pb = this.copyIn(b);
        return [pa, pb ?? 0];
    }
    copyIn(a) {
        const at = this.top;
        this.ensure(at + a.byteLength);
        this.view().set(a, at / 8);
        this.top = align(at + a.byteLength);
        this.cache.set(a, at);
        this.version++;
        return at;
    }
    /** Byte offset of a scratch area of `bytes` bytes above the cached data (valid until the next call). */
    scratch(bytes) {
        this.ensure(this.top + bytes + 64);
        return this.top;
    }
}
function align(n) {
    return (n + 63) & ~63;
}
let runtime;
function decode(b64) {
    return Uint8Array.from(Buffer.from(b64, 'base64'));
}
/** The per-thread kernel module, or null where this engine has no WebAssembly SIMD. */
function getRuntime() {
    if (runtime !== undefined)
        return runtime;
    const bytes = decode(KERNEL_BASE64);
    // The bytes are what the reproducibility check vouched for, or the build is broken: never run others.
    const sha = (0,external_node_crypto_namespaceObject.createHash)('sha256').update(bytes).digest('hex');
    if (sha !== KERNEL_SHA256)
        throw new Error(`kernel bytes have sha256 ${sha}, expected ${KERNEL_SHA256}`);
    try {
        if (wasmApi === undefined || !wasmApi.validate(bytes)) {
            runtime = null;
        }
        else {
            const instance = new wasmApi.Instance(new wasmApi.Module(bytes), { env: { abort: () => undefined } });
            runtime = new Runtime(instance.exports);
        }
    }
    catch {
        runtime = null;
    }
    return runtime;
}
function wasmAvailable() {
    return getRuntime() !== null;
}
/**
 * Where one gradient call's operands live in wasm memory. Kept while nothing moved (same shape,
 * same data, same memory), so the epoch loop allocates nothing and resolves nothing.
 */
class GradientPlan {
    version = -1;
    shape = null;
    x = null;
    y = null;
    xAt = 0;
    yAt = 0;
    paramsAt = 0;
    gradAt = 0;
    workAt = 0;
    activation = 0;
    head = 0;
    memory;
    grad;
    constructor(memory) {
        this.memory = memory;
        this.grad = memory.subarray(0, 0);
    }
    current(rt, shape, x, y) {
        return this.version === rt.version && shape === this.shape && x === this.x && y === this.y;
    }
    plan(rt, shape, x, y, size) {
        [this.xAt, this.yAt] = rt.resident(x, y);
        this.paramsAt = rt.scratch(16 * size + 128 + rt.ex.workBytes(shape.inputs, shape.width, shape.outputs));
        this.gradAt = align(this.paramsAt + 8 * size);
        this.workAt = align(this.gradAt + 8 * size);
        this.memory = rt.view();
        this.grad = this.memory.subarray(this.gradAt / 8, this.gradAt / 8 + size);
        this.activation = activationCode(shape.activation);
        this.head = headCode(shape.head);
        this.version = rt.version;
        this.shape = shape;
        this.x = x;
        this.y = y;
    }
}
/** The same for one forward call: inputs, logits and (optionally) hidden activations. */
class ForwardPlan {
    version = -1;
    shape = null;
    x = null;
    rows = -1;
    hiddenBytes = -1;
    xAt = 0;
    paramsAt = 0;
    logitsAt = 0;
    hiddenAt = 0;
    workAt = 0;
    memory;
    logits;
    hidden;
    constructor(memory) {
        this.memory = memory;
        this.logits = memory.subarray(0, 0);
        this.hidden = memory.subarray(0, 0);
    }
    current(rt, shape, x, rows, hiddenBytes) {
        return (this.version === rt.version &&
            shape === this.shape &&
            x === this.x &&
            rows === this.rows &&
            hiddenBytes === this.hiddenBytes);
    }
    plan(rt, shape, x, rows, hiddenBytes, size) {
        const { inputs: D, width: H, outputs: K } = shape;
        this.xAt = rt.residentOne(x);
        const logitBytes = 8 * rows * K;
        this.paramsAt = rt.scratch(8 * size + logitBytes + hiddenBytes + 256 + rt.ex.workBytes(D, H, K));
        this.logitsAt = align(this.paramsAt + 8 * size);
        this.hiddenAt = align(this.logitsAt + logitBytes);
        this.workAt = align(this.hiddenAt + hiddenBytes);
        this.memory = rt.view();
        this.logits = this.memory.subarray(this.logitsAt / 8, this.logitsAt / 8 + rows * K);
        this.hidden = this.memory.subarray(this.hiddenAt / 8, this.hiddenAt / 8 + rows * H);
        this.version = rt.version;
        this.shape = shape;
        this.x = x;
        this.rows = rows;
        this.hiddenBytes = hiddenBytes;
    }
}
/** A kernel backed by the shared WebAssembly module; throws when WebAssembly SIMD is unavailable. */
function wasmKernel() {
    const rt = getRuntime();
    if (rt === null)
        throw new Error('WebAssembly SIMD is not available in this JavaScript engine');
    const ex = rt.ex;
    // Gradient and forward calls share the scratch area above the cached data; each call rewrites
    // everything it reads there, so they may overlap.
    const g = new GradientPlan(rt.view());
    const f = new ForwardPlan(rt.view());
    return {
        name: 'wasm-simd-f64',
        lossAndGradient(shape, params, x, y, start, end, grad) {
            const P = params.length;
            if (!g.current(rt, shape, x, y))
                g.plan(rt, shape, x, y, P);
            const mem = g.memory;
            const po = g.paramsAt / 8;
            if (P <= 64)
                for (let q = 0; q < P; q++)
                    mem[po + q] = params[q];
            else
                mem.set(params, po);
            const { inputs, width, outputs } = shape;
            const loss = ex.lossGrad(g.activation, g.head, inputs, width, outputs, g.paramsAt, g.xAt, g.yAt, start, end, g.gradAt, g.workAt);
            const view = g.grad;
            if (P <= 64)
                for (let q = 0; q < P; q++)
                    grad[q] = view[q];
            else
                grad.set(view);
            return loss;
        },
        forward(shape, params, x, rows, logits, hidden) {
            const hiddenBytes = hidden ? 8 * rows * shape.width : 0;
            if (!f.current(rt, shape, x, rows, hiddenBytes))
                f.plan(rt, shape, x, rows, hiddenBytes, params.length);
            f.memory.set(params, f.paramsAt / 8);
            const { inputs, width, outputs } = shape;
            ex.forward(activationCode(shape.activation), inputs, width, outputs, f.paramsAt, f.xAt, rows, f.logitsAt, hidden ? f.hiddenAt : 0, f.workAt);
            logits.set(f.logits);
            if (hidden)
                hidden.set(f.hidden);
        },
    };
}

;// CONCATENATED MODULE: ./src/nn/kernel/select.ts
/** Picks the compute kernel a new trainer runs: the WebAssembly SIMD kernel, else the float64 reference (same bits). */


function defaultKernel() {
    return wasmAvailable() ? wasmKernel() : referenceKernel();
}

;// CONCATENATED MODULE: ./src/nn/metrics.ts

function computeMetrics(head, K, logits, y, rows, targetStd) {
    let loss = 0;
    for (let p = 0; p < rows; p++)
        loss += rowLoss(head, K, logits, p * K, y[p]);
    loss /= rows;
    const metric = (name) => targetMetric(name, head, K, logits, y, rows, targetStd);
    if (head === HEAD_LINEAR) {
        return { loss, accuracy: NaN, rmse: metric('rmse'), mae: metric('mae'), maxAbsError: metric('max-abs-error') };
    }
    // A network whose loss is not finite has no accuracy.
    return { loss, accuracy: Number.isFinite(loss) ? metric('accuracy') : NaN, rmse: NaN, mae: NaN, maxAbsError: NaN };
}
/** One metric without building the whole record (used inside the epoch loop). */
function targetMetric(name, head, K, logits, y, rows, targetStd) {
    if (name === 'accuracy') {
        if (head === HEAD_LINEAR)
            return NaN;
        let correct = 0;
        for (let p = 0; p < rows; p++) {
            let cls = 0;
            if (head === HEAD_LOGISTIC) {
                const z = logits[p];
                if (z !== z)
                    return NaN;
                cls = z > 0 ? 1 : 0;
            }
            else {
                const o = p * K;
                for (let k = 0; k < K; k++)
                    if (logits[o + k] !== logits[o + k])
                        return NaN;
                for (let k = 1; k < K; k++)
                    if (logits[o + k] > logits[o + cls])
                        cls = k;
            }
            if (cls === y[p])
                correct++;
        }
        return correct / rows;
    }
    if (head !== HEAD_LINEAR)
        return NaN;
    let se = 0;
    let ae = 0;
    let maxAe = 0;
    for (let p = 0; p < rows; p++) {
        const d = (logits[p] - y[p]) * targetStd;
        const a = d < 0 ? -d : d;
        se += d * d;
        ae += a;
        if (a > maxAe || a !== a)
            maxAe = a;
    }
    return name === 'rmse' ? Math.sqrt(se / rows) : name === 'mae' ? ae / rows : maxAe;
}
function metricValue(m, name) {
    switch (name) {
        case 'accuracy':
            return m.accuracy;
        case 'rmse':
            return m.rmse;
        case 'mae':
            return m.mae;
        case 'max-abs-error':
            return m.maxAbsError;
    }
}

;// CONCATENATED MODULE: ./src/nn/network.ts


/** The activation's usual initialisation. */
function defaultInit(activation) {
    return activation === 'relu' ? 'he' : 'nguyen-widrow';
}
/** Nguyen-Widrow scale β = 0.7 · H^(1/n) (Nguyen & Widrow 1990). @testOnly */
function nguyenWidrowBeta(width, inputs) {
    return 0.7 * detExp(detLog(width) / inputs);
}
/**
 * The input-weight norm (and bias range) a new hidden neuron gets: Nguyen-Widrow's β, at most 1.
 * β was derived for inputs in [−1, 1] and grows with the width; on standardised inputs a norm
 * above 1 starts wide layers in tanh's flat tails (1 is also the expected norm under LeCun's
 * fan-in rule, Var = 1/n, LeCun et al. 1998, from memory). The cap is our engineering choice,
 * chosen by measurement (README, "Training"): on two spirals at width 32, 8 of 20 restarts
 * reach 98% with it and 0 of 20 without; it binds only when 0.7·H^(1/n) > 1 (two inputs: H ≥ 3).
 */
const INIT_NORM_CAP = 1;
/** The norm a new hidden neuron's input weights get (see INIT_NORM_CAP). @testOnly */
function initialNorm(width, inputs) {
    return Math.min(INIT_NORM_CAP, nguyenWidrowBeta(width, inputs));
}
/** Standard normal draw by the Marsaglia polar method (no trigonometry, so it stays deterministic). */
function gaussian(rng) {
    for (;;) {
        const u = 2 * rng.nextDouble() - 1;
        const v = 2 * rng.nextDouble() - 1;
        const s = u * u + v * v;
        if (s > 0 && s < 1)
            return u * Math.sqrt((-2 * detLog(s)) / s);
    }
}
/**
 * Draws hidden neuron j's input weights and bias into `params` (layout `lay`, `width` hidden
 * neurons), as `init` prescribes for a layer of `width` neurons.
 */
function initHiddenNeuron(params, lay, inputs, width, j, init, rng) {
    if (init === 'nguyen-widrow') {
        const beta = initialNorm(width, inputs);
        let norm2 = 0;
        for (let i = 0; i < inputs; i++) {
            const w = rng.nextDouble() - 0.5;
            params[lay.w1 + i * width + j] = w;
            norm2 += w * w;
        }
        const scale = norm2 > 0 ? beta / Math.sqrt(norm2) : 0;
        for (let i = 0; i < inputs; i++)
            params[lay.w1 + i * width + j] *= scale;
        params[lay.b1 + j] = beta * (2 * rng.nextDouble() - 1);
    }
    else if (init === 'glorot') {
        const limit = Math.sqrt(6 / (inputs + width));
        for (let i = 0; i < inputs; i++)
            params[lay.w1 + i * width + j] = limit * (2 * rng.nextDouble() - 1);
        params[lay.b1 + j] = 0;
    }
    else {
        const std = Math.sqrt(2 / inputs);
        for (let i = 0; i < inputs; i++)
            params[lay.w1 + i * width + j] = std * gaussian(rng);
        params[lay.b1 + j] = 0;
    }
}
/** A freshly initialised parameter vector. Draw order: hidden neurons 0..H-1, then output weights row by row. */
function initParams(shape, init, rng) {
    const lay = layoutOf(shape);
    const params = new Float64Array(lay.size);
    const { inputs, width, outputs } = shape;
    for (let j = 0; j < width; j++)
        initHiddenNeuron(params, lay, inputs, width, j, init, rng);
    if (init === 'nguyen-widrow') {
        // Output weights: small uniform values, U(-0.5, 0.5); output biases 0.
        for (let q = 0; q < width * outputs; q++)
            params[lay.w2 + q] = rng.nextDouble() - 0.5;
    }
    else if (init === 'glorot') {
        const limit = Math.sqrt(6 / (width + outputs));
        for (let q = 0; q < width * outputs; q++)
            params[lay.w2 + q] = limit * (2 * rng.nextDouble() - 1);
    }
    else {
        const std = Math.sqrt(2 / width);
        for (let q = 0; q < width * outputs; q++)
            params[lay.w2 + q] = std * gaussian(rng);
    }
    return params;
}
/**
 * The parameters of `shape` with hidden neuron `j` removed (removeAt) or a zeroed neuron
 * appended (remove < 0). Returned in the layout of the new width.
 */
function resizeParams(params, shape, removeAt) {
    const { inputs, width, outputs } = shape;
    const newWidth = removeAt >= 0 ? width - 1 : width + 1;
    const from = layoutOf(shape);
    const to = layoutOf({ inputs, width: newWidth, outputs });
    const out = new Float64Array(to.size);
    const keep = (j) => (removeAt >= 0 && j > removeAt ? j - 1 : j);
    for (let j = 0; j < width; j++) {
        if (j === removeAt)
            continue;
        const jj = keep(j);
        for (let i = 0; i < inputs; i++)
            out[to.w1 + i * newWidth + jj] = params[from.w1 + i * width + j];
        out[to.b1 + jj] = params[from.b1 + j];
        for (let k = 0; k < outputs; k++)
            out[to.w2 + jj * outputs + k] = params[from.w2 + j * outputs + k];
    }
    for (let k = 0; k < outputs; k++)
        out[to.b2 + k] = params[from.b2 + k];
    return out;
}
/** Maps old parameter indices to new ones for a resize (−1: dropped); new parameters have no source. */
function resizeIndexMap(shape, removeAt) {
    const { inputs, width, outputs } = shape;
    const newWidth = removeAt >= 0 ? width - 1 : width + 1;
    const from = layoutOf(shape);
    const to = layoutOf({ inputs, width: newWidth, outputs });
    const map = new Int32Array(from.size).fill(-1);
    for (let j = 0; j < width; j++) {
        if (j === removeAt)
            continue;
        const jj = removeAt >= 0 && j > removeAt ? j - 1 : j;
        for (let i = 0; i < inputs; i++)
            map[from.w1 + i * width + j] = to.w1 + i * newWidth + jj;
        map[from.b1 + j] = to.b1 + jj;
        for (let k = 0; k < outputs; k++)
            map[from.w2 + j * outputs + k] = to.w2 + jj * outputs + k;
    }
    for (let k = 0; k < outputs; k++)
        map[from.b2 + k] = to.b2 + k;
    return map;
}
function toJson(shape, params) {
    const { inputs, width, outputs } = shape;
    const lay = layoutOf(shape);
    const hiddenWeights = [];
    for (let j = 0; j < width; j++) {
        const row = [];
        for (let i = 0; i < inputs; i++)
            row.push(params[lay.w1 + i * width + j]);
        hiddenWeights.push(row);
    }
    const outputWeights = [];
    for (let k = 0; k < outputs; k++) {
        const row = [];
        for (let j = 0; j < width; j++)
            row.push(params[lay.w2 + j * outputs + k]);
        outputWeights.push(row);
    }
    return {
        inputs,
        width,
        outputs,
        activation: shape.activation,
        head: shape.head,
        hiddenWeights,
        hiddenBias: Array.from(params.subarray(lay.b1, lay.b1 + width)),
        outputWeights,
        outputBias: Array.from(params.subarray(lay.b2, lay.b2 + outputs)),
    };
}
function fromJson(net) {
    const shape = {
        inputs: net.inputs,
        width: net.width,
        outputs: net.outputs,
        activation: net.activation,
        head: net.head,
    };
    const lay = layoutOf(shape);
    const params = new Float64Array(lay.size);
    for (let j = 0; j < net.width; j++) {
        for (let i = 0; i < net.inputs; i++)
            params[lay.w1 + i * net.width + j] = net.hiddenWeights[j][i];
        params[lay.b1 + j] = net.hiddenBias[j];
    }
    for (let k = 0; k < net.outputs; k++) {
        for (let j = 0; j < net.width; j++)
            params[lay.w2 + j * net.outputs + k] = net.outputWeights[k][j];
        params[lay.b2 + k] = net.outputBias[k];
    }
    return { shape, params };
}
function network_describe(shape) {
    return {
        inputs: shape.inputs,
        width: shape.width,
        outputs: shape.outputs,
        activation: shape.activation,
        head: shape.head,
    };
}

;// CONCATENATED MODULE: ./src/nn/stall.ts
/** When a training's error has flattened: the trigger of in-place growth. */
/** Dynamic Node Creation trigger (Ash 1989), signed form, on the min-so-far training error. */
class StallDetector {
    window;
    threshold;
    ring;
    count = 0;
    minSoFar = Infinity;
    errorAtStart = NaN;
    constructor(window, threshold) {
        this.window = window;
        this.threshold = threshold;
        this.ring = new Float64Array(window + 1);
    }
    reset() {
        this.count = 0;
        this.minSoFar = Infinity;
        this.errorAtStart = NaN;
    }
    /** Records the error of the current epoch; true when the error has flattened. */
    record(error) {
        if (error < this.minSoFar)
            this.minSoFar = error;
        const s = this.count++;
        const w = this.window;
        this.ring[s % (w + 1)] = this.minSoFar;
        if (s === 0)
            this.errorAtStart = this.minSoFar;
        if (s < w)
            return false;
        const drop = this.ring[(s - w) % (w + 1)] - this.minSoFar;
        if (!(this.errorAtStart > 0))
            return !(drop > 0);
        return drop / this.errorAtStart < this.threshold;
    }
}

;// CONCATENATED MODULE: ./src/nn/line-search.ts
/**
 * A line search for the strong Wolfe conditions (Nocedal & Wright, Numerical Optimization,
 * 2nd ed. 2006: Algorithm 3.5 with the zoom of Algorithm 3.6, trial steps by the cubic
 * interpolation of section 3.5, eq. 3.59):
 *   sufficient decrease  φ(α) ≤ φ(0) + c1·α·φ'(0)
 *   curvature            |φ'(α)| ≤ c2·|φ'(0)|
 * where φ(α) = f(x0 + α·d). Only +, −, ×, ÷, sqrt and comparisons, in a fixed order, so the
 * same inputs give the same bits on every engine. No allocation after construction.
 */
/**
 * A trial step from interpolation must stay at least this fraction of the bracket away from
 * both ends, so the bracket shrinks by a fixed factor whatever the cubic says. 0.1 is common
 * practice with no published source.
 */
const BRACKET_MARGIN = 0.1;
/**
 * Extrapolation bounds while no bracket exists: the next step lies in
 * [α_i + 1.1·(α_i − α_{i−1}), α_i + 4·(α_i − α_{i−1})], the factors of the Moré–Thuente line
 * search (MINPACK-2 dcsrch; from memory).
 */
const EXTRAPOLATE_MIN = 1.1;
const EXTRAPOLATE_MAX = 4;
const EPSILON = 2.220446049250313e-16;
function finite(v) {
    return v - v === 0;
}
/**
 * The minimiser of the cubic through (a, fa, ga) and (b, fb, gb) (Nocedal & Wright eq. 3.59);
 * NaN when the cubic has no local minimiser or the data are not finite.
 */
function cubicMinimizer(a, fa, ga, b, fb, gb) {
    const d1 = ga + gb - (3 * (fa - fb)) / (a - b);
    const disc = d1 * d1 - ga * gb;
    if (!(disc >= 0))
        return NaN;
    const root = Math.sqrt(disc);
    const d2 = b > a ? root : -root;
    const alpha = b - ((b - a) * (gb + d2 - d1)) / (gb - ga + 2 * d2);
    return finite(alpha) ? alpha : NaN;
}
/** Trial step inside the bracket (lo, hi): the cubic minimiser kept BRACKET_MARGIN away from both ends. */
function bracketedStep(aLo, fLo, gLo, aHi, fHi, gHi, hiFinite) {
    const left = aLo < aHi ? aLo : aHi;
    const right = aLo < aHi ? aHi : aLo;
    const margin = BRACKET_MARGIN * (right - left);
    // Without finite values at the far end there is nothing to interpolate: bisect.
    const c = hiFinite ? cubicMinimizer(aLo, fLo, gLo, aHi, fHi, gHi) : NaN;
    if (c !== c)
        return 0.5 * (aLo + aHi);
    if (c < left + margin)
        return left + margin;
    if (c > right - margin)
        return right - margin;
    return c;
}
/** Next step while the function still falls steeply: the cubic's minimiser beyond α_i, within the extrapolation bounds. */
function extrapolatedStep(aPrev, fPrev, gPrev, a, f, g) {
    const span = a - aPrev;
    const lower = a + EXTRAPOLATE_MIN * span;
    const upper = a + EXTRAPOLATE_MAX * span;
    const c = cubicMinimizer(aPrev, fPrev, gPrev, a, f, g);
    if (c !== c || c > upper)
        return upper;
    return c < lower ? lower : c;
}
class StrongWolfeLineSearch {
    settings;
    /** The best point of the last search (valid when it reported `moved`) and its gradient. */
    point;
    gradient;
    /** Loss, step and directional derivative φ'(α) at `point`. */
    loss = NaN;
    alpha = 0;
    slope = NaN;
    /** The point, gradient, loss and φ'(α) of the most recent evaluate(). */
    trialPoint;
    trialGradient;
    trialLoss = NaN;
    trialSlope = NaN;
    constructor(size, settings) {
        this.settings = settings;
        this.point = new Float64Array(size);
        this.gradient = new Float64Array(size);
        this.trialPoint = new Float64Array(size);
        this.trialGradient = new Float64Array(size);
    }
    resize(size) {
        this.point = new Float64Array(size);
        this.gradient = new Float64Array(size);
        this.trialPoint = new Float64Array(size);
        this.trialGradient = new Float64Array(size);
    }
    /** φ(α) at x0 + α·d (into trialPoint/trialGradient); sets trialSlope = ∇f(x0 + α·d)ᵀd. */
    evaluate(x0, d, alpha, objective) {
        const xt = this.trialPoint;
        const gt = this.trialGradient;
        const n = xt.length;
        for (let q = 0; q < n; q++)
            xt[q] = x0[q] + alpha * d[q];
        const f = objective(xt, gt);
        let slope = 0;
        for (let q = 0; q < n; q++)
            slope += gt[q] * d[q];
        this.trialLoss = f;
        this.trialSlope = slope;
        return f;
    }
    /** The trial just evaluated becomes the best point (buffers swap, nothing is copied). */
    keepTrial(alpha) {
        const p = this.point;
        const g = this.gradient;
        this.point = this.trialPoint;
        this.gradient = this.trialGradient;
        this.trialPoint = p;
        this.trialGradient = g;
        this.loss = this.trialLoss;
        this.slope = this.trialSlope;
        this.alpha = alpha;
    }
    /**
     * Searches along the descent direction d from x0, whose loss is f0 and whose directional
     * derivative is slope0 < 0, starting with step alpha1. Uses at most `budget` evaluations.
     * A non-finite loss or slope at a trial point counts as a step that is too long.
     */
    search(x0, f0, slope0, d, alpha1, objective, budget) {
        const { c1, c2 } = this.settings;
        const limit = Math.min(budget, this.settings.maxEvaluations);
        const curvature = -c2 * slope0;
        this.loss = f0;
        this.slope = slope0;
        this.alpha = 0;
        let evaluations = 0;
        const end = (status) => ({
            status: status === 'failed' && evaluations >= budget ? 'budget' : status,
            evaluations,
            moved: this.alpha > 0,
        });
        // Algorithm 3.5: widen the step until the bracket [lo, hi] holds a Wolfe point. The best
        // point so far (lo) is α = 0 at first, then always the lowest loss satisfying Armijo.
        let aPrev = 0;
        let fPrev = f0;
        let gPrev = slope0;
        let a = alpha1;
        let aHi;
        let fHi;
        let gHi;
        let hiFinite;
        for (let i = 1;; i++) {
            if (evaluations >= limit)
                return end('failed');
            const f = this.evaluate(x0, d, a, objective);
            const g = this.trialSlope;
            evaluations++;
            const ok = finite(f) && finite(g);
            if (!ok || f > f0 + c1 * a * slope0 || (i > 1 && f >= fPrev)) {
                aHi = a;
                fHi = f;
                gHi = g;
                hiFinite = ok;
                break;
            }
            if ((g < 0 ? -g : g) <= curvature) {
                this.keepTrial(a);
                return end('wolfe');
            }
            if (g >= 0) {
                // The minimum lies between the previous step and this one; this one is the lower.
                aHi = aPrev;
                fHi = fPrev;
                gHi = gPrev;
                hiFinite = true;
                this.keepTrial(a);
                break;
            }
            this.keepTrial(a);
            const next = extrapolatedStep(aPrev, fPrev, gPrev, a, f, g);
            aPrev = a;
            fPrev = f;
            gPrev = g;
            a = next;
        }
        // Algorithm 3.6 (zoom): lo is this.alpha with this.loss and this.slope.
        for (;;) {
            if (evaluations >= limit)
                return end('failed');
            const aLo = this.alpha;
            const width = aHi > aLo ? aHi - aLo : aLo - aHi;
            if (width <= EPSILON * (aHi > aLo ? aHi : aLo))
                return end('failed');
            const aj = bracketedStep(aLo, this.loss, this.slope, aHi, fHi, gHi, hiFinite);
            const f = this.evaluate(x0, d, aj, objective);
            const g = this.trialSlope;
            evaluations++;
            const ok = finite(f) && finite(g);
            if (!ok || f > f0 + c1 * aj * slope0 || f >= this.loss) {
                aHi = aj;
                fHi = f;
                gHi = g;
                hiFinite = ok;
                continue;
            }
            if ((g < 0 ? -g : g) <= curvature) {
                this.keepTrial(aj);
                return end('wolfe');
            }
            if (g * (aHi - aLo) >= 0) {
                aHi = aLo;
                fHi = this.loss;
                gHi = this.slope;
                hiFinite = true;
            }
            this.keepTrial(aj);
        }
    }
}

;// CONCATENATED MODULE: ./src/nn/lbfgs.ts
/**
 * Full-batch limited-memory BFGS (Liu & Nocedal 1989; Nocedal & Wright, Numerical Optimization,
 * 2nd ed. 2006, Algorithm 7.5), with the two-loop recursion of Algorithm 7.4, the initial
 * Hessian H0 = γ·I with γ = sᵀy / yᵀy of the newest pair (eq. 7.20), and a strong Wolfe line
 * search (line-search.ts). Only +, −, ×, ÷, sqrt and comparisons, in a fixed order, so a run
 * gives the same bits on every engine. All work arrays are allocated in the constructor or
 * on resize, none inside an iteration.
 */

/**
 * memory 10, gradientTolerance 1e-5, lossTolerance 2.22e-9 (factr 1e7 × machine epsilon, same
 * formula) and 20 line-search evaluations are SciPy's L-BFGS-B defaults (scipy.optimize
 * fmin_l_bfgs_b: m, pgtol, factr, maxls; checked in its documentation). c1 = 1e-4 and c2 = 0.9
 * are the values Nocedal & Wright recommend for quasi-Newton methods (section 3.1, from memory),
 * and SciPy's line_search defaults (checked). Nocedal & Wright suggest m between 3 and 20 (from
 * memory); 10 is SciPy's choice.
 * @testOnly
 */
const LBFGS_DEFAULTS = {
    memory: 10,
    c1: 1e-4,
    c2: 0.9,
    gradientTolerance: 1e-5,
    lossTolerance: 2.220446049250313e-9,
    maxLineSearchEvaluations: 20,
};
/**
 * A pair is kept only when sᵀy > ε·‖s‖·‖y‖ (ε the machine epsilon): the cosine between s and
 * y must exceed the rounding level of the dot product itself. A strong Wolfe step always
 * gives sᵀy ≥ (1 − c2)·|∇fᵀs| > 0, so this only drops pairs from steps accepted without the
 * curvature condition (budget ran out) or lost to rounding, where 1/sᵀy would be noise and the
 * inverse-Hessian approximation could stop being positive definite.
 */
const PAIR_COSINE_MIN = 2.220446049250313e-16;
function dot(a, ao, b, bo, n) {
    let s = 0;
    for (let q = 0; q < n; q++)
        s += a[ao + q] * b[bo + q];
    return s;
}
class Lbfgs {
    options;
    stats = { iterations: 0, evaluations: 0, skippedPairs: 0, restarts: 0 };
    n;
    m;
    /** Ring of pairs: pair i occupies [i·n, (i+1)·n) of s and y. */
    s;
    y;
    rho;
    coef;
    count = 0;
    newest = -1;
    gamma = 1;
    d;
    /** The point whose loss and gradient are cached, so an iteration starts without evaluating. */
    x;
    g;
    f = NaN;
    known = false;
    search;
    constructor(size, options = {}) {
        const o = { ...LBFGS_DEFAULTS, ...options };
        if (!Number.isInteger(o.memory) || o.memory < 1)
            throw new RangeError(`memory must be a whole number >= 1, got ${o.memory}`);
        if (!(0 < o.c1 && o.c1 < o.c2 && o.c2 < 1))
            throw new RangeError(`need 0 < c1 < c2 < 1, got c1 ${o.c1}, c2 ${o.c2}`);
        if (!(o.maxLineSearchEvaluations >= 1))
            throw new RangeError('maxLineSearchEvaluations must be >= 1');
        this.options = o;
        this.n = size;
        this.m = o.memory;
        this.s = new Float64Array(this.m * size);
        this.y = new Float64Array(this.m * size);
        this.rho = new Float64Array(this.m);
        this.coef = new Float64Array(this.m);
        this.d = new Float64Array(size);
        this.x = new Float64Array(size);
        this.g = new Float64Array(size);
        this.search = new StrongWolfeLineSearch(size, {
            c1: o.c1,
            c2: o.c2,
            maxEvaluations: o.maxLineSearchEvaluations,
        });
    }
    /**
     * Hands over an evaluation the caller already made at x, so the next iteration need not repeat
     * it. The curvature pairs stay; call reset() as well if x is unrelated to the previous point.
     */
    setPoint(x, loss, grad) {
        this.x.set(x);
        this.g.set(grad);
        this.f = loss;
        this.known = true;
    }
    /**
     * One iteration from x (updated in place): direction by the two-loop recursion, then a strong
     * Wolfe line search. Uses at most maxEvaluations evaluations (one more at the start when no
     * loss is known for x). If the caller changed x since the last call, the history is dropped
     * and x is evaluated afresh. x never gets worse: on 'stuck' it holds the best point found.
     */
    iterate(x, objective, maxEvaluations) {
        let evaluations = 0;
        if (!(maxEvaluations >= 1))
            return { evaluations, loss: this.known ? this.f : NaN, status: 'progress' };
        if (!this.known || !this.isCurrent(x)) {
            if (this.known)
                this.reset();
            this.x.set(x);
            this.f = objective(this.x, this.g);
            this.known = true;
            evaluations++;
            this.stats.evaluations++;
        }
        const n = this.n;
        const f0 = this.f;
        const gInf = this.gradientInfNorm();
        if (!(f0 - f0 === 0) || !(gInf - gInf === 0))
            return { evaluations, loss: f0, status: 'stuck' };
        if (gInf <= this.options.gradientTolerance)
            return { evaluations, loss: f0, status: 'converged' };
        this.stats.iterations++;
        for (;;) {
            let quasiNewton = this.count > 0;
            this.direction();
            let slope0 = dot(this.g, 0, this.d, 0, n);
            if (!(slope0 < 0) && quasiNewton) {
                // Rounding made the quasi-Newton direction useless: fall back on steepest descent.
                this.reset();
                quasiNewton = false;
                this.direction();
                slope0 = dot(this.g, 0, this.d, 0, n);
            }
            if (!(slope0 < 0))
                return { evaluations, loss: this.f, status: 'stuck' };
            const budget = maxEvaluations - evaluations;
            if (budget < 1)
                return { evaluations, loss: this.f, status: 'progress' };
            // Quasi-Newton steps are well scaled, so α = 1 comes first (Nocedal & Wright, section 3.5).
            // Without curvature information the first trial moves the parameters by a Euclidean length
            // of 1 (as Liu & Nocedal's LBFGS code does, from memory): the summed loss's gradient grows
            // with the row count, so α = 1 on −∇f would make the step depend on the data size, while a
            // unit move is on the scale of Nguyen–Widrow initial weights.
            const alpha1 = this.count > 0 ? 1 : 1 / Math.sqrt(dot(this.d, 0, this.d, 0, n));
            const fOld = this.f;
            const r = this.search.search(this.x, fOld, slope0, this.d, alpha1, objective, budget);
            evaluations += r.evaluations;
            this.stats.evaluations += r.evaluations;
            if (r.moved)
                this.accept(x, r.status !== 'failed');
            if (r.status === 'wolfe') {
                const fNew = this.f;
                const scale = Math.max(fOld < 0 ? -fOld : fOld, fNew < 0 ? -fNew : fNew, 1);
                const converged = this.gradientInfNorm() <= this.options.gradientTolerance ||
                    (this.options.lossTolerance > 0 && (fOld - fNew) / scale <= this.options.lossTolerance);
                return { evaluations, loss: this.f, status: converged ? 'converged' : 'progress' };
            }
            if (r.status === 'budget')
                return { evaluations, loss: this.f, status: 'progress' };
            // The line search failed. With curvature pairs, they may be what misleads: drop them and
            // try steepest descent from the best point so far. Without, there is nowhere to go.
            if (!quasiNewton)
                return { evaluations, loss: this.f, status: 'stuck' };
            this.reset();
            this.stats.restarts++;
        }
    }
    /** Forgets the curvature pairs (after the parameter vector changed meaning); the cached point stays. */
    reset() {
        this.count = 0;
        this.newest = -1;
        this.gamma = 1;
    }
    /**
     * Carries over to a resized parameter vector (map[old] = new index, −1 dropped). Removing or
     * adding a neuron changes the function, so old pairs are not secants of the new one: the
     * history is dropped and the next iteration evaluates the new point.
     */
    resize(_map, newSize) {
        this.reset();
        this.known = false;
        this.f = NaN;
        if (newSize === this.n)
            return;
        this.n = newSize;
        this.s = new Float64Array(this.m * newSize);
        this.y = new Float64Array(this.m * newSize);
        this.d = new Float64Array(newSize);
        this.x = new Float64Array(newSize);
        this.g = new Float64Array(newSize);
        this.search.resize(newSize);
    }
    /** Curvature pairs currently held. */
    get pairs() {
        return this.count;
    }
    isCurrent(x) {
        const c = this.x;
        if (x.length !== c.length)
            return false;
        for (let q = 0; q < c.length; q++)
            if (x[q] !== c[q])
                return false;
        return true;
    }
    gradientInfNorm() {
        const g = this.g;
        let m = 0;
        for (let q = 0; q < g.length; q++) {
            const a = g[q] < 0 ? -g[q] : g[q];
            if (a > m || a !== a)
                m = a;
        }
        return m;
    }
    /** d = −H·g by the two-loop recursion (Algorithm 7.4), newest pair first; −g without pairs. */
    direction() {
        const { n, m, s, y, rho, coef, d, g } = this;
        for (let q = 0; q < n; q++)
            d[q] = g[q];
        for (let k = 0; k < this.count; k++) {
            const i = (this.newest - k + m) % m;
            const a = rho[i] * dot(s, i * n, d, 0, n);
            coef[i] = a;
            const o = i * n;
            for (let q = 0; q < n; q++)
                d[q] -= a * y[o + q];
        }
        const gamma = this.gamma;
        for (let q = 0; q < n; q++)
            d[q] *= gamma;
        for (let k = this.count - 1; k >= 0; k--) {
            const i = (this.newest - k + m) % m;
            const b = rho[i] * dot(y, i * n, d, 0, n);
            const c = coef[i] - b;
            const o = i * n;
            for (let q = 0; q < n; q++)
                d[q] += c * s[o + q];
        }
        for (let q = 0; q < n; q++)
            d[q] = -d[q];
    }
    /** Moves to the line search's best point; stores the pair s = x₊ − x, y = g₊ − g when asked and acceptable. */
    accept(out, storePair) {
        const { n, m } = this;
        const xn = this.search.point;
        const gn = this.search.gradient;
        if (storePair) {
            let sy = 0;
            let ss = 0;
            let yy = 0;
            for (let q = 0; q < n; q++) {
                const sq = xn[q] - this.x[q];
                const yq = gn[q] - this.g[q];
                sy += sq * yq;
                ss += sq * sq;
                yy += yq * yq;
            }
            if (sy > PAIR_COSINE_MIN * Math.sqrt(ss) * Math.sqrt(yy)) {
                const i = (this.newest + 1) % m;
                const o = i * n;
                for (let q = 0; q < n; q++) {
                    this.s[o + q] = xn[q] - this.x[q];
                    this.y[o + q] = gn[q] - this.g[q];
                }
                this.rho[i] = 1 / sy;
                this.gamma = sy / yy;
                this.newest = i;
                if (this.count < m)
                    this.count++;
            }
            else {
                this.stats.skippedPairs++;
            }
        }
        this.x.set(xn);
        this.g.set(gn);
        this.f = this.search.loss;
        out.set(xn);
    }
}

;// CONCATENATED MODULE: ./src/nn/optimizers.ts
/** iRprop+ defaults (Riedmiller & Braun 1993; Igel & Hüsken 2003). */
const IRPROP_DEFAULTS = { etaPlus: 1.2, etaMinus: 0.5, delta0: 0.1, deltaMin: 1e-6, deltaMax: 50 };
/** Adam defaults (Kingma & Ba 2015). */
const ADAM_DEFAULTS = { learningRate: 0.001, beta1: 0.9, beta2: 0.999, epsilon: 1e-8 };
/** Backpropagation with momentum: ε 0.1, α 0.9, the values of Rumelhart, Hinton & Williams' 1986 symmetry run (from memory). */
const BACKPROP_DEFAULTS = { learningRate: 0.1, momentum: 0.9 };
function remap(old, map, newSize, fresh) {
    const out = new Float64Array(newSize).fill(fresh);
    for (let q = 0; q < map.length; q++)
        if (map[q] >= 0)
            out[map[q]] = old[q];
    return out;
}
/** iRprop+ (Igel & Hüsken): on a sign change, revert the last step only if the error rose. @testOnly */
class IRpropPlus {
    kind = 'irprop+';
    delta;
    prevGrad;
    prevStep;
    prevLoss = Infinity;
    constructor(size) {
        this.delta = new Float64Array(size).fill(IRPROP_DEFAULTS.delta0);
        this.prevGrad = new Float64Array(size);
        this.prevStep = new Float64Array(size);
    }
    step(params, grad, loss, _rows) {
        const { etaPlus, etaMinus, deltaMin, deltaMax } = IRPROP_DEFAULTS;
        const delta = this.delta;
        const prevGrad = this.prevGrad;
        const prevStep = this.prevStep;
        const errorRose = loss > this.prevLoss;
        const n = params.length;
        for (let q = 0; q < n; q++) {
            const g = grad[q];
            const c = g * prevGrad[q];
            if (c > 0) {
                const d = Math.min(delta[q] * etaPlus, deltaMax);
                delta[q] = d;
                const step = g > 0 ? -d : d;
                params[q] += step;
                prevStep[q] = step;
                prevGrad[q] = g;
            }
            else if (c < 0) {
                delta[q] = Math.max(delta[q] * etaMinus, deltaMin);
                if (errorRose) {
                    const step = -prevStep[q];
                    params[q] += step;
                    prevStep[q] = step;
                }
                else {
                    prevStep[q] = 0;
                }
                prevGrad[q] = 0;
            }
            else {
                const d = delta[q];
                const step = g > 0 ? -d : g < 0 ? d : 0;
                params[q] += step;
                prevStep[q] = step;
                prevGrad[q] = g;
            }
        }
        this.prevLoss = loss;
    }
    resize(map, newSize) {
        this.delta = remap(this.delta, map, newSize, IRPROP_DEFAULTS.delta0);
        this.prevGrad = remap(this.prevGrad, map, newSize, 0);
        this.prevStep = remap(this.prevStep, map, newSize, 0);
    }
    resetRange(from, to) {
        this.delta.fill(IRPROP_DEFAULTS.delta0, from, to);
        this.prevGrad.fill(0, from, to);
        this.prevStep.fill(0, from, to);
        // The function changed, so the last error no longer says whether a step made things worse.
        this.prevLoss = Infinity;
    }
    /** Inspection for tests. */
    state() {
        return { delta: this.delta, prevGrad: this.prevGrad, prevStep: this.prevStep, prevLoss: this.prevLoss };
    }
}
/** Adam (Kingma & Ba 2015), Algorithm 1, on the mean gradient of the batch. */
class Adam {
    lr;
    kind = 'adam';
    m;
    v;
    t = 0;
    b1t = 1;
    b2t = 1;
    constructor(size, lr) {
        this.lr = lr;
        this.m = new Float64Array(size);
        this.v = new Float64Array(size);
    }
    step(params, grad, _loss, rows) {
        const { beta1, beta2, epsilon } = ADAM_DEFAULTS;
        this.t++;
        this.b1t *= beta1;
        this.b2t *= beta2;
        const c1 = 1 / (1 - this.b1t);
        const c2 = 1 / (1 - this.b2t);
        const inv = 1 / rows;
        const m = this.m;
        const v = this.v;
        const lr = this.lr;
        const n = params.length;
        for (let q = 0; q < n; q++) {
            const g = grad[q] * inv;
            const mq = beta1 * m[q] + (1 - beta1) * g;
            const vq = beta2 * v[q] + (1 - beta2) * g * g;
            m[q] = mq;
            v[q] = vq;
            params[q] -= (lr * (mq * c1)) / (Math.sqrt(vq * c2) + epsilon);
        }
    }
    resize(map, newSize) {
        this.m = remap(this.m, map, newSize, 0);
        this.v = remap(this.v, map, newSize, 0);
    }
    resetRange(from, to) {
        this.m.fill(0, from, to);
        this.v.fill(0, from, to);
    }
}
/** Backpropagation with momentum: Δw(t) = −ε ∂E/∂w + α Δw(t−1), on the mean gradient (Rumelhart, Hinton & Williams 1986). */
class Momentum {
    lr;
    momentum;
    kind = 'backprop';
    prevStep;
    constructor(size, lr, momentum) {
        this.lr = lr;
        this.momentum = momentum;
        this.prevStep = new Float64Array(size);
    }
    step(params, grad, _loss, rows) {
        const scale = this.lr / rows;
        const alpha = this.momentum;
        const prev = this.prevStep;
        const n = params.length;
        for (let q = 0; q < n; q++) {
            const s = -scale * grad[q] + alpha * prev[q];
            prev[q] = s;
            params[q] += s;
        }
    }
    resize(map, newSize) {
        this.prevStep = remap(this.prevStep, map, newSize, 0);
    }
    resetRange(from, to) {
        this.prevStep.fill(0, from, to);
    }
}
function makeUpdater(kind, size, settings) {
    if (kind === 'irprop+')
        return new IRpropPlus(size);
    if (kind === 'adam')
        return new Adam(size, settings.learningRate ?? ADAM_DEFAULTS.learningRate);
    return new Momentum(size, settings.learningRate ?? BACKPROP_DEFAULTS.learningRate, settings.momentum ?? BACKPROP_DEFAULTS.momentum);
}

;// CONCATENATED MODULE: ./src/nn/steppers.ts


/** A first-order update: evaluate once, then step along the gradient. */
class FirstOrder {
    updater;
    result = { evaluations: 1, loss: 0, status: 'progress' };
    constructor(updater) {
        this.updater = updater;
    }
    step(params, objective, grad, _budget, rows) {
        const loss = objective(params, grad);
        // A non-finite loss leaves the weights untouched; the trainer stops the run as diverged.
        if (Number.isFinite(loss))
            this.updater.step(params, grad, loss, rows);
        this.result.loss = loss;
        return this.result;
    }
    resize(map, newSize) {
        this.updater.resize(map, newSize);
    }
    resetRange(from, to) {
        this.updater.resetRange(from, to);
    }
}
/** L-BFGS: each step is one iteration with its strong Wolfe line search. */
class QuasiNewton {
    lbfgs;
    constructor(size) {
        this.lbfgs = new Lbfgs(size);
    }
    step(params, objective, _grad, budget) {
        return this.lbfgs.iterate(params, objective, budget);
    }
    resize(map, newSize) {
        this.lbfgs.resize(map, newSize);
    }
    resetRange() {
        // The curvature pairs describe the whole vector: after surgery they no longer hold.
        this.lbfgs.reset();
    }
}
function makeStepper(optimizer, size, settings) {
    return optimizer === 'lbfgs' ? new QuasiNewton(size) : new FirstOrder(makeUpdater(optimizer, size, settings));
}

;// CONCATENATED MODULE: ./src/nn/surgery.ts



/** Hidden activations of every training row (rows × width); the logits go into `logits`. */
function hiddenActivations(kernel, shape, params, data, logits) {
    const hidden = new Float64Array(data.trainRows * shape.width);
    kernel.forward(shape, params, data.xTrain, data.trainRows, logits, hidden);
    return hidden;
}
function columnMeans(hidden, rows, width) {
    const mean = new Float64Array(width);
    for (let p = 0; p < rows; p++)
        for (let j = 0; j < width; j++)
            mean[j] += hidden[p * width + j];
    for (let j = 0; j < width; j++)
        mean[j] /= rows;
    return mean;
}
/** Appends a hidden neuron with fresh input weights (as `init` draws them) and zero outgoing weights. */
function withNeuronAdded(shape, params, init, rng) {
    const map = resizeIndexMap(shape, -1);
    const grown = resizeParams(params, shape, -1);
    const next = { ...shape, width: shape.width + 1 };
    initHiddenNeuron(grown, layoutOf(next), next.inputs, next.width, shape.width, init, rng);
    return { shape: next, params: grown, map };
}
/** Removes hidden neuron j, folding its mean activation over the training rows into the output biases. */
function withNeuronRemoved(kernel, shape, params, data, j) {
    if (!Number.isInteger(j) || j < 0 || j >= shape.width) {
        throw new RangeError(`no hidden neuron ${j} in a network of width ${shape.width}`);
    }
    const logits = new Float64Array(data.trainRows * shape.outputs);
    const mean = columnMeans(hiddenActivations(kernel, shape, params, data, logits), data.trainRows, shape.width);
    const lay = layoutOf(shape);
    const folded = params.slice();
    for (let k = 0; k < shape.outputs; k++)
        folded[lay.b2 + k] += folded[lay.w2 + j * shape.outputs + k] * mean[j];
    return {
        shape: { ...shape, width: shape.width - 1 },
        params: resizeParams(folded, shape, j),
        map: resizeIndexMap(shape, j),
    };
}
/** Compensated-ablation loss increase per hidden neuron (mean per training row), in one pass. */
function saliencies(kernel, shape, params, data, head) {
    const H = shape.width;
    const K = shape.outputs;
    const N = data.trainRows;
    const logits = new Float64Array(N * K);
    const hidden = hiddenActivations(kernel, shape, params, data, logits);
    const mean = columnMeans(hidden, N, H);
    const lay = layoutOf(shape);
    const out = new Float64Array(H);
    const z = new Float64Array(K);
    const y = data.yTrain;
    for (let p = 0; p < N; p++) {
        const base = rowLoss(head, K, logits, p * K, y[p]);
        for (let j = 0; j < H; j++) {
            const d = hidden[p * H + j] - mean[j];
            for (let k = 0; k < K; k++)
                z[k] = logits[p * K + k] - d * params[lay.w2 + j * K + k];
            out[j] += rowLoss(head, K, z, 0, y[p]) - base;
        }
    }
    for (let j = 0; j < H; j++)
        out[j] /= N;
    return out;
}

;// CONCATENATED MODULE: ./src/nn/trainer.ts
/**
 * One network and its optimiser state while it trains, grows and shrinks.
 *
 * Training follows the exact gradient of the loss it reports (plus the L2 penalty on the weights,
 * when there is one). The steering rows (validation rows, or the training rows when there are
 * none) decide when a training stops: when their loss has not really improved for `patience`
 * epochs, when the optimiser has converged, or at max-epochs. The network handed back is the one
 * with the lowest steering loss among those that met the target on the steering rows (or, when
 * none did, among all checked): early stopping with the best weights restored. The judging rows
 * are never read here.
 */









/**
 * A steering loss counts as improved when it falls by more than this fraction of the last
 * improved value; smaller gains do not reset the patience (an engineering choice, no source).
 */
const MIN_IMPROVEMENT = 1e-3;
/** The output head the dataset calls for. */
function headFor(data) {
    if (data.task === 'regression')
        return 'linear';
    return data.outputs === 1 ? 'logistic' : 'softmax';
}
class NetworkTrainer {
    data;
    options;
    kernel;
    shape;
    layout;
    params;
    grad;
    /** The best network checked so far, and the best that met the target (see the header). */
    best;
    bestMet;
    stepper;
    init;
    stall;
    head;
    logitsTrain;
    logitsSteer;
    batch;
    batchStart = 0;
    batchEnd = 0;
    /** The loss over all training rows with the weight penalty, and its gradient: what the optimiser minimises. */
    objective;
    /** The same over rows [batchStart, batchEnd) (mini-batch Adam). */
    batchObjective;
    constructor(data, width, options, rng, kernel, settings) {
        this.data = data;
        this.options = options;
        this.kernel = kernel;
        if (!Number.isInteger(width) || width < 0)
            throw new RangeError(`width must be a whole number >= 0, got ${width}`);
        if (data.trainRows < 1)
            throw new RangeError('the training set has no rows');
        if ((data.task === 'classification') !== (options.target.metric === 'accuracy')) {
            throw new RangeError(`target metric ${options.target.metric} does not fit a ${data.task} task`);
        }
        if (!(options.checkEvery >= 1))
            throw new RangeError(`checkEvery must be >= 1, got ${options.checkEvery}`);
        if (!(options.weightDecay >= 0))
            throw new RangeError(`weightDecay must be >= 0, got ${options.weightDecay}`);
        this.shape = {
            inputs: data.inputs,
            width,
            outputs: data.outputs,
            activation: options.activation,
            head: headFor(data),
        };
        this.layout = layoutOf(this.shape);
        this.head = headCode(this.shape.head);
        this.init = options.init ?? defaultInit(options.activation);
        this.params = initParams(this.shape, this.init, rng);
        this.grad = new Float64Array(this.params.length);
        this.best = new Float64Array(this.params.length);
        this.bestMet = new Float64Array(this.params.length);
        this.stepper = makeStepper(options.optimizer, this.params.length, settings);
        this.stall = options.stall ? new StallDetector(options.stall.window, options.stall.threshold) : null;
        this.logitsTrain = new Float64Array(data.trainRows * data.outputs);
        const steerRows = data.validationRows > 0 ? data.validationRows : data.trainRows;
        this.logitsSteer = new Float64Array(steerRows * data.outputs);
        const b = settings.batchSize ?? 0;
        this.batch = options.optimizer === 'adam' && b > 0 && b < data.trainRows ? b : data.trainRows;
        this.objective = (x, g) => this.penalised(x, g, this.lossOver(x, g, 0, this.data.trainRows));
        this.batchObjective = (x, g) => this.penalised(x, g, this.lossOver(x, g, this.batchStart, this.batchEnd));
    }
    get network() {
        return network_describe(this.shape);
    }
    /** The live parameter vector (layout in kernel/layout.ts); for tests and benchmarks. */
    get parameters() {
        return this.params;
    }
    lossOver(x, g, start, end) {
        return this.kernel.lossAndGradient(this.shape, x, this.data.xTrain, this.data.yTrain, start, end, g);
    }
    /** Adds (λ/2)·Σw² over the weights (not the biases) to `loss` and λw to their gradient. */
    penalised(x, g, loss) {
        const lambda = this.options.weightDecay;
        if (lambda === 0)
            return loss;
        const { w1, b1, w2, b2 } = this.layout;
        let squares = 0;
        for (let q = w1; q < b1; q++) {
            squares += x[q] * x[q];
            g[q] += lambda * x[q];
        }
        for (let q = w2; q < b2; q++) {
            squares += x[q] * x[q];
            g[q] += lambda * x[q];
        }
        return loss + 0.5 * lambda * squares;
    }
    /** One epoch: a full-batch optimiser step, or one pass of mini-batch Adam steps. */
    epoch(budget) {
        const N = this.data.trainRows;
        if (this.batch >= N)
            return this.stepper.step(this.params, this.objective, this.grad, budget, N);
        let loss = 0;
        for (let start = 0; start < N; start += this.batch) {
            this.batchStart = start;
            this.batchEnd = Math.min(N, start + this.batch);
            const part = this.stepper.step(this.params, this.batchObjective, this.grad, 1, this.batchEnd - start).loss;
            loss += part;
            if (!Number.isFinite(part))
                break;
        }
        return { evaluations: 1, loss, status: 'progress' };
    }
    run(maxEpochs) {
        const { options } = this;
        let stop = 'max-epochs';
        let epochs = 0;
        let nextCheck = options.checkEvery;
        let reference = Infinity;
        let lastImprovement = 0;
        let bestLoss = Infinity;
        let bestMetLoss = Infinity;
        this.stall?.reset();
        while (epochs < maxEpochs) {
            const step = this.epoch(maxEpochs - epochs);
            epochs += step.evaluations;
            if (!Number.isFinite(step.loss)) {
                stop = 'diverged';
                break;
            }
            const stalled = this.stall !== null && this.stall.record(step.loss / this.data.trainRows);
            const ended = step.status !== 'progress';
            if (epochs < nextCheck && epochs < maxEpochs && !ended && !stalled)
                continue;
            nextCheck = epochs + options.checkEvery;
            if (options.interrupted?.() === true) {
                stop = 'interrupted';
                break;
            }
            const steer = this.steeringMetrics();
            const metric = metricValue(steer, options.target.metric);
            if (!Number.isFinite(steer.loss) || !Number.isFinite(metric)) {
                stop = 'diverged';
                break;
            }
            if (steer.loss < reference * (1 - MIN_IMPROVEMENT)) {
                reference = steer.loss;
                lastImprovement = epochs;
            }
            if (steer.loss < bestLoss) {
                bestLoss = steer.loss;
                this.best.set(this.params);
            }
            if (meetsThreshold(metric, options.target) && steer.loss < bestMetLoss) {
                bestMetLoss = steer.loss;
                this.bestMet.set(this.params);
            }
            if (ended || stalled || epochs - lastImprovement >= options.patience) {
                stop = 'stalled';
                break;
            }
        }
        if (stop !== 'diverged' && stop !== 'interrupted') {
            if (bestMetLoss < Infinity)
                this.params.set(this.bestMet);
            else if (bestLoss < Infinity)
                this.params.set(this.best);
        }
        const rec = this.evaluate();
        if (stop === 'diverged' || stop === 'interrupted')
            return { ...rec, epochs, stop };
        if (!Number.isFinite(rec.trainLoss))
            return { ...rec, epochs, stop: 'diverged' };
        return { ...rec, epochs, stop: rec.stop === 'reached' ? 'reached' : stop };
    }
    trainMetrics() {
        const { data, shape } = this;
        this.kernel.forward(shape, this.params, data.xTrain, data.trainRows, this.logitsTrain, null);
        return computeMetrics(this.head, shape.outputs, this.logitsTrain, data.yTrain, data.trainRows, data.encoding.target.std);
    }
    /** Metrics on the steering rows: the validation rows, or the training rows when there are none. */
    steeringMetrics() {
        const { data, shape } = this;
        if (data.validationRows === 0)
            return this.trainMetrics();
        this.kernel.forward(shape, this.params, data.xValidation, data.validationRows, this.logitsSteer, null);
        return computeMetrics(this.head, shape.outputs, this.logitsSteer, data.yValidation, data.validationRows, data.encoding.target.std);
    }
    /**
     * One full-batch epoch: forward, backward and the optimiser's step, nothing else (no check).
     * Returns the loss; a non-finite loss leaves the weights untouched. For the engine benchmark.
     */
    fullBatchEpoch() {
        return this.stepper.step(this.params, this.objective, this.grad, 1, this.data.trainRows).loss;
    }
    /** Metrics on the training rows and on the steering rows. */
    metrics() {
        return { train: this.trainMetrics(), validation: this.steeringMetrics() };
    }
    evaluate() {
        const { train, validation } = this.metrics();
        const metric = this.options.target.metric;
        const trainMetric = metricValue(train, metric);
        const steeringMetric = metricValue(validation, metric);
        let stop = 'max-epochs';
        if (!Number.isFinite(train.loss))
            stop = 'diverged';
        else if (meetsThreshold(steeringMetric, this.options.target))
            stop = 'reached';
        return { epochs: 0, stop, trainLoss: train.loss, trainMetric, steeringMetric };
    }
    addNeuron(rng) {
        this.replace(withNeuronAdded(this.shape, this.params, this.init, rng));
    }
    removeNeuron(j) {
        this.replace(withNeuronRemoved(this.kernel, this.shape, this.params, this.data, j));
        // The output biases absorbed the removed neuron: what the optimiser learnt about them is stale.
        this.stepper.resetRange(this.layout.b2, this.layout.b2 + this.shape.outputs);
    }
    replace(r) {
        this.shape = r.shape;
        this.layout = layoutOf(r.shape);
        this.params = r.params;
        this.grad = new Float64Array(r.params.length);
        this.best = new Float64Array(r.params.length);
        this.bestMet = new Float64Array(r.params.length);
        this.stepper.resize(r.map, r.params.length);
        this.stall?.reset();
    }
    saliency() {
        return saliencies(this.kernel, this.shape, this.params, this.data, this.head);
    }
    snapshot() {
        return toJson(this.shape, this.params);
    }
    /** Takes over the weights of `net` (same shape); optimiser and stall state stay as new. */
    load(net) {
        const { shape, params } = fromJson(net);
        const s = this.shape;
        const same = ['inputs', 'width', 'outputs', 'head', 'activation'].every((k) => shape[k] === s[k]);
        if (!same) {
            throw new RangeError(`network ${shape.inputs}-${shape.width}-${shape.outputs} (${shape.activation}, ${shape.head}) does not fit ${s.inputs}-${s.width}-${s.outputs} (${s.activation}, ${s.head})`);
        }
        this.params.set(params);
    }
}
function settingsOf(options, extras) {
    return { ...(options.optimizerSettings ?? {}), ...(extras.optimizerSettings ?? {}) };
}
/**
 * A trainer that continues from an existing network: its weights, fresh optimiser and stall
 * state. Deterministic: the same arguments give the same later runs.
 */
function trainerFromNetwork(data, net, options, rng, extras = {}) {
    const trainer = new NetworkTrainer(data, net.width, { ...options, activation: net.activation }, rng, extras.kernel ?? defaultKernel(), settingsOf(options, extras));
    trainer.load(net);
    return trainer;
}
function createTrainer(data, width, options, rng, extras = {}) {
    return new NetworkTrainer(data, width, options, rng, extras.kernel ?? defaultKernel(), settingsOf(options, extras));
}

;// CONCATENATED MODULE: ./src/nn/predict.ts




/** Run a network on encoded rows; returns rows * outputs head outputs (probabilities or standardised values). */
function predict_predict(net, x, rows) {
    const { shape, params } = fromJson(net);
    const K = shape.outputs;
    const logits = new Float64Array(rows * K);
    referenceForward(shape, params, x, rows, logits, null, makeScratch(shape.width, K));
    const out = new Float64Array(rows * K);
    const head = headCode(shape.head);
    for (let p = 0; p < rows; p++)
        headOutputs(head, K, logits, p * K, out, p * K);
    return out;
}
/** The network's `metric` on encoded rows (regression errors in the target's units, via its std). */
function metricOn(net, x, y, rows, metric, targetStd) {
    if (rows === 0)
        return Number.NaN;
    const { shape, params } = fromJson(net);
    const logits = new Float64Array(rows * shape.outputs);
    defaultKernel().forward(shape, params, x, rows, logits, null);
    return targetMetric(metric, headCode(shape.head), shape.outputs, logits, y, rows, targetStd);
}
/** The class each row is given: the largest logit, or logit > 0 for a logistic head. */
function classesOn(net, x, rows) {
    const { shape, params } = fromJson(net);
    const K = shape.outputs;
    const logits = new Float64Array(rows * K);
    defaultKernel().forward(shape, params, x, rows, logits, null);
    const out = new Int32Array(rows);
    for (let p = 0; p < rows; p++) {
        if (K === 1)
            out[p] = logits[p] > 0 ? 1 : 0;
        else {
            let best = 0;
            for (let k = 1; k < K; k++)
                if (logits[p * K + k] > logits[p * K + best])
                    best = k;
            out[p] = best;
        }
    }
    return out;
}

;// CONCATENATED MODULE: ./src/nn/index.ts



;// CONCATENATED MODULE: ./src/model/predict.ts
/** Run an exported model on raw rows (column name → cell text), as read from a CSV file. */



/** A row's cell, by own key only: a column may be named `constructor` or `__proto__`. */
function cellOf(row, name) {
    return Object.hasOwn(row, name) ? row[name] : undefined;
}
/** (x − mean) / std, with a constant training column (std 0) only centred. */
function standardise(x, mean, std) {
    return std > 0 ? (x - mean) / std : x - mean;
}
/** Encode raw rows the way the training data was encoded. An unseen category encodes as all zeros. */
function encodeRows(model, rows) {
    const inputs = model.network.inputs;
    const x = new Float64Array(rows.length * inputs);
    rows.forEach((row, r) => {
        let c = r * inputs;
        for (const f of model.encoding.features) {
            const cell = cellOf(row, f.name);
            if (cell === undefined)
                throw new UserError(`row ${r + 1}: column ${quote(f.name)} is missing`, { key: f.name });
            const text = cell.trim();
            if (f.kind === 'numeric') {
                const v = text === '' ? Number.NaN : Number(text);
                if (!Number.isFinite(v)) {
                    throw new UserError(`row ${r + 1}, column ${quote(f.name)}: expected a number, found ${quote(cell)}`, {
                        key: f.name,
                    });
                }
                x[c++] = standardise(v, f.mean, f.std);
            }
            else {
                const k = f.categories.indexOf(text);
                for (let j = 0; j < f.categories.length; j++)
                    x[c + j] = j === k ? 1 : 0;
                c += f.categories.length;
            }
        }
    });
    return x;
}
/** Head outputs for each row: class probabilities, or the value in the target's units. */
function predictRows(model, rows) {
    const out = predict(model.network, encodeRows(model, rows), rows.length);
    const K = model.network.outputs;
    const t = model.encoding.target;
    const preds = [];
    for (let p = 0; p < rows.length; p++) {
        if (model.task === 'regression') {
            preds.push({ value: out[p] * t.std + t.mean });
            continue;
        }
        const classes = t.classes ?? [];
        // Keyed by class labels, which may be any string: no prototype, so no label is special.
        const probabilities = Object.create(null);
        let best = 0;
        if (K === 1) {
            // One logistic output: the probability of the second class.
            probabilities[classes[0]] = 1 - out[p];
            probabilities[classes[1]] = out[p];
            best = out[p] > 0.5 ? 1 : 0;
        }
        else {
            for (let k = 0; k < K; k++) {
                probabilities[classes[k]] = out[p * K + k];
                if (out[p * K + k] > out[p * K + best])
                    best = k;
            }
        }
        preds.push({ label: classes[best], probabilities });
    }
    return preds;
}
/** The model's target metric on rows that carry the target column. */
function scoreRows(model, rows) {
    const preds = predictRows(model, rows);
    const name = model.encoding.target.name;
    const truth = rows.map((row, r) => {
        const cell = cellOf(row, name);
        if (cell === undefined)
            throw new UserError(`row ${r + 1}: target column ${quote(name)} is missing`, { key: name });
        return cell.trim();
    });
    const metric = model.target.metric;
    if (metric === 'accuracy') {
        let correct = 0;
        preds.forEach((p, r) => {
            if ('label' in p && p.label === truth[r])
                correct++;
        });
        return correct / rows.length;
    }
    let se = 0;
    let ae = 0;
    let maxAe = 0;
    preds.forEach((p, r) => {
        const d = Math.abs(('value' in p ? p.value : Number.NaN) - Number(truth[r]));
        se += d * d;
        ae += d;
        if (d > maxAe || d !== d)
            maxAe = d;
    });
    if (metric === 'rmse')
        return Math.sqrt(se / rows.length);
    return metric === 'mae' ? ae / rows.length : maxAe;
}

;// CONCATENATED MODULE: ./src/model/index.ts
/** Witness export: the winning network as a JSON document anyone can run on raw rows. */




;// CONCATENATED MODULE: external "node:stream"
const external_node_stream_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:stream");
;// CONCATENATED MODULE: external "node:stream/promises"
const external_node_stream_promises_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:stream/promises");
;// CONCATENATED MODULE: external "stream"
const external_stream_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("stream");
;// CONCATENATED MODULE: ./node_modules/csv-parse/lib/utils/is_object.js
const is_object = function (obj) {
  return typeof obj === "object" && obj !== null && !Array.isArray(obj);
};



;// CONCATENATED MODULE: ./node_modules/csv-parse/lib/api/CsvError.js
class CsvError extends Error {
  constructor(code, message, options, ...contexts) {
    if (Array.isArray(message)) message = message.join(" ").trim();
    super(message);
    if (Error.captureStackTrace !== undefined) {
      Error.captureStackTrace(this, CsvError);
    }
    this.code = code;
    for (const context of contexts) {
      for (const key in context) {
        const value = context[key];
        this[key] = Buffer.isBuffer(value)
          ? value.toString(options.encoding)
          : value == null
            ? value
            : JSON.parse(JSON.stringify(value));
      }
    }
  }
}



;// CONCATENATED MODULE: ./node_modules/csv-parse/lib/api/normalize_columns_array.js



const normalize_columns_array = function (columns) {
  const normalizedColumns = [];
  for (let i = 0, l = columns.length; i < l; i++) {
    const column = columns[i];
    if (column === undefined || column === null || column === false) {
      normalizedColumns[i] = { disabled: true };
    } else if (typeof column === "string" || typeof column === "number") {
      normalizedColumns[i] = { name: `${column}` };
    } else if (is_object(column)) {
      if (typeof column.name !== "string") {
        throw new CsvError("CSV_OPTION_COLUMNS_MISSING_NAME", [
          "Option columns missing name:",
          `property "name" is required at position ${i}`,
          "when column is an object literal",
        ]);
      }
      normalizedColumns[i] = column;
    } else {
      throw new CsvError("CSV_INVALID_COLUMN_DEFINITION", [
        "Invalid column definition:",
        "expect a string or a literal object,",
        `got ${JSON.stringify(column)} at position ${i}`,
      ]);
    }
  }
  return normalizedColumns;
};



;// CONCATENATED MODULE: ./node_modules/csv-parse/lib/utils/ResizeableBuffer.js
class ResizeableBuffer {
  constructor(size = 100) {
    this.size = size;
    this.length = 0;
    this.buf = Buffer.allocUnsafe(size);
  }
  prepend(val) {
    if (Buffer.isBuffer(val)) {
      const length = this.length + val.length;
      if (length >= this.size) {
        this.resize();
        if (length >= this.size) {
          throw Error("INVALID_BUFFER_STATE");
        }
      }
      const buf = this.buf;
      this.buf = Buffer.allocUnsafe(this.size);
      val.copy(this.buf, 0);
      buf.copy(this.buf, val.length);
      this.length += val.length;
    } else {
      const length = this.length++;
      if (length === this.size) {
        this.resize();
      }
      const buf = this.clone();
      this.buf[0] = val;
      buf.copy(this.buf, 1, 0, length);
    }
  }
  append(val) {
    const length = this.length++;
    if (length === this.size) {
      this.resize();
    }
    this.buf[length] = val;
  }
  clone() {
    return Buffer.from(this.buf.slice(0, this.length));
  }
  resize() {
    const length = this.length;
    this.size = this.size * 2;
    const buf = Buffer.allocUnsafe(this.size);
    this.buf.copy(buf, 0, 0, length);
    this.buf = buf;
  }
  toString(encoding) {
    if (encoding) {
      return this.buf.toString(encoding, 0, this.length);
    } else {
      return Uint8Array.prototype.slice.call(this.buf.slice(0, this.length));
    }
  }
  toJSON() {
    return this.toString("utf8");
  }
  reset() {
    this.length = 0;
  }
}

/* harmony default export */ const utils_ResizeableBuffer = (ResizeableBuffer);

;// CONCATENATED MODULE: ./node_modules/csv-parse/lib/api/init_state.js


const init_state = function (options) {
  // ECMAScript WhiteSpace + LineTerminator codepoints, encoded under
  // `options.encoding`. Aligns trimming with `String.prototype.trim()`.
  // https://tc39.es/ecma262/#sec-white-space
  // https://tc39.es/ecma262/#sec-line-terminators
  //
  // Codepoints unrepresentable in the target encoding are dropped: Node's
  // Buffer substitutes them with `?` (0x3F), and including those would cause
  // literal `?` bytes in the input to be trimmed under `latin1`/`ascii`.
  const timchars = [
    // Basic Latin
    0x0020, // [Space](https://www.fileformat.info/info/unicode/char/0020/index.htm)
    0x0009, // [CHARACTER TABULATION (HT)](https://www.fileformat.info/info/unicode/char/0009/index.htm)
    0x000a, // [LINE FEED (LF)](https://www.fileformat.info/info/unicode/char/000a/index.htm)
    0x000d, // [CARRIAGE RETURN (CR)](https://www.fileformat.info/info/unicode/char/000d/index.htm)
    0x000c, // [FORM FEED (FF)](https://www.fileformat.info/info/unicode/char/000c/index.htm)
    0x000b, // [LINE TABULATION (VT)](https://www.fileformat.info/info/unicode/char/000b/index.htm)
    // Latin-1 Supplement
    0x00a0, // [NO-BREAK SPACE (NBSP)](https://www.fileformat.info/info/unicode/char/00a0/index.htm)
    // Ogham
    0x1680, // [OGHAM SPACE MARK](https://www.fileformat.info/info/unicode/char/1680/index.htm)
    // General Punctuation
    0x2000, // [EN QUAD](https://www.fileformat.info/info/unicode/char/2000/index.htm)
    0x2001, // [EM QUAD](https://www.fileformat.info/info/unicode/char/2001/index.htm)
    0x2002, // [EN SPACE](https://www.fileformat.info/info/unicode/char/2002/index.htm)
    0x2003, // [EM SPACE](https://www.fileformat.info/info/unicode/char/2003/index.htm)
    0x2004, // [THREE-PER-EM SPACE](https://www.fileformat.info/info/unicode/char/2004/index.htm)
    0x2005, // [FOUR-PER-EM SPACE](https://www.fileformat.info/info/unicode/char/2005/index.htm)
    0x2006, // [SIX-PER-EM SPACE](https://www.fileformat.info/info/unicode/char/2006/index.htm)
    0x2007, // [FIGURE SPACE](https://www.fileformat.info/info/unicode/char/2007/index.htm)
    0x2008, // [PUNCTUATION SPACE](https://www.fileformat.info/info/unicode/char/2008/index.htm)
    0x2009, // [THIN SPACE](https://www.fileformat.info/info/unicode/char/2009/index.htm)
    0x200a, // [HAIR SPACE](https://www.fileformat.info/info/unicode/char/200a/index.htm)
    0x2028, // [LINE SEPARATOR](https://www.fileformat.info/info/unicode/char/2028/index.htm)
    0x2029, // [PARAGRAPH SEPARATOR](https://www.fileformat.info/info/unicode/char/2029/index.htm)
    0x202f, // [NARROW NO-BREAK SPACE (NNBSP)](https://www.fileformat.info/info/unicode/char/202f/index.htm)
    0x205f, // [MEDIUM MATHEMATICAL SPACE (MMSP)](https://www.fileformat.info/info/unicode/char/205f/index.htm)
    0x3000, // [IDEOGRAPHIC SPACE](https://www.fileformat.info/info/unicode/char/3000/index.htm)
    0xfeff, // [ZERO WIDTH NO-BREAK SPACE (BOM)](https://www.fileformat.info/info/unicode/char/feff/index.htm)
  ].reduce((acc, codepoint) => {
    const encoded = Buffer.from(
      String.fromCharCode(codepoint),
      options.encoding,
    );
    if (codepoint !== 0x3f && encoded.length === 1 && encoded[0] === 0x3f) {
      return acc;
    }
    acc.push(encoded);
    return acc;
  }, []);
  // First-byte lookup table for `__isCharTrimable`. Non-whitespace bytes
  // (the common case) bail out in O(1) without scanning every timchar.
  const timcharFirstBytes = new Uint8Array(256);
  for (const t of timchars) timcharFirstBytes[t[0]] = 1;
  return {
    bomSkipped: false,
    bufBytesStart: 0,
    castField: options.cast_function,
    commenting: false,
    delimiterBufPrevious: undefined,
    delimiterDiscovered: false,
    // Current error encountered by a record
    error: undefined,
    enabled: options.from_line === 1,
    escaping: false,
    escapeIsQuote:
      Buffer.isBuffer(options.escape) &&
      Buffer.isBuffer(options.quote) &&
      Buffer.compare(options.escape, options.quote) === 0,
    // columns can be `false`, `true`, `Array`
    expectedRecordLength: Array.isArray(options.columns)
      ? options.columns.length
      : undefined,
    field: new utils_ResizeableBuffer(20),
    firstLineToHeaders: options.cast_first_line_to_header,
    needMoreDataSize: Math.max(
      // Skip if the remaining buffer smaller than comment
      options.comment !== null ? options.comment.length : 0,
      // Skip if the remaining buffer can be delimiter
      ...(options.delimiter
        ? options.delimiter.map((delimiter) => delimiter.length)
        : []),
      // Auto discovery of delimiter is limited to 1 character
      options.delimiter_auto ? 1 : 0,
      // Skip if the remaining buffer can be escape sequence
      options.quote !== null ? options.quote.length : 0,
      // Skip if the remaining buffer can be a multi-byte trim character
      ...timchars.map((t) => t.length),
    ),
    previousBuf: undefined,
    quoting: false,
    stop: false,
    rawBuffer: new utils_ResizeableBuffer(100),
    record: [],
    recordHasError: false,
    record_length: 0,
    recordDelimiterMaxLength:
      options.record_delimiter.length === 0
        ? 0
        : Math.max(...options.record_delimiter.map((v) => v.length)),
    trimChars: [
      Buffer.from(" ", options.encoding)[0],
      Buffer.from("\t", options.encoding)[0],
    ],
    wasQuoting: false,
    wasRowDelimiter: false,
    timchars: timchars,
    timcharFirstBytes: timcharFirstBytes,
  };
};



;// CONCATENATED MODULE: ./node_modules/csv-parse/lib/utils/underscore.js
const underscore = function (str) {
  return str.replace(/([A-Z])/g, function (_, match) {
    return "_" + match.toLowerCase();
  });
};



;// CONCATENATED MODULE: ./node_modules/csv-parse/lib/api/normalize_options.js





const normalize_options = function (opts) {
  const options = {};
  // Merge with user options
  for (const opt in opts) {
    options[underscore(opt)] = opts[opt];
  }
  // Normalize option `encoding`
  // Note: defined first because other options depends on it
  // to convert chars/strings into buffers.
  if (options.encoding === undefined || options.encoding === true) {
    options.encoding = "utf8";
  } else if (options.encoding === null || options.encoding === false) {
    options.encoding = null;
  } else if (
    typeof options.encoding !== "string" &&
    options.encoding !== null
  ) {
    throw new CsvError(
      "CSV_INVALID_OPTION_ENCODING",
      [
        "Invalid option encoding:",
        "encoding must be a string or null to return a buffer,",
        `got ${JSON.stringify(options.encoding)}`,
      ],
      options,
    );
  }
  // Normalize option `bom`
  if (
    options.bom === undefined ||
    options.bom === null ||
    options.bom === false
  ) {
    options.bom = false;
  } else if (options.bom !== true) {
    throw new CsvError(
      "CSV_INVALID_OPTION_BOM",
      [
        "Invalid option bom:",
        "bom must be true,",
        `got ${JSON.stringify(options.bom)}`,
      ],
      options,
    );
  }
  // Normalize option `cast`
  options.cast_function = null;
  if (
    options.cast === undefined ||
    options.cast === null ||
    options.cast === false ||
    options.cast === ""
  ) {
    options.cast = undefined;
  } else if (typeof options.cast === "function") {
    options.cast_function = options.cast;
    options.cast = true;
  } else if (options.cast !== true) {
    throw new CsvError(
      "CSV_INVALID_OPTION_CAST",
      [
        "Invalid option cast:",
        "cast must be true or a function,",
        `got ${JSON.stringify(options.cast)}`,
      ],
      options,
    );
  }
  // Normalize option `cast_date`
  if (
    options.cast_date === undefined ||
    options.cast_date === null ||
    options.cast_date === false ||
    options.cast_date === ""
  ) {
    options.cast_date = false;
  } else if (options.cast_date === true) {
    options.cast_date = function (value) {
      const date = Date.parse(value);
      return !isNaN(date) ? new Date(date) : value;
    };
  } else if (typeof options.cast_date !== "function") {
    throw new CsvError(
      "CSV_INVALID_OPTION_CAST_DATE",
      [
        "Invalid option cast_date:",
        "cast_date must be true or a function,",
        `got ${JSON.stringify(options.cast_date)}`,
      ],
      options,
    );
  }
  // Normalize option `columns`
  options.cast_first_line_to_header = undefined;
  if (options.columns === true) {
    // Fields in the first line are converted as-is to columns
    options.cast_first_line_to_header = undefined;
  } else if (typeof options.columns === "function") {
    options.cast_first_line_to_header = options.columns;
    options.columns = true;
  } else if (Array.isArray(options.columns)) {
    options.columns = normalize_columns_array(options.columns);
  } else if (
    options.columns === undefined ||
    options.columns === null ||
    options.columns === false
  ) {
    options.columns = false;
  } else {
    throw new CsvError(
      "CSV_INVALID_OPTION_COLUMNS",
      [
        "Invalid option columns:",
        "expect an array, a function or true,",
        `got ${JSON.stringify(options.columns)}`,
      ],
      options,
    );
  }
  // Normalize option `group_columns_by_name`
  if (
    options.group_columns_by_name === undefined ||
    options.group_columns_by_name === null ||
    options.group_columns_by_name === false
  ) {
    options.group_columns_by_name = false;
  } else if (options.group_columns_by_name !== true) {
    throw new CsvError(
      "CSV_INVALID_OPTION_GROUP_COLUMNS_BY_NAME",
      [
        "Invalid option group_columns_by_name:",
        "expect an boolean,",
        `got ${JSON.stringify(options.group_columns_by_name)}`,
      ],
      options,
    );
  } else if (options.columns === false) {
    throw new CsvError(
      "CSV_INVALID_OPTION_GROUP_COLUMNS_BY_NAME",
      [
        "Invalid option group_columns_by_name:",
        "the `columns` mode must be activated.",
      ],
      options,
    );
  }
  // Normalize option `comment`
  if (
    options.comment === undefined ||
    options.comment === null ||
    options.comment === false ||
    options.comment === ""
  ) {
    options.comment = null;
  } else {
    if (typeof options.comment === "string") {
      options.comment = Buffer.from(options.comment, options.encoding);
    }
    if (!Buffer.isBuffer(options.comment)) {
      throw new CsvError(
        "CSV_INVALID_OPTION_COMMENT",
        [
          "Invalid option comment:",
          "comment must be a buffer or a string,",
          `got ${JSON.stringify(options.comment)}`,
        ],
        options,
      );
    }
  }
  // Normalize option `comment_no_infix`
  if (
    options.comment_no_infix === undefined ||
    options.comment_no_infix === null ||
    options.comment_no_infix === false
  ) {
    options.comment_no_infix = false;
  } else if (options.comment_no_infix !== true) {
    throw new CsvError(
      "CSV_INVALID_OPTION_COMMENT",
      [
        "Invalid option comment_no_infix:",
        "value must be a boolean,",
        `got ${JSON.stringify(options.comment_no_infix)}`,
      ],
      options,
    );
  }
  // Normalize option `delimiter_auto`
  if (
    options.delimiter_auto === undefined ||
    options.delimiter_auto === null ||
    options.delimiter_auto === false
  ) {
    options.delimiter_auto = false;
  } else if (options.delimiter_auto === true) {
    options.delimiter_auto = {};
  } else if (!is_object(options.delimiter_auto)) {
    throw new CsvError(
      "CSV_INVALID_OPTION_DELIMITER_AUTO",
      [
        "Invalid option delimiter_auto:",
        "delimiter_auto must be a boolean or a configuration object,",
        `got ${JSON.stringify(options.delimiter_auto)}`,
      ],
      options,
    );
  }
  if (options.delimiter_auto) {
    if (options.delimiter_auto.preferred === undefined)
      options.delimiter_auto.preferred = {
        [",".charCodeAt(0)]: 1.8,
        ["\t".charCodeAt(0)]: 1.8,
        [";".charCodeAt(0)]: 1.6,
        [" ".charCodeAt(0)]: 1.6,
        [":".charCodeAt(0)]: 1.5,
        [".".charCodeAt(0)]: 1.4,
        ["/".charCodeAt(0)]: 1.4,
      };
    else if (!is_object(options.delimiter_auto.preferred)) {
      throw new CsvError(
        "CSV_INVALID_OPTION_DELIMITER_AUTO",
        [
          "Invalid option delimiter_auto:",
          "preferred must be an object,",
          `got ${JSON.stringify(options.delimiter_auto.preferred)}`,
        ],
        options,
      );
    }
    if (options.delimiter_auto.score === undefined)
      options.delimiter_auto.score = (info, options) => {
        return (
          (info.total - info.std) * (options.preferred[info.char_code] || 1)
        );
      };
    else if (typeof options.delimiter_auto.score !== "function") {
      throw new CsvError(
        "CSV_INVALID_OPTION_DELIMITER_AUTO",
        [
          "Invalid option delimiter_auto:",
          "score must be a function,",
          `got ${JSON.stringify(options.delimiter_auto.score)}`,
        ],
        options,
      );
    }
    if (options.delimiter_auto.size === undefined)
      options.delimiter_auto.size = 2048;
    else if (typeof options.delimiter_auto.size !== "number") {
      throw new CsvError(
        "CSV_INVALID_OPTION_DELIMITER_AUTO",
        [
          "Invalid option delimiter_auto:",
          "size must be a number,",
          `got ${JSON.stringify(options.delimiter_auto.size)}`,
        ],
        options,
      );
    }
  }
  // Normalize option `delimiter`
  const delimiter_json = JSON.stringify(options.delimiter);
  if (options.delimiter_auto !== false) {
    options.delimiter = [];
  }
  if (!Array.isArray(options.delimiter)) {
    if (
      options.delimiter === undefined ||
      options.delimiter === null ||
      options.delimiter === false
    ) {
      options.delimiter = Buffer.from(",", options.encoding);
    }
    options.delimiter = [options.delimiter];
  }
  options.delimiter = options.delimiter.map(function (delimiter) {
    if (typeof delimiter === "string") {
      delimiter = Buffer.from(delimiter, options.encoding);
    }
    if (!Buffer.isBuffer(delimiter) || delimiter.length === 0) {
      throw new CsvError(
        "CSV_INVALID_OPTION_DELIMITER",
        [
          "Invalid option delimiter:",
          "delimiter must be a non empty string or buffer or array of string|buffer,",
          `got ${delimiter_json}`,
        ],
        options,
      );
    }
    return delimiter;
  });
  // Normalize option `escape`
  if (options.escape === undefined || options.escape === true) {
    options.escape = Buffer.from('"', options.encoding);
  } else if (typeof options.escape === "string") {
    options.escape = Buffer.from(options.escape, options.encoding);
  } else if (options.escape === null || options.escape === false) {
    options.escape = null;
  }
  if (options.escape !== null) {
    if (!Buffer.isBuffer(options.escape)) {
      throw new Error(
        `Invalid Option: escape must be a buffer, a string or a boolean, got ${JSON.stringify(options.escape)}`,
      );
    }
  }
  // Normalize option `from`
  if (options.from === undefined || options.from === null) {
    options.from = 1;
  } else {
    if (typeof options.from === "string" && /\d+/.test(options.from)) {
      options.from = parseInt(options.from);
    }
    if (Number.isInteger(options.from)) {
      if (options.from < 0) {
        throw new Error(
          `Invalid Option: from must be a positive integer, got ${JSON.stringify(opts.from)}`,
        );
      }
    } else {
      throw new Error(
        `Invalid Option: from must be an integer, got ${JSON.stringify(options.from)}`,
      );
    }
  }
  // Normalize option `from_line`
  if (options.from_line === undefined || options.from_line === null) {
    options.from_line = 1;
  } else {
    if (
      typeof options.from_line === "string" &&
      /\d+/.test(options.from_line)
    ) {
      options.from_line = parseInt(options.from_line);
    }
    if (Number.isInteger(options.from_line)) {
      if (options.from_line <= 0) {
        throw new Error(
          `Invalid Option: from_line must be a positive integer greater than 0, got ${JSON.stringify(opts.from_line)}`,
        );
      }
    } else {
      throw new Error(
        `Invalid Option: from_line must be an integer, got ${JSON.stringify(opts.from_line)}`,
      );
    }
  }
  // Normalize options `ignore_last_delimiters`
  if (
    options.ignore_last_delimiters === undefined ||
    options.ignore_last_delimiters === null
  ) {
    options.ignore_last_delimiters = false;
  } else if (typeof options.ignore_last_delimiters === "number") {
    options.ignore_last_delimiters = Math.floor(options.ignore_last_delimiters);
    if (options.ignore_last_delimiters === 0) {
      options.ignore_last_delimiters = false;
    }
  } else if (typeof options.ignore_last_delimiters !== "boolean") {
    throw new CsvError(
      "CSV_INVALID_OPTION_IGNORE_LAST_DELIMITERS",
      [
        "Invalid option `ignore_last_delimiters`:",
        "the value must be a boolean value or an integer,",
        `got ${JSON.stringify(options.ignore_last_delimiters)}`,
      ],
      options,
    );
  }
  if (options.ignore_last_delimiters === true && options.columns === false) {
    throw new CsvError(
      "CSV_IGNORE_LAST_DELIMITERS_REQUIRES_COLUMNS",
      [
        "The option `ignore_last_delimiters`",
        "requires the activation of the `columns` option",
      ],
      options,
    );
  }
  // Normalize option `info`
  if (
    options.info === undefined ||
    options.info === null ||
    options.info === false
  ) {
    options.info = false;
  } else if (options.info !== true) {
    throw new Error(
      `Invalid Option: info must be true, got ${JSON.stringify(options.info)}`,
    );
  }
  // Normalize option `max_record_size`
  if (
    options.max_record_size === undefined ||
    options.max_record_size === null ||
    options.max_record_size === false
  ) {
    options.max_record_size = 0;
  } else if (
    Number.isInteger(options.max_record_size) &&
    options.max_record_size >= 0
  ) {
    // Great, nothing to do
  } else if (
    typeof options.max_record_size === "string" &&
    /\d+/.test(options.max_record_size)
  ) {
    options.max_record_size = parseInt(options.max_record_size);
  } else {
    throw new Error(
      `Invalid Option: max_record_size must be a positive integer, got ${JSON.stringify(options.max_record_size)}`,
    );
  }
  // Normalize option `objname`
  if (
    options.objname === undefined ||
    options.objname === null ||
    options.objname === false
  ) {
    options.objname = undefined;
  } else if (Buffer.isBuffer(options.objname)) {
    if (options.objname.length === 0) {
      throw new Error(`Invalid Option: objname must be a non empty buffer`);
    }
    if (options.encoding === null) {
      // Don't call `toString`, leave objname as a buffer
    } else {
      options.objname = options.objname.toString(options.encoding);
    }
  } else if (typeof options.objname === "string") {
    if (options.objname.length === 0) {
      throw new Error(`Invalid Option: objname must be a non empty string`);
    }
    // Great, nothing to do
  } else if (typeof options.objname === "number") {
    // if(options.objname.length === 0){
    //   throw new Error(`Invalid Option: objname must be a non empty string`);
    // }
    // Great, nothing to do
  } else {
    throw new Error(
      `Invalid Option: objname must be a string or a buffer, got ${options.objname}`,
    );
  }
  if (options.objname !== undefined) {
    if (typeof options.objname === "number") {
      if (options.columns !== false) {
        throw Error(
          "Invalid Option: objname index cannot be combined with columns or be defined as a field",
        );
      }
    } else {
      // A string or a buffer
      if (options.columns === false) {
        throw Error(
          "Invalid Option: objname field must be combined with columns or be defined as an index",
        );
      }
    }
  }
  // Normalize option `on_record`
  if (options.on_record === undefined || options.on_record === null) {
    options.on_record = undefined;
  } else if (typeof options.on_record !== "function") {
    throw new CsvError(
      "CSV_INVALID_OPTION_ON_RECORD",
      [
        "Invalid option `on_record`:",
        "expect a function,",
        `got ${JSON.stringify(options.on_record)}`,
      ],
      options,
    );
  }
  // Normalize option `on_skip`
  // options.on_skip ??= (err, chunk) => {
  //   this.emit('skip', err, chunk);
  // };
  if (
    options.on_skip !== undefined &&
    options.on_skip !== null &&
    typeof options.on_skip !== "function"
  ) {
    throw new Error(
      `Invalid Option: on_skip must be a function, got ${JSON.stringify(options.on_skip)}`,
    );
  }
  // Normalize option `quote`
  if (
    options.quote === null ||
    options.quote === false ||
    options.quote === ""
  ) {
    options.quote = null;
  } else {
    if (options.quote === undefined || options.quote === true) {
      options.quote = Buffer.from('"', options.encoding);
    } else if (typeof options.quote === "string") {
      options.quote = Buffer.from(options.quote, options.encoding);
    }
    if (!Buffer.isBuffer(options.quote)) {
      throw new Error(
        `Invalid Option: quote must be a buffer or a string, got ${JSON.stringify(options.quote)}`,
      );
    }
  }
  // Normalize option `raw`
  if (
    options.raw === undefined ||
    options.raw === null ||
    options.raw === false
  ) {
    options.raw = false;
  } else if (options.raw !== true) {
    throw new Error(
      `Invalid Option: raw must be true, got ${JSON.stringify(options.raw)}`,
    );
  }
  // Normalize option `record_delimiter`
  if (options.record_delimiter === undefined) {
    options.record_delimiter = [];
  } else if (
    typeof options.record_delimiter === "string" ||
    Buffer.isBuffer(options.record_delimiter)
  ) {
    if (options.record_delimiter.length === 0) {
      throw new CsvError(
        "CSV_INVALID_OPTION_RECORD_DELIMITER",
        [
          "Invalid option `record_delimiter`:",
          "value must be a non empty string or buffer,",
          `got ${JSON.stringify(options.record_delimiter)}`,
        ],
        options,
      );
    }
    options.record_delimiter = [options.record_delimiter];
  } else if (!Array.isArray(options.record_delimiter)) {
    throw new CsvError(
      "CSV_INVALID_OPTION_RECORD_DELIMITER",
      [
        "Invalid option `record_delimiter`:",
        "value must be a string, a buffer or array of string|buffer,",
        `got ${JSON.stringify(options.record_delimiter)}`,
      ],
      options,
    );
  }
  options.record_delimiter = options.record_delimiter.map(function (rd, i) {
    if (typeof rd !== "string" && !Buffer.isBuffer(rd)) {
      throw new CsvError(
        "CSV_INVALID_OPTION_RECORD_DELIMITER",
        [
          "Invalid option `record_delimiter`:",
          "value must be a string, a buffer or array of string|buffer",
          `at index ${i},`,
          `got ${JSON.stringify(rd)}`,
        ],
        options,
      );
    } else if (rd.length === 0) {
      throw new CsvError(
        "CSV_INVALID_OPTION_RECORD_DELIMITER",
        [
          "Invalid option `record_delimiter`:",
          "value must be a non empty string or buffer",
          `at index ${i},`,
          `got ${JSON.stringify(rd)}`,
        ],
        options,
      );
    }
    if (typeof rd === "string") {
      rd = Buffer.from(rd, options.encoding);
    }
    return rd;
  });
  // Normalize option `relax_column_count`
  if (typeof options.relax_column_count === "boolean") {
    // Great, nothing to do
  } else if (
    options.relax_column_count === undefined ||
    options.relax_column_count === null
  ) {
    options.relax_column_count = false;
  } else {
    throw new Error(
      `Invalid Option: relax_column_count must be a boolean, got ${JSON.stringify(options.relax_column_count)}`,
    );
  }
  if (typeof options.relax_column_count_less === "boolean") {
    // Great, nothing to do
  } else if (
    options.relax_column_count_less === undefined ||
    options.relax_column_count_less === null
  ) {
    options.relax_column_count_less = false;
  } else {
    throw new Error(
      `Invalid Option: relax_column_count_less must be a boolean, got ${JSON.stringify(options.relax_column_count_less)}`,
    );
  }
  if (typeof options.relax_column_count_more === "boolean") {
    // Great, nothing to do
  } else if (
    options.relax_column_count_more === undefined ||
    options.relax_column_count_more === null
  ) {
    options.relax_column_count_more = false;
  } else {
    throw new Error(
      `Invalid Option: relax_column_count_more must be a boolean, got ${JSON.stringify(options.relax_column_count_more)}`,
    );
  }
  // Normalize option `relax_quotes`
  if (typeof options.relax_quotes === "boolean") {
    // Great, nothing to do
  } else if (
    options.relax_quotes === undefined ||
    options.relax_quotes === null
  ) {
    options.relax_quotes = false;
  } else {
    throw new Error(
      `Invalid Option: relax_quotes must be a boolean, got ${JSON.stringify(options.relax_quotes)}`,
    );
  }
  // Normalize option `skip_empty_lines`
  if (typeof options.skip_empty_lines === "boolean") {
    // Great, nothing to do
  } else if (
    options.skip_empty_lines === undefined ||
    options.skip_empty_lines === null
  ) {
    options.skip_empty_lines = false;
  } else {
    throw new Error(
      `Invalid Option: skip_empty_lines must be a boolean, got ${JSON.stringify(options.skip_empty_lines)}`,
    );
  }
  // Normalize option `skip_records_with_empty_values`
  if (typeof options.skip_records_with_empty_values === "boolean") {
    // Great, nothing to do
  } else if (
    options.skip_records_with_empty_values === undefined ||
    options.skip_records_with_empty_values === null
  ) {
    options.skip_records_with_empty_values = false;
  } else {
    throw new Error(
      `Invalid Option: skip_records_with_empty_values must be a boolean, got ${JSON.stringify(options.skip_records_with_empty_values)}`,
    );
  }
  // Normalize option `skip_records_with_error`
  if (typeof options.skip_records_with_error === "boolean") {
    // Great, nothing to do
  } else if (
    options.skip_records_with_error === undefined ||
    options.skip_records_with_error === null
  ) {
    options.skip_records_with_error = false;
  } else {
    throw new Error(
      `Invalid Option: skip_records_with_error must be a boolean, got ${JSON.stringify(options.skip_records_with_error)}`,
    );
  }
  // Normalize option `rtrim`
  if (
    options.rtrim === undefined ||
    options.rtrim === null ||
    options.rtrim === false
  ) {
    options.rtrim = false;
  } else if (options.rtrim !== true) {
    throw new Error(
      `Invalid Option: rtrim must be a boolean, got ${JSON.stringify(options.rtrim)}`,
    );
  }
  // Normalize option `ltrim`
  if (
    options.ltrim === undefined ||
    options.ltrim === null ||
    options.ltrim === false
  ) {
    options.ltrim = false;
  } else if (options.ltrim !== true) {
    throw new Error(
      `Invalid Option: ltrim must be a boolean, got ${JSON.stringify(options.ltrim)}`,
    );
  }
  // Normalize option `trim`
  if (
    options.trim === undefined ||
    options.trim === null ||
    options.trim === false
  ) {
    options.trim = false;
  } else if (options.trim !== true) {
    throw new Error(
      `Invalid Option: trim must be a boolean, got ${JSON.stringify(options.trim)}`,
    );
  }
  // Normalize options `trim`, `ltrim` and `rtrim`
  if (options.trim === true && opts.ltrim !== false) {
    options.ltrim = true;
  } else if (options.ltrim !== true) {
    options.ltrim = false;
  }
  if (options.trim === true && opts.rtrim !== false) {
    options.rtrim = true;
  } else if (options.rtrim !== true) {
    options.rtrim = false;
  }
  // Normalize option `to`
  if (options.to === undefined || options.to === null) {
    options.to = -1;
  } else if (options.to !== -1) {
    if (typeof options.to === "string" && /\d+/.test(options.to)) {
      options.to = parseInt(options.to);
    }
    if (Number.isInteger(options.to)) {
      if (options.to <= 0) {
        throw new Error(
          `Invalid Option: to must be a positive integer greater than 0, got ${JSON.stringify(opts.to)}`,
        );
      }
    } else {
      throw new Error(
        `Invalid Option: to must be an integer, got ${JSON.stringify(opts.to)}`,
      );
    }
  }
  // Normalize option `to_line`
  if (options.to_line === undefined || options.to_line === null) {
    options.to_line = -1;
  } else if (options.to_line !== -1) {
    if (typeof options.to_line === "string" && /\d+/.test(options.to_line)) {
      options.to_line = parseInt(options.to_line);
    }
    if (Number.isInteger(options.to_line)) {
      if (options.to_line <= 0) {
        throw new Error(
          `Invalid Option: to_line must be a positive integer greater than 0, got ${JSON.stringify(opts.to_line)}`,
        );
      }
    } else {
      throw new Error(
        `Invalid Option: to_line must be an integer, got ${JSON.stringify(opts.to_line)}`,
      );
    }
  }
  return options;
};



;// CONCATENATED MODULE: ./node_modules/csv-parse/lib/utils/delimiter_discover.js



// Discussed in [issue #400](https://github.com/adaltas/node-csv/issues/400)
// See https://github.com/python/cpython/blob/ea1b1c579f600cc85d145c60862b2e6b98701b24/Lib/csv.py#L349
const delimiter_discover = function (records, options) {
  // Normalize the configuration
  if (!options) {
    ({ delimiter_auto: options } = normalize_options({ delimiter_auto: true }));
  }
  // Convert String to Buffer
  if (typeof records === "string") {
    records = Buffer.from(records);
  }
  // Convert Buffer to an array of records
  if (Buffer.isBuffer(records)) {
    records = ((data) => {
      const records = [];
      const parser = transform({ delimiter: [] });
      const push = (record) => records.push(record);
      const close = () => {};
      const error = parser.parse(data, true, push, close);
      if (error !== undefined) throw error;
      return records;
    })(records);
  }
  // Info array initialization, 127 entries, one per char code
  const info = Array(127)
    .fill()
    .map(() => ({ lines: [] }));
  // Traverse each records, count occurences per char code
  records.map(([record], line) => {
    for (let i = 0, l = record.length; i < l; i++) {
      // Count the character frequency
      const code = record.charCodeAt(i);
      if (info[code].lines[line] === undefined) info[code].lines[line] = 0;
      info[code].lines[line]++;
    }
  });
  // Traverse each char code, compute the score
  info.map((info, i) => {
    info.char_code = i;
    info.std = std(info.lines);
    info.total = info.lines.reduce((acc, val) => acc + val, 0);
    info.preferred = !!options.preferred[i];
    info.score = options.score(info, options);
  });
  // Extract the dominant character
  const result = info.reduce(
    (acc, info) => (acc.score > info.score ? acc : info),
    {},
  );
  return String.fromCharCode(result.char_code);
};

const std = function (array) {
  const n = array.length;
  if (n === 0) return 0;
  const mean = array.reduce((a, b) => a + b) / n;
  return Math.sqrt(
    array.map((x) => Math.pow(x - mean, 2)).reduce((a, b) => a + b) / n,
  );
};



;// CONCATENATED MODULE: ./node_modules/csv-parse/lib/api/index.js






const isRecordEmpty = function (record) {
  return record.every(
    (field) =>
      field == null || (field.toString && field.toString().trim() === ""),
  );
};

const cr = 13; // `\r`, carriage return, 0x0D in hexadécimal, 13 in decimal
const nl = 10; // `\n`, newline, 0x0A in hexadecimal, 10 in decimal

const boms = {
  // Note, the following are equals:
  // Buffer.from("\ufeff")
  // Buffer.from([239, 187, 191])
  // Buffer.from('EFBBBF', 'hex')
  utf8: Buffer.from([239, 187, 191]),
  // Note, the following are equals:
  // Buffer.from "\ufeff", 'utf16le
  // Buffer.from([255, 254])
  utf16le: Buffer.from([255, 254]),
};

const transform = function (original_options = {}) {
  const info = {
    bytes: 0,
    bytes_records: 0,
    comment_lines: 0,
    empty_lines: 0,
    invalid_field_length: 0,
    lines: 1,
    records: 0,
  };
  const options = normalize_options(original_options);
  return {
    info: info,
    original_options: original_options,
    options: options,
    state: init_state(options),
    __needMoreData: function (i, bufLen, end) {
      if (end) return false;
      const { encoding, escape, quote } = this.options;
      const { quoting, needMoreDataSize, recordDelimiterMaxLength } =
        this.state;
      const numOfCharLeft = bufLen - i - 1;
      const requiredLength = Math.max(
        needMoreDataSize,
        // Skip if the remaining buffer smaller than record delimiter
        // If "record_delimiter" is yet to be discovered:
        // 1. It is equals to `[]` and "recordDelimiterMaxLength" equals `0`
        // 2. We set the length to windows line ending in the current encoding
        // Note, that encoding is known from user or bom discovery at that point
        // recordDelimiterMaxLength,
        recordDelimiterMaxLength === 0
          ? Buffer.from("\r\n", encoding).length
          : recordDelimiterMaxLength,
        // Skip if remaining buffer can be an escaped quote
        quoting ? (escape === null ? 0 : escape.length) + quote.length : 0,
        // Skip if remaining buffer can be record delimiter following the closing quote
        quoting ? quote.length + recordDelimiterMaxLength : 0,
      );
      return numOfCharLeft < requiredLength;
    },
    // Central parser implementation
    parse: function (nextBuf, end, push, close) {
      const {
        bom,
        comment_no_infix,
        delimiter_auto,
        encoding,
        from_line,
        ltrim,
        max_record_size,
        raw,
        relax_quotes,
        rtrim,
        skip_empty_lines,
        to,
        to_line,
      } = this.options;
      let { comment, escape, quote, record_delimiter } = this.options;
      const {
        bomSkipped,
        delimiterDiscovered,
        delimiterBufPrevious,
        rawBuffer,
        escapeIsQuote,
      } = this.state;
      // Automatic delimiter discovery
      if (!delimiterDiscovered && delimiter_auto) {
        let delimiterBuf;
        if (delimiterBufPrevious === undefined) {
          delimiterBuf = nextBuf;
        } else if (
          delimiterBufPrevious !== undefined &&
          nextBuf === undefined
        ) {
          delimiterBuf = delimiterBufPrevious;
        } else {
          delimiterBuf = Buffer.concat([delimiterBufPrevious, nextBuf]);
        }
        // Ensure that nextBuf is not concatenated a second time during buffer reconciliation
        nextBuf = undefined;
        // this.delimiterBufPrevious = delimiterBuf;
        if (end || delimiterBuf.length > delimiter_auto.size) {
          this.options.delimiter = [
            Buffer.from(
              delimiter_discover(delimiterBuf, this.options.delimiter_auto),
            ),
          ];
          this.state.previousBuf = delimiterBuf;
          this.state.delimiterBufPrevious = undefined;
          this.state.delimiterDiscovered = true;
        } else {
          this.state.delimiterBufPrevious = delimiterBuf;
          return;
        }
      }
      // Previous buffers reconciliation
      const { previousBuf } = this.state;
      let buf;
      if (previousBuf === undefined) {
        if (nextBuf === undefined) {
          // Handle empty string
          close();
          return;
        } else {
          buf = nextBuf;
        }
      } else if (previousBuf !== undefined && nextBuf === undefined) {
        buf = previousBuf;
      } else {
        buf = Buffer.concat([previousBuf, nextBuf]);
      }
      // Handle UTF BOM
      if (bomSkipped === false) {
        if (bom === false) {
          this.state.bomSkipped = true;
        } else if (buf.length < 3) {
          // No enough data
          if (end === false) {
            // Wait for more data
            this.state.previousBuf = buf;
            return;
          }
        } else {
          for (const encoding in boms) {
            if (boms[encoding].compare(buf, 0, boms[encoding].length) === 0) {
              // Skip BOM
              const bomLength = boms[encoding].length;
              this.state.bufBytesStart += bomLength;
              buf = buf.slice(bomLength);
              // Renormalize original options with the new encoding
              const options = normalize_options({
                ...this.original_options,
                encoding: encoding,
              });
              // Properties are merged with the existing options instance
              for (const key in options) {
                this.options[key] = options[key];
              }
              // Options will re-evaluate the Buffer with the new encoding
              ({ comment, escape, quote } = this.options);
              break;
            }
          }
          this.state.bomSkipped = true;
        }
      }
      const bufLen = buf.length;
      let pos;
      for (pos = 0; pos < bufLen; pos++) {
        // Ensure we get enough space to look ahead
        // There should be a way to move this out of the loop
        if (this.__needMoreData(pos, bufLen, end)) {
          break;
        }
        if (this.state.wasRowDelimiter === true) {
          this.info.lines++;
          this.state.wasRowDelimiter = false;
        }
        if (to_line !== -1 && this.info.lines > to_line) {
          this.state.stop = true;
          close();
          return;
        }
        // Auto discovery of record_delimiter, unix, mac and windows supported
        if (this.state.quoting === false && record_delimiter.length === 0) {
          const record_delimiterCount = this.__autoDiscoverRecordDelimiter(
            buf,
            pos,
          );
          if (record_delimiterCount) {
            record_delimiter = this.options.record_delimiter;
          }
        }
        const chr = buf[pos];
        if (raw === true) {
          rawBuffer.append(chr);
        }
        if (
          (chr === cr || chr === nl) &&
          this.state.wasRowDelimiter === false
        ) {
          this.state.wasRowDelimiter = true;
        }
        // Previous char was a valid escape char
        // treat the current char as a regular char
        if (this.state.escaping === true) {
          this.state.escaping = false;
        } else {
          // Escape is only active inside quoted fields
          // We are quoting, the char is an escape chr and there is a chr to escape
          // if(escape !== null && this.state.quoting === true && chr === escape && pos + 1 < bufLen){
          if (
            escape !== null &&
            this.state.quoting === true &&
            this.__isEscape(buf, pos, chr) &&
            pos + escape.length < bufLen
          ) {
            if (escapeIsQuote) {
              if (this.__isQuote(buf, pos + escape.length)) {
                this.state.escaping = true;
                pos += escape.length - 1;
                continue;
              }
            } else {
              this.state.escaping = true;
              pos += escape.length - 1;
              continue;
            }
          }
          // Not currently escaping and chr is a quote
          // TODO: need to compare bytes instead of single char
          if (this.state.commenting === false && this.__isQuote(buf, pos)) {
            if (this.state.quoting === true) {
              const nextChr = buf[pos + quote.length];
              const isNextChrTrimable =
                rtrim && this.__isCharTrimable(buf, pos + quote.length);
              const isNextChrComment =
                comment !== null &&
                this.__compareBytes(comment, buf, pos + quote.length, nextChr);
              const isNextChrDelimiter = this.__isDelimiter(
                buf,
                pos + quote.length,
                nextChr,
              );
              const isNextChrRecordDelimiter =
                record_delimiter.length === 0
                  ? this.__autoDiscoverRecordDelimiter(buf, pos + quote.length)
                  : this.__isRecordDelimiter(nextChr, buf, pos + quote.length);
              // Escape a quote
              // Treat next char as a regular character
              if (
                escape !== null &&
                this.__isEscape(buf, pos, chr) &&
                this.__isQuote(buf, pos + escape.length)
              ) {
                pos += escape.length - 1;
              } else if (
                !nextChr ||
                isNextChrDelimiter ||
                isNextChrRecordDelimiter ||
                isNextChrComment ||
                isNextChrTrimable
              ) {
                this.state.quoting = false;
                this.state.wasQuoting = true;
                pos += quote.length - 1;
                continue;
              } else if (relax_quotes === false) {
                const err = this.__error(
                  new CsvError(
                    "CSV_INVALID_CLOSING_QUOTE",
                    [
                      "Invalid Closing Quote:",
                      `got "${String.fromCharCode(nextChr)}"`,
                      `at line ${this.info.lines}`,
                      "instead of delimiter, record delimiter, trimable character",
                      "(if activated) or comment",
                    ],
                    this.options,
                    this.__infoField(),
                  ),
                );
                if (err !== undefined) return err;
              } else {
                this.state.quoting = false;
                this.state.wasQuoting = true;
                this.state.field.prepend(quote);
                pos += quote.length - 1;
              }
            } else {
              if (this.state.field.length !== 0) {
                // In relax_quotes mode, treat opening quote preceded by chrs as regular
                if (relax_quotes === false) {
                  const info = this.__infoField();
                  const bom = Object.keys(boms)
                    .map((b) =>
                      boms[b].equals(this.state.field.toString()) ? b : false,
                    )
                    .filter(Boolean)[0];
                  const err = this.__error(
                    new CsvError(
                      "INVALID_OPENING_QUOTE",
                      [
                        "Invalid Opening Quote:",
                        `a quote is found on field ${JSON.stringify(info.column)} at line ${info.lines}, value is ${JSON.stringify(this.state.field.toString(encoding))}`,
                        bom ? `(${bom} bom)` : undefined,
                      ],
                      this.options,
                      info,
                      {
                        field: this.state.field,
                      },
                    ),
                  );
                  if (err !== undefined) return err;
                }
              } else {
                this.state.quoting = true;
                pos += quote.length - 1;
                continue;
              }
            }
          }
          if (this.state.quoting === false) {
            const recordDelimiterLength = this.__isRecordDelimiter(
              chr,
              buf,
              pos,
            );
            if (recordDelimiterLength !== 0) {
              // Do not emit comments which take a full line
              const skipCommentLine =
                this.state.commenting &&
                this.state.wasQuoting === false &&
                this.state.record.length === 0 &&
                this.state.field.length === 0;
              if (skipCommentLine) {
                this.info.comment_lines++;
                // Skip full comment line
              } else {
                // Activate records emission if above from_line
                if (
                  this.state.enabled === false &&
                  this.info.lines +
                    (this.state.wasRowDelimiter === true ? 1 : 0) >=
                    from_line
                ) {
                  this.state.enabled = true;
                  this.__resetField();
                  this.__resetRecord();
                  pos += recordDelimiterLength - 1;
                  continue;
                }
                // Skip if line is empty and skip_empty_lines activated
                if (
                  skip_empty_lines === true &&
                  this.state.wasQuoting === false &&
                  this.state.record.length === 0 &&
                  this.state.field.length === 0
                ) {
                  this.info.empty_lines++;
                  pos += recordDelimiterLength - 1;
                  continue;
                }
                this.info.bytes = this.state.bufBytesStart + pos;
                const errField = this.__onField();
                if (errField !== undefined) return errField;
                this.info.bytes =
                  this.state.bufBytesStart + pos + recordDelimiterLength;
                const errRecord = this.__onRecord(push);
                if (errRecord !== undefined) return errRecord;
                if (to !== -1 && this.info.records >= to) {
                  this.state.stop = true;
                  close();
                  return;
                }
              }
              this.state.commenting = false;
              pos += recordDelimiterLength - 1;
              continue;
            }
            if (this.state.commenting) {
              continue;
            }
            if (
              comment !== null &&
              (comment_no_infix === false ||
                (this.state.record.length === 0 &&
                  this.state.field.length === 0))
            ) {
              const commentCount = this.__compareBytes(comment, buf, pos, chr);
              if (commentCount !== 0) {
                this.state.commenting = true;
                continue;
              }
            }
            const delimiterLength = this.__isDelimiter(buf, pos, chr);
            if (delimiterLength !== 0) {
              this.info.bytes = this.state.bufBytesStart + pos;
              const errField = this.__onField();
              if (errField !== undefined) return errField;
              pos += delimiterLength - 1;
              continue;
            }
          }
        }
        if (this.state.commenting === false) {
          if (
            max_record_size !== 0 &&
            this.state.record_length + this.state.field.length > max_record_size
          ) {
            return this.__error(
              new CsvError(
                "CSV_MAX_RECORD_SIZE",
                [
                  "Max Record Size:",
                  "record exceed the maximum number of tolerated bytes",
                  `of ${max_record_size}`,
                  `at line ${this.info.lines}`,
                ],
                this.options,
                this.__infoField(),
              ),
            );
          }
        }
        const lappend =
          ltrim === false ||
          this.state.quoting === true ||
          this.state.field.length !== 0 ||
          !this.__isCharTrimable(buf, pos);
        // rtrim in non quoting is handle in __onField
        const rappend = rtrim === false || this.state.wasQuoting === false;
        if (lappend === true && rappend === true) {
          this.state.field.append(chr);
        } else if (rtrim === true && !this.__isCharTrimable(buf, pos)) {
          return this.__error(
            new CsvError(
              "CSV_NON_TRIMABLE_CHAR_AFTER_CLOSING_QUOTE",
              [
                "Invalid Closing Quote:",
                "found non trimable byte after quote",
                `at line ${this.info.lines}`,
              ],
              this.options,
              this.__infoField(),
            ),
          );
        } else {
          if (lappend === false) {
            pos += this.__isCharTrimable(buf, pos) - 1;
          }
          continue;
        }
      }
      if (end === true) {
        // Ensure we are not ending in a quoting state
        if (this.state.quoting === true) {
          const err = this.__error(
            new CsvError(
              "CSV_QUOTE_NOT_CLOSED",
              [
                "Quote Not Closed:",
                `the parsing is finished with an opening quote at line ${this.info.lines}`,
              ],
              this.options,
              this.__infoField(),
            ),
          );
          if (err !== undefined) return err;
        } else {
          // Skip last line if it has no characters
          if (
            this.state.wasQuoting === true ||
            this.state.record.length !== 0 ||
            this.state.field.length !== 0
          ) {
            this.info.bytes = this.state.bufBytesStart + pos;
            const errField = this.__onField();
            if (errField !== undefined) return errField;
            const errRecord = this.__onRecord(push);
            if (errRecord !== undefined) return errRecord;
          } else if (this.state.wasRowDelimiter === true) {
            this.info.empty_lines++;
          } else if (this.state.commenting === true) {
            this.info.comment_lines++;
          }
        }
      } else {
        this.state.bufBytesStart += pos;
        this.state.previousBuf = buf.slice(pos);
      }
      if (this.state.wasRowDelimiter === true) {
        this.info.lines++;
        this.state.wasRowDelimiter = false;
      }
    },
    __onRecord: function (push) {
      const {
        columns,
        group_columns_by_name,
        encoding,
        info,
        from,
        relax_column_count,
        relax_column_count_less,
        relax_column_count_more,
        raw,
        skip_records_with_empty_values,
      } = this.options;
      const { enabled, record } = this.state;
      if (enabled === false) {
        return this.__resetRecord();
      }
      // Convert the first line into column names
      const recordLength = record.length;
      if (columns === true) {
        if (skip_records_with_empty_values === true && isRecordEmpty(record)) {
          this.__resetRecord();
          return;
        }
        return this.__firstLineToColumns(record);
      }
      if (columns === false && this.info.records === 0) {
        this.state.expectedRecordLength = recordLength;
      }
      if (recordLength !== this.state.expectedRecordLength) {
        const err =
          columns === false
            ? new CsvError(
                "CSV_RECORD_INCONSISTENT_FIELDS_LENGTH",
                [
                  "Invalid Record Length:",
                  `expect ${this.state.expectedRecordLength},`,
                  `got ${recordLength} on line ${this.info.lines}`,
                ],
                this.options,
                this.__infoField(),
                {
                  record: record,
                },
              )
            : new CsvError(
                "CSV_RECORD_INCONSISTENT_COLUMNS",
                [
                  "Invalid Record Length:",
                  `columns length is ${columns.length},`, // rename columns
                  `got ${recordLength} on line ${this.info.lines}`,
                ],
                this.options,
                this.__infoField(),
                {
                  record: record,
                },
              );
        if (
          relax_column_count === true ||
          (relax_column_count_less === true &&
            recordLength < this.state.expectedRecordLength) ||
          (relax_column_count_more === true &&
            recordLength > this.state.expectedRecordLength)
        ) {
          this.info.invalid_field_length++;
          this.state.error = err;
          // Error is undefined with skip_records_with_error
        } else {
          const finalErr = this.__error(err);
          if (finalErr) return finalErr;
        }
      }
      if (skip_records_with_empty_values === true && isRecordEmpty(record)) {
        this.__resetRecord();
        return;
      }
      if (this.state.recordHasError === true) {
        this.__resetRecord();
        this.state.recordHasError = false;
        return;
      }
      this.info.records++;
      if (from === 1 || this.info.records >= from) {
        const { objname } = this.options;
        // With columns, records are object
        if (columns !== false) {
          const obj = {};
          // Transform record array to an object
          for (let i = 0, l = record.length; i < l; i++) {
            if (columns[i] === undefined || columns[i].disabled) continue;
            // Turn duplicate columns into an array
            if (
              group_columns_by_name === true &&
              Object.hasOwn(obj, columns[i].name)
            ) {
              if (Array.isArray(obj[columns[i].name])) {
                obj[columns[i].name] = obj[columns[i].name].concat(record[i]);
              } else {
                obj[columns[i].name] = [obj[columns[i].name], record[i]];
              }
            } else {
              Object.defineProperty(obj, columns[i].name, {
                value: record[i],
                enumerable: true,
                writable: true,
                configurable: true,
              });
            }
          }
          // Without objname (default)
          if (raw === true || info === true) {
            const extRecord = Object.assign(
              { record: obj },
              raw === true
                ? { raw: this.state.rawBuffer.toString(encoding) }
                : {},
              info === true ? { info: this.__infoRecord() } : {},
            );
            const err = this.__push(
              objname === undefined ? extRecord : [obj[objname], extRecord],
              push,
            );
            if (err) {
              return err;
            }
          } else {
            const err = this.__push(
              objname === undefined ? obj : [obj[objname], obj],
              push,
            );
            if (err) {
              return err;
            }
          }
          // Without columns, records are array
        } else {
          if (raw === true || info === true) {
            const extRecord = Object.assign(
              { record: record },
              raw === true
                ? { raw: this.state.rawBuffer.toString(encoding) }
                : {},
              info === true ? { info: this.__infoRecord() } : {},
            );
            const err = this.__push(
              objname === undefined ? extRecord : [record[objname], extRecord],
              push,
            );
            if (err) {
              return err;
            }
          } else {
            const err = this.__push(
              objname === undefined ? record : [record[objname], record],
              push,
            );
            if (err) {
              return err;
            }
          }
        }
      }
      this.__resetRecord();
    },
    __firstLineToColumns: function (record) {
      const { firstLineToHeaders } = this.state;
      try {
        const headers =
          firstLineToHeaders === undefined
            ? record
            : firstLineToHeaders.call(null, record);
        if (!Array.isArray(headers)) {
          return this.__error(
            new CsvError(
              "CSV_INVALID_COLUMN_MAPPING",
              [
                "Invalid Column Mapping:",
                "expect an array from column function,",
                `got ${JSON.stringify(headers)}`,
              ],
              this.options,
              this.__infoField(),
              {
                headers: headers,
              },
            ),
          );
        }
        const normalizedHeaders = normalize_columns_array(headers);
        this.state.expectedRecordLength = normalizedHeaders.length;
        this.options.columns = normalizedHeaders;
        this.__resetRecord();
        return;
      } catch (err) {
        return err;
      }
    },
    __resetRecord: function () {
      if (this.options.raw === true) {
        this.state.rawBuffer.reset();
      }
      this.state.error = undefined;
      this.state.record = [];
      this.state.record_length = 0;
    },
    __onField: function () {
      const { cast, encoding, rtrim, max_record_size } = this.options;
      const { enabled, wasQuoting } = this.state;
      // Short circuit for the from_line options
      if (enabled === false) {
        return this.__resetField();
      }
      let field = this.state.field.toString(encoding);
      if (rtrim === true && wasQuoting === false) {
        field = field.trimRight();
      }
      if (cast === true) {
        const [err, f] = this.__cast(field);
        if (err !== undefined) return err;
        field = f;
      }
      this.state.record.push(field);
      // Increment record length if record size must not exceed a limit
      if (max_record_size !== 0 && typeof field === "string") {
        this.state.record_length += field.length;
      }
      this.__resetField();
    },
    __resetField: function () {
      this.state.field.reset();
      this.state.wasQuoting = false;
    },
    __push: function (record, push) {
      const { on_record } = this.options;
      if (on_record !== undefined) {
        const info = this.__infoRecord();
        try {
          record = on_record.call(null, record, info);
        } catch (err) {
          return err;
        }
        if (record === undefined || record === null) {
          return;
        }
      }
      this.info.bytes_records += this.info.bytes;
      push(record);
    },
    // Return a tuple with the error and the casted value
    __cast: function (field) {
      const { columns, relax_column_count } = this.options;
      const isColumns = Array.isArray(columns);
      // Dont loose time calling cast
      // because the final record is an object
      // and this field can't be associated to a key present in columns
      if (
        isColumns === true &&
        relax_column_count &&
        this.options.columns.length <= this.state.record.length
      ) {
        return [undefined, undefined];
      }
      if (this.state.castField !== null) {
        try {
          const info = this.__infoField();
          return [undefined, this.state.castField.call(null, field, info)];
        } catch (err) {
          return [err];
        }
      }
      if (this.__isFloat(field)) {
        return [undefined, parseFloat(field)];
      } else if (this.options.cast_date !== false) {
        const info = this.__infoField();
        return [undefined, this.options.cast_date.call(null, field, info)];
      }
      return [undefined, field];
    },
    __compareBytes: function (sourceBuf, targetBuf, targetPos, firstByte) {
      if (sourceBuf[0] !== firstByte) return 0;
      const sourceLength = sourceBuf.length;
      for (let i = 1; i < sourceLength; i++) {
        if (sourceBuf[i] !== targetBuf[targetPos + i]) return 0;
      }
      return sourceLength;
    },
    // Helper to test if a character is trimable
    __isCharTrimable: function (buf, pos) {
      const { timchars, timcharFirstBytes } = this.state;
      // Fast bail-out: non-whitespace bytes (the common case) are rejected
      // without scanning the full timchar list.
      const first = buf[pos];
      if (first === undefined || timcharFirstBytes[first] === 0) return 0;
      loop1: for (let i = 0; i < timchars.length; i++) {
        const timchar = timchars[i];
        for (let j = 0; j < timchar.length; j++) {
          if (timchar[j] !== buf[pos + j]) continue loop1;
        }
        return timchar.length;
      }
      return 0;
    },
    __isDelimiter: function (buf, pos, chr) {
      const { delimiter, ignore_last_delimiters } = this.options;
      if (
        ignore_last_delimiters === true &&
        this.state.record.length === this.options.columns.length - 1
      ) {
        return 0;
      } else if (
        ignore_last_delimiters !== false &&
        typeof ignore_last_delimiters === "number" &&
        this.state.record.length === ignore_last_delimiters - 1
      ) {
        return 0;
      }
      loop1: for (let i = 0; i < delimiter.length; i++) {
        const del = delimiter[i];
        if (del[0] === chr) {
          for (let j = 1; j < del.length; j++) {
            if (del[j] !== buf[pos + j]) continue loop1;
          }
          return del.length;
        }
      }
      return 0;
    },
    __isEscape: function (buf, pos, chr) {
      const { escape } = this.options;
      if (escape === null) return false;
      const l = escape.length;
      if (escape[0] === chr) {
        for (let i = 0; i < l; i++) {
          if (escape[i] !== buf[pos + i]) {
            return false;
          }
        }
        return true;
      }
      return false;
    },
    __isFloat: function (value) {
      return value - parseFloat(value) + 1 >= 0; // Borrowed from jquery
    },
    // Keep it in case we implement the `cast_int` option
    // __isInt(value){
    //   // return Number.isInteger(parseInt(value))
    //   // return !isNaN( parseInt( obj ) );
    //   return /^(\-|\+)?[1-9][0-9]*$/.test(value)
    // }
    __isQuote: function (buf, pos) {
      const { quote } = this.options;
      if (quote === null) return false;
      const l = quote.length;
      for (let i = 0; i < l; i++) {
        if (quote[i] !== buf[pos + i]) {
          return false;
        }
      }
      return true;
    },
    __isRecordDelimiter: function (chr, buf, pos) {
      const { record_delimiter } = this.options;
      const recordDelimiterLength = record_delimiter.length;
      loop1: for (let i = 0; i < recordDelimiterLength; i++) {
        const rd = record_delimiter[i];
        const rdLength = rd.length;
        if (rd[0] !== chr) {
          continue;
        }
        for (let j = 1; j < rdLength; j++) {
          if (rd[j] !== buf[pos + j]) {
            continue loop1;
          }
        }
        return rd.length;
      }
      return 0;
    },
    __autoDiscoverRecordDelimiter: function (buf, pos) {
      const { encoding } = this.options;
      // Note, we don't need to cache this information in state,
      // It is only called on the first line until we find out a suitable
      // record delimiter.
      const rds = [
        // Important, the windows line ending must be before mac os 9
        Buffer.from("\r\n", encoding),
        Buffer.from("\n", encoding),
        Buffer.from("\r", encoding),
      ];
      loop: for (let i = 0; i < rds.length; i++) {
        const l = rds[i].length;
        for (let j = 0; j < l; j++) {
          if (rds[i][j] !== buf[pos + j]) {
            continue loop;
          }
        }
        this.options.record_delimiter.push(rds[i]);
        this.state.recordDelimiterMaxLength = rds[i].length;
        return rds[i].length;
      }
      return 0;
    },
    __error: function (msg) {
      const { encoding, raw, skip_records_with_error } = this.options;
      const err = typeof msg === "string" ? new Error(msg) : msg;
      if (skip_records_with_error) {
        this.state.recordHasError = true;
        if (this.options.on_skip !== undefined) {
          try {
            this.options.on_skip(
              err,
              raw ? this.state.rawBuffer.toString(encoding) : undefined,
            );
          } catch (err) {
            return err;
          }
        }
        // this.emit('skip', err, raw ? this.state.rawBuffer.toString(encoding) : undefined);
        return undefined;
      } else {
        return err;
      }
    },
    __infoDataSet: function () {
      return {
        ...this.info,
        columns: this.options.columns,
      };
    },
    __infoRecord: function () {
      const { columns, raw, encoding } = this.options;
      return {
        ...this.__infoDataSet(),
        bytes_records: this.info.bytes,
        error: this.state.error,
        header: columns === true,
        index: this.state.record.length,
        raw: raw ? this.state.rawBuffer.toString(encoding) : undefined,
      };
    },
    __infoField: function () {
      const { columns } = this.options;
      const isColumns = Array.isArray(columns);
      // Bytes records are only incremented when all records'fields are parsed
      const bytes_records = this.info.bytes_records;
      return {
        ...this.__infoRecord(),
        bytes_records: bytes_records,
        column:
          isColumns === true
            ? columns.length > this.state.record.length
              ? columns[this.state.record.length].name
              : null
            : this.state.record.length,
        quoting: this.state.wasQuoting,
      };
    },
  };
};



;// CONCATENATED MODULE: ./node_modules/csv-parse/lib/index.js
/*
CSV Parse

Please look at the [project documentation](https://csv.js.org/parse/) for
additional information.
*/







class Parser extends external_stream_namespaceObject.Transform {
  constructor(opts = {}) {
    super({ ...{ readableObjectMode: true }, ...opts, encoding: null });
    this.api = transform({
      on_skip: (err, chunk) => {
        this.emit("skip", err, chunk);
      },
      ...opts,
    });
    // Backward compatibility
    this.state = this.api.state;
    this.options = this.api.options;
    this.info = this.api.info;
  }
  // Implementation of `Transform._transform`
  _transform(buf, _, callback) {
    if (this.state.stop === true) {
      return;
    }
    const err = this.api.parse(
      buf,
      false,
      (record) => {
        this.push(record);
      },
      () => {
        this.push(null);
        this.end();
        // Fix #333 and break #410
        //   ko: api.stream.iterator.coffee
        //   ko with v21.4.0, ok with node v20.5.1: api.stream.finished # aborted (with generate())
        //   ko: api.stream.finished # aborted (with Readable)
        // this.destroy()
        // Fix #410 and partially break #333
        //   ok: api.stream.iterator.coffee
        //   ok: api.stream.finished # aborted (with generate())
        //   broken: api.stream.finished # aborted (with Readable)
        this.on("end", this.destroy);
      },
    );
    if (err !== undefined) {
      this.state.stop = true;
    }
    callback(err);
  }
  // Implementation of `Transform._flush`
  _flush(callback) {
    if (this.state.stop === true) {
      return;
    }
    const err = this.api.parse(
      undefined,
      true,
      (record) => {
        this.push(record);
      },
      () => {
        this.push(null);
        this.on("end", this.destroy);
      },
    );
    callback(err);
  }
}

const parse = function () {
  let data, options, callback;
  for (const i in arguments) {
    const argument = arguments[i];
    const type = typeof argument;
    if (
      data === undefined &&
      (typeof argument === "string" || Buffer.isBuffer(argument))
    ) {
      data = argument;
    } else if (options === undefined && is_object(argument)) {
      options = argument;
    } else if (callback === undefined && type === "function") {
      callback = argument;
    } else {
      throw new CsvError(
        "CSV_INVALID_ARGUMENT",
        ["Invalid argument:", `got ${JSON.stringify(argument)} at index ${i}`],
        options || {},
      );
    }
  }
  const parser = new Parser(options);
  if (callback) {
    const records =
      options === undefined || options.objname === undefined
        ? []
        : Object.create(null);
    parser.on("readable", function () {
      let record;
      while ((record = this.read()) !== null) {
        if (options === undefined || options.objname === undefined) {
          records.push(record);
        } else {
          Object.assign(records, {
            [record[0]]: record[1],
            // writable: true,
            // enumerable: true,
            // configurable: true
          });
        }
      }
    });
    parser.on("error", function (err) {
      callback(err, undefined, parser.api.__infoDataSet());
    });
    parser.on("end", function () {
      callback(undefined, records, parser.api.__infoDataSet());
    });
  }
  if (data !== undefined) {
    const writer = function () {
      parser.write(data);
      parser.end();
    };
    // Support Deno, Rollup doesn't provide a shim for setImmediate
    if (typeof setImmediate === "function") {
      setImmediate(writer);
    } else {
      setTimeout(writer, 0);
    }
  }
  return parser;
};



;// CONCATENATED MODULE: ./src/data/numbers.ts
/** Strict reading of numbers from CSV text: plain decimal notation only. */
/** What a cell's text is, as far as numbers go. */
const NumberKind = {
    /** A finite decimal number. */
    Finite: 0,
    /** Not a number at all (text). */
    Text: 1,
    /** `NaN`, `Infinity` and friends: number-like, but not a measurement. */
    NotFinite: 2,
    /** Decimal notation beyond ±MAX_MAGNITUDE (e.g. 1e39, or 1e400, which overflows a 64-bit float). */
    Overflow: 3,
};
/**
 * The largest magnitude a cell may hold: float32's largest finite value. A device runs the
 * network in float32, which cannot hold anything larger; and it keeps every column statistic
 * finite (a sum of squared differences reaches at most rows × 4.6e77), whereas one cell of
 * 1.7e308 overflows the variance to Infinity. Such a cell is refused rather than rescaled.
 */
const MAX_MAGNITUDE = 3.4028234663852886e38;
// Decimal notation: optional sign, digits with an optional fraction, optional exponent.
// Hex, binary, `1_000` and the like are text, even though Number() would accept some.
const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const NON_FINITE = /^[+-]?(?:nan|inf|infinity)$/i;
/** Reads `text` (already trimmed); the value is in `parsed.value` when Finite. */
function classifyNumber(text, parsed) {
    const c = text.charCodeAt(0);
    // Fast rejection of obvious text: a number starts with a digit, sign or dot.
    const couldBeNumber = (c >= 48 && c <= 57) || c === 45 || c === 43 || c === 46;
    if (couldBeNumber && DECIMAL.test(text)) {
        const value = Number(text);
        if (!(Math.abs(value) <= MAX_MAGNITUDE))
            return NumberKind.Overflow;
        parsed.value = value === 0 ? 0 : value; // -0 and 0 are the same measurement
        return NumberKind.Finite;
    }
    if (text.length <= 9 && NON_FINITE.test(text))
        return NumberKind.NotFinite;
    return NumberKind.Text;
}

;// CONCATENATED MODULE: ./src/data/text-check.ts
/**
 * A pass-through stream that refuses bytes that are not UTF-8 text (invalid sequences,
 * NUL bytes) before the CSV parser sees them, and says where they are: the line as an
 * editor counts it and the field number, tracked with a small quote-aware scan. It also
 * recognises a file whose lines end with CR alone (old Mac style), which the CSV parser
 * would read as one endless header line.
 */

class NotTextError extends Error {
    where;
    constructor(where) {
        super('bytes that are not UTF-8 text');
        this.where = where;
        this.name = 'NotTextError';
    }
}
const QUOTE = 0x22;
const NEWLINE = 0x0a;
const CR = 0x0d;
const HEADER_BYTES_KEPT = 65536;
class TextCheck extends external_node_stream_namespaceObject.Transform {
    delimiter;
    line = 1;
    field = 0;
    inQuotes = false;
    /** Continuation bytes still expected, and the allowed range of the next one. */
    need = 0;
    low = 0x80;
    high = 0xbf;
    /** The bytes of the character being read (its lead byte and the continuation bytes so far). */
    sequence = new Uint8Array(4);
    sequenceLength = 0;
    /** A CR outside quotes on line 1, not yet known to start a CRLF. */
    pendingCR = false;
    headerBytes = [];
    header = null;
    constructor(delimiter) {
        super();
        this.delimiter = delimiter;
    }
    _transform(chunk, _encoding, done) {
        let bad;
        try {
            bad = this.scan(chunk);
        }
        catch (error) {
            done(error); // a bug here must fail the load, not stall the stream
            return;
        }
        if (bad !== null) {
            done(new NotTextError(bad));
            return;
        }
        done(null, chunk);
    }
    _flush(done) {
        if (this.need > 0) {
            done(new NotTextError(this.where('truncated', this.sequenceHex())));
            return;
        }
        if (this.pendingCR) {
            done(new NotTextError(this.where('cr-only', text_check_hex(CR))));
            return;
        }
        done();
    }
    scan(chunk) {
        // Only a one-byte delimiter is followed for field numbers; otherwise fields count as 1.
        const delim = this.delimiter.length === 1 ? this.delimiter.charCodeAt(0) : -1;
        for (let i = 0; i < chunk.length; i++) {
            const b = chunk[i];
            // CR CR LF (a doubled conversion) still ends the line in LF; CR then anything else does not.
            if (this.pendingCR && b !== CR) {
                if (b !== NEWLINE)
                    return this.where('cr-only', text_check_hex(CR));
                this.pendingCR = false;
            }
            if (this.need > 0) {
                // The character started by the lead byte is what is broken, not the byte after it
                // (in a Latin-1 file, `é,` is e9 2c: the e9 is wrong, the comma is fine).
                if (b < this.low || b > this.high)
                    return this.where('invalid', this.sequenceHex(), text_check_hex(b));
                if (this.header === null)
                    this.keepHeaderByte(b);
                this.sequence[this.sequenceLength++] = b;
                this.need--;
                this.low = 0x80;
                this.high = 0xbf;
                continue;
            }
            if (b < 0x80) {
                if (b === 0)
                    return this.where('nul', '0x00');
                if (this.header === null)
                    this.keepHeaderByte(b);
                if (b === CR && this.header === null && !this.inQuotes)
                    this.pendingCR = true;
                if (b === NEWLINE) {
                    this.line++;
                    if (!this.inQuotes)
                        this.field = 0;
                }
                else if (b === QUOTE) {
                    this.inQuotes = !this.inQuotes;
                }
                else if (b === delim && !this.inQuotes) {
                    this.field++;
                }
                continue;
            }
            if (this.header === null)
                this.keepHeaderByte(b);
            this.sequence[0] = b;
            this.sequenceLength = 1;
            // Lead bytes and the ranges their first continuation byte may take (no overlongs,
            // no surrogates, nothing above U+10FFFF): the well-formed table of the Unicode standard.
            if (b >= 0xc2 && b <= 0xdf)
                this.expect(1, 0x80, 0xbf);
            else if (b === 0xe0)
                this.expect(2, 0xa0, 0xbf);
            else if ((b >= 0xe1 && b <= 0xec) || b === 0xee || b === 0xef)
                this.expect(2, 0x80, 0xbf);
            else if (b === 0xed)
                this.expect(2, 0x80, 0x9f);
            else if (b === 0xf0)
                this.expect(3, 0x90, 0xbf);
            else if (b >= 0xf1 && b <= 0xf3)
                this.expect(3, 0x80, 0xbf);
            else if (b === 0xf4)
                this.expect(3, 0x80, 0x8f);
            else
                return this.where('invalid', text_check_hex(b));
        }
        return null;
    }
    expect(need, low, high) {
        this.need = need;
        this.low = low;
        this.high = high;
    }
    sequenceHex() {
        return Array.from(this.sequence.subarray(0, this.sequenceLength), text_check_hex).join(' ');
    }
    /** Keeps the first record's bytes; called before `inQuotes` follows this byte. */
    keepHeaderByte(b) {
        if (b === NEWLINE && !this.inQuotes) {
            this.header = splitHeader(Buffer.from(this.headerBytes).toString('utf8'), this.delimiter);
            this.headerBytes = [];
        }
        else if (this.headerBytes.length < HEADER_BYTES_KEPT) {
            this.headerBytes.push(b);
        }
    }
    where(why, bytes, next = null) {
        return { line: this.line, column: this.field + 1, bytes, next, why, header: this.header ?? [] };
    }
}
function text_check_hex(b) {
    return `0x${b.toString(16).padStart(2, '0')}`;
}
/** Good enough to name a column in a message (quoted names may hold delimiters and line breaks); the CSV parser does the real work. */
function splitHeader(text, delimiter) {
    const names = [];
    let name = '';
    let quoted = false;
    const line = text.replace(/^\uFEFF/, '').replace(/\r$/, '');
    for (let i = 0; i < line.length; i++) {
        const ch = line[i];
        if (ch === '"') {
            if (quoted && line[i + 1] === '"') {
                name += '"';
                i++;
            }
            else
                quoted = !quoted;
        }
        else if (!quoted && line.startsWith(delimiter, i)) {
            names.push(name.trim());
            name = '';
            i += delimiter.length - 1;
        }
        else
            name += ch;
    }
    names.push(name.trim());
    return names;
}

;// CONCATENATED MODULE: ./src/data/where.ts
/** Where in the data file something is, for messages a user can follow in a text editor. */


/** `column 4 "kurtosis"`: both the number an editor shows and the header name. */
function columnLabel(column, name) {
    return name === undefined || name === '' ? `column ${column}` : `column ${column} ${escape_quote(name, 60)}`;
}
/** An error at a line (1-based, as an editor counts) and column (1-based field number). */
function dataError(file, line, column, message, key) {
    const at = column === undefined ? `${file.shown}:${line}` : `${file.shown}:${line}:${column}`;
    return new errors_UserError(`${at}: ${message}`, { file: file.path, line, column, key });
}
/** Quote a value from the file for a message, keeping it short and visible. */
function shownValue(value) {
    return escape_quote(value, 40);
}
/**
 * Most characters in a column name, class label or category (documented in the README's
 * limits). These strings are stored in the model and the baseline and shown on every screen;
 * a longer one is a whole document pasted into a cell, not a name (a practical cap, no source).
 */
const MAX_NAME_LENGTH = 256;
/** Characters (code points) in `s`. */
function characterCount(s) {
    let n = 0;
    for (let i = 0; i < s.length; i++) {
        const c = s.charCodeAt(i);
        if (c < 0xdc00 || c > 0xdfff)
            n++; // a low surrogate completes a character already counted
    }
    return n;
}
/**
 * A problem whose fix belongs in the config (a column name that is not in the header).
 * Thrown where the config position is not at hand; loadData turns it into a UserError
 * at the key's line and column in the config file.
 */
class ConfigKeyProblem extends Error {
    key;
    detail;
    constructor(key, detail) {
        super(`${key}: ${detail}`);
        this.key = key;
        this.detail = detail;
        this.name = 'ConfigKeyProblem';
    }
}

;// CONCATENATED MODULE: ./src/model/score-csv.ts
/**
 * Scores the rows of a CSV file with a model, streaming: the columns the model reads are found
 * by name in the header, every cell is read as the training data were (the same strict numbers,
 * the same standardisation and one-hot encoding), and a cell the model cannot take (a missing
 * column, a value that is not a number, a category it never saw) is an error naming the file,
 * the line and the column. With the target column present, the model's metric on those rows is
 * computed the way the report computes it.
 */











/** Rows encoded and run together (memory stays bounded whatever the file's size). */
const BATCH = 4096;
/** Reads `file` and hands each batch of predictions to `onBatch`, in file order. */
async function scoreCsv(model, file, onBatch, delimiter = ',') {
    const D = model.network.inputs;
    const K = model.network.outputs;
    const features = model.encoding.features;
    const target = model.encoding.target;
    const classes = target.classes ?? [];
    const x = new Float64Array(BATCH * D);
    const truthClass = new Int32Array(BATCH);
    const truthValue = new Float64Array(BATCH);
    let columns = null;
    let targetColumn = null;
    let filled = 0;
    let rows = 0;
    let correct = 0;
    let se = 0;
    let ae = 0;
    let maxAe = 0;
    let nextLine = 1;
    const parsed = { value: 0 };
    const flush = () => {
        if (filled === 0)
            return;
        const out = predict_predict(model.network, x.subarray(0, filled * D), filled);
        const cls = new Int32Array(filled);
        const outputs = new Float64Array(filled * K);
        for (let p = 0; p < filled; p++) {
            if (model.task === 'regression') {
                outputs[p] = out[p] * target.std + target.mean;
            }
            else if (K === 1) {
                outputs[p] = out[p];
                cls[p] = out[p] > 0.5 ? 1 : 0;
            }
            else {
                let best = 0;
                for (let k = 0; k < K; k++) {
                    outputs[p * K + k] = out[p * K + k];
                    if (out[p * K + k] > out[p * K + best])
                        best = k;
                }
                cls[p] = best;
            }
            if (targetColumn !== null) {
                if (model.task === 'classification') {
                    if (cls[p] === truthClass[p])
                        correct++;
                }
                else {
                    const d = Math.abs(outputs[p] - truthValue[p]);
                    se += d * d;
                    ae += d;
                    if (d > maxAe || d !== d)
                        maxAe = d;
                }
            }
        }
        onBatch({ rows: filled, classes: cls, outputs });
        filled = 0;
    };
    const number = (text, line, col) => {
        const kind = classifyNumber(text, parsed);
        if (kind !== NumberKind.Finite) {
            throw dataError(file, line, col.field + 1, `${columnLabel(col.field + 1, col.name)}: expected a finite number, found ${escape_quote(text)}`);
        }
        return parsed.value;
    };
    const onRecord = (record) => {
        const line = nextLine;
        nextLine += 1 + record.reduce((n, v) => n + (v.match(/\n/g)?.length ?? 0), 0);
        if (record.length === 1 && record[0] === '')
            return;
        if (columns === null) {
            const at = new Map(record.map((name, i) => [name, i]));
            columns = features.map((f) => {
                const field = at.get(f.name);
                if (field === undefined) {
                    throw dataError(file, line, undefined, `expected the column ${escape_quote(f.name)} the model reads, found only ${record.map((c) => escape_quote(c, 40)).join(', ')}`);
                }
                return { field, name: f.name };
            });
            const t = at.get(target.name);
            targetColumn = t === undefined ? null : { field: t, name: target.name };
            return;
        }
        const cols = columns;
        let c = filled * D;
        features.forEach((f, i) => {
            const col = cols[i];
            const text = (record[col.field] ?? '').trim();
            if (text === '')
                throw dataError(file, line, col.field + 1, `${columnLabel(col.field + 1, col.name)} is empty; the model needs a value`);
            if (f.kind === 'numeric') {
                x[c++] = standardise(number(text, line, col), f.mean, f.std);
            }
            else {
                const k = f.categories.indexOf(text);
                if (k < 0) {
                    throw dataError(file, line, col.field + 1, `${columnLabel(col.field + 1, col.name)}: the category ${escape_quote(text)} is not one the model was trained on (${f.categories.map((v) => escape_quote(v, 30)).join(', ')})`);
                }
                for (let j = 0; j < f.categories.length; j++)
                    x[c + j] = j === k ? 1 : 0;
                c += f.categories.length;
            }
        });
        if (targetColumn !== null) {
            const col = targetColumn;
            const text = (record[col.field] ?? '').trim();
            if (model.task === 'regression')
                truthValue[filled] = number(text, line, col);
            else {
                let k = classes.indexOf(text);
                // Numeric class labels are kept as the number's shortest text ("1", not "1.0").
                if (k < 0 && classifyNumber(text, parsed) === NumberKind.Finite)
                    k = classes.indexOf(String(parsed.value));
                if (k < 0) {
                    throw dataError(file, line, col.field + 1, `${columnLabel(col.field + 1, col.name)} (the target): the class ${escape_quote(text)} is not one the model knows`);
                }
                truthClass[filled] = k;
            }
        }
        filled++;
        rows++;
        if (filled === BATCH)
            flush();
    };
    const parser = parse({
        delimiter,
        bom: true,
        trim: true,
        skip_empty_lines: false,
        record_delimiter: ['\r\n', '\n'],
        relax_column_count: true,
    });
    const sink = new external_node_stream_namespaceObject.Writable({
        objectMode: true,
        write(record, _encoding, done) {
            try {
                onRecord(record);
            }
            catch (error) {
                done(error);
                return;
            }
            done();
        },
    });
    try {
        await (0,external_node_stream_promises_namespaceObject.pipeline)((0,external_node_fs_namespaceObject.createReadStream)(file.path), new TextCheck(delimiter), parser, sink);
    }
    catch (error) {
        if (error instanceof errors_UserError)
            throw error;
        if (error instanceof NotTextError) {
            throw dataError(file, error.where.line, error.where.column, `expected UTF-8 text, found the byte ${error.where.bytes}; save the file as CSV (UTF-8)`);
        }
        const code = error.code;
        if (code === 'ENOENT')
            throw new errors_UserError(`${file.shown}: the data file does not exist`, { file: file.path });
        if (code === 'EISDIR')
            throw new errors_UserError(`${file.shown}: is a folder; expected a CSV file`, { file: file.path });
        if (typeof code === 'string' && code.startsWith('CSV_')) {
            throw dataError(file, nextLine, undefined, `the row starting on this line cannot be read as CSV: ${error.message}`);
        }
        throw error;
    }
    flush();
    if (columns === null)
        throw dataError(file, 1, 1, 'the file is empty; expected a header row naming the columns');
    if (targetColumn === null || rows === 0)
        return { rows, metric: null };
    const metric = model.target.metric;
    if (metric === 'accuracy')
        return { rows, metric: correct / rows };
    return { rows, metric: metric === 'rmse' ? Math.sqrt(se / rows) : metric === 'mae' ? ae / rows : maxAe };
}

;// CONCATENATED MODULE: ./src/cli/model-commands.ts
/**
 * The commands that work on a model file (written by `check --model` or the action's `model`
 * output): `export` writes firmware source, `predict` scores the rows of a CSV file.
 */












async function readModel(root, path) {
    const file = (0,external_node_path_namespaceObject.resolve)(root, path);
    const shown = displayPath(root, file);
    let text;
    try {
        text = await (0,promises_namespaceObject.readFile)(file, 'utf8');
    }
    catch (e) {
        const code = e.code;
        if (code === 'ENOENT')
            throw new errors_UserError(`${shown}: model file not found`, { file: shown });
        if (code === 'EISDIR')
            throw new errors_UserError(`${shown}: expected a model file, found a folder`, { file: shown });
        throw new errors_UserError(`${shown}: the model file cannot be read (${code ?? 'unknown error'})`, { file: shown });
    }
    return parseModel(text, shown);
}
/** `export MODEL.json --format c --out DIR [--name NAME]`: NAME.h and NAME.c in DIR. */
async function runExport(root, args, flags) {
    if (flags.format !== 'c')
        throw new UsageError(`export: --format: expected c, found ${escape_quote(flags.format ?? '')}`);
    const model = await readModel(root, args[0]);
    if (model.int8 === null) {
        throw new errors_UserError(`${args[0]}: the model has no int8 form (it was written by an older neuron-budget); run check --model again to write one with it`);
    }
    const name = flags.name ?? DEFAULT_C_NAME;
    const dir = (0,external_node_path_namespaceObject.resolve)(root, flags.out ?? '.');
    const info = await (0,promises_namespaceObject.stat)(dir).catch(() => null);
    if (info !== null && !info.isDirectory())
        throw new errors_UserError(`export: --out ${escapeText(displayPath(root, dir))} is not a folder`);
    if (info === null)
        await (0,promises_namespaceObject.mkdir)(dir, { recursive: true });
    const files = exportC({ task: model.task, encoding: model.encoding, network: model.network, int8: model.int8 }, name, {
        toolVersion: model.provenance?.tool.version ?? TOOL_VERSION,
        dataFingerprint: model.provenance?.data ?? 'unknown (a model of version 1)',
        config: model.provenance?.config ?? 'unknown (a model of version 1)',
    });
    await writeOutput((0,external_node_path_namespaceObject.join)(dir, files.headerFile), files.header, 'header', root);
    await writeOutput((0,external_node_path_namespaceObject.join)(dir, files.sourceFile), files.source, 'source', root);
    return `wrote ${escapeText(displayPath(root, (0,external_node_path_namespaceObject.join)(dir, files.headerFile)))} and ${escapeText(displayPath(root, (0,external_node_path_namespaceObject.join)(dir, files.sourceFile)))}`;
}
/** A CSV field: quoted when it holds a delimiter, a quote or a line break. */
function csvField(s) {
    return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}
/**
 * `predict MODEL.json DATA.csv [--out FILE]`: one CSV row per data row, the prediction and then
 * one probability column per class (regression: the predicted value). With the target column in
 * the data, the model's metric on those rows goes to stderr.
 */
async function runPredict(root, args, flags, write) {
    const model = await readModel(root, args[0]);
    const dataPath = (0,external_node_path_namespaceObject.resolve)(root, args[1]);
    const file = { path: dataPath, shown: displayPath(root, dataPath) };
    const labels = model.encoding.target.classes ?? [];
    const K = model.network.outputs;
    const header = model.task === 'regression' ? ['prediction'] : ['prediction', ...labels.map((l) => `p(${l})`)];
    const lines = [header.map(csvField).join(',')];
    const outPath = flags.out === undefined ? null : (0,external_node_path_namespaceObject.resolve)(root, flags.out);
    const emit = (line) => {
        if (outPath === null)
            write(`${line}\n`);
        else
            lines.push(line);
    };
    if (outPath === null)
        write(`${lines[0]}\n`);
    const scored = await scoreCsv(model, file, (batch) => {
        for (let p = 0; p < batch.rows; p++) {
            if (model.task === 'regression') {
                emit(String(batch.outputs[p]));
                continue;
            }
            const probs = K === 1 ? [1 - batch.outputs[p], batch.outputs[p]] : Array.from(batch.outputs.subarray(p * K, p * K + K));
            emit([csvField(labels[batch.classes[p]]), ...probs.map(String)].join(','));
        }
    });
    if (outPath !== null)
        await writeOutput(outPath, `${lines.join('\n')}\n`, 'predictions', root);
    const where = outPath === null ? '' : ` to ${escapeText(displayPath(root, outPath))}`;
    const metric = scored.metric === null ? '' : `; ${model.target.metric} ${formatMetric(scored.metric)} on these rows`;
    return `scored ${scored.rows} rows${where}${metric}`;
}

;// CONCATENATED MODULE: ./src/report/progress.ts
/** Search progress as one plain line, at most one every few seconds, for the step log and for a terminal that is not interactive. */

const PROGRESS_INTERVAL_MS = 5000;
/** One line per event; metrics in the one format every screen uses (formatMetric). */
function progressLine(e) {
    if (e.kind === 'start') {
        return e.phase === 'growth' ? `growth: starting at width ${e.width}` : `prune: starting from width ${e.width}`;
    }
    const best = e.best === null ? 'none yet' : formatMetric(e.best);
    return `${e.phase}: width ${e.width}, restart ${e.restart + 1}, epoch ${e.epoch}, best so far ${best}`;
}
/**
 * Returns a progress handler that prints through `print`, at most once per `intervalMs`
 * (the first event always prints: the search sends one as each phase starts, so a log shows a
 * line at once rather than after the first training). `now` is injectable for tests.
 */
function throttledProgress(print, intervalMs = PROGRESS_INTERVAL_MS, now = Date.now) {
    let last = -Infinity;
    return (e) => {
        const t = now();
        if (t - last < intervalMs)
            return;
        last = t;
        print(progressLine(e));
    };
}

;// CONCATENATED MODULE: ./src/cli/progress.ts
/** Search progress on stderr: one line redrawn in place on a terminal; elsewhere a plain line every few seconds. */


function progressPrinter(stream) {
    if (!stream.isTTY) {
        // The same throttled line the action logs: the first event at once, then one every few seconds.
        const print = throttledProgress((line) => stream.write(`progress: ${line}\n`));
        return { onProgress: print, done: () => undefined };
    }
    let last = 0;
    let drawn = false;
    return {
        onProgress: (e) => {
            const now = performance.now();
            if (now - last < 100)
                return; // display only: at most ten redraws a second
            last = now;
            const best = e.best === null ? '' : ` · best ${formatMetric(e.best)}`;
            const line = e.kind === 'start'
                ? progressLine(e)
                : `${e.phase} · width ${e.width} · restart ${e.restart + 1} · epoch ${e.epoch}${best}`;
            stream.write(`\r\x1b[2K${line}`);
            drawn = true;
        },
        done: () => {
            if (drawn)
                stream.write('\r\x1b[2K');
        },
    };
}

;// CONCATENATED MODULE: ./src/cli/usage.ts
/** The help text of the command line. */


function usage(command) {
    if (command !== null) {
        const spec = COMMANDS[command];
        const lines = [
            `${TOOL_NAME} ${command}: ${spec.summary}`,
            '',
            `usage: ${TOOL_NAME} ${command}${argsText(spec)} [options]`,
            '',
            'options:',
            ...spec.flags.map((f) => `  --${`${f} ${FLAGS[f].value}`.padEnd(16)}${FLAGS[f].help}`),
            '',
            exitCodesText(),
        ];
        return lines.join('\n');
    }
    return [
        `${TOOL_NAME} ${TOOL_VERSION}: finds the smallest hidden-layer width that reaches`,
        'your target, and checks it against a committed baseline and a device budget.',
        '',
        'usage:',
        ...Object.entries(COMMANDS).map(([c, s]) => `  ${TOOL_NAME} ${c.padEnd(9)}${argsText(s)} [options]`),
        `  ${TOOL_NAME} COMMAND --help   options of one command`,
        `  ${TOOL_NAME} --version`,
        '',
        'commands:',
        ...Object.entries(COMMANDS).map(([c, s]) => `  ${c.padEnd(10)}${s.summary}`),
        '',
        'The current folder is the workspace. Paths in the config file resolve against',
        "the config file's folder and must stay inside the workspace.",
        'Messages go to stderr; stdout carries only what was asked for',
        "(--help, --version, baseline's one line, plan's shard list, predict's CSV).",
        '',
        exitCodesText(),
    ].join('\n');
}
function argsText(spec) {
    const rest = spec.rest === undefined ? '' : ` ${spec.rest}...`;
    return `${(spec.positionals ?? []).map((a) => ` ${a}`).join('')}${rest}`;
}
function exitCodesText() {
    return 'exit codes: 0 pass, improved or new; 1 fail or inconclusive; 2 bad input';
}

;// CONCATENATED MODULE: ./src/report/chart.ts
/**
 * Mermaid `xychart-beta` blocks. Only numbers computed by neuron-budget and fixed
 * words written here ever reach a chart, so nothing from the repository can break it;
 * `chartText` still refuses anything outside a small alphabet as a second line of defence.
 *
 * The constructs used: an init directive that sets the series colours, `xychart-beta`, `title "…"`, `x-axis "…" ["…", …]`,
 * `y-axis "…" a --> b`, `line [n, …]`, `bar [n, …]`. Every series has exactly one value
 * per x-axis category: Mermaid draws a missing value as a broken path, so a width with
 * no value is left out of the chart (the table beside it still lists it).
 */

/** Letters, digits, space and . , - + (a width read from a baseline file may print as 1e+21). */
const SAFE_TEXT = /^[A-Za-z0-9 .,+-]*$/;
function chartText(s) {
    if (!SAFE_TEXT.test(s))
        throw new Error(`chart text outside the safe alphabet: ${JSON.stringify(s)}`);
    return `"${s}"`;
}
function chartNumber(n) {
    const s = formatMetric(n);
    if (!/^-?\d+(\.\d+)?$/.test(s))
        throw new Error(`not a chart number: ${n}`);
    return s;
}
/** Colours readable on GitHub's light and dark themes. */
const CHART_COLORS = { baseline: '#8c959f', current: '#0969da', limit: '#cf222e' };
function renderChart(spec) {
    for (const s of spec.series) {
        if (s.values.length !== spec.categories.length) {
            throw new Error('every chart series needs one value per category');
        }
    }
    for (const s of spec.series) {
        if (!/^#[0-9a-f]{6}$/.test(s.color))
            throw new Error(`not a chart colour: ${JSON.stringify(s.color)}`);
    }
    const palette = spec.series.map((s) => s.color).join(',');
    const lines = [
        '```mermaid',
        `%%{init: {"themeVariables": {"xyChart": {"plotColorPalette": "${palette}"}}}}%%`,
        'xychart-beta',
        `  title ${chartText(spec.title)}`,
        `  x-axis ${chartText(spec.xTitle)} [${spec.categories.map(chartText).join(', ')}]`,
        `  y-axis ${chartText(spec.yTitle)} ${chartNumber(spec.yRange[0])} --> ${chartNumber(spec.yRange[1])}`,
        ...spec.series.map((s) => `  ${s.kind} [${s.values.map(chartNumber).join(', ')}]`),
        '```',
    ];
    return lines.join('\n');
}
/*
 * The ranges below take values read from a baseline file, which may be any finite number:
 * every step that could overflow (a margin on top of 1.7e308) stops at the largest float, so
 * an axis end is always a finite number.
 */
/** A y-axis range that shows every value and the threshold with a little room. */
function metricRange(values, threshold, accuracy) {
    const all = [...values, threshold].filter(Number.isFinite);
    if (accuracy) {
        const low = Math.min(...all);
        // Keep the axis from collapsing when every value is 1.
        return [Math.min(0.9, Math.max(0, Math.floor(low * 10) / 10)), 1];
    }
    const high = Math.max(...all, 0);
    return [0, niceCeil(chart_finite(high * 1.1))];
}
function countRange(values) {
    const high = Math.max(1, ...values.filter(Number.isFinite));
    return [0, chart_finite(Math.ceil(chart_finite(high * 1.15)) + 1)];
}
function niceCeil(x) {
    if (x <= 0)
        return 1;
    const step = 10 ** Math.floor(Math.log10(x));
    return chart_finite(Math.ceil(x / step) * step);
}
/** x, or the largest float when x overflowed. */
function chart_finite(x) {
    return Math.min(x, Number.MAX_VALUE);
}

;// CONCATENATED MODULE: ./src/report/view.ts
const VERDICT_LABEL = {
    pass: 'PASS',
    fail: 'FAIL',
    improved: 'IMPROVED',
    new: 'NEW',
    inconclusive: 'INCONCLUSIVE',
};
function viewOf(report) {
    const widths = report.search?.widths ?? [];
    const at = report.width === null ? undefined : widths.find((w) => w.width === report.width);
    const b = report.baseline;
    const byWidth = new Map();
    for (const w of widths)
        byWidth.set(w.width, { width: w.width, current: w, baseline: null });
    for (const w of b?.widths ?? []) {
        const row = byWidth.get(w.width) ?? { width: w.width, current: null, baseline: null };
        row.baseline = w;
        byWidth.set(w.width, row);
    }
    const grown = report.search?.grownWidth ?? null;
    const searchSeconds = report.timing['searchSeconds'];
    return {
        verdict: report.verdict,
        headline: report.reasons[0] ?? '',
        otherReasons: report.reasons.slice(1),
        metricName: report.metric.name,
        threshold: report.metric.threshold,
        current: {
            width: report.width,
            metric: report.metric.value,
            met: at ? at.met : null,
            restarts: at ? at.restarts : null,
            rows: report.data.rows,
            searchSeconds: typeof searchSeconds === 'number' ? searchSeconds : null,
        },
        baseline: b
            ? {
                width: b.width,
                metric: b.metric,
                met: b.met ?? null,
                restarts: b.restarts ?? null,
                rows: b.rows ?? null,
                searchSeconds: b.searchSeconds ?? null,
            }
            : null,
        prunedFrom: grown !== null && report.width !== null && grown !== report.width ? grown : null,
        backing: at ? backingSentence(at, report) : null,
        rows: [...byWidth.values()].sort((x, y) => x.width - y.width),
        history: b?.history ?? [],
        baselineFile: report.gate?.baselineFile ?? b?.file ?? null,
    };
}
/**
 * "5 networks of width 7 met the target on the judging rows (2 of 10 fresh restarts, 3 pruned from
 * wider networks); 3 are required." One definition of the backing, shown by every screen.
 */
function backingSentence(w, report) {
    const judging = report.search?.judging.on ?? 'judging';
    const rows = judging === 'judging' ? 'the judging rows' : `the ${judging} rows`;
    const parts = [];
    if (w.restarts > 0)
        parts.push(`${w.metBy.fresh} of ${w.restarts} fresh restart${w.restarts === 1 ? '' : 's'}`);
    if (w.metBy.pruned > 0)
        parts.push(`${w.metBy.pruned} pruned from wider networks`);
    const required = report.search?.required ?? null;
    const need = required === null ? '' : `; ${required} ${required === 1 ? 'is' : 'are'} required`;
    const networks = w.met === 1 ? '1 network' : `${w.met} networks`;
    return `${networks} of width ${w.width} met the target on ${rows} (${parts.join(', ')})${need}.`;
}
/** A baseline width's decisive metric, or its best in files that lack it when one network suffices. */
function baselineDecisive(w, required) {
    if (w.decisive !== undefined)
        return w.decisive;
    return required === 1 ? w.best : null;
}

;// CONCATENATED MODULE: ./src/report/words.ts


/** "best", "2nd best", "3rd best", "4th best". */
function nthBest(n) {
    if (n <= 1)
        return 'best';
    const tens = n % 100;
    const suffix = tens >= 11 && tens <= 13 ? 'th' : (['th', 'st', 'nd', 'rd'][n % 10] ?? 'th');
    return `${n}${suffix} best`;
}
/** "on 539 judging rows" (or validation/training rows when those judged). */
function judgingRowsPhrase(report) {
    const j = report.search?.judging;
    if (!j)
        return '';
    return `on ${formatCount(j.rows)} ${j.on} rows`;
}
/** The first answer: how many neurons the data need now, and what the witness scores. */
function needsSentence(report) {
    const base = report.baseline?.width ?? null;
    const target = targetPhrase(report.metric.name, report.metric.threshold);
    if (report.width === null) {
        const why = report.search?.outcome === 'inconclusive'
            ? 'not settled: the search stopped before it could decide'
            : `no width in the search range is adequate (${report.search?.required ?? 1} of its networks meeting ${target})`;
        return `${capitalise(why)}${base === null ? '' : `; the baseline needed ${neurons(base)}`}.`;
    }
    const was = base === null
        ? ''
        : base === report.width
            ? ', as the baseline did'
            : ` (the baseline needed ${formatCount(base)})`;
    const parts = [`${neurons(report.width)}${was}.`];
    const value = report.metric.value;
    if (value !== null) {
        const int8 = report.device?.metric.int8 ?? null;
        const decides = report.device?.precision ?? 'float32';
        const forms = int8 === null
            ? ''
            : decides === 'int8'
                ? ` in the int8 form that decides (float32 ${formatMetric(report.device.metric.float32)})`
                : `; int8 form ${formatMetric(int8)}`;
        const bound = `${higherIsBetter(report.metric.name) ? 'at least' : 'at most'} ${formatMetric(report.metric.threshold)}`;
        parts.push(`The witness scores ${report.metric.name} ${formatMetric(value)} ${judgingRowsPhrase(report)} (target: ${bound})${forms}.`);
    }
    return parts.join(' ');
}
/** The spread of a regression target, so "rmse ≤ 6" can be read against its scale; null otherwise. */
function targetSpreadSentence(report) {
    const s = report.data.targetSpread;
    if (!s || report.data.task !== 'regression')
        return null;
    return `The target column has mean ${formatMetric(s.mean)}, standard deviation ${formatMetric(s.std)}, range ${formatMetric(s.min)} to ${formatMetric(s.max)}.`;
}
/** Every data change, most important first within the fixed order a reader expects. */
function changeItems(ch, esc) {
    const items = [];
    if (ch.file)
        items.push({ weight: 2, text: `Data file ${esc(ch.file.before)} → ${esc(ch.file.after)}.` });
    if (!ch.changed) {
        items.push({ weight: 0, text: "Same data as the baseline's (same fingerprint)." });
        return items;
    }
    const r = ch.rows;
    const rowShare = r.before > 0 ? Math.abs(r.after - r.before) / r.before : 1;
    items.push({
        weight: rowShare >= 0.5 ? 5 : rowShare >= 0.05 ? 3 : 1,
        text: `Rows ${formatCount(r.before)} → ${formatCount(r.after)} (${formatDelta(r.after - r.before)}).`,
    });
    for (const label of ch.classesAppeared)
        items.push({ weight: 6, text: `New class ${esc(label)}.` });
    for (const label of ch.classesVanished)
        items.push({ weight: 6, text: `Class ${esc(label)} no longer appears.` });
    for (const c of ch.classes ?? []) {
        if (c.before === c.after || c.before === 0 || c.after === 0)
            continue;
        // What matters is the class's share of the rows, not its count: all classes growing together is one change.
        const moved = r.before > 0 && r.after > 0 ? Math.abs(c.after / r.after - c.before / r.before) : 1;
        items.push({
            weight: moved >= 0.05 ? 4 : 1,
            text: `Class ${esc(c.label)}: ${formatCount(c.before)} → ${formatCount(c.after)} rows (${formatDelta(c.after - c.before)}${share(c, r)}).`,
        });
    }
    for (const name of ch.columnsAdded)
        items.push({ weight: 5, text: `Column added: ${esc(name)}.` });
    for (const name of ch.columnsRemoved)
        items.push({ weight: 5, text: `Column removed: ${esc(name)}.` });
    for (const f of ch.features) {
        const parts = [];
        if (f.meanMoved) {
            const by = f.shiftInStd === null ? '' : ` (${f.shiftInStd.toFixed(1)} standard deviations)`;
            parts.push(`mean ${formatMetric(f.meanBefore)} → ${formatMetric(f.meanAfter)}${by}`);
        }
        if (f.rangeWidened) {
            const g = f.rangeGrowth;
            const sides = [];
            if (g.below > 0)
                sides.push(`${formatMetric(g.below)} lower${inStd(g.belowInStd)}`);
            if (g.above > 0)
                sides.push(`${formatMetric(g.above)} higher${inStd(g.aboveInStd)}`);
            parts.push(`range ${formatMetric(f.rangeBefore[0])} to ${formatMetric(f.rangeBefore[1])} widened to ${formatMetric(f.rangeAfter[0])} to ${formatMetric(f.rangeAfter[1])} (${sides.join(', ')})`);
        }
        if (parts.length === 0)
            continue;
        items.push({
            weight: f.meanMoved ? 2 + Math.min(3, 1.5 * (f.shiftInStd ?? 0)) : 2,
            text: `Feature ${esc(f.name)}: ${parts.join('; ')}.`,
        });
    }
    for (const c of ch.categories) {
        if (c.appeared.length > 0)
            items.push({
                weight: 4,
                text: `Feature ${esc(c.feature)}: new categories ${c.appeared.map((s) => esc(s)).join(', ')}.`,
            });
        if (c.vanished.length > 0)
            items.push({
                weight: 3,
                text: `Feature ${esc(c.feature)}: categories gone ${c.vanished.map((s) => esc(s)).join(', ')}.`,
            });
    }
    return items;
}
/** "; 39% → 31% of the rows", when both row counts are known. */
function share(c, rows) {
    if (rows.before <= 0 || rows.after <= 0)
        return '';
    const pct = (n, of) => `${Math.round((100 * n) / of)}%`;
    return `; ${pct(c.before, rows.before)} → ${pct(c.after, rows.after)} of the rows`;
}
/** " (1.2 standard deviations)" or nothing when the baseline's deviation was 0. */
function inStd(v) {
    return v === null ? '' : `, ${v.toFixed(1)} standard deviations`;
}
/** Most changes the "why it changed" answer names; the evidence lists them all. */
const WHY_ITEMS = 3;
/** The third answer: why the width changed, from the settings and the data, most important first. */
function whySentence(report, esc) {
    const b = report.baseline;
    if (b === null)
        return `No baseline to compare with: this is the first measurement of this data (${formatCount(report.data.rows)} rows).`;
    const settings = b.settingsChanged ?? [];
    const lead = settings.length > 0 ? `Settings changed: ${settings.map((s) => esc(s)).join('; ')}. ` : '';
    const ch = report.changes;
    if (ch === null)
        return `${lead}`.trim();
    if (!ch.changed) {
        return settings.length > 0
            ? `${lead}The data are the same as the baseline's.`
            : "Nothing changed: the same data and settings as the baseline's.";
    }
    const items = changeItems(ch, esc)
        .map((item, order) => ({ ...item, order }))
        .sort((x, y) => y.weight - x.weight || x.order - y.order);
    const shown = items.slice(0, WHY_ITEMS).map((i) => i.text);
    const more = items.length - shown.length;
    const tail = more > 0 ? ` And ${more} more change${more === 1 ? '' : 's'} in the details.` : '';
    const quiet = items.every((i) => i.weight <= 1) ? ' No class, column or feature moved beyond the thresholds.' : '';
    return `${lead}${shown.join(' ')}${quiet}${tail}`;
}
/** "Tried 14 removals on 3 networks: 3 removed, 11 put back; the witness was pruned from 8 to 7." */
function pruningSentence(report) {
    const steps = report.search?.pruning ?? [];
    if (steps.length === 0)
        return null;
    const networks = new Set(steps.map((s) => `${s.source.width}/${s.source.restart}`)).size;
    const removed = steps.filter((s) => s.accepted).length;
    const w = report.search?.witness ?? null;
    const witness = w !== null && w.how === 'pruned' && w.source.width !== w.width
        ? `; the witness was pruned from ${w.source.width} to ${w.width} neurons`
        : '';
    return `Tried ${steps.length} removal${steps.length === 1 ? '' : 's'} on ${networks} network${networks === 1 ? '' : 's'}: ${removed} removed, ${steps.length - removed} put back${witness}.`;
}
/** "45 trainings in 9.40 s (growth 8.10 s, pruning 1.30 s)": what the search cost this run. */
function searchCostSentence(report) {
    const s = report.search;
    if (!s)
        return null;
    const t = report.timing;
    const split = typeof t['growthSeconds'] === 'number' && typeof t['pruneSeconds'] === 'number'
        ? ` (growth ${formatSeconds(t['growthSeconds'])}, pruning ${formatSeconds(t['pruneSeconds'])})`
        : '';
    const walk = s.start === undefined ? '' : ` ${s.start.summary}`;
    return `The search ran ${formatCount(s.trainings)} training${s.trainings === 1 ? '' : 's'} in ${formatSeconds(t['searchSeconds'])}${split}.${walk}`;
}
/** Whether this run's result is already the baseline (nothing to accept). */
function baselineIsCurrent(report) {
    const b = report.baseline;
    return (b !== null &&
        b.width === report.width &&
        b.sameSettings !== false &&
        report.changes !== null &&
        !report.changes.changed &&
        report.changes.file === null);
}
/** What to do next, fitting the run: what was written, and the command the user would type. */
function hints(report, context, esc, code) {
    const out = [];
    const config = context.configShown === null ? '' : ` --config ${esc(context.configShown)}`;
    const file = esc(context.baselineFile ?? report.gate?.baselineFile ?? report.baseline?.file ?? 'the baseline file');
    const written = context.baseline;
    if (written !== null && 'file' in written) {
        out.push(`Baseline written: ${esc(written.file)}, width ${written.width}, ${written.historyEntries} history entr${written.historyEntries === 1 ? 'y' : 'ies'}. Commit it to make it the baseline.`);
    }
    else if (written !== null) {
        out.push(`Baseline not written: ${esc(written.notWritten, 400)}.`);
    }
    else if (report.width !== null && report.verdict !== 'inconclusive' && !baselineIsCurrent(report)) {
        const command = code(`neuron-budget baseline${config}`);
        const action = code('update-baseline: true');
        const lead = report.verdict === 'new'
            ? 'To record this result as the baseline'
            : 'If this change is intended, accept it as the new baseline';
        out.push(context.surface === 'action'
            ? `${lead}: run the action with ${action}, or run ${command} and commit ${file}.`
            : `${lead}: run ${command} and commit ${file}.`);
    }
    const budget = report.gate?.maxWidth ?? null;
    if (budget !== null && report.width !== null && report.width > budget) {
        out.push(`A new baseline does not lift the device budget: this check fails until the width fits it or ${code('gate.max-width')} is raised.`);
    }
    return out;
}
const SIGN_OFF = 'A passing gate is not a safety sign-off for a device.';
function capitalise(s) {
    return s.length > 0 ? s[0].toUpperCase() + s.slice(1) : s;
}

;// CONCATENATED MODULE: ./src/report/charts.ts
/**
 * The two charts, one per question, as chart specs with the sentence that reads them.
 *
 * Metric by width: one chart holds the baseline and this change, each width a pair of
 * categories ("b7" the baseline, "7" this change), because Mermaid draws two bar series at the
 * same place over each other. A side that did not decide a width has a bar of the axis minimum
 * there, i.e. none. The bar is the `required`-th best judged metric, so a bar reaches the
 * threshold line exactly when the width is adequate (recall floors aside). A category without
 * bars at each end (the widths just outside the range shown; the first is blank when that would be
 * 0) carries the threshold line past the outer bars, so it shows even with one width. Mermaid's
 * band axis merges equal labels, so every category is distinct.
 */





/** Most widths the metric chart shows; longer curves keep the widest (where the answer lies). */
const CHART_MAX_WIDTHS = 15;
/** Most baselines the drift chart shows. */
const DRIFT_MAX_POINTS = 30;
function metricChart(view, report) {
    const required = report.search?.required ?? 1;
    const rows = view.rows.slice(-CHART_MAX_WIDTHS);
    const pairs = view.baseline !== null;
    const now = rows.map((r) => r.current?.decisive ?? null);
    const base = rows.map((r) => (r.baseline ? baselineDecisive(r.baseline, required) : null));
    const values = [...now, ...base].filter((v) => v !== null && Number.isFinite(v));
    if (values.length === 0)
        return null;
    const accuracy = higherIsBetter(view.metricName);
    const range = metricRange(values, view.threshold, accuracy);
    // Mermaid draws a bar of the axis minimum as a stub a few pixels high; one below it draws nothing.
    const floor = range[0] - (range[1] - range[0]);
    const first = rows[0].width - 1;
    const categories = [first > 0 ? String(first) : ' '];
    const nowBars = [floor];
    const baseBars = [floor];
    rows.forEach((r, i) => {
        if (pairs) {
            categories.push(`b${r.width}${r.width === view.baseline?.width ? ' min' : ''}`);
            baseBars.push(base[i] ?? floor);
            nowBars.push(floor);
        }
        categories.push(`${r.width}${r.width === view.current.width ? ' min' : ''}`);
        nowBars.push(now[i] ?? floor);
        baseBars.push(floor);
    });
    categories.push(String(rows[rows.length - 1].width + 1));
    nowBars.push(floor);
    baseBars.push(floor);
    const which = nthBest(required);
    const side = accuracy ? 'at or above' : 'at or below';
    const legend = [
        `Bars: the ${which} ${view.metricName} of the networks at each width, so a bar ${side} the line means the width is adequate (${required} network${required === 1 ? '' : 's'} met the target).`,
        pairs ? 'Each width has two places: grey "b" and the width is the baseline, blue the width alone this change.' : '',
        `"min" marks the smallest adequate width${pairs ? ' of each' : ''}. Red line: the threshold ${formatMetric(view.threshold)}.`,
        `The y-axis runs from ${formatMetric(range[0])} to ${formatMetric(range[1])}${range[0] === 0 ? '' : ', not from 0'}; the numbers are in the table.`,
    ]
        .filter((s) => s !== '')
        .join(' ');
    return {
        spec: {
            title: `${view.metricName} by hidden neurons`,
            xTitle: 'hidden neurons',
            categories,
            yTitle: view.metricName,
            yRange: range,
            series: [
                ...(pairs ? [{ kind: 'bar', values: baseBars, color: CHART_COLORS.baseline }] : []),
                { kind: 'bar', values: nowBars, color: CHART_COLORS.current },
                { kind: 'line', values: categories.map(() => view.threshold), color: CHART_COLORS.limit },
            ],
        },
        legend,
        widths: rows.map((r) => r.width),
    };
}
/** Capacity drift: the width of each accepted baseline, then this change, against the neuron budget. */
function driftChart(view, budget) {
    if (view.history.length === 0)
        return null;
    const history = view.history.slice(-DRIFT_MAX_POINTS);
    const first = view.history.length - history.length;
    // A blank first and a "later" last category carry the budget line past the outer bars.
    const categories = [' ', ...history.map((_, i) => String(first + i + 1))];
    const widths = [0, ...history.map((h) => h.width)];
    if (view.current.width !== null) {
        categories.push('now');
        widths.push(view.current.width);
    }
    categories.push('later');
    widths.push(0);
    const legend = `Bars: the smallest adequate width of each accepted baseline, oldest first (numbered as in the history table)${view.current.width !== null ? ', then this change' : ''}.` +
        (budget === null
            ? ' No neuron budget is set (gate.max-width).'
            : ` Red line: the device budget of ${budget} hidden neurons.`);
    return {
        spec: {
            title: 'Smallest adequate width over time',
            xTitle: 'accepted baseline',
            categories,
            yTitle: 'hidden neurons',
            yRange: countRange(budget === null ? widths : [...widths, budget]),
            series: [
                { kind: 'bar', values: widths, color: CHART_COLORS.current },
                ...(budget === null
                    ? []
                    : [{ kind: 'line', values: categories.map(() => budget), color: CHART_COLORS.limit }]),
            ],
        },
        legend,
        widths: [],
    };
}

;// CONCATENATED MODULE: ./src/report/context.ts
const DEFAULT_CONTEXT = {
    surface: 'cli',
    mode: 'check',
    configShown: null,
    baselineFile: null,
    baseline: null,
};

;// CONCATENATED MODULE: ./src/report/evidence.ts
/**
 * The comment's evidence, collapsed under the three answers: the per-width ladder, per-class
 * figures, the baseline history, the pruning steps and every data change (Markdown tables).
 */




function collapsible(summary, body) {
    // The blank line after </summary> lets GitHub render the Markdown inside.
    return `<details><summary>${summary}</summary>\n\n${body}\n\n</details>`;
}
function num(v) {
    return v === null || v === undefined || !Number.isFinite(v) ? '—' : formatMetric(v);
}
/** "4 of 10 + 1 pruned": networks that met the target, by source. */
function metCell(w) {
    const fresh = `${w.metBy.fresh} of ${w.restarts}`;
    return w.metBy.pruned > 0 ? `${fresh} + ${w.metBy.pruned} pruned` : fresh;
}
function ladderSection(view, report, limits, mustShow) {
    const required = report.search?.required ?? 1;
    const which = nthBest(required);
    const hasBaseline = view.baseline !== null;
    const header = [
        'Width',
        'Met the target',
        `${capitalise(which)}`,
        'Best',
        'Adequate',
        ...(hasBaseline ? ['Baseline: met', `Baseline: ${which}`] : []),
    ];
    const keep = pickRows(view.rows, limits.widthRows, (r) => mustShow.has(r.width) || r.width === view.current.width);
    const lines = keep.kept.map((r) => {
        const c = r.current;
        const marked = r.width === view.current.width || r.width === view.baseline?.width;
        const cells = [
            marked ? `**${r.width}**` : String(r.width),
            c ? metCell(c) : 'not decided',
            num(c?.decisive),
            num(c?.best),
            c ? (c.adequate ? 'yes' : 'no') : '—',
        ];
        if (hasBaseline)
            cells.push(r.baseline ? String(r.baseline.met) : '—', num(r.baseline ? baselineDecisive(r.baseline, required) : null));
        return `| ${cells.join(' | ')} |`;
    });
    const align = header.map((_, i) => (i === 1 ? ':--' : '--:'));
    const omitted = keep.omitted > 0 ? `\n\n_${keep.omitted} more widths left out for length; the JSON report lists them all._` : '';
    const bold = view.current.width !== null || view.baseline?.width != null
        ? ' Bold: the smallest adequate width of this change and of the baseline.'
        : '';
    return (`| ${header.join(' | ')} |\n|${align.join('|')}|\n${lines.join('\n')}${omitted}\n\n` +
        `Met the target: fresh restarts at that width that met it, of those run, plus networks pruned down to it. ` +
        `A width is adequate when ${required} network${required === 1 ? '' : 's'} of it met the target, so the ${which} figure decides.${bold}` +
        (searchCostSentence(report) === null ? '' : ` ${searchCostSentence(report)}`));
}
function classSection(report) {
    const d = report.device;
    if (d === null || d.classes === null)
        return null;
    const floors = d.classes.some((c) => c.floor !== null);
    const head = `| Class | Rows | Recall | Precision${floors ? ' | Recall floor' : ''} |\n|:--|--:|--:|--:|${floors ? '--:|' : ''}`;
    const lines = d.classes.map((c) => `| ${escapeMarkdown(c.label)} | ${formatCount(c.rows)} | ${num(c.recall)} | ${num(c.precision)}${floors ? ` | ${num(c.floor)}` : ''} |`);
    const parts = [`In the ${d.precision} form that decides.`, `${head}\n${lines.join('\n')}`];
    if (d.confusion !== null) {
        const labels = d.classes.map((c) => escapeMarkdown(c.label, 40));
        const ch = `| True class ↓ predicted → | ${labels.join(' | ')} |\n|:--|${labels.map(() => '--:').join('|')}|`;
        const rows = d.confusion.map((row, i) => `| ${labels[i]} | ${row.map((n) => formatCount(n)).join(' | ')} |`);
        parts.push(`${ch}\n${rows.join('\n')}`);
    }
    return parts.join('\n\n');
}
function historySection(history, limits) {
    const start = Math.max(0, history.length - limits.historyRows);
    const lines = history.slice(start).map((h, i) => {
        const commit = h.commit === null ? '—' : escapeMarkdown(h.commit.slice(0, 12));
        return `| ${start + i + 1} | ${escapeMarkdown(h.date.slice(0, 10))} | ${commit} | ${formatCount(h.rows)} | ${h.width} | ${num(h.metric)} |`;
    });
    const omitted = start > 0 ? `\n\n_The ${start} oldest entries are left out for length._` : '';
    return `| # | Date | Commit | Rows | Width | Metric |\n|--:|:--|:--|--:|--:|--:|\n${lines.join('\n')}${omitted}`;
}
function pruneSection(report, limits) {
    const steps = report.search?.pruning ?? [];
    const summary = pruningSentence(report);
    if (summary === null)
        return null;
    if (limits.pruneRows === 0)
        return `${summary}\n\n_The steps are left out for length; the JSON report lists them._`;
    const shown = steps.slice(0, limits.pruneRows);
    const lines = shown.map((s) => `| ${s.source.width} | ${s.source.restart} | ${s.width} | ${s.neuron} | ${num(s.steeringBefore)} | ${num(s.steeringAfter)} | ${s.accepted ? 'removed' : 'put back'} |`);
    const omitted = steps.length > shown.length ? `\n\n_${steps.length - shown.length} more steps left out for length._` : '';
    return (`${summary}\n\n| Grown width | Restart | Width before | Neuron index | Steering before | Steering after | Outcome |\n|--:|--:|--:|--:|--:|--:|:--|\n${lines.join('\n')}${omitted}\n\n` +
        'Neuron index counts from 0, as in the JSON report and the model file. A neuron is put back when the network without it no longer meets the target on the steering rows.');
}
function changesSection(changes, limits) {
    const items = changeItems(changes, escapeMarkdown).map((i) => i.text);
    const shown = items.slice(0, limits.changeItems);
    const omitted = items.length > shown.length ? `\n\n_${items.length - shown.length} more changes left out for length._` : '';
    return `${shown.map((s) => `- ${s}`).join('\n')}${omitted}\n\nA feature is listed when its mean moved by more than half a baseline standard deviation, or its range grew on a side by more than half a baseline standard deviation.`;
}
function pickRows(rows, max, must) {
    if (rows.length <= max)
        return { kept: rows, omitted: 0 };
    let room = Math.max(0, max - rows.filter(must).length);
    const kept = rows.filter((r) => {
        if (must(r))
            return true;
        if (room > 0) {
            room--;
            return true;
        }
        return false;
    });
    return { kept, omitted: rows.length - kept.length };
}

;// CONCATENATED MODULE: ./src/report/ledger.ts

/** The ledger, or null when there is no width to cost. */
function ledgerOf(report) {
    // A network's cost depends on its width alone (for these inputs and outputs): the width's entry holds it.
    const costAt = (width) => report.search?.widths.find((w) => w.width === width)?.cost ?? null;
    if (report.width === null)
        return null;
    const c = report.device?.cost ?? costAt(report.width);
    if (c === null)
        return null;
    const p = report.device?.precision ?? 'float32';
    const other = p === 'int8' ? 'float32' : 'int8';
    const g = report.gate ?? null;
    const baselineWidth = report.baseline?.width ?? null;
    const base = baselineWidth === null ? null : costAt(baselineWidth);
    return {
        precision: p,
        baselineWidth,
        rows: [
            { label: 'hidden neurons', unit: '', now: report.width, budget: g?.maxWidth ?? null, atBaseline: baselineWidth },
            {
                label: `flash, ${p}`,
                unit: ' B',
                now: c.flashBytes[p],
                budget: g?.maxFlashBytes ?? null,
                atBaseline: base?.flashBytes[p] ?? null,
            },
            {
                label: `flash, ${other}`,
                unit: ' B',
                now: c.flashBytes[other],
                budget: null,
                atBaseline: base?.flashBytes[other] ?? null,
            },
            {
                label: `RAM, ${p}`,
                unit: ' B',
                now: c.ramBytes[p],
                budget: g?.maxRamBytes ?? null,
                atBaseline: base?.ramBytes[p] ?? null,
            },
            {
                label: `RAM, ${other}`,
                unit: ' B',
                now: c.ramBytes[other],
                budget: null,
                atBaseline: base?.ramBytes[other] ?? null,
            },
            {
                label: 'multiply-accumulates',
                unit: '',
                now: c.macs,
                budget: g?.maxMacs ?? null,
                atBaseline: base?.macs ?? null,
            },
        ],
    };
}
function amount(n, unit) {
    return `${formatCount(n)}${unit}`;
}
/** "5 (over by 2)" / "600 B (fits, 77 B spare)" / "none set". */
function budgetCell(row) {
    if (row.budget === null)
        return 'none set';
    const gap = row.now - row.budget;
    return gap > 0
        ? `${amount(row.budget, row.unit)} (over by ${amount(gap, row.unit)})`
        : `${amount(row.budget, row.unit)} (fits, ${amount(-gap, row.unit)} spare)`;
}
/** The second answer: does the width found fit the device? */
function fitsSentence(ledger) {
    if (ledger === null)
        return 'Nothing to cost: no width is adequate.';
    const budgeted = ledger.rows.filter((r) => r.budget !== null);
    if (budgeted.length === 0) {
        return 'No device budget is set, so nothing is gated; the ledger shows what the network costs. Set gate.max-width, gate.max-flash-bytes, gate.max-ram-bytes or gate.max-macs to gate on it.';
    }
    const over = budgeted.filter((r) => r.now > r.budget);
    if (over.length > 0)
        return `No: ${over.map((r) => `${excess(r)} over the budget of ${amount(r.budget, r.unit)}`).join('; ')}.`;
    return `Yes, within every budget set: ${budgeted.map((r) => `${r.label} ${amount(r.now, r.unit)} of ${amount(r.budget, r.unit)}`).join(', ')}.`;
}
/** "2 hidden neurons" / "123 B of flash, int8" / "12 multiply-accumulates". */
function excess(r) {
    const gap = r.now - r.budget;
    if (r.label === 'hidden neurons')
        return neurons(gap);
    return r.unit === '' ? `${formatCount(gap)} ${r.label}` : `${amount(gap, r.unit)} of ${r.label}`;
}

;// CONCATENATED MODULE: ./src/report/markdown.ts
/**
 * The pull-request comment and job summary (GitHub-flavoured Markdown), laid out around the
 * reviewer's three questions: how many neurons does the data need now, does that fit the
 * device, and why did it change. The verdict and the three answers come first; the evidence
 * (metric by width, per class, capacity drift, pruning, every data change) follows collapsed.
 * Every string from the repository passes through escapeMarkdown. When the comment would
 * exceed the limit, only the evidence is shortened.
 */









/** GitHub refuses comments longer than 65,536 characters; leave room for the shell's hidden marker. */
const COMMENT_LIMIT = 65_000;
const DETAIL_LEVELS = [
    { widthRows: Infinity, historyRows: Infinity, pruneRows: Infinity, changeItems: Infinity },
    { widthRows: 200, historyRows: 100, pruneRows: 60, changeItems: 100 },
    { widthRows: 80, historyRows: 40, pruneRows: 20, changeItems: 40 },
    { widthRows: 0, historyRows: 12, pruneRows: 0, changeItems: 12 },
];
const code = (s) => `\`${s}\``;
function renderMarkdown(report, options = {}) {
    const limit = options.limit ?? COMMENT_LIMIT;
    const context = options.context ?? DEFAULT_CONTEXT;
    const view = viewOf(report);
    const head = [headline(view), answers(view, report)].join('\n\n');
    const foot = footer(report, context);
    for (const level of DETAIL_LEVELS) {
        const body = [head, evidence(view, report, level), foot].filter((s) => s !== '').join('\n\n');
        if (body.length + 1 <= limit)
            return `${body}\n`;
    }
    const note = "_The evidence was left out to keep this comment within GitHub's size limit; the JSON report has it all._";
    return `${[head, note, foot].join('\n\n')}\n`;
}
function headline(view) {
    const lines = [`### neuron-budget: ${VERDICT_LABEL[view.verdict]}. ${escapeMarkdown(view.headline, MAX_MESSAGE)}`];
    if (view.otherReasons.length > 0) {
        lines.push('');
        for (const r of view.otherReasons)
            lines.push(`- ${escapeMarkdown(r, MAX_MESSAGE)}`);
    }
    return lines.join('\n');
}
/** The three answers, each led by its question's word in bold. */
function answers(view, report) {
    const needs = [needsSentence(report), view.backing, targetSpreadSentence(report)].filter((s) => s !== null);
    const ledger = ledgerOf(report);
    const parts = [
        `**Needs:** ${escapeMarkdown(needs.join(' '), 2 * MAX_MESSAGE)}`,
        `**Fits the device:** ${escapeMarkdown(fitsSentence(ledger), MAX_MESSAGE)}`,
    ];
    if (ledger !== null)
        parts.push(ledgerTable(ledger));
    parts.push(`**Why it changed:** ${whySentence(report, escapeMarkdown)}`);
    return parts.join('\n\n');
}
function ledgerTable(ledger) {
    const base = ledger.baselineWidth;
    const head = base === null
        ? '| On the device | Needs now | Budget |\n|:--|--:|--:|'
        : `| On the device | Needs now | Budget | At the baseline's ${base} |\n|:--|--:|--:|--:|`;
    const lines = ledger.rows.map((r) => {
        const cells = [r.label, `**${amount(r.now, r.unit)}**`, budgetCell(r)];
        if (base !== null)
            cells.push(r.atBaseline === null ? '—' : amount(r.atBaseline, r.unit));
        return `| ${cells.join(' | ')} |`;
    });
    return `${head}\n${lines.join('\n')}`;
}
function evidence(view, report, limits) {
    const blocks = [];
    const metric = metricChart(view, report);
    if (view.rows.length > 0) {
        const chart = metric === null ? '' : `${metric.legend}\n\n${renderChart(metric.spec)}\n\n`;
        blocks.push(collapsible(`Per width: ${escapeMarkdown(view.metricName)} of the ${view.rows.length} width${view.rows.length === 1 ? '' : 's'} decided`, `${chart}${ladderSection(view, report, limits, new Set(metric?.widths ?? []))}`));
    }
    const classes = classSection(report);
    if (classes !== null)
        blocks.push(collapsible('Per class, on the rows that judged the witness', classes));
    const drift = driftChart(view, report.gate?.maxWidth ?? null);
    if (drift !== null) {
        blocks.push(collapsible(`Capacity drift: ${view.history.length} accepted baseline${view.history.length === 1 ? '' : 's'}`, `${drift.legend}\n\n${renderChart(drift.spec)}\n\n${historySection(view.history, limits)}`));
    }
    const pruning = pruneSection(report, limits);
    if (pruning !== null)
        blocks.push(collapsible(`Pruning: ${report.search.pruning.length} removals tried`, pruning));
    if (report.changes)
        blocks.push(collapsible('Every data change since the baseline', changesSection(report.changes, limits)));
    return blocks.join('\n\n');
}
function footer(report, context) {
    const lines = hints(report, context, escapeMarkdown, code);
    const sign = `_neuron-budget ${escapeMarkdown(report.tool.version)} measures how many hidden neurons this data needs. ${SIGN_OFF}_`;
    return ['---', ...lines, sign].join('\n\n');
}

;// CONCATENATED MODULE: ./src/report/text.ts
/**
 * The terminal report: the same answers and words as the comment, plain text, at most 80 columns
 * (a long repository name may run over; each is clipped at 200 characters).
 */







const TEXT_WIDTH = 80;
function renderText(report, context = DEFAULT_CONTEXT) {
    const view = viewOf(report);
    const out = [];
    // Reasons are our sentences (their repository strings clipped where they were quoted): shown whole.
    out.push(...text_wrap(`neuron-budget: ${VERDICT_LABEL[view.verdict]}. ${escapeText(view.headline, MAX_MESSAGE)}`, ''));
    for (const r of view.otherReasons)
        out.push(...text_wrap(escapeText(r, MAX_MESSAGE), '  - ', '    '));
    const needs = [needsSentence(report), view.backing, targetSpreadSentence(report)].filter((s) => s !== null);
    out.push('', ...text_wrap(`Needs: ${needs.join(' ')}`, '', '  '));
    const ledger = ledgerOf(report);
    out.push('', ...text_wrap(`Fits the device: ${fitsSentence(ledger)}`, '', '  '));
    if (ledger !== null)
        out.push(...ledgerLines(ledger));
    out.push('', ...text_wrap(`Why it changed: ${whySentence(report, escapeText)}`, '', '  '));
    if (view.rows.length > 0)
        out.push('', ...ladderLines(view, report));
    if (view.history.length > 0) {
        out.push('');
        out.push(`capacity drift (accepted baselines, oldest first${view.current.width !== null ? ', then now' : ''}):`);
        const widths = view.history.slice(-20).map((h) => String(h.width));
        if (view.current.width !== null)
            widths.push(`now ${view.current.width}`);
        const budget = report.gate?.maxWidth ?? null;
        out.push(...text_wrap(`width ${widths.join(' -> ')}${budget === null ? '' : ` (budget ${budget})`}`, '  ', '  '));
    }
    const pruning = pruningSentence(report);
    if (pruning !== null)
        out.push('', ...text_wrap(`pruning: ${pruning[0].toLowerCase()}${pruning.slice(1)}`, '', '  '));
    if (report.changes) {
        out.push('', 'data changes since the baseline:');
        for (const item of changeItems(report.changes, escapeText))
            out.push(...text_wrap(item.text, '  - ', '    '));
    }
    out.push('');
    for (const line of hints(report, context, escapeText, (s) => s))
        out.push(...text_wrap(line, ''));
    out.push(...text_wrap(SIGN_OFF, ''));
    return `${out.join('\n')}\n`;
}
function ledgerLines(ledger) {
    const base = ledger.baselineWidth;
    const head = ['on the device', 'needs now', 'budget', ...(base === null ? [] : [`at baseline's ${base}`])];
    const rows = ledger.rows.map((r) => [
        r.label,
        amount(r.now, r.unit),
        budgetCell(r),
        ...(base === null ? [] : [r.atBaseline === null ? '-' : amount(r.atBaseline, r.unit)]),
    ]);
    const widths = [22, 11, 20, 18];
    return [head, ...rows].map((cells) => `  ${cells.map((c, i) => (i === 0 ? c.padEnd(widths[0]) : c.padStart(widths[i]))).join('')}`.trimEnd());
}
function ladderLines(view, report) {
    const required = report.search?.required ?? 1;
    const b = view.baseline;
    const out = [`${view.metricName} by width (met: networks that met the target; ${nthBest(required)} decides)`];
    const head = ['width', 'met', nthBest(required), 'best', 'adequate', ...(b ? ['baseline met'] : [])];
    const widths = [7, 16, 11, 10, 10, 14];
    const line = (cells) => cells
        .map((c, i) => c.padStart(widths[i]))
        .join('')
        .trimEnd();
    out.push(line(head));
    for (const r of view.rows) {
        const c = r.current;
        const marked = r.width === view.current.width ? '>' : ' ';
        out.push(line([
            `${marked}${r.width}`,
            c ? `${c.metBy.fresh} of ${c.restarts}${c.metBy.pruned > 0 ? ` +${c.metBy.pruned}p` : ''}` : 'not decided',
            fmt(c?.decisive),
            fmt(c?.best),
            c ? (c.adequate ? 'yes' : 'no') : '-',
            ...(b ? [r.baseline ? String(r.baseline.met) : '-'] : []),
        ]));
    }
    const notes = [`threshold ${formatMetric(view.threshold)}`];
    if (view.current.width !== null)
        notes.unshift("> marks this change's smallest adequate width");
    if (view.rows.some((r) => (r.current?.metBy.pruned ?? 0) > 0))
        notes.push('+Np: N networks pruned down to it');
    out.push(...text_wrap(`(${notes.join('; ')})`, '  ', '  '));
    const cost = searchCostSentence(report);
    if (cost !== null)
        out.push(...text_wrap(cost, '  ', '  '));
    return out;
}
/** Greedy word wrap at TEXT_WIDTH; a single word longer than a line stays whole. */
function text_wrap(text, first, rest = first) {
    const words = text.split(/ +/).filter((w) => w !== '');
    const lines = [];
    let line = first;
    let empty = true;
    for (const w of words) {
        if (!empty && line.length + 1 + w.length > TEXT_WIDTH) {
            lines.push(line);
            line = rest + w;
        }
        else {
            line += (empty ? '' : ' ') + w;
        }
        empty = false;
    }
    lines.push(line);
    return lines;
}
function fmt(v) {
    return v === null || v === undefined || !Number.isFinite(v) ? '-' : formatMetric(v);
}

;// CONCATENATED MODULE: ./src/report/json.ts
function withGate(report, outcome, gate) {
    const b = outcome.baseline;
    return {
        ...report,
        verdict: outcome.verdict,
        reasons: [...outcome.reasons],
        baseline: b
            ? {
                width: b.result.width,
                metric: b.result.metric.value,
                file: gate.baselineAsWritten,
                met: b.result.met,
                restarts: b.result.restarts,
                rows: b.data.rows,
                searchSeconds: b.result.searchSeconds,
                toolVersion: b.tool.version,
                sameSettings: outcome.settingsChanged.length === 0,
                settingsChanged: [...outcome.settingsChanged],
                widths: b.widths.map((w) => ({ ...w })),
                history: b.history.map((h) => ({ ...h })),
            }
            : null,
        gate: {
            maxWidth: gate.maxWidth,
            maxFlashBytes: gate.maxFlashBytes,
            maxRamBytes: gate.maxRamBytes,
            maxMacs: gate.maxMacs,
            allowedGrowth: gate.allowedGrowth,
            metricTolerance: gate.metricTolerance,
            baselineFile: gate.baselineAsWritten,
        },
        changes: outcome.changes,
    };
}

;// CONCATENATED MODULE: ./src/report/baseline-record.ts
/**
 * The one line that says what `baseline` did with the baseline file, for the command line's
 * stdout and the action's log (the record itself is in JobResult.baselineRecord).
 */


/** "baseline written: FILE, width W, N history entries", or "baseline not written: WHY". The file is escaped. */
function baselineRecordLine(record) {
    if ('notWritten' in record)
        return `baseline not written: ${record.notWritten}`;
    const entries = record.historyEntries === 1 ? '1 history entry' : `${formatCount(record.historyEntries)} history entries`;
    return `baseline written: ${escapeText(record.file)}, width ${record.width}, ${entries}`;
}

;// CONCATENATED MODULE: ./src/report/index.ts
/** Rendering a report: pull-request comment / job summary, terminal text, JSON. */






;// CONCATENATED MODULE: external "node:perf_hooks"
const external_node_perf_hooks_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:perf_hooks");
;// CONCATENATED MODULE: ./src/config/spec.ts
/**
 * Every config key the validator accepts, with its rule, default and description, as data.
 * The validator walks this table; a test walks it against schema/neuron-budget.schema.json
 * so the two cannot drift apart.
 */

/** Marks a key the user must give. */
const spec_REQUIRED = Symbol('required');
/** Marks a key whose default depends on another key (the description says how). */
const spec_DERIVED = Symbol('derived');
/** Largest width the search may try: the gate is for small networks on small devices. */
const WIDTH_LIMIT = 1024;
const EPOCH_LIMIT = 10_000_000;
const spec_CONFIG_SPEC = [
    {
        name: 'data',
        required: true,
        description: 'The CSV file the networks learn from and how to read it.',
        keys: [
            {
                name: 'path',
                changesResult: false,
                rule: { kind: 'path' },
                default: spec_REQUIRED,
                description: 'CSV file with a header row, relative to this config file. Must stay inside the workspace.',
            },
            {
                name: 'target',
                changesResult: true,
                rule: { kind: 'text' },
                default: spec_REQUIRED,
                description: 'Column to predict.',
            },
            {
                name: 'features',
                changesResult: true,
                rule: { kind: 'text-list', minItems: 1, nullable: true },
                default: null,
                description: 'Columns used as inputs. Default: every column except the target and the ignored ones.',
            },
            {
                name: 'ignore',
                changesResult: true,
                rule: { kind: 'text-list', minItems: 0 },
                default: [],
                description: 'Columns never used as inputs (identifiers, timestamps).',
            },
            {
                name: 'task',
                changesResult: true,
                rule: { kind: 'enum', values: ['auto', 'classification', 'regression'] },
                default: 'auto',
                description: `auto: decided from the target column: text, or numbers with at most ${AUTO_MAX_CLASSES} distinct values, is classification; other numbers are regression.`,
            },
            {
                name: 'validation',
                changesResult: true,
                rule: { kind: 'number', min: 0, max: 1, exclusiveMax: true },
                default: 0.25,
                description: 'Fraction of rows (per class) held out to steer training: when a training stops, and whether a pruning step is kept. 0 steers on the training rows.',
            },
            {
                name: 'judging',
                changesResult: true,
                rule: { kind: 'number', min: 0, max: 1, exclusiveMax: true },
                default: spec_DERIVED,
                description: 'Fraction of rows (per class) held out to judge whether a network meets the target; they never steer training. Default: 0.2 (at most half of what validation leaves), or 0 when data.validation is 0 (then the target is judged on the training rows). 0 with validation above 0 judges on the validation rows, which is optimistic.',
            },
            {
                name: 'delimiter',
                changesResult: true,
                rule: { kind: 'character' },
                default: ',',
                description: 'Field separator: one character (write "\\t" in double quotes for a tab).',
            },
            {
                name: 'max-categories',
                changesResult: true,
                rule: { kind: 'integer', min: 1, max: 10_000 },
                default: 20,
                description: 'Most distinct values a text feature may have; each becomes one input.',
            },
            {
                name: 'missing',
                changesResult: true,
                rule: { kind: 'enum', values: ['error', 'drop'] },
                default: 'error',
                description: 'An empty feature value: error stops with its location; drop skips the row and counts it.',
            },
        ],
    },
    {
        name: 'target',
        required: true,
        description: 'What a network must reach on the validation rows.',
        keys: [
            {
                name: 'metric',
                changesResult: true,
                rule: { kind: 'enum', values: ['accuracy', 'rmse', 'mae', 'max-abs-error'] },
                default: spec_DERIVED,
                description: 'accuracy for classification; rmse, mae or max-abs-error for regression. Default: follows the task, accuracy for classification and rmse for regression (with data.task auto, the task found in the data).',
            },
            {
                name: 'threshold',
                changesResult: true,
                rule: { kind: 'number', min: 0, max: Number.MAX_VALUE, exclusiveMin: true },
                default: spec_REQUIRED,
                description: "accuracy: at least this (above 0, at most 1); error metrics: at most this, in the target column's units. Checked against the metric in effect: with data.task auto and no target.metric, once the data show the task.",
            },
            {
                name: 'precision',
                changesResult: true,
                rule: { kind: 'enum', values: ['float32', 'int8'] },
                default: 'float32',
                description: 'Which form of a network must meet the target: float32, or int8 (its post-training quantised form, as the exported C runs it).',
            },
            {
                name: 'min-recall',
                changesResult: true,
                rule: { kind: 'recall', nullable: true },
                default: null,
                description: 'Classification: the least recall a network needs besides the metric, for every class (a number) or per named class (a mapping, e.g. bearing_wear: 0.9). null: none.',
            },
        ],
    },
    {
        name: 'search',
        required: false,
        description: 'How the smallest adequate width is searched for.',
        keys: [
            {
                name: 'min-width',
                changesResult: true,
                rule: { kind: 'integer', min: 1, max: WIDTH_LIMIT },
                default: 1,
                description: 'First width the growth phase tries.',
            },
            {
                name: 'max-width',
                changesResult: true,
                rule: { kind: 'integer', min: 1, max: WIDTH_LIMIT },
                default: 16,
                description: 'Last width the growth phase tries; at least min-width.',
            },
            {
                name: 'restarts',
                changesResult: true,
                rule: { kind: 'integer', min: 1, max: 1000 },
                default: 10,
                description: 'Seeded trainings per width.',
            },
            {
                name: 'required',
                changesResult: true,
                rule: { kind: 'integer', min: 1, max: 1000 },
                default: 3,
                description: 'Trainings per width that must reach the target for the width to count as adequate; at most restarts.',
            },
            {
                name: 'max-epochs',
                changesResult: true,
                rule: { kind: 'integer', min: 1, max: EPOCH_LIMIT },
                default: 3000,
                description: 'Epochs after which one training gives up.',
            },
            {
                name: 'seed',
                changesResult: true,
                rule: { kind: 'integer', min: 0, max: 4_294_967_295 },
                default: 1,
                description: 'Base seed of every random choice (split, initial weights); same seed, same result.',
            },
            {
                name: 'growth',
                changesResult: true,
                rule: { kind: 'enum', values: ['fresh', 'in-place'] },
                default: 'fresh',
                description: 'fresh: new seeded networks at each width; in-place: add neurons to the networks already trained.',
            },
            {
                name: 'start',
                changesResult: false,
                rule: { kind: 'enum', values: ['baseline', 'min-width'] },
                default: 'baseline',
                description: 'baseline: with a baseline of the same settings, decide its width and the one below first, and move only as far as the answer needs; min-width: try every width from min-width up.',
            },
            {
                name: 'activation',
                changesResult: true,
                rule: { kind: 'enum', values: ['tanh', 'logistic', 'relu'] },
                default: 'tanh',
                description: 'Hidden-layer activation function.',
            },
            {
                name: 'optimizer',
                changesResult: true,
                rule: { kind: 'enum', values: ['lbfgs', 'irprop+', 'adam', 'backprop'] },
                default: 'lbfgs',
                description: 'lbfgs (full-batch L-BFGS with a strong Wolfe line search), irprop+ (full batch), adam, or backprop (backpropagation with momentum).',
            },
            {
                name: 'weight-decay',
                changesResult: true,
                rule: { kind: 'number', min: 0, max: 1000 },
                default: 0.0001,
                description: 'L2 penalty on the weights (not the biases): the summed loss gains weight-decay/2 × the sum of squared weights. 0 turns it off.',
            },
            {
                name: 'init',
                changesResult: true,
                rule: { kind: 'enum', values: ['nguyen-widrow', 'glorot', 'he'], nullable: true },
                default: null,
                description: 'Initial weights. Default (null): Nguyen-Widrow for tanh and logistic, He for relu.',
            },
            {
                name: 'check-every',
                changesResult: true,
                rule: { kind: 'integer', min: 1, max: EPOCH_LIMIT },
                default: 10,
                description: 'Epochs between checks of the validation rows; at most max-epochs.',
            },
            {
                name: 'patience',
                changesResult: true,
                rule: { kind: 'integer', min: 1, max: EPOCH_LIMIT },
                default: 200,
                description: 'A training stops when its validation loss has not improved (by 0.1%) for this many epochs: early stopping, and the bound on polishing a network that met the target.',
            },
            {
                name: 'prune',
                changesResult: true,
                rule: { kind: 'boolean' },
                default: true,
                description: 'Whether to remove hidden neurons from the adequate network while it still reaches the target.',
            },
            {
                name: 'prune-epochs',
                changesResult: true,
                rule: { kind: 'integer', min: 0, max: EPOCH_LIMIT },
                default: 200,
                description: 'Epochs of retraining after each neuron removed.',
            },
            {
                name: 'time-budget',
                changesResult: false,
                rule: { kind: 'number', min: 0, max: 31_536_000, exclusiveMin: true, nullable: true },
                default: null,
                description: 'Wall-clock seconds the search may take; when spent the verdict is inconclusive. null: no limit.',
            },
            {
                name: 'max-trainings',
                changesResult: true,
                rule: { kind: 'integer', min: 1, max: 100_000_000, nullable: true },
                default: null,
                description: 'Most trainings the search may run; when spent the verdict is inconclusive. null: no limit.',
            },
            {
                name: 'workers',
                changesResult: false,
                rule: { kind: 'integer', min: 1, max: 256, nullable: true },
                default: null,
                description: 'Worker threads. null: one per available CPU core. Results do not depend on it.',
            },
        ],
    },
    {
        name: 'gate',
        required: false,
        description: 'How the result is judged against the committed baseline and the device budget.',
        keys: [
            {
                name: 'baseline',
                changesResult: false,
                rule: { kind: 'path' },
                default: 'neuron-budget.baseline.json',
                description: 'Baseline file, relative to this config file. Must stay inside the workspace.',
            },
            {
                name: 'max-width',
                changesResult: false,
                rule: { kind: 'integer', min: 1, max: WIDTH_LIMIT, nullable: true },
                default: null,
                description: 'Hard device budget: a smallest adequate width above it fails. null: no budget.',
            },
            {
                name: 'max-flash-bytes',
                changesResult: false,
                rule: { kind: 'integer', min: 1, max: 1_000_000_000, nullable: true },
                default: null,
                description: 'Device budget: flash bytes for the weights of the witness in target.precision form (as the exported C stores them); above it fails. null: no budget.',
            },
            {
                name: 'max-ram-bytes',
                changesResult: false,
                rule: { kind: 'integer', min: 1, max: 1_000_000_000, nullable: true },
                default: null,
                description: 'Device budget: RAM bytes for the activations of one inference in target.precision form; above it fails. null: no budget.',
            },
            {
                name: 'max-macs',
                changesResult: false,
                rule: { kind: 'integer', min: 1, max: 1_000_000_000_000, nullable: true },
                default: null,
                description: 'Device budget: multiply-accumulates per inference; above it fails. null: no budget.',
            },
            {
                name: 'allowed-growth',
                changesResult: false,
                rule: { kind: 'integer', min: 0, max: WIDTH_LIMIT },
                default: 0,
                description: 'Neurons the width may grow over the baseline before the verdict is fail.',
            },
            {
                name: 'metric-tolerance',
                changesResult: false,
                rule: { kind: 'number', min: 0, max: Number.MAX_VALUE },
                // 0.02 is common practice for "noticeably worse" with a few hundred validation rows; no source.
                default: 0.02,
                description: 'How much worse the metric at the chosen width may get against the baseline before it is flagged (accuracy: below 1).',
            },
        ],
    },
];

;// CONCATENATED MODULE: ./src/config/keys.ts
/** What the key list (spec.ts) implies: how a rule reads in a message, field names, defaults. */

/** "an integer from 1 to 1000", "one of tanh, logistic, relu", … for messages. */
function describeRule(rule) {
    const orNull = 'nullable' in rule && rule.nullable ? ', or null' : '';
    switch (rule.kind) {
        case 'integer':
            return `an integer from ${rule.min} to ${rule.max}${orNull}`;
        case 'number': {
            const low = rule.exclusiveMin ? `above ${rule.min}` : `of ${rule.min} or more`;
            if (rule.max === Number.MAX_VALUE)
                return `a number ${low}${orNull}`;
            if (rule.exclusiveMax)
                return `a number ${rule.exclusiveMin ? low : `from ${rule.min}`} and below ${rule.max}${orNull}`;
            return `a number ${rule.exclusiveMin ? low : `from ${rule.min}`} and at most ${rule.max}${orNull}`;
        }
        case 'enum':
            return `one of ${rule.values.join(', ')}${orNull}`;
        case 'boolean':
            return 'true or false';
        case 'text':
            return 'a column name (text)';
        case 'character':
            return 'a single character other than a quote or a line break';
        case 'path':
            return 'a path relative to the config file';
        case 'text-list':
            return `a list of column names${rule.minItems > 0 ? ` (at least ${rule.minItems})` : ''}${orNull}`;
        case 'recall':
            return `a recall above 0 and at most 1, or a mapping of class labels to such recalls${orNull}`;
    }
}
/** `min-width` → `minWidth`: how the typed config names a key. */
function fieldName(key) {
    return key.replace(/-([a-z])/g, (_, c) => c.toUpperCase());
}
/**
 * A section's documented defaults by typed field name (required and derived keys left out), for
 * code that builds a config without a file (tests, benchmarks).
 * @testOnly
 */
function sectionDefaults(section) {
    const spec = CONFIG_SPEC.find((s) => s.name === section);
    const out = {};
    for (const key of spec?.keys ?? []) {
        if (key.default === REQUIRED || key.default === DERIVED)
            continue;
        out[fieldName(key.name)] = Array.isArray(key.default) ? [...key.default] : key.default;
    }
    return out;
}
/** The judging fraction when validation rows are held out (common practice for a hold-out test set; no single source). */
const DEFAULT_JUDGING = 0.2;
/** data.judging when the config does not give it: 0.2, or less when the validation rows leave too little to train on. */
function derivedJudging(validation) {
    return validation > 0 ? Math.min(DEFAULT_JUDGING, (1 - validation) / 2) : 0;
}

;// CONCATENATED MODULE: ./src/gate/settings.ts
/**
 * The config settings that change the search's answer, and their fingerprint. Two runs
 * with different settings answer different questions, so the gate says so rather than
 * comparing their widths silently. Worker count and time budget are left out: they
 * change how long the search takes, not what it finds. The data file's path is left out
 * too: the data are compared by content (fingerprint and profile, see data-changes.ts),
 * so a renamed file with the same rows is the same question, and a file with other rows
 * shows up as a data change, which is what the gate exists to measure.
 */




function resultSettings(config) {
    const out = {};
    for (const section of spec_CONFIG_SPEC) {
        const values = config[section.name];
        for (const key of section.keys) {
            if (!key.changesResult)
                continue;
            out[`${section.name}.${key.name}`] = settingValue(values[fieldName(key.name)]);
        }
    }
    // The order of ignored columns does not matter; the order of features does (input order).
    const ignore = out['data.ignore'];
    if (Array.isArray(ignore))
        ignore.sort();
    return out;
}
/** A setting as the baseline records it: a plain value, a list of texts, or a structured value as its canonical text. */
function settingValue(value) {
    if (value === undefined || value === null)
        return null;
    if (Array.isArray(value) && value.every((v) => typeof v === 'string'))
        return [...value];
    if (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean')
        return value;
    // target.min-recall: {every} or {classes: [...]}, written the way the config states it.
    const rule = value;
    if (typeof rule.every === 'number')
        return rule.every;
    return JSON.stringify(Object.fromEntries((rule.classes ?? []).map((c) => [c.label, c.min])));
}
/** sha256 hex of the settings in canonical form (keys sorted). */
function settingsFingerprint(settings) {
    const keys = Object.keys(settings).sort();
    const canonical = JSON.stringify(keys.map((k) => [k, settings[k]]));
    return (0,external_node_crypto_namespaceObject.createHash)('sha256').update(canonical, 'utf8').digest('hex');
}
/** Settings that differ, as "key: before → after", in key order. */
function settingsDifferences(before, after) {
    const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])].sort();
    const out = [];
    for (const k of keys) {
        const a = show(before[k]);
        const b = show(after[k]);
        if (a !== b)
            out.push(`${k}: ${a} → ${b}`);
    }
    return out;
}
function show(v) {
    if (v === undefined)
        return '(not set)';
    if (v === null)
        return '(default)';
    // Column names are the repository's strings: each is clipped, and long lists would drown the
    // sentence they appear in. Escaping is the renderer's (text, Markdown), as for every reason.
    const s = Array.isArray(v) ? `[${v.map((name) => clip(name, 40)).join(', ')}]` : clip(String(v), 120);
    return clip(s, 120);
}

;// CONCATENATED MODULE: ./src/gate/compare.ts



function compare(input) {
    const { result, target, search, gate, baseline } = input;
    const settingsChanged = baseline ? settingsDifferences(baseline.config.settings, input.settings) : [];
    const flags = [];
    if (settingsChanged.length > 0) {
        flags.push(`The settings that shape the result differ from the baseline's (${settingsChanged.join('; ')}), so this compares answers to different questions.`);
    }
    if (result.outcome === 'inconclusive') {
        const how = result.notes.length > 0 ? ` ${result.notes.map(sentence).join(' ')}` : '';
        return {
            verdict: 'inconclusive',
            reasons: [`The search ran out of budget before it could decide the smallest adequate width.${how}`, ...flags],
            settingsChanged,
        };
    }
    if (result.outcome !== 'found' || result.width === null || result.metric === null) {
        const best = bestSeen(result.widths, target.metric);
        const bestText = best ? `; the best network reached ${formatMetric(best.value)} (width ${best.width})` : '';
        const networks = search.required === 1 ? 'a network that meets' : `${search.required} networks that meet`;
        return {
            verdict: 'fail',
            reasons: [
                `No width from ${search.minWidth} to ${search.maxWidth} has ${networks} ${targetPhrase(target.metric, target.threshold)}${bestText}.`,
                ...result.notes.map(sentence),
                ...flags,
            ],
            settingsChanged,
        };
    }
    const width = result.width;
    const failures = [];
    if (gate.maxWidth !== null && width > gate.maxWidth) {
        failures.push(`Needs ${neurons(width)}; the device budget is ${gate.maxWidth}.`);
    }
    failures.push(...budgetFailures(input));
    if (!baseline) {
        if (failures.length > 0)
            return { verdict: 'fail', reasons: [...failures, ...flags], settingsChanged };
        return {
            verdict: 'new',
            reasons: [
                `Needs ${neurons(width)}; there is no baseline yet to compare with, so record this result as the baseline.`,
                ...flags,
            ],
            settingsChanged,
        };
    }
    const before = baseline.result.width;
    const growth = width - before;
    const allowed = gate.allowedGrowth;
    const allowance = allowed === 0 ? 'no growth is allowed' : `the allowed growth is ${allowed}`;
    let comparison;
    if (growth > allowed) {
        failures.push(`Needs ${neurons(width)}, ${growth} more than the baseline's ${before}; ${allowance}.`);
        comparison = '';
    }
    else if (growth > 0) {
        comparison = `Needs ${neurons(width)}, ${growth} more than the baseline's ${before}, within the allowed growth of ${allowed}.`;
    }
    else if (growth < 0) {
        comparison = `Needs ${neurons(width)}, ${-growth} fewer than the baseline's ${before}; refresh the baseline to keep the gain.`;
    }
    else {
        comparison = `Needs ${neurons(width)}, the same as the baseline.`;
    }
    const tolerance = toleranceFlag(result.metric, baseline, target.metric, gate.metricTolerance);
    if (tolerance)
        flags.push(tolerance);
    if (failures.length > 0) {
        const context = comparison === '' ? [] : [comparison];
        return { verdict: 'fail', reasons: [...failures, ...context, ...flags], settingsChanged };
    }
    return { verdict: growth < 0 ? 'improved' : 'pass', reasons: [comparison, ...flags], settingsChanged };
}
function toleranceFlag(value, baseline, metric, tolerance) {
    const before = baseline.result.metric.value;
    const worse = higherIsBetter(metric) ? before - value : value - before;
    // A tiny epsilon so that a difference equal to the tolerance (up to rounding) is not flagged.
    if (worse <= tolerance + 1e-12)
        return null;
    return `Flag (does not fail the gate): ${metric} at the chosen width is ${formatMetric(value)}, ${formatMetric(worse)} worse than the baseline's ${formatMetric(before)}; the tolerance is ${formatMetric(tolerance)}.`;
}
function bestSeen(widths, metric) {
    let best = null;
    for (const w of widths) {
        if (w.best === null)
            continue;
        const better = best === null || (higherIsBetter(metric) ? w.best > best.value : w.best < best.value);
        if (better)
            best = { width: w.width, value: w.best };
    }
    return best;
}
function sentence(s) {
    const t = s.trim();
    const capital = t.charAt(0).toUpperCase() + t.slice(1);
    return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}
/** One sentence per byte or operation budget the witness exceeds, naming the figure and the budget. */
function budgetFailures(input) {
    const { gate, device } = input;
    if (!device)
        return [];
    const { cost, precision } = device;
    const out = [];
    const at = `(width ${input.result.width})`;
    if (gate.maxFlashBytes != null && cost.flashBytes[precision] > gate.maxFlashBytes) {
        out.push(`Needs ${formatCount(cost.flashBytes[precision])} flash bytes for its ${precision} weights ${at}; the device budget is ${formatCount(gate.maxFlashBytes)} bytes.`);
    }
    if (gate.maxRamBytes != null && cost.ramBytes[precision] > gate.maxRamBytes) {
        out.push(`Needs ${formatCount(cost.ramBytes[precision])} RAM bytes for one ${precision} inference ${at}; the device budget is ${formatCount(gate.maxRamBytes)} bytes.`);
    }
    if (gate.maxMacs != null && cost.macs > gate.maxMacs) {
        out.push(`Needs ${formatCount(cost.macs)} multiply-accumulates per inference ${at}; the device budget is ${formatCount(gate.maxMacs)}.`);
    }
    return out;
}

;// CONCATENATED MODULE: ./src/gate/data-changes.ts
/**
 * A numeric feature counts as shifted when its mean moved by more than this many
 * baseline standard deviations. Half a standard deviation is a common rule of thumb
 * for a "medium" shift (common practice, no single source).
 */
const MEAN_SHIFT_IN_STD = 0.5;
/**
 * A numeric feature's range counts as widened when it grew on a side (a new minimum below the
 * baseline's, or a new maximum above it) by more than this many baseline standard deviations.
 * A rule of thumb (common practice, no single source): the extremes of a sample wander by chance
 * as rows are added (for normal data and a thousand rows the sample maximum's spread is about
 * σ/√(2 ln n) ≈ 0.27σ, from extreme-value theory; figure from memory), so a new extreme within
 * a few hundredths of σ of the old one is no change a reviewer should read about, while one
 * half a σ beyond it puts rows where the baseline's networks never saw any.
 */
const RANGE_GROWTH_IN_STD = 0.5;
function dataChanges(before, after, fingerprints, files = { before: '', after: '' }) {
    const columnsBefore = new Set(before.columns);
    const columnsAfter = new Set(after.columns);
    const columnsAdded = after.columns.filter((c) => !columnsBefore.has(c));
    const columnsRemoved = before.columns.filter((c) => !columnsAfter.has(c));
    let classes = null;
    const classesAppeared = [];
    const classesVanished = [];
    if (before.classes !== null || after.classes !== null) {
        const b = tableOf(before.classes);
        const a = tableOf(after.classes);
        const labels = [...new Set([...b.keys(), ...a.keys()])].sort(byCodeUnit);
        classes = labels.map((label) => ({ label, before: b.get(label) ?? 0, after: a.get(label) ?? 0 }));
        for (const label of labels) {
            if (!b.has(label))
                classesAppeared.push(label);
            if (!a.has(label))
                classesVanished.push(label);
        }
    }
    const features = [];
    const categories = [];
    const featuresBefore = tableOf(before.features);
    const featuresAfter = tableOf(after.features);
    const shared = [...featuresAfter.keys()].filter((name) => featuresBefore.has(name)).sort(byCodeUnit);
    for (const name of shared) {
        const b = featuresBefore.get(name);
        const a = featuresAfter.get(name);
        if (b.kind === 'numeric' && a.kind === 'numeric') {
            const delta = atMostMax(Math.abs(a.mean - b.mean));
            const shiftInStd = b.std > 0 ? atMostMax(delta / b.std) : null;
            const meanMoved = shiftInStd === null ? delta > 0 : shiftInStd > MEAN_SHIFT_IN_STD;
            const rangeGrowth = growthOf(b, a);
            const rangeWidened = grewMeaningfully(rangeGrowth.below, b.std) || grewMeaningfully(rangeGrowth.above, b.std);
            if (meanMoved || rangeWidened) {
                features.push({
                    name,
                    meanBefore: b.mean,
                    meanAfter: a.mean,
                    stdBefore: b.std,
                    shiftInStd,
                    meanMoved,
                    rangeBefore: [b.min, b.max],
                    rangeAfter: [a.min, a.max],
                    rangeWidened,
                    rangeGrowth,
                });
            }
        }
        else if (b.kind === 'categorical' && a.kind === 'categorical') {
            const countsBefore = tableOf(b.counts);
            const countsAfter = tableOf(a.counts);
            const appeared = [...countsAfter.keys()].filter((c) => !countsBefore.has(c)).sort(byCodeUnit);
            const vanished = [...countsBefore.keys()].filter((c) => !countsAfter.has(c)).sort(byCodeUnit);
            if (appeared.length > 0 || vanished.length > 0)
                categories.push({ feature: name, appeared, vanished });
        }
    }
    return {
        changed: fingerprints.before !== fingerprints.after,
        file: files.before === files.after ? null : { before: files.before, after: files.after },
        rows: { before: before.rows, after: after.rows },
        classes,
        classesAppeared,
        classesVanished,
        features,
        categories,
        columnsAdded,
        columnsRemoved,
    };
}
/** How far the range reaches beyond the baseline's on each side, in the feature's units and in baseline stds. */
function growthOf(b, a) {
    const below = atMostMax(Math.max(0, b.min - a.min));
    const above = atMostMax(Math.max(0, a.max - b.max));
    const inStd = (g) => (b.std > 0 ? atMostMax(g / b.std) : null);
    return { below, above, belowInStd: inStd(below), aboveInStd: inStd(above) };
}
/** A side grew meaningfully: by more than RANGE_GROWTH_IN_STD baseline stds (any growth for a constant feature). */
function grewMeaningfully(growth, std) {
    return std > 0 ? growth > RANGE_GROWTH_IN_STD * std : growth > 0;
}
/**
 * A profile table as a Map. The tables are keyed by the data's own strings and a baseline file
 * is read with JSON.parse, so a label may be `constructor` or `__proto__`: only own keys count.
 */
function tableOf(table) {
    return new Map(table === null ? [] : Object.entries(table));
}
/**
 * Two finite means read from a baseline file can differ by more than the largest float; the
 * shift is then "at least the largest float", never Infinity (which JSON cannot hold).
 */
function atMostMax(x) {
    return Math.min(x, Number.MAX_VALUE);
}
/** Locale-independent order, so the summary reads the same on every machine. */
function byCodeUnit(a, b) {
    return a < b ? -1 : a > b ? 1 : 0;
}

;// CONCATENATED MODULE: ./src/gate/evaluate.ts



function evaluateGate(input) {
    const { result, loaded, config, baseline } = input;
    const cost = input.cost ?? null;
    const comparison = compare({
        result,
        target: config.target,
        search: { minWidth: config.search.minWidth, maxWidth: config.search.maxWidth, required: config.search.required },
        gate: config.gate,
        baseline,
        settings: resultSettings(config),
        device: cost === null ? null : { cost, precision: config.target.precision ?? 'float32' },
    });
    const changes = baseline
        ? dataChanges(baseline.data.profile, loaded.profile, { before: baseline.data.fingerprint, after: loaded.fingerprint }, { before: baseline.data.file, after: config.data.pathAsWritten.replace(/\\/g, '/') })
        : null;
    return { ...comparison, changes, baseline };
}

;// CONCATENATED MODULE: ./schema/baseline.schema.json
const baseline_schema_namespaceObject = /*#__PURE__*/JSON.parse('{"$schema":"https://json-schema.org/draft/2020-12/schema","title":"neuron-budget baseline","description":"The committed record of the last accepted neuron-budget result and its history. Written by `neuron-budget baseline` (or the action\'s update-baseline input); compared against by `neuron-budget check`.","type":"object","additionalProperties":false,"required":["schema","tool","result","widths","data","config","history"],"properties":{"schema":{"description":"Format and version of this file.","const":"neuron-budget/baseline@2"},"tool":{"type":"object","additionalProperties":false,"required":["name","version"],"properties":{"name":{"const":"neuron-budget"},"version":{"type":"string","description":"Version of neuron-budget that wrote the file."}}},"result":{"description":"The accepted result: the smallest adequate width and its metric.","type":"object","additionalProperties":false,"required":["width","metric","grownWidth","met","restarts","searchSeconds"],"properties":{"width":{"type":"integer","minimum":1,"description":"Smallest adequate width (hidden neurons)."},"metric":{"type":"object","additionalProperties":false,"required":["name","value","threshold"],"properties":{"name":{"enum":["accuracy","rmse","mae","max-abs-error"]},"value":{"type":"number","description":"The witness network\'s metric on the rows that judged it."},"threshold":{"type":"number"}}},"grownWidth":{"type":["integer","null"],"minimum":1,"description":"Smallest width adequate on fresh restarts alone (where growth stopped), before pruning."},"restarts":{"type":"integer","minimum":0,"description":"Fresh restarts run at `width` (0 when only pruned networks back it)."},"searchSeconds":{"type":["number","null"],"minimum":0,"description":"Wall-clock seconds of the search; informative only."},"met":{"type":"integer","minimum":0,"description":"Networks of `width` that met the target on the judging rows (fresh restarts and pruned networks)."}}},"widths":{"description":"The per-width curve of the search that produced the result.","type":"array","items":{"type":"object","additionalProperties":false,"required":["width","restarts","met","adequate","best"],"properties":{"width":{"type":"integer","minimum":1},"restarts":{"type":"integer","minimum":0,"description":"Fresh restarts run at this width."},"met":{"type":"integer","minimum":0,"description":"Networks of this width that met the target (fresh and pruned)."},"adequate":{"type":"boolean","description":"At least search.required networks of this width met the target."},"best":{"type":["number","null"],"description":"Best judged metric over the networks of this width; null when none finished."},"decisive":{"type":["number","null"],"description":"The search.required-th best judged metric over the networks of this width: at or past the threshold exactly when the width is adequate (recall floors aside); null when fewer finished."}}}},"data":{"type":"object","additionalProperties":false,"required":["file","rows","fingerprint","profile"],"properties":{"file":{"type":"string","description":"Data file as written in the config."},"rows":{"type":"integer","minimum":0},"fingerprint":{"$ref":"#/$defs/sha256"},"profile":{"type":"object","additionalProperties":false,"required":["rows","classes","columns","features"],"properties":{"rows":{"type":"integer","minimum":0},"classes":{"description":"Rows per class (classification); null for regression.","type":["object","null"],"additionalProperties":{"type":"integer","minimum":0}},"columns":{"type":"array","items":{"type":"string"}},"features":{"type":"object","additionalProperties":{"oneOf":[{"type":"object","additionalProperties":false,"required":["kind","mean","std","min","max","missing"],"properties":{"kind":{"const":"numeric"},"mean":{"type":"number"},"std":{"type":"number","minimum":0},"min":{"type":"number"},"max":{"type":"number"},"missing":{"type":"integer","minimum":0}}},{"type":"object","additionalProperties":false,"required":["kind","counts","missing"],"properties":{"kind":{"const":"categorical"},"counts":{"type":"object","additionalProperties":{"type":"integer","minimum":0}},"missing":{"type":"integer","minimum":0}}}]}}}}}},"config":{"description":"The settings that change the result (not workers or time budget), and their fingerprint.","type":"object","additionalProperties":false,"required":["fingerprint","settings"],"properties":{"fingerprint":{"$ref":"#/$defs/sha256"},"settings":{"type":"object","additionalProperties":{"anyOf":[{"type":["string","number","boolean","null"]},{"type":"array","items":{"type":"string"}}]}}}},"history":{"description":"Every accepted result, this one included as the last entry, oldest first; at most 100 entries.","type":"array","maxItems":100,"items":{"type":"object","additionalProperties":false,"required":["width","metric","rows","data","commit","date"],"properties":{"width":{"type":"integer","minimum":1},"metric":{"type":"number"},"rows":{"type":"integer","minimum":0},"data":{"$ref":"#/$defs/sha256"},"commit":{"type":["string","null"],"pattern":"^[0-9a-f]{4,64}$","title":"a commit hash (hex) or null"},"date":{"type":"string","pattern":"^\\\\d{4}-\\\\d{2}-\\\\d{2}T\\\\d{2}:\\\\d{2}:\\\\d{2}(\\\\.\\\\d+)?Z$","description":"ISO 8601 UTC date-time when the result was accepted.","title":"an ISO 8601 UTC date-time such as \\"2026-01-31T12:00:00.000Z\\""}}}}},"$defs":{"sha256":{"type":"string","pattern":"^[0-9a-f]{64}$","description":"sha256 fingerprint, 64 hex digits.","title":"a sha256 fingerprint (64 hex digits)"}}}');
;// CONCATENATED MODULE: ./src/gate/types.ts
const BASELINE_SCHEMA = 'neuron-budget/baseline@2';
const BASELINE_VERSION = 2;
/** Oldest history entries are dropped beyond this many. */
const HISTORY_CAP = 100;

;// CONCATENATED MODULE: ./src/gate/baseline.ts
/**
 * The baseline file: build it from a run, carry its history forward, read it back with
 * clear errors, and write it atomically. Everything here is pure except readBaseline
 * and writeBaseline; dates are passed in, never read from a clock.
 */









/**
 * Why this run cannot become a baseline, or null when it can. A baseline only ever
 * records a width that was found: a failed or unfinished search leaves the file as it was.
 */
function whyNotRecordable(result) {
    if (result.outcome === 'inconclusive') {
        return 'the search did not finish, so there is no result to record; the baseline file was left unchanged';
    }
    if (result.outcome !== 'found' || result.width === null || result.metric === null) {
        return 'no width reached the target, so there is no result to record; the baseline file was left unchanged';
    }
    return null;
}
/**
 * The baseline that accepting `current` produces: its headline and curve, with the
 * previous baseline's history carried forward and this result appended (newest last,
 * oldest dropped beyond HISTORY_CAP). Throws if the run is not recordable; check
 * whyNotRecordable first.
 */
function nextBaseline(previous, current, meta) {
    const { result, loaded, config } = current;
    const problem = whyNotRecordable(result);
    if (problem !== null || result.width === null || result.metric === null) {
        throw new Error(`nextBaseline called with an unrecordable result: ${problem ?? 'no width'}`);
    }
    const width = result.width;
    const atWidth = result.widths.find((w) => w.width === width) ?? null;
    const settings = resultSettings(config);
    const entry = {
        width,
        metric: result.metric,
        rows: loaded.profile.rows,
        data: loaded.fingerprint,
        commit: commitHash(meta.commit),
        date: meta.date.toISOString(),
    };
    const history = [...(previous?.history ?? []), entry].slice(-HISTORY_CAP);
    return {
        schema: BASELINE_SCHEMA,
        tool: { name: 'neuron-budget', version: meta.toolVersion },
        result: {
            width,
            metric: { name: config.target.metric, value: result.metric, threshold: config.target.threshold },
            grownWidth: result.grownWidth,
            met: atWidth ? atWidth.met : 0,
            restarts: atWidth ? atWidth.restarts : 0,
            searchSeconds: result.timing.searchSeconds,
        },
        widths: result.widths.map((w) => ({
            width: w.width,
            restarts: w.restarts,
            met: w.met,
            adequate: w.adequate,
            best: w.best,
            decisive: w.decisive,
        })),
        data: {
            file: config.data.pathAsWritten.replace(/\\/g, '/'),
            rows: loaded.profile.rows,
            fingerprint: loaded.fingerprint,
            profile: loaded.profile,
        },
        config: { fingerprint: settingsFingerprint(settings), settings },
        history,
    };
}
/** A commit id as the history stores it (lower-case hex), or null when it is not one. */
function commitHash(commit) {
    if (commit === null)
        return null;
    const c = commit.trim().toLowerCase();
    return /^[0-9a-f]{4,64}$/.test(c) ? c : null;
}
function serializeBaseline(baseline) {
    return `${JSON.stringify(baseline, null, 2)}\n`;
}
/**
 * Writes the baseline atomically (temp file beside it, then rename). The text is first
 * read back through the same validation a later run will use, so a value JSON cannot
 * hold (NaN becomes null) can never produce a baseline that the next run rejects.
 */
async function writeBaseline(path, baseline) {
    const text = serializeBaseline(baseline);
    try {
        parseBaseline(text, path);
    }
    catch (e) {
        throw new Error(`refusing to write a baseline that would not read back: ${e.message}`, { cause: e });
    }
    await writeFileAtomic(path, text);
}
/**
 * Reads a baseline. Missing file → null (the verdict is then `new`). A file that is not
 * valid JSON, of another schema version, or of the wrong shape → UserError naming the
 * file (`shown`, the path as the user wrote it), and the line/column or key.
 */
async function readBaseline(path, shown = path) {
    let text;
    try {
        text = await (0,promises_namespaceObject.readFile)(path, 'utf8');
    }
    catch (e) {
        const code = e.code;
        if (code === 'ENOENT')
            return null;
        if (code === 'EISDIR')
            throw new errors_UserError(`${shown}: expected a baseline file, found a folder`, { file: shown });
        throw new errors_UserError(`${shown}: cannot read the baseline file (${code ?? 'unknown error'})`, { file: shown });
    }
    return parseBaseline(text, shown);
}
/** Parses and validates baseline text; `shown` names the file in messages. */
function parseBaseline(text, shown) {
    if (text.trim() === '') {
        throw new errors_UserError(`${shown}: the baseline file is empty; delete it or run \`neuron-budget baseline\` to write it`, {
            file: shown,
        });
    }
    const syntax = findJsonSyntaxProblem(text);
    if (syntax) {
        throw new errors_UserError(`${shown}:${syntax.line}:${syntax.column}: the baseline is not valid JSON: ${syntax.detail}`, {
            file: shown,
            line: syntax.line,
            column: syntax.column,
        });
    }
    const value = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
    checkSchemaVersion(value, shown);
    validateBaselineShape(value, shown);
    return value;
}
function checkSchemaVersion(value, shown) {
    if (!baseline_isObject(value)) {
        throw new errors_UserError(`${shown}: expected a neuron-budget baseline (a JSON object), found ${baseline_describe(value)}`, {
            file: shown,
        });
    }
    const schema = 'schema' in value ? value['schema'] : baseline_MISSING;
    const match = typeof schema === 'string' ? /^neuron-budget\/baseline@(\d+)$/.exec(schema) : null;
    if (!match) {
        throw new errors_UserError(`${shown}: schema: expected "${BASELINE_SCHEMA}", found ${baseline_describe(schema)}; this file is not a neuron-budget baseline`, { file: shown, key: 'schema' });
    }
    const version = Number(match[1]);
    if (version > BASELINE_VERSION) {
        throw new errors_UserError(`${shown}: schema: this baseline was written by a newer neuron-budget (baseline@${version}); this version reads baseline@${BASELINE_VERSION}. Upgrade neuron-budget to compare against it`, { file: shown, key: 'schema' });
    }
    if (version < BASELINE_VERSION) {
        throw new errors_UserError(`${shown}: schema: this baseline (baseline@${version}) was written by an older neuron-budget, which judged networks on the rows that also steered their training; its widths do not compare with this version's. Delete the file and run \`neuron-budget baseline\` to record a new one`, { file: shown, key: 'schema' });
    }
    if (version !== BASELINE_VERSION) {
        throw new errors_UserError(`${shown}: schema: expected "${BASELINE_SCHEMA}", found ${baseline_describe(schema)}`, {
            file: shown,
            key: 'schema',
        });
    }
}
// ---- shape: schema/baseline.schema.json is the one definition ----
const baseline_checkShape = schemaValidator(baseline_schema_namespaceObject);
function validateBaselineShape(value, shown) {
    try {
        baseline_checkShape(value);
    }
    catch (e) {
        if (!(e instanceof SchemaProblem))
            throw e;
        throw new errors_UserError(`${shown}: ${e.key}: expected ${e.expected}, found ${e.found}`, { file: shown, key: e.key });
    }
}
const baseline_MISSING = Symbol('missing');
function baseline_isObject(v) {
    return typeof v === 'object' && v !== null && !Array.isArray(v);
}
function baseline_describe(v) {
    if (v === baseline_MISSING)
        return 'nothing';
    if (v === null)
        return 'null';
    if (Array.isArray(v))
        return 'a list';
    if (typeof v === 'object')
        return 'an object';
    if (typeof v === 'string')
        return escape_quote(v, 60);
    return typeof v === 'number' || typeof v === 'boolean' ? String(v) : typeof v;
}

;// CONCATENATED MODULE: external "node:os"
const external_node_os_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:os");
;// CONCATENATED MODULE: external "node:timers/promises"
const external_node_timers_promises_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:timers/promises");
;// CONCATENATED MODULE: ./src/files/lock.ts
/**
 * An exclusive lock beside a file, `.NAME.neuron-budget.lock`, for a read-compare-write that
 * must not interleave with another process's. Created with O_EXCL, so exactly one process
 * holds it; it records who holds it, so a lock whose holder died can be taken over:
 *
 * - its process is gone (same machine, by PID), or
 * - it is older than STALE_LOCK_AGE_MS (any machine; the section it guards takes
 *   milliseconds), or
 * - it is unreadable and older than a few seconds (a holder killed between create and write).
 */






const LOCK_SUFFIX = '.neuron-budget.lock';
/** A lock this old is stale, whoever holds it. @testOnly */
const STALE_LOCK_AGE_MS = 10 * 60 * 1000;
/** A lock file without readable content (its holder died before writing it) is stale after this. */
const EMPTY_LOCK_AGE_MS = 5_000;
function lockPathFor(path) {
    return (0,external_node_path_namespaceObject.join)((0,external_node_path_namespaceObject.dirname)(path), `.${(0,external_node_path_namespaceObject.basename)(path)}${LOCK_SUFFIX}`);
}
/** The lock is held by a live process and was not released in time. */
class LockBusy extends Error {
    lockPath;
    owner;
    constructor(lockPath, owner) {
        super(`${lockPath} is held${owner ? ` by process ${owner.pid}` : ''}`);
        this.lockPath = lockPath;
        this.owner = owner;
        this.name = 'LockBusy';
    }
}
async function acquireLock(path, options = {}) {
    const lockPath = lockPathFor(path);
    const waitMs = options.waitMs ?? 10_000;
    const pollMs = options.pollMs ?? 25;
    const record = {
        pid: process.pid,
        host: (0,external_node_os_namespaceObject.hostname)(),
        token: (0,external_node_crypto_namespaceObject.randomBytes)(8).toString('hex'),
        since: new Date().toISOString(),
    };
    const text = `${JSON.stringify(record)}\n`;
    const started = Date.now();
    for (;;) {
        try {
            const handle = await (0,promises_namespaceObject.open)(lockPath, 'wx');
            try {
                await handle.writeFile(text, 'utf8');
            }
            finally {
                await handle.close();
            }
            return { release: () => releaseLock(lockPath, text) };
        }
        catch (e) {
            if (e.code !== 'EEXIST')
                throw e;
        }
        const held = await inspect(lockPath);
        if (held === null)
            continue; // released between our try and the look
        if (held.stale) {
            // Re-read just before removing: never remove a lock someone else took over meanwhile.
            const again = await (0,promises_namespaceObject.readFile)(lockPath, 'utf8').catch(() => null);
            if (again === held.text)
                await (0,promises_namespaceObject.rm)(lockPath, { force: true });
            continue;
        }
        if (Date.now() - started >= waitMs)
            throw new LockBusy(lockPath, held.owner);
        await (0,external_node_timers_promises_namespaceObject.setTimeout)(pollMs);
    }
}
/** Removes the lock only while it is still ours. */
async function releaseLock(lockPath, text) {
    const now = await (0,promises_namespaceObject.readFile)(lockPath, 'utf8').catch(() => null);
    if (now === text)
        await (0,promises_namespaceObject.rm)(lockPath, { force: true });
}
async function inspect(lockPath) {
    let text;
    let age;
    try {
        text = await (0,promises_namespaceObject.readFile)(lockPath, 'utf8');
        age = Date.now() - (await (0,promises_namespaceObject.stat)(lockPath)).mtimeMs;
    }
    catch (e) {
        if (e.code === 'ENOENT')
            return null;
        throw e;
    }
    const owner = parseOwner(text);
    if (age >= STALE_LOCK_AGE_MS)
        return { text, stale: true, owner };
    if (owner === null)
        return { text, stale: age >= EMPTY_LOCK_AGE_MS, owner };
    const here = owner.host === (0,external_node_os_namespaceObject.hostname)();
    return { text, stale: here && processIsGone(owner.pid), owner };
}
/** The holder as the file says, or null. The file sits in a checkout: only plain values pass. */
function parseOwner(text) {
    let v;
    try {
        v = JSON.parse(text);
    }
    catch {
        return null;
    }
    if (typeof v !== 'object' || v === null)
        return null;
    const r = v;
    if (typeof r.pid !== 'number' || !Number.isSafeInteger(r.pid) || r.pid <= 0)
        return null;
    const host = typeof r.host === 'string' && /^[A-Za-z0-9._-]{1,255}$/.test(r.host) ? r.host : null;
    const since = typeof r.since === 'string' && !Number.isNaN(Date.parse(r.since)) ? new Date(r.since).toISOString() : null;
    return { pid: r.pid, host, since };
}

;// CONCATENATED MODULE: ./src/gate/baseline-update.ts
/**
 * Records an accepted result in the baseline file without losing another run's. A run reads
 * the baseline before its search and builds the next one from it; if a second run wrote the
 * file in between, writing ours would silently drop that run's history entry. So the write
 * happens under an exclusive lock beside the file, after reading the file again: unchanged,
 * ours is written; changed, nothing is written and the user is told to run again (exit 2).
 */




/**
 * Writes `next` to `path` if the file still holds `expected` (null: no file), else throws a
 * UserError naming the file (`shown`, as the user wrote it).
 */
async function updateBaseline(path, shown, expected, next) {
    const lock = await lockOrRefuse(path, shown);
    try {
        const now = await readBaseline(path, shown);
        if (!sameBaseline(expected, now)) {
            const what = now === null ? 'was removed' : expected === null ? 'was created' : 'changed';
            throw new errors_UserError(`${shown}: the baseline file ${what} while this run was searching (another \`neuron-budget baseline\` run?), ` +
                'so this result was not recorded, to keep that change. Run `neuron-budget baseline` again to record it on top.', { file: shown });
        }
        await writeBaseline(path, next);
    }
    finally {
        await lock.release();
    }
}
async function lockOrRefuse(path, shown) {
    try {
        return await acquireLock(path);
    }
    catch (e) {
        if (!(e instanceof LockBusy))
            throw e;
        const lockShown = displayLockPath(shown, path);
        const who = e.owner
            ? ` by process ${e.owner.pid}${e.owner.host ? ` on ${e.owner.host}` : ''}${e.owner.since ? ` since ${e.owner.since}` : ''}`
            : '';
        throw new errors_UserError(`${shown}: another neuron-budget run is writing this baseline (lock file ${lockShown}, held${who}), so this result was not recorded. ` +
            'Run `neuron-budget baseline` again when it has finished; if none is running, delete the lock file.', { file: shown });
    }
}
/** The lock file's path in the same form as the baseline's as the user wrote it. */
function displayLockPath(shown, path) {
    return `${shown.slice(0, shown.lastIndexOf('/') + 1)}${(0,external_node_path_namespaceObject.basename)(lockPathFor(path))}`;
}
/** Same content; key order and formatting of the file do not matter to a reader. */
function sameBaseline(a, b) {
    if (a === null || b === null)
        return a === b;
    return canonical(a) === canonical(b);
}
function canonical(v) {
    if (Array.isArray(v))
        return `[${v.map(canonical).join(',')}]`;
    if (v !== null && typeof v === 'object') {
        const keys = Object.keys(v).sort();
        return `{${keys.map((k) => `${JSON.stringify(k)}:${canonical(v[k])}`).join(',')}}`;
    }
    return JSON.stringify(v);
}

;// CONCATENATED MODULE: ./src/gate/stage.ts



async function runGateStage(input) {
    const previous = input.previous;
    const config = input.baselinePath === input.config.gate.baseline
        ? input.config
        : {
            ...input.config,
            gate: { ...input.config.gate, baseline: input.baselinePath, baselineAsWritten: input.baselineShown },
        };
    const outcome = evaluateGate({
        result: input.result,
        loaded: input.loaded,
        config,
        baseline: previous,
        cost: input.cost ?? null,
    });
    if (input.mode === 'check')
        return { outcome, written: null, record: null, gate: config.gate };
    const why = whyNotRecordable(input.result);
    if (why !== null)
        return { outcome, written: null, record: { notWritten: why }, gate: config.gate };
    const next = nextBaseline(previous, { result: input.result, loaded: input.loaded, config }, { date: input.date, commit: input.commit, toolVersion: input.toolVersion });
    // Only if the file still holds what `previous` was read from: never drop another run's entry.
    await updateBaseline(input.baselinePath, input.baselineShown, previous, next);
    const record = { file: input.baselineShown, width: next.result.width, historyEntries: next.history.length };
    return { outcome, written: input.baselinePath, record, gate: config.gate };
}

;// CONCATENATED MODULE: ./src/gate/index.ts
/**
 * The gate: baseline file, comparison and data changes. `evaluateGate` is the one call
 * the job needs after the search; `nextBaseline`/`writeBaseline` record an accepted result.
 */








;// CONCATENATED MODULE: ./src/search/growth.ts
function taskKey(task) {
    return `${task.width}:${task.restart}`;
}
/**
 * The widths in the order a walk can visit them. From min-width: upward. From a start width S
 * (fresh growth only): S, S−1, S+1, S−2, S+2, … within the range, so whichever way the walk
 * turns after S, the widths it visits come in increasing position and every task before the
 * first undecided one can no longer matter.
 */
function walkOrder(plan) {
    const start = startWidth(plan);
    if (start === null) {
        const out = [];
        for (let w = plan.minWidth; w <= plan.maxWidth; w++)
            out.push(w);
        return out;
    }
    const out = [start];
    for (let d = 1; start - d >= plan.minWidth || start + d <= plan.maxWidth; d++) {
        if (start - d >= plan.minWidth)
            out.push(start - d);
        if (start + d <= plan.maxWidth)
            out.push(start + d);
    }
    return out;
}
/** The width the walk starts from when it does not start at min-width (fresh growth only), clamped to the range. */
function startWidth(plan) {
    if (plan.growth === 'in-place' || plan.start === undefined || plan.start === null)
        return null;
    return Math.min(plan.maxWidth, Math.max(plan.minWidth, plan.start));
}
/** Every growth task in canonical order (walkOrder). In-place growth has one task per restart, starting at min-width. */
function planTasks(plan) {
    const tasks = [];
    if (plan.growth === 'in-place') {
        for (let i = 0; i < plan.restarts; i++)
            tasks.push({ width: plan.minWidth, restart: i });
        return tasks;
    }
    for (const w of walkOrder(plan)) {
        for (let i = 0; i < plan.restarts; i++)
            tasks.push({ width: w, restart: i });
    }
    return tasks;
}
/** The task whose result says how restart `restart` fares at width `width`. */
function taskFor(plan, width, restart) {
    return plan.growth === 'in-place' ? { width: plan.minWidth, restart } : { width, restart };
}
/**
 * In-place growth maps onto widths like this: restart i counts as meeting the target at width w
 * when its network met it at a width no larger than w (a network of fewer neurons that meets the
 * target is also a width-w network: give the extra neurons zero outgoing weights). Otherwise its
 * figures at w are those at the end of its time at w; a restart that diverged before w counts as
 * a diverged failure.
 */
function restartAtWidth(plan, result, width) {
    const task = { width: result.width, restart: result.restart };
    const base = { restart: result.restart, task };
    const judged = (j) => ({
        train: j.train,
        steering: j.steering,
        judged: j.judged,
        reached: j.reached,
        met: j.met,
    });
    if (plan.growth !== 'in-place') {
        return {
            ...base,
            ...judged(result),
            epochs: result.epochs,
            stop: result.stop,
            reason: result.reason,
            network: result.network,
        };
    }
    if (result.met && result.finalWidth <= width) {
        return {
            ...base,
            ...judged(result),
            epochs: result.epochs,
            stop: result.stop,
            reason: null,
            network: result.network,
        };
    }
    const seg = result.segments.find((s) => s.width === width);
    if (seg !== undefined) {
        const diverged = seg.stop === 'diverged';
        return {
            ...base,
            ...judged(seg),
            met: false,
            epochs: seg.epochs,
            stop: seg.stop,
            reason: diverged ? result.reason : null,
            network: null,
        };
    }
    const nan = Number.NaN;
    return {
        ...base,
        train: nan,
        steering: nan,
        judged: nan,
        reached: false,
        met: false,
        epochs: result.epochs,
        stop: 'diverged',
        reason: result.reason,
        network: null,
    };
}
/**
 * Walk the widths as the header says. Pure: the same outcomes give the same decision.
 * From a start width S the walk decides S first; when S is adequate it steps down until a width
 * is not (the answer is the last adequate one), otherwise it steps up until one is. It assumes
 * that adequacy, once lost going down, does not come back at a smaller width.
 */
function decideGrowth(plan, lookup) {
    const tried = [];
    const used = new Set();
    const allowedFailures = plan.restarts - plan.required;
    const byWidth = () => [...tried].sort((a, b) => a.width - b.width);
    const decideWidth = (w) => {
        const seen = [];
        let successes = 0;
        let failures = 0;
        for (let i = 0; i < plan.restarts; i++) {
            if (successes >= plan.required || failures > allowedFailures)
                break;
            const task = taskFor(plan, w, i);
            const key = taskKey(task);
            if (!used.has(key) && plan.maxTrainings !== null && used.size >= plan.maxTrainings) {
                if (seen.length > 0)
                    tried.push({ width: w, restarts: seen });
                const capHit = { width: w, restartsRun: seen.length };
                return { stop: { kind: 'decided', grownWidth: null, tried: byWidth(), trainings: used.size, capHit } };
            }
            const result = lookup(task);
            if (result === undefined) {
                if (seen.length > 0)
                    tried.push({ width: w, restarts: seen });
                return { stop: { kind: 'need', task, deciding: w, tried: byWidth(), trainings: used.size } };
            }
            used.add(key);
            const at = restartAtWidth(plan, result, w);
            seen.push(at);
            if (at.met)
                successes++;
            else
                failures++;
        }
        tried.push({ width: w, restarts: seen });
        return { adequate: successes >= plan.required };
    };
    const decided = (grownWidth) => ({
        kind: 'decided',
        grownWidth,
        tried: byWidth(),
        trainings: used.size,
        capHit: null,
    });
    const start = startWidth(plan);
    if (start !== null) {
        const first = decideWidth(start);
        if ('stop' in first)
            return first.stop;
        if (first.adequate) {
            let lowest = start;
            for (let w = start - 1; w >= plan.minWidth; w--) {
                const step = decideWidth(w);
                if ('stop' in step)
                    return step.stop;
                if (!step.adequate)
                    break;
                lowest = w;
            }
            return decided(lowest);
        }
        for (let w = start + 1; w <= plan.maxWidth; w++) {
            const step = decideWidth(w);
            if ('stop' in step)
                return step.stop;
            if (step.adequate)
                return decided(w);
        }
        return decided(null);
    }
    for (let w = plan.minWidth; w <= plan.maxWidth; w++) {
        const step = decideWidth(w);
        if ('stop' in step)
            return step.stop;
        if (step.adequate)
            return decided(w);
    }
    return decided(null);
}
/**
 * Merge growth results from anywhere (threads, processes, machines) into the decision.
 * Identical duplicates are fine; two different results for one task are refused; extra results
 * past the decision point are ignored.
 */
function mergeOutcomes(plan, results) {
    const byKey = new Map();
    for (const r of results) {
        const key = taskKey(r);
        const seen = byKey.get(key);
        // Every task is a pure function of (data, settings, task): two copies that differ mean mixed inputs.
        if (seen !== undefined && JSON.stringify(seen) !== JSON.stringify(r)) {
            throw new Error(`two different results for the task at width ${r.width}, restart ${r.restart}`);
        }
        byKey.set(key, r);
    }
    return decideGrowth(plan, (t) => byKey.get(taskKey(t)));
}

;// CONCATENATED MODULE: ./src/matrix/exact-json.ts
/**
 * JSON that carries every float64 a search produces exactly: JSON writes NaN and ±Infinity as
 * null and −0 as 0, and a merged search must see the very numbers its shards computed (a
 * diverged training's NaN metric decides how its restart counts). Those four values travel as
 * the strings below; every other number already round-trips through JSON unchanged.
 */
const SPECIAL = {
    NaN: Number.NaN,
    Infinity: Number.POSITIVE_INFINITY,
    '-Infinity': Number.NEGATIVE_INFINITY,
    '-0': -0,
};
function toExactJson(value) {
    return JSON.stringify(value, (_key, v) => {
        if (typeof v !== 'number')
            return v;
        if (Number.isNaN(v))
            return 'NaN';
        if (v === Number.POSITIVE_INFINITY)
            return 'Infinity';
        if (v === Number.NEGATIVE_INFINITY)
            return '-Infinity';
        return Object.is(v, -0) ? '-0' : v;
    });
}
/** Parses text written by toExactJson (the caller has checked the syntax). */
function fromExactJson(text) {
    return JSON.parse(text, (_key, v) => (typeof v === 'string' && Object.hasOwn(SPECIAL, v) ? SPECIAL[v] : v));
}

;// CONCATENATED MODULE: ./src/matrix/part.ts
/**
 * A part: what one shard of a plan computed, as a small JSON file that travels as an artifact.
 * It names the plan, the data and the settings it was computed for, so `merge` can refuse a part
 * that belongs to another run, and it carries each training's full outcome (and the networks that
 * met the target, pruned or not), so the merged search is the one-machine search exactly.
 */





const PART_SCHEMA = 'neuron-budget/part@1';
function serializePart(part) {
    return `${toExactJson(part)}\n`;
}
function part_describe(v) {
    if (v === undefined)
        return 'nothing';
    if (v === null)
        return 'null';
    if (Array.isArray(v))
        return `a list of ${v.length}`;
    if (typeof v === 'object')
        return 'an object';
    if (typeof v === 'string')
        return escape_quote(v, 40);
    return typeof v === 'number' || typeof v === 'boolean' ? String(v) : typeof v;
}
const part_isObject = (v) => typeof v === 'object' && v !== null && !Array.isArray(v);
/** Syntax, then the fields that say where the part came from; the content is checked by checkPart. */
function parsePart(text, shown) {
    const syntax = findJsonSyntaxProblem(text);
    if (syntax) {
        throw new errors_UserError(`${shown}:${syntax.line}:${syntax.column}: the part is not valid JSON: ${syntax.detail}`);
    }
    const doc = fromExactJson(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
    const bad = badIn(shown);
    if (!part_isObject(doc))
        return bad('(top level)', 'a neuron-budget part (a JSON object)', doc);
    if (doc['schema'] !== PART_SCHEMA)
        bad('schema', `"${PART_SCHEMA}"; this file is not the output of neuron-budget shard`, doc['schema']);
    const str = (o, key, at) => {
        const v = part_isObject(o) ? o[key] : undefined;
        return typeof v === 'string' ? v : bad(at, 'a string', v);
    };
    const int = (o, key, at) => {
        const v = part_isObject(o) ? o[key] : undefined;
        return Number.isInteger(v) && v >= 0 ? v : bad(at, 'a whole number ≥ 0', v);
    };
    str(doc['tool'], 'version', 'tool.version');
    str(doc, 'plan', 'plan');
    int(doc['shard'], 'index', 'shard.index');
    int(doc['shard'], 'of', 'shard.of');
    str(doc['data'], 'fingerprint', 'data.fingerprint');
    str(doc['settings'], 'fingerprint', 'settings.fingerprint');
    if (!Array.isArray(doc['results']))
        bad('results', 'a list', doc['results']);
    if (!Array.isArray(doc['pruned']))
        bad('pruned', 'a list', doc['pruned']);
    return doc;
}
const part_short = (hash) => `${hash.slice(0, 12)}…`;
/**
 * Whether the part belongs to this run: the same tool version, data, settings and plan, and
 * holds results for exactly its shard's tasks, each of the right shape.
 */
function checkPart(part, shown, want) {
    const refuse = (why) => {
        throw new errors_UserError(`${shown}: ${why}`);
    };
    const plan = want.plan;
    if (part.tool.version !== want.toolVersion)
        refuse(`made by neuron-budget ${escape_quote(part.tool.version, 20)}, but this is ${want.toolVersion}; run every stage with the same version`);
    if (part.data.fingerprint !== plan.data.fingerprint)
        refuse(`computed on other data (data fingerprint ${part_short(part.data.fingerprint)} in the part, ${part_short(plan.data.fingerprint)} here); every stage must run on the same commit`);
    if (part.settings.fingerprint !== plan.settings.fingerprint)
        refuse(`computed with other result-changing settings (settings fingerprint ${part_short(part.settings.fingerprint)} in the part, ${part_short(plan.settings.fingerprint)} here)`);
    if (part.shard.of !== plan.shards.length || part.plan !== plan.id)
        refuse(`belongs to another plan (plan ${part_short(part.plan)} of ${part.shard.of} shards; this run's plan is ${part_short(plan.id)} of ${plan.shards.length}): the plan, the shards and the merge must come from the same config, data and baseline`);
    const shard = plan.shards[part.shard.index];
    if (shard === undefined)
        refuse(`shard.index ${part.shard.index} is not a shard of this plan (0 to ${plan.shards.length - 1})`);
    const bad = badIn(shown);
    const tasks = new Map(shard.tasks.map((t) => [taskKey(t), t]));
    const seen = new Set();
    part.results.forEach((r, k) => {
        checkTaskResult(r, `results[${k}]`, want, bad);
        const key = taskKey(r);
        if (!tasks.has(key) || seen.has(key))
            bad(`results[${k}]`, `a task of shard ${part.shard.index}, each once`, `width ${r.width}, restart ${r.restart + 1}`);
        seen.add(key);
    });
    const prunedSeen = new Set();
    part.pruned.forEach((p, k) => {
        const at = `pruned[${k}]`;
        if (!part_isObject(p))
            return bad(at, 'a pruned network', p);
        checkTask(p.source, `${at}.source`, bad);
        const key = taskKey(p.source);
        if (!tasks.get(key)?.prune || prunedSeen.has(key))
            bad(`${at}.source`, `a task shard ${part.shard.index} prunes, each once`, `width ${p.source.width}`);
        prunedSeen.add(key);
        if (!Array.isArray(p.chain))
            bad(`${at}.chain`, 'a list', p.chain);
        if (!Array.isArray(p.steps))
            bad(`${at}.steps`, 'a list', p.steps);
        if (!isCount(p.trainings))
            bad(`${at}.trainings`, 'a whole number ≥ 0', p.trainings);
        if (typeof p.interrupted !== 'boolean')
            bad(`${at}.interrupted`, 'true or false', p.interrupted);
        // A chain shrinks one neuron per link, from the source's width down.
        p.chain.forEach((link, j) => {
            const where = `${at}.chain[${j}]`;
            checkJudged(link, where, bad);
            if (link.width !== p.source.width - 1 - j)
                bad(`${where}.width`, `${p.source.width - 1 - j}`, link.width);
            checkNetwork(link.network, `${where}.network`, want, bad);
            if (link.network.width !== link.width)
                bad(`${where}.network.width`, `${link.width}`, link.network.width);
        });
        p.steps.forEach((step, j) => checkStep(step, `${at}.steps[${j}]`, bad));
    });
}
function badIn(shown) {
    return (key, expected, found) => {
        throw new errors_UserError(`${shown}: ${key}: expected ${expected}, found ${part_describe(found)}`, { key });
    };
}
const isCount = (v) => Number.isInteger(v) && v >= 0;
const STOPS = new Set(['reached', 'stalled', 'diverged', 'max-epochs']);
function checkTask(t, at, bad) {
    if (!part_isObject(t))
        return bad(at, 'a task (width and restart)', t);
    if (!Number.isInteger(t['width']) || t['width'] < 1)
        bad(`${at}.width`, 'a whole number ≥ 1', t['width']);
    if (!isCount(t['restart']))
        bad(`${at}.restart`, 'a whole number ≥ 0', t['restart']);
}
function checkJudged(j, at, bad) {
    if (!part_isObject(j))
        return bad(at, 'an object', j);
    for (const k of ['train', 'steering', 'judged'])
        if (typeof j[k] !== 'number')
            bad(`${at}.${k}`, 'a number', j[k]);
    for (const k of ['reached', 'met'])
        if (typeof j[k] !== 'boolean')
            bad(`${at}.${k}`, 'true or false', j[k]);
}
function checkStep(step, at, bad) {
    if (!part_isObject(step))
        return bad(at, 'a prune step', step);
    checkTask(step['source'], `${at}.source`, bad);
    if (!Number.isInteger(step['width']) || step['width'] < 1)
        bad(`${at}.width`, 'a whole number ≥ 1', step['width']);
    if (!isCount(step['neuron']))
        bad(`${at}.neuron`, 'a whole number ≥ 0', step['neuron']);
    for (const k of ['steeringBefore', 'steeringAfter'])
        if (typeof step[k] !== 'number')
            bad(`${at}.${k}`, 'a number', step[k]);
    if (typeof step['accepted'] !== 'boolean')
        bad(`${at}.accepted`, 'true or false', step['accepted']);
    if (step['judged'] !== null && typeof step['judged'] !== 'number')
        bad(`${at}.judged`, 'a number or null', step['judged']);
}
function checkTaskResult(r, at, want, bad) {
    checkJudged(r, at, bad);
    const o = r;
    checkTask(o, at, bad);
    for (const k of ['epochs', 'finalWidth'])
        if (!isCount(o[k]))
            bad(`${at}.${k}`, 'a whole number ≥ 0', o[k]);
    if (typeof o['stop'] !== 'string' || !STOPS.has(o['stop']))
        bad(`${at}.stop`, 'a stop reason', o['stop']);
    if (!Array.isArray(o['segments']))
        bad(`${at}.segments`, 'a list', o['segments']);
    o['segments'].forEach((seg, k) => {
        const where = `${at}.segments[${k}]`;
        checkJudged(seg, where, bad);
        const g = seg;
        if (!Number.isInteger(g['width']) || g['width'] < 1)
            bad(`${where}.width`, 'a whole number ≥ 1', g['width']);
        if (!isCount(g['epochs']))
            bad(`${where}.epochs`, 'a whole number ≥ 0', g['epochs']);
        if (typeof g['stop'] !== 'string' || !STOPS.has(g['stop']))
            bad(`${where}.stop`, 'a stop reason', g['stop']);
    });
    if (o['network'] !== null) {
        checkNetwork(o['network'], `${at}.network`, want, bad);
        if (o['network'].width !== o['finalWidth'])
            bad(`${at}.network.width`, `finalWidth (${String(o['finalWidth'])})`, o['network'].width);
    }
    if (o['reason'] !== null && typeof o['reason'] !== 'string')
        bad(`${at}.reason`, 'a sentence or null', o['reason']);
}
function checkNetwork(n, at, want, bad) {
    if (!part_isObject(n))
        return bad(at, 'a network', n);
    const net = n;
    if (net.inputs !== want.inputs)
        bad(`${at}.inputs`, `${want.inputs}`, net.inputs);
    if (net.outputs !== want.outputs)
        bad(`${at}.outputs`, `${want.outputs}`, net.outputs);
    if (!Number.isInteger(net.width) || net.width < 1)
        bad(`${at}.width`, 'a whole number ≥ 1', net.width);
    // The activation and head follow from the settings, which the fingerprint already matched.
    if (net.activation !== want.activation)
        bad(`${at}.activation`, `"${want.activation}"`, net.activation);
    if (net.head !== want.head)
        bad(`${at}.head`, `"${want.head}"`, net.head);
    const numbers = (v, key, length) => {
        if (!Array.isArray(v) || v.length !== length || !v.every((x) => typeof x === 'number'))
            bad(key, `${length} numbers`, v);
    };
    const rows = (v, key, count, length) => {
        if (!Array.isArray(v) || v.length !== count)
            return bad(key, `${count} rows`, v);
        v.forEach((row, i) => numbers(row, `${key}[${i}]`, length));
    };
    rows(net.hiddenWeights, `${at}.hiddenWeights`, net.width, net.inputs);
    numbers(net.hiddenBias, `${at}.hiddenBias`, net.width);
    rows(net.outputWeights, `${at}.outputWeights`, net.outputs, net.width);
    numbers(net.outputBias, `${at}.outputBias`, net.outputs);
}

;// CONCATENATED MODULE: ./src/matrix/plan.ts
/**
 * A search as a plan of independent tasks for a job matrix: which (width, restart) trainings
 * each shard runs, balanced by their expected cost, and which of their networks a shard prunes
 * when they meet the target. The plan is a pure function of the data, the result-changing
 * settings, the start (a matching baseline) and the shard count, and its id is the hash of all
 * of them, so `merge` can rebuild it and tell whether every part belongs to it.
 *
 * Which tasks: from a baseline's width S, the two widths the common answer needs (S and S − 1,
 * every restart); from min-width, every width up to max-width. Whatever the decision needs
 * beyond the plan, `merge` runs itself, so a plan that guessed short costs time, never the answer.
 * Which networks are pruned on the shards: those on the path a one-machine search takes when
 * the answer has not moved (S's first `required` restarts, S − 1's first restarts − required + 1);
 * `merge` prunes any other network the answer needs.
 */


const PLAN_SCHEMA = 'neuron-budget/plan@1';
/** A matrix has at most 256 jobs per workflow run. */
const MAX_SHARDS = 256;
function taskMacs(m, task) {
    const weights = (w) => w * (m.inputs + m.outputs + 1) + m.outputs;
    const training = 3 * m.trainRows * m.maxEpochs * weights(task.width);
    // A prune chain usually ends after one refused step: pruneCandidates retrainings one neuron smaller.
    const pruning = task.prune && task.width > 1 ? 3 * m.trainRows * m.pruneEpochs * m.pruneCandidates * weights(task.width - 1) : 0;
    return training + pruning;
}
/** The tasks the plan covers, in canonical order, with the ones pruned on the shards marked. @testOnly */
function plannedTasks(plan) {
    const start = startWidth(plan);
    if (start === null)
        return planTasks(plan).map((t) => ({ ...t, prune: false }));
    const onPath = (t) => t.width === start ? t.restart < plan.required : t.restart <= plan.restarts - plan.required;
    return planTasks(plan)
        .filter((t) => t.width === start || t.width === start - 1)
        .map((t) => ({ ...t, prune: onPath(t) }));
}
/**
 * Split the tasks over `shards` shards (fewer when there are fewer tasks) by longest expected
 * cost first onto the least loaded shard; ties go to the earlier task and the lower shard, so the
 * plan is the same on every machine.
 */
function makePlan(plan, shards, identity, cost) {
    const tasks = plannedTasks(plan);
    const count = Math.max(1, Math.min(shards, tasks.length));
    const position = new Map(tasks.map((t, k) => [taskKey(t), k]));
    const byCost = tasks
        .map((t) => ({ t, macs: taskMacs(cost, t) }))
        .sort((a, b) => b.macs - a.macs || position.get(taskKey(a.t)) - position.get(taskKey(b.t)));
    const out = Array.from({ length: count }, (_, index) => ({ index, estimatedMacs: 0, tasks: [] }));
    for (const { t, macs } of byCost) {
        let least = out[0];
        for (const s of out)
            if (s.estimatedMacs < least.estimatedMacs)
                least = s;
        least.tasks.push(t);
        least.estimatedMacs += macs;
    }
    for (const s of out)
        s.tasks.sort((a, b) => position.get(taskKey(a)) - position.get(taskKey(b)));
    const start = startWidth(plan);
    const body = {
        schema: PLAN_SCHEMA,
        tool: { name: 'neuron-budget', version: identity.toolVersion },
        data: { fingerprint: identity.data, rows: identity.rows },
        settings: { fingerprint: identity.settings },
        start: start === null
            ? { from: 'min-width', width: plan.minWidth }
            : { from: 'baseline', width: start },
        shards: out,
    };
    return { ...body, id: planId(body) };
}
function planId(body) {
    return (0,external_node_crypto_namespaceObject.createHash)('sha256').update(JSON.stringify(body), 'utf8').digest('hex');
}

;// CONCATENATED MODULE: ./src/common/random.ts
/**
 * Seeded random numbers: xoshiro128** version 1.1 (Blackman & Vigna), seeded through
 * SplitMix64 (Steele, Lea & Flood). Only 32-bit integer operations in the hot path, so every
 * engine produces the same stream. Every random choice in neuron-budget (the data split, the
 * initial weights) draws from here.
 */
const MASK64 = (1n << 64n) - 1n;
const GOLDEN_GAMMA = 0x9e3779b97f4a7c15n;
/** One SplitMix64 output step: advances `state` by the golden gamma and mixes it. */
function splitMix64Mix(z) {
    z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
    z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
    return z ^ (z >> 31n);
}
/** A SplitMix64 generator over 64-bit unsigned BigInts (used for seeding only). @testOnly */
class SplitMix64 {
    state;
    constructor(seed) {
        this.state = BigInt.asUintN(64, seed);
    }
    next() {
        this.state = (this.state + GOLDEN_GAMMA) & MASK64;
        return splitMix64Mix(this.state);
    }
}
/** xoshiro128** 1.1: the scrambler reads s[1] (version 1.0 wrongly read s[0]). @testOnly */
class Xoshiro128StarStar {
    a;
    b;
    c;
    d;
    constructor(s0, s1, s2, s3) {
        this.a = s0 | 0;
        this.b = s1 | 0;
        this.c = s2 | 0;
        this.d = s3 | 0;
        if ((this.a | this.b | this.c | this.d) === 0) {
            throw new RangeError('xoshiro128** state must not be all zero');
        }
    }
    /** The four state words as unsigned 32-bit integers. */
    state() {
        return [this.a >>> 0, this.b >>> 0, this.c >>> 0, this.d >>> 0];
    }
    nextUint32() {
        const r = Math.imul(this.b, 5);
        const result = Math.imul((r << 7) | (r >>> 25), 9) >>> 0;
        const t = this.b << 9;
        this.c ^= this.a;
        this.d ^= this.b;
        this.b ^= this.c;
        this.a ^= this.d;
        this.c ^= t;
        this.d = (this.d << 11) | (this.d >>> 21);
        return result;
    }
    nextDouble() {
        const hi = this.nextUint32() >>> 5;
        const lo = this.nextUint32() >>> 6;
        return (hi * 67108864 + lo) / 9007199254740992;
    }
}
/**
 * Our seeding convention: a SplitMix64 generator started at `seed`; its first two outputs
 * r0, r1 give the state words [lo(r0), hi(r0), lo(r1), hi(r1)].
 */
function xoshiroFromSeed(seed) {
    const sm = new SplitMix64(seed);
    for (;;) {
        const r0 = sm.next();
        const r1 = sm.next();
        const w = [r0 & 0xffffffffn, r0 >> 32n, r1 & 0xffffffffn, r1 >> 32n].map(Number);
        // An all-zero state is a fixed point; draw again in the (2^-128) case it happens.
        if ((w[0] | w[1] | w[2] | w[3]) !== 0)
            return new Xoshiro128StarStar(w[0], w[1], w[2], w[3]);
    }
}
function toUint64(n, what) {
    if (!Number.isSafeInteger(n))
        throw new RangeError(`${what} must be a safe integer, got ${n}`);
    return BigInt.asUintN(64, BigInt(n));
}
/**
 * The stream for restart `restart` of width `width` under base seed `seed`. The three numbers
 * are chained through the SplitMix64 mixer so that neighbouring triples give unrelated streams.
 */
function rngFor(seed, width, restart) {
    let h = splitMix64Mix((toUint64(seed, 'seed') + GOLDEN_GAMMA) & MASK64);
    h = splitMix64Mix(((h ^ toUint64(width, 'width')) + GOLDEN_GAMMA * 2n) & MASK64);
    h = splitMix64Mix(((h ^ toUint64(restart, 'restart')) + GOLDEN_GAMMA * 3n) & MASK64);
    return xoshiroFromSeed(h);
}
/** Fisher–Yates shuffle in place. */
function shuffle(items, rng) {
    for (let i = items.length - 1; i > 0; i--) {
        const j = Math.floor(rng.nextDouble() * (i + 1));
        const t = items[i];
        items[i] = items[j];
        items[j] = t;
    }
}

;// CONCATENATED MODULE: ./src/search/classes.ts
/** counts[t][p]: rows of true class t predicted as p. */
function confusion(predicted, truth, classes) {
    const counts = Array.from({ length: classes }, () => new Array(classes).fill(0));
    for (let r = 0; r < truth.length; r++)
        counts[truth[r]][predicted[r]]++;
    return counts;
}
/** Recall per class: correct / rows of that class; NaN for a class with no rows. */
function recalls(counts) {
    return counts.map((row, c) => {
        const n = row.reduce((s, v) => s + v, 0);
        return n === 0 ? Number.NaN : row[c] / n;
    });
}
/** Precision per class: correct / rows predicted as that class; NaN when none was. */
function precisions(counts) {
    return counts.map((_, c) => {
        const n = counts.reduce((s, row) => s + row[c], 0);
        return n === 0 ? Number.NaN : counts[c][c] / n;
    });
}
/** Every class with a floor above 0 reaches it; a class absent from the rows cannot be checked and passes. */
function recallsHold(counts, floors) {
    const r = recalls(counts);
    return floors.every((min, c) => min <= 0 || Number.isNaN(r[c]) || r[c] >= min);
}
/** The target metric from predictions: class indices (accuracy) or values in the target's units (errors). */
function metricOfPredictions(metric, predicted, truth) {
    const n = truth.length;
    if (n === 0)
        return Number.NaN;
    if (metric === 'accuracy') {
        let correct = 0;
        for (let r = 0; r < n; r++)
            if (predicted[r] === truth[r])
                correct++;
        return correct / n;
    }
    let se = 0;
    let ae = 0;
    let max = 0;
    for (let r = 0; r < n; r++) {
        const d = Math.abs(predicted[r] - truth[r]);
        se += d * d;
        ae += d;
        if (d > max || d !== d)
            max = d;
    }
    return metric === 'rmse' ? Math.sqrt(se / n) : metric === 'mae' ? ae / n : max;
}

;// CONCATENATED MODULE: ./src/search/judge.ts
/**
 * Whether a trained network meets the target: decided on the judging rows alone, which no
 * training ever reads (they do not stop a training, pick a restart or accept a pruning step).
 * Without judging rows the validation rows judge, and without those the training rows.
 *
 * A network meets the target when, in the form target.precision names (float32, or the int8
 * form the exported C runs, quantised as src/device/quantize.ts does), its metric meets the
 * threshold on those rows and every class with a recall floor (target.min-recall) reaches it.
 */




function judgingRowsOf(data, folded) {
    if (data.judgingRows > 0)
        return { on: 'judging', rows: data.judgingRows, folded };
    if (data.validationRows > 0)
        return { on: 'validation', rows: data.validationRows, folded };
    return { on: 'training', rows: data.trainRows, folded };
}
/** The encoded rows that judge, with their targets (classes, or standardised values). */
function judgedRows(data) {
    if (data.judgingRows > 0)
        return { x: data.xJudging, y: data.yJudging, rows: data.judgingRows };
    if (data.validationRows > 0)
        return { x: data.xValidation, y: data.yValidation, rows: data.validationRows };
    return { x: data.xTrain, y: data.yTrain, rows: data.trainRows };
}
/** Everything the screens show about a network on the rows that judge. `withInt8` computes the int8 form even when float32 decides. */
function appraise(data, net, target, withInt8) {
    const { x, y, rows } = judgedRows(data);
    const std = data.encoding.target.std;
    const float32 = metricOn(net, x, y, rows, target.metric, std);
    const int8Decides = target.precision === 'int8';
    let int8 = null;
    let int8Classes = null;
    if ((withInt8 || int8Decides) && data.rawJudged !== undefined) {
        const q = quantizeNetwork(net, data.encoding, { x: data.xTrain, rows: data.trainRows });
        const out = int8Forward(q, data.rawJudged, rows);
        if (data.task === 'classification') {
            int8Classes = out.classes;
            int8 = metricOfPredictions(target.metric, out.classes, y);
        }
        else {
            const t = data.encoding.target;
            int8 = metricOfPredictions(target.metric, out.outputs, Float64Array.from(y, (v) => v * t.std + t.mean));
        }
    }
    if (int8Decides && int8 === null)
        throw new Error('target.precision is int8, but the dataset has no raw rows to run the int8 form on');
    const deciding = int8Decides ? int8 : float32;
    let counts = null;
    if (data.task === 'classification') {
        const predicted = int8Decides ? int8Classes : classesOn(net, x, rows);
        counts = confusion(predicted, y, data.encoding.target.classes?.length ?? 2);
    }
    const floors = target.recallFloors ?? null;
    const recallOk = floors === null || counts === null || recallsHold(counts, floors);
    return {
        float32,
        int8,
        confusion: counts,
        recall: counts === null ? null : recalls(counts),
        precision: counts === null ? null : precisions(counts),
        deciding,
        met: meetsThreshold(deciding, target) && recallOk,
    };
}
/** The record of a finished training, with its judgement on the rows that judge added. */
function judge(data, net, rec, target) {
    const diverged = rec.stop === 'diverged' || net === null;
    const a = diverged ? null : appraise(data, net, target, false);
    return {
        train: rec.trainMetric,
        steering: rec.steeringMetric,
        judged: a === null ? Number.NaN : a.deciding,
        reached: !diverged && meetsThreshold(rec.steeringMetric, target),
        met: a !== null && a.met,
    };
}

;// CONCATENATED MODULE: ./src/search/task.ts
/**
 * One unit of work, runnable in any thread: a growth task (one seeded training, or one
 * network grown in place) or a prune job (shrinking one network that met the target).
 * Everything here is a pure function of (data, context, task): no shared state, and the clock is
 * read only through `cancelled`, which can only end a task early (the caller then discards it).
 */



/**
 * Dynamic Node Creation trigger (Ash 1989): window 100 epochs, relative slope 0.05.
 * Engineering choices inside the published range (window 25 and slope 0.1 in one
 * published description; checks every 100 updates with a 1% threshold in another).
 */
const DEFAULT_STALL = { window: 100, threshold: 0.05 };
/** Engineering choice: try the three least salient neurons before giving up a prune step. */
const DEFAULT_PRUNE_CANDIDATES = 3;
const never = () => false;
function divergedReason(width, epochs) {
    return `training diverged (a non-finite loss or weight) at width ${width} after ${epochs} epochs`;
}
/** Gives up when the caller says so or the search's time is up. */
function stopWhen(ctx, cancelled) {
    const deadline = ctx.deadline;
    return deadline === null ? cancelled : () => cancelled() || Date.now() >= deadline;
}
/**
 * Run one growth task; the result is plain JSON (it can cross threads, processes, machines).
 * null only when `cancelled` (or the time budget) said to give up.
 * In-place growth (Dynamic Node Creation) starts at the task's width and gives every width up to
 * max-epochs; a neuron is added when the error curve flattens (the stall trigger) or that budget
 * runs out, until the target is met or max-width is hit.
 */
function runTask(data, ctx, task, cancelled = never) {
    const { plan, train } = ctx;
    const inPlace = plan.growth === 'in-place';
    const rng = rngFor(ctx.seed, task.width, task.restart);
    const options = {
        ...train,
        stall: inPlace ? { ...ctx.stall } : null,
        interrupted: stopWhen(ctx, cancelled),
    };
    const trainer = createTrainer(data, task.width, options, rng);
    const segments = [];
    let epochs = 0;
    for (;;) {
        const rec = trainer.run(train.maxEpochs);
        if (rec.stop === 'interrupted')
            return null;
        epochs += rec.epochs;
        const width = trainer.network.width;
        const network = rec.stop === 'diverged' ? null : trainer.snapshot();
        const judged = judge(data, network, rec, train.target);
        segments.push({ width, epochs, stop: rec.stop, ...judged });
        const done = judged.met || rec.stop === 'diverged' || !inPlace || width >= plan.maxWidth;
        if (done) {
            return {
                width: task.width,
                restart: task.restart,
                ...judged,
                stop: rec.stop,
                epochs,
                finalWidth: width,
                segments,
                network: judged.met ? network : null,
                reason: rec.stop === 'diverged' ? divergedReason(width, epochs) : null,
            };
        }
        // Out of patience or epochs at this width: add a neuron that leaves the function unchanged and keep training.
        trainer.addNeuron(rng);
    }
}
/**
 * Shrink one network by compensated ablation: score every hidden neuron by the loss increase of
 * removing it with its mean activation folded into the output biases, remove the least salient,
 * retrain for at most `pruneEpochs`, and keep the removal only if the steering rows still meet the
 * target; otherwise restore and try the next candidate. Each kept network is judged on the judging
 * rows (that decides whether it counts for its width), but the judging rows never decide whether a
 * removal is kept.
 */
function runPruneJob(data, ctx, job, cancelled = never) {
    const target = ctx.train.target;
    const retrain = { ...ctx.train, stall: null, interrupted: stopWhen(ctx, cancelled) };
    // Every restore starts from a snapshot with fresh optimiser state, so the result does not
    // depend on which thread ran the growth task.
    const fromSnapshot = (net) => trainerFromNetwork(data, net, retrain, rngFor(ctx.seed, job.source.width, job.source.restart));
    let trainer = fromSnapshot(job.network);
    let steering = trainer.evaluate().steeringMetric;
    let network = job.network;
    const chain = [];
    const steps = [];
    let trainings = 0;
    while (trainer.network.width > 1) {
        const width = trainer.network.width;
        const order = leastSalientFirst(trainer.saliency());
        let removed = false;
        let dirty = false;
        for (const j of order.slice(0, ctx.pruneCandidates)) {
            // Restore lazily: after the last refused candidate nothing trains again, so no rebuild is needed.
            if (dirty)
                trainer = fromSnapshot(network);
            trainer.removeNeuron(j);
            const rec = trainer.run(ctx.pruneEpochs);
            if (rec.stop === 'interrupted')
                return { source: job.source, chain, steps, trainings, interrupted: true };
            trainings++;
            const smaller = rec.stop === 'diverged' ? null : trainer.snapshot();
            const judged = judge(data, smaller, rec, target);
            const accepted = smaller !== null && judged.reached;
            steps.push({
                source: job.source,
                width,
                neuron: j,
                steeringBefore: steering,
                steeringAfter: judged.steering,
                accepted,
                judged: accepted ? judged.judged : null,
            });
            if (accepted && smaller !== null) {
                steering = judged.steering;
                network = smaller;
                chain.push({ width: width - 1, network: smaller, ...judged });
                removed = true;
                break;
            }
            dirty = true;
        }
        if (!removed)
            break;
    }
    return { source: job.source, chain, steps, trainings, interrupted: false };
}
/** Neuron indices by ascending saliency; ties (and NaN) resolved by index so the order is total. */
function leastSalientFirst(saliency) {
    const idx = Array.from(saliency, (_, j) => j);
    const key = (j) => (Number.isFinite(saliency[j]) ? saliency[j] : Number.POSITIVE_INFINITY);
    idx.sort((a, b) => key(a) - key(b) || a - b);
    return idx;
}

;// CONCATENATED MODULE: ./src/search/executor.ts
/**
 * Where tasks run: in this thread (one worker, and the path tests take from TypeScript
 * source) or on a pool of worker threads that share the encoded data without copies.
 * Both run the same task code, so the choice never changes a result.
 */



/** Marks a worker thread started by the pool (the bundle checks it to act as the worker). */
const WORKER_MARK = 'neuron-budget/search-worker';
const yieldToEventLoop = () => new Promise((resolve) => setImmediate(resolve));
function inThreadExecutor(data, ctx) {
    return {
        size: 1,
        async train(task) {
            await yieldToEventLoop();
            // Never discarded here (nothing runs ahead in one thread); null only when the time ran out.
            return runTask(data, ctx, task);
        },
        async prune(job) {
            await yieldToEventLoop();
            return runPruneJob(data, ctx, job);
        },
        discard() { },
        async close() { },
    };
}
function isShared(a) {
    return typeof SharedArrayBuffer !== 'undefined' && a.buffer instanceof SharedArrayBuffer;
}
function toShared(a) {
    if (isShared(a))
        return a;
    const s = new Float64Array(new SharedArrayBuffer(a.length * Float64Array.BYTES_PER_ELEMENT));
    s.set(a);
    return s;
}
/** The dataset with every array on SharedArrayBuffer (already the case for loaded data), so posting it shares memory. */
function shareDataset(data) {
    return {
        ...data,
        xTrain: toShared(data.xTrain),
        yTrain: toShared(data.yTrain),
        xValidation: toShared(data.xValidation),
        xJudging: toShared(data.xJudging),
        yJudging: toShared(data.yJudging),
        yValidation: toShared(data.yValidation),
    };
}
/**
 * A fixed pool of worker threads. `entry` is the file of the running bundle, which acts
 * as the worker when started with WORKER_MARK (ncc does not follow `new Worker(path)`).
 */
function workerPoolExecutor(data, ctx, size, entry) {
    const shared = shareDataset(data);
    const pending = new Map();
    const trainIds = new Map();
    const queue = [];
    const slots = [];
    let nextId = 0;
    let closed = false;
    const pump = () => {
        for (const slot of slots) {
            if (slot.busy !== null || queue.length === 0)
                continue;
            const next = queue.shift();
            slot.busy = next.id;
            const msg = next.job.type === 'train'
                ? { type: 'train', id: next.id, task: next.job.task }
                : { type: 'prune', id: next.id, job: next.job.job };
            slot.worker.postMessage(msg);
        }
    };
    const settle = (id) => {
        const p = pending.get(id);
        pending.delete(id);
        for (const [key, tid] of trainIds)
            if (tid === id)
                trainIds.delete(key);
        return p;
    };
    const startSlot = () => {
        const cancel = new Int32Array(new SharedArrayBuffer(Int32Array.BYTES_PER_ELEMENT)).fill(-1);
        const slot = { worker: new external_node_worker_threads_namespaceObject.Worker(entry, { workerData: { role: WORKER_MARK } }), busy: null, cancel };
        slot.worker.on('message', (reply) => {
            slot.busy = null;
            const p = settle(reply.id);
            if (p !== undefined) {
                if (reply.type === 'done')
                    p.resolve(reply.result);
                else if (reply.type === 'cancelled')
                    p.resolve(null);
                else
                    p.reject(new Error(reply.message));
            }
            pump();
        });
        const fail = (error) => {
            if (closed)
                return;
            if (slot.busy !== null)
                settle(slot.busy)?.reject(error);
            slot.busy = null;
        };
        slot.worker.on('error', fail);
        slot.worker.on('exit', (code) => fail(new Error(`search worker stopped unexpectedly (exit code ${code})`)));
        // The data's SharedArrayBuffers are shared with the thread, not copied.
        const init = { type: 'init', data: shared, ctx, cancel };
        slot.worker.postMessage(init);
        return slot;
    };
    for (let k = 0; k < size; k++)
        slots.push(startSlot());
    const submit = (job) => new Promise((resolve, reject) => {
        if (closed) {
            reject(new Error('search worker pool is closed'));
            return;
        }
        const id = nextId++;
        pending.set(id, { resolve: resolve, reject });
        if (job.type === 'train')
            trainIds.set(taskKey(job.task), id);
        queue.push({ id, job });
        pump();
    });
    return {
        size,
        train: (task) => submit({ type: 'train', task }),
        prune: (job) => submit({ type: 'prune', job }),
        discard(task) {
            const id = trainIds.get(taskKey(task));
            if (id === undefined)
                return;
            settle(id);
            const q = queue.findIndex((e) => e.id === id);
            if (q >= 0) {
                queue.splice(q, 1);
                return;
            }
            // The thread looks at its flag between slices of epochs and answers 'cancelled'.
            const slot = slots.find((s) => s.busy === id);
            if (slot !== undefined)
                Atomics.store(slot.cancel, 0, id);
        },
        async close() {
            closed = true;
            queue.length = 0;
            await Promise.all(slots.map((s) => s.worker.terminate()));
            pending.clear();
        },
    };
}

;// CONCATENATED MODULE: ./src/search/notes.ts
/**
 * Why no width is adequate, in sentences a reviewer can act on, read off the per-width curve:
 * - networks met the target, but too few of one width (say how many, and how many are required);
 * - the networks fit the training rows but not the judging rows: too few rows or too much noise;
 * - more neurons still help: the curve still improves at max-width, which is too small;
 * - the curve is flat and even the training rows are not fitted: the features may not carry the target.
 * And how far a search got when its budget ran out.
 */


/** Widths at the top of the range whose best is compared with the rest to tell a rising curve. */
const TOP_WIDTHS = 3;
/**
 * A curve still rises when its best over the top widths beats the best before them by more than
 * this (accuracy points, or this fraction of an error metric's value); an engineering choice.
 */
const RISE = 0.005;
function span(from, to) {
    return from === to ? `width ${from}` : `widths ${from}–${to}`;
}
function bestAt(widths, target, pickTrain = false) {
    let best = null;
    for (const w of widths) {
        const v = pickTrain ? w.bestTrain : w.best;
        if (v !== null && (best === null || isBetter(target.metric, v, best.value)))
            best = { width: w.width, value: v };
    }
    return best;
}
function rises(widths, target) {
    if (widths.length <= TOP_WIDTHS)
        return null;
    const top = bestAt(widths.slice(-TOP_WIDTHS), target);
    const before = bestAt(widths.slice(0, -TOP_WIDTHS), target);
    if (top === null || before === null)
        return null;
    const margin = higherIsBetter(target.metric) ? RISE : RISE * Math.abs(before.value);
    const gain = higherIsBetter(target.metric) ? top.value - before.value : before.value - top.value;
    return gain > margin ? { from: before, to: top } : null;
}
function notFoundNotes(plan, target, widths, judgedOn) {
    const notes = [];
    const name = target.metric;
    const withMet = widths.filter((w) => w.met > 0);
    if (withMet.length > 0) {
        const shown = withMet
            .slice(0, 3)
            .map((w) => `${w.met === 1 ? '1 network' : `${w.met} networks`} of width ${w.width}`)
            .join(', ');
        notes.push(`Some networks met ${targetShort(name, target.threshold)} (${shown}), but a width needs ${plan.required} to be adequate.`);
    }
    const train = bestAt(widths, target, true);
    const judged = bestAt(widths, target);
    const rising = rises(widths, target);
    if (rising !== null) {
        notes.push(`More neurons still help: the best ${judgedOn} ${name} improved from ${formatMetric(rising.from.value)} (width ${rising.from.width}) to ${formatMetric(rising.to.value)} (width ${rising.to.width}); search.max-width (${plan.maxWidth}) is too small for this target.`);
    }
    else if (train !== null && meetsThreshold(train.value, target)) {
        notes.push(`The networks fit the training rows (${name} ${formatMetric(train.value)} at width ${train.width}) but not the ${judgedOn} rows (best ${judged === null ? 'none' : formatMetric(judged.value)}): the data hold too few rows, or too much noise, for this target.`);
    }
    else {
        const best = train === null ? 'no network trained' : `the best training ${name} was ${formatMetric(train.value)}`;
        notes.push(`Even the training rows are not fitted (${best}) and more neurons did not help from ${span(plan.minWidth, plan.maxWidth)}: the features may not carry the target.`);
    }
    return notes;
}
/** The growth phase stopped (time budget, training cap) before a width was adequate. */
function stoppedGrowingNote(plan, why, atWidth, trainings, tried) {
    const before = tried.filter((t) => t.width !== atWidth && t.restarts.length > 0);
    const adequate = before.filter((t) => t.restarts.filter((r) => r.met).length >= plan.required).map((t) => t.width);
    const not = before.filter((t) => !adequate.includes(t.width)).map((t) => t.width);
    const said = [
        adequate.length > 0
            ? `${widthList(adequate)} ${adequate.length > 1 ? 'were' : 'was'} adequate on fresh restarts`
            : '',
        not.length > 0 ? `${widthList(not)} ${not.length > 1 ? 'were' : 'was'} not adequate on fresh restarts` : '',
    ].filter((x) => x !== '');
    return `${why} while deciding width ${atWidth}, after ${trainings} trainings${said.length > 0 ? `; ${said.join(', ')}` : ''}.`;
}
/** The time ran out while pruning: the grown width is proven, smaller ones are not settled. */
function stoppedPruningNote(why, grownWidth, trainings) {
    return `${why} while pruning, after ${trainings} trainings: ${neurons(grownWidth)} are enough (proven by fresh restarts), but whether fewer would do was not settled.`;
}
/** Ascending widths as "width 3", "widths 3–5" or "widths 3, 5–7". */
function widthList(widths) {
    const runs = [];
    for (let k = 0; k < widths.length;) {
        let e = k;
        while (e + 1 < widths.length && widths[e + 1] === widths[e] + 1)
            e++;
        runs.push(widths[k] === widths[e] ? `${widths[k]}` : `${widths[k]}–${widths[e]}`);
        k = e + 1;
    }
    return widths.length === 1 ? `width ${runs[0]}` : `widths ${runs.join(', ')}`;
}
/** Where growth began and which widths it decided, with why that was enough. */
function walkReport(plan, start, decision) {
    const choice = start ?? { from: 'min-width', width: plan.minWidth, why: 'the search starts there' };
    const from = choice.from === 'baseline' && plan.start != null ? 'baseline' : 'min-width';
    const width = from === 'baseline' ? choice.width : plan.minWidth;
    const decided = decision.tried.filter((t) => t.restarts.length > 0).map((t) => t.width);
    const lead = from === 'baseline'
        ? `Growth started at the baseline's width ${width} (${choice.why})`
        : `Growth started at min-width ${width} (${choice.why})`;
    const grown = decision.kind === 'decided' && decision.capHit === null ? decision.grownWidth : undefined;
    let summary;
    if (grown === undefined) {
        // Stopped (time budget, training cap) before the answer: the last width is only partly decided.
        summary = `${lead} and had tried ${decided.length === 0 ? 'no width' : widthList(decided)} when it stopped.`;
    }
    else if (from === 'min-width' || decided.length === 0) {
        summary = `${lead} and decided ${decided.length === 0 ? 'no width' : widthList(decided)}.`;
    }
    else {
        const lowest = decided[0];
        const untried = lowest > plan.minWidth ? span(plan.minWidth, lowest - 1) : null;
        const belowRule = untried === null
            ? ''
            : `; ${untried} ${lowest - 1 > plan.minWidth ? 'were' : 'was'} not trained: the start from the baseline takes the widths below one that is not adequate to be inadequate too, with no network there meeting the target by luck`;
        let what;
        if (grown === null)
            what = `no width from ${width} to max-width ${plan.maxWidth} was adequate on fresh restarts`;
        else if (grown > width)
            what = `width ${width} was not adequate on fresh restarts, so growth stepped up to width ${grown}, the first that was`;
        else if (grown === plan.minWidth)
            what = `every width down to min-width ${grown} was adequate on fresh restarts`;
        else
            what = `width ${grown} was adequate on fresh restarts and width ${grown - 1} was not`;
        summary = `${lead}: ${what}${belowRule}.`;
    }
    return { from, width, why: choice.why, decided, summary };
}

;// CONCATENATED MODULE: ./src/search/wilson.ts
/**
 * Wilson score interval for a binomial success rate (Wilson 1927). Used to show how
 * sure the k-of-n restart count at a width is.
 */
/** Two-sided 95% normal quantile. */
const Z95 = 1.959964;
function wilsonInterval(successes, trials, z = Z95) {
    if (trials <= 0)
        return [0, 1];
    const n = trials;
    const p = successes / n;
    const z2 = z * z;
    const denom = 1 + z2 / n;
    const centre = (p + z2 / (2 * n)) / denom;
    const half = (z * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n))) / denom;
    // Clamp the rounding dust at the ends so 0/n starts at exactly 0 and n/n ends at exactly 1.
    const lo = successes === 0 ? 0 : Math.max(0, centre - half);
    const hi = successes === n ? 1 : Math.min(1, centre + half);
    return [lo, hi];
}

;// CONCATENATED MODULE: ./src/search/tally.ts
/**
 * The one definition of an adequate width, applied: a width is adequate when at least `required`
 * distinct networks of that width met the target on the judging rows, counting fresh restarts at
 * that width and networks pruned down to it from a larger width. The headline is the smallest
 * adequate width; its witness is the network of that width that did best on the steering rows
 * (the judging rows decide whether a network counts, never which one is shown).
 */


/** @testOnly */
function median(values) {
    if (values.length === 0)
        return null;
    const s = [...values].sort((a, b) => a - b);
    const mid = s.length >> 1;
    return s.length % 2 === 1 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}
/** The n-th best finite value (1 = the best), or null when fewer than n are finite. */
function tally_nthBest(values, n, target) {
    const finite = values
        .filter(Number.isFinite)
        .sort((a, b) => (isBetter(target.metric, a, b) ? -1 : isBetter(target.metric, b, a) ? 1 : 0));
    return finite.length >= n ? finite[n - 1] : null;
}
function bestOf(values, target) {
    let best = null;
    for (const v of values)
        if (Number.isFinite(v) && (best === null || isBetter(target.metric, v, best)))
            best = v;
    return best;
}
/** Better witness first: steering metric, then fresh before pruned, then narrower source, then lower restart. */
function beats(a, b, target) {
    if (isBetter(target.metric, a.steering, b.steering))
        return true;
    if (isBetter(target.metric, b.steering, a.steering))
        return false;
    if (a.how !== b.how)
        return a.how === 'fresh';
    if (a.source.width !== b.source.width)
        return a.source.width < b.source.width;
    return a.source.restart < b.source.restart;
}
function pick(candidates, target) {
    let best = null;
    for (const c of candidates)
        if (c.met && (best === null || beats(c, best, target)))
            best = c;
    return best;
}
function tally(plan, target, tried, pruned, seed) {
    const fresh = new Map(tried.map((t) => [t.width, t.restarts]));
    const links = new Map();
    for (const r of pruned) {
        for (const link of r.chain) {
            const list = links.get(link.width) ?? [];
            list.push({ ...link, source: r.source, how: 'pruned' });
            links.set(link.width, list);
        }
    }
    const widthList = [...new Set([...fresh.keys(), ...links.keys()])].sort((a, b) => a - b);
    const widths = [];
    const candidatesAt = new Map();
    for (const w of widthList) {
        const runs = fresh.get(w) ?? [];
        const prunedHere = links.get(w) ?? [];
        const freshCandidates = runs
            .filter((r) => r.met && r.network !== null)
            .map((r) => ({ ...r, width: w, network: r.network, source: r.task, how: 'fresh' }));
        candidatesAt.set(w, [...freshCandidates, ...prunedHere]);
        const freshMet = freshCandidates.length;
        const prunedMet = prunedHere.filter((c) => c.met).length;
        const all = [...runs, ...prunedHere];
        widths.push({
            width: w,
            restarts: runs.length,
            reached: runs.filter((r) => r.reached).length,
            met: freshMet + prunedMet,
            metBy: { fresh: freshMet, pruned: prunedMet },
            adequate: freshMet + prunedMet >= plan.required,
            best: bestOf(all.map((r) => r.judged), target),
            decisive: tally_nthBest(all.map((r) => r.judged), plan.required, target),
            bestTrain: bestOf(all.map((r) => r.train), target),
            median: median(runs.map((r) => r.judged).filter(Number.isFinite)),
            wilson: wilsonInterval(freshMet, runs.length),
            medianEpochs: median(runs.map((r) => r.epochs)) ?? 0,
            diverged: runs.filter((r) => r.stop === 'diverged').length,
        });
    }
    const width = widths.find((w) => w.adequate)?.width ?? null;
    let chosen = null;
    if (width !== null)
        chosen = pick(candidatesAt.get(width) ?? [], target);
    else
        for (const w of widthList)
            chosen ??= pick(candidatesAt.get(w) ?? [], target);
    return { widths, width, witness: chosen === null ? null : witnessOf(chosen, seed) };
}
function witnessOf(c, seed) {
    return {
        source: c.source,
        seed,
        how: c.how,
        network: c.network,
        train: c.train,
        steering: c.steering,
        judged: c.judged,
        reached: c.reached,
        met: c.met,
    };
}

;// CONCATENATED MODULE: ./src/search/search.ts
/**
 * The growth-and-prune search: find the smallest hidden width at which enough networks meet the
 * target (tally.ts has the one definition), and hold a trained network (the witness) that shows it.
 *
 * 1. Growth (growth.ts): fresh seeded restarts, width by width upward, until one width is
 *    adequate on fresh restarts alone.
 * 2. Prune (task.ts): every network that met the target at that width or below is shrunk one
 *    neuron at a time while the steering rows still meet the target; each smaller network that
 *    also meets it on the judging rows counts for its width.
 * 3. Tally: the smallest width with `required` networks that met the target is the answer.
 */










function growthPlan(search, start = null) {
    return {
        start: start !== null && start.from === 'baseline' ? start.width : null,
        growth: search.growth,
        minWidth: search.minWidth,
        maxWidth: search.maxWidth,
        restarts: search.restarts,
        // A width is only adequate with a network to show for it: at least one must meet the target.
        required: Math.max(1, search.required),
        maxTrainings: search.maxTrainings,
    };
}
function searchContext(search, target, options = {}) {
    const train = {
        activation: search.activation,
        init: search.init,
        optimizer: search.optimizer,
        maxEpochs: search.maxEpochs,
        checkEvery: search.checkEvery,
        patience: search.patience,
        weightDecay: search.weightDecay,
        target: { ...target },
        stall: null,
    };
    return {
        seed: search.seed,
        plan: growthPlan(search, options.start ?? null),
        train,
        stall: { ...(options.stall ?? DEFAULT_STALL) },
        pruneEpochs: search.pruneEpochs,
        pruneCandidates: options.pruneCandidates ?? DEFAULT_PRUNE_CANDIDATES,
        deadline: search.timeBudget === null ? null : Date.now() + search.timeBudget * 1000,
    };
}
function workerCount(search, options) {
    const n = options.workers ?? search.workers ?? (0,external_node_os_namespaceObject.availableParallelism)();
    return Math.max(1, Math.floor(n));
}
/** Resolves when the deadline passes (never without one); the timer does not keep the process alive. */
function timeUp(deadline) {
    if (deadline === null)
        return new Promise(() => undefined);
    return new Promise((resolve) => setTimeout(() => resolve('time'), Math.max(0, deadline - Date.now())).unref());
}
/**
 * Whether the walk from a start width can still visit `width`: once it has turned down (or up)
 * from the start, the widths on the other side are never needed, so no thread speculates on them.
 */
function stillVisitable(plan, decision, width) {
    const start = startWidth(plan);
    if (start === null || decision.kind !== 'need' || decision.deciding === start)
        return true;
    return decision.deciding < start ? width <= start : width >= start;
}
/** The executor a search or a shard runs on: a pool of worker threads from a bundle, or this thread. */
function executorFor(data, ctx, search, options) {
    const size = workerCount(search, options);
    // A TypeScript source file cannot start as a worker: run in this thread then (tests from source).
    const entry = options.workerEntry != null && !/\.[cm]?ts$/.test(options.workerEntry) ? options.workerEntry : null;
    return size > 1 && entry !== null ? workerPoolExecutor(data, ctx, size, entry) : inThreadExecutor(data, ctx);
}
/** The growth phase: keeps every thread busy with tasks in canonical order from the first undecided one. */
async function grow(ctx, executor, target, progress, known) {
    const plan = ctx.plan;
    const canon = planTasks(plan);
    const position = new Map(canon.map((t, k) => [taskKey(t), k]));
    const results = new Map(known.map((r) => [taskKey(r), r]));
    const inflight = new Map();
    const clock = timeUp(ctx.deadline);
    let best = null;
    for (;;) {
        const decision = decideGrowth(plan, (t) => results.get(taskKey(t)));
        // Tasks before the first undecided one that are still running can no longer matter.
        const frontier = decision.kind === 'need' ? (position.get(taskKey(decision.task)) ?? 0) : canon.length;
        for (const key of [...inflight.keys()]) {
            if ((position.get(key) ?? 0) < frontier) {
                const [w, i] = key.split(':').map(Number);
                executor.discard({ width: w, restart: i });
                inflight.delete(key);
            }
        }
        if (decision.kind === 'decided')
            return { decision, results, outOfTime: false };
        if (ctx.deadline !== null && Date.now() >= ctx.deadline)
            return { decision, results, outOfTime: true };
        for (let k = frontier; k < canon.length && inflight.size < executor.size; k++) {
            const key = taskKey(canon[k]);
            if (results.has(key) || inflight.has(key) || !stillVisitable(plan, decision, canon[k].width))
                continue;
            inflight.set(key, executor.train(canon[k]));
        }
        const keyed = [...inflight.entries()].map(([key, p]) => p.then((r) => ({ key, r })));
        const done = await Promise.race([...keyed, clock]);
        if (done === 'time')
            return { decision, results, outOfTime: true };
        inflight.delete(done.key);
        // A task handed back without a result gave up because the time ran out.
        if (done.r === null)
            return { decision, results, outOfTime: true };
        results.set(done.key, done.r);
        if (Number.isFinite(done.r.judged) && (best === null || isBetter(target.metric, done.r.judged, best)))
            best = done.r.judged;
        progress({
            phase: 'growth',
            kind: 'done',
            width: done.r.finalWidth,
            restart: done.r.restart,
            epoch: done.r.epochs,
            best,
        });
    }
}
/** Every network that met the target at the grown width or below, once each, in (width, restart) order. */
function pruneSources(tried, grownWidth) {
    const jobs = [];
    const seen = new Set();
    for (const { width, restarts } of tried) {
        if (grownWidth !== null && width > grownWidth)
            continue;
        for (const r of restarts) {
            const key = taskKey(r.task);
            if (!r.met || r.network === null || seen.has(key))
                continue;
            seen.add(key);
            jobs.push({ source: r.task, network: r.network });
        }
    }
    return jobs;
}
/** Run the whole search. Outside `timing`, the result depends only on the data, the config and the code. */
async function runSearch(data, search, target, options = {}) {
    const now = options.now ?? (() => external_node_perf_hooks_namespaceObject.performance.now());
    const t0 = now();
    const ctx = searchContext(search, target, options);
    const plan = ctx.plan;
    const executor = executorFor(data, ctx, search, options);
    const progress = (e) => options.onProgress?.(e);
    const judging = judgingRowsOf(data, options.judgingFolded ?? false);
    const judgedOn = judging.on === 'judging' ? 'judged' : judging.on;
    const budgetWhy = `The time budget of ${search.timeBudget} s ran out`;
    try {
        const first = planTasks(plan)[0]?.width ?? plan.minWidth;
        progress({ phase: 'growth', kind: 'start', width: first, restart: 0, epoch: 0, best: null });
        const grown = await grow(ctx, executor, target, progress, options.known?.results ?? []);
        const growthEnd = now();
        if (options.known !== undefined) {
            const planned = new Set(options.known.results.map(taskKey));
            const here = grown.decision.tried
                .flatMap((t) => t.restarts.map((r) => r.task))
                .filter((t) => !planned.has(taskKey(t)));
            if (here.length > 0)
                options.onLocalWork?.(`${here.length} growth ${here.length === 1 ? 'training' : 'trainings'} the plan did not cover (widths ${[...new Set(here.map((t) => t.width))].join(', ')})`);
        }
        const timing = (end) => ({
            searchSeconds: secondsFromMs(end - t0),
            growthSeconds: secondsFromMs(growthEnd - t0),
            pruneSeconds: secondsFromMs(end - growthEnd),
        });
        const start = walkReport(plan, options.start ?? null, grown.decision);
        const base = { grownWidth: null, metric: null, witness: null, appraisal: null, pruning: [], judging, start };
        const decision = grown.decision;
        if (decision.kind === 'need') {
            return {
                ...base,
                outcome: 'inconclusive',
                width: null,
                widths: tally(plan, target, decision.tried, [], ctx.seed).widths,
                trainings: decision.trainings,
                notes: [stoppedGrowingNote(plan, budgetWhy, decision.deciding, decision.trainings, decision.tried)],
                timing: timing(now()),
            };
        }
        if (decision.capHit !== null) {
            const why = `The cap of ${search.maxTrainings} trainings was reached`;
            return {
                ...base,
                outcome: 'inconclusive',
                width: null,
                widths: tally(plan, target, decision.tried, [], ctx.seed).widths,
                trainings: decision.trainings,
                notes: [stoppedGrowingNote(plan, why, decision.capHit.width, decision.trainings, decision.tried)],
                timing: timing(now()),
            };
        }
        // Prune phase: shrink every network that met the target at the grown width or below.
        const jobs = search.prune ? pruneSources(decision.tried, decision.grownWidth) : [];
        if (jobs.length > 0) {
            const from = Math.max(...jobs.map((j) => j.source.width));
            progress({ phase: 'prune', kind: 'start', width: from, restart: 0, epoch: 0, best: null });
        }
        const prunedElsewhere = new Map((options.known?.pruned ?? []).map((r) => [taskKey(r.source), r]));
        const pruned = await Promise.all(jobs.map(async (job) => {
            const ready = prunedElsewhere.get(taskKey(job.source));
            if (ready !== undefined && !ready.interrupted)
                return ready;
            if (options.known !== undefined)
                options.onLocalWork?.(`pruning the network of width ${job.source.width}, restart ${job.source.restart + 1}`);
            const r = await executor.prune(job);
            const last = r.chain.length > 0 ? r.chain[r.chain.length - 1].width : job.source.width;
            progress({
                phase: 'prune',
                kind: 'done',
                width: last,
                restart: job.source.restart,
                epoch: r.steps.length,
                best: null,
            });
            return r;
        }));
        const trainings = decision.trainings + pruned.reduce((s, r) => s + r.trainings, 0);
        const t = tally(plan, target, decision.tried, pruned, ctx.seed);
        const steps = pruned.flatMap((r) => r.steps);
        if (pruned.some((r) => r.interrupted) && decision.grownWidth !== null) {
            return {
                ...base,
                outcome: 'inconclusive',
                grownWidth: decision.grownWidth,
                width: null,
                witness: t.witness,
                appraisal: t.witness === null ? null : appraise(data, t.witness.network, target, true),
                widths: t.widths,
                pruning: steps,
                trainings,
                notes: [stoppedPruningNote(budgetWhy, decision.grownWidth, trainings)],
                timing: timing(now()),
            };
        }
        const found = t.width !== null && t.witness !== null;
        return {
            outcome: found ? 'found' : 'not-found',
            width: found ? t.width : null,
            grownWidth: decision.grownWidth,
            metric: found ? t.witness.judged : null,
            witness: t.witness,
            appraisal: t.witness === null ? null : appraise(data, t.witness.network, target, true),
            widths: t.widths,
            pruning: steps,
            trainings,
            notes: found ? [] : notFoundNotes(plan, target, t.widths, judgedOn),
            judging,
            start,
            timing: timing(now()),
        };
    }
    finally {
        await executor.close();
    }
}

;// CONCATENATED MODULE: ./src/search/worker.ts
/**
 * The worker-thread side of the pool. A bundle calls runSearchWorker() when it starts
 * as a worker (`!isMainThread`); the thread then answers task messages until terminated.
 */


function runSearchWorker() {
    const port = external_node_worker_threads_namespaceObject.parentPort;
    if (port === null)
        throw new Error('runSearchWorker() must run in a worker thread');
    let data = null;
    let ctx = null;
    let cancel = new Int32Array(1).fill(-1);
    port.on('message', (msg) => {
        if (msg.type === 'init') {
            data = msg.data;
            ctx = msg.ctx;
            cancel = msg.cancel;
            return;
        }
        let reply;
        try {
            if (data === null || ctx === null)
                throw new Error('search worker got a task before its data');
            const id = msg.id;
            const result = msg.type === 'train'
                ? runTask(data, ctx, msg.task, () => Atomics.load(cancel, 0) === id)
                : runPruneJob(data, ctx, msg.job);
            reply = result === null ? { type: 'cancelled', id } : { type: 'done', id, result };
        }
        catch (e) {
            reply = { type: 'error', id: msg.id, message: e instanceof Error ? (e.stack ?? e.message) : String(e) };
        }
        port.postMessage(reply);
    });
}

;// CONCATENATED MODULE: ./src/search/index.ts
/** The growth-and-prune search: public surface. */








;// CONCATENATED MODULE: ./src/search/shard.ts

async function runShard(data, search, target, work, options = {}) {
    const ctx = searchContext(search, target, options);
    const executor = executorFor(data, ctx, search, options);
    const progress = options.onProgress ?? (() => undefined);
    try {
        progress({ phase: 'growth', kind: 'start', width: work.tasks[0]?.width ?? 1, restart: 0, epoch: 0, best: null });
        const outcomes = await Promise.all(work.tasks.map(async (task) => {
            const result = await executor.train({ width: task.width, restart: task.restart });
            if (result !== null)
                progress({
                    phase: 'growth',
                    kind: 'done',
                    width: result.finalWidth,
                    restart: result.restart,
                    epoch: result.epochs,
                    best: null,
                });
            if (result === null || !task.prune || !result.met || result.network === null)
                return { result, pruned: null };
            const pruned = await executor.prune({
                source: { width: task.width, restart: task.restart },
                network: result.network,
            });
            progress({
                phase: 'prune',
                kind: 'done',
                width: task.width,
                restart: task.restart,
                epoch: pruned.steps.length,
                best: null,
            });
            return { result, pruned: pruned.interrupted ? null : pruned };
        }));
        return {
            results: outcomes.flatMap((o) => (o.result === null ? [] : [o.result])),
            pruned: outcomes.flatMap((o) => (o.pruned === null ? [] : [o.pruned])),
        };
    }
    finally {
        await executor.close();
    }
}

;// CONCATENATED MODULE: ./src/report/assemble.ts



/** The report with the data stage's facts; verdict and search come later. */
function dataStageReport(config, data, timing) {
    const ds = data.dataset;
    const classes = data.profile.classes;
    return {
        schema: 'neuron-budget/report@2',
        tool: { name: TOOL_NAME, version: TOOL_VERSION },
        reasons: [],
        width: null,
        metric: { name: config.target.metric, value: null, threshold: config.target.threshold },
        baseline: null,
        data: {
            file: displayPath(config.root, config.data.path),
            rows: data.rows,
            droppedRows: data.droppedRows,
            trainRows: ds.trainRows,
            validationRows: ds.validationRows,
            judgingRows: ds.judgingRows,
            inputs: ds.inputs,
            outputs: ds.outputs,
            task: ds.task,
            fingerprint: data.fingerprint,
            classes: classes === null
                ? null
                : Object.keys(classes)
                    .sort()
                    .map((label) => ({ label, count: classes[label] })),
            targetSpread: data.targetSpread,
        },
        search: null,
        device: null,
        changes: null,
        timing: { ...timing },
    };
}
/** The data-stage report with the search's findings filled in (verdict and baseline come from the gate). */
function searchStageReport(report, search, required, context) {
    const { encoding } = context;
    const costOf = (width) => deviceCost(costShapeOf({ inputs: report.data.inputs, width, outputs: report.data.outputs }, encoding));
    return {
        ...report,
        device: deviceOf(search, context, report.data.inputs, report.data.outputs),
        reasons: [],
        width: search.width,
        metric: { ...report.metric, value: search.metric },
        search: {
            outcome: search.outcome,
            grownWidth: search.grownWidth,
            required,
            widths: search.widths.map((w) => ({ ...w, cost: costOf(w.width) })),
            pruning: search.pruning.map((p) => ({ ...p, source: shownSource(p.source) })),
            trainings: search.trainings,
            notes: search.notes,
            judging: search.judging,
            start: search.start,
            witness: assemble_witnessOf(search),
        },
    };
}
/** Restarts are 0-based inside the search (they seed its streams) and counted from 1 on every screen and file. */
function shownSource(task) {
    return { width: task.width, restart: task.restart + 1 };
}
function assemble_witnessOf(search) {
    const w = search.witness;
    if (w === null)
        return null;
    return {
        width: w.network.width,
        how: w.how,
        source: shownSource(w.source),
        judged: w.judged,
        steering: w.steering,
        train: w.train,
        met: w.met,
        adequate: search.width !== null,
    };
}
function deviceOf(search, context, inputs, outputs) {
    const w = search.witness;
    const a = search.appraisal;
    if (w === null || a === null)
        return null;
    const width = w.network.width;
    const labels = context.encoding.target.classes;
    const floors = context.target.recallFloors ?? null;
    const finite = (v) => (v === undefined || !Number.isFinite(v) ? null : v);
    return {
        precision: context.target.precision ?? 'float32',
        inputs,
        width,
        outputs,
        cost: deviceCost(costShapeOf({ inputs, width, outputs }, context.encoding)),
        metric: { float32: a.float32, int8: a.int8 },
        classes: labels === null || a.confusion === null
            ? null
            : labels.map((label, c) => ({
                label,
                rows: a.confusion[c].reduce((s, v) => s + v, 0),
                recall: finite(a.recall?.[c]),
                precision: finite(a.precision?.[c]),
                floor: floors === null || floors[c] <= 0 ? null : floors[c],
            })),
        confusion: a.confusion,
    };
}

;// CONCATENATED MODULE: ./src/job/finish.ts
/**
 * What every stage that ends in a search result does last (check, baseline, merge): compare
 * with the baseline, assemble the report, write the witness and the report, and render the screens.
 */









async function finishJob(job, search, options) {
    const { config, data, timing } = job;
    timing.growthSeconds = search.timing.growthSeconds;
    timing.pruneSeconds = search.timing.pruneSeconds;
    const cost = search.witness === null ? null : deviceCost(costShapeOf(search.witness.network, data.dataset.encoding));
    const gate = await runGateStage({
        mode: options.mode,
        result: search,
        cost,
        loaded: data,
        config,
        baselinePath: job.baselinePath,
        baselineShown: job.baselineShown,
        previous: job.previous,
        commit: options.commit ?? null,
        date: new Date(),
        toolVersion: TOOL_VERSION,
    });
    const report = withGate(searchStageReport(dataStageReport(config, data, timing), search, config.search.required, {
        encoding: data.dataset.encoding,
        target: config.target,
    }), gate.outcome, gate.gate);
    let modelWritten = null;
    if (options.modelPath) {
        if (search.witness === null) {
            options.log?.('model not written: no network met the target');
        }
        else {
            const backing = { on: search.judging.on, adequate: search.width !== null };
            const calibration = { x: data.dataset.xTrain, rows: data.dataset.trainRows };
            const provenance = {
                tool: { name: 'neuron-budget', version: TOOL_VERSION },
                data: data.fingerprint,
                config: displayPath(config.root, config.file),
            };
            const doc = modelDocument(search.witness, data.dataset.encoding, config.target, backing, calibration, provenance);
            await writeOutput(options.modelPath, serializeModel(doc), 'model', config.root);
            modelWritten = options.modelPath;
        }
    }
    if (options.reportPath) {
        await writeOutput(options.reportPath, `${JSON.stringify(report, null, 2)}\n`, 'report', config.root);
    }
    const verdict = report.verdict;
    const context = {
        surface: options.surface ?? 'cli',
        mode: options.mode,
        configShown: options.configShown ?? null,
        baselineFile: job.baselineFile,
        baseline: gate.record,
    };
    return {
        report,
        verdict,
        markdown: renderMarkdown(report, { context }),
        text: renderText(report, context),
        baselineWritten: gate.written,
        baselineRecord: gate.record,
        modelWritten,
        exitCode: verdict === 'fail' || verdict === 'inconclusive' ? EXIT.gate : EXIT.ok,
    };
}

;// CONCATENATED MODULE: ./src/config/build.ts
/**
 * From checked values to the typed Config: every key of spec.ts becomes a field of its section
 * (camelCase), paths become absolute inside the workspace, and the rules between keys are
 * checked (each error points at the key that was written).
 */






function buildConfig(reader, written, file, root) {
    const baseDir = (0,external_node_path_namespaceObject.dirname)(file);
    const sections = {};
    for (const spec of spec_CONFIG_SPEC) {
        const found = written.values.get(spec.name) ?? new Map();
        const section = {};
        for (const key of spec.keys) {
            const at = found.get(key.name);
            const value = reader.value(at, key);
            const field = fieldName(key.name);
            if (key.rule.kind === 'path' && typeof value === 'string') {
                section[field] = insidePath(reader, at, root, baseDir, value, `${spec.name}.${key.name}`);
                section[`${field}AsWritten`] = value;
            }
            else {
                section[field] = value;
            }
        }
        sections[spec.name] = section;
    }
    const config = {
        file,
        root,
        data: sections['data'],
        target: sections['target'],
        search: sections['search'],
        gate: sections['gate'],
        positions: reader.positions(written),
        metricGiven: written.values.get('target')?.has('metric') ?? false,
    };
    checkRules(reader, written, config);
    return config;
}
function insidePath(reader, found, root, baseDir, p, key) {
    const result = checkInside(root, baseDir, p);
    if (result.ok)
        return result.path;
    if (found)
        throw reader.valueError(found, `${result.reason}; paths must stay inside the workspace`);
    throw reader.error(null, key, `the default ${result.reason} (the config file is outside the workspace); set ${key}`);
}
/** The rules between keys, each reported at the key the user wrote. */
function checkRules(reader, written, config) {
    const at = (section, key) => written.values.get(section)?.get(key);
    const { data, target, search, gate } = config;
    for (const [list, name] of [
        [data.features, 'features'],
        [data.ignore, 'ignore'],
    ]) {
        if (list?.includes(data.target)) {
            const role = name === 'features' ? 'a feature' : 'ignored';
            throw reader.valueError(at('data', name), `lists the target column ${escape_quote(data.target)}; the target cannot also be ${role}`);
        }
    }
    const both = data.features?.find((f) => data.ignore.includes(f));
    if (both !== undefined) {
        throw reader.valueError(at('data', 'ignore'), `column ${escape_quote(both)} is both in data.features and in data.ignore; keep it in one`);
    }
    if (data.judging === undefined)
        data.judging = derivedJudging(data.validation);
    if (data.validation + data.judging >= 1) {
        const found = at('data', 'judging') ?? at('data', 'validation');
        throw reader.valueError(found, `expected data.validation + data.judging below 1 (some rows must be left to train on), found ${data.validation} + ${data.judging}`);
    }
    if (!config.metricGiven)
        target.metric = defaultMetric(data.task === 'regression' ? 'regression' : 'classification');
    if (config.metricGiven && data.task !== 'auto' && !metricFitsTask(target.metric, data.task)) {
        throw reader.valueError(at('target', 'metric'), `data.task is ${data.task}, so expected ${metricsFor(data.task)
            .join(', ')
            .replace(/, (?=[^,]*$)/, ' or ')}, found "${target.metric}"`);
    }
    const thresholdAt = at('target', 'threshold');
    if (config.metricGiven || data.task === 'classification')
        checkThreshold(reader, thresholdAt, target.metric, target.threshold);
    const searchFound = written.sections.get('search');
    const ordered = (name, relation, otherName) => {
        const value = search[fieldName(name)];
        const other = search[fieldName(otherName)];
        if (relation === 'at least' ? value >= other : value <= other)
            return;
        const mine = at('search', name);
        if (mine)
            throw reader.valueError(mine, `expected search.${name} to be ${relation} search.${otherName} (${other}), found ${value}`);
        // Only the other key was written: blame it, against this key's default.
        const reverse = relation === 'at least' ? 'at most' : 'at least';
        const message = `expected search.${otherName} to be ${reverse} search.${name} (${value}, the default), found ${other}`;
        const theirs = at('search', otherName);
        if (theirs)
            throw reader.valueError(theirs, message);
        throw reader.error(searchFound?.keyNode ?? null, `search.${otherName}`, message);
    };
    ordered('max-width', 'at least', 'min-width');
    ordered('required', 'at most', 'restarts');
    ordered('check-every', 'at most', 'max-epochs');
    if (gate.maxWidth !== null && gate.maxWidth < search.minWidth) {
        throw reader.valueError(at('gate', 'max-width'), `expected at least search.min-width (${search.minWidth}), found ${gate.maxWidth}; every width tried would be over the budget`);
    }
    const accuracyKnown = config.metricGiven || data.task === 'classification';
    if (accuracyKnown && target.metric === 'accuracy' && gate.metricTolerance >= 1) {
        throw reader.valueError(at('gate', 'metric-tolerance'), `expected a tolerance below 1 for accuracy, found ${gate.metricTolerance}`);
    }
}
/** An accuracy threshold must be a fraction; error thresholds are in the target's own units. */
function checkThreshold(reader, found, metric, threshold) {
    if (metric === 'accuracy' && threshold > 1) {
        throw reader.valueError(found, `expected an accuracy above 0 and at most 1, found ${threshold} (write 95% as 0.95)`);
    }
}

// EXTERNAL MODULE: ./node_modules/yaml/dist/index.js
var dist = __nccwpck_require__(8815);
;// CONCATENATED MODULE: ./src/config/reader.ts
/**
 * The YAML side of the config: parses the text once, walks it against the key list in spec.ts,
 * and checks each value against its rule. Every error names the file, the line and column, and
 * the key, and says what was expected and what was found. Where each key is written is kept, so
 * errors found later (after the data are read) still point at the right line.
 */






/** YAML tags a config may carry: the core schema's plain types. Anything else is refused. */
const CORE_TAGS = new Set(['str', 'int', 'float', 'bool', 'null', 'seq', 'map'].map((t) => `tag:yaml.org,2002:${t}`));
const NUMBER_TAGS = new Set(['tag:yaml.org,2002:int', 'tag:yaml.org,2002:float']);
const reader_DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
class ConfigReader {
    text;
    shown;
    lines = new dist/* LineCounter */.HN();
    doc;
    constructor(text, 
    /** The file as named in messages. */
    shown) {
        this.text = text;
        this.shown = shown;
        this.doc = (0,dist/* parseDocument */.Tp)(text, { lineCounter: this.lines, uniqueKeys: true, prettyErrors: false });
    }
    /** Checks the syntax and the sections and keys against spec.ts; values are checked by `value`. */
    read() {
        this.checkSyntax();
        this.checkTags();
        const top = this.doc.contents;
        if (top === null || ((0,dist/* isScalar */.jn)(top) && top.value === null)) {
            throw this.error(null, null, 'the config file is empty; expected a mapping with the sections data, target, search and gate');
        }
        if (!(0,dist/* isMap */.jh)(top)) {
            throw this.error(top, null, `expected a mapping with the sections data, target, search and gate, found ${this.describe(top)}`);
        }
        const sections = new Map();
        for (const pair of top.items) {
            const name = this.keyName(pair, '');
            const spec = spec_CONFIG_SPEC.find((s) => s.name === name);
            if (!spec) {
                const names = spec_CONFIG_SPEC.map((s) => s.name);
                throw this.error(pair.key, name, `unknown section${didYouMean(name, names)}; the sections are ${names.join(', ')}`);
            }
            sections.set(name, { node: this.deref(pair.value), keyNode: pair.key, key: name });
        }
        const values = new Map();
        for (const spec of spec_CONFIG_SPEC)
            values.set(spec.name, this.readSection(spec, sections.get(spec.name)));
        return { sections, values };
    }
    /** Where every written section and key is (dotted key → line and column of the key). */
    positions(written) {
        const out = new Map();
        const add = (found) => {
            const { line, col } = this.lines.linePos(found.keyNode.range?.[0] ?? 0);
            out.set(found.key, { line, column: col });
        };
        for (const found of written.sections.values())
            add(found);
        for (const section of written.values.values())
            for (const found of section.values())
                add(found);
        return out;
    }
    // ---- syntax and locations -------------------------------------------------------
    checkSyntax() {
        const first = this.doc.errors[0];
        if (!first)
            return;
        const offset = first.pos[0];
        if (first.code === 'MULTIPLE_DOCS') {
            throw this.errorAt(offset, null, 'expected one YAML document, found a second one (a "---" line)');
        }
        if (first.code === 'DUPLICATE_KEY') {
            const key = /^\s*["']?([^"':\n]*)/.exec(this.text.slice(offset))?.[1]?.trim() ?? '';
            throw this.errorAt(offset, null, `key ${escape_quote(key)} appears twice in the same mapping; keep one`);
        }
        const reason = first.message
            .replace(/ at line \d+, column \d+[\s\S]*$/, '')
            .replace(/\s+/g, ' ')
            .trim();
        throw this.errorAt(offset, null, `YAML syntax error: ${reason}`);
    }
    /**
     * Refuses tags outside the core schema (`!custom`, `!!binary`, `!!set`, …), which would
     * otherwise pass silently as plain text. `!!float 1` and `!!int 3` are numbers, as written.
     */
    checkTags() {
        (0,dist/* visit */.YR)(this.doc, {
            Node: (_key, node) => {
                if (!(0,dist/* isScalar */.jn)(node) && !(0,dist/* isMap */.jh)(node) && !(0,dist/* isSeq */.oP)(node))
                    return;
                const tag = node.tag;
                if (tag === undefined)
                    return;
                if (!CORE_TAGS.has(tag)) {
                    const shown = tag.startsWith('tag:yaml.org,2002:') ? `!!${tag.slice('tag:yaml.org,2002:'.length)}` : tag;
                    throw this.errorAt(this.tagOffset(node), null, `unsupported YAML tag ${escape_quote(shown)}; the config takes plain values (text, numbers, true/false, null, lists, mappings), so remove the tag`);
                }
                if ((0,dist/* isScalar */.jn)(node) && NUMBER_TAGS.has(tag) && typeof node.value === 'string') {
                    const text = node.value.trim();
                    if (!reader_DECIMAL.test(text)) {
                        throw this.error(node, null, `the tag ${tag.endsWith('int') ? '!!int' : '!!float'} needs a number, found ${escape_quote(node.value)}`);
                    }
                    node.value = Number(text);
                }
            },
        });
    }
    /** Where a tagged node's tag is written (the node's range starts after it), else the node. */
    tagOffset(node) {
        const start = node.range?.[0] ?? 0;
        let end = start;
        while (end > 0 && /\s/.test(this.text[end - 1]))
            end--;
        let tag = end;
        while (tag > 0 && !/\s/.test(this.text[tag - 1]))
            tag--;
        return this.text[tag] === '!' && tag < end ? tag : start;
    }
    errorAt(offset, key, message) {
        const { line, col } = this.lines.linePos(Math.min(offset, this.text.length));
        const prefix = key === null ? '' : `${key}: `;
        return new errors_UserError(`${this.shown}:${line}:${col}: ${prefix}${message}`, {
            file: this.shown,
            line,
            column: col,
            ...(key === null ? {} : { key }),
        });
    }
    /** An error located at `node` (or the file's start when null). */
    error(node, key, message) {
        return this.errorAt(node?.range?.[0] ?? 0, key, message);
    }
    /** Locates a bad value: at the value itself, or at its key when the value is empty. */
    valueError(found, message) {
        const empty = found.node === null || ((0,dist/* isScalar */.jn)(found.node) && found.node.value === null && found.node.source === '');
        return this.error(empty ? found.keyNode : found.node, found.key, message);
    }
    keyName(pair, prefix) {
        const key = pair.key;
        if (!(0,dist/* isScalar */.jn)(key) || (typeof key.value !== 'string' && typeof key.value !== 'number')) {
            throw this.error(key, null, `expected a key name${prefix ? ` in ${prefix.slice(0, -1)}` : ''}, found ${this.describe(key)}`);
        }
        return String(key.value);
    }
    deref(node) {
        if (node && (0,dist/* isAlias */.Vj)(node))
            return node.resolve(this.doc) ?? null;
        return node;
    }
    describe(node) {
        if (node === null)
            return 'nothing';
        if ((0,dist/* isMap */.jh)(node))
            return 'a mapping';
        if ((0,dist/* isSeq */.oP)(node))
            return 'a list';
        if ((0,dist/* isScalar */.jn)(node)) {
            const v = node.value;
            if (v === null)
                return node.source === '' || node.source === undefined ? 'nothing' : `null`;
            if (typeof v === 'string')
                return escape_quote(v);
            if (typeof v === 'number' || typeof v === 'boolean' || typeof v === 'bigint')
                return String(v);
        }
        return 'a value of an unsupported type';
    }
    // ---- sections and keys ----------------------------------------------------------
    readSection(spec, section) {
        const out = new Map();
        if (!section || section.node === null || ((0,dist/* isScalar */.jn)(section.node) && section.node.value === null)) {
            if (spec.required) {
                const missing = spec.keys.filter((k) => k.default === spec_REQUIRED).map((k) => `${spec.name}.${k.name}`);
                throw this.error(section?.keyNode ?? null, spec.name, `section is required (with ${missing.join(' and ')}); ${spec.description}`);
            }
            return out;
        }
        if (!(0,dist/* isMap */.jh)(section.node)) {
            throw this.error(section.node, spec.name, `expected a mapping of ${spec.name} settings, found ${this.describe(section.node)}`);
        }
        const names = spec.keys.map((k) => k.name);
        for (const pair of section.node.items) {
            const name = this.keyName(pair, `${spec.name}.`);
            const full = `${spec.name}.${name}`;
            if (!names.includes(name)) {
                throw this.error(pair.key, full, `unknown key${didYouMean(name, names)}; ${spec.name} accepts ${names.join(', ')}`);
            }
            out.set(name, { node: this.deref(pair.value), keyNode: pair.key, key: full });
        }
        for (const key of spec.keys) {
            if (key.default === spec_REQUIRED && !out.has(key.name)) {
                throw this.error(section.keyNode, `${spec.name}.${key.name}`, `required key is missing (${key.description})`);
            }
        }
        return out;
    }
    /** The value of one key checked against its rule, or its default (undefined for required and derived keys). */
    value(found, spec) {
        if (!found) {
            if (spec.default === spec_REQUIRED || spec.default === spec_DERIVED)
                return undefined;
            return Array.isArray(spec.default) ? [...spec.default] : spec.default;
        }
        return this.checkRule(found, spec);
    }
    /** target.min-recall: one floor for every class, or floors for named classes. */
    recallRule(found, node, expected) {
        const floor = (value) => typeof value === 'number' && value > 0 && value <= 1;
        if (node !== null && (0,dist/* isScalar */.jn)(node)) {
            if (!floor(node.value))
                throw this.valueError(found, `expected ${expected}, found ${this.describe(node)}`);
            return { every: node.value };
        }
        if (node === null || !(0,dist/* isMap */.jh)(node) || node.items.length === 0) {
            throw this.valueError(found, `expected ${expected}, found ${this.describe(node)}`);
        }
        const classes = [];
        for (const pair of node.items) {
            const label = this.keyName(pair, `${found.key}.`);
            const value = this.deref(pair.value);
            const v = value !== null && (0,dist/* isScalar */.jn)(value) ? value.value : undefined;
            if (!floor(v)) {
                throw this.error(value ?? pair.key, `${found.key}.${label}`, `expected a recall above 0 and at most 1, found ${this.describe(value)}`);
            }
            classes.push({ label, min: v });
        }
        return { classes };
    }
    checkRule(found, spec) {
        const rule = spec.rule;
        const node = found.node;
        const scalar = node !== null && (0,dist/* isScalar */.jn)(node) ? node.value : undefined;
        const isNull = node === null || ((0,dist/* isScalar */.jn)(node) && node.value === null);
        const expected = describeRule(rule);
        const bad = () => this.valueError(found, `expected ${expected}, found ${this.describe(node)}`);
        if (isNull && 'nullable' in rule && rule.nullable)
            return null;
        switch (rule.kind) {
            case 'integer':
            case 'number': {
                if (typeof scalar !== 'number' || !Number.isFinite(scalar))
                    throw bad();
                if (rule.kind === 'integer' && !Number.isInteger(scalar))
                    throw bad();
                const exMin = rule.kind === 'number' && rule.exclusiveMin;
                const exMax = rule.kind === 'number' && rule.exclusiveMax;
                if (scalar < rule.min || (exMin && scalar === rule.min))
                    throw bad();
                if (scalar > rule.max || (exMax && scalar === rule.max))
                    throw bad();
                return scalar;
            }
            case 'enum': {
                if (typeof scalar !== 'string' || !rule.values.includes(scalar)) {
                    const hint = typeof scalar === 'string' ? didYouMean(scalar, rule.values) : '';
                    throw this.valueError(found, `expected ${expected}, found ${this.describe(node)}${hint}`);
                }
                return scalar;
            }
            case 'boolean': {
                if (typeof scalar !== 'boolean')
                    throw bad();
                return scalar;
            }
            case 'text':
            case 'path': {
                if (typeof scalar === 'number' && rule.kind === 'text') {
                    throw this.valueError(found, `expected ${expected}, found the number ${this.describe(node)} (put a column name that looks like a number in quotes)`);
                }
                if (typeof scalar !== 'string' || scalar.trim() === '')
                    throw bad();
                return scalar;
            }
            case 'character': {
                if (typeof scalar !== 'string' || [...scalar].length !== 1 || /["\r\n]/.test(scalar))
                    throw bad();
                return scalar;
            }
            case 'text-list': {
                if (node === null || !(0,dist/* isSeq */.oP)(node))
                    throw bad();
                if (node.items.length < rule.minItems)
                    throw this.valueError(found, `expected ${expected}, found an empty list`);
                const seen = new Set();
                const out = [];
                for (const raw of node.items) {
                    const item = this.deref(raw);
                    const v = item !== null && (0,dist/* isScalar */.jn)(item) ? item.value : undefined;
                    if (typeof v !== 'string' || v.trim() === '') {
                        const hint = typeof v === 'number' ? ' (put a column name that looks like a number in quotes)' : '';
                        throw this.error(item ?? node, found.key, `expected column names as text, found ${this.describe(item)}${hint}`);
                    }
                    if (seen.has(v))
                        throw this.error(item, found.key, `column ${escape_quote(v)} is listed twice`);
                    seen.add(v);
                    out.push(v);
                }
                return out;
            }
            case 'recall':
                return this.recallRule(found, node, expected);
        }
    }
}

;// CONCATENATED MODULE: ./src/config/index.ts
/**
 * The config stage: the YAML file → a typed Config with every default filled in (reader.ts
 * walks the YAML against spec.ts, build.ts makes the typed config and checks the rules between
 * keys). Errors found after the data are read point at the key through the positions kept here.
 */











/** A config is a few dozen lines; anything this big is not one (and parsing it could take minutes). @testOnly */
const MAX_CONFIG_BYTES = 256 * 1024;
async function loadConfig(configPath, root) {
    const file = (0,external_node_path_namespaceObject.resolve)(root, configPath);
    const shown = displayPath(root, file);
    let text;
    try {
        const info = await (0,promises_namespaceObject.stat)(file);
        if (info.isFile() && info.size > MAX_CONFIG_BYTES) {
            throw new errors_UserError(`${shown}: the config file has ${formatCount(info.size)} bytes; a config may have at most ${formatCount(MAX_CONFIG_BYTES)} (is this the right file?)`, { file: shown });
        }
        text = await (0,promises_namespaceObject.readFile)(file, 'utf8');
    }
    catch (error) {
        if (error instanceof errors_UserError)
            throw error;
        const code = error.code;
        if (code === 'ENOENT')
            throw new errors_UserError(`${shown}: config file not found (looked for ${file})`, { file: shown });
        if (code === 'EISDIR')
            throw new errors_UserError(`${shown}: expected a YAML config file, found a folder`, { file: shown });
        if (code === 'EACCES')
            throw new errors_UserError(`${shown}: config file cannot be read (permission denied)`, { file: shown });
        throw error;
    }
    return parseConfig(text, { file, root });
}
/** Validates config text as if it were the file `file` (absolute) inside workspace `root`. @testOnly */
function parseConfig(text, where) {
    const file = (0,external_node_path_namespaceObject.resolve)(where.file);
    const root = (0,external_node_path_namespaceObject.resolve)(where.root);
    // Editors do not count a byte-order mark as a column; neither do we.
    const reader = new ConfigReader(text.replace(/^\uFEFF/, ''), displayPath(root, file));
    return buildConfig(reader, reader.read(), file, root);
}
/**
 * A UserError about a config key found after validation (the data showed the problem): at the
 * key's line and column when it is written, else at its section's, else at the file.
 */
function configKeyError(config, key, detail) {
    const shown = displayPath(config.root, config.file);
    const at = config.positions.get(key) ?? config.positions.get(key.split('.')[0]) ?? null;
    const where = at === null ? shown : `${shown}:${at.line}:${at.column}`;
    return new errors_UserError(`${where}: ${key}: ${detail}`, {
        file: shown,
        key,
        ...(at ? { line: at.line, column: at.column } : {}),
    });
}
/**
 * What the config could not settle before the data were read: the metric and recall floors,
 * which depend on the task and the class labels found.
 */
function settleTarget(config, task, classes) {
    const settled = settleMetric(config, task, classes);
    return { ...settled, target: { ...settled.target, recallFloors: recallFloors(settled, task, classes) } };
}
/** target.min-recall as one floor per class index; each named class must be one the data have. */
function recallFloors(config, task, classes) {
    const rule = config.target.minRecall ?? null;
    if (rule === null)
        return null;
    if (task !== 'classification' || classes === null) {
        throw configKeyError(config, 'target.min-recall', `the target column ${escape_quote(config.data.target)} was read as regression; recall floors need classes (remove target.min-recall)`);
    }
    if ('every' in rule)
        return classes.map(() => rule.every);
    const floors = classes.map(() => 0);
    for (const { label, min } of rule.classes) {
        const i = classes.indexOf(label);
        if (i < 0) {
            throw configKeyError(config, 'target.min-recall', `names the class ${escape_quote(label)}, which the target column ${escape_quote(config.data.target)} does not have${didYouMean(label, classes)}; its classes are ${classes.map((c) => escape_quote(c)).join(', ')}`);
        }
        floors[i] = min;
    }
    return floors;
}
/**
 * With data.task auto the task is only known after reading: the metric follows it unless the
 * config names one, and a named metric must suit it. A threshold or tolerance that cannot be an
 * accuracy is refused here, once the task is known, saying what to write either way.
 */
function settleMetric(config, task, classes) {
    const target = config.target;
    if (!config.metricGiven) {
        const metric = defaultMetric(task);
        if (metric === 'accuracy' && target.threshold > 1) {
            throw configKeyError(config, 'target.threshold', `${readAsClassification(config, classes)}, so the threshold is an accuracy: expected above 0 and at most 1, found ${target.threshold}; ${whatToWrite(config, classes, 'write the accuracy as a fraction (95% as 0.95)')}`);
        }
        if (metric === 'accuracy' && config.gate.metricTolerance >= 1) {
            throw configKeyError(config, 'gate.metric-tolerance', `${readAsClassification(config, classes)}, so the tolerance is an accuracy difference: expected below 1, found ${config.gate.metricTolerance}; ${whatToWrite(config, classes, 'write the tolerance as a fraction (2 points as 0.02)')}`);
        }
        return { ...config, target: { ...target, metric } };
    }
    if (metricFitsTask(target.metric, task))
        return config;
    const hint = task === 'classification'
        ? 'set target.metric to accuracy, or data.task to regression'
        : "set target.metric to rmse, mae or max-abs-error (with a threshold in the target's units), or data.task to classification";
    throw configKeyError(config, 'target.metric', `the target column ${escape_quote(config.data.target)} was read as ${task}, which cannot be judged by ${target.metric}; ${hint}`);
}
/** Whether a class target's labels are all numbers (data.task auto read a numeric column with few values as classes). */
function numericLabels(classes) {
    return classes !== null && classes.every((c) => c.trim() !== '' && Number.isFinite(Number(c)));
}
/** "the target column "x" was read as classification (…why…)". */
function readAsClassification(config, classes) {
    const why = numericLabels(classes)
        ? `it holds only ${classes.length} distinct numbers, and data.task auto reads at most ${AUTO_MAX_CLASSES} as class labels`
        : 'it holds text';
    return `the target column ${escape_quote(config.data.target)} was read as classification (${why})`;
}
/** What to write: a few distinct numbers may be a measurement (then regression, and rmse follows); text is classes. */
function whatToWrite(config, classes, asAccuracy) {
    if (!numericLabels(classes))
        return asAccuracy;
    return `if ${escape_quote(config.data.target)} is a measurement, write "task: regression" under data (the metric is then rmse, in the column's units); if it holds classes, ${asAccuracy}`;
}

;// CONCATENATED MODULE: ./src/data/column-store.ts
/**
 * One column of the file, kept compactly while reading: numbers in a growable
 * Float64Array, and (while the column has few distinct values) each cell's text as an
 * index into a small table of distinct strings. Which of the two the column really is
 * gets decided once the whole file has been read.
 */


const INITIAL_CAPACITY = 1024;
/** The column reads as numbers: at least half of its cells are (see columns.ts). */
function looksNumeric(store) {
    return store.numberCount > 0 && store.numberCount >= store.textCount;
}
class ColumnStore {
    name;
    column;
    distinctLimit;
    length = 0;
    /** Cell values where they are finite numbers, NaN elsewhere. */
    numbers = new Float64Array(INITIAL_CAPACITY);
    /** Index into `distinct` per cell; null once the column has too many distinct values. */
    codes = new Int32Array(INITIAL_CAPACITY);
    /** Distinct cell texts in order of first appearance; null after overflow. */
    distinct = new Map();
    /** Where the distinct texts first outgrew `distinctLimit` (the value and its line). */
    overflow = null;
    /** After overflow, all distinct texts while the column still looks like text (for the count). */
    overflowTexts = null;
    numberCount = 0;
    textCount = 0;
    firstText = null;
    /** First NaN/Infinity/overflowing number, and which it was. */
    firstNotFinite = null;
    /** First distinct text longer than MAX_NAME_LENGTH (refused if the column is categorical). */
    firstTooLong = null;
    /** Empty cells met, including those of dropped rows. */
    missing = 0;
    parsed = { value: 0 };
    constructor(name, 
    /** 1-based field number in the file. */
    column, 
    /** Most distinct texts worth remembering (the categorical cap, or the class cap). */
    distinctLimit) {
        this.name = name;
        this.column = column;
        this.distinctLimit = distinctLimit;
    }
    push(text, line) {
        const i = this.length;
        if (i === this.numbers.length)
            this.grow();
        const kind = classifyNumber(text, this.parsed);
        if (kind === NumberKind.Finite) {
            this.numbers[i] = this.parsed.value;
            this.numberCount++;
        }
        else {
            this.numbers[i] = NaN;
            if (kind === NumberKind.Text) {
                this.textCount++;
                if (this.firstText === null)
                    this.firstText = { value: text, line };
            }
            else {
                this.numberCount++;
                if (this.firstNotFinite === null) {
                    this.firstNotFinite = { value: text, line, overflow: kind === NumberKind.Overflow };
                }
            }
        }
        if (this.distinct !== null && this.codes !== null) {
            let code = this.distinct.get(text);
            if (code === undefined) {
                if (text.length > MAX_NAME_LENGTH && this.firstTooLong === null && characterCount(text) > MAX_NAME_LENGTH) {
                    this.firstTooLong = { value: text, line };
                }
                code = this.distinct.size;
                if (code >= this.distinctLimit) {
                    this.startOverflow(text, line);
                }
                else {
                    this.distinct.set(text, code);
                }
            }
            if (this.codes !== null)
                this.codes[i] = code;
        }
        else if (this.overflowTexts !== null) {
            if (this.textCount >= this.numberCount)
                this.overflowTexts.add(text);
            else
                this.overflowTexts = null; // a numeric-looking column: the count no longer matters
        }
        this.length = i + 1;
    }
    /** Distinct values counted so far past the cap (a lower bound when counting stopped). */
    distinctCount() {
        if (this.distinct !== null)
            return this.distinct.size;
        return this.overflowTexts?.size ?? this.distinctLimit + 1;
    }
    /** Whether `distinctCount()` is exact. */
    distinctCountExact() {
        return this.distinct !== null || this.overflowTexts !== null;
    }
    startOverflow(text, line) {
        this.overflow = { value: text, line };
        if (this.textCount >= this.numberCount && this.distinct !== null) {
            this.overflowTexts = new Set(this.distinct.keys());
            this.overflowTexts.add(text);
        }
        this.distinct = null;
        this.codes = null;
    }
    grow() {
        const capacity = this.numbers.length * 2;
        const numbers = new Float64Array(capacity);
        numbers.set(this.numbers);
        this.numbers = numbers;
        if (this.codes !== null) {
            const codes = new Int32Array(capacity);
            codes.set(this.codes);
            this.codes = codes;
        }
    }
}

;// CONCATENATED MODULE: ./src/data/columns.ts






/** Most classes a classification target may have (a practical cap, no source). */
const MAX_CLASSES = 1000;
/** Column names listed in a message before the rest are only counted. */
const NAMES_LISTED = 30;
/** Resolves data.target / data.features / data.ignore against the header. */
function chooseColumns(header, config, file) {
    const data = config.data;
    const index = new Map(header.map((name, i) => [name, i]));
    const find = (name, key) => {
        const i = index.get(name);
        if (i !== undefined)
            return i;
        const guess = nearest(name, header);
        const hint = guess === null ? '.' : ` (did you mean ${escape_quote(guess)}?).`;
        throw new ConfigKeyProblem(key, `expected a column of ${file.shown}, found ${escape_quote(name)}, which its header (line 1) does not have${hint} ` +
            `The columns are: ${listNames(header)}`);
    };
    const target = find(data.target, 'data.target');
    const ignored = new Set();
    for (const name of data.ignore) {
        const i = find(name, 'data.ignore');
        if (i === target) {
            throw new ConfigKeyProblem('data.ignore', `lists ${escape_quote(name)}, which is the target column (data.target)`);
        }
        ignored.add(i);
    }
    let features;
    if (data.features === null) {
        features = header.map((_, i) => i).filter((i) => i !== target && !ignored.has(i));
    }
    else {
        features = [];
        for (const name of data.features) {
            const i = find(name, 'data.features');
            if (i === target) {
                throw new ConfigKeyProblem('data.features', `lists ${escape_quote(name)}, which is the target column (data.target)`);
            }
            if (ignored.has(i)) {
                throw new ConfigKeyProblem('data.features', `lists ${escape_quote(name)}, which data.ignore also lists`);
            }
            if (features.includes(i)) {
                throw new ConfigKeyProblem('data.features', `lists ${escape_quote(name)} twice`);
            }
            features.push(i);
        }
    }
    if (features.length === 0) {
        throw new ConfigKeyProblem(data.features === null ? 'data.ignore' : 'data.features', `expected at least one feature column besides the target ${escape_quote(data.target)}, found none left in ${file.shown}`);
    }
    for (const field of [...features, target])
        checkNameLength(header[field], field + 1, file);
    const columns = features.map((field) => ({ field, distinctLimit: data.maxCategories }));
    columns.push({ field: target, distinctLimit: MAX_CLASSES });
    return { plan: { columns, target: columns.length - 1 }, features, target };
}

/** Numeric column values, or the first cell that breaks them. */
function numericColumn(store, file, role) {
    const text = store.firstText;
    const odd = store.firstNotFinite;
    const label = `${columnLabel(store.column, store.name)}${role}`;
    if (odd !== null && (text === null || odd.line <= text.line)) {
        const why = odd.overflow
            ? `a number too large: cells may hold numbers from -${MAX_MAGNITUDE_SHOWN} to ${MAX_MAGNITUDE_SHOWN}, the range of ` +
                'the float32 numbers a device runs the network in (check the unit or the decimal point)'
            : 'a value that is not a finite number (NaN and Infinity are not measurements; leave the cell empty if it is missing)';
        throw dataError(file, odd.line, store.column, `${label}: expected a finite number, found ${shownValue(odd.value)}, ${why}`);
    }
    if (text !== null) {
        throw dataError(file, text.line, store.column, `${label}: expected a number, found ${shownValue(text.value)} (the column holds numbers in ` +
            `${store.numberCount} of ${store.numberCount + store.textCount} rows; leave a missing value empty)`);
    }
    return { kind: 'numeric', name: store.name, column: store.column, values: store.numbers.subarray(0, store.length) };
}
/** MAX_MAGNITUDE as a message shows it. */
const MAX_MAGNITUDE_SHOWN = MAX_MAGNITUDE.toPrecision(2).replace('e+', 'e');
/**
 * The column's texts as categories, or the first cell that breaks them. `what` names a
 * value in messages: "category" for a feature, "class label" for the target.
 */
function categoricalColumn(store, file, cap, what = 'category') {
    if (store.distinct === null || store.codes === null) {
        const count = store.distinctCount();
        const over = store.overflow;
        const amount = store.distinctCountExact() ? `${count}` : `more than ${cap}`;
        throw dataError(file, over?.line ?? 1, store.column, `${columnLabel(store.column, store.name)} is text with ${amount} distinct values; a categorical column ` +
            `may have at most ${cap} (data.max-categories). The value ${shownValue(over?.value ?? '')} on this line ` +
            `is number ${cap + 1}. An identifier column belongs in data.ignore.`);
    }
    const long = store.firstTooLong;
    if (long !== null) {
        throw dataError(file, long.line, store.column, `${columnLabel(store.column, store.name)}: a ${what} may have at most ${MAX_NAME_LENGTH} characters; found ` +
            `one of ${formatCount(characterCount(long.value))} characters: ${shownValue(long.value)}`);
    }
    return sortedCategories(store, store.distinct, store.codes);
}
function sortedCategories(store, distinct, codes) {
    const firstSeen = [...distinct.keys()];
    const categories = [...firstSeen].sort(compareText);
    const rank = new Map(categories.map((c, i) => [c, i]));
    const remap = Int32Array.from(firstSeen, (c) => rank.get(c) ?? -1);
    const out = new Int32Array(store.length);
    for (let i = 0; i < store.length; i++)
        out[i] = remap[codes[i]];
    return { kind: 'categorical', name: store.name, column: store.column, categories, codes: out };
}
function compareText(a, b) {
    return a < b ? -1 : a > b ? 1 : 0;
}
/** The feature column as numeric or categorical, by the rule at the top of this file. */
function featureColumn(store, file, cap) {
    return looksNumeric(store) ? numericColumn(store, file, '') : categoricalColumn(store, file, cap);
}
/** A column the job uses must have a name of at most MAX_NAME_LENGTH characters. */
function checkNameLength(name, column, file) {
    if (name.length <= MAX_NAME_LENGTH)
        return;
    const length = characterCount(name);
    if (length <= MAX_NAME_LENGTH)
        return;
    throw dataError(file, 1, column, `column ${column}: a column name may have at most ${MAX_NAME_LENGTH} characters; found one of ` +
        `${formatCount(length)} characters: ${shownValue(name)}`);
}
/** The header's names for a message: quoted, clipped, and at most NAMES_LISTED of them. */
function listNames(header) {
    const shown = header.slice(0, NAMES_LISTED).map((name) => escape_quote(name, 40));
    const more = header.length - shown.length;
    return more > 0 ? `${shown.join(', ')} and ${formatCount(more)} more` : shown.join(', ');
}

;// CONCATENATED MODULE: ./src/data/encode.ts
function sharedFloat64(length) {
    return new Float64Array(new SharedArrayBuffer(length * Float64Array.BYTES_PER_ELEMENT));
}
/** Mean and population standard deviation over the given rows (two passes, for accuracy). */
function meanAndStd(values, rows) {
    if (rows.length === 0)
        return { mean: 0, std: 0 };
    let sum = 0;
    for (let i = 0; i < rows.length; i++)
        sum += values[rows[i]];
    const mean = sum / rows.length;
    let squares = 0;
    for (let i = 0; i < rows.length; i++) {
        const d = values[rows[i]] - mean;
        squares += d * d;
    }
    return { mean, std: Math.sqrt(squares / rows.length) };
}
function encodeDataset(features, target, split) {
    const encodings = features.map((column) => {
        if (column.kind === 'categorical') {
            return { kind: 'categorical', name: column.name, categories: column.categories };
        }
        const { mean, std } = meanAndStd(column.values, split.train);
        // A constant feature is only centred: dividing by 0 would poison every input.
        return { kind: 'numeric', name: column.name, mean, std: std > 0 ? std : 1 };
    });
    const inputs = encodings.reduce((n, e) => n + (e.kind === 'numeric' ? 1 : e.categories.length), 0);
    let targetEncoding;
    let outputs;
    if (target.task === 'classification') {
        targetEncoding = { name: target.name, task: 'classification', classes: target.classes, mean: 0, std: 1 };
        outputs = target.classes.length === 2 ? 1 : target.classes.length;
    }
    else {
        const { mean, std } = meanAndStd(target.values, split.train);
        targetEncoding = { name: target.name, task: 'regression', classes: null, mean, std: std > 0 ? std : 1 };
        outputs = 1;
    }
    const fill = (rows) => {
        const x = sharedFloat64(rows.length * inputs);
        const y = sharedFloat64(rows.length);
        let offset = 0;
        for (let f = 0; f < features.length; f++) {
            const column = features[f];
            const e = encodings[f];
            if (column.kind === 'numeric' && e.kind === 'numeric') {
                const values = column.values;
                for (let r = 0; r < rows.length; r++)
                    x[r * inputs + offset] = (values[rows[r]] - e.mean) / e.std;
                offset += 1;
            }
            else if (column.kind === 'categorical') {
                const codes = column.codes;
                for (let r = 0; r < rows.length; r++)
                    x[r * inputs + offset + codes[rows[r]]] = 1;
                offset += column.categories.length;
            }
        }
        if (target.task === 'classification') {
            for (let r = 0; r < rows.length; r++)
                y[r] = target.indices[rows[r]];
        }
        else {
            for (let r = 0; r < rows.length; r++)
                y[r] = (target.values[rows[r]] - targetEncoding.mean) / targetEncoding.std;
        }
        return { x, y };
    };
    const train = fill(split.train);
    const validation = fill(split.validation);
    const judging = fill(split.judging);
    // The rows that judge, as the device gets them: what the int8 path is judged on.
    const judgedRows = split.judging.length > 0 ? split.judging : split.validation.length > 0 ? split.validation : split.train;
    return {
        task: target.task,
        inputs,
        outputs,
        trainRows: split.train.length,
        validationRows: split.validation.length,
        xTrain: train.x,
        yTrain: train.y,
        xValidation: validation.x,
        yValidation: validation.y,
        judgingRows: split.judging.length,
        xJudging: judging.x,
        yJudging: judging.y,
        rawJudged: rawFeatures(features, judgedRows),
        encoding: { features: encodings, target: targetEncoding },
    };
}
/**
 * Rows as a device receives them (rows × features, float32): a numeric feature's value, a
 * categorical feature's category index. The exported C and the int8 simulation take this form.
 */
function rawFeatures(features, rows) {
    const F = features.length;
    const out = new Float32Array(new SharedArrayBuffer(rows.length * F * Float32Array.BYTES_PER_ELEMENT));
    features.forEach((column, f) => {
        if (column.kind === 'numeric')
            for (let r = 0; r < rows.length; r++)
                out[r * F + f] = column.values[rows[r]];
        else
            for (let r = 0; r < rows.length; r++)
                out[r * F + f] = column.codes[rows[r]];
    });
    return out;
}

;// CONCATENATED MODULE: ./src/data/fingerprint.ts
/**
 * sha256 of the data as used, over a canonical form: columns sorted by name, each
 * with its role and kind, then its values in row order (numbers as little-endian
 * 64-bit floats, categories as indices into the sorted category list). Line endings,
 * quoting, spelling of numbers ("1.0" vs "1") and column order do not change it; any
 * changed value does.
 */


const FORMAT = 'neuron-budget data fingerprint v1';
const CHUNK = 8192;
function fingerprint(features, target, rows) {
    const parts = features.map((column) => ({
        name: column.name,
        role: 'feature',
        kind: column.kind,
        write: (hash) => column.kind === 'numeric' ? numbers(hash, column.values) : categories(hash, column.categories, column.codes),
    }));
    parts.push({
        name: target.name,
        role: 'target',
        kind: target.task === 'classification' && target.numericLabels === null ? 'categorical' : 'numeric',
        write: (hash) => target.task === 'regression'
            ? numbers(hash, target.values)
            : target.numericLabels !== null
                ? numbers(hash, target.numericLabels)
                : categories(hash, target.classes, target.indices),
    });
    parts.sort((a, b) => compareText(a.name, b.name));
    const hash = (0,external_node_crypto_namespaceObject.createHash)('sha256');
    hash.update(`${FORMAT}\nrows ${rows}\n`);
    for (const part of parts) {
        hash.update(`${JSON.stringify([part.name, part.role, part.kind])}\n`);
        part.write(hash);
    }
    return hash.digest('hex');
}
function numbers(hash, values) {
    const chunk = new Float64Array(CHUNK);
    const view = new DataView(chunk.buffer);
    const littleEndian = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;
    for (let start = 0; start < values.length; start += CHUNK) {
        const n = Math.min(CHUNK, values.length - start);
        for (let i = 0; i < n; i++) {
            const v = values[start + i];
            if (littleEndian)
                chunk[i] = v === 0 ? 0 : v;
            else
                view.setFloat64(i * 8, v === 0 ? 0 : v, true);
        }
        hash.update(new Uint8Array(chunk.buffer, 0, n * 8));
    }
}
function categories(hash, names, codes) {
    hash.update(`${JSON.stringify(names)}\n`);
    const chunk = new Uint32Array(CHUNK);
    const view = new DataView(chunk.buffer);
    const littleEndian = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;
    for (let start = 0; start < codes.length; start += CHUNK) {
        const n = Math.min(CHUNK, codes.length - start);
        for (let i = 0; i < n; i++) {
            if (littleEndian)
                chunk[i] = codes[start + i];
            else
                view.setUint32(i * 4, codes[start + i], true);
        }
        hash.update(new Uint8Array(chunk.buffer, 0, n * 4));
    }
}

;// CONCATENATED MODULE: ./src/data/profile.ts
function profileData(features, target, stores, rows) {
    const missing = new Map(stores.map((s) => [s.column, s.missing]));
    const profiles = keyedTable();
    for (const column of features) {
        const lost = missing.get(column.column) ?? 0;
        profiles[column.name] =
            column.kind === 'numeric'
                ? numericProfile(column.values, lost)
                : categoricalProfile(column.categories, column.codes, lost);
    }
    let classes = null;
    if (target.task === 'classification') {
        const counts = new Array(target.classes.length).fill(0);
        for (const c of target.indices)
            counts[c]++;
        const table = keyedTable();
        target.classes.forEach((label, i) => {
            table[label] = counts[i];
        });
        classes = table;
    }
    const used = [
        ...features.map((c) => ({ name: c.name, column: c.column })),
        { name: target.name, column: target.column },
    ];
    used.sort((a, b) => a.column - b.column);
    return { rows, classes, columns: used.map((c) => c.name), features: profiles };
}
/** A regression target's mean, standard deviation and range over the rows used; null for classification. */
function targetSpread(target) {
    if (target.task !== 'regression')
        return null;
    const { mean, std, min, max } = numericProfile(target.values, 0);
    return { mean, std, min, max };
}
function numericProfile(values, missing) {
    let sum = 0;
    let min = Infinity;
    let max = -Infinity;
    for (let i = 0; i < values.length; i++) {
        const v = values[i];
        sum += v;
        if (v < min)
            min = v;
        if (v > max)
            max = v;
    }
    const mean = sum / values.length;
    let squares = 0;
    for (let i = 0; i < values.length; i++) {
        const d = values[i] - mean;
        squares += d * d;
    }
    // Population standard deviation, the same one the standardisation uses.
    return { kind: 'numeric', mean, std: Math.sqrt(squares / values.length), min, max, missing };
}
function categoricalProfile(categories, codes, missing) {
    const tally = new Array(categories.length).fill(0);
    for (const c of codes)
        tally[c]++;
    const counts = keyedTable();
    categories.forEach((category, i) => {
        counts[category] = tally[i];
    });
    return { kind: 'categorical', counts, missing };
}
/** An empty table keyed by strings from the file: no prototype, so no key is special. */
function keyedTable() {
    return Object.create(null);
}

;// CONCATENATED MODULE: external "node:v8"
const external_node_v8_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:v8");
;// CONCATENATED MODULE: ./src/data/memory.ts
/**
 * Will the data fit in memory? The column stores grow by doubling while the file is read, and
 * the split and the encoded dataset come after; a process that runs out of address space or
 * heap on the way dies with a fatal V8 error and a native stack, or an internal error, after
 * minutes of reading. So each time the stores are about to double, the reader projects the
 * whole file's rows from the bytes read so far and the file's size, estimates what loading them
 * takes, and stops with a message (how much, the limit, what to do) when it will not fit.
 *
 * The estimate counts what src/data allocates; the search's own working memory comes on top.
 */




const MIB = 1024 * 1024;
/** Room kept free for everything not estimated (parser buffers, the report, the workers' start). */
const HEADROOM = 64 * MIB;
/** The estimate is an estimate: ask for this much more (a practical margin, no source). */
const MARGIN = 1.1;
/** Bytes per row the split keeps: its row lists as JavaScript arrays (heap) and as Int32Arrays. */
const SPLIT_HEAP_PER_ROW = 16;
const SPLIT_TYPED_PER_ROW = 12;
function estimateLoad(shape) {
    const perRecord = shape.bytesParsed / Math.max(1, shape.recordsParsed);
    const rows = Math.max(shape.rows, Math.ceil(shape.fileBytes / Math.max(1, perRecord)));
    let capacity = shape.capacity;
    while (capacity < rows)
        capacity *= 2;
    let storePerRow = 0;
    let afterPerRow = 8; // the target per row as the network reads it
    for (const c of shape.columns) {
        storePerRow += 8 + (c.codes ? 4 : 0);
        afterPerRow += 8 * c.inputs + (c.codes ? 4 : 0); // inputs as float64; categories re-coded in sorted order
    }
    const stores = capacity * storePerRow;
    // While the last doubling copies, the old stores are still there; after reading, the stores
    // stay while the split and the encoded arrays are made.
    const reading = stores + (capacity / 2) * storePerRow;
    const after = stores + rows * (afterPerRow + SPLIT_TYPED_PER_ROW + SPLIT_HEAP_PER_ROW);
    return {
        rows,
        total: Math.max(reading, after),
        heap: rows * SPLIT_HEAP_PER_ROW,
        held: shape.capacity * storePerRow,
    };
}
function memoryRoom() {
    const heap = (0,external_node_v8_namespaceObject.getHeapStatistics)();
    const rss = process.memoryUsage.rss();
    const candidates = [];
    const total = (0,external_node_os_namespaceObject.totalmem)();
    candidates.push({ bytes: total - rss, bound: `the machine's memory of ${mib(total)}` });
    const constrained = process.constrainedMemory();
    if (constrained > 0 && constrained < total) {
        candidates.push({ bytes: constrained - rss, bound: `the container's memory limit of ${mib(constrained)}` });
    }
    const space = addressSpace();
    if (space !== null) {
        candidates.push({
            bytes: space.limit - space.used,
            bound: `the address-space limit (ulimit -v) of ${mib(space.limit)}, ${mib(space.used)} of it in use`,
        });
    }
    const tightest = candidates.reduce((a, b) => (b.bytes < a.bytes ? b : a));
    return {
        bytes: Math.max(0, tightest.bytes),
        bound: tightest.bound,
        heapBytes: Math.max(0, heap.heap_size_limit - heap.used_heap_size),
        heapLimit: heap.heap_size_limit,
    };
}
/** Why the estimate does not fit in `room`, or null when it does. */
function whyNotFit(estimate, room) {
    const need = estimate.total * MARGIN;
    const have = Math.max(0, room.bytes + estimate.held - HEADROOM);
    const heapNeed = estimate.heap * MARGIN;
    const heapHave = Math.max(0, room.heapBytes - HEADROOM);
    if (need <= have && heapNeed <= heapHave)
        return null;
    return (`loading about ${formatCount(estimate.rows)} rows needs about ${mib(need)} of memory ` +
        `(${mib(heapNeed)} of it on the JavaScript heap), but this process has room for about ${mib(have)}: ` +
        `typed arrays are bounded by ${room.bound}, and the JavaScript heap by its limit of ${mib(room.heapLimit)} ` +
        `(v8 heap_size_limit; ${mib(room.heapBytes)} of it free). Commit fewer rows (a sample of them), raise the ` +
        'limit (NODE_OPTIONS=--max-old-space-size=… for the heap; ulimit -v or the container limit for the rest), ' +
        'or run on a bigger runner');
}
function mib(bytes) {
    return `${formatCount(Math.round(bytes / MIB))} MiB`;
}
/** The soft address-space limit and the address space in use (Linux /proc), or null when there is none. */
function addressSpace() {
    try {
        const limits = (0,external_node_fs_namespaceObject.readFileSync)('/proc/self/limits', 'utf8');
        const m = /^Max address space\s+(\S+)/m.exec(limits);
        if (m === null || m[1] === 'unlimited')
            return null;
        const status = (0,external_node_fs_namespaceObject.readFileSync)('/proc/self/status', 'utf8');
        const used = /^VmSize:\s+(\d+) kB/m.exec(status);
        return { limit: Number(m[1]), used: used === null ? 0 : Number(used[1]) * 1024 };
    }
    catch {
        return null; // not Linux: the other limits still apply
    }
}

;// CONCATENATED MODULE: ./src/data/read-csv.ts
/**
 * Streams a CSV file through csv-parse into column stores, one record at a time, so the
 * file's text is never held whole. Every failure becomes a UserError naming the line
 * (as an editor counts it, header = line 1) and the column.
 */











async function readCsvColumns(file, options) {
    const fileBytes = (await (0,promises_namespaceObject.stat)(file.path)).size;
    let header = null;
    let stores = [];
    let fields = new Int32Array(0);
    let targetIndex = -1;
    let rows = 0;
    let dropped = 0;
    // The line each record starts on, counted by us (csv-parse's own count is off by one
    // for every CRLF inside a quoted value): a record spans one line plus the line breaks
    // inside its values.
    let nextLine = 1;
    const onRecord = (record) => {
        const line = nextLine;
        nextLine = line + 1 + lineBreaks(record);
        if (record.length === 1 && record[0] === '')
            return; // a blank line
        if (header === null) {
            header = checkHeader(file, record, line);
            const plan = options.plan(header);
            const known = header;
            stores = plan.columns.map((c) => new ColumnStore(known[c.field], c.field + 1, c.distinctLimit));
            fields = Int32Array.from(plan.columns, (c) => c.field);
            targetIndex = plan.target;
            return;
        }
        const names = header;
        if (record.length !== names.length)
            throw fieldCountError(file, line, record, names);
        let missingHere = false;
        for (let k = 0; k < stores.length; k++) {
            if (record[fields[k]] === '') {
                const store = stores[k];
                if (k === targetIndex) {
                    throw dataError(file, line, store.column, `${columnLabel(store.column, store.name)} (the target) is empty; every row needs a target value`);
                }
                if (options.missing === 'error') {
                    throw dataError(file, line, store.column, `${columnLabel(store.column, store.name)} is empty; expected a value ` +
                        '(set data.missing: drop to leave such rows out)');
                }
                store.missing++;
                missingHere = true;
            }
        }
        if (missingHere) {
            dropped++;
            return;
        }
        // The stores are full and about to double: first make sure the whole file will fit.
        if (rows === stores[0].numbers.length)
            checkMemory(file, stores, targetIndex, rows, parser.info, fileBytes);
        for (let k = 0; k < stores.length; k++)
            stores[k].push(record[fields[k]], line);
        rows++;
    };
    const parser = parse({
        delimiter: options.delimiter,
        bom: true,
        trim: true,
        skip_empty_lines: false, // blank lines come through as [''] and are skipped above, so lines stay counted
        // Files edited on several systems can mix line endings; accept both everywhere.
        record_delimiter: ['\r\n', '\n'],
        relax_column_count: true,
    });
    // Records go to a sink rather than through csv-parse's on_record hook, which builds an
    // info object per record; a throw in the sink fails the pipeline cleanly.
    const sink = new external_node_stream_namespaceObject.Writable({
        objectMode: true,
        highWaterMark: 1024,
        write(record, _encoding, done) {
            try {
                onRecord(record);
            }
            catch (error) {
                done(error);
                return;
            }
            done();
        },
    });
    try {
        await (0,external_node_stream_promises_namespaceObject.pipeline)((0,external_node_fs_namespaceObject.createReadStream)(file.path, { highWaterMark: 1 << 20 }), new TextCheck(options.delimiter), parser, sink);
    }
    catch (error) {
        throw explain(file, error, nextLine, header);
    }
    if (header === null) {
        throw dataError(file, 1, 1, 'the file is empty; expected a header row naming the columns');
    }
    const names = header;
    if (rows === 0) {
        if (dropped > 0) {
            throw dataError(file, nextLine - 1, undefined, `all ${dropped} data rows have an empty feature value and were dropped; no rows are left`);
        }
        throw dataError(file, nextLine, 1, `the file has a header (${names.length} columns) but no data rows; expected at least one row after line ${nextLine - 1}`);
    }
    return {
        header: names,
        columns: stores,
        target: stores[targetIndex],
        rows,
        droppedRows: dropped,
        lastLine: nextLine - 1,
    };
}
/** Stops with a UserError when loading the whole file would not fit in this process's memory. */
function checkMemory(file, stores, target, rows, parsed, fileBytes) {
    const estimate = estimateLoad({
        rows,
        capacity: stores[0].numbers.length,
        recordsParsed: parsed.records,
        bytesParsed: parsed.bytes,
        fileBytes,
        columns: stores.map((s, k) => ({
            codes: s.codes !== null,
            inputs: k === target ? 0 : s.distinct !== null && !looksNumeric(s) ? s.distinct.size : 1,
        })),
    });
    const why = whyNotFit(estimate, memoryRoom());
    if (why !== null)
        throw new errors_UserError(`${file.shown}: ${why}`, { file: file.path });
}
function lineBreaks(record) {
    let n = 0;
    for (let i = 0; i < record.length; i++) {
        const value = record[i];
        for (let at = value.indexOf('\n'); at !== -1; at = value.indexOf('\n', at + 1))
            n++;
    }
    return n;
}
function checkHeader(file, record, line) {
    const seen = new Map();
    record.forEach((name, i) => {
        if (name === '') {
            throw dataError(file, line, i + 1, `column ${i + 1} has no name in the header row`);
        }
        const first = seen.get(name);
        if (first !== undefined) {
            throw dataError(file, line, i + 1, `column ${i + 1} is named ${escape_quote(name, 60)} like column ${first + 1}; column names must be unique`);
        }
        seen.set(name, i);
    });
    return record;
}
function fieldCountError(file, line, record, header) {
    const expected = `expected ${header.length} fields as in the header`;
    if (record.length > header.length) {
        return dataError(file, line, header.length + 1, `${expected}, found ${record.length}: an extra field ${shownValue(record[header.length])} ` +
            `after the last column ${escape_quote(header[header.length - 1], 60)} (an unquoted delimiter inside a value?)`);
    }
    const next = record.length;
    return dataError(file, line, next + 1, `${expected}, found ${record.length}: the row ends before ${columnLabel(next + 1, header[next])}`);
}
/** What the bad bytes are, for the message. */
function notText(w) {
    if (w.why === 'nul') {
        return 'a NUL byte (0x00), so this is not a text file; a file saved as UTF-16 or a spreadsheet looks like this';
    }
    if (w.why === 'truncated')
        return `a UTF-8 character cut off by the end of the file (the bytes ${w.bytes})`;
    const one = !w.bytes.includes(' ');
    const bytes = one ? `the byte ${w.bytes}` : `the bytes ${w.bytes}`;
    if (w.next === null)
        return `${bytes}, which is not valid UTF-8 text`;
    // One high byte followed by plain ASCII is how é, ü or ° look in Latin-1 / Windows-1252.
    const legacy = one && Number(w.next) < 0x80 ? '; a file saved as Latin-1 or Windows-1252 looks like this' : '';
    return `${bytes}, which is not valid UTF-8 text (it starts a character that ${w.next} does not continue)${legacy}`;
}
/** Turns stream and parser failures into messages about the file. */
function explain(file, error, 
/** Line on which the record being parsed starts. */
recordLine, header) {
    if (error instanceof errors_UserError)
        return error;
    if (error instanceof NotTextError) {
        const w = error.where;
        if (w.why === 'cr-only') {
            return dataError(file, w.line, undefined, 'this file ends its lines with CR only (old Mac style); save it with LF or CRLF line endings');
        }
        // The parser's header when it has read it; the byte check runs ahead of the parser.
        const where = columnLabel(w.column, (header ?? w.header)[w.column - 1]);
        return dataError(file, w.line, w.column, `${where}: expected UTF-8 text, found ${notText(w)}; save the file as CSV (UTF-8)`);
    }
    const e = error;
    const field = typeof e.column === 'number' ? e.column + 1 : 1;
    const name = header?.[field - 1];
    switch (e.code) {
        case 'CSV_QUOTE_NOT_CLOSED':
            return dataError(file, recordLine, field, `${columnLabel(field, name)}: a quoted value opens in the row starting on this line and is never ` +
                'closed; the file ends still inside the quotes');
        case 'CSV_INVALID_CLOSING_QUOTE':
            return dataError(file, recordLine, field, `${columnLabel(field, name)}: in the row starting on this line, a closing quote is followed by more ` +
                'text; expected a delimiter or the end of the line (write a quote inside a quoted value as "")');
        case 'INVALID_OPENING_QUOTE':
            return dataError(file, recordLine, field, `${columnLabel(field, name)}: in the row starting on this line, a quote appears in the middle of an ` +
                'unquoted value; quote the whole value and write the inner quote as ""');
        case 'ENOENT':
            return new errors_UserError(`${file.shown}: the data file does not exist`, { file: file.path, key: 'data.path' });
        case 'EISDIR':
            return new errors_UserError(`${file.shown}: is a folder; data.path must name a CSV file`, {
                file: file.path,
                key: 'data.path',
            });
        case 'EACCES':
        case 'EPERM':
            return new errors_UserError(`${file.shown}: the data file cannot be read (permission denied)`, {
                file: file.path,
                key: 'data.path',
            });
    }
    if (typeof e.code === 'string' && e.code.startsWith('CSV_')) {
        return dataError(file, recordLine, field, `the row starting on this line cannot be read as CSV: ${e.message}`);
    }
    return error;
}

;// CONCATENATED MODULE: ./src/data/split.ts
/**
 * Deterministic three-way split, stratified by class, chosen by a seeded Fisher–Yates
 * shuffle of each class's rows:
 * - validation rows (round(rows × data.validation) per class, at least one) steer training:
 *   when a training stops, which restart is kept, whether a pruning step is accepted;
 * - judging rows (round(rows × data.judging) per class, at least one) decide whether a network
 *   meets the target, and never steer anything;
 * - the rest train.
 * The validation rows are the first of each shuffled class, so they are the same rows whatever
 * data.judging is. Every part keeps file order.
 *
 * Small data: when some class has too few rows for three parts, the judging part is dropped and
 * networks are judged on the validation rows (`judgingFolded`); the report says so, because a
 * figure chosen on the rows that judge it is optimistic.
 */



// Keeps the split's stream apart from the training streams drawn from the same seed.
const SPLIT_STREAM = 0x73706c6974n; // "split"
/** Rows each part takes from a group of `n`, or null when the group is too small for them. */
function partSizes(n, f, minTrain) {
    let validation = f.validation > 0 ? Math.max(1, Math.round(n * f.validation)) : 0;
    let judging = f.judging > 0 ? Math.max(1, Math.round(n * f.judging)) : 0;
    if (n < minTrain + Math.sign(validation) + Math.sign(judging))
        return null;
    // Keep enough to train on; the larger held-out part gives way first, and neither below one row.
    while (n - validation - judging < minTrain) {
        if (validation >= judging && validation > 1)
            validation--;
        else
            judging--;
    }
    return { validation, judging };
}
function splitRows(target, fractions, seed, file) {
    const groups = groupRows(target);
    const minTrain = target.classIndex === null ? 2 : 1;
    let f = fractions;
    let judgingFolded = false;
    if (f.judging > 0 && groups.some((rows) => partSizes(rows.length, f, minTrain) === null)) {
        f = { ...f, judging: 0 };
        judgingFolded = true;
    }
    const sizes = groups.map((rows, g) => {
        const s = partSizes(rows.length, f, minTrain);
        if (s === null)
            throw tooFew(target, g, rows.length, minTrain, f, file);
        return s;
    });
    const rng = xoshiroFromSeed(BigInt(seed) ^ SPLIT_STREAM);
    const train = [];
    const validation = [];
    const judging = [];
    groups.forEach((rows, g) => {
        shuffle(rows, rng);
        const { validation: v, judging: j } = sizes[g];
        for (let i = 0; i < rows.length; i++)
            (i < v ? validation : i < v + j ? judging : train).push(rows[i]);
    });
    const ascending = (xs) => Int32Array.from(xs).sort();
    return { train: ascending(train), validation: ascending(validation), judging: ascending(judging), judgingFolded };
}
function groupRows(target) {
    if (target.classIndex === null)
        return [Int32Array.from({ length: target.rows }, (_, i) => i)];
    const counts = new Int32Array(target.classes?.length ?? 0);
    for (const c of target.classIndex)
        counts[c]++;
    const groups = Array.from(counts, (n) => new Int32Array(n));
    const filled = new Int32Array(counts.length);
    target.classIndex.forEach((c, row) => {
        groups[c][filled[c]++] = row;
    });
    return groups;
}
function tooFew(target, group, rows, minTrain, f, file) {
    const what = target.classes === null
        ? `the data have ${rows} rows`
        : `class ${escape_quote(target.classes[group])} has ${rows} row${rows === 1 ? '' : 's'}`;
    const parts = [`${minTrain} to train on`];
    if (f.validation > 0)
        parts.push('1 to validate on');
    const minimum = minTrain + (f.validation > 0 ? 1 : 0);
    const per = target.classes === null ? '' : ' per class';
    return dataError(file, 1, target.column, `${columnLabel(target.column, target.name)} (the target): ${what}; with validation ${f.validation} the split needs at least ${minimum} rows${per} (${parts.join(', ')})`);
}

;// CONCATENATED MODULE: ./src/data/target.ts
/**
 * The target column and the task. With `task: auto`, a text target means
 * classification; a numeric target with at most AUTO_MAX_CLASSES distinct values means
 * classification too (class labels like 0/1/2); any other numeric target means regression.
 */




function targetColumn(store, config, file) {
    const wanted = config.data.task;
    const label = columnLabel(store.column, store.name);
    const numeric = looksNumeric(store);
    let task;
    if (wanted !== 'auto')
        task = wanted;
    else if (!numeric)
        task = 'classification';
    else
        task = distinctNumbers(store, AUTO_MAX_CLASSES) === null ? 'regression' : 'classification';
    if (task === 'regression') {
        if (!numeric) {
            const first = store.firstText;
            throw dataError(file, first?.line ?? 1, store.column, `${label} (the target) must be numeric for regression, found ${shownValue(first?.value ?? '')}`);
        }
        const column = numericColumn(store, file, ' (the target)');
        checkNotConstant(column.values, file, store);
        return { task, name: store.name, column: store.column, values: column.values };
    }
    if (numeric) {
        const column = numericColumn(store, file, ' (the target)');
        const values = distinctNumbers(store, MAX_CLASSES);
        if (values === null)
            throw tooManyClasses(store, file);
        const rank = new Map(values.map((v, i) => [v, i]));
        const indices = new Int32Array(column.values.length);
        for (let i = 0; i < indices.length; i++)
            indices[i] = rank.get(column.values[i]) ?? -1;
        const classes = values.map((v) => String(v));
        checkTwoClasses(classes, file, store);
        return { task, name: store.name, column: store.column, classes, indices, numericLabels: column.values };
    }
    if (store.distinct === null)
        throw tooManyClasses(store, file);
    const column = categoricalColumn(store, file, MAX_CLASSES, 'class label');
    checkTwoClasses(column.categories, file, store);
    return {
        task,
        name: store.name,
        column: store.column,
        classes: column.categories,
        indices: column.codes,
        numericLabels: null,
    };
}
/** Sorted distinct values of a numeric column, or null when there are more than `limit`. */
function distinctNumbers(store, limit) {
    const seen = new Set();
    const values = store.numbers;
    for (let i = 0; i < store.length; i++) {
        const v = values[i];
        if (Number.isNaN(v) || seen.has(v))
            continue;
        seen.add(v);
        if (seen.size > limit)
            return null;
    }
    return [...seen].sort((a, b) => a - b);
}
function checkTwoClasses(classes, file, store) {
    if (classes.length >= 2)
        return;
    throw dataError(file, 1, store.column, `${columnLabel(store.column, store.name)} (the target) has a single class ${escape_quote(classes[0] ?? '')} in all ` +
        `${store.length} rows; classification needs at least two classes`);
}
function checkNotConstant(values, file, store) {
    for (let i = 1; i < values.length; i++)
        if (values[i] !== values[0])
            return;
    throw dataError(file, 1, store.column, `${columnLabel(store.column, store.name)} (the target) is ${values[0]} in all ${values.length} rows; ` +
        'a regression target must vary');
}
function tooManyClasses(store, file) {
    return dataError(file, store.overflow?.line ?? 1, store.column, `${columnLabel(store.column, store.name)} (the target) has more than ${MAX_CLASSES} distinct values, ` +
        'too many classes for classification; set data.task: regression if it is a measurement');
}

;// CONCATENATED MODULE: ./src/data/index.ts
/**
 * The data stage: CSV file → typed columns → split → encoded dataset, fingerprint and
 * profile. See read-csv.ts, columns.ts, target.ts, split.ts, encode.ts, fingerprint.ts
 * and profile.ts for each step.
 */











async function loadData(config) {
    try {
        return await load(config);
    }
    catch (error) {
        if (error instanceof ConfigKeyProblem)
            throw configKeyError(config, error.key, error.detail);
        throw error;
    }
}
async function load(config) {
    const file = { path: config.data.path, shown: displayPath(config.root, config.data.path) };
    await checkExists(file);
    let features = [];
    const table = await readCsvColumns(file, {
        delimiter: config.data.delimiter,
        missing: config.data.missing,
        plan: (header) => {
            const chosen = chooseColumns(header, config, file);
            features = chosen.features;
            return chosen.plan;
        },
    });
    const stores = table.columns.slice(0, features.length);
    const typed = stores.map((store) => featureColumn(store, file, config.data.maxCategories));
    const target = targetColumn(table.target, config, file);
    const split = splitRows({
        classIndex: target.task === 'classification' ? target.indices : null,
        classes: target.task === 'classification' ? target.classes : null,
        rows: table.rows,
        name: target.name,
        column: target.column,
    }, { validation: config.data.validation, judging: config.data.judging }, config.search.seed, file);
    return {
        dataset: encodeDataset(typed, target, split),
        rows: table.rows,
        droppedRows: table.droppedRows,
        fingerprint: fingerprint(typed, target, table.rows),
        profile: profileData(typed, target, table.columns, table.rows),
        targetSpread: targetSpread(target),
        splitRows: split,
        judgingFolded: split.judgingFolded,
    };
}
async function checkExists(file) {
    let isFile;
    try {
        isFile = (await (0,promises_namespaceObject.stat)(file.path)).isFile();
    }
    catch {
        throw new ConfigKeyProblem('data.path', `expected a CSV file, found nothing at ${file.shown}`);
    }
    if (!isFile)
        throw new ConfigKeyProblem('data.path', `expected a CSV file, found a folder at ${file.shown}`);
}

;// CONCATENATED MODULE: ./src/report/data-summary.ts




/** Class labels are padded into a column; a longer one is clipped so one label cannot widen every line. */
const LABEL_SHOWN = 40;
function inputsLine(data) {
    const features = data.dataset.encoding.features;
    const numeric = features.filter((f) => f.kind === 'numeric').length;
    const categorical = features.filter((f) => f.kind === 'categorical');
    const parts = [`${numeric} numeric`];
    if (categorical.length > 0) {
        const oneHot = categorical
            .map((f) => (f.kind === 'categorical' ? `${escapeText(f.name, 60)} → ${f.categories.length}` : ''))
            .join(', ');
        parts.push(`${categorical.length} categorical (${oneHot})`);
    }
    return `${data.dataset.inputs} after encoding: ${parts.join(', ')}`;
}
function splitLine(config, report, data) {
    const d = report.data;
    const how = `${d.task === 'classification' ? 'stratified by class, ' : ''}seed ${config.search.seed}`;
    if (d.validationRows === 0 && d.judgingRows === 0) {
        return `${d.trainRows} training rows, steered and judged on themselves (data.validation is 0)`;
    }
    const parts = [`${d.trainRows} training`];
    if (d.validationRows > 0)
        parts.push(`${d.validationRows} validation`);
    if (d.judgingRows > 0)
        parts.push(`${d.judgingRows} judging`);
    const folded = data.judgingFolded ? '; a class is too small for judging rows, so the validation rows judge' : '';
    const optimistic = d.judgingRows === 0 && !data.judgingFolded ? '; judged on the validation rows (data.judging is 0)' : '';
    return `${parts.join(' / ')} (${how})${folded}${optimistic}`;
}
function dataSummaryText(config, data, report) {
    const d = report.data;
    const rows = [
        ['config', escapeText(displayPath(config.root, config.file))],
        ['data', escapeText(d.file)],
        ['rows', `${d.rows} used${d.droppedRows > 0 ? `, ${d.droppedRows} dropped for missing values` : ''}`],
        ['split', splitLine(config, report, data)],
        ['inputs', inputsLine(data)],
        [
            'task',
            `${d.task}${d.classes ? `, ${d.classes.length} classes` : ''}; ${d.outputs} network output${d.outputs === 1 ? '' : 's'}`,
        ],
    ];
    if (d.classes) {
        const labels = d.classes.map((c) => escapeText(c.label, LABEL_SHOWN));
        const width = Math.max(...labels.map((l) => l.length));
        d.classes.forEach((c, i) => {
            const share = ((100 * c.count) / d.rows).toFixed(1);
            rows.push([
                i === 0 ? 'classes' : '',
                `${labels[i].padEnd(width)}  ${String(c.count).padStart(7)}  ${share.padStart(5)}%`,
            ]);
        });
    }
    rows.push(['target', targetShort(report.metric.name, report.metric.threshold)]);
    rows.push(['fingerprint', d.fingerprint]);
    const body = rows.map(([k, v]) => `  ${k.padEnd(12)}${v}`).join('\n');
    return `${TOOL_NAME} ${TOOL_VERSION} · data summary\n${body}`;
}

;// CONCATENATED MODULE: ./src/search/start.ts
function chooseStart(facts) {
    const fromMin = (why) => ({ from: 'min-width', width: facts.minWidth, why });
    if (facts.start === 'min-width')
        return fromMin('search.start is min-width');
    if (facts.growth === 'in-place')
        return fromMin('in-place growth grows every network from min-width');
    if (facts.baselineWidth === null)
        return fromMin('there is no baseline yet');
    if (facts.settingsChanged.length > 0)
        return fromMin("the baseline's settings differ, so it answers another question");
    const width = Math.min(facts.maxWidth, Math.max(facts.minWidth, facts.baselineWidth));
    if (width === facts.minWidth)
        return fromMin(`the baseline's width ${facts.baselineWidth} is min-width`);
    return { from: 'baseline', width, why: `the baseline has the same settings` };
}

;// CONCATENATED MODULE: ./src/job/prepare.ts
/**
 * What every stage of the main job does first (check, baseline, plan, shard, merge): read the
 * config, check the outputs can be written, read the baseline, load the data, and choose where
 * the growth walk starts. Everything a stage decides from afterwards is in the result.
 */













async function prepareJob(options) {
    const timing = {};
    const loaded = await loadConfig(options.configPath, options.root);
    // Fail on an unwritable output before minutes of work, not after.
    for (const [path, what] of options.outputs ?? [])
        if (path)
            await checkOutputFolder(path, what, options.root);
    const baselinePath = options.baselinePath ?? loaded.gate.baseline;
    const reads = [
        [loaded.file, 'config file'],
        [loaded.data.path, 'data file'],
        [baselinePath, 'baseline file'],
        ...(options.reads ?? []),
    ];
    refuseOverwritingInputs(options.outputs ?? [], reads, loaded.root);
    const baselineShown = options.baselinePath
        ? displayPath(loaded.root, options.baselinePath)
        : loaded.gate.baselineAsWritten;
    // A corrupt baseline is the user's to fix before minutes of search, not after.
    const previous = await readBaseline(baselinePath, baselineShown);
    const data = await timed(timing, 'loadSeconds', () => loadData(loaded));
    const config = settleTarget(loaded, data.dataset.task, data.dataset.encoding.target.classes);
    options.log?.(dataSummaryText(config, data, dataStageReport(config, data, timing)));
    return {
        config,
        data,
        previous,
        baselinePath,
        baselineShown,
        baselineFile: displayPath(loaded.root, baselinePath),
        start: startFor(config, previous),
        timing,
    };
}
/** Same file: the same absolute path, or (when both exist) the same file through a link. */
function sameFile(a, b) {
    if ((0,external_node_path_namespaceObject.resolve)(a) === (0,external_node_path_namespaceObject.resolve)(b))
        return true;
    try {
        return (0,external_node_fs_namespaceObject.realpathSync)(a) === (0,external_node_fs_namespaceObject.realpathSync)(b);
    }
    catch {
        return false;
    }
}
/** An output written over a file the run reads would destroy it (`--report readings.csv`). */
function refuseOverwritingInputs(outputs, reads, root) {
    for (const [out, what] of outputs) {
        if (!out)
            continue;
        const hit = reads.find(([input]) => sameFile(out, input));
        if (hit !== undefined)
            throw new errors_UserError(`${what} file ${displayPath(root, out)} is the ${hit[1]} this run reads; write the ${what} to another file`, { file: displayPath(root, out) });
    }
}
/** The stages that end in a report (check, baseline, merge) check its folder, and the model's, first. */
function prepareReportJob(options) {
    return prepareJob({
        ...options,
        outputs: [
            [options.reportPath, 'report'],
            [options.modelPath, 'model'],
        ],
    });
}
/** The whole search on the prepared job, timed; `more` adds outcomes computed elsewhere (merge). */
function searchJob(job, running, more = {}) {
    return timed(job.timing, 'searchSeconds', () => runSearch(job.data.dataset, job.config.search, job.config.target, {
        ...searchOptions(job, running),
        ...more,
    }));
}
/** The search options every stage passes (shard runs its own tasks with them). */
function searchOptions(job, running) {
    return {
        workers: running.workers ?? null,
        workerEntry: running.workerEntry ?? null,
        judgingFolded: job.data.judgingFolded,
        start: job.start,
        ...(running.onProgress ? { onProgress: running.onProgress } : {}),
    };
}
/** Where growth starts: at a baseline that answers the same question, else at min-width. */
function startFor(config, previous) {
    const s = config.search;
    return chooseStart({
        start: s.start,
        growth: s.growth,
        minWidth: s.minWidth,
        maxWidth: s.maxWidth,
        baselineWidth: previous === null ? null : (previous.result.grownWidth ?? previous.result.width),
        settingsChanged: previous === null ? [] : settingsDifferences(previous.config.settings, resultSettings(config)),
    });
}
async function timed(timing, name, work) {
    const start = performance.now();
    try {
        return await work();
    }
    finally {
        timing[name] = secondsFromMs(performance.now() - start);
    }
}

;// CONCATENATED MODULE: ./src/job/stages.ts
/**
 * The search over a job matrix, in three stages: `plan` splits the trainings into shards,
 * `shard` runs one shard anywhere, and `merge` checks that every part belongs to this run,
 * completes whatever the parts did not cover, and finishes exactly as `check` would (same
 * report outside `timing`, same verdict, same exit code).
 */


















/** This run's plan for `shards` shards: a pure function of the prepared job. */
function planOf(job, shards) {
    const { config, data } = job;
    const d = data.dataset;
    return makePlan(growthPlan(config.search, job.start), shards, {
        toolVersion: TOOL_VERSION,
        data: data.fingerprint,
        rows: data.rows,
        settings: settingsFingerprint(resultSettings(config)),
    }, {
        trainRows: d.trainRows,
        inputs: d.inputs,
        outputs: d.outputs,
        maxEpochs: config.search.maxEpochs,
        pruneEpochs: config.search.prune ? config.search.pruneEpochs : 0,
        pruneCandidates: DEFAULT_PRUNE_CANDIDATES,
    });
}
function describePlan(plan) {
    const tasks = plan.shards.reduce((n, s) => n + s.tasks.length, 0);
    const widths = [...new Set(plan.shards.flatMap((s) => s.tasks.map((t) => t.width)))].sort((a, b) => a - b);
    const from = plan.start.from === 'baseline'
        ? `from the baseline's width ${plan.start.width}`
        : `from min-width ${plan.start.width}`;
    const range = widths.length === 1 ? `width ${widths[0]}` : `widths ${widths[0]}–${widths[widths.length - 1]}`;
    const lines = [`plan: ${tasks} trainings (${range}, ${from}) over ${plan.shards.length} shards`];
    for (const s of plan.shards) {
        const pruned = s.tasks.filter((t) => t.prune).length;
        lines.push(`  shard ${s.index}: ${s.tasks.length} trainings${pruned > 0 ? `, prunes up to ${pruned} networks` : ''} (about ${(s.estimatedMacs / 1e9).toFixed(1)} G multiply-adds)`);
    }
    return lines.join('\n');
}
async function runPlanStage(options) {
    if (!Number.isInteger(options.shards) || options.shards < 1 || options.shards > MAX_SHARDS)
        throw new errors_UserError(`shards: expected a whole number from 1 to ${MAX_SHARDS} (a matrix's job limit), found ${options.shards}`);
    const job = await prepareJob({ ...options, outputs: [[options.planPath, 'plan']] });
    const plan = planOf(job, options.shards);
    await writeOutput(options.planPath, `${JSON.stringify(plan, null, 2)}\n`, 'plan', job.config.root);
    let text = describePlan(plan);
    if (plan.shards.length < options.shards)
        text += `\n(${options.shards} shards were asked for, but there are only ${plan.shards.length} trainings to share)`;
    return { plan, indexes: plan.shards.map((s) => s.index), text };
}
/** Reads a plan file and checks it is this run's plan (the same data, settings, baseline and tool). */
async function readPlan(path, job) {
    const shown = displayPath(job.config.root, path);
    const text = await (0,promises_namespaceObject.readFile)(path, 'utf8').catch((e) => {
        throw new errors_UserError(e.code === 'ENOENT'
            ? `plan file ${shown} does not exist; write it with \`neuron-budget plan\``
            : `cannot read the plan file ${shown} (${e.code ?? 'unknown error'})`);
    });
    const syntax = findJsonSyntaxProblem(text);
    if (syntax)
        throw new errors_UserError(`${shown}:${syntax.line}:${syntax.column}: the plan is not valid JSON: ${syntax.detail}`);
    const doc = JSON.parse(text);
    const refuse = (why) => {
        throw new errors_UserError(`${shown}: ${why}`);
    };
    if (typeof doc !== 'object' || doc === null || doc.schema !== PLAN_SCHEMA)
        return refuse(`expected a neuron-budget plan (schema "${PLAN_SCHEMA}"), the output of \`neuron-budget plan\``);
    const shards = Array.isArray(doc.shards) ? doc.shards.length : 0;
    if (shards < 1 || shards > MAX_SHARDS)
        return refuse(`shards: expected 1 to ${MAX_SHARDS} shards, found ${shards}`);
    const mine = planOf(job, shards);
    if (doc.data?.fingerprint !== mine.data.fingerprint)
        refuse('was made for other data than this checkout holds; make the plan from the same commit as the shards');
    if (doc.settings?.fingerprint !== mine.settings.fingerprint)
        refuse('was made with other result-changing settings than this config has');
    if (JSON.stringify(doc) !== JSON.stringify(mine))
        refuse(`is not this run's plan (plan ${escape_quote(String(doc.id).slice(0, 12))}, this config, data and baseline give ${mine.id.slice(0, 12)}); it may come from another tool version or another baseline`);
    return mine;
}
async function runShardStage(options) {
    const started = external_node_perf_hooks_namespaceObject.performance.now();
    const job = await prepareJob({
        ...options,
        outputs: [[options.partPath, 'part']],
        reads: [[options.planPath, 'plan file']],
    });
    const plan = await readPlan(options.planPath, job);
    const shard = plan.shards[options.index];
    if (!Number.isInteger(options.index) || shard === undefined)
        throw new errors_UserError(`index: expected a shard of the plan, 0 to ${plan.shards.length - 1}, found ${options.index}`);
    const outcome = await runShard(job.data.dataset, job.config.search, job.config.target, shard, searchOptions(job, options));
    const part = {
        schema: PART_SCHEMA,
        tool: { name: 'neuron-budget', version: TOOL_VERSION },
        plan: plan.id,
        shard: { index: shard.index, of: plan.shards.length },
        data: { fingerprint: plan.data.fingerprint },
        settings: { fingerprint: plan.settings.fingerprint },
        results: outcome.results,
        pruned: outcome.pruned,
        seconds: secondsFromMs(external_node_perf_hooks_namespaceObject.performance.now() - started),
    };
    await writeOutput(options.partPath, serializePart(part), 'part', job.config.root);
    const left = shard.tasks.length - outcome.results.length;
    const text = `shard ${shard.index} of ${plan.shards.length}: ${outcome.results.length} trainings, ${outcome.pruned.length} networks pruned, ` +
        `${part.seconds.toFixed(1)} s${left > 0 ? `; ${left} trainings left for the merge (the time budget ran out)` : ''}`;
    return { part, text };
}
async function readParts(paths, job) {
    if (paths.length === 0)
        throw new errors_UserError('merge needs the part files the shards wrote (neuron-budget shard --out …); none were given');
    return Promise.all(paths.map(async (path) => {
        const shown = displayPath(job.config.root, path);
        const text = await (0,promises_namespaceObject.readFile)(path, 'utf8').catch((e) => {
            throw new errors_UserError(e.code === 'ENOENT'
                ? `part file ${shown} does not exist`
                : `cannot read the part file ${shown} (${e.code ?? 'unknown error'})`);
        });
        return { part: parsePart(text, shown), shown };
    }));
}
/**
 * The plan the parts belong to, rebuilt here: of the shard counts the parts give, the one whose
 * plan most parts name (so a stray part of another plan is the one refused, whatever its place
 * in the list); when none names a plan of this run, the first part's count (and it is refused).
 */
function namedPlan(job, parts) {
    const counts = [...new Set(parts.map((p) => p.part.shard.of))].filter((n) => n >= 1 && n <= MAX_SHARDS);
    const candidates = counts
        .map((n) => planOf(job, n))
        .map((plan) => ({ plan, naming: parts.filter((p) => p.part.plan === plan.id).length }))
        .filter((c) => c.naming > 0)
        .sort((a, b) => b.naming - a.naming);
    return candidates[0]?.plan ?? planOf(job, Math.min(MAX_SHARDS, Math.max(1, parts[0].part.shard.of)));
}
async function runMergeStage(options) {
    const job = await prepareReportJob({ ...options, reads: options.partPaths.map((p) => [p, 'part file']) });
    const parts = await readParts(options.partPaths, job);
    const plan = namedPlan(job, parts);
    const want = {
        plan,
        toolVersion: TOOL_VERSION,
        inputs: job.data.dataset.inputs,
        outputs: job.data.dataset.outputs,
        activation: job.config.search.activation,
        head: headFor(job.data.dataset),
    };
    const byIndex = new Map();
    for (const { part, shown } of parts) {
        checkPart(part, shown, want);
        const other = byIndex.get(part.shard.index);
        if (other !== undefined)
            throw new errors_UserError(`${shown} and ${other} are both shard ${part.shard.index}; give each shard's part once`);
        byIndex.set(part.shard.index, shown);
    }
    const missing = plan.shards.map((s) => s.index).filter((i) => !byIndex.has(i));
    if (missing.length > 0)
        throw new errors_UserError(`the part of shard ${missing.join(', ')} of ${plan.shards.length} is missing (parts given: ${[...byIndex.keys()].sort((a, b) => a - b).join(', ')}); did a shard job fail or its artifact not download?`);
    const known = {
        results: parts.flatMap((p) => p.part.results),
        pruned: parts.flatMap((p) => p.part.pruned),
    };
    options.log?.(`merge: ${parts.length} parts of plan ${plan.id.slice(0, 12)}: ${known.results.length} trainings, ${known.pruned.length} pruned networks`);
    const search = await searchJob(job, options, {
        known,
        onLocalWork: (what) => options.log?.(`merge: ran here what the parts did not hold: ${what}`),
    });
    return finishJob(job, search, options);
}

;// CONCATENATED MODULE: ./src/run.ts
/**
 * The main job shared by the command line and the action: config → data → search → gate →
 * report. This file only orchestrates; each stage lives in its folder (job/ has the steps every
 * stage shares, and the matrix stages plan, shard and merge).
 */


async function runJob(options) {
    const job = await prepareReportJob(options);
    return finishJob(job, await searchJob(job, options), options);
}

;// CONCATENATED MODULE: ./src/cli.ts
/**
 * The `neuron-budget` command line: parses argv, runs the main job, prints to stderr,
 * and turns the outcome into an exit code (0 pass/improved/new, 1 fail/inconclusive,
 * 2 bad input or usage, 3 internal error). stdout carries only what was asked for
 * (--help, --version, `baseline`'s one line saying whether the file was written, `predict`'s
 * rows), so it stays clean for scripts.
 *
 * The workspace root is the current working directory: paths inside the config file
 * must stay inside it. Paths given as flags are the user's own choice and resolve
 * against the current directory.
 */















async function main(argv) {
    const err = process.stderr;
    try {
        const invocation = parseInvocation(argv);
        if (invocation.kind === 'help') {
            process.stdout.write(`${usage(invocation.command)}\n`);
            return EXIT.ok;
        }
        if (invocation.kind === 'version') {
            process.stdout.write(`${TOOL_VERSION}\n`);
            return EXIT.ok;
        }
        const root = process.cwd();
        const { flags } = invocation;
        if (invocation.command === 'export') {
            err.write(`${await runExport(root, invocation.args, flags)}\n`);
            return EXIT.ok;
        }
        if (invocation.command === 'predict') {
            const said = await runPredict(root, invocation.args, flags, (text) => process.stdout.write(text));
            err.write(`${said}\n`);
            return EXIT.ok;
        }
        const fromCwd = (p) => (p === undefined ? null : (0,external_node_path_namespaceObject.resolve)(root, p));
        const progress = progressPrinter(err);
        const log = (line) => {
            progress.done();
            err.write(`${escapeLines(line)}\n`);
        };
        const base = {
            configPath: (0,external_node_path_namespaceObject.resolve)(root, flags.config ?? DEFAULT_CONFIG),
            root,
            baselinePath: fromCwd(flags.baseline),
            log,
        };
        const running = {
            workers: invocation.workers,
            workerEntry: (0,external_node_url_namespaceObject.fileURLToPath)(import.meta.url),
            ...(progress.onProgress ? { onProgress: progress.onProgress } : {}),
        };
        if (invocation.command === 'plan') {
            const shards = wholeNumber('plan', 'shards', flags.shards);
            const planned = await runPlanStage({ ...base, shards, planPath: (0,external_node_path_namespaceObject.resolve)(root, flags.out) });
            err.write(`${escapeLines(planned.text)}\n`);
            // What plan was asked for: the shard indexes, on stdout for a script to fan out.
            process.stdout.write(`${JSON.stringify(planned.indexes)}\n`);
            return EXIT.ok;
        }
        if (invocation.command === 'shard') {
            const index = wholeNumber('shard', 'index', flags.index);
            let said;
            try {
                said = await runShardStage({
                    ...base,
                    ...running,
                    planPath: (0,external_node_path_namespaceObject.resolve)(root, flags.plan),
                    index,
                    partPath: (0,external_node_path_namespaceObject.resolve)(root, flags.out),
                });
            }
            finally {
                progress.done();
            }
            err.write(`${escapeLines(said.text)}\n`);
            return EXIT.ok;
        }
        const finish = {
            reportPath: fromCwd(flags.report),
            modelPath: fromCwd(flags.model),
            surface: 'cli',
            configShown: flags.config ?? null,
        };
        let result;
        try {
            result =
                invocation.command === 'merge'
                    ? await runMergeStage({
                        ...base,
                        ...running,
                        ...finish,
                        mode: 'check',
                        partPaths: invocation.args.map((a) => (0,external_node_path_namespaceObject.resolve)(root, a)),
                    })
                    : await runJob({
                        ...base,
                        ...running,
                        ...finish,
                        mode: invocation.command === 'baseline' ? 'baseline' : 'check',
                    });
        }
        finally {
            progress.done();
        }
        err.write(`${escapeLines(result.text)}\n`);
        // What `baseline` was asked for: whether the file was written, on stdout for scripts.
        if (result.baselineRecord)
            process.stdout.write(`${escapeLines(baselineRecordLine(result.baselineRecord))}\n`);
        return result.exitCode;
    }
    catch (error) {
        if (isUserError(error)) {
            const pointer = error instanceof UsageError && !error.message.includes('--help') ? `; see ${TOOL_NAME} --help` : '';
            err.write(`error: ${error.message}${pointer}\n`);
            return EXIT.badInput;
        }
        const stack = error instanceof Error ? (error.stack ?? error.message) : String(error);
        err.write(`internal error in ${TOOL_NAME} ${TOOL_VERSION} (a bug, not a problem with your files; please report it):\n${escapeLines(stack)}\n`);
        return EXIT.internal;
    }
}
/** A flag that must be a whole number ≥ 0 (a shard count or index). */
function wholeNumber(command, flag, value) {
    const n = value !== undefined && /^\d{1,6}$/.test(value) ? Number(value) : Number.NaN;
    if (!Number.isInteger(n))
        throw new UsageError(`${command}: --${flag}: expected a whole number, found ${escape_quote(value ?? '')}`);
    return n;
}
// This file is an entry point only (it runs on import); nothing should import it.
if (!external_node_worker_threads_namespaceObject.isMainThread) {
    runSearchWorker();
}
else {
    void main(process.argv.slice(2)).then((code) => {
        process.exitCode = code;
    });
}

