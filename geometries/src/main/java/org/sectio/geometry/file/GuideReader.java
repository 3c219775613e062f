package org.sectio.geometry.file;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Loop;
import org.sectio.geometry.Material;
import org.sectio.geometry.Region;
import org.sectio.geometry.WallMetal;

/**
 * Reads the top level of a geometry file into a guide: the unit and parameters first (every later
 * value is read against them), then exactly one of {@code "wall"}, {@code "family"} or
 * {@code "standard"}, then the optional inner conductors, dielectric regions and filling, and last the
 * wall metals: {@code "conductor"} for every wall, {@code "inner_conductor_metal"} for every inner
 * conductor, and an inner-conductor entry's own {@code "conductor"}, each overriding the one before.
 */
final class GuideReader {

    static final String[] TOP_LEVEL = {"name", "units", "parameters", "wall", "family", "standard",
        "rounded_corners", "inner_conductors", "dielectrics", "filling", "conductor", "inner_conductor_metal"};

    private final ShapeKinds shapes = new ShapeKinds();
    private final Map<String, Double> settings;

    /** @param settings parameter values (file units) that replace those the file writes */
    GuideReader(Map<String, Double> settings) {
        this.settings = Map.copyOf(settings);
    }

    /**
     * @param root the document's top-level object
     * @return the unit its {@code "units"} names, millimetres when it names none
     * @throws SectionFileException for an unknown unit
     */
    static LengthUnit unit(SectionNode root) throws SectionFileException {
        if (!root.has("units")) {
            return LengthUnit.MILLIMETRE;
        }
        SectionNode unitNode = root.get("units");
        String word = unitNode.text();
        return LengthUnit.forKeyword(word).orElseThrow(() -> unitNode.problem(
                "unknown units \"" + word + "\", expected one of " + LengthUnit.keywords()));
    }

    /**
     * @param top the document's top-level value
     * @return the guide, m
     * @throws SectionFileException at the first fault
     */
    GuideSection read(SectionNode top) throws SectionFileException {
        SectionNode root = top.requireObject("a JSON object with a \"wall\", a \"family\" or a \"standard\"");
        root.allowOnly(TOP_LEVEL);
        String name = root.has("name") ? root.get("name").text().strip() : null;
        if (name != null && name.isEmpty()) {
            throw root.get("name").problem("expected a non-empty name, got an empty string");
        }
        LengthUnit unit = unit(root);
        if (!settings.isEmpty() && !root.has("parameters")) {
            throw root.problem("no \"parameters\" to set " + SectionNode.quoted(settings.keySet().toArray(
                    String[]::new)) + " in, expected the file to define them under \"parameters\"");
        }
        Map<String, Double> parameters = root.has("parameters")
                ? ParameterTable.resolve(root.get("parameters").within(new Scope(unit, Map.of())), settings)
                : Map.of();
        root = root.within(new Scope(unit, parameters));

        List<String> kinds = new ArrayList<>();
        for (String k : List.of("wall", "family", "standard")) {
            if (root.has(k)) {
                kinds.add(k);
            }
        }
        if (kinds.size() != 1) {
            throw root.problem(kinds.isEmpty() ? "missing key \"wall\" (or \"family\" or \"standard\")"
                    : "expected one of \"wall\", \"family\" or \"standard\", got " + SectionNode.quoted(
                            kinds.toArray(String[]::new)));
        }
        if (root.has("rounded_corners") && !root.has("standard")) {
            throw root.get("rounded_corners").problem("\"rounded_corners\" goes with \"standard\" only, expected"
                    + " a \"corner_radius\" in the wall's rectangle or the family instead");
        }
        GuideSection guide = switch (kinds.get(0)) {
            case "wall" -> wall(root.get("wall"));
            case "family" -> FamilyGuide.read(root.get("family"));
            default -> StandardGuide.read(root.get("standard"),
                    root.has("rounded_corners") ? root.get("rounded_corners") : null);
        };
        Map<Integer, WallMetal> ownMetals = new HashMap<>();
        if (root.has("inner_conductors")) {
            guide = withConductors(guide, root.get("inner_conductors"), ownMetals);
        }
        if (root.has("dielectrics")) {
            guide = withDielectrics(guide, root.get("dielectrics"));
        }
        Material filling = guide.filling();
        if (root.has("filling")) {
            SectionNode f = root.get("filling").requireObject("an object with \"permittivity\", \"loss_tangent\","
                    + " \"permeability\"");
            f.allowOnly("permittivity", "loss_tangent", "permeability");
            filling = MaterialReader.read(f, false);
        }
        return new GuideSection(name != null ? name : guide.name(), guide.interior(), guide.dielectrics(), filling,
                wallMetals(root, guide.conductors().size(), ownMetals));
    }

