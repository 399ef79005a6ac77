/**
 * Dense LU factorization behind one seam: {@link org.spanlift.solve.linear.DenseLu} is a factorized square
 * system (factor once, then any number of right-hand sides, with the pivot ratio as its quality estimate),
 * {@link org.spanlift.solve.linear.LuOptions} chooses the implementation and how many threads it may use.
 *
 * <p>Two implementations: {@link org.spanlift.solve.linear.EjmlLu}, EJML's LU with partial pivoting, and
 * {@link org.spanlift.solve.linear.TiledLu}, the same arithmetic blocked for the cache and spread over threads,
 * whose factors and solutions are bit-identical to EJML's whatever the thread count. Every implementation
 * passes one contract test ({@code DenseLuContractTest}).
 */
package org.spanlift.solve.linear;
