package org.spanlift.solve.linear;

/** EJML's LU passes the contract. */
class EjmlLuContractTest extends DenseLuContractTest {

    @Override
    LuOptions options() {
        return new LuOptions(LuOptions.Method.EJML, 1);
    }
}
