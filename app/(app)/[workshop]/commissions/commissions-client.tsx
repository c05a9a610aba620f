"use client";

// The commissions table screen: filters from the address bar, the page from the API.
import { CommissionTable } from "@/components/commissions/commission-table";
import { ListFilters } from "@/components/commissions/list-filters";
import { isFiltered, listApiQuery } from "@/components/commissions/list-view";
import { useCommissionList, useCommissionPeople, useStageLine } from "@/components/commissions/queries";
import { Empty, Failed, Loading, NoSuchPage } from "@/components/commissions/query-states";
import { useListView } from "@/components/commissions/use-list-view";

export function CommissionsClient({
  slug,
  showClient,
  showBuilderFilter,
  peopleSource,
}: {
  slug: string;
  showClient: boolean;
  showBuilderFilter: boolean;
  peopleSource: "commission-people" | "members" | null;
}) {
  const [view, setView] = useListView();
  const list = useCommissionList(slug, listApiQuery(view));
  const stages = useStageLine(slug);
  const people = useCommissionPeople(slug, peopleSource);
  const stageOptions = stages.data ? [...stages.data.stages, ...stages.data.sideStages] : [];

  return (
    <div className="space-y-4">
      <ListFilters view={view} setView={setView} stages={stageOptions} people={peopleSource ? (people.data ?? { clients: [], builders: [] }) : null} showBuilderFilter={showBuilderFilter} />
      {list.isPending ? (
        <Loading label="Loading commissions…" rows={6} />
      ) : list.isError && !list.data ? (
        <Failed what="The commissions" error={list.error} retry={() => list.refetch()} />
      ) : list.data.total === 0 ? (
        <Empty>{isFiltered(view) ? "No commission matches these filters." : showClient ? "No commissions yet." : "No commissions yet: you have not asked for an instrument."}</Empty>
      ) : list.data.items.length === 0 ? (
        <NoSuchPage page={view.page} backToFirst={() => setView({ page: 1 })} />
      ) : (
        <>
          {list.isError ? <Failed what="The latest figures" error={list.error} retry={() => list.refetch()} /> : null}
          <CommissionTable slug={slug} rows={list.data.items} total={list.data.total} view={view} setView={setView} showClient={showClient} busy={list.isPlaceholderData} />
        </>
      )}
    </div>
  );
}
