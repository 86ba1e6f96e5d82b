/**
 * The numbers both kernels must share to give the same bits: the constants of the elementary
 * functions (detmath.ts), the gradient block size and the activation and head codes. This file is
 * the one source: scripts/build-kernel.mjs writes them into kernel.as (between its "generated
 * constants" markers) and `build-kernel.mjs --check` fails when kernel.as or its bytes disagree.
 * Plain numeric literals only, so the script can read them without a TypeScript compiler.
 */

/** ln 2 split so that k * LN2_HI is exact for |k| < 2^11 (the classic Cody-Waite reduction). */
export const LN2_HI = 6.9314718036912381649e-1;
export const LN2_LO = 1.90821492927058770002e-10;
export const INV_LN2 = 1.442695040888963387;

/** Taylor coefficients 1/n! for n = 2..13 of expm1 on |r| <= ln2/2 (truncation < 1e-17 relative). */
export const C2 = 0.5;
export const C3 = 0.16666666666666666;
export const C4 = 0.041666666666666664;
export const C5 = 0.008333333333333333;
export const C6 = 0.001388888888888889;
export const C7 = 0.0001984126984126984;
export const C8 = 0.0000248015873015873;
export const C9 = 0.0000027557319223985893;
export const C10 = 2.755731922398589e-7;
export const C11 = 2.505210838544172e-8;
export const C12 = 2.08767569878681e-9;
export const C13 = 1.6059043836821613e-10;

/** |x| beyond this has tanh(x) === ±1 in double precision. */
export const TANH_CLAMP = 22;
/** 1.5·2^52: adding it rounds a double of magnitude below 2^51 to a whole number. */
export const ROUND_MAGIC = 6755399441055744;
export const SQRT2 = 1.4142135623730951;

/**
 * Rows per gradient block. The input-weight gradient is summed block by block: for each weight,
 * the products of a block's rows are added in row order starting from +0, and that block sum is
 * then added to the running gradient, in both kernels.
 */
export const GRAD_BLOCK_ROWS = 32;

export const ACT_TANH = 0;
export const ACT_LOGISTIC = 1;
export const ACT_RELU = 2;
export const HEAD_LINEAR = 0;
export const HEAD_LOGISTIC = 1;
export const HEAD_SOFTMAX = 2;
