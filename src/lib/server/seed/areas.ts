/** The invented creamery's areas: the plant's own names for where things are. */
import { demoSites } from './demo';

const areaId = (n: number) => `5e7a0009-0000-4000-8000-${String(n).padStart(12, '0')}`;

export const creameryAreas = {
	boilerHouse: { id: areaId(1), name: 'Boiler house', sortOrder: 1 },
	evaporatorHall: { id: areaId(2), name: 'Evaporator hall', sortOrder: 2 },
	dryerTower: { id: areaId(3), name: 'Spray dryer tower', sortOrder: 3 },
	cipRoom: { id: areaId(4), name: 'CIP room', sortOrder: 4 },
	milkReception: { id: areaId(5), name: 'Milk reception', sortOrder: 5 },
	packing: { id: areaId(6), name: 'Packing and stores', sortOrder: 6 }
} as const;

export type CreameryArea = keyof typeof creameryAreas;

export const demoAreas = Object.values(creameryAreas).map((a) => ({
	...a,
	siteId: demoSites[0].id
}));
