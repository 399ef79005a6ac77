package org.spanlift.solve.linear;

/** The tiled LU on one thread passes the contract. */
class TiledLuContractTest extends DenseLuContractTest {

    @Override
    LuOptions options() {
        return new LuOptions(LuOptions.Method.TILED, 1);
    }
}
