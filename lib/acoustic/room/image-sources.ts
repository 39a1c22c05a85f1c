// Image sources of a point source in a rectangular room (Allen & Berkley (1979), JASA 65, 943):
// along each axis of length L the images of a source at s lie at x_n = n L + (n even ? s : L - s),
// reached after |n| reflections, alternately on the far and near wall (n > 0 starts at the far wall).
// Each image's pressure at the listener, relative to the direct sound, is the product of the pressure
// reflection factors sqrt(1 - alpha) of the surfaces hit (per octave band; Allen & Berkley's beta) and
// the spherical-spreading ratio r_direct / r_image.
import { OCTAVE_BANDS_HZ } from '../constants';
import { requireAtLeast, requireAtMost } from '../input-error';
import { MAX_IMAGE_ORDER } from '../input-limits';
import type { RoomBox } from '../types';
import type { Point3, RoomSurfaces, SurfaceName } from './room-input';
import { roomSpeedOfSound } from './room-acoustics';

export interface ImageSource {
  /** Number of reflections, 0 for the direct sound. */
  order: number;
  /** Image indices (nx, ny, nz) of Allen & Berkley's lattice. */
  indices: [number, number, number];
  positionM: Point3;
  distanceM: number;
  delayS: number;
  /** Delay after the direct sound, s. */
  delayAfterDirectS: number;
  /** Surfaces hit, each once per reflection (which surfaces, not the order of the hits). */
  surfacesHit: SurfaceName[];
  /** Level at the listener relative to the direct sound, dB, in the octave bands 63 Hz to 8 kHz. */
  relativeLevelDb: number[];
}

type Axis = { lengthM: number; source: number; near: SurfaceName; far: SurfaceName };

function axisImage(axis: Axis, index: number): { coordinateM: number; hits: SurfaceName[] } {
  const coordinateM = index * axis.lengthM + (index % 2 === 0 ? axis.source : axis.lengthM - axis.source);
  const count = Math.abs(index);
  const first = index > 0 ? axis.far : axis.near;
  const second = index > 0 ? axis.near : axis.far;
  const hits: SurfaceName[] = [];
  for (let bounce = 0; bounce < count; bounce++) hits.push(bounce % 2 === 0 ? first : second);
  return { coordinateM, hits };
}

/** The direct sound and every image source up to maxOrder reflections, by delay. */
export function imageSources(room: RoomBox, surfaces: RoomSurfaces, source: Point3, listener: Point3, maxOrder = 2): ImageSource[] {
  requireAtMost(requireAtLeast(maxOrder, 0, 'maxOrder'), MAX_IMAGE_ORDER, 'maxOrder');
  const speedMps = roomSpeedOfSound(room);
  const axes: Axis[] = [
    { lengthM: room.lengthM, source: source.xM, near: 'wallXMin', far: 'wallXMax' },
    { lengthM: room.widthM, source: source.yM, near: 'wallYMin', far: 'wallYMax' },
    { lengthM: room.heightM, source: source.zM, near: 'floor', far: 'ceiling' },
  ];
  const directM = Math.hypot(source.xM - listener.xM, source.yM - listener.yM, source.zM - listener.zM);
  const images: ImageSource[] = [];
  for (let nx = -maxOrder; nx <= maxOrder; nx++) {
    for (let ny = -maxOrder + Math.abs(nx); ny <= maxOrder - Math.abs(nx); ny++) {
      const rest = maxOrder - Math.abs(nx) - Math.abs(ny);
      for (let nz = -rest; nz <= rest; nz++) {
        const [x, y, z] = [axisImage(axes[0], nx), axisImage(axes[1], ny), axisImage(axes[2], nz)];
        const positionM = { xM: x.coordinateM, yM: y.coordinateM, zM: z.coordinateM };
        const distanceM = Math.hypot(positionM.xM - listener.xM, positionM.yM - listener.yM, positionM.zM - listener.zM);
        const surfacesHit = [...x.hits, ...y.hits, ...z.hits];
        const relativeLevelDb = OCTAVE_BANDS_HZ.map((_, band) => {
          // Allen & Berkley (1979): pressure reflection factor beta = sqrt(1 - alpha) per reflection, 1/r spreading
          const reflection = surfacesHit.reduce((product, name) => product * Math.sqrt(1 - surfaces[name][band]), 1);
          return 20 * Math.log10((reflection * directM) / distanceM);
        });
        images.push({
          order: surfacesHit.length,
          indices: [nx, ny, nz],
          positionM,
          distanceM,
          delayS: distanceM / speedMps,
          delayAfterDirectS: (distanceM - directM) / speedMps,
          surfacesHit,
          relativeLevelDb,
        });
      }
    }
  }
  return images.sort((first, second) => first.delayS - second.delayS || first.order - second.order);
}
