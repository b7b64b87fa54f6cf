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

#: Plausible bulk density range for a Bouguer reduction, kg/m^3 (water to
#: the densest common crustal rocks; common practice, no source).
PLAUSIBLE_DENSITY = (1000.0, 3500.0)

# --- Reference ellipsoids and normal-gravity formulas ------------------------
# Appended below the scalar constants so that concurrent edits by other
# contributors (who only append too) never conflict; hence the late import.
from dataclasses import dataclass as _dataclass  # noqa: E402


@_dataclass(frozen=True)
class Ellipsoid:
    """A level reference ellipsoid with its normal-gravity constants.

    Attributes
    ----------
    name : str
        Short lower-case name (``"grs80"``, ``"wgs84"``).
    semimajor_axis : float
        a, in m.
    flattening : float
        f, dimensionless.
    geocentric_gravitational_constant : float
        GM, in m^3 s^-2 (atmosphere included).
    angular_velocity : float
        omega, in rad/s.
    gravity_equator, gravity_pole : float
        Normal gravity on the ellipsoid at the equator and at the poles, in
        m/s^2 (the published values, not recomputed).
    reference : str
        Where the numbers come from.
    """

    name: str
    semimajor_axis: float
    flattening: float
    geocentric_gravitational_constant: float
    angular_velocity: float
    gravity_equator: float
    gravity_pole: float
    reference: str

    @property
    def semiminor_axis(self) -> float:
        """Semi-minor axis b = a (1 - f), in m."""
        return self.semimajor_axis * (1.0 - self.flattening)

    @property
    def first_eccentricity_squared(self) -> float:
        """e^2 = f (2 - f), dimensionless."""
        return self.flattening * (2.0 - self.flattening)

    @property
    def linear_eccentricity(self) -> float:
        """E = sqrt(a^2 - b^2), in m."""
        a, b = self.semimajor_axis, self.semiminor_axis
        return (a * a - b * b) ** 0.5

    @property
    def somigliana_k(self) -> float:
        """Constant k = b gamma_p / (a gamma_e) - 1 of Somigliana's formula."""
        return (self.semiminor_axis * self.gravity_pole) / (self.semimajor_axis * self.gravity_equator) - 1.0


#: Geodetic Reference System 1980 (Moritz 1980, Bull. Geod. 54(3) 395-405;
#: the Geodesist's Handbook 1988 re-issue).
GRS80 = Ellipsoid(
    name="grs80",
    semimajor_axis=6_378_137.0,
    flattening=1.0 / 298.257222101,
    geocentric_gravitational_constant=3.986005e14,
    angular_velocity=7.292115e-5,
    gravity_equator=9.7803267715,
    gravity_pole=9.8321863685,
    reference="Moritz (1980), Geodetic Reference System 1980, Bull. Geod. 54(3) 395-405",
)

#: World Geodetic System 1984 (NIMA TR8350.2, 2000 -- from memory; the normal
#: gravity values as quoted by a secondary source, docs/reduction.md section 2).
WGS84 = Ellipsoid(
    name="wgs84",
    semimajor_axis=6_378_137.0,
    flattening=1.0 / 298.257223563,
    geocentric_gravitational_constant=3.986004418e14,
    angular_velocity=7.292115e-5,
    gravity_equator=9.7803253359,
    gravity_pole=9.8321849378,
    reference="NIMA TR8350.2 (2000), World Geodetic System 1984 (from memory; values [V2])",
)

#: Ellipsoids by name, for user-facing choices.
ELLIPSOIDS = {"grs80": GRS80, "wgs84": WGS84}

#: The 1967 normal-gravity formula as used by legacy (IGSN71) databases, in
#: mGal: gamma = A (1 + B sin^2 phi + C sin^4 phi). Coefficients as used by
#: the USGS ground-gravity compilation of the Sonoma-Clear Lake area (its README,
#: checked on 2,859 rows); the formula is the Geodetic Reference System 1967
#: series (IAG 1971, from memory).
NORMAL_GRAVITY_1967_EQUATOR = 978_031.846
NORMAL_GRAVITY_1967_SIN2 = 0.005278895
NORMAL_GRAVITY_1967_SIN4 = 0.000023462
