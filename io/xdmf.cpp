#include "io/xdmf.hpp"

#include <cstdio>
#include <utility>

#include "io/snapshot_layout.hpp"

namespace brume::io {

namespace {

std::string number(double value) {
  char text[32];
  std::snprintf(text, sizeof text, "%.17g", value);
  return text;
}

std::string escaped(const std::string& text) {
  std::string out;
  for (const char ch : text) {
    switch (ch) {
      case '&':
        out += "&amp;";
        break;
      case '<':
        out += "&lt;";
        break;
      case '>':
        out += "&gt;";
        break;
      case '"':
        out += "&quot;";
        break;
      case '\'':
        out += "&apos;";
        break;
      default:
        out += ch;
    }
  }
  return out;
}

std::string triple(const std::array<double, 3>& zyx) {
  return number(zyx[0]) + " " + number(zyx[1]) + " " + number(zyx[2]);
}

std::string dimensions(const std::array<long, 3>& zyx) {
  return std::to_string(zyx[0]) + " " + std::to_string(zyx[1]) + " " + std::to_string(zyx[2]);
}

std::string float_item(const std::string& dims, int precision, const std::string& format) {
  return "<DataItem Dimensions=\"" + dims + "\" NumberType=\"Float\" Precision=\"" +
         std::to_string(precision) + "\" Format=\"" + format + "\">";
}

// A uniform grid: node counts, origin and spacing slowest axis first, and its attributes.
struct GridShape {
  std::array<long, 3> nodes;
  std::array<double, 3> origin;
  std::array<double, 3> spacing;
};

GridShape cell_grid(const XdmfSnapshot& s) {
  GridShape g{};
  for (int d = 0; d < 3; ++d) {
    g.nodes[2 - d] = s.cells[d] + 1;
    g.origin[2 - d] = s.lower[d];
    g.spacing[2 - d] = s.size[d] / double(s.cells[d]);
  }
  return g;
}

// Nodes at the face centres of the face array normal to `axis`: on the cell faces along the
// normal (when it has more than one cell), at the cell centres along the other axes.
GridShape face_grid(const XdmfSnapshot& s, int axis) {
  GridShape g{};
  g.nodes = stored_shape(s.cells, axis);
  for (int d = 0; d < 3; ++d) {
    const double dx = s.size[d] / double(s.cells[d]);
    const bool on_faces = d == axis && s.cells[d] > 1;
    g.origin[2 - d] = s.lower[d] + (on_faces ? 0.0 : 0.5 * dx);
    g.spacing[2 - d] = dx;
  }
  return g;
}

std::string attribute(const XdmfSnapshot& s, const SnapshotField& f, const char* center,
                      const std::string& indent) {
  const int precision = s.single_precision ? 4 : 8;
  return indent + "<Attribute Name=\"" + f.name + "\" AttributeType=\"Scalar\" Center=\"" + center +
         "\">\n" + indent + "  " +
         float_item(dimensions(stored_shape(s.cells, f.staggered_axis())), precision, "HDF") +
         escaped(s.data_file) + ":/fields/" + f.name + "</DataItem>\n" + indent + "</Attribute>\n";
}

std::string uniform_grid(const XdmfSnapshot& s, const std::string& name, const GridShape& g,
                         const std::vector<SnapshotField>& fields, const char* center,
                         const std::string& indent) {
  const std::string in = indent + "  ";
  std::string xml = indent + "<Grid Name=\"" + escaped(name) + "\" GridType=\"Uniform\">\n";
  xml += in + "<Time Value=\"" + number(s.time) + "\"/>\n";
  xml +=
      in + "<Topology TopologyType=\"3DCoRectMesh\" Dimensions=\"" + dimensions(g.nodes) + "\"/>\n";
  xml += in + "<Geometry GeometryType=\"ORIGIN_DXDYDZ\">\n";
  xml += in + "  " + float_item("3", 8, "XML") + triple(g.origin) + "</DataItem>\n";
  xml += in + "  " + float_item("3", 8, "XML") + triple(g.spacing) + "</DataItem>\n";
  xml += in + "</Geometry>\n";
  for (const SnapshotField& f : fields)
    xml += attribute(s, f, center, in);
  return xml + indent + "</Grid>\n";
}

// The grids of one snapshot, by name: "cells", then the face arrays.
struct NamedGrid {
  std::string name;
  GridShape shape;
  std::vector<SnapshotField> fields;
  const char* center;
};

std::vector<NamedGrid> grids(const XdmfSnapshot& s) {
  std::vector<NamedGrid> list{{"cells", cell_grid(s), {}, "Cell"}};
  for (const SnapshotField& f : snapshot_fields(s.magnetic, s.isothermal)) {
    if (f.staggered_axis() < 0) {
      list.front().fields.push_back(f);
    } else {
      list.push_back({f.name, face_grid(s, f.staggered_axis()), {f}, "Node"});
    }
  }
  return list;
}

std::string units_information(const XdmfSnapshot& s, const std::string& indent) {
  return indent + "<Information Name=\"length_to_cgs\" Value=\"" + number(s.length_to_cgs) +
         "\"/>\n" + indent + "<Information Name=\"time_to_cgs\" Value=\"" + number(s.time_to_cgs) +
         "\"/>\n";
}

const char* header = "<?xml version=\"1.0\" encoding=\"utf-8\"?>\n<Xdmf Version=\"3.0\">\n";
const char* footer = "</Xdmf>\n";

}  // namespace

XdmfSnapshot xdmf_snapshot(std::string data_file, const solver::State& state,
                           const SnapshotInfo& info) {
  XdmfSnapshot s;
  s.data_file = std::move(data_file);
  s.time = state.time;
  s.cells = info.global_cells;
  s.lower = info.lower;
  s.size = info.size;
  s.single_precision = info.single_precision;
  s.magnetic = state.magnetic;
  s.isothermal = state.isothermal;
  s.time_to_cgs = info.units.time;
  s.length_to_cgs = info.units.length;
  return s;
}

std::string snapshot_xdmf(const XdmfSnapshot& snapshot) {
  std::string xml = std::string(header) + "  <Domain>\n" + units_information(snapshot, "    ");
  for (const NamedGrid& g : grids(snapshot))
    xml += uniform_grid(snapshot, g.name, g.shape, g.fields, g.center, "    ");
  return xml + "  </Domain>\n" + footer;
}

std::string time_series_xdmf(const std::vector<XdmfSnapshot>& snapshots) {
  std::string xml = std::string(header) + "  <Domain>\n";
  if (snapshots.empty()) return xml + "  </Domain>\n" + footer;
  xml += units_information(snapshots.front(), "    ");
  const std::size_t grid_count = grids(snapshots.front()).size();
  for (std::size_t n = 0; n < grid_count; ++n) {
    xml += "    <Grid Name=\"" + grids(snapshots.front())[n].name +
           "\" GridType=\"Collection\" CollectionType=\"Temporal\">\n";
    for (const XdmfSnapshot& s : snapshots) {
      const NamedGrid g = grids(s)[n];
      const std::string stem = std::filesystem::path(s.data_file).stem().string();
      xml += uniform_grid(s, stem, g.shape, g.fields, g.center, "      ");
    }
    xml += "    </Grid>\n";
  }
  return xml + "  </Domain>\n" + footer;
}

std::filesystem::path sidecar_path(const std::filesystem::path& data_file) {
  std::filesystem::path path = data_file;
  return path.replace_extension(".xmf");
}

}  // namespace brume::io
