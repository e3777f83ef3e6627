"use client";

import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";

import { EmptyState } from "@/components/ui/empty-state";
import { geometryLabels } from "@/content-schema/catalogue-cutter";
import { materialGroupLabels } from "@/content-schema/catalogue-material";
import type { Cutter, MachineClass, Material } from "@/lib/catalogue/catalogue-types";

import { DataTable } from "./data-table";

const mono = (text: string) => <span className="num whitespace-nowrap">{text}</span>;

export function CuttersTable({ vendorSlug, cutters }: { vendorSlug: string; cutters: Cutter[] }) {
  const columns: ColumnDef<Cutter, unknown>[] = [
    {
      accessorKey: "sku",
      header: "SKU",
      cell: ({ row }) => (
        <Link className="num font-medium underline" href={`/${vendorSlug}/drafting/cutters/${encodeURIComponent(row.original.sku)}`}>
          {row.original.sku}
        </Link>
      ),
    },
    { accessorKey: "name", header: "Name" },
    { accessorKey: "diameterMm", header: "DC", cell: ({ row }) => mono(`${row.original.diameterMm} mm`) },
    { accessorKey: "flutes", header: "ZEFP", cell: ({ row }) => mono(String(row.original.flutes)) },
    { accessorKey: "fluteLengthMm", header: "APMX", cell: ({ row }) => mono(`${row.original.fluteLengthMm} mm`) },
    { id: "geometry", accessorFn: (c) => geometryLabels[c.geometry], header: "Geometry" },
    { accessorKey: "toolMaterial", header: "Tool material" },
  ];
  return (
    <DataTable
      data={cutters}
      columns={columns}
      label="cutters"
      empty={<EmptyState title="No cutters yet">Add one, or import a CSV file.</EmptyState>}
    />
  );
}

export function MaterialsTable({ vendorSlug, materials }: { vendorSlug: string; materials: Material[] }) {
  const columns: ColumnDef<Material, unknown>[] = [
    {
      accessorKey: "name",
      header: "Name",
      cell: ({ row }) => (
        <Link className="font-medium underline" href={`/${vendorSlug}/drafting/materials/${row.original.slug}`}>
          {row.original.name}
        </Link>
      ),
    },
    { accessorKey: "slug", header: "Slug", cell: ({ row }) => mono(row.original.slug) },
    { id: "group", accessorFn: (m) => materialGroupLabels[m.materialGroup], header: "Group" },
    { accessorKey: "vcMinMpm", header: "vc window", cell: ({ row }) => mono(`${row.original.vcMinMpm}–${row.original.vcMaxMpm} m/min`) },
    { accessorKey: "minChipLoadMm", header: "Min fz", cell: ({ row }) => mono(`${row.original.minChipLoadMm} mm`) },
    {
      accessorKey: "chipLoadMinPctD",
      header: "Chip band",
      cell: ({ row }) => mono(`${row.original.chipLoadMinPctD}–${row.original.chipLoadMaxPctD} % of D`),
    },
    { accessorKey: "kcNmm2", header: "kc", cell: ({ row }) => mono(`${row.original.kcNmm2} N/mm²`) },
  ];
  return <DataTable data={materials} columns={columns} label="materials" empty={<EmptyState title="No materials yet" />} />;
}

export function MachineClassesTable({ vendorSlug, machineClasses }: { vendorSlug: string; machineClasses: MachineClass[] }) {
  const columns: ColumnDef<MachineClass, unknown>[] = [
    {
      accessorKey: "name",
      header: "Name",
      cell: ({ row }) => (
        <Link className="font-medium underline" href={`/${vendorSlug}/drafting/machine-classes/${row.original.slug}`}>
          {row.original.name}
        </Link>
      ),
    },
    { accessorKey: "slug", header: "Slug", cell: ({ row }) => mono(row.original.slug) },
    { accessorKey: "rpmMax", header: "Spindle", cell: ({ row }) => mono(`${row.original.rpmMin}–${row.original.rpmMax} rpm`) },
    { accessorKey: "powerKw", header: "Power", cell: ({ row }) => mono(`${row.original.powerKw} kW`) },
    { accessorKey: "maxFeedMmMin", header: "Max feed", cell: ({ row }) => mono(`${row.original.maxFeedMmMin} mm/min`) },
    { accessorKey: "rigidity", header: "Rigidity", cell: ({ row }) => mono(row.original.rigidity.toFixed(2)) },
  ];
  return (
    <DataTable data={machineClasses} columns={columns} label="machine classes" empty={<EmptyState title="No machine classes yet" />} />
  );
}
