/**
 * The configuration in balance: neutral point and static margin, pitch derivatives, trim in level flight, the
 * trimmed stall and the forward limit of the centre of gravity that elevator power sets ({@link
 * org.spanlift.balance.Balance}); the fuselage's empirical moment slope ({@link
 * org.spanlift.balance.FuselageMoment}). Linear theory for the configuration given, without propeller slipstream,
 * out of ground effect, tail efficiency 1.
 */
package org.spanlift.balance;
