# SPDX-License-Identifier: GPL-2.0-or-later
"""Batch runner: the terrain correction and the reduction on Dask, without QGIS.

``python3 -m relief_gravity.batch terrain|reduce --help``; see docs/batch.md.
Nothing here imports QGIS: only numpy/scipy (through ``algorithms/``), GDAL's
Python bindings and dask.distributed.
"""
