/**
 * Grid-based horizontal datum shifts from NTv2 files (the published binary layout of the NTv2
 * Developer's Guide, Natural Resources Canada): parent and child subgrids, bilinear interpolation of the
 * shifts, the reverse by iteration. Also the exceptions shared by every grid reader.
 */
package io.geotick.transforms.grid;
