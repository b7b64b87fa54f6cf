# SPDX-License-Identifier: GPL-2.0-or-later
"""Physical and geodetic constants used everywhere in Relief Gravity.

Every constant carries its source. Values are immutable: change them here,
never mid-run.
"""

#: Newtonian gravitational constant G in m^3 kg^-1 s^-2 (CODATA 2018).
GRAVITATIONAL_CONSTANT = 6.6743e-11

#: Factor from SI acceleration (m/s^2) to mGal (1 mGal = 1e-5 m/s^2).
SI_TO_MGAL = 1.0e5

#: Conventional reduction density in kg/m^3 (Hinze et al. 2005; the
#: traditional 2.67 g/cm^3 of Hayford & Bowie 1912, from memory).
DEFAULT_REDUCTION_DENSITY = 2670.0

#: Outer radius of the Bouguer cap and of the terrain correction, in metres
#: (LaFehr 1991; Hinze et al. 2005): 166.735 km, the Hayford-Bowie zone O.
BOUGUER_CAP_RADIUS = 166_735.0

#: Earth radius used by LaFehr (1991) for the spherical cap, in metres.
LAFEHR_EARTH_RADIUS = 6_371_000.0

#: Mean Earth radius used for the curvature drop s^2 / (2R), in metres
#: (GRS80 mean radius R1, Moritz 1980, rounded).
MEAN_EARTH_RADIUS = 6_371_008.7714

#: Feet to metres (international foot).
FOOT = 0.3048
