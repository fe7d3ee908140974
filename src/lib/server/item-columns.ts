/**
 * A finding's words and figures under the names lists and pages read them by, from the live
 * findings (with their asset, area and header joined: `assets`, `areas`, `headers`) or from a
 * revision's frozen snapshot. Shared by the reports' rows and the Ladder's item pages.
 */
import { areas, assets, findings as F, headers, surveyRevisionFindings as S } from './db/schema';

export const liveItemColumns = {
	id: F.id,
	kind: F.kind,
	tag: assets.tag,
	location: F.location,
	area: areas.name,
	header: headers.name,
	condition: F.condition,
	status: F.status,
	steamKgH: F.steamLoss,
	heatKw: F.heatLoss,
	fuelGjYear: F.fuelEnergy,
	costMinor: F.cost,
	co2KgYear: F.co2,
	waterM3Year: F.water,
	repairCostMinor: F.repairCost,
	paybackYears: F.paybackYears,
	measureId: F.measureId
};

export const snapshotItemColumns = {
	id: S.findingId,
	kind: S.kind,
	tag: S.tag,
	location: S.location,
	area: S.areaName,
	header: S.headerName,
	condition: S.condition,
	status: S.status,
	steamKgH: S.steamLoss,
	heatKw: S.heatLoss,
	fuelGjYear: S.fuelEnergy,
	costMinor: S.cost,
	co2KgYear: S.co2,
	waterM3Year: S.water,
	repairCostMinor: S.repairCost,
	paybackYears: S.paybackYears,
	measureId: S.measureId
};
