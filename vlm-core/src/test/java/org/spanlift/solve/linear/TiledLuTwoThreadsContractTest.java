package org.spanlift.solve.linear;

/** The tiled LU on two threads passes the contract. */
class TiledLuTwoThreadsContractTest extends DenseLuContractTest {

    @Override
    LuOptions options() {
        return new LuOptions(LuOptions.Method.TILED, 2);
    }
}
