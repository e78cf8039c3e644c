import { useState } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { CasebookEmptyState } from "@/components/casebook-empty-state";
import { activeCount, CasebookFilterChips, filterQuery, NO_FILTERS, type CasebookFilters } from "@/components/casebook-filter-chips";
import { CasebookResultCard } from "@/components/casebook-result-card";
import { CasebookResultTable } from "@/components/casebook-result-table";
import { CasebookSearchBox } from "@/components/casebook-search-box";
import { ChoiceChips } from "@/components/choice-chips";
import { Heading } from "@/components/heading";
import { Notice } from "@/components/notice";
import { Pager } from "@/components/pager";
import { Loading } from "@/components/query-state";
import { Screen } from "@/components/screen";
import { colors, space } from "@/constants/theme";
import { useIsWide } from "@/hooks/use-layout";
import { useCaseSearch, useDebounced } from "@/hooks/use-search";
import { useShopMembers } from "@/hooks/use-shop";
import type { ApiError } from "@/lib/api";
import type { SearchRequest, SearchSort } from "@/lib/search-schemas";

const PAGE_SIZE = 20;

/** The casebook: every case the shop has judged, found by words (typos forgiven) and filters. */
export default function CasebookScreen() {
  const wide = useIsWide();
  const [text, setText] = useState("");
  const words = useDebounced(text.trim(), 250);
  const [filters, setFilters] = useState<CasebookFilters>(NO_FILTERS);
  const [sort, setSort] = useState<SearchSort | undefined>();
  const [showFilters, setShowFilters] = useState(wide);
  const members = useShopMembers();
  const asked: SearchRequest = { q: words, ...filterQuery(filters), sort: words ? sort : sort === "relevance" ? undefined : sort };
  // New words, filters or order start again at page 1: the page belongs to the question asked.
  const [paging, setPaging] = useState({ for: "", page: 1 });
  const key = JSON.stringify(asked);
  const page = paging.for === key ? paging.page : 1;
  const query: SearchRequest = { ...asked, page, pageSize: PAGE_SIZE };
  const search = useCaseSearch(query);
  const answer = search.data;
  const active = activeCount(filters);
  const order = [...(words ? [{ value: "relevance", label: "best match" }] : []), { value: "date-desc", label: "newest" }, { value: "date-asc", label: "oldest" }];
  const error = search.error as ApiError | null;

  return (
    <Screen wide={wide}>
      <Heading>Casebook</Heading>
      <CasebookSearchBox value={text} onChange={setText} busy={search.isFetching || text.trim() !== words} />
      <View style={styles.bar}>
        <Pressable role="button" aria-expanded={showFilters} onPress={() => setShowFilters(!showFilters)} style={styles.toggle}>
          <Text style={styles.toggleText}>{showFilters ? "Hide filters" : "Filters"}{active ? ` (${active} on)` : ""}</Text>
        </Pressable>
        {active ? (
          <Pressable role="button" onPress={() => setFilters(NO_FILTERS)} style={styles.toggle}>
            <Text style={styles.toggleText}>Clear filters</Text>
          </Pressable>
        ) : null}
        {answer ? <Text style={styles.count} testID="casebook-total">{answer.total === 1 ? "1 case" : `${answer.total.toLocaleString("en")} cases`}</Text> : null}
      </View>
      {showFilters ? (
        <CasebookFilterChips filters={filters} onChange={setFilters} facets={answer?.facets} people={members.data ?? []} />
      ) : null}
      {answer && answer.total > 1 ? (
        <ChoiceChips label="Order" options={order} value={answer.sort} onChange={(s) => setSort(s as SearchSort)} />
      ) : null}
      {error ? (
        <Notice tone="error">{[error.message, ...Object.values(error.fields ?? {})].join(" ")}</Notice>
      ) : null}
      {search.isPending ? <Loading /> : null}
      {answer && answer.total === 0 ? (
        <CasebookEmptyState query={query} filtered={active > 0}
          onClearFilters={() => setFilters(NO_FILTERS)} onClearWords={() => setText("")} />
      ) : null}
      {answer && answer.items.length ? (
        wide ? (
          <CasebookResultTable hits={answer.items} sort={answer.sort} onSort={setSort} />
        ) : (
          answer.items.map((hit) => <CasebookResultCard key={hit.id} hit={hit} />)
        )
      ) : null}
      {answer && answer.total > PAGE_SIZE ? <Pager page={page} pageSize={PAGE_SIZE} total={answer.total} onPage={(p) => setPaging({ for: key, page: p })} /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: "row", alignItems: "center", flexWrap: "wrap", gap: space.md },
  toggle: { minHeight: 40, justifyContent: "center" },
  toggleText: { fontSize: 15, fontWeight: "600", color: colors.steel, textDecorationLine: "underline" },
  count: { marginLeft: "auto", fontSize: 14, color: colors.muted },
});