    /** @return the metal of each conductor given: every wall, then every inner one, then each entry's own */
    private static Map<Integer, WallMetal> wallMetals(SectionNode root, int conductors, Map<Integer, WallMetal> own)
            throws SectionFileException {
        Map<Integer, WallMetal> metals = new HashMap<>();
        if (root.has("conductor")) {
            WallMetal all = WallMetalReader.read(root.get("conductor"));
            for (int c = 0; c < conductors; c++) {
                metals.put(c, all);
            }
        }
        if (root.has("inner_conductor_metal")) {
            SectionNode inner = root.get("inner_conductor_metal");
            WallMetal metal = WallMetalReader.read(inner);
            if (conductors < 2) {
                throw inner.problem("the guide has no inner conductor, expected \"inner_conductor_metal\" only with"
                        + " \"inner_conductors\" or a family that has one (coaxial)");
            }
            for (int c = 1; c < conductors; c++) {
                metals.put(c, metal);
            }
        }
        metals.putAll(own);
        return metals;
    }

    private GuideSection wall(SectionNode wall) throws SectionFileException {
        ShapeRegion shape = shapes.read(wall);
        return new GuideSection(shape.description(), outerFirst(shape.region()), List.of(), Material.AIR);
    }

    /** @return the region with its loops reordered so that the one enclosing the most area comes first */
    static Region outerFirst(Region region) {
        List<Loop> loops = new ArrayList<>(region.loops());
        loops.sort((p, q) -> Double.compare(Math.abs(q.signedArea()), Math.abs(p.signedArea())));
        return new Region(loops);
    }

    private GuideSection withConductors(GuideSection guide, SectionNode list, Map<Integer, WallMetal> ownMetals)
            throws SectionFileException {
        Region interior = guide.interior();
        for (SectionNode entry : list.elements("an array of shapes")) {
            SectionNode item = entry;
            if (entry.has("shape") || entry.has("conductor")) {
                entry.allowOnly("shape", "conductor");
                item = entry.get("shape");
                if (entry.has("conductor")) {
                    ownMetals.put(interior.loops().size(), WallMetalReader.read(entry.get("conductor")));
                }
            }
            Region conductor = shapes.read(item).region();
            if (conductor.loops().size() != 1) {
                throw item.problem("an inner conductor must be bounded by one loop, got "
                        + conductor.loops().size() + " loops");
            }
            Walls.requireStrictlyInside(conductor.loops().get(0), interior, item);
            List<Loop> loops = new ArrayList<>(interior.loops());
            loops.add(conductor.loops().get(0));
            interior = new Region(loops);
        }
        return new GuideSection(guide.name(), interior, guide.dielectrics(), guide.filling());
    }

    private GuideSection withDielectrics(GuideSection guide, SectionNode list) throws SectionFileException {
        List<Dielectric> dielectrics = new ArrayList<>(guide.dielectrics());
        List<SectionNode> items = list.elements("an array of dielectric regions");
        for (int k = 0; k < items.size(); k++) {
            SectionNode item = items.get(k);
            item.requireObject("an object with \"shape\" and \"permittivity\"");
            item.allowOnly("name", "shape", "permittivity", "loss_tangent", "permeability");
            String label = item.has("name") ? item.get("name").text() : "dielectric " + (k + 1);
            Region region = shapes.read(item.get("shape")).region();
            Walls.requireWithin(region, guide.interior(), item.get("shape"));
            for (Dielectric other : dielectrics) {
                Walls.requireApart(region, other, item.get("shape"));
            }
            dielectrics.add(new Dielectric(label, region, MaterialReader.read(item, true)));
        }
        return new GuideSection(guide.name(), guide.interior(), dielectrics, guide.filling());
    }
}
